// Package fixes builds the suggested fixes that overfact attaches to its
// findings: rewrites of factorial arithmetic into calls of the helper module
// github.com/overfact/overfact/fixes/lgamma, and range guards where no
// rewrite can make a result fit its type.
//
// The analyzer describes what it matched with a Match and calls Suggest;
// this package never imports the analyzer, so the two evolve separately.
package fixes

import (
	"go/ast"
	"go/types"
)

// HelperPath is the import path of the helper module rewritten code imports.
const HelperPath = "github.com/overfact/overfact/fixes/lgamma"

// Shape names the arithmetic the analyzer recognised.
type Shape int

const (
	ShapeNone             Shape = iota
	ShapeFactorial              // a standalone factorial or double factorial (loop, recursion or call) whose value is returned or stored
	ShapeBinomial               // n!/(k!(n-k)!)                       Args: n, k
	ShapePermutation            // n!/(n-k)!                           Args: n, k
	ShapeMultinomial            // n!/(k1!k2!...km!)                   Args: k1..km (n is their sum), or Extra[0]=n when given separately (fixes checks that n = k1+...+km)
	ShapeCatalan                // (2n)!/((n+1)!n!)                    Args: n
	ShapeHypergeometric         // C(K,k)C(N-K,n-k)/C(N,n)             Args: k, N, K, n
	ShapePowOverFactorial       // x^k/k!                              Args: x, k
	ShapePoisson                // x^k*exp(-x)/k!                      Args: k, lambda
	ShapeBinomialPMF            // C(n,k) p^k (1-p)^(n-k)              Args: k, n, p
	ShapeGammaRatio             // Γ(a)/Γ(b)                           Args: a, b
	ShapeBeta                   // Γ(a)Γ(b)/Γ(a+b)                     Args: a, b
	ShapeBinomialLoop           // b = b*(n-k+i)/i loop                Args: n, k
	ShapeFallingLoop            // n(n-1)...(n-k+1) loop               Args: n, k
	ShapeGamma                  // a bare math.Gamma(x)                Args: x
	ShapeFactorialValue         // T(f(n)): a factorial call converted  Args: n (f's value is n! exactly)
	ShapeInverseBeta            // Γ(a+b)/(Γ(a)Γ(b)) = 1/B(a,b)       Args: a, b
	ShapeSeriesTerm             // num/acc, acc = k! kept by the loop   Node: the term; Acc, Loop: the running factorial (the fixer reads num itself)
	ShapeModelBinomLoop         // a loop the value model reads as C(n,k) Args: n, k (the analyzer vouches for the trip count and the domain; see buildModelLoop)
	ShapeNegBinomialPMF         // C(f+s-1,f) p^s (1-p)^f              Args: f, s, p
	ShapeLgammaSign             // math.Exp(v ± …) of math.Lgamma values whose signs are dropped  Node: the Exp call; Args: the blank or unread sign identifiers
	ShapeStirling               // √(2πn)(n/e)^n standing for n!      Node: the expression; Args: n (the analyzer vouches for the form)
	ShapeLogStirling            // (n+½)ln n − n + ½ln 2π for ln n!    Node: the expression; Args: n (the analyzer vouches for the form)
	ShapeExpChoose              // exp(lg(n+1) − lg(k+1) − lg(n−k+1)), as a product of exps too  Args: n, k (lg: a function the analyzer vouches returns ln|Γ|)
	ShapeExpBeta                // exp(lg(a) + lg(b) − lg(a+b))        Args: a, b
	ShapeExpGammaRatio          // exp(lg(a) − lg(b))                  Args: a, b
	ShapeExpFactorial           // exp(lg(n+1)) or math.Gamma(n+1), under a conversion or rounding  Args: n
	ShapeExpBinomialPMF         // exp(lg(n+1) − lg(k+1) − lg(n−k+1) + k·ln p + (n−k)·ln(1−p)), powers as factors too  Args: k, n, p
	ShapeModelSeriesTerm        // num/acc in a loop, acc = k! there     Node: the quotient; Args: x, k of math.Pow(x, k) in num; Extra[0]: that call; Acc, Loop (the analyzer vouches for acc's value; see buildModelSeriesTerm)
	ShapeModelPoissonRun        // p := math.Exp(−λ); p *= λ/k in a loop  Node: the update statement; Args: k (the loop's counter, whole-numbered), λ; Acc, Loop (the analyzer vouches that p is λ^k·e^(−λ)/k! after it; see buildModelPoissonRun)
	ShapeGammaRatioAmong        // Γ(a)·X/(Y·Γ(b)), X and Y other factors  Node: the product; Args: a, b; Extra: the two math.Gamma calls (see buildGammaRatioAmong)
	ShapePowOverGamma           // math.Pow(x, p)/math.Gamma(a)          Args: x, p, a
	ShapeLogSpaceTerm           // a series term over running products    Node: the term; Args: its parts (the variables carried as lgamma.Product, math.Pow calls); Func (see buildLogSpaceTerm)
	ShapeProductChain           // a product of math.Pow and math.Gamma values  Node: the product (see buildProductChain)
	ShapeLoopGuard              // an integer product loop whose product, times a positive constant, is the function's result  Loop: the loop; Param, FirstBad: the range guard put before it (see buildLoopGuard)
	ShapePascalGuard            // f(n-1, k-1) + f(n-1, k) in an integer type  Node: the statement that sums; Args: the parameters n, k as declared (r, c of C(r+c, r) with PathCount); Func (see buildPascalGuard)
	ShapeModelFallingLoop       // a loop the value model reads as n!/(n-k)!  Args: n, k (the analyzer vouches for the trip count; see buildModelLoop)
	ShapeLogSum                 // math.Log(s) of a float sum s += term   Node: the math.Log, Log2 or Log10 call; Acc: s; Binomials (see buildLogSum)
	ShapeLogOfValue             // math.Log(f(n)) of a float factorial or binomial function's call  Node: the math.Log, Log2 or Log10 call; Factorials or Binomials: that call (see buildLogOfValue)
	ShapeRunSum                 // s += term of a running term, read after the loop as a product with s  Node: that read; Acc: s; Args: the running terms (see buildRunSum)
	ShapeLoopQuotient           // num/den after num *= n − i over k trips and den *= i up to k  Node: the quotient; Args: n, k; Acc, AccInit, Loop: num's; Divisor: den's (see buildLoopQuotient)
	ShapeBinomialValue          // T(f(n, k)) of an integer binomial function of known form, T a float type  Node: the conversion; IntBinomials: the call (see buildBinomialValue)
)

