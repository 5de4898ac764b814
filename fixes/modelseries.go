package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
)

// A series term that divides a power by a running factorial the loop
// keeps, whatever the factorial's argument (k, 2k+1, n+k),
//
//	sum, fact, sign := 0.0, 1.0, 1.0
//	for k := 0; k < terms; k++ {
//		if k > 0 {
//			fact *= float64(2*k) * float64(2*k+1)
//		}
//		sum += sign * math.Pow(x, float64(2*k+1)) / fact
//		sign = -sign
//	}
//
// keeps its loop and takes the power over the factorial from the
// helper, in log space (DLMF 5.11.1 for ln k!; common practice):
//
//	sum, sign := 0.0, 1.0
//	for k := 0; k < terms; k++ {
//		sum += sign * lgamma.PowOverFactorial(x, 2*k+1)
//		sign = -sign
//	}
//
// The analyzer vouches for what only the model knows
// (ShapeModelSeriesTerm in match.go): where the term reads it, the
// accumulator holds k! for the power's own exponent k, starting at 1
// and multiplied on every trip that updates it. This builder checks
// the rest on its own: the accumulator is read by its updates and the
// term alone, written by its declaration and its updates alone, each
// update multiplies it by plain factors, and an update under an if is
// that if's only statement, whose condition is plain too.
func buildModelSeriesTerm(b *builder) error {
	m := b.m
	quo, ok := m.Node.(*ast.BinaryExpr)
	if !ok || quo.Op != token.QUO || m.Acc == nil || m.Loop == nil || len(m.Args) != 2 || len(m.Extra) != 1 {
		return errors.New("series term match lacks its quotient, accumulator, loop or power")
	}
	if classOf(m.Result) != classFloat {
		return fmt.Errorf("series term of non-float type %s", m.Result)
	}
	if !b.isObj(quo.Y, m.Acc) {
		return fmt.Errorf("the term does not divide by %s", m.Acc.Name())
	}
	pow := m.Extra[0]
	if pow.Pos() < quo.X.Pos() || pow.End() > quo.X.End() {
		return errors.New("the power is not in the term's numerator")
	}
	var updates []ast.Stmt // the statements to delete
	nupd := 0
	var bad error
	ast.Inspect(m.Loop, func(n ast.Node) bool {
		if bad != nil {
			return false
		}
		switch s := n.(type) {
		case *ast.FuncLit:
			if b.assigns(s, m.Acc) {
				bad = fmt.Errorf("a closure assigns %s", m.Acc.Name())
			}
			return false
		case *ast.IfStmt:
			if len(s.Body.List) == 1 && s.Init == nil && s.Else == nil && b.isUpdate(s.Body.List[0], m.Acc) {
				if !b.plain(s.Cond) {
					bad = errors.New("the update's condition calls out or may panic")
					return false
				}
				updates = append(updates, s)
				nupd++
				return false
			}
		case *ast.AssignStmt, *ast.IncDecStmt:
			if b.assigns(s, m.Acc) {
				if !b.isUpdate(s.(ast.Stmt), m.Acc) {
					bad = fmt.Errorf("%s is assigned other than by a multiplication", m.Acc.Name())
					return false
				}
				updates = append(updates, s.(ast.Stmt))
				nupd++
			}
		}
		return true
	})
	if bad != nil {
		return bad
	}
	if nupd == 0 {
		return fmt.Errorf("the loop does not update %s", m.Acc.Name())
	}
	if b.uses(m.Acc) != nupd+1 {
		// The running factorial is read after the loop too (Erlang B's
		// a^c/c!/Σ): no helper call can take its place there, but it can
		// be carried in log space with every read (ShapeLogSpaceTerm).
		if id, ok := ast.Unparen(quo.Y).(*ast.Ident); ok && m.Func != nil {
			b.m.Args = []ast.Expr{id}
			if err := buildLogSpaceTerm(b); err == nil {
				return nil
			}
		}
		return fmt.Errorf("%s is read outside the term and its updates", m.Acc.Name())
	}
	writes := nupd
	if _, ok := b.declaring(m.Acc).(*ast.AssignStmt); ok {
		writes++
	}
	if b.writes(m.Acc) != writes {
		return fmt.Errorf("%s is assigned outside its declaration and its updates", m.Acc.Name())
	}
	inits, err := b.initsWithout([]types.Object{m.Acc})
	if err != nil {
		return err
	}
	if ast.Unparen(quo.X) == pow {
		// A term of e^−λ·Σ λ^k/k! takes e^−λ in (poissonsum.go).
		folded, err := b.foldPoissonTerm(quo, m.Args[0], m.Args[1])
		if err != nil {
			return err
		}
		if folded {
			for _, st := range updates {
				b.deleteStmt(st)
			}
			b.applyInits(inits)
			b.message += " and drop the running " + m.Acc.Name()
			return nil
		}
	}
	call, err := b.powOverFactorialCall(m.Args[0], m.Args[1], quo.Pos())
	if err != nil {
		return err
	}
	num := b.copyText(quo.X)
	off := int(pow.Pos() - quo.X.Pos())
	end := int(pow.End() - quo.X.Pos())
	if end > len(num) || b.commentIn(quo) {
		return errors.New("the numerator's text does not hold the power")
	}
	b.replace(quo.Pos(), quo.End(), num[:off]+call+num[end:])
	for _, st := range updates {
		b.deleteStmt(st)
	}
	b.applyInits(inits)
	b.message = b.rewriteMessage() + " and drop the running " + m.Acc.Name()
	return nil
}

