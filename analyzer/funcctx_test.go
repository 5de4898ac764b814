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
	var got []string
	ft := reflect.TypeOf(fnCtx{})
	for i := 0; i < ft.NumField(); i++ {
		got = append(got, ft.Field(i).Name)
	}
	if !slices.Equal(got, want) {
		t.Errorf("fnCtx fields are %v, want %v: declare category state with a stateKey (funcctx.go)", got, want)
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
