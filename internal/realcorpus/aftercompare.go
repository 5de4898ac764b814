package main

import (
	"bufio"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
)

// An afterResult is one printed result of the after-fix test.
type afterResult struct {
	kind      string // value, panic, timeout, missing
	value     string // the value, or the panic's message
	judgement string // right, wrong, nofit, or - (no exact value)
}

// afterRun is the output of the after-fix test in one copy of a module:
// the probe results by label id, and the grid results by id and point.
type afterRun struct {
	probes map[string]afterResult
	grid   map[string]map[string]afterResult
	points map[string][]string // grid points in output order
}

func parseAfterResult(s string) afterResult {
	kind, rest, _ := strings.Cut(s, " ")
	switch kind {
	case "value":
		v, j, _ := strings.Cut(rest, " ")
		return afterResult{kind: kind, value: v, judgement: j}
	case "panic":
		if m, err := strconv.Unquote(rest); err == nil {
			rest = m
		}
		return afterResult{kind: kind, value: rest}
	}
	return afterResult{kind: kind}
}

// readAfter reads the output of go test -v of the after-fix test.
func readAfter(r io.Reader) (afterRun, error) {
	run := afterRun{probes: map[string]afterResult{}, grid: map[string]map[string]afterResult{}, points: map[string][]string{}}
	sc := bufio.NewScanner(r)
	sc.Buffer(make([]byte, 0, 64*1024), 1<<20)
	for sc.Scan() {
		line := sc.Text()
		switch {
		case strings.HasPrefix(line, "AFTER PROBE "):
			id, res, ok := strings.Cut(strings.TrimPrefix(line, "AFTER PROBE "), "\t")
			if !ok {
				return run, fmt.Errorf("bad line %q", line)
			}
			run.probes[id] = parseAfterResult(res)
		case strings.HasPrefix(line, "AFTER GRID "):
			f := strings.SplitN(strings.TrimPrefix(line, "AFTER GRID "), "\t", 3)
			if len(f) != 3 {
				return run, fmt.Errorf("bad line %q", line)
			}
			if run.grid[f[0]] == nil {
				run.grid[f[0]] = map[string]afterResult{}
			}
			run.grid[f[0]][f[1]] = parseAfterResult(f[2])
			run.points[f[0]] = append(run.points[f[0]], f[1])
		}
	}
	return run, sc.Err()
}

// sameValue reports whether two printed values are the same: equal
// integers, or floats within afterTolerance relative (NaN equal to NaN,
// an infinity to itself).
func sameValue(a, b string) bool {
	if a == b {
		return true
	}
	x, err1 := strconv.ParseFloat(a, 64)
	y, err2 := strconv.ParseFloat(b, 64)
	if err1 != nil || err2 != nil {
		return false
	}
	if math.IsNaN(x) || math.IsNaN(y) || math.IsInf(x, 0) || math.IsInf(y, 0) {
		return false
	}
	return math.Abs(x-y) <= afterTolerance*math.Abs(x)
}

func finite(v string) bool {
	x, err := strconv.ParseFloat(v, 64)
	return err == nil && !math.IsNaN(x) && !math.IsInf(x, 0)
}

// The verdicts of one labelled function after -fix.
const (
	afterRight    = "right after fix"       // BAD: right at the probe and on every grid point whose exact value fits
	afterWrong    = "still wrong"           // BAD: wrong somewhere its exact value fits, without a panic
	afterFailing  = "newly failing"         // a panic where the exact value fits (or, without one, where the original gave a finite value)
	afterChanged  = "right value changed"   // a value the original got right (SAFE: any value) differs after the fix
	afterSame     = "unchanged"             // SAFE: the same on every grid point
	afterNoGrid   = "no grid, source same"  // SAFE without a grid whose source the fix left alone
	afterUnproved = "no grid, source fixed" // SAFE without a grid whose source the fix changed
)

// A judged function: its verdict and the points that decided it.
type afterVerdict struct {
	label   label
	verdict string
	points  int      // grid points compared
	notes   []string // the first points that decided a bad verdict
}

