package fixes_test

import (
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestCRLFEdits analyses a file whose lines end in CRLF (written so at
// test time, out of reach of any line-ending conversion of the checkout):
// the lines a fix inserts (imports, comments kept above the new code)
// must end in CRLF too, whatever driver applies them.
func TestCRLFEdits(t *testing.T) {
	dir := gopath(t, filepath.Join("testdata", "src"), "probecomments")
	name := filepath.Join(dir, "src", "probecomments", "comments.go")
	src, err := os.ReadFile(name)
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(name, []byte(strings.ReplaceAll(string(src), "\n", "\r\n")), 0o644); err != nil {
		t.Fatal(err)
	}
	bareLF := regexp.MustCompile(`(^|[^\r])\n`)
	breaks := 0
	for _, r := range analysistest.Run(t, dir, probe, "probecomments") {
		for _, d := range r.Diagnostics {
			for _, f := range d.SuggestedFixes {
				for _, e := range f.TextEdits {
					if bareLF.Match(e.NewText) {
						t.Errorf("%s: fix inserts a bare LF: %q", r.Pass.Fset.Position(e.Pos), e.NewText)
					}
					breaks += strings.Count(string(e.NewText), "\r\n")
				}
			}
		}
	}
	if breaks == 0 {
		t.Error("no fix inserted a line break; the test shows nothing")
	}
}
