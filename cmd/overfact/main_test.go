package main

import (
	"bytes"
	"errors"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
)

// overfactBin is the command under test, built once for the test binary.
var overfactBin string

func TestMain(m *testing.M) {
	os.Exit(buildAndRun(m))
}

func buildAndRun(m *testing.M) int {
	dir, err := os.MkdirTemp("", "overfact-cmd-test")
	if err != nil {
		fmt.Fprintln(os.Stderr, err)
		return 1
	}
	defer os.RemoveAll(dir)
	overfactBin = filepath.Join(dir, "overfact")
	if runtime.GOOS == "windows" {
		overfactBin += ".exe"
	}
	build := exec.Command("go", "build", "-o", overfactBin, ".")
	if out, err := build.CombinedOutput(); err != nil {
		fmt.Fprintf(os.Stderr, "building overfact: %v\n%s", err, out)
		return 1
	}
	code := m.Run()
	if releaseDir != "" {
		os.RemoveAll(releaseDir) // the module caches in it were made with -modcacherw
	}
	return code
}

// result is what one run of the command produced.
type result struct {
	stdout, stderr string
	code           int
}

// runIn runs the command in dir with args; env entries are added to the
// environment.
func runIn(t *testing.T, dir string, env []string, args ...string) result {
	t.Helper()
	return runBinary(t, overfactBin, dir, env, args...)
}

// runBinary runs the command bin as runIn does.
func runBinary(t *testing.T, bin, dir string, env []string, args ...string) result {
	t.Helper()
	cmd := exec.Command(bin, args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), env...)
	var stdout, stderr bytes.Buffer
	cmd.Stdout, cmd.Stderr = &stdout, &stderr
	err := cmd.Run()
	code := 0
	var exit *exec.ExitError
	if errors.As(err, &exit) {
		code = exit.ExitCode()
	} else if err != nil {
		t.Fatalf("running overfact %v: %v", args, err)
	}
	return result{stdout.String(), stderr.String(), code}
}

// writeModule creates a module in a fresh temporary directory from a map
// of slash-separated file names to contents.
func writeModule(t *testing.T, files map[string]string) string {
	t.Helper()
	dir := t.TempDir()
	for name, content := range files {
		path := filepath.Join(dir, filepath.FromSlash(name))
		if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, []byte(content), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return dir
}

// isolated keeps a temporary module out of any workspace and away from
// the network: it has no dependencies.
var isolated = []string{"GOWORK=off", "GOFLAGS=-mod=mod", "GOPROXY=off"}

func TestVersion(t *testing.T) {
	r := runIn(t, ".", nil, "version")
	if r.code != 0 || !strings.HasPrefix(r.stdout, "overfact ") || !strings.Contains(r.stdout, runtime.Version()) {
		t.Errorf("version: code %d, output %q", r.code, r.stdout)
	}
}

// TestVetProtocol checks the two queries the go command sends a vet
// tool before any package: -V=full names the tool and a build ID (read by
// buildid.go in the go command's internal "work" package), and -flags lists the flags as JSON
// (read by cmd/go/internal/vet/vetflag.go); file names from memory.
func TestVetProtocol(t *testing.T) {
	r := runIn(t, ".", nil, "-V=full")
	if r.code != 0 || !strings.Contains(r.stdout, " version ") || !strings.Contains(r.stdout, "buildID=") {
		t.Errorf("-V=full: code %d, output %q", r.code, r.stdout)
	}
	r = runIn(t, ".", nil, "-flags")
	if r.code != 0 || !strings.HasPrefix(strings.TrimSpace(r.stdout), "[") || !strings.Contains(r.stdout, `"Name"`) {
		t.Errorf("-flags: code %d, output %q", r.code, r.stdout)
	}
}

func TestNoArguments(t *testing.T) {
	r := runIn(t, ".", nil)
	if r.code != 2 || !strings.Contains(r.stderr, "Usage") {
		t.Errorf("no arguments: code %d, stderr %q", r.code, r.stderr)
	}
}

// TestBadFlag checks that a mistyped flag leads with the error and does
// not bury it under the whole usage.
func TestBadFlag(t *testing.T) {
	for _, args := range [][]string{{"-nosuch", "./..."}, {"bounds", "-nosuch"}, {"lsp", "-nosuch"}, {"helper", "-nosuch"}} {
		r := runIn(t, ".", nil, args...)
		first, _, _ := strings.Cut(r.stderr, "\n")
		if r.code != 2 || !strings.Contains(first, "flag provided but not defined: -nosuch") || strings.Count(r.stderr, "\n") > 2 {
			t.Errorf("%v: code %d, stderr:\n%s\nwant 2 and the error first, in at most two lines", args, r.code, r.stderr)
		}
	}
}

// TestHelp checks "help", "help SUBCOMMAND" and -h: the usage on stdout
// (help) and exit 0; an unknown subcommand is a bad command line.
func TestHelp(t *testing.T) {
	for _, tt := range []struct {
		args []string
		want string
	}{
		{[]string{"help"}, "overfact helper"},
		{[]string{"help", "bounds"}, "Usage: overfact bounds"},
		{[]string{"help", "lsp"}, "Usage: overfact lsp"},
		{[]string{"help", "helper"}, "Usage: overfact helper"},
	} {
		if r := runIn(t, ".", nil, tt.args...); r.code != 0 || !strings.Contains(r.stdout, tt.want) {
			t.Errorf("%v: code %d, stdout %q; want 0 and %q", tt.args, r.code, r.stdout, tt.want)
		}
	}
	if r := runIn(t, ".", nil, "-h"); r.code != 0 || !strings.Contains(r.stderr, "Usage:") {
		t.Errorf("-h: code %d, stderr %q", r.code, r.stderr)
	}
	if r := runIn(t, ".", nil, "help", "nosuch"); r.code != 2 || !strings.Contains(r.stderr, "bounds, version") {
		t.Errorf("help nosuch: code %d, stderr %q; want 2 and the subcommands", r.code, r.stderr)
	}
}
