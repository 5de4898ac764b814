package analyzer

import (
	"reflect"
	"slices"
	"testing"
)

// TestFuncStateOwned keeps the function context to what every check
// asks about a function: its checker, node and file, its questions to
// the type checker, its range queries and its definitions. A cache or note of one category is declared by
// that category as a stateKey, beside its detector, and lives in owned;
// a new field here would make the shared context carry it again.
func TestFuncStateOwned(t *testing.T) {
	want := []string{"c", "node", "file", "typeQueries", "rangeQueries", "definitions", "owned"}
	if got := fieldNames(fnCtx{}); !slices.Equal(got, want) {
		t.Errorf("fnCtx fields are %v, want %v: declare category state with a stateKey (funcctx.go)", got, want)
	}
}

// TestPassStateOwned keeps the checker to what the pass shares: its
// files, the functions and facts of phase 1, the index of calls, the
// findings and the guards they hold back, the fixer and the package's
// tables. What one category or the value model gathers over the pass (a
// summary of fields, the functions' values, the variables of float
// counts) is declared by its owner as a stateKey and lives in owned
// (passStateOf).
func TestPassStateOwned(t *testing.T) {
	want := []string{"pass", "fixer", "files", "funcs", "fnInfo", "reported", "consumed", "allFuncs", "callIndex", "escapes",
		"reportedPos", "byPos", "tables", "tablesDone", "rewritten", "held", "owned"}
	if got := fieldNames(checker{}); !slices.Equal(got, want) {
		t.Errorf("checker fields are %v, want %v: declare pass state with a stateKey (funcctx.go)", got, want)
	}
}

// fieldNames returns the names of the fields of the struct v, in order.
func fieldNames(v any) []string {
	var names []string
	t := reflect.TypeOf(v)
	for i := 0; i < t.NumField(); i++ {
		names = append(names, t.Field(i).Name)
	}
	return names
}

// TestPassStateOfMakesOnce checks that an owner's pass state is made
// once per pass and is its own: another pass starts afresh.
func TestPassStateOfMakesOnce(t *testing.T) {
	type notes struct{ n int }
	k := &stateKey[notes]{"pass notes"}
	c, d := &checker{}, &checker{}
	passStateOf(c, k).n++
	passStateOf(c, k).n++
	if got := passStateOf(c, k).n; got != 2 {
		t.Errorf("pass state = %d, want 2", got)
	}
	if got := passStateOf(d, k).n; got != 0 {
		t.Errorf("another pass sees the state: %d", got)
	}
}

// TestStateOfMakesOnce checks that an owner's state is made once per
// function and is its own: two keys of one type do not share state, and
// another function starts afresh.
func TestStateOfMakesOnce(t *testing.T) {
	type notes struct{ n int }
	k1, k2 := &stateKey[notes]{"one"}, &stateKey[notes]{"two"}
	f, g := &fnCtx{}, &fnCtx{}
	if peekState(f, k1) != nil {
		t.Fatal("peekState made the state")
	}
	stateOf(f, k1).n++
	stateOf(f, k1).n++
	stateOf(f, k2).n += 10
	if got := stateOf(f, k1).n; got != 2 {
		t.Errorf("state of k1 = %d, want 2", got)
	}
	if got := peekState(f, k2).n; got != 10 {
		t.Errorf("state of k2 = %d, want 10", got)
	}
	if peekState(g, k1) != nil {
		t.Error("another function sees the state")
	}
}
