package fixes

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"sort"

	"github.com/overfact/overfact/internal/textedit"
)

// A fix that edits only function bodies and the file's imports cannot
// change whether any other declaration of the package compiles: a body
// declares nothing outside itself, and a function's signature, not its
// body, is what the rest of the package sees. Such a fix is checked by
// type-checking the functions it edits, from the fixed text, against the
// package-level declarations they reach by name (transitively; a named
// type with all its methods), with the function bodies of those dropped
// (go/types does not check a function without a body), instead of the
// whole package: the cost of a check is then what the edited functions
// use, not the package, and a package with many findings no longer pays
// for its size once per fix.
//
// What the dropped bodies would have told the full check, this one takes
// from the pass's type information, which is theirs unchanged:
//   - an import of the edited file that the dropped bodies use must still
//     be there under the same name (else the full check is run, which
//     reports where it is missing), and is then not reported unused;
//   - the imports of the other files, which the fix does not touch, are
//     not reported unused;
//   - a declaration left out cannot clash with the edited code: the names
//     the fixed code and its imports declare or use are among those
//     reached, so a clash is reported as in the whole package;
//   - the edited functions must refer to no package-level variable,
//     function or method that they did not refer to before the fix (else
//     the full check is run): the bodies dropped are where an
//     initialization cycle through such a new reference would show.
// Every other fix (one that edits a declaration's signature, a package-level
// variable, or adds a declaration), a file with a dot or cgo import, and a
// package that did not type-check as loaded get the full check.

// funcEdits describes a fix whose edits all lie in the file's import
// header or inside function bodies.
type funcEdits struct {
	headerEnd token.Pos       // where the first declaration other than an import begins
	touched   []*ast.FuncDecl // the functions whose bodies the fix edits, in order
}

// scopeOfEdits returns the functions the fix edits, or false when the
// fix needs the full check.
func (b *builder) scopeOfEdits() (*funcEdits, bool) {
	if len(b.pass.TypeErrors) > 0 {
		return nil, false
	}
	for _, spec := range b.file.Imports {
		if importPath(spec) == "C" || (spec.Name != nil && spec.Name.Name == ".") {
			return nil, false
		}
	}
	fe := &funcEdits{headerEnd: token.Pos(b.tok.Base() + b.tok.Size())}
	for _, d := range b.file.Decls {
		if g, ok := d.(*ast.GenDecl); !ok || g.Tok != token.IMPORT {
			fe.headerEnd = d.Pos()
			break
		}
	}
	funcs := b.fx.funcsOf(b.file)
	// b.edits are sorted by position; so are funcs.
	for _, e := range b.edits {
		if e.End <= fe.headerEnd {
			continue
		}
		i := sort.Search(len(funcs), func(i int) bool { return funcs[i].End() > e.Pos })
		if i == len(funcs) || funcs[i].Body == nil || !(funcs[i].Body.Lbrace < e.Pos && e.End <= funcs[i].Body.Rbrace) {
			return nil, false
		}
		if n := len(fe.touched); n == 0 || fe.touched[n-1] != funcs[i] {
			fe.touched = append(fe.touched, funcs[i])
		}
	}
	return fe, true
}

// funcsOf returns the functions declared in f, in order, listed once per
// file: each fix looks up the ones it edits.
func (fx *Fixer) funcsOf(f *ast.File) []*ast.FuncDecl {
	if funcs, ok := fx.funcs[f]; ok {
		return funcs
	}
	var funcs []*ast.FuncDecl
	for _, d := range f.Decls {
		if fd, ok := d.(*ast.FuncDecl); ok {
			funcs = append(funcs, fd)
		}
	}
	if fx.funcs == nil {
		fx.funcs = make(map[*ast.File][]*ast.FuncDecl)
	}
	fx.funcs[f] = funcs
	return funcs
}

