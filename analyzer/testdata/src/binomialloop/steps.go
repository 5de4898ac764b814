package binomialloop

// Running products that multiply before they divide, whose value after
// the loop is not a binomial coefficient (analyzer/modelstep.go): the
// product on the last trip is the value times that trip's divisor, so
// it wraps first. Exact values from math/big (TestStepProduct in
// analyzer/thresholds runs the same loops in machine integers).

// Pairings counts the ways to pair 2n players into n matches,
// (2n−1)!! = (2n)!/(2^n·n!) (OEIS A001147), by the step
// m·(2k+1)(2k+2)/(2(k+1)): 31!!·33·34 ≈ 2.15e20 wraps uint64 at n = 17
// although 33!! ≈ 6.33e18 fits.
func Pairings(n int) uint64 { // want Pairings:`wrong for some n`
	m := uint64(1)
	for k := 0; k < n; k++ { // want `running product m \* uint64\(\(2\*k \+ 1\) \* \(2\*k \+ 2\)\) in uint64 wraps before the division by uint64\(2 \* \(k \+ 1\)\) for n ≥ 17, although .* fits up to n = 17; n is not bounded here`
		m = m * uint64((2*k+1)*(2*k+2)) / uint64(2*(k+1))
	}
	return m
}

// Mountains counts the mountain ranges of n up- and n down-strokes, the
// Catalan number C_n (OEIS A000108), by C_{k+1} = C_k·2(2k+1)/(k+2):
// C_33·2·67 ≈ 2.85e19 wraps int64 at n = 34 (C_32·2·65 ≈ 7.22e18 still
// fits at n = 33), although C_35 ≈ 3.12e18 fits.
func Mountains(n int) int64 { // want Mountains:`wrong for some n`
	c := int64(1)
	for k := 0; k < n; k++ { // want `running product c \* int64\(2 \* \(2\*k \+ 1\)\) in int64 wraps before the division by int64\(k \+ 2\) for n ≥ 34, although its value after the loop fits up to n = 35`
		c = c * int64(2*(2*k+1)) / int64(k+2)
	}
	return c
}

// PairingsSmall stops at 16 pairs, where every product fits: silent.
func PairingsSmall(n int) uint64 {
	if n > 16 {
		return 0
	}
	m := uint64(1)
	for k := 0; k < n; k++ {
		m = m * uint64((2*k+1)*(2*k+2)) / uint64(2*(k+1))
	}
	return m
}

// FloatMountains keeps the product in float64, which only rounds:
// silent.
func FloatMountains(n int) float64 {
	c := 1.0
	for k := 0; k < n; k++ {
		c = c * float64(2*(2*k+1)) / float64(k+2)
	}
	return c
}

// Slots is n + 1 by the step s·(k+2)/(k+1): neither the value nor the
// product ever nears the type's limit: silent.
func Slots(n int) int64 {
	s := int64(1)
	for k := 0; k < n; k++ {
		s = s * int64(k+2) / int64(k+1)
	}
	return s
}
