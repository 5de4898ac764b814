// Package bezierkit evaluates Bézier curves and triangular patches,
// elevates their degree, and holds the small quadrature and smoothing
// helpers a curve editor needs.
package bezierkit

import "math"

// Point is a point in the plane.
type Point struct{ X, Y float64 }

func factorial(n float64) float64 { // want factorial:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for x := 2.0; x <= n; x++ {
		f *= x
	}
	return f
}

// Bernstein returns the Bernstein basis polynomial B_{i,n}(t).
func Bernstein(i, n int, t float64) float64 { // want Bernstein:`wrong for n ≥ 171 \(Bernstein, bezierkit/bernstein\.go:22\)` Bernstein:`value Γ\(p1 \+ 1\)·\(p2\)\^\(p0\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ p1 \+ 1\)·\(-p2 \+ 1\)\^\(p0 - p1\)\), wrong once p1`
	c := factorial(float64(n)) / (factorial(float64(i)) * factorial(float64(n-i))) // want `Bernstein computes C\(n, i\) in float64, which fits where factorial\(float64\(n\)\) already`
	return c * math.Pow(t, float64(i)) * math.Pow(1-t, float64(n-i))               // want `ratio of factorials in float64: the numerator \(float64\(n\)\)! overflows to \+Inf for`
}

// Curve is a Bézier curve given by its control points.
type Curve struct {
	Ctrl []Point
}

// Eval returns the point of the curve at parameter t in [0, 1].
func (c Curve) Eval(t float64) Point {
	n := len(c.Ctrl) - 1
	var p Point
	for i, q := range c.Ctrl {
		b := Bernstein(i, n, t) // want `Eval builds its result from Bernstein\(i, n, t\), which is wrong from n = 171 \(reported at`
		p.X += b * q.X
		p.Y += b * q.Y
	}
	return p
}

// EvalDeCasteljau returns the same point by repeated linear interpolation.
func (c Curve) EvalDeCasteljau(t float64) Point {
	pts := append([]Point(nil), c.Ctrl...)
	for r := len(pts) - 1; r > 0; r-- {
		for i := 0; i < r; i++ {
			pts[i].X = (1-t)*pts[i].X + t*pts[i+1].X
			pts[i].Y = (1-t)*pts[i].Y + t*pts[i+1].Y
		}
	}
	return pts[0]
}

// Elevate returns the control points of the same curve one degree higher.
func (c Curve) Elevate() Curve {
	n := len(c.Ctrl) - 1
	out := make([]Point, n+2)
	out[0], out[n+1] = c.Ctrl[0], c.Ctrl[n]
	for i := 1; i <= n; i++ {
		a := float64(i) / float64(n+1)
		out[i] = Point{
			a*c.Ctrl[i-1].X + (1-a)*c.Ctrl[i].X,
			a*c.Ctrl[i-1].Y + (1-a)*c.Ctrl[i].Y,
		}
	}
	return Curve{out}
}

// Derivative returns the hodograph, the curve of the derivative.
func (c Curve) Derivative() Curve {
	n := len(c.Ctrl) - 1
	out := make([]Point, n)
	for i := range out {
		out[i] = Point{
			float64(n) * (c.Ctrl[i+1].X - c.Ctrl[i].X),
			float64(n) * (c.Ctrl[i+1].Y - c.Ctrl[i].Y),
		}
	}
	return Curve{out}
}
