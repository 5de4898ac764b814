package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The pascal-rule category: a binomial coefficient built by Pascal's
// rule, C(n, k) = C(n−1, k−1) + C(n−1, k) (common practice; DLMF
// 26.3.5), in an integer type, written as a recursion
//
//	func ways(n, k int) int64 {
//		if k == 0 || k == n {
//			return 1
//		}
//		return ways(n-1, k-1) + ways(n-1, k)
//	}
//
// or as a table filled row by row,
//
//	c[i][j] = c[i-1][j-1] + c[i-1][j]
//
// Every entry is the sum of two smaller ones, so no intermediate leaves
// the type before the coefficient does; but the coefficient itself
// wraps silently where it leaves the type, from C(n, ⌊n/2⌋) on
// (thresholds.CentralBinomial: n = 67 for int64), into a value that
// later sums carry on. A sum reduced modulo something, or an entry
// changed again in the same trip (a saturation, a reduction), is left
// alone. Floats are left alone too: their sums reach +Inf only where
// the coefficient is past float64, which is IEEE's answer.
//
// No integer type holds the coefficients past the threshold, so there is
// no rewrite. A recursion whose edges are ones gets a guard before the
// statement that sums (fixes.ShapePascalGuard), which panics exactly
// where C(n, k) leaves the type; a table gets none, since a guard on its
// size would refuse the rows that fit.

// checkPascalRecursion reports a recursion that returns (or stores) the
// sum of its own values at (n−1, k−1) and (n−1, k), one of them weighed
// for Stirling numbers (stirlingnumbers.go), or the derangement
// recurrence (n−1)·(f(n−1) + f(n−2)) (derangement.go).
func (fc *fnCtx) checkPascalRecursion(decl *ast.FuncDecl) {
	self, _ := fc.c.pass.TypesInfo.Defs[decl.Name].(*types.Func)
	if self == nil || decl.Body == nil {
		return
	}
	done := false
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if done {
			return false
		}
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BinaryExpr:
			if n.Op == token.REM {
				return false // reduced modulo m: its values stay small
			}
			if n.Op == token.ADD {
				done = fc.judgePascalRecursion(decl, self, n) || fc.judgeTriangleRecursion(decl, self, n)
				return !done
			}
			if n.Op == token.SUB {
				done = fc.judgeTriangleRecursion(decl, self, n)
				return !done
			}
			if n.Op == token.MUL {
				done = fc.judgeDerangementRecursion(decl, self, n)
				return !done
			}
		}
		return true
	})
}

