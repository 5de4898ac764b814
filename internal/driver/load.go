package driver

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/scanner"
	"go/token"
	"go/types"
	"maps"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"slices"
	"strings"
	"sync"

	"golang.org/x/tools/go/gcexportdata"
	"golang.org/x/tools/go/packages"
)

// FactScan decides from syntax alone whether a package may carry an
// analyzer's facts (analyzer.MayCarryFacts is overfact's): funcs if any
// of its functions may, and methods names the methods among them.
// imported gives the name of a package it imports (by import path) and
// whether that one may carry facts, and methodBelow whether a method of
// that name may carry one in any package below.
type FactScan func(files []*ast.File, imported func(path string) (name string, carries bool), methodBelow func(name string) bool) (funcs bool, methods []string)

// metaMode is what the loader asks go list for: the import graph, the
// files, and export data for every package (go list -export), which is
// what a driver of an analyzer without facts loads too.
const metaMode = packages.NeedName | packages.NeedFiles | packages.NeedCompiledGoFiles |
	packages.NeedImports | packages.NeedDeps | packages.NeedExportFile |
	packages.NeedModule | packages.NeedTypesSizes

// LoadForFacts loads the packages matching patterns for an analyzer with
// facts: syntax and full type information for the packages named and for
// every dependency that may carry a fact, and types from export data for
// the rest, whose facts the checker would find empty anyway. The
// standard library carries none of overfact's facts: the functions of it
// that the analyzer knows (math.Gamma and its kin) it knows by name, so
// its packages always come from export data. Every other dependency is
// parsed, and scan decides. The result is what packages.Load with
// packages.LoadAllSyntax returns, except that the dependencies from
// export data have no Syntax and no TypesInfo; checker.Analyze runs the
// analyzer on them with no files, which exports nothing.
//
// With an overlay of Go files (the later rounds of -fix), export data is
// built from the files on disk, which go/packages therefore never
// trusts: here the packages the overlay reaches (those with an overlaid
// file in their directory, and every package importing one of them) come
// from source, and the rest as without an overlay (see exportBeyond).
// With any other overlay, or without a scan, it is packages.Load with
// packages.LoadAllSyntax.
func LoadForFacts(cfg *packages.Config, patterns []string, scan FactScan) ([]*packages.Package, error) {
	if scan == nil || !goFilesOnly(cfg.Overlay) {
		full := *cfg
		full.Mode = packages.LoadAllSyntax | packages.NeedModule
		return packages.Load(&full, patterns...)
	}
	meta := *cfg
	meta.Mode = metaMode
	if len(cfg.Overlay) > 0 {
		// go list -export would compile the overlaid packages, for
		// export data that is not read: they come from source.
		meta.Mode &^= packages.NeedExportFile
	}
	roots, err := packages.Load(&meta, patterns...)
	if err != nil {
		return nil, err
	}
	order := postorder(roots)
	if len(cfg.Overlay) > 0 {
		if err := exportBeyond(cfg, order); err != nil {
			return nil, err
		}
	}
	l := &loader{cfg: cfg, fset: cfg.Fset, parsed: make(map[string]*parsedFile)}
	if l.fset == nil {
		l.fset = token.NewFileSet()
	}
	if l.goroot, err = goroot(cfg); err != nil {
		return nil, err
	}
	isRoot := make(map[*packages.Package]bool, len(roots))
	for _, p := range roots {
		isRoot[p] = true
	}
	l.decide(order, isRoot, scan)
	l.check(order)
	return roots, nil
}

// goFilesOnly reports whether every file of overlay is a Go file: an
// overlaid go.mod, go.sum or go.work could change which package an
// import names, and with it any package's export data.
func goFilesOnly(overlay map[string][]byte) bool {
	for name := range overlay {
		if filepath.Ext(name) != ".go" {
			return false
		}
	}
	return true
}

