// Command realcorpus is the harness of overfact's real-code corpus: hand
// labels of the functions with factorial-like arithmetic in published
// modules (testdata/realcorpus/labels.tsv), in two dimensions (overflow:
// BAD or SAFE; digits lost by exponentials of log-gamma sums: DIGITS-BAD
// or DIGITS-SAFE), probes that show each BAD and DIGITS-BAD function's
// wrong value against math/big, and the score of overfact's findings
// against the labels. scripts/realcorpus.sh drives it; the
// third-party source is fetched from the module proxy and never stored
// in this repository.
//
// Usage:
//
//	realcorpus funcs DIR
//		lists the functions of the non-test Go files under DIR with
//		their lines (what labels name).
//	realcorpus probes -labels FILE -helpers DIR MODULE MODDIR
//		writes the probe tests of MODULE's BAD and DIGITS-BAD labels into MODDIR, a
//		writable copy of the module, and prints the probed packages.
//	realcorpus score -labels FILE -modules FILE MODULE@VERSION MODDIR JSONFILE ...
//		matches the findings of overfact -json (JSONFILE) to the labels
//		and prints a table per dimension, the false positives and the
//		missed BAD functions, and the dimensions combined.
//	realcorpus after-write -labels FILE -grids FILE -helpers DIR MODULE ORIGDIR FIXEDDIR
//		writes the after-fix test of MODULE's overflow labels (every BAD
//		probe, a grid of inputs for each labelled function) into both
//		copies of the module, the original and the one overfact -fix
//		changed, and prints the packages written.
//	realcorpus after-compare -labels FILE (MODULE ORIGDIR FIXEDDIR ORIGOUT FIXEDOUT)...
//		compares the outputs of the after-fix test in the two copies and
//		prints per module and in total the BAD functions right after the
//		fix, still wrong and newly failing, and the SAFE functions changed.
package main

import (
	"flag"
	"fmt"
	"os"
	"strings"
)

func main() {
	if len(os.Args) < 2 {
		usage()
	}
	var err error
	switch os.Args[1] {
	case "funcs":
		err = cmdFuncs(os.Args[2:])
	case "probes":
		err = cmdProbes(os.Args[2:])
	case "score":
		err = cmdScore(os.Args[2:])
	case "after-write":
		err = cmdAfterWrite(os.Args[2:])
	case "after-compare":
		err = cmdAfterCompare(os.Args[2:])
	default:
		usage()
	}
	if err != nil {
		fmt.Fprintln(os.Stderr, "realcorpus:", err)
		os.Exit(1)
	}
}

func usage() {
	fmt.Fprintln(os.Stderr, "usage: realcorpus funcs DIR | probes -labels F -helpers D MODULE MODDIR | score -labels F -modules F (MODULE@VERSION MODDIR JSON)... | after-write -labels F -grids F -helpers D MODULE ORIG FIXED | after-compare -labels F (MODULE ORIG FIXED ORIGOUT FIXEDOUT)...")
	os.Exit(2)
}

func cmdFuncs(args []string) error {
	if len(args) != 1 {
		usage()
	}
	spans, err := moduleSpans(args[0])
	if err != nil {
		return err
	}
	for _, s := range spans {
		fmt.Printf("%s\t%d\t%d\t%s\n", s.File, s.Start, s.End, s.Func)
	}
	return nil
}

func cmdProbes(args []string) error {
	fs := flag.NewFlagSet("probes", flag.ExitOnError)
	labelsPath := fs.String("labels", "testdata/realcorpus/labels.tsv", "labels file")
	helpers := fs.String("helpers", "testdata/realcorpus/helpers", "directory of per-package probe helpers")
	fs.Parse(args)
	if fs.NArg() != 2 {
		usage()
	}
	labels, err := readLabels(*labelsPath)
	if err != nil {
		return err
	}
	pkgs, err := writeProbes(labels, fs.Arg(0), fs.Arg(1), *helpers)
	if err != nil {
		return err
	}
	fmt.Println(strings.Join(pkgs, " "))
	return nil
}

func cmdScore(args []string) error {
	fs := flag.NewFlagSet("score", flag.ExitOnError)
	labelsPath := fs.String("labels", "testdata/realcorpus/labels.tsv", "labels file")
	modulesPath := fs.String("modules", "testdata/realcorpus/modules.tsv", "modules file")
	fs.Parse(args)
	if fs.NArg() == 0 || fs.NArg()%3 != 0 {
		usage()
	}
	labels, err := readLabels(*labelsPath)
	if err != nil {
		return err
	}
	mods, err := readModules(*modulesPath)
	if err != nil {
		return err
	}
	if err := checkCorpus(labels, mods); err != nil {
		return err
	}
	var runs []moduleRun
	for i := 0; i < fs.NArg(); i += 3 {
		mod, ver, ok := strings.Cut(fs.Arg(i), "@")
		if !ok {
			return fmt.Errorf("%q is not MODULE@VERSION", fs.Arg(i))
		}
		data, err := os.ReadFile(fs.Arg(i + 2))
		if err != nil {
			return err
		}
		found, errs, err := readFindings(data, fs.Arg(i+1))
		if err != nil {
			return fmt.Errorf("%s: %v", fs.Arg(i+2), err)
		}
		runs = append(runs, moduleRun{Module: mod, Version: ver, Dir: fs.Arg(i + 1), Findings: found, Errors: errs})
	}
	return score(os.Stdout, labels, runs)
}

func cmdAfterWrite(args []string) error {
	fs := flag.NewFlagSet("after-write", flag.ExitOnError)
	labelsPath := fs.String("labels", "testdata/realcorpus/labels.tsv", "labels file")
	gridsPath := fs.String("grids", "testdata/realcorpus/grids.tsv", "grids file")
	helpers := fs.String("helpers", "testdata/realcorpus/helpers", "directory of per-package probe helpers")
	fs.Parse(args)
	if fs.NArg() != 3 {
		usage()
	}
	labels, err := readLabels(*labelsPath)
	if err != nil {
		return err
	}
	grids, err := readGrids(*gridsPath)
	if err != nil {
		return err
	}
	module, orig, fixed := fs.Arg(0), fs.Arg(1), fs.Arg(2)
	var pkgs []string
	for _, dir := range []string{orig, fixed} {
		if pkgs, err = writeAfter(labels, grids, module, dir, orig, *helpers); err != nil {
			return err
		}
	}
	fmt.Println(strings.Join(pkgs, " "))
	return nil
}

func cmdAfterCompare(args []string) error {
	fs := flag.NewFlagSet("after-compare", flag.ExitOnError)
	labelsPath := fs.String("labels", "testdata/realcorpus/labels.tsv", "labels file")
	fs.Parse(args)
	if fs.NArg() == 0 || fs.NArg()%5 != 0 {
		usage()
	}
	labels, err := readLabels(*labelsPath)
	if err != nil {
		return err
	}
	var mods []moduleAfter
	for i := 0; i < fs.NArg(); i += 5 {
		m := moduleAfter{Module: fs.Arg(i)}
		if m.ChangedFuncs, err = changedFuncs(labels, m.Module, fs.Arg(i+1), fs.Arg(i+2)); err != nil {
			return err
		}
		for j, run := range []*afterRun{&m.Orig, &m.Fixed} {
			f, err := os.Open(fs.Arg(i + 3 + j))
			if err != nil {
				return err
			}
			*run, err = readAfter(f)
			f.Close()
			if err != nil {
				return fmt.Errorf("%s: %v", fs.Arg(i+3+j), err)
			}
		}
		mods = append(mods, m)
	}
	compareAfter(os.Stdout, labels, mods)
	return nil
}
