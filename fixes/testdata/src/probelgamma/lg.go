// Package probelgamma holds exponentials of log-gamma values for the fix
// builders: a warehouse's pick-list odds, each marked with the shape the
// fixer is asked to rewrite, some of which it must refuse.
package probelgamma

import "math"

func lnG(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// Picks is C(n, k) in log space.
func Picks(n, k int) float64 {
	// probe:expchoose(n, k)
	return math.Exp(lnG(float64(n)+1) - lnG(float64(k)+1) - lnG(float64(n-k)+1)) // want "probe expchoose"
}

// PicksOff has a wrong argument: Γ(n+2) is (n+1)!, not n!.
func PicksOff(n, k int) float64 {
	// probe:expchoose(n, k)
	return math.Exp(lnG(float64(n)+2) - lnG(float64(k)+1) - lnG(float64(n-k)+1)) // want "probe expchoose: no fix: the exponent is not the log-gamma form of its operands"
}

// PicksDoubled carries a factor the helper would drop.
func PicksDoubled(n, k int) float64 {
	// probe:expchoose(n, k)
	return 2 * math.Exp(lnG(float64(n)+1)-lnG(float64(k)+1)-lnG(float64(n-k)+1)) // want "probe expchoose: no fix: the rewrite would drop the factor 2"
}

// PicksSplit is C(n, k) as a quotient of exponentials.
func PicksSplit(n, k int) float64 {
	// probe:expchoose(n, k)
	return math.Exp(lnG(float64(n)+1)) / (math.Exp(lnG(float64(k)+1)) * math.Exp(lnG(float64(n-k)+1))) // want "probe expchoose"
}

// Hits is the binomial pmf with its powers in log space.
func Hits(k, n int, p float64) float64 {
	// probe:expbinompmf(k, n, p)
	return math.Exp(lnG(float64(n)+1) - lnG(float64(k)+1) - lnG(float64(n-k)+1) + float64(k)*math.Log(p) + float64(n-k)*math.Log(1-p)) // want "probe expbinompmf"
}

// HitsPow is the binomial pmf with its powers as factors.
func HitsPow(k, n int, p float64) float64 {
	// probe:expbinompmf(k, n, p)
	return math.Exp(lnG(float64(n)+1)-lnG(float64(k)+1)-lnG(float64(n-k)+1)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want "probe expbinompmf"
}

// HitsSkewed raises 1−p to k: not the pmf.
func HitsSkewed(k, n int, p float64) float64 {
	// probe:expbinompmf(k, n, p)
	return math.Exp(lnG(float64(n)+1) - lnG(float64(k)+1) - lnG(float64(n-k)+1) + float64(k)*math.Log(p) + float64(k)*math.Log(1-p)) // want "probe expbinompmf: no fix: the exponent is not the log-gamma form of its operands"
}

// Shelves reads n! back as an integer, rounded.
func Shelves(n int) int {
	// probe:expfactorial(n)
	return int(math.Round(math.Exp(lnG(float64(n) + 1)))) // want "probe expfactorial"
}

// Racks reads n! back from math.Gamma.
func Racks(n int) int64 {
	// probe:expfactorial(n)
	return int64(math.Gamma(float64(n) + 1)) // want "probe expfactorial"
}

// Bins is B(a, b).
func Bins(a, b float64) float64 {
	// probe:expbeta(a, b)
	return math.Exp(lnG(a) + lnG(b) - lnG(a+b)) // want "probe expbeta"
}

// Aisles is Γ(a)/Γ(b).
func Aisles(a, b float64) float64 {
	// probe:expgammaratio(a, b)
	return math.Exp(lnG(a) - lnG(b)) // want "probe expgammaratio"
}
