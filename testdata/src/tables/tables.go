// Package tables prints the lookup tables of the planning tools; it
// shows the //overfact: directives.
package tables

// menuFactorial serves a menu of 1 to 20 items.
func menuFactorial(n int) int64 { // want menuFactorial:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ { //overfact:allow n comes from a menu of 1 to 20 items
		f *= int64(i)
	}
	return f
}

// menuFloat has its allow on the line before the loop.
func menuFloat(n int) float64 { // want menuFloat:`factorial of parameter 0, breaks from 171`
	f := 1.0
	//overfact:allow the menu never offers more than 170 items
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// seatings counts seatings of a table.
//
//overfact:allow tables seat at most 12 guests
func seatings(n int) int { // want seatings:`factorial of parameter 0, breaks from 21`
	f := 1
	for i := 2; i <= n; i++ {
		f *= i
	}
	return f
}

// boundedByAssume declares the bound the caller guarantees.
//
//overfact:assume n <= 20
func boundedByAssume(n int) int64 { // want boundedByAssume:`factorial of parameter 0, safe for \[2, 20\]`
	f := int64(1)
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f
}

// rangeAssume uses the two-sided form.
//
//overfact:assume 0 <= n <= 170
func rangeAssume(n int) float64 { // want rangeAssume:`factorial of parameter 0, safe for \[2, 170\]`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// statementAssume puts the bound on the line before the loop.
func statementAssume(n int) int64 {
	f := int64(1)
	//overfact:assume n < 21
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f * 2
}

// noReason has an allow without its mandatory reason, which silences
// nothing and is reported.
func noReason(n int) int64 {
	f := int64(1)
	for i := 2; i <= n; i++ { //overfact:allow // want `//overfact:allow needs a reason` `factorial of n in int64 wraps`
		f *= int64(i)
	}
	return f * 2
}

// unknownVerb misspells a directive.
func unknownVerb(n int) int64 {
	f := int64(1)
	for i := 2; i <= n; i++ { //overfact:ignore n is small // want `unknown directive //overfact:ignore` `factorial of n in int64 wraps`
		f *= int64(i)
	}
	return f * 2
}

// badAssume is not a bound the analyzer can read.
//
//overfact:assume n is small // want `malformed //overfact:assume`
func badAssume(n int) int64 { // want badAssume:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps`
		f *= int64(i)
	}
	return f
}

// wrongName names no parameter.
//
//overfact:assume m <= 5 // want `//overfact:assume names m, which is no parameter or result of wrongName`
func wrongName(n int) int64 {
	return int64(n) * 2
}
