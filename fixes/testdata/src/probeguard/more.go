package probeguard

// Lit holds a factorial in a function literal, whose guard names it
// "factorial".
//
// probe:factorial(n)
var Lit = func(n int) int { // want "probe factorial"
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

// Level is a factorial of a float parameter, whose guard prints %v.
//
// probe:factorial(x)
func Level(x float64) float64 { // want "probe factorial"
	r := 1.0
	for i := 2.0; i <= x; i++ {
		r *= i
	}
	return r
}

// Plan has a method with a factorial.
type Plan struct{ units int }

// Orders is n! in a method; the guard names the method.
//
// probe:factorial(n)
func (p Plan) Orders(n int) int { // want "probe factorial"
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
