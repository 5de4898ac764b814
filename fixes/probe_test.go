package fixes_test

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"regexp"
	"strings"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/fixes"
)

// probe is a stand-in analyzer for testing the fix builders apart from the
// real analyzer: each comment "// probe:shape(operands)" describes the
// statement on the next line as a Match, and probe reports it with the
// fixes Build returns ("probe shape"), or the reason it refused
// ("probe shape: no fix: why").
//
// Operands are Go expressions found (by their printed form) inside the
// matched expression. Loop probes name the accumulator first, separated by
// a semicolon: probe:binomialloop(b; n, k). A multinomial probe may give
// n apart after a semicolon: probe:multinomial(a, b; n). A factorial probe
// computes the first bad value itself (with math/big), as the analyzer
// hands it over from its thresholds.
var probe = &analysis.Analyzer{
	Name: "probe",
	Doc:  "describe marked statements as fix matches",
	Run:  runProbe,
}

var probeComment = regexp.MustCompile(`^//\s*probe:(\w+)\((.*)\)\s*$`)

var probeShapes = map[string]fixes.Shape{
	"factorial":      fixes.ShapeFactorial,
	"binomial":       fixes.ShapeBinomial,
	"permutation":    fixes.ShapePermutation,
	"multinomial":    fixes.ShapeMultinomial,
	"catalan":        fixes.ShapeCatalan,
	"hypergeometric": fixes.ShapeHypergeometric,
	"powfact":        fixes.ShapePowOverFactorial,
	"poisson":        fixes.ShapePoisson,
	"binompmf":       fixes.ShapeBinomialPMF,
	"gammaratio":     fixes.ShapeGammaRatio,
	"beta":           fixes.ShapeBeta,
	"binomialloop":   fixes.ShapeBinomialLoop,
	"fallingloop":    fixes.ShapeFallingLoop,
	"modelloop":      fixes.ShapeModelBinomLoop,
	"gamma":          fixes.ShapeGamma,
}

func runProbe(pass *analysis.Pass) (any, error) {
	fx := fixes.NewFixer(pass)
	for _, f := range pass.Files {
		for _, cg := range f.Comments {
			for _, c := range cg.List {
				sub := probeComment.FindStringSubmatch(c.Text)
				if sub == nil {
					continue
				}
				m, err := probeMatch(pass, f, pass.Fset.Position(c.Pos()).Line+1, sub[1], sub[2])
				if err != nil {
					pass.Reportf(c.Pos(), "bad probe: %v", err)
					continue
				}
				found, err := fx.Build(m)
				msg := "probe " + sub[1]
				if err != nil {
					msg += ": no fix: " + err.Error()
				}
				pass.Report(analysis.Diagnostic{Pos: m.Node.Pos(), Message: msg, SuggestedFixes: found})
			}
		}
	}
	return nil, nil
}

func probeMatch(pass *analysis.Pass, f *ast.File, line int, shape, operands string) (fixes.Match, error) {
	m := fixes.Match{Shape: probeShapes[shape], File: f}
	if m.Shape == fixes.ShapeNone {
		return m, fmt.Errorf("unknown shape %q", shape)
	}
	head, tail, semi := strings.Cut(operands, ";")
	switch m.Shape {
	case fixes.ShapeFactorial:
		return factorialMatch(pass, m, line, head)
	case fixes.ShapeBinomialLoop, fixes.ShapeFallingLoop, fixes.ShapeModelBinomLoop:
		if !semi {
			return m, fmt.Errorf("loop probe needs the accumulator")
		}
		// A model loop comes with the analyzer's word for its domain,
		// k ≥ 0 included (the probe package's loops are described so).
		m.CountNonNeg = m.Shape == fixes.ShapeModelBinomLoop
		return loopMatch(pass, m, line, strings.TrimSpace(head), tail)
	}
	e := exprAt(pass.Fset, f, line)
	if e == nil {
		return m, fmt.Errorf("no expression on line %d", line)
	}
	m.Node, m.Result = e, pass.TypesInfo.TypeOf(e)
	var err error
	if m.Args, err = findAll(e, head); err != nil {
		// Operands may sit in the definitions of locals the expression
		// reads: look in the whole function.
		if m.Args, err = findAll(enclosingFunc(f, e), head); err != nil {
			return m, err
		}
	}
	if semi {
		m.Extra, err = findAll(e, tail)
	}
	return m, err
}

func factorialMatch(pass *analysis.Pass, m fixes.Match, line int, param string) (fixes.Match, error) {
	var fn ast.Node
	ast.Inspect(m.File, func(n ast.Node) bool {
		switch n.(type) {
		case *ast.FuncDecl, *ast.FuncLit:
			if fn == nil && pass.Fset.Position(n.Pos()).Line == line {
				fn = n
			}
		}
		return fn == nil
	})
	if fn == nil {
		return m, fmt.Errorf("no function on line %d", line)
	}
	var sig *types.Signature
	switch f := fn.(type) {
	case *ast.FuncDecl:
		m.Node = f.Name
		sig = pass.TypesInfo.Defs[f.Name].Type().(*types.Signature)
	case *ast.FuncLit:
		m.Node = f
		sig = pass.TypesInfo.TypeOf(f).(*types.Signature)
	}
	m.Func = fn
	for i := 0; i < sig.Params().Len(); i++ {
		if p := sig.Params().At(i); p.Name() == param {
			m.Param = p
		}
	}
	if sig.Results().Len() == 0 || m.Param == nil {
		return m, fmt.Errorf("function has no parameter %s or no result", param)
	}
	m.Result = sig.Results().At(0).Type()
	m.FirstBad = firstBadFactorial(pass.TypesSizes, m.Result)
	return m, nil
}

