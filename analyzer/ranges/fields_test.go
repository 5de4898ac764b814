package ranges

import "testing"

var fieldCases = []struct {
	name, src string
}{
	{"guarded field of a struct parameter", `package p
type plan struct{ batch, lots int }
func fact(n int) int { return n }
func draws(c plan) int {
	if c.batch < 0 || c.batch > 20 {
		return 0
	}
	return fact(c.batch/*@range [0, 20]*/) + c.lots/*@range (-inf, +inf)*/
}`},
	{"field assignment and update", `package p
type plan struct{ batch int }
func draws() int {
	var c plan
	c.batch = 4
	c.batch += 3
	c.batch++
	return c.batch/*@range [8, 8]*/
}`},
	{"whole assignment forgets the fields", `package p
type plan struct{ batch int }
func load() plan { return plan{} }
func draws(c plan) int {
	if c.batch > 20 {
		return 0
	}
	c = load()
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"field through a pointer is unknown", `package p
type plan struct{ batch int }
func draws(c *plan) int {
	if c.batch > 20 {
		return 0
	}
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"address of the struct", `package p
type plan struct{ batch int }
func tweak(c *plan) { c.batch = 99 }
func draws(c plan) int {
	if c.batch > 20 {
		return 0
	}
	tweak(&c)
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"address of the field", `package p
type plan struct{ batch int }
func tweak(p *int) { *p = 99 }
func draws(c plan) int {
	if c.batch > 20 {
		return 0
	}
	tweak(&c.batch)
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"pointer method on the struct", `package p
type plan struct{ batch int }
func (c *plan) grow() { c.batch *= 10 }
func draws(c plan) int {
	if c.batch > 20 {
		return 0
	}
	c.grow()
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"closure writing the field", `package p
type plan struct{ batch int }
func draws(c plan) int {
	if c.batch > 20 {
		return 0
	}
	f := func() { c.batch = 99 }
	f()
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"field counter in a loop", `package p
type tally struct{ n int }
func count() int {
	var t tally
	for i := 0; i < 10; i++ {
		t.n = i
	}
	return t.n/*@range [0, 9]*/
}`},
	{"composite literal sets the fields", `package p
type plan struct {
	batch, lots int
	name        string
	spare       uint8
}
func fact(n int) int { return n }
func draws(n int) int {
	c := plan{batch: 12, name: "line 4"}
	d := plan{3, n, "x", 7}
	s := fact(c.batch/*@range [12, 12]*/)
	s += fact(c.lots/*@range [0, 0]*/)
	s += fact(int(c.spare/*@range [0, 0]*/))
	s += fact(d.batch/*@range [3, 3]*/)
	return s + fact(d.lots/*@range (-inf, +inf)*/)
}`},
	{"literal through a pointer sets nothing", `package p
type plan struct{ batch int }
func draws() int {
	c := &plan{batch: 12}
	return c.batch/*@range (-inf, +inf)*/
}`},
	{"range over structs refreshes the variable", `package p
type plan struct{ batch int }
func fact(n int) int { return n }
func draws(ps []plan) int {
	s := 0
	for _, p := range ps {
		if p.batch > 12 {
			continue
		}
		s += fact(p.batch/*@range (-inf, 12]*/)
	}
	return s
}`},
}

func TestFields(t *testing.T) {
	for _, c := range fieldCases {
		t.Run(c.name, func(t *testing.T) { checkMarkers(t, c.src, Options{}) })
	}
}
