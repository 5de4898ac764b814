package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"sort"
	"strings"

	"github.com/overfact/overfact/internal/assigned"
	"github.com/overfact/overfact/internal/astpath"
)

// A series term whose parts the code keeps in running products of their
// own, each of which may leave float64 while the term does not,
//
//	half := x / 2
//	pw := math.Pow(half, float64(n))
//	f1, f2 := 1.0, 1.0
//	for k := 1; k < 200; k++ {
//		pw *= half * half
//		f1 *= float64(n + k)
//		f2 *= float64(k)
//		sum += pw / (f1 * f2)                  // Bessel I_n
//	}
//
// keeps its loop and its running products, carried by the helper's
// Product, which forms the same float64 value step by step and beside it
// the logarithm of the magnitude (DLMF 4.2 for ln of a product; common
// practice):
//
//	pw := lgamma.PowProduct(half, float64(n))
//	f1, f2 := lgamma.ProductOf(1.0), lgamma.ProductOf(1.0)
//	for k := 1; k < 200; k++ {
//		pw = pw.MulFloat(half * half)
//		f1 = f1.MulFloat(float64(n + k))
//		f2 = f2.MulFloat(float64(k))
//		sum += pw.Quo(f1.Mul(f2)).Float64()
//	}
//
// Every operation of the original is the same float64 operation in the
// Product, in the same order, and Float64 returns that value wherever
// no step of it left the normal range: the rewrite changes no value the
// code got right, whatever the parts hold, so the fixer needs nothing
// of the value model but which variables are the parts. A part is a
// local float64 variable declared by := and changed only by *=, /= and
// plain assignments (one value a target), at least once from its own
// value; every read of it becomes a Product expression, and where a
// float64 is needed its Float64. math.Pow calls among the factors of a
// product become PowProduct, so that a power past float64 keeps its
// value too.
func buildLogSpaceTerm(b *builder) error {
	term, ok := b.m.Node.(ast.Expr)
	if !ok || b.m.Func == nil {
		return errors.New("log-space term match lacks its term or function")
	}
	if !isFloat64Kind(b.pass.TypesInfo.TypeOf(term)) {
		return fmt.Errorf("series term of type %s, not of float64's kind", b.pass.TypesInfo.TypeOf(term))
	}
	body := b.funcBody()
	if body == nil {
		return errors.New("the term's function has no body")
	}
	lp := &logProducts{b: b, set: make(map[types.Object]bool), pkg: b.helper(term.Pos())}
	var names []string
	for _, a := range b.m.Args {
		id, ok := ast.Unparen(a).(*ast.Ident)
		if !ok {
			continue
		}
		v, ok := b.pass.TypesInfo.ObjectOf(id).(*types.Var)
		if !ok || lp.set[v] {
			continue
		}
		if err := lp.qualifies(v, body); err != nil {
			// A product written in one expression is still taken in
			// log space where its parts alone are not carried.
			if lp.chainableIn(term, true) && lp.leaves(term) >= 2 {
				return buildProductChain(b)
			}
			return err
		}
		lp.set[v] = true
		names = append(names, v.Name())
	}
	if len(lp.set) == 0 || !lp.chainable(term) && !lp.assignsPart(body, term) {
		return errors.New("no part of the term is a running product the fixer can carry in log space")
	}
	names = append(names, lp.partners(body)...)
	names = append(names, lp.copies(body)...)
	if b.commentIn(body) {
		// The rewrite replaces statements whole; a comment inside one
		// would go.
		for _, s := range lp.statements(body) {
			if b.commentIn(s) {
				return errors.New("a comment inside a statement the rewrite replaces")
			}
		}
	}
	lp.rewrite(body)
	if lp.err != nil {
		return lp.err
	}
	sort.Strings(names)
	b.message = fmt.Sprintf("Carry %s as products in log space (%s.Product) (imports %s)", strings.Join(names, ", "), lp.pkg, HelperPath)
	return nil
}

