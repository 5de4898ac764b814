package driver

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/format"
	"go/token"
	"sort"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"

	"github.com/overfact/overfact/internal/textedit"
)

// An edit is a text edit of one file.
type edit struct {
	file string
	textedit.Edit
}

// fixPlan is the set of fixes taken in one round, their edits per file.
type fixPlan struct {
	files    map[string][]edit
	near     map[string]editIndex // files' edits by where they lie, to check a new edit against
	accepted map[string]bool      // fix keys, to drop the copy a test variant reports
	taken    []finding            // the findings whose fixes were taken
	takenAt  []string             // where they are and what they say, for messages
	clashed  int                  // fixes left for a later round: their edits overlap a taken fix
	deferred int                  // definitions' fixes left for a later round (see planFixes)
	refused  []string             // packages not fixed because they have errors
}

// A finding is where a diagnostic lies, by physical file and byte offset,
// and its category: what identifies it across the rounds of -fix, once
// its offset is carried through the edits of each round (see moved).
type finding struct {
	file     string
	offset   int
	category string
}

func findingOf(fset *token.FileSet, d analysis.Diagnostic) finding {
	p := fset.PositionFor(d.Pos, false)
	return finding{p.Filename, p.Offset, d.Category}
}

// planFixes selects the first suggested fix of every root diagnostic,
// skipping packages that did not type-check, generated files and the
// findings in done, whose fix was applied in an earlier round without
// silencing them (a fix is never applied twice). A fix whose edits clash
// with a taken one is left for the next round; identical edits, such as
// the same import added by two fixes, coalesce.
//
// The fixes of the categories last names (for overfact, factorial
// definitions: loops and recursions, whose fix is a range guard) are
// taken only in a round that takes nothing else. A
// guard bounds its factorial, which silences the findings of the ratios
// and terms built from it, even in other packages; a ratio whose rewrite
// was not yet offered (an analyzer may offer only so many fixes per
// analysis) would then keep the guard's panic where its rewrite gives
// the right value.
//
// When complete is set (the analyzer offered a fix for every finding it
// could fix: no budget held any back), a round whose other fixes are all
// taken, none clashing, takes the definitions' fixes too, except those in
// a function another fix of the round edits: every rewrite a guard could
// pre-empt is then in the round, and a definition judged by its own
// function is judged the same after rewrites elsewhere. That saves the
// analysis of the whole package that a round of its own would cost.
func planFixes(roots []*checker.Action, done map[finding]bool, last func(category string) bool, complete bool) *fixPlan {
	p := &fixPlan{files: make(map[string][]edit), near: make(map[string]editIndex), accepted: make(map[string]bool)}
	type candidate struct {
		fset      *token.FileSet
		d         analysis.Diagnostic
		generated map[string]bool
	}
	var definitions []candidate
	funcs := make(funcSpans)
	for _, act := range roots {
		if act.Err != nil || len(act.Diagnostics) == 0 {
			continue
		}
		if len(act.Package.Errors) > 0 || act.Package.IllTyped {
			p.refused = append(p.refused, act.Package.ID)
			continue
		}
		fset := act.Package.Fset
		generated := generatedFiles(fset, act.Package.Syntax)
		if complete {
			funcs.add(fset, act.Package.Syntax)
		}
		for _, d := range act.Diagnostics {
			if len(d.SuggestedFixes) == 0 || done[findingOf(fset, d)] {
				continue
			}
			if last != nil && last(d.Category) {
				definitions = append(definitions, candidate{fset, d, generated})
				continue
			}
			p.take(fset, d, generated)
		}
	}
	if len(p.taken) > 0 && (!complete || p.clashed > 0) {
		p.deferred = len(definitions)
		return p
	}
	edited := make(map[funcSpan]bool) // the functions the round's other fixes edit
	for name, edits := range p.files {
		for _, e := range edits {
			if fn, ok := funcs.at(name, e.Start); ok {
				edited[fn] = true
			}
		}
	}
	for _, c := range definitions {
		if len(edited) > 0 && funcs.editsAny(c.fset, c.d, edited) {
			p.deferred++
			continue
		}
		p.take(c.fset, c.d, c.generated)
	}
	return p
}

