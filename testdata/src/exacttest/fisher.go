package exacttest

// Table is a 2×2 contingency table.
type Table struct {
	A, B, C, D int
}

func hyperPMF(a, b, c, d int) float64 {
	n := a + b + c + d
	return factF(a+b) * factF(c+d) * factF(a+c) * factF(b+d) / // want `ratio of factorials in float64: the intermediate \(a \+ b\)!·\(c \+ d\)!·\(a \+ c\)!·\(b \+ d\)! overflows to \+Inf first, at a = b = c = d = 29 \(all equal\)`
		(factF(n) * factF(a) * factF(b) * factF(c) * factF(d))
}

// FisherExact is the two-sided p-value of Fisher's exact test.
func (t Table) FisherExact() float64 { // want FisherExact:`wrong for some t`
	row1, col1 := t.A+t.B, t.A+t.C
	n := t.A + t.B + t.C + t.D
	obs := hyperPMF(t.A, t.B, t.C, t.D) // want `FisherExact computes C\(t\.A \+ t\.B, t\.A\)·C\(t\.C \+ t\.D, t\.C\)/C\(t\.A \+ t\.B \+ t\.C \+ t\.D, t\.A \+ t\.C\) in float64, which fits where hyperPMF\(t\.A, t\.B, t\.C, t\.D\) already is \+Inf or NaN once t\.A \+ t\.B ≥ 171`
	p := 0.0
	for a := max(0, row1+col1-n); a <= min(row1, col1); a++ {
		b, c := row1-a, col1-a
		d := n - a - b - c
		if q := hyperPMF(a, b, c, d); q <= obs*(1+1e-7) {
			p += q
		}
	}
	return p
}
