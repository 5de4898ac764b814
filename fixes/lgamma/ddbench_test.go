package lgamma

import "testing"

var sinkD dd

func BenchmarkDDExp(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkD = ddExp(dd{float64(i%100) * 0.37, 0})
	}
}

func BenchmarkDDLog(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkD = ddLog(dd{float64(i%100) + 1.5, 0})
	}
}

func BenchmarkDDMul(b *testing.B) {
	x := dd{1.0000001, 1e-20}
	for i := 0; i < b.N; i++ {
		x = x.mul(dd{1.0000001, 1e-20})
	}
	sinkD = x
}

func BenchmarkDDLogFast(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkD = ddLogFast(dd{float64(i%100) + 1.5, 0})
	}
}
