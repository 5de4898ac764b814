package sarif

import (
	"go/token"
	"os"
)

// Positions decides where a position is reported when its file carries
// //line directives (goyacc, cgo and other generators write them): at the
// file and line a directive maps it to when that file exists, at the
// file that was compiled otherwise. A directive naming a file that is
// not there (the grammar of a generator run elsewhere, a path of another
// machine) would send a reader, an editor or a code-scanning service to
// nothing.
type Positions struct {
	exists map[string]bool
	// Stat reports whether a regular file exists; os.Stat unless set.
	Stat func(name string) bool
}

// NewPositions returns an empty cache of file existence checks.
func NewPositions() *Positions {
	return &Positions{exists: make(map[string]bool), Stat: isRegular}
}

func isRegular(name string) bool {
	fi, err := os.Stat(name)
	return err == nil && fi.Mode().IsRegular()
}

// Of returns the reported position of pos. A mapped position keeps the
// directive's line and column; a directive without a column gives
// column 0, which token.Position.String leaves out and SARIF omits.
func (ps *Positions) Of(fset *token.FileSet, pos token.Pos) token.Position {
	mapped := fset.PositionFor(pos, true)
	phys := fset.PositionFor(pos, false)
	if mapped == phys || mapped.Filename == "" {
		return phys
	}
	ok, seen := ps.exists[mapped.Filename]
	if !seen {
		ok = ps.Stat(mapped.Filename)
		ps.exists[mapped.Filename] = ok
	}
	if ok {
		return mapped
	}
	return phys
}

// Span returns the reported start and end of [pos, end): an end that
// does not land in the start's file, or lands before it, collapses to
// the start.
func (ps *Positions) Span(fset *token.FileSet, pos, end token.Pos) (token.Position, token.Position) {
	p := ps.Of(fset, pos)
	if !end.IsValid() {
		return p, p
	}
	e := ps.Of(fset, end)
	if e.Filename != p.Filename || e.Line < p.Line || e.Line == p.Line && e.Column < p.Column {
		return p, p
	}
	return p, e
}
