package thresholds

import (
	"math"
	"math/big"
	"math/rand/v2"
	"testing"
)

func TestPowerFirstBad(t *testing.T) {
	// 2^63 > MaxInt64 ≥ 2^62; 2^1024 > MaxFloat64 ≥ 2^1023; 2^128 >
	// MaxFloat32 (IEEE 754 exponent ranges, common practice).
	tests := []struct {
		name string
		x    float64
		want int64
	}{
		{"int64", 2, 63}, {"uint64", 2, 64}, {"int8", 2, 7}, {"uint8", -2, 8},
		{"float64", 2, 1024}, {"float32", 2, 128}, {"float64", 10, 309},
		{"int64", 10, 19}, {"uint64", 10, 20},
		{"float64", 1, math.MaxInt64}, {"float64", 0.5, math.MaxInt64},
		{"float64", math.NaN(), math.MaxInt64}, {"float64", math.Inf(-1), 1},
	}
	for _, tt := range tests {
		if got := PowerFirstBad(mustNamed(t, tt.name, nil), tt.x); got != tt.want {
			t.Errorf("PowerFirstBad(%s, %v) = %d, want %d", tt.name, tt.x, got, tt.want)
		}
	}
}

// TestPowerExact checks non-integer bases exactly: the float64 x is a
// dyadic rational m·2^e, so x^k is compared with max as integers.
func TestPowerExact(t *testing.T) {
	for _, name := range []string{"int32", "int64", "float32", "float64"} {
		typ := mustNamed(t, name, nil)
		max := typ.MaxInt()
		// Bases with limits below about 2000, so the exact powers stay
		// cheap; bases near 1 are checked in TestPowerNearOne.
		for _, x := range []float64{1.5, 2.5, 3.14159, 7.389, 1e10, 1.7976931348623157e308} {
			k := PowerFirstBad(typ, x)
			if powerExceeds(x, k, max) != true || (k > 0 && powerExceeds(x, k-1, max)) {
				t.Errorf("PowerFirstBad(%s, %v) = %d fails the exact check", name, x, k)
			}
		}
	}
}

// powerExceeds reports whether x^k > max, with x = m·2^e exactly:
// m^k·2^(ek) > max ⟺ m^k > max·2^(−ek) when ek < 0.
func powerExceeds(x float64, k int64, max *big.Int) bool {
	mant := new(big.Float).SetFloat64(x)
	me := new(big.Float)
	e := mant.MantExp(me)
	// me in [0.5, 1): scale to a 53-bit integer.
	mi, _ := new(big.Float).SetMantExp(me, 53).Int(nil)
	e -= 53
	lhs := new(big.Int).Exp(mi, big.NewInt(k), nil)
	rhs := new(big.Int).Set(max)
	shift := int64(e) * k
	if shift >= 0 {
		lhs.Lsh(lhs, uint(shift))
	} else {
		rhs.Lsh(rhs, uint(-shift))
	}
	return lhs.Cmp(rhs) > 0
}

// TestPowerNearOne checks bases just above 1, whose limits run to
// millions, against k ≈ ln(max)/log1p(x−1), an independent float64
// formula (x−1 is exact here by Sterbenz's lemma).
func TestPowerNearOne(t *testing.T) {
	for _, name := range []string{"int32", "int64", "float64"} {
		typ := mustNamed(t, name, nil)
		for _, x := range []float64{1.0001, 1.0000001, 1 + 0x1p-40} {
			k := PowerFirstBad(typ, x)
			mf, _ := new(big.Float).SetInt(typ.MaxInt()).Float64()
			want := math.Log(mf) / math.Log1p(x-1)
			if math.Abs(float64(k)-want) > 1+1e-9*want {
				t.Errorf("PowerFirstBad(%s, %v) = %d, want ≈ %.1f", name, x, k, want)
			}
		}
	}
}

// TestPowerRandomExact checks pseudo-random bases in [1.05, 10^6) exactly
// (a fixed seed keeps the run reproducible).
func TestPowerRandomExact(t *testing.T) {
	r := rand.New(rand.NewPCG(1, 2))
	for _, name := range []string{"int64", "uint32", "float32", "float64"} {
		typ := mustNamed(t, name, nil)
		max := typ.MaxInt()
		for range 40 {
			x := math.Exp(math.Log(1.05) + r.Float64()*(math.Log(1e6)-math.Log(1.05)))
			k := PowerFirstBad(typ, x)
			if !powerExceeds(x, k, max) || (k > 0 && powerExceeds(x, k-1, max)) {
				t.Errorf("PowerFirstBad(%s, %v) = %d fails the exact check", name, x, k)
			}
		}
	}
}
