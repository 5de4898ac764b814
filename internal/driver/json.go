package driver

import (
	"bytes"
	"encoding/json"
	"go/token"
	"io"

	"golang.org/x/tools/go/analysis/checker"

	"github.com/overfact/overfact/internal/sarif"
)

// printJSON writes graph's findings in the JSON form of go vet -json,
// which the checker prints with every position where a //line directive
// maps it. A mapped file that does not exist is no place to jump to, so
// such positions are rewritten to the compiled file, as the text and
// SARIF reports give them (sarif.Positions).
func printJSON(w io.Writer, graph *checker.Graph) error {
	var buf bytes.Buffer
	if err := graph.PrintJSON(&buf); err != nil {
		return err
	}
	out := buf.Bytes()
	ps := sarif.NewPositions()
	// Each mapped position printed, with the one to print instead; a
	// mapped position that stands for two places is left as it is.
	reps := make(map[string]string)
	ambiguous := make(map[string]bool)
	for _, act := range graph.Roots {
		if act.Err != nil {
			continue
		}
		fset := act.Package.Fset
		for _, d := range act.Diagnostics {
			pos := []token.Pos{d.Pos, d.End}
			for _, r := range d.Related {
				pos = append(pos, r.Pos, r.End)
			}
			for _, fx := range d.SuggestedFixes {
				for _, e := range fx.TextEdits {
					pos = append(pos, e.Pos, e.End)
				}
			}
			for _, p := range pos {
				if !p.IsValid() || fset.File(p) == nil {
					continue
				}
				mapped := fset.Position(p).String()
				rep := ps.Of(fset, p).String()
				if old, ok := reps[mapped]; ok && old != rep {
					ambiguous[mapped] = true
				}
				reps[mapped] = rep
			}
		}
	}
	for mapped, rep := range reps {
		if rep == mapped || ambiguous[mapped] {
			continue
		}
		from, _ := json.Marshal(mapped)
		to, _ := json.Marshal(rep)
		out = bytes.ReplaceAll(out, from, to)
	}
	_, err := w.Write(out)
	return err
}
