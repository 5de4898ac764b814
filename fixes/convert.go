package fixes

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/types"
)

// class sorts a numeric type into the families the helper serves.
type class int

const (
	classOther class = iota
	classFloat
	classSigned
	classUnsigned
)

func classOf(t types.Type) class {
	b, ok := t.Underlying().(*types.Basic)
	if !ok {
		return classOther
	}
	info := b.Info()
	switch {
	case info&types.IsFloat != 0:
		return classFloat
	case info&types.IsUnsigned != 0:
		return classUnsigned
	case info&types.IsInteger != 0:
		return classSigned
	}
	return classOther
}

// arg returns the source text of e converted to the helper parameter type
// want. It refuses conversions that could change the value: a float
// operand where the helper takes an integer (the fractional part would be
// dropped) and anything that is not a number.
func (b *builder) arg(e ast.Expr, want types.Type) (string, error) {
	if classOf(want) != classFloat {
		e = b.floatOfInt(e)
	}
	text := b.copyText(e)
	tv, ok := b.pass.TypesInfo.Types[e]
	if !ok {
		return "", fmt.Errorf("no type for %s", text)
	}
	if types.Identical(tv.Type, want) {
		return text, nil
	}
	if tv.Value != nil && isUntyped(tv.Type) {
		if !representable(tv.Value, want) {
			return "", fmt.Errorf("constant %s does not fit %s", text, want)
		}
		return text, nil
	}
	from, to := classOf(tv.Type), classOf(want)
	switch {
	case from == classOther || to == classOther:
		return "", fmt.Errorf("%s has non-numeric type %s", text, tv.Type)
	case from == classFloat && to != classFloat && b.counts != nil && classOf(want) == classSigned:
		// A float count: the helper gets it as an int where it holds
		// one (countConds), and the original arithmetic is kept elsewhere.
		conv := want.String() + "(" + text + ")"
		var primary bool
		switch e.(type) {
		case *ast.Ident, *ast.SelectorExpr, *ast.CallExpr, *ast.ParenExpr, *ast.IndexExpr:
			primary = true
		}
		b.counts.floats = append(b.counts.floats, countOperand{text: text, conv: conv, primary: primary})
		return conv, nil
	case from == classFloat && to != classFloat:
		return "", fmt.Errorf("%s is a float where an integer is needed", text)
	}
	return want.String() + "(" + text + ")", nil
}

// floatOfInt returns x when e is a conversion float64(x) (or float32(x))
// of an integer x, and e otherwise: math.Pow(x, float64(k)) takes its
// exponent as a float, yet k itself is what the helper's integer
// parameter needs. Every integer a factorial can take converts to float64
// exactly (below 2^53), so nothing is lost.
func (b *builder) floatOfInt(e ast.Expr) ast.Expr {
	call, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok || len(call.Args) != 1 {
		return e
	}
	tv, ok := b.pass.TypesInfo.Types[call.Fun]
	if !ok || !tv.IsType() || classOf(tv.Type) != classFloat {
		return e
	}
	inner := call.Args[0]
	if c := classOf(b.pass.TypesInfo.TypeOf(inner)); c != classSigned && c != classUnsigned {
		return e
	}
	return inner
}

func isUntyped(t types.Type) bool {
	b, ok := t.(*types.Basic)
	return ok && b.Info()&types.IsUntyped != 0
}

// representable reports whether the constant v converts to t exactly.
func representable(v constant.Value, t types.Type) bool {
	b, ok := t.Underlying().(*types.Basic)
	if !ok {
		return false
	}
	switch classOf(b) {
	case classFloat:
		return v.Kind() == constant.Int || v.Kind() == constant.Float
	case classSigned:
		i := constant.ToInt(v)
		_, exact := constant.Int64Val(i)
		return i.Kind() == constant.Int && exact
	case classUnsigned:
		i := constant.ToInt(v)
		_, exact := constant.Uint64Val(i)
		return i.Kind() == constant.Int && exact
	}
	return false
}

// result wraps call, whose type is got, so that it has type want.
func (b *builder) result(call string, got, want types.Type) (string, error) {
	if types.Identical(got, want) {
		return call, nil
	}
	name, err := b.typeName(want)
	if err != nil {
		return "", err
	}
	return name + "(" + call + ")", nil
}

// typeName spells t as the fixed file must, qualifying types of other
// packages by the name this file imports them under.
func (b *builder) typeName(t types.Type) (string, error) {
	var missing error
	qual := func(p *types.Package) string {
		if p == b.pass.Pkg {
			return ""
		}
		for _, spec := range b.file.Imports {
			pn := b.pkgNameOf(spec)
			if pn != nil && pn.Imported() == p && pn.Name() != "_" && pn.Name() != "." {
				return pn.Name()
			}
		}
		missing = fmt.Errorf("type %s is not nameable in this file", t)
		return p.Name()
	}
	s := types.TypeString(t, qual)
	return s, missing
}

func (b *builder) pkgNameOf(spec *ast.ImportSpec) *types.PkgName {
	if spec.Name != nil {
		pn, _ := b.pass.TypesInfo.Defs[spec.Name].(*types.PkgName)
		return pn
	}
	pn, _ := b.pass.TypesInfo.Implicits[spec].(*types.PkgName)
	return pn
}
