// Package driver runs one analyzer over packages named by go/packages
// patterns and reports the findings as text, JSON or SARIF, or applies
// their fixes.
//
// It plays the part singlechecker plays for most analyzers, on top of
// the public checker package, and adds what that lacks: a SARIF log,
// a working directory of its own (so that a nested module can be
// analysed from outside it), progress on long runs, and fixes that are
// written atomically and never applied to a package that did not
// type-check. The exit codes follow Go's analysis drivers.
package driver

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/sarif"
)

// Exit codes, the convention of Go's analysis drivers.
const (
	ExitClean    = 0 // no findings
	ExitError    = 1 // a package failed to load, parse or type-check, or a fix failed
	ExitFindings = 3 // findings reported (or, with Diff, a non-empty diff)
)

// Options configures a run.
type Options struct {
	Dir   string // directory to load from; the current one if empty
	Tests bool   // analyse test files too
	Fix   bool   // apply the first fix of each finding instead of reporting
	Diff  bool   // print the fixes as a unified diff instead of applying them; implies Fix
	JSON  bool   // report in the JSON form of go vet -json on stdout

	SARIF      string // write a SARIF log to this file ("-" for stdout)
	SourceRoot string // SARIF artifact URIs are relative to it; Dir if empty
	Rules      []sarif.Rule
	Version    string // tool version written into the SARIF log

	// FixLast, when set, names the categories whose fixes wait for a
	// round in which no other finding has a fix to apply (the analyzer's
	// FixesLast: a definition's range guard would silence the findings
	// whose rewrites should come first).
	FixLast func(category string) bool

	// FixesComplete says that the analyzer offers a fix for every
	// finding it can fix in each analysis (no budget of fix checks holds
	// any back): a round of -fix whose other fixes are all taken then
	// takes the FixLast categories' fixes too (see planFixes), and a
	// large package is fixed in two analyses instead of three.
	FixesComplete bool

	// Helper, when its Path is set, is the module that fixes import; -fix
	// makes sure it resolves from the fixed module before writing.
	Helper Helper

	// FactScan, when set, tells from syntax which dependencies may carry
	// the analyzer's facts: only those are type-checked from source, the
	// rest come from export data (LoadForFacts). Without it every
	// dependency of an analyzer with facts is loaded from source.
	FactScan FactScan

	// Progress, when set, receives "done/total" lines while a run over
	// more than ProgressMin packages is in progress.
	Progress io.Writer

	Stdout, Stderr io.Writer
}

// ProgressMin is the number of packages above which progress is shown.
const ProgressMin = 50

// Run analyses the packages matching patterns and returns the exit code.
func Run(a *analysis.Analyzer, patterns []string, opts Options) int {
	defer limitMemory()()
	r := &run{opts: opts, src: newSources()}
	return r.main(a, patterns)
}

type run struct {
	opts     Options
	dir      string // absolute
	failed   bool   // an error happened
	findings bool   // findings were reported (or a diff printed)
	src      *sources
}

// code is the exit code: an error outranks findings, so that a broken
// package is never mistaken for one that merely has findings.
func (r *run) code() int {
	switch {
	case r.failed:
		return ExitError
	case r.findings:
		return ExitFindings
	}
	return ExitClean
}

func (r *run) errorf(format string, args ...any) {
	fmt.Fprintf(r.opts.Stderr, "overfact: "+format+"\n", args...)
	r.failed = true
}

func (r *run) main(a *analysis.Analyzer, patterns []string) int {
	dir, err := filepath.Abs(r.opts.Dir)
	if err != nil {
		r.errorf("%v", err)
		return r.code()
	}
	r.dir = dir
	if info, err := os.Stat(dir); err != nil || !info.IsDir() {
		r.errorf("cannot load packages from %s: no such directory", r.opts.Dir)
		return r.code()
	}
	graph, ok := r.analyze(a, patterns, nil, true)
	if !ok {
		return r.code()
	}
	if r.opts.Fix || r.opts.Diff {
		r.fix(a, patterns, graph)
	} else {
		r.report(graph)
	}
	return r.code()
}

// analyze loads the packages, with overlay standing in for the files it
// names, and runs a over them. The first pass reports load errors and
// shows progress; the later passes of -fix are silent.
func (r *run) analyze(a *analysis.Analyzer, patterns []string, overlay map[string][]byte, first bool) (*checker.Graph, bool) {
	pkgs, err := r.load(a, patterns, overlay)
	if err != nil {
		r.errorf("%v", err)
		return nil, false
	}
	analyzer, finish := withSources(a, overlay, r.src), func() {}
	if first {
		if n := printPackageErrors(r.opts.Stderr, r.dir, pkgs); n > 0 {
			r.failed = true
		}
		if r.opts.Progress != nil {
			analyzer, finish = withProgress(analyzer, pkgs, r.opts.Progress)
		}
	}
	graph, err := checker.Analyze([]*analysis.Analyzer{analyzer}, pkgs, nil)
	finish()
	if err != nil {
		r.errorf("%v", err)
		return nil, false
	}
	if first {
		for act := range graph.All() {
			if act.Err != nil && act.IsRoot {
				r.errorf("%s: %v", act.Package.ID, act.Err)
			}
		}
	}
	return graph, true
}

func (r *run) load(a *analysis.Analyzer, patterns []string, overlay map[string][]byte) ([]*packages.Package, error) {
	cfg := &packages.Config{Mode: packages.LoadSyntax | packages.NeedModule, Dir: r.dir, Tests: r.opts.Tests, Overlay: overlay,
		ParseFile: r.src.parseFile(overlay)}
	var pkgs []*packages.Package
	var err error
	if len(a.FactTypes) > 0 {
		// Facts flow up from dependencies, which must be analysed too.
		pkgs, err = LoadForFacts(cfg, patterns, r.opts.FactScan)
	} else {
		pkgs, err = packages.Load(cfg, patterns...)
	}
	if err == nil && len(pkgs) == 0 {
		err = fmt.Errorf("%s matched no packages", strings.Join(patterns, " "))
	}
	return pkgs, err
}

func (r *run) report(graph *checker.Graph) {
	// One finding, one report, and the same exit code in every mode.
	r.findings = dropCopies(graph.Roots) > 0
	if r.opts.SARIF != "" {
		r.writeSARIF(graph.Roots)
	}
	if r.opts.JSON {
		if err := printJSON(r.opts.Stdout, graph); err != nil {
			r.errorf("%v", err)
		}
		return
	}
	writeText(r.opts.Stderr, r.dir, graph.Roots)
}
