package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
)

// The logarithm of a float64 sum whose terms, or whose running value,
// pass float64 while the logarithm does not,
//
//	var possible float64
//	for i := 0.0; i <= k; i++ {
//		possible += choose(n, i)
//	}
//	return math.Log2(possible)
//
// keeps the sum and its loop, and carries beside it a Sum of the helper,
// which forms the same float64 sum term by term (each term a Product:
// the code's own value, with the logarithm of a binomial function's
// C(n, k) or of a power beside it) and the logarithm of the sum of the
// terms:
//
//	var possible float64
//	possibleLog := lgamma.SumOf(possible)
//	for i := 0.0; i <= k; i++ {
//		possibleLog = possibleLog.Add(lgamma.ChooseProduct(choose(n, i), n, i))
//		possible = possibleLog.Float64()
//	}
//	return possibleLog.Log2()
//
// The float64 sum is the code's own wherever each term's steps stayed in
// range (Product.Float64), and Log2 is math.Log2 of it wherever it is a
// normal positive float64: the rewrite changes no value the code got
// right. The sum must be a float64 local declared in the function and
// changed only by s += term, s = s + term and plain assignments that
// restart it (s = 0); a term may be a local defined just for it.
func buildLogSum(b *builder) error {
	call, fn := b.callOf(asExpr(b.m.Node))
	if call == nil || len(call.Args) != 1 || !(isMath(fn, "Log") || isMath(fn, "Log2") || isMath(fn, "Log10")) {
		return errors.New("log-sum match lacks its math.Log call")
	}
	sum, err := b.sumVar()
	if err != nil {
		return err
	}
	if id, ok := ast.Unparen(call.Args[0]).(*ast.Ident); !ok || b.pass.TypesInfo.Uses[id] != sum {
		return fmt.Errorf("math.%s does not take the sum itself", fn.Name())
	}
	body := b.funcBody()
	if body == nil {
		return errors.New("the sum's function has no body")
	}
	if err := b.plainBinomials(); err != nil {
		return err
	}
	ls := &logSum{b: b, sum: sum, lp: &logProducts{b: b, set: map[types.Object]bool{}, pkg: b.helper(call.Pos()), calls: true}}
	if err := ls.writes(body); err != nil {
		return err
	}
	if ls.decl == nil || !ls.carries {
		return errors.New("no term of the sum holds a value the fixer can carry in log space")
	}
	if call.Pos() < ls.decl.End() {
		return errors.New("the logarithm is taken before the sum is declared")
	}
	name, err := ls.logName(body, call.Pos())
	if err != nil {
		return err
	}
	if err := ls.wholeStatements(); err != nil {
		return err
	}
	pkg := ls.lp.pkg
	ls.emit(name, func(i int) string {
		if def := ls.defs[i]; def != nil {
			// t := E; s += t: the local becomes the Product of E.
			r := def.Rhs[0]
			b.replace(r.Pos(), r.End(), ls.lp.product(r))
			return b.text(ls.terms[i])
		}
		return ls.lp.product(ls.terms[i])
	})
	b.replace(call.Pos(), call.End(), name+"."+fn.Name()+"()")
	b.message = fmt.Sprintf("Carry the sum %s in log space beside its float64 value (%s.Sum), so that its logarithm stays finite where the sum passes float64 (imports %s)", sum.Name(), pkg, HelperPath)
	return nil
}

// sumVar returns the match's sum, a float64 variable.
func (b *builder) sumVar() (*types.Var, error) {
	sum, ok := b.m.Acc.(*types.Var)
	if !ok || !types.Identical(sum.Type(), types.Typ[types.Float64]) {
		return nil, errors.New("the sum is not a float64 variable")
	}
	return sum, nil
}

// plainBinomials refuses a match whose binomial calls have operands
// with effects: the rewrite writes them again beside the call.
func (b *builder) plainBinomials() error {
	for _, f := range b.m.Binomials {
		if !b.plain(f.N) || !b.plain(f.K) {
			return errors.New("a binomial's operands have effects the rewrite would repeat")
		}
	}
	return nil
}

// logName returns the name of the Sum carried beside the sum, s + "Log",
// when it is free wherever the rewrite declares or reads it.
func (ls *logSum) logName(body *ast.BlockStmt, read token.Pos) (string, error) {
	name := ls.sum.Name() + "Log"
	if !ls.b.free(name, ls.decl.End()) || !ls.b.free(name, read) || declaresName(body, name) {
		return "", fmt.Errorf("the name %s is taken", name)
	}
	return name, nil
}

// wholeStatements refuses a sum whose statements are not statements of
// a block or hold a comment: the rewrite replaces them whole.
func (ls *logSum) wholeStatements() error {
	for _, st := range append(append([]ast.Stmt{ls.decl}, ls.adds...), ls.resets...) {
		if _, _, err := ls.b.enclosingList(st); err != nil || ls.b.commentIn(st) {
			return fmt.Errorf("a statement of the sum the fixer cannot rewrite whole: %s", ls.b.text(st))
		}
	}
	return nil
}

// emit declares the Sum name beside the sum, restarts it where the sum
// is, and turns each s += t into name = name.Add(term(i)); s =
// name.Float64().
func (ls *logSum) emit(name string, term func(i int) string) {
	b, pkg, s := ls.b, ls.lp.pkg, ls.sum.Name()
	b.insert(ls.decl.End(), "\n"+b.indentOf(ls.decl.Pos())+name+" := "+pkg+".SumOf("+s+")")
	for _, st := range ls.resets {
		b.insert(st.End(), "\n"+b.indentOf(st.Pos())+name+" = "+pkg+".SumOf("+s+")")
	}
	for i, st := range ls.adds {
		b.replace(st.Pos(), st.End(), name+" = "+name+".Add("+term(i)+")\n"+b.indentOf(st.Pos())+s+" = "+name+".Float64()")
	}
}

