package analyzer

import (
	"go/ast"
	"go/token"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/fixes"
)

// finding is one root cause, ready to become a Diagnostic.
type finding struct {
	node     ast.Node
	cat      string // the pattern's category, without definiteSuffix
	definite bool
	msg      string
	related  []analysis.RelatedInformation
	match    *fixes.Match
}

// report emits f unless it lies in a generated file, is silenced by an
// allow directive, or repeats a finding already made.
func (fc *fnCtx) report(f finding) {
	c := fc.c
	cat := f.cat
	if f.definite {
		cat += definiteSuffix
	}
	pos := f.node.Pos()
	fi := c.fileOf(pos)
	if fi == nil || fi.generated || fi.dirs.allowed(c.pass.Fset, pos) {
		return
	}
	key := reportKey{pos, cat}
	if c.reported[key] {
		return
	}
	c.reported[key] = true
	d := analysis.Diagnostic{
		Pos:      pos,
		End:      f.node.End(),
		Category: cat,
		URL:      categoryURL(cat),
		Message:  f.msg,
		Related:  f.related,
	}
	if f.match != nil && !fc.noFix && !fi.cgo {
		f.match.File = fi.file
		d.SuggestedFixes = c.physicalOnly(fixes.Suggest(c.pass, *f.match))
	}
	c.pass.Report(d)
}

// reportDirective reports a malformed directive; these are never
// silenced, since an allow that does not parse silences nothing.
func (c *checker) reportDirective(pos, end token.Pos, msg string) {
	c.pass.Report(analysis.Diagnostic{
		Pos:      pos,
		End:      end,
		Category: catDirective,
		URL:      categoryURL(catDirective),
		Message:  msg,
	})
}

// relatedDef points at the definition of a factorial-valued function,
// at the start of the line that declares it. The name's own column is
// not always known: under go vet a function of another package comes
// from export data, which keeps only its line, so the line start is the
// position every driver can give alike.
func (c *checker) relatedDef(name string, pos token.Pos) []analysis.RelatedInformation {
	if !pos.IsValid() {
		return nil
	}
	if f := c.pass.Fset.File(pos); f != nil {
		pos = f.LineStart(f.PositionFor(pos, false).Line)
	}
	return []analysis.RelatedInformation{{Pos: pos, Message: name + " is defined here"}}
}

// physicalOnly drops the fixes when an edit lies where a //line
// directive maps the file to another name: drivers that place an edit
// by its mapped file name and its offset in the compiled file would
// write into the wrong file.
func (c *checker) physicalOnly(fs []analysis.SuggestedFix) []analysis.SuggestedFix {
	for _, f := range fs {
		for _, e := range f.TextEdits {
			for _, p := range []token.Pos{e.Pos, e.End} {
				if p.IsValid() && c.pass.Fset.PositionFor(p, true).Filename != c.pass.Fset.PositionFor(p, false).Filename {
					return nil
				}
			}
		}
	}
	return fs
}
