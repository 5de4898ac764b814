package main

import (
	"encoding/json"
	"fmt"
	"os"
	"runtime"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/driver"
)

// childReport is what one measured process prints on its standard output.
type childReport struct {
	Side        string  `json:"side"`
	Packages    int     `json:"packages"`
	Load        float64 `json:"load_s"`
	Analyze     float64 `json:"analyze_s"`
	Total       float64 `json:"total_s"`
	PeakKiB     int64   `json:"vmhwm_kib"`
	Diagnostics int     `json:"diagnostics"`
	Errors      int     `json:"errors"`
}

// runChild loads the packages once, runs one side once and reports. Each
// side runs in a process of its own so that its peak memory is its own.
func runChild(name string, patterns []string) error {
	if name == "fix" {
		return runFixChild(patterns)
	}
	a := side(name)
	if a == nil {
		return fmt.Errorf("unknown side %q", name)
	}
	stop, err := startProfiles()
	if err != nil {
		return err
	}
	start := time.Now()
	pkgs, err := load(*dirFlag, strategyOf(name), *testsFlag, patterns)
	if err != nil {
		return err
	}
	loaded := time.Now()
	g, err := checker.Analyze([]*analysis.Analyzer{a}, pkgs, nil)
	if err != nil {
		return err
	}
	done := time.Now()
	if err := stop(); err != nil {
		return err
	}
	rep := childReport{Side: name, Packages: len(pkgs),
		Load: seconds(loaded.Sub(start)), Analyze: seconds(done.Sub(loaded)), Total: seconds(done.Sub(start))}
	for _, act := range g.Roots {
		rep.Diagnostics += len(act.Diagnostics)
		if act.Err != nil {
			rep.Errors++
		}
	}
	f, err := os.Open("/proc/self/status")
	if err != nil {
		return err
	}
	defer f.Close()
	if rep.PeakKiB, err = parseHWM(f); err != nil {
		return err
	}
	runtime.KeepAlive(pkgs)
	return json.NewEncoder(os.Stdout).Encode(rep)
}

// runFixChild runs the command's -fix once over patterns, in -dir, as
// the command runs it (the budget of fix checks lifted), under the
// profiles asked for, and exits with its code. The module must already
// provide the helper module the fixes import (overfact helper).
func runFixChild(patterns []string) error {
	stop, err := startProfiles()
	if err != nil {
		return err
	}
	fixes.SetCheckBudget(0)
	code := driver.Run(analyzer.Analyzer, patterns, driver.Options{Dir: *dirFlag, Tests: *testsFlag, Fix: true, FixesComplete: true,
		FixLast: analyzer.FixesLast, FactScan: analyzer.MayCarryFacts, Stdout: os.Stdout, Stderr: os.Stderr})
	if err := stop(); err != nil {
		return err
	}
	os.Exit(code)
	return nil
}
