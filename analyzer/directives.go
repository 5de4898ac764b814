package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"regexp"
	"strconv"
	"strings"

	"github.com/overfact/overfact/analyzer/ranges"
)

// Directives follow the Go convention for tool directives: a line
// comment "//overfact:verb args" with no space after the slashes.
const directivePrefix = "//overfact:"

// directives are the allow, approx and assume directives of one file.
type directives struct {
	allow       placed
	approx      placed // the Stirling approximation is meant (stirlingapproximation.go)
	funcAssumes map[*ast.FuncDecl]map[types.Object]ranges.Interval
	stmtAssumes []stmtAssume
}

// placed are the lines and functions a directive with a reason covers:
// its own line (trailing), the next line (on a line of its own), or the
// whole function (in its doc comment).
type placed struct {
	lines map[int]bool
	funcs []*ast.FuncDecl
}

// stmtAssume is a bound declared on the line before a statement; it holds
// for the variable within that statement.
type stmtAssume struct {
	obj      types.Object
	iv       ranges.Interval
	from, to token.Pos
}

var (
	// x <= 20, x < 21, x >= 0, x > 0, x == 5
	assumeOne = regexp.MustCompile(`^([\pL_][\pL\pN_]*)(<=|<|>=|>|==)(-?[0-9]+)$`)
	// 0 <= x <= 20 (each bound strict or not)
	assumeTwo = regexp.MustCompile(`^(-?[0-9]+)(<=|<)([\pL_][\pL\pN_]*)(<=|<)(-?[0-9]+)$`)
)

// parseAssume parses the argument of an assume directive.
func parseAssume(arg string) (name string, iv ranges.Interval, ok bool) {
	s := strings.Join(strings.Fields(arg), "")
	if m := assumeOne.FindStringSubmatch(s); m != nil {
		v, err := strconv.ParseInt(m[3], 10, 64)
		if err != nil {
			return "", iv, false
		}
		lo, hi := int64(math.MinInt64), int64(math.MaxInt64)
		switch m[2] {
		case "<=":
			hi = v
		case "<":
			hi = v - 1
		case ">=":
			lo = v
		case ">":
			lo = v + 1
		case "==":
			lo, hi = v, v
		}
		return m[1], ranges.Span(lo, hi), true
	}
	if m := assumeTwo.FindStringSubmatch(s); m != nil {
		lo, err1 := strconv.ParseInt(m[1], 10, 64)
		hi, err2 := strconv.ParseInt(m[5], 10, 64)
		if err1 != nil || err2 != nil {
			return "", iv, false
		}
		if m[2] == "<" {
			lo++
		}
		if m[4] == "<" {
			hi--
		}
		if lo > hi {
			return "", iv, false
		}
		return m[3], ranges.Span(lo, hi), true
	}
	return "", iv, false
}

// parseDirectives collects the directives of f and reports malformed
// ones. Generated files are neither reported in nor read.
func (c *checker) parseDirectives(f *ast.File, generated bool) *directives {
	d := &directives{allow: placed{lines: make(map[int]bool)}, approx: placed{lines: make(map[int]bool)}, funcAssumes: make(map[*ast.FuncDecl]map[types.Object]ranges.Interval)}
	if generated {
		return d
	}
	docOf := make(map[*ast.CommentGroup]*ast.FuncDecl)
	for _, decl := range f.Decls {
		if fd, ok := decl.(*ast.FuncDecl); ok && fd.Doc != nil {
			docOf[fd.Doc] = fd
		}
	}
	var pending []*ast.Comment // statement-level assumes
	text := &fileText{c: c}
	for _, cg := range f.Comments {
		for _, cm := range cg.List {
			if !strings.HasPrefix(cm.Text, directivePrefix) {
				continue
			}
			verb, arg, _ := strings.Cut(strings.TrimPrefix(cm.Text, directivePrefix), " ")
			arg = directiveArg(arg)
			fn := docOf[cg]
			switch verb {
			case "allow":
				c.parsePlaced(&d.allow, text, cm, arg, fn, "//overfact:allow needs a reason, as in //overfact:allow n is at most 12 here")
			case "approx":
				c.parsePlaced(&d.approx, text, cm, arg, fn, "//overfact:approx needs a reason, as in //overfact:approx a rough size estimate is enough here")
			case "assume":
				if fn != nil {
					c.parseFuncAssume(d, cm, arg, fn)
				} else if text.trailing(cm) {
					c.reportDirective(cm.Pos(), cm.End(), "//overfact:assume belongs in a function's doc comment or on its own line before a statement")
				} else {
					pending = append(pending, cm)
				}
			default:
				c.reportDirective(cm.Pos(), cm.End(), "unknown directive //overfact:"+verb+" (known: allow, approx, assume)")
			}
		}
	}
	if len(pending) > 0 {
		c.parseStmtAssumes(d, f, pending)
	}
	return d
}

// parsePlaced records a directive that needs a reason (missing is the
// finding when it has none) and covers what its place says.
func (c *checker) parsePlaced(p *placed, text *fileText, cm *ast.Comment, reason string, fn *ast.FuncDecl, missing string) {
	if reason == "" {
		c.reportDirective(cm.Pos(), cm.End(), missing)
		return
	}
	if fn != nil {
		p.funcs = append(p.funcs, fn)
		return
	}
	line := c.pass.Fset.Position(cm.Pos()).Line
	if text.trailing(cm) {
		p.lines[line] = true
	} else {
		p.lines[line+1] = true
	}
}

