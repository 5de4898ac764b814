package analyzer

import (
	"go/ast"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
)

// ownEntry returns the parameter ranges a function declares for itself
// in //overfact:assume directives of its doc comment.
func (c *checker) ownEntry(n ast.Node) map[types.Object]ranges.Interval {
	entry := make(map[types.Object]ranges.Interval)
	decl, ok := n.(*ast.FuncDecl)
	if !ok {
		return entry
	}
	if fi := c.fileOf(decl.Pos()); fi != nil {
		for obj, iv := range fi.dirs.funcAssumes[decl] {
			entry[obj] = iv
		}
	}
	return entry
}

// entryOf returns the entry ranges of a function: its own annotations,
// and for an unexported factorial function that does not bound its
// parameter, the join of the argument ranges at its call sites in this
// package (all there can be). Call-site ranges are one level deep: each
// caller is analysed with its own annotations only.
func (c *checker) entryOf(n ast.Node) map[types.Object]ranges.Interval {
	entry := c.ownEntry(n)
	decl, ok := n.(*ast.FuncDecl)
	if !ok {
		return entry
	}
	obj, _ := c.pass.TypesInfo.Defs[decl.Name].(*types.Func)
	ff := c.funcs[obj]
	if ff == nil || ff.fact.Safe || obj.Exported() {
		return entry
	}
	iv, ok := c.callSiteRange(ff)
	if !ok {
		return entry
	}
	p := obj.Type().(*types.Signature).Params().At(ff.param)
	if old, ok := entry[p]; ok {
		iv = iv.Meet(old)
	}
	entry[p] = iv
	return entry
}

// callSiteRange joins the ranges of the argument n over every call of ff
// outside ff itself. It reports false when the function is also used as
// a value (then it may be called from anywhere) or never called.
func (c *checker) callSiteRange(ff *facFunc) (ranges.Interval, bool) {
	calls := c.callsOf(ff.obj)
	if calls == nil {
		return ranges.Interval{}, false
	}
	join := ranges.Empty()
	any := false
	for _, call := range calls {
		if ff.decl.Pos() <= call.Pos() && call.End() <= ff.decl.End() {
			continue
		}
		caller := c.enclosingFunc(call)
		if caller == nil || ff.param >= len(call.Args) {
			return ranges.Interval{}, false
		}
		own := c.ownCtx(caller)
		join = join.Join(own.rangeOf(call.Args[ff.param]))
		any = true
		if join.IsTop() {
			break
		}
	}
	return join, any
}

// callsOf returns the calls of fn in this package, or nil when fn is
// also used other than by calling it.
func (c *checker) callsOf(fn *types.Func) []*ast.CallExpr {
	if c.callIndex == nil {
		c.indexCalls()
	}
	if c.escapes[fn] {
		return nil
	}
	return c.callIndex[fn]
}

// indexCalls records, once per pass, the calls of this package's
// factorial functions and which of them escape as values.
func (c *checker) indexCalls() {
	c.callIndex = make(map[*types.Func][]*ast.CallExpr)
	c.escapes = make(map[*types.Func]bool)
	called := make(map[*ast.Ident]bool)
	for _, f := range c.pass.Files {
		ast.Inspect(f, func(n ast.Node) bool {
			call, ok := n.(*ast.CallExpr)
			if !ok {
				return true
			}
			fn := c.calleeOf(call)
			if c.funcs[fn] == nil {
				return true
			}
			c.callIndex[fn] = append(c.callIndex[fn], call)
			switch fun := unparen(call.Fun).(type) {
			case *ast.Ident:
				called[fun] = true
			case *ast.SelectorExpr:
				called[fun.Sel] = true
			}
			return true
		})
	}
	for id, obj := range c.pass.TypesInfo.Uses {
		if fn, ok := obj.(*types.Func); ok && c.funcs[fn] != nil && !called[id] {
			c.escapes[fn] = true
		}
	}
}

// enclosingFunc returns the innermost function holding n.
func (c *checker) enclosingFunc(n ast.Node) ast.Node {
	var best ast.Node
	for _, f := range c.allFuncs {
		if f.Pos() <= n.Pos() && n.End() <= f.End() {
			if best == nil || best.Pos() <= f.Pos() {
				best = f
			}
		}
	}
	return best
}
