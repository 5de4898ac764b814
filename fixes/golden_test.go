package fixes_test

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

var probePackages = []string{"probebinom", "probeterm", "probeloop", "probeguard", "probeimports", "probemany", "probecomments", "probemodel"}

// TestProbeGolden applies the fixes of hand-described matches and compares
// the results with the .golden files, which were written by hand from the
// identities named beside each fix kind; then it checks that one fix
// applied alone drops the import it empties, and that all fixes applied
// at once merge without overlaps and type-check against the real helper.
func TestProbeGolden(t *testing.T) {
	t.Parallel()
	dir := gopath(t, filepath.Join("testdata", "src"), probePackages...)
	results := analysistest.RunWithSuggestedFixes(t, dir, probe, probePackages...)
	// The same run serves two more checks, since loading is the slow
	// part: one fix alone, then all fixes at once.
	singleFixDropsImport(t, results)
	applied, skipped := applyResults(t, results, nil)
	if applied == 0 || skipped != 0 {
		t.Errorf("applied %d fixes, skipped %d for overlaps; want some and none", applied, skipped)
	}
	typeCheck(t, dir, probePackages...)
}
