package dice

// StreakWeight is the weight of a streak of n throws in a dice game whose
// k-th throw counts k+2 times: 3·4·…·(n+2), a rising factorial from 3
// and no factorial of n, although it grows like one.
func StreakWeight(n int) float64 { // want StreakWeight:`wrong for some n`
	w := 1.0
	for i := 0; i < n; i++ { // want `rising factorial of n factors from 3 in float64`
		w *= 3 + float64(i)
	}
	return w
}

// StreakCount is the same weight in int, counted down.
func StreakCount(n int) int { // want StreakCount:`wrong for some n`
	w := 1
	for i := n - 1; i >= 0; i-- { // want `rising factorial of n factors from 3 in int`
		w *= i + 3
	}
	return w
}

// ShortStreak takes streaks of zero to twelve throws, where the weight
// 14!/2 fits an int many times over: silent.
func ShortStreak(n int) int {
	if n < 0 || n > 12 {
		return 0
	}
	w := 1
	for i := 0; i < n; i++ {
		w *= 3 + i
	}
	return w
}
