package poweroverfactorial

import "math"

// A power whose base the code does not fix overflows before the
// divisor does once the base is large: the first such base at the last
// argument whose double factorial fits is the (e)-th root of the
// largest float64 (mpmath at 30 digits: MaxFloat64^(1/300) =
// 10.6541…, the exponent 300 at n = 300, whose 300!! fits).

func dfact(n int) float64 { // want dfact:`double-factorial of parameter 0, breaks from 301`
	r := 1.0
	for i := n; i > 1; i -= 2 {
		r *= float64(i)
	}
	return r
}

// oddTerm is x^n/n!!, a term of the series of erf's odd powers.
func oddTerm(x float64, n int) float64 {
	return math.Pow(x, float64(n)) / dfact(n) // want `term with x\^n over n!! in float64: the divisor n!! overflows to \+Inf for n ≥ 301 .*; where \|x\| ≥ 10\.6541 the power x\^n overflows to \+Inf first, before n reaches 301; n is not bounded here`
}
