package fixes

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/astpath"
)

// covered checks that replacing the match's expression by a helper call
// on its operands loses nothing: the operands lie inside the expression
// (or in the definitions of locals it alone reads, which the rewrite
// deletes with it), and every variable that source reads is read by an
// operand. A match whose expression also holds another factor
// (x * n!/(k!(n-k)!)) would otherwise have that factor silently dropped.
func (b *builder) covered() error {
	node := b.m.Node
	regions := []ast.Node{node}
	for _, s := range b.m.Chain {
		as, ok := s.(*ast.AssignStmt)
		if !ok || len(as.Rhs) != 1 || as.Tok != token.MUL_ASSIGN && as.Tok != token.QUO_ASSIGN {
			return fmt.Errorf("a link of the chain is not r *= x or r /= x")
		}
		regions = append(regions, as.Rhs[0])
	}
	locals := make(map[types.Object]bool)
	operands := append(append([]ast.Expr(nil), b.m.Args...), b.m.Extra...)
	if b.m.Vouched != nil {
		operands = append(operands, b.m.Vouched)
	}
	if !within(operands, regions) {
		defs, err := b.absorbable()
		if err != nil {
			return err
		}
		for v, d := range defs {
			if !holdsOperand(d, operands) {
				// A local the operands do not flow through (scale := 2)
				// is a factor of its own, not part of the ratio.
				continue
			}
			locals[v] = true
			regions = append(regions, d)
			b.absorbed = append(b.absorbed, d)
		}
	}
	read := make(map[types.Object]bool)
	for _, a := range operands {
		if !within([]ast.Expr{a}, regions) {
			return fmt.Errorf("operand %s lies outside the rewritten expression", b.text(a))
		}
		for _, v := range b.vars(a) {
			read[v] = true
		}
	}
	for _, r := range regions {
		for _, v := range b.vars(r) {
			if !read[v] && !locals[v] {
				return fmt.Errorf("the rewrite would drop %s", v.Name())
			}
		}
		if c := b.looseConstant(r, operands); c != nil {
			return fmt.Errorf("the rewrite would drop the factor %s", b.text(c))
		}
	}
	return nil
}

// looseConstant returns a constant in n that is neither in an operand nor
// in the arguments of a call (fact(2*n) and math.Pow(1-p, …) hold their
// constants inside factorial and power arguments; 2*fact(n) does not),
// or nil. Such a constant is a factor the helper would not reproduce.
func (b *builder) looseConstant(n ast.Node, operands []ast.Expr) ast.Expr {
	var loose ast.Expr
	var visit func(n ast.Node) bool
	visit = func(n ast.Node) bool {
		if loose != nil {
			return false
		}
		switch e := n.(type) {
		case *ast.CallExpr:
			if tv, ok := b.pass.TypesInfo.Types[e.Fun]; ok && tv.IsType() {
				return true // a conversion shields nothing: float64(2)*n!
			}
			ast.Inspect(e.Fun, visit)
			return false // constants among the arguments are arguments
		case *ast.BasicLit:
			loose = e
		case *ast.Ident:
			if _, ok := b.pass.TypesInfo.Uses[e].(*types.Const); ok {
				loose = e
			}
		}
		if loose != nil && inOperand(loose, operands) {
			loose = nil
		}
		return loose == nil
	}
	ast.Inspect(n, visit)
	return loose
}

// holdsOperand reports whether one of operands lies in n.
func holdsOperand(n ast.Node, operands []ast.Expr) bool {
	for _, a := range operands {
		if n.Pos() <= a.Pos() && a.End() <= n.End() {
			return true
		}
	}
	return false
}

// inOperand reports whether e lies in one of operands.
func inOperand(e ast.Expr, operands []ast.Expr) bool {
	return within([]ast.Expr{e}, exprNodes(operands))
}

func exprNodes(es []ast.Expr) []ast.Node {
	out := make([]ast.Node, len(es))
	for i, e := range es {
		out[i] = e
	}
	return out
}