// copies adds to the carried variables those whose every value is a
// product of carried ones (norm := g), until none is left, and returns
// their names: a Gamma value kept under a second name is carried under
// both.
func (lp *logProducts) copies(body *ast.BlockStmt) []string {
	var names []string
	for more := true; more; {
		more = false
		ast.Inspect(body, func(n ast.Node) bool {
			as, ok := n.(*ast.AssignStmt)
			if !ok || as.Tok != token.DEFINE || len(as.Lhs) != len(as.Rhs) {
				return true
			}
			for i, l := range as.Lhs {
				id, ok := l.(*ast.Ident)
				if !ok || !lp.chainable(as.Rhs[i]) {
					continue
				}
				v, ok := lp.b.pass.TypesInfo.Defs[id].(*types.Var)
				if ok && !lp.set[v] && lp.qualifies(v, body) == nil {
					lp.set[v] = true
					names = append(names, v.Name())
					more = true
				}
			}
			return true
		})
	}
	return names
}

// partners adds to the carried variables the locals that are direct
// factors, beside a carried one, of a product the rewrite turns into a
// Product, and whose every value is a product of powers, Gamma values
// and exponentials (top := math.Pow(x, k/2-1) * math.Exp(-x/2) read in
// top / bottom, bottom carried), until none is left, and returns their
// names: such a factor may leave float64 on its own where the product
// does not, and as a Product it keeps its float64 value wherever it
// stayed in range.
func (lp *logProducts) partners(body *ast.BlockStmt) []string {
	var names []string
	var walk func(e ast.Expr) bool
	walk = func(e ast.Expr) bool {
		more := false
		switch x := ast.Unparen(e).(type) {
		case *ast.UnaryExpr:
			if x.Op == token.SUB {
				more = walk(x.X)
			}
		case *ast.BinaryExpr:
			if x.Op == token.MUL || x.Op == token.QUO {
				more = walk(x.X)
				more = walk(x.Y) || more
			}
		case *ast.Ident:
			v, ok := lp.b.pass.TypesInfo.Uses[x].(*types.Var)
			if ok && !lp.set[v] && lp.qualifies(v, body) == nil {
				lp.set[v] = true
				names = append(names, v.Name())
				more = true
			}
		}
		return more
	}
	for more := true; more; {
		more = false
		ast.Inspect(body, func(n ast.Node) bool {
			if x, ok := n.(*ast.BinaryExpr); ok && lp.chainable(x) {
				more = walk(x) || more
				return false
			}
			return true
		})
	}
	return names
}

// assignsPart reports whether e is (in) the value an assignment gives a
// carried variable.
func (lp *logProducts) assignsPart(body *ast.BlockStmt, e ast.Expr) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || found {
			return !found
		}
		for i, l := range as.Lhs {
			if !lp.isPart(ast.Unparen(l)) {
				continue
			}
			r := as.Rhs[0]
			if len(as.Lhs) == len(as.Rhs) {
				r = as.Rhs[i]
			}
			found = found || r.Pos() <= e.Pos() && e.End() <= r.End()
		}
		return !found
	})
	return found
}

// logProducts is one log-space rewrite: the variables it carries as
// Products and the name of the helper's import.
type logProducts struct {
	b   *builder
	set map[types.Object]bool
	pkg string
	// calls: math.Pow and math.Gamma calls are products of their own
	// (a product of them written in one expression); otherwise they are
	// carried only as factors of a product with a carried variable.
	calls bool
	// subs are expressions to write as the given text wherever the
	// chain takes them as they are (a count from a float helper in an
	// expression kept as written, asWritten).
	subs map[ast.Expr]string
	// counts are the subs that are exact integer counts (a binomial
	// function's value from the float helper of its form): a factor of
	// the chain as lgamma.CountProduct, whose zero makes the product
	// zero however far the other factors left float64.
	counts map[ast.Expr]bool
	// err is the first type the rewrite could not name in the file.
	err error
	// names, where set, are the Product expressions carried variables
	// are read as (a Sum's sumLog.Product()); otherwise their names.
	names map[types.Object]string
	// skip are statements the rewrite leaves to its caller.
	skip map[ast.Node]bool
	// abs: math.Abs of a chainable expression is chainable too
	// (Product.Abs), for the sides of a comparison (runsum.go).
	abs bool
}

