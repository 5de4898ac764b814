package gentable

// Scale is hand-written and reported as usual.
func Scale(n int) float64 { // want Scale:`wrong for some n`
	s := 1.0
	for i := 1; i <= n; i++ { // want `factorial of n in float64 overflows`
		s *= float64(i)
	}
	return s / 2
}
