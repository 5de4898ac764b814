package main

import (
	"flag"
	"fmt"
	"os"
	"strings"
	"text/tabwriter"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/driver"
	"github.com/overfact/overfact/internal/sarif"
)

// analysisFlags returns the flags of the standalone mode, stored into
// opts (which may be nil when only the usage is wanted).
func analysisFlags(opts *driver.Options) *flag.FlagSet {
	if opts == nil {
		opts = new(driver.Options)
	}
	fs := flag.NewFlagSet("overfact", flag.ContinueOnError)
	fs.StringVar(&opts.Dir, "C", "", "change to `dir` before loading packages (for a module nested in another)")
	fs.BoolVar(&opts.Tests, "test", true, "analyse test files too")
	fs.BoolVar(&opts.Fix, "fix", false, "apply the first suggested fix of each finding")
	fs.BoolVar(&opts.Diff, "diff", false, "print the fixes as a unified diff instead of applying them (implies -fix)")
	fs.BoolVar(&opts.JSON, "json", false, "print findings as JSON on stdout, in the form of go vet -json")
	fs.StringVar(&opts.SARIF, "sarif", "", "also write a SARIF 2.1.0 log to `file` (- for stdout)")
	fs.StringVar(&opts.SourceRoot, "srcroot", "", "`dir` SARIF artifact URIs are relative to (default: the -C directory or the current one)")
	addAnalyzerFlags(fs)
	fs.Usage = func() { usage(fs) }
	return fs
}

// runAnalysis implements the standalone mode: overfact [flags] PACKAGES.
func runAnalysis(args []string) int {
	opts := driver.Options{Stdout: os.Stdout, Stderr: os.Stderr}
	fs := analysisFlags(&opts)
	patterns, code, ok := parseFlags(fs, args, os.Stderr)
	if !ok {
		return code
	}
	if len(patterns) == 0 {
		fmt.Fprintln(os.Stderr, "overfact: no packages to analyse")
		usage(fs)
		return 2
	}
	if msg := conflictingFlags(opts); msg != "" {
		fmt.Fprintf(os.Stderr, "overfact: %s\n", msg)
		return 2
	}
	opts.Rules = rules()
	opts.FixLast = analyzer.FixesLast
	opts.Version = moduleVersion()
	opts.Helper = helperModule()
	opts.FactScan = analyzer.MayCarryFacts
	if opts.Fix || opts.Diff {
		// -fix applies every fix it can; checking them all costs what
		// their functions reach, so the budget that keeps go vet and
		// the editor quick on a package with thousands of findings
		// would only make -fix re-analyse the package once per 32 fixes.
		fixes.SetCheckBudget(0)
		opts.FixesComplete = true
	}
	if driver.IsTerminal(os.Stderr) {
		opts.Progress = os.Stderr
	}
	defer paceCollector()()
	return driver.Run(analyzer.Analyzer, patterns, opts)
}

// conflictingFlags explains why a combination of flags cannot work:
// fixing reports nothing, and stdout holds one document at a time.
func conflictingFlags(o driver.Options) string {
	switch {
	case (o.Fix || o.Diff) && (o.JSON || o.SARIF != ""):
		return "-fix and -diff do not report findings; run -json or -sarif separately"
	case o.JSON && o.SARIF == "-":
		return "-json and -sarif - would both write to stdout; give -sarif a file"
	}
	return ""
}

// addAnalyzerFlags exposes the analyzer's own flags, as singlechecker
// does, so that the same flag works standalone and under go vet.
func addAnalyzerFlags(fs *flag.FlagSet) {
	analyzer.Analyzer.Flags.VisitAll(func(f *flag.Flag) {
		if fs.Lookup(f.Name) == nil {
			fs.Var(f.Value, f.Name, f.Usage)
		}
	})
}

// rules turns the analyzer's categories into SARIF rules, each at the
// analyzer's severity (whose words are SARIF's levels).
func rules() []sarif.Rule {
	var out []sarif.Rule
	for _, c := range analyzer.Categories() {
		out = append(out, sarif.Rule{ID: c.ID, Title: c.Title, Help: c.Help, Level: analyzer.Severity(c.ID)})
	}
	return out
}

func usage(fs *flag.FlagSet) {
	out := fs.Output()
	doc, _, _ := strings.Cut(analyzer.Analyzer.Doc, "\n\n")
	if !strings.HasPrefix(doc, analyzer.Analyzer.Name+":") {
		doc = analyzer.Analyzer.Name + ": " + doc
	}
	fmt.Fprintf(out, "%s\n\n", doc)
	fmt.Fprintln(out, "Usage:")
	tw := tabwriter.NewWriter(out, 0, 4, 2, ' ', 0)
	fmt.Fprintln(tw, "  overfact [flags] PACKAGES\tanalyse packages (exit 0 clean, 3 findings, 1 errors, 2 bad usage)")
	for _, c := range subcommands {
		fmt.Fprintf(tw, "  %s\t%s\n", strings.TrimSpace("overfact "+c.name+" "+c.args), c.summary)
	}
	tw.Flush()
	fmt.Fprint(out, `  go vet -vettool=$(which overfact) PACKAGES
  go fix -fixtool=$(which overfact) PACKAGES

Flags:
`)
	fs.PrintDefaults()
}
