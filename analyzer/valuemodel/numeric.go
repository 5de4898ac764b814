package valuemodel

import "math"

// LogAbs returns ln |t| at the variables' values val, with Γ through
// math.Lgamma, so that a caller can compare a term with a direct
// computation; ok is false when a variable has no value or a Γ
// argument is a pole.
func (t *Term) LogAbs(val map[Sym]float64) (float64, bool) {
	if t == nil {
		return 0, false
	}
	at := func(a Affine) (float64, bool) {
		v, _ := a.c().Float64()
		for _, l := range a.Terms {
			x, ok := val[l.Sym]
			if !ok {
				return 0, false
			}
			k, _ := l.K.Float64()
			v += k * x
		}
		return v, true
	}
	c, _ := t.Coef.Float64()
	if c == 0 {
		return math.Inf(-1), true
	}
	out := math.Log(math.Abs(c)) + float64(t.SqrtPi)*0.5*math.Log(math.Pi)
	for _, g := range t.Gamma {
		x, ok := at(g.Arg)
		if !ok || x <= 0 && x == math.Trunc(x) {
			return 0, false
		}
		lg, _ := math.Lgamma(x)
		out += float64(g.Pow) * lg
	}
	for _, p := range t.Pows {
		b, ok1 := at(p.Base)
		e, ok2 := at(p.Exp)
		if !ok1 || !ok2 {
			return 0, false
		}
		out += e * math.Log(math.Abs(b))
	}
	x, ok := at(t.Exp)
	if !ok {
		return 0, false
	}
	return out + x, true
}
