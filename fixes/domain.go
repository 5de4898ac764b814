package fixes

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"regexp"
	"strconv"
	"strings"

	"github.com/overfact/overfact/internal/astpath"
)

// A helper computes its quantity on the quantity's domain: C(n, k) for
// 0 ≤ k ≤ n, a probability for p in [0, 1], Γ(a)/Γ(b) away from the
// poles. The code it replaces computed something outside it too, and
// often the right thing for what it is: a factorial loop is an empty
// product, 1, below 2, so fact(n)/(fact(k)·fact(n−k)) is 0 for k > n
// where lgamma.Choose is 0 as well but lgamma.MustFallingInt64 panics,
// and fact(−3)/fact(−28) is 1 where the helper panics; math.Gamma(−2.5)
// is finite where lgamma.Beta(−2.5, b) is NaN (lgamma.GammaRatio follows
// math.Gamma below zero: no test). A fix must not change a
// value the code got right, so where the operands leave the domain the
// rewritten code runs the expression as written:
//
//	if k < 0 || k > n {
//		//overfact:allow outside 0 ≤ k ≤ n the expression as written
//		return fact(n) / (fact(k) * fact(n-k))
//	}
//	return lgamma.MustChooseInt64(int64(n), int64(k))
//
// where the expression is what a return statement returns, and the same
// test inside a function literal called in place elsewhere.
//
// Inside the domain the helper and the expression are the same quantity
// (the row's identity), so the expression as written runs only where
// the helper would have differed from it; whatever it computes there is
// what the code always computed.

// The domain is the helper's: it is written once, over the helper's
// operands in the order of its parameters (%[1]s is the first), as
// bounds that all hold inside it, and tested two ways. A rewrite of the
// row's expression on the code's own operands tests that they leave it
// (k < 0 || k > n, keepOutsideDomain); a call given float counts tests
// that they are integers inside it (countConds, floatcount.go). Either
// way one mechanism, keepAsWritten, keeps the expression as written.

// A bound is lo ≤ hi, or lo < hi when strict.
type bound struct {
	lo, hi string
	strict bool
}

// inside is the bound as a test that holds inside the domain: 0 <= k.
func (d bound) inside(ops []any) string {
	op := " <= "
	if d.strict {
		op = " < "
	}
	return fill(d.lo, ops) + op + fill(d.hi, ops)
}

// outside is the bound as a test that holds outside the domain, the
// operand first: k < 0, k > n.
func (d bound) outside(ops []any) string {
	if _, err := strconv.Atoi(d.lo); err == nil {
		op := " < "
		if d.strict {
			op = " <= "
		}
		return fill(d.hi, ops) + op + d.lo
	}
	op := " > "
	if d.strict {
		op = " >= "
	}
	return fill(d.lo, ops) + op + fill(d.hi, ops)
}

// fill returns a side of a bound with the operands in place of their
// references; a constant side stays as it is.
func fill(side string, ops []any) string {
	if !strings.Contains(side, "%") {
		return side
	}
	return fmt.Sprintf(side, ops...)
}

// atLeastZero returns the operand i of the bound 0 ≤ %[i]s, if it is one.
func (d bound) atLeastZero() (int, bool) {
	var i int
	if d.lo != "0" || d.strict {
		return 0, false
	}
	if n, _ := fmt.Sscanf(d.hi, "%%[%d]s", &i); n != 1 || d.hi != fmt.Sprintf("%%[%d]s", i) {
		return 0, false
	}
	return i - 1, true
}

var operandRef = regexp.MustCompile(`%\[(\d+)\]s`)

// operands returns the operands the bound names, from 0.
func (d bound) operands() []int {
	var out []int
	for _, m := range operandRef.FindAllStringSubmatch(d.lo+" "+d.hi, -1) {
		i, _ := strconv.Atoi(m[1])
		out = append(out, i-1)
	}
	return out
}

