package thresholds

import "math"

// Digits lost in sums of log-gamma values.
//
// exp(Σ pᵢ·ln Γ(xᵢ)) computed in float64 as math.Exp of a sum of
// math.Lgamma results carries, relative to the true value, the absolute
// error of the computed sum: exp(Ŝ) = exp(S)·exp(Ŝ−S). The terms of S
// can be huge while S itself is small (ln C(n, k) is a difference of
// three values near n·ln n), so the result keeps only about
// 53 − log2(Σ|pᵢ·ln Γ(xᵢ)|) bits.
//
// The bound, to first order in u = 2^-53 but with every rounding
// counted, is built as follows; every step names its source:
//
//   - Each math.Lgamma result is within one ulp of ln Γ(x), so within
//     2u·|ln Γ(x)| (the accuracy of FreeBSD msun's lgamma_r, from which
//     Go's math.Lgamma is translated, from memory).
//   - A coefficient pᵢ that is not a power of two costs one rounding of
//     the product, u·|pᵢ·ln Γ(xᵢ)|; a power of two is exact.
//   - An argument xᵢ computed by floating-point arithmetic (a+b of two
//     float64 values) is off by up to u·|xᵢ|, which moves ln Γ by
//     u·|xᵢ·ψ(xᵢ)|, where |x·ψ(x)| ≤ max(1+γ, x·max(γ, ln x)) for x > 0
//     (ψ(x) < ln x for x > 0, ψ increasing, ψ(1) = −γ, and
//     x·ψ(x) → −1 as x → 0, DLMF 5.7.6 and 5.11.2, from memory);
//     integer arguments converted from integers below 2^53 are exact.
//   - Recursive summation of m terms errs by at most
//     γ_{m−1}·Σ|computed terms|, γ_k = k·u/(1−k·u) (N. J. Higham,
//     Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM
//     2002, section 4.2, eq. (4.4), from memory).
//   - math.Exp rounds its result within one ulp, 2u relative (the error
//     analysis quoted in Go's src/math/exp.go, "always less than 1
//     ulp", from memory), and each of the E−1 multiplications or
//     divisions that combine E exponentials rounds within u.
//
// With Δ = Σ over the exponentials of (2u + γ_{m−1}(1+3u))·A + u·A₂ + R,
// where A = Σ|pᵢ·ln Γ(xᵢ)|, A₂ the part of A with a coefficient that is
// not a power of two and R the argument terms above, the relative error
// of the result is at most
//
//	exp(Δ)·(1+2u)^E·(1+u)^(E−1) − 1.

// unitRoundoff is u = 2^-53, the unit roundoff of float64 (IEEE 754,
// round to nearest).
var unitRoundoff = math.Ldexp(1, -53)

// eulerGamma is the Euler–Mascheroni constant γ = −ψ(1) (DLMF 5.2.3,
// from memory), used only inside the bound on |x·ψ(x)|.
const eulerGamma = 0.5772156649015329

// LgammaMin returns the minimum of ln Γ(x) over x > 0, found by a
// golden-section search on math.Lgamma over [1, 2], where ln Γ, convex
// for x > 0, is 0 at both ends (about −0.1214862905 at x ≈ 1.4616321,
// DLMF 5.4.iii, from memory). It makes |ln Γ(x)| ≤ ln Γ(x) − 2·LgammaMin()
// for every x > 0.
func LgammaMin() float64 {
	return memo(cacheKey{shape: "lgamma-min"}, func() float64 {
		lg := func(x float64) float64 { v, _ := math.Lgamma(x); return v }
		a, b := 1.0, 2.0
		r := (math.Sqrt(5) - 1) / 2
		for i := 0; i < 200 && b-a > 1e-15; i++ {
			c, d := b-r*(b-a), a+r*(b-a)
			if lg(c) < lg(d) {
				b = d
			} else {
				a = c
			}
		}
		return lg((a + b) / 2)
	})
}

// A LogGammaTerm is one p·ln Γ(x) of an exponent, with x an affine form
// C + Σ K[j]·v[j] of the exponent's variables.
type LogGammaTerm struct {
	P       float64
	C       float64
	K       []float64
	Rounded bool // x is computed in floating point and may be rounded
}

