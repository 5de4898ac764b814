package valuemodel

import (
	"go/ast"
	"testing"
)

// TestLogGammaOption checks that a call Options.LogGamma names is read
// as ln Γ of its argument, so that exp of differences of such calls is
// the Γ ratio they stand for (C(n, k) = Γ(n+1)/(Γ(k+1)Γ(n−k+1)), common
// practice), and that without the option the same code stays unknown.
func TestLogGammaOption(t *testing.T) {
	src := `func lg(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

func f(n, k int) float64 {
	return math.Exp(lg(float64(n)+1) - lg(float64(k)+1) - lg(float64(n-k)+1))
}`
	info, fd := load(t, src, "f")
	isLg := func(call *ast.CallExpr) bool {
		id, ok := call.Fun.(*ast.Ident)
		return ok && id.Name == "lg"
	}
	res := Evaluate(info, fd, Options{LogGamma: isLg})
	if got := Recognise(returned(res, fd)).String(); got != "C(n, k)" {
		t.Errorf("with the option: %q, want C(n, k)", got)
	}
	res = Evaluate(info, fd, Options{})
	if got := returned(res, fd); got != nil {
		t.Errorf("without the option: %v, want unknown", got)
	}
}
