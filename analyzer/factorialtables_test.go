package analyzer

import (
	"math"
	"math/big"
	"testing"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// The table cases are in testdata/src/factorialratio/tables.go, checked
// with the category's other cases by TestCategories.

// TestFactorialTablesProbe shows two of those cases' wrong values beside
// math/big: Sprouts(200, 100, 1/2) from a float64 table is NaN (200! is
// +Inf, so is 100!·100!) where the exact C(200, 100)/2^200 is about
// 0.056, and RowPlans(25, 2) from an int64 table is not 25·24 = 600,
// as 25! and 23! have wrapped.
func TestFactorialTablesProbe(t *testing.T) {
	var tray [500]float64
	tray[0] = 1
	for i := 1; i < len(tray); i++ {
		tray[i] = tray[i-1] * float64(i)
	}
	got := tray[200] / (tray[100] * tray[100]) * math.Pow(0.5, 100) * math.Pow(0.5, 100)
	exact, _ := new(big.Rat).SetFrac(new(big.Int).Binomial(200, 100), new(big.Int).Lsh(big.NewInt(1), 200)).Float64()
	if !math.IsNaN(got) || !(exact > 0.05 && exact < 0.06) {
		t.Errorf("Sprouts(200, 100, 1/2) = %v, exact %v: want NaN where the exact value is about 0.056", got, exact)
	}
	orders := make([]int64, 26)
	orders[0] = 1
	run := int64(1)
	for i := 1; i <= 25; i++ {
		run *= int64(i)
		orders[i] = run
	}
	want := new(big.Int).Quo(new(big.Int).MulRange(1, 25), new(big.Int).MulRange(1, 23))
	if plans := orders[25] / orders[23]; !want.IsInt64() || plans == want.Int64() {
		t.Errorf("RowPlans(25, 2) = %d, exact %v: want a wrong value where the exact one fits int64", plans, want)
	}
}

// TestFactorialTableFillProbe shows the fill the table-fill finding
// names (TrayOrders in testdata/src/factorialratio/tables.go) beside
// math/big: its element n is n! up to n = 20 and wrong from 21 on, the
// first index the message gives.
func TestFactorialTableFillProbe(t *testing.T) {
	tbl := make([]int64, 26)
	tbl[0] = 1
	for i := 1; i < len(tbl); i++ {
		tbl[i] = tbl[i-1] * int64(i)
	}
	firstWrong := -1
	for i := range tbl {
		exact := new(big.Int).MulRange(1, int64(i))
		if (!exact.IsInt64() || exact.Int64() != tbl[i]) && firstWrong < 0 {
			firstWrong = i
		}
	}
	if firstWrong != 21 {
		t.Errorf("first wrong element of the int64 factorial table: %d, want 21 (the message's n ≥ 21)", firstWrong)
	}
}

// appendFirstWrong grows a table by append as the append-grown cases in
// testdata/src/factorialratio/tables.go do (CheckOrders, RackOrders) and
// returns the first index whose element is not math/big's m!.
func appendFirstWrong[T int64 | uint64](limit int) int64 {
	f := []T{1}
	for len(f) <= limit {
		m := len(f)
		f = append(f, f[m-1]*T(m))
	}
	for i, v := range f {
		if machineBig(v).Cmp(new(big.Int).MulRange(1, int64(i))) != 0 {
			return int64(i)
		}
	}
	return -1
}

// TestAppendTableProbe checks the index the append-grown tables'
// messages give, the first factorial past the type (thresholds.Factorial),
// against a table grown in the machine type and math/big.
func TestAppendTableProbe(t *testing.T) {
	for name, got := range map[string]int64{"int64": appendFirstWrong[int64](30), "uint64": appendFirstWrong[uint64](30)} {
		num, _ := thresholds.Named(name, nil)
		if want := thresholds.Factorial(num).FirstBad; got != want {
			t.Errorf("%s: the grown table is first wrong at %d, the threshold says %d", name, got, want)
		}
	}
}
