package fixes_test

import (
	"fmt"
	"go/importer"
	"go/types"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/fixes"
)

// BenchmarkBuild measures the cost of one fix in packages of growing
// size, and reports it as a ratio to one type-check of the package
// (typechecks/fix), measured in the same run: Build re-parses and
// type-checks the package to verify each fix, so the ratio should stay
// near a small constant while the time per fix grows with the package.
//
//	go test -run '^$' -bench BenchmarkBuild ./fixes/
func BenchmarkBuild(b *testing.B) {
	for _, files := range []int{1, 10, 50} {
		b.Run(fmt.Sprintf("files=%d", files), func(b *testing.B) {
			pass, matches := benchPass(b, files)
			// The baseline is the fastest of a few type-checks with a warm
			// importer, so that loading export data is not counted.
			conf := types.Config{Importer: importer.Default()}
			perCheck := time.Duration(1 << 62)
			for i := 0; i < 6; i++ {
				start := time.Now()
				if _, err := conf.Check("bench", pass.Fset, pass.Files, nil); err != nil {
					b.Fatal(err)
				}
				perCheck = min(perCheck, time.Since(start))
			}
			b.ResetTimer()
			var fx *fixes.Fixer
			for i := 0; i < b.N; i++ {
				// A package's fixes share one fixer, whose budget
				// allows a bounded number of checks; a fresh one per
				// file's ten fixes stays inside it.
				if i%10 == 0 {
					fx = fixes.NewFixer(pass)
				}
				if _, err := fx.Build(matches[i%len(matches)]); err != nil {
					b.Fatal(err)
				}
			}
			b.StopTimer()
			perFix := b.Elapsed() / time.Duration(b.N)
			b.ReportMetric(float64(perFix)/float64(perCheck), "typechecks/fix")
		})
	}
}

// benchPass writes a package of n files, each with ten binomial ratios
// marked for the probe, loads it and returns a pass over it with the
// probe's matches.
func benchPass(b testing.TB, n int) (*analysis.Pass, []fixes.Match) {
	dir := b.TempDir()
	pkgDir := filepath.Join(dir, "src", "bench")
	if err := os.MkdirAll(pkgDir, 0o755); err != nil {
		b.Fatal(err)
	}
	for f := 0; f < n; f++ {
		var src strings.Builder
		fmt.Fprintf(&src, "package bench\n\n")
		if f == 0 {
			src.WriteString("func fact(n int) float64 {\n\tr := 1.0\n\tfor i := 2; i <= n; i++ {\n\t\tr *= float64(i)\n\t}\n\treturn r\n}\n")
		}
		for i := 0; i < 10; i++ {
			fmt.Fprintf(&src, "\nfunc C%d_%d(n, k int) float64 {\n\t// probe:binomial(n, k)\n\treturn fact(n) / (fact(k) * fact(n-k))\n}\n", f, i)
		}
		if err := os.WriteFile(filepath.Join(pkgDir, fmt.Sprintf("f%d.go", f)), []byte(src.String()), 0o644); err != nil {
			b.Fatal(err)
		}
	}
	cfg := loadConfig(dir)
	cfg.Tests = false
	loaded, err := packages.Load(cfg, "bench")
	if err != nil || len(loaded) != 1 || len(loaded[0].Errors) > 0 {
		b.Fatalf("load: %v %v", err, loaded)
	}
	p := loaded[0]
	pass := &analysis.Pass{
		Fset: p.Fset, Files: p.Syntax, Pkg: p.Types, TypesInfo: p.TypesInfo, TypesSizes: p.TypesSizes,
		ReadFile: os.ReadFile, Report: func(analysis.Diagnostic) {},
	}
	var matches []fixes.Match
	for _, f := range p.Syntax {
		for _, cg := range f.Comments {
			sub := probeComment.FindStringSubmatch(cg.List[0].Text)
			if sub == nil {
				continue
			}
			m, err := probeMatch(pass, f, p.Fset.Position(cg.Pos()).Line+1, sub[1], sub[2])
			if err != nil {
				b.Fatal(err)
			}
			matches = append(matches, m)
		}
	}
	return pass, matches
}

// TestFixerReadsEachFileOnce checks that the fixes of one pass read each
// file once between them, through a ReadFile that does not cache (go
// vet's and the editor's do not): every fix starts from its file's text,
// and a read per fix costs findings × file size.
func TestFixerReadsEachFileOnce(t *testing.T) {
	pass, matches := benchPass(t, 3)
	reads := make(map[string]int)
	pass.ReadFile = func(name string) ([]byte, error) {
		reads[name]++
		return os.ReadFile(name)
	}
	fx := fixes.NewFixer(pass)
	built := 0
	for _, m := range matches {
		if _, err := fx.Build(m); err == nil {
			built++
		}
	}
	if built < len(matches)/2 {
		t.Fatalf("%d of %d fixes built; the probe's binomials should build", built, len(matches))
	}
	if len(reads) != 3 {
		t.Errorf("read %d files, want the package's 3: %v", len(reads), reads)
	}
	for name, n := range reads {
		if n != 1 {
			t.Errorf("%s read %d times, want once", filepath.Base(name), n)
		}
	}
}
