// Package bracketodds prices the odds a fan site publishes: draw
// lotteries, keno cards, and knockout brackets and playoff series.
package bracketodds

import (
	"fmt"
	"math/big"
)

// fact returns n! in an int64.
func fact(n int) int64 { // want fact:`factorial of parameter 0, breaks from 21`
	if n <= 1 {
		return 1
	}
	return int64(n) * fact(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21`
}

// Combinations is the number of tickets in an n-choose-k draw.
func Combinations(n, k int) int64 { // want Combinations:`wrong for n ≥ 21 \(Combinations, bracketodds/lottery\.go:23\)` Combinations:`binomial of parameter 0, breaks from 21`
	if k < 0 || k > n {
		return 0
	}
	return fact(n) / (fact(k) * fact(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21, although C\(n, n/2\) `
}

// Odds formats the one-in-N jackpot odds of a draw.
func Odds(n, k int) string {
	return fmt.Sprintf("1 in %d", Combinations(n, k)) // want `Odds builds its result from Combinations\(n, k\), which is wrong from n = 21 \(reported at bracketodds/lottery\.go:23\)`
}

// Tickets is Combinations computed by the multiplicative formula, for
// draws from at most 60 balls.
func Tickets(n, k int) (int64, error) { // want Tickets:`binomial of parameter 0, safe for \[0, 60\]`
	if n > 60 || k < 0 || k > n {
		return 0, fmt.Errorf("bracketodds: draw %d from %d not supported", k, n)
	}
	if k > n-k {
		k = n - k
	}
	var r int64 = 1
	for i := 1; i <= k; i++ {
		r = r * int64(n-k+i) / int64(i)
	}
	return r, nil
}

// TwoDrumOdds is the number of tickets of a game that draws k of n
// main balls and one of m bonus balls.
func TwoDrumOdds(n, k, m int) *big.Int {
	t := new(big.Int).Binomial(int64(n), int64(k))
	return t.Mul(t, big.NewInt(int64(m)))
}

// kenoFact holds 0! .. 80! for keno cards of an 80-number board.
var kenoFact = func() [81]float64 {
	var t [81]float64
	t[0] = 1
	for i := 1; i <= 80; i++ {
		t[i] = t[i-1] * float64(i)
	}
	return t
}()

// KenoHit is the probability that a card with spots numbers catches
// exactly hits of the 20 drawn from 80.
func KenoHit(spots, hits int) float64 {
	if hits < 0 || hits > spots || spots > 20 || spots-hits > 60 {
		return 0
	}
	c := func(n, k int) float64 { return kenoFact[n] / (kenoFact[k] * kenoFact[n-k]) }
	return c(20, hits) * c(60, spots-hits) / c(80, spots)
}

// KenoWays is the number of winning combinations of a keno card: the
// draws of 20 from 80 in which exactly hits of the spots come up.
func KenoWays(spots, hits int) int64 { // want KenoWays:`wrong for spots ≥ 21 \(Combinations, bracketodds/lottery\.go:23\)`
	return Combinations(spots, hits) * Combinations(80-spots, 20-hits) // want `KenoWays builds its result from Combinations\(spots, hits\), which is wrong from n = 21 \(reported at bracketodds/lottery\.go:23\); spots, passed as n, is not bounded here`
}