// isFloat64Kind reports whether t is float64 or a named type over it
// (type Length float64): a Product carries either.
func isFloat64Kind(t types.Type) bool {
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Kind() == types.Float64
}

// asFloat64 returns text, the source of e, as a float64: converted
// where e is of a named type over float64.
// A conversion of a literal or a float64 to the named type, Length(1),
// is written as what it converts.
func (lp *logProducts) asFloat64(e ast.Expr, text string) string {
	info := lp.b.pass.TypesInfo
	t := info.TypeOf(e)
	if t == nil || !isFloat64Kind(t) || types.Identical(t, types.Typ[types.Float64]) || isLiteral(e) {
		return text
	}
	if c, ok := ast.Unparen(e).(*ast.CallExpr); ok && len(c.Args) == 1 && info.Types[c.Fun].IsType() {
		x := c.Args[0]
		if xt := info.TypeOf(x); xt != nil && (types.Identical(xt, types.Typ[types.Float64]) || isLiteral(x)) {
			return lp.spliced(x)
		}
	}
	return "float64(" + text + ")"
}

// isLiteral reports whether e is a number as written, signed or not.
func isLiteral(e ast.Expr) bool {
	switch x := ast.Unparen(e).(type) {
	case *ast.BasicLit:
		return true
	case *ast.UnaryExpr:
		return (x.Op == token.SUB || x.Op == token.ADD) && isLiteral(x.X)
	}
	return false
}

// read writes a chainable x as its Product's float64 value, converted
// to x's own type where that is a named type over float64 (Length).
func (lp *logProducts) read(x ast.Expr) string {
	text := lp.chain(x) + ".Float64()"
	t := lp.b.pass.TypesInfo.TypeOf(x)
	if t == nil || types.Identical(t, types.Typ[types.Float64]) || !isFloat64Kind(t) {
		return text
	}
	name, err := lp.b.typeName(t)
	if err != nil && lp.err == nil {
		lp.err = err
	}
	return name + "(" + text + ")"
}

// qualifies checks that v is a running product the rewrite can carry: a
// float64 local declared by :=, whose every change is an assignment of
// one value to it or a *= or /=, at least one of them from its own
// value.
func (lp *logProducts) qualifies(v *types.Var, body *ast.BlockStmt) error {
	b := lp.b
	if !isFloat64Kind(v.Type()) {
		return fmt.Errorf("%s is not of float64's kind", v.Name())
	}
	if v.Pos() < body.Pos() || v.Pos() >= body.End() {
		return fmt.Errorf("%s is not a local of the term's function", v.Name())
	}
	self, products := false, true
	switch d := b.declaring(v).(type) {
	case *ast.AssignStmt:
		if d.Tok != token.DEFINE {
			return fmt.Errorf("%s is not declared by :=", v.Name())
		}
	case *ast.DeclStmt:
		spec := varSpec(d, v)
		if spec == nil || len(spec.Names) != 1 || len(spec.Values) > 1 {
			return fmt.Errorf("%s is not declared alone", v.Name())
		}
		for _, e := range spec.Values {
			products = lp.chainableIn(e, true)
		}
	default:
		return fmt.Errorf("%s is not declared by := or var", v.Name())
	}
	var bad error
	assigned.Each(b.pass.TypesInfo, body, nil, func(obj types.Object, at ast.Node) bool {
		if obj != v {
			return true
		}
		as, ok := at.(*ast.AssignStmt)
		if !ok {
			bad = fmt.Errorf("%s is changed other than by an assignment", v.Name())
			return false
		}
		switch as.Tok {
		case token.MUL_ASSIGN, token.QUO_ASSIGN:
			self = true
		case token.ASSIGN, token.DEFINE:
			if len(as.Lhs) != len(as.Rhs) {
				bad = fmt.Errorf("%s is assigned from a call of several results", v.Name())
				return false
			}
			for i, l := range as.Lhs {
				if !b.isObj(l, v) {
					continue
				}
				if b.mentionsObj(as.Rhs[i], v) && as.Tok == token.ASSIGN {
					self = true
				}
				products = products && lp.chainableIn(as.Rhs[i], true)
			}
		default:
			bad = fmt.Errorf("%s is changed by %s", v.Name(), as.Tok)
			return false
		}
		return true
	})
	if bad != nil {
		return bad
	}
	if !self && !products {
		return fmt.Errorf("%s is neither a running product nor a product of powers, Gamma values and exponentials", v.Name())
	}
	return nil
}

