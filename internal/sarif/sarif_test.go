package sarif

import (
	"bytes"
	"encoding/json"
	"go/ast"
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"unicode/utf16"

	"golang.org/x/tools/go/analysis"
)

// The schema in testdata is the SARIF 2.1.0 JSON schema (draft 04),
// "sarif-2.1.0-rtm.5.json", taken from the npm package
// @microsoft/jest-sarif 1.0.0-beta.0 (MIT licence), file
// lib/schemas/sarif-2.1.0-rtm.5.json. From memory, rtm.5 is the
// committee draft that OASIS approved as the 2.1.0 standard, published
// as sarif-schema-2.1.0.json.
const schemaFile = "testdata/sarif-schema-2.1.0.json"

func TestUTF16Column(t *testing.T) {
	// Expected values come from unicode/utf16.Encode, the standard
	// library's implementation of RFC 2781, applied to the line prefix.
	tests := []struct {
		line   string
		prefix string // the text before the position on its line
	}{
		{"x := fact(n)", "x := "},
		{"s := \"é\" + fact(n)", "s := \"é\" + "},   // 2-byte UTF-8, 1 unit
		{"s := \"世界\" + fact(n)", "s := \"世界\" + "}, // 3-byte UTF-8, 1 unit each
		{"s := \"😀\" + fact(n)", "s := \"😀\" + "},   // 4-byte UTF-8, a surrogate pair
		{"// 𝛤(x) ratio\tg(x)", "// 𝛤(x) ratio\t"},  // mathematical capital gamma, outside the BMP
		{"", ""},                  // empty line, column 1
		{"abc\xffdef", "abc\xff"}, // invalid byte, one replacement unit
		{"\u00e9\u0301 := 1", "\u00e9\u0301 := "}, // combining accent is its own unit
		{"x := `😀😀` + y", "x := `😀😀` + "},
	}
	for _, tt := range tests {
		content := []byte("package p\n" + tt.line + "\n")
		offset := len("package p\n") + len(tt.prefix)
		byteCol := len(tt.prefix) + 1
		want := len(utf16.Encode([]rune(tt.prefix))) + 1
		if got := UTF16Column(content, offset, byteCol); got != want {
			t.Errorf("UTF16Column(%q, col %d) = %d, want %d", tt.line, byteCol, got, want)
		}
	}
	// Out-of-range input is returned unchanged rather than panicking.
	if got := UTF16Column([]byte("ab"), 10, 3); got != 3 {
		t.Errorf("out of range offset: got %d, want 3", got)
	}
}

