// Package fixseries is a kiln-cooling lab's series code: sums and terms
// whose true values are small although a factorial inside them no longer
// fits a float64. Past that point the code still returns the right
// value, and a fix must not make it panic there.
package fixseries

import "math"

// factorial returns n! in float64.
func factorial(n int) float64 { // want factorial:"factorial of parameter 0"
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// Decay is the kiln's cooling term a^(k+1)/k!. Past k = 170 the divisor
// is +Inf, and for a ≤ 1 the term is then below the smallest float64, so
// 0 is its correctly rounded value; for a larger a it is not, and the
// rewrite takes the product in log space.
func Decay(a float64, k int) float64 { // want Decay:`value \(p0\)\^\(p1 \+ 1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Decay:`wrong for k ≥ 171`
	return math.Pow(a, float64(k+1)) / factorial(k) // want `term with a\^\(k \+ 1\) over k! in float64`
}

// Label prints the number of firing orders of n trays.
func Label(n int) float64 { // want Label:"factorial of parameter 0"
	return factorial(n)
}

// ExpSeries sums 1 + x + x^2/2! + ... + x^terms/terms!, keeping the
// factorial in the loop that sums the terms.
func ExpSeries(x float64, terms int) float64 { // want ExpSeries:`wrong for some terms`
	sum, fact := 1.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		fact *= float64(k)
		sum += math.Pow(x, float64(k)) / fact
	}
	return sum
}

// Tail is 1/n!, the weight of the n-th term, from an integer product
// converted at the end; carried as a Product, it keeps 1/n! where n!
// alone leaves float64 and the quotient is subnormal (171 ≤ n ≤ 177).
func Tail(n int) float64 { // want Tail:`wrong for some n`
	p := 1.0
	for i := 1; i <= n; i++ { // want "factorial of n in float64"
		p *= float64(i)
	}
	return 1 / p
}

// ExpTail sums the same series and also returns the last factorial, so
// the running factorial stays: only the terms could be rewritten, and a
// fix that kept half the loop's state is not offered.
func ExpTail(x float64, terms int) (float64, float64) { // want ExpTail:`wrong for some terms`
	sum, fact := 1.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		fact *= float64(k)
		sum += math.Pow(x, float64(k)) / fact
	}
	return sum, fact
}

// Lagged adds x^k/(k-1)!: the term reads the factorial before its
// update, so it is no x^k/k! and keeps its loop as written.
func Lagged(x float64, terms int) float64 { // want Lagged:`wrong for some terms`
	sum, fact := 0.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		sum += math.Pow(x, float64(k)) / fact
		fact *= float64(k)
	}
	return sum
}

// Shifted adds x^(k+1)/k!, whose power is not the factorial's count.
func Shifted(x float64, terms int) float64 { // want Shifted:`wrong for some terms`
	sum, fact := 0.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		fact *= float64(k)
		sum += math.Pow(x, float64(k+1)) / fact
	}
	return sum
}

// CoolingSum is ExpSeries written with its own declarations and the
// update spelled out in full, over an int64 count.
func CoolingSum(rate float64, steps int64) float64 { // want CoolingSum:`wrong for some steps`
	var sum float64 = 1
	f := 1.0
	for j := int64(1); j <= steps; j++ { // want "factorial of steps in float64"
		f = f * float64(j)
		sum += math.Pow(rate, float64(j)) / f
	}
	return sum
}

// CoolingPower keeps the power beside the factorial, as x^k/k! is often
// written: both overflow long before their quotient does.
func CoolingPower(x float64, terms int) float64 { // want CoolingPower:`wrong for some terms`
	sum, fact, pow := 1.0, 1.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		fact *= float64(k)
		pow *= x
		sum += pow / fact
	}
	return sum
}

// LateCount is the chance that a kiln sees at most n cracks in a batch
// whose mean is lambda: a Poisson sum with its factorial in the loop.
func LateCount(lambda float64, n int) float64 { // want LateCount:`wrong for some n`
	cdf, fact := math.Exp(-lambda), 1.0
	for k := 1; k <= n; k++ { // want "factorial of n in float64"
		fact *= float64(k)
		cdf += math.Exp(-lambda) * math.Pow(lambda, float64(k)) / fact
	}
	return cdf
}

// PowerFirst reads the power before it is updated, so its term is
// x^(k-1)/k! and it keeps its loop.
func PowerFirst(x float64, terms int) float64 { // want PowerFirst:`wrong for some terms`
	sum, fact, pow := 0.0, 1.0, 1.0
	for k := 1; k <= terms; k++ { // want "factorial of terms in float64"
		fact *= float64(k)
		sum += pow / fact
		pow *= x
	}
	return sum
}

// ModeNorm is 1/√(2^n·n!·√π), the normaliser of the kiln wall's n-th
// Hermite temperature mode: 2^n·n! leaves float64 from n = 151 and n!
// from 171, while the normaliser stays a normal float64 up to n = 267
// (bounds from Python's math.lgamma).
func ModeNorm(n int) float64 { // want ModeNorm:`wrong for some n`
	f := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171`
		f *= float64(i)
	}
	return 1 / math.Sqrt(math.Pow(2, float64(n))*f*math.Sqrt(math.Pi))
}
