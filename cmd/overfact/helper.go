package main

import (
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"os/exec"
	"path/filepath"
	"strings"

	"golang.org/x/mod/modfile"
)

// defaultHelperDir is where "overfact helper" puts the copy, relative to
// the module root: third_party is the usual home of copied code (common
// practice).
const defaultHelperDir = "third_party/lgamma"

// runHelper implements "overfact helper [-from DIR] [DEST]": for a module
// whose builds cannot fetch modules, it copies the helper module into
// DEST inside the module of the current directory and points go.mod at
// the copy with a requirement and a relative replace, so that fixed code
// builds from the repository alone.
func runHelper(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("overfact helper", flag.ContinueOnError)
	from := fs.String("from", "", "copy the helper from `dir` (fixes/lgamma of an overfact checkout) instead of fetching it")
	fs.Usage = func() {
		fmt.Fprintf(fs.Output(), "Usage: overfact helper [-from DIR] [DEST]\n\n"+
			"Copies the helper module that fixed code imports into DEST (default %s)\n"+
			"inside the current module, and adds to its go.mod a requirement and a\n"+
			"replace directive pointing at the copy. Without -from, the helper comes\n"+
			"from the module cache or the module proxy, at the version matching\n"+
			"this overfact.\n\nFlags:\n", defaultHelperDir)
		fs.PrintDefaults()
	}
	rest, code, ok := parseFlags(fs, args, stderr)
	if !ok {
		return code
	}
	if len(rest) > 1 {
		fmt.Fprintf(stderr, "overfact helper: want at most one destination, got %q\n", rest)
		return 2
	}
	dest := defaultHelperDir
	if len(rest) == 1 {
		dest = rest[0]
	}
	if err := copyHelper(dest, *from, stdout); err != nil {
		fmt.Fprintf(stderr, "overfact helper: %v\n", err)
		return 1
	}
	return 0
}

func copyHelper(dest, from string, stdout io.Writer) error {
	h := helperModule()
	gomod, err := goOutput(".", nil, "env", "GOMOD")
	if err != nil {
		return err
	}
	if gomod == "" || gomod == os.DevNull {
		return errors.New("the current directory is in no module; run it inside the module whose code overfact fixes")
	}
	modDir := filepath.Dir(gomod)
	target, err := filepath.Abs(dest)
	if err != nil {
		return err
	}
	rel, err := filepath.Rel(modDir, target)
	if err != nil || rel == "." || rel == ".." || strings.HasPrefix(rel, ".."+string(filepath.Separator)) {
		return fmt.Errorf("%s is not a directory inside the module at %s", dest, modDir)
	}
	if _, err := os.Stat(target); err == nil {
		return fmt.Errorf("%s already exists; remove it to replace the copy", dest)
	}
	if from == "" {
		if from, err = downloadHelper(h.Path + "@" + h.Version); err != nil {
			return fmt.Errorf("%v\nfetch it on a machine that can, or copy it from a checkout of overfact with -from path/to/overfact/fixes/lgamma", err)
		}
	}
	if err := checkModulePath(filepath.Join(from, "go.mod"), h.Path); err != nil {
		return err
	}
	if err := copyModule(from, target); err != nil {
		return err
	}
	local := "./" + filepath.ToSlash(rel)
	if _, err := goOutput(modDir, nil, "mod", "edit", "-require="+h.Path+"@"+h.Version, "-replace="+h.Path+"="+local); err != nil {
		return err
	}
	fmt.Fprintf(stdout, "copied %s into %s; go.mod now has\n\trequire %s %s\n\treplace %s => %s\n"+
		"Commit the copy. If the module vendors its dependencies, run go mod vendor.\n",
		h.Path, local, h.Path, h.Version, h.Path, local)
	return nil
}

// downloadHelper returns the directory of a module version in the
// module cache, fetching it through GOPROXY if it is not there yet. It
// runs outside any module, so that no go.mod or go.sum is touched.
func downloadHelper(modVersion string) (string, error) {
	out, err := goOutput(os.TempDir(), []string{"GOWORK=off"}, "mod", "download", "-json", modVersion)
	var m struct{ Dir, Error string }
	if jerr := json.Unmarshal([]byte(out), &m); jerr == nil && m.Error != "" {
		return "", errors.New(m.Error)
	}
	if err != nil {
		return "", err
	}
	if m.Dir == "" {
		return "", fmt.Errorf("go mod download %s gave no directory", modVersion)
	}
	return m.Dir, nil
}

// checkModulePath makes sure that gomod declares the module path.
func checkModulePath(gomod, path string) error {
	data, err := os.ReadFile(gomod)
	if err != nil {
		return err
	}
	if got := modfile.ModulePath(data); got != path {
		return fmt.Errorf("%s declares module %q, not %s", gomod, got, path)
	}
	return nil
}

// goOutput runs the go command in dir with env added to the environment
// and returns its standard output, trimmed; an error carries its
// standard error.
func goOutput(dir string, env []string, args ...string) (string, error) {
	cmd := exec.Command("go", args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), env...)
	var stderr strings.Builder
	cmd.Stderr = &stderr
	out, err := cmd.Output()
	if err != nil {
		return strings.TrimSpace(string(out)), fmt.Errorf("go %s: %v\n%s", strings.Join(args, " "), err, strings.TrimSpace(stderr.String()))
	}
	return strings.TrimSpace(string(out)), nil
}

// copyModule copies the files of the module at src to dst, leaving out
// version control data and nested modules, which are not part of it.
// Files come out writable even when src is the read-only module cache.
func copyModule(src, dst string) error {
	return filepath.WalkDir(src, func(path string, d os.DirEntry, err error) error {
		if err != nil {
			return err
		}
		rel, _ := filepath.Rel(src, path)
		if d.Name() == ".git" {
			if d.IsDir() {
				return filepath.SkipDir
			}
			return nil
		}
		if d.IsDir() {
			if _, err := os.Stat(filepath.Join(path, "go.mod")); err == nil && rel != "." {
				return filepath.SkipDir
			}
			return os.MkdirAll(filepath.Join(dst, rel), 0o755)
		}
		if !d.Type().IsRegular() {
			return nil
		}
		data, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		return os.WriteFile(filepath.Join(dst, rel), data, 0o644)
	})
}
