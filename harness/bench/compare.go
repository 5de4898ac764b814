package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os"
	"os/exec"
	"runtime"
	"slices"
	"syscall"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
)

// sample is one child run as seen by the parent.
type sample struct {
	childReport
	MaxRSSKiB int64 // getrusage of the child (Linux reports KiB)
}

// compare interleaves child runs of the two sides, then times the
// analysis step alone on packages loaded once in this process, and
// prints medians and ratios.
func compare(patterns []string) error {
	if len(patterns) == 0 {
		return fmt.Errorf("no packages given")
	}
	if *runsFlag < 1 {
		return fmt.Errorf("-n must be positive")
	}
	fmt.Printf("packages %v from %q, tests=%v, load=%s, %d runs per side, GOMAXPROCS=%d\n",
		patterns, *dirFlag, *testsFlag, *loadFlag, *runsFlag, runtime.GOMAXPROCS(0))
	sides := []string{"noop-roots", "overfact", "overfact-source"}
	// One discarded run per side warms the build and list caches.
	for _, s := range sides {
		if _, err := child(s, patterns); err != nil {
			return err
		}
	}
	runs := map[string][]sample{}
	for i := range *runsFlag {
		// Rotate the order so no side always runs first or last.
		order := append(slices.Clone(sides[i%len(sides):]), sides[:i%len(sides)]...)
		for _, s := range order {
			r, err := child(s, patterns)
			if err != nil {
				return err
			}
			runs[s] = append(runs[s], r)
		}
	}
	printWhole(runs)
	return analysisOnly(patterns)
}

// child re-executes this binary to run one side in a fresh process.
func child(name string, patterns []string) (sample, error) {
	exe, err := os.Executable()
	if err != nil {
		return sample{}, err
	}
	args := []string{"-child", name, "-dir", *dirFlag, fmt.Sprintf("-tests=%v", *testsFlag), "-load", *loadFlag}
	cmd := exec.Command(exe, append(args, patterns...)...)
	var out bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, os.Stderr
	if err := cmd.Run(); err != nil {
		return sample{}, fmt.Errorf("%s run: %v", name, err)
	}
	var s sample
	if err := json.Unmarshal(out.Bytes(), &s.childReport); err != nil {
		return sample{}, fmt.Errorf("%s run: %v in %q", name, err, out.String())
	}
	if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
		s.MaxRSSKiB = ru.Maxrss
	}
	return s, nil
}

// field extracts one measured quantity from every sample of a side.
func field(ss []sample, f func(sample) float64) []float64 {
	xs := make([]float64, len(ss))
	for i, s := range ss {
		xs[i] = f(s)
	}
	return xs
}

func printWhole(runs map[string][]sample) {
	nr, o, src := runs["noop-roots"], runs["overfact"], runs["overfact-source"]
	fmt.Printf("\nwhole run, one process per run (medians of %d):\n", len(nr))
	fmt.Printf("  packages analysed: %d; overfact diagnostics: %d (test variants counted apart), errors: %d; from every dependency's source: %d, errors: %d\n",
		o[0].Packages, o[0].Diagnostics, o[0].Errors, src[0].Diagnostics, src[0].Errors)
	row := func(label, name string, side, base []sample, f func(sample) float64, unit func(float64) string) {
		a, b := median(field(side, f)), median(field(base, f))
		fmt.Printf("  %-30s %-15s %-10s noop %-10s ratio %s\n", label, name, unit(a), unit(b), ratio(a, b))
	}
	secs := func(x float64) string { return fmt.Sprintf("%.2fs", x) }
	total := func(s sample) float64 { return s.Total }
	hwm := func(s sample) float64 { return float64(s.PeakKiB) }
	fmt.Printf("  overfact loaded as the command loads it (-load %s), against the no-op loaded as it\n", *loadFlag)
	fmt.Println("  needs itself (syntax of the named packages, export data for every dependency):")
	row("wall, load+analyze [target]", "overfact", o, nr, total, secs)
	row("wall, load only", "overfact", o, nr, func(s sample) float64 { return s.Load }, secs)
	row("wall, analyze only", "overfact", o, nr, func(s sample) float64 { return s.Analyze }, secs)
	row("peak RSS, VmHWM [target]", "overfact", o, nr, hwm, mib)
	row("peak RSS, rusage maxrss", "overfact", o, nr, func(s sample) float64 { return float64(s.MaxRSSKiB) }, mib)
	fmt.Println("  overfact with every dependency from source (the load before export data), same no-op:")
	row("wall, load+analyze", "overfact-source", src, nr, total, secs)
	row("peak RSS, VmHWM", "overfact-source", src, nr, hwm, mib)
}

// analysisOnly loads once and alternates the two analyzers on the same
// packages, so loading, which dominates a whole run, is out of the figure.
func analysisOnly(patterns []string) error {
	pkgs, err := load(*dirFlag, *loadFlag, *testsFlag, patterns)
	if err != nil {
		return err
	}
	wall := map[string][]float64{}
	alloc := map[string][]float64{}
	for i := range *runsFlag {
		order := []*analysis.Analyzer{noop, target}
		if i%2 == 1 {
			order[0], order[1] = order[1], order[0]
		}
		for _, a := range order {
			runtime.GC()
			var before, after runtime.MemStats
			runtime.ReadMemStats(&before)
			start := time.Now()
			if _, err := checker.Analyze([]*analysis.Analyzer{a}, pkgs, nil); err != nil {
				return err
			}
			wall[a.Name] = append(wall[a.Name], seconds(time.Since(start)))
			runtime.ReadMemStats(&after)
			alloc[a.Name] = append(alloc[a.Name], float64(after.TotalAlloc-before.TotalAlloc)/1024)
		}
	}
	fmt.Printf("\nanalysis only, packages loaded once in one process (medians of %d):\n", *runsFlag)
	w1, w0 := median(wall[target.Name]), median(wall[noop.Name])
	fmt.Printf("  %-30s overfact %-10s noop %-10s ratio %s\n", "wall", fmt.Sprintf("%.3fs", w1), fmt.Sprintf("%.3fs", w0), ratio(w1, w0))
	a1, a0 := median(alloc[target.Name]), median(alloc[noop.Name])
	fmt.Printf("  %-30s overfact %-10s noop %-10s ratio %s\n", "bytes allocated", mib(a1), mib(a0), ratio(a1, a0))
	return nil
}