// exportBeyond gives the packages of order (a graph go list described
// under cfg's overlay, without export data) the export data of the
// files on disk wherever the overlay cannot reach: a package none of
// whose directories holds an overlaid file and none of whose imports the
// overlay reaches is the package go list describes without the overlay,
// and its export data, built from the disk, describes it. Those are
// asked of go list by import path, without the overlay; the others, test
// variants among them (go list names them by path only as part of their
// test), keep no export file and come from source, as with
// packages.LoadAllSyntax. So does a package whose listing differs in its
// files, or which go list could not build.
func exportBeyond(cfg *packages.Config, order []*packages.Package) error {
	overlaid := make(map[string]bool) // directories
	for name := range cfg.Overlay {
		overlaid[filepath.Dir(name)] = true
	}
	reached := make(map[*packages.Package]bool, len(order))
	want := make(map[string]*packages.Package)
	for _, p := range order {
		files := slices.Concat(p.GoFiles, p.CompiledGoFiles, p.OtherFiles, p.IgnoredFiles)
		r := len(files) == 0
		for _, f := range files {
			r = r || overlaid[filepath.Dir(f)]
		}
		for _, imp := range p.Imports {
			r = r || reached[imp]
		}
		reached[p] = r
		if !r && p.ID == p.PkgPath && p.PkgPath != "unsafe" {
			want[p.PkgPath] = p
		}
	}
	if len(want) == 0 {
		return nil
	}
	disk := *cfg
	disk.Overlay, disk.Tests = nil, false
	disk.Mode = packages.NeedName | packages.NeedFiles | packages.NeedCompiledGoFiles | packages.NeedExportFile
	listed, err := packages.Load(&disk, slices.Sorted(maps.Keys(want))...)
	if err != nil {
		return err
	}
	for _, q := range listed {
		p := want[q.PkgPath]
		if p == nil || q.ExportFile == "" || len(q.Errors) > 0 ||
			!slices.Equal(p.GoFiles, q.GoFiles) || !slices.Equal(p.CompiledGoFiles, q.CompiledGoFiles) {
			continue
		}
		p.ExportFile = q.ExportFile
	}
	return nil
}

// loader type-checks a graph that go list described, each package from
// source or from export data.
type loader struct {
	cfg    *packages.Config
	fset   *token.FileSet
	goroot string

	source map[*packages.Package]bool // type-checked from source
	need   map[*packages.Package]bool // export data read in full (a source package imports it)

	mu     sync.Mutex // guards parsed
	parsed map[string]*parsedFile
	export sync.Mutex // export data reads share the packages they fill in
}

type parsedFile struct {
	ready chan struct{}
	file  *ast.File
	err   error
}

// postorder lists the graph below roots, every package after its imports.
func postorder(roots []*packages.Package) []*packages.Package {
	var out []*packages.Package
	seen := make(map[*packages.Package]bool)
	var visit func(p *packages.Package)
	visit = func(p *packages.Package) {
		if seen[p] {
			return
		}
		seen[p] = true
		for _, path := range slices.Sorted(maps.Keys(p.Imports)) {
			visit(p.Imports[path])
		}
		out = append(out, p)
	}
	for _, p := range roots {
		visit(p)
	}
	return out
}