// varSpec returns the spec of the var declaration d that declares v,
// or nil.
func varSpec(d *ast.DeclStmt, v types.Object) *ast.ValueSpec {
	g, ok := d.Decl.(*ast.GenDecl)
	if !ok || g.Tok != token.VAR {
		return nil
	}
	for _, s := range g.Specs {
		if vs, ok := s.(*ast.ValueSpec); ok {
			for _, n := range vs.Names {
				if n.Pos() == v.Pos() {
					return vs
				}
			}
		}
	}
	return nil
}

// isPart reports whether e is a variable the rewrite carries.
func (lp *logProducts) isPart(e ast.Expr) bool {
	id, ok := e.(*ast.Ident)
	return ok && lp.set[lp.b.pass.TypesInfo.ObjectOf(id)]
}

// chainable reports whether e is a product (or quotient, negation,
// parenthesis) with a carried variable among its direct factors: it
// becomes a Product expression.
func (lp *logProducts) chainable(e ast.Expr) bool { return lp.chainableIn(e, lp.calls) }

// chainableIn is chainable with calls of math.Pow, math.Gamma and
// math.Exp taken as products of their own when calls is set: inside a
// value that becomes a Product anyway.
func (lp *logProducts) chainableIn(e ast.Expr, calls bool) bool {
	switch x := e.(type) {
	case *ast.Ident:
		return lp.isPart(x)
	case *ast.CallExpr:
		if in := lp.sameTypeConv(x); in != nil {
			return lp.chainableIn(in, calls)
		}
		if in := lp.sqrtOf(x); in != nil {
			return lp.chainableIn(in, calls)
		}
		if in := lp.absOf(x); in != nil {
			return lp.chainableIn(in, calls)
		}
		return calls && lp.isLeaf(x)
	case *ast.ParenExpr:
		return lp.chainableIn(x.X, calls)
	case *ast.UnaryExpr:
		return x.Op == token.SUB && lp.chainableIn(x.X, calls)
	case *ast.BinaryExpr:
		return (x.Op == token.MUL || x.Op == token.QUO) && (lp.chainableIn(x.X, calls) || lp.chainableIn(x.Y, calls))
	}
	return false
}

// isLeaf reports whether e is a call of math.Pow, math.Gamma or
// math.Exp, or of a factorial function (Match.Factorials).
func (lp *logProducts) isLeaf(e ast.Expr) bool {
	if lp.factorialCall(e) != nil || lp.binomialCall(e) != nil {
		return true
	}
	c, fn := lp.b.callOf(e)
	return c != nil && (len(c.Args) == 2 && isMath(fn, "Pow") || len(c.Args) == 1 && (isMath(fn, "Gamma") || isMath(fn, "Exp")))
}

// factorialCall returns the match's factorial call that e is, or nil.
func (lp *logProducts) factorialCall(e ast.Expr) *FactorialCall {
	for i, f := range lp.b.m.Factorials {
		if f.Call == ast.Unparen(e) {
			return &lp.b.m.Factorials[i]
		}
	}
	return nil
}

