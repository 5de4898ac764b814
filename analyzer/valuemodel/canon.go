package valuemodel

import "fmt"

// Kind names a canonical form of factorial arithmetic.
type Kind int

const (
	Unknown     Kind = iota
	Fact             // n!
	Falling          // n!/(n−k)!
	Rising           // x(x+1)…(x+n−1) = Γ(x+n)/Γ(x)
	Binomial         // C(n, k)
	InvBinomial      // 1/C(n, k)
	Multinomial      // n!/(k₁!…k_m!), Σkᵢ = n
	Catalan          // C(2n, n)/(n+1)
	PowOverFact      // x^k/k!
	Poisson          // x^k·e^(−x)/k!
	BinomialPMF      // C(n, k)·p^k·(1−p)^(n−k)
	Beta             // Γ(a)Γ(b)/Γ(a+b)
	InvBeta          // Γ(a+b)/(Γ(a)Γ(b))
	GammaRatio       // any other ratio or product of Γ values
)

// Form is a recognised term: its kind and arguments, in the order the
// kind's String names them.
type Form struct {
	Kind Kind
	Args []Affine
}

// String names the form as a message would: "C(n, k)", "n!".
func (f Form) String() string {
	a := func(i int) string { return paren(f.Args[i]) }
	switch f.Kind {
	case Fact:
		return a(0) + "!"
	case Falling:
		return fmt.Sprintf("%s!/%s!", a(0), paren(f.Args[0].Sub(f.Args[1])))
	case Rising:
		return fmt.Sprintf("rising(%s, %s)", f.Args[0], f.Args[1])
	case Binomial:
		return fmt.Sprintf("C(%s, %s)", f.Args[0], f.Args[1])
	case InvBinomial:
		return fmt.Sprintf("1/C(%s, %s)", f.Args[0], f.Args[1])
	case Multinomial:
		s := "multinomial(" + f.Args[0].String() + ";"
		for i, x := range f.Args[1:] {
			if i > 0 {
				s += ","
			}
			s += " " + x.String()
		}
		return s + ")"
	case Catalan:
		return fmt.Sprintf("Catalan(%s)", f.Args[0])
	case PowOverFact:
		return fmt.Sprintf("%s^%s/%s!", a(0), a(1), a(1))
	case Poisson:
		return fmt.Sprintf("%s^%s·e^(−%s)/%s!", a(0), a(1), f.Args[0], a(1))
	case BinomialPMF:
		return fmt.Sprintf("C(%s, %s)·%s^%s·(1−%s)^(%s)", f.Args[0], f.Args[1], a(2), a(1), f.Args[2], f.Args[0].Sub(f.Args[1]))
	case Beta:
		return fmt.Sprintf("B(%s, %s)", f.Args[0], f.Args[1])
	case InvBeta:
		return fmt.Sprintf("1/B(%s, %s)", f.Args[0], f.Args[1])
	case GammaRatio:
		return "a ratio of Γ values"
	}
	return moreString(f)
}

func paren(a Affine) string {
	if len(a.Terms) == 1 && a.c().Sign() == 0 && isOne(a.Terms[0].K) || a.IsConst() {
		return a.String()
	}
	return "(" + a.String() + ")"
}