// judgePascalRecursion judges sum = f(…n−1…k−1…) + f(…n−1…k…), either
// order, every other argument passed through.
func (fc *fnCtx) judgePascalRecursion(decl *ast.FuncDecl, self *types.Func, sum *ast.BinaryExpr) bool {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(sum))
	if !ok || t.Float {
		return false
	}
	a, okA := fc.stripConv(sum.X).(*ast.CallExpr)
	b, okB := fc.stripConv(sum.Y).(*ast.CallExpr)
	if !okA || !okB || fc.c.calleeOf(a) != self || fc.c.calleeOf(b) != self || len(a.Args) != len(b.Args) {
		return false
	}
	// ni, ki: Pascal's rule, shifts (−1, −1) and (−1, 0) in either call;
	// ri, ci: lattice paths, shifts (−1, 0) and (0, −1), one per call.
	ni, ki, ri, ci := -1, -1, -1, -1
	for i := range a.Args {
		da, okA := fc.paramShift(decl, a.Args[i], i)
		db, okB := fc.paramShift(decl, b.Args[i], i)
		switch {
		case !okA || !okB:
			return false
		case da == -1 && db == -1:
			if ni >= 0 {
				return false
			}
			ni = i
		case da == -1 && db == 0 && ri < 0:
			ri = i
		case da == 0 && db == -1 && ci < 0:
			ci = i
		case da != 0 || db != 0:
			return false
		}
	}
	switch {
	case ni >= 0 && ri >= 0 && ci < 0:
		ki = ri
	case ni >= 0 && ci >= 0 && ri < 0:
		ki = ci
	case ni < 0 && ri >= 0 && ci >= 0:
		return fc.judgeLatticeRecursion(decl, self, sum, t, ri, ci)
	}
	if ni < 0 || ki < 0 {
		return false
	}
	params := self.Type().(*types.Signature).Params()
	nObj, kObj := params.At(ni), params.At(ki)
	if nObj.Name() == "" || kObj.Name() == "" || nObj.Name() == "_" || kObj.Name() == "_" {
		return false
	}
	n, k := fc.entryRange(nObj, sum), fc.entryRange(kObj, sum)
	if pascalFits(t, n, k) || fc.pascalGuarded(decl, nObj, kObj) || fc.c.callsFit(self, decl, ni, ki, func(n, k ranges.Interval) bool { return pascalFits(t, n, k) }) {
		return false
	}
	first := thresholds.CentralBinomial(t.Num)
	clause, definite := verdict(nObj.Name(), n, first.FirstBad)
	msg := fmt.Sprintf("recursion computes C(%s, %s) by Pascal's rule (%s) in %s: the sum %s where C(%s, %s) leaves %s, from %s = %d at %s = ⌊%s/2⌋ (C(%d, %d) ≈ %s is the largest central one that fits), and every call above it adds the wrapped value on",
		nObj.Name(), kObj.Name(), src(sum), t.typeName(), verb(t), nObj.Name(), kObj.Name(), t.Name,
		nObj.Name(), first.FirstBad, kObj.Name(), nObj.Name(), first.FirstBad-1, (first.FirstBad-1)/2, first.LastGoodApprox())
	fc.report(finding{node: sum, cat: catPascal, definite: definite && pascalAlwaysPast(t, n, k), msg: msg + clause, match: fc.pascalGuard(decl, sum, ni, ki)})
	return true
}

// pascalGuard describes, for the fixer, the guard before the statement
// that sums (fixes/pascalguard.go): it panics where C(n, k) leaves the
// type, which is exactly where the recursion's value is wrong when its
// edges are ones, every constant it returns 0 or 1 and some 1. nil
// otherwise: with other edges the entries are other multiples.
func (fc *fnCtx) pascalGuard(decl *ast.FuncDecl, sum *ast.BinaryExpr, ni, ki int) *fixes.Match {
	ones, ok := false, true
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			for _, r := range n.Results {
				if v, isConst := fc.intConst(r); isConst {
					ones = ones || v == 1
					ok = ok && (v == 0 || v == 1)
				}
			}
		}
		return ok
	})
	var st ast.Stmt
	for up := fc.parentMap()[sum]; up != nil && st == nil; up = fc.parentMap()[up] {
		st, _ = up.(ast.Stmt)
	}
	names := paramIdents(decl)
	if !ok || !ones || st == nil || max(ni, ki) >= len(names) || names[ni] == nil || names[ki] == nil {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapePascalGuard, Node: st, Args: []ast.Expr{names[ni], names[ki]},
		Result: fc.c.pass.TypesInfo.TypeOf(sum), Func: decl}
}

// paramIdents returns the identifiers that declare decl's parameters,
// in order, nil for an unnamed one.
func paramIdents(decl *ast.FuncDecl) []*ast.Ident {
	var out []*ast.Ident
	for _, f := range decl.Type.Params.List {
		if len(f.Names) == 0 {
			out = append(out, nil)
		}
		out = append(out, f.Names...)
	}
	return out
}

// pascalGuarded reports whether the function checks with the helper
// module whether C(n, k) fits before it sums, and panics where it does
// not: an if statement that calls lgamma.ChooseInt64 or ChooseUint64
// of n and k and whose body panics or returns (the guard of
// ShapePascalGuard).
func (fc *fnCtx) pascalGuarded(decl *ast.FuncDecl, n, k types.Object) bool {
	return fc.chooseGuarded(decl, func(nArg, kArg ast.Expr) bool {
		return fc.c.objOf(fc.stripConv(nArg)) == n && fc.c.objOf(fc.stripConv(kArg)) == k
	})
}

