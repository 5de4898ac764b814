package valuemodel

import "testing"

// A local defined once, outside loops, from a value the algebra cannot
// say is a variable of its own: the binomial pmf over ki := ⌊k⌋ is
// still C(n, ki)·p^ki·(1−p)^(n−ki) (the textbook pmf, common
// practice). A local assigned again, or defined in a loop, stays
// unknown.
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
	ki = int(math.Ceil(k))
	return math.Pow(p, float64(ki))
}`, "?"},
		{"in a loop", `func f(n int, x float64) float64 {
	v := 1.0
	for i := 0; i < n; i++ {
		r := math.Sqrt(x)
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
