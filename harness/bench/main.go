// Command bench measures what overfact costs on real and generated code.
//
// It has three modes:
//
//	bench -mode compare [-dir D] [-n 5] PATTERNS
//		times the overfact analyzer against an inspect-only no-op
//		analyzer under the same driver (go/analysis/checker) on the same
//		packages, and prints the ratios of wall time and peak memory, both
//		for the analysis step alone and for the whole run (load+analyze).
//	bench -mode scale [-n 5] [-casetime 5m]
//		generates one long function and a package of many small factorial
//		functions at three sizes and prints how analysis time grows; each
//		size runs in a child process cut off after -casetime.
//	bench -scalecase "long function:16" [-n 5] [-cpuprofile F]
//		measures one of those sizes (kind:divisor of the full size) in this
//		process and prints each run's analysis time in seconds.
//	bench -mode loadcmp [-dir D] PATTERNS
//		runs overfact over the packages with every dependency loaded from
//		source and loaded as the command loads them, and fails unless
//		the diagnostics, fixes and facts are the same.
//	bench -mode genfile -dir D [-size 5242880]
//		writes a module of one package into D whose one file is at least
//		size bytes of generated factorial functions.
//	bench -mode edges -overfact CMD [-baseline CMD2] [-n 5]
//		runs the command as "overfact std" (tests included), on one 5 MB
//		generated file and with -fix on it, and prints wall time and peak
//		memory (medians of n runs) against their targets; with -baseline,
//		alternates the two commands and prints their ratios.
//	bench -mode corpus [-dir D] PATTERNS
//		runs overfact (tests included) over the packages and prints the
//		package count, crashes, analyzer errors and every finding.
//
// Package loading uses go/packages from directory D (the current one by
// default), so PATTERNS are resolved in the module found there.
package main

import (
	"flag"
	"fmt"
	"os"
	"time"
)

var (
	modeFlag     = flag.String("mode", "compare", "what to measure: compare, scale, loadcmp, genfile, edges or corpus")
	dirFlag      = flag.String("dir", "", "directory packages are loaded from (default: current)")
	runsFlag     = flag.Int("n", 5, "number of timed runs per side; the median is reported")
	testsFlag    = flag.Bool("tests", true, "include test packages")
	loadFlag     = flag.String("load", "driver", "how overfact's packages are loaded: driver (as the command does: source for the dependencies that may carry facts, export data for the rest), source (every dependency from source) or roots (export data for every dependency)")
	childFlag    = flag.String("child", "", "internal: run one side (noop or overfact) once and report JSON; fix: run the command's -fix once")
	jsonFlag     = flag.Bool("json", false, "corpus mode: print findings as JSON lines")
	overfactFlag = flag.String("overfact", "", "edges mode: the overfact `command` to run")
	baseFlag     = flag.String("baseline", "", "edges mode: an overfact `command` to alternate with -overfact, for ratios under the same load")
	sizeFlag     = flag.Int("size", 5<<20, "genfile mode: size in bytes of the file written")
	helperFlag   = flag.String("helper", "fixes/lgamma", "edges mode: the helper module's `dir` (of this checkout), copied into the generated module for -fix")

	caseTimeFlag  = flag.Duration("casetime", 5*time.Minute, "scale mode: time allowed for the runs of one size")
	profileFlag   = flag.String("cpuprofile", "", "with -scalecase or -child: write a CPU profile of the analysis runs (of the whole run with -child) to this file")
	memProfFlag   = flag.String("memprofile", "", "with -child: write a heap profile, taken when the analysis ends, to this file")
	scaleCaseFlag = flag.String("scalecase", "", "internal: measure one scale case (kind:divisor) and print run times")
)

func main() {
	flag.Usage = func() {
		fmt.Fprintf(os.Stderr, "usage: bench [-mode compare|scale|corpus] [flags] [packages]\n")
		flag.PrintDefaults()
	}
	flag.Parse()
	var err error
	switch {
	case *scaleCaseFlag != "":
		err = runScaleCase(*scaleCaseFlag)
	case *childFlag != "":
		err = runChild(*childFlag, flag.Args())
	case *modeFlag == "compare":
		err = compare(flag.Args())
	case *modeFlag == "scale":
		err = scale()
	case *modeFlag == "corpus":
		err = corpus(flag.Args())
	case *modeFlag == "loadcmp":
		err = loadcmp(flag.Args())
	case *modeFlag == "genfile":
		err = genFile(*dirFlag, *sizeFlag)
	case *modeFlag == "edges":
		err = edges(*overfactFlag, *baseFlag, *runsFlag)
	default:
		err = fmt.Errorf("unknown mode %q", *modeFlag)
	}
	if err != nil {
		fmt.Fprintln(os.Stderr, "bench:", err)
		os.Exit(1)
	}
}
