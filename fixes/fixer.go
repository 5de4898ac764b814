package fixes

import (
	"go/ast"
	"go/token"
	"go/types"

	"golang.org/x/tools/go/analysis"
)

// A Fixer builds the fixes of one package's findings. It holds what those
// fixes share: the budget of fix checks, the package's files parsed afresh
// for those checks, and the variables each function body assigns. It
// belongs to the pass it was made for and is dropped with it: make one in
// the analyzer's run function, use it on the pass's goroutine, and keep no
// reference past the run. Nothing of a package's fixes outlives its pass,
// so a long-lived process (the language server) holds no loaded package
// on the fixer's account.
type Fixer struct {
	pass     *analysis.Pass
	checks   int // fix checks spent, at most maxVerifications
	parsed   *parsed
	decls    *decls                         // parsed files without function bodies
	uses     map[*types.PkgName][]token.Pos // where each import name is used
	depNames map[string]bool                // names of the package's variables, functions and methods
	assigned map[*ast.BlockStmt]map[types.Object]bool
}

// NewFixer returns the fixer of pass's findings.
func NewFixer(pass *analysis.Pass) *Fixer {
	return &Fixer{pass: pass}
}

// verificationsLeft reports whether the package may still check a fix.
func (fx *Fixer) verificationsLeft() bool {
	return fx.checks < maxVerifications
}

// spendVerification reports whether the package may check one more fix,
// and counts it.
func (fx *Fixer) spendVerification() bool {
	if fx.checks >= maxVerifications {
		return false
	}
	fx.checks++
	return true
}

// assignedInBody is assigned(obj, body) for a whole function body,
// answered from one walk of it per package: every finding in a function
// asks it of the function's parameter, and a walk per finding made a
// long function's guards cost its length times its findings.
func (b *builder) assignedInBody(obj types.Object, body *ast.BlockStmt) bool {
	fx := b.fx
	set, ok := fx.assigned[body]
	if !ok {
		set = make(map[types.Object]bool)
		b.eachAssigned(body, func(v types.Object) bool {
			set[v] = true
			return true
		})
		if fx.assigned == nil {
			fx.assigned = make(map[*ast.BlockStmt]map[types.Object]bool)
		}
		fx.assigned[body] = set
	}
	return set[obj]
}
