package thresholds

import "sync"

// cacheKey names one computed result: a shape, a type and up to two
// arguments of the shape.
type cacheKey struct {
	shape string
	t     Num
	a, b  int64
}

var cache sync.Map // cacheKey -> result

// memo returns the cached result for k, computing it with f on first use.
// Two goroutines may both compute a missing entry; they store the same
// value, so the race only costs time.
func memo[T any](k cacheKey, f func() T) T {
	if v, ok := cache.Load(k); ok {
		return v.(T)
	}
	v, _ := cache.LoadOrStore(k, f())
	return v.(T)
}

// memoLimit is memo for Limits, returning a copy the caller may modify.
func memoLimit(k cacheKey, f func() Limit) Limit {
	return memo(k, f).clone()
}
