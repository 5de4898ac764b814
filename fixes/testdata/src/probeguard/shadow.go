package probeguard

// Spin has a parameter named fmt, so the guard imports fmt as fmt2.
//
// probe:factorial(n)
func Spin(n int, fmt string) int { // want "probe factorial"
	r := len(fmt)
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
