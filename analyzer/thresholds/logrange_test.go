package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestLogRange checks the logarithms against the type limits of package
// math and math/big's exact powers of two.
func TestLogRange(t *testing.T) {
	for _, c := range []struct {
		name   string
		lo, hi float64
	}{
		{"float64", math.Log(math.SmallestNonzeroFloat64 * (1 << 52)), math.Log(math.MaxFloat64)},
		{"float32", math.Log(float64(math.SmallestNonzeroFloat32) * (1 << 23)), math.Log(math.MaxFloat32)},
		{"int64", 0, bigLog(new(big.Int).Lsh(big.NewInt(1), 63))},
		{"uint32", 0, bigLog(new(big.Int).Lsh(big.NewInt(1), 32))},
		{"int8", 0, math.Log(128)},
	} {
		n, ok := Named(c.name, nil)
		if !ok {
			t.Fatal(c.name)
		}
		lo, hi := LogRange(n)
		if math.Abs(lo-c.lo) > 1e-12 || math.Abs(hi-c.hi) > 1e-9 {
			t.Errorf("LogRange(%s) = %v, %v; want %v, %v", c.name, lo, hi, c.lo, c.hi)
		}
	}
}

func bigLog(x *big.Int) float64 {
	f, _ := new(big.Float).SetInt(x).Float64()
	return math.Log(f)
}
