// Package fixratio is a support-desk staffing estimator whose rota counts
// are ratios of factorials; its .golden file shows them rewritten into
// helper calls.
package fixratio

func fact(n int) int { // want fact:"factorial of parameter 0"
	r := 1
	for i := 2; i <= n; i++ { // want "factorial of n in int"
		r *= i
	}
	return r
}

func factF(n int) float64 { // want factF:"factorial of parameter 0"
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Rotas counts the ways to pick k agents out of n.
func Rotas(n, k int) int { // want Rotas:"binomial of parameter 0" Rotas:`wrong for n ≥ 21`
	return fact(n) / (fact(k) * fact(n-k)) // want "binomial coefficient"
}

// RotaShare is Rotas as a float, for probabilities.
func RotaShare(n, k int) float64 { // want RotaShare:"binomial of parameter 0"
	return factF(n) / (factF(k) * factF(n-k)) // want "binomial coefficient"
}

// Orders counts ordered picks of k agents out of n.
func Orders(n, k int) int { // want Orders:`value Γ\(p0 \+ 1\)/Γ\(p0 - p1 \+ 1\), wrong once p0 ≥ 21` Orders:`wrong for n ≥ 21`
	return fact(n) / fact(n-k) // want "permutation count"
}

// Shifts counts the ways to split a+b+c agents into three named shifts.
func Shifts(a, b, c int) float64 { // want Shifts:`value Γ\(p0 \+ p1 \+ p2 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\)·Γ\(p2 \+ 1\)\), wrong once p0 \+ p1 \+ p2 ≥ 171` Shifts:`wrong for a ≥ 171 or b ≥ 171 or c ≥ 171`
	return factF(a+b+c) / (factF(a) * factF(b) * factF(c)) // want "multinomial coefficient"
}

// Queues counts well-formed call/answer sequences of n pairs.
func Queues(n int) int { // want Queues:`value Γ\(2\*p0 \+ 1\)/\(Γ\(p0 \+ 2\)·Γ\(p0 \+ 1\)\), wrong once 2\*p0 ≥ 21` Queues:`wrong for n ≥ 10\.5`
	return fact(2*n) / (fact(n+1) * fact(n)) // want "Catalan number"
}

func fact32(n int32) int32 { // want fact32:"factorial of parameter 0"
	r := int32(1)
	for i := int32(2); i <= n; i++ { // want "factorial of n in int32"
		r *= i
	}
	return r
}

// Rotas32 is Rotas in int32: the helper's int64 is checked to fit.
func Rotas32(n, k int32) int32 { // want Rotas32:"binomial of parameter 0" Rotas32:`wrong for n ≥ 13`
	return fact32(n) / (fact32(k) * fact32(n-k)) // want "binomial coefficient"
}

// Pairings counts picks of k agents out of n, each pick staffed on
// either of two sites. The syntax groups the binomial apart from the 2,
// so the binomial alone is rewritten.
func Pairings(n, k int) int { // want Pairings:`value 2·Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 21` Pairings:`wrong for n ≥ 21`
	return 2 * (fact(n) / (fact(k) * fact(n-k))) // want "binomial coefficient"
}

// PairingsFlat is Pairings with the 2 inside the numerator: the
// expression is no binomial as written, so it is reported as a plain
// ratio, without a fix.
func PairingsFlat(n, k int) int { // want PairingsFlat:`value 2·Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 21` PairingsFlat:`wrong for n ≥ 21`
	return 2 * fact(n) / (fact(k) * fact(n-k)) // want `ratio of factorials in int: the numerator n! wraps`
}

// TripleShare is RotaShare for three shifts; the factor 3 comes after
// the binomial, which is rewritten on its own.
func TripleShare(n, k int) float64 { // want TripleShare:`value 3·Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 171` TripleShare:`wrong for n ≥ 171`
	return factF(n) / (factF(k) * factF(n-k)) * 3 // want "binomial coefficient"
}

// ShiftTable is the chance of a 2×2 table of a, b, c, d agents by shift
// and by team, with its margins fixed: nine factorials over one another,
// no single binomial, taken in log space where they leave float64.
func ShiftTable(a, b, c, d int) float64 { // want ShiftTable:`value Γ\(p0 \+ p1 \+ 1\)·Γ\(p2 \+ p3 \+ 1\)` ShiftTable:`wrong for some a or some b`
	n := a + b + c + d
	return factF(a+b) * factF(c+d) * factF(a+c) * factF(b+d) / (factF(n) * factF(a) * factF(b) * factF(c) * factF(d)) // want `ratio of factorials in float64: the intermediate \(a \+ b\)!·\(c \+ d\)!·\(a \+ c\)!·\(b \+ d\)! overflows to \+Inf first, at a = b = c = d = 29`
}
