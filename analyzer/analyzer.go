package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"strings"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/fixes"
)

// Analyzer reports overflow-prone factorial arithmetic.
var Analyzer = &analysis.Analyzer{
	Name:             "overfact",
	Doc:              doc,
	URL:              "https://github.com/overfact/overfact",
	Run:              run,
	FactTypes:        []analysis.Fact{new(FactorialFact), new(ValueFact), new(WrongValueFact)},
	RunDespiteErrors: true,
}

var debug bool

// debugOut receives the debug log; tests replace it.
var debugOut io.Writer = os.Stderr

// testHook, when set by a test, runs at the start of each function's
// checks, so that a test can make one of them fail.
var testHook func(ast.Node)

func init() {
	Analyzer.Flags.BoolVar(&debug, "debug", false, "log functions skipped after an internal error to stderr")
}

// checker holds the state of one pass.
type checker struct {
	pass      *analysis.Pass
	fixer     *fixes.Fixer // the package's fixes share it; it dies with the pass
	files     map[*token.File]*fileInfo
	funcs     map[*types.Func]*facFunc // factorial-valued functions of this package
	fnInfo    map[ast.Node]*fnCtx      // per analysed function
	reported  map[reportKey]bool
	consumed  map[*ast.CallExpr]bool // calls already part of a finding
	allFuncs  []ast.Node             // every FuncDecl and FuncLit, in source order
	callIndex map[*types.Func][]*ast.CallExpr
	escapes   map[*types.Func]bool
	// reportedPos holds the positions of reported's keys, sorted, for
	// reportedAt and reportedWithin: findings come in source order, so it
	// grows at its end.
	reportedPos []token.Pos
	// byPos holds allFuncs sorted by position across files, for enclosingFunc.
	byPos []ast.Node
	// tables holds the package's unchanging tables (ranges.PackageTables),
	// found the first time a function is range-analysed.
	tables     map[types.Object]*ast.CompositeLit
	tablesDone bool
	// rewritten holds the nodes that a reported fix replaces, and held
	// the findings whose guard waits for them (holdGuard).
	rewritten []ast.Node
	held      []heldGuard
	// owned holds what categories keep about the pass (passStateOf).
	owned states
}

type reportKey struct {
	pos token.Pos
	cat string
}

// fileInfo is what the checker knows about one file.
type fileInfo struct {
	file      *ast.File
	generated bool
	// cgo marks cgo's rewrite of a user's file: its findings map back to
	// the user's file through //line comments, but its text is not that
	// file's, so no edit computed on it may be offered.
	cgo  bool
	dirs *directives
}

func run(pass *analysis.Pass) (any, error) {
	c := &checker{
		pass:     pass,
		fixer:    fixes.NewFixer(pass),
		files:    make(map[*token.File]*fileInfo),
		funcs:    make(map[*types.Func]*facFunc),
		fnInfo:   make(map[ast.Node]*fnCtx),
		reported: make(map[reportKey]bool),
		consumed: make(map[*ast.CallExpr]bool),
	}
	for _, f := range pass.Files {
		tf := pass.Fset.File(f.Pos())
		if tf == nil {
			continue
		}
		fi := &fileInfo{file: f}
		fi.generated, fi.cgo = judgeGenerated(pass.Fset, f)
		fi.dirs = c.parseDirectives(f, fi.generated)
		c.files[tf] = fi
	}

	// Phase 1: find factorial-valued functions and export their facts, so
	// that phase 2 sees calls of local and imported ones alike.
	scans := c.scanAll(pass.Files)
	funcs := c.allFuncs
	var decls []*ast.FuncDecl
	for _, n := range funcs {
		if d, ok := n.(*ast.FuncDecl); ok && d.Body != nil {
			if s := scans[d]; s.worthProducts() || s.localCall {
				decls = append(decls, d)
			}
		}
	}
	// Tables first: a function that returns a table's element is a
	// factorial function (wrapperOf).
	c.findFactorialTables(scans)
	for _, d := range decls {
		c.guard(d, func() { c.findFactorialFunc(d) })
	}
	for _, d := range decls {
		if c.funcs[c.declObj(d)] == nil {
			s := scans[d]
			c.guard(d, func() { c.findBinomialFunc(d, s.knownCall || s.localCall && len(c.funcs) > 0, s.worthLoops()) })
		}
	}
	c.findValueFacts(decls, scans)
	// Phase 2: report, function by function, only where a cheap syntactic
	// scan found something worth the range analysis.
	for _, n := range funcs {
		s := scans[n]
		// A call of this package's functions may now be a call of a
		// factorial function found in phase 1.
		s.knownCall = s.knownCall || s.localCall && (len(c.funcs) > 0 || passStateOf(c, callStateKey).found())
		if funcBody(n) != nil && s.worth() {
			c.guard(n, func() { c.checkFunc(n, *s) })
		}
		c.forgetRanges(n)
	}
	c.checkWeightReads(funcs)
	c.releaseGuards()
	// Last: the callers of the functions found wrong above.
	c.checkWrongCallers()
	return nil, nil
}

// guard runs f and turns a panic into a skipped function, so that odd
// code never crashes the driver nor yields a bogus finding.
func (c *checker) guard(n ast.Node, f func()) {
	defer func() {
		if r := recover(); r != nil && debug {
			fmt.Fprintf(debugOut, "overfact: %s: skipped function after internal error: %v%s\n", c.pass.Fset.Position(n.Pos()), r, panicSite())
		}
	}()
	f()
}

// panicSite names the innermost function of this module on the stack
// of a panic being recovered, for the -debug log of an internal error.
func panicSite() string {
	pcs := make([]uintptr, 64)
	frames := runtime.CallersFrames(pcs[:runtime.Callers(3, pcs)])
	for {
		f, more := frames.Next()
		if strings.HasPrefix(f.Function, "github.com/overfact/overfact/") {
			return fmt.Sprintf(" (in %s, %s:%d)", f.Function[strings.LastIndex(f.Function, "/")+1:], filepath.Base(f.File), f.Line)
		}
		if !more {
			return ""
		}
	}
}

func funcBody(n ast.Node) *ast.BlockStmt {
	switch n := n.(type) {
	case *ast.FuncDecl:
		return n.Body
	case *ast.FuncLit:
		return n.Body
	}
	return nil
}

// fileOf returns what the checker knows of the file holding pos.
func (c *checker) fileOf(pos token.Pos) *fileInfo {
	tf := c.pass.Fset.File(pos)
	if tf == nil {
		return nil
	}
	return c.files[tf]
}

// declObj returns the function a declaration declares.
func (c *checker) declObj(d *ast.FuncDecl) *types.Func {
	fn, _ := c.pass.TypesInfo.Defs[d.Name].(*types.Func)
	return fn
}
