package driver

import (
	"os"
	"sort"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
)

// maxFixRounds bounds the passes of -fix. Fixes whose edits overlap
// (typically two fixes adding different imports at one place) cannot be
// applied together; rather than leave them for the user to run again,
// the driver re-analyses the fixed text and applies the fixes of the
// findings that were left over, a few times at most.
const maxFixRounds = 4

// fix applies (or, with Diff, prints) the fixes of graph's findings,
// then writes every changed file once.
func (r *run) fix(a *analysis.Analyzer, patterns []string, graph *checker.Graph) {
	if !r.ensureHelper(graph.Roots) {
		return
	}
	contents := make(map[string][]byte) // current text of each changed file
	originals := make(map[string][]byte)
	var pending map[string]int // findings whose fix was left over; nil: all
	applied := make(map[string]map[string]bool)
	var plan *fixPlan
	for round := 0; ; round++ {
		plan = planFixes(graph.Roots, pending, applied)
		for _, id := range plan.refused {
			if round == 0 {
				r.errorf("not fixing %s: the package has errors", id)
			} else {
				r.errorf("not applying the remaining fixes of %s: it no longer type-checks after the first ones", id)
			}
		}
		if !r.applyPlan(plan, contents, originals) || len(plan.leftover) == 0 || round+1 == maxFixRounds {
			break
		}
		next, ok := r.analyze(a, patterns, contents, false)
		if !ok {
			break
		}
		graph, pending = next, plan.leftover
	}
	r.writeFixed(contents, originals)
	if n := plan.leftoverCount(); n > 0 {
		r.errorf("%d fixes overlap others and were not applied; run again to apply them", n)
	}
}

// applyPlan applies a plan's edits to the current contents and reports
// whether anything changed.
func (r *run) applyPlan(plan *fixPlan, contents, originals map[string][]byte) bool {
	changed := false
	for name, edits := range plan.files {
		old, ok := contents[name]
		if !ok {
			var err error
			if old, err = os.ReadFile(name); err != nil {
				r.errorf("%v", err)
				continue
			}
			originals[name] = old
		}
		fixed, err := apply(old, edits)
		if err != nil {
			r.errorf("fixing %s: %v", name, err)
			continue
		}
		contents[name] = fixed
		changed = true
	}
	return changed
}

// writeFixed prints the diff of, or writes, every changed file.
func (r *run) writeFixed(contents, originals map[string][]byte) {
	names := make([]string, 0, len(contents))
	for name := range contents {
		names = append(names, name)
	}
	sort.Strings(names)
	for _, name := range names {
		old, fixed := originals[name], contents[name]
		if string(old) == string(fixed) {
			continue
		}
		if r.opts.Diff {
			if err := writeUnified(r.opts.Stdout, relPath(r.dir, name), old, fixed); err != nil {
				r.errorf("%v", err)
			}
			r.findings = true
			continue
		}
		if err := writeAtomic(name, fixed); err != nil {
			r.errorf("%v", err)
		}
	}
}

// withOverlay returns a copy of a whose passes read the files named in
// overlay from it. The checker's Pass.ReadFile reads the disk, but in a
// later round of -fix the syntax comes from the edited text, and an
// analyzer or fix builder that reads the source must see that text.
func withOverlay(a *analysis.Analyzer, overlay map[string][]byte) *analysis.Analyzer {
	wrapped := *a
	wrapped.Run = func(pass *analysis.Pass) (any, error) {
		disk := pass.ReadFile
		pass.ReadFile = func(name string) ([]byte, error) {
			if content, ok := overlay[name]; ok {
				return content, nil
			}
			return disk(name)
		}
		return a.Run(pass)
	}
	return &wrapped
}
