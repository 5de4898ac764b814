// Package fuzz checks overfact against generated and mutated Go sources:
// the analyzer must not panic, and every suggested fix it offers must leave
// code that parses and type-checks.
//
// The package holds a minimal go/analysis driver for one in-memory
// package, so that a fuzz execution costs a parse, a type-check and an
// analysis, without go/packages or the go command.
package fuzz

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"os"
	"reflect"

	"golang.org/x/tools/go/analysis"
)

// Package is one type-checked in-memory package.
type Package struct {
	Fset  *token.FileSet
	Files []*ast.File
	Src   map[string][]byte // file name -> content
	Types *types.Package
	Info  *types.Info
}

// Run runs a, after what it requires, on pkg and returns a's diagnostics.
// Facts about other packages are never present (dependencies are not
// analysed), which is what an analyzer sees for any package without
// factorial code of its own.
func Run(a *analysis.Analyzer, pkg *Package) ([]analysis.Diagnostic, error) {
	if err := analysis.Validate([]*analysis.Analyzer{a}); err != nil {
		return nil, err
	}
	r := &runner{pkg: pkg, results: map[*analysis.Analyzer]any{},
		objFacts: map[objKey]analysis.Fact{}, pkgFacts: map[pkgKey]analysis.Fact{}}
	if _, err := r.run(a); err != nil {
		return nil, err
	}
	return r.diags[a], nil
}

type objKey struct {
	obj types.Object
	t   string
}

type pkgKey struct {
	pkg *types.Package
	t   string
}

type runner struct {
	pkg      *Package
	results  map[*analysis.Analyzer]any
	diags    map[*analysis.Analyzer][]analysis.Diagnostic
	objFacts map[objKey]analysis.Fact
	pkgFacts map[pkgKey]analysis.Fact
}

func factName(f analysis.Fact) string { return fmt.Sprintf("%T", f) }

func (r *runner) run(a *analysis.Analyzer) (any, error) {
	if res, ok := r.results[a]; ok {
		return res, nil
	}
	resultOf := map[*analysis.Analyzer]any{}
	for _, req := range a.Requires {
		res, err := r.run(req)
		if err != nil {
			return nil, fmt.Errorf("%s: %v", req.Name, err)
		}
		resultOf[req] = res
	}
	if r.diags == nil {
		r.diags = map[*analysis.Analyzer][]analysis.Diagnostic{}
	}
	p := r.pkg
	pass := &analysis.Pass{
		Analyzer:   a,
		Fset:       p.Fset,
		Files:      p.Files,
		Pkg:        p.Types,
		TypesInfo:  p.Info,
		TypesSizes: types.SizesFor("gc", "amd64"),
		ResultOf:   resultOf,
		Module:     &analysis.Module{Path: "example.com/fuzz", GoVersion: "1.26"},
		Report:     func(d analysis.Diagnostic) { r.diags[a] = append(r.diags[a], d) },
		ReadFile: func(name string) ([]byte, error) {
			if b, ok := p.Src[name]; ok {
				return b, nil
			}
			return nil, os.ErrNotExist
		},
		ImportObjectFact: func(obj types.Object, f analysis.Fact) bool {
			return copyFact(r.objFacts[objKey{obj, factName(f)}], f)
		},
		ExportObjectFact: func(obj types.Object, f analysis.Fact) {
			if obj.Pkg() != p.Types {
				panic(fmt.Sprintf("fact exported about %v, not in package %s", obj, p.Types.Path()))
			}
			r.objFacts[objKey{obj, factName(f)}] = f
		},
		ImportPackageFact: func(pkg *types.Package, f analysis.Fact) bool {
			return copyFact(r.pkgFacts[pkgKey{pkg, factName(f)}], f)
		},
		ExportPackageFact: func(f analysis.Fact) { r.pkgFacts[pkgKey{p.Types, factName(f)}] = f },
		AllObjectFacts: func() []analysis.ObjectFact {
			var out []analysis.ObjectFact
			for k, f := range r.objFacts {
				out = append(out, analysis.ObjectFact{Object: k.obj, Fact: f})
			}
			return out
		},
		AllPackageFacts: func() []analysis.PackageFact {
			var out []analysis.PackageFact
			for k, f := range r.pkgFacts {
				out = append(out, analysis.PackageFact{Package: k.pkg, Fact: f})
			}
			return out
		},
	}
	res, err := a.Run(pass)
	if err != nil {
		return nil, err
	}
	r.results[a] = res
	return res, nil
}

// copyFact copies a stored fact into the caller's pointer, as the
// drivers in x/tools do with reflection.
func copyFact(stored, dst analysis.Fact) bool {
	if stored == nil {
		return false
	}
	reflect.ValueOf(dst).Elem().Set(reflect.ValueOf(stored).Elem())
	return true
}
