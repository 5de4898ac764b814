package analyzer

// The scenario packages of the log-space categories (lgammasign.go,
// stirlingapproximation.go) run with the others; their fixes are
// checked against .golden files by the fixes package's tests.
func init() {
	scenarios = append(scenarios, "lgamma-sign", "stirling-approximation")
}