// powOverFactorialCall writes lgamma.PowOverFactorial(x, k) of the
// match's result type. A float k that is not a conversion of an
// integer is passed as int(k): the analyzer vouches that it is a whole
// number (a float counter from a whole start by unit steps).
func (b *builder) powOverFactorialCall(x, k ast.Expr, at token.Pos) (string, error) {
	if classOf(b.pass.TypesInfo.TypeOf(b.floatOfInt(k))) != classFloat {
		return b.call("PowOverFactorial", []ast.Expr{x, k}, b.m.Result)
	}
	xt, err := b.arg(x, types.Typ[types.Float64])
	if err != nil {
		return "", err
	}
	text, err := b.result(b.helper(at)+".PowOverFactorial("+xt+", int("+b.copyText(k)+"))", types.Typ[types.Float64], b.m.Result)
	b.shown = text
	return text, err
}

// isUpdate reports whether s is acc *= F or acc = acc * F (acc once
// among the factors of a product) with the other factors plain.
func (b *builder) isUpdate(s ast.Stmt, acc types.Object) bool {
	as, ok := s.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 || !b.isObj(as.Lhs[0], acc) {
		return false
	}
	switch as.Tok {
	case token.MUL_ASSIGN:
		return b.plain(as.Rhs[0]) && !b.mentionsObj(as.Rhs[0], acc)
	case token.ASSIGN:
	default:
		return false
	}
	var fs []ast.Expr
	var flat func(e ast.Expr)
	flat = func(e ast.Expr) {
		if m, ok := ast.Unparen(e).(*ast.BinaryExpr); ok && m.Op == token.MUL {
			flat(m.X)
			flat(m.Y)
			return
		}
		fs = append(fs, e)
	}
	flat(as.Rhs[0])
	self := 0
	for _, f := range fs {
		switch {
		case b.isObj(f, acc):
			self++
		case !b.plain(f) || b.mentionsObj(f, acc):
			return false
		}
	}
	return self == 1 && len(fs) > 1
}

// mentionsObj reports whether n reads obj.
func (b *builder) mentionsObj(n ast.Node, obj types.Object) bool {
	found := false
	ast.Inspect(n, func(x ast.Node) bool {
		if id, ok := x.(*ast.Ident); ok && b.pass.TypesInfo.Uses[id] == obj {
			found = true
		}
		return !found
	})
	return found
}

// applyInits rewrites the declarations initsWithout returned: a
// statement left empty goes, the others keep what remains.
func (b *builder) applyInits(inits map[ast.Stmt]string) {
	for st, rest := range inits {
		if rest == "" {
			b.deleteStmt(st)
		} else {
			b.replace(st.Pos(), st.End(), rest)
		}
	}
}
