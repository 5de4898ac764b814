package ranges

import "testing"

// Each case is a small function from a made-up scenario; the expected
// ranges in the markers are derived by hand from Go's semantics.
var guardCases = []struct {
	name, src string
}{
	{"early return bounds a staffing estimate", `package p
func staffNeeded(n int) int {
	if n > 20 {
		return -1
	}
	return n/*@range (-inf, 20]*/
}`},
	{"no guard stays top", `package p
func staffNeeded(n int) int {
	return n/*@range (-inf, +inf)*/
}`},
	{"guard that falls through does not refine", `package p
func staffNeeded(n int) int {
	if n > 20 {
		n = n + 0
	}
	return n/*@range (-inf, +inf)*/
}`},
	{"guard body refines inside", `package p
func odds(n int) int {
	if n >= 0 && n <= 20 {
		return n/*@range [0, 20]*/
	}
	return n/*@range (-inf, +inf)*/
}`},
	{"else gets the negation", `package p
func odds(n int) int {
	if n < 3 {
		return 0
	} else {
		return n/*@range [3, +inf)*/
	}
}`},
	{"or chain after early return", `package p
func plan(n int) int {
	if n < 0 || n > 12 {
		panic("sample size out of table")
	}
	return n/*@range [0, 12]*/
}`},
	{"or chain inside then stays loose", `package p
func plan(n int) int {
	if n < 0 || n > 12 {
		return n/*@range (-inf, +inf)*/
	}
	return 0
}`},
	{"negated condition", `package p
func plan(n int) int {
	if !(n <= 12) {
		return 0
	}
	return n/*@range (-inf, 12]*/
}`},
	{"variable on the right", `package p
func plan(n int) int {
	if 12 < n {
		return 0
	}
	return n/*@range (-inf, 12]*/
}`},
	{"against a bounded variable", `package p
func plan(n, m int) int {
	if m < 0 || m > 10 {
		return 0
	}
	if n < m {
		return n/*@range (-inf, 9]*/
	}
	return 0
}`},
	// n < m with m any int gives n <= MaxInt64-1.
	{"against an unbounded variable", `package p
func plan(n, m int) int {
	if n < m {
		return n/*@range (-inf, 9223372036854775806]*/
	}
	return 0
}`},
	{"equality with a constant", `package p
func dice(n int) int {
	if n == 6 {
		return n/*@range [6, 6]*/
	}
	return n/*@range (-inf, +inf)*/
}`},
	{"inequality trims an end", `package p
func dice(n int) int {
	if n < 1 || n > 6 {
		return 0
	}
	if n != 6 {
		return n/*@range [1, 5]*/
	}
	return n/*@range [6, 6]*/
}`},
	{"os.Exit does not return", `package p
import "os"
func crew(n int) int {
	if n > 30 {
		os.Exit(2)
	}
	return n/*@range (-inf, 30]*/
}`},
	{"log.Fatalf does not return", `package p
import "log"
func crew(n int) int {
	if n > 30 {
		log.Fatalf("crew of %d is too big", n)
	}
	return n/*@range (-inf, 30]*/
}`},
	{"t.Fatalf does not return", `package p
import "testing"
func crew(t *testing.T, n int) int {
	if n > 30 {
		t.Fatalf("crew of %d is too big", n)
	}
	return n/*@range (-inf, 30]*/
}`},
	{"an ordinary call returns", `package p
import "log"
func crew(n int) int {
	if n > 30 {
		log.Printf("crew of %d is big", n)
	}
	return n/*@range (-inf, +inf)*/
}`},
	{"continue leaves the branch", `package p
func shifts(xs []int) int {
	s := 0
	for _, n := range xs {
		if n > 8 {
			continue
		}
		s += n/*@range (-inf, 8]*/
	}
	return s
}`},
	{"tag switch", `package p
func faces(n int) int {
	switch n {
	case 0, 1:
		return n/*@range [0, 1]*/
	case 2:
		return n/*@range [2, 2]*/
	default:
		return n/*@range (-inf, +inf)*/
	}
}`},
	{"tagless switch guard", `package p
func faces(n int) int {
	switch {
	case n > 20:
		return 0
	case n < 0:
		return 0
	}
	return n/*@range [0, 20]*/
}`},
	{"fallthrough joins", `package p
func faces(n int) int {
	r := 0
	switch {
	case n < 0:
		return 0
	case n <= 5:
		r = n/*@range [0, 5]*/
		fallthrough
	case n <= 10:
		r = n/*@range [0, 10]*/
	default:
		r = 0
	}
	return r/*@range [0, 10]*/
}`},
	{"constants and conversions", `package p
const maxCrew = 12
func crew() (int64, float64, uint8) {
	a := int64(maxCrew)
	b := float64(a)/*@range [12, 12]*/
	var c uint8 = 300 - 290
	d := -a/*@range [-12, -12]*/
	_ = d
	return a/*@range [12, 12]*/, b / 5/*@range [2, 3]*/, c/*@range [10, 10]*/
}`},
	{"conversion that does not fit", `package p
func crew(n int) uint8 {
	if n < 0 || n > 300 {
		return 0
	}
	return uint8(n)/*@range [0, 255]*/
}`},
	{"min max len", `package p
var table [7]int
func bins(n int, xs []int) int {
	a := min(n, 20)/*@range (-inf, 20]*/
	b := max(n, 0)/*@range [0, +inf)*/
	c := len(table)/*@range [7, 7]*/
	d := len(xs)/*@range [0, +inf)*/
	p := &table
	e := len(p)/*@range [7, 7]*/
	return a + b + c + d + e
}`},
	{"arithmetic", `package p
func mix(n int) int {
	if n < 2 || n > 10 {
		return 0
	}
	a := n * 3/*@range [6, 30]*/
	b := n / 3/*@range [0, 3]*/
	c := n % 4/*@range [0, 3]*/
	d := 100 - n/*@range [90, 98]*/
	e := n << 2/*@range [8, 40]*/
	return a + b + c + d + e
}`},
	// -MinInt64 wraps to MinInt64, so an unbounded n gives Top.
	{"negating an unbounded value", `package p
func mix(n int) int {
	if n > 5 {
		return 0
	}
	return -n/*@range (-inf, +inf)*/
}`},
	{"negating a bounded value", `package p
func mix(n int) int {
	if n > 5 || n < -5 {
		return 0
	}
	return -n/*@range [-5, 5]*/
}`},
	{"min of unknowns", `package p
func mix(n, m int) int {
	return min(n, m)/*@range (-inf, +inf)*/
}`},
	{"uint64 strict bound keeps +inf", `package p
func mix(u, v uint64) uint64 {
	if u < v {
		return u/*@range [0, +inf)*/
	}
	return 0
}`},
	{"uint guard", `package p
func mix(u uint) uint {
	if u > 20 {
		return 0
	}
	return u * 2/*@range [0, 40]*/
}`},
	{"constant past int64", `package p
func mix() uint64 {
	const big = 1 << 63
	var u uint64 = big
	return u/*@range [+inf, +inf)*/
}`},
	{"wrapping makes top", `package p
func mix(n int) int {
	if n > 20 {
		return 0
	}
	return n - 1/*@range (-inf, +inf)*/
}`},
	{"a guard on the length of a slice never reassigned bounds it", `package p
func plot(cp []float64) int {
	if len(cp) == 0 || len(cp) > 400 {
		return 0
	}
	c := make([]float64, len(cp))
	m := len(c)/*@range [0, +inf)*/
	return len(cp)/*@range [0, 400]*/ + m
}`},
	{"the length of a reassigned slice is not carried past the assignment", `package p
func plot(cp []float64) int {
	if len(cp) > 400 {
		return 0
	}
	cp = append(cp, 1)
	return len(cp)/*@range [0, +inf)*/
}`},
	{"a slice whose address escapes loses its bound", `package p
func grow(p *[]float64) { *p = append(*p, 0) }
func plot(cp []float64) int {
	if len(cp) > 400 {
		return 0
	}
	grow(&cp)
	return len(cp)/*@range [0, +inf)*/
}`},
	{"small type wraps", `package p
func mix(n int8) int8 {
	if n < 100 {
		return 0
	}
	return n + 100/*@range [-128, 127]*/
}`},
}

func TestGuards(t *testing.T) {
	for _, c := range guardCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{}) })
	}
}
