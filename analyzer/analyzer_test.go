package analyzer

import (
	"go/parser"
	"go/token"
	"math"
	"math/big"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/analysistest"
)

func testdata(t *testing.T) string {
	dir, err := filepath.Abs(filepath.Join("..", "testdata"))
	if err != nil {
		t.Fatal(err)
	}
	return dir
}

// The packages of testdata/src, each a scenario with its expectations in
// // want comments. The numbers in the wants are facts of the trade,
// written from memory: 20! ≈ 2.43e18 is the largest factorial in int64
// and 170! ≈ 7.26e306 in float64 (OEIS A000142), C(66, 33) the largest
// central binomial in int64 (OEIS A000984), the Catalan number C₃₅ the
// largest in int64 (OEIS A000108), 33!! the largest double factorial in
// int64 (OEIS A006882), Γ(x) overflows float64 just above x = 171.62
// (DLMF 5.4.1 with 170!). TestScenarios re-derives each threshold it can
// parse out of a message with math/big or math.Gamma.
var scenarios = []string{
	"cardshuffle", "mathkit", "bottling", "staffing", "gasmodel", "dice",
	"reliability", "generic", "gentable", "tables", "oddcode", "seating",
	"labtables", "raffle", "pickroute", "linkbudget", "gameodds", "clinicq", "germtrial",
	"linebroaden", "sparecheck", "queuedesk", "spinstats", "puzzlebox", "exacttest",
	"orbitals", "curveforge", "latticeprice", "outbreak", "fieldgene",
	"annuity", "claimfreq", "bracketodds", "dspwindow", "repairshop",
	"speciesrich", "coalesce", "microstates", "matchgoals", "bezierkit",
}

// logSpacePackages are the category packages beside the analyzer of the
// categories no realistic scenario above exercises (the log-space ones):
// TestScenarios checks their diagnostics with the scenarios'.
var logSpacePackages = []string{"lgammasign", "lgammadigits", "lgammainteger", "lgammaoverflow", "stirlingapproximation"}

// TestScenarios runs the analyzer over every scenario package in one
// load, checks the // want expectations, and then checks the emitted
// diagnostics against the category list and against math/big.
func TestScenarios(t *testing.T) {
	results := analysistest.Run(t, testdata(t), Analyzer, scenarios...)
	results = append(results, analysistest.Run(t, analysistest.TestData(), Analyzer, logSpacePackages...)...)
	var diags []analysis.Diagnostic
	unrelated := make(map[string]bool)
	for _, r := range results {
		diags = append(diags, r.Diagnostics...)
		checkRelated(t, r.Pass.Fset, r.Diagnostics, unrelated)
	}
	for k := range relatedOpen {
		if !unrelated[k] {
			t.Errorf("relatedOpen lists %s, which has no finding without its definition any more: remove it", k)
		}
	}
	if len(diags) == 0 {
		t.Fatal("no diagnostics at all")
	}
	t.Run("categories", func(t *testing.T) { checkCategories(t, diags) })
	t.Run("factorial-numbers", func(t *testing.T) { checkFactorialNumbers(t, diags) })
	t.Run("binomial-numbers", func(t *testing.T) { checkBinomialNumbers(t, diags) })
	t.Run("gamma-numbers", func(t *testing.T) { checkGammaNumbers(t, diags) })
	t.Run("chain-fix", func(t *testing.T) { checkChainFix(t, results) })
}