// chooseGuarded reports whether decl holds an if statement that leaves
// the function (panics or returns) and calls lgamma.ChooseInt64 or
// ChooseUint64 with arguments args accepts.
func (fc *fnCtx) chooseGuarded(decl *ast.FuncDecl, args func(n, k ast.Expr) bool) bool {
	found := false
	ast.Inspect(decl.Body, func(x ast.Node) bool {
		ifs, ok := x.(*ast.IfStmt)
		if !ok || found {
			return !found
		}
		if !fc.exits(ifs.Body) {
			return true
		}
		ast.Inspect(ifs, func(y ast.Node) bool {
			call, ok := y.(*ast.CallExpr)
			if !ok || len(call.Args) != 2 || found {
				return !found
			}
			fn := fc.c.calleeOf(call)
			if fn == nil || fn.Pkg() == nil || fn.Pkg().Path() != fixes.HelperPath || fn.Name() != "ChooseInt64" && fn.Name() != "ChooseUint64" {
				return true
			}
			found = args(call.Args[0], call.Args[1])
			return !found
		})
		return !found
	})
	return found
}

// judgeLatticeRecursion judges sum = f(…r−1…c…) + f(…r…c−1…), the count
// of lattice paths C(r + c, r) when the edges are ones (common practice:
// a path's last step comes from the left or from below), which wraps
// where that count leaves t, from r + c = thresholds.CentralBinomial at
// r = c. It reports whether the sum was judged.
func (fc *fnCtx) judgeLatticeRecursion(decl *ast.FuncDecl, self *types.Func, sum *ast.BinaryExpr, t numType, ri, ci int) bool {
	params := self.Type().(*types.Signature).Params()
	rObj, cObj := params.At(ri), params.At(ci)
	if rObj.Name() == "" || cObj.Name() == "" || rObj.Name() == "_" || cObj.Name() == "_" {
		return false
	}
	fits := func(r, c ranges.Interval) bool {
		if r.IsEmpty() || c.IsEmpty() || r.Hi == math.MaxInt64 || c.Hi == math.MaxInt64 {
			return false
		}
		r.Hi, c.Hi = max(r.Hi, 0), max(c.Hi, 0)
		return pascalFits(t, ranges.Interval{Lo: 0, Hi: r.Hi + c.Hi}, ranges.Interval{Lo: 0, Hi: min(r.Hi, c.Hi)})
	}
	r, c := fc.entryRange(rObj, sum), fc.entryRange(cObj, sum)
	guarded := fc.chooseGuarded(decl, func(n, k ast.Expr) bool {
		add, ok := ast.Unparen(n).(*ast.BinaryExpr)
		return ok && add.Op == token.ADD && fc.c.objOf(fc.stripConv(k)) == rObj &&
			fc.c.objOf(fc.stripConv(add.X)) == rObj && fc.c.objOf(fc.stripConv(add.Y)) == cObj
	})
	if fits(r, c) || guarded || fc.c.callsFit(self, decl, ri, ci, fits) {
		return true
	}
	first := thresholds.CentralBinomial(t.Num)
	total := rObj.Name() + " + " + cObj.Name()
	var both ranges.Interval
	if !r.IsEmpty() && !c.IsEmpty() {
		both = r.Add(c)
	}
	clause, _ := verdict(total, both, first.FirstBad)
	msg := fmt.Sprintf("recursion counts lattice paths, C(%s, %s), by the rule %s in %s: the sum %s where C(%s, %s) leaves %s, from %s = %d at %s = %s (C(%d, %d) ≈ %s is the largest central one that fits), and every call above it adds the wrapped value on",
		total, rObj.Name(), src(sum), t.typeName(), verb(t), total, rObj.Name(), t.Name,
		total, first.FirstBad, rObj.Name(), cObj.Name(), first.FirstBad-1, (first.FirstBad-1)/2, first.LastGoodApprox())
	m := fc.pascalGuard(decl, sum, ri, ci)
	if m != nil {
		m.PathCount = true
	}
	fc.report(finding{node: sum, cat: catPascal, msg: msg + clause, match: m})
	return true
}

