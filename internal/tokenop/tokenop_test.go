package tokenop

import (
	"go/constant"
	"go/token"
	"testing"
)

// TestOfAssign checks every assignment operator against go/token's own
// spelling: x op= y is x = x op y, so op= is op's text followed by "=".
func TestOfAssign(t *testing.T) {
	for tok := token.ILLEGAL; tok <= token.TILDE; tok++ {
		op := OfAssign(tok)
		s := tok.String()
		isAssign := tok.IsOperator() && len(s) > 1 && s[len(s)-1] == '=' && tok != token.EQL && tok != token.NEQ &&
			tok != token.LEQ && tok != token.GEQ && tok != token.DEFINE
		switch {
		case isAssign && op.String()+"=" != s:
			t.Errorf("OfAssign(%s) = %s", tok, op)
		case !isAssign && op != token.ILLEGAL:
			t.Errorf("OfAssign(%s) = %s, want ILLEGAL", tok, op)
		}
	}
}

// TestNegateFlip checks the comparisons against go/constant's Compare:
// x op y is false exactly where x Negate(op) y is true, and equals
// y Flip(op) x.
func TestNegateFlip(t *testing.T) {
	ops := []token.Token{token.EQL, token.NEQ, token.LSS, token.LEQ, token.GTR, token.GEQ}
	for _, op := range ops {
		for a := int64(-2); a <= 2; a++ {
			for b := int64(-2); b <= 2; b++ {
				x, y := constant.MakeInt64(a), constant.MakeInt64(b)
				if constant.Compare(x, op, y) == constant.Compare(x, Negate(op), y) {
					t.Errorf("%d %s %d and %d %s %d agree", a, op, b, a, Negate(op), b)
				}
				if constant.Compare(x, op, y) != constant.Compare(y, Flip(op), x) {
					t.Errorf("%d %s %d differs from %d %s %d", a, op, b, b, Flip(op), a)
				}
			}
		}
	}
	for _, op := range []token.Token{token.ADD, token.LAND} {
		if Negate(op) != op || Flip(op) != op {
			t.Errorf("%s is not a comparison but was changed", op)
		}
	}
}