// checkChainFix: a ratio built over several statements (bottling's
// r := n!; r /= k!; r /= (n-k)!) is reported at its last link; its
// factorial function returns 1 below zero (mathkit.Factorial's loop runs
// no trip there), so the fix can give the start the whole value, exact
// outside 0 ≤ k ≤ n too, and delete the links.
func checkChainFix(t *testing.T, results []*analysistest.Result) {
	found := false
	for _, r := range results {
		for _, d := range r.Diagnostics {
			p := r.Pass.Fset.Position(d.Pos)
			if filepath.Base(p.Filename) != "plan.go" || p.Line != 152 || r.Pass.Pkg.Name() != "bottling" {
				continue
			}
			found = true
			if len(d.SuggestedFixes) != 1 || !strings.Contains(d.SuggestedFixes[0].Message, "MustChooseInt64") {
				t.Errorf("%s: the chained ratio's fixes are %v, want the rewrite to MustChooseInt64", p, d.SuggestedFixes)
			}
		}
	}
	if !found {
		t.Error("no finding at bottling/plan.go:152")
	}
}

// checkCategories: every category emitted is listed, with its URL.
func checkCategories(t *testing.T, diags []analysis.Diagnostic) {
	listed := make(map[string]CategoryInfo)
	for _, c := range Categories() {
		if c.Title == "" || !strings.HasPrefix(c.Help, "https://github.com/overfact/overfact#") {
			t.Errorf("category %q lacks a title or an anchor URL: %+v", c.ID, c)
		}
		listed[c.ID] = c
	}
	seen := make(map[string]bool)
	for _, d := range diags {
		c, ok := listed[d.Category]
		if !ok {
			t.Errorf("category %q of %q is not in Categories()", d.Category, d.Message)
			continue
		}
		if d.URL != c.Help {
			t.Errorf("diagnostic URL %q, category help %q", d.URL, c.Help)
		}
		seen[d.Category] = true
	}
	// The scenarios exercise every pattern at least in its possible form.
	for _, p := range patterns {
		if !seen[p.id] && !seen[p.id+definiteSuffix] {
			t.Errorf("no scenario emits category %q", p.id)
		}
	}
}

// maxOf returns the largest finite value of a predeclared numeric type,
// computed here from the language specification's type sizes (not by
// the thresholds package), as an exact big.Float.
func maxOf(t *testing.T, name string) *big.Float {
	switch name {
	case "float64":
		return new(big.Float).SetFloat64(math.MaxFloat64)
	case "float32":
		return new(big.Float).SetFloat64(math.MaxFloat32)
	}
	bits := map[string]uint{"int8": 7, "int16": 15, "int32": 31, "int64": 63, "int": 63,
		"uint8": 8, "uint16": 16, "uint32": 32, "uint64": 64, "uint": 64}[name]
	if bits == 0 {
		t.Fatalf("unknown type %q", name)
	}
	m := new(big.Int).Sub(new(big.Int).Lsh(big.NewInt(1), bits), big.NewInt(1))
	return new(big.Float).SetInt(m)
}

func fits(t *testing.T, v *big.Int, typ string) bool {
	return new(big.Float).SetInt(v).Cmp(maxOf(t, typ)) <= 0
}

// doubleFact is n!! by its definition.
func doubleFact(n int64) *big.Int {
	r := big.NewInt(1)
	for i := n; i > 1; i -= 2 {
		r.Mul(r, big.NewInt(i))
	}
	return r
}

var factorialMsg = regexp.MustCompile(`(double )?factorial of (\w+) in (\w+)[^:]*? (?:wraps|overflows to \+Inf) for (\w+) ≥ (\d+) \((\d+)(!!?) ≈ ([0-9.e]+) is the largest that fits\)`)

