package fixes

import (
	"errors"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/astpath"
)

// A Poisson CDF is often summed as e^−λ · Σ λ^k/k!: the terms λ^k/k!
// accumulate in a loop and e^−λ multiplies the sum after it. Taking the
// term alone from the helper (PowOverFactorial) is not enough: past
// λ ≈ 709, e^−λ underflows to 0 while the sum of λ^k/k! (about e^λ)
// overflows to +Inf, and the product is NaN where the probability is
// between 0 and 1. So where the sum is read only through that product,
// e^−λ goes into each term, λ^k e^−λ/k! = PoissonTerm(k, λ) (common
// practice; the probability PoissonPMF(k, λ) for λ ≥ 0, the term of the
// alternating sum the code forms for λ < 0), and the product becomes the sum itself:
//
//	sum := 0.0                       sum := 0.0
//	for k := 0; k <= n; k++ {        for k := 0; k <= n; k++ {
//		sum += math.Pow(l, float64(k)) / fact(k)   →   sum += lgamma.PoissonTerm(k, l)
//	}                                }
//	return math.Exp(-l) * sum        return sum
//
// The fixer checks from the syntax that the term is the whole right side
// of sum += in the loop's body, that sum starts at 0 and is assigned
// nowhere else, that its one other read is the operand of a product
// with math.Exp(E) whose E is −λ as a linear form, after the loop in
// the same statement list, and that nothing λ reads is assigned from
// the loop to that product. Where these hold it returns the fix's edits
// in b; otherwise errNoPoissonSum, and the term alone is rewritten.

var errNoPoissonSum = errors.New("not a Poisson sum scaled by e^−λ after its loop")

// poissonSum tries the fold for a power-over-factorial term (Args x, k).
func (b *builder) poissonSum() error {
	node := b.m.Node
	x, k := b.m.Args[0], b.m.Args[1]
	product, accRead, err := b.poissonScale(node, x)
	if err != nil {
		return err
	}
	if err := b.covered(); err != nil {
		return err
	}
	if err := b.checkShape(); err != nil {
		return err
	}
	text, err := b.call("PoissonTerm", []ast.Expr{k, x}, b.m.Result)
	if err != nil {
		return err
	}
	return b.foldScaled(node, text, x, product, accRead, true)
}

// foldPoissonTerm rewrites term, x^k/k! in a series builder's loop, as
// PoissonTerm(k, x), x^k·e^−x/k! at any real x (negative rates
// included, where PoissonPMF is NaN), where its sum is read only
// through e^−x·sum after the loop (poissonScale), and that product as
// the sum. It reports false, with nothing written, where the sum is no
// such Poisson sum or k is not an integer.
func (b *builder) foldPoissonTerm(term, x, k ast.Expr) (bool, error) {
	if classOf(b.pass.TypesInfo.TypeOf(b.floatOfInt(k))) == classFloat {
		return false, nil
	}
	product, accRead, err := b.poissonScale(term, x)
	if err == errNoPoissonSum {
		return false, nil
	} else if err != nil {
		return false, err
	}
	text, err := b.call("PoissonTerm", []ast.Expr{k, x}, b.m.Result)
	if err != nil {
		return false, err
	}
	return true, b.foldScaled(term, text, x, product, accRead, false)
}

// foldScaled replaces term by text, its PoissonTerm call, and the
// product e^−λ·sum by the sum, and words the fix. With asWritten, for
// λ < 0 both run as written: each term times e^−λ = e^|λ| leaves
// float64 from |λ| ≈ 709 on, with alternating signs, and the folded sum
// is NaN where the code's own e^−λ·sum is an infinity of the right
// sign; a rate below zero is outside what the fold is for. A series
// builder's term reads running products its fix removes, and cannot run
// as written: it folds at every λ.
func (b *builder) foldScaled(term ast.Node, text string, x ast.Expr, product *ast.BinaryExpr, accRead ast.Expr, asWritten bool) error {
	if !asWritten {
		b.replace(term.Pos(), term.End(), text)
		b.replace(product.Pos(), product.End(), b.copyText(accRead))
		b.message = "Rewrite each term as " + b.shown + ", with e^−λ folded in, and the scaled sum as " + b.text(accRead) + " (imports " + HelperPath + ")"
		return nil
	}
	kept := b.keptAsWritten
	defer func() { b.keptAsWritten = kept }()
	conds := []string{operandText(b.copyText(x), x) + " < 0"}
	const why = "//overfact:allow below λ = 0 the sum as written"
	termText, err := b.keepAs(text, term, b.copyText(term), conds, false, why)
	if err != nil {
		return err
	}
	sumText, err := b.keepAs(b.copyText(accRead), product, b.copyText(product), conds, false, why)
	if err != nil {
		return err
	}
	b.replace(term.Pos(), term.End(), termText)
	b.replace(product.Pos(), product.End(), sumText)
	b.message = "Rewrite each term as " + b.shown + ", with e^−λ folded in, and the scaled sum as " + b.text(accRead) + " (imports " + HelperPath + ")"
	return nil
}

