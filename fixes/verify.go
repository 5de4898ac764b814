package fixes

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/internal/textedit"
)

// verify applies the fix to the file and type-checks the result, so that
// a fix never leaves code that does not compile: a wrong conversion, a
// clashing name or a variable the fix left unused are caught here rather
// than in the user's build. A fix that edits only function bodies and
// imports is checked by type-checking the functions it edits against the
// package's declarations (verifyfunc.go); any other, by type-checking the
// whole package with the fixed file in place.
func (b *builder) verify() error {
	if !b.fx.spendVerification() {
		return errVerificationsSpent
	}
	// The cheap check reads the edited functions' text alone, so that
	// its cost does not grow with the file: the whole fixed file is
	// built only for the full check (and for tests that watch checks).
	var err error
	fe, cheap := b.scopeOfEdits()
	if cheap {
		err = b.checkFunctions(fe)
		if err == errNeedsFullCheck {
			cheap = false
		}
	}
	var fixed []byte
	if !cheap || checkHook != nil {
		var aerr error
		if fixed, aerr = apply(b.src, b.tok, b.edits); aerr != nil {
			return aerr
		}
	}
	if !cheap {
		err = b.checkPackage(fixed)
	}
	if checkHook != nil {
		checkHook(b, fixed, cheap, err)
	}
	return err
}

// checkHook, when set (by tests), sees every fix check: whether it was
// made on the edited functions alone, and its outcome.
var checkHook func(b *builder, fixed []byte, cheap bool, err error)

// checkPackage type-checks the package with the fixed file in place.
func (b *builder) checkPackage(fixed []byte) error {
	// The fixed file and the package's other files are parsed into one
	// file set of the fixer's own (go/types compares positions, so the
	// fixed file cannot join the pass's set under positions of its own);
	// the other files are parsed once per package and shared by its fixes.
	others, err := b.fx.parsedFiles()
	if err != nil {
		return err
	}
	name := b.tok.Name()
	fixedFile, err := parser.ParseFile(others.fset, name, fixed, parser.SkipObjectResolution)
	if err != nil {
		return fmt.Errorf("fixed code does not parse: %v", err)
	}
	files := []*ast.File{fixedFile}
	for _, f := range b.pass.Files {
		if f != b.file {
			files = append(files, others.files[f])
		}
	}
	return b.typeCheck(others.fset, files, nil)
}

// typeCheck type-checks files as the pass's package and returns the first
// error that excuse (if any) does not excuse.
func (b *builder) typeCheck(fset *token.FileSet, files []*ast.File, excuse func(types.Error) bool) error {
	var first error
	conf := types.Config{
		Importer:  b.fx.importerMap(),
		Sizes:     b.pass.TypesSizes,
		GoVersion: b.pass.Pkg.GoVersion(),
		Error: func(err error) {
			if te, ok := err.(types.Error); ok && excuse != nil && excuse(te) {
				return
			}
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

// parsed holds a package's files parsed afresh, by the pass's file.
type parsed struct {
	fset  *token.FileSet
	files map[*ast.File]*ast.File
}

func (fx *Fixer) parsedFiles() (*parsed, error) {
	if fx.parsed != nil {
		return fx.parsed, nil
	}
	pass := fx.pass
	p := &parsed{fset: token.NewFileSet(), files: make(map[*ast.File]*ast.File)}
	for _, f := range pass.Files {
		name := pass.Fset.File(f.FileStart).Name()
		src, err := fx.source(name)
		if err != nil {
			return nil, err
		}
		pf, err := parser.ParseFile(p.fset, name, src, parser.SkipObjectResolution)
		if err != nil {
			return nil, err
		}
		p.files[f] = pf
	}
	fx.parsed = p
	return p, nil
}

// importerMap is a types.Importer over packages already loaded.
type importerMap map[string]*types.Package

// importerFor resolves imports to the packages the analysed package
// already depends on, and the helper module and fmt (which fixes add) to
// their declared stand-ins when it does not, or when it depends on them
// only through packages read from export data, which hold just the part
// of them their importers mention.
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
			if q, ok := m[path]; !ok || !q.Complete() {
				m[path] = p
			}
		}
	}
	return m
}

// importerMap returns importerFor the fixer's package, made once.
func (fx *Fixer) importerMap() importerMap {
	if fx.importer == nil {
		fx.importer = importerFor(fx.pass.Pkg)
	}
	return fx.importer
}

func (m importerMap) Import(path string) (*types.Package, error) {
	if p, ok := m[path]; ok {
		return p, nil
	}
	return nil, fmt.Errorf("package %s is not a dependency", path)
}

// apply returns src with the fix's edits applied, by the one applier
// the command also writes fixes with.
func apply(src []byte, tok *token.File, edits []analysis.TextEdit) ([]byte, error) {
	es := make([]textedit.Edit, len(edits))
	for i, e := range edits {
		es[i] = textedit.Edit{Start: tok.Offset(e.Pos), End: tok.Offset(e.End), Text: string(e.NewText)}
	}
	return textedit.Apply(src, es)
}

// maxVerifications is the default bound on the fixes type-checked in one
// package (SetCheckBudget). A check that cannot be confined to the edited
// functions type-checks the whole package, so without a bound a package
// with thousands of such findings would cost thousands of type-checks,
// and analysis time would grow with the square of the package. With it,
// fix checking costs at most this many type-checks of the package:
// linear in its size. Findings past the bound are still reported, without
// a fix; after the first fixes are applied, the next analysis offers
// fixes for the rest.
const maxVerifications = 32

var errVerificationsSpent = fmt.Errorf("this package's fix checks are spent; apply the fixes offered so far and analyse again")
