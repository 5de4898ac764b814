package main

import (
	"math"
	"strings"
	"testing"
)

func TestMedian(t *testing.T) {
	// Expected values are the textbook definition of the median
	// (common practice): the middle order statistic, or the mean of the
	// two middle ones.
	tests := []struct {
		in   []float64
		want float64
	}{
		{nil, 0},
		{[]float64{3}, 3},
		{[]float64{5, 1, 3}, 3},
		{[]float64{4, 1, 3, 2}, 2.5},
		{[]float64{1, 100, 2, 3, 2}, 2},
	}
	for _, tt := range tests {
		if got := median(tt.in); math.Abs(got-tt.want) > 1e-12 {
			t.Errorf("median(%v) = %v, want %v", tt.in, got, tt.want)
		}
	}
	in := []float64{3, 1, 2}
	median(in)
	if in[0] != 3 || in[1] != 1 {
		t.Errorf("median reordered its argument: %v", in)
	}
}

func TestRatio(t *testing.T) {
	tests := []struct {
		a, b float64
		want string
	}{
		{107, 100, "1.07×"},
		{1, 3, "0.33×"},
		{5, 0, "n/a"},
	}
	for _, tt := range tests {
		if got := ratio(tt.a, tt.b); got != tt.want {
			t.Errorf("ratio(%v, %v) = %q, want %q", tt.a, tt.b, got, tt.want)
		}
	}
}

func TestParseHWM(t *testing.T) {
	// Layout of /proc/self/status as documented in proc(5).
	status := "Name:\tbench\nVmPeak:\t  812345 kB\nVmHWM:\t   54321 kB\nVmRSS:\t   50000 kB\n"
	got, err := parseHWM(strings.NewReader(status))
	if err != nil || got != 54321 {
		t.Errorf("parseHWM = %d, %v; want 54321", got, err)
	}
	if _, err := parseHWM(strings.NewReader("Name:\tx\n")); err == nil {
		t.Errorf("parseHWM without VmHWM: no error")
	}
}
