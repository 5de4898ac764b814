package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// math.Lgamma returns ln|Γ(x)| and the sign of Γ(x) apart. Code that
// drops the sign (v, _ := math.Lgamma(x), or a sign variable never read)
// and then takes math.Exp of v, alone or in a sum of such values, gets
// |Γ(x)| where it means Γ(x): the result has the wrong sign wherever
// Γ(x) < 0, on (−1, 0), (−3, −2), … (thresholds.GammaNegativeIn). The
// finding is made where the argument can lie there: it is not an
// integer-valued expression (Γ has no sign at its poles, and math.Lgamma
// says +1 there, which is what a caller would use anyway) and nothing the
// ranges or the float guards see keeps it out of those intervals.

// lgammaValue is a math.Lgamma call whose sign the code drops.
type lgammaValue struct {
	stmt *ast.AssignStmt
	arg  ast.Expr
	sign *ast.Ident // the blank identifier, or the sign variable never read
}

// checkLgammaSign reports math.Exp calls whose argument sums values of
// math.Lgamma calls whose signs are dropped.
func (fc *fnCtx) checkLgammaSign() {
	vals := fc.droppedSigns()
	if len(vals) == 0 {
		return
	}
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || !fc.c.isMathFunc(call, "Exp") {
			return true
		}
		var used []*lgammaValue
		if !fc.carries(call.Args[0], vals, &used, 0) || len(used) == 0 {
			return true
		}
		fc.judgeLgammaSign(call, used)
		return true
	})
}

// droppedSigns finds the locals that hold the first result of a
// math.Lgamma call whose second result is blank or never read, each
// assigned there only.
func (fc *fnCtx) droppedSigns() map[types.Object]*lgammaValue {
	var out map[types.Object]*lgammaValue
	info := fc.c.pass.TypesInfo
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || len(as.Lhs) != 2 || len(as.Rhs) != 1 {
			return true
		}
		call, ok := ast.Unparen(as.Rhs[0]).(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || !fc.c.isMathFunc(call, "Lgamma") {
			return true
		}
		v := fc.c.objOf(as.Lhs[0])
		sign, ok := as.Lhs[1].(*ast.Ident)
		if v == nil || !ok || len(fc.defsOf(v)) != 2 {
			return true // the value changes elsewhere: not followed
		}
		if sign.Name != "_" {
			s := info.Defs[sign]
			if s == nil || fc.readAnywhere(s) {
				return true
			}
		}
		if out == nil {
			out = make(map[types.Object]*lgammaValue)
		}
		out[v] = &lgammaValue{stmt: as, arg: call.Args[0], sign: sign}
		return true
	})
	return out
}

// readAnywhere reports whether obj is used in the function at all (an
// assignment to it counts: the code then does something with the sign).
func (fc *fnCtx) readAnywhere(obj types.Object) bool {
	used := false
	ast.Inspect(fc.node, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && fc.c.pass.TypesInfo.Uses[id] == obj {
			used = true
		}
		return !used
	})
	return used
}

// carries reports whether e is a sum of terms that may hold values of
// vals, through parentheses, signs, float conversions and locals defined
// once as such sums, collecting the values it meets. A product or a call
// around such a value (2*v, math.Sqrt(v)) ends the flow: false.
func (fc *fnCtx) carries(e ast.Expr, vals map[types.Object]*lgammaValue, used *[]*lgammaValue, depth int) bool {
	if depth > maxDepth {
		return false
	}
	switch x := ast.Unparen(e).(type) {
	case *ast.Ident:
		obj := fc.c.objOf(x)
		if v := vals[obj]; v != nil {
			*used = append(*used, v)
			return true
		}
		if def := fc.singleDef(x); def != nil {
			var inner []*lgammaValue
			if fc.carries(def, vals, &inner, depth+1) {
				*used = append(*used, inner...)
			}
		}
		return true
	case *ast.UnaryExpr:
		if x.Op == token.ADD || x.Op == token.SUB {
			return fc.carries(x.X, vals, used, depth+1)
		}
	case *ast.BinaryExpr:
		if x.Op == token.ADD || x.Op == token.SUB {
			return fc.carries(x.X, vals, used, depth+1) && fc.carries(x.Y, vals, used, depth+1)
		}
		var inner []*lgammaValue
		fc.carries(x.X, vals, &inner, depth+1)
		fc.carries(x.Y, vals, &inner, depth+1)
		return len(inner) == 0
	case *ast.CallExpr:
		if fc.isConversion(x) && len(x.Args) == 1 {
			return fc.carries(x.Args[0], vals, used, depth+1)
		}
		for _, a := range x.Args {
			var inner []*lgammaValue
			if fc.carries(a, vals, &inner, depth+1); len(inner) > 0 {
				return false
			}
		}
		return true
	}
	return true
}

