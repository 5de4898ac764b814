package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
)

// A series whose running term and sum pass float64 while the value the
// code reads after the loop, the sum scaled down, does not,
//
//	term, sum := 1.0, 1.0
//	for i := 1; i <= n; i++ {
//		term *= lt / float64(i)
//		sum += term
//	}
//	return math.Exp(-lt) * sum
//
// carries the running term as a Product, the sum beside its float64
// value as a Sum (fixes/logsum.go), and reads the scaled sum as a
// Product chain over the Sum's Product:
//
//	term, sum := lgamma.ProductOf(1.0), 1.0
//	sumLog := lgamma.SumOf(sum)
//	for i := 1; i <= n; i++ {
//		term = term.MulFloat(lt / float64(i))
//		sumLog = sumLog.Add(term)
//		sum = sumLog.Float64()
//	}
//	return lgamma.ExpProduct(-lt).Mul(sumLog.Product()).Float64()
//
// Every float64 operation of the original is the same operation in the
// Products and the Sum, in the same order, and each answers that value
// wherever no step left the normal range: nothing right changes. The
// read must be a product or quotient with the sum among its factors
// and none of the running terms; the sum obeys buildLogSum's rules, and
// each term it adds is a product over the carried terms.
func buildRunSum(b *builder) error {
	node, ok := b.m.Node.(ast.Expr)
	if !ok || b.m.Func == nil {
		return errors.New("running-sum match lacks its read or its function")
	}
	sum, err := b.sumVar()
	if err != nil {
		return err
	}
	body := b.funcBody()
	if body == nil {
		return errors.New("the sum's function has no body")
	}
	pkg := b.helper(node.Pos())
	lp := &logProducts{b: b, set: map[types.Object]bool{}, pkg: pkg, skip: map[ast.Node]bool{}}
	for _, a := range b.m.Args {
		id, ok := ast.Unparen(a).(*ast.Ident)
		if !ok {
			continue
		}
		v, ok := b.pass.TypesInfo.ObjectOf(id).(*types.Var)
		if !ok || lp.set[v] || v == sum {
			continue
		}
		if err := lp.qualifies(v, body); err != nil {
			return err
		}
		lp.set[v] = true
	}
	if len(lp.set) == 0 && len(b.m.Factorials) == 0 {
		return errors.New("no running term the fixer can carry in log space")
	}
	ls := &logSum{b: b, sum: sum, lp: lp}
	if err := ls.writes(body); err != nil {
		return err
	}
	if ls.decl == nil || len(ls.adds) == 0 {
		return errors.New("the sum has no declaration or no addition the fixer can rewrite")
	}
	if len(lp.set) == 0 {
		// Terms written out on each trip (runsumterms.go).
		if ls.readParts, err = ls.explicitTerms(body, node); err != nil {
			return err
		}
	}
	for i, t := range ls.terms {
		if ls.defs[i] != nil || !lp.chainableIn(ast.Unparen(t), ls.readParts != nil) {
			return fmt.Errorf("a term the fixer cannot carry in log space: %s", b.text(t))
		}
	}
	name, err := ls.logName(body, node.Pos())
	if err != nil {
		return err
	}
	lp.copies(body)
	ls.dropSumCopies(body)
	readText, err := ls.scaledRead(node, name)
	if err != nil {
		return err
	}
	if err := ls.wholeStatements(); err != nil {
		return err
	}
	if b.commentIn(node) {
		return errors.New("a comment inside the read of the sum")
	}
	for _, st := range ls.adds {
		lp.skip[st] = true
	}
	lp.skip[node] = true
	ls.compares(body, name)
	lp.rewrite(body)
	if lp.err != nil {
		return lp.err
	}
	ls.emit(name, func(i int) string { return lp.product(ast.Unparen(ls.terms[i])) })
	b.replace(node.Pos(), node.End(), readText)
	b.message = fmt.Sprintf("Carry the running term and the sum %s in log space (%s.Product, %s.Sum), so that the sum scaled after the loop stays finite where it is (imports %s)", sum.Name(), pkg, pkg, HelperPath)
	return nil
}

