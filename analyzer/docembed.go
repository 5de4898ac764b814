package analyzer

import (
	_ "embed"
	"go/parser"
	"go/token"
	"strings"
)

// docSource is doc.go itself: its package comment is the single source of
// the analyzer's documentation, as in golang.org/x/tools/go/analysis/passes.
//
//go:embed doc.go
var docSource string

// doc is Analyzer.Doc: the package comment of doc.go from its
// "# Analyzer overfact" heading on.
var doc = mustExtractDoc(docSource, "overfact")

// mustExtractDoc returns the part of a package comment that follows the
// heading "# Analyzer name", as plain text. It panics where the comment
// lacks the heading: a build that cannot document its analyzer is broken.
func mustExtractDoc(src, name string) string {
	f, err := parser.ParseFile(token.NewFileSet(), "doc.go", src, parser.ParseComments|parser.PackageClauseOnly)
	if err != nil || f.Doc == nil {
		panic("analyzer: doc.go has no package comment")
	}
	text := f.Doc.Text()
	header := "# Analyzer " + name + "\n"
	_, after, ok := strings.Cut(text, header)
	if !ok {
		panic("analyzer: doc.go lacks the heading " + header)
	}
	return strings.TrimSpace(after)
}
