package fixes

import (
	"fmt"
	"go/ast"
	"go/types"
	"strings"
)

// family names the helper functions that compute one quantity, by the
// class of result they return.
type family struct {
	float, signed, unsigned string
}

// pick returns the helper of f that serves a result of type t. Integer
// results need a 64-bit type: the exact helpers return int64 or uint64,
// and converting to a narrower type would wrap silently again.
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
	if c := classOf(t); c != classFloat && b.pass.TypesSizes.Sizeof(t) < 8 {
		return "", fmt.Errorf("result type %s is narrower than the exact helpers' 64 bits", t)
	}
	return name, nil
}

// call returns the text of a call of the helper function name on args,
// converted to the type want.
func (b *builder) call(name string, args []ast.Expr, want types.Type) (string, error) {
	sig := helperFunc(name)
	if sig == nil {
		return "", fmt.Errorf("helper has no function %s", name)
	}
	params := sig.Params()
	if len(args) == 0 || !sig.Variadic() && len(args) != params.Len() {
		return "", fmt.Errorf("%s takes %d operands, match has %d", name, params.Len(), len(args))
	}
	texts := make([]string, len(args))
	for i, a := range args {
		pt := params.At(min(i, params.Len()-1)).Type()
		if sig.Variadic() && i >= params.Len()-1 {
			pt = pt.(*types.Slice).Elem()
		}
		t, err := b.arg(a, pt)
		if err != nil {
			return "", err
		}
		texts[i] = t
	}
	text := b.helper(b.m.Node.Pos()) + "." + name + "(" + strings.Join(texts, ", ") + ")"
	return b.result(text, sig.Results().At(0).Type(), want)
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
	text, err := b.call(name, args, b.m.Result)
	if err != nil {
		return err
	}
	b.replace(b.m.Node.Pos(), b.m.Node.End(), text)
	for _, d := range b.absorbed {
		b.deleteStmt(d)
	}
	b.message = rewriteMessage(text)
	return nil
}

func rewriteMessage(text string) string {
	return fmt.Sprintf("Rewrite as %s (imports %s)", text, HelperPath)
}
