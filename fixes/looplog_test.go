package fixes_test

import "math/big"

// The greenhouse planner's binomial coefficients, each a quotient of
// running products counted in float64 (a falling product over a
// factorial in two loops, or n! over the factors one loop multiplies in
// under conditions): past 170 factors both products are +Inf and the
// quotient NaN where C(n, k) fits up to n = 1029. The fix carries the
// products as the helper's Product.
func init() {
	fixPackages = append(fixPackages, "fixlooplog")
	diffCases = append(diffCases,
		// Negative n and k past n included: the loop's k factors down
		// from n (0 among them for k > n ≥ 0) over k!.
		diffCase{pkg: "fixlooplog", fn: "Plots", loops: []string{"n := -10; n <= 1100; n += 13", "k := 0; k <= n+5; k += 1 + max(n, 0)/9"}, args: "float64(n), float64(k)", typ: "float64", ref: refDownOverFactorial},
		diffCase{pkg: "fixlooplog", fn: "Trays", loops: []string{"n := 0; n <= 1100; n += 13", "k := 0; k <= n; k += 1 + n/9"}, args: "float64(n), float64(k)", typ: "float64", ref: refChoose},
	)
}

// refDownOverFactorial is n(n−1)…(n−k+1)/k! for a whole n of either sign
// and k ≥ 0, in math/big (the generalised binomial coefficient, DLMF
// 26.3.1 read for any n; common practice).
func refDownOverFactorial(x []float64) *big.Float {
	return quo(refProductDown(x), bf(factorialBig(int64(x[1]))))
}
