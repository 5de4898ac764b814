// Package fixconvbinom is an acceptance-sampling sheet that counts the
// samples of a lot with an int64 binomial function and converts the
// counts to float64 to form probabilities; its .golden file takes each
// converted count from the float helper of the function's form, so that
// the function's own exact rewrite, which panics past int64, is never
// reached from a caller that computes in float64.
package fixconvbinom

import "math"

// samples is C(n, k), 0 outside 0 ≤ k ≤ n.
func samples(n, k int) int64 { // want samples:"binomial of parameter 0, breaks from 62"
	if k < 0 || k > n {
		return 0
	}
	r := int64(1)
	for i := 1; i <= k; i++ { // want "multiplicative binomial loop in int64"
		r = r * int64(n-k+i) / int64(i)
	}
	return r
}

// MissAll is the probability that drawn items from a lot holding bad
// defective ones are all sound.
func MissAll(lot, bad, drawn int) float64 { // want MissAll:`wrong for some lot or some bad`
	return float64(samples(lot-bad, drawn)) / float64(samples(lot, drawn)) // want `samples\(lot-bad, drawn\) computes C\(lot - bad, drawn\) in int64` `samples\(lot, drawn\) computes C\(lot, drawn\) in int64`
}

// Exactly is the binomial probability of k defective items among n when
// each is defective with probability p.
func Exactly(n, k int, p float64) float64 { // want Exactly:`wrong for n ≥ 62`
	return float64(samples(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in int64`
}

// Weight32 is the count in float32, whose single rounding of the
// integer the float64 helper would double: it keeps its finding and has
// no fix.
func Weight32(n, k int) float32 { // want Weight32:`wrong for n ≥ 62`
	return float32(samples(n, k)) // want `before the conversion to float32`
}

// halved is C(n, k) from the smaller of k and n − k, without a guard:
// its value outside 0 ≤ k ≤ n is no form the fixer knows.
func halved(n, k int) int64 { // want halved:"binomial of parameter 0, breaks from 62"
	if k > n-k {
		k = n - k
	}
	r := int64(1)
	for i := 0; i < k; i++ { // want "multiplicative binomial loop in int64"
		r = r * int64(n-i) / int64(i+1)
	}
	return r
}

// Share converts halved's count: no fix.
func Share(n, k int) float64 { // want Share:`wrong for n ≥ 62`
	return float64(halved(n, k)) / 2 // want `halved\(n, k\) computes C\(n, k\) in int64`
}
