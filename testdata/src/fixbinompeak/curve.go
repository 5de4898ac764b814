// Package fixbinompeak is a glyph rasteriser's curve toolkit: Bernstein
// weights for outline curves of any degree and the counting helpers of
// its hinting tables, written with one ratio per step of a running
// binomial. Its .golden file shows the loop whose value the helper
// computes replaced by one call, the running weights whose steps the
// code reads carried as products in log space (each step the same
// float64 value wherever it stayed in range, the binomial it stands for
// again past the peak), and the others left as they are.
package fixbinompeak

import "math"

// Length is a distance on the glyph's em square.
type Length float64

// Ways counts the ways to pick k of n outline points, one ratio per
// step: the running value is C(n, c) after step c.
func Ways(n, k int) float64 { // want Ways:"binomial of parameter 0, breaks from 1030"
	if n < 0 || k < 0 || k > n {
		return 0
	}
	v := 1.0
	for c := 1; c <= k; c++ { // want `multiplicative binomial loop computes C\(n, k\) in float64 one ratio at a time: the running v is C\(n, c\) after each step and passes C\(n, ⌊n/2⌋\) when k > n/2, which overflows to \+Inf for n ≥ 1030`
		v *= float64(n+1-c) / float64(c)
	}
	return v
}

// Combin is the sheet function COMBIN over float cells, truncated to
// whole numbers first.
func Combin(number, chosen float64) float64 { // want Combin:"binomial of parameter 0, breaks from 1030"
	if chosen > number || chosen < 0 {
		return 0
	}
	val := 1.0
	for c := 1.0; c <= chosen; c++ { // want `multiplicative binomial loop computes C\(number, chosen\) in float64 one ratio at a time`
		val *= (number + 1 - c) / c
	}
	return val
}

// Weights returns the Bernstein weights C(n−1, i) of a curve with n
// control points, as a table the renderer multiplies the points by.
func Weights(n int) []Length {
	if n < 2 {
		return nil
	}
	w := make([]Length, n)
	w[0] = 1
	cur := Length(1)
	for i := 1; i < n; i++ { // want `running product cur computes C\(n - 1, i\) one ratio at a time in float64 \(as Length\)|running product cur computes C\(n - 1, i\) one ratio at a time in`
		cur *= Length(n-i) / Length(i)
		w[i] = cur
	}
	return w
}

// Picks steps the pick count down from k, one ratio per step, over a
// range loop.
func Picks(n, k int) float64 { // want Picks:"binomial of parameter 0, breaks from 1030"
	if n < 0 || k < 0 || k > n {
		return 0
	}
	v := 1.0
	for i := range k { // want `multiplicative binomial loop computes C\(n, k\) in float64 one ratio at a time`
		v *= float64(n-i) / float64(i+1)
	}
	return v
}

// HalfWays first folds k onto the smaller half, so the running value
// only climbs: it overflows only where C(n, k) does.
func HalfWays(n, k int) float64 { // want HalfWays:"binomial of parameter 0, breaks from 1030"
	if n < 0 || k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	v := 1.0
	for c := 1; c <= k; c++ {
		v *= float64(n+1-c) / float64(c)
	}
	return v
}

// SmallWays is bounded: C(1000, 500) fits float64.
func SmallWays(n, k int) float64 { // want SmallWays:"binomial of parameter 0, safe for \\[0, 1000\\]"
	if n < 0 || n > 1000 || k < 0 || k > n {
		return 0
	}
	v := 1.0
	for c := 1; c <= k; c++ {
		v *= float64(n+1-c) / float64(c)
	}
	return v
}

// Sextics takes at most six points of any outline: the running value
// climbs for every n past 12 and never reaches a peak that overflows.
func Sextics(n int) float64 {
	v := 1.0
	for c := 1; c <= 6; c++ {
		v *= float64(n+1-c) / float64(c)
	}
	return v
}

// Ramp multiplies the ratio in the other way round, as a product of
// the step's own ratio: the same running binomial, with a float index.
func Ramp(n float64) float64 { // want Ramp:`value Γ\(p0 \+ 1\)/Γ\(1/2\*p0 \+ 1\)\^2, a running product`
	r := 1.0
	for i := 1.0; i <= n/2; i++ {
		r *= (n - i + 1) / i
	}
	return r
}

// Cell is one cell of the hinting sheet.
type Cell struct{ Number float64 }

// SheetCombin is the sheet function COMBIN as the sheet evaluates it:
// the cells are read, truncated to whole numbers and checked, each
// step reassigning the locals.
func SheetCombin(n, c Cell) float64 {
	number, chosen, val := 0.0, 0.0, 1.0
	number = n.Number
	chosen = c.Number
	number, chosen = math.Trunc(number), math.Trunc(chosen)
	if chosen > number {
		return 0
	}
	if chosen == number || chosen == 0 {
		return 1
	}
	for c := float64(1); c <= chosen; c++ { // want `multiplicative binomial loop computes C\(number, chosen\) in float64 one ratio at a time`
		val *= (number + 1 - c) / c
	}
	return math.Ceil(val)
}

// Point is one control point of an outline.
type Point struct{ X, Y Length }

// Scale multiplies each control point of a curve after the first by
// its Bernstein weight C(n−1, i), stepping the weight one ratio at a
// time over the points.
func Scale(pts []Point) {
	w := Length(1)
	for i := 1; i < len(pts); i++ { // want `running product w computes C\(len\(pts\) - 1, i\) one ratio at a time in float64`
		w *= Length(len(pts)-i) / Length(i)
		pts[i].X *= w
		pts[i].Y *= w
	}
}

// Spread fills the weights C(n, i+1) of n+1 points over a range of
// the first n.
func Spread(pts []Point) []Length {
	out := make([]Length, len(pts)+1)
	out[0] = 1
	w := Length(1)
	for i := range pts { // want `running product w computes C\(len\(pts\), i \+ 1\) one ratio at a time`
		w *= Length(len(pts)-i) / Length(i+1)
		out[i+1] = w
	}
	return out
}

// Tint scales each point by its Bernstein weight, the running weight
// declared without a value and its first two steps given by a switch.
func Tint(pts []Point) []Point {
	out := make([]Point, len(pts))
	var w Length
	for i, p := range pts { // want `running product w computes C\(len\(pts\) - 1, i\) one ratio at a time in float64`
		switch i {
		case 0:
			w = 1
		case 1:
			w = Length(len(pts)) - 1
		default:
			w *= Length(len(pts)-i) / Length(i)
		}
		out[i] = Point{X: p.X * w, Y: p.Y * w}
	}
	return out
}
