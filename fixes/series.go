package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"strings"

	"github.com/overfact/overfact/internal/assigned"
	"github.com/overfact/overfact/internal/astpath"
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
// counts k up by one from 1 or 2), so the term is x^k/k!, which the
// helper evaluates without forming either power or factorial (DLMF 5.11.1
// for ln k!; common practice). The running factorial goes with its update
// and its declaration, and so does a running power that only the term
// reads. The numerators a term may have are the rows of seriesForms.
func buildSeriesTerm(b *builder) error {
	m := b.m
	term, ok := ast.Unparen(m.Node.(ast.Expr)).(*ast.BinaryExpr)
	if !ok || term.Op != token.QUO || m.Acc == nil || m.Loop == nil {
		return errors.New("series term match lacks its quotient, accumulator or loop")
	}
	if classOf(m.Result) != classFloat {
		return fmt.Errorf("series term of non-float type %s", m.Result)
	}
	if !b.isObj(term.Y, m.Acc) {
		return fmt.Errorf("the term does not divide by %s", m.Acc.Name())
	}
	iv, lo, _, body, err := b.counter(m.Loop)
	if err != nil {
		return err
	}
	if !lo.equal(constLinear(1)) && !lo.equal(constLinear(2)) {
		return errors.New("the loop does not count from 1 or 2")
	}
	update, err := b.runningUpdate(body, m.Acc, varLinear(iv), nil)
	if err != nil {
		return err
	}
	if term.Pos() < update.End() || b.inClosure(body, term) {
		return errors.New("the term is not read on the trip that updates the factorial, after the update")
	}
	s := &seriesTerm{iv: iv, lo: lo, body: body, update: update, drop: []types.Object{m.Acc}, stmts: []ast.Stmt{update}}
	var form *seriesForm
	for i := range seriesForms {
		if s.args = seriesForms[i].match(b, s, term.X); s.args != nil {
			form = &seriesForms[i]
			break
		}
	}
	if form == nil {
		return fmt.Errorf("the numerator %s is no form the helper evaluates over %s!", b.text(term.X), iv.Name())
	}
	for _, v := range s.drop {
		// Each dropped accumulator is read by its update once (v *= f
		// and v = v * f alike) and by the term once, and written by its
		// update and its declaration alone.
		if b.uses(v) != 2 {
			return fmt.Errorf("%s is read outside the term and its update", v.Name())
		}
		writes := 1
		if _, ok := b.declaring(v).(*ast.AssignStmt); ok {
			writes++
		}
		if b.writes(v) != writes {
			return fmt.Errorf("%s is assigned outside its declaration and its update", v.Name())
		}
	}
	inits, err := b.initsWithout(s.drop)
	if err != nil {
		return err
	}
	folded := false
	if form.helper == "PowOverFactorial" {
		// A term of e^−λ·Σ λ^k/k! takes e^−λ in (poissonsum.go).
		if folded, err = b.foldPoissonTerm(term, s.args[0], s.args[1]); err != nil {
			return err
		}
	}
	if !folded {
		text, err := b.call(form.helper, s.args, m.Result)
		if err != nil {
			return err
		}
		b.replace(term.Pos(), term.End(), text)
	}
	for _, st := range s.stmts {
		b.deleteStmt(st)
	}
	b.applyInits(inits)
	names := make([]string, len(s.drop))
	for i, v := range s.drop {
		names[i] = v.Name()
	}
	if !folded {
		b.message = b.rewriteMessage()
	}
	b.message += " and drop the running " + strings.Join(names, " and ")
	return nil
}

// seriesTerm is what a numerator's match learns about the loop.
type seriesTerm struct {
	iv     types.Object
	lo     linear
	body   *ast.BlockStmt
	update ast.Stmt       // the factorial's update
	args   []ast.Expr     // the helper's operands
	drop   []types.Object // accumulators the rewrite removes
	stmts  []ast.Stmt     // their updates
}

// A seriesForm is one numerator a running factorial's term may have: it
// recognises the numerator and returns the helper's operands.
type seriesForm struct {
	helper string
	match  func(b *builder, s *seriesTerm, num ast.Expr) []ast.Expr
}

