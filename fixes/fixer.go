package fixes

import (
	"errors"
	"go/ast"
	"go/token"
	"go/types"
	"sync/atomic"

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
	sources  map[string][]byte             // the files' text, read once (source)
	checks   int                           // fix checks spent
	budget   int                           // fix checks allowed; 0: no bound (see SetCheckBudget)
	importer importerMap                   // the package's imports and the fixes' stand-ins
	funcs    map[*ast.File][]*ast.FuncDecl // each file's functions, in order
	parsed   *parsed
	decls    *decls                         // parsed files without function bodies
	uses     map[*types.PkgName][]token.Pos // where each import name is used
	depNames map[string]bool                // names of the package's variables, functions and methods
	assigned map[*ast.BlockStmt]map[types.Object]bool
	// fieldVars stand for field reads v.F in linear forms (linearOf).
	fieldVars map[[2]types.Object]*types.Var
}

// NewFixer returns the fixer of pass's findings, with the budget of fix
// checks SetCheckBudget last set.
func NewFixer(pass *analysis.Pass) *Fixer {
	return &Fixer{pass: pass, budget: int(checkBudget.Load())}
}

// source returns the text of the named file, read with the pass's
// ReadFile the first time a fix asks for it and kept for the others:
// every fix starts from its file's text, and where ReadFile does not
// cache (go vet, the editor), thousands of fixes in one large file each
// read the whole file.
func (fx *Fixer) source(name string) ([]byte, error) {
	if src, ok := fx.sources[name]; ok {
		return src, nil
	}
	read := fx.pass.ReadFile
	if read == nil {
		return nil, errors.New("pass cannot read files")
	}
	src, err := read(name)
	if err != nil {
		return nil, err
	}
	if fx.sources == nil {
		fx.sources = make(map[string][]byte)
	}
	fx.sources[name] = src
	return src, nil
}

// checkBudget is the number of fix checks each Fixer made from now on
// allows; 0 lifts the bound.
var checkBudget atomic.Int64

func init() { checkBudget.Store(maxVerifications) }

// SetCheckBudget sets the number of fixes a package may check (and so
// offer) in one analysis, for the Fixers made from now on: n > 0 bounds
// them, n <= 0 lifts the bound. It returns the previous setting (0 for
// none). The default, maxVerifications, keeps the analysis of a package
// with thousands of findings quick where every analysis is shown at
// once (go vet, the editor); a run that applies every fix it can, the
// command's -fix, lifts it: a fix check costs what the edited functions
// reach, not the package (verifyfunc.go), so checking every fix of a
// package costs about as much as building them.
func SetCheckBudget(n int) (previous int) {
	if n < 0 {
		n = 0
	}
	return int(checkBudget.Swap(int64(n)))
}

// verificationsLeft reports whether the package may still check a fix.
func (fx *Fixer) verificationsLeft() bool {
	return fx.budget <= 0 || fx.checks < fx.budget
}

// spendVerification reports whether the package may check one more fix,
// and counts it.
func (fx *Fixer) spendVerification() bool {
	if !fx.verificationsLeft() {
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
