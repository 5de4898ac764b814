package fixes

import (
	"testing"

	"golang.org/x/tools/go/analysis"
)

// The fix checks of one package are bounded, so that checking fixes costs
// at most maxVerifications type-checks of a package however many findings
// it has; other packages keep their own count, and no number of other
// packages analysed meanwhile gives a spent package a fresh budget (a
// process-wide cache of the last few passes once did, by forgetting the
// oldest one while it was still in use).
func TestVerificationBudget(t *testing.T) {
	a := NewFixer(new(analysis.Pass))
	for i := 0; i < maxVerifications; i++ {
		if !a.spendVerification() {
			t.Fatalf("check %d of a package refused; want %d allowed", i+1, maxVerifications)
		}
	}
	if a.verificationsLeft() {
		t.Errorf("verificationsLeft after %d checks = true, want false", maxVerifications)
	}
	for i := 0; i < 20; i++ {
		if !NewFixer(new(analysis.Pass)).spendVerification() {
			t.Fatalf("package %d's first check refused", i+2)
		}
	}
	if a.spendVerification() {
		t.Errorf("check %d of a package allowed after other packages were fixed; want at most %d", maxVerifications+1, maxVerifications)
	}
}
