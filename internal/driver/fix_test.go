package driver

import (
	"go/ast"
	"go/parser"
	"go/token"
	"math/rand/v2"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/textedit"
)

// TestGofmtIfClean checks that fixed text is gofmt-ed only when the
// original was gofmt-clean.
func TestGofmtIfClean(t *testing.T) {
	src := "package p\n\nfunc f(n int) int { return fact(n) / fact(n-2) }\n"
	i := strings.Index(src, "fact(n) / fact(n-2)")
	edits := []textedit.Edit{
		{Start: i, End: i + len("fact(n) / fact(n-2)"), Text: "n * (n - 1)"},
		{Start: len("package p\n"), End: len("package p\n"), Text: "\n// f counts ordered pairs.\n"},
	}
	fixed, err := textedit.Apply([]byte(src), edits)
	if err != nil {
		t.Fatal(err)
	}
	// Written by hand: both edits applied, then gofmt (the source was
	// gofmt-clean) folds the doubled blank line.
	want := "package p\n\n// f counts ordered pairs.\n\nfunc f(n int) int { return n * (n - 1) }\n"
	if got := gofmtIfClean([]byte(src), fixed); string(got) != want {
		t.Errorf("gofmtIfClean = %q, want %q", got, want)
	}
	// A hand-aligned original keeps its layout.
	loose := strings.Replace(src, "{ return", "{   return", 1)
	i = strings.Index(loose, "fact(n) / fact(n-2)")
	fixed, _ = textedit.Apply([]byte(loose), []textedit.Edit{{Start: i, End: i + len("fact(n) / fact(n-2)"), Text: "n * (n - 1)"}})
	if got := gofmtIfClean([]byte(loose), fixed); !strings.Contains(string(got), "{   return n * (n - 1) }") {
		t.Errorf("gofmtIfClean reformatted a file that was not gofmt-clean: %q", got)
	}
}

// TestMoved checks how a finding's offset follows the edits of a round.
func TestMoved(t *testing.T) {
	edits := []edit{
		{"f", textedit.Edit{Start: 2, End: 2, Text: "ab"}},   // insertion
		{"f", textedit.Edit{Start: 10, End: 14, Text: "x"}},  // replacement
		{"f", textedit.Edit{Start: 20, End: 20, Text: "\n"}}, // a line break
	}
	tests := []struct {
		off  int
		eol  string
		want int
	}{
		{0, "\n", 0},     // before every edit
		{2, "\n", 4},     // at the insertion: pushed after it
		{5, "\n", 7},     // between the edits
		{11, "\n", 12},   // inside the replacement: its start
		{14, "\n", 13},   // just after it
		{20, "\n", 20},   // at the line break
		{21, "\r\n", 22}, // a CRLF file's line break is two bytes
	}
	for _, tt := range tests {
		if got := moved(tt.off, edits, tt.eol); got != tt.want {
			t.Errorf("moved(%d, %q) = %d, want %d", tt.off, tt.eol, got, tt.want)
		}
	}
}

