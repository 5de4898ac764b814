package linkbudget

import "math"

// ErlangB is the blocking probability of a trunk group with n circuits offered a erlangs.
func ErlangB(a float64, n int) float64 { // want ErlangB:`wrong for some n`
	num := math.Pow(a, float64(n)) / fact(n) // want `power-over-factorial term a\^n/n! in float64: the divisor n! overflows`
	den := 0.0
	for i := 0; i <= n; i++ {
		den += math.Pow(a, float64(i)) / fact(i) // want `power-over-factorial term a\^i/i! in float64: the divisor i! overflows`
	}
	return num / den
}

// ErlangBStable is the same blocking probability by the recurrence on n.
func ErlangBStable(a float64, n int) float64 {
	b := 1.0
	for i := 1; i <= n; i++ {
		b = a * b / (float64(i) + a*b)
	}
	return b
}

// ErlangC is the chance that a request has to wait for a free circuit.
func ErlangC(a float64, n int) float64 { // want ErlangC:`wrong for some n`
	fct := 1.0
	sum := 0.0
	for k := 0; k < n; k++ { // want `running factorial fct computes k! inside the sum that divides by it: i`
		if k > 0 {
			fct *= float64(k)
		}
		sum += math.Pow(a, float64(k)) / fct
	}
	top := math.Pow(a, float64(n)) / (fct * float64(n)) * float64(n) / (float64(n) - a)
	return top / (sum + top)
}
