package driver

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/format"
	"go/token"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
)

// An edit replaces bytes [start, end) of a file by text.
type edit struct {
	file       string
	start, end int
	text       string
}

// overlaps reports whether two edits of one file touch the same bytes;
// two insertions at one point conflict too, since their order is unknown.
func (e edit) overlaps(f edit) bool {
	if e.file != f.file {
		return false
	}
	if e.start == e.end && f.start == f.end {
		return e.start == f.start
	}
	return e.start < f.end && f.start < e.end
}

// fixPlan is the set of accepted edits, per file.
type fixPlan struct {
	files    map[string][]edit
	accepted map[string]bool // fix keys, to drop the copy a test variant reports
	// leftover counts, by findingKey, the findings whose fix clashed
	// with an accepted one.
	leftover map[string]int
	refused  []string // packages not fixed because they have errors
}

// findingKey identifies a finding across re-analyses of edited text,
// where its position moves but its file, category and message do not.
func findingKey(fset *token.FileSet, d analysis.Diagnostic) string {
	return fset.Position(d.Pos).Filename + "\x00" + d.Category + "\x00" + d.Message
}

// fixText is the text a fix inserts, which stays the same when earlier
// edits move its positions.
func fixText(f analysis.SuggestedFix) string {
	var sb strings.Builder
	for _, te := range f.TextEdits {
		sb.Write(te.NewText)
		sb.WriteByte(0)
	}
	return sb.String()
}

func (p *fixPlan) leftoverCount() int {
	n := 0
	for _, c := range p.leftover {
		n += c
	}
	return n
}

// planFixes selects the first suggested fix of every root diagnostic,
// skipping packages that did not type-check and generated files, and
// dropping a fix whose edits overlap an accepted one (identical edits,
// such as the same import added twice, coalesce). When only is not nil,
// it takes only as many findings of each key as only counts: those left
// over by the previous round. applied records, per finding key, the text
// of the fixes applied so far; a finding of a leftover key whose fix was
// already applied is one its fix did not silence, and is passed over so
// that no fix is applied twice.
func planFixes(roots []*checker.Action, only map[string]int, applied map[string]map[string]bool) *fixPlan {
	p := &fixPlan{files: make(map[string][]edit), accepted: make(map[string]bool), leftover: make(map[string]int)}
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
		for _, d := range guardsLast(act.Diagnostics) {
			if len(d.SuggestedFixes) == 0 {
				continue
			}
			key, text := findingKey(fset, d), fixText(d.SuggestedFixes[0])
			if only != nil {
				if only[key] == 0 || applied[key][text] {
					continue
				}
				only[key]--
			}
			if !p.add(fset, d.SuggestedFixes[0], generated) {
				p.leftover[key]++
				continue
			}
			if applied[key] == nil {
				applied[key] = make(map[string]bool)
			}
			applied[key][text] = true
		}
	}
	return p
}

// guardsLast orders the diagnostics of a package so that the fixes of
// factorial definitions (loops and recursions, whose fix is a range
// guard) are tried after every other fix. A guard bounds the factorial,
// which silences the findings of the ratios and terms built from it; if
// a guard won a clash with such a ratio's rewrite, the next round would
// no longer report the ratio, and it would keep the guard's panic where a
// rewrite gives the right value.
func guardsLast(diags []analysis.Diagnostic) []analysis.Diagnostic {
	out := append([]analysis.Diagnostic(nil), diags...)
	sort.SliceStable(out, func(i, j int) bool { return !isDefinition(out[i]) && isDefinition(out[j]) })
	return out
}

// isDefinition reports whether d is a factorial definition's finding.
func isDefinition(d analysis.Diagnostic) bool {
	cat := strings.TrimSuffix(d.Category, ".definite")
	return cat == "factorial-loop" || cat == "factorial-recursion"
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

// add accepts fix unless it clashes with an accepted fix; it reports
// false for a clash only.
func (p *fixPlan) add(fset *token.FileSet, fix analysis.SuggestedFix, generated map[string]bool) bool {
	var edits []edit
	for _, te := range fix.TextEdits {
		end := te.End
		if !end.IsValid() {
			end = te.Pos
		}
		s, e := fset.Position(te.Pos), fset.Position(end)
		if generated[s.Filename] {
			return true
		}
		edits = append(edits, edit{s.Filename, s.Offset, e.Offset, string(te.NewText)})
	}
	key := fmt.Sprint(edits)
	if p.accepted[key] {
		return true
	}
	var fresh []edit
	for _, e := range edits {
		dup, clash := p.check(e)
		if clash {
			return false
		}
		if !dup {
			fresh = append(fresh, e)
		}
	}
	p.accepted[key] = true
	for _, e := range fresh {
		p.files[e.file] = append(p.files[e.file], e)
	}
	return true
}

// check reports whether e equals an accepted edit or clashes with one.
func (p *fixPlan) check(e edit) (dup, clash bool) {
	for _, f := range p.files[e.file] {
		if f == e {
			return true, false
		}
		if e.overlaps(f) {
			return false, true
		}
	}
	return false, false
}

// apply returns content with the edits applied. It re-formats the result
// only when the original was gofmt-clean, so that a fix never reformats
// code its author laid out by hand.
func apply(content []byte, edits []edit) ([]byte, error) {
	sorted := append([]edit(nil), edits...)
	sort.SliceStable(sorted, func(i, j int) bool {
		return sorted[i].start < sorted[j].start || sorted[i].start == sorted[j].start && sorted[i].end < sorted[j].end
	})
	var out bytes.Buffer
	last := 0
	for _, e := range sorted {
		if e.start < last || e.end > len(content) {
			return nil, fmt.Errorf("edit %d-%d out of range or overlapping", e.start, e.end)
		}
		out.Write(content[last:e.start])
		out.WriteString(e.text)
		last = e.end
	}
	out.Write(content[last:])
	if orig, err := format.Source(content); err == nil && bytes.Equal(orig, content) {
		if fixed, err := format.Source(out.Bytes()); err == nil {
			return fixed, nil
		}
	}
	return out.Bytes(), nil
}

// writeAtomic replaces the file name by content without ever leaving it
// half-written: the bytes go to a temporary file in the same directory,
// which is then renamed over the original, keeping its permissions. A
// file without write permission is refused even when the process could
// replace it (as root can), since its owner marked it read-only.
func writeAtomic(name string, content []byte) error {
	info, err := os.Stat(name)
	if err != nil {
		return err
	}
	if info.Mode().Perm()&0o200 == 0 {
		return fmt.Errorf("%s is read-only; not fixed", name)
	}
	tmp, err := os.CreateTemp(filepath.Dir(name), "."+filepath.Base(name)+".overfact-*")
	if err != nil {
		return fmt.Errorf("cannot fix %s: %v", name, err)
	}
	defer os.Remove(tmp.Name()) // after a successful rename there is nothing to remove
	if _, err := tmp.Write(content); err != nil {
		tmp.Close()
		return fmt.Errorf("cannot fix %s: %v", name, err)
	}
	if err := tmp.Chmod(info.Mode().Perm()); err != nil {
		tmp.Close()
		return fmt.Errorf("cannot fix %s: %v", name, err)
	}
	if err := tmp.Close(); err != nil {
		return fmt.Errorf("cannot fix %s: %v", name, err)
	}
	if err := os.Rename(tmp.Name(), name); err != nil {
		return fmt.Errorf("cannot fix %s: %v", name, err)
	}
	return nil
}
