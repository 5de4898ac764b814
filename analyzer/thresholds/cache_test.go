package thresholds

import (
	"testing"
	"time"
)

// BenchmarkFactorialCached measures a call once the result is cached,
// the cost the analyzer pays per finding.
func BenchmarkFactorialCached(b *testing.B) {
	t, _ := Named("float64", nil)
	Factorial(t)
	for b.Loop() {
		Factorial(t)
	}
}

// BenchmarkColdOverWarm reports, in one run, how many times more a
// first computation of the table costs than a cached one:
//
//	go test -run '^$' -bench ColdOverWarm ./analyzer/thresholds
func BenchmarkColdOverWarm(b *testing.B) {
	var cold, warm time.Duration
	for b.Loop() {
		cache.Clear()
		maxCache.Clear()
		s := time.Now()
		Table(nil)
		cold += time.Since(s)
		s = time.Now()
		Table(nil)
		warm += time.Since(s)
	}
	b.ReportMetric(float64(cold)/float64(warm), "cold/warm")
	b.ReportMetric(float64(warm.Nanoseconds())/float64(b.N), "warm-ns/table")
}

// TestConcurrentFirstUse computes the table from several goroutines at
// once on an empty cache; run with -race to check the cache. All must
// agree with a table computed alone afterwards.
func TestConcurrentFirstUse(t *testing.T) {
	cache.Clear()
	maxCache.Clear()
	done := make(chan []Row)
	for range 4 {
		go func() { done <- Table(nil) }()
	}
	var got [][]Row
	for range 4 {
		got = append(got, <-done)
	}
	cache.Clear()
	maxCache.Clear()
	want := Table(nil)
	for _, rows := range got {
		for i, r := range rows {
			if r.Factorial.FirstBad != want[i].Factorial.FirstBad || r.CentralLoop.FirstBad != want[i].CentralLoop.FirstBad {
				t.Errorf("row %d differs between goroutines", i)
			}
		}
	}
}
