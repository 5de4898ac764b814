// Package switchboard sizes the lines of a hotel's telephone exchange:
// the share of calls that find every line busy and the chance that a
// guest waits for an operator, from the offered load in erlangs. Its
// factorials are kept in caches, so each is multiplied once.
package switchboard

import "math"

// seen holds the line factorials computed so far.
var seen = map[int]float64{0: 1, 1: 1}

// lineFact is n!, remembered in seen.
func lineFact(n int) float64 { // want lineFact:`factorial of parameter 0, breaks from 171`
	if v, ok := seen[n]; ok {
		return v
	}
	f := float64(n) * lineFact(n-1)
	seen[n] = f
	return f
}

// BusyShare is the share of calls that find all lines busy (Erlang's
// loss formula): load^lines/lines! over the sum of load^i/i!.
func BusyShare(load float64, lines int) float64 { // want BusyShare:`wrong for some lines`
	top := math.Pow(load, float64(lines)) / lineFact(lines) // want `power-over-factorial term load\^lines/lines! in float64: the divisor lines! overflows to \+Inf for lines ≥ 171 .*lines is not bounded here`
	sum := 0.0
	for i := 0; i <= lines; i++ {
		sum += math.Pow(load, float64(i)) / lineFact(i) // want `power-over-factorial term load\^i/i! in float64: the divisor i! overflows to \+Inf for i ≥ 171`
	}
	return top / sum
}

// operatorTable holds the operator factorials, filled on first use.
var operatorTable [400]float64

// operatorFact is n!, kept in operatorTable.
func operatorFact(n int) float64 { // want operatorFact:`factorial of parameter 0, breaks from 171`
	if operatorTable[n] != 0 {
		return operatorTable[n]
	}
	if n < 2 {
		return 1
	}
	operatorTable[n] = float64(n) * operatorFact(n-1)
	return operatorTable[n]
}

// WaitChance is the chance that a guest waits for one of operators
// operators (Erlang's delay formula), for a load below operators.
func WaitChance(load float64, operators int) float64 { // want WaitChance:`wrong for some operators`
	c := float64(operators)
	if load >= c {
		return 1
	}
	last := math.Pow(load, c) / operatorFact(operators) * c / (c - load) // want `term with load\^c over operators! in float64: the divisor operators! overflows to \+Inf for operators ≥ 171`
	sum := last
	for k := 0; k < operators; k++ {
		sum += math.Pow(load, float64(k)) / operatorFact(k) // want `power-over-factorial term load\^k/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
	}
	return last / sum
}

// ringOrders holds the counts of orders in which rooms can be rung.
var ringOrders = []int{1}

// RingOrders is the number of orders in which n rooms can be rung, n!.
func RingOrders(n int) int { // want RingOrders:`factorial of parameter 0, breaks from 21` RingOrders:`wrong for n ≥ 21`
	if n < len(ringOrders) {
		return ringOrders[n]
	}
	r := n * RingOrders(n-1) // want `recursive factorial of n in int wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest that fits\); n is not bounded here`
	ringOrders = append(ringOrders, r)
	return r
}

// FreeShare is the loss formula by its recurrence over the lines,
// B(i) = load·B(i−1)/(i + load·B(i−1)): no power and no factorial.
func FreeShare(load float64, lines int) float64 {
	b := 1.0
	for i := 1; i <= lines; i++ {
		b = load * b / (float64(i) + load*b)
	}
	return b
}

// DeskShare is the loss formula for the front desk, which has at most
// twelve lines and at most forty erlangs of load.
func DeskShare(load float64, lines int) float64 {
	if lines < 0 || lines > 12 || load < 0 || load > 40 {
		return math.NaN()
	}
	top := math.Pow(load, float64(lines)) / lineFact(lines)
	sum := 0.0
	for i := 0; i <= lines; i++ {
		sum += math.Pow(load, float64(i)) / lineFact(i)
	}
	return top / sum
}
