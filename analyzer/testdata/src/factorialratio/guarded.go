package factorialratio

// Guards on a variable bound the affine arguments built from it: after
// m ≤ 10, (2m)! is at most 20!, which fits int64. Limits from math/big:
// 20! = 2432902008176640000 ≤ MaxInt64 = 9223372036854775807 < 21! =
// 51090942171709440000. A guard too weak for the argument still leaves
// the ratio's numerator to wrap.

// HalfMatchings is (2m)!/(2·m!), silent: m ≤ 10 gives 2m ≤ 20.
func HalfMatchings(m int) int64 {
	if m > 10 {
		return -1
	}
	return factI(2*m) / (factI(m) * 2)
}

// PairedTeams is (2m)!/(m!·m!) under an if/else guard: the numerator
// is at most 20!.
func PairedTeams(m int) int64 {
	if m <= 10 {
		return factI(2*m) / (factI(m) * factI(m))
	} else {
		return -1
	}
}

// MixedCrews is (m+k)!/(m!·k!) with both parts guarded: m+k ≤ 20.
func MixedCrews(m, k int) int64 {
	if m > 10 || k > 10 {
		return -1
	}
	return factI(m+k) / (factI(m) * factI(k))
}

// OddSeatings is (2m+1)!/m!, silent: m ≤ 9 gives 2m+1 ≤ 19.
func OddSeatings(m int) int64 {
	if m >= 10 {
		return 0
	}
	return factI(2*m+1) / factI(m)
}

// TrayLayouts is (3m−1)!·2, a product: m ≤ 7 gives 3m−1 ≤ 20.
func TrayLayouts(m int) int64 {
	if m > 7 {
		return 0
	}
	return factI(3*m-1) * 2
}

// LooseMatchings guards m only up to 11: 2m reaches 22, and 22! wraps.
func LooseMatchings(m int) int64 { // want LooseMatchings:`value 1/2·Γ\(2\*p0 \+ 1\)/Γ\(p0 \+ 1\), wrong once 2\*p0 ≥ 21` LooseMatchings:`wrong for m ≥ 10\.5 \(LooseMatchings`
	if m > 11 {
		return -1
	}
	return factI(2*m) / (factI(m) * 2) // want `ratio of factorials in int64: the numerator \(2 \* m\)! wraps for 2 \* m ≥ 21 before the division; 2 \* m may reach 22 here`
}
