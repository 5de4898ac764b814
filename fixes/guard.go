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
	"github.com/overfact/overfact/internal/astpath"
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
	if b.assignedInBody(m.Param, body) && !m.EntryGuard {
		// The guard tests the value the function was called with.
		return fmt.Errorf("%s is assigned in the function, so its first value does not bound the factorial", m.Param.Name())
	}
	indent := b.indentOf(body.Lbrace) + "\t"
	guard := "\n" + indent + b.guardText(body.Lbrace+1, indent)
	// The guard goes after the brace's line, below any comment ending
	// that line, unless a statement shares the line with the brace.
	at := b.lineEnd(body.Lbrace) - 1
	if len(body.List) > 0 && b.line(body.List[0].Pos()) == b.line(body.Lbrace) {
		at = body.Lbrace + 1
		guard += "\n" + indent
	}
	b.insert(at, guard)
	b.guardMessage()
	return nil
}

// guardText is the guard's if statement, to stand at pos indented by
// indent: it panics naming the parameter's value and the limit.
func (b *builder) guardText(pos token.Pos, indent string) string {
	m := b.m
	verb := "%d"
	if classOf(m.Param.Type()) == classFloat {
		verb = "%v"
	}
	p := m.Param.Name()
	msg := fmt.Sprintf("%s: %s = %s overflows %s (largest is %d)", funcName(m.Func), p, verb, b.resultName(), m.FirstBad-1)
	fmtName := b.use("fmt", "fmt", pos)
	return fmt.Sprintf("if %s >= %d {\n%s\tpanic(%s.Sprintf(%s, %s))\n%s}",
		p, m.FirstBad, indent, fmtName, strconv.Quote(msg), p, indent)
}

func (b *builder) resultName() string {
	if b.m.Result == nil {
		return "its result type"
	}
	return types.TypeString(b.m.Result, types.RelativeTo(b.pass.Pkg))
}

func (b *builder) guardMessage() {
	b.message = fmt.Sprintf("Add a range guard: panic when %s >= %d, where the result overflows %s", b.m.Param.Name(), b.m.FirstBad, b.resultName())
	if b.added["fmt"] {
		b.message += " (imports fmt)"
	}
}

// buildLoopGuard puts the range guard right before a product loop whose
// product, times a positive constant, the function returns (the
// analyzer vouches for that, and that the product leaves the result
// type exactly when the loop starts with Param ≥ FirstBad):
//
//	f := int64(1)
//	if n >= 21 {
//		panic(fmt.Sprintf("CountDown: n = %d overflows int64 (largest is 20)", n))
//	}
//	for n > 1 { f *= int64(n); n-- }
//	return f * 1
//
// Placed there, the guard fires only where the loop runs, after the
// function's own early returns, and it tests the value the function was
// called with: the parameter must not be assigned before the loop, nor
// may the loop run more than once per call (no loop or closure around
// it), which the fixer checks itself.
func buildLoopGuard(b *builder) error {
	m := b.m
	body := funcBody(m.Func)
	if body == nil || m.Loop == nil || m.Param == nil || m.Param.Name() == "" || m.Param.Name() == "_" || m.FirstBad <= 0 {
		return errors.New("loop guard lacks a function body, a loop, a named parameter or a first bad value")
	}
	if _, ok := m.Param.Type().(*types.TypeParam); ok {
		return fmt.Errorf("%s has the type parameter %s", m.Param.Name(), m.Param.Type())
	}
	if !reaches(m.Param.Type(), m.FirstBad) {
		return fmt.Errorf("%s of type %s never reaches %d", m.Param.Name(), m.Param.Type(), m.FirstBad)
	}
	start, err := b.beforeStmt(body, m.Loop, true, m.Param)
	if err != nil {
		return err
	}
	indent := b.indentOf(m.Loop.Pos())
	b.insert(start, indent+b.guardText(start, indent)+"\n")
	b.guardMessage()
	return nil
}

// beforeStmt returns where a guard goes before st, a statement of a
// block of body that runs once per call where once is set (no loop or
// closure around it), and checks that the guard would test the
// arguments: each of params is visible there and not assigned before
// it. The guard goes at the start of st's line, above the comment lines
// right before st, which speak of it.
func (b *builder) beforeStmt(body *ast.BlockStmt, st ast.Stmt, once bool, params ...types.Object) (token.Pos, error) {
	path, _ := astpath.Enclosing(b.file, st.Pos(), st.End())
	inList := false
	if len(path) > 1 {
		for _, s := range stmtList(path[1]) {
			inList = inList || s == st
		}
	}
	for i := 1; i < len(path) && path[i] != body; i++ {
		switch path[i].(type) {
		case *ast.ForStmt, *ast.RangeStmt:
			if once {
				return 0, errors.New("the statement may run more than once per call")
			}
		case *ast.FuncLit:
			return 0, errors.New("the statement is inside a function literal")
		}
	}
	if len(path) < 2 || path[0] != st || !inList {
		return 0, errors.New("the statement is not a statement of a block")
	}
	for _, p := range params {
		if _, obj := b.scopeAt(st.Pos()).LookupParent(p.Name(), st.Pos()); obj != p {
			return 0, fmt.Errorf("%s is not visible before the statement", p.Name())
		}
		if assigned.Before(b.pass.TypesInfo, body, p, st.Pos()) {
			return 0, fmt.Errorf("%s is assigned before the statement, so the guard would not test the argument", p.Name())
		}
	}
	start := b.tok.LineStart(b.line(st.Pos()))
	for _, c := range b.srcBetween(start, st.Pos()) {
		if c != ' ' && c != '\t' {
			return 0, errors.New("the statement shares its line with another statement")
		}
	}
	for _, cg := range b.file.Comments {
		if cg.End() < start && b.line(cg.End()) == b.line(start)-1 && b.commentAlone(cg) {
			start = b.tok.LineStart(b.line(cg.Pos()))
		}
	}
	return start, nil
}

// srcBetween returns the source between two positions.
func (b *builder) srcBetween(from, to token.Pos) []byte {
	return b.src[b.offset(from):b.offset(to)]
}

// commentAlone reports whether cg begins its line.
func (b *builder) commentAlone(cg *ast.CommentGroup) bool {
	for _, c := range b.srcBetween(b.tok.LineStart(b.line(cg.Pos())), cg.Pos()) {
		if c != ' ' && c != '\t' {
			return false
		}
	}
	return true
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
