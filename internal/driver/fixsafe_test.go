package driver

import (
	"bytes"
	"go/ast"
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// The tests below attack -fix the way a hostile or unlucky user would:
// files edited while it runs, another -fix at the same time, read-only
// files, links and line endings. noteAnalyzer (fixrun_test.go) offers a
// fix for every x *= y; noteFixed is what its fixes make of noteSrc.
const noteFixed = "// note: keep\n// note: a\n// note: b\npackage p\n\nfunc f(keep, a, b, i int) int {\n\tkeep *= i\n\ta = a * i\n\tb = b * i\n\treturn keep + a + b\n}\n"

// noteModule writes a module of the given files (noteSrc as p.go when
// files is nil) and returns its directory.
func noteModule(t *testing.T, files map[string]string) string {
	t.Helper()
	t.Setenv("GOWORK", "off")
	t.Setenv("GOFLAGS", "-mod=mod")
	t.Setenv("GOPROXY", "off")
	if files == nil {
		files = map[string]string{"p.go": noteSrc}
	}
	dir := t.TempDir()
	files["go.mod"] = "module example.com/p\n\ngo 1.21\n"
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

func runFix(a *analysis.Analyzer, dir string) (int, string) {
	var stdout, stderr bytes.Buffer
	code := Run(a, []string{"."}, Options{Dir: dir, Fix: true, Stdout: &stdout, Stderr: &stderr})
	return code, stderr.String()
}

func readFile(t *testing.T, name string) string {
	t.Helper()
	b, err := os.ReadFile(name)
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

// noLeftovers fails if a temporary file of -fix is left in dir.
func noLeftovers(t *testing.T, dir string) {
	t.Helper()
	entries, _ := os.ReadDir(dir)
	for _, e := range entries {
		if strings.Contains(e.Name(), ".overfact-") {
			t.Errorf("temporary file left behind: %s", e.Name())
		}
	}
}

// editing wraps a so that, after the files were parsed and before any fix
// is applied, edit changes the disk: a user typing while -fix runs.
func editing(a *analysis.Analyzer, edit func()) *analysis.Analyzer {
	var once sync.Once
	wrapped := *a
	wrapped.Run = func(pass *analysis.Pass) (any, error) {
		once.Do(edit)
		return a.Run(pass)
	}
	return &wrapped
}

// TestFixFileEditedDuringRun edits a file while its analysis runs. The
// edits computed for the old text would land at the wrong offsets of the
// new one; -fix must leave the user's text alone, say so and exit 1. An
// edit that keeps the file's size must be caught too.
func TestFixFileEditedDuringRun(t *testing.T) {
	tests := []struct{ name, edited string }{
		{"two comment lines at the top", "// Package p multiplies.\n// (edited while -fix ran)\n" + noteSrc},
		{"same size", strings.Replace(noteSrc, "return keep + a + b", "return keep + b + a", 1)},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			dir := noteModule(t, nil)
			name := filepath.Join(dir, "p.go")
			code, stderr := runFix(editing(noteAnalyzer, func() {
				if err := os.WriteFile(name, []byte(tt.edited), 0o644); err != nil {
					t.Error(err)
				}
			}), dir)
			if code != ExitError || !strings.Contains(stderr, "p.go changed since it was analysed") {
				t.Errorf("exit code %d, stderr %q; want 1 and the changed file named", code, stderr)
			}
			if got := readFile(t, name); got != tt.edited {
				t.Errorf("the edited file was changed by -fix:\n%s", got)
			}
			noLeftovers(t, dir)
		})
	}
}

// TestFixConcurrentRuns runs two -fix over one module at once, the second
// analysing the original text and applying its fixes after the first has
// written. No file may be left unparseable: the second run must see that
// the file changed and write nothing.
func TestFixConcurrentRuns(t *testing.T) {
	dir := noteModule(t, nil)
	name := filepath.Join(dir, "p.go")
	release := make(chan struct{})
	parsed := make(chan struct{})
	late := editing(noteAnalyzer, func() {
		close(parsed)
		<-release
	})
	var code2 int
	var stderr2 string
	var wg sync.WaitGroup
	wg.Add(1)
	go func() {
		defer wg.Done()
		code2, stderr2 = runFix(late, dir)
	}()
	<-parsed
	code1, stderr1 := runFix(noteAnalyzer, dir)
	close(release)
	wg.Wait()
	if code1 != ExitClean {
		t.Errorf("first run: exit code %d\n%s", code1, stderr1)
	}
	if code2 != ExitError || !strings.Contains(stderr2, "changed since it was analysed") {
		t.Errorf("second run: exit code %d, stderr %q; want 1 and the changed file named", code2, stderr2)
	}
	got := readFile(t, name)
	if _, err := parser.ParseFile(token.NewFileSet(), name, got, 0); err != nil {
		t.Errorf("file left unparseable: %v\n%s", err, got)
	}
	if got != noteFixed {
		t.Errorf("file after two runs:\n%s\nwant the first run's fixes:\n%s", got, noteFixed)
	}
	noLeftovers(t, dir)
}

// TestFixAllOrNothing gives one of two files to fix no write permission:
// the run must write neither, name the refused file and exit 1.
func TestFixAllOrNothing(t *testing.T) {
	other := strings.ReplaceAll(noteSrc, "func f(", "func g(")
	dir := noteModule(t, map[string]string{"p.go": noteSrc, "q.go": other})
	ro := filepath.Join(dir, "q.go")
	if err := os.Chmod(ro, 0o444); err != nil {
		t.Fatal(err)
	}
	code, stderr := runFix(noteAnalyzer, dir)
	if code != ExitError || !strings.Contains(stderr, ro+" is read-only") || !strings.Contains(stderr, "no file written") {
		t.Errorf("exit code %d, stderr %q; want 1, the read-only file named and nothing written", code, stderr)
	}
	if got := readFile(t, filepath.Join(dir, "p.go")); got != noteSrc {
		t.Errorf("p.go was fixed although q.go could not be:\n%s", got)
	}
	if got := readFile(t, ro); got != other {
		t.Errorf("the read-only file changed:\n%s", got)
	}
	noLeftovers(t, dir)
}

// TestFixKeepsModeAndOwner checks that a fixed file keeps its permission
// bits and, where the process may set it, its owner and group.
func TestFixKeepsModeAndOwner(t *testing.T) {
	dir := noteModule(t, nil)
	name := filepath.Join(dir, "p.go")
	if err := os.Chmod(name, 0o640); err != nil {
		t.Fatal(err)
	}
	owned := os.Getuid() == 0 // only root can give a file away
	if owned {
		if err := os.Chown(name, 4321, 8765); err != nil {
			t.Fatal(err)
		}
	}
	before, _ := os.Stat(name)
	if code, stderr := runFix(noteAnalyzer, dir); code != ExitClean {
		t.Fatalf("exit code %d\n%s", code, stderr)
	}
	after, _ := os.Stat(name)
	if readFile(t, name) != noteFixed {
		t.Errorf("file not fixed:\n%s", readFile(t, name))
	}
	if after.Mode() != before.Mode() {
		t.Errorf("mode %v after -fix, want %v", after.Mode(), before.Mode())
	}
	if owned {
		if u, g, _ := ownerOf(after); u != 4321 || g != 8765 {
			t.Errorf("owner %d:%d after -fix, want 4321:8765", u, g)
		}
	} else {
		t.Log("not root: owner not tested")
	}
}

// TestFixSymlink writes a symbolically linked source file through to the
// file it names: the link stays a link, and the target gets the fixes.
func TestFixSymlink(t *testing.T) {
	dir := noteModule(t, map[string]string{})
	shared := t.TempDir()
	real := filepath.Join(shared, "real.go")
	if err := os.WriteFile(real, []byte(noteSrc), 0o600); err != nil {
		t.Fatal(err)
	}
	link := filepath.Join(dir, "p.go")
	if err := os.Symlink(real, link); err != nil {
		t.Skipf("cannot make a symbolic link: %v", err)
	}
	if code, stderr := runFix(noteAnalyzer, dir); code != ExitClean {
		t.Fatalf("exit code %d\n%s", code, stderr)
	}
	if info, err := os.Lstat(link); err != nil || info.Mode()&os.ModeSymlink == 0 {
		t.Errorf("p.go is no longer a symbolic link (%v, %v)", info.Mode(), err)
	}
	if got := readFile(t, real); got != noteFixed {
		t.Errorf("link target after -fix:\n%s\nwant:\n%s", got, noteFixed)
	}
	if info, _ := os.Stat(real); info.Mode().Perm() != 0o600 {
		t.Errorf("link target mode %v, want 0600 kept", info.Mode().Perm())
	}
	noLeftovers(t, dir)
	noLeftovers(t, shared)
}

// TestFixHardLink refuses a file with a second hard link: replacing it
// would leave the other name with the old text, and writing it in place
// could leave it half-written.
func TestFixHardLink(t *testing.T) {
	dir := noteModule(t, nil)
	name := filepath.Join(dir, "p.go")
	other := filepath.Join(t.TempDir(), "copy.go")
	if err := os.Link(name, other); err != nil {
		t.Skipf("cannot make a hard link: %v", err)
	}
	code, stderr := runFix(noteAnalyzer, dir)
	if code != ExitError || !strings.Contains(stderr, "hard links") {
		t.Errorf("exit code %d, stderr %q; want 1 and the hard link named", code, stderr)
	}
	for _, n := range []string{name, other} {
		if got := readFile(t, n); got != noteSrc {
			t.Errorf("%s changed:\n%s", n, got)
		}
	}
	a, _ := os.Stat(name)
	b, _ := os.Stat(other)
	if !os.SameFile(a, b) {
		t.Error("the hard link was broken")
	}
}

// TestFixCRLF fixes a file whose lines end in CRLF: the lines the fixes
// insert must end in CRLF too.
func TestFixCRLF(t *testing.T) {
	crlf := strings.ReplaceAll(noteSrc, "\n", "\r\n")
	dir := noteModule(t, map[string]string{"p.go": crlf})
	name := filepath.Join(dir, "p.go")
	if code, stderr := runFix(noteAnalyzer, dir); code != ExitClean {
		t.Fatalf("exit code %d\n%s", code, stderr)
	}
	got := readFile(t, name)
	if want := strings.ReplaceAll(noteFixed, "\n", "\r\n"); got != want {
		t.Errorf("CRLF file after -fix:\n%q\nwant:\n%q", got, want)
	}
}

// growAnalyzer never runs out of fixes: it reports the last declaration
// of every file, with a fix that appends another declaration after it.
var growAnalyzer = &analysis.Analyzer{
	Name: "grow",
	Doc:  "reports the last declaration and appends one",
	Run: func(pass *analysis.Pass) (any, error) {
		for _, f := range pass.Files {
			last := f.Decls[len(f.Decls)-1]
			pass.Report(analysis.Diagnostic{Pos: last.Pos(), Message: "last declaration",
				SuggestedFixes: []analysis.SuggestedFix{{TextEdits: []analysis.TextEdit{{Pos: last.End(), End: last.End(), NewText: []byte("\n\nvar _ = 0")}}}}})
		}
		return nil, nil
	},
}

// TestFixRoundsBounded checks that -fix stops after its last round when
// fixes keep coming, says how many it held back and where, and exits 1.
func TestFixRoundsBounded(t *testing.T) {
	dir := noteModule(t, map[string]string{"p.go": "package p\n\nvar _ = 0\n"})
	code, stderr := runFix(growAnalyzer, dir)
	if code != ExitError || !strings.Contains(stderr, "stopped after 16 rounds of fixes: 1 more fix was offered and held back") || !strings.Contains(stderr, "p.go:") {
		t.Errorf("exit code %d, stderr %q; want 1 and the held-back fix listed", code, stderr)
	}
	if got := strings.Count(readFile(t, filepath.Join(dir, "p.go")), "var _ = 0"); got != 1+maxFixRounds {
		t.Errorf("%d declarations after -fix, want %d: one per round", got, 1+maxFixRounds)
	}
}

// TestFixRestoresOnLateChange edits the second of two files after the
// first was renamed into place: the run must put the first back, leave
// the user's edit alone and exit 1, so that it still writes all or
// nothing.
func TestFixRestoresOnLateChange(t *testing.T) {
	other := strings.ReplaceAll(noteSrc, "func f(", "func g(")
	dir := noteModule(t, map[string]string{"p.go": noteSrc, "q.go": other})
	q := filepath.Join(dir, "q.go")
	edited := "// edited at the last moment\n" + other
	testHookBeforeRename = func(name string) {
		if name == q {
			if err := os.WriteFile(q, []byte(edited), 0o644); err != nil {
				t.Error(err)
			}
		}
	}
	defer func() { testHookBeforeRename = nil }()
	code, stderr := runFix(noteAnalyzer, dir)
	if code != ExitError || !strings.Contains(stderr, "q.go changed since it was analysed; restoring the files already written") {
		t.Errorf("exit code %d, stderr %q; want 1 and the restore announced", code, stderr)
	}
	if got := readFile(t, filepath.Join(dir, "p.go")); got != noteSrc {
		t.Errorf("p.go was not restored:\n%s", got)
	}
	if got := readFile(t, q); got != edited {
		t.Errorf("q.go lost the user's edit:\n%s", got)
	}
	noLeftovers(t, dir)
}

// TestFixBesideBrokenPackage fixes a module where another package does
// not type-check as written: that package is named and left alone, and
// the others are still fixed (their fixed text builds).
func TestFixBesideBrokenPackage(t *testing.T) {
	broken := "package bad\n\nfunc h(x int) int {\n\tx *= y\n\treturn x\n}\n"
	dir := noteModule(t, map[string]string{"p.go": noteSrc, "bad/bad.go": broken})
	var stdout, stderr bytes.Buffer
	code := Run(noteAnalyzer, []string{"./..."}, Options{Dir: dir, Fix: true, Stdout: &stdout, Stderr: &stderr})
	if code != ExitError || !strings.Contains(stderr.String(), "example.com/p/bad") || strings.Contains(stderr.String(), "no file written") {
		t.Errorf("exit code %d, stderr %q; want 1 and only the broken package refused", code, stderr.String())
	}
	if got := readFile(t, filepath.Join(dir, "p.go")); got != noteFixed {
		t.Errorf("p.go:\n%s\nwant:\n%s", got, noteFixed)
	}
	if got := readFile(t, filepath.Join(dir, "bad", "bad.go")); got != broken {
		t.Errorf("the broken package was changed:\n%s", got)
	}
}

// breakAnalyzer offers a fix that does not compile, as a buggy analyzer
// might: x *= y becomes x = x * undefinedFactor.
var breakAnalyzer = &analysis.Analyzer{
	Name: "break",
	Doc:  "offers a fix that does not compile",
	Run: func(pass *analysis.Pass) (any, error) {
		for _, f := range pass.Files {
			ast.Inspect(f, func(n ast.Node) bool {
				if as, ok := n.(*ast.AssignStmt); ok && as.Tok == token.MUL_ASSIGN {
					pass.Report(analysis.Diagnostic{Pos: as.Pos(), Message: "product",
						SuggestedFixes: []analysis.SuggestedFix{{TextEdits: []analysis.TextEdit{{Pos: as.Pos(), End: as.End(), NewText: []byte("x = x * undefinedFactor")}}}}})
				}
				return true
			})
		}
		return nil, nil
	},
}

// TestFixThatDoesNotBuild checks that fixed text which no longer
// type-checks is never written, whatever analyzer offered the fix.
func TestFixThatDoesNotBuild(t *testing.T) {
	src := "package p\n\nfunc f(x, i int) int {\n\tx *= i\n\treturn x\n}\n"
	dir := noteModule(t, map[string]string{"p.go": src})
	code, stderr := runFix(breakAnalyzer, dir)
	if code != ExitError || !strings.Contains(stderr, "the fixed code of example.com/p does not build") || !strings.Contains(stderr, "undefinedFactor") {
		t.Errorf("exit code %d, stderr %q; want 1 and the type error named", code, stderr)
	}
	if got := readFile(t, filepath.Join(dir, "p.go")); got != src {
		t.Errorf("p.go was written:\n%s", got)
	}
}
