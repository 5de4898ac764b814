package fieldgene

import (
	"math"
	"math/big"
)

// floatFact is n! in float64.
func floatFact(n int) float64 { // want floatFact:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for n > 1 {
		f *= float64(n)
		n--
	}
	return f
}

// hwProbDirect is Levene's probability of nAB heterozygotes given the
// allele counts, 2^nAB N! nA! nB! / (nAA! nAB! nBB! (2N)!).
func hwProbDirect(nAA, nAB, nBB int) float64 {
	n := nAA + nAB + nBB
	nA := 2*nAA + nAB
	nB := 2*nBB + nAB
	num := math.Pow(2, float64(nAB)) * floatFact(n) * floatFact(nA) * floatFact(nB)
	return num / (floatFact(nAA) * floatFact(nAB) * floatFact(nBB) * floatFact(2*n)) // want `ratio of factorials in float64: the intermediate 2\^nAB·n!·nA!·nB! overflows to \+Inf first, at nAA = nAB = nBB = 24 \(all equal\)`
}

// HWExactTest is the Hardy–Weinberg exact test's p-value: the
// heterozygote distribution is built outward from its middle in units of
// the middle's probability, then normalised.
func HWExactTest(nAA, nAB, nBB int) float64 {
	n := nAA + nAB + nBB
	rare := 2*nAA + nAB
	if 2*nBB+nAB < rare {
		rare = 2*nBB + nAB
	}
	if n == 0 {
		return 1
	}
	probs := make([]float64, rare+1)
	mid := int(int64(rare) * int64(2*n-rare) / int64(2*n))
	if (rare-mid)%2 != 0 {
		mid++
	}
	if mid > rare {
		mid -= 2
	}
	probs[mid] = 1
	sum := 1.0
	hom1 := (rare - mid) / 2
	hom2 := n - mid - hom1
	for het := mid; het >= 2; het -= 2 {
		probs[het-2] = probs[het] * float64(het) * float64(het-1) / (4 * float64(hom1+1) * float64(hom2+1))
		sum += probs[het-2]
		hom1++
		hom2++
	}
	hom1 = (rare - mid) / 2
	hom2 = n - mid - hom1
	for het := mid; het <= rare-2; het += 2 {
		probs[het+2] = probs[het] * 4 * float64(hom1) * float64(hom2) / (float64(het+2) * float64(het+1))
		sum += probs[het+2]
		hom1--
		hom2--
	}
	if nAB > rare {
		return 0
	}
	pObs := probs[nAB]
	p := 0.0
	for _, v := range probs {
		if v <= pObs*(1+1e-9) {
			p += v
		}
	}
	return math.Min(1, p/sum)
}

// GenotypeMultinomial is the multinomial probability of the genotype
// counts under the given frequencies, N!/Π n_i! · Π f_i^n_i.
func GenotypeMultinomial(counts []int, freqs []float64) float64 {
	n := 0
	for _, c := range counts {
		n += c
	}
	v := floatFact(n)
	for i, c := range counts {
		v *= math.Pow(freqs[i], float64(c)) / floatFact(c) // want `power-over-factorial term \(freqs\[i\]\)\^c/c! in float64:`
	}
	return v
}

// MultinomialLog is the natural log of GenotypeMultinomial.
func MultinomialLog(counts []int, freqs []float64) float64 {
	n := 0
	for _, c := range counts {
		n += c
	}
	lp, _ := math.Lgamma(float64(n + 1))
	for i, c := range counts {
		lc, _ := math.Lgamma(float64(c + 1))
		lp += float64(c)*math.Log(freqs[i]) - lc
	}
	return lp
}

// Orderings counts the distinct orderings of a haplotype string, the
// multinomial of its letter counts, exactly.
func Orderings(seq string) *big.Int {
	tally := map[rune]int64{}
	var n int64
	for _, r := range seq {
		tally[r]++
		n++
	}
	res := new(big.Int).MulRange(1, n)
	for _, c := range tally {
		res.Quo(res, new(big.Int).MulRange(1, c))
	}
	return res
}
