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

// NewGlyph serves the outlines of one glyph, never more than 400
// control points: C(399, 199) fits float64, so every weight is right.
func NewGlyph(cp ...Point) Outline {
	if len(cp) == 0 || len(cp) > 400 {
		return nil
	}
	c := make(Outline, len(cp))
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