// A domain is where a helper computes what the textbook formula of its
// shape computes (common practice: C(n,k) = n!/(k!(n−k)!) for
// 0 ≤ k ≤ n, n!/(n−k)! for 0 ≤ k ≤ n, x^k/k!, λ^k e^−λ/k! and the
// multinomial's parts for counts ≥ 0, the binomial pmf for 0 ≤ k ≤ n,
// the negative binomial pmf C(f+s−1, f) p^s (1−p)^f for f ≥ 0 and
// s ≥ 1; probabilities in [0, 1], rates ≥ 0, B(a, b) for positive
// arguments): its bounds, in words for the directive's reason. counts,
// where set, are the bounds float counts are tested against instead.
type domain struct {
	bounds []bound
	words  string
	counts []bound
}

var (
	kUpToN    = []bound{{"0", "%[2]s", false}, {"%[2]s", "%[1]s", false}}
	nAtLeast0 = []bound{{"0", "%[1]s", false}}
	// loopTrips is the domain of a model loop's float counts: n whole
	// and k ≥ 0 whole, the loop's trip count (buildModelLoop).
	loopTrips  = []bound{{"0", "%[2]s", false}}
	pmfBetween = []bound{{"0", "%[1]s", false}, {"%[1]s", "%[2]s", false}, {"0", "%[3]s", false}, {"%[3]s", "1", false}}
)

// domains holds the domain of each helper with one, by the name of its
// float helper.
var domains = map[string]domain{
	"Choose":           {bounds: kUpToN, words: "0 ≤ k ≤ n"},
	"Falling":          {bounds: kUpToN, words: "0 ≤ k ≤ n"},
	"Catalan":          {bounds: nAtLeast0, words: "n ≥ 0"},
	"Factorial":        {bounds: nAtLeast0, words: "n ≥ 0"},
	"PowOverFactorial": {bounds: []bound{{"0", "%[2]s", false}}, words: "k ≥ 0"},
	"PoissonPMF":       {bounds: []bound{{"0", "%[1]s", false}, {"0", "%[2]s", false}}, words: "k ≥ 0, λ ≥ 0"},
	// λ^k e^−λ / k! is what the helper computes for any λ.
	"PoissonTerm": {bounds: []bound{{"0", "%[1]s", false}}, words: "k ≥ 0"},
	"BinomialPMF": {bounds: pmfBetween, words: "0 ≤ k ≤ n, 0 ≤ p ≤ 1"},
	"NegativeBinomialPMF": {bounds: []bound{{"0", "%[1]s", false}, {"1", "%[2]s", false}, {"0", "%[3]s", false}, {"%[3]s", "1", false}},
		words: "f ≥ 0, s ≥ 1, 0 ≤ p ≤ 1"},
	// Operands k, N, K, n. Outside its support the hypergeometric
	// probability is 0, as the helper says, but the code's own binomials
	// need not be: one over factorial loops, whose empty product is 1
	// below 2, is 1/(k!·(−d)!·…) ≠ 0 for k > n. The helper runs only
	// where each of the three binomials is in its own domain:
	// 0 ≤ k ≤ K and 0 ≤ n − k ≤ N − K, which imply 0 ≤ n ≤ N (tested
	// before the differences, which then cannot wrap). Float counts are
	// held to the support: 0 ≤ k ≤ K, k ≤ n, 0 ≤ n−k ≤ N−K.
	"HypergeometricPMF": {
		bounds: []bound{{"0", "%[1]s", false}, {"%[1]s", "%[3]s", false}, {"%[1]s", "%[4]s", false}, {"%[4]s", "%[2]s", false}, {"%[4]s-%[1]s", "%[2]s-%[3]s", false}},
		words:  "0 ≤ k ≤ successes, 0 ≤ draws − k ≤ total − successes",
		counts: []bound{{"0", "%[1]s", false}, {"%[1]s", "%[3]s", false}, {"%[1]s", "%[4]s", false}, {"%[4]s-%[1]s", "%[2]s-%[3]s", false}},
	},
	"Beta": {bounds: []bound{{"0", "%[1]s", true}, {"0", "%[2]s", true}}, words: "positive arguments"},
}

// domainOf returns the domain of the helper name over n operands; a
// multinomial's has one bound per part.
func domainOf(name string, n int) (domain, bool) {
	if name == "Multinomial" {
		d := domain{words: "parts ≥ 0"}
		for i := range n {
			d.bounds = append(d.bounds, bound{"0", fmt.Sprintf("%%[%d]s", i+1), false})
		}
		return d, n > 0
	}
	d, ok := domains[name]
	return d, ok
}

