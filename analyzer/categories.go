package analyzer

import "strings"

// A category names one pattern the analyzer reports. A finding whose
// overflow is certain for every input the code can see carries the
// pattern's ID followed by definiteSuffix; a finding that overflows only
// for inputs nothing rules out carries the bare ID.
const (
	catLoop       = "factorial-loop"
	catRecursion  = "factorial-recursion"
	catCall       = "factorial-call"
	catRatio      = "factorial-ratio"
	catBinomLoop  = "binomial-loop"
	catPascal     = "pascal-rule"
	catPowOverFac = "power-over-factorial"
	catGammaRatio = "gamma-ratio"
	catGamma      = "gamma-overflow"
	catLateConv   = "late-conversion"
	catDirective  = "directive"
	catLgammaSign = "lgamma-sign"
	catStirling   = "stirling-approximation"

	catLgammaDigits   = "lgamma-digits"
	catLgammaInteger  = "lgamma-integer"
	catLgammaOverflow = "lgamma-overflow"

	catWrongCallee = "wrong-callee"

	definiteSuffix = ".definite"
)

// baseURL is the pattern list of the project README; each category is an
// anchor in it.
const baseURL = "https://github.com/overfact/overfact#"

// CategoryInfo describes one category for report writers such as SARIF.
type CategoryInfo struct {
	ID    string // the Diagnostic.Category value
	Title string // a one-sentence description
	Help  string // the URL of the category's section in the README
}

// patterns lists every pattern category with its description, in the order
// of the README.
var patterns = []struct{ id, title string }{
	{catLoop, "A loop multiplies an accumulator by its induction variable (a factorial, double, falling or rising factorial) and the product exceeds its type."},
	{catRecursion, "A recursive function returns n times itself at n-1 and the factorial exceeds its result type."},
	{catCall, "A call of a factorial-valued function receives an argument whose factorial cannot fit the result type, or a float factorial or binomial value that can be +Inf reaches a logarithm that is finite."},
	{catRatio, "A binomial, permutation, multinomial, Catalan or hypergeometric value is computed as a ratio of factorials whose numerator overflows first."},
	{catBinomLoop, "A multiplicative binomial loop overflows in its intermediate product before the division, even where the coefficient fits."},
	{catPascal, "A count built by a triangle rule, a binomial coefficient by Pascal's rule C(n, k) = C(n-1, k-1) + C(n-1, k), a Stirling number by k·S(n-1, k) + S(n-1, k-1) or a Bell number by the Bell triangle, in a recursion or a table, or a table of counts filled by additions row by row (Pascal's row in place, subsets by their sum, partitions), wraps in an integer type once the count leaves it."},
	{catPowOverFac, "A power-over-factorial term such as x^k/k! (Poisson, Erlang, Taylor series) divides two values that overflow separately."},
	{catGammaRatio, "A ratio or product of math.Gamma values (Beta function, Student-t constant) overflows in a Gamma call although the result is finite."},
	{catGamma, "math.Gamma receives an argument not bounded below the point where it returns +Inf."},
	{catLateConv, "A factorial is converted to another type after it has already wrapped or lost exactness."},
	{catLgammaSign, "math.Exp of a math.Lgamma value whose sign was dropped stands for Γ(x) where Γ(x) can be negative."},
	{catStirling, "A hand-written Stirling approximation stands for n!: it is off by about 1/(12n) relative, and its power n^n can overflow before n! does."},
	{catLgammaDigits, "math.Exp of a sum or difference of log-gamma values (a binomial, Beta or gamma ratio) loses more digits than the tolerance allows over the argument's range."},
	{catLgammaInteger, "An exponential of log-gamma values, or math.Gamma, is converted or rounded to an integer that comes out wrong."},
	{catLgammaOverflow, "math.Exp of a log-gamma value is +Inf where the expression it feeds is finite."},
	{catWrongCallee, "A function returns, or builds its result from, the value of a call whose callee is reported wrong for inputs this caller does not rule out; the callee's fix makes it right."},
}

// Categories returns every category the analyzer can emit: each pattern in
// its possible and its definite form, and the category of malformed
// directives. (factorial-call's possible form is only the logarithm of
// a float factorial or binomial call, checkLogOfValue.)
func Categories() []CategoryInfo {
	var out []CategoryInfo
	for _, p := range patterns {
		out = append(out,
			CategoryInfo{ID: p.id, Title: p.title, Help: baseURL + p.id},
			CategoryInfo{ID: p.id + definiteSuffix, Title: "Certain for every input the code allows: " + lowerFirst(p.title), Help: baseURL + p.id})
	}
	out = append(out, CategoryInfo{ID: catDirective, Title: "An //overfact: directive is malformed, lacks its reason or names an unknown verb.", Help: baseURL + catDirective})
	return out
}

// isDefinite reports whether a category is the definite form of a pattern:
// its overflow is certain for every input the code allows.
func isDefinite(category string) bool {
	return strings.HasSuffix(category, definiteSuffix)
}

// Severities of findings, in the words SARIF uses for its levels.
const (
	SeverityError   = "error"   // a definite finding
	SeverityWarning = "warning" // a possible one
)

// Severity returns how serious a finding of the category is: definite
// findings are errors, the others warnings. Every report writer (SARIF,
// the language server) takes its levels from here.
func Severity(category string) string {
	if isDefinite(category) {
		return SeverityError
	}
	return SeverityWarning
}

// fixesLast holds the patterns found at a factorial's definition. Their
// fix is a range guard, which makes every caller's ratio or term silent
// without rewriting it; a fixing driver applies them only in a round
// where no other fix is left, so that the rewrites come first.
var fixesLast = map[string]bool{catLoop: true, catRecursion: true}

// FixesLast reports whether the fixes of a category's findings wait until
// no other finding has a fix to apply (see fixesLast).
func FixesLast(category string) bool {
	return fixesLast[strings.TrimSuffix(category, definiteSuffix)]
}

// categoryURL returns the README anchor of a category, definite or not.
func categoryURL(cat string) string {
	return baseURL + strings.TrimSuffix(cat, definiteSuffix)
}

func lowerFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToLower(s[:1]) + s[1:]
}
