package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// The three log-gamma categories (lgamma-digits, lgamma-integer,
// lgamma-overflow) read the same code: math.Exp of a sum of log-gamma
// values, each the first result of math.Lgamma, taken directly
// (lg, _ := math.Lgamma(x)) or through a function of the package that
// returns it (func lgamma(x float64) float64 { v, _ := math.Lgamma(x);
// return v }). This file finds those exponentials and evaluates them as
// the program does.

// lgTerm is one p·ln Γ(arg) of an exponent, or p times the value of
// a call whose ValueFact says it returns a logarithm (call set, arg
// nil): ln C(n, k) summed from log-gamma values in another function.
type lgTerm struct {
	p    float64
	arg  ast.Expr
	call *ast.CallExpr
}

// lgExp is a math.Exp call whose argument holds log-gamma values.
type lgExp struct {
	call  *ast.CallExpr
	terms []lgTerm
	rest  bool // the argument adds something else too (k·ln p)
	// facts reports that some terms are calls of functions that return
	// log-gamma sums: only lgamma-digits reads those (their arguments
	// are the callee's, not expressions of this function).
	facts bool
}

// lgWrappers is the functions of the package that return ln|Γ| of their
// argument, found on first use (isLgammaCall).
type lgWrappers struct{ set map[*types.Func]bool }

var lgWrappersKey = &stateKey[lgWrappers]{"the package's log-gamma wrappers"}

// isLgammaCall reports whether call returns ln|Γ| of its one argument:
// a call of a function of this package that returns the first result
// of math.Lgamma of its parameter.
func (c *checker) isLgammaCall(call *ast.CallExpr) bool {
	fn := c.calleeOf(call)
	if fn == nil || fn.Pkg() != c.pass.Pkg || len(call.Args) != 1 {
		return false
	}
	w := passStateOf(c, lgWrappersKey)
	if w.set == nil {
		w.set = make(map[*types.Func]bool)
		for _, n := range c.allFuncs {
			if d, ok := n.(*ast.FuncDecl); ok && d.Recv == nil && c.lgammaWrapper(d) {
				w.set[c.declObj(d)] = true
			}
		}
	}
	return w.set[fn]
}

// lgammaWrapper reports whether d is func f(x T) T { v, _ :=
// math.Lgamma(x); return v } (any names, the sign unused).
func (c *checker) lgammaWrapper(d *ast.FuncDecl) bool {
	ps := d.Type.Params.List
	if d.Body == nil || len(ps) != 1 || len(ps[0].Names) != 1 || len(d.Body.List) != 2 {
		return false
	}
	param := c.pass.TypesInfo.Defs[ps[0].Names[0]]
	as, ok := d.Body.List[0].(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 2 || len(as.Rhs) != 1 {
		return false
	}
	call, ok := ast.Unparen(as.Rhs[0]).(*ast.CallExpr)
	if !ok || !c.isMathFunc(call, "Lgamma") || len(call.Args) != 1 || c.objOf(call.Args[0]) != param || param == nil {
		return false
	}
	if id, ok := as.Lhs[1].(*ast.Ident); !ok || id.Name != "_" {
		return false
	}
	ret, ok := d.Body.List[1].(*ast.ReturnStmt)
	return ok && len(ret.Results) == 1 && c.objOf(ret.Results[0]) != nil && c.objOf(ret.Results[0]) == c.objOf(as.Lhs[0])
}

// lgammaLocal returns the argument of the math.Lgamma call that gives
// the local id its only value (lg, _ := math.Lgamma(x)), or nil.
func (fc *fnCtx) lgammaLocal(id *ast.Ident) ast.Expr {
	obj := fc.c.objOf(id)
	if obj == nil {
		return nil
	}
	// A two-value assignment is noted as two unknown values; any other
	// change of the variable adds more.
	if len(fc.defsOf(obj)) != 2 {
		return nil
	}
	var arg ast.Expr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || arg != nil {
			return arg == nil
		}
		if len(as.Lhs) == 2 && len(as.Rhs) == 1 && fc.c.objOf(as.Lhs[0]) == obj {
			if call, ok := ast.Unparen(as.Rhs[0]).(*ast.CallExpr); ok && fc.c.isMathFunc(call, "Lgamma") && len(call.Args) == 1 {
				arg = call.Args[0]
			}
		}
		return arg == nil
	})
	return arg
}

