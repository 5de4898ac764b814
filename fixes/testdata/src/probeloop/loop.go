// Package probeloop holds multiplicative loops for the fix builders: a
// dice-odds table counting rolls and orderings.
package probeloop

// Ways counts the ways k dice of n show a six, multiplicatively.
func Ways(n, k int) int {
	b := 1
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop"
		b = b * (n - k + i) / i
	}
	return b
}

// Orders counts ordered draws of k faces out of n.
func Orders(n, k int64) int64 {
	var p int64 = 1
	// probe:fallingloop(p; n, k)
	for i := int64(0); i < k; i++ { // want "probe fallingloop"
		p *= n - i
	}
	return p
}

// WaysU counts in unsigned arithmetic, with a statement between the
// accumulator's initialisation and the loop.
func WaysU(n, k uint64) uint64 {
	b := uint64(1)
	steps := 0
	// probe:binomialloop(b; n, k)
	for i := uint64(1); i <= k; i++ { // want "probe binomialloop"
		b = b * (n - k + i) / i
	}
	return b + uint64(steps)
}

// Counted also counts its steps, which the fix must not drop.
func Counted(n, k int) (int, int) {
	b, steps := 1, 0
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop: no fix: the loop does more than update b"
		b = b * (n - k + i) / i
		steps++
	}
	return b, steps
}

// Odds is the float version, which the log-space helper serves.
func Odds(n, k int) float64 {
	b := 1.0
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop"
		b = b * float64(n-k+i) / float64(i)
	}
	return b
}

// Kept declares its counter outside the loop, which the check does not
// follow (removing the loop would leave i unused).
func Kept(n, k int) (int, int) {
	b := 1
	i := 1
	// probe:binomialloop(b; n, k)
	for ; i <= k; i++ { // want "probe binomialloop: no fix: the loop does not count an induction variable up by one"
		b = b * (n - k + i) / i
	}
	return b, 0
}

// Doubled starts at 2, which the helper does not reproduce.
func Doubled(n, k int) int {
	b := 2
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop: no fix: b does not start at 1"
		b = b * (n - k + i) / i
	}
	return b
}

// Ranged counts with range over an int.
func Ranged(n, k int) int {
	b := 1
	// probe:binomialloop(b; n, k)
	for i := range k { // want "probe binomialloop"
		b = b * (n - i) / (i + 1)
	}
	return b
}

// OffByOne multiplies by n-i from i = 1: that is C(n-1, k)·n/(n-k), not
// C(n, k).
func OffByOne(n, k int) int {
	b := 1
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop: no fix: the loop is not the multiplicative binomial of its operands"
		b = b * (n - i) / i
	}
	return b
}

// DivideFirst divides before it multiplies, which truncates.
func DivideFirst(n, k int) int {
	b := 1
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop: no fix: the loop's update is not acc = acc \\* F / G"
		b = b / i * (n - k + i)
	}
	return b
}
