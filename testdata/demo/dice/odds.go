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

// Patterns counts the throws of n dice showing face i counts[i] times:
// the multinomial n!/(c1!...c6!).
func Patterns(counts [6]int) int {
	n := 0
	for _, c := range counts {
		n += c
	}
	den := 1
	for _, c := range counts {
		den *= perms(c)
	}
	return perms(n) / den
}

// Probability is the chance of a pattern among the 6^n equally likely
// throws; the count is converted to float64 only after it was formed in
// int.
func Probability(counts [6]int) float64 {
	n := 0
	for _, c := range counts {
		n += c
	}
	total := 1.0
	for i := 0; i < n; i++ {
		total *= 6
	}
	return float64(Patterns(counts)) / total
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
