package valuemodel

import (
	"fmt"
	"go/ast"
	"math"
	"math/big"
	"testing"
)

// A switch on the counter whose constant cases are the first trips and
// whose default runs on the rest, as Bernstein weights are set, also
// written as a tagless switch comparing the counter: on trip t ≥ 2 the
// weight is w(1)·∏_{i=2}^{t} (N−i)/i = C(N−1, t), checked against
// math/big's binomial for N = 40 (the identity is common practice: the
// multiplicative formula of C(n, k)).
func TestPeelSwitch(t *testing.T) {
	const body = `func f(c []float64) float64 {
	var w float64
	for i := range c {
		switch %s {
		case %s:
			w = 1
		case %s:
			w = float64(len(c)) - 1
		default:
			w *= float64(len(c)-i) / float64(i)
		}
		c[i] *= w
	}
	return w
}`
	for name, cases := range map[string][3]string{
		"tagged":  {"i", "0", "1"},
		"tagless": {"", "i == 0", "1 == i"},
	} {
		t.Run(name, func(t *testing.T) {
			info, fd := load(t, fmt.Sprintf(body, cases[0], cases[1], cases[2]), "f")
			res := Evaluate(info, fd, Options{})
			if len(res.Loops) != 1 || len(res.Loops[0].Accs) != 1 {
				t.Fatalf("want one loop with one accumulator, got %d loops", len(res.Loops))
			}
			l := res.Loops[0]
			a := l.Accs[0]
			if len(a.Ops) != 1 || a.Guarded || !a.Ops[0].From.Equal(Int(2)) {
				t.Fatalf("ops %+v (guarded %v), want one op from trip 2 on", a.Ops, a.Guarded)
			}
			if f := Recognise(a.Ops[0].After); f.Kind != Binomial {
				t.Fatalf("after the op: %v, want a binomial", a.Ops[0].After)
			}
			syms := map[string]Sym{}
			for s := range res.Exprs {
				syms[s.Name()] = s
			}
			n := int64(40)
			for trip := int64(2); trip < n; trip++ {
				val := map[Sym]float64{syms["len(c)"]: float64(n), l.Iter: float64(trip)}
				want, _ := new(big.Float).SetInt(new(big.Int).Binomial(n-1, trip)).Float64()
				closeLog(t, "weight", a.Ops[0].After, val, math.Log(want))
			}
		})
	}
}

// Constant cases that are not the first trips, a case that breaks, or
// a start value that reads what the loop changes are beyond the
// summary: the weight is then no accumulator.
func TestPeelSwitchRefused(t *testing.T) {
	for name, src := range map[string]string{
		"gap": `func f(c []float64, n float64) float64 {
	var w float64
	for i := range c {
		switch i {
		case 0:
			w = 1
		case 2:
			w = n
		default:
			w *= n / float64(i)
		}
	}
	return w
}`,
		"break": `func f(c []float64, n float64) float64 {
	var w float64
	for i := range c {
		switch i {
		case 0:
			w = 1
		default:
			if n > 3 {
				break
			}
			w *= n / float64(i)
		}
	}
	return w
}`,
		"start reads the loop": `func f(c []float64, n float64) float64 {
	var w, s float64
	for i := range c {
		s += c[i]
		switch i {
		case 0:
			w = s
		default:
			w *= n / float64(i)
		}
	}
	return w
}`,
	} {
		t.Run(name, func(t *testing.T) {
			info, fd := load(t, src, "f")
			res := Evaluate(info, fd, Options{})
			for _, l := range res.Loops {
				for _, a := range l.Accs {
					if a.Obj.Name() == "w" {
						t.Errorf("w summarised as an accumulator: %+v", a)
					}
				}
			}
		})
	}
}

// A range over x[1:] of a slice that keeps its length runs len(x) − 1
// trips, and the elements of a composite literal get values: u is
// t^(i+1) inside Pt{X: u}.
func TestRangeTailAndLiteral(t *testing.T) {
	info, fd := load(t, `type Pt struct{ X float64 }
func f(c []Pt, t float64) float64 {
	u := t
	for i := range c[1:] {
		c[i+1] = Pt{X: u}
		u *= t
	}
	return u
}`, "f")
	res := Evaluate(info, fd, Options{})
	if len(res.Loops) != 1 {
		t.Fatalf("want one loop, got %d", len(res.Loops))
	}
	if got := res.Loops[0].Count.String(); got != "len(c) - 1" {
		t.Errorf("trips %s, want len(c) - 1", got)
	}
	if got := returned(res, fd).String(); got != "(t)^(len(c))" {
		t.Errorf("returned %s, want (t)^(len(c))", got)
	}
	found := false
	for x, v := range res.Values {
		if id, ok := x.(*ast.Ident); ok && id.Name == "u" && v != nil && len(v.Pows) == 1 && !v.Pows[0].Exp.IsConst() {
			found = true
		}
	}
	if !found {
		t.Errorf("no value for u inside the literal")
	}
}
