// Package exacteval evaluates a Go function's own arithmetic with
// unbounded numbers, as a reference for what the function means to
// compute: integers are big.Int with Go's truncated division and
// remainder but no wrap-around, floats are big.Float at Prec bits
// (whose exponent range nothing here leaves), and the math functions
// the code calls are evaluated to that precision (bigmath.go, gamma.go).
//
// It interprets the function's SSA form (golang.org/x/tools/go/ssa):
// arithmetic, control flow, calls of functions with bodies in the
// program (methods and closures included), math functions, struct
// fields, arrays and slices of numbers, package variables (after
// running the package's init). A call that panics is recorded as a
// *PanicError, the function's true behaviour.
//
// Whatever it cannot evaluate faithfully it refuses with a *SkipError
// naming the reason, never a guess: an unsupported instruction (maps,
// channels, interfaces' dynamic calls, defer and recover), a call into
// another package without a body, a step or depth bound exceeded, a
// float comparison or float-to-integer conversion whose outcome a
// rounding of the real program could flip, and values with no real
// result (0/0, ∞−∞, a pole of Γ).
//
// The package is for tests and scripts only: the analyzer and the fixes
// never import it.
package exacteval
