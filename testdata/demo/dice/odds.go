// Package dice prints the odds table for the summer-party dice game:
// throw n six-sided dice and count the ways to see each pattern.
package dice

// perms returns n! as an int, the count of orders of n dice.
func perms(n int) int {
	if n == 0 {
		return 1
	}
	return n * perms(n-1)
}

// Patterns counts the throws of n dice that show ones ones and sixes
// sixes, the rest being other faces: the multinomial
// n!/(ones! sixes! (n-ones-sixes)!), before the other faces are told apart.
func Patterns(n, ones, sixes int) int {
	return perms(n) / (perms(ones) * perms(sixes) * perms(n-ones-sixes))
}

// Orders is the number of orders in which n distinct dice can be lined
// up on the table, as a float64 for the odds poster; the count is
// converted only after it was formed in int.
func Orders(n int) float64 {
	return float64(perms(n))
}

// Table returns the chance of "all different" for a throw of one to six
// dice, for the poster; six dice is the most the game uses, so perms
// never sees more than 6.
func Table() [6]float64 {
	var t [6]float64
	for n := 1; n <= 6; n++ {
		ways := perms(6) / perms(6-n)
		total := 1
		for i := 0; i < n; i++ {
			total *= 6
		}
		t[n-1] = float64(ways) / float64(total)
	}
	return t
}

// TokenOrders is the number of orders in which the 24 party tokens can
// be handed out, a count that looks small and is not.
func TokenOrders() int {
	return perms(24)
}
