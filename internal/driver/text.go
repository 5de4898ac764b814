package driver

import (
	"fmt"
	"go/token"
	"io"
	"path/filepath"
	"strings"

	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/sarif"
)

// writeText prints each root finding once as "file:line:col: message",
// the form compilers and go vet use and editors jump to, each related
// position after it as "file:line:col: \tmessage" as go vet prints them,
// and returns how many findings it printed. A file in both a package and
// its test variant yields the same finding twice; the copy is dropped.
// Under a //line directive a position is printed where the directive
// maps it only when that file exists (see sarif.Positions), and without
// a column when the directive gives none, as token.Position does.
func writeText(w io.Writer, dir string, roots []*checker.Action) int {
	seen := make(map[string]bool)
	ps := sarif.NewPositions()
	n := 0
	for _, act := range roots {
		if act.Err != nil {
			continue
		}
		for _, d := range act.Diagnostics {
			p := ps.Of(act.Package.Fset, d.Pos)
			line := fmt.Sprintf("%s: %s", textPos(dir, p), d.Message)
			if seen[line] {
				continue
			}
			seen[line] = true
			fmt.Fprintln(w, line)
			for _, rel := range d.Related {
				fmt.Fprintf(w, "%s: \t%s\n", textPos(dir, ps.Of(act.Package.Fset, rel.Pos)), rel.Message)
			}
			n++
		}
	}
	return n
}

// textPos formats p as file:line:column, or file:line when the column is
// not known, with the file relative to dir when it lies inside it.
func textPos(dir string, p token.Position) string {
	p.Filename = relPath(dir, p.Filename)
	return p.String()
}

// relPath returns name relative to dir when it lies inside dir, so that
// output is short and the same on every checkout.
func relPath(dir, name string) string {
	rel, err := filepath.Rel(dir, name)
	if err != nil || rel == ".." || strings.HasPrefix(rel, ".."+string(filepath.Separator)) {
		return name
	}
	return rel
}

// printPackageErrors prints the load, parse and type errors of pkgs and
// their dependencies, each once, and returns their number. Positions
// inside dir are shortened as findings are.
func printPackageErrors(w io.Writer, dir string, pkgs []*packages.Package) int {
	n := 0
	seen := make(map[string]bool)
	packages.Visit(pkgs, nil, func(p *packages.Package) {
		for _, err := range p.Errors {
			msg := err.Msg
			if err.Pos != "" && err.Pos != "-" {
				msg = relPath(dir, err.Pos) + ": " + msg
			}
			if !seen[msg] {
				seen[msg] = true
				fmt.Fprintln(w, msg)
			}
			n++
		}
	})
	return n
}
