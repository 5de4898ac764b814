// Package lgammadigits is the odds desk of a lottery board: ticket
// counts, draw probabilities and prize-pool shares computed in log space.
package lgammadigits

import "math"

// logGamma returns ln|Γ(x)|.
func logGamma(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// Tickets counts the ways to draw k balls from a drum of n.
func Tickets(n, k int) float64 { // want Tickets:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	return math.Exp(logGamma(float64(n)+1) - logGamma(float64(k)+1) - logGamma(float64(n-k)+1)) // want `computes C\(n, k\) from 3 log-gamma values .* passes the tolerance 1e-12 from n = 249 with k between 0 and n, .* at n = 1e\+09; n is not bounded here`
}

// PoolShare is the Beta weight B(a, b) the board splits a prize pool by.
func PoolShare(a, b float64) float64 {
	return math.Exp(logGamma(a) + logGamma(b) - logGamma(a+b)) // want `computes B\(a, b\) from 3 log-gamma values .* passes the tolerance 1e-12 from a = 107 with b between 1 and a`
}

// ExactHits is the chance that exactly k of n tickets win at odds p.
func ExactHits(k, n int, p float64) float64 {
	return math.Exp(logGamma(float64(n)+1) - logGamma(float64(k)+1) - logGamma(float64(n-k)+1) + float64(k)*math.Log(p) + float64(n-k)*math.Log(1-p)) // want `computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) from 3 log-gamma values .* from n = 249 .*; the exponent's other terms add rounding errors of their own`
}

// Rollover grows a jackpot by Γ(a+h)/Γ(a) after h idle draws.
func Rollover(a, h float64) float64 {
	num, _ := math.Lgamma(a + h)
	den, _ := math.Lgamma(a)
	return math.Exp(num - den) // want `computes rising\(a, h\) from 2 log-gamma values .* from a = 158 with h between 1 and a`
}

// RegionalDraw counts the tickets of a regional drum of at most 1000
// balls: bounded, but past the tolerance from 249 balls on.
func RegionalDraw(n, k int) float64 {
	if n > 1000 {
		return 0
	}
	return math.Exp(logGamma(float64(n)+1) - logGamma(float64(k)+1) - logGamma(float64(n-k)+1)) // want `computes C\(n, k\) .* from n = 249 with k between 0 and n, .* at n = 1000; n may reach 1000 here`
}

// SmallDrum counts tickets of the board's children's drum, which never
// holds more than 60 balls.
func SmallDrum(n, k int) float64 {
	if n < 0 || n > 60 || k < 0 || k > n {
		return 0
	}
	return math.Exp(logGamma(float64(n)+1) - logGamma(float64(k)+1) - logGamma(float64(n-k)+1))
}

// BallWeight is the weight of one ball in a drum of at most 40.
func BallWeight(x float64) float64 {
	if x > 40 {
		x = 40
	}
	return math.Exp(logGamma(x))
}

// FixedOdds is the house's fixed 7-from-3 quote.
func FixedOdds() float64 {
	return math.Exp(logGamma(8) - logGamma(4) - logGamma(5))
}