var seriesForms = []seriesForm{
	// math.Pow(x, k)/k!                      → PowOverFactorial(x, k)
	{"PowOverFactorial", func(b *builder, s *seriesTerm, num ast.Expr) []ast.Expr {
		if x := b.powOf(num, s.iv); x != nil {
			return []ast.Expr{x, b.counterRef(num, s.iv)}
		}
		return nil
	}},
	// math.Exp(−λ)·math.Pow(λ, k)/k!, any order → PoissonTerm(k, λ), the
	// probability for λ ≥ 0 and the formula below
	{"PoissonTerm", func(b *builder, s *seriesTerm, num ast.Expr) []ast.Expr {
		var fs, den []ast.Expr
		if !b.factors(num, false, &fs, &den) || len(fs) != 2 || len(den) != 0 {
			return nil
		}
		for i := range fs {
			pow, exp := fs[i], fs[1-i]
			lambda := b.powOf(pow, s.iv)
			if lambda == nil {
				continue
			}
			l, ok := b.linearOf(lambda)
			if ok && b.mathCall("Exp", l.neg())(exp) {
				return []ast.Expr{b.counterRef(pow, s.iv), lambda}
			}
		}
		return nil
	}},
	// p/k! with p *= x on the same trip before the term, from p = 1 and
	// k from 1 → PowOverFactorial(x, k)
	{"PowOverFactorial", func(b *builder, s *seriesTerm, num ast.Expr) []ast.Expr {
		id, ok := ast.Unparen(num).(*ast.Ident)
		if !ok || !s.lo.equal(constLinear(1)) {
			return nil
		}
		p, ok := b.pass.TypesInfo.Uses[id].(*types.Var)
		if !ok {
			return nil
		}
		var x ast.Expr
		update, err := b.runningUpdate(s.body, p, linear{}, &x)
		if err != nil || update.End() > num.Pos() || !b.invariant(x, s.body) {
			return nil
		}
		s.drop = append(s.drop, p)
		s.stmts = append(s.stmts, update)
		return []ast.Expr{x, b.counterRef(s.update, s.iv)}
	}},
}

// powOf returns x when e is math.Pow(x, k) with k the counter iv,
// through numeric conversions, or nil.
func (b *builder) powOf(e ast.Expr, iv types.Object) ast.Expr {
	call, fn := b.callOf(e)
	if call == nil || !isMath(fn, "Pow") || len(call.Args) != 2 {
		return nil
	}
	if k, ok := b.linearOf(call.Args[1]); !ok || !k.equal(varLinear(iv)) {
		return nil
	}
	return call.Args[0]
}

// counterRef returns an identifier of iv inside n, for the helper's k.
func (b *builder) counterRef(n ast.Node, iv types.Object) ast.Expr {
	var ref ast.Expr
	ast.Inspect(n, func(x ast.Node) bool {
		if id, ok := x.(*ast.Ident); ok && ref == nil && b.pass.TypesInfo.Uses[id] == iv {
			ref = id
		}
		return ref == nil
	})
	return ref
}

// invariant reports whether no variable e reads is assigned in body.
func (b *builder) invariant(e ast.Expr, body *ast.BlockStmt) bool {
	for _, v := range b.vars(e) {
		if b.assigns(body, v) {
			return false
		}
	}
	return true
}

// runningUpdate returns the one statement at the top of the loop's body
// that assigns acc, which must be acc *= f or acc = acc * f. With want
// set, f must be that linear form; with factor set, f is returned there.
func (b *builder) runningUpdate(body *ast.BlockStmt, acc types.Object, want linear, factor *ast.Expr) (ast.Stmt, error) {
	bad := fmt.Errorf("the loop does not multiply %s by one factor", acc.Name())
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
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 || !b.isObj(as.Lhs[0], acc) {
		return nil, bad
	}
	f := as.Rhs[0]
	switch as.Tok {
	case token.MUL_ASSIGN:
	case token.ASSIGN:
		m, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		switch {
		case !ok || m.Op != token.MUL:
			return nil, bad
		case b.isObj(m.X, acc):
			f = m.Y
		case b.isObj(m.Y, acc):
			f = m.X
		default:
			return nil, bad
		}
	default:
		return nil, bad
	}
	if factor != nil {
		*factor = f
		return update, nil
	}
	if l, ok := b.linearOf(f); !ok || !l.equal(want) {
		return nil, bad
	}
	return update, nil
}

