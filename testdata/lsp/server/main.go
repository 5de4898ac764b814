// Command server is a stand-in for "overfact lsp" used by the editor test
// while the real command cannot be built: it serves a test analyzer that
// reports calls of math.Gamma.
package main

import (
	"context"
	"go/ast"
	"os"

	"github.com/overfact/overfact/internal/lsp"
	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/types/typeutil"
)

var gammaCalls = &analysis.Analyzer{
	Name: "gammacalls",
	Doc:  "report calls of math.Gamma",
	Run: func(pass *analysis.Pass) (any, error) {
		for _, f := range pass.Files {
			ast.Inspect(f, func(n ast.Node) bool {
				call, ok := n.(*ast.CallExpr)
				if !ok {
					return true
				}
				if fn := typeutil.StaticCallee(pass.TypesInfo, call); fn == nil || fn.FullName() != "math.Gamma" {
					return true
				}
				pass.Report(analysis.Diagnostic{
					Pos: call.Pos(), End: call.End(), Category: "gamma", Message: "math.Gamma overflows",
					SuggestedFixes: []analysis.SuggestedFix{{Message: "call gammaChecked", TextEdits: []analysis.TextEdit{{Pos: call.Fun.Pos(), End: call.Fun.End(), NewText: []byte("gammaChecked")}}}},
				})
				return true
			})
		}
		return nil, nil
	},
}

func main() {
	if len(os.Args) < 2 || os.Args[1] != "lsp" {
		os.Exit(2)
	}
	if err := lsp.Serve(context.Background(), os.Stdin, os.Stdout, lsp.Options{Analyzers: []*analysis.Analyzer{gammaCalls}, Log: os.Stderr}); err != nil {
		os.Exit(1)
	}
}
