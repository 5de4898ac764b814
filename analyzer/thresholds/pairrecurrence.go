package thresholds

import (
	"fmt"
	"math"
	"math/big"
)

// pairCap is the last step simulated: a recurrence whose weight grows
// by one a step leaves every 64-bit type within 25 steps once its
// values are nonzero, so a sequence still inside t after this many
// steps is one that stays there (zero, or a weight that stays 0).
const pairCap = 4096

// PairRecurrence returns the first loop value i at which the weighted
// sum of two rolling values, x_i = (i + shift)·(x_{i−1} + x_{i−2}),
// leaves t, the loop starting at i = start with x_{start−2} = older and
// x_{start−1} = newer (common practice: the derangement numbers D(n) =
// (n−1)·(D(n−1) + D(n−2)), OEIS A000166, are older = 1, newer = 0,
// start = 2, shift = −1; older = newer = 1 gives n!, since n! =
// (n−1)·((n−1)! + (n−2)!)). The sum is checked as well as the product,
// and in an unsigned type a negative value is past it too. LastGood
// and Peak are x at the value before; FirstBad is math.MaxInt64 when
// no step up to pairCap leaves t, or start or shift is
// past ±2^40. int64 with the derangement numbers'
// start: 21 (TestPairRecurrence checks it against the count by
// inclusion–exclusion, and the factorials' start against n!).
func PairRecurrence(t Num, older, newer, start, shift int64) Limit {
	key := cacheKey{shape: fmt.Sprintf("pair:%d:%d", older, newer), t: t, a: start, b: shift}
	return memoLimit(key, func() Limit {
		max := t.maxInt()
		out := func(v *big.Int) bool { return v.CmpAbs(max) > 0 || !t.Signed && v.Sign() < 0 }
		if start < -1<<40 || start > 1<<40 || shift < -1<<40 || shift > 1<<40 {
			return Limit{FirstBad: math.MaxInt64}
		}
		a, b := big.NewInt(older), big.NewInt(newer)
		for i := start; i < start+pairCap; i++ {
			sum := new(big.Int).Add(a, b)
			next := new(big.Int).Mul(sum, big.NewInt(i+shift))
			if out(sum) || out(next) {
				return Limit{FirstBad: i, LastGood: new(big.Int).Set(b), Peak: new(big.Int).Set(b)}
			}
			a, b = b, next
		}
		return Limit{FirstBad: math.MaxInt64}
	})
}

// PairSequence names what a rolling pair recurrence computes.
type PairSequence int

const (
	// PairOther: a sequence of the rule with no name here.
	PairOther PairSequence = iota
	// PairDerangements: x_i = D(i), the derangement numbers.
	PairDerangements
	// PairFactorials: x_i = i!.
	PairFactorials
)

// NamePair returns what PairRecurrence's sequence with these arguments
// is: the rule x_i = (i−1)·(x_{i−1} + x_{i−2}) fixes the whole sequence
// from two consecutive values, so x_{start−2} and x_{start−1} equal to
// D(start−2) and D(start−1) make every x_i = D(i) (OEIS A000166), and
// equal to (start−2)! and (start−1)! make every x_i = i! (A000142).
func NamePair(older, newer, start, shift int64) PairSequence {
	if shift != -1 || start < 2 || start > 22 {
		return PairOther
	}
	d, f := [2]int64{1, 0}, int64(1) // D(0), D(1); 0!
	for k := int64(0); k < start-2; k++ {
		d = [2]int64{d[1], (k + 1) * (d[0] + d[1])}
		f *= k + 1
	}
	switch {
	case older == d[0] && newer == d[1]:
		return PairDerangements
	case older == f && newer == f*(start-1):
		return PairFactorials
	}
	return PairOther
}