// paramShift reads arg, the i-th argument of a recursive call, as the
// function's i-th parameter plus a constant.
func (fc *fnCtx) paramShift(decl *ast.FuncDecl, arg ast.Expr, i int) (int64, bool) {
	lin, ok := fc.linear(arg)
	if !ok || len(lin.Terms) != 1 || lin.Terms[0].K != 1 || fc.c.paramIndex(decl, lin.Terms[0].Sym.Object) != i {
		return 0, false
	}
	return lin.C, true
}

// pascalAlwaysPast reports whether every C(n, k) over the ranges leaves
// t: C(n, ·) is smallest at the ends of k's range and grows with n, so
// it is enough that both ends at n.Lo leave it, with 0 ≤ k ≤ n.Lo.
func pascalAlwaysPast(t numType, n, k ranges.Interval) bool {
	if n.IsEmpty() || k.IsEmpty() || k.Lo < 0 || k.Hi > n.Lo {
		return false
	}
	for _, kk := range []int64{k.Lo, k.Hi} {
		if m := min(kk, n.Lo-kk); m < 64 && thresholds.ChooseFits(t.Num, n.Lo, m) {
			return false
		}
	}
	return true
}

// pascalFits reports whether every C(n, k) over the ranges fits t: the
// largest is C(n.Hi, min(k.Hi, ⌊n.Hi/2⌋)).
func pascalFits(t numType, n, k ranges.Interval) bool {
	if n.IsEmpty() || k.IsEmpty() || n.Hi == math.MaxInt64 {
		return false
	}
	if n.Hi < thresholds.CentralBinomial(t.Num).FirstBad {
		return true
	}
	kk := min(max(k.Hi, 0), n.Hi/2)
	if k.Lo > n.Hi/2 && k.Lo != math.MinInt64 {
		kk = n.Hi - min(k.Lo, n.Hi)
	}
	if kk >= 64 {
		// C(n, kk) ≥ C(2kk, kk) ≥ 2^kk for kk ≤ n/2: past every
		// integer type, and not worth computing for a large n.
		return false
	}
	return thresholds.ChooseFits(t.Num, n.Hi, kk)
}

// checkPascalTables reports the tables body fills by Pascal's rule,
// t[i][j] = t[i-1][j-1] + t[i-1][j] (either order, any offsets of the
// two indexes that keep the rule's shape), with Stirling numbers
// (stirlingnumbers.go) or with derangement numbers (derangement.go).
func (fc *fnCtx) checkPascalTables(body *ast.BlockStmt) {
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BlockStmt:
			for _, st := range n.List {
				if as, ok := st.(*ast.AssignStmt); ok && tableStep(as) && !fc.changedAgain(n, as) {
					fc.judgePascalTable(as)
					fc.judgeDerangementTable(as)
					fc.judgeTriangleTable(as)
					fc.judgeBellTable(as)
				}
			}
		}
		return true
	})
}

// tableStep reports whether as may be a step of a table filled by a
// recurrence: one table entry assigned a sum, a difference or a product. Only such
// statements are compared with the rest of their block.
func tableStep(as *ast.AssignStmt) bool {
	if as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return false
	}
	_, entry := as.Lhs[0].(*ast.IndexExpr)
	b, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	return entry && ok && (b.Op == token.ADD || b.Op == token.SUB || b.Op == token.MUL)
}

// changedAgain reports whether another statement of block assigns to
// what as assigns to (a reduction c[i][j] %= m, a saturation).
func (fc *fnCtx) changedAgain(block *ast.BlockStmt, as *ast.AssignStmt) bool {
	if len(as.Lhs) != 1 {
		return true
	}
	target := src(as.Lhs[0])
	again := false
	for _, st := range block.List {
		ast.Inspect(st, func(n ast.Node) bool {
			if o, ok := n.(*ast.AssignStmt); ok && o != as {
				for _, l := range o.Lhs {
					again = again || src(l) == target
				}
			}
			return !again
		})
	}
	return again
}

