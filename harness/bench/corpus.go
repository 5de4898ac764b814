package main

import (
	"cmp"
	"encoding/json"
	"fmt"
	"go/token"
	"os"
	"path/filepath"
	"runtime/debug"
	"slices"
	"strings"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
)

// finding is one diagnostic of a corpus run, deduplicated across the
// package variants (p, p [p.test], p_test) that share a file.
type finding struct {
	Pos      string `json:"pos"`
	Category string `json:"category,omitempty"`
	Message  string `json:"message"`
	Fixes    int    `json:"fixes"`

	pos token.Position
}

// panicError marks an analyzer run that panicked, so crashes are counted
// apart from errors the analyzer returned.
type panicError struct {
	val   any
	stack []byte
}

func (e *panicError) Error() string { return fmt.Sprintf("panic: %v\n%s", e.val, e.stack) }

// guarded returns a copy of a whose Run turns a panic into a panicError:
// checker.Analyze runs actions on goroutines and would otherwise lose the
// whole corpus run to one crash.
func guarded(a *analysis.Analyzer) *analysis.Analyzer {
	g := *a
	run := a.Run
	g.Run = func(pass *analysis.Pass) (res any, err error) {
		defer func() {
			if v := recover(); v != nil {
				err = &panicError{v, debug.Stack()}
			}
		}()
		return run(pass)
	}
	return &g
}

func corpus(patterns []string) error {
	if len(patterns) == 0 {
		return fmt.Errorf("no packages given")
	}
	a := guarded(target)
	pkgs, err := load(*dirFlag, *loadFlag, *testsFlag, patterns)
	if err != nil {
		return err
	}
	var g *checker.Graph
	recovered, err := countRecovered(func() error {
		var err error
		g, err = checker.Analyze([]*analysis.Analyzer{a}, pkgs, nil)
		return err
	})
	if err != nil {
		return err
	}
	crashes, errs, actions := recovered, 0, 0
	seen := map[string]bool{}
	var found []finding
	for act := range g.All() {
		if act.Analyzer != a {
			continue
		}
		actions++
		if pe, ok := act.Err.(*panicError); ok {
			crashes++
			fmt.Fprintf(os.Stderr, "CRASH in %s: %v\n", act.Package.ID, pe)
		} else if act.Err != nil {
			errs++
			fmt.Fprintf(os.Stderr, "ERROR in %s: %v\n", act.Package.ID, act.Err)
		}
		if !act.IsRoot {
			continue // drivers report findings of the named packages only
		}
		for _, d := range act.Diagnostics {
			p := act.Package.Fset.Position(d.Pos)
			f := finding{shortPos(p.String()), d.Category, d.Message, len(d.SuggestedFixes), p}
			key := f.Pos + "\x00" + f.Message
			if !seen[key] {
				seen[key] = true
				found = append(found, f)
			}
		}
	}
	slices.SortFunc(found, func(x, y finding) int {
		if c := strings.Compare(x.pos.Filename, y.pos.Filename); c != 0 {
			return c
		}
		return cmp.Compare(x.pos.Offset, y.pos.Offset)
	})
	fmt.Printf("patterns %v (tests=%v): %d root packages, %d analyzer actions (dependencies included), %d crashes (%d of them recovered inside the analyzer), %d analyzer errors, %d findings\n",
		patterns, *testsFlag, len(pkgs), actions, crashes, recovered, errs, len(found))
	for _, f := range found {
		if *jsonFlag {
			b, _ := json.Marshal(f)
			fmt.Println(string(b))
			continue
		}
		fmt.Printf("%s: %s (%d fixes)\n", f.Pos, f.Message, f.Fixes)
	}
	if crashes+errs > 0 {
		return fmt.Errorf("%d crashes, %d analyzer errors", crashes, errs)
	}
	return nil
}

// shortPos trims the module cache and GOROOT prefixes so positions read
// the same on every machine.
func shortPos(pos string) string {
	for _, env := range []string{"GOMODCACHE", "GOROOT"} {
		if root := goEnv(env); root != "" {
			if rest, ok := strings.CutPrefix(pos, root+string(filepath.Separator)); ok {
				return "$" + env + "/" + rest
			}
		}
	}
	return pos
}

// countRecovered runs f with the analyzer's debug flag on, if it has one,
// and standard error sent to a file, and counts the functions the analyzer
// reports having skipped after an internal error: those are panics it
// recovered from, and count as crashes here. The log is copied to the
// real standard error.
func countRecovered(f func() error) (int, error) {
	if fl := target.Flags.Lookup("debug"); fl != nil {
		if err := fl.Value.Set("true"); err != nil {
			return 0, err
		}
	}
	log, err := os.CreateTemp("", "overfact-corpus-log")
	if err != nil {
		return 0, err
	}
	defer os.Remove(log.Name())
	defer log.Close()
	stderr := os.Stderr
	os.Stderr = log
	err = f()
	os.Stderr = stderr
	text, rerr := os.ReadFile(log.Name())
	if rerr != nil {
		return 0, rerr
	}
	os.Stderr.Write(text)
	return strings.Count(string(text), "internal error"), err
}