// domainShapes are the shapes whose rewrite tests the code's operands
// against the domain of the row's helper (keepOutsideDomain).
var domainShapes = map[Shape]bool{
	ShapeBinomial: true, ShapePermutation: true, ShapeMultinomial: true, ShapeCatalan: true, ShapeFactorialValue: true,
	ShapeHypergeometric: true, ShapePowOverFactorial: true, ShapePoisson: true, ShapeBinomialPMF: true,
	ShapeNegBinomialPMF: true, ShapeBeta: true, ShapeInverseBeta: true, ShapeLoopQuotient: true,
}

// keepOutsideDomain makes the node's own expression run where the
// operands leave the helper's domain: before the return statement that
// returns the node, or by wrapping text, the helper call replacing it,
// which it returns. It changes nothing where that cannot be written
// faithfully (operands with effects evaluated twice, locals the rewrite
// deletes), is never needed (constant operands) or is done already (a
// call on float counts, countConds).
func (b *builder) keepOutsideDomain(text string, args []ast.Expr) (string, error) {
	if !domainShapes[b.m.Shape] || b.keptAsWritten {
		return text, nil
	}
	d, ok := domainOf(shapes[b.m.Shape].helpers.float, len(args))
	if !ok {
		return text, nil
	}
	quotient, err := b.emptyQuotient()
	// Where the test cannot be written, the rewrite stands alone; not
	// for a chain, whose links it deletes: outside the domain its value
	// would change.
	alone := func() (string, error) {
		if len(b.m.Chain) > 0 {
			return "", fmt.Errorf("no exact value outside %s for a value built over several statements", d.words)
		}
		return text, nil
	}
	if len(b.m.Chain) > 0 && (err != nil || quotient == "") {
		return alone()
	}
	if err != nil {
		return text, nil
	}
	// Locals the rewrite deletes (hit := C(bad, k) read by return
	// hit·miss/C(total, n)) move into the branch when they are the
	// statements just before the return; the exact quotient reads none.
	var defs []ast.Stmt
	if quotient == "" {
		if defs, ok = b.absorbedBeforeReturn(args); !ok || len(defs) > 0 && b.returning() == nil {
			return text, nil
		}
	}
	ops := make([]any, len(args))
	exprs := make([]ast.Expr, len(args))
	allConst := true
	for i, a := range args {
		if !b.plain(a) { // evaluated twice: in the test and in the call
			return alone()
		}
		// float64(k) < 0 is k < 0: test the count itself.
		e := b.floatOfInt(a)
		tv, ok := b.pass.TypesInfo.Types[e]
		if !ok {
			return alone()
		}
		if tv.Value == nil {
			allConst = false
		}
		exprs[i] = e
		ops[i] = operandText(b.text(e), e)
	}
	if allConst {
		return text, nil
	}
	var conds []string
	for _, bd := range d.bounds {
		// The operands a bound compares are compared as they are: they
		// must have one type.
		if ix := bd.operands(); len(ix) > 1 {
			for _, i := range ix {
				if i >= len(exprs) || !types.Identical(b.pass.TypesInfo.TypeOf(exprs[i]), b.pass.TypesInfo.TypeOf(exprs[ix[0]])) {
					return alone()
				}
			}
		}
	}
	for _, bd := range d.bounds {
		// An unsigned count is never below zero.
		if i, ok := bd.atLeastZero(); ok && i < len(exprs) {
			if t, ok := b.pass.TypesInfo.TypeOf(exprs[i]).Underlying().(*types.Basic); ok && t.Info()&types.IsUnsigned != 0 {
				continue
			}
			// Nor one the analyzer's ranges show is not (Match.NonNeg).
			if b.m.NonNeg[args[i]] || b.m.NonNeg[exprs[i]] {
				continue
			}
		}
		conds = append(conds, bd.outside(ops))
	}
	if len(conds) == 0 {
		return text, nil
	}
	if quotient != "" {
		return b.keepAs(text, b.m.Node, quotient, conds, false, "// outside "+d.words+", as the code computed it: the factorial of a negative number is 1")
	}
	var lead []string
	for _, def := range defs {
		lead = append(lead, b.copyText(def))
	}
	empty, why := b.wrappedEmptyDivisor(d, exprs, conds)
	if why != "" {
		lead = append(lead, why)
	}
	lead = append(lead, "//overfact:allow outside "+d.words+" the expression as written")
	orig, err := b.asWrittenWith(b.m.Node, empty)
	if err != nil {
		return "", err
	}
	if fn := b.summandOf(); (b.m.Shape == ShapeBinomialPMF || b.m.Shape == ShapeNegBinomialPMF) && fn != "" {
		var refused []string
		orig, refused = b.refuseInfiniteTerm(fn, orig, exprs)
		lead = append(lead, refused...)
	}
	return b.keepAs(text, b.m.Node, orig, conds, false, lead...)
}

