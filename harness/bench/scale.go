package main

import (
	"bufio"
	"context"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"runtime/pprof"
	"strconv"
	"strings"
	"syscall"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"
)

// scaleCase is one generated input at one size.
type scaleCase struct {
	kind  string // what grows
	unit  string // what is counted
	units int
	src   string
}

// Full sizes required of the analyzer: a 50,000-line function and a
// package of 2,000 functions. Each is measured at 1/16, 1/4 and 1 of it.
const (
	fullLines = 50000
	fullFuncs = 2000
)

func scale() error {
	fmt.Printf("analysis time of overfact (median of up to %d runs, %v per size at most) against input size\n", *runsFlag, *caseTimeFlag)
	for _, kind := range []string{"long function", "many functions"} {
		var base, allocBase, cpuBase float64
		for _, div := range []int{16, 4, 1} {
			c := makeCase(kind, div)
			times, allocs, cpus, err := scaleChild(kind, div)
			if cs, ok := err.(*cutShort); ok {
				per := cs.ran.Seconds() / float64(c.units)
				fmt.Printf("  %-15s %6d %-5s %2d×  first run unfinished after %.0fs of analysis: per 1000 %s more than %.3fms, per-unit ratio to 1× more than %s\n",
					kind, c.units, c.unit, 16/div, cs.ran.Seconds(), c.unit, per*1e6, ratio(per, base))
				continue
			}
			if err != nil {
				return fmt.Errorf("%s 1/%d: %v", kind, div, err)
			}
			per := median(times) / float64(c.units)
			allocPer := median(allocs) / float64(c.units)
			cpuPer := median(cpus) / float64(c.units)
			if base == 0 {
				base, allocBase, cpuBase = per, allocPer, cpuPer
			}
			fmt.Printf("  %-15s %6d %-5s %2d×  %d runs, median %.2fs, per 1000 %s %.3fms, per-unit ratio to 1× %s; allocations per 1000 %s %.0f, ratio %s; CPU per 1000 %s %.3fms, ratio %s\n",
				kind, c.units, c.unit, 16/div, len(times), median(times), c.unit, per*1e6, ratio(per, base), c.unit, allocPer*1000, ratio(allocPer, allocBase), c.unit, cpuPer*1e6, ratio(cpuPer, cpuBase))
		}
	}
	return nil
}

// scaleChild measures one case in a child process, which is killed when
// the case's time is up: checker.Analyze cannot be interrupted, and a
// superlinear analyzer would otherwise never finish the largest cases.
// It returns the analysis times of the runs that finished, the heap
// allocations each made for the generated package, and the CPU time
// (user and system) of the process during each.
func scaleChild(kind string, div int) (times, allocs, cpus []float64, err error) {
	exe, err := os.Executable()
	if err != nil {
		return nil, nil, nil, err
	}
	ctx, cancel := context.WithTimeout(context.Background(), *caseTimeFlag)
	defer cancel()
	cmd := exec.CommandContext(ctx, exe, "-scalecase", fmt.Sprintf("%s:%d", kind, div), "-n", fmt.Sprint(*runsFlag))
	cmd.Stderr = os.Stderr
	out, err := cmd.StdoutPipe()
	if err != nil {
		return nil, nil, nil, err
	}
	if err := cmd.Start(); err != nil {
		return nil, nil, nil, err
	}
	var loaded time.Time
	sc := bufio.NewScanner(out)
	for sc.Scan() {
		if sc.Text() == "loaded" {
			loaded = time.Now()
			continue
		}
		f := strings.Fields(sc.Text())
		if len(f) != 3 {
			return nil, nil, nil, fmt.Errorf("bad child output %q", sc.Text())
		}
		t, err1 := strconv.ParseFloat(f[0], 64)
		a, err2 := strconv.ParseFloat(f[1], 64)
		c, err3 := strconv.ParseFloat(f[2], 64)
		if err1 != nil || err2 != nil || err3 != nil {
			return nil, nil, nil, fmt.Errorf("bad child output %q", sc.Text())
		}
		times, allocs, cpus = append(times, t), append(allocs, a), append(cpus, c)
	}
	if err := cmd.Wait(); err != nil && ctx.Err() == nil {
		return nil, nil, nil, err
	}
	if len(times) == 0 && !loaded.IsZero() {
		// A lower bound on the first run, which was cut short.
		return nil, nil, nil, &cutShort{time.Since(loaded)}
	}
	return times, allocs, cpus, nil
}

