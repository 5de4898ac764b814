package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/assigned"
	"github.com/overfact/overfact/internal/astpath"
)

// A falling factorial multiplied up by one loop and divided by k!
// multiplied up by another is C(n, k) (common practice: C(n, k) =
// n(n−1)…(n−k+1)/k!):
//
//	num := uint64(1)
//	for i := 0; i < k; i++ { num *= uint64(n - i) }
//	den := uint64(1)
//	for i := 2; i <= k; i++ { den *= uint64(i) }
//	return num / den
//
// The numerator wraps long before the quotient leaves the type (C(41,
// 20) fits uint64, 41·40·…·22 does not), and the numerator's loop has no
// fix of its own: the falling-factorial helper would panic where the
// quotient fits. The quotient becomes the binomial helper's call, and
// outside 0 ≤ k ≤ n the expression as written runs (keepOutsideDomain),
// where the loops' empty products and zero factors are what the code
// always computed:
//
//	if k < 0 || k > n {
//		//overfact:allow outside 0 ≤ k ≤ n the expression as written
//		return num / den
//	}
//	return lgamma.MustChooseUint64(uint64(n), uint64(k))
//
// The loops stay, since that branch reads them. The fixer checks on its
// own that each loop is what the match says (checkLoop, factorialUpTo),
// that both start at 1 and do nothing else, and that they run once,
// straight before the quotient, with nothing in between changing the
// products or the variables of n and k.
func buildLoopQuotient(b *builder) error {
	q, ok := b.m.Node.(*ast.BinaryExpr)
	d := b.m.Divisor
	if !ok || q.Op != token.QUO || d == nil || b.m.Loop == nil || d.Loop == nil || b.m.AccInit == nil || d.AccInit == nil {
		return errors.New("quotient match lacks the quotient or its loops")
	}
	info := b.pass.TypesInfo
	if b.m.Acc == d.Acc || identObj(info, q.X) != b.m.Acc || identObj(info, q.Y) != d.Acc {
		return errors.New("the quotient does not divide one loop's product by the other's")
	}
	for _, l := range []*Match{&b.m, d} {
		if !onlyUpdates(info, l.Loop, l.Acc) {
			return fmt.Errorf("the loop does more than update %s", l.Acc.Name())
		}
		if rhs := initValue(info, l.AccInit, l.Acc); rhs == nil || !isOne(info, rhs) {
			return fmt.Errorf("%s does not start at 1", l.Acc.Name())
		}
		if b.mentioned(l.Acc, l.AccInit.End(), l.Loop.Pos()) {
			return fmt.Errorf("%s changes between its initialisation and the loop", l.Acc.Name())
		}
	}
	if err := b.checkLoop(b.m.Loop, b.m.Acc); err != nil {
		return err
	}
	if err := b.factorialUpTo(d.Loop, d.Acc); err != nil {
		return err
	}
	if err := b.straightBefore(q, &b.m, d); err != nil {
		return err
	}
	// Outside 0 ≤ k ≤ n the loops' values are not the helper's: the
	// rewrite must be able to test the domain (keepOutsideDomain), on
	// operands of one type that it may evaluate twice.
	n, k := b.m.Args[0], b.m.Args[1]
	if !b.plain(n) || !b.plain(k) || !types.Identical(info.TypeOf(n), info.TypeOf(k)) {
		return errors.New("n and k are not plain operands of one type, which the test of the domain needs")
	}
	name, err := b.pick(shapes[b.m.Shape].helpers, b.m.Result)
	if err != nil {
		return err
	}
	return b.replaceByCall(name, b.m.Args)
}

// identObj returns the object of e when e is an identifier.
func identObj(info *types.Info, e ast.Expr) types.Object {
	if id, ok := ast.Unparen(e).(*ast.Ident); ok {
		return info.ObjectOf(id)
	}
	return nil
}

// factorialUpTo checks that the loop leaves acc at k!, k = b.m.Args[1]:
// it multiplies acc by its induction variable i alone, from 1 or 2 up to
// k (the empty product 1 is 0! and 1!).
func (b *builder) factorialUpTo(loop ast.Stmt, acc types.Object) error {
	k, ok := b.linearOf(b.m.Args[1])
	if !ok {
		return errors.New("k is not a sum of variables and constants")
	}
	iv, lo, count, body, err := b.counter(loop)
	if err != nil {
		return err
	}
	f, g, err := b.update(body, acc)
	if err != nil {
		return err
	}
	one := linearOne()
	jf, rest := split(f, iv, lo)
	if g != nil || jf != 1 || !rest.equal(lo) || !lo.equal(one) && !lo.equal(constLinear(2)) || !count.add(lo).add(one.neg()).equal(k) {
		return fmt.Errorf("the loop of %s is not the factorial of %s", acc.Name(), b.text(b.m.Args[1]))
	}
	return nil
}

// straightBefore checks that the initialisations and loops of the
// matches lie in the block of the statement that evaluates q, before it,
// so that each runs once for each quotient, and that nothing from the
// first loop to q changes the products or the variables of the operands.
func (b *builder) straightBefore(q ast.Expr, loops ...*Match) error {
	path, _ := astpath.Enclosing(b.file, q.Pos(), q.End())
	var list []ast.Stmt
	var at ast.Stmt
	for i, n := range path {
		s, ok := n.(ast.Stmt)
		if !ok || i+1 >= len(path) {
			continue
		}
		if l := stmtList(path[i+1]); l != nil {
			list, at = l, s
			break
		}
	}
	if at == nil {
		return errors.New("the quotient is not in a statement of a block")
	}
	index := func(s ast.Stmt) int {
		for i, t := range list {
			if t == s {
				return i
			}
		}
		return -1
	}
	first := at.Pos()
	watched := make(map[types.Object]bool)
	for _, l := range loops {
		i, j := index(l.AccInit), index(l.Loop)
		if i < 0 || j <= i || j >= index(at) {
			return errors.New("the loops do not run straight before the quotient")
		}
		first = min(first, l.Loop.Pos())
		watched[l.Acc] = true
	}
	for _, a := range b.m.Args {
		l, _ := b.linearOf(a)
		for _, v := range lform(l).Syms() {
			if v, ok := v.Object.(*types.Var); !ok || v.IsField() {
				return errors.New("an operand reads a field, which the code may change")
			}
			watched[v.Object] = true
		}
	}
	var changed types.Object
	skip := func(n ast.Node) bool {
		for _, l := range loops {
			if n == l.Loop || n == l.AccInit {
				return true // they set or update only their products
			}
		}
		return n.Pos() >= q.Pos()
	}
	for _, s := range list {
		if s.End() <= first || s.Pos() >= q.Pos() {
			continue
		}
		assigned.Each(b.pass.TypesInfo, s, skip, func(v types.Object, n ast.Node) bool {
			if watched[v] && n.Pos() < q.Pos() {
				changed = v
			}
			return changed == nil
		})
	}
	if changed != nil {
		return fmt.Errorf("%s changes between the loops and the quotient", changed.Name())
	}
	return nil
}