// TestDefinitionsInARoundOfTheirOwn checks that the fixes of factorial
// definitions (range guards, which silence the ratios built on the
// factorial) wait until a round takes no other fix.
func TestDefinitionsInARoundOfTheirOwn(t *testing.T) {
	fset := token.NewFileSet()
	src := "package p\n\nvar a, b, c = 1, 2, 3\n"
	f, err := parser.ParseFile(fset, "p.go", src, 0)
	if err != nil {
		t.Fatal(err)
	}
	tf := fset.File(f.FileStart)
	diag := func(cat string, off int) analysis.Diagnostic {
		pos := tf.Pos(off)
		return analysis.Diagnostic{Pos: pos, Category: cat, Message: cat,
			SuggestedFixes: []analysis.SuggestedFix{{TextEdits: []analysis.TextEdit{{Pos: pos, End: pos + 1, NewText: []byte("x")}}}}}
	}
	at := strings.Index(src, "a")
	act := &checker.Action{
		Package: &packages.Package{ID: "p", Fset: fset, Syntax: []*ast.File{f}},
		Diagnostics: []analysis.Diagnostic{
			diag("factorial-loop", at),
			diag("factorial-ratio", at+3),
			diag("factorial-recursion.definite", at+6),
		},
	}
	// The analyzer's rule (analyzer.FixesLast, tested beside it): a
	// definition's findings wait; the driver knows no category names.
	last := func(cat string) bool {
		return strings.HasPrefix(cat, "factorial-loop") || strings.HasPrefix(cat, "factorial-recursion")
	}
	plan := planFixes([]*checker.Action{act}, map[finding]bool{}, last, false)
	if len(plan.taken) != 1 || plan.taken[0].category != "factorial-ratio" || plan.deferred != 2 {
		t.Fatalf("first round took %v and deferred %d; want the ratio alone, 2 deferred", plan.taken, plan.deferred)
	}
	plan = planFixes([]*checker.Action{act}, map[finding]bool{plan.taken[0]: true}, last, false)
	if len(plan.taken) != 2 || plan.deferred != 0 {
		t.Errorf("second round took %v and deferred %d; want both definitions", plan.taken, plan.deferred)
	}
}

// TestNoCategoryWaitsByDefault checks that the driver holds no fix back
// on its own: without Options.FixLast every category is alike.
func TestNoCategoryWaitsByDefault(t *testing.T) {
	fset := token.NewFileSet()
	src := "package p\n\nvar a, b = 1, 2\n"
	f, err := parser.ParseFile(fset, "p.go", src, 0)
	if err != nil {
		t.Fatal(err)
	}
	tf := fset.File(f.FileStart)
	at := strings.Index(src, "a")
	var diags []analysis.Diagnostic
	for i, cat := range []string{"factorial-loop", "factorial-ratio"} {
		pos := tf.Pos(at + 3*i)
		diags = append(diags, analysis.Diagnostic{Pos: pos, Category: cat, Message: cat,
			SuggestedFixes: []analysis.SuggestedFix{{TextEdits: []analysis.TextEdit{{Pos: pos, End: pos + 1, NewText: []byte("x")}}}}})
	}
	act := &checker.Action{Package: &packages.Package{ID: "p", Fset: fset, Syntax: []*ast.File{f}}, Diagnostics: diags}
	if plan := planFixes([]*checker.Action{act}, map[finding]bool{}, nil, false); len(plan.taken) != 2 || plan.deferred != 0 {
		t.Errorf("took %v and deferred %d; want both, none deferred", plan.taken, plan.deferred)
	}
}

