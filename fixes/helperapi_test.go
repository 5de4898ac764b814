package fixes_test

import (
	"go/types"
	"strings"
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
		var fn *types.Func
		if typ, method, ok := strings.Cut(name, "."); ok {
			if tn, ok := scope.Lookup(typ).(*types.TypeName); ok {
				obj, _, _ := types.LookupFieldOrMethod(tn.Type(), false, tn.Pkg(), method)
				fn, _ = obj.(*types.Func)
			}
		} else {
			fn, _ = scope.Lookup(name).(*types.Func)
		}
		if fn == nil {
			t.Errorf("helper module lacks %s", name)
			continue
		}
		// Parameter names do not matter; the types are predeclared or
		// the helper's own, written unqualified, so equal strings are
		// equal signatures.
		unqualified := func(*types.Package) string { return "" }
		if got, decl := types.TypeString(fn.Type(), unqualified), types.TypeString(sig, unqualified); got != decl {
			t.Errorf("%s: module has %s, fixes declare %s", name, got, decl)
		}
	}
}
