package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"sort"

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
	// floatWay, when set, is a float expression through whose large
	// magnitudes the value is wrong (the base of a power that overflows
	// first): its float parameters are the function's ways in for
	// WrongValueFact when no count is.
	floatWay ast.Expr
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
	c.noteReported(pos)
	fc.noteWrongValue(f)
	d := analysis.Diagnostic{
		Pos:      pos,
		End:      f.node.End(),
		Category: cat,
		URL:      categoryURL(cat),
		Message:  f.msg,
		Related:  f.related,
	}
	if f.match != nil && !fi.cgo {
		f.match.File = fi.file
		f.match.NonNeg = fc.nonNegative(f.match.Args)
		f.match.IntBinomials = fc.intBinomials(f.match)
		if c.holdGuard(d, f.match) {
			return
		}
		d.SuggestedFixes = c.physicalOnly(c.fixer.Suggest(*f.match))
		if len(d.SuggestedFixes) > 0 {
			c.rewritten = append(c.rewritten, f.match.Node)
		}
	}
	c.pass.Report(d)
}

// heldGuard is a float factorial function's finding whose range guard
// waits for the end of the pass (see holdGuard).
type heldGuard struct {
	d analysis.Diagnostic
	m fixes.Match
}

// holdGuard keeps back the finding d of a float-valued factorial
// function whose fix is a range guard. Past its limit such a function
// returns +Inf, and a caller such as x/fact(k) or a series term may still
// compute its own result correctly from that; a guard would make that
// caller panic. So the guard is offered only where every call of the
// function in the package lies in an expression that a fix rewrites
// without it, which the end of the pass knows (releaseGuards).
func (c *checker) holdGuard(d analysis.Diagnostic, m *fixes.Match) bool {
	if m.Shape != fixes.ShapeFactorial || m.Result == nil {
		return false
	}
	if b, ok := m.Result.Underlying().(*types.Basic); !ok || b.Info()&types.IsFloat == 0 {
		return false // a wrapped integer is never a value a caller can use
	}
	c.held = append(c.held, heldGuard{d, *m})
	return true
}

// releaseGuards reports the held findings, each with its guard only
// where no call of its function is left to see the guard fire.
func (c *checker) releaseGuards() {
	for _, h := range c.held {
		if decl, ok := h.m.Func.(*ast.FuncDecl); ok && c.callsRewritten(c.declObj(decl)) {
			h.d.SuggestedFixes = c.physicalOnly(c.fixer.Suggest(h.m))
		}
		c.pass.Report(h.d)
	}
	c.held = nil
}

// callsRewritten reports whether no call of fn in this package could
// see a guard fire while its own result is still right: each call either
// lies in an expression that a fix of this pass rewrites, or its value
// never meets arithmetic (it is printed, compared, passed on), so that
// the caller only carries n! itself, which does not fit. fn must never
// be used as a value.
func (c *checker) callsRewritten(fn *types.Func) bool {
	if fn == nil {
		return false
	}
	calls := c.callsOf(fn)
	if c.escapes[fn] {
		return false
	}
	for _, call := range calls {
		if c.inRewrite(call) {
			continue
		}
		outer := c.enclosingFunc(call)
		if outer == nil || c.ctx(outer).gammaEscapes(call) {
			return false
		}
	}
	return true
}

// inRewrite reports whether n lies in an expression that a reported
// fix replaces.
func (c *checker) inRewrite(n ast.Node) bool {
	for _, r := range c.rewritten {
		if r.Pos() <= n.Pos() && n.End() <= r.End() {
			return true
		}
	}
	return false
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

// noteReported adds pos to reportedPos, keeping it sorted.
func (c *checker) noteReported(pos token.Pos) {
	at := c.reportedPos
	i := sort.Search(len(at), func(i int) bool { return at[i] > pos })
	at = append(at, 0)
	copy(at[i+1:], at[i:])
	at[i] = pos
	c.reportedPos = at
}

// nonNegative returns the operands of a match, and the integers inside
// their conversions, that the range analysis (not the //overfact:assume
// annotations, which are the user's word, not the code's) shows are
// never negative where they are evaluated.
func (fc *fnCtx) nonNegative(args []ast.Expr) map[ast.Expr]bool {
	var out map[ast.Expr]bool
	for _, a := range args {
		e := fc.stripConv(a)
		if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e)); !ok || t.Float {
			continue
		}
		if iv := fc.ranges().Of(ast.Unparen(e)); iv.IsEmpty() || iv.Lo < 0 {
			continue
		}
		if out == nil {
			out = make(map[ast.Expr]bool)
		}
		out[a], out[e] = true, true
	}
	return out
}