// A funcSpan is the extent of a function declaration: its file and the
// offsets of its start and end.
type funcSpan struct {
	file       string
	start, end int
}

// funcSpans lists the function declarations of files, by physical file
// name, in order.
type funcSpans map[string][]funcSpan

func (fs funcSpans) add(fset *token.FileSet, files []*ast.File) {
	for _, f := range files {
		tf := fset.File(f.FileStart)
		if tf == nil {
			continue
		}
		name := tf.Name()
		if _, ok := fs[name]; ok {
			continue // a test variant's copy of a file
		}
		spans := []funcSpan{}
		for _, d := range f.Decls {
			if fd, ok := d.(*ast.FuncDecl); ok {
				spans = append(spans, funcSpan{name, tf.Offset(fd.Pos()), tf.Offset(fd.End())})
			}
		}
		fs[name] = spans
	}
}

// at returns the function of file that holds offset off.
func (fs funcSpans) at(file string, off int) (funcSpan, bool) {
	spans := fs[file]
	i := sort.Search(len(spans), func(i int) bool { return spans[i].end > off })
	if i < len(spans) && spans[i].start <= off {
		return spans[i], true
	}
	return funcSpan{}, false
}

// editsAny reports whether d lies in, or its fix edits, one of the
// functions in edited.
func (fs funcSpans) editsAny(fset *token.FileSet, d analysis.Diagnostic, edited map[funcSpan]bool) bool {
	at := []token.Pos{d.Pos}
	for _, te := range d.SuggestedFixes[0].TextEdits {
		at = append(at, te.Pos)
	}
	for _, pos := range at {
		p := fset.PositionFor(pos, false)
		if fn, ok := fs.at(p.Filename, p.Offset); ok && edited[fn] {
			return true
		}
	}
	return false
}

// take adds the first fix of d to the plan, unless it clashes.
func (p *fixPlan) take(fset *token.FileSet, d analysis.Diagnostic, generated map[string]bool) {
	switch p.add(fset, d.SuggestedFixes[0], generated) {
	case added:
		p.taken = append(p.taken, findingOf(fset, d))
		p.takenAt = append(p.takenAt, fmt.Sprintf("%s: %s", fset.Position(d.Pos), d.Message))
	case clashed:
		p.clashed++
	}
}

func generatedFiles(fset *token.FileSet, files []*ast.File) map[string]bool {
	gen := make(map[string]bool)
	for _, f := range files {
		if ast.IsGenerated(f) {
			gen[fset.File(f.FileStart).Name()] = true
		}
	}
	return gen
}

type addResult int

const (
	added   addResult = iota
	skipped           // in a generated file, or the same fix taken already
	clashed
)

// add takes fix unless it clashes with a taken fix.
func (p *fixPlan) add(fset *token.FileSet, fix analysis.SuggestedFix, generated map[string]bool) addResult {
	var edits []edit
	for _, te := range fix.TextEdits {
		end := te.End
		if !end.IsValid() {
			end = te.Pos
		}
		// The physical file and offset: a //line directive names
		// another file, which is not the one to edit.
		s, e := fset.PositionFor(te.Pos, false), fset.PositionFor(end, false)
		if generated[s.Filename] {
			return skipped
		}
		edits = append(edits, edit{s.Filename, textedit.Edit{Start: s.Offset, End: e.Offset, Text: string(te.NewText)}})
	}
	key := fmt.Sprint(edits)
	if p.accepted[key] {
		return skipped
	}
	var fresh []edit
	for _, e := range edits {
		dup, clash := p.check(e)
		if clash {
			return clashed
		}
		if !dup {
			fresh = append(fresh, e)
		}
	}
	p.accepted[key] = true
	for _, e := range fresh {
		p.keep(e)
	}
	return added
}

// keep adds e to the taken edits of its file.
func (p *fixPlan) keep(e edit) {
	idx, ok := p.near[e.file]
	if !ok {
		idx = make(editIndex)
		p.near[e.file] = idx
	}
	idx.add(e, len(p.files[e.file]))
	p.files[e.file] = append(p.files[e.file], e)
}

