package fixes_test

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

var probePackages = []string{"probebinom", "probeterm", "probeloop", "probeguard", "probeimports", "probemany"}

// TestProbeGolden applies the fixes of hand-described matches and compares
// the results with the .golden files, which were written by hand from the
// identities named beside each fix kind.
func TestProbeGolden(t *testing.T) {
	dir := gopath(t, filepath.Join("testdata", "src"), probePackages...)
	analysistest.RunWithSuggestedFixes(t, dir, probe, probePackages...)
}
