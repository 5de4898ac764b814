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

// Throw is the faces of one throw of five dice.
type Throw [5]int

// Orders counts the orders of a throw; the array length bounds it.
func Orders(t Throw) int64 {
	f := int64(1)
	for i := 1; i <= len(t); i++ {
		f *= int64(i)
	}
	return f * 1
}

// TableSize picks the table for a game; every case is small.
func TableSize(game string) int64 {
	var n int
	switch game {
	case "poker":
		n = 5
	case "yacht":
		n = 5
	default:
		n = 2
	}
	f := int64(1)
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f * 1
}

// PoolOrders counts orders of a dice pool; either branch bounds it.
func PoolOrders(pool int, big bool) float64 {
	if !big {
		pool = min(pool, 10)
	} else if pool > 170 {
		return -1
	}
	f := 1.0
	for i := 2; i <= pool; i++ {
		f *= float64(i)
	}
	return f / 2
}

// BucketOrders counts orders of a bucket of dice that the caller may fill
// to any size.
func BucketOrders(bucket []int) float64 {
	f := 1.0
	for i := 2; i <= len(bucket); i++ { // want `factorial of len\(bucket\) in float64 overflows to \+Inf for len\(bucket\) ≥ 171`
		f *= float64(i)
	}
	return f / 2
}
