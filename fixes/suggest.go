package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"sort"

	"golang.org/x/tools/go/analysis"
)

// Suggest returns the fixes for m, the recommended one first, or nil when
// no value-preserving rewrite exists.
func (fx *Fixer) Suggest(m Match) []analysis.SuggestedFix {
	fixes, _ := fx.Build(m)
	return fixes
}

// Build is Suggest with the reason a fix was refused, for callers that
// want to explain a finding without a fix (and for tests).
func (fx *Fixer) Build(m Match) (fixes []analysis.SuggestedFix, err error) {
	// A fixer bug must cost a fix, never the analysis.
	defer func() {
		if r := recover(); r != nil {
			fixes, err = nil, fmt.Errorf("internal error building the fix: %v", r)
		}
	}()
	if !fx.verificationsLeft() {
		// Building a fix costs a walk of its function; past the budget
		// the check would refuse it anyway, so do not build it.
		return nil, errVerificationsSpent
	}
	b, err := newBuilder(fx, m)
	if err != nil {
		return nil, err
	}
	row, ok := shapes[m.Shape]
	if !ok {
		return nil, fmt.Errorf("no rewrite for shape %d", m.Shape)
	}
	if err := row.build(b); err != nil {
		return nil, err
	}
	fix, err := b.finish()
	if err != nil {
		return nil, err
	}
	return []analysis.SuggestedFix{fix}, nil
}

// A builder collects the edits of one fix to one file.
type builder struct {
	fx      *Fixer
	pass    *analysis.Pass
	m       Match
	file    *ast.File
	tok     *token.File
	src     []byte
	edits   []analysis.TextEdit
	removed []span            // source the fix deletes
	copied  []span            // source the fix deletes but re-emits verbatim
	imports map[string]string // import path → name the fix uses
	added   map[string]bool   // import paths the fix adds
	listed  bool              // the fix made the file's one unparenthesised import a list
	// countBounds, where set, are the bounds float counts are tested
	// against instead of the helper's domain (countConds).
	countBounds []bound
	// absorbed are definitions of locals only the rewritten expression
	// read; the rewrite deletes them.
	absorbed []ast.Stmt
	// counts, while a helper call's operands are converted, collects the
	// float operands passed to integer parameters (countConds); nil where
	// a float operand is refused.
	counts *floatCounts
	// keptAsWritten: a test already keeps the expression as written
	// where the helper's value would differ (keepAsWritten).
	keptAsWritten bool
	shown         string // the helper call as the fix's message shows it
	message       string
}

type span struct{ pos, end token.Pos }

func (s span) contains(p token.Pos) bool { return s.pos <= p && p < s.end }

func newBuilder(fx *Fixer, m Match) (*builder, error) {
	pass := fx.pass
	if m.File == nil || m.Node == nil {
		return nil, errors.New("match has no file or node")
	}
	if ast.IsGenerated(m.File) {
		return nil, errors.New("file is generated")
	}
	tok := pass.Fset.File(m.File.FileStart)
	if tok == nil {
		return nil, errors.New("file has no position information")
	}
	src, err := fx.source(tok.Name())
	if err != nil {
		return nil, err
	}
	if len(src) != tok.Size() {
		return nil, fmt.Errorf("%s changed since it was parsed", tok.Name())
	}
	return &builder{fx: fx, pass: pass, m: m, file: m.File, tok: tok, src: src,
		imports: make(map[string]string), added: make(map[string]bool)}, nil
}

func (b *builder) offset(p token.Pos) int { return b.tok.Offset(p) }

// text returns the source of n.
func (b *builder) text(n ast.Node) string {
	return string(b.src[b.offset(n.Pos()):b.offset(n.End())])
}

// copyText returns the source of n and records that the fix keeps it, so
// that imports it uses are not deleted.
func (b *builder) copyText(n ast.Node) string {
	b.copied = append(b.copied, span{n.Pos(), n.End()})
	return b.text(n)
}

// replace replaces the source from pos to end with text.
func (b *builder) replace(pos, end token.Pos, text string) {
	b.edits = append(b.edits, analysis.TextEdit{Pos: pos, End: end, NewText: []byte(text)})
	if end > pos {
		b.removed = append(b.removed, span{pos, end})
	}
}

// finish adds the import edits, checks the fixed file type-checks and
// returns the fix.
func (b *builder) finish() (analysis.SuggestedFix, error) {
	b.removeUnusedImports()
	b.keepComments()
	b.matchLineEndings()
	sort.SliceStable(b.edits, func(i, j int) bool {
		if b.edits[i].Pos != b.edits[j].Pos {
			return b.edits[i].Pos < b.edits[j].Pos
		}
		return b.edits[i].End < b.edits[j].End
	})
	if err := b.verify(); err != nil {
		return analysis.SuggestedFix{}, err
	}
	return analysis.SuggestedFix{Message: b.message, TextEdits: b.edits}, nil
}
