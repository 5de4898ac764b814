package fixes_test

import (
	"path/filepath"
	"sync"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/fixes"
)

// TestFunctionCheckAgreesWithPackageCheck runs the analyzer over every
// analysistest package of the repository (its scenarios and the fix
// goldens' packages) and the hand-described matches of fixes/testdata,
// and type-checks each fix twice: as the fixer does (the edited functions
// against the package's declarations, when the fix edits only function
// bodies and imports) and with the whole package. Both must accept and
// refuse the same fixes, and most checks must have taken the cheap path.
// Not parallel: it sets a hook that every fix check of the process sees.
func TestFunctionCheckAgreesWithPackageCheck(t *testing.T) {
	var mu sync.Mutex
	var cheap, whole, rejected int
	undo := fixes.CompareFixChecks(func(file string, functionsOnly bool, got, full error) {
		mu.Lock()
		defer mu.Unlock()
		if !functionsOnly {
			whole++
			return
		}
		cheap++
		if (got == nil) != (full == nil) {
			t.Errorf("%s: the check of the edited functions says %v; the whole package's says %v", file, got, full)
		}
		if full != nil {
			rejected++
		}
	})
	defer undo()
	dir, patterns := testdataTree(t)
	analysistest.Run(quiet{}, dir, analyzer.Analyzer, patterns...)
	probeDir := gopath(t, filepath.Join("testdata", "src"), probePackages...)
	analysistest.Run(quiet{}, probeDir, probe, probePackages...)
	t.Logf("%d fix checks of the edited functions (%d of them refusals), %d of the whole package", cheap, rejected, whole)
	if cheap == 0 || cheap < whole {
		t.Errorf("%d checks of the edited functions against %d of the whole package; want most fixes checked the cheap way", cheap, whole)
	}
}
