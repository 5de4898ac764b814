package bezierkit

import "math"

func gchoose(n, k int) float64 {
	return math.Gamma(float64(n+1)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(n-k+1))) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(n \+ 1\)\) is \+Inf for n ≥ 171`
}

// ElevateBy returns the control points of the curve raised by r degrees
// at once.
func (c Curve) ElevateBy(r int) Curve {
	n := len(c.Ctrl) - 1
	out := make([]Point, n+r+1)
	for i := range out {
		lo, hi := max(0, i-r), min(n, i)
		for j := lo; j <= hi; j++ {
			w := gchoose(n, j) * gchoose(r, i-j) / gchoose(n+r, i) // want `divides by C\(r \+ n, t\) formed on its own in float64: gchoose\(n\+r, i\) is \+Inf or NaN for r \+ n ≥ 171 \(its math\.Gamma\(float64\(n \+ 1\)\) breaks first\)`
			out[i].X += w * c.Ctrl[j].X
			out[i].Y += w * c.Ctrl[j].Y
		}
	}
	return Curve{out}
}

func logChoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	d, _ := math.Lgamma(float64(n - k + 1))
	return a - b - d
}

// ElevateByLog is ElevateBy with the weights taken from log-binomials.
func (c Curve) ElevateByLog(r int) Curve {
	n := len(c.Ctrl) - 1
	out := make([]Point, n+r+1)
	for i := range out {
		lo, hi := max(0, i-r), min(n, i)
		for j := lo; j <= hi; j++ {
			w := math.Exp(logChoose(n, j) + logChoose(r, i-j) - logChoose(n+r, i))
			out[i].X += w * c.Ctrl[j].X
			out[i].Y += w * c.Ctrl[j].Y
		}
	}
	return Curve{out}
}

// laguerreScale returns Γ(n+α+1)/n!, the factor of the generalised
// Gauss–Laguerre weights.
func laguerreScale(n int, alpha float64) float64 {
	return math.Gamma(float64(n)+alpha+1) / math.Gamma(float64(n)+1) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(n\) \+ alpha \+ 1\) is \+Inf for`
}

// LaguerreWeight returns the Gauss–Laguerre weight of the node x for an
// n-point rule, given L_{n+1}^{(α)}(x).
func LaguerreWeight(n int, alpha, x, lnext float64) float64 { // want LaguerreWeight:`value Γ\(p0 \+ p1 \+ 1\)·\(p2\)/\(Γ\(p0 \+ 2\)·\(p0 \+ 1\)·\(p3\)\^\(2\)\), wrong once p0 \+ p1 \+ 1 ≥` LaguerreWeight:`wrong for n ≥ 170\.624377 \(LaguerreWeight, bezierkit/elevate\.go:56\)`
	return laguerreScale(n, alpha) * x / (float64((n+1)*(n+1)) * lnext * lnext) // want `LaguerreWeight computes Γ\(n \+ alpha \+ 1\)·\(x\)/\(Γ\(n \+ 2\)·\(n \+ 1\)·\(lnext\)\^\(2\)\) in float64,`
}

// Simpson integrates f over [a, b] with the composite Simpson rule on n
// (even) panels.
func Simpson(f func(float64) float64, a, b float64, n int) float64 {
	h := (b - a) / float64(n)
	s := f(a) + f(b)
	for i := 1; i < n; i++ {
		w := 4.0
		if i%2 == 0 {
			w = 2
		}
		s += w * f(a+float64(i)*h)
	}
	return s * h / 3
}