// tableSum is a table step t[I][J] = t[…][…] + t[…][…] in an integer
// type: the sum, its type, the assigned entry's parts and each term's
// shifts (row, column) from it.
type tableSum struct {
	sum            *ast.BinaryExpr
	t              numType
	base, row, col ast.Expr
	shifts         [2][2]int64
}

// tableSumOf reads as as a tableSum.
func (fc *fnCtx) tableSumOf(as *ast.AssignStmt) (tableSum, bool) {
	var ts tableSum
	sum, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	if !ok || sum.Op != token.ADD {
		return ts, false
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(sum))
	if !ok || t.Float {
		return ts, false
	}
	base, row, col, ok := index2(as.Lhs[0])
	if !ok {
		return ts, false
	}
	ts = tableSum{sum: sum, t: t, base: base, row: row, col: col}
	for i, e := range []ast.Expr{sum.X, sum.Y} {
		b, r, c, ok := index2(ast.Unparen(e))
		if !ok || src(b) != src(base) {
			return ts, false
		}
		dr, ok1 := fc.shiftOf(r, row)
		dc, ok2 := fc.shiftOf(c, col)
		if !ok1 || !ok2 {
			return ts, false
		}
		ts.shifts[i] = [2]int64{dr, dc}
	}
	return ts, true
}

// judgePascalTable judges one table step (tableStep) t[I][J] = t[I−1][J−1] + t[I−1][J].
func (fc *fnCtx) judgePascalTable(as *ast.AssignStmt) {
	ts, ok := fc.tableSumOf(as)
	if !ok {
		return
	}
	sum, t, base, row, col, shifts := ts.sum, ts.t, ts.base, ts.row, ts.col, ts.shifts
	if shifts[0][0] != -1 || shifts[1][0] != -1 || shifts[0][1]+shifts[1][1] != -1 || shifts[0][1]*shifts[1][1] != 0 {
		return
	}
	rv, ok := fc.linear(row)
	if !ok || len(rv.Terms) != 1 || rv.Terms[0].K != 1 {
		return
	}
	ri, ci := fc.rangeOf(row), fc.rangeOf(col)
	if pascalFits(t, ri, ci) {
		return
	}
	first := thresholds.CentralBinomial(t.Num)
	name := src(row)
	clause, definite := verdict(name, ri, first.FirstBad)
	msg := fmt.Sprintf("table %s is filled by Pascal's rule (%s = %s) in %s: with ones on its edges the entry %s is C(%s, %s), which %s where it leaves %s, from row %s = %d at %s = ⌊%s/2⌋ (C(%d, %d) ≈ %s is the largest central one that fits), and the rows below add the wrapped entries on",
		src(base), src(as.Lhs[0]), src(sum), t.typeName(), src(as.Lhs[0]), name, src(col), verb(t), t.Name,
		name, first.FirstBad, src(col), name, first.FirstBad-1, (first.FirstBad-1)/2, first.LastGoodApprox())
	fc.report(finding{node: as, cat: catPascal, definite: definite && ci.Lo <= first.FirstBad/2 && ci.Hi >= ri.Lo/2, msg: msg + clause})
}

// index2 splits b[r][c] into its parts.
func index2(e ast.Expr) (b, r, c ast.Expr, ok bool) {
	outer, ok := e.(*ast.IndexExpr)
	if !ok {
		return nil, nil, nil, false
	}
	inner, ok := ast.Unparen(outer.X).(*ast.IndexExpr)
	if !ok {
		return nil, nil, nil, false
	}
	return inner.X, inner.Index, outer.Index, true
}

// shiftOf returns a − b where that is a constant of linear forms.
func (fc *fnCtx) shiftOf(a, b ast.Expr) (int64, bool) {
	la, ok1 := fc.linear(a)
	lb, ok2 := fc.linear(b)
	if !ok1 || !ok2 {
		return 0, false
	}
	d := la.add(lb.scale(-1))
	if len(d.Terms) != 0 {
		return 0, false
	}
	return d.C, true
}
