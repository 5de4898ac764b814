package fixes

import (
	"bytes"
	"go/ast"
	"go/token"
	"go/types"
	"sort"
	"strconv"
	"strings"

	"golang.org/x/tools/go/analysis"
)

// helper returns the name under which the fixed file refers to the helper
// module, adding its import when the file lacks one. at is where the name
// will be used.
func (b *builder) helper(at token.Pos) string {
	return b.use(HelperPath, "lgamma", at)
}

// use returns the name of the import of path in the fixed file, adding
// the import under base (or base2, base3, ... when base is taken) if the
// file does not import path yet. An existing import is reused; a dot or
// blank import is not, since its name cannot qualify a call.
func (b *builder) use(path, base string, at token.Pos) string {
	if name, ok := b.imports[path]; ok {
		return name
	}
	for _, spec := range b.file.Imports {
		if importPath(spec) != path {
			continue
		}
		if pn := b.pkgNameOf(spec); pn != nil && pn.Name() != "_" && pn.Name() != "." && b.visible(pn, at) {
			b.imports[path] = pn.Name()
			return pn.Name()
		}
	}
	name := base
	for i := 2; !b.free(name, at); i++ {
		name = base + strconv.Itoa(i)
	}
	b.imports[path] = name
	b.added[path] = true
	b.addImport(path, base, name)
	return name
}

func importPath(spec *ast.ImportSpec) string {
	p, _ := strconv.Unquote(spec.Path.Value)
	return p
}

// visible reports whether the name of pn still denotes pn at pos (a local
// variable may shadow it).
func (b *builder) visible(pn *types.PkgName, pos token.Pos) bool {
	_, obj := b.scopeAt(pos).LookupParent(pn.Name(), pos)
	return obj == pn
}

// free reports whether name can be declared at file scope and used at pos:
// nothing of that name is visible there, in this file or in the package.
func (b *builder) free(name string, pos token.Pos) bool {
	if _, obj := b.scopeAt(pos).LookupParent(name, pos); obj != nil {
		return false
	}
	return b.pass.Pkg.Scope().Lookup(name) == nil
}

func (b *builder) scopeAt(pos token.Pos) *types.Scope {
	// The scope of the function declaration that holds pos, found by
	// binary search: the package scope's Innermost tries every function
	// of the file in turn, which costs a file's functions per fix.
	funcs := b.fx.funcsOf(b.file)
	i := sort.Search(len(funcs), func(i int) bool { return funcs[i].End() > pos })
	if i < len(funcs) {
		if fs := b.pass.TypesInfo.Scopes[funcs[i].Type]; fs != nil && fs.Contains(pos) {
			return fs.Innermost(pos)
		}
	}
	if s := b.pass.Pkg.Scope().Innermost(pos); s != nil {
		return s
	}
	return b.pass.TypesInfo.Scopes[b.file]
}

// addImport inserts the import spec of path where goimports would put
// it (common practice): in the first import declaration, standard-library
// paths in sorted position in the standard group, which comes first,
// other paths in sorted position among the other imports, each kind in a
// group of its own separated by a blank line.
func (b *builder) addImport(path, base, name string) {
	spec := strconv.Quote(path)
	if name != base {
		spec = name + " " + spec
	}
	var decl *ast.GenDecl
	for _, d := range b.file.Decls {
		if g, ok := d.(*ast.GenDecl); ok && g.Tok == token.IMPORT {
			decl = g
			break
		}
	}
	switch {
	case decl == nil:
		b.insert(b.file.Name.End(), "\n\nimport "+spec)
	case len(decl.Specs) == 0:
		b.insert(decl.Lparen+1, "\n\t"+spec+"\n")
	case !decl.Lparen.IsValid() && b.listed:
		// A second import of this fix: the list is made already.
		b.insert(placeImport(decl.Specs, path, spec))
	case !decl.Lparen.IsValid():
		b.listed = true
		// import "math" becomes a parenthesised list. The parentheses
		// are edits of their own, identical in every fix, so that fixes
		// adding different imports to the same declaration merge. The
		// opening one replaces the space after the keyword rather than
		// being inserted where a new standard import is: a driver that
		// drops only adjacent copies of an edit (golangci-lint's) then
		// still sees the copies side by side.
		only := decl.Specs[0]
		kw := decl.TokPos + token.Pos(len(token.IMPORT.String()))
		if gap := b.src[b.tok.Offset(kw):b.tok.Offset(only.Pos())]; len(gap) > 0 && len(bytes.TrimSpace(gap)) == 0 {
			b.replace(kw, only.Pos(), " (\n\t")
		} else {
			b.insert(only.Pos(), "(\n\t")
		}
		b.insert(placeImport(decl.Specs, path, spec))
		b.insert(b.closeParen(only))
	default:
		b.insert(placeImport(decl.Specs, path, spec))
	}
}