// summandOf returns the name of the function in which the match's node
// is what a loop adds to (or subtracts from) a float sum, sum += node;
// "" where it is not.
func (b *builder) summandOf() string {
	node, ok := b.m.Node.(ast.Expr)
	if !ok {
		return ""
	}
	path, _ := astpath.Enclosing(b.file, node.Pos(), node.End())
	if len(path) < 2 || path[0] != node {
		return ""
	}
	as, ok := path[1].(*ast.AssignStmt)
	if !ok || len(as.Rhs) != 1 || as.Rhs[0] != node || (as.Tok != token.ADD_ASSIGN && as.Tok != token.SUB_ASSIGN) ||
		classOf(b.pass.TypesInfo.TypeOf(as.Lhs[0])) != classFloat {
		return ""
	}
	loop := false
	for _, n := range path[2:] {
		switch n := n.(type) {
		case *ast.ForStmt, *ast.RangeStmt:
			loop = true
		case *ast.FuncLit:
			return ""
		case *ast.FuncDecl:
			if loop {
				return n.Name.Name
			}
			return ""
		}
	}
	return ""
}

// refuseInfiniteTerm makes a term of a sum, kept as written outside the
// helper's domain, refuse to run where its own value leaves float64: a
// binomial probability's terms for p outside [0, 1] alternate in sign
// (1 − p < 0), and two of them past float64 add to +Inf − Inf = NaN,
// not to the sum, whose true value there (C(500, d)·34.5^d·(−33.5)^(500−d)
// summed over d ≤ 5 is about −9.7e773) the loop cannot form in float64
// either. It returns the term's value and the lines that form it and
// panic naming the operands where it is ±Inf.
func (b *builder) refuseInfiniteTerm(fn, orig string, exprs []ast.Expr) (string, []string) {
	pos := b.m.Node.Pos()
	name := b.freeName("term", pos, pos, nil)
	var labels, values []string
	for _, e := range exprs {
		if e == nil {
			continue
		}
		op := e
		for {
			c, ok := ast.Unparen(op).(*ast.CallExpr)
			if !ok || !b.isNumericConversion(c) {
				break
			}
			op = c.Args[0]
		}
		verb := "%d"
		if classOf(b.pass.TypesInfo.TypeOf(op)) == classFloat {
			verb = "%v"
		}
		labels = append(labels, b.text(ast.Unparen(op))+" = "+verb)
		values = append(values, b.text(op))
	}
	msg := fmt.Sprintf("%s: %s: a term of the sum overflows float64", fn, strings.Join(labels, ", "))
	return name, []string{
		name + " := " + orig,
		fmt.Sprintf("if %s.IsInf(%s, 0) {", b.use("math", "math", pos), name),
		fmt.Sprintf("\tpanic(%s.Sprintf(%s, %s))", b.use("fmt", "fmt", pos), strconv.Quote(msg), strings.Join(values, ", ")),
		"}",
	}
}

