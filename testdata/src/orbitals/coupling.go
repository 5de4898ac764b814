package orbitals

import (
	"math"
	"math/big"
)

func iabs(a int) int {
	if a < 0 {
		return -a
	}
	return a
}

func imax3(a, b, c int) int {
	if b > a {
		a = b
	}
	if c > a {
		a = c
	}
	return a
}

func imin3(a, b, c int) int {
	if b < a {
		a = b
	}
	if c < a {
		a = c
	}
	return a
}

// admissible reports whether (j1 j2 j3; m1 m2 m3) can be non-zero.
func admissible(j1, j2, j3, m1, m2, m3 int) bool {
	if m1+m2+m3 != 0 {
		return false
	}
	if j3 < iabs(j1-j2) || j3 > j1+j2 {
		return false
	}
	return iabs(m1) <= j1 && iabs(m2) <= j2 && iabs(m3) <= j3
}

// Wigner3j evaluates the 3j symbol for integer angular momenta by
// Racah's formula.
func Wigner3j(j1, j2, j3, m1, m2, m3 int) float64 { // want Wigner3j:`wrong for some j1 or some j2 or some j3 or some m1 or some m2 or some m3`
	if !admissible(j1, j2, j3, m1, m2, m3) {
		return 0
	}
	tri := factorial(j1+j2-j3) * factorial(j1-j2+j3) * factorial(-j1+j2+j3) / factorial(j1+j2+j3+1) // want `Wigner3j computes Γ\(j1 \+ j2 - j3 \+ 1\)·Γ\(j1 - j2 \+ j3 \+`
	pre := math.Sqrt(tri * factorial(j1+m1) * factorial(j1-m1) * factorial(j2+m2) *                 // want `ratio of factorials in float64: the intermediate \(j1 \+ j2 - j3\)!·.*/\(j1 \+ j2 \+ j3 \+ 1\)! overflows to \+Inf first, at j1 = j2 = j3 = 50 \(all equal\), m1 = m2 = m3 = 0`
		factorial(j2-m2) * factorial(j3+m3) * factorial(j3-m3))
	tmin := imax3(0, j2-j3-m1, j1-j3+m2)
	tmax := imin3(j1+j2-j3, j1-m1, j2+m2)
	sum := 0.0
	for t := tmin; t <= tmax; t++ {
		d := factorial(t) * factorial(j3-j2+t+m1) * factorial(j3-j1+t-m2) * // want `product of factorials in float64: the factor t! alone`
			factorial(j1+j2-j3-t) * factorial(j1-t-m1) * factorial(j2-t+m2)
		if t%2 == 0 {
			sum += 1 / d
		} else {
			sum -= 1 / d
		}
	}
	if iabs(j1-j2-m3)%2 == 1 {
		return -pre * sum
	}
	return pre * sum
}

// ClebschGordan is <j1 m1; j2 m2 | J M> from the 3j symbol.
func ClebschGordan(j1, m1, j2, m2, J, M int) float64 { // want ClebschGordan:`wrong for some j1`
	cg := math.Sqrt(float64(2*J+1)) * Wigner3j(j1, j2, J, m1, m2, -M) // want `ClebschGordan builds its result from Wigner3j\(j1, j2, J, m1, m2, -M\), which is wrong for some values of j1`
	if iabs(j1-j2+M)%2 == 1 {
		return -cg
	}
	return cg
}

// CGExact is ClebschGordan with Racah's sum in exact rationals.
func CGExact(j1, m1, j2, m2, J, M int) float64 {
	if !admissible(j1, j2, J, m1, m2, -M) {
		return 0
	}
	fact := func(n int) *big.Int { return new(big.Int).MulRange(1, int64(n)) }
	m3 := -M
	// sq = (2J+1) Δ Π(j±m)!, the square of the prefactor.
	num := new(big.Int).Mul(fact(j1+j2-J), fact(j1-j2+J))
	num.Mul(num, fact(-j1+j2+J))
	for _, v := range []int{j1 + m1, j1 - m1, j2 + m2, j2 - m2, J + m3, J - m3} {
		num.Mul(num, fact(v))
	}
	num.Mul(num, big.NewInt(int64(2*J+1)))
	sq := new(big.Rat).SetFrac(num, fact(j1+j2+J+1))
	sum := new(big.Rat)
	tmin := imax3(0, j2-J-m1, j1-J+m2)
	tmax := imin3(j1+j2-J, j1-m1, j2+m2)
	for t := tmin; t <= tmax; t++ {
		d := fact(t)
		for _, v := range []int{J - j2 + t + m1, J - j1 + t - m2, j1 + j2 - J - t, j1 - t - m1, j2 - t + m2} {
			d.Mul(d, fact(v))
		}
		term := new(big.Rat).SetFrac(big.NewInt(1), d)
		if t%2 == 1 {
			term.Neg(term)
		}
		sum.Add(sum, term)
	}
	pre := new(big.Float).SetPrec(200).SetRat(sq)
	pre.Sqrt(pre)
	val := new(big.Float).SetPrec(200).SetRat(sum)
	val.Mul(val, pre)
	// 3j phase (−1)^(j1−j2−m3) times the CG phase (−1)^(j1−j2+M): m3 = −M, so they cancel.
	f, _ := val.Float64()
	return f
}
