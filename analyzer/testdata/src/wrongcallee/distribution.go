package wrongcallee

import (
	"errors"
	"math"
)

// A distribution returned as a slice of probabilities, each a ratio of
// float64 factorials, and its callers that read the slice entry by
// entry. From n = 171 the numerator n! is +Inf (170! ≈ 7.26e306 is the
// largest factorial below MaxFloat64, Python's exact math.factorial),
// every entry is +Inf/+Inf = NaN or +Inf·0, while C(n, j)/2^n ≤ 1.

var errNegative = errors.New("negative count")

func floatFact(n int) float64 { // want floatFact:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Occupancy returns the chance that j of n slots are taken, for every
// j, each slot taken with probability 1/2.
func Occupancy(n int) ([]float64, error) { // want Occupancy:`wrong for n ≥ 171`
	if n < 0 {
		return nil, errNegative
	}
	p := make([]float64, n+1)
	for j := range p {
		p[j] = floatFact(n) / (floatFact(j) * floatFact(n-j)) * math.Pow(0.5, float64(n)) // want `ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
	}
	return p, nil
}

// ExpectedTaken is Σ j·p[j] = n/2, NaN from n = 171.
func ExpectedTaken(n int) (float64, error) { // want ExpectedTaken:`wrong for n ≥ 171`
	p, err := Occupancy(n) // want `ExpectedTaken builds its result from Occupancy\(n\), which is wrong from n = 171`
	if err != nil {
		return 0, err
	}
	m := 0.0
	for j, v := range p {
		m += float64(j) * v
	}
	return m, nil
}

// SmallExpected asks only up to 100 slots: silent.
func SmallExpected(n int) float64 {
	if n > 100 {
		return 0
	}
	p, _ := Occupancy(n)
	m := 0.0
	for j, v := range p {
		m += float64(j) * v
	}
	return m
}

// Slots reads only the slice's length, which is right: silent.
func Slots(n int) int {
	p, _ := Occupancy(n)
	return len(p)
}

// FirstGap returns the first index of the slice, from its keys alone:
// silent.
func FirstGap(n int) int {
	p, _ := Occupancy(n)
	last := 0
	for j := range p {
		last = j
	}
	return last
}
