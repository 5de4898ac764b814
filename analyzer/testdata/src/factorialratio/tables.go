package factorialratio

// Factorial tables (analyzer/factorialtables.go), as a seed bank scores
// its germination trials: the chance that exactly k of n seeds in a tray
// sprout, the ways to pick a sample of trays, and the orders in which
// trays can be checked, from tables of factorials filled once by a loop.
// Findings on tables have no fix.

import "math"

// trayFact holds n! for the trays' seed counts, filled by init.
var trayFact [500]float64

func init() {
	trayFact[0] = 1
	for i := 1; i < len(trayFact); i++ {
		trayFact[i] = trayFact[i-1] * float64(i)
	}
}

// Sprouts is the chance that exactly k of n seeds sprout when each does
// with chance p.
func Sprouts(n, k int, p float64) float64 { // want Sprouts:`wrong for some n or some k`
	ways := trayFact[n] / (trayFact[k] * trayFact[n-k])
	return ways * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171 before the division; n is not bounded here`
}

// SampleWays is the number of ways to pick k of n trays, from a table
// of factorials up to n built for the call.
func SampleWays(n, k int) float64 { // want SampleWays:`binomial of parameter 0, breaks from 171`
	f := make([]float64, n+1)
	f[0] = 1
	for i := 1; i <= n; i++ {
		f[i] = float64(i) * f[i-1]
	}
	return f[n] / (f[k] * f[n-k]) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171, although C\(n, n/2\) itself fits up to n = 1029`
}

// RowPlans is the number of orders in which the trays of a row can be
// checked, n!/(n-k)! for the first k of them, from a table kept as the
// running product goes.
func RowPlans(n, k int) int64 { // want RowPlans:`wrong for some n`
	orders := make([]int64, n+1)
	orders[0] = 1
	run := int64(1)
	for i := 1; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that fits\); n is not bounded here`
		run *= int64(i)
		orders[i] = run
	}
	return orders[n] / orders[n-k] // want `permutation count n!/\(n - k\)! as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
}

// shelfFact holds 0! to 20!, all of which fit int64.
var shelfFact [21]int64

func init() {
	shelfFact[0] = 1
	for i := 1; i <= 20; i++ {
		shelfFact[i] = shelfFact[i-1] * int64(i)
	}
}

// ShelfOrders is the number of orders of a shelf's boxes; a shelf holds
// at most 20 boxes, the table's last entry.
func ShelfOrders(boxes int) int64 {
	return shelfFact[boxes] / shelfFact[0]
}

// PairWays is C(n, 2) from the exact table, n at most 20.
func PairWays(n int) int64 {
	return shelfFact[n] / (shelfFact[2] * shelfFact[n-2])
}

// TrayOrders returns the orders in which 0..n trays can be checked, a
// table of n! in int64 filled for any n: from 21 trays on its elements
// have wrapped, whoever reads them.
func TrayOrders(n int) []int64 {
	t := make([]int64, n+1)
	t[0] = 1
	for i := 1; i <= n; i++ { // want `loop fills the factorial table t with i! at index i up to n: the factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that fits\); n is not bounded here`
		t[i] = t[i-1] * int64(i)
	}
	return t
}

// benchOrders holds the orders of a bench's 0..24 trays: past 20 they
// have wrapped.
var benchOrders [25]uint64

func init() {
	benchOrders[0] = 1
	for i := 1; i < len(benchOrders); i++ { // want `loop fills the factorial table benchOrders with i! at index i up to len\(benchOrders\)-1: the factorial of len\(benchOrders\)-1 in uint64 wraps`
		benchOrders[i] = benchOrders[i-1] * uint64(i)
	}
}

// ShelfTable stops at the largest shelf that fits: no finding.
func ShelfTable(n int) []int64 {
	if n > 20 {
		n = 20
	}
	t := make([]int64, n+1)
	t[0] = 1
	for i := 1; i <= n; i++ {
		t[i] = t[i-1] * int64(i)
	}
	return t
}

// seedFact grows as larger trays come in: element m is appended as
// seedFact[m-1]·m, so seedFact[m] is m!.
var seedFact = []float64{1}

// seedFactorial returns n!, growing the table as far as n first.
func seedFactorial(n int) float64 { // want seedFactorial:`factorial of parameter 0, breaks from 171`
	for len(seedFact) <= n {
		m := len(seedFact)
		seedFact = append(seedFact, seedFact[m-1]*float64(m))
	}
	return seedFact[n]
}

// TrayPicks is the number of ways to pick k of a tray's n seeds.
func TrayPicks(n, k int) float64 { // want TrayPicks:`binomial of parameter 0, breaks from 171`
	return seedFactorial(n) / (seedFactorial(k) * seedFactorial(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// CheckOrders grows an int64 table of the orders of 0..n trays by
// append, indexed by the loop.
func CheckOrders(n int) []int64 {
	f := []int64{1}
	for i := 1; i <= n; i++ { // want `loop fills the factorial table f with i! at index i up to n: the factorial of n in int64 wraps for n ≥ 21`
		f = append(f, f[i-1]*int64(i))
	}
	return f
}

// RackOrders grows its table by its own length, reading it after.
func RackOrders(n, k int) uint64 { // want RackOrders:`wrong for some n`
	r := []uint64{1, 1}
	for len(r) <= n { // want `loop fills the factorial table r with i! at index i up to n: the factorial of n in uint64 wraps for n ≥ 21`
		r = append(r, r[len(r)-1]*uint64(len(r)))
	}
	return r[n] / r[n-k] // want `permutation count n!/\(n - k\)! as a ratio of factorials in uint64: the numerator n! wraps for n ≥ 21`
}

// ShortOrders stops at 20 trays, all of whose orders fit int64: silent.
func ShortOrders() []int64 {
	f := []int64{1}
	for len(f) <= 20 {
		f = append(f, f[len(f)-1]*int64(len(f)))
	}
	return f
}

// Doubling starts at 2, so its elements are 2·m!, no factorials: silent.
func Doubling(n int) []int64 {
	f := []int64{2}
	for i := 1; i <= n; i++ {
		f = append(f, f[i-1]*int64(i))
	}
	return f
}

// SkipOdd may skip an append, so the index is not the length: silent.
func SkipOdd(n int) []int64 {
	f := []int64{1}
	for i := 1; i <= n; i++ {
		if i%2 == 1 {
			continue
		}
		f = append(f, f[i-1]*int64(i))
	}
	return f
}
