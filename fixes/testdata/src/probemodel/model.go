// Package probemodel holds binomial loops described as the value model
// hands them over (the analyzer vouches for the trip count and the
// domain), to test the checks the fixer makes on its own.
package probemodel

// Bag is a bag of N marbles of which K are drawn.
type Bag struct {
	N, K int
}

// Draws reads the fields through a pointer receiver that nothing
// changes before the loop.
func (b *Bag) Draws() float64 {
	r := 1.0
	// probe:modelloop(r; b.N, b.K)
	for d := 1; d <= b.K; d++ { // want "probe modelloop"
		r *= float64(b.N - d + 1)
		r /= float64(d)
	}
	return r
}

// Shake may change the fields before the loop.
func (b *Bag) Shake() {}

// Shaken calls a method of the bag first.
func (b *Bag) Shaken() float64 {
	b.Shake()
	r := 1.0
	// probe:modelloop(r; b.N, b.K)
	for d := 1; d <= b.K; d++ { // want "probe modelloop: no fix: b.N may change before the call"
		r = r * float64(b.N-b.K+d) / float64(d)
	}
	return r
}

// Capped lowers n before the loop: the call would have to see the new
// value, not the one the function was given.
func Capped(n, k int) float64 {
	if n > 1000 {
		n = 1000
	}
	r := 1.0
	// probe:modelloop(r; n, k)
	for d := 1; d <= k; d++ { // want "probe modelloop: no fix: n may change before the call"
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Local counts over a local copy, which is not an operand the call can
// name as the function was given it.
func Local(n, k int) float64 {
	top := n
	r := 1.0
	// probe:modelloop(r; top, k)
	for d := 1; d <= k; d++ { // want "probe modelloop: no fix: top is not a parameter or the receiver"
		r = r * float64(top-k+d) / float64(d)
	}
	return r
}

// Indexed takes its factors from a table, which may panic.
func Indexed(n, k int, w []float64) float64 {
	r := 1.0
	f := 0.0
	// probe:modelloop(r; n, k)
	for d := 1; d <= k; d++ { // want "probe modelloop: no fix: the loop's body calls out or may panic"
		f = w[d]
		r = r * float64(n-k+d) / float64(d)
	}
	return r + f
}

// Doubled starts at 2.
func Doubled(n, k int) float64 {
	r := 2.0
	// probe:modelloop(r; n, k)
	for d := 1; d <= k; d++ { // want "probe modelloop: no fix: r does not start at 1"
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Between sets the accumulator again between its start and the loop.
func Between(n, k int, scale float64) float64 {
	r := 1.0
	r *= scale
	// probe:modelloop(r; n, k)
	for d := 1; d <= k; d++ { // want "probe modelloop: no fix: r does not start at 1"
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}
