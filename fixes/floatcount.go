package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"strings"
)

// Float counts. Code that keeps counts in float64 (spreadsheet formulas,
// a factorial loop over a float counter) passes them to the shapes'
// helpers, whose counts are ints. The value is the shape's only where
// every such operand holds an integer and the operands lie in the
// shape's domain (0 ≤ k ≤ n for C(n, k)); elsewhere the original's own
// arithmetic defines it (a float factorial loop computes ⌊x⌋! for a
// fraction x, and n!/k! for k > n), and no helper computes that. So the
// rewritten expression calls the helper where the counts are integers in
// the domain, and keeps the original expression for the other inputs:
//
//	func() float64 {
//		if float64(int(n)) == n && float64(int(k)) == k && 0 <= int(k) && int(k) <= int(n) {
//			return lgamma.Choose(int(n), int(k))
//		}
//		//overfact:allow counts that are not integers in the shape's domain keep the original arithmetic
//		return fact(n) / (fact(k) * fact(n-k))
//	}()
//
// float64(int(x)) == x holds exactly for a float x that is an integer
// an int represents (NaN, ±Inf and fractions fail it; common practice).
// The directive keeps the fix idempotent: the kept expression is right
// wherever the helper branch does not run, or wrong there as before.

// floatCounts collects the float operands of one helper call.
type floatCounts struct {
	floats []countOperand
}

type countOperand struct {
	text    string // the operand's source
	conv    string // the operand converted to the helper's integer parameter
	primary bool   // the operand needs no parentheses (a name, field, call)
}

// countDomains gives, for each helper with count parameters, the
// conditions on its converted arguments under which the helper computes
// what the textbook formula of its shape computes (common practice:
// C(n,k) = n!/(k!(n−k)!) for 0 ≤ k ≤ n, n!/(n−k)! for 0 ≤ k ≤ n,
// x^k/k!, λ^k e^−λ/k! and the multinomial's parts for counts ≥ 0, the
// binomial pmf for 0 ≤ k ≤ n, the negative binomial pmf
// C(f+s−1, f) p^s (1−p)^f for f ≥ 0 and s ≥ 1, the hypergeometric pmf
// for 0 ≤ k ≤ K, 0 ≤ n−k ≤ N−K; probabilities in [0, 1], rates ≥ 0).
var countDomains = map[string]func(a []string) []string{
	"Choose":           func(a []string) []string { return []string{"0 <= " + a[1], a[1] + " <= " + a[0]} },
	"Falling":          func(a []string) []string { return []string{"0 <= " + a[1], a[1] + " <= " + a[0]} },
	"PowOverFactorial": func(a []string) []string { return []string{"0 <= " + a[1]} },
	"PoissonPMF":       func(a []string) []string { return []string{"0 <= " + a[0], "0 <= " + a[1]} },
	"PoissonTerm":      func(a []string) []string { return []string{"0 <= " + a[0]} },
	"Factorial":        func(a []string) []string { return []string{"0 <= " + a[0]} },
	"Catalan":          func(a []string) []string { return []string{"0 <= " + a[0]} },
	"BinomialPMF": func(a []string) []string {
		return []string{"0 <= " + a[0], a[0] + " <= " + a[1], "0 <= " + a[2], a[2] + " <= 1"}
	},
	"NegativeBinomialPMF": func(a []string) []string {
		return []string{"0 <= " + a[0], "1 <= " + a[1], "0 <= " + a[2], a[2] + " <= 1"}
	},
	"HypergeometricPMF": func(a []string) []string { // k, N, K, n
		k, total, succ, n := a[0], a[1], a[2], a[3]
		return []string{"0 <= " + k, k + " <= " + succ, k + " <= " + n, n + "-" + k + " <= " + total + "-" + succ}
	},
	"Multinomial": func(a []string) []string {
		var out []string
		for _, x := range a {
			out = append(out, "0 <= "+x)
		}
		return out
	},
}

// countCall wraps text, the call of the float helper name on the
// converted operands args, so that it runs only where the float counts
// hold integers in the helper's domain, keeping the original expression
// node elsewhere (see above). It refuses when the rewrite deletes
// locals the kept expression reads.
func (b *builder) countCall(name, text string, args []string, node ast.Node) (string, error) {
	domain, ok := countDomains[name]
	if !ok {
		return "", fmt.Errorf("%s takes no counts", name)
	}
	if len(b.absorbed) > 0 {
		return "", errors.New("float counts: the kept expression reads locals the rewrite deletes")
	}
	var conds []string
	seen := map[string]bool{}
	for _, c := range b.counts.floats {
		if seen[c.text] {
			continue
		}
		seen[c.text] = true
		x := c.text
		if !c.primary {
			x = "(" + x + ")"
		}
		conds = append(conds, fmt.Sprintf("float64(%s) == %s", c.conv, x))
	}
	conds = append(conds, domain(args)...)
	return b.guarded(conds, text, node, "counts that are not integers in the shape's domain keep the original arithmetic")
}

// guarded returns a function literal that returns text, the helper's
// call, where every condition holds, and the original expression node
// elsewhere, with a directive giving why (the kept expression is what
// the code computed before on those inputs):
//
//	func() float64 {
//		if conds {
//			return text
//		}
//		//overfact:allow why
//		return node
//	}()
func (b *builder) guarded(conds []string, text string, node ast.Node, why string) (string, error) {
	result, err := b.typeName(b.m.Result)
	if err != nil {
		return "", err
	}
	indent := b.indentOf(node.Pos())
	return fmt.Sprintf("func() %[1]s {\n%[2]s\tif %[3]s {\n%[2]s\t\treturn %[4]s\n%[2]s\t}\n%[2]s\t//overfact:allow %[6]s\n%[2]s\treturn %[5]s\n%[2]s}()",
		result, indent, strings.Join(conds, " && "), text, b.copyText(node), why), nil
}
