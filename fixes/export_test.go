package fixes

import "go/types"

// Test-only exports.

// HelperFuncs lists the helper functions fixes may emit, for tests that
// check them against the helper module.
func HelperFuncs() map[string]*types.Signature {
	pkgs, err := stubs()
	if err != nil {
		return nil
	}
	out := make(map[string]*types.Signature)
	scope := pkgs[HelperPath].Scope()
	for _, name := range scope.Names() {
		if fn, ok := scope.Lookup(name).(*types.Func); ok {
			out[name] = fn.Type().(*types.Signature)
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
