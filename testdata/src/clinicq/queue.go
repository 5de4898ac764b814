package clinicq

import (
	"errors"
	"math"
)

// Queue is an M/M/c model of a walk-in clinic.
type Queue struct {
	Arrival float64 // patients per hour
	Service float64 // patients per hour per doctor
	Servers int
}

func factorial(n float64) float64 { // want factorial:`factorial of parameter 0`
	r := 1.0
	for i := 2.0; i <= n; i++ {
		r *= i
	}
	return r
}

// WaitProb is the chance an arriving patient has to wait (Erlang C).
func (q Queue) WaitProb() float64 { // want WaitProb:`wrong for some q`
	a := q.Arrival / q.Service
	c := float64(q.Servers)
	sum := 0.0
	for k := 0.0; k < c; k++ {
		sum += math.Pow(a, k) / factorial(k) // want `power-over-factorial term a\^k/k! in float64: the divisor k! overflows`
	}
	last := math.Pow(a, c) / factorial(c) * c / (c - a) // want `power-over-factorial term a\^c/c! in float64: the divisor c! overflows`
	return last / (sum + last)
}

// IdleProb is the chance that every doctor is free.
func (q Queue) IdleProb() float64 { // want IdleProb:`wrong for some q`
	a := q.Arrival / q.Service
	c := q.Servers
	rho := a / float64(c)
	sum := 0.0
	for k := 0; k < c; k++ {
		sum += math.Pow(a, float64(k)) / factorial(float64(k)) // want `power-over-factorial term a\^k/\(float64\(k\)\)! in float64: the divisor \(f`
	}
	sum += math.Pow(a, float64(c)) / (factorial(float64(c)) * (1 - rho)) // want `term with a\^c over \(float64\(c\)\)! in float64: the divisor \(float64\(c\)\)!`
	return 1 / sum
}

var errTooLarge = errors.New("clinicq: more doctors than the table covers")

// WaitProbSmall is Erlang C for clinics with at most 60 doctors.
func (q Queue) WaitProbSmall() (float64, error) {
	if q.Servers > 60 || q.Servers < 1 {
		return 0, errTooLarge
	}
	a := q.Arrival / q.Service
	if a >= float64(q.Servers) {
		return 1, nil
	}
	term, sum := 1.0, 1.0
	for k := 1; k < q.Servers; k++ {
		term *= a / float64(k)
		sum += term
	}
	term *= a / float64(q.Servers)
	last := term * float64(q.Servers) / (float64(q.Servers) - a)
	return last / (sum + last), nil
}
