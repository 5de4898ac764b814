package main

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"strconv"
	"strings"
)

// A grid is a small set of inputs at which the -fix mode calls one
// labelled function in the original and in the fixed copy of its module
// (testdata/realcorpus/grids.tsv, or one generated from the function's
// signature). Every variable is a float64 in the generated code.
type grid struct {
	Module string
	File   string
	Func   string
	Vars   []gridVar // the cross product of their values is the grid
	Where  string    // a Go boolean expression of the variables, or empty: which points to call
	Call   string    // a Go expression of the variables: the function's value
	Want   string    // a Go expression of the variables: the exact value, or empty

	lineNo int // line of the grids file; 0 for a generated grid
}

type gridVar struct {
	Name   string
	Values []string // Go float literals
}

var gridColumns = []string{"module", "file", "function", "vars", "where", "call", "want"}

// readGrids reads the grids file: tab-separated, a header line naming
// gridColumns, lines starting with # ignored.
func readGrids(path string) ([]grid, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	gs, err := parseGrids(string(data))
	if err != nil {
		return nil, fmt.Errorf("%s: %w", path, err)
	}
	return gs, nil
}

func parseGrids(data string) ([]grid, error) {
	var out []grid
	header := false
	for n, line := range strings.Split(data, "\n") {
		if strings.TrimSpace(line) == "" || strings.HasPrefix(line, "#") {
			continue
		}
		cols := strings.Split(line, "\t")
		if !header {
			if strings.Join(cols, "\t") != strings.Join(gridColumns, "\t") {
				return nil, fmt.Errorf("line %d: header must be %q", n+1, strings.Join(gridColumns, "\\t"))
			}
			header = true
			continue
		}
		if len(cols) != len(gridColumns) {
			return nil, fmt.Errorf("line %d: %d columns, want %d", n+1, len(cols), len(gridColumns))
		}
		g := grid{Module: cols[0], File: cols[1], Func: cols[2], Where: strings.TrimSpace(cols[4]),
			Call: strings.TrimSpace(cols[5]), Want: strings.TrimSpace(cols[6]), lineNo: n + 1}
		vars, err := parseGridVars(cols[3])
		if err != nil {
			return nil, fmt.Errorf("line %d: %v", n+1, err)
		}
		g.Vars = vars
		if g.Module == "" || g.File == "" || g.Func == "" || g.Call == "" {
			return nil, fmt.Errorf("line %d: empty module, file, function or call", n+1)
		}
		for _, e := range []string{g.Where, g.Call, g.Want} {
			if e == "" {
				continue
			}
			if _, err := parser.ParseExpr(e); err != nil {
				return nil, fmt.Errorf("line %d: %q is not a Go expression: %v", n+1, e, err)
			}
		}
		out = append(out, g)
	}
	if !header {
		return nil, fmt.Errorf("no header line")
	}
	return out, nil
}

// parseGridVars reads "n=0..3,10,170.5 k=1,2": space-separated
// variables, each with comma-separated values, a..b standing for the
// integers from a to b.
func parseGridVars(s string) ([]gridVar, error) {
	var out []gridVar
	seen := map[string]bool{}
	for _, f := range strings.Fields(s) {
		name, vals, ok := strings.Cut(f, "=")
		if !ok || !token.IsIdentifier(name) || seen[name] {
			return nil, fmt.Errorf("bad or repeated variable in %q", f)
		}
		seen[name] = true
		v := gridVar{Name: name}
		for _, item := range strings.Split(vals, ",") {
			if lo, hi, ok := strings.Cut(item, ".."); ok {
				a, err1 := strconv.Atoi(lo)
				b, err2 := strconv.Atoi(hi)
				if err1 != nil || err2 != nil || b < a || b-a > 1000 {
					return nil, fmt.Errorf("bad range %q", item)
				}
				for i := a; i <= b; i++ {
					v.Values = append(v.Values, strconv.Itoa(i))
				}
				continue
			}
			if _, err := strconv.ParseFloat(item, 64); err != nil {
				return nil, fmt.Errorf("bad value %q", item)
			}
			v.Values = append(v.Values, item)
		}
		out = append(out, v)
	}
	if len(out) == 0 {
		return nil, fmt.Errorf("no variables")
	}
	return out, nil
}

// size is the number of points of the cross product.
func (g grid) size() int {
	n := 1
	for _, v := range g.Vars {
		n *= len(v.Values)
	}
	return n
}

// The values a generated grid gives each parameter: small and large
// counts, the float64 factorial limit (170! fits, 171! does not), a
// fraction and a negative value. Fewer for more parameters, so that no
// grid passes a few thousand points.
var (
	autoFloatValues  = []string{"-1.5", "0", "0.5", "1", "2", "3", "7.5", "10", "25", "100", "170", "171", "200", "1000"}
	autoFloatValues3 = []string{"-1", "0", "0.5", "1", "3", "10", "100", "171", "200"}
	autoFloatValues4 = []string{"0", "0.5", "1", "10", "200"}
)

// autoGrid generates a grid for a function of numeric parameters and one
// numeric result, declared at fn's line in file (relative to root), from
// its signature. Methods and functions of other parameter types get none.
func autoGrid(root string, l label) (grid, bool) {
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, filepath.Join(root, filepath.FromSlash(l.File)), nil, parser.SkipObjectResolution)
	if err != nil {
		return grid{}, false
	}
	for _, d := range f.Decls {
		fd, ok := d.(*ast.FuncDecl)
		if !ok || fd.Recv != nil || fset.Position(fd.Pos()).Line != l.Line || fd.Type.TypeParams != nil {
			continue
		}
		if fd.Type.Results == nil || len(fd.Type.Results.List) != 1 || len(fd.Type.Results.List[0].Names) > 1 || !numericType(fd.Type.Results.List[0].Type) {
			return grid{}, false
		}
		var types []string
		for _, p := range fd.Type.Params.List {
			if !numericType(p.Type) {
				return grid{}, false
			}
			n := len(p.Names)
			if n == 0 {
				n = 1
			}
			for i := 0; i < n; i++ {
				types = append(types, p.Type.(*ast.Ident).Name)
			}
		}
		if len(types) == 0 || len(types) > 4 {
			return grid{}, false
		}
		vals := autoFloatValues
		switch {
		case len(types) == 3:
			vals = autoFloatValues3
		case len(types) == 4:
			vals = autoFloatValues4
		}
		g := grid{Module: l.Module, File: l.File, Func: l.Func}
		var args, conds []string
		for i, t := range types {
			name := fmt.Sprintf("a%d", i)
			v := gridVar{Name: name, Values: vals}
			if isIntType(t) {
				// An integer parameter takes the integer values only.
				v.Values = nil
				for _, s := range vals {
					if _, err := strconv.Atoi(s); err == nil {
						v.Values = append(v.Values, s)
					}
				}
				if strings.HasPrefix(t, "u") {
					conds = append(conds, name+" >= 0")
				}
			}
			g.Vars = append(g.Vars, v)
			args = append(args, fmt.Sprintf("%s(%s)", t, name))
		}
		g.Where = strings.Join(conds, " && ")
		g.Call = fmt.Sprintf("%s(%s)", fd.Name.Name, strings.Join(args, ", "))
		return g, true
	}
	return grid{}, false
}

func numericType(e ast.Expr) bool {
	id, ok := e.(*ast.Ident)
	if !ok {
		return false
	}
	switch id.Name {
	case "float64", "float32":
		return true
	}
	return isIntType(id.Name)
}

func isIntType(name string) bool {
	switch name {
	case "int", "int64", "int32", "uint", "uint64", "uint32":
		return true
	}
	return false
}