// lgammaTerms splits an exponent into its log-gamma terms, each with
// its coefficient, and reports whether anything else is added.
func (fc *fnCtx) lgammaTerms(e ast.Expr, p float64, depth int, out *[]lgTerm) (rest bool) {
	if depth > maxDepth {
		return true
	}
	e = ast.Unparen(e)
	switch x := e.(type) {
	case *ast.BinaryExpr:
		switch x.Op {
		case token.ADD, token.SUB:
			q := p
			if x.Op == token.SUB {
				q = -p
			}
			r1 := fc.lgammaTerms(x.X, p, depth+1, out)
			r2 := fc.lgammaTerms(x.Y, q, depth+1, out)
			return r1 || r2
		case token.MUL:
			if c, ok := fc.floatConst(x.X); ok {
				return fc.lgammaTerms(x.Y, p*c, depth+1, out)
			}
			if c, ok := fc.floatConst(x.Y); ok {
				return fc.lgammaTerms(x.X, p*c, depth+1, out)
			}
		}
	case *ast.UnaryExpr:
		if x.Op == token.SUB {
			return fc.lgammaTerms(x.X, -p, depth+1, out)
		}
	case *ast.CallExpr:
		if fc.c.isLgammaCall(x) {
			*out = append(*out, lgTerm{p: p, arg: x.Args[0]})
			return false
		}
		if len(x.Args) == 1 && fc.isConversion(x) {
			return fc.lgammaTerms(x.Args[0], p, depth+1, out)
		}
		if f := fc.c.valueFactOf(fc.c.calleeOf(x)); f != nil && f.Log {
			*out = append(*out, lgTerm{p: p, call: x})
			return false
		}
	case *ast.Ident:
		if arg := fc.lgammaLocal(x); arg != nil {
			*out = append(*out, lgTerm{p: p, arg: arg})
			return false
		}
		if def := fc.singleDef(x); def != nil {
			return fc.lgammaTerms(def, p, depth+1, out)
		}
	}
	return true
}

// lgammaExps returns the math.Exp calls of the function body (outside
// closures) whose argument holds a log-gamma value.
func (fc *fnCtx) lgammaExps() []*lgExp {
	var out []*lgExp
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.CallExpr:
			if fc.c.isMathFunc(n, "Exp") && len(n.Args) == 1 {
				var terms []lgTerm
				rest := fc.lgammaTerms(n.Args[0], 1, 0, &terms)
				if len(terms) > 0 {
					x := &lgExp{call: n, terms: terms, rest: rest}
					for _, t := range terms {
						x.facts = x.facts || t.call != nil
					}
					out = append(out, x)
				}
			}
		}
		return true
	})
	return out
}

// checkLogGamma runs the three log-gamma checks over the function: the
// exponentials that overflow first (one root cause), then integers read
// back from them, then the digits their sums lose.
func (fc *fnCtx) checkLogGamma() {
	all := fc.lgammaExps()
	var exps []*lgExp // those whose terms are all of this function
	for _, x := range all {
		if !x.facts {
			exps = append(exps, x)
		}
	}
	convs := fc.integerReads(exps)
	if len(all) == 0 && len(convs) == 0 {
		return
	}
	res := vm.Evaluate(fc.c.pass.TypesInfo, fc.node, vm.Options{Callee: fc.modelCallee, LogCallee: fc.logCallee, LogGamma: fc.c.isLgammaCall, MaxNodes: modelMaxNodes})
	done := make(map[ast.Node]bool)
	fc.checkLgammaOverflow(res, exps, done)
	fc.checkLgammaInteger(res, convs, done)
	fc.checkLgammaDigits(res, all, done)
}

