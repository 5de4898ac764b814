package thresholds

import "go/types"

// Row is one line of the thresholds table printed by the command.
type Row struct {
	Type         Num
	Factorial    Limit   // n!; the largest n with n! fitting is FirstBad−1
	CentralRatio Limit   // C(n, n/2) as n!/(k!(n−k)!): breaks with the numerator n!
	CentralLoop  Limit   // C(n, n/2) by the multiplicative loop
	CentralTrue  Limit   // the true C(n, n/2)
	Gamma        float64 // floats only: GammaFirstBad; 0 for ints
}

// Table returns one Row per type, for all types of All(sizes) when none
// are given.
func Table(sizes types.Sizes, nums ...Num) []Row {
	if len(nums) == 0 {
		nums = All(sizes)
	}
	rows := make([]Row, 0, len(nums))
	for _, t := range nums {
		rows = append(rows, Row{
			Type:         t,
			Factorial:    Factorial(t),
			CentralRatio: CentralBinomialRatio(t),
			CentralLoop:  CentralBinomialLoop(t),
			CentralTrue:  CentralBinomial(t),
			Gamma:        GammaFirstBad(t),
		})
	}
	return rows
}
