package probeimports

import (
	"errors"
	"strings"
)

var errEmpty = errors.New("empty plan")

// Rule guards a plan name; fmt goes between errors and strings.
//
// probe:factorial(n)
func Rule(name string, n int) (int, error) { // want "probe factorial"
	if strings.TrimSpace(name) == "" {
		return 0, errEmpty
	}
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r, nil
}
