package fuzz

import (
	"fmt"
	"go/ast"
	"go/build"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"sync"

	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/driver"
)

// Checker parses and type-checks in-memory packages. All of them share one
// file set and one importer, so the standard library and the helper module
// are type-checked from source once per process.
type Checker struct {
	Fset *token.FileSet

	mu        sync.Mutex
	std       types.ImporterFrom
	helperDir string
	cache     map[string]*types.Package
	helper    *types.Package
	helperErr error
}

// NewChecker returns a Checker that finds the helper module's source in
// helperDir.
func NewChecker(helperDir string) *Checker {
	fset := token.NewFileSet()
	return &Checker{Fset: fset, std: importer.ForCompiler(fset, "source", nil).(types.ImporterFrom), helperDir: helperDir, cache: map[string]*types.Package{}}
}

// Import implements types.Importer: the standard library from source, and
// the helper module type-checked from its directory.
func (c *Checker) Import(path string) (*types.Package, error) {
	if path == fixes.HelperPath {
		return c.importHelper()
	}
	if !isStd(path) {
		return nil, fmt.Errorf("fuzz packages may import only the standard library and %s, not %q", fixes.HelperPath, path)
	}
	// The source importer caches packages but still reads the package
	// directory through go/build on every call, which would dominate an
	// execution; hence a cache in front of it.
	if p, ok := c.cache[path]; ok {
		return p, nil
	}
	p, err := c.std.ImportFrom(path, "", 0)
	if err == nil {
		c.cache[path] = p
	}
	return p, err
}

// isStd reports whether path names a standard-library package: the go
// command's rule is that their first element has no dot.
func isStd(path string) bool {
	first, _, _ := strings.Cut(path, "/")
	return !strings.Contains(first, ".")
}

func (c *Checker) importHelper() (*types.Package, error) {
	if c.helper != nil || c.helperErr != nil {
		return c.helper, c.helperErr
	}
	// go/build applies the build constraints (the module keeps
	// generators behind "ignore").
	bp, err := build.Default.ImportDir(c.helperDir, 0)
	if err != nil {
		return nil, err
	}
	var files []*ast.File
	for _, base := range bp.GoFiles {
		name := filepath.Join(c.helperDir, base)
		src, err := os.ReadFile(name)
		if err != nil {
			return nil, err
		}
		f, err := parser.ParseFile(c.Fset, name, src, parser.ParseComments)
		if err != nil {
			return nil, err
		}
		files = append(files, f)
	}
	conf := types.Config{Importer: c, GoVersion: "go1.21"}
	c.helper, c.helperErr = conf.Check(fixes.HelperPath, c.Fset, files, nil)
	return c.helper, c.helperErr
}

// Parse parses the named sources of one package.
func (c *Checker) Parse(src map[string][]byte) ([]*ast.File, error) {
	names := make([]string, 0, len(src))
	for name := range src {
		names = append(names, name)
	}
	sort.Strings(names)
	files := make([]*ast.File, 0, len(names))
	for _, name := range names {
		f, err := parser.ParseFile(c.Fset, name, src[name], parser.ParseComments|parser.SkipObjectResolution)
		if err != nil {
			return nil, err
		}
		files = append(files, f)
	}
	return files, nil
}

// Check parses and type-checks src as one package and reports the first
// error, of either kind.
func (c *Checker) Check(path string, src map[string][]byte) (*Package, error) {
	c.mu.Lock()
	defer c.mu.Unlock()
	files, err := c.Parse(src)
	if err != nil {
		return nil, err
	}
	if len(files) == 0 {
		return nil, fmt.Errorf("no files")
	}
	info := driver.NewTypesInfo()
	conf := types.Config{Importer: c, GoVersion: "go1.26", Sizes: types.SizesFor("gc", "amd64")}
	pkg, err := conf.Check(path, c.Fset, files, info)
	if err != nil {
		return nil, err
	}
	return &Package{Fset: c.Fset, Files: files, Src: src, Types: pkg, Info: info}, nil
}
