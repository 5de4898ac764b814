// Package textedit applies byte-offset edits to a file's text. It is the
// one applier of the project: the fix builder applies a fix to check that
// the result type-checks, the command applies the fixes it writes, and the
// fuzz target applies every fix it tries, all through Apply, so that the
// three can never disagree about what a set of edits produces.
package textedit

import (
	"bytes"
	"fmt"
	"sort"
	"strings"
)

// An Edit replaces bytes [Start, End) of a file by Text; Start == End is
// an insertion.
type Edit struct {
	Start, End int
	Text       string
}

// Clashes reports whether e and f, taken from two different fixes, cannot
// both be applied: they touch the same bytes, or both insert at one
// point, where nothing orders the two insertions. Within one fix,
// insertions at one point apply in the fix's order and do not clash.
func (e Edit) Clashes(f Edit) bool {
	if e.Start == e.End && f.Start == f.End {
		return e.Start == f.Start
	}
	return e.Start < f.End && f.Start < e.End
}

// Apply returns src with the edits applied. The edits are taken in order
// of Start, keeping the given order among edits that start at one offset
// (so an insertion listed before a replacement at its start goes first).
// Edits that overlap or fall outside src are an error.
//
// Inserted text takes the file's line endings: in a file whose lines end
// in CRLF, every line break of the inserted text becomes CRLF (see
// LineEnding), so that a fix never leaves a file with mixed endings.
func Apply(src []byte, edits []Edit) ([]byte, error) {
	sorted := append([]Edit(nil), edits...)
	// At one position, an insertion comes before a replacement that
	// starts there (an import added before the declaration it edits).
	sort.SliceStable(sorted, func(i, j int) bool {
		return sorted[i].Start < sorted[j].Start || sorted[i].Start == sorted[j].Start && sorted[i].End < sorted[j].End
	})
	eol := LineEnding(src)
	var out bytes.Buffer
	out.Grow(len(src))
	last := 0
	for _, e := range sorted {
		if e.Start < last || e.End < e.Start || e.End > len(src) {
			return nil, fmt.Errorf("edit [%d,%d) overlaps another or lies outside the file's %d bytes", e.Start, e.End, len(src))
		}
		out.Write(src[last:e.Start])
		out.WriteString(WithLineEnding(e.Text, eol))
		last = e.End
	}
	out.Write(src[last:])
	return out.Bytes(), nil
}

// LineEnding returns the line ending of src: "\r\n" when its first line
// ends in CRLF, "\n" otherwise (a file with mixed endings is judged by its
// first line, as editors commonly do).
func LineEnding(src []byte) string {
	i := bytes.IndexByte(src, '\n')
	if i > 0 && src[i-1] == '\r' {
		return "\r\n"
	}
	return "\n"
}

// WithLineEnding returns text with every line break written as eol.
func WithLineEnding(text, eol string) string {
	if eol == "\n" || !strings.Contains(text, "\n") {
		return text
	}
	return strings.ReplaceAll(strings.ReplaceAll(text, "\r\n", "\n"), "\n", eol)
}