// checkFunctions type-checks the fixed text of the functions fe names,
// with the fixed file's imports, against the declarations of the package
// they reach, without function bodies. It returns errNeedsFullCheck when
// it cannot judge the fix: the fix removes an import that a body it does
// not check still uses, adds a reference to a package-level variable,
// function or method, or its excerpt does not parse (the whole file's
// check then reports why).
func (b *builder) checkFunctions(fe *funcEdits) error {
	others, err := b.fx.parsedFiles()
	if err != nil {
		return err
	}
	decls, err := b.fx.declsOnly()
	if err != nil {
		return err
	}
	src, err := b.excerpt(fe)
	if err != nil {
		return err
	}
	sf, err := parser.ParseFile(others.fset, b.tok.Name(), src, parser.SkipObjectResolution)
	if err != nil {
		return errNeedsFullCheck
	}
	nImports := 0
	for _, d := range sf.Decls {
		if g, ok := d.(*ast.GenDecl); ok && g.Tok == token.IMPORT {
			nImports++
		}
	}
	if len(sf.Decls) != nImports+len(fe.touched) {
		return errNeedsFullCheck
	}
	touched := sf.Decls[nImports:]
	if !b.sameReferences(fe, touched) {
		return errNeedsFullCheck
	}
	excused := make(map[token.Pos]bool)
	for p := range decls.excused {
		excused[p] = true
	}
	if !b.keptImports(sf, fe, excused) {
		return errNeedsFullCheck
	}
	// The names the fixed code mentions or its imports declare; the
	// declarations they reach.
	var seeds []string
	for _, d := range sf.Decls {
		seeds = append(seeds, mentions(d)...)
	}
	imp := b.fx.importerMap()
	for _, spec := range sf.Imports {
		if spec.Name != nil {
			seeds = append(seeds, spec.Name.Name)
		} else if p, ok := imp[importPath(spec)]; ok {
			seeds = append(seeds, p.Name())
		}
	}
	replaced := make(map[ast.Decl]ast.Decl) // the edited functions, by their declaration before the fix
	for i, d := range touched {
		orig, ok := decls.bodyless[fe.touched[i]]
		if !ok {
			return errNeedsFullCheck
		}
		replaced[orig] = d
	}
	reached := decls.reach(seeds, replaced)
	// The fixed file: its new imports and edited functions, and the
	// declarations reached of the rest of the package as parsed before
	// the fix, imports of the other files kept. Only the declarations
	// reached are visited, so that a check costs what the edited
	// functions reach, not the package.
	byFile := make(map[*ast.File][]ast.Decl)
	for d := range reached {
		if _, ok := replaced[d]; !ok {
			f := decls.fileOf[d]
			byFile[f] = append(byFile[f], d)
		}
	}
	for i := range touched {
		orig := decls.bodyless[fe.touched[i]]
		byFile[b.file] = append(byFile[b.file], orig)
	}
	files := make([]*ast.File, 0, len(b.pass.Files))
	for _, f := range b.pass.Files {
		pf := decls.files[f]
		nf := *pf
		nf.Decls = nil
		if f == b.file {
			nf = *sf
			nf.Decls = append([]ast.Decl(nil), sf.Decls[:nImports]...)
		} else {
			nf.Decls = append(nf.Decls, decls.imports[f]...)
		}
		ds := byFile[f]
		sort.Slice(ds, func(i, j int) bool { return ds[i].Pos() < ds[j].Pos() })
		for _, d := range ds {
			if r, ok := replaced[d]; ok && f == b.file {
				d = r
			}
			nf.Decls = append(nf.Decls, d)
		}
		files = append(files, &nf)
	}
	return b.typeCheck(b.fx.parsed.fset, files, func(err types.Error) bool {
		return err.Soft && excused[err.Pos]
	})
}

// errNeedsFullCheck says that the functions' check cannot judge the fix.
var errNeedsFullCheck = fmt.Errorf("the fix needs a check of the whole package")