// checkFactorialNumbers parses "factorial of n in T wraps for n ≥ N
// ((N-1)! ≈ X …)" and checks with math/big that N! does not fit T, that
// (N−1)! does, and that X is (N−1)! to three digits.
func checkFactorialNumbers(t *testing.T, diags []analysis.Diagnostic) {
	checked := 0
	for _, d := range diags {
		m := factorialMsg.FindStringSubmatch(d.Message)
		if m == nil || m[2] != m[4] {
			continue
		}
		typ := m[3]
		n, _ := strconv.ParseInt(m[5], 10, 64)
		last, _ := strconv.ParseInt(m[6], 10, 64)
		val := func(k int64) *big.Int { return new(big.Int).MulRange(1, k) }
		if m[1] != "" {
			val = doubleFact
		}
		if last != n-1 {
			t.Errorf("%q: largest that fits is %d, first bad %d", d.Message, last, n)
		}
		if fits(t, val(n), typ) || !fits(t, val(n-1), typ) {
			t.Errorf("%q: math/big disagrees about %d in %s", d.Message, n, typ)
		}
		approx, _ := strconv.ParseFloat(m[8], 64)
		exact, _ := new(big.Float).SetInt(val(n - 1)).Float64()
		if math.Abs(approx-exact)/exact > 0.005 {
			t.Errorf("%q: %s is not %d%s ≈ %g", d.Message, m[8], n-1, m[7], exact)
		}
		checked++
	}
	if checked < 10 {
		t.Errorf("only %d factorial messages checked", checked)
	}
}

var (
	centralMsg = regexp.MustCompile(`in (\w+): .* C\((\w+), (\w+)/2\) itself fits up to (\w+) = (\d+)`)
	loopMsg    = regexp.MustCompile(`multiplicative binomial loop in (\w+): .* for (\w+) ≥ (\d+) at k = (\w+)/2`)
)

// loopPeakFits runs b = b*(n-k+i)/i for i = 1..k in math/big and
// reports whether every intermediate fits typ.
func loopPeakFits(t *testing.T, n, k int64, typ string) bool {
	b := big.NewInt(1)
	for i := int64(1); i <= k; i++ {
		b.Mul(b, big.NewInt(n-k+i))
		if !fits(t, b, typ) {
			return false
		}
		b.Quo(b, big.NewInt(i))
	}
	return true
}

// checkBinomialNumbers checks "C(n, n/2) itself fits up to n = N" and the
// binomial-loop threshold against math/big.
func checkBinomialNumbers(t *testing.T, diags []analysis.Diagnostic) {
	checked := 0
	for _, d := range diags {
		if m := centralMsg.FindStringSubmatch(d.Message); m != nil {
			n, _ := strconv.ParseInt(m[5], 10, 64)
			if !fits(t, new(big.Int).Binomial(n, n/2), m[1]) || fits(t, new(big.Int).Binomial(n+1, (n+1)/2), m[1]) {
				t.Errorf("%q: math/big disagrees that C(%d, %d) is the last central binomial in %s", d.Message, n, n/2, m[1])
			}
			checked++
		}
		if m := loopMsg.FindStringSubmatch(d.Message); m != nil {
			n, _ := strconv.ParseInt(m[3], 10, 64)
			if loopPeakFits(t, n, n/2, m[1]) || !loopPeakFits(t, n-1, (n-1)/2, m[1]) {
				t.Errorf("%q: a math/big run of the loop disagrees about n = %d in %s", d.Message, n, m[1])
			}
			checked++
		}
	}
	if checked < 3 {
		t.Errorf("only %d binomial messages checked", checked)
	}
}

var studentMsg = regexp.MustCompile(`math.Gamma\(\(v \+ 1\) / 2\) is \+Inf for nu ≥ (\d+)`)

// checkGammaNumbers checks the Student-t threshold with the standard
// library's math.Gamma: Γ((ν+1)/2) is +Inf at the stated ν and finite
// just below.
func checkGammaNumbers(t *testing.T, diags []analysis.Diagnostic) {
	for _, d := range diags {
		if m := studentMsg.FindStringSubmatch(d.Message); m != nil {
			nu, _ := strconv.ParseFloat(m[1], 64)
			if !math.IsInf(math.Gamma((nu+1)/2), 1) || math.IsInf(math.Gamma(nu/2), 1) {
				t.Errorf("%q: math.Gamma disagrees about ν = %g", d.Message, nu)
			}
			return
		}
	}
	t.Error("no Student-t message found")
}

