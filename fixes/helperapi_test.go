package fixes_test

import (
	"go/types"
	"testing"

	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/fixes"
)

// TestHelperAPIMatchesModule checks that every helper function fixes emit
// exists in the helper module with the signature the fixer type-checks
// rewritten code against.
func TestHelperAPIMatchesModule(t *testing.T) {
	pkgs, err := packages.Load(&packages.Config{Mode: packages.NeedTypes | packages.NeedName, Dir: "lgamma"}, ".")
	if err != nil || len(pkgs) != 1 || len(pkgs[0].Errors) > 0 {
		t.Fatalf("loading the helper module: %v %v", err, pkgs)
	}
	scope := pkgs[0].Types.Scope()
	want := fixes.HelperFuncs()
	if len(want) == 0 {
		t.Fatal("no helper functions declared")
	}
	for name, sig := range want {
		fn, ok := scope.Lookup(name).(*types.Func)
		if !ok {
			t.Errorf("helper module lacks %s", name)
			continue
		}
		// Parameter names do not matter; the types are all predeclared,
		// so structural identity across the two packages is exact.
		if !types.Identical(fn.Type(), sig) {
			t.Errorf("%s: module has %s, fixes declare %s", name, fn.Type(), sig)
		}
	}
}
