// Package dice tabulates the odds of throws of five dice.
package dice

// fact is a small factorial; the table only ever needs it for the five
// dice of a throw, and every call below passes a constant.
func fact(n int) int { // want fact:`factorial of parameter 0, breaks from 21`
	r := 1
	for n > 1 {
		r *= n
		n--
	}
	return r
}

// FullHouse is the chance of three of one face and two of another.
func FullHouse() float64 {
	orders := fact(5) / (fact(3) * fact(2))
	return float64(orders*6*5) / 7776
}

// FourOfAKind is the chance of four equal faces.
func FourOfAKind() float64 {
	orders := fact(5) / (fact(4) * fact(1))
	return float64(orders*6*5) / 7776
}

// Straight is the chance of five consecutive faces.
func Straight() float64 {
	return float64(2*fact(5)) / 7776
}
