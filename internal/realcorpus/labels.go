package main

import (
	"bufio"
	"fmt"
	"io"
	"os"
	"strconv"
	"strings"
)

// A label is one hand-judged function of a published module in one of
// two dimensions. Overflow: whether it silently returns a wrong value
// because an intermediate left its type's range (BAD) or not (SAFE).
// Digits: whether its exponential of log-gamma sums loses digits past
// the digits tolerance for some admitted input (DIGITS-BAD) or not
// (DIGITS-SAFE). A BAD or DIGITS-BAD label carries a probe call and the
// math/big reference it is compared with. A function has at most one
// label per dimension.
type label struct {
	Module  string // module path, as on the module proxy
	Version string // module version
	Package string // import path of the function's package
	File    string // file, relative to the module root
	Func    string // Name, or Recv.Method for a method
	Line    int    // line of the func keyword
	Verdict string // BAD, SAFE, DIGITS-BAD or DIGITS-SAFE
	Shape   string // the arithmetic, in a few words
	Probe   string // BAD, DIGITS-BAD: a Go expression, evaluated in the package, giving the function's value
	Want    string // BAD, DIGITS-BAD: a Go expression giving the exact value (*big.Int or *big.Float)

	lineNo int // line of the labels file, for messages
}

// labelColumns is the header line of the labels file.
var labelColumns = []string{"module", "version", "package", "file", "function", "line", "verdict", "shape", "probe", "want"}

// The verdicts, by dimension.
const (
	verdictBad        = "BAD"
	verdictSafe       = "SAFE"
	verdictDigitsBad  = "DIGITS-BAD"
	verdictDigitsSafe = "DIGITS-SAFE"
)

// The dimensions a label judges.
const (
	dimOverflow = "overflow"
	dimDigits   = "digits"
)

// digitsCategory is the overfact category scored against the digits
// labels; every other category is scored against the overflow labels.
const digitsCategory = "lgamma-digits"

// digitsTolerance is the relative error past which a DIGITS-BAD probe
// shows lost digits: the tolerance the lgamma-digits category reports
// against (docs/patterns.md).
const digitsTolerance = 1e-12

// dimension is the dimension the label's verdict judges.
func (l label) dimension() string {
	if l.Verdict == verdictDigitsBad || l.Verdict == verdictDigitsSafe {
		return dimDigits
	}
	return dimOverflow
}

// bad reports whether the verdict is BAD or DIGITS-BAD.
func (l label) bad() bool { return l.Verdict == verdictBad || l.Verdict == verdictDigitsBad }

// findingDimension is the dimension a finding of category is scored in.
func findingDimension(category string) string {
	if category == digitsCategory {
		return dimDigits
	}
	return dimOverflow
}

func (l label) key() string {
	return l.Module + "\t" + l.File + "\t" + l.Func + "\t" + l.dimension()
}

// readLabels reads a labels file: tab-separated, one header line naming
// labelColumns, lines starting with # ignored.
func readLabels(path string) ([]label, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	ls, err := parseLabels(f)
	if err != nil {
		return nil, fmt.Errorf("%s: %w", path, err)
	}
	return ls, nil
}

