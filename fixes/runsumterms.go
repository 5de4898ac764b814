package fixes

import (
	"errors"
	"go/ast"
	"go/types"
)

// A series summed from terms the code writes out on each trip, with no
// running term, and read after the loop beside another such term,
//
//	num := math.Pow(a, float64(c)) / fact(c)
//	den := 0.0
//	for k := 0; k <= c; k++ {
//		den += math.Pow(a, float64(k)) / fact(k)
//	}
//	return num / den                           // Erlang B
//
// is wrong where a power or a factorial passes float64 while the ratio
// does not (a^c is +Inf past a ≈ 113 at c = 150, where a^c/c! fits).
// The terms are carried as Products of their powers and factorials,
// the sum as a Sum, and the locals the read multiplies beside the sum
// (num) as Products, the read a Product chain (fixes/runsum.go):
//
//	num := lgamma.PowProduct(a, float64(c)).Quo(lgamma.FactorialProduct(fact(c), float64(c)))
//	…	denLog = denLog.Add(lgamma.PowProduct(a, float64(k)).Quo(lgamma.FactorialProduct(fact(k), float64(k))))
//	return num.Quo(denLog.Product()).Float64()
//
// Every float64 operation is the same in the Products, so nothing the
// code got right changes.

// explicitTerms prepares lp for a sum whose match names no running
// term: the terms are products of the leaves themselves, and the
// float64 locals the read of the sum reads, each a product of
// powers, Gamma values, exponentials and factorial calls, are carried
// too and returned. An error where the read reads a local that is no
// such product.
func (ls *logSum) explicitTerms(body *ast.BlockStmt, read ast.Expr) (map[types.Object]bool, error) {
	b, lp := ls.b, ls.lp
	parts := make(map[types.Object]bool)
	var err error
	ast.Inspect(read, func(n ast.Node) bool {
		id, ok := n.(*ast.Ident)
		if !ok || err != nil {
			return err == nil
		}
		v, ok := b.pass.TypesInfo.Uses[id].(*types.Var)
		if !ok || v == ls.sum || v.Pos() < body.Pos() || v.Pos() >= body.End() || parts[v] {
			return true
		}
		if e := lp.qualifies(v, body); e != nil {
			err = e
			return false
		}
		lp.set[v] = true
		parts[v] = true
		return true
	})
	if err != nil {
		return nil, err
	}
	if len(ls.terms) == 0 {
		return nil, errors.New("the sum adds no term")
	}
	return parts, nil
}