// Match is what the analyzer found, in the terms a fix needs.
type Match struct {
	Shape Shape
	File  *ast.File // the file holding Node
	// Node is the expression (for ratios and terms) or statement (for
	// loops) whose value the fix replaces.
	Node ast.Node
	// Args are the shape's operands as they appear in the source, in the
	// order documented beside each Shape.
	Args  []ast.Expr
	Extra []ast.Expr
	// Result is the type of the value the original code computes.
	Result types.Type

	// For loop shapes: the accumulator, the statement that initialises it
	// (nil when it is a parameter or named result) and the loop itself.
	Acc     types.Object
	AccInit ast.Stmt
	Loop    ast.Stmt
	// CountNonNeg, for the binomial and falling-factorial loops, tells
	// that the number of factors (Args[1]) is never negative where the
	// loop starts. Otherwise the rewrite keeps what a loop that runs no
	// trip leaves, its accumulator at 1, where the helper would say 0 or
	// panic for k < 0.
	CountNonNeg bool
	// EmptyBelow, for the ratio shapes, tells that every factorial
	// function the expression calls (with one argument each) returns 1,
	// the empty product, for every negative argument and n! otherwise, so
	// that outside the helper's domain the expression's value is the
	// exact quotient lgamma.MustFactorialQuotientInt64 of the calls'
	// arguments, with no need to call the functions themselves. For the
	// term shapes (ShapePoisson, ShapePowOverFactorial) it tells the same
	// of the divisor's function, whose call is Factorials[0].
	EmptyBelow bool
	// Floor, for the ratio shapes, tells that every
	// factorial function returns ⌊x⌋! for every x, fractions included
	// (a loop from 2 up to x by one): outside the helper's domain a float
	// expression's value is lgamma.FloorFactorialQuotient of the calls'
	// arguments, which no factorial's overflow turns into NaN.
	Floor bool
	// NonNeg holds the operands (Args, and the integer inside a
	// conversion float64(k)) that the analyzer's range analysis shows
	// are never negative where they are evaluated (a loop counter from
	// 0): a test of the helper's domain leaves out their k < 0.
	NonNeg map[ast.Expr]bool
	// Factorials, for ShapeProductChain, are the calls among the
	// expression's factors of functions that return a factorial, each
	// with the count it is the factorial of: the chain carries each as
	// lgamma.FactorialProduct(call, count), the code's own value with
	// ln count! beside it. For the term shapes with EmptyBelow it is the
	// divisor's one call.
	Factorials []FactorialCall
	// Binomials, for ShapeLogSum, are the calls among the summed terms'
	// factors of functions that return C(N, K), as the analyzer's facts
	// say: the sum carries each as lgamma.ChooseProduct(call, N, K), the
	// code's own value with ln C(N, K) beside it.
	Binomials []BinomialCall
	// IntBinomials maps the calls in Node of integer functions whose
	// value is C(n, k) in a form known outside 0 ≤ k ≤ n too to their
	// operands and form. A float expression kept as written where the
	// operands leave a helper's domain takes those calls' values from the
	// float helper of the form (lgamma.ChooseLoop, ChooseFactorials)
	// instead of calling them: the functions' own fixes panic where
	// C(n, k) leaves their integer type, where the original float64(…)
	// of the call had a value.
	IntBinomials map[*ast.CallExpr]IntBinomial
	// Vouched is a variable Node reads whose value there the analyzer
	// shows is the factor the shape's check expects in its place,
	// wherever the expression is in the helper's domain: the coefficient
	// C(n, k) of a binomial probability (a local a binomial loop
	// multiplied up), the power x^k of a power over a factorial or a
	// Poisson term (a loop's running product x·x·…·x). The check takes
	// it as that factor, and the rewrite keeps it for the expression as
	// written outside the domain.
	Vouched ast.Expr
	// CoefficientLoop, where Coefficient is the accumulator of a
	// binomial loop the model reads, is that loop's own match
	// (ShapeModelBinomLoop), which the fix rewrites too.
	CoefficientLoop *Match
	// Divisor, for ShapeLoopQuotient, is the factorial loop whose
	// accumulator the quotient divides by: its Acc, AccInit and Loop.
	Divisor *Match
	// Chain, when Node is the value first assigned to a variable r
	// (r := fact(n)), holds the statements right after it that complete
	// the match's value, r /= fact(k), r *= …: their right sides are
	// further factors (divisors for /=), and the rewrite deletes them.
	Chain []ast.Stmt

	// For ShapeFactorial and ShapeLoopGuard: the enclosing function, the
	// parameter whose range decides overflow, and the first bad value of
	// that parameter.
	Func     ast.Node // *ast.FuncDecl or *ast.FuncLit
	Param    types.Object
	FirstBad int64
	// EntryGuard, for ShapeFactorial, tells that the analyzer's range
	// analysis shows the guard on Param's value at the function's entry
	// exact although the function assigns Param later (a clamp before
	// the product, or the loop counting Param itself down from its
	// entry value): it fires exactly where the product leaves the type.
	EntryGuard bool
	// PathCount, for ShapePascalGuard, tells that Args are r and c of
	// lattice paths f(r-1, c) + f(r, c-1), whose value is C(r+c, r).
	PathCount bool
}

