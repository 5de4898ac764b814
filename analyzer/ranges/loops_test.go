package ranges

import "testing"

var loopCases = []struct {
	name, src string
}{
	{"counting up to a guarded bound", `package p
func waysToSeat(n int) int {
	if n < 0 || n > 20 {
		return 0
	}
	r := 1
	for i := 2; i <= n; i++ {
		r *= i/*@range [2, 20]*/
	}
	return r
}`},
	{"labelled break out of a nested loop", `package p
func packCrates(n int) int {
	r := 1
outer:
	for i := 1; i <= n; i++ {
		for j := 0; j < 3; j++ {
			if i > 4 {
				break outer
			}
		}
		r *= i/*@range [1, 4]*/
	}
	return r
}`},
	{"goto out of a nested loop", `package p
func packCrates(n int) int {
	r := 1
	for i := 1; i <= n; i++ {
		for j := 0; j < 3; j++ {
			if i > 4 {
				goto done
			}
		}
		r *= i/*@range [1, 4]*/
	}
done:
	return r
}`},
	{"a loop that may run no trip keeps its entry state at the exit", `package p
func packCrates(n, m int) int {
	if n > 20 {
		return 0
	}
	r := 1
	for i := 1; i <= n; i++ {
		for j := 0; j < m; j++ {
			if i > 4 {
				break
			}
		}
		r *= i/*@range [1, 20]*/
	}
	return r
}`},
	{"counting up to an unbounded n", `package p
func waysToSeat(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i/*@range (-inf, +inf)*/
	}
	return r
}`},
	{"strict bound keeps the lower end", `package p
func waysToSeat(n int) int {
	r := 1
	for i := 1; i < n; i++ {
		r *= i/*@range [1, 9223372036854775806]*/
	}
	return r
}`},
	{"counting down", `package p
func waysToSeat(n int) int {
	if n > 20 {
		return 0
	}
	r := 1
	for i := n; i > 1; i-- {
		r *= i/*@range [2, 20]*/
	}
	return r
}`},
	{"counting down unbounded", `package p
func waysToSeat(n int) int {
	r := 1
	for i := n; i > 1; i-- {
		r *= i/*@range [2, +inf)*/
	}
	return r
}`},
	{"step two", `package p
func evenCrews(n int) int {
	if n > 20 {
		return 0
	}
	s := 0
	for i := 0; i <= n; i += 2 {
		s += i/*@range [0, 20]*/
	}
	return s
}`},
	{"integer range", `package p
func tally(n int) int {
	if n > 21 {
		return 0
	}
	s := 0
	for i := range n {
		s += i/*@range [0, 20]*/
	}
	return s
}`},
	{"integer range unbounded", `package p
func tally(n int) int {
	s := 0
	for i := range n {
		s += i/*@range [0, 9223372036854775806]*/
	}
	return s
}`},
	{"array range", `package p
func tally(faces [6]int) int {
	s := 0
	for i := range faces {
		s += i/*@range [0, 5]*/
	}
	for i := range &faces {
		s += i/*@range [0, 5]*/
	}
	return s
}`},
	{"slice range", `package p
func tally(faces []int) int {
	s := 0
	for i := range faces {
		s += i/*@range [0, 9223372036854775806]*/
	}
	return s
}`},
	{"while loop counting down", `package p
func drain(n int) int {
	if n > 15 {
		return 0
	}
	r := 1
	for n > 1 {
		r *= n/*@range [2, 15]*/
		n--
	}
	return n/*@range (-inf, 1]*/
}`},
	{"while loop from an unbounded start", `package p
func drain(n int) int {
	r := 1
	for n > 1 {
		r *= n/*@range [2, +inf)*/
		n--
	}
	return r
}`},
	{"exit value of an up loop", `package p
func lastIndex(n int) int {
	if n < 0 || n > 20 {
		return 0
	}
	i := 2
	for ; i <= n; i++ {
	}
	return i/*@range [2, 21]*/
}`},
	{"nested loops compose", `package p
func pairs(n int) int {
	if n < 0 || n > 10 {
		return 0
	}
	s := 0
	for i := 0; i < n; i++ {
		for j := i; j < n; j++ {
			s += j/*@range [0, 9]*/
		}
	}
	return s
}`},
	{"nested loop with an unbounded inner limit", `package p
func pairs(n, m int) int {
	if n < 0 || n > 10 {
		return 0
	}
	s := 0
	for i := 0; i < n; i++ {
		for j := i; j <= m; j++ {
			s += i/*@range [0, 9]*/ + j/*@range (-inf, +inf)*/
		}
	}
	return s
}`},
	{"break leaves early", `package p
func firstFull(n int) int {
	i := 0
	for ; i < 100; i++ {
		if i*i > n {
			break
		}
	}
	return i/*@range [0, 100]*/
}`},
	// Once widened to [0, MaxInt64], s += 3 may wrap (the domain does
	// not relate s to i), so the whole int range is the sound answer;
	// NoWrap keeps the lower end.
	{"accumulator is widened", `package p
func total(n int) int {
	if n > 10 {
		return 0
	}
	s := 0
	for i := 0; i < n; i++ {
		s += 3
	}
	return s/*@range (-inf, +inf)*/
}`},
	{"float counter up to a float bound", `package p
func gammaTerm(x float64) float64 {
	if x < 1 || x > 170 {
		return 0
	}
	g := 1.0
	for t := 1.0; t < x; t++ {
		g *= t/*@range [1, 170]*/
	}
	return g
}`},
	{"float counter with no bound", `package p
func gammaTerm(x float64) float64 {
	g := 1.0
	for t := 1.0; t < x; t++ {
		g *= t/*@range [1, +inf)*/
	}
	return g
}`},
	{"recursive step down", `package p
func fact(n int) int {
	if n <= 1 {
		return 1
	}
	return n * fact(n-1/*@range [1, 9223372036854775806]*/)
}`},
	{"infinite loop without break is not left", `package p
func serve(n int) int {
	for {
		n++
	}
	return n/*@range empty*/
}`},
	{"empty range body is unreachable", `package p
func none() int {
	s := 0
	for i := range 0 {
		s += i/*@range empty*/
	}
	return s/*@range [0, 0]*/
}`},
}

func TestLoops(t *testing.T) {
	for _, c := range loopCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{}) })
	}
}

var noWrapCases = []struct {
	name, src string
}{
	{"accumulator keeps its lower end", `package p
func total(n int) int {
	if n > 10 {
		return 0
	}
	s := 0
	for i := 0; i < n; i++ {
		s += 3
	}
	return s/*@range [0, +inf)*/
}`},
	{"decrement after an upper guard", `package p
func prev(n int) int {
	if n > 20 {
		return 0
	}
	return n - 1/*@range (-inf, 19]*/
}`},
	{"counter against an unbounded limit", `package p
func waysToSeat(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i/*@range [2, +inf)*/
	}
	return r
}`},
}

func TestNoWrap(t *testing.T) {
	for _, c := range noWrapCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{NoWrap: true}) })
	}
}
