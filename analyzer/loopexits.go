package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"math"
)

// Early exits of product loops: a return, goto or break that ends a
// loop, or skips its update, before its product reaches the first bad
// value; and reportLoop, which reports a loop finding with them in mind.

// leavesEarly reports whether a product loop can end before its test
// stops it, or skip its update on a trip: then its accumulator need not
// hold the product its shape promises. It counts
//
//   - a return, or a goto to a label outside the loop;
//   - a break of the loop or of a statement around it: unlabelled and not
//     inside a nested for, range, switch or select, or naming a label
//     outside the loop (the loop's own included);
//   - a continue of a loop around it (a labelled continue from a nested
//     loop), and a continue of this loop that comes before the update.
//
// Calls that never return (panic, os.Exit) are not counted: a product
// that ends in one returns nothing. Closures are not looked into.
func (fc *fnCtx) leavesEarly(al *accLoop) []ast.Stmt {
	info := fc.c.pass.TypesInfo
	loop, body := al.shape.stmt, al.shape.body
	inner := make(map[types.Object]bool) // labels declared in the body
	ast.Inspect(body, func(n ast.Node) bool {
		if l, ok := n.(*ast.LabeledStmt); ok {
			inner[info.Defs[l.Label]] = true
		}
		_, lit := n.(*ast.FuncLit)
		return !lit
	})
	var exits []ast.Stmt
	// breakable and loops count the nested statements an unlabelled
	// break or continue would target instead of the loop.
	var walk func(n ast.Node, breakable, loops int)
	walk = func(n ast.Node, breakable, loops int) {
		ast.Inspect(n, func(m ast.Node) bool {
			if m == nil {
				return false
			}
			if m == n {
				return true
			}
			switch m := m.(type) {
			case *ast.FuncLit:
				return false
			case *ast.ReturnStmt:
				exits = append(exits, m)
			case *ast.ForStmt, *ast.RangeStmt:
				walk(m, breakable+1, loops+1)
				return false
			case *ast.SwitchStmt, *ast.TypeSwitchStmt, *ast.SelectStmt:
				walk(m, breakable+1, loops)
				return false
			case *ast.BranchStmt:
				if fc.branchLeaves(m, loop, al.update, inner, breakable, loops) {
					exits = append(exits, m)
				}
			}
			return true
		})
	}
	walk(body, 0, 0)
	return exits
}

// exitsPast reports whether every early exit of a loop counting up to a
// factorial's largest factor comes after the factor first has been
// multiplied in: the product has wrapped by then, as it would without
// the exit, so the loop is still the factorial where it matters (a
// "break" once i > 1000 changes nothing about 21!).
func (fc *fnCtx) exitsPast(al *accLoop, first int64) bool {
	sh := al.shape
	if sh.step <= 0 || sh.whileLike {
		return false
	}
	lin, ok := fc.linear(fc.stripConv(al.mult))
	if !ok || len(lin.Terms) != 1 || lin.Terms[0].Sym.Object != sh.iv || lin.Terms[0].K != 1 {
		return false
	}
	for _, x := range al.exits {
		// Before the update of this trip, the factors multiplied in
		// run up to iv - step; the exit must see that past first.
		lo := fc.entryRange(sh.iv, x).Lo
		if lo == math.MinInt64 || lo-sh.step+lin.C < first {
			return false
		}
	}
	return true
}

// branchLeaves judges one branch statement inside a product loop for
// leavesEarly; breakable and loops count the statements nested between
// it and the loop that an unlabelled break or continue would target.
func (fc *fnCtx) branchLeaves(b *ast.BranchStmt, loop, update ast.Stmt, inner map[types.Object]bool, breakable, loops int) bool {
	var target types.Object
	if b.Label != nil {
		target = fc.c.pass.TypesInfo.Uses[b.Label]
		if inner[target] {
			return false // stays inside the loop
		}
	}
	switch b.Tok {
	case token.GOTO:
		return true
	case token.BREAK:
		return target != nil || breakable == 0
	case token.CONTINUE:
		own := target == nil && loops == 0 || target != nil && fc.labelledStmt(target) == loop
		if !own {
			return target != nil // a continue of an outer loop
		}
		return b.Pos() < update.Pos()
	}
	return false // fallthrough
}

// labelledStmt returns the statement the label lbl is declared on.
func (fc *fnCtx) labelledStmt(lbl types.Object) ast.Stmt {
	var found ast.Stmt
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if l, ok := n.(*ast.LabeledStmt); ok && fc.c.pass.TypesInfo.Defs[l.Label] == lbl {
			found = l.Stmt
		}
		return found == nil
	})
	return found
}

// reportLoop reports a finding on a product loop. A loop that can leave
// early is never certain to reach its bound, and no fix that takes it to
// compute its whole product (a range guard on its bound, a helper call)
// is offered: Cap(25) with "if r > 1000 { break }" returns 5040, and a
// guard would make it panic. A loop that leaves early and also reads its
// product outside the update watches that product (if r > limit
// { break }) and is not reported.
func (fc *fnCtx) reportLoop(al *accLoop, f finding) {
	if !al.early {
		fc.report(f)
		return
	}
	if fc.readsAcc(al) {
		return
	}
	if f.definite {
		f.msg += "; the loop can also leave before it gets there"
	}
	f.definite, f.match = false, nil
	fc.report(f)
}

// readsAcc reports whether the loop body uses the accumulator outside its
// update statements and the results of return statements: a test on the
// product, as in "if r > limit { break }".
func (fc *fnCtx) readsAcc(al *accLoop) bool {
	info := fc.c.pass.TypesInfo
	found := false
	ast.Inspect(al.shape.body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.ReturnStmt, *ast.FuncLit:
			return false
		case *ast.AssignStmt:
			if n == al.update || al.div != nil && fc.isDivOf(n, al) {
				return false
			}
		case *ast.Ident:
			found = found || info.Uses[n] == al.acc
		}
		return !found
	})
	return found
}