// A FactorialCall is a call of a function that returns (Arg+Off)!, as
// the analyzer's facts say.
type FactorialCall struct {
	Call *ast.CallExpr
	Arg  ast.Expr
	Off  int64
}

// A BinomialCall is a call of a function that returns C(N, K), as the
// analyzer's facts say.
type BinomialCall struct {
	Call *ast.CallExpr
	N, K ast.Expr
}

// IntBinomial is a call of an integer binomial function
// (Match.IntBinomials): its operands n and k, and its form.
type IntBinomial struct {
	N, K ast.Expr
	Form BinomialForm
}

// A BinomialForm says what an integer binomial function computes
// outside 0 ≤ k ≤ n too, in integers that do not wrap; each form has
// the float helper that computes the same (binomialFormHelpers).
type BinomialForm int

const (
	// FormFactorials: n!/(k!(n−k)!) over factorial functions that return
	// 1 below 2, rounded toward zero.
	FormFactorials BinomialForm = iota
	// FormLoop: the multiplicative loop from 1 over k trips, the
	// generalised C(n, k) for k ≥ 0 and 1 for k < 0.
	FormLoop
	// FormZero: 0 wherever k < 0 or k > n (the function returns 0 there
	// before it computes anything), C(n, k) elsewhere.
	FormZero
)
