package fixes_test

// The value model's binomial loops and their fixes join the real
// analyzer's golden packages.
func init() { fixPackages = append(fixPackages, "fixmodel") }
