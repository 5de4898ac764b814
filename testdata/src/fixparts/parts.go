// Package fixparts is a ferry's loading planner, counting the orders in
// which vehicles of several kinds can board as a multinomial formed in a
// loop over the kinds. Its .golden file shows the divisor carried in log
// space by the helper's Product, each factorial the value its function
// returns with ln n! beside it.
package fixparts

// fact returns n! in float64, ⌊n⌋! for a fraction, +Inf past 170!.
func fact(n float64) float64 { // want fact:`factorial of parameter 0`
	r := 1.0
	for i := 2.0; i <= n; i++ {
		r *= i
	}
	return r
}

// Boardings counts the distinct boarding orders of parts[i] vehicles of
// kind i: (Σ parts)!/Π parts!.
func Boardings(parts ...float64) float64 {
	total, den := 0.0, 1.0
	for _, p := range parts {
		total += p
		den *= fact(p)
	}
	return fact(total) / den // want `Boardings computes the multinomial coefficient \(Σ parts\)!/Π part! as fact\(total\) / den over the loop's parts in float64`
}

// BoardingsTwoPass counts the same orders with the total and the divisor
// each taken in a loop of its own over the kinds.
func BoardingsTwoPass(parts ...float64) float64 {
	total := 0.0
	for _, p := range parts {
		total += p
	}
	den := 1.0
	for _, p := range parts {
		den *= fact(p)
	}
	return fact(total) / den // want `BoardingsTwoPass computes the multinomial coefficient \(Σ parts\)!/Π part! as fact\(total\) / den over the loop's parts in float64`
}
