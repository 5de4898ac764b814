// Package matchgoals models match scores with independent Poisson goal
// counts: score matrices, outcome probabilities, goal differences
// (Skellam), the Dixon–Coles correction and season counts.
package matchgoals

import "math"

func factorial(n int) int { // want factorial:`factorial of parameter 0, breaks from 21`
	f := 1
	for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that fits\); n is not`
		f *= i
	}
	return f
}

func poisson(k int, lambda float64) float64 {
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / float64(factorial(k)) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in int: the divisor k! wraps for k ≥ 21 \(20! ≈`
}

// ScoreMatrix returns P(home scores i, away scores j) for i, j ≤ maxGoals.
func ScoreMatrix(home, away float64, maxGoals int) [][]float64 {
	m := make([][]float64, maxGoals+1)
	for i := range m {
		m[i] = make([]float64, maxGoals+1)
		for j := range m[i] {
			m[i][j] = poisson(i, home) * poisson(j, away) // want `ScoreMatrix builds its result from poisson\(i, home\), which is wrong from k = 21 \(reported`
		}
	}
	return m
}

// OutcomeProbs returns the probabilities of a home win, a draw and an
// away win, over scores up to maxGoals.
func OutcomeProbs(home, away float64, maxGoals int) (win, draw, loss float64) {
	m := ScoreMatrix(home, away, maxGoals) // want `OutcomeProbs builds its result from ScoreMatrix\(home, away, maxGoals\), which is wrong for some values of maxGoals`
	for i, row := range m {
		for j, p := range row {
			switch {
			case i > j:
				win += p
			case i == j:
				draw += p
			default:
				loss += p
			}
		}
	}
	return win, draw, loss
}

// TotalGoalsCDF returns P(total goals ≤ k) for a match with expected
// total lambda. Rates above 600 are not goal counts and panic.
func TotalGoalsCDF(lambda float64, k int) float64 {
	if lambda > 600 {
		panic("matchgoals: rate out of range")
	}
	p := math.Exp(-lambda)
	cdf := p
	for i := 1; i <= k; i++ {
		p = p * lambda / float64(i)
		cdf += p
	}
	return cdf
}

// DixonColesTau returns the Dixon–Coles adjustment of the low scores.
func DixonColesTau(x, y int, lh, la, rho float64) float64 {
	switch {
	case x == 0 && y == 0:
		return 1 - lh*la*rho
	case x == 0 && y == 1:
		return 1 + lh*rho
	case x == 1 && y == 0:
		return 1 + la*rho
	case x == 1 && y == 1:
		return 1 - rho
	}
	return 1
}

// LogLik returns the Poisson log-likelihood of observed goal counts
// given their expected values.
func LogLik(goals []int, mu []float64) float64 {
	ll := 0.0
	for i, y := range goals {
		lg, _ := math.Lgamma(float64(y) + 1)
		ll += float64(y)*math.Log(mu[i]) - mu[i] - lg
	}
	return ll
}

// EloExpected returns the expected score of a side rated ra against rb.
func EloExpected(ra, rb float64) float64 {
	return 1 / (1 + math.Pow(10, (rb-ra)/400))
}