// within reports whether every expression lies inside one of regions.
func within(es []ast.Expr, regions []ast.Node) bool {
	for _, e := range es {
		in := false
		for _, r := range regions {
			in = in || r.Pos() <= e.Pos() && e.End() <= r.End()
		}
		if !in {
			return false
		}
	}
	return true
}

// absorbable finds the definitions, earlier in the statement list that
// holds the match's expression, of locals read only by that expression
// (num := n!; den := k!(n-k)!; return num / den): the rewrite deletes
// them along with the expression. None of the operands' variables may be
// assigned between the first definition and the expression, so the helper
// call sees the values the definitions saw.
func (b *builder) absorbable() (map[types.Object]ast.Stmt, error) {
	node := b.m.Node
	list, at, err := b.enclosingList(node)
	if err != nil {
		return nil, err
	}
	defs := make(map[types.Object]ast.Stmt)
	first := at
	for j := at - 1; j >= 0; j-- {
		v := b.definedVar(list[j])
		if v != nil && b.usedOnlyIn(v, node) {
			defs[v] = list[j]
			first = j
		}
	}
	for _, s := range list[first:at] {
		if _, isDef := defs[b.definedVar(s)]; isDef && b.definedVar(s) != nil {
			continue
		}
		for _, a := range b.m.Args {
			for _, v := range b.vars(a) {
				if b.assigned(v, s) {
					return nil, fmt.Errorf("%s changes before the expression", v.Name())
				}
			}
		}
	}
	return defs, nil
}

// enclosingList returns the statement list that holds node and the
// index of the statement there that holds it.
func (b *builder) enclosingList(node ast.Node) ([]ast.Stmt, int, error) {
	path, _ := astpath.Enclosing(b.file, node.Pos(), node.End())
	for i := 1; i < len(path); i++ {
		list := stmtList(path[i])
		for j, s := range list {
			if s == path[i-1] {
				return list, j, nil
			}
		}
	}
	return nil, -1, fmt.Errorf("the match's expression is not in a statement list")
}

// definedVar returns the variable s defines, if s is v := e or var v = e.
func (b *builder) definedVar(s ast.Stmt) types.Object {
	switch s := s.(type) {
	case *ast.AssignStmt:
		if s.Tok == token.DEFINE && len(s.Lhs) == 1 && len(s.Rhs) == 1 {
			if id, ok := s.Lhs[0].(*ast.Ident); ok {
				return b.pass.TypesInfo.Defs[id]
			}
		}
	case *ast.DeclStmt:
		if g, ok := s.Decl.(*ast.GenDecl); ok && len(g.Specs) == 1 {
			if v, ok := g.Specs[0].(*ast.ValueSpec); ok && len(v.Names) == 1 && len(v.Values) == 1 {
				return b.pass.TypesInfo.Defs[v.Names[0]]
			}
		}
	}
	return nil
}

// usedOnlyIn reports whether every use of v lies in n, and there is one.
func (b *builder) usedOnlyIn(v types.Object, n ast.Node) bool {
	used := false
	for id, obj := range b.pass.TypesInfo.Uses {
		if obj != v {
			continue
		}
		if id.Pos() < n.Pos() || id.End() > n.End() {
			return false
		}
		used = true
	}
	return used
}

// deleteStmt deletes s, with its line when nothing else is on it.
func (b *builder) deleteStmt(s ast.Stmt) {
	start := b.offset(b.tok.LineStart(b.line(s.Pos())))
	alone := true
	for _, c := range b.src[start:b.offset(s.Pos())] {
		alone = alone && (c == ' ' || c == '\t')
	}
	if alone {
		b.replace(b.tok.Pos(start), b.lineEnd(s.End()), "")
		return
	}
	b.replace(s.Pos(), s.End(), "")
}

// vars lists the variables (not fields) n reads.
func (b *builder) vars(n ast.Node) []types.Object {
	var out []types.Object
	ast.Inspect(n, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := b.pass.TypesInfo.Uses[id].(*types.Var); ok && !v.IsField() {
				out = append(out, v)
			}
		}
		return true
	})
	return out
}