func (c *checker) parseFuncAssume(d *directives, cm *ast.Comment, arg string, fn *ast.FuncDecl) {
	name, iv, ok := parseAssume(arg)
	if !ok {
		c.reportDirective(cm.Pos(), cm.End(), "malformed //overfact:assume: want ident <= N (or <, >=, >, ==) or A <= ident <= B")
		return
	}
	obj := paramNamed(c.pass.TypesInfo, fn, name)
	if obj == nil {
		c.reportDirective(cm.Pos(), cm.End(), "//overfact:assume names "+name+", which is no parameter or result of "+fn.Name.Name)
		return
	}
	m := d.funcAssumes[fn]
	if m == nil {
		m = make(map[types.Object]ranges.Interval)
		d.funcAssumes[fn] = m
	}
	if old, ok := m[obj]; ok {
		iv = iv.Meet(old)
	}
	m[obj] = iv
}

// paramNamed finds a parameter or named result of fn called name.
func paramNamed(info *types.Info, fn *ast.FuncDecl, name string) types.Object {
	lists := []*ast.FieldList{fn.Recv, fn.Type.Params, fn.Type.Results}
	for _, l := range lists {
		if l == nil {
			continue
		}
		for _, f := range l.List {
			for _, id := range f.Names {
				if id.Name == name {
					return info.Defs[id]
				}
			}
		}
	}
	return nil
}

// parseStmtAssumes attaches each own-line assume to the statement that
// starts on the next line, resolving its identifier there.
func (c *checker) parseStmtAssumes(d *directives, f *ast.File, pending []*ast.Comment) {
	want := make(map[int]*ast.Comment)
	for _, cm := range pending {
		want[c.pass.Fset.Position(cm.Pos()).Line+1] = cm
	}
	found := make(map[*ast.Comment]bool)
	ast.Inspect(f, func(n ast.Node) bool {
		st, ok := n.(ast.Stmt)
		if !ok || n == nil {
			return true
		}
		cm := want[c.pass.Fset.Position(st.Pos()).Line]
		if cm == nil || found[cm] {
			return true
		}
		found[cm] = true
		name, iv, ok := parseAssume(directiveArg(strings.TrimPrefix(cm.Text, directivePrefix+"assume")))
		if !ok {
			c.reportDirective(cm.Pos(), cm.End(), "malformed //overfact:assume: want ident <= N (or <, >=, >, ==) or A <= ident <= B")
			return true
		}
		obj := c.identIn(st, name)
		if obj == nil {
			c.reportDirective(cm.Pos(), cm.End(), "//overfact:assume names "+name+", which the next statement does not use")
			return true
		}
		d.stmtAssumes = append(d.stmtAssumes, stmtAssume{obj: obj, iv: iv, from: st.Pos(), to: st.End()})
		return true
	})
	for _, cm := range pending {
		if !found[cm] {
			c.reportDirective(cm.Pos(), cm.End(), "//overfact:assume is not followed by a statement")
		}
	}
}

// identIn returns the variable named name that st uses or declares.
func (c *checker) identIn(st ast.Stmt, name string) types.Object {
	var obj types.Object
	ast.Inspect(st, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && id.Name == name && obj == nil {
			if v, ok := c.pass.TypesInfo.ObjectOf(id).(*types.Var); ok {
				obj = v
			}
		}
		return obj == nil
	})
	return obj
}

// fileText is the text of the file whose directives are parsed, read
// the first time a directive's place needs it and kept for the others:
// a file with thousands of directives (as -fix leaves where it keeps an
// expression as written) is read once, whether or not the pass's
// ReadFile caches (go vet's and the editor's do not).
type fileText struct {
	c    *checker
	src  []byte
	read bool
}

// trailing reports whether code precedes the comment on its line.
func (t *fileText) trailing(cm *ast.Comment) bool {
	tf := t.c.pass.Fset.File(cm.Pos())
	if tf == nil || t.c.pass.ReadFile == nil {
		return false
	}
	if !t.read {
		t.read = true
		if src, err := t.c.pass.ReadFile(tf.Name()); err == nil {
			t.src = src
		}
	}
	if t.src == nil {
		return false
	}
	src := t.src
	start := tf.Offset(tf.LineStart(tf.Line(cm.Pos())))
	end := tf.Offset(cm.Pos())
	if start < 0 || end > len(src) || start > end {
		return false
	}
	return strings.TrimSpace(string(src[start:end])) != ""
}

// allowed reports whether an allow directive covers pos.
func (d *directives) allowed(fset *token.FileSet, pos token.Pos) bool {
	return d.allow.covers(fset, pos)
}

// covers reports whether one of the directives covers pos.
func (p *placed) covers(fset *token.FileSet, pos token.Pos) bool {
	if p.lines[fset.Position(pos).Line] {
		return true
	}
	for _, f := range p.funcs {
		if f.Pos() <= pos && pos < f.End() {
			return true
		}
	}
	return false
}

// stmtAssumesIn returns the statement-level assumes inside fn.
func (d *directives) stmtAssumesIn(fn ast.Node) []stmtAssume {
	var out []stmtAssume
	for _, a := range d.stmtAssumes {
		if fn.Pos() <= a.from && a.to <= fn.End() {
			out = append(out, a)
		}
	}
	return out
}

// directiveArg trims the argument of a directive; a "//" in it starts a
// comment on the directive, as in //overfact:assume n <= 20 // menu size.
func directiveArg(arg string) string {
	if i := strings.Index(arg, "//"); i >= 0 {
		arg = arg[:i]
	}
	return strings.TrimSpace(arg)
}
