package analyzer

import (
	"math"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

var (
	signWitness  = regexp.MustCompile(`as at .* = (-?[0-9.e+-]+), where Γ is (-?[0-9.e+-]+)`)
	stirlingErr  = regexp.MustCompile(`it is ([0-9.e+-]+)% below .*? at \S+ = ([0-9]+)(?: and ([0-9.e+-]+)% at \S+ = ([0-9]+))?`)
	selfPowerMsg = regexp.MustCompile(`(math\.Pow\([^)]*\)) is \+Inf for \S+ ≥ ([0-9]+), although .* fits float64 up to \S+ = ([0-9]+)`)
)

// TestLogSpaceNumbers re-derives the numbers of the log-space messages
// with package math alone: Γ at the witness of a dropped sign
// (math.Gamma), Stirling's relative error as 1 − e^(S(n) − ln n!) with
// ln n! from math.Lgamma and S(n) = (n+½)ln n − n + ½ln 2π (not the
// series the thresholds package sums), and the first n at which
// math.Pow(n, n+h/2) is +Inf, next to the last n with math.Gamma(n+1)
// finite.
func TestLogSpaceNumbers(t *testing.T) {
	results := analysistest.Run(t, analysistest.TestData(), Analyzer, "lgammasign", "stirlingapproximation")
	checked := 0
	for _, r := range results {
		for _, d := range r.Diagnostics {
			if m := signWitness.FindStringSubmatch(d.Message); m != nil {
				w, _ := strconv.ParseFloat(m[1], 64)
				g, _ := strconv.ParseFloat(m[2], 64)
				if !(math.Gamma(w) < 0) || math.Abs(math.Gamma(w)-g) > 1e-3*math.Abs(g) {
					t.Errorf("%q: math.Gamma(%g) = %g", d.Message, w, math.Gamma(w))
				}
				checked++
			}
			if m := stirlingErr.FindStringSubmatch(d.Message); m != nil {
				for i := 1; i+1 < len(m) && m[i] != ""; i += 2 {
					p, _ := strconv.ParseFloat(m[i], 64)
					n, _ := strconv.ParseFloat(m[i+1], 64)
					lf, _ := math.Lgamma(n + 1)
					want := -math.Expm1((n+0.5)*math.Log(n) - n + 0.5*math.Log(2*math.Pi) - lf)
					if math.Abs(p/100-want) > 5e-3*want {
						t.Errorf("%q: error at n = %g is %g%%, want %.4g%%", d.Message, n, p, 100*want)
					}
					checked++
				}
			}
			if m := selfPowerMsg.FindStringSubmatch(d.Message); m != nil {
				first, _ := strconv.ParseFloat(m[2], 64)
				fits, _ := strconv.ParseFloat(m[3], 64)
				h := 0.0
				if strings.Contains(m[1], "+0.5") {
					h = 1
				}
				pow := func(n float64) float64 { return math.Pow(n, n+h/2) }
				if !math.IsInf(pow(first), 1) || math.IsInf(pow(first-1), 0) {
					t.Errorf("%q: math.Pow at %g and %g: %g, %g", d.Message, first, first-1, pow(first), pow(first-1))
				}
				if math.IsInf(math.Gamma(fits+1), 0) || !math.IsInf(math.Gamma(fits+2), 1) {
					t.Errorf("%q: %g! is not the largest factorial in float64", d.Message, fits)
				}
				checked++
			}
		}
	}
	if checked < 10 {
		t.Errorf("checked %d numbers; the scenarios hold more", checked)
	}
}