// productRoot returns the outermost product or quotient that e is a
// factor of, through parentheses (e itself when it is none).
func (fc *fnCtx) productRoot(e ast.Expr) ast.Expr {
	parents := fc.parentMap()
	top := e
	for {
		switch p := parents[top].(type) {
		case *ast.ParenExpr:
			top = p
			continue
		case *ast.BinaryExpr:
			if p.Op == token.MUL || p.Op == token.QUO {
				top = p
				continue
			}
		}
		return top
	}
}

// symSpan is the range of one variable of the model, as floats: where
// nothing bounds it below, lo is 0 for an integer (a count) and 1 for a
// float (a shape parameter, kept off the pole of Γ at 0); hi is +Inf
// where nothing bounds it above.
type symSpan struct {
	sym     vm.Sym
	lo, hi  float64
	loKnown bool
	isInt   bool
	name    string
}

// spanOf returns the range of s at node at.
func (fc *fnCtx) spanOf(res *vm.Result, s vm.Sym, at ast.Node) (symSpan, bool) {
	sp := symSpan{sym: s, lo: 0, hi: math.Inf(1), name: s.Name()}
	if s.Obj == nil || s.Loop != nil {
		return sp, false
	}
	t, ok := fc.c.numOf(s.Obj.Type())
	if s.Field != nil {
		t, ok = fc.c.numOf(s.Field.Type())
	}
	if !ok {
		return sp, false
	}
	sp.isInt = !t.Float
	if sp.isInt {
		r := fc.symRange(res, s, at)
		if r.IsEmpty() {
			return sp, false
		}
		if r.Lo != math.MinInt64 && !typeLimit(-r.Lo) {
			sp.lo, sp.loKnown = float64(r.Lo), true
		}
		if !typeLimit(r.Hi) {
			sp.hi = float64(r.Hi)
		}
		return sp, true
	}
	sp.lo = 1
	var id *ast.Ident
	ast.Inspect(at, func(n ast.Node) bool {
		if x, ok := n.(*ast.Ident); ok && id == nil && s.Field == nil && fc.c.objOf(x) == s.Obj {
			id = x
		}
		return id == nil
	})
	if id != nil {
		lo, hi := fc.floatBounds(id)
		if !math.IsInf(lo, -1) {
			sp.lo, sp.loKnown = lo, true
		}
		sp.hi = hi
	}
	return sp, true
}

// affineArg returns the model's affine form of an argument.
func affineArg(res *vm.Result, e ast.Expr) (vm.Affine, bool) {
	t := res.Values[e]
	if t == nil {
		t = res.Values[ast.Unparen(e)]
	}
	if t == nil {
		return vm.Affine{}, false
	}
	return t.Affine()
}

// floatOf returns the value of a small rational of the model.
func floatOf(r interface{ Float64() (float64, bool) }) float64 {
	f, _ := r.Float64()
	return f
}

// floatEval evaluates e in float64 as the program does, with the
// variables of env set: the arithmetic of the expression, the locals it
// reads through their one definition, log-gamma calls and locals, and
// math.Exp, Gamma, Log, Floor, Ceil, Trunc and Round. Integer
// arithmetic is done in integers.
func (fc *fnCtx) floatEval(e ast.Expr, env map[types.Object]float64, depth int) (float64, bool) {
	if depth > maxDepth {
		return 0, false
	}
	e = ast.Unparen(e)
	if v, ok := fc.floatConst(e); ok {
		return v, true
	}
	isInt := false
	if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e)); ok {
		isInt = !t.Float
	}
	switch x := e.(type) {
	case *ast.Ident:
		if v, ok := env[fc.c.objOf(x)]; ok {
			return v, true
		}
		if arg := fc.lgammaLocal(x); arg != nil {
			a, ok := fc.floatEval(arg, env, depth+1)
			lg, _ := math.Lgamma(a)
			return lg, ok
		}
		if def := fc.singleDef(x); def != nil {
			return fc.floatEval(def, env, depth+1)
		}
	case *ast.UnaryExpr:
		if x.Op == token.SUB || x.Op == token.ADD {
			v, ok := fc.floatEval(x.X, env, depth+1)
			if x.Op == token.SUB {
				v = -v
			}
			return v, ok
		}
	case *ast.BinaryExpr:
		a, ok1 := fc.floatEval(x.X, env, depth+1)
		b, ok2 := fc.floatEval(x.Y, env, depth+1)
		if !ok1 || !ok2 {
			return 0, false
		}
		switch x.Op {
		case token.ADD:
			return a + b, true
		case token.SUB:
			return a - b, true
		case token.MUL:
			return a * b, true
		case token.QUO:
			if isInt {
				if b == 0 {
					return 0, false
				}
				return math.Trunc(a / b), true
			}
			return a / b, true
		}
	case *ast.CallExpr:
		if len(x.Args) != 1 {
			return 0, false
		}
		a, ok := fc.floatEval(x.Args[0], env, depth+1)
		if !ok {
			return 0, false
		}
		if fc.isConversion(x) {
			if isInt {
				return math.Trunc(a), true
			}
			if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e)); ok && t.Float && t.Bits == 32 {
				return float64(float32(a)), true
			}
			return a, true
		}
		if fc.c.isLgammaCall(x) {
			lg, _ := math.Lgamma(a)
			return lg, true
		}
		for name, f := range evalMath {
			if fc.c.isMathFunc(x, name) {
				return f(a), true
			}
		}
	}
	return 0, false
}

