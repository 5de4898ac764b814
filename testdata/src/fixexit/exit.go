// Package fixexit is a warehouse packing planner whose product loops can
// leave before their test stops them: by a labelled break or continue
// out of a nested loop, a goto, a return, or a break once the product is
// large. Such a loop need not compute the whole product its shape
// suggests, so it is never reported as certain and no fix that assumes
// it runs to the end (a range guard, a helper call) is offered; its
// .golden file keeps every such function as written.
package fixexit

// Labeled multiplies crate sizes 1..n, but a check in a nested loop
// stops both loops at the fifth crate: Labeled(25) is 4! = 24.
func Labeled(n int) int {
	r := 1
outer:
	for i := 1; i <= n; i++ {
		for j := 0; j < 3; j++ {
			if i > 4 {
				break outer
			}
		}
		r *= i
	}
	return r
}

// Jumped is Labeled with a goto out of both loops.
func Jumped(n int) int {
	r := 1
	for i := 1; i <= n; i++ {
		for j := 0; j < 3; j++ {
			if i > 4 {
				goto done
			}
		}
		r *= i
	}
done:
	return r
}

// Skipped tallies the crates of a shelf until a nested check skips to
// the next shelf: only shelves of at most five crates multiply in.
func Skipped(n int) int {
	r := 1
shelves:
	for i := 1; i <= n; i++ {
		for j := 0; j < i; j++ {
			if j >= 5 {
				continue shelves
			}
		}
		r *= i
	}
	return r
}

// Capped stops once the product passes a pallet limit: it never wraps.
func Capped(n int) int {
	r := 1
	for i := 1; i <= n; i++ {
		r *= i
		if r > 1000 {
			break
		}
	}
	return r
}

// Until multiplies 1..n but stops at the crate numbered stop.
func Until(n, stop int) int { // want Until:`wrong for some n`
	r := 1
	for i := 1; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
		if i == stop {
			break
		}
		r *= i
	}
	return r
}

// Thirty multiplies 1..30 unless a crate numbered stop comes first.
func Thirty(stop int) int { // want Thirty:`wrong for some stop`
	r := 1
	for i := 1; i <= 30; i++ { // want `^factorial of 30 in int wraps \(20! ≈ 2.43e18 is the largest that fits\); the loop can also leave before it gets there$`
		if i == stop {
			return r
		}
		r *= i
	}
	return r
}

// OddCrates multiplies the odd crate numbers only: 25 gives 25!! in
// full, which fits an int.
func OddCrates(n int) int { // want OddCrates:`wrong for some n`
	r := 1
	for i := 1; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
		if i%2 == 0 {
			continue
		}
		r *= i
	}
	return r
}

// Past leaves its loop only long after the product has wrapped: it is
// n! wherever it is right, and gets the range guard.
func Past(n int) int { // want Past:"factorial of parameter 0, breaks from 21" Past:`wrong for some n`
	r := 1
	for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
		if i > 1000 {
			break
		}
		r *= i
	}
	return r
}
