package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
	"strings"
)

// A sum that keeps its running factorial in the loop that adds the terms,
//
//	sum, fact := 1.0, 1.0
//	for k := 1; k <= n; k++ {
//		fact *= float64(k)
//		sum += math.Pow(x, float64(k)) / fact
//	}
//
// keeps its loop and takes each term from the helper, in log space:
//
//	sum := 1.0
//	for k := 1; k <= n; k++ {
//		sum += lgamma.PowOverFactorial(x, k)
//	}
//
// fact is k! after its update on trip k (it starts at 1 and the loop
// counts k up by one from 1 or 2), so the term is x^k/k!, which
// PowOverFactorial evaluates without forming either power or factorial
// (DLMF 5.11.1 for ln k!; common practice). The accumulator goes with its
// update: nothing else reads it.
func buildSeriesTerm(b *builder) error {
	m := b.m
	term, ok := ast.Unparen(m.Node.(ast.Expr)).(*ast.BinaryExpr)
	if !ok || term.Op != token.QUO || m.Acc == nil || m.AccInit == nil || m.Loop == nil || len(m.Args) != 2 {
		return errors.New("series term match lacks its quotient, accumulator, initialisation or loop")
	}
	if classOf(m.Result) != classFloat {
		return fmt.Errorf("series term of non-float type %s", m.Result)
	}
	info := b.pass.TypesInfo
	if id, ok := ast.Unparen(term.Y).(*ast.Ident); !ok || info.ObjectOf(id) != m.Acc {
		return fmt.Errorf("the term does not divide by %s", m.Acc.Name())
	}
	iv, lo, _, body, err := b.counter(m.Loop)
	if err != nil {
		return err
	}
	if !lo.equal(constLinear(1)) && !lo.equal(constLinear(2)) {
		return errors.New("the loop does not count from 1 or 2")
	}
	if !b.isPowOf(term.X, m.Args[0], iv) {
		return fmt.Errorf("the numerator is not math.Pow(%s, %s)", b.text(m.Args[0]), iv.Name())
	}
	update, err := b.factorialUpdate(body, m.Acc, iv)
	if err != nil {
		return err
	}
	if term.Pos() < update.End() || !within([]ast.Expr{term}, []ast.Node{body}) {
		return errors.New("the term is not read after the factorial's update in the loop")
	}
	if b.inClosure(body, term) {
		return errors.New("the term lies in a function literal, which may run on a later trip")
	}
	init, err := b.initWithout(m.AccInit, m.Acc)
	if err != nil {
		return err
	}
	// The update reads the accumulator once (acc *= k and acc = acc * k
	// alike), the term once.
	if b.uses(m.Acc) != 2 {
		return fmt.Errorf("%s is read outside the term and its update", m.Acc.Name())
	}
	text, err := b.call("PowOverFactorial", m.Args, m.Result)
	if err != nil {
		return err
	}
	b.replace(term.Pos(), term.End(), text)
	b.deleteStmt(update)
	if init == "" {
		b.deleteStmt(m.AccInit)
	} else {
		b.replace(m.AccInit.Pos(), m.AccInit.End(), init)
	}
	b.message = b.rewriteMessage() + " and drop the running factorial " + m.Acc.Name()
	return nil
}

func constLinear(c int64) linear {
	l := newLinear()
	l.c = constant.MakeInt64(c)
	return l
}

func varLinear(v types.Object) linear {
	l := newLinear()
	l.terms[v] = constant.MakeInt64(1)
	return l
}

// isPowOf reports whether e is math.Pow(x, k) with k the counter iv,
// through numeric conversions.
func (b *builder) isPowOf(e, x ast.Expr, iv types.Object) bool {
	call, fn := b.callOf(e)
	if call == nil || !isMath(fn, "Pow") || len(call.Args) != 2 || ast.Unparen(call.Args[0]) != ast.Unparen(x) {
		return false
	}
	k, ok := b.linearOf(call.Args[1])
	return ok && k.equal(varLinear(iv))
}

