package fixes

import "go/types"

// Test-only exports.

// HelperFuncs lists the helper functions fixes may emit, methods as
// Type.Method, for tests that check them against the helper module.
func HelperFuncs() map[string]*types.Signature {
	pkgs, err := stubs()
	if err != nil {
		return nil
	}
	out := make(map[string]*types.Signature)
	scope := pkgs[HelperPath].Scope()
	for _, name := range scope.Names() {
		switch obj := scope.Lookup(name).(type) {
		case *types.Func:
			out[name] = obj.Type().(*types.Signature)
		case *types.TypeName:
			if n, ok := obj.Type().(*types.Named); ok {
				for i := 0; i < n.NumMethods(); i++ {
					out[name+"."+n.Method(i).Name()] = n.Method(i).Type().(*types.Signature)
				}
			}
		}
	}
	return out
}

// CompareFixChecks makes every fix check also type-check the whole
// package with the fixed file in place, and calls report with the file,
// whether the check was made on the edited functions alone, its outcome
// and the whole package's. The returned function undoes it. Not for
// parallel tests.
func CompareFixChecks(report func(file string, functionsOnly bool, got, whole error)) (undo func()) {
	checkHook = func(b *builder, fixed []byte, cheap bool, err error) {
		report(b.tok.Name(), cheap, err, b.checkPackage(fixed))
	}
	return func() { checkHook = nil }
}
