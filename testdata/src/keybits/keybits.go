// Package keybits rates the door codes of a storage depot in bits: how
// many codes an intruder must try, given how many keys of the code are
// shifted, how many turns a swipe pattern takes on the keypad, and how
// many digits were swapped for look-alike symbols. Each count is a sum
// of binomial coefficients; the rating is its logarithm.
package keybits

import "math"

// ways is C(n, k), one factor at a time, multiplying before it divides.
func ways(n, k float64) float64 { // want ways:`binomial of parameter 0, breaks from 1021`
	if k > n {
		return 0
	}
	r := 1.0
	for d := 1.0; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product r\*\(n\) overflows to \+Inf before the division for n ≥ 1021`
		r *= n
		r /= d
		n--
	}
	return r
}

// ShiftBits is the number of bits the shifted keys of a code add: the
// ways to shift up to min(shifted, plain) of its keys.
func ShiftBits(shifted, plain float64) float64 {
	total := shifted + plain
	var count float64
	for i := 0.0; i <= math.Min(shifted, plain); i++ {
		count += ways(total, i)
	}
	return math.Log2(count) // want `math\.Log2 of count, a sum of C\(total, i\) accumulated in float64: its terms reach C\(total, ⌊total/2⌋\), which overflows to \+Inf for total ≥ 1030 \(C\(1029, 514\) ≈ 1\.43e308 is the largest central one that fits\), so the sum and its logarithm are \+Inf although the logarithm of the sum is at most total·ln 2`
}

// SwipeBits is the number of bits of a swipe pattern of up to length
// keys with up to turns turns on a pad of starts keys whose keys have
// degree neighbours on average.
func SwipeBits(length, turns int, starts, degree float64) float64 { // want SwipeBits:`wrong for some length or some turns`
	count := 0.0
	for i := 2; i <= length; i++ {
		most := min(turns, i-1)
		for j := 1; j <= most; j++ {
			term := ways(float64(i-1), float64(j-1)) * starts * math.Pow(degree, float64(j))
			count += term
		}
	}
	return math.Log10(count) // want `math\.Log10 of count, a sum of C\(i - 1, j - 1\) accumulated in float64: its terms reach C\(i - 1, ⌊\(i - 1\)/2⌋\), which overflows to \+Inf for i - 1 ≥ 1030`
}

// SwapBits is bounded: codes are at most 64 keys long, so the sum stays
// far below float64's limit.
func SwapBits(swapped, kept int) float64 {
	n := swapped + kept
	if swapped < 0 || kept < 0 || n > 64 {
		return 0
	}
	var count float64
	for i := 0; i <= min(swapped, kept); i++ {
		count += ways(float64(n), float64(i))
	}
	return math.Log2(count)
}

// FewShiftBits counts at most three shifted keys: the terms stay below
// C(n, 3), which fits float64 for every n a code can have.
func FewShiftBits(shifted, plain float64) float64 {
	var count float64
	for i := 0.0; i <= 3 && i <= shifted; i++ {
		count += ways(shifted+plain, i)
	}
	return math.Log2(count)
}

// SafeShiftBits keeps the sum in log space: each term's logarithm from
// log-gamma, folded in with a log-sum-exp.
func SafeShiftBits(shifted, plain int) float64 {
	n := shifted + plain
	acc := math.Inf(-1)
	for i := 0; i <= min(shifted, plain); i++ {
		a, _ := math.Lgamma(float64(n + 1))
		b, _ := math.Lgamma(float64(i + 1))
		c, _ := math.Lgamma(float64(n - i + 1))
		t := a - b - c
		hi := math.Max(acc, t)
		acc = hi + math.Log1p(math.Exp(-math.Abs(acc-t)))
	}
	return acc / math.Ln2
}

// ShiftCount returns the sum itself: it is +Inf only where the true
// count is past float64 too.
func ShiftCount(shifted, plain float64) float64 {
	var count float64
	for i := 0.0; i <= math.Min(shifted, plain); i++ {
		count += ways(shifted+plain, i)
	}
	return count
}

// PadGuesses is the number of guesses for a swipe of length keys with
// up to turns turns, times the ways to shift up to shifted of its keys.
func PadGuesses(length, turns, shifted int, starts float64) float64 { // want PadGuesses:`wrong for some length or some turns or some shifted`
	guesses := 0.0
	for i := 2; i <= length; i++ {
		for j := 1; j <= min(turns, i-1); j++ {
			guesses += starts * float64(j)
		}
	}
	var shifts float64
	for i := 1; i <= min(shifted, length-shifted); i++ {
		shifts += ways(float64(length), float64(i))
	}
	guesses *= shifts // want `guesses times shifts in float64: guesses is 0 when the loops that add to it run no trip, and shifts, a sum of C\(length, i\), is \+Inf once its terms reach C\(length, ⌊length/2⌋\) at length ≥ 1030 .* so the product is 0·\(\+Inf\) = NaN although its true value is 0`
	return guesses
}

// GuardedPadGuesses scales only a count that is not 0.
func GuardedPadGuesses(length, turns, shifted int, starts float64) float64 {
	guesses := 0.0
	for i := 2; i <= length; i++ {
		for j := 1; j <= min(turns, i-1); j++ {
			guesses += starts * float64(j)
		}
	}
	var shifts float64
	for i := 1; i <= min(shifted, length-shifted); i++ {
		shifts += ways(float64(length), float64(i))
	}
	if guesses > 0 {
		guesses *= shifts
	}
	return guesses
}

// DoubledGuesses starts from one guess and doubles it: never 0.
func DoubledGuesses(length, shifted int) float64 {
	guesses := 1.0
	for i := 0; i < shifted; i++ {
		guesses *= 2
	}
	var shifts float64
	for i := 1; i <= min(shifted, length-shifted); i++ {
		shifts += ways(float64(length), float64(i))
	}
	return guesses * shifts
}
