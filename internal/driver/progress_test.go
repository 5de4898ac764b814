package driver

import (
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/packages"
)

type progressFact struct{}

func (*progressFact) AFact() {}

func fakePackages(n int) []*packages.Package {
	pkgs := make([]*packages.Package, n)
	for i := range pkgs {
		pkgs[i] = &packages.Package{ID: fmt.Sprintf("p%d", i), PkgPath: fmt.Sprintf("p%d", i)}
	}
	return pkgs
}

func TestProgress(t *testing.T) {
	runs := 0
	a := &analysis.Analyzer{
		Name:      "probe",
		Doc:       "counts runs",
		FactTypes: []analysis.Fact{new(progressFact)},
		Run:       func(*analysis.Pass) (any, error) { runs++; return nil, nil },
	}
	var w bytes.Buffer
	if got, _ := withProgress(a, fakePackages(ProgressMin), &w); got != a {
		t.Errorf("a run of %d packages got a progress wrapper", ProgressMin)
	}
	// A dependency shared by two roots is counted once.
	pkgs := fakePackages(60)
	shared := &packages.Package{ID: "shared", PkgPath: "shared"}
	pkgs[0].Imports = map[string]*packages.Package{"shared": shared}
	pkgs[1].Imports = map[string]*packages.Package{"shared": shared}
	wrapped, finish := withProgress(a, pkgs, &w)
	for i := 0; i < 61; i++ {
		if _, err := wrapped.Run(nil); err != nil {
			t.Fatal(err)
		}
	}
	finish()
	out := w.String()
	if runs != 61 || !strings.HasPrefix(out, "overfact: 1/61 packages\r") || !strings.HasSuffix(out, "overfact: 61/61 packages\n") || strings.Count(out, "\r") != 60 {
		t.Errorf("runs %d, progress output %q", runs, out)
	}
	if wrapped.Name != a.Name || len(wrapped.FactTypes) != 1 {
		t.Errorf("the wrapper lost the analyzer's name or facts")
	}

	// A run cut short (packages skipped for errors) still ends its line.
	w.Reset()
	wrapped, finish = withProgress(a, pkgs, &w)
	wrapped.Run(nil)
	finish()
	if !strings.HasSuffix(w.String(), "\r\n") {
		t.Errorf("unfinished progress line not ended: %q", w.String())
	}
}

func TestIsTerminal(t *testing.T) {
	f, err := os.Create(filepath.Join(t.TempDir(), "log"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if IsTerminal(f) {
		t.Error("a regular file is taken for a terminal")
	}
}
