package driver

import (
	"go/token"

	"golang.org/x/tools/go/analysis/checker"
)

// dropCopies removes from the diagnostics of roots every finding that an
// earlier root already reported at the same position with the same
// message, and returns how many findings are left. A file that belongs
// to a package and to its test variant ("p" and "p [p.test]") is
// analysed twice; go vet reports its findings once, and so does every
// output of the driver. The first copy is kept, which is the package's
// own, since go/packages lists a package before its test variant.
func dropCopies(roots []*checker.Action) int {
	type key struct {
		pos, end token.Position
		msg      string
	}
	seen := make(map[key]bool)
	n := 0
	for _, act := range roots {
		if act.Err != nil {
			continue
		}
		kept := act.Diagnostics[:0:0]
		for _, d := range act.Diagnostics {
			fset := act.Package.Fset
			k := key{fset.Position(d.Pos), fset.Position(d.End), d.Message}
			if !seen[k] {
				seen[k] = true
				kept = append(kept, d)
			}
		}
		act.Diagnostics = kept
		n += len(kept)
	}
	return n
}