// firstBadFactorial is the smallest n whose n! does not fit t, found with
// exact big-number arithmetic (math/big) independently of the thresholds
// package: 21 for int64 (OEIS A000142), 171 for float64.
func firstBadFactorial(sizes types.Sizes, t types.Type) int64 {
	limit := new(big.Float)
	b := t.Underlying().(*types.Basic)
	bits := uint(8 * sizes.Sizeof(t))
	switch {
	case b.Info()&types.IsFloat != 0 && b.Kind() == types.Float32:
		limit.SetFloat64(math.MaxFloat32)
	case b.Info()&types.IsFloat != 0:
		limit.SetFloat64(math.MaxFloat64)
	case b.Info()&types.IsUnsigned != 0:
		limit.SetInt(new(big.Int).Sub(new(big.Int).Lsh(big.NewInt(1), bits), big.NewInt(1)))
	default:
		limit.SetInt(new(big.Int).Sub(new(big.Int).Lsh(big.NewInt(1), bits-1), big.NewInt(1)))
	}
	f := big.NewInt(1)
	for n := int64(1); ; n++ {
		f.Mul(f, big.NewInt(n))
		if new(big.Float).SetInt(f).Cmp(limit) > 0 {
			return n
		}
	}
}

func loopMatch(pass *analysis.Pass, m fixes.Match, line int, acc, operands string) (fixes.Match, error) {
	var loop ast.Stmt
	var list []ast.Stmt
	ast.Inspect(m.File, func(n ast.Node) bool {
		if b, ok := n.(*ast.BlockStmt); ok && loop == nil {
			for _, s := range b.List {
				switch s.(type) {
				case *ast.ForStmt, *ast.RangeStmt:
					if pass.Fset.Position(s.Pos()).Line == line {
						loop, list = s, b.List
					}
				}
			}
		}
		return loop == nil
	})
	if loop == nil {
		return m, fmt.Errorf("no for statement on line %d", line)
	}
	m.Node, m.Loop = loop, loop
	ast.Inspect(m.File, func(n ast.Node) bool {
		if d, ok := n.(*ast.FuncDecl); ok && d.Pos() <= loop.Pos() && loop.End() <= d.End() {
			m.Func = d
		}
		return m.Func == nil
	})
	_, m.Acc = pass.Pkg.Scope().Innermost(loop.Pos()).LookupParent(acc, loop.Pos())
	if m.Acc == nil {
		return m, fmt.Errorf("no accumulator %s", acc)
	}
	m.Result = m.Acc.Type()
	for _, s := range list {
		if s == loop {
			break
		}
		if assigns(pass.TypesInfo, s, m.Acc) {
			m.AccInit = s
		}
	}
	var err error
	m.Args, err = findAll(loop, operands)
	return m, err
}

func assigns(info *types.Info, s ast.Stmt, obj types.Object) bool {
	switch s := s.(type) {
	case *ast.AssignStmt:
		for _, l := range s.Lhs {
			if id, ok := l.(*ast.Ident); ok && info.ObjectOf(id) == obj {
				return true
			}
		}
	case *ast.DeclStmt:
		for _, sp := range s.Decl.(*ast.GenDecl).Specs {
			if v, ok := sp.(*ast.ValueSpec); ok {
				for _, id := range v.Names {
					if info.Defs[id] == obj {
						return true
					}
				}
			}
		}
	}
	return false
}

func enclosingFunc(f *ast.File, e ast.Expr) ast.Node {
	var fn ast.Node = f
	ast.Inspect(f, func(n ast.Node) bool {
		if d, ok := n.(*ast.FuncDecl); ok && d.Pos() <= e.Pos() && e.End() <= d.End() {
			fn = d.Body
		}
		return true
	})
	return fn
}

// exprAt returns the value of the return, assignment or declaration that
// starts on line.
func exprAt(fset *token.FileSet, f *ast.File, line int) ast.Expr {
	var e ast.Expr
	ast.Inspect(f, func(n ast.Node) bool {
		if e != nil || n == nil {
			return false
		}
		if s, ok := n.(ast.Stmt); ok && fset.Position(s.Pos()).Line == line {
			switch s := s.(type) {
			case *ast.ReturnStmt:
				e = s.Results[0]
			case *ast.AssignStmt:
				e = s.Rhs[0]
			case *ast.DeclStmt:
				e = s.Decl.(*ast.GenDecl).Specs[0].(*ast.ValueSpec).Values[0]
			}
		}
		return true
	})
	return e
}

// findAll finds each comma-separated expression of list inside root.
func findAll(root ast.Node, list string) ([]ast.Expr, error) {
	var out []ast.Expr
	for _, text := range strings.Split(list, ",") {
		want, err := parser.ParseExpr(strings.TrimSpace(text))
		if err != nil {
			return nil, err
		}
		var found ast.Expr
		ast.Inspect(root, func(n ast.Node) bool {
			if e, ok := n.(ast.Expr); ok && found == nil && types.ExprString(e) == types.ExprString(want) {
				found = e
			}
			return found == nil
		})
		if found == nil {
			return nil, fmt.Errorf("operand %s not found", text)
		}
		out = append(out, found)
	}
	return out, nil
}
