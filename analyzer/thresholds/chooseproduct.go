package thresholds

import (
	"math"
	"math/big"
)

// IntForm is C + Σ Coef[i]·x_i over the variables of a search.
type IntForm struct {
	C    int64
	Coef []int64
}

func (f IntForm) at(x []int64) int64 {
	v := f.C
	for i, c := range f.Coef {
		v += c * x[i]
	}
	return v
}

// searchMax is the largest coordinate ChooseProductWitness tries: every
// C(n, k) with n past it is past every machine type for k between 2 and
// n−2, so the product's breaking point, where each factor still fits,
// lies below it.
const searchMax = 160

// ChooseProductWitness looks for the first input at which a product of
// binomial coefficients ∏ C(n_j, k_j), each n_j and k_j a form in up to
// three variables, leaves t while every factor lies in 0 ≤ k ≤ n and
// fits t: the product wraps there although nothing before it did. The
// points tried have each x_i in [lo_i, hi_i] ∩ [0, searchMax], in order
// of their largest coordinate, then lexicographically; the answer is the
// first, with the factors' exact values and their product. ok is false
// when no point tried is one, or there are more than three variables.
// Each candidate is screened with ln C from a table of ln k! and
// confirmed with math/big.
func ChooseProductWitness(t Num, ns, ks []IntForm, lo, hi []int64) (x []int64, factors []*big.Int, product *big.Int, ok bool) {
	d := len(lo)
	if d == 0 || d > 3 || len(ns) != len(ks) || len(ns) < 2 {
		return nil, nil, nil, false
	}
	lim := t.maxInt()
	logMax := t.logMax()
	// The largest n a form reaches over the box, for the table of ln k!.
	top := int64(0)
	for _, f := range ns {
		v := f.C
		for _, c := range f.Coef {
			v += abs64(c) * searchMax
		}
		top = max(top, v)
	}
	if top > 1<<16 {
		return nil, nil, nil, false
	}
	lf := make([]float64, top+1)
	for i := int64(2); i <= top; i++ {
		lf[i] = lf[i-1] + math.Log(float64(i))
	}
	lo2, hi2 := make([]int64, d), make([]int64, d)
	for i := range lo {
		lo2[i], hi2[i] = max(lo[i], 0), min(hi[i], searchMax)
		if lo2[i] > hi2[i] {
			return nil, nil, nil, false
		}
	}
	pt := make([]int64, d)
	// try judges one point: every factor defined and fitting, the
	// product past t.
	try := func() bool {
		sum := 0.0
		for j := range ns {
			n, k := ns[j].at(pt), ks[j].at(pt)
			if k < 0 || k > n || n > top {
				return false
			}
			l := lf[n] - lf[k] - lf[n-k]
			if l > logMax+1e-9 {
				return false // this factor leaves t itself
			}
			sum += l
		}
		if sum < logMax-1e-9 {
			return false
		}
		prod := big.NewInt(1)
		vals := make([]*big.Int, len(ns))
		for j := range ns {
			n, k := ns[j].at(pt), ks[j].at(pt)
			vals[j] = new(big.Int).Binomial(n, k)
			if vals[j].CmpAbs(lim) > 0 {
				return false
			}
			prod.Mul(prod, vals[j])
		}
		if prod.CmpAbs(lim) <= 0 {
			return false
		}
		x, factors, product = append([]int64(nil), pt...), vals, prod
		return true
	}
	for m := int64(0); m <= searchMax; m++ {
		// The points whose largest coordinate is m.
		var walk func(i int, hasM bool) bool
		walk = func(i int, hasM bool) bool {
			if i == d {
				return hasM && try()
			}
			from := lo2[i]
			if i == d-1 && !hasM {
				from = m // the last coordinate must be the largest
			}
			for v := from; v <= min(hi2[i], m); v++ {
				pt[i] = v
				if walk(i+1, hasM || v == m) {
					return true
				}
			}
			return false
		}
		if walk(0, false) {
			return x, factors, product, true
		}
	}
	return nil, nil, nil, false
}

func abs64(v int64) int64 {
	if v < 0 {
		return -v
	}
	return v
}
