package sarif

import (
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// lined is a file whose //line directives map its lines elsewhere: to a
// grammar that does not exist, to a template that does (with a column),
// and to the same template without a column.
const lined = `package lined

func a() int {
//line grammar.y:102
	return 1
}

func b() int {
//line tmpl.src:2:5
	return "é" + 2
}

func c() int {
//line tmpl.src:1
	return 3
}
`

const tmplSrc = "first line\n\"é\" é \"é\" + x\n"

// TestLineDirectiveRegions checks where findings under //line directives
// land in the log: the compiled file when the mapped one is missing,
// the mapped file when it exists, with UTF-16 columns counted on the
// mapped file's own line, and no column at all when the directive gives
// none. Every finding is in the log, and no column is below 1.
func TestLineDirectiveRegions(t *testing.T) {
	dir := t.TempDir()
	name := filepath.Join(dir, "lined.go")
	for file, text := range map[string]string{name: lined, filepath.Join(dir, "tmpl.src"): tmplSrc} {
		if err := os.WriteFile(file, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, name, lined, parser.ParseComments)
	if err != nil {
		t.Fatal(err)
	}
	base := fset.File(f.Pos()).Base()
	at := func(text string) token.Pos { return token.Pos(base + strings.Index(lined, text)) }
	b, err := NewBuilder(ToolComponent{Name: "overfact"}, nil, dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, d := range []analysis.Diagnostic{
		{Pos: at("return 1"), End: at("return 1") + 8, Message: "a"},
		{Pos: at("return \"é\""), End: at("return \"é\"") + 6, Message: "b"},
		{Pos: at("return 3"), Message: "c"},
	} {
		if err := b.Add(fset, d, "overfact"); err != nil {
			t.Fatalf("Add(%s): %v", d.Message, err)
		}
	}
	res := b.Log().Runs[0].Results
	if len(res) != 3 {
		t.Fatalf("%d results, want 3", len(res))
	}
	// Expected places, read off the two texts by hand: "return 1" is at
	// line 5, column 2 of lined.go (its grammar.y does not exist). The
	// directive "tmpl.src:2:5" puts the tab at column 5 of tmpl.src's
	// line 2, so "return" is at byte column 6 there; that line's first
	// five bytes, a quote, a 2-byte "é", a quote and a space, are four
	// UTF-16 units, so the column is 5. "tmpl.src:1" gives no column.
	want := []struct {
		uri  string
		line int
		col  int
	}{
		{"lined.go", 5, 2},
		{"tmpl.src", 2, 5},
		{"tmpl.src", 1, 0},
	}
	for i, w := range want {
		loc := res[i].Locations[0].PhysicalLocation
		rg := loc.Region
		if loc.ArtifactLocation.URI != w.uri || rg.StartLine != w.line || rg.StartColumn != w.col {
			t.Errorf("result %s at %s:%d:%d, want %s:%d:%d", res[i].Message.Text, loc.ArtifactLocation.URI, rg.StartLine, rg.StartColumn, w.uri, w.line, w.col)
		}
		if rg.StartColumn < 0 || rg.EndColumn < 0 || (rg.StartColumn == 0) != (rg.EndColumn == 0) {
			t.Errorf("result %s: columns %d-%d", res[i].Message.Text, rg.StartColumn, rg.EndColumn)
		}
	}
	if got := string(encode(t, b)); strings.Contains(got, `"startColumn": 0`) {
		t.Errorf("log holds a column 0:\n%s", got)
	}
	checkSchema(t, b)
}