// judgeAfter compares the original's and the fixed copy's results for
// one labelled function. changed says whether the fix edited its source.
func judgeAfter(l label, orig, fixed afterRun, changed bool) afterVerdict {
	id := probeID(l)
	v := afterVerdict{label: l}
	failing, wrong, changedRight := 0, 0, 0
	note := func(format string, args ...interface{}) {
		if len(v.notes) < 4 {
			v.notes = append(v.notes, fmt.Sprintf(format, args...))
		}
	}
	if l.Verdict == verdictBad {
		o, ok1 := orig.probes[id]
		f, ok2 := fixed.probes[id]
		switch {
		case !ok1 || !ok2:
			wrong++
			note("probe: no result (original %v, fixed %v)", ok1, ok2)
		case f.kind == "panic" && o.judgement == "nofit":
		case f.kind == "panic":
			failing++
			note("probe: panics (%s) where the exact value fits", f.value)
		case f.kind != "value" || f.judgement != "right":
			wrong++
			note("probe: fixed %s %s (%s), original %s", f.kind, f.value, f.judgement, o.value)
		}
	}
	for _, p := range orig.points[id] {
		o := orig.grid[id][p]
		f, ok := fixed.grid[id][p]
		if !ok {
			f = afterResult{kind: "missing"}
		}
		v.points++
		switch {
		case o.kind != "value":
			// The original panicked or hung: nothing to keep.
			if l.Verdict == verdictBad && f.kind == "value" && f.judgement == "wrong" {
				wrong++
				note("%s: fixed %s wrong (original %s)", p, f.value, o.kind)
			}
		case o.judgement == "right" || (o.judgement == "-" && (l.Verdict == verdictSafe || finite(o.value))):
			// A value to keep: the original is right here (SAFE: everywhere).
			if f.kind == "panic" {
				failing++
				note("%s: panics (%s); original %s", p, f.value, o.value)
			} else if f.kind != "value" || !sameValue(o.value, f.value) && !(o.value == f.value) {
				changedRight++
				note("%s: %s %s, original %s", p, f.kind, f.value, o.value)
			}
		case o.judgement == "nofit" || o.judgement == "-":
			// Past the type's range, any value or a panic is acceptable;
			// without an exact value, a point where the original was not
			// finite is not judged.
		default:
			// The original is wrong here.
			switch {
			case f.kind == "panic":
				failing++
				note("%s: panics (%s) where the exact value fits; original %s", p, f.value, o.value)
			case f.kind == "value" && f.judgement == "right":
			default:
				wrong++
				note("%s: fixed %s %s, original %s", p, f.kind, f.value, o.value)
			}
		}
	}
	switch {
	case failing > 0:
		v.verdict = afterFailing
	case changedRight > 0:
		v.verdict = afterChanged
	case l.Verdict == verdictSafe && v.points == 0 && changed:
		v.verdict = afterUnproved
	case l.Verdict == verdictSafe && v.points == 0:
		v.verdict = afterNoGrid
	case l.Verdict == verdictSafe:
		v.verdict = afterSame
	case wrong > 0:
		v.verdict = afterWrong
	default:
		v.verdict = afterRight
	}
	return v
}

// afterTally is one row of the after-fix table.
type afterTally struct {
	bad, right, wrong, failing, badChanged int
	safe, safeChanged, safeGrid, noGrid    int
	points                                 int
}

func (t *afterTally) add(v afterVerdict) {
	t.points += v.points
	if v.label.Verdict == verdictBad {
		t.bad++
		switch v.verdict {
		case afterRight:
			t.right++
		case afterWrong:
			t.wrong++
		case afterFailing:
			t.failing++
		case afterChanged:
			t.badChanged++
		}
		return
	}
	t.safe++
	switch v.verdict {
	case afterChanged, afterFailing:
		t.safeChanged++
	case afterSame:
		t.safeGrid++
	default:
		t.noGrid++
	}
}