// excerpt returns the fixed file's import header and the fixed text of
// the functions fe names, each preceded by a line directive that gives
// it the line and column it has in the fixed file, so that the check
// reports the positions the whole file would. It is built from the
// original text and the fix's edits, at a cost that does not depend on
// the text left out. It returns errNeedsFullCheck when an edit before a
// function ends on the line the function starts on (its column in the
// fixed text is then not its column in the original).
func (b *builder) excerpt(fe *funcEdits) ([]byte, error) {
	var out bytes.Buffer
	i := 0        // the next edit to apply
	lines := 0    // line breaks the edits applied so far add
	lastEnd := -1 // the original line of the end of the last edit applied
	// piece writes the original text [start, end) with the edits inside
	// it applied; edits are sorted, and each lies inside one piece
	// (scopeOfEdits).
	piece := func(start, end token.Pos) error {
		var es []textedit.Edit
		for ; i < len(b.edits) && b.edits[i].Pos >= start && b.edits[i].End <= end; i++ {
			e := b.edits[i]
			es = append(es, textedit.Edit{Start: b.offset(e.Pos) - b.offset(start), End: b.offset(e.End) - b.offset(start), Text: string(e.NewText)})
			lines += bytes.Count(e.NewText, []byte{'\n'}) - bytes.Count(b.src[b.offset(e.Pos):b.offset(e.End)], []byte{'\n'})
			lastEnd = b.tok.PositionFor(e.End, false).Line
		}
		text, err := textedit.Apply(b.src[b.offset(start):b.offset(end)], es)
		if err != nil {
			return err
		}
		out.Write(text)
		return nil
	}
	if err := piece(token.Pos(b.tok.Base()), fe.headerEnd); err != nil {
		return nil, err
	}
	for _, fd := range fe.touched {
		at := b.tok.PositionFor(fd.Pos(), false)
		if at.Line == lastEnd {
			return nil, errNeedsFullCheck
		}
		fmt.Fprintf(&out, "\n//line %s:%d:%d\n", b.tok.Name(), at.Line+lines, at.Column)
		if err := piece(fd.Pos(), fd.End()); err != nil {
			return nil, err
		}
	}
	if i != len(b.edits) {
		return nil, fmt.Errorf("fix edits overlap the functions they edit")
	}
	return out.Bytes(), nil
}

// keptImports reports whether every import of the original file that
// code outside the edited functions uses is still in the fixed header sf
// under the same name, and marks those specs of sf as excused from being
// reported unused: their uses are in the bodies left out.
func (b *builder) keptImports(sf *ast.File, fe *funcEdits, excused map[token.Pos]bool) bool {
	uses := b.fx.importUses()
	inTouched := func(p token.Pos) bool {
		i := sort.Search(len(fe.touched), func(i int) bool { return fe.touched[i].End() > p })
		return i < len(fe.touched) && fe.touched[i].Pos() <= p
	}
	for _, spec := range b.file.Imports {
		pn := b.pkgNameOf(spec)
		if pn == nil {
			continue
		}
		usedElsewhere := false
		for _, p := range uses[pn] {
			if !inTouched(p) {
				usedElsewhere = true
				break
			}
		}
		if !usedElsewhere {
			continue
		}
		kept := false
		for _, s := range sf.Imports {
			if importPath(s) == importPath(spec) && sameName(s.Name, spec.Name) {
				excused[s.Pos()] = true
				kept = true
			}
		}
		if !kept {
			return false
		}
	}
	return true
}

func sameName(a, b *ast.Ident) bool {
	if a == nil || b == nil {
		return a == b
	}
	return a.Name == b.Name
}

// importUses returns the positions of the uses of each import name of the
// package, gathered from one walk of the pass's uses.
func (fx *Fixer) importUses() map[*types.PkgName][]token.Pos {
	if fx.uses != nil {
		return fx.uses
	}
	fx.uses = make(map[*types.PkgName][]token.Pos)
	for id, obj := range fx.pass.TypesInfo.Uses {
		if pn, ok := obj.(*types.PkgName); ok {
			fx.uses[pn] = append(fx.uses[pn], id.Pos())
		}
	}
	return fx.uses
}

