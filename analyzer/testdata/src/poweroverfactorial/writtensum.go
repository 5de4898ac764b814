package poweroverfactorial

import "math"

// Sums of terms a reservoir model writes out on each trip, power over
// factorial, with no running term: the factorials fit (at most 120
// terms), but the powers pass float64 for a large mean while the value
// read after the loop does not.

// Overflow is the chance of at most n storms in a season with mean lam
// storms (a Poisson CDF, e^−lam·Σ lam^i/i!).
func Overflow(lam float64, n int) float64 { // want Overflow:`wrong for some n`
	if n < 0 || n > 120 {
		return 0
	}
	total := 0.0
	for i := 0; i <= n; i++ {
		total += math.Pow(lam, float64(i)) / factF(i) // want `total sums the running term lam\^k/k! in float64: the sum of its first 121 terms is \+Inf for lam ≥ 16812\.9, while math.Exp\(-lam\) \* total, which reads the sum after the loop, stays finite`
	}
	return math.Exp(-lam) * total
}

// Spill is the chance that a surge finds all bays full (Erlang B): the
// last term over the sum of all.
func Spill(load float64, bays int) float64 { // want Spill:`wrong for some bays`
	if bays < 1 || bays > 100 {
		return 1
	}
	var last = math.Pow(load, float64(bays)) / factF(bays)
	all := 0.0
	for j := 0; j <= bays; j++ {
		all += math.Pow(load, float64(j)) / factF(j) // want `all sums the running term load\^k/k! in float64: the sum of its first 101 terms is \+Inf for load ≥ 45944\.9, while last / all`
	}
	return last / all
}

// Gauge sums ten terms, a truncated series for small arguments.
func Gauge(x float64) float64 {
	total := 0.0
	for i := 0; i < 10; i++ {
		total += math.Pow(x, float64(i)) / factF(i)
	}
	return math.Exp(-x) * total
}