// decide picks each package's source: the packages named, those without
// export data, and the dependencies outside the standard library that
// may carry facts come from source; the rest from export data.
func (l *loader) decide(order []*packages.Package, isRoot map[*packages.Package]bool, scan FactScan) {
	l.source = make(map[*packages.Package]bool)
	l.need = make(map[*packages.Package]bool)
	type carry struct {
		funcs   bool
		methods map[string]bool // the methods that may carry facts here and below; shared, never written once set
	}
	carries := make(map[*packages.Package]carry, len(order))
	// Parse the candidates' files first, all at once.
	var scanned []*packages.Package
	for _, p := range order {
		if isRoot[p] || p.ExportFile != "" && !l.standard(p) {
			scanned = append(scanned, p)
		}
	}
	files := make(map[*packages.Package][]*ast.File, len(scanned))
	var mu sync.Mutex
	parallel(len(scanned), func(i int) {
		fs, _ := l.parseFiles(scanned[i].CompiledGoFiles)
		mu.Lock()
		files[scanned[i]] = fs
		mu.Unlock()
	})
	for _, p := range order {
		c := carry{}
		for _, imp := range p.Imports {
			c.methods = union(c.methods, carries[imp].methods)
		}
		switch {
		case p.PkgPath == "unsafe":
		case p.ExportFile == "" && !isRoot[p]:
			// Broken, or not built: source; its methods are not known.
			l.source[p] = true
			c.funcs = true
		case files[p] != nil:
			imported := func(path string) (string, bool) {
				if imp := p.Imports[path]; imp != nil {
					return imp.Name, carries[imp].funcs
				}
				return "", false
			}
			funcs, methods := scan(files[p], imported, func(name string) bool { return c.methods[name] })
			c.funcs = funcs
			c.methods = union(c.methods, setOf(methods))
			l.source[p] = funcs || isRoot[p]
		}
		carries[p] = c
		if l.source[p] {
			for _, imp := range p.Imports {
				l.need[imp] = true
			}
		}
	}
}

// union returns the union of a and b, which it may share but never
// writes to.
func union(a, b map[string]bool) map[string]bool {
	switch {
	case len(b) == 0:
		return a
	case len(a) == 0:
		return b
	}
	u := maps.Clone(a)
	maps.Copy(u, b)
	return u
}

func setOf(names []string) map[string]bool {
	s := make(map[string]bool, len(names))
	for _, n := range names {
		s[n] = true
	}
	return s
}

// standard reports whether p is a package of the standard library.
func (l *loader) standard(p *packages.Package) bool {
	if p.Module != nil || len(p.GoFiles) == 0 {
		return false
	}
	return strings.HasPrefix(p.GoFiles[0], l.goroot)
}

// goroot returns the GOROOT/src directory of the go command cfg runs.
func goroot(cfg *packages.Config) (string, error) {
	cmd := exec.Command("go", "env", "GOROOT")
	cmd.Dir, cmd.Env = cfg.Dir, cfg.Env
	out, err := cmd.Output()
	if err != nil {
		return "", fmt.Errorf("go env GOROOT: %v", err)
	}
	return filepath.Join(strings.TrimSpace(string(out)), "src") + string(filepath.Separator), nil
}

// check type-checks the graph: each package once its imports are done,
// at most GOMAXPROCS at a time.
func (l *loader) check(order []*packages.Package) {
	done := make(map[*packages.Package]chan struct{}, len(order))
	for _, p := range order {
		done[p] = make(chan struct{})
		p.Fset = l.fset
		if p.PkgPath == "unsafe" {
			p.Types = types.Unsafe
		} else {
			// Every package exists before any export data is read, so that
			// reading one fills in its imports instead of making new ones.
			p.Types = types.NewPackage(p.PkgPath, p.Name)
		}
	}
	cpu := make(chan struct{}, runtime.GOMAXPROCS(0))
	var wg sync.WaitGroup
	for _, p := range order {
		wg.Add(1)
		go func() {
			defer wg.Done()
			defer close(done[p])
			for _, imp := range p.Imports {
				<-done[imp]
			}
			cpu <- struct{}{}
			defer func() { <-cpu }()
			l.load(p)
		}()
	}
	wg.Wait()
}

// load gives p its types, and its syntax if it comes from source.
func (l *loader) load(p *packages.Package) {
	switch {
	case p.PkgPath == "unsafe":
		p.Syntax, p.TypesInfo = []*ast.File{}, NewTypesInfo()
	case l.source[p] && (len(p.CompiledGoFiles) > 0 || p.ExportFile == ""):
		p.Errors = slices.DeleteFunc(p.Errors, buildFailure)
		l.fromSource(p)
	case l.source[p] || l.need[p]:
		if len(p.CompiledGoFiles) == 0 && l.source[p] {
			p.Errors = append(p.Errors, packages.Error{Pos: "-", Msg: "sources missing for package " + p.ID, Kind: packages.ParseError})
		}
		if err := l.fromExport(p); err != nil {
			p.IllTyped = true
			p.Errors = append(p.Errors, packages.Error{Pos: "-", Msg: err.Error(), Kind: packages.UnknownError})
		}
	}
}

