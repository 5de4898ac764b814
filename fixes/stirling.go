package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/types"
)

// A hand-written Stirling approximation standing for n!, √(2πn)(n/e)^n
// in any arrangement, becomes the helper's n!, and its log form
// (n+½)ln n − n + ½ln 2π becomes ln n!:
//
//	s := math.Sqrt(2*math.Pi*float64(n)) * math.Pow(float64(n)/math.E, float64(n))
//
// becomes
//
//	s := lgamma.Factorial(n)
//
// which is n! correctly rounded where the approximation was 1/(12n) off,
// and finite up to 170! where math.Pow(n, n) was +Inf from 144. The
// analyzer vouches that the expression's value is Stirling's term of
// the operand (ShapeStirling, ShapeLogStirling in match.go), found by
// the value model. For a float n the formula stands for Γ(n+1) and
// becomes math.Gamma(n + 1) or lgamma.LogGamma(n + 1). This builder checks that the expression, and the
// definitions of locals only it reads, which go with it, read no
// variable but the operand's, so that nothing else is dropped.
func buildStirling(b *builder) error {
	if len(b.m.Args) != 1 || b.m.Result == nil {
		return errors.New("Stirling match lacks n or the result type")
	}
	name := "Factorial"
	if b.m.Shape == ShapeLogStirling {
		name = "LogFactorial"
	}
	keep := make(map[types.Object]bool)
	for _, v := range b.vars(b.m.Args[0]) {
		keep[v] = true
	}
	regions, err := b.absorbChain(keep)
	if err != nil {
		return err
	}
	locals := make(map[types.Object]bool)
	for _, d := range b.absorbed {
		locals[b.definedVar(d)] = true
	}
	for _, r := range regions {
		for _, v := range b.vars(r) {
			if !keep[v] && !locals[v] && !b.aliasOf(v, keep) {
				return fmt.Errorf("the rewrite would drop %s", v.Name())
			}
		}
	}
	if classOf(b.pass.TypesInfo.TypeOf(b.m.Args[0])) == classFloat {
		return b.replaceByGamma()
	}
	return b.replaceByCall(name, b.m.Args)
}

// replaceByGamma rewrites the formula of a float x, which stands for
// Γ(x+1) over the reals, as math.Gamma(x + 1), or its log form as
// lgamma.LogGamma(x + 1): the same values where the formula had any
// (x > 0), without its error and finite up to Γ(171.6).
func (b *builder) replaceByGamma() error {
	at := b.m.Node.Pos()
	x := b.copyText(b.m.Args[0])
	text := b.use("math", "math", at) + ".Gamma(" + x + " + 1)"
	if b.m.Shape == ShapeLogStirling {
		text = b.helper(at) + ".LogGamma(" + x + " + 1)"
	}
	text, err := b.result(text, types.Typ[types.Float64], b.m.Result)
	if err != nil {
		return err
	}
	b.replace(b.m.Node.Pos(), b.m.Node.End(), text)
	for _, d := range b.absorbed {
		b.deleteStmt(d)
	}
	b.message = "Rewrite as " + text
	if b.m.Shape == ShapeLogStirling {
		b.message += " (imports " + HelperPath + ")"
	}
	return nil
}

// absorbChain returns the match's expression and the statements before
// it, in its block, that define locals read only there or in other such
// statements (x := float64(n); lx := math.Log(x); return x*lx - x + …),
// which go with the expression; none may come after a change of the
// operand's variables.
func (b *builder) absorbChain(keep map[types.Object]bool) ([]ast.Node, error) {
	node := b.m.Node
	list, at, err := b.enclosingList(node)
	if err != nil {
		return nil, err
	}
	regions := []ast.Node{node}
	inRegions := func(id *ast.Ident) bool {
		for _, r := range regions {
			if r.Pos() <= id.Pos() && id.End() <= r.End() {
				return true
			}
		}
		return false
	}
	for j := at - 1; j >= 0; j-- {
		s := list[j]
		for v := range keep {
			if b.assigned(v, s) {
				return regions, nil // earlier definitions saw other values
			}
		}
		v := b.definedVar(s)
		if v == nil {
			continue
		}
		only, used := true, false
		for id, obj := range b.pass.TypesInfo.Uses {
			if obj == v {
				used = true
				only = only && inRegions(id)
			}
		}
		if used && only {
			regions = append(regions, s)
			b.absorbed = append(b.absorbed, s)
		}
	}
	return regions, nil
}

// aliasOf reports whether v is a local defined once, as a conversion of
// one of keep (c := float64(agents)) and never assigned again: reading
// it is reading the operand, and it stays where it is.
func (b *builder) aliasOf(v types.Object, keep map[types.Object]bool) bool {
	var def ast.Expr
	ast.Inspect(b.funcBody(), func(n ast.Node) bool {
		if s, ok := n.(ast.Stmt); ok && b.definedVar(s) == v {
			if as, ok := s.(*ast.AssignStmt); ok {
				def = as.Rhs[0]
			}
		}
		return true
	})
	if def == nil || b.countWrites(b.funcBody(), v, false) != 1 {
		return false
	}
	e := ast.Unparen(def)
	if call, ok := e.(*ast.CallExpr); ok && b.isNumericConversion(call) {
		e = ast.Unparen(call.Args[0])
	}
	id, ok := e.(*ast.Ident)
	return ok && keep[b.pass.TypesInfo.Uses[id]]
}
