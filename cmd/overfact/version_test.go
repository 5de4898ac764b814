package main

import (
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestVersionRevision builds the command as docs/command.md says to from
// a clone, go build -buildvcs=true in a git checkout of the working tree,
// and checks that "overfact version" names the commit, as git rev-parse
// HEAD gives it.
func TestVersionRevision(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the command in a scratch git checkout")
	}
	if _, err := exec.LookPath("git"); err != nil {
		t.Skip("no git")
	}
	root := repoRoot(t)
	clone := t.TempDir()
	for _, dir := range []string{".", filepath.Join("fixes", "lgamma")} {
		if err := copyModule(filepath.Join(root, dir), filepath.Join(clone, dir)); err != nil {
			t.Fatal(err)
		}
	}
	git := func(args ...string) string {
		t.Helper()
		cmd := exec.Command("git", append([]string{"-c", "user.name=overfact test", "-c", "user.email=test@example.com"}, args...)...)
		cmd.Dir = clone
		out, err := cmd.CombinedOutput()
		if err != nil {
			t.Fatalf("git %v: %v\n%s", args, err, out)
		}
		return strings.TrimSpace(string(out))
	}
	git("init", "-q")
	git("add", ".")
	git("commit", "-q", "-m", "scratch")
	head := git("rev-parse", "HEAD")

	bin := filepath.Join(t.TempDir(), "overfact")
	build := exec.Command("go", "build", "-buildvcs=true", "-o", bin, "./cmd/overfact")
	build.Dir = clone
	build.Env = append(os.Environ(), "GOFLAGS=", "GOPROXY=off")
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("go build: %v\n%s", err, out)
	}
	out, err := exec.Command(bin, "version").Output()
	if err != nil || !strings.Contains(string(out), "(revision "+head+")") {
		t.Errorf("version: %v, %q; want the revision %s", err, out, head)
	}
}
