// Package reliability models k-out-of-n redundant pump stations: a
// station works while at least k of its n pumps do.
package reliability

import "math"

// Choose returns C(n, k) with the multiplicative formula.
func Choose(n, k int64) int64 { // want Choose:`binomial of parameter 0, breaks from 62` Choose:`wrong for some n or some k`
	b := int64(1)
	for i := int64(1); i <= k; i++ { // want `multiplicative binomial loop in int64: the product b \* \(n - k \+ i\) wraps before the division for n ≥ 62 at k = n/2, although C\(n, n/2\) itself fits up to n = 66; n is not bounded here`
		b = b * (n - k + i) / i
	}
	return b
}

// chooseSteps is the same loop in two statements, counting from n down.
func chooseSteps(n, k int) int { // want chooseSteps:`binomial of parameter 0, breaks from 62`
	b := 1
	for i := 0; i < k; i++ { // want `multiplicative binomial loop in int: the product b \* \(n - i\) wraps`
		b *= n - i
		b /= i + 1
	}
	return b
}

// Availability is the probability that at least k of n pumps work, each
// with probability p.
func Availability(n, k int, p float64) float64 { // want Availability:`wrong for n ≥ 62`
	sum := 0.0
	for i := k; i <= n; i++ {
		sum += float64(chooseSteps(n, i)) * math.Pow(p, float64(i)) * math.Pow(1-p, float64(n-i)) // want `binomial probability C\(n, i\)·p\^i·\(1−p\)\^\(n−i\) in int: chooseSteps\(n, …\) breaks for n ≥ 62 although the probability itself is at most 1; n is not bounded here`
	}
	return sum
}

// SmallStation bounds the station size: a station has at most 60 pumps.
func SmallStation(n, k int64) int64 { // want SmallStation:`binomial of parameter 0, safe for`
	if n > 60 || k < 0 || k > n {
		return 0
	}
	b := int64(1)
	for i := int64(1); i <= k; i++ {
		b = b * (n - k + i) / i
	}
	return b
}

// ChooseFloat divides at every step in floating point; it loses a little
// precision but has no wrapping intermediate.
func ChooseFloat(n, k int) float64 { // want ChooseFloat:`binomial of parameter 0, breaks from 1030`
	b := 1.0
	for i := 1; i <= k; i++ {
		b *= float64(n-k+i) / float64(i)
	}
	return b
}

// ChooseU counts pump subsets in uint64.
func ChooseU(n, k uint64) uint64 { // want ChooseU:`binomial of parameter 0, breaks from 63` ChooseU:`wrong for some n or some k`
	b := uint64(1)
	for i := uint64(0); i < k; i++ { // want `multiplicative binomial loop in uint64: the product b \* \(n - i\) wraps before the division for n ≥ 63`
		b = b * (n - i) / (i + 1)
	}
	return b
}

// FewSpares counts choices of at most 5 spares from a depot of at most
// 1000 pumps.
func FewSpares(n, k int64) int64 {
	if n < 0 || n > 1000 || k < 0 || k > 5 {
		return 0
	}
	b := int64(1)
	for i := int64(1); i <= k; i++ {
		b = b * (n - k + i) / i
	}
	return b * 1
}

// SmallAvailability is Availability for the six-pump station.
func SmallAvailability(k int, p float64) float64 {
	sum := 0.0
	for i := k; i <= 6; i++ {
		sum += float64(chooseSteps(6, i)) * math.Pow(p, float64(i)) * math.Pow(1-p, float64(6-i))
	}
	return sum
}