// logSum is what buildLogSum reads of the sum's writes.
type logSum struct {
	b       *builder
	sum     *types.Var
	lp      *logProducts
	decl    ast.Stmt          // the declaration, var s float64 or s := …
	adds    []ast.Stmt        // s += t, s = s + t
	terms   []ast.Expr        // t of each add
	defs    []*ast.AssignStmt // t := E before an add whose t is that local, else nil
	resets  []ast.Stmt        // s = e, e not reading s
	carries bool              // some term carries a logarithm of its own
	// readParts are the carried locals the read of the sum multiplies
	// beside it, where the terms are written out (runsumterms.go).
	readParts map[types.Object]bool
}

// writes sorts every write of the sum, and refuses any it cannot keep
// in step: ++, &s, a closure's, a multiple assignment, or an operator
// other than += and =.
func (ls *logSum) writes(body *ast.BlockStmt) error {
	info := ls.b.pass.TypesInfo
	isSum := func(e ast.Expr) bool {
		id, ok := ast.Unparen(e).(*ast.Ident)
		return ok && info.ObjectOf(id) == ls.sum
	}
	var err error
	ast.Inspect(body, func(n ast.Node) bool {
		if err != nil {
			return false
		}
		switch x := n.(type) {
		case *ast.FuncLit:
			if ls.b.mentionsObj(x, ls.sum) {
				err = errors.New("a function literal reads or sets the sum")
			}
			return false
		case *ast.UnaryExpr:
			if x.Op == token.AND && isSum(x.X) {
				err = errors.New("the sum's address is taken")
			}
		case *ast.IncDecStmt:
			if isSum(x.X) {
				err = errors.New("the sum is incremented")
			}
		case *ast.RangeStmt:
			if x.Key != nil && isSum(x.Key) || x.Value != nil && isSum(x.Value) {
				err = errors.New("a range clause sets the sum")
			}
		case *ast.DeclStmt:
			if varSpec(x, ls.sum) != nil {
				ls.decl = x
			}
		case *ast.AssignStmt:
			err = ls.assign(x, isSum)
		}
		return true
	})
	return err
}

// assign sorts one assignment that may write the sum.
func (ls *logSum) assign(x *ast.AssignStmt, isSum func(ast.Expr) bool) error {
	at := -1
	for i, l := range x.Lhs {
		if isSum(l) {
			at = i
		}
	}
	if at < 0 {
		return nil
	}
	if x.Tok == token.DEFINE && len(x.Lhs) == len(x.Rhs) {
		ls.decl = x // term, sum := 1.0, 1.0
		return nil
	}
	if len(x.Lhs) != 1 || len(x.Rhs) != 1 {
		return errors.New("the sum is set in a multiple assignment")
	}
	r := x.Rhs[0]
	switch {
	case x.Tok == token.DEFINE:
		ls.decl = x
	case x.Tok == token.ADD_ASSIGN && !ls.b.mentionsObj(r, ls.sum):
		ls.add(x, r)
	case x.Tok == token.ASSIGN && !ls.b.mentionsObj(r, ls.sum):
		ls.resets = append(ls.resets, x)
	case x.Tok == token.ASSIGN:
		bin, ok := ast.Unparen(r).(*ast.BinaryExpr)
		if !ok || bin.Op != token.ADD || !isSum(bin.X) || ls.b.mentionsObj(bin.Y, ls.sum) {
			return fmt.Errorf("the sum is set by %s", ls.b.text(x))
		}
		ls.add(x, bin.Y)
	default:
		return fmt.Errorf("the sum is set by %s", ls.b.text(x))
	}
	return nil
}

// add records s += t, and t's definition when t is a local defined by
// t := E just for this add in the same block (t then stays the term,
// and its definition becomes E's Product).
func (ls *logSum) add(st *ast.AssignStmt, t ast.Expr) {
	var def *ast.AssignStmt
	if id, ok := ast.Unparen(t).(*ast.Ident); ok {
		def = ls.termDef(st, id)
	}
	if def != nil || ls.lp.chainableIn(t, true) {
		ls.carries = true
	}
	ls.adds = append(ls.adds, st)
	ls.terms = append(ls.terms, t)
	ls.defs = append(ls.defs, def)
}

// termDef returns the statement id := E right before st in its block,
// when id is a float64 local used only in st and E is a product the
// fixer carries; nil otherwise.
func (ls *logSum) termDef(st *ast.AssignStmt, id *ast.Ident) *ast.AssignStmt {
	b := ls.b
	v := b.pass.TypesInfo.Uses[id]
	if v == nil || !types.Identical(v.Type(), types.Typ[types.Float64]) || !b.usedOnlyIn(v, st) {
		return nil
	}
	list, i, err := b.enclosingList(st)
	if err != nil {
		return nil
	}
	for j := i - 1; j >= 0; j-- {
		d, ok := list[j].(*ast.AssignStmt)
		if ok && b.definedVar(d) == v && d.Tok == token.DEFINE && ls.lp.chainableIn(d.Rhs[0], true) {
			return d
		}
		if ok && b.definedVar(d) == v {
			return nil
		}
	}
	return nil
}

// declaresName reports whether body declares or uses a name.
func declaresName(body *ast.BlockStmt, name string) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && id.Name == name {
			found = true
		}
		return !found
	})
	return found
}
