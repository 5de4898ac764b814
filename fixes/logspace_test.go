package fixes_test

// The log-space categories' scenario packages carry .golden files for
// their fixes, written by hand from the identities in lgammasign.go and
// stirling.go.
func init() {
	fixPackages = append(fixPackages, "lgamma-sign", "stirling-approximation")
}