// sqrtOf returns x of a call math.Sqrt(x), or nil: the square root of
// a product is a Product too (Product.Sqrt), 1/√(2^n·n!·√π) keeps its
// value where the product under the root leaves float64.
func (lp *logProducts) sqrtOf(c *ast.CallExpr) ast.Expr {
	if _, fn := lp.b.callOf(c); len(c.Args) == 1 && isMath(fn, "Sqrt") {
		return c.Args[0]
	}
	return nil
}

// absOf returns x of a call math.Abs(x) where lp takes such calls
// (abs), or nil.
func (lp *logProducts) absOf(c *ast.CallExpr) ast.Expr {
	if _, fn := lp.b.callOf(c); lp.abs && len(c.Args) == 1 && isMath(fn, "Abs") {
		return c.Args[0]
	}
	return nil
}

// sameTypeConv returns x of a conversion float64(x) whose x is a
// float64 already (a conversion that changes nothing), or nil.
func (lp *logProducts) sameTypeConv(c *ast.CallExpr) ast.Expr {
	info := lp.b.pass.TypesInfo
	if tv, ok := info.Types[c.Fun]; !ok || !tv.IsType() || len(c.Args) != 1 {
		return nil
	}
	if !types.Identical(info.TypeOf(c), types.Typ[types.Float64]) || !types.Identical(info.TypeOf(c.Args[0]), types.Typ[types.Float64]) {
		return nil
	}
	return c.Args[0]
}

// binomialCall returns the match's binomial call that e is, or nil.
func (lp *logProducts) binomialCall(e ast.Expr) *BinomialCall {
	for i, f := range lp.b.m.Binomials {
		if f.Call == ast.Unparen(e) {
			return &lp.b.m.Binomials[i]
		}
	}
	return nil
}

// count writes a count as a float64 operand of a helper call.
func (lp *logProducts) count(e ast.Expr) string {
	if types.Identical(lp.b.pass.TypesInfo.TypeOf(e), types.Typ[types.Float64]) {
		return lp.spliced(e)
	}
	return "float64(" + lp.spliced(e) + ")"
}

// callText writes a call as the code writes it, its arguments spliced.
func (lp *logProducts) callText(c *ast.CallExpr) string {
	args := make([]string, len(c.Args))
	for i, a := range c.Args {
		args[i] = lp.spliced(a)
	}
	return lp.b.copyText(c.Fun) + "(" + strings.Join(args, ", ") + ")"
}

// leaf writes a call of math.Pow, math.Gamma or math.Exp as the
// Product that holds its value, and a factorial function's call as the
// Product of the value it returns with the count's ln n! beside it; ""
// for any other expression.
func (lp *logProducts) leaf(e ast.Expr) string {
	if !lp.isLeaf(e) {
		return ""
	}
	if f := lp.factorialCall(e); f != nil {
		count := lp.count(f.Arg)
		if _, ok := ast.Unparen(f.Arg).(*ast.Ident); !ok && f.Off != 0 && !strings.HasPrefix(count, "float64(") {
			count = "(" + count + ")"
		}
		if f.Off != 0 {
			count = fmt.Sprintf("%s%+d", count, f.Off)
		}
		return lp.pkg + ".FactorialProduct(" + lp.callText(f.Call) + ", " + count + ")"
	}
	if f := lp.binomialCall(e); f != nil {
		return lp.pkg + ".ChooseProduct(" + lp.callText(f.Call) + ", " + lp.count(f.N) + ", " + lp.count(f.K) + ")"
	}
	c, fn := lp.b.callOf(e)
	if fn.Name() == "Pow" {
		return lp.pkg + ".PowProduct(" + lp.spliced(c.Args[0]) + ", " + lp.spliced(c.Args[1]) + ")"
	}
	return lp.pkg + "." + fn.Name() + "Product(" + lp.spliced(c.Args[0]) + ")"
}

