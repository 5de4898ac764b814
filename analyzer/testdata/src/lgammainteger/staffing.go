// Package lgammainteger is a call-centre staffing sheet: orderings of
// agents on a rota and teams picked from a shift, counted from log-gamma
// values.
package lgammainteger

import "math"

// lgamma returns ln|Γ(x)|.
func lgamma(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// RotaOrders counts the orders n agents can take their breaks in.
func RotaOrders(n int) int { // want RotaOrders:`wrong for some n`
	return int(math.Exp(lgamma(float64(n) + 1))) // want `reads the integer n! back .* the int result is wrong from n = 5 \(.* gives 119 where 5! is 120\)`
}

// Teams counts the teams of k agents a shift of n can field.
func Teams(n, k int) int64 { // want Teams:`wrong for some n or some k`
	return int64(math.Round(math.Exp(lgamma(float64(n)+1) - lgamma(float64(k)+1) - lgamma(float64(n-k)+1)))) // want `reads the integer C\(n, k\) back .* the int64 result is wrong from n = 48 \(at k = 25 it gives 30957699535775 where C\(48, 25\) is 30957699535776\)`
}

// DeskOrders is the number of desk orders as a float for the sheet.
func DeskOrders(n int) float64 { // want DeskOrders:`wrong for some n`
	return math.Floor(math.Exp(lgamma(float64(n) + 1))) // want `the float64 result is wrong from n = 5`
}

// SmallTeamOrders rounds, and the sheet never has more than 16 agents.
func SmallTeamOrders(n int) int {
	if n < 0 || n > 16 {
		panic("at most 16 agents")
	}
	return int(math.Round(math.Exp(lgamma(float64(n) + 1))))
}

// Lineups uses math.Gamma, exact for the 20 agents a line holds.
func Lineups(n int) int64 {
	if n < 0 || n > 20 {
		return -1
	}
	return int64(math.Gamma(float64(n) + 1))
}

// PairOrders truncates, over the at most 4 agents of a night shift.
func PairOrders(n int) int {
	if n < 0 || n > 4 {
		return 0
	}
	return int(math.Exp(lgamma(float64(n) + 1)))
}