func parseLabels(r io.Reader) ([]label, error) {
	var out []label
	sc := bufio.NewScanner(r)
	sc.Buffer(make([]byte, 0, 64*1024), 1<<20)
	header := false
	seen := map[string]int{}
	n := 0
	for sc.Scan() {
		n++
		line := sc.Text()
		if strings.TrimSpace(line) == "" || strings.HasPrefix(line, "#") {
			continue
		}
		cols := strings.Split(line, "\t")
		if !header {
			if strings.Join(cols, "\t") != strings.Join(labelColumns, "\t") {
				return nil, fmt.Errorf("line %d: header must be %q", n, strings.Join(labelColumns, "\\t"))
			}
			header = true
			continue
		}
		if len(cols) != len(labelColumns) {
			return nil, fmt.Errorf("line %d: %d columns, want %d", n, len(cols), len(labelColumns))
		}
		for i, c := range cols {
			cols[i] = strings.TrimSpace(c)
		}
		l := label{Module: cols[0], Version: cols[1], Package: cols[2], File: cols[3], Func: cols[4],
			Verdict: cols[6], Shape: cols[7], Probe: cols[8], Want: cols[9], lineNo: n}
		var err error
		if l.Line, err = strconv.Atoi(cols[5]); err != nil || l.Line <= 0 {
			return nil, fmt.Errorf("line %d: bad line number %q", n, cols[5])
		}
		switch {
		case l.Module == "" || l.Version == "" || l.Package == "" || l.File == "" || l.Func == "":
			return nil, fmt.Errorf("line %d: empty module, version, package, file or function", n)
		case !strings.HasPrefix(l.Version, "v"):
			return nil, fmt.Errorf("line %d: version %q does not start with v", n, l.Version)
		case l.Package != l.Module && !strings.HasPrefix(l.Package, l.Module+"/"):
			return nil, fmt.Errorf("line %d: package %s is not in module %s", n, l.Package, l.Module)
		case !strings.HasSuffix(l.File, ".go") || strings.HasSuffix(l.File, "_test.go"):
			return nil, fmt.Errorf("line %d: file %s is not a non-test Go file", n, l.File)
		case l.Shape == "":
			return nil, fmt.Errorf("line %d: no shape", n)
		}
		switch l.Verdict {
		case verdictBad, verdictDigitsBad:
			if l.Probe == "" || l.Want == "" {
				return nil, fmt.Errorf("line %d: %s %s has no probe or no reference", n, l.Verdict, l.Func)
			}
		case verdictSafe, verdictDigitsSafe:
			if l.Probe != "" || l.Want != "" {
				return nil, fmt.Errorf("line %d: %s %s has a probe", n, l.Verdict, l.Func)
			}
		default:
			return nil, fmt.Errorf("line %d: verdict %q is not BAD, SAFE, DIGITS-BAD or DIGITS-SAFE", n, l.Verdict)
		}
		if prev, ok := seen[l.key()]; ok {
			return nil, fmt.Errorf("line %d: %s %s labelled again for %s (first at line %d)", n, l.File, l.Func, l.dimension(), prev)
		}
		seen[l.key()] = n
		out = append(out, l)
	}
	if err := sc.Err(); err != nil {
		return nil, err
	}
	if !header {
		return nil, fmt.Errorf("no header line")
	}
	return out, nil
}

// A corpusModule is one line of the modules file: a module version and
// the package patterns overfact is run on.
type corpusModule struct {
	Module, Version string
	Patterns        []string
}

var moduleColumns = []string{"module", "version", "packages"}

// readModules reads the modules file: tab-separated, a header line
// naming moduleColumns, lines starting with # ignored.
func readModules(path string) ([]corpusModule, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	var out []corpusModule
	header := false
	seen := map[string]bool{}
	for n, line := range strings.Split(string(data), "\n") {
		if strings.TrimSpace(line) == "" || strings.HasPrefix(line, "#") {
			continue
		}
		cols := strings.Split(line, "\t")
		if !header {
			if strings.Join(cols, "\t") != strings.Join(moduleColumns, "\t") {
				return nil, fmt.Errorf("%s:%d: header must be %q", path, n+1, strings.Join(moduleColumns, "\\t"))
			}
			header = true
			continue
		}
		if len(cols) != len(moduleColumns) {
			return nil, fmt.Errorf("%s:%d: %d columns, want %d", path, n+1, len(cols), len(moduleColumns))
		}
		m := corpusModule{Module: cols[0], Version: cols[1], Patterns: strings.Fields(cols[2])}
		if m.Module == "" || !strings.HasPrefix(m.Version, "v") || len(m.Patterns) == 0 {
			return nil, fmt.Errorf("%s:%d: need a module, a version and package patterns", path, n+1)
		}
		for _, p := range m.Patterns {
			if p != m.Module && p != m.Module+"/..." && !strings.HasPrefix(p, m.Module+"/") {
				return nil, fmt.Errorf("%s:%d: pattern %s is outside module %s", path, n+1, p, m.Module)
			}
		}
		if seen[m.Module] {
			return nil, fmt.Errorf("%s:%d: module %s listed twice", path, n+1, m.Module)
		}
		seen[m.Module] = true
		out = append(out, m)
	}
	if !header {
		return nil, fmt.Errorf("%s: no header line", path)
	}
	return out, nil
}

// checkCorpus checks that every label names a module of the modules
// file at that module's version.
func checkCorpus(labels []label, mods []corpusModule) error {
	version := map[string]string{}
	for _, m := range mods {
		version[m.Module] = m.Version
	}
	for _, l := range labels {
		v, ok := version[l.Module]
		switch {
		case !ok:
			return fmt.Errorf("labels line %d: module %s is not in the modules file", l.lineNo, l.Module)
		case v != l.Version:
			return fmt.Errorf("labels line %d: %s labelled at %s, listed at %s", l.lineNo, l.Module, l.Version, v)
		}
	}
	return nil
}