// decls holds the package's files, parsed afresh, with their function
// bodies dropped; the positions of their import specs, whose imports the
// dropped bodies may have been the only users of; and an index of their
// declarations by the names they declare.
type decls struct {
	files    map[*ast.File]*ast.File  // by the pass's file
	imports  map[*ast.File][]ast.Decl // the import declarations, by the pass's file
	fileOf   map[ast.Decl]*ast.File   // the pass's file of each declaration
	bodyless map[ast.Decl]ast.Decl    // by the pass's declaration
	excused  map[token.Pos]bool
	byName   map[string][]ast.Decl // package-level declarations by name
	methods  map[string][]ast.Decl // methods by their receiver's type name
	names    map[ast.Decl][]string // what each declaration mentions, when asked
}

func (fx *Fixer) declsOnly() (*decls, error) {
	if fx.decls != nil {
		return fx.decls, nil
	}
	p, err := fx.parsedFiles()
	if err != nil {
		return nil, err
	}
	d := &decls{files: make(map[*ast.File]*ast.File), bodyless: make(map[ast.Decl]ast.Decl),
		imports: make(map[*ast.File][]ast.Decl), fileOf: make(map[ast.Decl]*ast.File),
		excused: make(map[token.Pos]bool), byName: make(map[string][]ast.Decl),
		methods: make(map[string][]ast.Decl), names: make(map[ast.Decl][]string)}
	for orig, pf := range p.files {
		f := *pf
		f.Decls = make([]ast.Decl, len(pf.Decls))
		for i, decl := range pf.Decls {
			if fd, ok := decl.(*ast.FuncDecl); ok && fd.Body != nil {
				decl = withoutBody(fd)
			}
			f.Decls[i] = decl
			d.fileOf[decl] = orig
			if g, ok := decl.(*ast.GenDecl); ok && g.Tok == token.IMPORT {
				d.imports[orig] = append(d.imports[orig], decl)
			}
			if len(orig.Decls) == len(pf.Decls) {
				d.bodyless[orig.Decls[i]] = decl
			}
			d.index(decl)
		}
		f.Comments = nil
		d.files[orig] = &f
		for _, s := range pf.Imports {
			d.excused[s.Pos()] = true
		}
	}
	fx.decls = d
	return d, nil
}

// index records the names decl declares at package level (a method under
// its receiver's type name).
func (d *decls) index(decl ast.Decl) {
	switch decl := decl.(type) {
	case *ast.FuncDecl:
		if decl.Recv == nil {
			d.byName[decl.Name.Name] = append(d.byName[decl.Name.Name], decl)
		} else if len(decl.Recv.List) == 1 {
			if t := recvTypeName(decl.Recv.List[0].Type); t != "" {
				d.methods[t] = append(d.methods[t], decl)
			}
		}
	case *ast.GenDecl:
		for _, spec := range decl.Specs {
			switch spec := spec.(type) {
			case *ast.TypeSpec:
				d.byName[spec.Name.Name] = append(d.byName[spec.Name.Name], decl)
			case *ast.ValueSpec:
				for _, n := range spec.Names {
					d.byName[n.Name] = append(d.byName[n.Name], decl)
				}
			}
		}
	}
}

// recvTypeName returns the name of a receiver's base type: T of T, *T,
// T[P] and (*T).
func recvTypeName(e ast.Expr) string {
	for {
		switch x := e.(type) {
		case *ast.StarExpr:
			e = x.X
		case *ast.ParenExpr:
			e = x.X
		case *ast.IndexExpr:
			e = x.X
		case *ast.IndexListExpr:
			e = x.X
		case *ast.Ident:
			return x.Name
		default:
			return ""
		}
	}
}