// closeParen returns where the ")" of an import list made from the
// single spec only goes, and its text: at the start of the next line when
// nothing follows the spec on its own, so that specs that several fixes
// append at the spec's end all land inside the list, in whatever order
// a driver merges same-point insertions.
func (b *builder) closeParen(only ast.Spec) (token.Pos, string) {
	end := specEnd(only)
	rest := b.src[b.tok.Offset(end):]
	if i := bytes.IndexByte(rest, '\n'); i >= 0 && len(bytes.TrimSpace(rest[:i])) == 0 {
		return end + token.Pos(i+1), ")\n"
	}
	return end, "\n)"
}

// placeImport returns where, among the specs of an import declaration,
// the spec of path goes, and the text to insert there.
func placeImport(specs []ast.Spec, path, spec string) (token.Pos, string) {
	std := isStd(path)
	var kin []*ast.ImportSpec // the imports of the same kind
	for _, s := range specs {
		if is := s.(*ast.ImportSpec); isStd(importPath(is)) == std {
			kin = append(kin, is)
		}
	}
	for _, s := range kin {
		if importPath(s) > path {
			return specStart(s), spec + "\n\t"
		}
	}
	switch {
	case len(kin) > 0:
		return specEnd(kin[len(kin)-1]), "\n\t" + spec
	case std: // the standard group comes first
		return specStart(specs[0].(*ast.ImportSpec)), spec + "\n\n\t"
	}
	return specEnd(specs[len(specs)-1].(*ast.ImportSpec)), "\n\n\t" + spec
}

// specStart and specEnd include a spec's doc and line comments, so that
// an insertion never separates a comment from its import.
func specStart(s ast.Spec) token.Pos {
	if is := s.(*ast.ImportSpec); is.Doc != nil {
		return is.Doc.Pos()
	}
	return s.Pos()
}

func specEnd(s ast.Spec) token.Pos {
	if is := s.(*ast.ImportSpec); is.Comment != nil {
		return is.Comment.End()
	}
	return s.End()
}

// isStd reports whether path looks like a standard-library path (common
// practice, as in goimports: no dot in the first element).
func isStd(path string) bool {
	first, _, _ := strings.Cut(path, "/")
	return !strings.Contains(first, ".")
}

func (b *builder) insert(pos token.Pos, text string) {
	b.edits = append(b.edits, analysis.TextEdit{Pos: pos, End: pos, NewText: []byte(text)})
}

// removeUnusedImports deletes the imports whose every use lies in source
// the fix deletes, so that one fix applied alone (as an editor does) still
// compiles. The go vet, go fix and checker drivers of x/tools v0.52.0
// also drop unreferenced imports after merging fixes
// (driverutil.FormatSourceRemoveImports); this covers the single-fix case.
func (b *builder) removeUnusedImports() {
	for _, spec := range b.file.Imports {
		pn := b.pkgNameOf(spec)
		if pn == nil || pn.Name() == "_" || pn.Name() == "." {
			continue
		}
		if b.imports[pn.Imported().Path()] == pn.Name() {
			continue // the fix uses this import
		}
		if b.removesAllUses(pn) {
			b.deleteSpec(spec)
		}
	}
}

func (b *builder) removesAllUses(pn *types.PkgName) bool {
	uses := b.fx.importUses()[pn]
	for _, p := range uses {
		if !b.deletes(p) {
			return false
		}
	}
	return len(uses) > 0
}

// deletes reports whether the fix drops the source at p.
func (b *builder) deletes(p token.Pos) bool {
	for _, c := range b.copied {
		if c.contains(p) {
			return false
		}
	}
	for _, r := range b.removed {
		if r.contains(p) {
			return true
		}
	}
	return false
}

// deleteSpec deletes the import spec together with its line, or the whole
// declaration when it is the declaration's only spec and nothing was
// inserted into it.
func (b *builder) deleteSpec(spec *ast.ImportSpec) {
	for _, d := range b.file.Decls {
		g, ok := d.(*ast.GenDecl)
		if !ok || g.Tok != token.IMPORT {
			continue
		}
		for i, s := range g.Specs {
			if s != spec {
				continue
			}
			switch {
			case len(g.Specs) == 1 && !b.insertsInto(g):
				b.replace(g.Pos(), b.lineEnd(g.End()), "")
			case i+1 < len(g.Specs):
				b.replace(s.Pos(), g.Specs[i+1].Pos(), "")
			case i > 0:
				b.replace(g.Specs[i-1].End(), s.End(), "")
			default:
				b.replace(s.Pos(), s.End(), "")
			}
			return
		}
	}
}

func (b *builder) insertsInto(g *ast.GenDecl) bool {
	for _, e := range b.edits {
		if e.Pos == e.End && g.Pos() <= e.Pos && e.Pos <= g.End() {
			return true
		}
	}
	return false
}

// lineEnd returns the position just past the newline ending p's line.
func (b *builder) lineEnd(p token.Pos) token.Pos {
	off := b.offset(p)
	for off < len(b.src) && b.src[off] != '\n' {
		off++
	}
	if off < len(b.src) {
		off++
	}
	return b.tok.Pos(off)
}