// product writes e as a Product expression: a chain of its factors, a
// power from PowProduct, a Gamma value from GammaProduct, any other
// value from ProductOf.
func (lp *logProducts) product(e ast.Expr) string {
	if c, ok := lp.countProduct(e); ok {
		return c
	}
	if lp.chainableIn(e, true) {
		return lp.chain(e)
	}
	if l := lp.leaf(e); l != "" {
		return l
	}
	return lp.pkg + ".ProductOf(" + lp.asFloat64(e, lp.spliced(e)) + ")"
}

// countProduct writes e as lgamma.CountProduct of its text where it is
// one of the counts.
func (lp *logProducts) countProduct(e ast.Expr) (string, bool) {
	e = ast.Unparen(e)
	if !lp.counts[e] {
		return "", false
	}
	return lp.pkg + ".CountProduct(" + lp.asFloat64(e, lp.subs[e]) + ")", true
}

// chain writes a chainable e as the Product operations that form the
// same float64 operations in the same order.
func (lp *logProducts) chain(e ast.Expr) string {
	switch x := e.(type) {
	case *ast.Ident:
		if name, ok := lp.names[lp.b.pass.TypesInfo.ObjectOf(x)]; ok {
			return name
		}
		return x.Name
	case *ast.CallExpr:
		if in := lp.sameTypeConv(x); in != nil {
			return lp.chain(in)
		}
		if in := lp.sqrtOf(x); in != nil {
			return lp.product(in) + ".Sqrt()"
		}
		if in := lp.absOf(x); in != nil {
			return lp.product(in) + ".Abs()"
		}
		return lp.leaf(x)
	case *ast.ParenExpr:
		return lp.chain(x.X)
	case *ast.UnaryExpr:
		return lp.chain(x.X) + ".Neg()"
	case *ast.BinaryExpr:
		return lp.apply(lp.product(x.X), x.Op, x.Y)
	}
	panic("chain of an expression that is not chainable")
}

// apply writes left op y, left a Product expression.
func (lp *logProducts) apply(left string, op token.Token, y ast.Expr) string {
	name := "Mul"
	if op == token.QUO || op == token.QUO_ASSIGN {
		name = "Quo"
	}
	if _, count := lp.countProduct(y); count || lp.chainableIn(y, true) {
		return left + "." + name + "(" + lp.product(y) + ")"
	}
	// The call's parentheses group y: its own would be doubled.
	y = ast.Unparen(y)
	return left + "." + name + "Float(" + lp.asFloat64(y, lp.spliced(y)) + ")"
}

// spliced returns the source of e with every read of a carried variable
// rewritten: each largest chainable expression in it becomes its chain
// read back as a float64.
func (lp *logProducts) spliced(e ast.Expr) string {
	b := lp.b
	var out strings.Builder
	at := e.Pos()
	ast.Inspect(e, func(n ast.Node) bool {
		x, ok := n.(ast.Expr)
		if !ok {
			return true
		}
		text, sub := lp.subs[x]
		if !sub {
			if !lp.chainable(x) {
				return true
			}
			text = lp.read(x)
		}
		out.Write(b.src[b.offset(at):b.offset(x.Pos())])
		out.WriteString(text)
		at = x.End()
		return false
	})
	out.Write(b.src[b.offset(at):b.offset(e.End())])
	b.copied = append(b.copied, span{e.Pos(), e.End()})
	return out.String()
}

// statements returns the assignments to carried variables, which the
// rewrite replaces.
func (lp *logProducts) statements(body *ast.BlockStmt) []ast.Stmt {
	var out []ast.Stmt
	ast.Inspect(body, func(n ast.Node) bool {
		switch x := n.(type) {
		case *ast.AssignStmt:
			for _, l := range x.Lhs {
				if lp.isPart(ast.Unparen(l)) {
					out = append(out, x)
					break
				}
			}
		case *ast.DeclStmt:
			if lp.declared(x) != nil {
				out = append(out, x)
			}
		}
		return true
	})
	return out
}

// declared returns the spec of d that declares a carried variable, or
// nil.
func (lp *logProducts) declared(d *ast.DeclStmt) *ast.ValueSpec {
	for v := range lp.set {
		if spec := varSpec(d, v); spec != nil {
			return spec
		}
	}
	return nil
}