// Recognise names the canonical form of t, whatever the order its
// factors were written in; Kind Unknown when it is none of them.
func Recognise(t *Term) Form {
	if t == nil || !isOne(t.Coef) || t.SqrtPi != 0 {
		return Form{}
	}
	up, down := gammaLists(t)
	noExp := t.Exp.IsConst() && t.Exp.c().Sign() == 0
	if len(t.Pows) == 0 && noExp {
		return gammaForm(up, down)
	}
	// x^k/k!, x^k·e^(−x)/k!, C(n,k)·p^k·(1−p)^(n−k)
	switch {
	case len(up) == 0 && len(down) == 1 && len(t.Pows) == 1:
		p, k := t.Pows[0], down[0].Shift(-1)
		if !p.Exp.Equal(k) {
			return Form{}
		}
		if noExp {
			return Form{PowOverFact, []Affine{p.Base, k}}
		}
		if t.Exp.Equal(p.Base.Scale(shared(-1))) {
			return Form{Poisson, []Affine{p.Base, k}}
		}
	case noExp && len(t.Pows) == 2:
		b := gammaForm(up, down)
		if b.Kind != Binomial {
			return Form{}
		}
		n, k := b.Args[0], b.Args[1]
		for _, pq := range [][2]Power{{t.Pows[0], t.Pows[1]}, {t.Pows[1], t.Pows[0]}} {
			p, q := pq[0], pq[1]
			// (1−p) is kept monic as (p − 1) with a sign the
			// coefficient absorbs only for integer exponents, so
			// accept q = 1 − p as written.
			if q.Base.Equal(Int(1).Sub(p.Base)) && p.Exp.Equal(k) && q.Exp.Equal(n.Sub(k)) {
				return Form{BinomialPMF, []Affine{n, k, p.Base}}
			}
		}
	}
	return Form{}
}

func abs(x int) int {
	if x < 0 {
		return -x
	}
	return x
}

// gammaForm names a ratio of Γ values, each argument listed once per
// power.
func gammaForm(up, down []Affine) Form {
	sum := func(xs []Affine) Affine {
		s := Int(0)
		for _, x := range xs {
			s = s.Add(x)
		}
		return s
	}
	switch {
	case len(up) == 1 && len(down) == 0:
		return Form{Fact, []Affine{up[0].Shift(-1)}}
	case len(up) == 1 && len(down) == 1:
		if x := down[0]; len(x.Terms) == 1 && isOne(x.Terms[0].K) && x.c().Sign() == 0 && !up[0].Sub(x).IsConst() {
			// Γ(x+n)/Γ(x) over a bare variable x: the rising factorial.
			return Form{Rising, []Affine{x, up[0].Sub(x)}}
		}
		n := up[0].Shift(-1)
		k := up[0].Sub(down[0])
		if k.IsConst() && k.c().Sign() == 0 {
			return Form{}
		}
		return Form{Falling, []Affine{n, k}}
	case len(up) == 1 && len(down) == 2:
		a, b, c := up[0], down[0], down[1]
		if b.Add(c).Equal(a.Shift(1)) {
			k := b.Shift(-1)
			if len(k.Terms) > len(c.Terms) || (len(k.Terms) == len(c.Terms) && k.c().Cmp(c.Shift(-1).c()) > 0) {
				k = c.Shift(-1) // name the simpler of k and n−k
			}
			return Form{Binomial, []Affine{a.Shift(-1), k}}
		}
		// Catalan: Γ(2n+1)/(Γ(n+2)Γ(n+1))
		for _, bc := range [][2]Affine{{b, c}, {c, b}} {
			n := bc[1].Shift(-1)
			if bc[0].Equal(n.Shift(2)) && a.Equal(n.Scale(shared(2)).Shift(1)) {
				return Form{Catalan, []Affine{n}}
			}
		}
	case len(up) == 2 && len(down) == 1:
		a, b, c := down[0], up[0], up[1]
		if b.Add(c).Equal(a.Shift(1)) {
			return Form{InvBinomial, []Affine{a.Shift(-1), b.Shift(-1)}}
		}
		if b.Add(c).Equal(a) {
			return Form{Beta, []Affine{b, c}}
		}
	case len(up) == 1 && len(down) >= 3:
		if sum(down).Equal(up[0].Shift(int64(len(down) - 1))) {
			args := []Affine{up[0].Shift(-1)}
			for _, d := range down {
				args = append(args, d.Shift(-1))
			}
			return Form{Multinomial, args}
		}
	}
	if len(up) == 0 && len(down) == 0 {
		return Form{}
	}
	if len(down) == 1 && len(up) == 2 && sum(up).Equal(down[0]) {
		return Form{Beta, []Affine{up[0], up[1]}}
	}
	if len(up) == 1 && len(down) == 2 && sum(down).Equal(up[0]) {
		return Form{InvBeta, []Affine{down[0], down[1]}}
	}
	return Form{GammaRatio, nil}
}
