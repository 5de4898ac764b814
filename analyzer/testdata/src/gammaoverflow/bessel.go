package gammaoverflow

import "math"

// Series terms (x/2)^(2k+nu)/(Γ(k+1)·Γ(k+nu+1)) of the modified Bessel
// function I_nu (DLMF 10.25.2). Γ(k+1) is +Inf from k = 171 (Γ
// overflows float64 from 171.624…, DLMF 5.4.1 with 170!, from memory),
// but at k = 170 the exponent is 340 + nu, and the power passes float64
// first wherever |x/2| ≥ MaxFloat64^(1/340) = 8.06550 (mpmath).

// BesselI sums 300 terms with nu never negative: the power's threshold
// is taken at nu's least value.
func BesselI(nu int, x float64) float64 { // want BesselI:`wrong for some nu`
	if nu < 0 {
		return 0
	}
	s := 0.0
	for k := 0; k < 300; k++ {
		s += math.Pow(x/2, float64(2*k+nu)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(k+nu+1))) // want `math\.Gamma overflows: math\.Gamma\(float64\(k \+ 1\)\) is \+Inf for k ≥ 171 .*; where \|x / 2\| ≥ 8\.0655 the power \(x / 2\)\^\(2\*k \+ nu\) overflows to \+Inf first, before k reaches 171` `series term`
	}
	return s
}

// BesselIAny lets nu be negative: the threshold is stated at nu = 0.
func BesselIAny(nu int, x float64) float64 { // want BesselIAny:`wrong for some nu`
	s := 0.0
	for k := 0; k < 300; k++ {
		s += math.Pow(x/2, float64(2*k+nu)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(k+nu+1))) // want `where \|x / 2\| ≥ 8\.0655 at nu = 0 the power` `series term`
	}
	return s
}

// BesselIConst has a constant base: the power's own limit is known, and
// no base is named.
func BesselIConst(nu int) float64 {
	if nu < 0 {
		return 0
	}
	s := 0.0
	for k := 0; k < 300; k++ {
		s += math.Pow(3, float64(2*k+nu)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(k+nu+1))) // want `math\.Gamma overflows: math\.Gamma\(float64\(k \+ 1\)\) is \+Inf for k ≥ 171 \(Γ\(x\) overflows float64 from x = 171\.624377\); the argument may reach 300 here$`
	}
	return s
}
