// Package shares splits a shipment between two docks: it carries a fact
// only on a function that returns a slice of probabilities.
package shares

import "math"

// Split returns the chance that j of n crates go to the first dock,
// each with even odds, for every j: C(n, j)/2^n from n! as Γ(n+1),
// which is +Inf from n = 171 while every share is at most 1.
func Split(n int) []float64 {
	p := make([]float64, n+1)
	for j := range p {
		p[j] = math.Gamma(float64(n+1)) / (math.Gamma(float64(j+1)) * math.Gamma(float64(n-j+1))) * math.Pow(0.5, float64(n))
	}
	return p
}
