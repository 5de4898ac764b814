package fixes

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"sort"

	"golang.org/x/tools/go/analysis"
)

// verify applies the fix to the file and type-checks the package with the
// fixed file in place, so that a fix never leaves code that does not
// compile: a wrong conversion, a clashing name or a variable the fix left
// unused are caught here rather than in the user's build.
func (b *builder) verify() error {
	fixed, err := apply(b.src, b.tok, b.edits)
	if err != nil {
		return err
	}
	// All files are parsed afresh into one file set: go/types compares
	// positions, so the fixed file cannot join the pass's set of files
	// under positions of its own.
	fset := token.NewFileSet()
	var files []*ast.File
	for _, f := range b.pass.Files {
		name := b.pass.Fset.File(f.FileStart).Name()
		src := fixed
		if f != b.file {
			if src, err = b.pass.ReadFile(name); err != nil {
				return err
			}
		}
		pf, err := parser.ParseFile(fset, name, src, parser.SkipObjectResolution)
		if err != nil {
			return fmt.Errorf("fixed code does not parse: %v", err)
		}
		files = append(files, pf)
	}
	var first error
	conf := types.Config{
		Importer:  importerFor(b.pass.Pkg),
		Sizes:     b.pass.TypesSizes,
		GoVersion: b.pass.Pkg.GoVersion(),
		Error: func(err error) {
			if first == nil {
				first = err
			}
		},
	}
	conf.Check(b.pass.Pkg.Path(), fset, files, nil)
	if first != nil {
		return fmt.Errorf("fixed code does not type-check: %v", first)
	}
	return nil
}

// importerFor resolves imports to the packages the analysed package
// already depends on, and the helper module and fmt (which fixes add) to
// their declared stand-ins when it does not.
type importerMap map[string]*types.Package

func importerFor(pkg *types.Package) importerMap {
	m := make(importerMap)
	var visit func(p *types.Package)
	visit = func(p *types.Package) {
		if _, ok := m[p.Path()]; ok {
			return
		}
		m[p.Path()] = p
		for _, q := range p.Imports() {
			visit(q)
		}
	}
	for _, q := range pkg.Imports() {
		visit(q)
	}
	if s, err := stubs(); err == nil {
		for path, p := range s {
			if _, ok := m[path]; !ok {
				m[path] = p
			}
		}
	}
	return m
}

func (m importerMap) Import(path string) (*types.Package, error) {
	if p, ok := m[path]; ok {
		return p, nil
	}
	return nil, fmt.Errorf("package %s is not a dependency", path)
}

// apply returns src with the non-overlapping edits applied.
func apply(src []byte, tok *token.File, edits []analysis.TextEdit) ([]byte, error) {
	sorted := append([]analysis.TextEdit(nil), edits...)
	sort.SliceStable(sorted, func(i, j int) bool { return sorted[i].Pos < sorted[j].Pos })
	var out []byte
	last := 0
	for _, e := range sorted {
		start, end := tok.Offset(e.Pos), tok.Offset(e.End)
		if start < last || end < start {
			return nil, fmt.Errorf("overlapping edits at offset %d", start)
		}
		out = append(out, src[last:start]...)
		out = append(out, e.NewText...)
		last = end
	}
	return append(out, src[last:]...), nil
}