func (t LogGammaTerm) at(v []float64) float64 {
	x := t.C
	for j, k := range t.K {
		if k != 0 {
			x += k * v[j]
		}
	}
	return x
}

// ExpLogGammaError returns the bound above on the relative error of a
// product of exponentials, exps[e] holding the terms of the e-th
// exponent, with each variable v[j] anywhere in [lo[j], hi[j]]. Since
// ln Γ is convex on x > 0 (common practice: Γ is log-convex, the
// Bohr–Mollerup theorem), Σ|pᵢ|·ln Γ(xᵢ) is convex over the box and its
// largest value is at a corner; |ln Γ| ≤ ln Γ − 2·LgammaMin() turns that
// into a bound on A. A corner where some argument is not positive (a
// pole of Γ, where the code's own guards return early: C(n, k) for
// k > n) is left out, so where the box holds such corners the result is
// the bound at the corners where every argument is positive, a value
// the bound takes, not its largest over the box. It reports false when
// no corner has every argument positive or a bound is infinite.
//
// Special cases are:
//
//	ExpLogGammaError(nil, …) = 0, true
func ExpLogGammaError(exps [][]LogGammaTerm, lo, hi []float64) (float64, bool) {
	u := unitRoundoff
	delta := 0.0
	for _, terms := range exps {
		if len(terms) == 0 {
			continue
		}
		a, a2, r, ok := cornerMax(terms, lo, hi)
		if !ok {
			return 0, false
		}
		m := float64(len(terms))
		gam := (m - 1) * u / (1 - (m-1)*u)
		delta += (2*u+gam*(1+3*u))*a + u*a2 + r
	}
	e := float64(len(exps))
	bound := math.Expm1(delta + e*math.Log1p(2*u) + math.Max(e-1, 0)*math.Log1p(u))
	if math.IsInf(bound, 0) || math.IsNaN(bound) {
		return 0, false
	}
	return bound, true
}

// cornerMax returns, over the corners of the box, the largest
// A = Σ|pᵢ·ln Γ(xᵢ)| (bounded through convexity), the largest part A₂ of
// it with coefficients that are not powers of two, and the largest
// argument-rounding term R.
func cornerMax(terms []LogGammaTerm, lo, hi []float64) (a, a2, r float64, ok bool) {
	feasible := false
	minLg := LgammaMin()
	d := len(lo)
	v := make([]float64, d)
	for mask := 0; mask < 1<<d; mask++ {
		for j := range v {
			v[j] = lo[j]
			if mask&(1<<j) != 0 {
				v[j] = hi[j]
			}
		}
		var sa, sa2, sr float64
		pole := false
		for _, t := range terms {
			if x := t.at(v); !(x > 0) || math.IsInf(x, 0) {
				pole = true
			}
		}
		if pole {
			continue
		}
		feasible = true
		for _, t := range terms {
			x := t.at(v)
			lg, _ := math.Lgamma(x)
			w := math.Abs(t.P) * (lg - 2*minLg)
			sa += w
			if !powerOfTwo(t.P) {
				sa2 += w
			}
			if t.Rounded {
				sr += unitRoundoff * math.Abs(t.P) * math.Max(1+eulerGamma, x*math.Max(eulerGamma, math.Log(x)))
			}
		}
		a, a2, r = math.Max(a, sa), math.Max(a2, sa2), math.Max(r, sr)
	}
	if !feasible || math.IsInf(a, 0) || math.IsNaN(a) {
		return 0, 0, 0, false
	}
	return a, a2, r, true
}

func powerOfTwo(p float64) bool {
	frac, _ := math.Frexp(math.Abs(p))
	return frac == 0.5
}

// ExpLogGammaFirst returns the smallest integer t in [from, to] at which
// bound(t) exceeds tol, for a bound that does not decrease with t (a
// box that grows with t); ok is false when bound(to) does not exceed it
// or a bound cannot be computed.
func ExpLogGammaFirst(bound func(t float64) (float64, bool), from, to int64, tol float64) (int64, bool) {
	over := func(t int64) bool {
		b, ok := bound(float64(t))
		return ok && b > tol
	}
	if from > to || !over(to) {
		return 0, false
	}
	if over(from) {
		return from, true
	}
	return firstTrue(from, to, over), true
}