// rewrite edits the function body: the assignments to carried variables
// take Products, every other read of one reads a Product back.
func (lp *logProducts) rewrite(body *ast.BlockStmt) {
	b := lp.b
	var visit func(n ast.Node) bool
	visit = func(n ast.Node) bool {
		if lp.skip[n] {
			return false
		}
		switch x := n.(type) {
		case *ast.DeclStmt:
			// var w T, or var w = e: the Product of its value, 0 by
			// default.
			spec := lp.declared(x)
			if spec == nil {
				return true
			}
			value := lp.pkg + ".ProductOf(0)"
			if len(spec.Values) == 1 {
				value = lp.product(spec.Values[0])
			}
			b.replace(spec.Names[0].Pos(), spec.End(), spec.Names[0].Name+" = "+value)
			return false
		case *ast.AssignStmt:
			if (x.Tok == token.MUL_ASSIGN || x.Tok == token.QUO_ASSIGN) && lp.isPart(ast.Unparen(x.Lhs[0])) {
				v := ast.Unparen(x.Lhs[0]).(*ast.Ident).Name
				b.replace(x.Pos(), x.End(), v+" = "+lp.apply(v, x.Tok, x.Rhs[0]))
				return false
			}
			for i, l := range x.Lhs {
				if lp.isPart(ast.Unparen(l)) {
					r := x.Rhs[i]
					b.replace(r.Pos(), r.End(), lp.product(r))
					continue
				}
				ast.Inspect(l, visit)
				if len(x.Lhs) == len(x.Rhs) {
					ast.Inspect(x.Rhs[i], visit)
				}
			}
			if len(x.Lhs) != len(x.Rhs) {
				for _, r := range x.Rhs {
					ast.Inspect(r, visit)
				}
			}
			return false
		case ast.Expr:
			if lp.chainable(x) {
				b.replace(x.Pos(), x.End(), lp.read(x))
				return false
			}
		}
		return true
	}
	ast.Inspect(body, visit)
}

// A product of powers and Gamma values written in one expression,
//
//	math.Pow(r, d) * math.Pow(math.Pi, d/2) / math.Gamma(d/2+1)
//	math.Gamma(c) * math.Gamma(d) / (math.Gamma(c-a) * math.Gamma(c-b))
//
// is the same chain of Products with each call the Product that holds
// its value (PowProduct, GammaProduct):
//
//	lgamma.PowProduct(r, d).Mul(lgamma.PowProduct(math.Pi, d/2)).Quo(lgamma.GammaProduct(d/2 + 1)).Float64()
//
// which keeps the float64 value wherever no step of it left the normal
// range, and takes the logarithms where one did (a power or a Gamma
// value past float64 whose quotient is not). The analyzer names the
// expression; the fixer checks that two of its factors at least are
// such calls.
func buildProductChain(b *builder) error {
	e, ok := b.m.Node.(ast.Expr)
	if !ok {
		return errors.New("product match lacks its expression")
	}
	if !types.Identical(b.pass.TypesInfo.TypeOf(e), types.Typ[types.Float64]) {
		return fmt.Errorf("product of type %s, not float64", b.pass.TypesInfo.TypeOf(e))
	}
	lp := &logProducts{b: b, set: map[types.Object]bool{}, pkg: b.helper(e.Pos()), calls: true}
	if !lp.chainable(e) || lp.leaves(e) < 2 {
		return fmt.Errorf("not a product of two or more powers and Gamma values: %s", b.text(e))
	}
	e = lp.rootedTop(e)
	text := lp.chain(e) + ".Float64()"
	if b.commentCopied(e) {
		// Copied into the one line of the chain, a // comment would
		// swallow the rest of it; a comment between the factors goes
		// above the line (keepComments).
		return errors.New("a comment inside a factor of the product")
	}
	b.replace(e.Pos(), e.End(), text)
	b.message = fmt.Sprintf("Take the product in log space where its factors leave float64 (%s.Product) (imports %s)", lp.pkg, HelperPath)
	return nil
}