// reach returns the declarations that the names reach, transitively: the
// declarations of those names, of the names these mention, and every
// method of a type reached. The declarations replaced stand for the
// edited functions, which are checked in their fixed form instead.
func (d *decls) reach(seeds []string, replaced map[ast.Decl]ast.Decl) map[ast.Decl]bool {
	reached := make(map[ast.Decl]bool)
	seen := make(map[string]bool)
	work := seeds
	add := func(decl ast.Decl) {
		if reached[decl] {
			return
		}
		reached[decl] = true
		if _, ok := replaced[decl]; ok {
			return
		}
		ns, ok := d.names[decl]
		if !ok {
			ns = mentions(decl)
			d.names[decl] = ns
		}
		work = append(work, ns...)
		if g, ok := decl.(*ast.GenDecl); ok && g.Tok == token.TYPE {
			for _, spec := range g.Specs {
				work = append(work, "\x00"+spec.(*ast.TypeSpec).Name.Name)
			}
		}
	}
	for len(work) > 0 {
		n := work[len(work)-1]
		work = work[:len(work)-1]
		if seen[n] {
			continue
		}
		seen[n] = true
		if len(n) > 0 && n[0] == 0 { // the methods of type n[1:]
			for _, m := range d.methods[n[1:]] {
				add(m)
			}
			continue
		}
		for _, decl := range d.byName[n] {
			add(decl)
		}
	}
	return reached
}

// mentions returns the identifiers n mentions that may name a
// package-level declaration: every identifier but a selected field or
// method, a declared parameter, result or field, and a function's own name.
func mentions(n ast.Node) []string {
	var out []string
	skip := make(map[*ast.Ident]bool)
	ast.Inspect(n, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.SelectorExpr:
			skip[n.Sel] = true
		case *ast.Field:
			for _, id := range n.Names {
				skip[id] = true
			}
		case *ast.FuncDecl:
			skip[n.Name] = true
		case *ast.Ident:
			if !skip[n] {
				out = append(out, n.Name)
			}
		}
		return true
	})
	return out
}

// sameReferences reports whether the fixed functions refer to no
// package-level variable or function, and no method of the package's
// types, that the functions did not refer to before the fix. The names
// of the fixed code are taken from its syntax (a local of the same name
// counts as a reference, which can only send a fix to the full check).
func (b *builder) sameReferences(fe *funcEdits, fixed []ast.Decl) bool {
	fx := b.fx
	if fx.depNames == nil {
		fx.depNames = make(map[string]bool)
		scope := b.pass.Pkg.Scope()
		for _, name := range scope.Names() {
			switch obj := scope.Lookup(name).(type) {
			case *types.Var, *types.Func:
				fx.depNames[name] = true
			case *types.TypeName:
				if named, ok := obj.Type().(*types.Named); ok {
					for i := 0; i < named.NumMethods(); i++ {
						fx.depNames[named.Method(i).Name()] = true
					}
				}
			}
		}
	}
	before := make(map[string]bool)
	for _, fd := range fe.touched {
		ast.Inspect(fd.Body, func(n ast.Node) bool {
			if id, ok := n.(*ast.Ident); ok {
				if obj := b.pass.TypesInfo.Uses[id]; obj != nil && obj.Pkg() == b.pass.Pkg && fx.depNames[id.Name] && packageLevel(obj) {
					before[id.Name] = true
				}
			}
			return true
		})
	}
	ok := true
	for _, d := range fixed {
		ast.Inspect(d.(*ast.FuncDecl).Body, func(n ast.Node) bool {
			if id, isID := n.(*ast.Ident); isID && fx.depNames[id.Name] && !before[id.Name] {
				ok = false
			}
			return ok
		})
	}
	return ok
}

// packageLevel reports whether obj is declared at package level or is a
// method.
func packageLevel(obj types.Object) bool {
	if fn, ok := obj.(*types.Func); ok && fn.Type().(*types.Signature).Recv() != nil {
		return true
	}
	return obj.Parent() == obj.Pkg().Scope()
}

// withoutBody returns fd with a body go/types does not look into: none,
// or, where a function must have one (init, a generic function), an empty
// endless loop, which ends any function.
func withoutBody(fd *ast.FuncDecl) *ast.FuncDecl {
	c := *fd
	c.Body = nil
	if fd.Recv == nil && fd.Name.Name == "init" || fd.Type.TypeParams.NumFields() > 0 {
		at := fd.Body.Lbrace
		c.Body = &ast.BlockStmt{Lbrace: at, Rbrace: fd.Body.Rbrace, List: []ast.Stmt{
			&ast.ForStmt{For: at, Body: &ast.BlockStmt{Lbrace: at, Rbrace: at}},
		}}
	}
	return &c
}
