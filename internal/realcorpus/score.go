package main

import (
	"encoding/json"
	"fmt"
	"io"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
)

// A finding is one overfact diagnostic, as -json prints it.
type finding struct {
	Category string `json:"category"`
	Posn     string `json:"posn"`
	Message  string `json:"message"`

	file string // relative to the module root
	line int
}

// readFindings reads the output of overfact -json (the go vet -json
// form: package → analyzer → diagnostics, or an object with an error)
// and keeps the findings inside root, with paths made relative to it.
// Errors the analyzer reported for a package are returned as strings.
func readFindings(data []byte, root string) ([]finding, []string, error) {
	var out []finding
	var errs []string
	if len(strings.TrimSpace(string(data))) == 0 {
		return nil, nil, nil
	}
	dec := json.NewDecoder(strings.NewReader(string(data)))
	for {
		var pkgs map[string]map[string]json.RawMessage
		if err := dec.Decode(&pkgs); err == io.EOF {
			break
		} else if err != nil {
			return nil, nil, err
		}
		for pkg, byAnalyzer := range pkgs {
			for _, raw := range byAnalyzer {
				var diags []finding
				if err := json.Unmarshal(raw, &diags); err != nil {
					var e struct {
						Error string `json:"error"`
					}
					if json.Unmarshal(raw, &e) == nil && e.Error != "" {
						errs = append(errs, pkg+": "+e.Error)
						continue
					}
					return nil, nil, fmt.Errorf("%s: %v", pkg, err)
				}
				for _, d := range diags {
					file, line, ok := splitPosn(d.Posn)
					if !ok {
						continue
					}
					rel, err := filepath.Rel(root, file)
					if err != nil || strings.HasPrefix(rel, "..") {
						continue
					}
					d.file, d.line = filepath.ToSlash(rel), line
					out = append(out, d)
				}
			}
		}
	}
	sort.Slice(out, func(i, j int) bool {
		if out[i].file != out[j].file {
			return out[i].file < out[j].file
		}
		return out[i].line < out[j].line
	})
	return out, errs, nil
}

// splitPosn splits file:line:col.
func splitPosn(p string) (string, int, bool) {
	i := strings.LastIndex(p, ":")
	if i < 0 {
		return "", 0, false
	}
	j := strings.LastIndex(p[:i], ":")
	if j < 0 {
		return "", 0, false
	}
	line, err := strconv.Atoi(p[j+1 : i])
	if err != nil {
		return "", 0, false
	}
	return p[:j], line, true
}

// A moduleRun is what the script collected for one module: where its
// source is and what overfact reported.
type moduleRun struct {
	Module, Version string
	Dir             string
	Findings        []finding
	Errors          []string
}

// tally is one row of the table.
type tally struct {
	bad, safe  int
	findings   int
	tp, fn, fp int
}

func (t *tally) add(u tally) {
	t.bad += u.bad
	t.safe += u.safe
	t.findings += u.findings
	t.tp += u.tp
	t.fn += u.fn
	t.fp += u.fp
}

// ratio prints a/b to three decimals with the fraction beside it, so a
// figure just under a target (18/19 = 0.947) never reads as meeting it.
func ratio(a, b int) string {
	if b == 0 {
		return "n/a"
	}
	return fmt.Sprintf("%.3f (%d/%d)", float64(a)/float64(b), a, b)
}

// score matches each module's findings to its labelled functions, in
// each dimension, and writes to w a table per dimension (overflow: the
// findings of every category but lgamma-digits against the BAD and SAFE
// labels; digits: the lgamma-digits findings against the DIGITS-BAD and
// DIGITS-SAFE labels), the combined totals, the false positives and the
// found and missed BAD functions. It returns an error if a label names
// a function that is not at its line.
func score(w io.Writer, labels []label, runs []moduleRun) error {
	var all tally
	for _, dim := range []string{dimOverflow, dimDigits} {
		t, err := scoreDimension(w, dim, labels, runs)
		if err != nil {
			return err
		}
		all.add(t)
	}
	fmt.Fprintf(w, "\n## combined\n\n| dimensions | BAD | SAFE | findings | BAD found (TP) | BAD missed (FN) | FP functions | recall | precision |\n|---|---|---|---|---|---|---|---|---|\n")
	fmt.Fprintf(w, "| overflow + digits | %d | %d | %d | %d | %d | %d | %s | %s |\n",
		all.bad, all.safe, all.findings, all.tp, all.fn, all.fp, ratio(all.tp, all.bad), ratio(all.tp, all.tp+all.fp))
	for _, run := range runs {
		for _, e := range run.Errors {
			fmt.Fprintf(w, "\nanalyzer error: %s\n", e)
		}
	}
	return nil
}

