package main

import (
	"bufio"
	"context"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"runtime/pprof"
	"strconv"
	"strings"
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
		var base float64
		for _, div := range []int{16, 4, 1} {
			c := makeCase(kind, div)
			times, err := scaleChild(kind, div)
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
			if base == 0 {
				base = per
			}
			fmt.Printf("  %-15s %6d %-5s %2d×  %d runs, median %.2fs, per 1000 %s %.3fms, per-unit ratio to 1× %s\n",
				kind, c.units, c.unit, 16/div, len(times), median(times), c.unit, per*1e6, ratio(per, base))
		}
	}
	return nil
}

// scaleChild measures one case in a child process, which is killed when
// the case's time is up: checker.Analyze cannot be interrupted, and a
// superlinear analyzer would otherwise never finish the largest cases.
// It returns the analysis times of the runs that finished.
func scaleChild(kind string, div int) ([]float64, error) {
	exe, err := os.Executable()
	if err != nil {
		return nil, err
	}
	ctx, cancel := context.WithTimeout(context.Background(), *caseTimeFlag)
	defer cancel()
	cmd := exec.CommandContext(ctx, exe, "-scalecase", fmt.Sprintf("%s:%d", kind, div), "-n", fmt.Sprint(*runsFlag))
	cmd.Stderr = os.Stderr
	out, err := cmd.StdoutPipe()
	if err != nil {
		return nil, err
	}
	if err := cmd.Start(); err != nil {
		return nil, err
	}
	var times []float64
	var loaded time.Time
	sc := bufio.NewScanner(out)
	for sc.Scan() {
		if sc.Text() == "loaded" {
			loaded = time.Now()
			continue
		}
		t, err := strconv.ParseFloat(sc.Text(), 64)
		if err != nil {
			return nil, fmt.Errorf("bad child output %q", sc.Text())
		}
		times = append(times, t)
	}
	if err := cmd.Wait(); err != nil && ctx.Err() == nil {
		return nil, err
	}
	if len(times) == 0 && !loaded.IsZero() {
		// A lower bound on the first run, which was cut short.
		return nil, &cutShort{time.Since(loaded)}
	}
	return times, nil
}

// cutShort reports a case whose first run did not finish in time.
type cutShort struct{ ran time.Duration }

func (c *cutShort) Error() string { return fmt.Sprintf("first run cut short after %v", c.ran) }

// runScaleCase is the child side of scaleChild: it generates the case,
// loads it once and prints the analysis time of each run, one per line.
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
	pkg, err := writeCase(dir, makeCase(kind, div))
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
		g, err := checker.Analyze([]*analysis.Analyzer{target}, []*packages.Package{pkg}, nil)
		if err != nil {
			return err
		}
		d, err := ownTime(g, pkg)
		if err != nil {
			return err
		}
		fmt.Println(d.Seconds())
	}
	return nil
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

// writeCase writes c as a module of its own and loads it.
func writeCase(dir string, c scaleCase) (*packages.Package, error) {
	files := map[string]string{
		"go.mod": "module example.com/gen\n\ngo 1.26\n",
		"gen.go": c.src,
	}
	for name, text := range files {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(text), 0o644); err != nil {
			return nil, err
		}
	}
	mode, err := loadMode("auto", []*analysis.Analyzer{target})
	if err != nil {
		return nil, err
	}
	pkgs, err := load(dir, mode, false, []string{"."})
	if err != nil {
		return nil, err
	}
	return pkgs[0], nil
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
