package fuzz

import (
	"fmt"
	"go/token"
	"slices"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/internal/textedit"
)

// edit is a TextEdit resolved to byte offsets in one file.
type edit struct {
	file       string
	start, end int
	text       string
}

// resolve turns the edits of fix into offsets, rejecting edits that fall
// outside the package's files or overlap each other, which the go/analysis
// contract forbids within one fix. Identical edits are merged, as the
// x/tools drivers do.
func resolve(fset *token.FileSet, src map[string][]byte, fix analysis.SuggestedFix) ([]edit, error) {
	var out []edit
	for _, te := range fix.TextEdits {
		tf := fset.File(te.Pos)
		if tf == nil {
			return nil, fmt.Errorf("edit at %d is in no file", te.Pos)
		}
		end := te.End
		if !end.IsValid() {
			end = te.Pos
		}
		if fset.File(end) != tf {
			return nil, fmt.Errorf("edit %s spans files", fset.Position(te.Pos))
		}
		name := tf.Name()
		if _, ok := src[name]; !ok {
			return nil, fmt.Errorf("edit in %s, not a file of the package", name)
		}
		e := edit{name, tf.Offset(te.Pos), tf.Offset(end), string(te.NewText)}
		if e.start > e.end || e.end > len(src[name]) {
			return nil, fmt.Errorf("edit %s has bad range [%d,%d)", fset.Position(te.Pos), e.start, e.end)
		}
		out = append(out, e)
	}
	sortEdits(out)
	out = slices.Compact(out)
	if i := firstOverlap(out); i >= 0 {
		return nil, fmt.Errorf("overlapping edits at %s offsets %d and %d", out[i].file, out[i].start, out[i+1].start)
	}
	return out, nil
}

func sortEdits(es []edit) {
	slices.SortStableFunc(es, func(a, b edit) int {
		if a.file != b.file {
			if a.file < b.file {
				return -1
			}
			return 1
		}
		if a.start != b.start {
			return a.start - b.start
		}
		return a.end - b.end
	})
}

// firstOverlap returns the index i of the first sorted edit that overlaps
// edit i+1, or -1. As in x/tools' diff package, insertions at one offset
// do not overlap: they apply in order.
func firstOverlap(es []edit) int {
	for i := 0; i+1 < len(es); i++ {
		a, b := es[i], es[i+1]
		if a.file == b.file && b.start < a.end {
			return i
		}
	}
	return -1
}

// apply returns a copy of src with the sorted, non-overlapping edits done,
// by the applier the command writes fixes with.
func apply(src map[string][]byte, es []edit) map[string][]byte {
	out := make(map[string][]byte, len(src))
	byFile := make(map[string][]textedit.Edit)
	for _, e := range es {
		byFile[e.file] = append(byFile[e.file], e.edit())
	}
	for name, b := range src {
		out[name] = b
		if mine := byFile[name]; len(mine) > 0 {
			fixed, err := textedit.Apply(b, mine)
			if err == nil {
				// As the command does after each round of fixes.
				fixed, err = textedit.Apply(fixed, textedit.EmptiedImports(b, fixed))
			}
			if err != nil {
				panic(err) // resolve and merge let no such edit through
			}
			out[name] = fixed
		}
	}
	return out
}

func (e edit) edit() textedit.Edit { return textedit.Edit{Start: e.start, End: e.end, Text: e.text} }

// merge adds the edits of next to those already chosen, unless one of
// them clashes with a chosen edit; it reports whether next was taken.
// Between fixes the rule is stricter than within one: two different
// insertions at one point clash, since nothing orders them. Identical
// edits coalesce. This is how -fix combines the fixes of a run.
func merge(chosen, next []edit) ([]edit, bool) {
	var fresh []edit
	for _, e := range next {
		dup := false
		for _, c := range chosen {
			if c == e {
				dup = true
				break
			}
			if clash(c, e) {
				return chosen, false
			}
		}
		if !dup {
			fresh = append(fresh, e)
		}
	}
	all := append(slices.Clone(chosen), fresh...)
	sortEdits(all)
	return all, true
}

// clash reports whether edits of two different fixes touch the same bytes
// or insert at the same point.
func clash(a, b edit) bool {
	return a.file == b.file && a.edit().Clashes(b.edit())
}
