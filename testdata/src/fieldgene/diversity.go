package fieldgene

import "math"

// lchoose is ln C(n, k).
func lchoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}

// chooseG is C(n, k) from the Gamma function.
func chooseG(n, k int) float64 {
	return math.Gamma(float64(n+1)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(n-k+1))) // want `ratio of math\.Gamma values in float64:`
}

// Rarefy is Hurlbert's expected number of species in a subsample of n
// individuals, Σ 1 − C(N−N_i, n)/C(N, n).
func Rarefy(counts []int, n int) float64 {
	total := 0
	for _, c := range counts {
		total += c
	}
	den := chooseG(total, n) // want `Rarefy builds its result from chooseG\(total, n\), which is wrong from n = 171`
	es := 0.0
	for _, c := range counts {
		if total-c >= n {
			es += 1 - chooseG(total-c, n)/den
		} else {
			es++
		}
	}
	return es
}

// RarefyProduct is Rarefy with each ratio of binomials taken as the
// product Π (N−N_i−j)/(N−j) over j < n. It returns NaN when n exceeds
// the sample.
func RarefyProduct(counts []int, n int) float64 {
	total := 0
	for _, c := range counts {
		total += c
	}
	if n < 0 || n > total {
		return math.NaN()
	}
	es := 0.0
	for _, c := range counts {
		ratio := 1.0
		for j := 0; j < n && ratio > 0; j++ {
			ratio *= float64(total-c-j) / float64(total-j)
		}
		if ratio < 0 {
			ratio = 0
		}
		es += 1 - ratio
	}
	return es
}

// SimpsonUnbiased is the probability that two individuals drawn without
// replacement belong to the same species.
func SimpsonUnbiased(counts []int) float64 {
	var num, total float64
	for _, c := range counts {
		x := float64(c)
		num += x * (x - 1)
		total += x
	}
	return num / (total * (total - 1))
}

// Chao1 is the bias-corrected Chao1 richness estimate.
func Chao1(counts []int) float64 {
	var obs, f1, f2 float64
	for _, c := range counts {
		if c == 0 {
			continue
		}
		obs++
		switch c {
		case 1:
			f1++
		case 2:
			f2++
		}
	}
	return obs + f1*(f1-1)/(2*(f2+1))
}

// chooseMul is C(n, k) by the multiplicative formula in int64.
func chooseMul(n, k int) int64 { // want chooseMul:`binomial of parameter 0, breaks from 62`
	if k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	r := int64(1)
	for i := 1; i <= k; i++ { // want `multiplicative binomial loop in int64: the product r \*`
		r = r * int64(n-k+i) / int64(i)
	}
	return r
}

// DetectionProb is the probability that a sample of the given size from
// a population holding marked tagged animals catches at least one.
func DetectionProb(total, marked, sample int) float64 { // want DetectionProb:`wrong for some total or some marked`
	return 1 - float64(chooseMul(total-marked, sample))/float64(chooseMul(total, sample)) // want `chooseMul\(total-marked, sample\) computes C\(total - marked, sample\) in int64, which wraps for total - marked ≥ 62 at sample = \(total - marked\)/2, before the conversion to float64` `chooseMul\(total, sample\) computes C\(total, sample\) in int64, which wraps for total ≥ 62 at sample = total/2`
}