// scoreDimension scores one dimension: a finding counts for the function
// whose lines hold it. A BAD function with a finding is found (TP), one
// without is missed (FN); a SAFE or unlabelled function with a finding
// is a false positive (FP), counted once per function.
func scoreDimension(w io.Writer, dim string, labels []label, runs []moduleRun) (tally, error) {
	type fpItem struct {
		where, verdict string
		msgs           []string
	}
	var total tally
	var fps []fpItem
	var missed, found []label
	fmt.Fprintf(w, "## %s\n\n", dim)
	fmt.Fprintln(w, "| module | version | BAD | SAFE | findings | BAD found (TP) | BAD missed (FN) | FP functions | recall | precision |")
	fmt.Fprintln(w, "|---|---|---|---|---|---|---|---|---|---|")
	for _, run := range runs {
		spans, err := moduleSpans(run.Dir)
		if err != nil {
			return total, err
		}
		byFunc := map[string]label{}
		for _, l := range labels {
			if l.Module != run.Module {
				continue
			}
			if l.Version != run.Version {
				return total, fmt.Errorf("%s: labelled at %s, run at %s", l.Module, l.Version, run.Version)
			}
			var sp *span
			for i := range spans {
				if spans[i].File == l.File && spans[i].Func == l.Func && spans[i].Start == l.Line {
					sp = &spans[i]
				}
			}
			if sp == nil {
				return total, fmt.Errorf("labels line %d: no function %s at %s:%d in %s@%s", l.lineNo, l.Func, l.File, l.Line, l.Module, l.Version)
			}
			if l.dimension() == dim {
				byFunc[l.File+"\t"+l.Func] = l
			}
		}
		// Functions with findings of this dimension, and their messages.
		hit := map[string][]string{}
		var order []string
		var t tally
		for _, f := range run.Findings {
			if findingDimension(f.Category) != dim {
				continue
			}
			t.findings++
			key := f.file + "\t(package level)"
			if sp, ok := spanAt(spans, f.file, f.line); ok {
				key = sp.File + "\t" + sp.Func
			}
			if _, ok := hit[key]; !ok {
				order = append(order, key)
			}
			hit[key] = append(hit[key], fmt.Sprintf("%d: %s", f.line, f.Message))
		}
		for _, l := range byFunc {
			if !l.bad() {
				t.safe++
				continue
			}
			t.bad++
			if len(hit[l.File+"\t"+l.Func]) > 0 {
				t.tp++
				found = append(found, l)
			} else {
				t.fn++
				missed = append(missed, l)
			}
		}
		for _, key := range order {
			l, ok := byFunc[key]
			if ok && l.bad() {
				continue
			}
			t.fp++
			verdict := "unlabelled"
			if ok {
				verdict = l.Verdict
			}
			file, fn, _ := strings.Cut(key, "\t")
			fps = append(fps, fpItem{where: run.Module + "/" + file + " " + fn, verdict: verdict, msgs: hit[key]})
		}
		total.add(t)
		fmt.Fprintf(w, "| %s | %s | %d | %d | %d | %d | %d | %d | %s | %s |\n", run.Module, run.Version,
			t.bad, t.safe, t.findings, t.tp, t.fn, t.fp, ratio(t.tp, t.bad), ratio(t.tp, t.tp+t.fp))
	}
	fmt.Fprintf(w, "| **total** | | %d | %d | %d | %d | %d | %d | %s | %s |\n",
		total.bad, total.safe, total.findings, total.tp, total.fn, total.fp, ratio(total.tp, total.bad), ratio(total.tp, total.tp+total.fp))
	fmt.Fprintf(w, "\nFalse positives (%s findings in functions not labelled bad), %d:\n", dim, len(fps))
	for _, fp := range fps {
		fmt.Fprintf(w, "- %s [%s]\n", fp.where, fp.verdict)
		for _, m := range fp.msgs {
			fmt.Fprintf(w, "    %s\n", m)
		}
	}
	sort.Slice(found, func(i, j int) bool { return probeID(found[i]) < probeID(found[j]) })
	fmt.Fprintf(w, "\nFound %s-bad functions, %d:\n", dim, len(found))
	for _, l := range found {
		fmt.Fprintf(w, "- %s: %s\n", probeID(l), l.Shape)
	}
	sort.Slice(missed, func(i, j int) bool { return probeID(missed[i]) < probeID(missed[j]) })
	fmt.Fprintf(w, "\nMissed %s-bad functions, %d:\n", dim, len(missed))
	for _, l := range missed {
		fmt.Fprintf(w, "- %s: %s\n", probeID(l), l.Shape)
	}
	fmt.Fprintln(w)
	return total, nil
}
