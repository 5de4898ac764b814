// Package labtables is the reference-table desk of a small physics lab:
// it checks the lab's printed Γ table against math.Gamma and computes
// volumes of d-dimensional balls for its toy gas runs. A bare
// math.Gamma that only meets comparisons is IEEE-correct at +Inf; one
// that meets arithmetic turns +Inf into a wrong value.
package labtables

import "math"

// Entry is one printed row: Γ(X) = Want, +Inf past float64.
type Entry struct{ X, Want float64 }

func near(want, got float64) bool {
	if math.IsInf(want, 1) {
		return math.IsInf(got, 1)
	}
	return math.Abs(got-want) <= 1e-12*math.Abs(want)
}

// Mismatches counts the rows math.Gamma disagrees with: the value is
// only handed to a comparison, so +Inf for a row past 171.62 is right.
func Mismatches(rows []Entry) int {
	bad := 0
	for _, r := range rows {
		if got := math.Gamma(r.X); !near(r.Want, got) {
			bad++
		}
	}
	return bad
}

// Overflows lists the rows whose Γ is beyond float64, as the printed
// table marks them.
func Overflows(rows []Entry) []float64 {
	var xs []float64
	for _, r := range rows {
		if math.IsInf(math.Gamma(r.X), 1) || math.Gamma(r.X) > math.MaxFloat64 {
			xs = append(xs, r.X)
		}
	}
	return xs
}

// Column fills the computed column of the table beside the printed one.
func Column(rows []Entry) []float64 {
	col := make([]float64, len(rows))
	for i, r := range rows {
		col[i] = math.Gamma(r.X)
	}
	return col
}

// BallVolume is the volume r^d·π^(d/2)/Γ(d/2+1) of a d-ball (DLMF 5.19.4,
// from memory): finite and tiny where Γ(d/2+1) is +Inf.
func BallVolume(d, r float64) float64 { // want BallVolume:`value \(p1\)\^\(p0\)·\(884279719003555/281474976710656\)\^\(1/2\*p0\)/Γ\(1/2\*p0 \+ 1\), wrong once 1/2\*p0 \+ 1 ≥ 171\.624377`
	return math.Pow(r, d) * math.Pow(math.Pi, d/2) / math.Gamma(d/2+1) // want `math.Gamma overflows: math.Gamma\(d/2 \+ 1\) is \+Inf for d ≥ 341.2`
}

// ShellVolume is BallVolume through a normaliser kept in a variable.
func ShellVolume(d, r, dr float64) float64 {
	norm := math.Gamma(d/2 + 1) // want `math.Gamma overflows: math.Gamma\(d/2 \+ 1\) is \+Inf for d ≥ 341.2`
	v := math.Pow(math.Pi, d/2) * (math.Pow(r+dr, d) - math.Pow(r, d))
	return v / norm
}

// LogEntry is the natural log of a table row for the log-scale plot:
// ln Γ(x) is finite for every x the table holds, math.Log(+Inf) is not.
func LogEntry(r Entry) float64 {
	return math.Log(math.Gamma(r.X)) // want `math.Gamma overflows: math.Gamma\(r.X\) is \+Inf for arguments ≥ 171.62`
}

// StateDensity keeps Γ(d/2) under a second name before dividing by it.
func StateDensity(d, e float64) float64 { // want StateDensity:`value \(p1\)\^\(1/2\*p0 - 1\)/Γ\(1/2\*p0\), wrong once 1/2\*p0 ≥ 171\.624377`
	g := math.Gamma(d / 2) // want `math.Gamma overflows: math.Gamma\(d / 2\) is \+Inf for d ≥ 343.2`
	norm := g
	return math.Pow(e, d/2-1) / norm
}

// Recorded keeps the value under two names, only to compare it.
func Recorded(r Entry) bool {
	g := math.Gamma(r.X)
	kept := g
	return near(r.Want, kept)
}
