package lsp

import (
	"crypto/sha256"
	"errors"
	"fmt"
	"go/ast"
	"go/parser"
	"go/scanner"
	"go/types"
	"os"
	"path/filepath"
	"slices"
	"sort"
	"strconv"
	"strings"
	"sync"

	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/driver"
)

// loadCache keeps the last few packages loaded with their dependencies, so
// that the next analysis of the same package, after edits to that package's
// files only, re-parses and re-type-checks the package alone against the
// dependencies already in memory instead of loading the whole import graph
// from source again. This is how the gopls design keeps per-keystroke work
// proportional to the edited package (common practice in Go editors).
//
// An entry is valid while the open buffers outside its package are
// unchanged and none of the files and directories it was loaded from that
// can change (the module's go.mod and go.sum, the directories and Go files
// of its packages outside GOROOT and the module cache) has a new size or
// modification time; anything else (a new import, a package clause edit,
// cgo) falls back to a full load.
type loadCache struct {
	mu      sync.Mutex
	entries []*loadEntry // most recent first
}

type loadEntry struct {
	pkg    *packages.Package
	key    [sha256.Size]byte
	stamps map[string]stamp // files and directories the load read
	uses   int              // re-checks served
	facts  *factMemo        // analyzer outcomes on the dependencies
}

// maxUses bounds the re-checks one entry serves: each adds the re-parsed
// files' line tables to the shared token.FileSet, which only a fresh load
// starts anew.
const maxUses = 1000

// stamp is what a load saw of a file (its size and modification time)
// or of a directory (the names of its Go files: editors that save through a
// backup file touch the directory itself on every save).
type stamp string

func stampOf(path string) stamp {
	fi, err := os.Stat(path)
	switch {
	case err != nil:
		return "absent"
	case !fi.IsDir():
		return stamp(fmt.Sprintf("%d %d", fi.Size(), fi.ModTime().UnixNano()))
	}
	entries, err := os.ReadDir(path)
	if err != nil {
		return "unreadable"
	}
	var names []string
	for _, e := range entries {
		if isGoFile(e.Name()) {
			names = append(names, e.Name())
		}
	}
	return stamp(strings.Join(names, "/"))
}

// mutableInputs lists the files and directories of pkg's load that can
// change while the editor runs: those of the packages of modules that
// are not in the module cache (whose directories carry an "@version"), and
// of the standard library none, as GOROOT is read-only in practice.
func mutableInputs(pkg *packages.Package) map[string]stamp {
	stamps := make(map[string]stamp)
	seen := make(map[*packages.Package]bool)
	var visit func(p *packages.Package)
	visit = func(p *packages.Package) {
		if seen[p] {
			return
		}
		seen[p] = true
		if m := p.Module; m != nil && !strings.Contains(m.Dir, "@") {
			if m.GoMod != "" {
				stamps[m.GoMod] = stampOf(m.GoMod)
				sum := strings.TrimSuffix(m.GoMod, ".mod") + ".sum"
				stamps[sum] = stampOf(sum)
			}
			for _, f := range p.CompiledGoFiles {
				stamps[f] = stampOf(f)
				stamps[filepath.Dir(f)] = stampOf(filepath.Dir(f))
			}
		}
		for _, imp := range p.Imports {
			visit(imp)
		}
	}
	visit(pkg)
	return stamps
}

// unchanged reports whether every input of e looks as when it was loaded.
// Open files do not count: their text comes from the overlay, which the
// entry's key covers, so saving a buffer keeps the entry.
func (e *loadEntry) unchanged(overlay map[string][]byte) bool {
	for path, st := range e.stamps {
		if _, open := overlay[path]; !open && stampOf(path) != st {
			return false
		}
	}
	return true
}

// maxCached bounds the memory held: each entry keeps a dependency graph.
const maxCached = 3

// errStale reports that a cached package cannot serve the current buffers.
var errStale = errors.New("cached package is stale")

// lookup returns the entry of the cached package holding path if it is
// still valid for overlay, and counts the use, or returns nil.
func (c *loadCache) lookup(path string, overlay map[string][]byte) *loadEntry {
	c.mu.Lock()
	defer c.mu.Unlock()
	for _, e := range c.entries {
		if slices.Contains(e.pkg.CompiledGoFiles, path) && e.key == outsideKey(e.pkg, overlay) && e.unchanged(overlay) && e.uses < maxUses {
			e.uses++
			return e
		}
	}
	return nil
}

// add records a freshly loaded package and returns its entry, unless it
// uses cgo, whose compiled files are generated and cannot be re-parsed from
// the overlay; then it returns nil.
func (c *loadCache) add(pkg *packages.Package, overlay map[string][]byte) *loadEntry {
	if !slices.Equal(pkg.GoFiles, pkg.CompiledGoFiles) || pkg.Types == nil {
		return nil
	}
	c.mu.Lock()
	defer c.mu.Unlock()
	c.entries = slices.DeleteFunc(c.entries, func(e *loadEntry) bool { return e.pkg.ID == pkg.ID })
	e := &loadEntry{pkg: pkg, key: outsideKey(pkg, overlay), stamps: mutableInputs(pkg), facts: newFactMemo()}
	c.entries = append([]*loadEntry{e}, c.entries...)
	if len(c.entries) > maxCached {
		clear(c.entries[maxCached:]) // the backing array would keep the evicted graph
		c.entries = c.entries[:maxCached]
	}
	return e
}

