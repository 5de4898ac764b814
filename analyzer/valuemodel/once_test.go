package valuemodel

import "testing"

// A local defined once, outside loops, from a value the algebra cannot
// say is a variable of its own: the binomial pmf over ki := ⌊k⌋ is
// still C(n, ki)·p^ki·(1−p)^(n−ki) (the textbook pmf, common
// practice). A local assigned again holds a new variable from that
// assignment on, distinct from the first (the quotient of the two
// powers is no 1); one assigned in a loop stays unknown.
func TestEvaluateDefinedOnce(t *testing.T) {
	tests := []struct {
		name, src, want string
	}{
		{"floor", `func f(n int, k, p float64) float64 {
	ki := int(math.Floor(k))
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(ki + 1))
	c, _ := math.Lgamma(float64(n - ki + 1))
	return math.Exp(a-b-c) * math.Pow(p, float64(ki)) * math.Pow(1-p, float64(n-ki))
}`, "C(n, ki)·p^ki·(1−p)^(n - ki)"},
		{"assigned again", `func f(n int, k, p float64) float64 {
	ki := int(math.Floor(k))
	lo := ki
	ki = int(math.Ceil(k))
	return math.Pow(p, float64(ki)) / math.Pow(p, float64(lo))
}`, "1/(p)^(ki - ki)"},
		{"in a loop", `func f(n int, x float64) float64 {
	v := 1.0
	for i := 0; i < n; i++ {
		r := math.Sin(x)
		v *= r
	}
	return v
}`, "?"},
	}
	for _, tt := range tests {
		info, fd := load(t, tt.src, "f")
		got := returned(Evaluate(info, fd, Options{}), fd)
		s := got.String()
		if f := Recognise(got); f.Kind != Unknown {
			s = f.String()
		}
		if s != tt.want {
			t.Errorf("%s: got %s, want %s", tt.name, s, tt.want)
		}
	}
}

// A struct local defined once from calls: its numeric fields are
// variables, so a power of one over a factorial of another is named.
func TestEvaluateStructDefinedOnce(t *testing.T) {
	src := `type arg struct{ Number float64 }

func get(i int) arg { return arg{float64(i)} }

func f() float64 {
	x, n := get(1), get(2)
	return math.Pow(x.Number, n.Number) / math.Gamma(n.Number+1)
}`
	info, fd := load(t, src, "f")
	got := returned(Evaluate(info, fd, Options{}), fd)
	if f := Recognise(got); f.String() != "x.Number^n.Number/n.Number!" {
		t.Errorf("got %s (%s), want x.Number^n.Number/n.Number!", got, f)
	}
}
