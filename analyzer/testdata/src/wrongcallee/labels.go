package wrongcallee

import (
	"fmt"
	"strconv"
)

// Counts rendered as text and multiplied in int64: the callee is a
// ratio of factorials whose numerator wraps while the count fits, so a
// string or a product built from it shows the wrong number. Exact
// values from Python's exact integers (math.comb).

func factInt(n int) int64 { // want factInt:`factorial of parameter 0, breaks from 21`
	r := int64(1)
	for i := int64(2); i <= int64(n); i++ { // want `factorial of int64\(n\) in int64 wraps`
		r *= i
	}
	return r
}

// Choose is C(n, k) = n!/(k!(n−k)!): 21! wraps int64 while C(21, 2) =
// 210 and C(66, 33) ≈ 7.2e18 fit.
func Choose(n, k int) int64 { // want Choose:`binomial of parameter 0, breaks from 21` Choose:`wrong for n ≥ 21 \(Choose, wrongcallee/labels\.go:24\)`
	return factInt(n) / (factInt(k) * factInt(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
}

// PairsLabel renders the count with strconv: at n = 21 the text is not
// "pairs: 210".
func PairsLabel(n int) string {
	return "pairs: " + strconv.FormatInt(Choose(n, 2), 10) // want `PairsLabel builds its result from Choose\(n, 2\), which is wrong from n = 21 \(reported at wrongcallee/labels\.go:24\); n is not bounded here`
}

// PairsNote formats the count with fmt.
func PairsNote(n int) string {
	return fmt.Sprintf("%d pairs", Choose(n, 2)) // want `PairsNote builds its result from Choose\(n, 2\), which is wrong from n = 21`
}

// FewPairsLabel bounds n where n! fits: silent.
func FewPairsLabel(n int) string {
	if n > 20 {
		return ""
	}
	return strconv.FormatInt(Choose(n, 2), 10)
}

// FactLabel renders a factorial function's value, wrong only where n!
// leaves int64 itself: silent.
func FactLabel(n int) string {
	return fmt.Sprint(factInt(n))
}

// Handshakes multiplies two counts in int64: at (21, 3) the exact
// product 210·3 = 630 fits.
func Handshakes(a, b int) int64 { // want Handshakes:`wrong for a ≥ 21 \(Choose, wrongcallee/labels\.go:24\)`
	return Choose(a, 2) * Choose(b, 2) // want `Handshakes builds its result from Choose\(a, 2\), which is wrong from n = 21 \(reported at wrongcallee/labels\.go:24\); a, passed as n, is not bounded here`
}

// PairTable fills a table of counts: each element holds Choose's wrong
// value at n ≥ 21 (C(21, 2) = 210), and so does the table returned.
func PairTable(n int) []int64 {
	t := make([]int64, n+1)
	for i := range t {
		t[i] = Choose(i, 2) // want `PairTable builds its result from Choose\(i, 2\), which is wrong from n = 21`
	}
	return t
}

// PairCount stores the count in a table it does not return: silent.
func PairCount(n int) int {
	t := make([]int64, 1)
	t[0] = Choose(n, 2)
	return len(t)
}
