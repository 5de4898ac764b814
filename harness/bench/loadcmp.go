package main

import (
	"fmt"
	"runtime"
	"slices"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/driver"
)

// loadcmp runs overfact over the packages twice, once with every
// dependency loaded from source and once loaded as the command loads
// them (export data for the dependencies that cannot carry facts), and
// compares the outcomes: every diagnostic with its fixes and every fact
// the packages saw must be the same.
func loadcmp(patterns []string) error {
	if len(patterns) == 0 {
		return fmt.Errorf("no packages given")
	}
	outcome := func(strategy string) ([]string, error) {
		start := time.Now()
		pkgs, err := load(*dirFlag, strategy, *testsFlag, patterns)
		if err != nil {
			return nil, err
		}
		fromSource := 0
		packages.Visit(pkgs, nil, func(p *packages.Package) {
			if p.TypesInfo != nil {
				fromSource++
			}
		})
		g, err := checker.Analyze([]*analysis.Analyzer{target}, pkgs, nil)
		if err != nil {
			return nil, err
		}
		out := driver.Outcome(g)
		fmt.Printf("  load %-7s %d packages named, %d type-checked from source; %d lines of outcome; %.1fs\n",
			strategy, len(pkgs), fromSource, len(out), time.Since(start).Seconds())
		return out, nil
	}
	fmt.Printf("packages %v from %q, tests=%v\n", patterns, *dirFlag, *testsFlag)
	src, err := outcome("source")
	if err != nil {
		return err
	}
	runtime.GC()
	drv, err := outcome("driver")
	if err != nil {
		return err
	}
	facts := 0
	for _, s := range src {
		if len(s) > 5 && s[:5] == "fact " {
			facts++
		}
	}
	if slices.Equal(src, drv) {
		fmt.Printf("  same outcome: %d lines, %d of them facts\n", len(src), facts)
		return nil
	}
	for _, s := range src {
		if !slices.Contains(drv, s) {
			fmt.Printf("  only with every dependency from source: %s\n", s)
		}
	}
	for _, s := range drv {
		if !slices.Contains(src, s) {
			fmt.Printf("  only as the command loads: %s\n", s)
		}
	}
	return fmt.Errorf("the two loads differ")
}
