// Package signcurve draws the lettering curves of a sign-making
// workshop's cutting plotter: a Bézier curve through the control
// points of a glyph outline, with the Bernstein weights C(n−1, i) of
// each control point computed once, one ratio at a time, in the
// plotter's length unit.
package signcurve

// Length is a distance on the cutting bed, in millimetres.
type Length float64

// Point is a position on the cutting bed.
type Point struct{ X, Y Length }

type node struct {
	At, Weighted Point
}

// Outline is a curve ready for the plotter.
type Outline []node

// NewOutline weights the control points: the first two weights are
// set outright, the rest by w *= (n−i)/i. The running weight is
// C(n−1, i) after trip i, which passes C(n−1, ⌊(n−1)/2⌋) half way and
// stays +Inf for the later points once that central value leaves
// float64, although those weights fit again near the end.
func NewOutline(cp ...Point) Outline {
	if len(cp) == 0 {
		return nil
	}
	c := make(Outline, len(cp))
	for i, p := range cp {
		c[i].At = p
	}
	var w Length
	for i, p := range c { // want `running product w computes C\(len\(cp\) - 1, i\) one ratio at a time in float64: it passes C\(len\(cp\) - 1, ⌊\(len\(cp\) - 1\)/2⌋\), which overflows to \+Inf for len\(cp\) ≥ 1031 .*; len\(cp\) is not bounded here`
		switch i {
		case 0:
			w = 1
		case 1:
			w = Length(len(c)) - 1
		default:
			w *= Length(len(c)-i) / Length(i)
		}
		c[i].Weighted.X = p.At.X * w
		c[i].Weighted.Y = p.At.Y * w
	}
	return c
}

// At returns the point at t along the outline, 0 ≤ t ≤ 1: the
// weighted control points times t^i, then times (1−t)^(n−i).
func (c Outline) At(t float64) Point {
	c[0].At = c[0].Weighted
	u := t
	for i, p := range c[1:] {
		c[i+1].At = Point{
			X: p.Weighted.X * Length(u), // want `p.Weighted.X holds the binomial weight C\(len\(cp\) - 1, i\) that w forms one ratio at a time in NewOutline, \+Inf for the central points once len\(cp\) ≥ 1031; multiplied here by u, a power of t that grows with the trips, the product is \+Inf, or NaN where the power underflows to 0`
			Y: p.Weighted.Y * Length(u),
		}
		u *= t
	}
	t1 := 1 - t
	tt := t1
	p := c[len(c)-1].At
	for i := len(c) - 2; i >= 0; i-- {
		p.X += c[i].At.X * Length(tt)
		p.Y += c[i].At.Y * Length(tt)
		tt *= t1
	}
	return p
}

// Enlarge scales the outline for a bigger sign: a constant factor on
// each weight, no power that underflows.
func (c Outline) Enlarge(k Length) {
	for i := range c {
		c[i].Weighted.X = c[i].Weighted.X * k
		c[i].Weighted.Y = c[i].Weighted.Y * k
	}
}

type glyphNode struct {
	At, Weighted Point
}

// Glyph is the outline of one letter.
type Glyph []glyphNode

// NewGlyph serves the outlines of one glyph, never more than 400
// control points: C(399, 199) fits float64, so every weight is right.
func NewGlyph(cp ...Point) Glyph {
	if len(cp) == 0 || len(cp) > 400 {
		return nil
	}
	c := make(Glyph, len(cp))
	for i, p := range cp {
		c[i].At = p
	}
	var w Length
	for i, p := range c {
		switch i {
		case 0:
			w = 1
		case 1:
			w = Length(len(c)) - 1
		default:
			w *= Length(len(c)-i) / Length(i)
		}
		c[i].Weighted.X = p.At.X * w
		c[i].Weighted.Y = p.At.Y * w
	}
	return c
}

// At is Outline.At for a glyph, whose weights fit.
func (g Glyph) At(t float64) Point {
	g[0].At = g[0].Weighted
	u := t
	for i, p := range g[1:] {
		g[i+1].At = Point{X: p.Weighted.X * Length(u), Y: p.Weighted.Y * Length(u)}
		u *= t
	}
	t1 := 1 - t
	tt := t1
	p := g[len(g)-1].At
	for i := len(g) - 2; i >= 0; i-- {
		p.X += g[i].At.X * Length(tt)
		p.Y += g[i].At.Y * Length(tt)
		tt *= t1
	}
	return p
}
