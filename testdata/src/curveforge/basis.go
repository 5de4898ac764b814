package curveforge

import "math"

// binom is C(n, k) by the multiplicative formula.
func binom(n, k int) int { // want binom:`binomial of parameter 0, breaks from 62`
	if k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	r := 1
	for i := 0; i < k; i++ { // want `multiplicative binomial loop in int: the product r \* \(n`
		r = r * (n - i) / (i + 1)
	}
	return r
}

// Integer is the set of integer types Choose accepts.
type Integer interface {
	~int | ~int32 | ~int64 | ~uint32 | ~uint64
}

// Choose is C(n, k) in the caller's integer type.
func Choose[T Integer](n, k T) T { // want Choose:`binomial of parameter 0, breaks from 30`
	if k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	var r T = 1
	for i := T(1); i <= k; i++ { // want `multiplicative binomial loop in int32 \(the narrowest`
		r = r * (n - k + i) / i
	}
	return r
}

// Bernstein is the Bernstein basis polynomial b_{i,n}(t).
func Bernstein(n, i int, t float64) float64 { // want Bernstein:`wrong for n ≥ 62`
	return float64(binom(n, i)) * math.Pow(t, float64(i)) * math.Pow(1-t, float64(n-i)) // want `binomial probability C\(n, i\)·t\^i·\(1−t\)\^\(n−i\) in int:`
}

// BernsteinLog forms b_{i,n}(t) in log space, for 0 < t < 1.
func BernsteinLog(n, i int, t float64) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(i + 1))
	c, _ := math.Lgamma(float64(n - i + 1))
	return math.Exp(a - b - c + float64(i)*math.Log(t) + float64(n-i)*math.Log1p(-t)) // want `math\.Exp of log-gamma values computes a product of Γ`
}

// BasisFunc returns the degree-n basis as a closure over its binomial
// weights, computed once.
func BasisFunc(n int) func(i int, t float64) float64 {
	w := make([]float64, n+1)
	c := 1.0
	for i := 0; i <= n; i++ { // want `multiplicative binomial loop steps through C\(n, k\) for every k ≤ n in float64: the product c\*\(float64\(n - i\)\) overflows to \+Inf before the division for n ≥ 1021 at k = n/2`
		w[i] = c
		c = c * float64(n-i) / float64(i+1)
	}
	return func(i int, t float64) float64 {
		return w[i] * math.Pow(t, float64(i)) * math.Pow(1-t, float64(n-i))
	}
}

// BernsteinRecur evaluates b_{i,n}(t) by the de Casteljau triangle of
// the basis: b_{j,k} = (1−t)·b_{j,k−1} + t·b_{j−1,k−1}.
func BernsteinRecur(n, i int, t float64) float64 {
	if i < 0 || i > n {
		return 0
	}
	b := make([]float64, n+1)
	b[0] = 1
	for k := 1; k <= n; k++ {
		for j := k; j >= 1; j-- {
			b[j] = (1-t)*b[j] + t*b[j-1]
		}
		b[0] *= 1 - t
	}
	return b[i]
}
