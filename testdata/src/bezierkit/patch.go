package bezierkit

import "math"

func fact64(n int) int64 { // want fact64:`factorial of parameter 0, breaks from 21`
	if n < 2 {
		return 1
	}
	return int64(n) * fact64(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that`
}

func binom(n, k int) int64 { // want binom:`binomial of parameter 0, breaks from 21`
	return fact64(n) / (fact64(k) * fact64(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥`
}

// Smoothstep returns the generalised smoothstep of order n at x in
// [0, 1], the polynomial of degree 2n+1 with n vanishing derivatives at
// both ends.
func Smoothstep(n int, x float64) float64 { // want Smoothstep:`wrong for some n \(binom, bezierkit/patch\.go:13\)`
	if x <= 0 {
		return 0
	}
	if x >= 1 {
		return 1
	}
	s := 0.0
	for k := 0; k <= n; k++ {
		s += float64(binom(n+k, k)*binom(2*n+1, n-k)) * math.Pow(-x, float64(k)) // want `Smoothstep builds its result from binom\(n\+k, k\), which is wrong from n = 21 \(reported at`
	}
	return s * math.Pow(x, float64(n+1))
}

func factRec(n int) int { // want factRec:`factorial of parameter 0, breaks from 21`
	if n <= 1 {
		return 1
	}
	return n * factRec(n-1) // want `recursive factorial of n in int wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that`
}

// TriangleCoeff returns the trinomial n!/(i! j! k!) with n = i+j+k, the
// weight of control point (i, j, k) of a triangular Bézier patch.
func TriangleCoeff(i, j, k int) int { // want TriangleCoeff:`value Γ\(p0 \+ p1 \+ p2 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\)·Γ\(p2 \+ 1\)\), wrong once p0 \+ p1 \+ p2 ≥ 21` TriangleCoeff:`wrong for i ≥ 21 or j ≥ 21 or k ≥ 21 \(TriangleCoeff, bezierkit/patch\.go:43\)`
	return factRec(i+j+k) / (factRec(i) * factRec(j) * factRec(k)) // want `multinomial coefficient as a ratio of factorials in int: the numerator \(i \+ j \+ k\)! wraps`
}

// Patch is a triangular Bézier patch of degree N with scalar control
// values indexed by (i, j), k = N−i−j.
type Patch struct {
	N    int
	Ctrl map[[2]int]float64
}

// Eval returns the patch value at barycentric coordinates (u, v, w).
func (p Patch) Eval(u, v, w float64) float64 { // want Eval:`wrong for some p \(TriangleCoeff, bezierkit/patch\.go:43\)`
	s := 0.0
	for i := 0; i <= p.N; i++ {
		for j := 0; i+j <= p.N; j++ {
			k := p.N - i - j
			b := float64(TriangleCoeff(i, j, k)) * // want `Eval builds its result from TriangleCoeff\(i, j, k\), which is wrong from i = 21 \(reported`
				math.Pow(u, float64(i)) * math.Pow(v, float64(j)) * math.Pow(w, float64(k))
			s += b * p.Ctrl[[2]int{i, j}]
		}
	}
	return s
}

// BSplineBasis returns the Cox–de Boor basis function N_{i,p}(t) over
// the knot vector knots.
func BSplineBasis(i, p int, t float64, knots []float64) float64 {
	if p == 0 {
		if knots[i] <= t && t < knots[i+1] {
			return 1
		}
		return 0
	}
	v := 0.0
	if d := knots[i+p] - knots[i]; d != 0 {
		v += (t - knots[i]) / d * BSplineBasis(i, p-1, t, knots)
	}
	if d := knots[i+p+1] - knots[i+1]; d != 0 {
		v += (knots[i+p+1] - t) / d * BSplineBasis(i+1, p-1, t, knots)
	}
	return v
}
