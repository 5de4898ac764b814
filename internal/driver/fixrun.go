package driver

import (
	"fmt"
	"os"
	"sort"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"

	"github.com/overfact/overfact/internal/textedit"
)

// maxFixRounds bounds the rounds of -fix. A round applies every fix it
// can; fixes whose edits overlap a taken one (typically two fixes adding
// different imports at one place), and the findings an analyzer offered
// no fix for yet (where a budget of fix checks holds fixes back: the
// command lifts overfact's for -fix), are left for the next round, which
// re-analyses the edited text in memory. Rounds go on until one finds
// nothing left to apply, 16 at most.
const maxFixRounds = 16

// maxHeldBackShown bounds the findings a run lists when it stops with
// fixes still to apply; the rest are counted.
const maxHeldBackShown = 10

// fix applies (or, with Diff, prints) the fixes of graph's findings, in
// rounds, then writes every changed file, or none.
func (r *run) fix(a *analysis.Analyzer, patterns []string, graph *checker.Graph) {
	if !r.ensureHelper(graph.Roots) {
		return
	}
	contents := make(map[string][]byte)  // edited text of each changed file
	originals := make(map[string][]byte) // its analysed text
	done := make(map[finding]bool)       // findings whose fix was applied
	broken := brokenRoots(graph.Roots)   // packages with errors before any fix
	for round := 1; ; round++ {
		plan := planFixes(graph.Roots, done, r.opts.FixLast, r.opts.FixesComplete)
		if round == 1 {
			for _, id := range plan.refused {
				r.errorf("not fixing %s: the package has errors", id)
			}
		}
		if len(plan.taken) == 0 {
			break
		}
		if round > maxFixRounds {
			r.heldBack(plan)
			break
		}
		if !r.applyPlan(plan, contents, originals, done) {
			return
		}
		next, ok := r.analyze(a, patterns, contents, false)
		if !ok {
			r.errorf("%s", r.nothingDone())
			return
		}
		// The fixed text is checked before it is written: a package
		// that no longer loads (an import the module cannot resolve,
		// such as a helper module it does not require) or type-checks
		// is never written.
		for id, first := range brokenRoots(next.Roots) {
			if _, ok := broken[id]; !ok {
				r.errorf("the fixed code of %s does not build: %s; %s", id, first, r.nothingDone())
				return
			}
		}
		graph = next
	}
	changes := changedFiles(contents, originals)
	if r.opts.Diff {
		r.printDiffs(changes)
		return
	}
	r.writeFixed(changes)
}

// brokenRoots returns the root packages that have errors, each with its
// first error.
func brokenRoots(roots []*checker.Action) map[string]string {
	out := make(map[string]string)
	for _, act := range roots {
		pkg := act.Package
		switch {
		case len(pkg.Errors) > 0:
			out[pkg.ID] = pkg.Errors[0].Error()
		case pkg.IllTyped:
			out[pkg.ID] = "the package does not type-check"
		}
	}
	return out
}

// applyPlan applies a plan's edits to the current contents and carries
// the applied findings through them. It reports false, having said why,
// when a file no longer holds the text that was analysed: nothing is
// written then.
func (r *run) applyPlan(plan *fixPlan, contents, originals map[string][]byte, done map[finding]bool) bool {
	names := make([]string, 0, len(plan.files))
	pruned := make(map[string][]edit) // imports the round's fixes emptied, by file
	for name := range plan.files {
		names = append(names, name)
	}
	sort.Strings(names)
	for _, name := range names {
		old, ok := contents[name]
		if !ok {
			var err error
			if old, err = os.ReadFile(name); err == nil {
				err = r.src.check(name, old)
			}
			if err != nil {
				r.errorf("%v; %s", err, r.nothingDone())
				return false
			}
			originals[name] = old
		}
		fixed, err := textedit.Apply(old, textEdits(plan.files[name]))
		if err == nil {
			if prune := textedit.EmptiedImports(originals[name], fixed); len(prune) > 0 {
				for _, e := range prune {
					pruned[name] = append(pruned[name], edit{file: name, Edit: e})
				}
				fixed, err = textedit.Apply(fixed, prune)
			}
		}
		if err != nil {
			r.errorf("fixing %s: %v; %s", name, err, r.nothingDone())
			return false
		}
		contents[name] = fixed
	}
	for _, f := range plan.taken {
		done[f] = true
	}
	var all []finding
	for f := range done {
		all = append(all, f)
	}
	clear(done)
	type shift struct{ edits, pruned *shifter }
	shifts := make(map[string]shift) // by file, made once per round
	for _, f := range all {
		if edits, ok := plan.files[f.file]; ok {
			sh, ok := shifts[f.file]
			if !ok {
				eol := textedit.LineEnding(originals[f.file])
				sh = shift{newShifter(edits, eol), newShifter(pruned[f.file], eol)}
				shifts[f.file] = sh
			}
			f.offset = sh.pruned.at(sh.edits.at(f.offset))
		}
		done[f] = true
	}
	return true
}

func textEdits(edits []edit) []textedit.Edit {
	out := make([]textedit.Edit, len(edits))
	for i, e := range edits {
		out[i] = e.Edit
	}
	return out
}

// nothingDone says that a run stopped before writing (or printing)
// anything.
func (r *run) nothingDone() string {
	if r.opts.Diff {
		return "no diff printed"
	}
	return "no file written"
}

// heldBack reports the fixes still offered after the last round.
func (r *run) heldBack(plan *fixPlan) {
	n, what := len(plan.taken)+plan.clashed+plan.deferred, "fixes were"
	if n == 1 {
		what = "fix was"
	}
	r.errorf("stopped after %d rounds of fixes: %d more %s offered and held back; run -fix again to apply them (positions in the fixed text):", maxFixRounds, n, what)
	for i, where := range plan.takenAt {
		if i == maxHeldBackShown {
			fmt.Fprintf(r.opts.Stderr, "\t... and %d more\n", len(plan.takenAt)-i)
			break
		}
		fmt.Fprintf(r.opts.Stderr, "\t%s\n", where)
	}
}

// A change is one file's analysed text and its fixed text.
type change struct {
	name     string
	old, new []byte
}

// changedFiles lists the files the fixes change, in name order, gofmt-ing
// the fixed text of files that were gofmt-clean.
func changedFiles(contents, originals map[string][]byte) []change {
	var out []change
	for name, fixed := range contents {
		old := originals[name]
		fixed = gofmtIfClean(old, fixed)
		if string(old) != string(fixed) {
			out = append(out, change{name, old, fixed})
		}
	}
	sort.Slice(out, func(i, j int) bool { return out[i].name < out[j].name })
	return out
}

// printDiffs prints the unified diff of every change.
func (r *run) printDiffs(changes []change) {
	for _, c := range changes {
		if err := writeUnified(r.opts.Stdout, relPath(r.dir, c.name), c.old, c.new); err != nil {
			r.errorf("%v", err)
		}
		r.findings = true
	}
}