// poissonScale checks that node, a term x^k/k!, is the whole right side
// of sum += in its loop's body, sum a float starting at 0 read nowhere
// else but in one product e^−x·sum after the loop, with nothing x reads
// assigned from the loop to it, and returns that product and its read
// of sum; errNoPoissonSum where that does not hold.
func (b *builder) poissonScale(node ast.Node, x ast.Expr) (*ast.BinaryExpr, ast.Expr, error) {
	path, _ := astpath.Enclosing(b.file, node.Pos(), node.End())
	if len(path) < 3 {
		return nil, nil, errNoPoissonSum
	}
	as, ok := path[1].(*ast.AssignStmt)
	if !ok || as.Tok != token.ADD_ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 || ast.Unparen(as.Rhs[0]) != node {
		return nil, nil, errNoPoissonSum
	}
	id, ok := as.Lhs[0].(*ast.Ident)
	if !ok {
		return nil, nil, errNoPoissonSum
	}
	acc, ok := b.pass.TypesInfo.Uses[id].(*types.Var)
	if !ok || classOf(acc.Type()) != classFloat {
		return nil, nil, errNoPoissonSum
	}
	// The loop whose body holds the update directly.
	var loop ast.Stmt
	for i := 2; i < len(path); i++ {
		if blk, ok := path[i].(*ast.BlockStmt); ok && i+1 < len(path) {
			switch l := path[i+1].(type) {
			case *ast.ForStmt:
				if l.Body == blk && path[i-1] == as {
					loop = l
				}
			case *ast.RangeStmt:
				if l.Body == blk && path[i-1] == as {
					loop = l
				}
			}
			break
		}
	}
	if loop == nil {
		return nil, nil, errNoPoissonSum
	}
	list, at, err := b.enclosingList(loop)
	if err != nil {
		return nil, nil, errNoPoissonSum
	}
	lambda, ok := b.linearOf(x)
	if !ok {
		return nil, nil, errNoPoissonSum
	}
	// Every use of acc: its definition at 0, the update, and one product.
	var product *ast.BinaryExpr
	var accRead ast.Expr
	for i := range list {
		ast.Inspect(list[i], func(n ast.Node) bool {
			be, ok := n.(*ast.BinaryExpr)
			if !ok || be.Op != token.MUL || product != nil || i <= at {
				return true
			}
			for _, side := range [2][2]ast.Expr{{be.X, be.Y}, {be.Y, be.X}} {
				if r, ok := ast.Unparen(side[0]).(*ast.Ident); ok && b.pass.TypesInfo.Uses[r] == acc && b.isExpOf(side[1], lambda.neg()) {
					product, accRead = be, side[0]
				}
			}
			return true
		})
	}
	if product == nil {
		return nil, nil, errNoPoissonSum
	}
	body := b.enclosingBody(loop)
	if body == nil {
		return nil, nil, errNoPoissonSum
	}
	startsAtZero := false
	ok = true
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.Ident:
			if b.pass.TypesInfo.Uses[n] == acc && n != id && n != accRead {
				ok = false
			}
			if b.pass.TypesInfo.Defs[n] == acc {
				startsAtZero = b.definedAsZero(body, n)
			}
		}
		return ok
	})
	if !ok || !startsAtZero {
		return nil, nil, errNoPoissonSum
	}
	for _, v := range b.vars(x) {
		for _, s := range list[at:] {
			if s.Pos() > product.End() {
				break
			}
			if b.assigned(v, s) {
				return nil, nil, errNoPoissonSum
			}
		}
	}
	return product, accRead, nil
}

// isExpOf reports whether e is math.Exp(E) with E the linear form want.
func (b *builder) isExpOf(e ast.Expr, want linear) bool {
	c, fn := b.callOf(e)
	return c != nil && isMath(fn, "Exp") && b.argsAre(c, want)
}

// enclosingBody returns the body of the function that holds n.
func (b *builder) enclosingBody(n ast.Node) *ast.BlockStmt {
	path, _ := astpath.Enclosing(b.file, n.Pos(), n.End())
	for _, p := range path {
		switch f := p.(type) {
		case *ast.FuncLit:
			return f.Body
		case *ast.FuncDecl:
			return f.Body
		}
	}
	return nil
}

// definedAsZero reports whether the definition of the variable named by
// id gives it the value 0 (v := 0.0, var v float64, var v = 0).
func (b *builder) definedAsZero(body *ast.BlockStmt, id *ast.Ident) bool {
	path, _ := astpath.Enclosing(b.file, id.Pos(), id.End())
	for _, p := range path {
		switch s := p.(type) {
		case *ast.AssignStmt:
			for i, l := range s.Lhs {
				if l == id && len(s.Rhs) == len(s.Lhs) {
					return b.isZero(s.Rhs[i])
				}
			}
			return false
		case *ast.ValueSpec:
			for i, n := range s.Names {
				if n == id {
					return len(s.Values) == 0 || len(s.Values) == len(s.Names) && b.isZero(s.Values[i])
				}
			}
			return false
		}
	}
	return false
}

func (b *builder) isZero(e ast.Expr) bool {
	tv, ok := b.pass.TypesInfo.Types[e]
	return ok && tv.Value != nil && constant.Sign(tv.Value) == 0
}
