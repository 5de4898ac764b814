package analyzer

import (
	"go/ast"
	"go/token"
)

// exactPart returns the largest sub-expression of root that holds every
// known factor of p and nothing else, with its product, or nil when the
// syntax does not group the factors apart from the unknown operands.
// 2*(n!/(k!(n-k)!)) holds the binomial n!/(k!(n-k)!); (2*n!)/(k!(n-k)!)
// holds none, as the 2 is a factor of the numerator. The search follows
// locals given one value, as evalProduct does; the queue is bounded by
// the size of the expression and those definitions, which evalProduct
// has already walked.
func (fc *fnCtx) exactPart(root ast.Expr, p *product) (ast.Expr, *product) {
	if p.other == 0 {
		return nil, nil
	}
	want := make(map[*ast.CallExpr]bool)
	for _, list := range [][]factor{p.num, p.den} {
		for _, f := range list {
			if f.call == nil {
				return nil, nil // a power loop's accumulator has no call to find
			}
			want[f.call] = true
		}
	}
	if len(want) == 0 {
		return nil, nil // nothing to judge, so nothing to look for
	}
	queue := []ast.Expr{root}
	for steps := 0; len(queue) > 0 && steps < 4*maxDepth*maxDepth; steps++ {
		e := queue[0]
		queue = queue[1:]
		if id, ok := fc.stripConv(e).(*ast.Ident); ok {
			// A local given one value: the factors may be grouped in its
			// definition (top := x^c/c! * c/(c−a); return top/(sum+top)).
			if def := fc.singleDef(id); def != nil {
				queue = append(queue, def)
			}
			continue
		}
		b, ok := fc.stripConv(e).(*ast.BinaryExpr)
		if !ok || b.Op != token.MUL && b.Op != token.QUO {
			continue
		}
		if e != root {
			if sub := fc.evalProduct(b); sub.other == 0 && sameCalls(sub, want) {
				return b, sub
			}
		}
		queue = append(queue, b.X, b.Y)
	}
	return nil, nil
}

// sameCalls reports whether p's factors are exactly the calls in want.
func sameCalls(p *product, want map[*ast.CallExpr]bool) bool {
	n := 0
	for _, list := range [][]factor{p.num, p.den} {
		for _, f := range list {
			if !want[f.call] {
				return false
			}
			n++
		}
	}
	return n == len(want)
}
