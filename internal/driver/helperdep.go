package driver

import (
	"bytes"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strings"

	"golang.org/x/mod/modfile"
	"golang.org/x/mod/semver"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"
)

// A Helper is a module that suggested fixes import: fixed code builds
// only where it resolves.
type Helper struct {
	Path    string // module path, which is also the package path fixes import
	Version string // the version matching this build of the tool
}

// ensureHelper makes sure that every module whose files the fixes of
// roots would make import the helper can resolve it, before anything is
// written. Where the module does not require the helper, or requires an
// older version than the tool's, it runs go get in the module, as the
// user would. Where that cannot work (vendoring, GOFLAGS=-mod=readonly
// or -mod=vendor, or go get fails, as it does with GOPROXY=off and an
// empty module cache), it reports the command to run and returns false:
// the caller then writes nothing. With Diff, nothing is ever written, so
// a missing helper is only pointed out.
func (r *run) ensureHelper(roots []*checker.Action) bool {
	h := r.opts.Helper
	if h.Path == "" {
		return true
	}
	ok := true
	for _, mod := range modulesImporting(roots, h.Path) {
		if !r.moduleHasHelper(mod, h) {
			ok = false
		}
	}
	return ok
}

// modulesImporting returns the modules, sorted by directory, of the root
// packages where the first fix of some finding inserts an import of path.
func modulesImporting(roots []*checker.Action, path string) []*packages.Module {
	quoted := []byte(`"` + path + `"`)
	seen := make(map[string]*packages.Module)
	for _, act := range roots {
		mod := act.Package.Module
		if act.Err != nil || mod == nil || mod.Dir == "" || seen[mod.Dir] != nil {
			continue
		}
	diags:
		for _, d := range act.Diagnostics {
			if len(d.SuggestedFixes) == 0 {
				continue
			}
			for _, te := range d.SuggestedFixes[0].TextEdits {
				if bytes.Contains(te.NewText, quoted) {
					seen[mod.Dir] = mod
					break diags
				}
			}
		}
	}
	mods := make([]*packages.Module, 0, len(seen))
	for _, m := range seen {
		mods = append(mods, m)
	}
	sort.Slice(mods, func(i, j int) bool { return mods[i].Dir < mods[j].Dir })
	return mods
}

// moduleHasHelper checks one module and adds the requirement if it can.
func (r *run) moduleHasHelper(mod *packages.Module, h Helper) bool {
	gflags := goEnv(mod.Dir, "GOFLAGS")
	vendor := strings.Contains(gflags, "-mod=vendor") ||
		(fileExists(filepath.Join(mod.Dir, "vendor", "modules.txt")) && !strings.Contains(gflags, "-mod="))
	version, found := helperVersion(mod.Dir, h.Path, vendor)
	if found && (version == "" || !semver.IsValid(h.Version) || semver.Compare(version, h.Version) >= 0) {
		return true
	}
	get := fmt.Sprintf("go get %s@%s", h.Path, h.Version)
	dir := relPath(r.dir, mod.Dir)
	where, runIn := fmt.Sprintf("module %s (%s)", mod.Path, dir), "Run in "+dir+":"
	if dir == "." {
		where, runIn = "module "+mod.Path, "Run:"
	}
	what := fmt.Sprintf("the fixes import %s, which %s does not provide", h.Path, where)
	if found {
		what = fmt.Sprintf("the fixes need %s %s, and %s has %s", h.Path, h.Version, where, version)
	}
	switch {
	case r.opts.Diff:
		fmt.Fprintf(r.opts.Stderr, "overfact: %s; before applying the diff, %s\n\t%s\n", what, strings.ToLower(runIn[:1])+runIn[1:], get)
		return true
	case vendor:
		r.errorf("%s through its vendor directory; nothing was written. %s\n\t%s && go mod vendor\nthen run overfact -fix again", what, runIn, get)
		return false
	case strings.Contains(gflags, "-mod=readonly"):
		r.errorf("%s, and GOFLAGS=-mod=readonly forbids changing its go.mod; nothing was written. %s\n\t%s\nthen run overfact -fix again", what, runIn, get)
		return false
	}
	cmd := exec.Command("go", "get", h.Path+"@"+h.Version)
	cmd.Dir = mod.Dir
	if out, err := cmd.CombinedOutput(); err != nil {
		r.errorf("%s, and %s failed (%v):\n%s\nNothing was written. Make the module available and %s\n\t%s\nthen run overfact -fix again (or keep a copy of the helper in the module: overfact helper)",
			what, get, err, indent(out), strings.ToLower(runIn[:1])+runIn[1:], get)
		return false
	}
	if err := markDirect(mod.GoMod, h.Path); err != nil {
		r.errorf("%v", err)
		return false
	}
	fmt.Fprintf(r.opts.Stderr, "overfact: added %s %s to %s, which the fixes import\n", h.Path, h.Version, relPath(r.dir, mod.GoMod))
	return true
}

// helperVersion asks the go command, in the module at dir, which version
// of the helper module provides its package. It reports whether the
// package resolves at all, and the version ("" when replaced by a
// directory). It never changes go.mod: outside vendor mode it passes
// -mod=readonly, which overrides a GOFLAGS=-mod=mod that would make go
// list add a missing requirement itself.
func helperVersion(dir, path string, vendor bool) (version string, found bool) {
	args := []string{"list", "-find", "-f", "{{with .Module}}{{if .Replace}}{{.Replace.Version}}{{else}}{{.Version}}{{end}}{{end}}"}
	if !vendor {
		args = append(args, "-mod=readonly")
	}
	cmd := exec.Command("go", append(args, path)...)
	cmd.Dir = dir
	out, err := cmd.Output()
	if err != nil {
		return "", false
	}
	return strings.TrimSpace(string(out)), true
}

// markDirect removes the "// indirect" that go get leaves on a
// requirement no package of the module imports yet: the fixed files are
// about to import it.
func markDirect(gomod, path string) error {
	data, err := os.ReadFile(gomod)
	if err != nil {
		return err
	}
	f, err := modfile.Parse(gomod, data, nil)
	if err != nil {
		return err
	}
	for _, req := range f.Require {
		if req.Mod.Path == path && req.Indirect {
			version := req.Mod.Version
			if err := f.DropRequire(path); err != nil {
				return err
			}
			f.AddNewRequire(path, version, false)
			f.Cleanup()
			out, err := f.Format()
			if err != nil {
				return err
			}
			return writeFile(gomod, out)
		}
	}
	return nil
}

// goEnv returns one go environment variable as the go command sees it
// in dir (including the user's go env -w settings).
func goEnv(dir, name string) string {
	cmd := exec.Command("go", "env", name)
	cmd.Dir = dir
	out, err := cmd.Output()
	if err != nil {
		return os.Getenv(name)
	}
	return strings.TrimSpace(string(out))
}

func fileExists(name string) bool {
	_, err := os.Stat(name)
	return err == nil
}

// indent prefixes every line of out with a tab.
func indent(out []byte) string {
	lines := strings.Split(strings.TrimRight(string(out), "\n"), "\n")
	return "\t" + strings.Join(lines, "\n\t")
}
