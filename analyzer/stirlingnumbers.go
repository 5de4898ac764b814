package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
)

// Stirling numbers, found beside Pascal's rule and reported under
// pascal-rule: the triangles whose rule weighs one of its two terms,
// T(n, k) = w·T(n−1, k) + T(n−1, k−1) (common practice; DLMF 26.8.18,
// 26.8.22):
//
//   - w = k, Stirling numbers of the second kind (set partitions, OEIS
//     A008277), written as a recursion (memoised or not)
//
//     v := int64(k)*m.Parts(n-1, k) + m.Parts(n-1, k-1)
//
//     or as a table, s[i][j] = j*s[i-1][j] + s[i-1][j-1];
//   - w = n−1, unsigned Stirling numbers of the first kind (permutations
//     by cycles, OEIS A132393), and the signed ones written
//     s(n−1, k−1) − (n−1)·s(n−1, k), whose magnitudes are the same.
//
// The weighted term is at most the entry itself, so nothing leaves the
// type before the entry does; the entry wraps silently where it leaves
// it (thresholds.TriangleLimit: S from row 26 at k = 9, c from row 21 at
// k = 3, in int64) and the later sums carry the wrapped value on. As for
// Pascal's rule, a sum under %, an entry changed again in the same trip,
// ranges whose entries fit, and floats are left alone. No fix: no
// integer type holds the entries past the row, and no helper computes
// them.
//
// The Bell triangle, t[i][j] = t[i][j-1] + t[i-1][j-1] with each row
// started by the end of the one before, is read here too: its rows run
// through the Bell numbers, B(n) = Σ_k S(n, k).

// triangleName is how messages name the triangle's entries.
func triangleName(tr thresholds.Triangle, signed bool, n, k string) string {
	switch {
	case tr == thresholds.StirlingSecond:
		return fmt.Sprintf("the Stirling numbers of the second kind, S(%s, %s)", n, k)
	case signed:
		return fmt.Sprintf("the signed Stirling numbers of the first kind, s(%s, %s)", n, k)
	}
	return fmt.Sprintf("the unsigned Stirling numbers of the first kind, c(%s, %s)", n, k)
}

// weightedTerms splits sum into its plain term and the operands of its
// weighted one: p + w·q, either order, or, for the signed first kind,
// p − w·q. ok is false for any other shape.
func (fc *fnCtx) weightedTerms(sum *ast.BinaryExpr) (plain ast.Expr, pairs [2][2]ast.Expr, ok bool) {
	for i, e := range []ast.Expr{sum.Y, sum.X} {
		if sum.Op == token.SUB && i == 1 {
			break
		}
		mul, isMul := ast.Unparen(e).(*ast.BinaryExpr)
		if !isMul || mul.Op != token.MUL {
			continue
		}
		plain = sum.X
		if i == 1 {
			plain = sum.Y
		}
		return plain, [2][2]ast.Expr{{mul.X, mul.Y}, {mul.Y, mul.X}}, true
	}
	return nil, pairs, false
}

