package driver

import (
	"fmt"
	"io"
	"os"
	"sync"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/packages"
)

// IsTerminal reports whether f is a character device, the test for a
// terminal that needs no dependency beyond the standard library.
func IsTerminal(f *os.File) bool {
	info, err := f.Stat()
	return err == nil && info.Mode()&os.ModeCharDevice != 0
}

// withProgress returns a copy of a whose Run reports "done/total
// packages" on w after each package, when the run covers more than
// ProgressMin packages; otherwise it returns a unchanged. The copy keeps
// a's fact types and requirements, so facts flow as before. The returned
// function ends the progress line when packages with errors were skipped.
func withProgress(a *analysis.Analyzer, pkgs []*packages.Package, w io.Writer) (*analysis.Analyzer, func()) {
	total := len(pkgs)
	if len(a.FactTypes) > 0 {
		total = 0
		packages.Visit(pkgs, nil, func(*packages.Package) { total++ })
	}
	if total <= ProgressMin {
		return a, func() {}
	}
	var mu sync.Mutex
	done := 0
	wrapped := *a
	wrapped.Run = func(pass *analysis.Pass) (any, error) {
		res, err := a.Run(pass)
		mu.Lock()
		done++
		// A carriage return redraws the line in place; the last one ends it.
		end := "\r"
		if done >= total {
			end = "\n"
		}
		fmt.Fprintf(w, "overfact: %d/%d packages%s", done, total, end)
		mu.Unlock()
		return res, err
	}
	finish := func() {
		mu.Lock()
		defer mu.Unlock()
		if done > 0 && done < total {
			fmt.Fprintln(w)
		}
	}
	return &wrapped, finish
}
