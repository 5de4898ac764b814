package valuemodel

import "fmt"

// Forms that are products of the ones Recognise names: probabilities a
// caller builds from a binomial-valued helper. Their kinds are numbered
// apart from those of canon.go so that the two lists grow independently.
const (
	// Hypergeometric is C(K, k)·C(N−K, n−k)/C(N, n); Args k, N, K, n.
	Hypergeometric Kind = 100 + iota
	// NegBinomialPMF is C(f+s−1, f)·p^s·(1−p)^f; Args f, s, p.
	NegBinomialPMF
)

// moreString names the forms of this file.
func moreString(f Form) string {
	switch f.Kind {
	case Hypergeometric:
		k, N, K, n := f.Args[0], f.Args[1], f.Args[2], f.Args[3]
		return fmt.Sprintf("C(%s, %s)·C(%s, %s)/C(%s, %s)", K, k, N.Sub(K), n.Sub(k), N, n)
	case NegBinomialPMF:
		fl, s, p := f.Args[0], f.Args[1], f.Args[2]
		return fmt.Sprintf("C(%s, %s)·%s^%s·(1−%s)^%s", fl.Add(s).Shift(-1), fl, paren(p), paren(s), p, paren(fl))
	}
	return "?"
}

// RecogniseAny names t as Recognise does, and also as the products of
// binomials of this file.
func RecogniseAny(t *Term) Form {
	f := Recognise(t)
	if f.Kind != Unknown && f.Kind != GammaRatio || t == nil {
		return f
	}
	if g := recogniseNegBinomial(t); g.Kind != Unknown {
		return g
	}
	if g := recogniseHypergeometric(t); g.Kind != Unknown {
		return g
	}
	return f
}

// gammaLists returns the Γ arguments of t above and below the line,
// each listed once per power.
func gammaLists(t *Term) (up, down []Affine) {
	for _, g := range t.Gamma {
		for i := 0; i < abs(g.Pow); i++ {
			if g.Pow > 0 {
				up = append(up, g.Arg)
			} else {
				down = append(down, g.Arg)
			}
		}
	}
	return up, down
}

// recogniseNegBinomial matches Γ(f+s)/(Γ(s)Γ(f+1))·p^s·(1−p)^f, the
// negative binomial probability of f failures before the s-th success
// (common practice), however the binomial's k is named.
func recogniseNegBinomial(t *Term) Form {
	if !isOne(t.Coef) || t.SqrtPi != 0 || len(t.Pows) != 2 || !t.Exp.IsConst() || t.Exp.c().Sign() != 0 {
		return Form{}
	}
	up, down := gammaLists(t)
	b := gammaForm(up, down)
	if b.Kind != Binomial {
		return Form{}
	}
	n, k := b.Args[0], b.Args[1]
	for _, pq := range [][2]Power{{t.Pows[0], t.Pows[1]}, {t.Pows[1], t.Pows[0]}} {
		p, q := pq[0], pq[1]
		if !q.Base.Equal(Int(1).Sub(p.Base)) {
			continue
		}
		f, s := q.Exp, p.Exp
		// C(f+s−1, f) = C(f+s−1, s−1): n must be f+s−1 and the
		// binomial's k either f or s−1.
		if n.Equal(f.Add(s).Shift(-1)) && (k.Equal(f) || k.Equal(s.Shift(-1))) && !s.IsConst() {
			return Form{NegBinomialPMF, []Affine{f, s, p.Base}}
		}
	}
	return Form{}
}

// recogniseHypergeometric matches
// Γ(K+1)Γ(N−K+1)Γ(n+1)Γ(N−n+1)/(Γ(k+1)Γ(K−k+1)Γ(n−k+1)Γ(N−K−n+k+1)Γ(N+1)),
// the hypergeometric probability C(K,k)·C(N−K,n−k)/C(N,n) (common
// practice), in any order of its factors.
func recogniseHypergeometric(t *Term) Form {
	if !isOne(t.Coef) || t.SqrtPi != 0 || len(t.Pows) != 0 || !t.Exp.IsConst() || t.Exp.c().Sign() != 0 {
		return Form{}
	}
	up, down := gammaLists(t)
	if len(up) != 4 || len(down) != 5 {
		return Form{}
	}
	without := func(xs []Affine, skip ...int) []Affine {
		var out []Affine
	next:
		for i, x := range xs {
			for _, s := range skip {
				if i == s {
					continue next
				}
			}
			out = append(out, x)
		}
		return out
	}
	// matchAll reports whether want and got hold the same forms.
	matchAll := func(want, got []Affine) bool {
		used := make([]bool, len(got))
		for _, w := range want {
			found := false
			for j, g := range got {
				if !used[j] && g.Equal(w) {
					used[j], found = true, true
					break
				}
			}
			if !found {
				return false
			}
		}
		return true
	}
	for d := range down {
		N := down[d].Shift(-1)
		for a := 1; a < 4; a++ {
			// up[0] pairs with up[a]: K+1 and N−K+1, the rest n+1
			// and N−n+1.
			rest := without([]Affine{up[0], up[1], up[2], up[3]}, 0, a)
			if !up[0].Add(up[a]).Equal(N.Shift(2)) || !rest[0].Add(rest[1]).Equal(N.Shift(2)) {
				continue
			}
			for _, K1 := range []Affine{up[0], up[a]} {
				for _, n1 := range rest {
					K, n := K1.Shift(-1), n1.Shift(-1)
					others := without(down, d)
					for i := range others {
						k := others[i].Shift(-1)
						want := []Affine{K.Sub(k).Shift(1), n.Sub(k).Shift(1), N.Sub(K).Sub(n).Add(k).Shift(1)}
						if matchAll(want, without(others, i)) {
							return Form{Hypergeometric, []Affine{k, N, K, n}}
						}
					}
				}
			}
		}
	}
	return Form{}
}
