package analyzer

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// Values held in struct fields: one function stores binomial weights in
// a field, another multiplies them by powers.
//
//	func New(cp ...Point) Curve {        // w is C(n−1, i) after trip i
//		for i, p := range c { …; c[i].Control.X = p.At.X * w }
//	}
//	func (c Curve) Point(t float64) Point {
//		for i, p := range c[1:] { c[i+1].At.X = p.Control.X * Length(u); u *= t }
//		…
//	}
//
// The package-local field summary records, for a field (or a field of a
// field, Control.X) that a running binomial weight reported by
// binomialPeak is stored into, times another value, what the weight is
// and where it breaks. A read of the field multiplied by a power that
// grows with the trips (t^i, which underflows for |t| < 1) forms
// +Inf·t^i, or +Inf·0 = NaN, where the weight has passed the central
// coefficient, although the term C(n, i)·t^i it stands for fits for
// small t. The claim is existential, as every possible finding is: a
// value of the struct type built by the writer from n points on holds
// +Inf in the field, and the reader, which takes any value of that
// type, then returns +Inf or NaN. Other writes of the field (a bounded
// writer, a setter) do not make it false; they only add inputs on which
// the reader is right.

// fieldPath names a field by its last two selections, Control.X, or one
// (W, nil) when the base is no field.
type fieldPath [2]*types.Var

// weightField is what the summary knows about one field path.
type weightField struct {
	writer string // the function that stores the weight
	acc    string // the running product
	form   string // the weight, C(n, j), in the writer's names
	nName  string // the writer's variable that n rests on
	first  int64  // the first value of nName at which it breaks
}

// weightFields is the package-local field summary, by field path.
type weightFields struct {
	fields map[fieldPath]*weightField
}

var weightFieldsKey = &stateKey[weightFields]{"fields that store running binomial weights"}

// pathOf returns the field path e selects; an element of a slice or
// array held in a field (c.weights[i]) has the field's path.
func (c *checker) pathOf(e ast.Expr) (fieldPath, bool) {
	if ix, ok := ast.Unparen(e).(*ast.IndexExpr); ok {
		if t := c.pass.TypesInfo.TypeOf(ix.X); t != nil {
			switch t.Underlying().(type) {
			case *types.Slice, *types.Array:
				return c.pathOf(ix.X)
			}
		}
		return fieldPath{}, false
	}
	sel, ok := ast.Unparen(e).(*ast.SelectorExpr)
	if !ok {
		return fieldPath{}, false
	}
	s := c.pass.TypesInfo.Selections[sel]
	if s == nil || s.Kind() != types.FieldVal {
		return fieldPath{}, false
	}
	inner, _ := s.Obj().(*types.Var)
	if outer, ok := ast.Unparen(sel.X).(*ast.SelectorExpr); ok {
		if os := c.pass.TypesInfo.Selections[outer]; os != nil && os.Kind() == types.FieldVal {
			o, _ := os.Obj().(*types.Var)
			return fieldPath{o, inner}, o != nil && inner != nil
		}
	}
	return fieldPath{inner, nil}, inner != nil
}

// noteWeightFields records the fields a running binomial weight is
// stored into inside its loop: c[i].Control.X = p.At.X * w.
func (mc *modelCtx) noteWeightFields(a *vm.Acc, form string, nName string, first int64) {
	c := mc.fc.c
	wf := passStateOf(c, weightFieldsKey)
	name := "the function literal"
	if d, ok := mc.fc.node.(*ast.FuncDecl); ok {
		name = d.Name.Name
	}
	ast.Inspect(mc.loop.Stmt, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			return true
		}
		p, ok := c.pathOf(as.Lhs[0])
		if !ok || !mc.fc.hasFactor(as.Rhs[0], a.Obj) {
			return true
		}
		if t, ok := c.numOf(c.pass.TypesInfo.TypeOf(as.Lhs[0])); !ok || !t.Float {
			return true
		}
		if wf.fields == nil {
			wf.fields = make(map[fieldPath]*weightField)
		}
		if wf.fields[p] == nil {
			wf.fields[p] = &weightField{writer: name, acc: a.Obj.Name(), form: form, nName: nName, first: first}
		}
		return true
	})
}