// wrappedEmptyDivisor returns, for a term x^k/k! kept as written where
// its one bound, k ≥ 0, fails (conds), the divisor's factorial call
// mapped to the empty product 1, and the comment that says why, when
// the call's argument converts the signed count to an unsigned type:
// factU(uint64(k)) for k < 0. There the conversion wraps to 2⁶⁴ − |k|,
// where the function runs about 2⁶⁴ trips or its own range guard
// panics naming a number the caller never passed, and never returns the
// value the term means; the function returns 1 for every argument below
// 2 (Match.EmptyBelow), the factorial of a negative count in the code's
// own reading, which the helper's fix inside the domain shares (it
// reads the count as k, not as uint64(k)). nil where that does not
// apply.
func (b *builder) wrappedEmptyDivisor(d domain, exprs []ast.Expr, conds []string) (map[ast.Expr]string, string) {
	if b.m.Shape != ShapePoisson && b.m.Shape != ShapePowOverFactorial || !b.m.EmptyBelow ||
		len(b.m.Factorials) != 1 || len(d.bounds) != 1 || len(conds) != 1 {
		return nil, ""
	}
	i, ok := d.bounds[0].atLeastZero()
	f := b.m.Factorials[0]
	if !ok || i >= len(exprs) || f.Off != 0 || f.Call == nil || len(f.Call.Args) != 1 {
		return nil, ""
	}
	conv, ok := ast.Unparen(f.Call.Args[0]).(*ast.CallExpr)
	if !ok || !b.isNumericConversion(conv) || classOf(b.pass.TypesInfo.TypeOf(conv)) != classUnsigned ||
		classOf(b.pass.TypesInfo.TypeOf(conv.Args[0])) != classSigned {
		return nil, ""
	}
	count := exprs[i]
	if types.ExprString(ast.Unparen(conv.Args[0])) != types.ExprString(ast.Unparen(count)) {
		return nil, ""
	}
	return map[ast.Expr]string{f.Call: "1"}, fmt.Sprintf("// %s! of a negative %s is the empty product 1, which %s returns below 2; %s would wrap",
		operandText(b.text(count), count), b.text(count), b.text(f.Call.Fun), b.text(conv))
}

// keepAsWritten returns text, the helper call that replaces node, so
// that node runs as written where the helper's value would differ from
// it, with a directive giving why (the kept expression is what the code
// computed before on those inputs). With inside, the helper runs where
// every condition holds:
//
//	func() float64 {
//		if conds {
//			return text
//		}
//		//overfact:allow why
//		return node
//	}()
//
// otherwise the expression as written runs where any condition holds,
// before the return statement that returns the match's node, or in a
// function literal:
//
//	func() float64 {
//		if conds {
//			//overfact:allow why
//			return node
//		}
//		return text
//	}()
func (b *builder) keepAsWritten(text string, node ast.Node, conds []string, inside bool, why string) (string, error) {
	orig, err := b.asWritten(node)
	if err != nil {
		return "", err
	}
	return b.keepAs(text, node, orig, conds, inside, "//overfact:allow "+why)
}

// productShapes are the shapes whose expression kept as written is a
// product the helper's Product chain forms with the same float64
// operations wherever they stay in range: a count times powers, which
// is 0 where the count is (k > n) however far the powers leave float64
// (p outside [0, 1]), and products of Gamma values and powers outside
// the helper's domain, Γ(a)Γ(b)/Γ(a+b) for a negative b, whose Gamma
// values leave float64 where the product does not (Γ(200)·Γ(−50.5) over
// Γ(149.5)).
var productShapes = map[Shape]bool{
	ShapeBinomialPMF: true, ShapeNegBinomialPMF: true,
	ShapeBeta: true, ShapeInverseBeta: true, ShapeGammaRatio: true, ShapePowOverGamma: true,
}

// asWritten returns node's source for the branch that runs it as
// written, in two respects not as written where the code's own float
// arithmetic would lose a value the expression has:
//
//   - a float ratio of factorial functions that return ⌊x⌋!
//     (Match.Floor) is their exact quotient in log space (emptyQuotient);
//   - each float conversion of an integer binomial function's call in it
//     (Match.IntBinomials) is taken from the float helper of the
//     function's form (binomialFormHelpers): float64(ways(n, k)) becomes lgamma.ChooseLoop(n, k),
//     the value the call had before its function's own fix, which panics
//     where C(n, k) leaves the integer type;
//   - a binomial probability's float64 product, or one of Gamma values
//     (productShapes), is formed as the helper's Product chain (buildProductChain), which is
//     the same float64 operations wherever they stay in range, and the
//     product's value where a factor leaves float64 and the product does
//     not: C(2, 150)·150.5^150·(−149.5)^−148 is 0, not 0·Inf = NaN.
func (b *builder) asWritten(node ast.Node) (string, error) {
	return b.asWrittenWith(node, nil)
}

