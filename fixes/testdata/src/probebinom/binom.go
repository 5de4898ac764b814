// Package probebinom holds ratios of factorials for the fix builders: a
// staffing estimator that counts ways to pick on-call rotas.
package probebinom

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func factU(n uint64) uint64 {
	r := uint64(1)
	for i := uint64(2); i <= n; i++ {
		r *= i
	}
	return r
}

func factF(n int) float64 {
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

func fact32(n int32) int32 {
	r := int32(1)
	for i := int32(2); i <= n; i++ {
		r *= i
	}
	return r
}

// Rotas counts the ways to pick k agents out of n.
func Rotas(n, k int) int {
	// probe:binomial(n,k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial"
}

// RotasU is Rotas in unsigned arithmetic.
func RotasU(n, k uint64) uint64 {
	// probe:binomial(n,k)
	return factU(n) / (factU(k) * factU(n-k)) // want "probe binomial"
}

// RotaShare is Rotas as a float, for probabilities.
func RotaShare(n, k int) float64 {
	// probe:binomial(n,k)
	return factF(n) / (factF(k) * factF(n-k)) // want "probe binomial"
}

// Rotas32 is narrower than the exact helpers, so their result is checked
// to fit before the conversion.
func Rotas32(n, k int32) int32 {
	// probe:binomial(n,k)
	return fact32(n) / (fact32(k) * fact32(n-k)) // want "probe binomial"
}

// Orders counts ordered picks of k agents out of n.
func Orders(n, k int) int {
	// probe:permutation(n,k)
	return fact(n) / fact(n-k) // want "probe permutation"
}

// OrdersF is Orders as a float.
func OrdersF(n, k int) float64 {
	// probe:permutation(n,k)
	return factF(n) / factF(n-k) // want "probe permutation"
}

// Shifts counts the ways to split a+b+c agents into three named shifts.
func Shifts(a, b, c int) int {
	// probe:multinomial(a,b,c)
	return fact(a+b+c) / (fact(a) * fact(b) * fact(c)) // want "probe multinomial"
}

// ShiftsF is Shifts as a float.
func ShiftsF(a, b, c int) float64 {
	// probe:multinomial(a,b,c)
	return factF(a+b+c) / (factF(a) * factF(b) * factF(c)) // want "probe multinomial"
}

// Queues counts well-formed call/answer sequences of n pairs.
func Queues(n int) int {
	// probe:catalan(n)
	return fact(2*n) / (fact(n+1) * fact(n)) // want "probe catalan"
}

// QueuesF is Queues as a float.
func QueuesF(n int) float64 {
	// probe:catalan(n)
	return factF(2*n) / (factF(n+1) * factF(n)) // want "probe catalan"
}

// Share takes a float count, truncated inside the factorials: the
// operand n is not what the factorials read.
func Share(n float64, k int) float64 {
	// probe:binomial(n,k)
	return factF(int(n)) / (factF(k) * factF(int(n)-k)) // want "probe binomial: no fix: the expression is not the binomial coefficient of its operands"
}

// Stepwise builds the ratio through locals, which the rewrite deletes.
func Stepwise(n, k int) int {
	num := fact(n)
	den := fact(k) * fact(n-k) // the denominator
	// probe:binomial(n, k)
	return num / den // want "probe binomial"
}

// Reused reads its numerator twice, so the local stays and no fix is
// offered.
func Reused(n, k int) (int, int) {
	num := fact(n)
	den := fact(k) * fact(n-k)
	// probe:binomial(n, k)
	return num / den, num // want "probe binomial: no fix: operand n lies outside"
}

// Moved changes k between the definitions and the ratio.
func Moved(n, k int) int {
	num := fact(n)
	den := fact(k) * fact(n-k)
	k++
	// probe:binomial(n, k)
	return num / den // want "probe binomial: no fix: k changes before the expression"
}

// Scaled has a factor of its own in a local; the rewrite would drop it.
func Scaled(n, k int) int {
	scale := 2
	num := fact(n)
	den := fact(k) * fact(n-k)
	// probe:binomial(n, k)
	return scale * num / den // want "probe binomial: no fix: the rewrite would drop scale"
}

const pair = 2

// Twice has a constant factor, which the helper would not reproduce.
func Twice(n, k int) int {
	// probe:binomial(n, k)
	return 2 * fact(n) / (fact(k) * fact(n-k)) // want "probe binomial: no fix: the rewrite would drop the factor 2"
}

// Pairs divides by a named constant as well.
func Pairs(n, k int) int {
	// probe:binomial(n, k)
	return fact(n) / (pair * fact(k) * fact(n-k)) // want "probe binomial: no fix: the rewrite would drop the factor pair"
}
