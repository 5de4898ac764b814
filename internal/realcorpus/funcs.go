package main

import (
	"go/ast"
	"go/parser"
	"go/token"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"strings"
)

// A span is the lines of one function declaration in a module; function
// literals inside it count for it.
type span struct {
	File       string // relative to the module root, slash-separated
	Func       string // Name or Recv.Method
	Start, End int    // lines of the func keyword and of the closing brace
}

// funcName names a declaration as labels do: Name, or Recv.Method with
// the receiver's type name stripped of * and type parameters.
func funcName(fd *ast.FuncDecl) string {
	if fd.Recv == nil || len(fd.Recv.List) == 0 {
		return fd.Name.Name
	}
	t := fd.Recv.List[0].Type
	for {
		switch x := t.(type) {
		case *ast.StarExpr:
			t = x.X
			continue
		case *ast.IndexExpr:
			t = x.X
			continue
		case *ast.IndexListExpr:
			t = x.X
			continue
		case *ast.ParenExpr:
			t = x.X
			continue
		}
		break
	}
	if id, ok := t.(*ast.Ident); ok {
		return id.Name + "." + fd.Name.Name
	}
	return fd.Name.Name
}

// moduleSpans parses every non-test Go file under root (not descending
// into testdata, vendor or nested modules) and returns its functions.
func moduleSpans(root string) ([]span, error) {
	var out []span
	fset := token.NewFileSet()
	err := filepath.WalkDir(root, func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		if d.IsDir() {
			name := d.Name()
			if path != root && (name == "testdata" || name == "vendor" || strings.HasPrefix(name, ".") || strings.HasPrefix(name, "_")) {
				return filepath.SkipDir
			}
			if path != root {
				if _, err := os.Stat(filepath.Join(path, "go.mod")); err == nil {
					return filepath.SkipDir
				}
			}
			return nil
		}
		if !strings.HasSuffix(path, ".go") || strings.HasSuffix(path, "_test.go") {
			return nil
		}
		f, err := parser.ParseFile(fset, path, nil, parser.SkipObjectResolution)
		if err != nil {
			return nil // a file the build does not compile either; findings cannot point into it
		}
		rel, _ := filepath.Rel(root, path)
		rel = filepath.ToSlash(rel)
		for _, decl := range f.Decls {
			fd, ok := decl.(*ast.FuncDecl)
			if !ok {
				continue
			}
			out = append(out, span{File: rel, Func: funcName(fd),
				Start: fset.Position(fd.Pos()).Line, End: fset.Position(fd.End()).Line})
		}
		return nil
	})
	sort.Slice(out, func(i, j int) bool {
		if out[i].File != out[j].File {
			return out[i].File < out[j].File
		}
		return out[i].Start < out[j].Start
	})
	return out, err
}

// spanAt returns the function of file whose lines hold line, if any.
func spanAt(spans []span, file string, line int) (span, bool) {
	for _, s := range spans {
		if s.File == file && s.Start <= line && line <= s.End {
			return s, true
		}
	}
	return span{}, false
}
