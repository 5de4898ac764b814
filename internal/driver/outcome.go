package driver

import (
	"fmt"
	"go/types"
	"slices"

	"golang.org/x/tools/go/analysis/checker"
)

// Outcome lists what a run of the checker produced on its root packages,
// one line each, sorted: every diagnostic with its category and the
// edits of its fixes, and every object fact a root package saw (its own
// and those it inherited from its dependencies), with all its fields. Two
// ways of loading the same packages must give the same outcome.
func Outcome(g *checker.Graph) []string {
	seen := make(map[string]bool)
	add := func(s string) { seen[s] = true }
	for _, act := range g.Roots {
		if act.Err != nil {
			add(fmt.Sprintf("error %s: %v", act.Package.ID, act.Err))
			continue
		}
		fset := act.Package.Fset
		for _, d := range act.Diagnostics {
			line := fmt.Sprintf("diagnostic %s: [%s] %s", fset.Position(d.Pos), d.Category, d.Message)
			for _, f := range d.SuggestedFixes {
				line += fmt.Sprintf("\n\tfix %q", f.Message)
				for _, e := range f.TextEdits {
					line += fmt.Sprintf("\n\t\t%s-%s %q", fset.Position(e.Pos), fset.Position(e.End), e.NewText)
				}
			}
			add(line)
		}
		for _, f := range act.AllObjectFacts() {
			obj := f.Object
			add(fmt.Sprintf("fact %s %s: %#v", obj.Pkg().Path(), types.ObjectString(obj, (*types.Package).Name), f.Fact))
		}
		for _, f := range act.AllPackageFacts() {
			add(fmt.Sprintf("package fact %s: %#v", f.Package.Path(), f.Fact))
		}
	}
	out := make([]string, 0, len(seen))
	for s := range seen {
		out = append(out, s)
	}
	slices.Sort(out)
	return out
}