// check reports whether e equals a taken edit or clashes with one: the
// first taken edit of its file, in the order taken, that does either
// decides. Only the edits near e can (see editIndex).
func (p *fixPlan) check(e edit) (dup, clash bool) {
	taken := p.files[e.file]
	first := p.near[e.file].first(e, func(i int) bool {
		return taken[i] == e || e.Clashes(taken[i].Edit)
	})
	switch {
	case first < 0:
		return false, false
	case taken[first] == e:
		return true, false
	}
	return false, true
}

// An editIndex lists the edits of one file by the stretches of
// editStretch bytes they touch, as indices into the file's edits in the
// order taken. An edit equal to another, or clashing with it (they touch
// the same bytes, or insert at one point), touches a stretch the other
// touches too, so a new edit need only be compared with the edits of its
// own stretches: a round that takes tens of thousands of fixes in one
// file would otherwise compare every edit with every other.
type editIndex map[int][]int

const editStretch = 4096

// stretches returns the first and last stretch e touches, its end
// included (an insertion touches the stretch of its point).
func stretches(e edit) (lo, hi int) {
	return e.Start / editStretch, max(e.Start, e.End) / editStretch
}

func (x editIndex) add(e edit, i int) {
	lo, hi := stretches(e)
	for s := lo; s <= hi; s++ {
		x[s] = append(x[s], i)
	}
}

// first returns the smallest index among the edits sharing a stretch
// with e for which match holds, or -1.
func (x editIndex) first(e edit, match func(i int) bool) int {
	found := -1
	lo, hi := stretches(e)
	for s := lo; s <= hi; s++ {
		for _, i := range x[s] {
			if (found < 0 || i < found) && match(i) {
				found = i
			}
		}
	}
	return found
}

// moved returns the offset in the edited text of the byte at offset off
// of the text the edits were applied to; a byte the edits replaced moves
// to the start of its replacement. eol is the file's line ending, which
// inserted text takes (textedit.Apply).
func moved(off int, edits []edit, eol string) int {
	return newShifter(edits, eol).at(off)
}

// A shifter maps offsets through one round's edits of a file: sorted
// once, with the sum of the length changes before each, so that carrying
// every finding of a file through the edits costs a binary search each
// instead of a pass over the edits.
type shifter struct {
	edits []edit
	delta []int // delta[i]: the change in length of edits[:i]
}

func newShifter(edits []edit, eol string) *shifter {
	sorted := append([]edit(nil), edits...)
	sort.SliceStable(sorted, func(i, j int) bool {
		return sorted[i].Start < sorted[j].Start || sorted[i].Start == sorted[j].Start && sorted[i].End < sorted[j].End
	})
	delta := make([]int, len(sorted)+1)
	for i, e := range sorted {
		delta[i+1] = delta[i] + len(textedit.WithLineEnding(e.Text, eol)) - (e.End - e.Start)
	}
	return &shifter{sorted, delta}
}

// at is moved(off) for the shifter's edits. The edits of a round do not
// overlap, so only the last edit starting at or before off can hold it.
func (s *shifter) at(off int) int {
	k := sort.Search(len(s.edits), func(i int) bool { return s.edits[i].Start > off })
	if k > 0 {
		if e := s.edits[k-1]; e.Start < e.End && off < e.End { // e.Start <= off < e.End
			return e.Start + s.delta[k-1]
		}
	}
	return off + s.delta[k]
}

// gofmtIfClean returns fixed gofmt-ed when the original was gofmt-clean,
// so that fixes never reformat code its author laid out by hand, and
// fixed as it is otherwise. The fixed text is formatted while the
// original is checked, on another core: on a file of megabytes each takes
// a second, and the original is nearly always clean.
func gofmtIfClean(original, fixed []byte) []byte {
	var out []byte
	var outErr error
	done := make(chan struct{})
	go func() {
		defer close(done)
		out, outErr = format.Source(fixed)
	}()
	orig, err := format.Source(original)
	<-done
	if err == nil && bytes.Equal(orig, original) && outErr == nil {
		return out
	}
	return fixed
}