// TestDefinitionsJoinACompleteRound checks that, when the analyzer offers
// every fix it can (Options.FixesComplete), a round whose other fixes are
// all taken takes the definitions' fixes too, except one in a function
// another fix of the round edits; and that a clash among the other fixes
// defers every definition, as without FixesComplete.
func TestDefinitionsJoinACompleteRound(t *testing.T) {
	fset := token.NewFileSet()
	src := "package p\n\nfunc f() { a := 1; _ = a }\n\nfunc g() { b := 2; _ = b }\n\nfunc h() { c := 3; d := 4; _, _ = c, d }\n"
	f, err := parser.ParseFile(fset, "p.go", src, 0)
	if err != nil {
		t.Fatal(err)
	}
	tf := fset.File(f.FileStart)
	diag := func(cat, at, text string) analysis.Diagnostic {
		pos := tf.Pos(strings.Index(src, at))
		return analysis.Diagnostic{Pos: pos, Category: cat, Message: cat + " " + at,
			SuggestedFixes: []analysis.SuggestedFix{{TextEdits: []analysis.TextEdit{{Pos: pos, End: pos + 1, NewText: []byte(text)}}}}}
	}
	last := func(cat string) bool { return cat == "factorial-loop" || cat == "factorial-recursion" }
	plan := func(complete bool, diags ...analysis.Diagnostic) *fixPlan {
		act := &checker.Action{Package: &packages.Package{ID: "p", Fset: fset, Syntax: []*ast.File{f}}, Diagnostics: diags}
		return planFixes([]*checker.Action{act}, map[finding]bool{}, last, complete)
	}
	messages := func(p *fixPlan) []string {
		var out []string
		for _, at := range p.takenAt {
			out = append(out, at[strings.LastIndex(at, ": ")+2:])
		}
		return out
	}
	diags := []analysis.Diagnostic{
		diag("factorial-loop", "a :=", "x"),      // in f, which no other fix edits
		diag("factorial-ratio", "b :=", "y"),     // in g
		diag("factorial-ratio", "c :=", "z"),     // in h
		diag("factorial-recursion", "d :=", "w"), // in h too
	}
	p := plan(true, diags...)
	if got, want := strings.Join(messages(p), ", "), "factorial-ratio b :=, factorial-ratio c :=, factorial-loop a :="; got != want || p.deferred != 1 {
		t.Errorf("complete round took %q and deferred %d; want %q and 1 (the definition in h)", got, p.deferred, want)
	}
	p = plan(false, diags...)
	if got, want := strings.Join(messages(p), ", "), "factorial-ratio b :=, factorial-ratio c :="; got != want || p.deferred != 2 {
		t.Errorf("round took %q and deferred %d; want %q and 2", got, p.deferred, want)
	}
	// Two ratio fixes replacing the same byte differently clash: the one
	// left for the next round may be pre-empted by a guard, so every
	// definition waits.
	p = plan(true, append(diags, diag("factorial-ratio", "b :=", "v"))...)
	if p.clashed != 1 || p.deferred != 2 {
		t.Errorf("round with a clash: %d clashed, %d deferred; want 1 and 2", p.clashed, p.deferred)
	}
}

// TestEditIndexAgreesWithScan checks the plan's check of a new edit
// against the definition it replaces: the first taken edit of the file,
// in the order taken, that equals the new edit or clashes with it
// (textedit.Edit.Clashes) decides. Random edits, insertions and
// replacements, some spanning several of the index's stretches, some
// duplicated, are offered in turn.
func TestEditIndexAgreesWithScan(t *testing.T) {
	rng := rand.New(rand.NewPCG(14, 1))
	for trial := 0; trial < 20; trial++ {
		p := &fixPlan{files: make(map[string][]edit), near: make(map[string]editIndex), accepted: make(map[string]bool)}
		var offered []edit
		for n := 0; n < 400; n++ {
			var e edit
			if n > 0 && rng.IntN(8) == 0 {
				e = offered[rng.IntN(len(offered))] // the same edit again, as two fixes adding one import
			} else {
				start := rng.IntN(20 * editStretch)
				end := start
				switch rng.IntN(3) {
				case 1:
					end += 1 + rng.IntN(64)
				case 2:
					end += 1 + rng.IntN(3*editStretch)
				}
				e = edit{file: "p.go", Edit: textedit.Edit{Start: start, End: end, Text: []string{"a", "b"}[rng.IntN(2)]}}
			}
			offered = append(offered, e)
			wantDup, wantClash := false, false
			for _, f := range p.files[e.file] {
				if f == e {
					wantDup = true
					break
				}
				if e.Clashes(f.Edit) {
					wantClash = true
					break
				}
			}
			dup, clash := p.check(e)
			if dup != wantDup || clash != wantClash {
				t.Fatalf("trial %d, edit %d %+v: check = dup %v, clash %v; the scan of every taken edit says dup %v, clash %v",
					trial, n, e, dup, clash, wantDup, wantClash)
			}
			// A fix's own edits are not checked against each other
			// (two insertions at one point apply in the fix's order):
			// now and then one is kept although it clashes.
			if !dup && (!clash || rng.IntN(10) == 0) {
				p.keep(e)
			}
		}
	}
}
