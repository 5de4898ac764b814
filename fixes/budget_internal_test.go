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

// SetCheckBudget lifts the bound for the Fixers made after it (the
// command's -fix), and leaves those made before it, and those made after
// the default is restored, bounded.
func TestSetCheckBudget(t *testing.T) {
	before := NewFixer(new(analysis.Pass))
	prev := SetCheckBudget(0)
	defer SetCheckBudget(prev)
	if prev != maxVerifications {
		t.Errorf("SetCheckBudget(0) returned %d, want the default %d", prev, maxVerifications)
	}
	lifted := NewFixer(new(analysis.Pass))
	for i := 0; i < 10*maxVerifications; i++ {
		if !lifted.spendVerification() {
			t.Fatalf("check %d refused with the budget lifted", i+1)
		}
	}
	for i := 0; i < maxVerifications; i++ {
		before.spendVerification()
	}
	if before.verificationsLeft() {
		t.Errorf("a Fixer made before the budget was lifted allows more than %d checks", maxVerifications)
	}
	SetCheckBudget(3)
	small := NewFixer(new(analysis.Pass))
	for i := 0; i < 3; i++ {
		if !small.spendVerification() {
			t.Fatalf("check %d of 3 refused", i+1)
		}
	}
	if small.spendVerification() {
		t.Errorf("a fourth check allowed under a budget of 3")
	}
}
