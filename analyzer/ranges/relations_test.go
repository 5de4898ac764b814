package ranges

import "testing"

var relationCases = []struct {
	name, src string
}{
	{"binomial guard then size guard", `package p
func fact(n int) int { return n }
func choose(n, k int) int {
	if k < 0 || k > n {
		return 0
	}
	if n > 20 {
		return -1
	}
	return fact(n) / (fact(k/*@range [0, 20]*/) * fact(n-k/*@range [0, 20]*/))
}`},
	{"without the relation the difference is unknown", `package p
func fact(n int) int { return n }
func choose(n, k int) int {
	if k < 0 || n > 20 {
		return 0
	}
	return fact(n-k/*@range (-inf, +inf)*/)
}`},
	{"loop counter below the limit", `package p
func fact(n int) int { return n }
func falling(n int) int {
	if n > 20 {
		return 0
	}
	r := 1
	for i := 0; i < n; i++ {
		r *= fact(n-i/*@range [1, 20]*/)
	}
	return r
}`},
	{"range key below its limit", `package p
func fact(n int) int { return n }
func falling(n int) int {
	if n > 20 {
		return 0
	}
	r := 1
	for i := range n {
		r *= fact(n-i/*@range [1, 20]*/)
	}
	return r
}`},
	// n−i reaches −2 for n = 5 here, so no i < n fact may be used; n is
	// widened downwards, and the difference may wrap.
	{"range limit changed in the body", `package p
func fact(n int) int { return n }
func falling(n int) int {
	if n > 20 || n < 0 {
		return 0
	}
	r := 1
	for i := range n {
		n--
		r *= fact(n-i/*@range (-inf, +inf)*/)
	}
	return r
}`},
	{"assignment kills the relation", `package p
func fact(n int) int { return n }
func choose(n, k int, wide bool) int {
	if k < 0 || k > n || n > 20 {
		return 0
	}
	if wide {
		k = 2 * n
	}
	return fact(n-k/*@range [-40, 20]*/)
}`},
	{"offsets on both sides", `package p
func fact(n int) int { return n }
func pick(n, m int) int {
	if n < 0 || n > 30 || m < 0 || m > 30 {
		return 0
	}
	if n+2 > m+5 {
		return 0
	}
	return fact(m-n/*@range [-3, 30]*/)
}`},
	{"a relation only one branch has is dropped", `package p
func fact(n int) int { return n }
func pick(n, m int, c bool) int {
	if n < 0 || n > 30 || m < 0 || m > 30 {
		return 0
	}
	if c {
		if m > n {
			return 0
		}
	}
	return fact(n-m/*@range [-30, 30]*/)
}`},
}

func TestRelations(t *testing.T) {
	for _, c := range relationCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{}) })
	}
}

func TestRelationEscapes(t *testing.T) {
	checkMarkers(t, `package p
func set(p *int) { *p = 50 }
func fact(n int) int { return n }
func choose(n, k int) int {
	if k < 0 || k > n {
		return 0
	}
	set(&k)
	if n > 20 {
		return -1
	}
	return fact(n-k/*@range (-inf, +inf)*/)
}`, Options{})
}
