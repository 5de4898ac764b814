package fixes_test

import (
	"math"
	"math/big"
)

// The log-space categories' scenario packages carry .golden files for
// their fixes, written by hand from the identities in lgammasign.go and
// stirling.go, and run in the differential test against math/big.
func init() {
	fixPackages = append(fixPackages, "lgammasign", "stirlingapproximation")
	diffCases = append(diffCases,
		// Γ at half-integers and integers, negative ones included, where
		// the dropped sign is wrong on (−1, 0), (−3, −2), …
		diffCase{pkg: "lgammasign", fn: "PowerLawDerivative", loops: []string{"k := -13; k <= 9; k++"}, args: "1, float64(k) / 2, 0.5, 1", typ: "float64", ref: refPowerLaw},
		diffCase{pkg: "lgammasign", fn: "RelaxationWeight", loops: []string{"k := -13; k <= 9; k++"}, args: "float64(k) / 2", typ: "float64", ref: refRelaxation},
		diffCase{pkg: "lgammasign", fn: "ShellVolume", loops: []string{"d := -13; d <= 20; d++"}, args: "d", typ: "float64", ref: refShellVolume},
		diffCase{pkg: "lgammasign", fn: "HalfStep", loops: []string{"k := -3; k <= -2; k++"}, args: "float64(k) / 2", typ: "float64", ref: refHalfStep},
		diffCase{pkg: "lgammasign", fn: "Reflected", loops: []string{"n := 0; n <= 10; n++", "k := -3; k <= 8; k++"}, args: "float64(n), float64(k) / 2", typ: "float64", ref: refReflected},
		// n! by Stirling's formula: 1/(12n) off everywhere, +Inf from
		// 144 where it forms n^n.
		diffCase{pkg: "stirlingapproximation", fn: "Shuffles", loops: []string{"n := 1; n <= 175; n++"}, args: "n", typ: "float64", ref: refFactorial},
		diffCase{pkg: "stirlingapproximation", fn: "OddsTable", loops: []string{"n := 1; n <= 12; n++"}, args: "n", typ: "float64", ref: refFactorial, call: "OddsTable()[n]"},
		diffCase{pkg: "stirlingapproximation", fn: "ErlangWeight", loops: []string{"a := 1; a <= 16; a *= 2", "c := 1; c <= 170; c += 3"}, args: "float64(a) / 2, c", typ: "float64", ref: refPowFact},
		diffCase{pkg: "stirlingapproximation", fn: "StaffingBound", loops: []string{"a := 1; a <= 16; a *= 2", "c := 1; c <= 170; c += 3"}, args: "float64(a) / 2, c", typ: "float64", ref: refPowFact},
		diffCase{pkg: "stirlingapproximation", fn: "LargeQueue", loops: []string{"a := 1; a <= 16; a *= 2", "c := 1; c <= 170; c += 3"}, args: "float64(a) / 2, c", typ: "float64", ref: refPowFact},
		diffCase{pkg: "stirlingapproximation", fn: "DropletCount", loops: []string{"n := 1; n <= 175; n++"}, args: "float64(n)", typ: "float64", ref: refFactorial},
		diffCase{pkg: "stirlingapproximation", fn: "DropletEntropy", loops: []string{"n := 1; n <= 3000; n += 7"}, args: "float64(n)", typ: "float64", ref: refLogFactorial},
		diffCase{pkg: "stirlingapproximation", fn: "MixingEntropy", loops: []string{"n := 1; n <= 3000; n += 7"}, args: "n", typ: "float64", ref: refLogFactorial},
		diffCase{pkg: "stirlingapproximation", fn: "Microstates", loops: []string{"n := 100; n <= 3000; n += 7"}, args: "n", typ: "float64", ref: refLogFactorial},
	)
}