// cutShort reports a case whose first run did not finish in time.
type cutShort struct{ ran time.Duration }

func (c *cutShort) Error() string { return fmt.Sprintf("first run cut short after %v", c.ran) }

// runScaleCase is the child side of scaleChild: it generates the case,
// loads it once and prints, one line per run, the analysis time and the
// heap allocations the generated package cost. Allocations are counted,
// not timed, so they do not depend on the machine's load or caches: if
// they grow linearly while the time grows faster, the difference is the
// memory hierarchy rather than extra work. The driver also analyses the
// standard-library packages the case imports (overfact exports facts);
// their share is measured on a baseline package with the same imports
// and subtracted.
func runScaleCase(spec string) error {
	kind, divText, ok := strings.Cut(spec, ":")
	div, err := strconv.Atoi(divText)
	if !ok || err != nil || div < 1 {
		return fmt.Errorf("bad case %q", spec)
	}
	dir, err := os.MkdirTemp("", "overfact-scale-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(dir)
	pkg, basePkg, err := writeCase(dir, makeCase(kind, div))
	if err != nil {
		return err
	}
	fmt.Println("loaded")
	if *profileFlag != "" {
		f, err := os.Create(*profileFlag)
		if err != nil {
			return err
		}
		defer f.Close()
		if err := pprof.StartCPUProfile(f); err != nil {
			return err
		}
		defer pprof.StopCPUProfile()
	}
	for range *runsFlag {
		baseAllocs, _, err := analyzeCounted(basePkg)
		if err != nil {
			return err
		}
		cpu0 := cpuTime()
		allocs, g, err := analyzeCounted(pkg)
		if err != nil {
			return err
		}
		cpu := cpuTime() - cpu0
		d, err := ownTime(g, pkg)
		if err != nil {
			return err
		}
		fmt.Println(d.Seconds(), int64(allocs)-int64(baseAllocs), cpu.Seconds())
	}
	return nil
}

// cpuTime returns the user and system CPU time of the process so far: on
// a machine shared with other work it moves far less than the wall time
// (the collector's work on an idle second core counts in it too).
func cpuTime() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

// analyzeCounted runs overfact on pkg and its dependencies and returns
// the number of heap allocations made meanwhile.
func analyzeCounted(pkg *packages.Package) (uint64, *checker.Graph, error) {
	var before, after runtime.MemStats
	runtime.ReadMemStats(&before)
	g, err := checker.Analyze([]*analysis.Analyzer{target}, []*packages.Package{pkg}, nil)
	runtime.ReadMemStats(&after)
	return after.Mallocs - before.Mallocs, g, err
}

func makeCase(kind string, div int) scaleCase {
	if kind == "long function" {
		n := fullLines / div
		src := bigFunc(n)
		return scaleCase{kind, "lines", strings.Count(src, "\n"), src}
	}
	n := fullFuncs / div
	return scaleCase{kind, "funcs", n, manyFuncs(n)}
}

// writeCase writes c as a module of its own, with a baseline package
// that imports what the generated one does and holds no code, and loads
// both.
func writeCase(dir string, c scaleCase) (gen, base *packages.Package, err error) {
	if err := os.Mkdir(filepath.Join(dir, "base"), 0o755); err != nil {
		return nil, nil, err
	}
	files := map[string]string{
		"go.mod":       "module example.com/gen\n\ngo 1.26\n",
		"gen.go":       c.src,
		"base/base.go": "// Package base imports what the generated package imports.\npackage base\n\nimport \"math\"\n\nvar _ = math.Pi\n",
	}
	for name, text := range files {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(text), 0o644); err != nil {
			return nil, nil, err
		}
	}
	pkgs, err := load(dir, "driver", false, []string{".", "./base"})
	if err != nil {
		return nil, nil, err
	}
	for _, p := range pkgs {
		if p.Name == "base" {
			base = p
		} else {
			gen = p
		}
	}
	if gen == nil || base == nil {
		return nil, nil, fmt.Errorf("loaded %d packages, want the generated one and its baseline", len(pkgs))
	}
	return gen, base, nil
}

// ownTime sums the durations of the actions on pkg (overfact and what it
// requires), leaving out the standard-library dependencies, whose fixed
// cost would hide how the time grows with the generated package.
func ownTime(g *checker.Graph, pkg *packages.Package) (time.Duration, error) {
	var d time.Duration
	for act := range g.All() {
		if act.Package != pkg {
			continue
		}
		if act.Err != nil {
			return 0, act.Err
		}
		d += act.Duration
	}
	return d, nil
}
