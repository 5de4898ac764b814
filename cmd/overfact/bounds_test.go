package main

import (
	"encoding/json"
	"math"
	"math/big"
	"strings"
	"testing"
	"unicode/utf8"
)

// maxOf is the largest value of each type, from the Go specification
// (Numeric types); float maxima are exact integers.
func maxOf(t *testing.T, name string, intBits int) *big.Int {
	t.Helper()
	signed := func(bits uint) *big.Int {
		return new(big.Int).Sub(new(big.Int).Lsh(big.NewInt(1), bits-1), big.NewInt(1))
	}
	unsigned := func(bits uint) *big.Int {
		return new(big.Int).Sub(new(big.Int).Lsh(big.NewInt(1), bits), big.NewInt(1))
	}
	switch name {
	case "int8":
		return signed(8)
	case "int32":
		return signed(32)
	case "int64":
		return signed(64)
	case "int":
		return signed(uint(intBits))
	case "uint16":
		return unsigned(16)
	case "uint64":
		return unsigned(64)
	case "float32":
		i, _ := big.NewFloat(math.MaxFloat32).Int(nil)
		return i
	case "float64":
		i, _ := big.NewFloat(math.MaxFloat64).Int(nil)
		return i
	}
	t.Fatalf("no maximum for %s", name)
	return nil
}

// walkFirstBad returns the smallest n >= 1 for which value(n) exceeds max,
// by walking n upwards with math/big.
func walkFirstBad(max *big.Int, value func(n int64) *big.Int) int64 {
	for n := int64(1); ; n++ {
		if value(n).Cmp(max) > 0 {
			return n
		}
	}
}

func factorial(n int64) *big.Int { return new(big.Int).MulRange(1, n) }

func centralBinomial(n int64) *big.Int { return new(big.Int).Binomial(n, n/2) }

// loopPeak is the largest intermediate of b = b*(n-k+i)/i, i = 1..k,
// k = n/2: the product b*(n-k+i) formed before each division.
func loopPeak(n int64) *big.Int {
	k := n / 2
	b, peak := big.NewInt(1), big.NewInt(1)
	for i := int64(1); i <= k; i++ {
		b.Mul(b, big.NewInt(n-k+i))
		if b.Cmp(peak) > 0 {
			peak.Set(b)
		}
		b.Quo(b, big.NewInt(i))
	}
	return peak
}

type jsonLimit struct {
	LastGood      *int64 `json:"lastGood"`
	LastGoodValue string `json:"lastGoodValue"`
	FirstBad      *int64 `json:"firstBad"`
}

type jsonRow struct {
	Type          string    `json:"type"`
	Bits          int       `json:"bits"`
	Factorial     jsonLimit `json:"factorial"`
	CentralRatio  jsonLimit `json:"centralRatio"`
	CentralLoop   jsonLimit `json:"centralLoop"`
	CentralTrue   jsonLimit `json:"centralTrue"`
	GammaFirstBad *float64  `json:"gammaFirstBad"`
}

func boundsJSON(t *testing.T, args ...string) []jsonRow {
	t.Helper()
	r := runIn(t, ".", nil, append([]string{"bounds", "-json"}, args...)...)
	if r.code != 0 {
		t.Fatalf("bounds %v: code %d, stderr %s", args, r.code, r.stderr)
	}
	var rows []jsonRow
	if err := json.Unmarshal([]byte(r.stdout), &rows); err != nil {
		t.Fatalf("bounds %v: %v\n%s", args, err, r.stdout)
	}
	return rows
}

func checkLimit(t *testing.T, what string, l jsonLimit, max *big.Int, value func(int64) *big.Int) {
	t.Helper()
	want := walkFirstBad(max, value)
	if l.FirstBad == nil || *l.FirstBad != want || l.LastGood == nil || *l.LastGood != want-1 {
		t.Errorf("%s: firstBad %v lastGood %v, want %d and %d", what, ptr(l.FirstBad), ptr(l.LastGood), want, want-1)
	}
}

func ptr(p *int64) any {
	if p == nil {
		return nil
	}
	return *p
}

// TestBoundsAgainstBig checks each column of the table against a walk
// with math/big over the exact values: n!, C(n, n/2) and the
// intermediates of the multiplicative loop. Known points, from memory
// and OEIS A000142 (factorials): 20! = 2432902008176640000 fits int64
// and 21! does not; 170! is the last factorial below the float64 maximum.
func TestBoundsAgainstBig(t *testing.T) {
	rows := boundsJSON(t, "int8", "int32", "int64", "uint16", "uint64", "float32", "float64")
	if len(rows) != 7 {
		t.Fatalf("got %d rows, want 7", len(rows))
	}
	for _, row := range rows {
		max := maxOf(t, row.Type, 64)
		checkLimit(t, row.Type+" n!", row.Factorial, max, factorial)
		// The ratio form computes n! first, so it breaks with n!.
		checkLimit(t, row.Type+" C(n,n/2) ratio", row.CentralRatio, max, factorial)
		checkLimit(t, row.Type+" C(n,n/2) loop", row.CentralLoop, max, loopPeak)
		checkLimit(t, row.Type+" C(n,n/2)", row.CentralTrue, max, centralBinomial)
		if row.Factorial.LastGood != nil {
			if want := factorial(*row.Factorial.LastGood).String(); row.Factorial.LastGoodValue != want {
				t.Errorf("%s: largest n! = %s, want %s", row.Type, row.Factorial.LastGoodValue, want)
			}
		}
	}
	if got := *rows[2].Factorial.FirstBad; got != 21 || rows[2].Factorial.LastGoodValue != "2432902008176640000" {
		t.Errorf("int64: n! breaks at %d with largest %s, want 21 and 2432902008176640000 (OEIS A000142)", got, rows[2].Factorial.LastGoodValue)
	}
	if got := *rows[6].Factorial.FirstBad; got != 171 {
		t.Errorf("float64: n! breaks at %d, want 171", got)
	}
}

