// Package astpath finds the syntax enclosing a source interval without
// walking the whole file.
package astpath

import (
	"go/ast"
	"go/token"
	"sort"

	"golang.org/x/tools/go/ast/astutil"
)

// Enclosing is astutil.PathEnclosingInterval(file, start, end), computed
// within the top-level declaration that holds the interval. At the file's
// level PathEnclosingInterval lists and sorts every declaration of the
// file on each call, so asking it once per finding made a file of many
// declarations cost their number squared; here the declaration is found
// by a binary search and only it is walked. An interval that no single
// declaration holds gets PathEnclosingInterval's answer on the whole file.
func Enclosing(file *ast.File, start, end token.Pos) (path []ast.Node, exact bool) {
	decls := file.Decls
	i := sort.Search(len(decls), func(i int) bool { return decls[i].End() >= end })
	if i < len(decls) && holds(decls[i], start, end) {
		one := &ast.File{Package: file.Package, Name: file.Name, Decls: decls[i : i+1],
			FileStart: file.FileStart, FileEnd: file.FileEnd}
		path, exact = astutil.PathEnclosingInterval(one, start, end)
		if len(path) > 0 && path[len(path)-1] == one {
			path[len(path)-1] = file
			return path, exact
		}
	}
	return astutil.PathEnclosingInterval(file, start, end)
}

// holds reports whether d holds the interval without touching its edges
// where PathEnclosingInterval could attribute the interval to a
// neighbour: an empty interval must lie strictly inside d.
func holds(d ast.Decl, start, end token.Pos) bool {
	if start == end {
		return d.Pos() < start && end < d.End()
	}
	return d.Pos() <= start && start < end && end <= d.End()
}