// asWrittenWith is asWritten with the expressions of subs (of a float
// node) written as their texts there.
func (b *builder) asWrittenWith(node ast.Node, subs map[ast.Expr]string) (string, error) {
	e, ok := node.(ast.Expr)
	if !ok || classOf(b.m.Result) != classFloat {
		return b.copyText(node), nil
	}
	if subs == nil {
		subs = make(map[ast.Expr]string)
	}
	counts := make(map[ast.Expr]bool)
	if node == b.m.Node && b.m.Floor {
		shown, counts := b.shown, b.counts
		q, err := b.emptyQuotient()
		b.shown, b.counts = shown, counts
		if err != nil || q != "" {
			return q, err
		}
	}
	var err error
	ast.Inspect(e, func(n ast.Node) bool {
		conv, ok := n.(*ast.CallExpr)
		if !ok || err != nil || len(b.m.IntBinomials) == 0 {
			return err == nil && len(b.m.IntBinomials) > 0
		}
		to := b.pass.TypesInfo.TypeOf(conv)
		if !b.isNumericConversion(conv) || classOf(to) != classFloat {
			return true
		}
		call, _ := ast.Unparen(conv.Args[0]).(*ast.CallExpr)
		bin, ok := b.m.IntBinomials[call]
		if !ok {
			return true
		}
		name := binomialFormHelpers[bin.Form]
		shown := b.shown
		subs[conv], err = b.call(name, []ast.Expr{bin.N, bin.K}, to)
		counts[conv] = true
		b.shown = shown
		return false
	})
	if err != nil {
		return "", err
	}
	if len(subs) == 0 && !productShapes[b.m.Shape] {
		return b.copyText(node), nil
	}
	// Without calls, no part of the expression is a chain: spliced writes
	// it with subs alone.
	lp := &logProducts{b: b, set: map[types.Object]bool{}, pkg: b.helper(e.Pos()), subs: subs}
	if chain := (&logProducts{b: b, set: lp.set, pkg: lp.pkg, calls: true, subs: subs, counts: counts}); productShapes[b.m.Shape] &&
		types.Identical(b.pass.TypesInfo.TypeOf(e), types.Typ[types.Float64]) && chain.chainable(e) && chain.leaves(e) >= 1 && !b.commentIn(e) {
		return chain.chain(e) + ".Float64()", nil
	}
	return lp.spliced(e), nil
}

// keepAs is keepAsWritten with orig, what runs in node's place where the
// helper's value would differ (node as written, or an exact equivalent
// that avoids calls a guard may make panic), and lead, the lines that
// branch runs before it returns orig: definitions it reads, then the
// comment that says why. keepAs indents them.
func (b *builder) keepAs(text string, node ast.Node, orig string, conds []string, inside bool, lead ...string) (string, error) {
	b.keptAsWritten = true
	if !inside && node == b.m.Node {
		if ret := b.returning(); ret != nil {
			ind := b.indentOf(ret.Pos())
			b.replace(ret.Pos(), ret.Pos(), fmt.Sprintf("if %[2]s {\n%[1]s\t%[3]s\n%[1]s\treturn %[4]s\n%[1]s}\n%[1]s",
				ind, strings.Join(conds, " || "), strings.Join(lead, "\n"+ind+"\t"), orig))
			return text, nil
		}
	}
	name, err := b.typeName(b.m.Result)
	if err != nil {
		return "", err
	}
	ind := b.indentOf(node.Pos())
	if inside {
		return fmt.Sprintf("func() %[1]s {\n%[2]s\tif %[3]s {\n%[2]s\t\treturn %[4]s\n%[2]s\t}\n%[2]s\t%[6]s\n%[2]s\treturn %[5]s\n%[2]s}()",
			name, ind, strings.Join(conds, " && "), text, orig, strings.Join(lead, "\n"+ind+"\t")), nil
	}
	return fmt.Sprintf("func() %[1]s {\n%[2]s\tif %[3]s {\n%[2]s\t\t%[4]s\n%[2]s\t\treturn %[5]s\n%[2]s\t}\n%[2]s\treturn %[6]s\n%[2]s}()",
		name, ind, strings.Join(conds, " || "), strings.Join(lead, "\n"+ind+"\t\t"), orig, text), nil
}