// piBig is π to refPrec bits by Machin's formula,
// π = 16·arctan(1/5) − 4·arctan(1/239) (common practice).
func piBig() *big.Float {
	atanInv := func(m int64) *big.Float {
		sum := fl(0)
		x := quo(fl(1), fl(float64(m)))
		x2 := mul(x, x)
		term := x
		eps := new(big.Float).SetMantExp(fl(1), -int(refPrec)-8)
		for k := int64(0); term.Cmp(eps) > 0; k++ {
			t := quo(term, fl(float64(2*k+1)))
			if k%2 == 0 {
				sum.Add(sum, t)
			} else {
				sum.Sub(sum, t)
			}
			term = mul(term, x2)
		}
		return sum
	}
	p := mul(fl(16), atanInv(5))
	return p.Sub(p, mul(fl(4), atanInv(239)))
}

var sqrtPiBig = func() *big.Float {
	return new(big.Float).SetPrec(refPrec).Sqrt(piBig())
}()

// gammaBig returns Γ(y) for an integer or half-integer y, and false at
// a pole (0 and the negative integers): Γ(m) = (m−1)!,
// Γ(m+½) = (2m)!/(4^m·m!)·√π and Γ(½−m) = (−4)^m·m!/(2m)!·√π
// (DLMF 5.4.1, 5.4.6, from memory).
func gammaBig(y float64) (*big.Float, bool) {
	if y == math.Trunc(y) {
		if y <= 0 {
			return nil, false
		}
		return bf(factorialBig(int64(y) - 1)), true
	}
	m := int64(math.Floor(y)) // y = m + ½
	if m >= 0 {
		num := bf(factorialBig(2 * m))
		den := bf(new(big.Int).Mul(new(big.Int).Exp(big.NewInt(4), big.NewInt(m), nil), factorialBig(m)))
		return mul(quo(num, den), sqrtPiBig), true
	}
	j := int64(0.5 - y) // y = ½ − j
	num := bf(new(big.Int).Mul(new(big.Int).Exp(big.NewInt(-4), big.NewInt(j), nil), factorialBig(j)))
	return mul(quo(num, bf(factorialBig(2*j))), sqrtPiBig), true
}

// invGammaBig is 1/Γ(y), 0 at the poles.
func invGammaBig(y float64) *big.Float {
	g, ok := gammaBig(y)
	if !ok {
		return fl(0)
	}
	return quo(fl(1), g)
}

// refPowerLaw is num/Γ(k+1−α)·t^(k−α) for (num, k, α, t) with t = 1.
func refPowerLaw(x []float64) *big.Float { return mul(fl(x[0]), invGammaBig(x[1]+1-x[2])) }

// refRelaxation is Γ(s)/2, +Inf at a pole (where math.Lgamma's +Inf
// makes both codes +Inf).
func refRelaxation(x []float64) *big.Float {
	g, ok := gammaBig(x[0])
	if !ok {
		return new(big.Float).SetInf(false)
	}
	return quo(g, fl(2))
}

// refShellVolume is π^(d/2)/Γ(d/2+1) = (√π)^d/Γ(d/2+1).
func refShellVolume(x []float64) *big.Float {
	d := int64(x[0])
	p := fl(1)
	for i := int64(0); i < abs(d); i++ {
		p = mul(p, sqrtPiBig)
	}
	if d < 0 {
		p = quo(fl(1), p)
	}
	return mul(p, invGammaBig(x[0]/2+1))
}

func abs(x int64) int64 {
	if x < 0 {
		return -x
	}
	return x
}

// refHalfStep is Γ(k+½), +Inf at the pole k = −1.
func refHalfStep(x []float64) *big.Float { return mul(fl(2), refRelaxation([]float64{x[0] + 0.5})) }

// refReflected is Γ(n+1)/Γ(k+1).
func refReflected(x []float64) *big.Float {
	g, _ := gammaBig(x[0] + 1)
	return mul(g, invGammaBig(x[1]+1))
}

// refLogFactorial is ln n! of the exact n!, its logarithm taken from
// the big.Float's mantissa and exponent: ln(m·2^e) = ln m + e·ln 2,
// within a few float64 ulps.
func refLogFactorial(x []float64) *big.Float {
	f := bf(factorialBig(int64(x[0])))
	m := new(big.Float)
	e := f.MantExp(m)
	mf, _ := m.Float64()
	return fl(math.Log(mf) + float64(e)*math.Ln2)
}
