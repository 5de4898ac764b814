package ranges

import "testing"

var flowCases = []struct {
	name, src string
}{
	{"value assigned on every path", `package p
func cases(short bool) int {
	top := 6
	if short {
		top = 3
	}
	return top/*@range [3, 6]*/
}`},
	{"value assigned on one path only", `package p
func cases(short bool, n int) int {
	top := 6
	if short {
		top = n
	}
	return top/*@range (-inf, +inf)*/
}`},
	{"named result starts at zero", `package p
func crates(full bool) (n int) {
	if full {
		n = 24
	}
	return n/*@range [0, 24]*/
}`},
	{"compound assignment", `package p
func crates() int {
	n := 4
	n += 2
	n *= 3
	n -= 1
	n++
	n--
	n /= 2
	return n/*@range [8, 8]*/
}`},
	{"parallel assignment swaps", `package p
func swap() int {
	a, b := 1, 9
	a, b = b, a
	return a*10 + b/*@range [91, 91]*/
}`},
	{"tuple from a call is unknown", `package p
func two() (int, int) { return 1, 2 }
func use() int {
	a, b := two()
	return a/*@range (-inf, +inf)*/ + b
}`},
	{"address taken makes top from there", `package p
func set(p *int) { *p = 99 }
func sample() int {
	n := 5
	m := n/*@range [5, 5]*/
	set(&n)
	return m + n/*@range (-inf, +inf)*/
}`},
	{"address taken inside a loop makes top throughout it", `package p
func set(p *int) { *p = 99 }
func sample() int {
	n, s := 5, 0
	for i := 0; i < 3; i++ {
		s += n/*@range (-inf, +inf)*/
		set(&n)
	}
	return s
}`},
	{"closure that assigns", `package p
func sample() int {
	n := 5
	bump := func() { n = 40 }
	bump()
	return n/*@range (-inf, +inf)*/
}`},
	{"closure that only reads", `package p
func sample() int {
	n := 5
	show := func() int { return n/*@range (-inf, +inf)*/ }
	_ = show
	return n/*@range [5, 5]*/
}`},
	{"closure locals are its own", `package p
func sample() func() int {
	return func() int {
		k := 7
		return k/*@range [7, 7]*/
	}
}`},
	{"deferred closure modifying a result", `package p
func sample() (n int) {
	n = 3
	defer func() { n *= 100 }()
	return n/*@range (-inf, +inf)*/
}`},
	{"pointer method call takes the address", `package p
type count int
func (c *count) bump() { *c += 50 }
func sample() count {
	var c count = 2
	c.bump()
	return c/*@range (-inf, +inf)*/
}`},
	{"value method does not", `package p
type count int
func (c count) twice() count { return 2 * c }
func sample() count {
	var c count = 2
	_ = c.twice()
	return c/*@range [2, 2]*/
}`},
	{"shadowed names are different variables", `package p
func sample(short bool) int {
	n := 20
	if short {
		n := 3
		_ = n/*@range [3, 3]*/
	}
	return n/*@range [20, 20]*/
}`},
	{"package variables are always top", `package p
var limit = 10
func sample() int {
	limit = 4
	return limit/*@range (-inf, +inf)*/
}`},
	{"var declarations", `package p
func sample() (int, float64) {
	var a int
	var b, c = 2, 3.5
	var d uint8
	e := int(d)/*@range [0, 0]*/
	return a/*@range [0, 0]*/ + b/*@range [2, 2]*/ + e, c/*@range [3, 4]*/
}`},
	{"float loop bounds", `package p
func term(x float64) float64 {
	if x < 0 || x > 170 {
		return 0
	}
	return x/*@range [0, 170]*/
}`},
	{"float strict bound rounds outwards", `package p
func term(x float64) float64 {
	if x < 170.5 {
		return x/*@range (-inf, 171]*/
	}
	return 0
}`},
	{"converted comparison refines the integer", `package p
func term(n int) float64 {
	if float64(n) > 170 {
		return 0
	}
	return float64(n)/*@range (-inf, 170]*/
}`},
	{"offset comparison refines when it cannot wrap", `package p
func term(n int) int {
	if n < 0 || n > 1000 {
		return 0
	}
	if n+1 > 21 {
		return 0
	}
	return n/*@range [0, 20]*/
}`},
	// n may be MaxInt64, and then n+1 wraps to MinInt64 and passes.
	{"offset comparison that may wrap does not", `package p
func term(n int) int {
	if n+1 > 21 {
		return 0
	}
	return n/*@range (-inf, +inf)*/
}`},
	{"and chain refines the right operand", `package p
func fact(n int) int { return n }
func ok(n int) bool {
	return n <= 20 && fact(n/*@range (-inf, 20]*/) > 0
}`},
	{"or chain refines the right operand", `package p
func fact(n int) int { return n }
func ok(n int) bool {
	return n > 20 || fact(n/*@range (-inf, 20]*/) > 0
}`},
	{"generic integer parameter", `package p
type whole interface{ ~int | ~int64 }
func seats[T whole](n T) T {
	if n < 0 || n > 12 {
		return 0
	}
	return n/*@range [0, 12]*/
}`},
	{"generic parameter that may be int8 wraps early", `package p
type small interface{ ~int8 | ~int64 }
func seats[T small](n T) T {
	if n < 100 || n > 120 {
		return 0
	}
	return n + 10/*@range (-inf, +inf)*/
}`},
	// Go spec, "Type parameter declarations": a type set may mix integer
	// and float types, so nothing about i's values is known statically.
	{"loop variable of a type parameter with integers and floats", `package p
type amount interface{ ~int | ~float64 }
func fact[T amount](n T) T {
	p := T(1)
	for i := T(2); i <= n; i++ {
		p *= i/*@range (-inf, +inf)*/
	}
	return p/*@range (-inf, +inf)*/
}`},
	{"counter of a type parameter with integers and floats", `package p
type amount interface{ ~int | ~float64 }
func tally[T amount](n T) T {
	var j T
	for j = 0; j < 10; j++ {
		_ = j/*@range (-inf, +inf)*/
	}
	return j
}`},
	{"generic without a numeric core", `package p
func seats[T any](n T) T {
	return n
}
func use(n int) int {
	if n > 3 {
		return 0
	}
	return seats(n)/*@range (-inf, +inf)*/
}`},
	{"goto target forgets facts", `package p
func retry(n int) int {
	k := 0
again:
	m := k/*@range (-inf, +inf)*/
	k = m + 1
	if k < 3 {
		goto again
	}
	return k/*@range [3, +inf)*/
}`},
	{"labeled break and continue", `package p
func grid(n int) int {
	s := 0
outer:
	for i := 0; i < 8; i++ {
		for j := 0; j < 8; j++ {
			if j > i {
				continue outer
			}
			if i*j > n {
				break outer
			}
			s += j/*@range [0, 7]*/
		}
	}
	return s
}`},
	{"select joins its clauses", `package p
func pick(a, b chan int) int {
	n := 0
	select {
	case <-a:
		n = 1
	case <-b:
		n = 2
	}
	return n/*@range [1, 2]*/
}`},
	{"type switch keeps facts", `package p
func kind(v any) int {
	n := 4
	switch v.(type) {
	case int:
		n = 5
	case string:
	}
	return n/*@range [4, 5]*/
}`},
	{"unreachable after return", `package p
func gone(n int) int {
	return 0
	return n/*@range empty*/
}`},
	{"constant false branch", `package p
const debug = false
func gone(n int) int {
	if debug {
		return n/*@range empty*/
	}
	return 1
}`},
	{"impossible guard is unreachable", `package p
func gone(n int) int {
	if n < 0 || n > 10 {
		return 0
	}
	if n > 12 {
		return n/*@range empty*/
	}
	return n
}`},
}

func TestFlow(t *testing.T) {
	for _, c := range flowCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{}) })
	}
}