// TestBoundsGamma checks the float64 Gamma column against the standard
// library's math.Gamma: finite just below the threshold, +Inf at it.
func TestBoundsGamma(t *testing.T) {
	rows := boundsJSON(t, "float64", "int64")
	g := rows[0].GammaFirstBad
	if g == nil {
		t.Fatal("float64 row has no Gamma threshold")
	}
	if !math.IsInf(math.Gamma(*g), 1) || math.IsInf(math.Gamma(math.Nextafter(*g, 0)), 0) {
		t.Errorf("Γ threshold %v: math.Gamma there = %v, just below = %v", *g, math.Gamma(*g), math.Gamma(math.Nextafter(*g, 0)))
	}
	if rows[1].GammaFirstBad != nil {
		t.Errorf("int64 row has a Gamma threshold %v", *rows[1].GammaFirstBad)
	}
}

// TestBoundsArch checks that -arch decides the width of int: 32 bits on
// 386, where 13! = 6227020800 no longer fits (OEIS A000142).
func TestBoundsArch(t *testing.T) {
	for _, tt := range []struct {
		arch string
		bits int
	}{{"386", 32}, {"amd64", 64}, {"arm", 32}, {"arm64", 64}} {
		rows := boundsJSON(t, "-arch", tt.arch, "int")
		if len(rows) != 1 || rows[0].Bits != tt.bits {
			t.Fatalf("-arch %s: rows %+v, want one of %d bits", tt.arch, rows, tt.bits)
		}
		checkLimit(t, tt.arch+" int n!", rows[0].Factorial, maxOf(t, "int", tt.bits), factorial)
	}
}

func TestBoundsText(t *testing.T) {
	r := runIn(t, ".", nil, "bounds")
	if r.code != 0 {
		t.Fatalf("bounds: code %d, stderr %s", r.code, r.stderr)
	}
	lines := strings.Split(strings.TrimRight(r.stdout, "\n"), "\n")
	// A header and the 13 fixed-size numeric types of the Go specification.
	if len(lines) != 14 {
		t.Fatalf("got %d lines, want 14:\n%s", len(lines), r.stdout)
	}
	// tabwriter pads every cell to its column's width, so every row is
	// as wide as the header, counted in runes (the header holds a Γ).
	for _, l := range lines[1:] {
		if utf8.RuneCountInString(l) != utf8.RuneCountInString(lines[0]) {
			t.Errorf("row not aligned with header:\n%s\n%s", lines[0], l)
		}
	}
	var int64Row string
	for _, l := range lines {
		if strings.Fields(l)[0] == "int64" {
			int64Row = l
		}
	}
	if !strings.Contains(int64Row, "n = 20") || !strings.Contains(int64Row, "n = 21") {
		t.Errorf("int64 row %q lacks n = 20 fitting and n = 21 breaking", int64Row)
	}
}

// TestBoundsBadInput checks that a wrong type or architecture is a bad
// command line whose message lists the valid values.
func TestBoundsBadInput(t *testing.T) {
	for _, tt := range []struct {
		args []string
		want string
	}{
		{[]string{"bounds", "complex128"}, "int8 int16"},
		{[]string{"bounds", "float128"}, "float32 float64"},
		{[]string{"bounds", "string"}, "uintptr"},
		{[]string{"bounds", "-arch", "pdp11"}, "386 amd64 arm arm64"},
		{[]string{"bounds", "-arch", "sparc"}, "amd64"},
	} {
		if r := runIn(t, ".", nil, tt.args...); r.code != 2 || !strings.Contains(r.stderr, tt.want) {
			t.Errorf("%v: code %d, stderr %q; want 2 and the valid values (%s ...)", tt.args, r.code, r.stderr, tt.want)
		}
	}
}

// TestBoundsFlagAfterType checks that a flag after a type name is a flag,
// not a type: bounds int8 -json prints int8's row as JSON.
func TestBoundsFlagAfterType(t *testing.T) {
	r := runIn(t, ".", nil, "bounds", "int8", "-json")
	var rows []jsonRow
	if err := json.Unmarshal([]byte(r.stdout), &rows); err != nil || r.code != 0 || len(rows) != 1 || rows[0].Type != "int8" {
		t.Errorf("bounds int8 -json: code %d, %v, stdout %q, stderr %q; want int8's row as JSON", r.code, err, r.stdout, r.stderr)
	}
}