// hasFactor reports whether obj is a factor of the product e, through
// parentheses and conversions.
func (fc *fnCtx) hasFactor(e ast.Expr, obj types.Object) bool {
	e = fc.stripConv(e)
	if fc.c.objOf(e) == obj {
		return true
	}
	b, ok := e.(*ast.BinaryExpr)
	return ok && b.Op == token.MUL && (fc.hasFactor(b.X, obj) || fc.hasFactor(b.Y, obj))
}

// weightHeld returns the summary of the field path e reads.
func (c *checker) weightHeld(e ast.Expr) (*weightField, bool) {
	p, ok := c.pathOf(e)
	if !ok {
		return nil, false
	}
	w := passStateOf(c, weightFieldsKey).fields[p]
	return w, w != nil
}

// checkWeightReads judges, after every function of the package was
// checked (so that each weight's writer was judged, whatever the order
// of the source), the products of a weight field with a growing power.
func (c *checker) checkWeightReads(funcs []ast.Node) {
	if len(passStateOf(c, weightFieldsKey).fields) == 0 {
		return
	}
	for _, n := range funcs {
		if funcBody(n) == nil {
			continue
		}
		c.guard(n, func() { c.ctx(n).checkWeightRead() })
	}
}

// checkWeightRead reports the first product in the function of a weight
// field and a power of a variable whose exponent grows with the trips.
func (fc *fnCtx) checkWeightRead() {
	c := fc.c
	var cands []*ast.BinaryExpr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		if b, ok := n.(*ast.BinaryExpr); ok && b.Op == token.MUL {
			for _, x := range []ast.Expr{b.X, b.Y} {
				if _, ok := c.weightHeld(fc.stripConv(x)); ok {
					cands = append(cands, b)
				}
			}
		}
		return true
	})
	if len(cands) == 0 {
		return
	}
	res := fc.evalModel()
	for _, b := range cands {
		read, other := fc.stripConv(b.X), b.Y
		w, ok := c.weightHeld(read)
		if !ok {
			read, other = fc.stripConv(b.Y), b.X
			w, _ = c.weightHeld(read)
		}
		base, ok := growingPower(res.Values[other])
		if !ok {
			base, ok = fc.powCall(other)
		}
		if w == nil || !ok || c.reportedWithin(b) {
			continue
		}
		msg := fmt.Sprintf("%s holds the binomial weight %s that %s forms one ratio at a time in %s, +Inf for the central points once %s ≥ %d; multiplied here by %s, a power of %s that grows with the trips, the product is +Inf, or NaN where the power underflows to 0, although the term it stands for, the weight times %s to that power, fits",
			src(read), w.form, w.acc, w.writer, w.nName, w.first, src(fc.stripConv(other)), base, base)
		fc.report(finding{node: b, cat: catRatio, msg: msg})
		return
	}
}

// growingPower reports whether t is a power of a variable (not a
// constant of magnitude at least 1) whose exponent has a variable: a
// running power t^(i+1) in a loop, or math.Pow(t, k). It returns the
// base as written in the algebra.
func growingPower(t *vm.Term) (string, bool) {
	if t == nil {
		return "", false
	}
	for _, p := range t.Pows {
		if p.Exp.IsConst() {
			continue
		}
		if p.Base.IsConst() {
			if f, _ := p.Base.C.Float64(); f >= 1 || f <= -1 {
				continue
			}
		}
		return p.Base.String(), true
	}
	return "", false
}

// powCall reports whether e is math.Pow(x, k) with an exponent that is
// no constant and a base that is no constant of magnitude at least 1,
// read from the syntax where the model has no value for it (a loop it
// does not summarise). It returns the base as written.
func (fc *fnCtx) powCall(e ast.Expr) (string, bool) {
	call, ok := fc.stripConv(e).(*ast.CallExpr)
	if !ok || !fc.c.isMathFunc(call, "Pow") || len(call.Args) != 2 {
		return "", false
	}
	info := fc.c.pass.TypesInfo
	if tv, ok := info.Types[call.Args[1]]; !ok || tv.Value != nil {
		return "", false
	}
	if tv, ok := info.Types[call.Args[0]]; ok && tv.Value != nil {
		if f, ok := constant.Float64Val(constant.ToFloat(tv.Value)); !ok || f >= 1 || f <= -1 {
			return "", false
		}
	}
	return src(fc.stripConv(call.Args[0])), true
}
