package fixes_test

import (
	"strings"
	"testing"

	"golang.org/x/tools/go/packages"
)

// TestImportsRunOneWay checks that the fix builders depend on nothing of
// the analyzer: the analyzer imports fixes and hands it every threshold
// a fix needs (Match.FirstBad), so an import back up would make the two
// layers one. The dependency list is the go command's (go list -deps).
func TestImportsRunOneWay(t *testing.T) {
	if testing.Short() {
		t.Skip("loads the package graph")
	}
	const module = "github.com/overfact/overfact"
	pkgs, err := packages.Load(&packages.Config{Mode: packages.NeedName | packages.NeedImports | packages.NeedDeps}, module+"/fixes")
	if err != nil {
		t.Fatal(err)
	}
	packages.Visit(pkgs, func(p *packages.Package) bool {
		for path := range p.Imports {
			if path == module+"/analyzer" || strings.HasPrefix(path, module+"/analyzer/") {
				t.Errorf("%s imports %s: the fixer must not depend on the analyzer", p.PkgPath, path)
			}
		}
		return true
	}, nil)
}
