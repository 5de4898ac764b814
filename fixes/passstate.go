package fixes

import (
	"go/ast"
	"go/types"
	"sync"

	"golang.org/x/tools/go/analysis"
)

// passState is what the fixes of one package share: the budget of fix
// checks, the package's files parsed afresh for those checks, and the
// variables each function body assigns. A driver analyses packages in
// parallel and builds a package's fixes while analysing it, on the
// pass's own goroutine, so the states of the last few passes serve them
// all and each state is used by one goroutine at a time.
type passState struct {
	checks   int
	parsed   *parsed
	assigned map[*ast.BlockStmt]map[types.Object]bool
}

var passStates struct {
	sync.Mutex
	order []*analysis.Pass
	m     map[*analysis.Pass]*passState
}

// passStatesKept is how many passes keep their state.
const passStatesKept = 8

// stateOf returns the state of pass, creating it (and forgetting the
// oldest) on first use.
func stateOf(pass *analysis.Pass) *passState {
	passStates.Lock()
	defer passStates.Unlock()
	if st, ok := passStates.m[pass]; ok {
		return st
	}
	if passStates.m == nil {
		passStates.m = make(map[*analysis.Pass]*passState)
	}
	if len(passStates.order) == passStatesKept {
		delete(passStates.m, passStates.order[0])
		passStates.order = passStates.order[1:]
	}
	st := &passState{}
	passStates.m[pass] = st
	passStates.order = append(passStates.order, pass)
	return st
}

// assignedInBody is assigned(obj, body) for a whole function body,
// answered from one walk of it per package: every finding in a function
// asks it of the function's parameter, and a walk per finding made a
// long function's guards cost its length times its findings.
func (b *builder) assignedInBody(obj types.Object, body *ast.BlockStmt) bool {
	st := stateOf(b.pass)
	set, ok := st.assigned[body]
	if !ok {
		set = make(map[types.Object]bool)
		b.eachAssigned(body, func(v types.Object) bool {
			set[v] = true
			return true
		})
		if st.assigned == nil {
			st.assigned = make(map[*ast.BlockStmt]map[types.Object]bool)
		}
		st.assigned[body] = set
	}
	return set[obj]
}
