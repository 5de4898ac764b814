// Package fixlooplog holds binomial coefficients that a greenhouse
// planner forms as quotients of running products counted in float64:
// the products leave float64 (+Inf/+Inf is NaN) where the coefficient
// does not, and the fix carries them as the helper's Product.
package fixlooplog

// Plots counts the ways to choose beds of the garden's rows: the
// numerator counted down from rows, the divisor up to beds.
func Plots(rows, beds float64) float64 {
	top := 1.0
	for r := rows; r > rows-beds; r-- {
		top *= r
	}
	bottom := 1.0
	for b := 1.0; b <= beds; b++ {
		bottom *= b
	}
	return top / bottom // want `computes C\(rows, beds\) as rows!/\(rows - beds\)! divided by beds! in float64: the numerator overflows to \+Inf for rows ≥ 171 at beds = rows and for rows ≥ 270 at beds = rows/2, although C\(rows, rows/2\) itself fits up to rows = 1029; rows is not bounded here`
}

// Trays keeps rows!, beds! and (rows−beds)! in one pass.
func Trays(rows, beds float64) float64 {
	all := 1.0
	part := 1.0
	for i := 2.0; i <= rows; i++ {
		all *= i
		if i <= beds {
			part *= i
		}
		if i <= rows-beds {
			part *= i
		}
	}
	return all / part // want `computes C\(rows, beds\) as rows! divided by its divisor in float64: the numerator overflows to \+Inf for rows ≥ 171`
}

// Bench serves benches of at most 150 rows, where both products fit.
func Bench(rows, beds float64) float64 {
	if rows < 0 || rows > 150 {
		return 0
	}
	top := 1.0
	for r := rows; r > rows-beds; r-- {
		top *= r
	}
	bottom := 1.0
	for b := 1.0; b <= beds; b++ {
		bottom *= b
	}
	return top / bottom
}
