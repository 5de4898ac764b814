package fuzz

import (
	"fmt"
	"go/parser"
	"go/token"
	"io"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// sharedChecker keeps the standard library and the helper module
// type-checked across fuzz executions of one worker process.
var sharedChecker = NewChecker(helperDir)

// FuzzAnalyzer runs overfact on two packages per input: one generated
// from seed by Generate (it must type-check), and src itself when it is a
// valid Go file. Seeds are the analyzer's own test packages under
// testdata/src, read at test time, and one generator seed per shape.
//
// Run it with
//
//	go test -run XXX -fuzz FuzzAnalyzer -fuzztime 10m -parallel 1 ./harness/fuzz
func FuzzAnalyzer(f *testing.F) {
	root := filepath.Join("..", "..", "testdata", "src")
	err := filepath.WalkDir(root, func(path string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() || !strings.HasSuffix(path, ".go") {
			return err
		}
		b, err := os.ReadFile(path)
		if err == nil {
			f.Add(b, []byte(nil))
		}
		return err
	})
	if err != nil && !os.IsNotExist(err) {
		f.Fatal(err)
	}
	for s := range shapes {
		f.Add([]byte(nil), []byte{byte(s), byte(s), 7, 1, 23, 4})
	}
	f.Fuzz(func(t *testing.T, src, seed []byte) {
		gen := map[string][]byte{"gen.go": []byte(Generate("gen", seed))}
		checkPackage(t, underTest, "example.com/gen", gen, true)
		if len(src) == 0 {
			return
		}
		name, ok := packageName(src)
		if !ok {
			return
		}
		checkPackage(t, underTest, "example.com/"+name, map[string][]byte{name + ".go": src}, false)
	})
}

// packageName returns the package clause of src, if it parses at all.
func packageName(src []byte) (string, bool) {
	f, err := parser.ParseFile(token.NewFileSet(), "x.go", src, parser.PackageClauseOnly)
	if err != nil || f.Name.Name == "_" {
		return "", false
	}
	return f.Name.Name, true
}

// checkPackage type-checks src, runs a on it, and applies each suggested
// fix alone and then all of them together (the first fix of each
// diagnostic, skipping any that overlap one already taken, as -fix does);
// every result must parse and type-check. When must is false, inputs that
// do not type-check in the first place are skipped.
func checkPackage(t *testing.T, a *analysis.Analyzer, path string, src map[string][]byte, must bool) {
	t.Helper()
	pkg, err := sharedChecker.Check(path, src)
	if err != nil {
		if must {
			t.Fatalf("generated package does not type-check: %v\n%s", err, dump(src))
		}
		return
	}
	mark := analyzerLog.mark()
	stderr := os.Stderr
	os.Stderr = analyzerLog.f
	diags, err := Run(a, pkg)
	os.Stderr = stderr
	if err != nil {
		t.Fatalf("analyzer error on valid code: %v\n%s", err, dump(src))
	}
	if msg := analyzerLog.since(mark); strings.Contains(msg, "internal error") {
		t.Fatalf("analyzer recovered from a panic: %s\n%s", msg, dump(src))
	}
	var all []edit
	for _, d := range diags {
		for i, fix := range d.SuggestedFixes {
			es, err := resolve(pkg.Fset, src, fix)
			if err != nil {
				t.Errorf("%s: %s: fix %q: %v", pkg.Fset.Position(d.Pos), d.Message, fix.Message, err)
				continue
			}
			fixed := apply(src, es)
			if _, err := sharedChecker.Check(path, fixed); err != nil {
				t.Errorf("%s: %s: fix %q leaves broken code: %v\n%s", pkg.Fset.Position(d.Pos), d.Message, fix.Message, err, dump(fixed))
			}
			if i == 0 {
				all, _ = merge(all, es)
			}
		}
	}
	if len(all) == 0 {
		return
	}
	fixed := apply(src, all)
	if _, err := sharedChecker.Check(path, fixed); err != nil {
		t.Errorf("all fixes together leave broken code: %v\n%s", err, dump(fixed))
	}
}

func dump(src map[string][]byte) string {
	var b strings.Builder
	for name, text := range src {
		fmt.Fprintf(&b, "-- %s --\n%s", name, text)
	}
	return b.String()
}

// analyzerLog catches what the analyzer writes to standard error while it
// runs (os.Stderr points to it only then, so the fuzzing engine's own
// output is untouched). Its
// debug flag makes it log each function it skipped after recovering from a
// panic; the fuzz target counts those as crashes.
var analyzerLog = newStderrLog()

type stderrLog struct{ f *os.File }

func newStderrLog() *stderrLog {
	if fl := underTest.Flags.Lookup("debug"); fl != nil {
		fl.Value.Set("true")
	}
	f, err := os.CreateTemp("", "overfact-fuzz-stderr")
	if err != nil {
		panic(err)
	}
	os.Remove(f.Name()) // kept open; gone when the process ends
	return &stderrLog{f}
}

func (l *stderrLog) mark() int64 {
	off, _ := l.f.Seek(0, io.SeekCurrent)
	return off
}

func (l *stderrLog) since(off int64) string {
	end := l.mark()
	b := make([]byte, end-off)
	l.f.ReadAt(b, off)
	return string(b)
}