// scaledRead writes the read of the sum after the loop: a product with
// the sum among its factors and no running term, as the Product chain
// over name.Product(); or a quotient num / (sum + x), num and x products
// over the running terms (Erlang C's last / (sum + last)), as num's
// chain over name.Add(x).Product(): the same float64 addition and
// division, each carried in log space.
func (ls *logSum) scaledRead(node ast.Expr, name string) (string, error) {
	b, lp, sum := ls.b, ls.lp, ls.sum
	if node.Pos() < ls.decl.End() {
		return "", errors.New("the sum is read before it is declared")
	}
	if q, ok := ast.Unparen(node).(*ast.BinaryExpr); ok && q.Op == token.QUO {
		if add, ok := ast.Unparen(q.Y).(*ast.BinaryExpr); ok && add.Op == token.ADD {
			x := add.Y
			if id, ok := ast.Unparen(add.Y).(*ast.Ident); ok && b.pass.TypesInfo.Uses[id] == sum {
				x = add.X
			} else if id, ok := ast.Unparen(add.X).(*ast.Ident); !ok || b.pass.TypesInfo.Uses[id] != sum {
				x = nil
			}
			if x != nil && lp.chainableIn(ast.Unparen(q.X), false) && lp.chainableIn(ast.Unparen(x), false) && !b.mentionsObj(q.X, sum) && !b.mentionsObj(x, sum) {
				return lp.product(ast.Unparen(q.X)) + ".Quo(" + name + ".Add(" + lp.product(ast.Unparen(x)) + ").Product()).Float64()", nil
			}
		}
	}
	read := &logProducts{b: b, set: map[types.Object]bool{sum: true}, pkg: lp.pkg, calls: true, names: map[types.Object]string{sum: name + ".Product()"}}
	if !read.chainableIn(node, true) {
		return "", fmt.Errorf("the read of the sum is not a product the fixer can carry: %s", b.text(node))
	}
	for v := range lp.set {
		if ls.readParts[v] {
			read.set[v] = true
			continue
		}
		if b.mentionsObj(node, v) {
			return "", fmt.Errorf("the read of the sum reads the running term %s too", v.Name())
		}
	}
	return read.chain(node) + ".Float64()", nil
}

// dropSumCopies takes off the carried variables those assigned a value
// that reads the sum (pw := last / (sum + last)): the sum stays a
// float64 and its reads are the caller's to write.
func (ls *logSum) dropSumCopies(body *ast.BlockStmt) {
	b := ls.b
	ast.Inspect(body, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok {
			return true
		}
		for i, l := range as.Lhs {
			id, ok := ast.Unparen(l).(*ast.Ident)
			if !ok {
				continue
			}
			v := b.pass.TypesInfo.ObjectOf(id)
			if ls.lp.set[v] && (len(as.Lhs) != len(as.Rhs) || b.mentionsObj(as.Rhs[i], ls.sum)) {
				delete(ls.lp.set, v)
			}
		}
		return true
	})
}

// compares rewrites each comparison < or > after the sum's declaration
// that reads a running term or the sum, math.Abs(del) <
// math.Abs(sum)*1e-16 (the exit of a series once its terms no longer
// change the sum), as Product.Less of its two sides, the sum read as
// its Product:
//
//	del.Abs().Less(sumLog.Product().Abs().MulFloat(1e-16))
//
// Less is the float64 comparison wherever both sides are normal
// float64s the code formed, and the comparison of the values carried
// beside them elsewhere: where the float64 sum is +Inf while the sum is
// not, del < +Inf would stop the series on its first trip past float64,
// far from its end. A side that is no product over the carried values
// must not read one; the comparison is then left to the rewrite, which
// reads each value back as a float64.
func (ls *logSum) compares(body *ast.BlockStmt, name string) {
	b, lp := ls.b, ls.lp
	set := map[types.Object]bool{ls.sum: true}
	for v := range lp.set {
		set[v] = true
	}
	cmp := &logProducts{b: b, set: set, pkg: lp.pkg, abs: true, names: map[types.Object]string{ls.sum: name + ".Product()"}}
	reads := func(e ast.Expr) bool {
		for v := range set {
			if b.mentionsObj(e, v) {
				return true
			}
		}
		return false
	}
	ast.Inspect(body, func(n ast.Node) bool {
		x, ok := n.(*ast.BinaryExpr)
		if !ok || x.Op != token.LSS && x.Op != token.GTR || x.Pos() < ls.decl.End() {
			return true
		}
		l, r := ast.Unparen(x.X), ast.Unparen(x.Y)
		if !cmp.chainable(l) && !cmp.chainable(r) || !cmp.chainable(l) && reads(l) || !cmp.chainable(r) && reads(r) {
			return true
		}
		if x.Op == token.GTR {
			l, r = r, l
		}
		b.replace(x.Pos(), x.End(), cmp.product(l)+".Less("+cmp.product(r)+")")
		lp.skip[x] = true
		return false
	})
}
