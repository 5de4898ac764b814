package pickroute

// fact returns n! for the route counters.
func fact(n int) uint64 { // want fact:`factorial of parameter 0`
	r := uint64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in uint64 wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the larges`
		r *= uint64(i)
	}
	return r
}

// factf is the float64 factorial used for zone splits.
func factf(n float64) float64 { // want factf:`factorial of parameter 0`
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}