// forget drops the entries of packages none of whose files is open, with
// their dependency graphs and memos, and reports whether it dropped any:
// a package the editor has closed is not worth the memory it pins.
func (c *loadCache) forget(open func(path string) bool) bool {
	c.mu.Lock()
	defer c.mu.Unlock()
	n := len(c.entries)
	c.entries = slices.DeleteFunc(c.entries, func(e *loadEntry) bool { // zeroes the tail
		return !slices.ContainsFunc(e.pkg.CompiledGoFiles, open)
	})
	return len(c.entries) < n
}

// outsideKey fingerprints the overlay as it matters to pkg's dependencies:
// the set of open files, and the contents of those outside pkg.
func outsideKey(pkg *packages.Package, overlay map[string][]byte) [sha256.Size]byte {
	paths := make([]string, 0, len(overlay))
	for p := range overlay {
		paths = append(paths, p)
	}
	sort.Strings(paths)
	h := sha256.New()
	for _, p := range paths {
		fmt.Fprintf(h, "%s\x00", p)
		if !slices.Contains(pkg.CompiledGoFiles, p) {
			fmt.Fprintf(h, "%d\x00", len(overlay[p]))
			h.Write(overlay[p])
		}
	}
	var key [sha256.Size]byte
	h.Sum(key[:0])
	return key
}

// recheck returns a copy of the cached package pkg re-parsed from the
// overlay (or disk) and re-type-checked against pkg's loaded imports, with
// the same types.Config settings go/packages uses.
func recheck(pkg *packages.Package, overlay map[string][]byte) (*packages.Package, error) {
	var errs []packages.Error
	files := make([]*ast.File, 0, len(pkg.CompiledGoFiles))
	for _, name := range pkg.CompiledGoFiles {
		src, ok := overlay[name]
		if !ok {
			var err error
			if src, err = os.ReadFile(name); err != nil {
				return nil, errStale
			}
		}
		f, err := parser.ParseFile(pkg.Fset, name, src, parser.AllErrors|parser.ParseComments)
		if f == nil {
			return nil, errStale
		}
		errs = append(errs, parseErrors(err)...)
		if !importsKnown(pkg, f) || f.Name.Name != pkg.Name || constraints(f) != constraints(cachedSyntax(pkg, name)) {
			return nil, errStale
		}
		files = append(files, f)
	}
	info := driver.NewTypesInfo(files...)
	var typeErrors []types.Error
	tc := &types.Config{
		Importer: importerFunc(func(path string) (*types.Package, error) {
			if path == "unsafe" {
				return types.Unsafe, nil
			}
			return pkg.Imports[path].Types, nil // importsKnown checked it
		}),
		Error: func(err error) {
			if te, ok := err.(types.Error); ok {
				typeErrors = append(typeErrors, te)
				errs = append(errs, packages.Error{Pos: te.Fset.Position(te.Pos).String(), Msg: te.Msg, Kind: packages.TypeError})
			}
		},
		Sizes: pkg.TypesSizes,
	}
	if pkg.Module != nil && pkg.Module.GoVersion != "" {
		tc.GoVersion = "go" + pkg.Module.GoVersion
	}
	tpkg := types.NewPackage(pkg.PkgPath, pkg.Name)
	if err := types.NewChecker(tc, pkg.Fset, tpkg, info).Files(files); err != nil && len(errs) == 0 {
		errs = append(errs, packages.Error{Msg: err.Error(), Kind: packages.TypeError})
	}
	np := *pkg
	np.Syntax, np.Types, np.TypesInfo = files, tpkg, info
	np.TypeErrors, np.Errors = typeErrors, errs
	np.IllTyped = len(errs) > 0
	for _, imp := range pkg.Imports {
		np.IllTyped = np.IllTyped || imp.IllTyped
	}
	return &np, nil
}

// constraints returns the build constraint lines of f: editing them may
// move the file in or out of the package, which only go list decides.
func constraints(f *ast.File) string {
	if f == nil {
		return ""
	}
	var lines []string
	for _, g := range f.Comments {
		if g.Pos() > f.Package {
			break
		}
		for _, c := range g.List {
			if strings.HasPrefix(c.Text, "//go:build") || strings.HasPrefix(c.Text, "// +build") {
				lines = append(lines, c.Text)
			}
		}
	}
	return strings.Join(lines, "\n")
}

// cachedSyntax returns the syntax tree pkg was loaded with for file name.
func cachedSyntax(pkg *packages.Package, name string) *ast.File {
	for _, f := range pkg.Syntax {
		if tf := pkg.Fset.File(f.FileStart); tf != nil && tf.Name() == name {
			return f
		}
	}
	return nil
}

// importsKnown reports whether every import of f is among pkg's loaded
// imports; a new import needs go list, hence a full load.
func importsKnown(pkg *packages.Package, f *ast.File) bool {
	for _, spec := range f.Imports {
		path, err := strconv.Unquote(spec.Path.Value)
		if err != nil || path == "C" {
			return false
		}
		if imp := pkg.Imports[path]; path != "unsafe" && (imp == nil || imp.Types == nil) {
			return false
		}
	}
	return true
}

// parseErrors converts a parser error into package errors.
func parseErrors(err error) []packages.Error {
	if err == nil {
		return nil
	}
	var list scanner.ErrorList
	if !errors.As(err, &list) {
		return []packages.Error{{Msg: err.Error(), Kind: packages.ParseError}}
	}
	out := make([]packages.Error, 0, len(list))
	for _, e := range list {
		out = append(out, packages.Error{Pos: e.Pos.String(), Msg: e.Msg, Kind: packages.ParseError})
	}
	return out
}

type importerFunc func(path string) (*types.Package, error)

func (f importerFunc) Import(path string) (*types.Package, error) { return f(path) }
