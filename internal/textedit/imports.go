package textedit

import (
	"go/ast"
	"go/parser"
	"go/token"
	"path"
	"strconv"
)

// EmptiedImports returns the edits that delete, from fixed, the imports
// that a set of fixes applied together left unused: each fix drops an
// import only when it alone empties it, so two fixes that each rewrite
// one of a file's two math.Pow calls leave "math" behind, and the file
// would not build. The command applies these edits after each round of
// fixes; drivers that apply every fix of a file at once and do not
// prune imports (go fix, an editor's "apply all") can be left with such
// an import. An import is dropped when its package name was used in old, the
// analysed text, and is used nowhere in fixed. The name is the import's
// own or its path's last element; an import whose package has another
// name is never counted as used in old, so it is never dropped (and the
// build check after each round stops a run whose guess was wrong).
func EmptiedImports(old, fixed []byte) []Edit {
	fset := token.NewFileSet()
	before, err1 := parser.ParseFile(fset, "", old, parser.SkipObjectResolution)
	after, err2 := parser.ParseFile(fset, "", fixed, parser.SkipObjectResolution)
	if err1 != nil || err2 != nil {
		return nil
	}
	usedBefore, usedAfter := selectorBases(before), selectorBases(after)
	tf := fset.File(after.Pos())
	var out []Edit
	for _, d := range after.Decls {
		g, ok := d.(*ast.GenDecl)
		if !ok || g.Tok != token.IMPORT {
			continue
		}
		for _, s := range g.Specs {
			spec := s.(*ast.ImportSpec)
			name := importName(spec)
			if name == "" || !usedBefore[name] || usedAfter[name] {
				continue
			}
			// A lone import declaration goes whole; a spec of a
			// parenthesised one goes with its line.
			start, end := spec.Pos(), spec.End()
			if !g.Lparen.IsValid() {
				start, end = g.Pos(), g.End()
			}
			out = append(out, lineSpan(fixed, tf.Offset(start), tf.Offset(end)))
		}
	}
	return out
}

// importName is the name a file refers to an import by, or "" for a
// blank or dot import.
func importName(spec *ast.ImportSpec) string {
	if spec.Name != nil {
		if spec.Name.Name == "_" || spec.Name.Name == "." {
			return ""
		}
		return spec.Name.Name
	}
	p, err := strconv.Unquote(spec.Path.Value)
	if err != nil {
		return ""
	}
	return path.Base(p)
}

// selectorBases returns the identifiers that stand before a dot in f,
// outside its import declarations.
func selectorBases(f *ast.File) map[string]bool {
	out := make(map[string]bool)
	ast.Inspect(f, func(n ast.Node) bool {
		if sel, ok := n.(*ast.SelectorExpr); ok {
			if id, ok := sel.X.(*ast.Ident); ok {
				out[id.Name] = true
			}
		}
		return true
	})
	return out
}

// lineSpan widens [start, end) to the whole lines it lies on when
// nothing but blanks shares them, so that no empty line is left behind.
func lineSpan(src []byte, start, end int) Edit {
	s, e := start, end
	for s > 0 && (src[s-1] == ' ' || src[s-1] == '\t') {
		s--
	}
	for e < len(src) && (src[e] == ' ' || src[e] == '\t' || src[e] == '\r') {
		e++
	}
	if (s == 0 || src[s-1] == '\n') && (e == len(src) || src[e] == '\n') {
		if e < len(src) {
			e++
		}
		return Edit{Start: s, End: e}
	}
	return Edit{Start: start, End: end}
}
