package analyzer

import (
	"go/ast"
	"go/build"
	"go/version"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"sync"
)

// Go-version detection: the language version a file is compiled at,
// which decides the semantics of its loop variables.

// goVersionOf returns the Go language version of the file holding n, or
// "" when nothing states it. The type checker records the file's version
// (a //go:build line, else the module's go line). A standard-library
// package has neither, and go/packages states no version for it, but the
// go command always compiles std at the language version of its own
// toolchain (cmd/go passes -lang only for packages in a module), so that
// version is the right one there.
func (c *checker) goVersionOf(n ast.Node) string {
	fi := c.fileOf(n.Pos())
	if fi == nil {
		return ""
	}
	if v := c.pass.TypesInfo.FileVersions[fi.file]; v != "" {
		return v
	}
	if v := c.pass.Pkg.GoVersion(); v != "" {
		return v
	}
	if c.inStd(c.pass.Fset.Position(fi.file.Pos()).Filename) {
		return stdVersion()
	}
	return ""
}

// inStd reports whether the package of this pass is part of the standard
// library: it belongs to no module (drivers give an empty Module rather
// than none: go/analysis/checker does), its import path has no dot in its
// first element, and its files are under $GOROOT/src. The last test keeps
// a GOPATH-mode package (such as an analysistest one) out.
func (c *checker) inStd(filename string) bool {
	if c.pass.Module != nil && c.pass.Module.Path != "" || filename == "" {
		return false
	}
	first, _, _ := strings.Cut(c.pass.Pkg.Path(), "/")
	if strings.Contains(first, ".") {
		return false
	}
	dir := filepath.Dir(filename)
	if in, ok := stdDirs.Load(dir); ok {
		return in.(bool)
	}
	src := goroot().src
	rel, err := filepath.Rel(src, resolved(dir))
	in := src != "" && err == nil && filepath.IsLocal(rel)
	stdDirs.Store(dir, in)
	return in
}

// stdDirs caches inStd's answer per directory: resolving symbolic links
// costs system calls, and one package asks for each of its loops.
var stdDirs sync.Map

// gorootInfo is what the standard library's location and version are
// worked out to, once per process.
type gorootInfo struct {
	src     string // $GOROOT/src with symbolic links resolved
	version string // language version of the toolchain, such as go1.26
}

var goroot = sync.OnceValue(func() gorootInfo {
	var g gorootInfo
	if build.Default.GOROOT != "" {
		g.src = resolved(filepath.Join(build.Default.GOROOT, "src"))
		// $GOROOT/VERSION names the release whose std is loaded; a
		// development tree has none, and the running binary's version
		// stands in for it.
		if b, err := os.ReadFile(filepath.Join(build.Default.GOROOT, "VERSION")); err == nil {
			line, _, _ := strings.Cut(string(b), "\n")
			g.version = version.Lang(strings.TrimSpace(line))
		}
	}
	if g.version == "" {
		g.version = version.Lang(runtime.Version())
	}
	// A development toolchain reports "devel go1.27-…".
	for _, f := range strings.Fields(runtime.Version()) {
		if v, _, _ := strings.Cut(f, "-"); g.version == "" && version.IsValid(v) {
			g.version = version.Lang(v)
		}
	}
	return g
})

func stdVersion() string { return goroot().version }

func resolved(dir string) string {
	if r, err := filepath.EvalSymlinks(dir); err == nil {
		return r
	}
	return dir
}
