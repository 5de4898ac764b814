package curveforge

import (
	"errors"
	"math"
)

// Vec is a point of the plane.
type Vec struct{ X, Y float64 }

// Lerp moves from a to b by the fraction t.
func Lerp[T ~float32 | ~float64](a, b, t T) T {
	return a + (b-a)*t
}

// Curve is a Bézier curve given by its control points.
type Curve struct {
	Ctrl []Vec
}

// Point evaluates the curve at t by de Casteljau's algorithm.
func (c Curve) Point(t float64) Vec {
	p := append([]Vec(nil), c.Ctrl...)
	for k := len(p) - 1; k > 0; k-- {
		for j := 0; j < k; j++ {
			p[j] = Vec{Lerp(p[j].X, p[j+1].X, t), Lerp(p[j].Y, p[j+1].Y, t)}
		}
	}
	if len(p) == 0 {
		return Vec{}
	}
	return p[0]
}

// PointBernstein evaluates the curve at t as Σ b_{i,n}(t)·P_i.
func (c Curve) PointBernstein(t float64) Vec {
	n := len(c.Ctrl) - 1
	var out Vec
	for i, p := range c.Ctrl {
		b := Bernstein(n, i, t) // want `PointBernstein builds its result from Bernstein\(n, i, t\), which is wrong from n = 62`
		out.X += b * p.X
		out.Y += b * p.Y
	}
	return out
}

const tableSize = 68

// pascal holds C(n, k) for n < tableSize; C(67, 33) is the largest and
// fits in uint64.
var pascal [tableSize][tableSize]uint64

func init() {
	for n := 0; n < tableSize; n++ {
		pascal[n][0] = 1
		for k := 1; k <= n; k++ {
			pascal[n][k] = pascal[n-1][k-1] + pascal[n-1][k]
		}
	}
}

// ChooseTable returns C(n, k) from the table, false when n is outside it.
func ChooseTable(n, k int) (uint64, bool) {
	if n < 0 || n >= tableSize || k < 0 || k > n {
		return 0, false
	}
	return pascal[n][k], true
}

// ErrDegree is returned when an elevated degree leaves the table.
var ErrDegree = errors.New("curveforge: degree too high")

// Elevate raises the degree of the curve by r, keeping its shape.
func (c *Curve) Elevate(r int) error {
	n := len(c.Ctrl) - 1
	if n < 0 || r < 0 || n+r >= tableSize {
		return ErrDegree
	}
	out := make([]Vec, n+r+1)
	for i := range out {
		den, _ := ChooseTable(n+r, i)
		for j := 0; j <= n; j++ {
			if i-j < 0 || i-j > r {
				continue
			}
			a, _ := ChooseTable(n, j)
			b, _ := ChooseTable(r, i-j)
			w := float64(a) * float64(b) / float64(den)
			out[i].X += w * c.Ctrl[j].X
			out[i].Y += w * c.Ctrl[j].Y
		}
	}
	c.Ctrl = out
	return nil
}

// Length approximates the arc length by n chords.
func (c Curve) Length(n int) float64 {
	s := 0.0
	prev := c.Point(0)
	for i := 1; i <= n; i++ {
		p := c.Point(float64(i) / float64(n))
		s += math.Hypot(p.X-prev.X, p.Y-prev.Y)
		prev = p
	}
	return s
}
