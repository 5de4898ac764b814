package main

import (
	"bytes"
	"go/parser"
	"go/token"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestLabelsFile checks the committed corpus files: the labels parse,
// every BAD label has a probe and a reference that are Go expressions,
// both verdicts occur, every label's module is listed at its version,
// and the probe helpers are Go files.
func TestLabelsFile(t *testing.T) {
	labels, err := readLabels("../../testdata/realcorpus/labels.tsv")
	if err != nil {
		t.Fatal(err)
	}
	mods, err := readModules("../../testdata/realcorpus/modules.tsv")
	if err != nil {
		t.Fatal(err)
	}
	if err := checkCorpus(labels, mods); err != nil {
		t.Fatal(err)
	}
	count := map[string]int{}
	labelled := map[string]bool{}
	for _, l := range labels {
		count[l.Verdict]++
		labelled[l.Module] = true
		if !l.bad() {
			continue
		}
		for _, e := range []string{l.Probe, l.Want} {
			if _, err := parser.ParseExpr(e); err != nil {
				t.Errorf("labels line %d: %q is not a Go expression: %v", l.lineNo, e, err)
			}
		}
	}
	if count[verdictBad] == 0 || count[verdictSafe] == 0 {
		t.Errorf("labels: %d BAD, %d SAFE; the corpus needs both", count[verdictBad], count[verdictSafe])
	}
	if count[verdictDigitsBad] == 0 {
		t.Errorf("labels: no DIGITS-BAD label; the lgamma-digits findings would all count as false positives")
	}
	for _, m := range mods {
		if !labelled[m.Module] {
			t.Errorf("module %s has no labels", m.Module)
		}
	}
	helpers, _ := filepath.Glob("../../testdata/realcorpus/helpers/*.go.txt")
	for _, h := range helpers {
		src, err := os.ReadFile(h)
		if err != nil {
			t.Fatal(err)
		}
		if !strings.Contains(string(src), "package __PKG__") {
			t.Errorf("%s: no package __PKG__ clause", h)
		}
		if _, err := parser.ParseFile(token.NewFileSet(), h, strings.Replace(string(src), "__PKG__", "p", 1), 0); err != nil {
			t.Errorf("%s: %v", h, err)
		}
	}
	t.Logf("%d labels (%d BAD, %d SAFE, %d DIGITS-BAD, %d DIGITS-SAFE) in %d modules", len(labels),
		count[verdictBad], count[verdictSafe], count[verdictDigitsBad], count[verdictDigitsSafe], len(mods))
}

const header = "module\tversion\tpackage\tfile\tfunction\tline\tverdict\tshape\tprobe\twant\n"

func TestParseLabelsRejects(t *testing.T) {
	good := "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tBAD\tfactorial loop\tF(21)\texFact(21)\n"
	if _, err := parseLabels(strings.NewReader(header + good)); err != nil {
		t.Fatalf("good line rejected: %v", err)
	}
	for _, tc := range []struct{ name, line string }{
		{"BAD without probe", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tBAD\tloop\t\t\n"},
		{"BAD without reference", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tBAD\tloop\tF(21)\t\n"},
		{"SAFE with probe", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tSAFE\tloop\tF(21)\texFact(21)\n"},
		{"unknown verdict", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tMAYBE\tloop\t\t\n"},
		{"DIGITS-BAD without probe", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tDIGITS-BAD\texp of lgamma\t\t\n"},
		{"DIGITS-SAFE with probe", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tDIGITS-SAFE\texp of lgamma\tF(21)\texFact(21)\n"},
		{"missing column", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tSAFE\tloop\t\n"},
		{"bad line number", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\tx\tSAFE\tloop\t\t\n"},
		{"package outside module", "example.com/m\tv1.0.0\texample.com/other\tp/a.go\tF\t3\tSAFE\tloop\t\t\n"},
		{"test file", "example.com/m\tv1.0.0\texample.com/m/p\tp/a_test.go\tF\t3\tSAFE\tloop\t\t\n"},
		{"no shape", "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tSAFE\t\t\t\n"},
		{"version without v", "example.com/m\t1.0.0\texample.com/m/p\tp/a.go\tF\t3\tSAFE\tloop\t\t\n"},
	} {
		if _, err := parseLabels(strings.NewReader(header + tc.line)); err == nil {
			t.Errorf("%s: accepted", tc.name)
		}
	}
	if _, err := parseLabels(strings.NewReader(header + good + good)); err == nil {
		t.Errorf("a function labelled twice: accepted")
	}
	// One label per dimension: overflow and digits verdicts may stand
	// side by side, two digits verdicts may not.
	digits := "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tF\t3\tDIGITS-SAFE\texp of lgamma\t\t\n"
	if _, err := parseLabels(strings.NewReader(header + good + digits)); err != nil {
		t.Errorf("an overflow and a digits label of one function rejected: %v", err)
	}
	if _, err := parseLabels(strings.NewReader(header + digits + digits)); err == nil {
		t.Errorf("a function labelled twice for digits: accepted")
	}
	if _, err := parseLabels(strings.NewReader(good)); err == nil {
		t.Errorf("no header: accepted")
	}
}

// TestScore runs the matching on a module of five functions written
// here, with findings in the form overfact -json prints: lgamma-digits
// findings are scored against the digits labels only, every other
// category against the overflow labels only.
func TestScore(t *testing.T) {
	dir := t.TempDir()
	src := `package p

func Bad(n int) int {
	f := 1
	for i := 2; i <= n; i++ {
		f *= i
	}
	return f
}

func Missed(n float64) float64 { return n }

func Safe(n int) int {
	return n
}

func Other() {}

func Lost(a float64) float64 {
	return a
}
`
	if err := os.MkdirAll(filepath.Join(dir, "p"), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "p", "a.go"), []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	labels, err := parseLabels(strings.NewReader(header +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tBad\t3\tBAD\tfactorial loop\tBad(21)\texFact(21)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tMissed\t11\tBAD\tnothing\tMissed(1)\tofpF(2)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tSafe\t13\tSAFE\tidentity\t\t\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tBad\t3\tDIGITS-SAFE\tno exponential\t\t\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tLost\t19\tDIGITS-BAD\texp of lgamma\tLost(1)\tofpF(2)\n"))
	if err != nil {
		t.Fatal(err)
	}
	file := filepath.Join(dir, "p", "a.go")
	js := `{"example.com/m/p": {"overfact": [
		{"posn": "` + file + `:6:3", "message": "factorial wraps"},
		{"posn": "` + file + `:14:9", "message": "on a safe function"},
		{"posn": "` + file + `:17:1", "message": "on an unlabelled function"},
		{"category": "lgamma-digits", "posn": "` + file + `:20:9", "message": "digits lost"},
		{"category": "lgamma-digits", "posn": "` + file + `:11:40", "message": "digits in an overflow-BAD function"},
		{"category": "lgamma-digits", "posn": "` + file + `:7:3", "message": "digits in a DIGITS-SAFE function"}
	]}}`
	found, errs, err := readFindings([]byte(js), dir)
	if err != nil || len(errs) != 0 || len(found) != 6 {
		t.Fatalf("readFindings: %d findings, errors %v, %v", len(found), errs, err)
	}
	var out bytes.Buffer
	if err := score(&out, labels, []moduleRun{{Module: "example.com/m", Version: "v1.0.0", Dir: dir, Findings: found}}); err != nil {
		t.Fatal(err)
	}
	got := out.String()
	// Overflow: BAD 2, SAFE 1, findings 3, TP 1, FN 1 (Missed: its
	// lgamma-digits finding does not count here), FP 2 (Safe and
	// Other), recall 1/2, precision 1/3. Digits: BAD 1, SAFE 1,
	// findings 3, TP 1 (Lost), FN 0, FP 2 (Bad, labelled DIGITS-SAFE,
	// and Missed, without a digits label), recall 1, precision 1/3.
	for _, want := range []string{
		"## overflow\n\n| module |",
		"| example.com/m | v1.0.0 | 2 | 1 | 3 | 1 | 1 | 2 | 0.500 (1/2) | 0.333 (1/3) |",
		"p/a.go Safe [SAFE]",
		"p/a.go Other [unlabelled]",
		"example.com/m/p/a.go:11 Missed: nothing",
		"Found overflow-bad functions, 1:\n- example.com/m/p/a.go:3 Bad: factorial loop",
		"## digits\n\n| module |",
		"| example.com/m | v1.0.0 | 1 | 1 | 3 | 1 | 0 | 2 | 1.000 (1/1) | 0.333 (1/3) |",
		"p/a.go Bad [DIGITS-SAFE]\n    7: digits in a DIGITS-SAFE function",
		"p/a.go Missed [unlabelled]\n    11: digits in an overflow-BAD function",
		"Found digits-bad functions, 1:\n- example.com/m/p/a.go:19 Lost: exp of lgamma",
		"| overflow + digits | 3 | 2 | 6 | 2 | 1 | 4 | 0.667 (2/3) | 0.333 (2/6) |",
	} {
		if !strings.Contains(got, want) {
			t.Errorf("score output lacks %q:\n%s", want, got)
		}
	}

	// A label whose function is not at its line is an error.
	stale, _ := parseLabels(strings.NewReader(header + "example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tSafe\t12\tSAFE\tidentity\t\t\n"))
	if err := score(&out, stale, []moduleRun{{Module: "example.com/m", Version: "v1.0.0", Dir: dir}}); err == nil {
		t.Errorf("a stale line number was accepted")
	}
}

func TestReadFindingsError(t *testing.T) {
	_, errs, err := readFindings([]byte(`{"example.com/m/p": {"overfact": {"error": "type errors"}}}`), "/x")
	if err != nil || len(errs) != 1 || !strings.Contains(errs[0], "type errors") {
		t.Fatalf("errs %v, err %v", errs, err)
	}
}

// TestProbeSource checks that the generated probe file and the helpers
// written beside it are Go source.
func TestProbeSource(t *testing.T) {
	ls, err := parseLabels(strings.NewReader(header +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/a.go\tT.M\t3\tBAD\tloop\tT{}.M(21)\texQuo(exFact(30), exBinom(30, 2))\n"))
	if err != nil {
		t.Fatal(err)
	}
	fset := token.NewFileSet()
	if _, err := parser.ParseFile(fset, "probe.go", probeSource("p", ls), 0); err != nil {
		t.Errorf("probe source: %v", err)
	}
	if _, err := parser.ParseFile(fset, "helpers.go", strings.Replace(probeHelpers, "__PKG__", "p", 1), 0); err != nil {
		t.Errorf("helpers source: %v", err)
	}
}

// TestProbesRun builds and runs the generated probes on a small package
// written here, with the go command and no network. C(21, 1) as
// fact(21)/(fact(1)*fact(20)) in int64 must PASS (wrong value shown: 21!
// wraps, math/big), fact(21) itself must FAIL (21! = 51090942171709440000
// does not fit int64, so a wrapped value is no labelling evidence), a
// float64 factorial at 20 must FAIL (its value is right), and a float64
// C(200, 2) from factorials must PASS (NaN) as an overflow probe but
// FAIL as a digits probe (NaN is an overflow, not lost digits). As
// digits probes, B(100000, 3) from log-gamma values must PASS (exact:
// 2/(100000·100001·100002), DLMF 5.12.1 with integer arguments) and
// B(3, 4) must FAIL (1/60: within the digits tolerance).
func TestProbesRun(t *testing.T) {
	if testing.Short() {
		t.Skip("runs the go command")
	}
	dir := t.TempDir()
	src := `package p

import "math"

func fact(n int64) int64 {
	f := int64(1)
	for i := int64(2); i <= n; i++ {
		f *= i
	}
	return f
}

func ffact(n float64) float64 {
	f := 1.0
	for i := 2.0; i <= n; i++ {
		f *= i
	}
	return f
}

func choose(n, k float64) float64 { return ffact(n) / (ffact(k) * ffact(n-k)) }

func ichoose(n, k int64) int64 { return fact(n) / (fact(k) * fact(n-k)) }

func lbeta(a, b float64) float64 {
	x, _ := math.Lgamma(a)
	y, _ := math.Lgamma(b)
	z, _ := math.Lgamma(a + b)
	return math.Exp(x + y - z)
}

func smallBeta(a, b float64) float64 { return lbeta(a, b) }
`
	must := func(err error) {
		t.Helper()
		if err != nil {
			t.Fatal(err)
		}
	}
	must(os.MkdirAll(filepath.Join(dir, "p"), 0o755))
	must(os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module example.com/m\n\ngo 1.21\n"), 0o644))
	must(os.WriteFile(filepath.Join(dir, "p", "p.go"), []byte(src), 0o644))
	labels, err := parseLabels(strings.NewReader(header +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tfact\t5\tBAD\tint64 factorial loop\tfact(21)\texFact(21)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tffact\t13\tBAD\tfloat64 factorial loop, right here\tfact(20)\texFact(20)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tchoose\t21\tBAD\tbinomial from factorials\tchoose(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tchoose\t21\tDIGITS-BAD\tNaN is no digits loss\tchoose(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tichoose\t23\tBAD\tbinomial from factorials\tichoose(21, 1)\texBinom(21, 1)\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tlbeta\t25\tDIGITS-BAD\texp of log-gamma sums\tlbeta(100000, 3)\texQuo(2, exMul(100000, 100001, 100002))\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tsmallBeta\t32\tDIGITS-BAD\texp of log-gamma sums, small arguments\tsmallBeta(3, 4)\texQuo(1, 60)\n"))
	must(err)
	pkgs, err := writeProbes(labels, "example.com/m", dir, t.TempDir())
	must(err)
	if len(pkgs) != 1 || pkgs[0] != "./p" {
		t.Fatalf("probed packages %v", pkgs)
	}
	cmd := exec.Command("go", "test", "-count=1", "-run", "^"+probeTest+"$", "-v", "./p")
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), "GOWORK=off", "GOFLAGS=-mod=mod", "GOTOOLCHAIN=local")
	out, err := cmd.CombinedOutput()
	if err != nil {
		t.Fatalf("go test: %v\n%s", err, out)
	}
	for _, want := range []string{
		"PROBE FAIL example.com/m/p/p.go:5 fact: the exact value 51090942171709440000 does not fit int64",
		"PROBE PASS example.com/m/p/p.go:23 ichoose: got -1, exact 21 (integer differs)",
		"PROBE FAIL example.com/m/p/p.go:13 ffact: got 2432902008176640000, exact 2432902008176640000: the value is right",
		"PROBE PASS example.com/m/p/p.go:21 choose: got NaN, exact 19900 (NaN)",
		"PROBE FAIL example.com/m/p/p.go:21 choose: got NaN, exact 19900: not finite: an overflow, not lost digits",
		"PROBE PASS example.com/m/p/p.go:25 lbeta: got ",
		"exact 1.99994000139997e-15 (relative error ",
		"PROBE FAIL example.com/m/p/p.go:32 smallBeta: got ",
		"exact 0.016666666666666667: the value is right",
	} {
		if !strings.Contains(string(out), want) {
			t.Errorf("probe output lacks %q:\n%s", want, out)
		}
	}
}

// TestGridsFile checks the committed grids: they parse, and every grid
// names a labelled function of the overflow dimension.
func TestGridsFile(t *testing.T) {
	grids, err := readGrids("../../testdata/realcorpus/grids.tsv")
	if err != nil {
		t.Fatal(err)
	}
	labels, err := readLabels("../../testdata/realcorpus/labels.tsv")
	if err != nil {
		t.Fatal(err)
	}
	labelled := map[string]bool{}
	for _, l := range labels {
		if l.dimension() == dimOverflow {
			labelled[l.Module+"\t"+l.File+"\t"+l.Func] = true
		}
	}
	for _, g := range grids {
		if !labelled[g.Module+"\t"+g.File+"\t"+g.Func] {
			t.Errorf("grids line %d: %s %s is not labelled", g.lineNo, g.File, g.Func)
		}
		if n := g.size(); n == 0 || n > 5000 {
			t.Errorf("grids line %d: %d points", g.lineNo, n)
		}
	}
}

func TestParseGridVars(t *testing.T) {
	vs, err := parseGridVars("n=0..3,170.5 k=1")
	if err != nil {
		t.Fatal(err)
	}
	if len(vs) != 2 || strings.Join(vs[0].Values, ",") != "0,1,2,3,170.5" || strings.Join(vs[1].Values, ",") != "1" {
		t.Errorf("got %+v", vs)
	}
	for _, bad := range []string{"", "n", "n=x", "n=3..1", "n=1 n=2", "1n=2"} {
		if _, err := parseGridVars(bad); err == nil {
			t.Errorf("%q accepted", bad)
		}
	}
}

// TestJudgeAfter checks the verdicts of the -fix mode on outputs written
// here: a BAD function repaired at its probe and on its grid, one that
// still returns NaN, one that now panics where its exact value fits,
// one whose right value moved, and SAFE functions kept, changed, and
// without a grid.
func TestJudgeAfter(t *testing.T) {
	ls, err := parseLabels(strings.NewReader(header +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tFixed\t1\tBAD\tb\tFixed(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tStill\t2\tBAD\tb\tStill(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tPanics\t3\tBAD\tb\tPanics(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tMoved\t4\tBAD\tb\tMoved(200, 2)\texBinom(200, 2)\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tKept\t5\tSAFE\tb\t\t\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tChanged\t6\tSAFE\tb\t\t\n" +
		"example.com/m\tv1.0.0\texample.com/m\ta.go\tBare\t7\tSAFE\tb\t\t\n"))
	if err != nil {
		t.Fatal(err)
	}
	orig := "AFTER PROBE example.com/m/a.go:1 Fixed\tvalue NaN wrong\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=10\tvalue 45 right\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=200\tvalue NaN wrong\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=2000\tvalue NaN nofit\n" +
		"AFTER PROBE example.com/m/a.go:2 Still\tvalue NaN wrong\n" +
		"AFTER PROBE example.com/m/a.go:3 Panics\tvalue NaN wrong\n" +
		"AFTER PROBE example.com/m/a.go:4 Moved\tvalue NaN wrong\n" +
		"AFTER GRID example.com/m/a.go:4 Moved\tn=3\tvalue 3 right\n" +
		"AFTER GRID example.com/m/a.go:5 Kept\tx=1\tvalue 0.5 -\n" +
		"AFTER GRID example.com/m/a.go:5 Kept\tx=2\tvalue +Inf -\n" +
		"AFTER GRID example.com/m/a.go:6 Changed\tx=1\tvalue 0.5 -\n"
	fixed := "AFTER PROBE example.com/m/a.go:1 Fixed\tvalue 19900 right\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=10\tvalue 45.00000000000001 right\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=200\tvalue 19900 right\n" +
		"AFTER GRID example.com/m/a.go:1 Fixed\tn=2000\tpanic \"Fixed: n = 2000 overflows\"\n" +
		"AFTER PROBE example.com/m/a.go:2 Still\tvalue NaN wrong\n" +
		"AFTER PROBE example.com/m/a.go:3 Panics\tpanic \"no\"\n" +
		"AFTER PROBE example.com/m/a.go:4 Moved\tvalue 19900 right\n" +
		"AFTER GRID example.com/m/a.go:4 Moved\tn=3\tvalue 3.1 wrong\n" +
		"AFTER GRID example.com/m/a.go:5 Kept\tx=1\tvalue 0.5 -\n" +
		"AFTER GRID example.com/m/a.go:5 Kept\tx=2\tvalue +Inf -\n" +
		"AFTER GRID example.com/m/a.go:6 Changed\tx=1\tvalue 0.25 -\n"
	o, err := readAfter(strings.NewReader(orig))
	if err != nil {
		t.Fatal(err)
	}
	f, err := readAfter(strings.NewReader(fixed))
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]string{"Fixed": afterRight, "Still": afterWrong, "Panics": afterFailing, "Moved": afterChanged,
		"Kept": afterSame, "Changed": afterChanged, "Bare": afterNoGrid}
	for _, l := range ls {
		if v := judgeAfter(l, o, f, false); v.verdict != want[l.Func] {
			t.Errorf("%s: %q, want %q (%v)", l.Func, v.verdict, want[l.Func], v.notes)
		}
	}
	var out bytes.Buffer
	total := compareAfter(&out, ls, []moduleAfter{{Module: "example.com/m", Orig: o, Fixed: f}})
	if total.bad != 4 || total.right != 1 || total.wrong != 1 || total.failing != 1 || total.badChanged != 1 || total.safe != 3 || total.safeChanged != 1 {
		t.Errorf("totals %+v\n%s", total, out.String())
	}
}

// TestAfterRun writes the after-fix test into an original and a "fixed"
// copy of a small package written here (the fix is made by hand: the
// float binomial from factorials becomes a product of ratios that stays
// finite) and runs both with the go command: the generated grid, the
// probe runner and the comparison must agree that the function is right
// after the fix, with C(n, k) from math/big (exBinom).
func TestAfterRun(t *testing.T) {
	if testing.Short() {
		t.Skip("runs the go command")
	}
	src := `package p

func ffact(n float64) float64 {
	f := 1.0
	for i := 2.0; i <= n; i++ {
		f *= i
	}
	return f
}

func choose(n, k float64) float64 { return ffact(n) / (ffact(k) * ffact(n-k)) }
`
	fixedSrc := strings.Replace(src, "return ffact(n) / (ffact(k) * ffact(n-k)) }", `r := 1.0
	for i := 1.0; i <= k; i++ {
		r = r * (n - k + i) / i
	}
	return r
}`, 1)
	labels, err := parseLabels(strings.NewReader(header +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tffact\t3\tSAFE\tfloat64 factorial loop\t\t\n" +
		"example.com/m\tv1.0.0\texample.com/m/p\tp/p.go\tchoose\t11\tBAD\tbinomial from factorials\tchoose(200, 2)\texBinom(200, 2)\n"))
	if err != nil {
		t.Fatal(err)
	}
	grids, err := parseGrids(strings.Join(gridColumns, "\t") + "\n" +
		"example.com/m\tp/p.go\tchoose\tn=0..5,170,171,200 k=0,1,2\tk <= n\tchoose(n, k)\texBinom(int64(n), int64(k))\n")
	if err != nil {
		t.Fatal(err)
	}
	var runs [2]afterRun
	var dirs [2]string
	for i, s := range []string{src, fixedSrc} {
		dir := t.TempDir()
		dirs[i] = dir
		if err := os.MkdirAll(filepath.Join(dir, "p"), 0o755); err != nil {
			t.Fatal(err)
		}
		os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module example.com/m\n\ngo 1.21\n"), 0o644)
		os.WriteFile(filepath.Join(dir, "p", "p.go"), []byte(s), 0o644)
		pkgs, err := writeAfter(labels, grids, "example.com/m", dir, dirs[0], t.TempDir())
		if err != nil || len(pkgs) != 1 {
			t.Fatalf("packages %v, %v", pkgs, err)
		}
		cmd := exec.Command("go", "test", "-count=1", "-run", "^"+afterTest+"$", "-v", "./p")
		cmd.Dir = dir
		cmd.Env = append(os.Environ(), "GOWORK=off", "GOFLAGS=-mod=mod", "GOTOOLCHAIN=local")
		out, err := cmd.CombinedOutput()
		if err != nil {
			t.Fatalf("go test: %v\n%s", err, out)
		}
		if runs[i], err = readAfter(bytes.NewReader(out)); err != nil {
			t.Fatal(err)
		}
	}
	changed, err := changedFuncs(labels, "example.com/m", dirs[0], dirs[1])
	if err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	total := compareAfter(&out, labels, []moduleAfter{{Module: "example.com/m", Orig: runs[0], Fixed: runs[1], ChangedFuncs: changed}})
	// ffact has a generated grid (numeric signature) and is unchanged.
	if total.right != 1 || total.safeGrid != 1 || total.points == 0 {
		t.Errorf("totals %+v\n%s", total, out.String())
	}
	if p := runs[0].probes["example.com/m/p/p.go:11 choose"]; p.value != "NaN" || p.judgement != "wrong" {
		t.Errorf("original probe %+v", p)
	}
	if !changed[labels[1].key()] || changed[labels[0].key()] {
		t.Errorf("changed functions %v", changed)
	}
}
