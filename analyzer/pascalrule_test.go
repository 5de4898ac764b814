package analyzer

import (
	"math/big"
	"testing"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// pascalFirstWrongRow fills Pascal's triangle in the machine type T,
// as the category's code does, and returns the first row holding an
// entry that differs from the exact C(i, j) of math/big.
func pascalFirstWrongRow[T int32 | int64 | uint64](limit int) int64 {
	prev := []T{1}
	for i := 1; i <= limit; i++ {
		row := make([]T, i+1)
		row[0], row[i] = 1, 1
		for j := 1; j < i; j++ {
			row[j] = prev[j-1] + prev[j]
		}
		for j, v := range row {
			var got big.Int
			if _, unsigned := any(v).(uint64); unsigned {
				got.SetUint64(uint64(v))
			} else {
				got.SetInt64(int64(v))
			}
			if got.Cmp(new(big.Int).Binomial(int64(i), int64(j))) != 0 {
				return int64(i)
			}
		}
		prev = row
	}
	return -1
}

// TestPascalRuleThresholds checks the row the messages name, the first
// n whose C(n, ⌊n/2⌋) leaves the type, against a triangle filled in the
// machine type and math/big's exact coefficients.
func TestPascalRuleThresholds(t *testing.T) {
	for name, got := range map[string]int64{
		"int32":  pascalFirstWrongRow[int32](80),
		"int64":  pascalFirstWrongRow[int64](80),
		"uint64": pascalFirstWrongRow[uint64](80),
	} {
		num, ok := thresholds.Named(name, nil)
		if !ok {
			t.Fatalf("no type %s", name)
		}
		if want := thresholds.CentralBinomial(num).FirstBad; got != want {
			t.Errorf("%s: the triangle is first wrong at row %d, the threshold says %d", name, got, want)
		}
	}
}
