// Package fixkept prices the firing plan of a pottery kiln: the chance
// that k of n pots crack, each with probability p, and the chance that
// a sample of n pots from a kiln load shows k glazing flaws. Its .golden
// file takes each probability from the helper module, and where the
// operands leave the helper's domain (a count past the load, p outside
// [0, 1]) keeps the expression as written with each binomial count from
// the float helper of its function's form, which the count functions'
// own fixes no longer compute where the count leaves int.
package fixkept

import "math"

// ways counts the choices of k pots out of n with the multiplicative
// formula.
func ways(n, k int) int { // want ways:`binomial of parameter 0, breaks from 62`
	w := 1
	for i := 1; i <= k; i++ { // want `multiplicative binomial loop in int`
		w = w * (n - k + i) / i
	}
	return w
}

func fact(n int64) int64 { // want fact:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		f *= i
	}
	return f
}

// pairs counts the same choices as a ratio of factorials.
func pairs(n, k int64) int64 { // want pairs:`binomial of parameter 0, breaks from 21`
	return fact(n) / (fact(k) * fact(n-k)) // want `binomial coefficient as a ratio of factorials in int64`
}

// Cracked is the chance that k of n pots crack, each with probability p.
func Cracked(n, k int, p float64) float64 { // want Cracked:`wrong for n ≥ 62`
	return float64(ways(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in int: ways`
}

// Flawed is the chance that a sample of n pots from a load of total
// holding bad flawed ones shows k of them.
func Flawed(total, bad, n, k int) float64 { // want Flawed:`wrong for total ≥ 62`
	return float64(ways(bad, k)) * float64(ways(total-bad, n-k)) / float64(ways(total, n)) // want `hypergeometric probability from three binomial coefficients in int`
}

// Glazed is Cracked over the factorial count.
func Glazed(n, k int64, p float64) float64 { // want Glazed:`wrong for n ≥ 21`
	return float64(pairs(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in int64: pairs`
}

// Passed is the chance that at most c of n pots crack: Cracked's terms
// summed. For p outside [0, 1] the terms alternate in sign, and where
// they leave float64 their sum would be +Inf − Inf = NaN: the fixed loop
// refuses such a term, naming its operands.
func Passed(n, c int, p float64) float64 { // want Passed:`wrong for n ≥ 62`
	sum := 0.0
	for k := 0; k <= c; k++ {
		sum += float64(ways(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in int: ways`
	}
	return sum
}
