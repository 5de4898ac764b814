// Package tokenop maps Go's operator tokens to one another: an
// assignment operator to its binary operator, a comparison to its
// negation and to its mirror image. The analyzer's range analysis
// (analyzer/ranges) and its value model (analyzer/valuemodel) read the
// same statements and conditions; both are leaves of the module, so the
// mapping they share lives here, in a package that imports nothing of
// the project.
package tokenop

import "go/token"

// OfAssign returns the binary operator of the assignment operator tok
// (token.ADD for token.ADD_ASSIGN), or token.ILLEGAL when tok is none.
func OfAssign(tok token.Token) token.Token {
	switch tok {
	case token.ADD_ASSIGN:
		return token.ADD
	case token.SUB_ASSIGN:
		return token.SUB
	case token.MUL_ASSIGN:
		return token.MUL
	case token.QUO_ASSIGN:
		return token.QUO
	case token.REM_ASSIGN:
		return token.REM
	case token.AND_ASSIGN:
		return token.AND
	case token.OR_ASSIGN:
		return token.OR
	case token.XOR_ASSIGN:
		return token.XOR
	case token.SHL_ASSIGN:
		return token.SHL
	case token.SHR_ASSIGN:
		return token.SHR
	case token.AND_NOT_ASSIGN:
		return token.AND_NOT
	}
	return token.ILLEGAL
}

// Negate returns the comparison that holds where op does not (NaN aside,
// for floats); any other token is returned as it is.
func Negate(op token.Token) token.Token {
	switch op {
	case token.EQL:
		return token.NEQ
	case token.NEQ:
		return token.EQL
	case token.LSS:
		return token.GEQ
	case token.LEQ:
		return token.GTR
	case token.GTR:
		return token.LEQ
	case token.GEQ:
		return token.LSS
	}
	return op
}

// Flip turns the comparison x op y into y op' x; any other token is
// returned as it is.
func Flip(op token.Token) token.Token {
	switch op {
	case token.LSS:
		return token.GTR
	case token.LEQ:
		return token.GEQ
	case token.GTR:
		return token.LSS
	case token.GEQ:
		return token.LEQ
	}
	return op
}
