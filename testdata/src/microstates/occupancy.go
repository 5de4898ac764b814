package microstates

// Integer is the integer types counts are kept in.
type Integer interface {
	~int | ~int32 | ~int64 | ~uint64
}

// Ways returns the number of ways to put n identical bosons into g
// states, C(n+g−1, n).
func Ways[T Integer](n, g T) T {
	var num, den T = 1, 1
	for i := T(1); i <= n; i++ { // want `falling factorial of n factors in int32 \(the narrowest type in the constraint of T\) wraps: when its factors run down to 1 it is a factorial`
		num *= g - 1 + i
		den *= i
	}
	return num / den
}

var pascal = [][]uint64{{1}}

// FermiWays returns the number of ways to put n identical fermions into
// g states, C(g, n), from a cached Pascal triangle.
func FermiWays(g, n int) uint64 {
	if n < 0 || n > g {
		return 0
	}
	for len(pascal) <= g {
		prev := pascal[len(pascal)-1]
		row := make([]uint64, len(prev)+1)
		row[0], row[len(prev)] = 1, 1
		for j := 1; j < len(prev); j++ {
			row[j] = prev[j-1] + prev[j]
		}
		pascal = append(pascal, row)
	}
	return pascal[g][n]
}
