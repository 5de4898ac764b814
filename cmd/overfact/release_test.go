package main

import (
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"sync"
	"testing"

	"golang.org/x/mod/modfile"
	"golang.org/x/mod/module"

	"github.com/overfact/overfact/internal/modproxy"
)

// releaseVersion is the version the release tests publish both modules
// at: a pre-release no real tag uses, so that nothing in a module cache
// can be mistaken for it.
const releaseVersion = "v0.9.0-releasetest"

const (
	rootPath   = "github.com/overfact/overfact"
	helperPath = rootPath + "/fixes/lgamma"
)

// A release is the working tree published as releaseVersion into a
// file-based module proxy, as docs/release.md publishes a tag, and the
// command installed from that proxy with go install …@version into a
// fresh GOPATH, as a user installs it.
type release struct {
	dir   string // scratch directory of the whole release
	proxy modproxy.Proxy
	bin   string // the installed command
}

var (
	releaseOnce sync.Once
	theRelease  *release
	releaseErr  error
	releaseDir  string // removed by TestMain, whether publish succeeded or not
)

// published returns the release, building it on first use. It is shared
// by the tests that need it, since installing the command from the proxy
// compiles it and x/tools from scratch module paths.
func published(t *testing.T) *release {
	t.Helper()
	if testing.Short() {
		t.Skip("publishes the module into a file proxy and installs the command from it")
	}
	releaseOnce.Do(func() { theRelease, releaseErr = publish() })
	if releaseErr != nil {
		t.Fatal(releaseErr)
	}
	return theRelease
}

// env is the environment of a go command that sees only the release's
// proxy, with a module cache of its own under gopath and no checksum
// database (the test modules are on no public database).
func (r *release) env(gopath string, extra ...string) []string {
	return append([]string{
		"GOPATH=" + gopath,
		"GOMODCACHE=" + filepath.Join(gopath, "pkg", "mod"),
		"GOBIN=" + filepath.Join(gopath, "bin"),
		"GOPROXY=" + r.proxy.URL(),
		"GOSUMDB=off",
		"GONOSUMDB=github.com/overfact",
		"GOFLAGS=-mod=mod -modcacherw", // -modcacherw: the scratch cache can be removed
		"GOWORK=off",
		"GOTOOLCHAIN=local",
	}, extra...)
}

// goCmd runs the go command in dir with env added to the environment.
func goCmd(dir string, env []string, args ...string) (string, error) {
	cmd := exec.Command("go", args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), env...)
	out, err := cmd.CombinedOutput()
	if err != nil {
		return string(out), fmt.Errorf("go %s in %s: %v\n%s", strings.Join(args, " "), dir, err, out)
	}
	return string(out), nil
}

// publish plays docs/release.md on a copy of the working tree: it tags
// (publishes) the helper module, makes the root module require that
// version with go get, publishes the root module, and installs the
// command from the proxy.
func publish() (*release, error) {
	root, err := filepath.Abs(filepath.Join("..", ".."))
	if err != nil {
		return nil, err
	}
	dir, err := os.MkdirTemp("", "overfact-release")
	if err != nil {
		return nil, err
	}
	releaseDir = dir
	r := &release{dir: dir, proxy: modproxy.Proxy{Dir: filepath.Join(dir, "proxy")}}
	if err := r.proxy.PublishDir(helperPath, releaseVersion, filepath.Join(root, "fixes", "lgamma")); err != nil {
		return nil, err
	}
	if err := r.copyDependencies(root); err != nil {
		return nil, err
	}
	src := filepath.Join(dir, "src")
	if err := copyModule(root, src); err != nil {
		return nil, err
	}
	for _, args := range [][]string{
		{"mod", "edit", "-require=" + helperPath + "@" + releaseVersion},
		{"get", helperPath + "@" + releaseVersion},
	} {
		if _, err := goCmd(src, r.env(filepath.Join(dir, "release-gopath")), args...); err != nil {
			return nil, err
		}
	}
	if err := r.proxy.PublishDir(rootPath, releaseVersion, src); err != nil {
		return nil, err
	}
	user := filepath.Join(dir, "user-gopath")
	if _, err := goCmd(dir, r.env(user), "install", rootPath+"/cmd/overfact@"+releaseVersion); err != nil {
		return nil, err
	}
	r.bin = filepath.Join(user, "bin", "overfact")
	return r, nil
}

