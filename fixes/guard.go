package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"strconv"

	"github.com/overfact/overfact/internal/assigned"
)

// No rewrite makes 25! fit an int64, so a standalone factorial gets a
// range guard instead: the function panics, naming the argument and the
// limit, where it used to return a wrapped integer or +Inf:
//
//	if n >= 21 {
//		panic(fmt.Sprintf("fact: n = %d overflows int64 (largest is 20)", n))
//	}
//
// The limit is the match's first bad value, computed by the thresholds
// package; nothing here types a threshold.
func buildGuard(b *builder) error {
	m := b.m
	body := funcBody(m.Func)
	if body == nil || m.Param == nil || m.Param.Name() == "" || m.Param.Name() == "_" {
		return errors.New("factorial match lacks a function body or a named parameter")
	}
	if m.FirstBad <= 0 {
		// The analyzer computes every threshold (analyzer/thresholds)
		// and hands it over; the fixer types none and asks nobody.
		return errors.New("factorial match has no first bad value")
	}
	if _, ok := m.Param.Type().(*types.TypeParam); ok {
		// One guard would have to serve every type of the constraint.
		return fmt.Errorf("%s has the type parameter %s", m.Param.Name(), m.Param.Type())
	}
	if !reaches(m.Param.Type(), m.FirstBad) {
		return fmt.Errorf("%s of type %s never reaches %d", m.Param.Name(), m.Param.Type(), m.FirstBad)
	}
	if _, obj := b.scopeAt(body.Lbrace+1).LookupParent(m.Param.Name(), body.Lbrace+1); obj != m.Param {
		return fmt.Errorf("%s is not visible where the function starts", m.Param.Name())
	}
	if b.assignedInBody(m.Param, body) {
		// The guard tests the value the function was called with.
		return fmt.Errorf("%s is assigned in the function, so its first value does not bound the factorial", m.Param.Name())
	}
	verb := "%d"
	if classOf(m.Param.Type()) == classFloat {
		verb = "%v"
	}
	result := "its result type"
	if m.Result != nil {
		result = types.TypeString(m.Result, types.RelativeTo(b.pass.Pkg))
	}
	p := m.Param.Name()
	msg := fmt.Sprintf("%s: %s = %s overflows %s (largest is %d)", funcName(m.Func), p, verb, result, m.FirstBad-1)
	fmtName := b.use("fmt", "fmt", body.Lbrace+1)
	indent := b.indentOf(body.Lbrace) + "\t"
	guard := fmt.Sprintf("\n%sif %s >= %d {\n%s\tpanic(%s.Sprintf(%s, %s))\n%s}",
		indent, p, m.FirstBad, indent, fmtName, strconv.Quote(msg), p, indent)
	// The guard goes after the brace's line, below any comment ending
	// that line, unless a statement shares the line with the brace.
	at := b.lineEnd(body.Lbrace) - 1
	if len(body.List) > 0 && b.line(body.List[0].Pos()) == b.line(body.Lbrace) {
		at = body.Lbrace + 1
		guard += "\n" + indent
	}
	b.insert(at, guard)
	b.message = fmt.Sprintf("Add a range guard: panic when %s >= %d, where the result overflows %s", p, m.FirstBad, result)
	if b.added["fmt"] {
		b.message += " (imports fmt)"
	}
	return nil
}

// assigned reports whether obj is assigned, incremented, set by a range
// clause or has its address taken anywhere in n.
func (b *builder) assigned(obj types.Object, n ast.Node) bool {
	return assigned.In(b.pass.TypesInfo, n, obj, nil)
}

// eachAssigned calls f with each variable assigned, incremented, set by
// a range clause or having its address taken in n, until f returns
// false.
func (b *builder) eachAssigned(n ast.Node, f func(types.Object) bool) {
	assigned.Each(b.pass.TypesInfo, n, nil, func(v types.Object, _ ast.Node) bool { return f(v) })
}

func funcBody(n ast.Node) *ast.BlockStmt {
	switch f := n.(type) {
	case *ast.FuncDecl:
		return f.Body
	case *ast.FuncLit:
		return f.Body
	}
	return nil
}

func funcName(n ast.Node) string {
	if f, ok := n.(*ast.FuncDecl); ok {
		return f.Name.Name
	}
	return "factorial"
}

// reaches reports whether a value of type t can be as large as v; a guard
// the parameter can never trip would be dead code.
func reaches(t types.Type, v int64) bool {
	b, ok := t.Underlying().(*types.Basic)
	if !ok {
		return false
	}
	switch classOf(b) {
	case classFloat:
		return true
	case classSigned, classUnsigned:
		bits := map[types.BasicKind]uint{types.Int8: 7, types.Int16: 15, types.Int32: 31, types.Uint8: 8, types.Uint16: 16, types.Uint32: 32}[b.Kind()]
		return bits == 0 || uint64(v) <= math.MaxUint64>>(64-bits)
	}
	return false
}

func (b *builder) line(p token.Pos) int { return b.tok.Line(p) }

// indentOf returns the leading white space of the line holding p.
func (b *builder) indentOf(p token.Pos) string {
	start := b.offset(b.tok.LineStart(b.line(p)))
	end := start
	for end < len(b.src) && (b.src[end] == '\t' || b.src[end] == ' ') {
		end++
	}
	return string(b.src[start:end])
}
