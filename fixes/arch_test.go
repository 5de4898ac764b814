package fixes_test

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestThirtyTwoBitInt analyses for GOARCH=386, where int has 32 bits: an
// int-valued ratio gets the helper's int64 checked to fit (the conversion
// alone could wrap), a 64-bit one is rewritten plainly, and a guard takes
// the int32 limit (13! > 2^31−1, OEIS A000142).
func TestThirtyTwoBitInt(t *testing.T) {
	t.Setenv("GOARCH", "386")
	dir := gopath(t, filepath.Join("testdata", "src"), "probe32")
	analysistest.RunWithSuggestedFixes(t, dir, probe, "probe32")
}