// rootedTop returns the expression that holds e under a square root:
// math.Sqrt(e), and the products and further roots that hold that, as
// √((2l+1)/(4π)·(l−m)!/(l+m)!) or 1/√(2^n·n!·√π); e itself where no
// root holds it. The quotient under a root may leave float64 where its
// root does not (158!/183! does not, 1036!/1163! does), so the chain
// takes the root too, and Product.Sqrt halves its logarithm.
func (lp *logProducts) rootedTop(e ast.Expr) ast.Expr {
	path, _ := astpath.Enclosing(lp.b.file, e.Pos(), e.End())
	top, rooted := e, false
	for i, n := range path {
		if n != e {
			continue
		}
		for _, up := range path[i+1:] {
			switch x := up.(type) {
			case *ast.ParenExpr:
				continue
			case *ast.CallExpr:
				if lp.sqrtOf(x) != nil {
					top, rooted = x, true
					continue
				}
			case *ast.BinaryExpr:
				if rooted && (x.Op == token.MUL || x.Op == token.QUO) && types.Identical(lp.b.pass.TypesInfo.TypeOf(x), types.Typ[types.Float64]) {
					top = x
					continue
				}
			}
			break
		}
		break
	}
	return top
}

// leaves counts the direct factors of a chainable e that are calls of
// math.Pow or math.Gamma.
func (lp *logProducts) leaves(e ast.Expr) int {
	switch x := e.(type) {
	case *ast.CallExpr:
		if in := lp.sqrtOf(x); in != nil {
			return lp.leaves(in)
		}
		return 1
	case *ast.ParenExpr:
		return lp.leaves(x.X)
	case *ast.UnaryExpr:
		return lp.leaves(x.X)
	case *ast.BinaryExpr:
		n := 0
		for _, y := range []ast.Expr{x.X, x.Y} {
			if lp.chainableIn(y, true) {
				n += lp.leaves(y)
			}
		}
		return n
	}
	return 0
}

// buildGammaRatio rewrites Γ(a)/Γ(b) into lgamma.GammaRatio, except
// where the ratio is a factor of a float64 product with powers or other
// Gamma values, Γ((k+3)/2)/Γ(3/2)·s^k: the ratio alone may be +Inf
// where the product is finite or 0 (s = 0 gives +Inf·0 = NaN), so the
// whole product is taken as a Product chain (buildProductChain), which
// keeps the float64 value wherever its steps stay in range.
func buildGammaRatio(b *builder) error {
	if top := b.enclosingProduct(); top != nil {
		node := b.m.Node
		b.m.Node = top
		if err := buildProductChain(b); err == nil {
			return nil
		}
		b.m.Node = node
	}
	return buildTerm(b)
}

// enclosingProduct returns the largest product or quotient of float64
// factors that holds the match's node as a factor and has other calls
// of math.Pow, math.Gamma or math.Exp among its factors; nil where
// there is none.
func (b *builder) enclosingProduct() ast.Expr {
	path, _ := astpath.Enclosing(b.file, b.m.Node.Pos(), b.m.Node.End())
	var top ast.Expr
	for i, n := range path {
		if n == b.m.Node {
			for _, up := range path[i+1:] {
				switch x := up.(type) {
				case *ast.ParenExpr:
					continue
				case *ast.BinaryExpr:
					if x.Op == token.MUL || x.Op == token.QUO {
						top = x
						continue
					}
				}
				break
			}
			break
		}
	}
	if top == nil || !types.Identical(b.pass.TypesInfo.TypeOf(top), types.Typ[types.Float64]) {
		return nil
	}
	lp := &logProducts{b: b, set: map[types.Object]bool{}, calls: true}
	if !lp.chainable(top) || lp.leaves(top) <= lp.leaves(b.m.Node.(ast.Expr)) {
		return nil
	}
	return top
}
