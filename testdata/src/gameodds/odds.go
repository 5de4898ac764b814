package gameodds

import "math"

// HandCount is the number of distinct hands of the given size.
func HandCount(deck, hand int) int64 { // want HandCount:`wrong for some deck or some hand`
	r := int64(1)
	n := int64(deck)
	for d := int64(1); d <= int64(hand); d++ { // want `multiplicative binomial loop computes C\(deck`
		r *= n
		r /= d
		n--
	}
	return r
}

// DrawOdds is the chance of exactly want successes when drawing hand cards
// from a deck holding successes good cards.
func DrawOdds(deck, successes, hand, want int) float64 {
	c := func(n, k int) float64 {
		return factorial(n) / (factorial(k) * factorial(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerato`
	}
	return c(successes, want) * c(deck-successes, hand-want) / c(deck, hand)
}

func lg(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// NegBinomialPMF is the chance of k failures before the r-th success.
func NegBinomialPMF(k, r int, p float64) float64 { // want NegBinomialPMF:`wrong for some k or some r`
	c := math.Exp(lg(float64(k+r)) - lg(float64(k+1)) - lg(float64(r))) // want `math.Exp of log-gamma values computes C\(k \+ r - 1, r - 1\) from 3 log-gamma values`
	return c * math.Pow(p, float64(r)) * math.Pow(1-p, float64(k)) // want `computes the negative binomial probability C\(k \+ r - 1`
}

// NegBinomialLogPMF is the same probability kept in log space until the
// end: no overflow, but its three log-gamma values lose digits as k grows.
func NegBinomialLogPMF(k, r int, p float64) float64 {
	l := lg(float64(k+r)) - lg(float64(k+1)) - lg(float64(r))
	return math.Exp(l + float64(r)*math.Log(p) + float64(k)*math.Log1p(-p)) // want `math.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values`
}

// Multinomial counts the ways to deal piles of the given sizes.
func Multinomial(counts ...int) uint64 {
	res := uint64(1)
	total := uint64(0)
	for _, c := range counts {
		total += uint64(c)
		res *= binom(total, uint64(c)) // want `loop multiplies binom\(total, uint64\(c\)\) into res over the parts c in uint64: the product is the multinomial coefficient \(Σ parts\)!/Π part!, which wraps where it leaves uint64: from total = 21 with parts of 1, whose factors 1, 2, … all fit, where it is 21! \(20! ≈ 2\.43e18 is the largest that fits\), and from total = 68 with two equal parts`
	}
	return res
}

// DiceSumWays counts the ways dice with the given faces sum to target.
func DiceSumWays(dice, faces, target int) int64 {
	ways := make([]int64, target+1)
	ways[0] = 1
	for d := 0; d < dice; d++ {
		next := make([]int64, target+1)
		for s := 0; s <= target; s++ {
			if ways[s] == 0 {
				continue
			}
			for f := 1; f <= faces && s+f <= target; f++ {
				next[s+f] += ways[s]
			}
		}
		ways = next
	}
	return ways[target]
}

// catalanTable holds the Catalan numbers used to score bracket tournaments of up to 9 rounds.
func catalanTable() [10]int {
	var t [10]int
	f := func(n int) int {
		v := 1
		for i := 2; i <= n; i++ {
			v *= i
		}
		return v
	}
	for n := 0; n < 10; n++ {
		t[n] = f(2*n) / (f(n+1) * f(n))
	}
	return t
}
