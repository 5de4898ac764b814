package fixes

import (
	"testing"

	"golang.org/x/tools/go/analysis"
)

// The fix checks of one package are bounded, so that checking fixes costs
// at most maxVerifications type-checks of a package however many findings
// it has; other packages keep their own count.
func TestVerificationBudget(t *testing.T) {
	a, b := new(analysis.Pass), new(analysis.Pass)
	for i := 0; i < maxVerifications; i++ {
		if !spendVerification(a) {
			t.Fatalf("check %d of a package refused; want %d allowed", i+1, maxVerifications)
		}
	}
	if verificationsLeft(a) {
		t.Errorf("verificationsLeft after %d checks = true, want false", maxVerifications)
	}
	if spendVerification(a) {
		t.Errorf("check %d of a package allowed; want at most %d", maxVerifications+1, maxVerifications)
	}
	if !spendVerification(b) {
		t.Error("another package's first check refused")
	}
}
