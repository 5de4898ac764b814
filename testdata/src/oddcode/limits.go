package oddcode

import "math"

// untilMax runs to a bound written as a constant past int64: the message
// names the constant as written, not as a variable with a range.
func untilMax() uint64 {
	r := uint64(1)
	for i := uint64(2); i <= math.MaxUint64-1; i++ { // want `^factorial up to math.MaxUint64 - 1 in uint64 wraps \(20! ≈ 2.43e18 is the largest that fits\)$`
		r *= i
	}
	return r
}

// hugeRatio is far past float64 in truth as well: no "finite" claim.
func hugeRatio() float64 {
	return math.Gamma(1e308) / math.Gamma(1e307) // want `^ratio of math.Gamma values in float64: math.Gamma\(1e308\) is \+Inf for arguments ≥ 171.624377; the argument is always past it here$`
}

// infRatio divides an infinite Γ: +Inf is the true value.
func infRatio() float64 {
	return math.Gamma(math.Inf(1)) / math.Gamma(3) // want `^ratio of math.Gamma values in float64: math.Gamma\(math.Inf\(1\)\) is \+Inf for arguments ≥ 171.624377; the argument is always past it here$`
}

// nanRatio is NaN whatever the arithmetic: nothing overflows.
func nanRatio() float64 {
	return math.Gamma(math.NaN()) / math.Gamma(3)
}

// farApart moves its arguments apart by 1e300: no "finite" claim.
func farApart(x float64) float64 {
	return math.Gamma(x+1e300) / math.Gamma(x) // want `^ratio of math.Gamma values in float64: math.Gamma\(x \+ 1e300\) is \+Inf for x ≥ -1e\+300 \(Γ\(x\) overflows float64 from x = 171.624377\); x is not bounded here$`
}

// nearby keeps its arguments 2 apart: the ratio x(x+1) is finite where
// Γ(x+2) first overflows.
func nearby(x float64) float64 {
	return math.Gamma(x+2) / math.Gamma(x) // want `although the result itself is finite`
}
