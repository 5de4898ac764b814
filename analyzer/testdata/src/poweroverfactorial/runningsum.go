package poweroverfactorial

import "math"

// Series summed from a running term, brought back after the loop by a
// small prefactor or a ratio.

// warmSpares is the probability that at most n failures occur at rate
// rate over hours (a Poisson CDF, e^−λ·Σ λ^i/i!).
func warmSpares(n int, rate, hours float64) float64 {
	m := rate * hours
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= m / float64(i)
		sum += term // want `sum sums the running term \(rate·hours\)\^k/k! in float64: the sum \(e\^\(rate·hours\) for a loop past k ≈ rate·hours\) is \+Inf for rate·hours ≥ 709\.783`
	}
	return math.Exp(-m) * sum
}

// queueWait is the probability that an arrival waits for one of seats
// servers at load erlangs (Erlang C, terms a^k/k! built one from the
// other).
func queueWait(seats int, erlangs float64) float64 {
	term, sum := 1.0, 0.0
	for k := 0; k < seats; k++ {
		sum += term // want `sum sums the running term erlangs\^k/k! in float64: .* while last / \(sum \+ last\), which reads the sum after the loop, stays finite; there it is \+Inf/\(\+Inf\) = NaN or 0`
		term *= erlangs / float64(k+1)
	}
	last := term / (1 - erlangs/float64(seats))
	return last / (sum + last)
}

// coinTail is the two-sided probability of at most k heads or tails in
// n fair tosses, Σ C(n, i)·2^(1−n).
func coinTail(n, k int) float64 {
	c, p := 1.0, 0.0
	for i := 0; i <= k; i++ { // want `multiplicative binomial loop computes C\(n, k \+ 1\) in float64`
		p += c // want `p sums the running term C\(n, t\) in float64: the terms reach C\(n, ⌊n/2⌋\), \+Inf for n ≥ 1030`
		c = c * float64(n-i) / float64(i+1)
	}
	return 2 * p * math.Pow(0.5, float64(n))
}

// lineBlocking is Erlang B's blocking ratio over at most 150 lines: the
// sum of 151 terms passes float64 from an offered load of about 6400.
//
//overfact:assume lines <= 150
func lineBlocking(load float64, lines int) float64 {
	term, den := 1.0, 1.0
	for k := 1; k <= lines; k++ {
		term *= load / float64(k)
		den += term // want `den sums the running term load\^k/k! in float64: the sum of its first 150 terms is \+Inf for load ≥ 6\d\d\d`
	}
	return term / den
}

// Negative cases.

// expSeries returns the sum itself, which overflows only where e^x does.
func expSeries(n int, x float64) float64 {
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= x / float64(i)
		sum += term
	}
	return sum
}

// smallRate bounds the rate, so the sum stays below e^700.
func smallRate(n int, rate float64) float64 {
	if rate < 0 || rate > 700 {
		return math.NaN()
	}
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= rate / float64(i)
		sum += term
	}
	return math.Exp(-rate) * sum
}

// eightTerms sums a constant number of terms, a truncated series for
// small arguments.
func eightTerms(x float64) float64 {
	term, sum := 1.0, 1.0
	for i := 1; i <= 8; i++ {
		term *= x / float64(i)
		sum += term
	}
	return math.Exp(-x) * sum
}

// meanTerm divides the sum, which overflows only where the mean does.
func meanTerm(n int, x float64) float64 {
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= x / float64(i)
		sum += term
	}
	return sum / float64(n+1)
}

// scaledUp multiplies the sum by a large factor: the value overflows
// where the sum does, so there is nothing to bring back.
func scaledUp(n int, x float64) float64 {
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= x / float64(i)
		sum += term
	}
	return sum * math.Pow(2, float64(n))
}