// judgeTriangleRecursion judges sum = f(…n−1…k−1…) + w·f(…n−1…k…), w = k
// or n−1, every other argument passed through. It reports whether the
// sum was such a step.
func (fc *fnCtx) judgeTriangleRecursion(decl *ast.FuncDecl, self *types.Func, sum *ast.BinaryExpr) bool {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(sum))
	if !ok || t.Float {
		return false
	}
	plainE, pairs, ok := fc.weightedTerms(sum)
	plain, okP := fc.stripConv(plainE).(*ast.CallExpr)
	if !ok || !okP || fc.c.calleeOf(plain) != self {
		return false
	}
	for _, pair := range pairs {
		call, ok := fc.stripConv(pair[1]).(*ast.CallExpr)
		if !ok || fc.c.calleeOf(call) != self || len(call.Args) != len(plain.Args) {
			continue
		}
		ni, ki := -1, -1
		for i := range plain.Args {
			dp, okP := fc.paramShift(decl, plain.Args[i], i)
			dw, okW := fc.paramShift(decl, call.Args[i], i)
			switch {
			case !okP || !okW:
				ni = -2
			case dp == -1 && dw == -1 && ni == -1:
				ni = i
			case dp == -1 && dw == 0 && ki == -1:
				ki = i
			case dp != 0 || dw != 0:
				ni = -2
			}
			if ni == -2 {
				break
			}
		}
		if ni < 0 || ki < 0 {
			continue
		}
		tr, ok := fc.triangleWeight(pair[0], func(e ast.Expr, i int) (int64, bool) { return fc.paramShift(decl, e, []int{ni, ki}[i]) })
		if !ok || sum.Op == token.SUB && tr != thresholds.StirlingFirst {
			continue
		}
		params := self.Type().(*types.Signature).Params()
		nObj, kObj := params.At(ni), params.At(ki)
		if nObj.Name() == "" || kObj.Name() == "" || nObj.Name() == "_" || kObj.Name() == "_" {
			return false
		}
		fits := func(n, k ranges.Interval) bool {
			return !n.IsEmpty() && !k.IsEmpty() && bounded(n) && thresholds.TriangleFits(tr, t.Num, n.Hi, k.Lo, k.Hi)
		}
		n, k := fc.entryRange(nObj, sum), fc.entryRange(kObj, sum)
		if fits(n, k) || fc.c.callsFit(self, decl, ni, ki, fits) {
			return true
		}
		first, firstK := thresholds.TriangleLimit(tr, t.Num)
		clause, definite := verdict(nObj.Name(), n, first.FirstBad)
		msg := fmt.Sprintf("recursion computes %s, by the rule %s in %s: the sum %s where the entry leaves %s, from %s = %d at %s = %d (the largest entry of row %d, ≈ %s, fits), and every call above it carries the wrapped value on",
			triangleName(tr, sum.Op == token.SUB, nObj.Name(), kObj.Name()), src(sum), t.typeName(), verb(t), t.Name,
			nObj.Name(), first.FirstBad, kObj.Name(), firstK, first.FirstBad-1, first.LastGoodApprox())
		definite = definite && !k.IsEmpty() && thresholds.TriangleAllPast(tr, t.Num, n.Lo, k.Lo, k.Hi)
		fc.report(finding{node: sum, cat: catPascal, definite: definite, msg: msg + clause})
		return true
	}
	return false
}

// triangleWeight reads w of a weighted term: shift(w, 1) = 0, the k
// parameter itself, is the second kind; shift(w, 0) = −1, n−1, the first.
func (fc *fnCtx) triangleWeight(w ast.Expr, shift func(e ast.Expr, i int) (int64, bool)) (thresholds.Triangle, bool) {
	if d, ok := shift(w, 1); ok && d == 0 {
		return thresholds.StirlingSecond, true
	}
	if d, ok := shift(w, 0); ok && d == -1 {
		return thresholds.StirlingFirst, true
	}
	return 0, false
}

// judgeTriangleTable judges one table step (tableStep) t[I][J] =
// w·t[I−1][J] + t[I−1][J−1], w = J or I−1 (or the signed first kind's
// difference).
func (fc *fnCtx) judgeTriangleTable(as *ast.AssignStmt) {
	sum, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	if !ok || sum.Op != token.ADD && sum.Op != token.SUB {
		return
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(sum))
	if !ok || t.Float {
		return
	}
	base, row, col, ok := index2(as.Lhs[0])
	plainE, pairs, okT := fc.weightedTerms(sum)
	if !ok || !okT {
		return
	}
	// entry returns the shifts of e = base[r][c] from the assigned entry.
	entry := func(e ast.Expr) (dr, dc int64, ok bool) {
		b, r, c, ok := index2(fc.stripConv(e))
		if !ok || src(b) != src(base) {
			return 0, 0, false
		}
		dr, ok1 := fc.shiftOf(r, row)
		dc, ok2 := fc.shiftOf(c, col)
		return dr, dc, ok1 && ok2
	}
	if dr, dc, ok := entry(plainE); !ok || dr != -1 || dc != -1 {
		return
	}
	for _, pair := range pairs {
		if dr, dc, ok := entry(pair[1]); !ok || dr != -1 || dc != 0 {
			continue
		}
		tr, ok := fc.triangleWeight(pair[0], func(e ast.Expr, i int) (int64, bool) { return fc.shiftOf(e, []ast.Expr{row, col}[i]) })
		if !ok || sum.Op == token.SUB && tr != thresholds.StirlingFirst {
			continue
		}
		ri, ci := fc.rangeOf(row), fc.rangeOf(col)
		if bounded(ri) && !ci.IsEmpty() && thresholds.TriangleFits(tr, t.Num, ri.Hi, ci.Lo, ci.Hi) {
			return
		}
		first, firstK := thresholds.TriangleLimit(tr, t.Num)
		name := src(row)
		clause, definite := verdict(name, ri, first.FirstBad)
		msg := fmt.Sprintf("table %s is filled with %s, by the rule %s = %s in %s: with the triangle's edges (1 at [0][0], 0 at [i][0] for i > 0) the entry %s wraps where it leaves %s, from row %s = %d at %s = %d (the largest entry of row %d, ≈ %s, fits), and the rows below carry the wrapped entries on",
			src(base), triangleName(tr, sum.Op == token.SUB, name, src(col)), src(as.Lhs[0]), src(sum), t.typeName(), src(as.Lhs[0]), t.Name,
			name, first.FirstBad, src(col), firstK, first.FirstBad-1, first.LastGoodApprox())
		definite = definite && !ci.IsEmpty() && thresholds.TriangleAllPast(tr, t.Num, ri.Lo, ci.Lo, ci.Hi)
		fc.report(finding{node: as, cat: catPascal, definite: definite, msg: msg + clause})
		return
	}
}

