// Package stirlingapprox holds a dice-game server's odds tables, a
// call-centre queueing model and a gas lab's entropy bookkeeping, each
// with n! written by hand as Stirling's formula.
package stirlingapprox

import "math"

// Shuffles is the number of orders in which n dice can be rolled out
// of the cup, for the table's odds display.
func Shuffles(n int) float64 {
	x := float64(n)
	return math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x) // want `hand-written Stirling approximation √\(2πn\)\(n/e\)\^n of n!: it is 7.79% below n! at n = 1 and 0.83% at n = 10 \(about 1/\(12n\) relative; above 1e-12 up to n = 83333333\d+\), where a factorial is expected exactly; n is not bounded here`
}

// OddsTable fills the display table for hands of 1 to 12 dice.
func OddsTable() []float64 {
	table := make([]float64, 13)
	for n := 1; n <= 12; n++ {
		f := float64(n)
		table[n] = math.Pow(f, f) * math.Exp(-f) * math.Sqrt(2*math.Pi*f) // want `.*it is 7.79% below n! at n = 1 and 0.83% at n = 10.*; n may reach 12 here`
	}
	return table
}

// RoughPot estimates the pot for a tournament of n players; the
// estimate only needs its order of magnitude.
func RoughPot(n int) float64 {
	x := float64(n)
	//overfact:approx the pot display rounds to two significant digits
	return math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x)
}

// Pot is RoughPot where the reason was forgotten: the directive is
// reported and does not silence.
func Pot(n int) float64 {
	x := float64(n)
	return math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x) //overfact:approx // want `//overfact:approx needs a reason` `Stirling approximation`
}
