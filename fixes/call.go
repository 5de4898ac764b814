package fixes

import (
	"fmt"
	"go/ast"
	"go/types"
	"strconv"
	"strings"
)

// family names the helper functions that compute one quantity, by the
// class of result they return.
type family struct {
	float, signed, unsigned string
}

// pick returns the helper of f that serves a result of type t. The exact
// helpers return int64 or uint64; for a narrower integer type (int32, or
// int on a 32-bit target) call wraps their result in a check, since the
// conversion alone would wrap silently again.
func (b *builder) pick(f family, t types.Type) (string, error) {
	var name string
	switch classOf(t) {
	case classFloat:
		name = f.float
	case classSigned:
		name = f.signed
	case classUnsigned:
		name = f.unsigned
		if name == "" {
			name = f.signed
		}
	}
	if name == "" {
		return "", fmt.Errorf("no helper for a result of type %s", t)
	}
	return name, nil
}

// narrow reports whether t is an integer type narrower than 64 bits.
func (b *builder) narrow(t types.Type) bool {
	return classOf(t) != classFloat && b.pass.TypesSizes.Sizeof(t) < 8
}

// checked converts text, the call of a 64-bit exact helper, to the narrow
// integer type want, panicking when the value does not fit:
//
//	func() int32 {
//		v := lgamma.MustChooseInt64(int64(n), int64(k))
//		if int64(int32(v)) != v {
//			panic("lgamma.MustChooseInt64(int64(n), int64(k)) overflows int32")
//		}
//		return int32(v)
//	}()
func (b *builder) checked(text string, got, want types.Type) (string, error) {
	name, err := b.typeName(want)
	if err != nil {
		return "", err
	}
	// v may shadow a v of the enclosing code without harm: the operands,
	// on the right of v's definition, are outside its scope.
	v := "v"
	indent := b.indentOf(b.m.Node.Pos())
	msg := strconv.Quote(text + " overflows " + types.TypeString(want, types.RelativeTo(b.pass.Pkg)))
	return fmt.Sprintf("func() %[1]s {\n%[2]s\t%[3]s := %[4]s\n%[2]s\tif %[5]s(%[1]s(%[3]s)) != %[3]s {\n%[2]s\t\tpanic(%[6]s)\n%[2]s\t}\n%[2]s\treturn %[1]s(%[3]s)\n%[2]s}()",
		name, indent, v, text, got, msg), nil
}

// call returns the text of a call of the helper function name on args,
// converted to the type want; where float operands are passed as
// counts, an expression that calls it only where they are integers in
// the helper's domain (countConds).
func (b *builder) call(name string, args []ast.Expr, want types.Type) (string, error) {
	text, conds, err := b.countedCall(name, args, want)
	if err == nil && conds != nil {
		text, err = b.keepAsWritten(text, b.m.Node, conds, true, countsKept)
	}
	return text, err
}

// countedCall returns the text of a call of the helper function name on
// args, converted to the type want, and, where float operands are
// passed as counts, the tests under which it computes the value
// (countConds); nil tests where there are no float counts.
func (b *builder) countedCall(name string, args []ast.Expr, want types.Type) (string, []string, error) {
	sig := helperFunc(name)
	if sig == nil {
		return "", nil, fmt.Errorf("helper has no function %s", name)
	}
	params := sig.Params()
	if len(args) == 0 || !sig.Variadic() && len(args) != params.Len() {
		return "", nil, fmt.Errorf("%s takes %d operands, match has %d", name, params.Len(), len(args))
	}
	texts := make([]string, len(args))
	if classOf(want) == classFloat {
		// Float counts are taken only for a float result (floatcount.go).
		b.counts = &floatCounts{}
		defer func() { b.counts = nil }()
	}
	for i, a := range args {
		pt := params.At(min(i, params.Len()-1)).Type()
		if sig.Variadic() && i >= params.Len()-1 {
			pt = pt.(*types.Slice).Elem()
		}
		t, err := b.arg(a, pt)
		if err != nil {
			return "", nil, err
		}
		texts[i] = t
	}
	text := b.helper(b.m.Node.Pos()) + "." + name + "(" + strings.Join(texts, ", ") + ")"
	got := sig.Results().At(0).Type()
	if classOf(got) != classFloat && b.narrow(want) {
		b.shown = fmt.Sprintf("%s(%s), checked to fit", types.TypeString(want, types.RelativeTo(b.pass.Pkg)), text)
		text, err := b.checked(text, got, want)
		return text, nil, err
	}
	text, err := b.result(text, got, want)
	b.shown = text
	if err != nil || b.counts == nil || len(b.counts.floats) == 0 {
		return text, nil, err
	}
	conds, err := b.countConds(name, texts)
	return text, conds, err
}

// rewrite replaces the match's node with the call of the helper name and
// words the fix's message.
func (b *builder) rewrite(name string, args []ast.Expr) error {
	if b.m.Result == nil {
		return fmt.Errorf("match has no result type")
	}
	if err := b.covered(); err != nil {
		return err
	}
	if err := b.checkShape(); err != nil {
		return err
	}
	return b.replaceByCall(name, args)
}

// replaceByCall replaces the match's node with the call of the helper
// name on args, deletes the definitions it absorbed and words the fix's
// message.
func (b *builder) replaceByCall(name string, args []ast.Expr) error {
	text, err := b.call(name, args, b.m.Result)
	if err != nil {
		return err
	}
	if text, err = b.keepOutsideDomain(text, args); err != nil {
		return err
	}
	b.replace(b.m.Node.Pos(), b.m.Node.End(), text)
	for _, d := range append(b.absorbed, b.m.Chain...) {
		b.deleteStmt(d)
	}
	b.message = b.rewriteMessage()
	return nil
}

// rewriteMessage words the fix of the last call built.
func (b *builder) rewriteMessage() string {
	return fmt.Sprintf("Rewrite as %s (imports %s)", b.shown, HelperPath)
}