// gammaSignRange is where the argument of a math.Lgamma call can be
// negative with Γ < 0: a point there, and whether every value the code
// allows is there. shown asks for evidence that negative arguments
// occur: a lower bound below 0 that the code states, or a constant.
func (fc *fnCtx) gammaSignRange(arg ast.Expr, shown bool) (witness float64, definite, ok bool) {
	if fc.integerValued(arg, 0) {
		return 0, false, false // poles only: math.Lgamma's +1 is as good as any sign
	}
	g, known := fc.gammaBoundOf(arg)
	if shown && (!known || math.IsInf(g.lo, -1) || g.lo >= 0) {
		return 0, false, false
	}
	if !known {
		w, _ := thresholds.GammaNegativeIn(math.Inf(-1), math.Inf(1))
		return w, false, true
	}
	if g.aff.v == nil || g.aff.isInt && isInteger(g.aff.a()) && isInteger(g.aff.b()) {
		// A constant, or an integer-valued argument: at a pole Γ has no
		// sign and math.Lgamma's +1 is as good as any.
		if g.aff.v != nil {
			return 0, false, false
		}
		w, found := thresholds.GammaNegativeIn(g.lo, g.hi)
		return w, found, found
	}
	w, found := thresholds.GammaNegativeIn(g.lo, g.hi)
	if !found {
		return 0, false, false
	}
	// Definite when the whole range lies in one interval where Γ < 0.
	// Definite when the whole range lies in one interval where Γ < 0, its
	// ends allowed (poles, where math.Lgamma's +Inf has no sign to lose).
	definite = g.lo >= math.Floor(w) && g.hi <= math.Floor(w)+1
	return w, definite, true
}

func isInteger(x float64) bool { return x == math.Trunc(x) && !math.IsInf(x, 0) }

// judgeLgammaSign reports exp, the math.Exp of a sum holding used.
func (fc *fnCtx) judgeLgammaSign(exp *ast.CallExpr, used []*lgammaValue) {
	var bad *lgammaValue
	var witness float64
	definite := false
	// A sum of several values is a binomial coefficient, a Beta
	// function or a pmf, whose arguments are counts or shape parameters,
	// positive by their domain: it is reported only where the code shows
	// an argument below 0. A single value is a hand-made Γ(x) or 1/Γ(x),
	// reported unless x is shown positive.
	shown := len(used) > 1
	for _, v := range used {
		w, def, ok := fc.gammaSignRange(v.arg, shown)
		if ok && bad == nil {
			bad, witness, definite = v, w, def
		}
	}
	if bad == nil {
		return
	}
	arg := src(bad.arg)
	g := math.Gamma(witness)
	msg := fmt.Sprintf("the sign of Γ(%s) from math.Lgamma is dropped, and %s uses |Γ(%s)| for Γ(%s): they differ where Γ < 0, for arguments in (−1, 0), (−3, −2), …, as at %s = %.4g, where Γ is %.4g",
		arg, src(exp), arg, arg, arg, witness, g)
	msg += fc.gammaSignClause(bad.arg, definite)
	signs := make([]ast.Expr, len(used))
	for i, v := range used {
		signs[i] = v.sign
	}
	fc.report(finding{
		node:     exp,
		cat:      catLgammaSign,
		definite: definite,
		msg:      msg,
		match: &fixes.Match{
			Shape:  fixes.ShapeLgammaSign,
			Node:   exp,
			Args:   signs,
			Result: fc.c.pass.TypesInfo.TypeOf(exp),
			Func:   fc.node,
		},
	})
}

// gammaSignClause says what the code allows of the argument.
func (fc *fnCtx) gammaSignClause(arg ast.Expr, definite bool) string {
	g, known := fc.gammaBoundOf(arg)
	switch {
	case definite:
		return "; the argument is always there"
	case !known || g.aff.v == nil:
		return "; the argument is not bounded here"
	case math.IsInf(g.lo, -1):
		return fmt.Sprintf("; %s is not bounded below here", src(g.aff.v))
	}
	return fmt.Sprintf("; the argument may be as low as %.6g here", g.lo)
}

// integerValued reports whether e only takes integer values: integer
// constants and conversions of integers, combined by +, − and ×.
func (fc *fnCtx) integerValued(e ast.Expr, depth int) bool {
	if depth > maxDepth {
		return false
	}
	e = ast.Unparen(e)
	if v, ok := fc.floatConst(e); ok {
		return isInteger(v)
	}
	switch x := e.(type) {
	case *ast.CallExpr:
		if fc.isConversion(x) && len(x.Args) == 1 {
			if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(x.Args[0])); ok && !t.Float {
				return true
			}
			return fc.integerValued(x.Args[0], depth+1)
		}
	case *ast.BinaryExpr:
		switch x.Op {
		case token.ADD, token.SUB, token.MUL:
			return fc.integerValued(x.X, depth+1) && fc.integerValued(x.Y, depth+1)
		}
	case *ast.UnaryExpr:
		return (x.Op == token.SUB || x.Op == token.ADD) && fc.integerValued(x.X, depth+1)
	case *ast.Ident:
		if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(x)); ok && !t.Float {
			return true
		}
		if def := fc.singleDef(x); def != nil {
			return fc.integerValued(def, depth+1)
		}
	}
	return false
}
