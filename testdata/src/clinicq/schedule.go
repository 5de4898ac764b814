package clinicq

import "math"

// slotOrderings is the number of ways to order the booked patients.
func slotOrderings(patients []string) int {
	n := 1
	for i := len(patients); i > 1; i-- { // want `factorial of len\(patients\) in int wraps for len\(patients\) ≥ 21 \(20! ≈`
		n *= i
	}
	return n
}

// noShowRisk is the chance that exactly k of n booked patients turn up when
// each turns up with probability p.
func noShowRisk(n, k int, p float64) float64 {
	c := 1.0
	for j := 1; j <= k; j++ { // want `multiplicative binomial loop computes C\(n`
		c = c * float64(n-k+j) / float64(j)
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// dailyPermutations is the number of orders for the eight fixed morning slots.
func dailyPermutations() int {
	const slots = 8
	v := 1
	for i := 1; i <= slots; i++ {
		v *= i
	}
	return v
}

// triageSequences counts the interleavings of urgent and routine patients
// that keep each group in its own arrival order.
func triageSequences(urgent, routine int) uint64 {
	num := uint64(1)
	for i := 0; i < urgent; i++ { // want `falling factorial of urgent factors from urgent \+ routine down in uint`
		num *= uint64(urgent + routine - i)
	}
	den := uint64(1)
	for i := 2; i <= urgent; i++ { // want `factorial of urgent in uint64 wraps for urgent ≥ 21 \(20! ≈ 2\.43e18 is`
		den *= uint64(i)
	}
	return num / den
}

// logTriageSequences is the same count's natural log for very long days.
func logTriageSequences(urgent, routine int) float64 {
	a, _ := math.Lgamma(float64(urgent + routine + 1))
	b, _ := math.Lgamma(float64(urgent + 1))
	c, _ := math.Lgamma(float64(routine + 1))
	return a - b - c
}