// emptyQuotient returns, for an integer ratio whose factorial functions
// return 1 below zero (Match.EmptyBelow), the call of the exact
// quotient on the arguments of the expression's factorial calls: what
// the expression computes outside the helper's domain, without calling
// those functions, which a range guard may make panic for a large
// argument (fact(25) in fact(−3)/(fact(25)·fact(−28)), whose value 0
// fits). For a float ratio whose functions return ⌊x⌋! (Match.Floor)
// it is the quotient in log space, lgamma.FloorFactorialQuotient, which
// the factorials' overflow does not turn into NaN (rotas(171)/
// (rotas(700)·rotas(−529)) is 171!/700!, below float64: 0, not
// +Inf/+Inf). "" where it does not apply.
func (b *builder) emptyQuotient() (string, error) {
	switch b.m.Shape {
	case ShapeBinomial, ShapePermutation, ShapeMultinomial, ShapeCatalan:
	default:
		return "", nil
	}
	name := "MustFactorialQuotientInt64"
	switch {
	case classOf(b.m.Result) == classFloat && b.m.Floor:
		name = "FloorFactorialQuotient"
	case !b.m.EmptyBelow || classOf(b.m.Result) != classSigned:
		return "", nil
	}
	var num, den []ast.Expr
	if !b.nodeFactors(&num, &den) || len(num) != 1 {
		return "", nil
	}
	var args []ast.Expr
	for _, f := range append(num, den...) {
		c, _ := b.callOf(f)
		if c == nil || len(c.Args) != 1 {
			return "", nil
		}
		args = append(args, c.Args[0])
	}
	shown := b.shown
	defer func() { b.shown = shown }()
	return b.call(name, args, b.m.Result)
}

// returning returns the return statement whose only result is the
// match's node, if it is one that starts its line.
func (b *builder) returning() *ast.ReturnStmt {
	path, _ := astpath.Enclosing(b.file, b.m.Node.Pos(), b.m.Node.End())
	for i, n := range path {
		if n == b.m.Node {
			if i+1 < len(path) {
				if ret, ok := path[i+1].(*ast.ReturnStmt); ok && len(ret.Results) == 1 && ret.Results[0] == b.m.Node &&
					b.offset(ret.Pos()) == b.offset(b.tok.LineStart(b.line(ret.Pos())))+len(b.indentOf(ret.Pos())) {
					return ret
				}
			}
			break
		}
	}
	return nil
}

// operandText is an operand's source, parenthesised unless it is an
// operand in Go's grammar already.
func operandText(text string, e ast.Expr) string {
	switch ast.Unparen(e).(type) {
	case *ast.Ident, *ast.BasicLit, *ast.SelectorExpr, *ast.CallExpr, *ast.IndexExpr:
		return text
	}
	if _, ok := e.(*ast.ParenExpr); ok {
		return text
	}
	return "(" + text + ")"
}

// absorbedBeforeReturn returns the definitions the rewrite deletes, in
// source order, when the as-written branch can hold them: none, or the
// statements just before the return statement that returns the node,
// defining no variable an operand reads (the test runs before them).
func (b *builder) absorbedBeforeReturn(args []ast.Expr) ([]ast.Stmt, bool) {
	if len(b.absorbed) == 0 {
		return nil, true
	}
	ret := b.returning()
	if ret == nil {
		return nil, false
	}
	list, at, err := b.enclosingList(ret)
	if err != nil || at < len(b.absorbed) {
		return nil, false
	}
	defs := list[at-len(b.absorbed) : at]
	mine := make(map[ast.Stmt]bool)
	for _, d := range b.absorbed {
		mine[d] = true
	}
	defined := make(map[types.Object]bool)
	for _, d := range defs {
		if !mine[d] {
			return nil, false
		}
		defined[b.definedVar(d)] = true
	}
	for _, a := range args {
		for _, v := range b.vars(a) {
			if defined[v] {
				return nil, false
			}
		}
	}
	return defs, true
}