// evalMath are the functions of package math floatEval runs.
var evalMath = map[string]func(float64) float64{
	"Exp": math.Exp, "Gamma": math.Gamma, "Log": math.Log, "Floor": math.Floor,
	"Ceil": math.Ceil, "Trunc": math.Trunc, "Round": math.Round, "RoundToEven": math.RoundToEven,
}

// lgammaMatch describes for the fixes package an expression whose value
// the model names C(n, k), B(a, b), Γ(a)/Γ(b) or the binomial pmf over
// plain variables,
// built from exponentials of log-gamma values; nil otherwise.
func (fc *fnCtx) lgammaMatch(res *vm.Result, root ast.Expr) *fixes.Match {
	t := res.Values[root]
	if t == nil {
		return nil
	}
	var shape fixes.Shape
	var args []vm.Affine
	switch f := vm.Recognise(t); {
	case f.Kind == vm.Binomial:
		shape, args = fixes.ShapeExpChoose, f.Args
	case f.Kind == vm.Beta:
		shape, args = fixes.ShapeExpBeta, f.Args
	case f.Kind == vm.BinomialPMF: // n, k, p; the helper takes k, n, p
		shape, args = fixes.ShapeExpBinomialPMF, []vm.Affine{f.Args[1], f.Args[0], f.Args[2]}
	case len(t.Gamma) == 2 && len(t.Pows) == 0 && t.Exp.IsConst() && t.SqrtPi == 0 && t.Coef.Cmp(big.NewRat(1, 1)) == 0:
		g, h := t.Gamma[0], t.Gamma[1]
		if g.Pow < 0 {
			g, h = h, g
		}
		if g.Pow != 1 || h.Pow != -1 {
			return nil
		}
		shape, args = fixes.ShapeExpGammaRatio, []vm.Affine{g.Arg, h.Arg}
	default:
		return nil
	}
	exprs, ok := fc.plainArgs(root, args)
	if !ok {
		return nil
	}
	return &fixes.Match{Shape: shape, Node: root, Args: exprs, Result: fc.c.pass.TypesInfo.TypeOf(root)}
}

// plainArgs returns, for forms that are each one plain variable, a read
// of that variable inside root.
func (fc *fnCtx) plainArgs(root ast.Node, args []vm.Affine) ([]ast.Expr, bool) {
	var out []ast.Expr
	for _, a := range args {
		s, ok := plainVar(a)
		if !ok || s.Field != nil || s.Obj == nil {
			return nil, false
		}
		var read ast.Expr
		ast.Inspect(root, func(n ast.Node) bool {
			if id, ok := n.(*ast.Ident); ok && read == nil && fc.c.pass.TypesInfo.Uses[id] == s.Obj {
				read = id
			}
			return read == nil
		})
		if read == nil {
			return nil, false
		}
		out = append(out, read)
	}
	return out, true
}
