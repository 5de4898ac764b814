package factorialratio

// Multinomial coefficients as products of binomial coefficients over a
// loop's parts (analyzer/modelmultinomial.go), as a seed bank counts the
// ways to share seed lots among its trays. The thresholds are checked
// against products formed in the machine type and math/big by
// TestBinomialPartsThresholds.

// lotChoose is C(n, k) by the multiplicative loop.
func lotChoose(n, k int64) int64 { // want lotChoose:`binomial of parameter 0`
	r := int64(1)
	for i := int64(1); i <= k; i++ { // want `multiplicative binomial loop`
		r = r * (n - k + i) / i
	}
	return r
}

// LotShares counts the ways to share the lots among trays, the running
// total updated first.
func LotShares(lots []int64) int64 {
	ways, total := int64(1), int64(0)
	for _, l := range lots {
		total += l
		ways *= lotChoose(total, l) // want `loop multiplies lotChoose\(total, l\) into ways over the parts l in int64: the product is the multinomial coefficient \(Σ parts\)!/Π part!, which wraps where it leaves int64: from total = 21 with parts of 1, whose factors 1, 2, … all fit, where it is 21! \(20! ≈ 2\.43e18 is the largest that fits\), and from total = 67 with two equal parts, where it is C\(67, 33\)`
	}
	return ways
}

// TrayShares takes the sum after the product, by index.
func TrayShares(sizes []int) int64 {
	ways := int64(1)
	seen := 0
	for i := 0; i < len(sizes); i++ {
		ways = ways * lotChoose(int64(seen+sizes[i]), int64(sizes[i])) // want `loop multiplies lotChoose\(int64\(seen\+sizes\[i\]\), int64\(sizes\[i\]\)\) into ways over the parts sizes\[i\] in int64: the product is the multinomial coefficient`
		seen += sizes[i]
	}
	return ways
}

// FloatShares keeps the product in float64, whose +Inf past the type is
// IEEE's answer: no multinomial finding. Each factor is converted only
// after lotChoose has formed it in int64, whose loop wraps from total =
// 62 at l = total/2 (lots {31, 31}: C(62, 31) ≈ 4.65e17, math/big),
// far below float64's limit: a late conversion.
func FloatShares(lots []int64) float64 {
	ways, total := 1.0, int64(0)
	for _, l := range lots {
		total += l
		ways *= float64(lotChoose(total, l)) // want `lotChoose\(total, l\) computes C\(total, l\) in int64, which wraps for total ≥ 62 at l = total/2, before the conversion to float64 \(which holds C\(n, n/2\) up to n = 1029\)`
	}
	return ways
}

// PairShares picks pairs, not the parts: no multinomial, silent.
func PairShares(lots []int64) int64 {
	ways, total := int64(1), int64(0)
	for _, l := range lots {
		total += l
		ways *= lotChoose(total, 2)
	}
	return ways
}

// ModShares reduces the product modulo a prime: silent.
func ModShares(lots []int64) int64 {
	ways, total := int64(1), int64(0)
	for _, l := range lots {
		total += l
		ways = ways * lotChoose(total, l) % 1_000_000_007
	}
	return ways
}

// FewShares shares at most 20 seeds in all: silent.
func FewShares(lots [4]int64) int64 {
	ways, total := int64(1), int64(0)
	for _, l := range lots {
		total += l
		if l < 0 || total > 20 {
			return 0
		}
		ways *= lotChoose(total, l)
	}
	return ways
}

// Splits counts the ways to sow k of n seeds in one bed and j of the
// rest in another, a trinomial n!/(k!·j!·(n−k−j)!). The input the
// message names is checked against a math/big scan by
// TestChooseProductWitness (analyzer/thresholds).
func Splits(n, k, j int64) int64 { // want Splits:`wrong for some n or some k or some j`
	return lotChoose(n, k) * lotChoose(n-k, j) // want `product of binomial coefficients lotChoose\(n, k\) \* lotChoose\(n-k, j\) in int64 wraps where it leaves int64 while every factor fits: first at n = \d+, k = \d+, j = \d+ by the largest argument, where lotChoose\(n, k\) ≈ \S+ and lotChoose\(n-k, j\) ≈ \S+ fit and the product ≈ \S+ does not`
}

// FloatSplits multiplies in float64: no product finding, but each
// coefficient is formed in int64 first (late conversions).
func FloatSplits(n, k, j int64) float64 { // want FloatSplits:`wrong for some n or some k`
	return float64(lotChoose(n, k)) * float64(lotChoose(n-k, j)) // want `lotChoose\(n, k\) computes C\(n, k\) in int64, which wraps for n ≥ 62 at k = n/2` `lotChoose\(n-k, j\) computes C\(n - k, j\) in int64, which wraps for n - k ≥ 62 at j = \(n - k\)/2`
}

// SmallSplits sows at most 30 seeds, whose trinomials fit int64: silent.
func SmallSplits(n, k, j int64) int64 {
	if n < 0 || n > 30 || k < 0 || k > 30 || j < 0 || j > 30 {
		return 0
	}
	return lotChoose(n, k) * lotChoose(n-k, j)
}

// ScaledSplit has a factor besides the binomials: left to other rules.
func ScaledSplit(n, k, w int64) int64 {
	return w * lotChoose(n, k) * lotChoose(n, k)
}

// CheckedShares refuses a product past int64 before forming it: silent.
func CheckedShares(lots []int64) (int64, bool) {
	ways, total := int64(1), int64(0)
	for _, l := range lots {
		total += l
		b := lotChoose(total, l)
		if ways > (1<<63-1)/b {
			return 0, false
		}
		ways *= lotChoose(total, l)
	}
	return ways, true
}
