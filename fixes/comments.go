package fixes

import (
	"go/ast"
	"go/token"
	"sort"
	"strings"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/internal/textedit"
)

// keepComments re-emits the comments in source the fix deletes without
// copying it: a comment inside a rewritten expression or a replaced loop
// is the author's, and stays next to the new code. A comment of one line
// written /* like this */ follows the replacement text; any other (a //
// comment, which would swallow the rest of its line) goes on a line of
// its own above the line where the replaced source began, indented as
// that line is. The comments of a deleted import go with the import.
func (b *builder) keepComments() {
	above := make([][]string, len(b.edits)) // by edit: comments for above its line
	for _, cg := range b.commentsInEdits() {
		for _, c := range cg.List {
			i := b.deletingEdit(c)
			if i < 0 {
				continue
			}
			e := &b.edits[i]
			if strings.HasPrefix(c.Text, "/*") && !strings.Contains(c.Text, "\n") && len(e.NewText) > 0 {
				e.NewText = append(e.NewText, " "+c.Text...)
				continue
			}
			above[i] = append(above[i], c.Text)
		}
	}
	for i, texts := range above {
		if len(texts) == 0 {
			continue
		}
		start := b.tok.LineStart(b.line(b.edits[i].Pos))
		indent := b.indentOf(start)
		var sb strings.Builder
		for _, t := range texts {
			sb.WriteString(indent + t + "\n")
		}
		b.insert(start, sb.String())
	}
}

// commentsInEdits returns the file's comment groups that overlap an edit
// which deletes source, in order: only those can hold a comment the fix
// deletes. Each edit's are found by binary search, so that a fix costs
// what it edits, not the file's comments.
func (b *builder) commentsInEdits() []*ast.CommentGroup {
	groups := b.file.Comments
	var at []int
	for _, e := range b.edits {
		if e.End <= e.Pos {
			continue
		}
		i := sort.Search(len(groups), func(i int) bool { return groups[i].End() > e.Pos })
		for ; i < len(groups) && groups[i].Pos() < e.End; i++ {
			at = append(at, i)
		}
	}
	sort.Ints(at)
	var out []*ast.CommentGroup
	for k, i := range at {
		if k == 0 || at[k-1] != i {
			out = append(out, groups[i])
		}
	}
	return out
}

// deletingEdit returns the index of the edit that deletes comment c
// without the fix copying it, or -1.
func (b *builder) deletingEdit(c *ast.Comment) int {
	if b.inImportDecl(c.Pos()) {
		return -1
	}
	for _, s := range b.copied {
		if s.pos <= c.Pos() && c.End() <= s.end {
			return -1
		}
	}
	for i, e := range b.edits {
		if e.End > e.Pos && e.Pos <= c.Pos() && c.End() <= e.End {
			return i
		}
	}
	return -1
}

// inImportDecl reports whether p lies on a line of an import declaration.
func (b *builder) inImportDecl(p token.Pos) bool {
	line := b.line(p)
	for _, d := range b.file.Decls {
		g, ok := d.(*ast.GenDecl)
		if !ok || g.Tok != token.IMPORT {
			return false // imports come before every other declaration
		}
		if b.line(g.Pos()) <= line && line <= b.line(g.End()) {
			return true
		}
	}
	return false
}

// matchLineEndings writes the line breaks of every edit as the file's own:
// CRLF in a file whose lines end in CRLF. Every driver then inserts lines
// that match the file, however it applies the edits.
func (b *builder) matchLineEndings() {
	eol := textedit.LineEnding(b.src)
	for i, e := range b.edits {
		b.edits[i] = analysis.TextEdit{Pos: e.Pos, End: e.End, NewText: []byte(textedit.WithLineEnding(string(e.NewText), eol))}
	}
}
