package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"strings"

	"github.com/overfact/overfact/internal/astpath"
)

// math.Exp of math.Lgamma values whose signs were dropped is |Γ(x)| (or
// a ratio of such), not Γ(x). The fix keeps each sign, naming the blank
// identifier, and multiplies the exponential by the product of the
// signs: each sign is ±1, so dividing by it is multiplying by it, and
//
//	lg, _ := math.Lgamma(x)
//	… math.Exp(lg - w) …
//
// becomes
//
//	lg, sign := math.Lgamma(x)
//	… (float64(sign) * math.Exp(lg-w)) …
//
// which is Γ(x)·e^(−w) (math.Lgamma's sign is +1 at the poles, where
// the value is +Inf either way). The analyzer vouches that the argument
// of math.Exp is a sum of the values with their signs dropped and other
// terms (ShapeLgammaSign in match.go); the type check of the fixed file
// catches a name that does not reach the call.
func buildLgammaSign(b *builder) error {
	exp, ok := b.m.Node.(*ast.CallExpr)
	if !ok || len(b.m.Args) == 0 {
		return errors.New("lgamma-sign match lacks the math.Exp call or the signs")
	}
	var names []string
	named := make(map[*ast.Ident]string)
	for _, a := range b.m.Args {
		id, ok := a.(*ast.Ident)
		if !ok {
			return fmt.Errorf("sign %s is not an identifier", b.text(a))
		}
		if id.Name != "_" {
			names = append(names, id.Name)
			continue
		}
		if n, ok := named[id]; ok {
			names = append(names, n)
			continue
		}
		as := b.assignOf(id)
		if as == nil || as.Tok != token.DEFINE {
			return errors.New("the dropped sign is not in a := statement, where a name could be declared")
		}
		n := b.freeName("sign", id.Pos(), exp.Pos(), named)
		named[id] = n
		b.replace(id.Pos(), id.End(), n)
		names = append(names, n)
	}
	text := "float64(" + strings.Join(names, "*") + ") * " + b.copyText(exp)
	if b.inOperation(exp) {
		text = "(" + text + ")"
	}
	b.replace(exp.Pos(), exp.End(), text)
	b.message = "Keep the sign of math.Lgamma and multiply by it: " + text
	return nil
}

// assignOf returns the assignment whose left side holds id.
func (b *builder) assignOf(id *ast.Ident) *ast.AssignStmt {
	path, _ := astpath.Enclosing(b.file, id.Pos(), id.End())
	for _, n := range path {
		if as, ok := n.(*ast.AssignStmt); ok {
			for _, l := range as.Lhs {
				if l == id {
					return as
				}
			}
			return nil
		}
	}
	return nil
}

// freeName returns base, or base2, base3, …: the first that nothing
// visible at decl or at use declares and no other new name takes.
func (b *builder) freeName(base string, decl, use token.Pos, taken map[*ast.Ident]string) string {
	for i := 1; ; i++ {
		name := base
		if i > 1 {
			name = fmt.Sprintf("%s%d", base, i)
		}
		clash := false
		for _, t := range taken {
			clash = clash || t == name
		}
		_, atDecl := b.scopeAt(decl).LookupParent(name, decl)
		_, atUse := b.scopeAt(use).LookupParent(name, use)
		if !clash && atDecl == nil && atUse == nil {
			return name
		}
	}
}

// inOperation reports whether e is an operand of a binary or unary
// operator, where a product put in its place needs parentheses.
func (b *builder) inOperation(e ast.Expr) bool {
	path, _ := astpath.Enclosing(b.file, e.Pos(), e.End())
	for _, n := range path[1:] {
		switch n.(type) {
		case *ast.ParenExpr:
			return false
		case *ast.BinaryExpr, *ast.UnaryExpr, *ast.StarExpr, *ast.SelectorExpr, *ast.IndexExpr:
			return true
		default:
			return false
		}
	}
	return false
}
