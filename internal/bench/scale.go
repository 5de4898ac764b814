package main

import (
	"fmt"
	"os"
	"path/filepath"
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
	dir, err := os.MkdirTemp("", "overfact-scale-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(dir)
	fmt.Printf("analysis time of overfact (median of %d) against input size\n", *runsFlag)
	for _, kind := range []string{"long function", "many functions"} {
		var base float64
		for _, div := range []int{16, 4, 1} {
			c := makeCase(kind, div)
			per, err := measureCase(dir, c)
			if err != nil {
				return fmt.Errorf("%s 1/%d: %v", kind, div, err)
			}
			if base == 0 {
				base = per
			}
			fmt.Printf("  %-15s %6d %-5s %2d×  per 1000 %s %.3fms  per-unit ratio to 1× %s\n",
				kind, c.units, c.unit, 16/div, c.unit, per*1000*1000, ratio(per, base))
		}
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

// measureCase writes c as a module of its own, loads it once and returns
// the median analysis time per unit, in seconds.
func measureCase(root string, c scaleCase) (float64, error) {
	dir, err := os.MkdirTemp(root, "m")
	if err != nil {
		return 0, err
	}
	files := map[string]string{
		"go.mod": "module example.com/gen\n\ngo 1.26\n",
		"gen.go": c.src,
	}
	for name, text := range files {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(text), 0o644); err != nil {
			return 0, err
		}
	}
	mode, err := loadMode("auto", []*analysis.Analyzer{target})
	if err != nil {
		return 0, err
	}
	pkgs, err := load(dir, mode, false, []string{"."})
	if err != nil {
		return 0, err
	}
	var times []float64
	for range *runsFlag {
		g, err := checker.Analyze([]*analysis.Analyzer{target}, pkgs, nil)
		if err != nil {
			return 0, err
		}
		d, err := ownTime(g, pkgs[0])
		if err != nil {
			return 0, err
		}
		times = append(times, seconds(d))
	}
	return median(times) / float64(c.units), nil
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
