package valuemodel

import "testing"

// BenchmarkEvaluate measures one small guarded factorial function, the
// kind the model evaluates in bulk (go test -bench Evaluate -benchmem).
func BenchmarkEvaluate(b *testing.B) {
	t := &testing.T{}
	info, fd := load(t, `func f(n uint) uint64 {
	if n > 20 {
		return 0
	}
	var f uint64 = 1
	for i := uint64(2); i <= uint64(n); i++ {
		f *= i
	}
	return f
}`, "f")
	b.ReportAllocs()
	b.ResetTimer()
	for range b.N {
		Evaluate(info, fd, Options{})
	}
}
