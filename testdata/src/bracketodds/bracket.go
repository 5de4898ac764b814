package bracketodds

import "math"

// Outcomes is the number of ways a single-elimination bracket of
// 2^rounds teams can be filled in.
func Outcomes(rounds int) float64 {
	return math.Pow(2, math.Pow(2, float64(rounds))-1)
}

// factF is n! in float64, counted with a float64 counter.
func factF(n float64) float64 { // want factF:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2.0; i <= n; i++ {
		r *= i
	}
	return r
}

// SeriesWin is the probability that a team winning each game with
// probability p takes a best-of-(2n-1) series: it wins n games while
// the opponent wins k < n.
func SeriesWin(n int, p float64) float64 { // want SeriesWin:`wrong for some n \(SeriesWin, bracketodds/bracket\.go:28\)`
	q := 1 - p
	s := 0.0
	for k := 0; k < n; k++ {
		ways := factF(float64(n-1+k)) / (factF(float64(k)) * factF(float64(n-1))) // want `SeriesWin computes C\(n \+ k - 1, n - 1\) in float64, which fits where factF\(float64\(n - 1 \+ k\)\) already overflow`
		s += ways * math.Pow(p, float64(n)) * math.Pow(q, float64(k))             // want `ratio of factorials in float64: the numerator`
	}
	return s
}

// SeriesWinRunning is SeriesWin with the term updated from the
// previous one.
func SeriesWinRunning(n int, p float64) float64 { // want SeriesWinRunning:`wrong for some n \(SeriesWinRunning, bracketodds/bracket\.go:39\)`
	q := 1 - p
	term := math.Pow(p, float64(n))
	s := term
	for k := 1; k < n; k++ { // want `running product term computes the probabilities C\(n \+ k - 1, k\)·p\^n·\(1−p\)\^k one factor at a time from \(p\)\^\(n\), which in float64 loses its digits for n ≥ 1023 and is 0 for n ≥ 1075 \(at p = 0\.5\)`
		term *= float64(n-1+k) / float64(k) * q
		s += term
	}
	return s
}

// SeriesWinLog is SeriesWin with each term from its logarithm.
func SeriesWinLog(n int, p float64) float64 {
	lp, lq := math.Log(p), math.Log1p(-p)
	ln1, _ := math.Lgamma(float64(n))
	s := 0.0
	for k := 0; k < n; k++ {
		a, _ := math.Lgamma(float64(n + k))
		b, _ := math.Lgamma(float64(k + 1))
		s += math.Exp(a - b - ln1 + float64(n)*lp + float64(k)*lq)
	}
	return s
}

// Seedings is the number of ways to seed n teams into n slots.
func Seedings(n uint64) uint64 { // want Seedings:`factorial of parameter 0, breaks from 21` Seedings:`wrong for some n \(Seedings, bracketodds/bracket\.go:62\)`
	s := uint64(1)
	for i := uint64(2); i <= n; i++ { // want `factorial of n in uint64 wraps for n ≥ 21`
		s *= i
	}
	return s
}

// DistinctBrackets is the number of seedings of n = 2^r teams that
// give different first-round pairings: n! / (2^(n/2) (n/2)!).
func DistinctBrackets(n uint64) uint64 { // want DistinctBrackets:`wrong for n ≥ 21 \(DistinctBrackets, bracketodds/bracket\.go:72\)`
	h := n / 2
	return Seedings(n) / (Seedings(h) << h) // want `ratio of factorials in uint64: the numerator n! wraps for n ≥ 21 before the division`
}

// MeetProb is the probability that two given teams meet somewhere in
// a random bracket of 2^rounds teams with every game a coin toss.
func MeetProb(rounds int) float64 {
	return 1 / math.Pow(2, float64(rounds-1))
}

// Schedules is the number of round-robin pairings of 2n teams in one
// round, (2n)! / (2^n n!), computed by the product of odd numbers.
func Schedules(n int) uint64 { // want Schedules:`wrong for some n \(Schedules, bracketodds/bracket\.go:85\)`
	r := uint64(1)
	for i := 1; i < 2*n; i += 2 { // want `double factorial of 2 \* n-1 in uint64 wraps for 2 \* n ≥ 35`
		r *= uint64(i)
	}
	return r
}