// buildFailure reports whether err is the go command's report that it
// could not build a package's export data ("# path" and the compiler's
// output): the type-check from source reports the same errors in the form
// every other load gives them.
func buildFailure(err packages.Error) bool {
	return err.Kind == packages.ListError && strings.HasPrefix(err.Msg, "# ")
}

// fromExport reads p's types from its export data, as go/packages does.
func (l *loader) fromExport(p *packages.Package) error {
	l.export.Lock()
	defer l.export.Unlock()
	if p.Types.Complete() {
		return nil
	}
	f, err := os.Open(p.ExportFile)
	if err != nil {
		return err
	}
	defer f.Close()
	r, err := gcexportdata.NewReader(f)
	if err != nil {
		return fmt.Errorf("reading %s: %v", p.ExportFile, err)
	}
	view := make(map[string]*types.Package)
	seen := make(map[*packages.Package]bool)
	var visit func(map[string]*packages.Package)
	visit = func(imports map[string]*packages.Package) {
		for _, q := range imports {
			if !seen[q] {
				seen[q] = true
				view[q.PkgPath] = q.Types
				visit(q.Imports)
			}
		}
	}
	visit(p.Imports)
	view[p.PkgPath] = p.Types
	tp, err := gcexportdata.Read(r, l.fset, view, p.PkgPath)
	if err != nil {
		return fmt.Errorf("reading %s: %v", p.ExportFile, err)
	}
	p.Types = tp
	return nil
}

// fromSource parses and type-checks p as go/packages does for a package
// loaded with syntax.
func (l *loader) fromSource(p *packages.Package) {
	appendError := func(err error) {
		switch err := err.(type) {
		case *os.PathError:
			p.Errors = append(p.Errors, packages.Error{Pos: err.Path + ":1", Msg: err.Err.Error(), Kind: packages.ParseError})
		case scanner.ErrorList:
			for _, e := range err {
				p.Errors = append(p.Errors, packages.Error{Pos: e.Pos.String(), Msg: e.Msg, Kind: packages.ParseError})
			}
		case types.Error:
			p.TypeErrors = append(p.TypeErrors, err)
			p.Errors = append(p.Errors, packages.Error{Pos: err.Fset.Position(err.Pos).String(), Msg: err.Msg, Kind: packages.TypeError})
		default:
			p.Errors = append(p.Errors, packages.Error{Pos: "-", Msg: err.Error(), Kind: packages.UnknownError})
		}
	}
	files, errs := l.parseFiles(p.CompiledGoFiles)
	for _, err := range errs {
		appendError(err)
	}
	p.Syntax = files
	p.TypesInfo = NewTypesInfo(files...)
	importer := importerFunc(func(path string) (*types.Package, error) {
		if path == "unsafe" {
			return types.Unsafe, nil
		}
		imp := p.Imports[path]
		if imp == nil {
			return nil, fmt.Errorf("no metadata for %s", path)
		}
		if imp.Types == nil || !imp.Types.Complete() {
			return nil, fmt.Errorf("no type information for %s", path)
		}
		return imp.Types, nil
	})
	tc := &types.Config{Importer: importer, Error: appendError, Sizes: p.TypesSizes}
	if p.Module != nil && p.Module.GoVersion != "" {
		tc.GoVersion = "go" + p.Module.GoVersion
	}
	typErr := types.NewChecker(tc, l.fset, p.Types, p.TypesInfo).Files(p.Syntax)
	if typErr != nil && len(p.Errors) == 0 {
		appendError(typErr)
	}
	p.IllTyped = len(p.Errors) > 0
	for _, imp := range p.Imports {
		p.IllTyped = p.IllTyped || imp.IllTyped
	}
}