func (t *afterTally) sum(u afterTally) {
	t.bad += u.bad
	t.right += u.right
	t.wrong += u.wrong
	t.failing += u.failing
	t.badChanged += u.badChanged
	t.safe += u.safe
	t.safeChanged += u.safeChanged
	t.safeGrid += u.safeGrid
	t.noGrid += u.noGrid
	t.points += u.points
}

// A moduleAfter is one module's after-fix outputs.
type moduleAfter struct {
	Module        string
	Orig, Fixed   afterRun
	ChangedFuncs  map[string]bool // label keys of the functions whose source the fix changed
	ProbesMissing bool            // the after-fix test did not run
}

// compareAfter writes the after-fix table per module and in total, then
// every function that is not right (BAD) or unchanged (SAFE) with the
// points that decided it. It returns the totals.
func compareAfter(w io.Writer, labels []label, mods []moduleAfter) afterTally {
	var total afterTally
	var verdicts []afterVerdict
	fmt.Fprintf(w, "| module | BAD | right after fix | still wrong | newly failing | right values changed | SAFE | SAFE changed | SAFE unchanged on a grid | SAFE without a grid | grid points |\n")
	fmt.Fprintf(w, "|---|---|---|---|---|---|---|---|---|---|---|\n")
	row := func(name string, t afterTally) {
		fmt.Fprintf(w, "| %s | %d | %d | %d | %d | %d | %d | %d | %d | %d | %d |\n", name, t.bad, t.right, t.wrong, t.failing, t.badChanged, t.safe, t.safeChanged, t.safeGrid, t.noGrid, t.points)
	}
	for _, m := range mods {
		var t afterTally
		for _, l := range overflowLabels(labels, m.Module) {
			v := judgeAfter(l, m.Orig, m.Fixed, m.ChangedFuncs[l.key()])
			t.add(v)
			verdicts = append(verdicts, v)
		}
		row(m.Module, t)
		total.sum(t)
	}
	row("**total**", total)
	sort.SliceStable(verdicts, func(i, j int) bool { return verdicts[i].verdict < verdicts[j].verdict })
	fmt.Fprintf(w, "\n")
	for _, v := range verdicts {
		if v.verdict == afterRight || v.verdict == afterSame || v.verdict == afterNoGrid {
			continue
		}
		fmt.Fprintf(w, "%s %s %s (%d grid points)\n", strings.ToUpper(strings.ReplaceAll(v.verdict, " ", "-")), v.label.Verdict, probeID(v.label), v.points)
		for _, n := range v.notes {
			fmt.Fprintf(w, "\t%s\n", n)
		}
	}
	for _, v := range verdicts {
		if v.verdict == afterRight {
			fmt.Fprintf(w, "RIGHT-AFTER-FIX %s (%d grid points)\n", probeID(v.label), v.points)
		}
	}
	return total
}

// changedFuncs returns the keys of the labels of module whose function
// text differs between the original copy at origDir and the fixed one.
func changedFuncs(labels []label, module, origDir, fixedDir string) (map[string]bool, error) {
	text := func(dir string) (map[string]string, error) {
		spans, err := moduleSpans(dir)
		if err != nil {
			return nil, err
		}
		files := map[string][]string{}
		out := map[string]string{}
		for _, s := range spans {
			lines, ok := files[s.File]
			if !ok {
				data, err := os.ReadFile(filepath.Join(dir, filepath.FromSlash(s.File)))
				if err != nil {
					return nil, err
				}
				lines = strings.Split(string(data), "\n")
				files[s.File] = lines
			}
			out[s.File+"\t"+s.Func] += strings.Join(lines[s.Start-1:s.End], "\n")
		}
		return out, nil
	}
	a, err := text(origDir)
	if err != nil {
		return nil, err
	}
	b, err := text(fixedDir)
	if err != nil {
		return nil, err
	}
	out := map[string]bool{}
	for _, l := range overflowLabels(labels, module) {
		k := l.File + "\t" + l.Func
		if a[k] != b[k] {
			out[l.key()] = true
		}
	}
	return out, nil
}