// sample is a file with a non-ASCII string before a finding, so that
// byte and UTF-16 columns differ.
const sample = `package stats

// Γ ratio of the dice table.
func odds(n int) float64 {
	label := "😀 würfel"; _ = label; return float64(fact(n)) / float64(fact(n-2))
}

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

// findCall returns the position range of the first call of name after
// the byte offset from.
func findCall(t *testing.T, fset *token.FileSet, f *ast.File, src, text string) (token.Pos, token.Pos) {
	t.Helper()
	i := strings.Index(src, text)
	if i < 0 {
		t.Fatalf("%q not in sample", text)
	}
	base := fset.File(f.Pos()).Base()
	return token.Pos(base + i), token.Pos(base + i + len(text))
}

func buildSample(t *testing.T) (*Builder, string) {
	t.Helper()
	dir := t.TempDir()
	name := filepath.Join(dir, "pkg", "odds.go")
	if err := os.MkdirAll(filepath.Dir(name), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(name, []byte(sample), 0o644); err != nil {
		t.Fatal(err)
	}
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, name, sample, parser.ParseComments)
	if err != nil {
		t.Fatal(err)
	}
	ratioPos, ratioEnd := findCall(t, fset, f, sample, "float64(fact(n)) / float64(fact(n-2))")
	loopPos, loopEnd := findCall(t, fset, f, sample, "r *= i")
	b, err := NewBuilder(ToolComponent{Name: "overfact", Version: "v0.0.0-test", InformationURI: "https://github.com/overfact/overfact"},
		[]Rule{
			{ID: "factorial-ratio", Title: "A ratio of factorials overflows before it is divided.", Help: "https://github.com/overfact/overfact#factorial-ratio", Level: LevelError},
			{ID: "factorial-loop", Title: "A factorial loop overflows its accumulator.", Help: "https://github.com/overfact/overfact#factorial-loop"},
		}, dir)
	if err != nil {
		t.Fatal(err)
	}
	diags := []analysis.Diagnostic{
		{
			Pos: ratioPos, End: ratioEnd, Category: "factorial-ratio",
			Message: "fact(n) overflows int64 at n = 21",
			Related: []analysis.RelatedInformation{{Pos: loopPos, End: loopEnd, Message: "the product that overflows"}},
			SuggestedFixes: []analysis.SuggestedFix{{
				Message: "compute the ratio as a falling product",
				TextEdits: []analysis.TextEdit{
					{Pos: ratioPos, End: ratioEnd, NewText: []byte("float64(n * (n - 1))")},
					{Pos: loopPos, End: loopPos, NewText: []byte("// checked\n")}, // an insertion
				},
			}},
		},
		{Pos: loopPos, End: loopEnd, Category: "factorial-loop", Message: "r overflows int at n = 21"},
		{Pos: loopPos, End: loopEnd, Category: "factorial-loop", Message: "r overflows int at n = 21"}, // test variant duplicate
		{Pos: loopPos, Category: "", Message: "no category, no end"},
	}
	for _, d := range diags {
		if err := b.Add(fset, d, "overfact"); err != nil {
			t.Fatal(err)
		}
	}
	return b, dir
}

func encode(t *testing.T, b *Builder) []byte {
	t.Helper()
	var buf bytes.Buffer
	if err := b.Write(&buf); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}

func loadValidator(t *testing.T) *schemaValidator {
	t.Helper()
	data, err := os.ReadFile(schemaFile)
	if err != nil {
		t.Fatal(err)
	}
	v, err := newSchemaValidator(data)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

func TestLogMatchesSchema(t *testing.T) {
	b, _ := buildSample(t)
	checkSchema(t, b)
}

// checkSchema validates the log built by b against the SARIF schema.
func checkSchema(t *testing.T, b *Builder) {
	t.Helper()
	var inst any
	if err := json.Unmarshal(encode(t, b), &inst); err != nil {
		t.Fatal(err)
	}
	v := loadValidator(t)
	for _, e := range v.validate(v.root, inst, "$") {
		t.Error(e)
	}
}

// TestValidatorRejects checks that the schema validator is not vacuous:
// each mutation breaks a constraint of the SARIF schema.
func TestValidatorRejects(t *testing.T) {
	b, _ := buildSample(t)
	out := encode(t, b)
	v := loadValidator(t)
	mutations := []struct {
		name   string
		mutate func(log map[string]any)
	}{
		{"no version (§3.13.2 required)", func(l map[string]any) { delete(l, "version") }},
		{"wrong version (enum 2.1.0)", func(l map[string]any) { l["version"] = "2.0.0" }},
		{"no runs (required)", func(l map[string]any) { delete(l, "runs") }},
		{"unknown level (§3.27.10 enum)", func(l map[string]any) {
			result(l)["level"] = "fatal"
		}},
		{"startLine 0 (minimum 1)", func(l map[string]any) {
			region(l)["startLine"] = 0.0
		}},
		{"unknown property (additionalProperties false)", func(l map[string]any) { l["extra"] = true }},
		{"message without text (anyOf text/id)", func(l map[string]any) {
			result(l)["message"] = map[string]any{}
		}},
	}
	for _, m := range mutations {
		var inst map[string]any
		if err := json.Unmarshal(out, &inst); err != nil {
			t.Fatal(err)
		}
		m.mutate(inst)
		if errs := v.validate(v.root, inst, "$"); len(errs) == 0 {
			t.Errorf("%s: validator accepted the broken log", m.name)
		}
	}
}

func result(l map[string]any) map[string]any {
	return l["runs"].([]any)[0].(map[string]any)["results"].([]any)[0].(map[string]any)
}

func region(l map[string]any) map[string]any {
	loc := result(l)["locations"].([]any)[0].(map[string]any)
	return loc["physicalLocation"].(map[string]any)["region"].(map[string]any)
}

func TestLogContent(t *testing.T) {
	b, dir := buildSample(t)
	log := b.Log()
	run := log.Runs[0]

	if got, want := run.OriginalURIBaseIDs[SourceRoot].URI, "file://"+filepath.ToSlash(dir)+"/"; got != want {
		t.Errorf("SRCROOT = %q, want %q", got, want)
	}
	if len(run.Results) != 3 {
		t.Fatalf("got %d results, want 3 (the test-variant duplicate dropped)", len(run.Results))
	}
	ratio := run.Results[0]
	if ratio.RuleID != "factorial-ratio" || ratio.Level != LevelError || run.Tool.Driver.Rules[ratio.RuleIndex].ID != "factorial-ratio" {
		t.Errorf("ratio result: rule %q index %d level %q", ratio.RuleID, ratio.RuleIndex, ratio.Level)
	}
	loc := ratio.Locations[0].PhysicalLocation
	if loc.ArtifactLocation.URI != "pkg/odds.go" || loc.ArtifactLocation.URIBaseID != SourceRoot {
		t.Errorf("artifact = %+v, want pkg/odds.go relative to %s", loc.ArtifactLocation, SourceRoot)
	}
	// Columns counted by hand from the sample line
	//	\tlabel := "😀 würfel"; _ = label; return float64(...
	// tab 1, `label := "` 10, 😀 2 units, ` würfel"; _ = label; return ` 28
	// (ü is one unit): the ratio starts after 41 units, at column 42,
	// where its byte column is 45 (😀 is 4 bytes, ü 2). Python's
	// len(s.encode("utf-16-le"))//2 agrees.
	if loc.Region.StartLine != 5 || loc.Region.StartColumn != 42 {
		t.Errorf("ratio region start = %d:%d, want 5:42", loc.Region.StartLine, loc.Region.StartColumn)
	}
	if n := len("float64(fact(n)) / float64(fact(n-2))"); loc.Region.EndColumn != 42+n {
		t.Errorf("ratio region end column = %d, want %d", loc.Region.EndColumn, 42+n)
	}
	if len(ratio.RelatedLocations) != 1 || *ratio.RelatedLocations[0].ID != 1 || ratio.RelatedLocations[0].PhysicalLocation.Region.StartLine != 11 {
		t.Errorf("related locations = %+v", ratio.RelatedLocations)
	}
	if len(ratio.Fixes) != 1 || len(ratio.Fixes[0].ArtifactChanges) != 1 {
		t.Fatalf("fixes = %+v", ratio.Fixes)
	}
	reps := ratio.Fixes[0].ArtifactChanges[0].Replacements
	if len(reps) != 2 || reps[0].InsertedContent.Text != "float64(n * (n - 1))" {
		t.Fatalf("replacements = %+v", reps)
	}
	ins := reps[1].DeletedRegion
	if ins.StartLine != ins.EndLine || ins.StartColumn != ins.EndColumn || ins.StartColumn != 3 {
		t.Errorf("insertion region = %+v, want an empty region at 11:3", ins)
	}
	// A diagnostic without a category gets the fallback rule.
	if r := run.Results[2]; r.RuleID != "overfact" || run.Tool.Driver.Rules[r.RuleIndex].ID != "overfact" {
		t.Errorf("fallback rule = %q", r.RuleID)
	}
}

func TestArtifactOutsideRoot(t *testing.T) {
	b, err := NewBuilder(ToolComponent{Name: "overfact"}, nil, "/src/project")
	if err != nil {
		t.Fatal(err)
	}
	// RFC 8089 file URIs; a space is percent-encoded (RFC 3986 §2.1).
	tests := []struct{ file, uri, base string }{
		{"/src/project/a/b.go", "a/b.go", SourceRoot},
		{"/src/project/my dir/b.go", "my%20dir/b.go", SourceRoot},
		{"/usr/lib/go/src/math/gamma.go", "file:///usr/lib/go/src/math/gamma.go", ""},
		{"/src/project2/x.go", "file:///src/project2/x.go", ""},
	}
	for _, tt := range tests {
		got := b.artifact(tt.file)
		if got.URI != tt.uri || got.URIBaseID != tt.base {
			t.Errorf("artifact(%s) = %+v, want {%s %s}", tt.file, got, tt.uri, tt.base)
		}
	}
}