// factorialUpdate returns the one statement of the loop's body that
// assigns acc, which must be acc *= iv or acc = acc * iv (through
// conversions), at the body's top level.
func (b *builder) factorialUpdate(body *ast.BlockStmt, acc, iv types.Object) (ast.Stmt, error) {
	var update ast.Stmt
	for _, s := range body.List {
		if !b.assigns(s, acc) {
			continue
		}
		if update != nil {
			return nil, fmt.Errorf("the loop assigns %s twice", acc.Name())
		}
		update = s
	}
	as, ok := update.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil, fmt.Errorf("the loop does not multiply %s by its counter", acc.Name())
	}
	f := as.Rhs[0]
	if as.Tok == token.ASSIGN {
		m, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		if !ok || m.Op != token.MUL {
			return nil, fmt.Errorf("the loop does not multiply %s by its counter", acc.Name())
		}
		switch {
		case b.isObj(m.X, acc):
			f = m.Y
		case b.isObj(m.Y, acc):
			f = m.X
		default:
			return nil, fmt.Errorf("the loop does not multiply %s by its counter", acc.Name())
		}
	} else if as.Tok != token.MUL_ASSIGN {
		return nil, fmt.Errorf("the loop does not multiply %s by its counter", acc.Name())
	}
	if l, ok := b.linearOf(f); !ok || !l.equal(varLinear(iv)) {
		return nil, fmt.Errorf("the loop does not multiply %s by its counter", acc.Name())
	}
	return update, nil
}

// assigns reports whether s, or a statement nested in it, assigns obj.
func (b *builder) assigns(s ast.Stmt, obj types.Object) bool {
	found := false
	ast.Inspect(s, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				found = found || b.isObj(l, obj)
			}
		case *ast.IncDecStmt:
			found = found || b.isObj(n.X, obj)
		case *ast.UnaryExpr:
			found = found || n.Op == token.AND && b.isObj(n.X, obj)
		}
		return !found
	})
	return found
}

func (b *builder) isObj(e ast.Expr, obj types.Object) bool {
	id, ok := ast.Unparen(e).(*ast.Ident)
	return ok && b.pass.TypesInfo.ObjectOf(id) == obj
}

// uses counts the identifiers in the file that read obj (its
// definition excluded, the left side of a plain assignment too).
func (b *builder) uses(obj types.Object) int {
	n := 0
	ast.Inspect(b.file, func(node ast.Node) bool {
		if as, ok := node.(*ast.AssignStmt); ok && as.Tok == token.ASSIGN {
			// The targets of a plain assignment are writes.
			for _, r := range as.Rhs {
				ast.Inspect(r, func(x ast.Node) bool {
					if id, ok := x.(*ast.Ident); ok && b.pass.TypesInfo.Uses[id] == obj {
						n++
					}
					return true
				})
			}
			for _, l := range as.Lhs {
				if _, ok := l.(*ast.Ident); !ok {
					ast.Inspect(l, func(x ast.Node) bool {
						if id, ok := x.(*ast.Ident); ok && b.pass.TypesInfo.Uses[id] == obj {
							n++
						}
						return true
					})
				}
			}
			return false
		}
		if id, ok := node.(*ast.Ident); ok && b.pass.TypesInfo.Uses[id] == obj {
			n++
		}
		return true
	})
	return n
}

// inClosure reports whether n lies in a function literal inside root.
func (b *builder) inClosure(root, n ast.Node) bool {
	found := false
	ast.Inspect(root, func(x ast.Node) bool {
		if lit, ok := x.(*ast.FuncLit); ok && lit.Pos() <= n.Pos() && n.End() <= lit.End() {
			found = true
		}
		return !found
	})
	return found
}

// initWithout returns the text of init with acc's name and value taken
// out, "" when acc is all it declares; acc must start at 1.
func (b *builder) initWithout(init ast.Stmt, acc types.Object) (string, error) {
	info := b.pass.TypesInfo
	if v := initValue(info, init, acc); v != nil {
		if !isOne(info, v) {
			return "", fmt.Errorf("%s does not start at 1", acc.Name())
		}
		return "", nil
	}
	as, ok := init.(*ast.AssignStmt)
	if !ok || as.Tok != token.DEFINE || len(as.Lhs) != len(as.Rhs) {
		return "", fmt.Errorf("%s is not declared on its own or in a plain list", acc.Name())
	}
	var names, values []string
	found := false
	for i, l := range as.Lhs {
		if id, ok := l.(*ast.Ident); ok && info.ObjectOf(id) == acc {
			if !isOne(info, as.Rhs[i]) {
				return "", fmt.Errorf("%s does not start at 1", acc.Name())
			}
			found = true
			continue
		}
		names = append(names, b.copyText(l))
		values = append(values, b.copyText(as.Rhs[i]))
	}
	if !found {
		return "", fmt.Errorf("%s is not declared by its initialisation", acc.Name())
	}
	if b.commentIn(init) {
		return "", errors.New("the initialisation holds a comment")
	}
	return strings.Join(names, ", ") + " := " + strings.Join(values, ", "), nil
}

// commentIn reports whether a comment lies inside n.
func (b *builder) commentIn(n ast.Node) bool {
	for _, g := range b.file.Comments {
		if n.Pos() < g.Pos() && g.End() < n.End() {
			return true
		}
	}
	return false
}
