package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/types"
	"strconv"
)

// A binomial coefficient built by Pascal's rule in an integer type,
//
//	v := ways(n-1, k-1) + ways(n-1, k)
//
// has no rewrite that fits (C(67, 33) is past int64), and its sums never
// wrap before the coefficient they form does: every entry is the sum of
// two smaller ones, each right where it fits. So the guard goes right
// before the statement that sums, and panics exactly where C(n, k)
// leaves the result type, naming n and k:
//
//	if _, ok := lgamma.ChooseInt64(int64(n), int64(k)); n >= 0 && !ok {
//		panic(fmt.Sprintf("ways: C(n, k) overflows int64 at n = %d, k = %d", n, k))
//	}
//
// For a result narrower than 64 bits the coefficient is also checked to
// convert to it unchanged. The analyzer vouches that the function's
// edges are ones (every constant it returns is 0 or 1), so that its
// value is C(n, k); the fixer checks that n and k are the parameters,
// visible and unassigned before the statement.
func buildPascalGuard(b *builder) error {
	m := b.m
	body := funcBody(m.Func)
	st, ok := m.Node.(ast.Stmt)
	if body == nil || !ok || len(m.Args) != 2 {
		return errors.New("Pascal's-rule match lacks its function, statement or parameters")
	}
	var params [2]types.Object
	for i, a := range m.Args {
		id, ok := a.(*ast.Ident)
		if !ok {
			return errors.New("Pascal's-rule operand is not a parameter")
		}
		params[i] = b.pass.TypesInfo.Defs[id]
		if params[i] == nil || id.Name == "_" {
			return fmt.Errorf("%s is not a named parameter", id.Name)
		}
	}
	n, k := params[0], params[1]
	class := classOf(m.Result)
	helper, err := b.pick(shapes[m.Shape].helpers, m.Result)
	if err != nil {
		return err
	}
	wide := "int64"
	if class == classUnsigned {
		wide = "uint64"
		if classOf(n.Type()) != classUnsigned || classOf(k.Type()) != classUnsigned {
			return errors.New("an unsigned result over signed counts")
		}
	}
	if class != classSigned && class != classUnsigned {
		return fmt.Errorf("no Pascal's-rule guard for %s", m.Result)
	}
	start, err := b.beforeStmt(body, st, false, n, k)
	if err != nil {
		return err
	}
	result, err := b.typeName(m.Result)
	if err != nil {
		return err
	}
	indent := b.indentOf(st.Pos())
	pkg := b.helper(start)
	fmtName := b.use("fmt", "fmt", start)
	value, check := "_", "!ok"
	if b.narrow(m.Result) {
		value, check = "v", fmt.Sprintf("(!ok || %s(%s(v)) != v)", wide, result)
	}
	// Lattice paths count C(r+c, r) with n = r, k = c here.
	top, shownTop, low, shownLow := widened(wide, n), n.Name(), widened(wide, k), k.Name()
	cond := check
	if class == classSigned {
		cond = n.Name() + " >= 0 && " + check
	}
	if m.PathCount {
		top, shownTop, low, shownLow = widened(wide, n)+"+"+widened(wide, k), n.Name()+" + "+k.Name(), widened(wide, n), n.Name()
		if class == classSigned {
			cond = n.Name() + " >= 0 && " + k.Name() + " >= 0 && " + check
		}
	}
	msg := fmt.Sprintf("%s: C(%s, %s) overflows %s at %s = %%d, %s = %%d", funcName(m.Func), shownTop, shownLow, result, n.Name(), k.Name())
	guard := fmt.Sprintf("%[1]sif %[2]s, ok := %[3]s.%[4]s(%[5]s, %[6]s); %[7]s {\n%[1]s\tpanic(%[8]s.Sprintf(%[9]s, %[10]s, %[11]s))\n%[1]s}\n",
		indent, value, pkg, helper, top, low, cond, fmtName, strconv.Quote(msg), n.Name(), k.Name())
	b.insert(start, guard)
	b.message = fmt.Sprintf("Add a range guard: panic where C(%s, %s) overflows %s (imports %s)", shownTop, shownLow, result, HelperPath)
	return nil
}

// widened writes the parameter p converted to wide, unless it is of
// that type already.
func widened(wide string, p types.Object) string {
	if sameBasic(p.Type(), wide) {
		return p.Name()
	}
	return wide + "(" + p.Name() + ")"
}

// sameBasic reports whether t is the basic type named name.
func sameBasic(t types.Type, name string) bool {
	b, ok := t.(*types.Basic)
	return ok && b.Name() == name
}