// assigns reports whether n, or a statement nested in it, assigns obj.
func (b *builder) assigns(n ast.Node, obj types.Object) bool {
	return b.countWrites(n, obj, true) > 0
}

// writes counts the changes of obj in the file (internal/assigned: an
// assignment, ++ or --, a range clause, its address taken).
func (b *builder) writes(obj types.Object) int {
	return b.countWrites(b.file, obj, false)
}

func (b *builder) countWrites(root ast.Node, obj types.Object, first bool) int {
	n := 0
	assigned.Each(b.pass.TypesInfo, root, nil, func(v types.Object, _ ast.Node) bool {
		if v == obj {
			n++
		}
		return !first || n == 0
	})
	return n
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

// initsWithout finds the statement declaring each of vars, which must
// start it at 1 and lie before the loop, and returns each statement's
// text with those names and values taken out ("" when nothing is left).
func (b *builder) initsWithout(vars []types.Object) (map[ast.Stmt]string, error) {
	info := b.pass.TypesInfo
	drop := make(map[types.Object]bool)
	stmts := make(map[ast.Stmt]bool)
	for _, v := range vars {
		drop[v] = true
		st := b.declaring(v)
		if st == nil {
			return nil, fmt.Errorf("%s is not declared by a statement of its own function", v.Name())
		}
		stmts[st] = true
	}
	out := make(map[ast.Stmt]string)
	for st := range stmts {
		if v := b.soleInit(st, drop); v != nil {
			if !isOne(info, v) {
				return nil, errors.New("a running product does not start at 1")
			}
			out[st] = ""
			continue
		}
		as, ok := st.(*ast.AssignStmt)
		if !ok || as.Tok != token.DEFINE || len(as.Lhs) != len(as.Rhs) {
			return nil, errors.New("a running product is not declared on its own or in a plain list")
		}
		if b.commentIn(st) {
			return nil, errors.New("the initialisation holds a comment")
		}
		var names, values []string
		for i, l := range as.Lhs {
			if id, ok := l.(*ast.Ident); ok && drop[info.ObjectOf(id)] {
				if !isOne(info, as.Rhs[i]) {
					return nil, fmt.Errorf("%s does not start at 1", id.Name)
				}
				continue
			}
			names = append(names, b.copyText(l))
			values = append(values, b.copyText(as.Rhs[i]))
		}
		if len(names) > 0 {
			out[st] = strings.Join(names, ", ") + " := " + strings.Join(values, ", ")
		} else {
			out[st] = ""
		}
	}
	return out, nil
}

// declaring returns the statement whose identifier defines v.
func (b *builder) declaring(v types.Object) ast.Stmt {
	path, _ := astpath.Enclosing(b.file, v.Pos(), v.Pos())
	for _, n := range path {
		switch n := n.(type) {
		case *ast.AssignStmt, *ast.DeclStmt:
			return n.(ast.Stmt)
		case *ast.FuncDecl, *ast.FuncLit, *ast.File:
			return nil
		}
	}
	return nil
}

// soleInit returns the value st gives the one variable it declares when
// that variable is in drop.
func (b *builder) soleInit(st ast.Stmt, drop map[types.Object]bool) ast.Expr {
	for v := range drop {
		if e := initValue(b.pass.TypesInfo, st, v); e != nil {
			return e
		}
	}
	return nil
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

// commentCopied reports whether a comment inside n lies in source the
// fix copies (copyText).
func (b *builder) commentCopied(n ast.Node) bool {
	for _, g := range b.file.Comments {
		if n.Pos() < g.Pos() && g.End() < n.End() {
			for _, c := range b.copied {
				if c.pos <= g.Pos() && g.End() <= c.end {
					return true
				}
			}
		}
	}
	return false
}
