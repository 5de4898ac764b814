package thresholds

import (
	"fmt"
	"go/types"
	"strings"
	"testing"
)

// TestPrintTable prints the thresholds table of docs/thresholds.md:
//
//	go test -run TestPrintTable -v ./analyzer/thresholds
//
// and checks that each row carries the values of the shape functions.
func TestPrintTable(t *testing.T) {
	for _, arch := range []string{"amd64", "386"} {
		sizes := types.SizesFor("gc", arch)
		rows := Table(sizes)
		if len(rows) != 13 {
			t.Fatalf("%s: %d rows, want 13", arch, len(rows))
		}
		var b strings.Builder
		fmt.Fprintf(&b, "gc/%s\n\n", arch)
		b.WriteString("| type | bits | largest n with n! | C(n,n/2) as n!/(k!(n-k)!) | by the loop | true C(n,n/2) | Γ(x) overflows at |\n")
		b.WriteString("|---|---|---|---|---|---|---|\n")
		for _, r := range rows {
			checkRow(t, r)
			gamma := "-"
			if r.Type.Float {
				gamma = fmt.Sprint(r.Gamma)
			}
			fmt.Fprintf(&b, "| %s | %d | %s | %s | %s | %s | %s |\n", r.Type, r.Type.Bits,
				cell(r.Factorial), cell(r.CentralRatio), cell(r.CentralLoop), cell(r.CentralTrue), gamma)
		}
		t.Log("\n" + b.String())
	}
	if got := Table(nil, mustNamed(t, "int8", nil)); len(got) != 1 || got[0].Factorial.FirstBad != 6 {
		t.Errorf("Table(nil, int8) = %+v", got)
	}
}

// cell shows the largest good n and the result there.
func cell(l Limit) string {
	return fmt.Sprintf("%d (%s)", l.FirstBad-1, l.LastGoodApprox())
}

func checkRow(t *testing.T, r Row) {
	t.Helper()
	if r.Factorial.FirstBad != Factorial(r.Type).FirstBad ||
		r.CentralRatio.FirstBad != Factorial(r.Type).FirstBad ||
		r.CentralLoop.FirstBad != CentralBinomialLoop(r.Type).FirstBad ||
		r.CentralTrue.FirstBad != CentralBinomial(r.Type).FirstBad ||
		r.Gamma != GammaFirstBad(r.Type) {
		t.Errorf("row %s disagrees with the shape functions", r.Type)
	}
	// The three ways to compute C(n, n/2) break in this order, since
	// C(n, k) < k·C(n, k) ≤ n! for n ≥ 2 (common practice).
	if !(r.CentralRatio.FirstBad <= r.CentralLoop.FirstBad && r.CentralLoop.FirstBad <= r.CentralTrue.FirstBad) {
		t.Errorf("row %s: ratio %d, loop %d, true %d out of order", r.Type,
			r.CentralRatio.FirstBad, r.CentralLoop.FirstBad, r.CentralTrue.FirstBad)
	}
}
