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
