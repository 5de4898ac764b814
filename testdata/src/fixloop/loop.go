// Package fixloop is a dice-odds table whose counts are built by
// multiplicative loops; its .golden file shows each loop replaced by one
// exact helper call.
package fixloop

// Ways counts the ways k dice of n show a six.
func Ways(n, k int) int { // want Ways:"binomial of parameter 0" Ways:`wrong for some n or some k`
	b := 1
	for i := 1; i <= k; i++ { // want "multiplicative binomial loop"
		b = b * (n - k + i) / i
	}
	return b
}

// WaysChecked refuses a negative k first, so the rewrite needs no
// condition of its own.
func WaysChecked(n, k int) int { // want WaysChecked:"binomial of parameter 0" WaysChecked:`wrong for some n or some k`
	if k < 0 {
		return 0
	}
	b := 1
	for i := 1; i <= k; i++ { // want "multiplicative binomial loop"
		b = b * (n - k + i) / i
	}
	return b
}

// WaysU counts in unsigned arithmetic.
func WaysU(n, k uint64) uint64 { // want WaysU:"binomial of parameter 0" WaysU:`wrong for some n or some k`
	b := uint64(1)
	for i := uint64(1); i <= k; i++ { // want "multiplicative binomial loop"
		b = b * (n - k + i) / i
	}
	return b
}

// Rolls counts the ordered ways k dice of n can be picked one after
// another: n(n−1)…(n−k+1).
func Rolls(n, k int) int { // want Rolls:"falling-factorial of parameter 0" Rolls:`wrong for some n or some k`
	p := 1
	for i := 0; i < k; i++ { // want `falling factorial of k factors from n down in int wraps`
		p *= n - i
	}
	return p
}

// RollsUp is Rolls counted up to n: (n−k+1)(n−k+2)…n.
func RollsUp(n, k int) int { // want RollsUp:`wrong for some n or some k`
	p := 1
	for i := n - k + 1; i <= n; i++ { // want `falling factorial of k factors from n down in int wraps`
		p *= i
	}
	return p
}

// Picks is RollsUp in uint64 with its factor written off the counter,
// (i − 1) for i from n−k+2 to n+1: the fixer reads the factor against
// the counter itself. For k > n the product holds the factor 0 where
// n−k+2 does not wrap, and the falling factorial is 0 for every k > n.
func Picks(n, k uint64) uint64 { // want Picks:`wrong for some n or some k`
	p := uint64(1)
	for i := n - k + 2; i <= n+1; i++ { // want `falling factorial of k factors from n down in uint64 wraps`
		p *= i - 1
	}
	return p
}

// Draws is Picks in int64 for counts the caller checked: n is never
// negative at the loop, where the helper takes it.
func Draws(n, k int64) int64 { // want Draws:`wrong for some n or some k`
	if n < 0 || k < 0 {
		return 0
	}
	p := int64(1)
	for i := n - k; i < n; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		p *= i + 1
	}
	return p
}

// Shifted is Draws without the check: over a negative n the loop
// multiplies negative factors, which the falling helpers do not take, so
// it has no fix.
func Shifted(n, k int64) (p int64) { // want Shifted:`wrong for some n or some k`
	p = 1
	for i := n - k; i <= n-1; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		p *= 1 + i
	}
	return p
}

// Interleavings divides the falling factorial by k! after both loops:
// C(n, k) may fit where the numerator wraps, and a helper that panics
// past the numerator's range would refuse it, so the numerator's loop
// has no fix of its own; the quotient, C(n, k), is rewritten instead,
// and outside k ≤ n it stays as written.
func Interleavings(n, k uint64) uint64 { // want Interleavings:`wrong for some n or some k`
	num := uint64(1)
	for i := uint64(0); i < k; i++ { // want `falling factorial of k factors from n down in uint64 wraps`
		num *= n - i
	}
	den := uint64(1)
	for i := uint64(2); i <= k; i++ { // want `factorial of k in uint64 wraps for k ≥ 21`
		den *= i
	}
	return num / den
}

// Routes counts the monotone routes across a grid of across × up
// blocks, C(across+up, across), with the multiplicative loop written
// over the route's length: its n is the sum across+up, which no single
// variable of the loop names.
func Routes(across, up int) int { // want Routes:`wrong for some across or some up`
	r := 1
	for i := 0; i < across; i++ { // want "multiplicative binomial loop in int: the product r \\* \\(across \\+ up - i\\) wraps before the division for across \\+ up ≥ 62"
		r = r * (across + up - i) / (i + 1)
	}
	return r
}

// Committees counts the committees of k members out of n: the falling
// factorial over k!, each multiplied up by a loop of its own.
func Committees(n, k int) int64 { // want Committees:`wrong for some n or some k`
	num := int64(1)
	for i := 0; i < k; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		num *= int64(n - i)
	}
	den := int64(1)
	for i := 1; i <= k; i++ { // want `factorial of k in int64 wraps for k ≥ 21`
		den = den * int64(i)
	}
	return num / den
}

// CommitteesAfterLeave takes one member out between the loops: the
// quotient is not C(n, k) of the n it is left with, and stays as
// written.
func CommitteesAfterLeave(n, k int) int64 { // want CommitteesAfterLeave:`wrong for some n or some k`
	num := int64(1)
	for i := 0; i < k; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		num *= int64(n - i)
	}
	n--
	den := int64(1)
	for i := 1; i <= k; i++ { // want `factorial of k in int64 wraps for k ≥ 21`
		den *= int64(i)
	}
	return num / den
}
