package ranges

import (
	"go/ast"
	"go/types"
)

// closeScope drops from s the facts about the variables declared in the
// scope that st opens (a block, or the implicit scope of an if, for,
// range or switch statement). They cannot be read once the scope ends,
// and a variable declared in a loop body is declared afresh on every
// trip; keeping them would make the state of a long function grow with
// every block already left, and each update of it cost the logarithm of
// the whole function's variable count instead of those in scope.
func (f *Func) closeScope(s state, st ast.Stmt) state {
	if !s.live {
		return s
	}
	sc := f.info.Scopes[st]
	if sc == nil || sc.Len() == 0 {
		return s
	}
	for _, name := range sc.Names() {
		f.drop(&s, sc.Lookup(name))
	}
	return s
}

// drop removes what s says about obj and the stand-ins of its fields.
func (f *Func) drop(s *state, obj types.Object) {
	if id, ok := f.ids[obj]; ok {
		s.facts = s.facts.del(id)
		s.rels = killRels(s.rels, id)
	}
	for _, v := range f.fieldsOf[obj] {
		f.drop(s, v)
	}
}