// parseFiles parses names, each file once however many packages list it
// (a package and its test variant share their files, as in go/packages).
func (l *loader) parseFiles(names []string) ([]*ast.File, []error) {
	files := make([]*ast.File, len(names))
	errs := make([]error, len(names))
	parallel(len(names), func(i int) { files[i], errs[i] = l.parseFile(names[i]) })
	var fs []*ast.File
	var es []error
	for i := range names {
		if files[i] != nil {
			fs = append(fs, files[i])
		}
		if errs[i] != nil {
			es = append(es, errs[i])
		}
	}
	return fs, es
}

func (l *loader) parseFile(name string) (*ast.File, error) {
	l.mu.Lock()
	pf, ok := l.parsed[name]
	if !ok {
		pf = &parsedFile{ready: make(chan struct{})}
		l.parsed[name] = pf
	}
	l.mu.Unlock()
	if ok {
		<-pf.ready
		return pf.file, pf.err
	}
	defer close(pf.ready)
	src, ok := l.cfg.Overlay[name]
	if !ok {
		var err error
		if src, err = os.ReadFile(name); err != nil {
			pf.err = err
			return nil, err
		}
	}
	parse := l.cfg.ParseFile
	if parse == nil {
		parse = func(fset *token.FileSet, name string, src []byte) (*ast.File, error) {
			return parser.ParseFile(fset, name, src, parseMode)
		}
	}
	pf.file, pf.err = parse(l.fset, name, src)
	return pf.file, pf.err
}

// parallel runs f(0) … f(n-1), GOMAXPROCS at a time.
func parallel(n int, f func(int)) {
	sem := make(chan struct{}, runtime.GOMAXPROCS(0))
	var wg sync.WaitGroup
	for i := range n {
		wg.Add(1)
		sem <- struct{}{}
		go func() {
			defer wg.Done()
			defer func() { <-sem }()
			f(i)
		}()
	}
	wg.Wait()
}

// NewTypesInfo returns a types.Info with every map the analysis API
// promises a pass (the driver, the language server and the fuzz target
// type-check with it). Given the files to be checked, it sizes the three
// large maps for them in advance (infoHints) instead of letting them grow
// entry by entry: the type checker's record of a 5 MB file then allocates
// a fifth less, with the same maps at the end.
func NewTypesInfo(files ...*ast.File) *types.Info {
	exprs, defs, uses := infoHints(files)
	return &types.Info{
		Types:        make(map[ast.Expr]types.TypeAndValue, exprs),
		Defs:         make(map[*ast.Ident]types.Object, defs),
		Uses:         make(map[*ast.Ident]types.Object, uses),
		Implicits:    make(map[ast.Node]types.Object),
		Instances:    make(map[*ast.Ident]types.Instance),
		Scopes:       make(map[ast.Node]*types.Scope),
		Selections:   make(map[*ast.SelectorExpr]*types.Selection),
		FileVersions: make(map[*ast.File]string),
	}
}

// infoHints estimates the entries go/types records in Info.Types, Defs
// and Uses for files, from a count of their expressions and identifiers.
// The fractions were measured on the standard library's strings, fmt,
// go/types and math/big, on gonum's stat/distuv and on a generated file
// of small functions: Types held 0.73–0.79 of the expressions, Uses
// 0.75–0.84 and Defs 0.14–0.25 of the identifiers. An estimate a little
// short costs a map the growth of a few of its tables; one far over
// would cost memory, so each takes a fraction near the smallest seen.
func infoHints(files []*ast.File) (exprs, defs, uses int) {
	var nExprs, nIdents int
	for _, f := range files {
		ast.Inspect(f, func(n ast.Node) bool {
			switch n.(type) {
			case *ast.Ident:
				nIdents++
				nExprs++
			case ast.Expr:
				nExprs++
			}
			return true
		})
	}
	return nExprs * 3 / 4, nIdents / 6, nIdents * 3 / 4
}

type importerFunc func(path string) (*types.Package, error)

func (f importerFunc) Import(path string) (*types.Package, error) { return f(path) }
