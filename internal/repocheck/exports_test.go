package repocheck

import (
	"go/types"
	"sort"
	"strings"
	"testing"

	"golang.org/x/tools/go/packages"
)

const module = "github.com/overfact/overfact"

// interfaceMethods are method names that satisfy a standard interface
// (fmt.Stringer, error, types.Importer, analysis.Fact, sort.Interface):
// production code calls them through the interface, which a search for
// direct uses does not see.
var interfaceMethods = map[string]bool{
	"String": true, "Error": true, "Unwrap": true, "Import": true, "AFact": true,
	"Len": true, "Less": true, "Swap": true, "MarshalJSON": true, "UnmarshalJSON": true,
}

// TestNoTestOnlyExports checks that every exported identifier the
// module declares in a non-test file (package-level functions, types,
// variables and constants, and methods) is used by some non-test file,
// its own package's included, whenever a test uses it: one that only
// tests use belongs in the package's export_test.go, where it is part of
// the tests and not of the API. Struct fields are left out (encoding/json
// reads them), and so are methods that satisfy an interface or a type
// constraint (called through it, they have no direct use), and packages
// that only tests import (harness/fuzz, internal/modproxy: their API is
// for tests by design).
func TestNoTestOnlyExports(t *testing.T) {
	if testing.Short() {
		t.Skip("type-checks the module with its tests")
	}
	cfg := &packages.Config{
		Mode:  packages.NeedName | packages.NeedFiles | packages.NeedSyntax | packages.NeedTypes | packages.NeedTypesInfo | packages.NeedImports,
		Tests: true,
		Dir:   "../..",
	}
	pkgs, err := packages.Load(cfg, "./...")
	if err != nil {
		t.Fatal(err)
	}
	declared := map[string]string{} // key → position
	usedBy := map[string]map[bool]bool{}
	prodImported := map[string]bool{} // packages a non-test file imports
	viaInterface := map[string]bool{} // method names of the module's interfaces
	for _, p := range pkgs {
		if len(p.Errors) > 0 {
			t.Fatalf("%s: %v", p.ID, p.Errors)
		}
		if p.ID == p.PkgPath && !strings.HasSuffix(p.PkgPath, ".test") { // a package without its tests
			for path := range p.Imports {
				prodImported[path] = true
			}
		}
		for _, name := range p.Types.Scope().Names() {
			if it, ok := p.Types.Scope().Lookup(name).Type().Underlying().(*types.Interface); ok {
				for i := 0; i < it.NumMethods(); i++ {
					viaInterface[it.Method(i).Name()] = true
				}
			}
		}
	}
	for _, p := range pkgs {
		for _, f := range p.Syntax {
			isTest := strings.HasSuffix(p.Fset.File(f.Pos()).Name(), "_test.go")
			for id, obj := range p.TypesInfo.Defs {
				if isTest || obj == nil || id.Pos() < f.Pos() || id.Pos() >= f.End() {
					continue
				}
				if k, ok := exportKey(obj); ok && (prodImported[obj.Pkg().Path()] || p.Name == "main" && !strings.HasSuffix(p.PkgPath, ".test")) {
					if f, isFunc := obj.(*types.Func); !isFunc || f.Type().(*types.Signature).Recv() == nil || !viaInterface[f.Name()] {
						declared[k] = p.Fset.Position(id.Pos()).String()
					}
				}
			}
			for id, obj := range p.TypesInfo.Uses {
				if id.Pos() < f.Pos() || id.Pos() >= f.End() {
					continue
				}
				if k, ok := exportKey(obj); ok {
					if usedBy[k] == nil {
						usedBy[k] = map[bool]bool{}
					}
					usedBy[k][isTest] = true
				}
			}
		}
	}
	var testOnly []string
	for k, pos := range declared {
		if usedBy[k][true] && !usedBy[k][false] {
			testOnly = append(testOnly, k+" ("+pos+")")
		}
	}
	sort.Strings(testOnly)
	for _, s := range testOnly {
		t.Errorf("only tests use %s: move it to export_test.go or drop it", s)
	}
}

// exportKey names an exported package-level object or method of the
// module the same way in every package that sees it: from source or from
// another package's view, generic or instantiated.
func exportKey(obj types.Object) (string, bool) {
	if obj.Pkg() == nil || !obj.Exported() || !strings.HasPrefix(obj.Pkg().Path(), module) {
		return "", false
	}
	path := strings.TrimSuffix(obj.Pkg().Path(), "_test")
	switch o := obj.(type) {
	case *types.Func:
		o = o.Origin()
		sig := o.Type().(*types.Signature)
		if sig.Recv() == nil {
			return path + "." + o.Name(), o.Parent() == o.Pkg().Scope()
		}
		if interfaceMethods[o.Name()] {
			return "", false
		}
		recv := sig.Recv().Type()
		if p, ok := recv.(*types.Pointer); ok {
			recv = p.Elem()
		}
		named, ok := recv.(*types.Named)
		if !ok {
			return "", false // an interface's method
		}
		return path + "." + named.Origin().Obj().Name() + "." + o.Name(), true
	case *types.Var:
		if o.IsField() {
			return "", false
		}
	case *types.PkgName, *types.Label:
		return "", false
	}
	return path + "." + obj.Name(), obj.Parent() == obj.Pkg().Scope()
}
