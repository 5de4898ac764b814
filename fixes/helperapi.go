package fixes

import (
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"sync"
)

// helperAPI declares the part of the helper module's API that fixes emit.
// The fixer cannot load the helper itself (user packages rarely import it
// before a fix is applied), so it type-checks rewritten code against these
// declarations. TestHelperAPIMatchesModule checks every signature here
// against the real module, so this copy cannot drift unnoticed.
const helperAPI = `package lgamma

func Choose(n, k int) float64                               { panic("") }
func MustChooseInt64(n, k int64) int64                      { panic("") }
func MustChooseUint64(n, k uint64) uint64                   { panic("") }
func ChooseInt64(n, k int64) (int64, bool)                  { panic("") }
func ChooseUint64(n, k uint64) (uint64, bool)               { panic("") }
func ChooseLoop(n, k int) float64                           { panic("") }
func ChooseFactorials(n, k int) float64                     { panic("") }
func ChooseOrZero(n, k int) float64                         { panic("") }
func Falling(n, k int) float64                              { panic("") }
func MustFallingInt64(n, k int64) int64                     { panic("") }
func MustFallingUint64(n, k uint64) uint64                  { panic("") }
func Multinomial(ks ...int) float64                         { panic("") }
func MustMultinomialInt64(ks ...int64) int64                { panic("") }
func MustFactorialQuotientInt64(num int64, den ...int64) int64 { panic("") }
func FloorFactorialQuotient(num float64, den ...float64) float64 { panic("") }
func Catalan(n int) float64                                 { panic("") }
func MustCatalanInt64(n int64) int64                        { panic("") }
func HypergeometricPMF(k, total, successes, draws int) float64 { panic("") }
func PowOverFactorial(x float64, k int) float64             { panic("") }
func PoissonPMF(k int, lambda float64) float64              { panic("") }
func PoissonTerm(k int, lambda float64) float64             { panic("") }
func PowOverGamma(x, p, a float64) float64                  { panic("") }
func BinomialPMF(k, n int, p float64) float64               { panic("") }
func NegativeBinomialPMF(f, s int, p float64) float64       { panic("") }
func GammaRatio(a, b float64) float64                       { panic("") }
func Factorial(n int) float64                               { panic("") }
func MustFactorialInt64(n int64) int64                      { panic("") }
func MustFactorialUint64(n uint64) uint64                   { panic("") }
func Beta(a, b float64) float64                             { panic("") }
func LogFactorial(n int) float64                            { panic("") }
func LogGamma(x float64) float64                            { panic("") }

type Product struct{ v float64 }

func ProductOf(x float64) Product                          { panic("") }
func CountProduct(v float64) Product                       { panic("") }
func PowProduct(x, p float64) Product                      { panic("") }
func GammaProduct(a float64) Product                       { panic("") }
func ExpProduct(x float64) Product                         { panic("") }
func FactorialProduct(v, n float64) Product                { panic("") }
func (p Product) Mul(q Product) Product                    { panic("") }
func (p Product) Quo(q Product) Product                    { panic("") }
func (p Product) MulFloat(x float64) Product               { panic("") }
func (p Product) QuoFloat(x float64) Product               { panic("") }
func (p Product) Neg() Product                             { panic("") }
func (p Product) Abs() Product                             { panic("") }
func (p Product) Less(q Product) bool                      { panic("") }
func (p Product) Sqrt() Product                            { panic("") }
func (p Product) Float64() float64                         { panic("") }
func ChooseProduct(v, n, k float64) Product                { panic("") }
func (p Product) Log() float64                             { panic("") }
func (p Product) Log2() float64                            { panic("") }
func (p Product) Log10() float64                           { panic("") }

type Sum struct{ v float64 }

func SumOf(x float64) Sum                                  { panic("") }
func (s Sum) Add(p Product) Sum                            { panic("") }
func (s Sum) AddFloat(x float64) Sum                       { panic("") }
func (s Sum) Float64() float64                             { panic("") }
func (s Sum) Log() float64                                 { panic("") }
func (s Sum) Log2() float64                                { panic("") }
func (s Sum) Log10() float64                               { panic("") }
func (s Sum) Product() Product                             { panic("") }
`

// fmtAPI stands in for package fmt when a range guard adds the import to a
// package that does not already depend on it.
const fmtAPI = `package fmt

func Sprintf(format string, a ...any) string { panic("") }
`

var (
	stubOnce  sync.Once
	stubPkgs  map[string]*types.Package
	errStubTC error
)

// stubs returns the type-checked stand-ins, keyed by import path.
func stubs() (map[string]*types.Package, error) {
	stubOnce.Do(func() {
		stubPkgs = make(map[string]*types.Package)
		for path, src := range map[string]string{HelperPath: helperAPI, "fmt": fmtAPI} {
			fset := token.NewFileSet()
			f, err := parser.ParseFile(fset, path+".go", src, 0)
			if err != nil {
				errStubTC = err
				return
			}
			pkg, err := new(types.Config).Check(path, fset, []*ast.File{f}, nil)
			if err != nil {
				errStubTC = err
				return
			}
			stubPkgs[path] = pkg
		}
	})
	return stubPkgs, errStubTC
}

// helperFunc returns the signature of the helper function name.
func helperFunc(name string) *types.Signature {
	pkgs, err := stubs()
	if err != nil {
		return nil
	}
	fn, ok := pkgs[HelperPath].Scope().Lookup(name).(*types.Func)
	if !ok {
		return nil
	}
	return fn.Type().(*types.Signature)
}