// judgeBellTable judges one table step (tableStep) of the Bell triangle,
// t[I][J] = t[I][J−1] + t[I−1][J−1] (either order), in a function that
// also starts each row with the end of the one before, t[I][0] =
// t[I−1][I−1]: row I then runs from the Bell number B(I) to B(I+1)
// (thresholds.BellTriangleLimit), and wraps from the first row whose
// entries leave the type. Other edges give another triangle: silent.
func (fc *fnCtx) judgeBellTable(as *ast.AssignStmt) {
	ts, ok := fc.tableSumOf(as)
	if !ok {
		return
	}
	sum, t, base, row, col, shifts := ts.sum, ts.t, ts.base, ts.row, ts.col, ts.shifts
	if shifts[0][1] != -1 || shifts[1][1] != -1 || shifts[0][0]+shifts[1][0] != -1 || shifts[0][0]*shifts[1][0] != 0 || !fc.startsBellRows(base) {
		return
	}
	ri := fc.rangeOf(row)
	first, firstK := thresholds.BellTriangleLimit(t.Num)
	if bounded(ri) && ri.Hi < first.FirstBad {
		return
	}
	name := src(row)
	clause, definite := verdict(name, ri, first.FirstBad)
	msg := fmt.Sprintf("table %s is filled as the Bell triangle (%s = %s) in %s: each row starting with the end of the one before, row %s runs from the Bell number B(%s) to B(%s+1), and the entry %s wraps where it leaves %s, from row %s = %d at %s = %d (the largest entry of row %d, B(%d) ≈ %s, fits), and the rows below carry the wrapped entries on",
		src(base), src(as.Lhs[0]), src(sum), t.typeName(), name, name, name, src(as.Lhs[0]), t.Name,
		name, first.FirstBad, src(col), firstK, first.FirstBad-1, first.FirstBad, first.LastGoodApprox())
	fc.report(finding{node: as, cat: catPascal, definite: definite, msg: msg + clause})
}

// startsBellRows reports whether the function assigns t[I][0] =
// t[I−1][I−1] for some row index I: each row of a Bell triangle starts
// with the last entry of the row before.
func (fc *fnCtx) startsBellRows(base ast.Expr) bool {
	found := false
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || found || len(as.Lhs) != 1 || len(as.Rhs) != 1 || as.Tok != token.ASSIGN {
			return !found
		}
		b, r, c, ok1 := index2(as.Lhs[0])
		pb, pr, pc, ok2 := index2(ast.Unparen(as.Rhs[0]))
		if !ok1 || !ok2 || src(b) != src(base) || src(pb) != src(base) {
			return true
		}
		zero, isConst := fc.intConst(c)
		dr, ok3 := fc.shiftOf(pr, r)
		dc, ok4 := fc.shiftOf(pc, r)
		found = isConst && zero == 0 && ok3 && ok4 && dr == -1 && dc == -1
		return !found
	})
	return found
}
