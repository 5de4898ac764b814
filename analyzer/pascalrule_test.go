package analyzer

import (
	"math/big"
	"testing"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// machineBig returns a machine integer's value as math/big holds it.
func machineBig[T int32 | int64 | uint64](v T) *big.Int {
	if _, unsigned := any(v).(uint64); unsigned {
		return new(big.Int).SetUint64(uint64(v))
	}
	return big.NewInt(int64(v))
}

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
			if machineBig(v).Cmp(new(big.Int).Binomial(int64(i), int64(j))) != 0 {
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

// triangleFirstWrongRow fills a Stirling triangle in the machine type T,
// as the code the category reports does, beside the same triangle in
// math/big, and returns the first row holding an entry that differs.
func triangleFirstWrongRow[T int32 | int64 | uint64](tr thresholds.Triangle, limit int) int64 {
	prev, exact := []T{1}, []*big.Int{big.NewInt(1)}
	for i := 1; i <= limit; i++ {
		row, ex := make([]T, i+1), make([]*big.Int, i+1)
		for j := 0; j <= i; j++ {
			w := j
			if tr == thresholds.StirlingFirst {
				w = i - 1
			}
			ex[j] = new(big.Int)
			if j < i {
				row[j] = T(w) * prev[j]
				ex[j].Mul(big.NewInt(int64(w)), exact[j])
			}
			if j > 0 {
				row[j] += prev[j-1]
				ex[j].Add(ex[j], exact[j-1])
			}
			if machineBig(row[j]).Cmp(ex[j]) != 0 {
				return int64(i)
			}
		}
		prev, exact = row, ex
	}
	return -1
}

// TestTriangleThresholds checks the rows the Stirling-number messages
// name (stirlingnumbers.go) against triangles filled in the machine type
// and in math/big.
func TestTriangleThresholds(t *testing.T) {
	for _, tr := range []thresholds.Triangle{thresholds.StirlingSecond, thresholds.StirlingFirst} {
		for name, got := range map[string]int64{
			"int32":  triangleFirstWrongRow[int32](tr, 80),
			"int64":  triangleFirstWrongRow[int64](tr, 80),
			"uint64": triangleFirstWrongRow[uint64](tr, 80),
		} {
			num, ok := thresholds.Named(name, nil)
			if !ok {
				t.Fatalf("no type %s", name)
			}
			if want := thresholds.TriangleLimitRow(tr, num); got != want {
				t.Errorf("triangle %d, %s: first wrong at row %d, the threshold says %d", tr, name, got, want)
			}
		}
	}
}

// TestBellTriangleThresholds fills the Bell triangle in each machine
// type, as BellRows in testdata/src/pascalrule/stirling.go does, beside
// the same triangle in math/big, and checks that the first row holding
// a wrong entry is the one the message names.
func TestBellTriangleThresholds(t *testing.T) {
	check := func(name string, got int64) {
		num, _ := thresholds.Named(name, nil)
		if l, _ := thresholds.BellTriangleLimit(num); got != l.FirstBad {
			t.Errorf("%s: the Bell triangle is first wrong at row %d, the threshold says %d", name, got, l.FirstBad)
		}
	}
	check("int32", bellFirstWrongRow[int32](60))
	check("int64", bellFirstWrongRow[int64](60))
	check("uint64", bellFirstWrongRow[uint64](60))
}

func bellFirstWrongRow[T int32 | int64 | uint64](limit int) int64 {
	prev, exact := []T{1}, []*big.Int{big.NewInt(1)}
	for i := 1; i <= limit; i++ {
		row, ex := make([]T, i+1), make([]*big.Int, i+1)
		row[0], ex[0] = prev[i-1], exact[i-1]
		for j := 1; j <= i; j++ {
			row[j] = row[j-1] + prev[j-1]
			ex[j] = new(big.Int).Add(ex[j-1], exact[j-1])
		}
		for j := range row {
			if machineBig(row[j]).Cmp(ex[j]) != 0 {
				return int64(i)
			}
		}
		prev, exact = row, ex
	}
	return -1
}