// TestDocIsPackageComment checks that Analyzer.Doc is the package
// comment of doc.go, its single source, from the heading on: the
// synopsis line that go vet and the command's usage show first, and the
// directive syntax users read in go doc.
func TestDocIsPackageComment(t *testing.T) {
	f, err := parser.ParseFile(token.NewFileSet(), "doc.go", nil, parser.ParseComments|parser.PackageClauseOnly)
	if err != nil {
		t.Fatal(err)
	}
	text := f.Doc.Text()
	const header = "# Analyzer overfact\n\n"
	i := strings.Index(text, header)
	if i < 0 {
		t.Fatalf("package comment lacks %q", header)
	}
	if got, want := Analyzer.Doc, strings.TrimSpace(text[i+len(header):]); got != want {
		t.Errorf("Analyzer.Doc differs from the package comment:\n--- comment ---\n%s\n--- Doc ---\n%s", want, got)
	}
	if !strings.HasPrefix(Analyzer.Doc, "overfact: report factorial arithmetic") || !strings.Contains(Analyzer.Doc, "//overfact:assume n <= 20") {
		t.Errorf("Analyzer.Doc lacks its synopsis or the directive syntax:\n%s", Analyzer.Doc)
	}
}

// relatedOpen lists the findings of the fifth held-out set
// (docs/blind5-labels.tsv) that name a binomial function's calls but not
// its declaration, keyed by package directory, file and line. Like the
// after-fix lists it may only shrink: TestScenarios fails when a listed
// finding is gone or points at the declaration.
var relatedOpen = map[string]string{}

// checkRelated: a finding about a value that comes from a call of a
// factorial function points at that function's declaration. The findings
// listed in relatedOpen that have none are recorded in unrelated instead.
func checkRelated(t *testing.T, fset *token.FileSet, diags []analysis.Diagnostic, unrelated map[string]bool) {
	for _, d := range diags {
		switch strings.TrimSuffix(d.Category, definiteSuffix) {
		case catRatio, catCall, catLateConv:
		default:
			continue
		}
		pos := fset.Position(d.Pos)
		key := filepath.Base(filepath.Dir(pos.Filename)) + "/" + filepath.Base(pos.Filename) + ":" + strconv.Itoa(pos.Line)
		if _, open := relatedOpen[key]; open && len(d.Related) == 0 {
			unrelated[key] = true
			continue
		}
		if len(d.Related) != 1 {
			t.Errorf("%s: %q has %d related positions, want the definition", fset.Position(d.Pos), d.Message, len(d.Related))
			continue
		}
		p := fset.Position(d.Related[0].Pos)
		src, err := os.ReadFile(p.Filename)
		if err != nil {
			t.Fatal(err)
		}
		lines := strings.Split(string(src), "\n")
		if p.Line < 1 || p.Line > len(lines) || !strings.HasPrefix(lines[p.Line-1], "func ") {
			t.Errorf("%s: related position %s is not a function declaration", fset.Position(d.Pos), p)
		}
	}
}

// TestCategoryRules checks the category rules that report writers and
// drivers take from the analyzer instead of spelling category names: the
// definite form (suffix ".definite", as doc.go documents) is an error and
// the bare form a warning, and only the findings at a factorial's
// definition, whose fix is a range guard, have their fixes applied last.
func TestCategoryRules(t *testing.T) {
	for _, c := range Categories() {
		definite := strings.HasSuffix(c.ID, ".definite")
		want := SeverityWarning
		if definite {
			want = SeverityError
		}
		if isDefinite(c.ID) != definite || Severity(c.ID) != want {
			t.Errorf("%s: isDefinite = %v, Severity = %q", c.ID, isDefinite(c.ID), Severity(c.ID))
		}
		base := strings.TrimSuffix(c.ID, ".definite")
		if got, want := FixesLast(c.ID), base == "factorial-loop" || base == "factorial-recursion"; got != want {
			t.Errorf("FixesLast(%s) = %v, want %v", c.ID, got, want)
		}
	}
}
