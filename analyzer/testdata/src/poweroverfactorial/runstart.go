package poweroverfactorial

import "math"

// Running products that start from a distribution's first probability,
// math.Pow of a base below 1: the start underflows to 0 and every later
// probability with it. Exact values from Python's exact integers
// (math.comb over 2^n, as fractions).

// binomialBelow is P(X ≤ m) for X ~ Binomial(n, p), from (1−p)^n.
// (2000, 0.5, 1000): exact 0.5089195055729272; the loop gives 0.
func binomialBelow(n int, p float64, m int) float64 {
	q := 1 - p
	pr := math.Pow(q, float64(n))
	total := pr
	for j := 0; j < m; j++ { // want `running product pr computes the probabilities C\(n, j \+ 1\)·p\^\(j \+ 1\)·\(1−p\)\^\(n - j - 1\) one factor at a time from \(-p \+ 1\)\^\(n\), which in float64 loses its digits for n ≥ 1023 and is 0 for n ≥ 1075 \(at -p \+ 1 = 0\.5\)`
		pr = pr * float64(n-j) / float64(j+1) * p / q
		total += pr
	}
	return total
}

// waitingBelow is the chance of fewer than limit failures before the
// r-th success at success rate s, from s^r.
// (1200, 1400, 0.5): exact 0.999956615535609; the loop gives 0.
func waitingBelow(r, limit int, s float64) float64 {
	w := math.Pow(s, float64(r))
	sum := 0.0
	for f := 0; f < limit; f++ { // want `running product w computes the probabilities C\(r \+ f, f \+ 1\)·s\^r·\(1−s\)\^\(f \+ 1\) one factor at a time from \(s\)\^\(r\), which in float64 loses its digits for r ≥ 1023 and is 0 for r ≥ 1075 \(at s = 0\.5\)`
		sum += w
		w *= float64(r+f) / float64(f+1) * (1 - s)
	}
	return sum
}

// binomialBelowShort runs a fixed number of trips: every probability it
// reaches is as small as the start, so 0 is right to float64.
func binomialBelowShort(n int, p float64) float64 {
	q := 1 - p
	pr := math.Pow(q, float64(n))
	total := pr
	for j := 0; j < 3; j++ {
		pr = pr * float64(n-j) / float64(j+1) * p / q
		total += pr
	}
	return total
}

// binomialBelowSmall bounds n below the point where (1/2)^n is
// subnormal.
func binomialBelowSmall(n int, p float64, m int) float64 {
	if n > 1000 {
		return math.NaN()
	}
	q := 1 - p
	pr := math.Pow(q, float64(n))
	total := pr
	for j := 0; j < m; j++ {
		pr = pr * float64(n-j) / float64(j+1) * p / q
		total += pr
	}
	return total
}

// binomialBelowLog takes each probability from its logarithm.
func binomialBelowLog(n int, p float64, m int) float64 {
	lq, lp := math.Log1p(-p), math.Log(p)
	ln, _ := math.Lgamma(float64(n + 1))
	total := 0.0
	for j := 0; j <= m; j++ {
		a, _ := math.Lgamma(float64(j + 1))
		b, _ := math.Lgamma(float64(n - j + 1))
		total += math.Exp(ln - a - b + float64(j)*lp + float64(n-j)*lq)
	}
	return total
}
