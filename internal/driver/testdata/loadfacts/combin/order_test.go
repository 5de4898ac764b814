package combin

import "testing"

// The number of orders of 5 pallets is 5! = 120 (OEIS A000142).
func TestFactorial(t *testing.T) {
	if Factorial(5) != 120 {
		t.Fatal("5! is 120")
	}
}