// copyDependencies serves the root module's requirements from the local
// module cache, where building the working tree has put them.
func (r *release) copyDependencies(root string) error {
	data, err := os.ReadFile(filepath.Join(root, "go.mod"))
	if err != nil {
		return err
	}
	f, err := modfile.Parse("go.mod", data, nil)
	if err != nil {
		return err
	}
	if len(f.Replace) > 0 {
		return fmt.Errorf("go.mod has a replace directive; go install …@version refuses such a module")
	}
	var mods []module.Version
	for _, req := range f.Require {
		if req.Mod.Path != helperPath {
			mods = append(mods, req.Mod)
		}
	}
	cache, err := goCmd(root, nil, "env", "GOMODCACHE")
	if err != nil {
		return err
	}
	return r.proxy.CopyFromCache(filepath.Join(strings.TrimSpace(cache), "cache", "download"), mods)
}

// TestReleaseInstall checks the two promises of the install section:
// go install …/cmd/overfact@version works from a fresh GOPATH (the root
// go.mod has no replace directive, which go install refuses), and a user
// module gets the helper with go get …/fixes/lgamma@version.
func TestReleaseInstall(t *testing.T) {
	r := published(t)
	out, err := exec.Command(r.bin, "version").Output()
	if err != nil || !strings.HasPrefix(string(out), "overfact "+releaseVersion+" ") {
		t.Errorf("installed overfact version: %v, %q; want it to name %s", err, out, releaseVersion)
	}

	user := writeModule(t, map[string]string{
		"go.mod": "module example.com/bottling\n\ngo 1.21\n",
		"odds/odds.go": "// Package odds prices the acceptance plan.\npackage odds\n\n" +
			"import \"" + helperPath + "\"\n\n" +
			"// Plans is the number of ways to sample k of n crates.\nfunc Plans(n, k int64) int64 { return lgamma.MustChooseInt64(n, k) }\n",
	})
	env := r.env(t.TempDir())
	if _, err := goCmd(user, env, "get", helperPath+"@"+releaseVersion); err != nil {
		t.Fatal(err)
	}
	gomod, err := os.ReadFile(filepath.Join(user, "go.mod"))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(gomod), helperPath+" "+releaseVersion) {
		t.Errorf("go.mod after go get does not require %s %s:\n%s", helperPath, releaseVersion, gomod)
	}
	if _, err := goCmd(user, env, "build", "./..."); err != nil {
		t.Error(err)
	}
}

// TestWorkSumComplete checks that the committed go.work.sum holds every
// checksum the workspace's module graph needs, so that no go command run
// in a fresh clone (the quick start, the test suite) rewrites it: go list
// -m all loads the whole graph, and must leave the file as it is. It runs
// on copies of the workspace's module files and skips when the module
// proxy cannot be reached and the module cache lacks a go.mod file.
func TestWorkSumComplete(t *testing.T) {
	root := repoRoot(t)
	dir := t.TempDir()
	for _, name := range []string{"go.work", "go.work.sum", "go.mod", "go.sum", filepath.Join("fixes", "lgamma", "go.mod")} {
		data, err := os.ReadFile(filepath.Join(root, name))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.MkdirAll(filepath.Dir(filepath.Join(dir, name)), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, name), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if out, err := goCmd(dir, []string{"GOWORK=" + filepath.Join(dir, "go.work"), "GOFLAGS="}, "list", "-m", "all"); err != nil {
		if strings.Contains(out, "lookup disabled") || strings.Contains(out, "dial tcp") {
			t.Skipf("the module graph cannot be loaded offline: %v", err)
		}
		t.Fatal(err)
	}
	before, _ := os.ReadFile(filepath.Join(root, "go.work.sum"))
	after, _ := os.ReadFile(filepath.Join(dir, "go.work.sum"))
	if string(before) != string(after) {
		t.Errorf("go list -m all rewrote go.work.sum; commit this one:\n%s", after)
	}
}
