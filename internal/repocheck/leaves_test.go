package repocheck

import (
	"sort"
	"strings"
	"testing"

	"golang.org/x/tools/go/packages"
)

// TestLeavesImportNoProject checks that the analyzer's leaf packages stay
// leaves: range reasoning, thresholds and the value model depend on
// nothing of the project but the shared leaves (linear forms, operator
// tokens), and those on nothing of it at all, so no arrow runs from a
// leaf back up to the analyzer, the fixer or the driver. The import
// lists are the go command's (go list -deps).
func TestLeavesImportNoProject(t *testing.T) {
	if testing.Short() {
		t.Skip("loads the package graph")
	}
	allowed := map[string][]string{
		"analyzer/ranges":     {"internal/tokenop"},
		"analyzer/thresholds": nil,
		"analyzer/valuemodel": {"internal/linform", "internal/tokenop"},
		"internal/linform":    nil,
		"internal/tokenop":    nil,
	}
	var patterns []string
	for p := range allowed {
		patterns = append(patterns, module+"/"+p)
	}
	sort.Strings(patterns)
	pkgs, err := packages.Load(&packages.Config{Mode: packages.NeedName | packages.NeedImports, Dir: "../.."}, patterns...)
	if err != nil {
		t.Fatal(err)
	}
	if len(pkgs) != len(allowed) {
		t.Fatalf("loaded %d packages, want %d", len(pkgs), len(allowed))
	}
	for _, p := range pkgs {
		rel := strings.TrimPrefix(p.PkgPath, module+"/")
		ok := map[string]bool{}
		for _, a := range allowed[rel] {
			ok[module+"/"+a] = true
		}
		for path := range p.Imports {
			if (path == module || strings.HasPrefix(path, module+"/")) && !ok[path] {
				t.Errorf("%s imports %s: a leaf imports only the shared leaves %v", rel, path, allowed[rel])
			}
		}
	}
}
