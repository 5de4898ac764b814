package gameodds

// Number is any counter type the odds tables work in.
type Number interface {
	~int | ~int64 | ~float64
}

// Product multiplies every value from lo to hi.
func Product[T Number](lo, hi T) T {
	var p T = 1
	for v := lo; v <= hi; v++ { // want `product of the factors from lo up to hi in int \(the narrowest type in`
		p *= v
	}
	return p
}

// Permutations is the number of ordered draws of k cards from n.
func Permutations(n, k int) int {
	return Product(n-k+1, n)
}

func factorial(n int) float64 { // want factorial:`factorial of parameter 0`
	out := 1.0
	for n > 1 {
		out *= float64(n)
		n--
	}
	return out
}

func binom(n, k uint64) uint64 { // want binom:`binomial of parameter 0`
	r := uint64(1)
	for i := uint64(0); i < k; i++ { // want `multiplicative binomial loop in uint64: the product r \* \(n - i\) wraps`
		r = r * (n - i) / (i + 1)
	}
	return r
}
