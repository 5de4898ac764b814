package sampling

// crateArrangements is the number of ways to arrange the six bottles of
// a crate: the factorial of a small constant, computed exactly.
func crateArrangements() int64 {
	return fact(6)
}

// labelOrders counts the orders in which the labeller can apply the
// labels of one bottle; a bottle carries at most five labels, and the
// guard keeps the factorial far below int64's limit.
func labelOrders(labels int64) int64 {
	if labels < 0 || labels > 5 {
		return 0
	}
	return fact(labels)
}

// CrateReport is the line printed on the quality sheet.
func CrateReport(labels int64) (int64, int64) {
	return crateArrangements(), labelOrders(labels)
}
