package lsp

import (
	"bytes"
	"context"
	"fmt"
	"go/token"
	"os"
	"path/filepath"
	"runtime/debug"
	"slices"
	"strings"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/internal/driver"
)

// loadMode is what checker.Analyze needs: syntax and types of the analysed
// package and of every dependency, since analyzers with facts run on the
// dependencies too.
const loadMode = packages.NeedName | packages.NeedFiles | packages.NeedCompiledGoFiles |
	packages.NeedImports | packages.NeedDeps | packages.NeedTypes | packages.NeedTypesSizes |
	packages.NeedSyntax | packages.NeedTypesInfo | packages.NeedModule

// finding is one diagnostic converted to the protocol, with its fixes.
type finding struct {
	diag  Diagnostic
	fixes []fix
}

// fix is one suggested fix converted to the protocol: edits per file path.
type fix struct {
	title string
	edits map[string][]TextEdit
	// base holds, for each edited file, the open document whose text the
	// edits were computed against, or nil for a file that was not open
	// (whose text was read from disk). The fix is offered only while each
	// of those files is still in that state.
	base map[string]*document
}

// result is the result of analysing the package of one file at one
// snapshot of the open buffers.
type result struct {
	// docs holds, for each open file of the analysed package, the state
	// of its buffer that was analysed; findings are keyed by the same
	// paths.
	docs     map[string]*document
	findings map[string][]finding
	// rechecked says the package was re-checked against cached
	// dependencies rather than loaded afresh.
	rechecked bool
	seen      map[string]bool // findings added, by file, range and message
}

// analyze loads the package containing path with the open buffers as an
// overlay and runs the analyzers on it. A panic inside loading or analysis
// is turned into an error, so one bad input cannot stop the server.
func analyze(ctx context.Context, opts *Options, cache *loadCache, docs map[string]*document, path string, enc encoding) (res *result, err error) {
	defer func() {
		if p := recover(); p != nil {
			res, err = nil, fmt.Errorf("panic during analysis of %s: %v\n%s", path, p, debug.Stack())
		}
	}()
	overlay := overlayOf(docs)
	cfg := &packages.Config{
		Mode:    loadMode,
		Context: ctx,
		Dir:     filepath.Dir(path),
		Overlay: overlay,
		Tests:   strings.HasSuffix(path, "_test.go"),
	}
	roots, memo, rechecked, err := load(cfg, path, cache, opts.FactScan)
	if err != nil {
		return nil, err
	}
	analyzers := opts.Analyzers
	if memo != nil {
		analyzers = memo.wrap(analyzers, roots[0].Types)
	}
	analyzers = readingOverlay(analyzers, overlay)
	// Sequential keeps every action on this goroutine, where the deferred
	// recover above can catch an analyzer's panic; in parallel mode it
	// would kill the process.
	graph, err := checker.Analyze(analyzers, roots, &checker.Options{Sequential: true})
	if err != nil {
		return nil, err
	}
	if err := rootFailure(graph, roots); err != nil {
		return nil, err
	}
	conv := &converter{enc: enc, overlay: overlay, fset: roots[0].Fset, texts: make(map[string][]byte), severity: opts.Severity}
	res = collect(graph, roots, docs, conv)
	res.rechecked = rechecked
	return res, nil
}

// overlayOf returns the open buffers to analyse. Only Go files: an unsaved
// go.mod would change what go list resolves, which the saved one should
// decide.
func overlayOf(docs map[string]*document) map[string][]byte {
	overlay := make(map[string][]byte, len(docs))
	for p, d := range docs {
		if isGoFile(p) {
			overlay[p] = d.text
		}
	}
	return overlay
}

// collect converts the root actions' diagnostics that fall in open files
// of the analysed packages.
func collect(graph *checker.Graph, roots []*packages.Package, docs map[string]*document, conv *converter) *result {
	res := newResult()
	for _, p := range roots {
		for _, f := range p.CompiledGoFiles {
			if d, ok := docs[f]; ok {
				res.docs[f] = d
			}
		}
	}
	for _, act := range graph.Roots {
		for _, d := range act.Diagnostics {
			res.add(conv, docs, d)
		}
	}
	return res
}

func newResult() *result {
	return &result{docs: make(map[string]*document), findings: make(map[string][]finding), seen: make(map[string]bool)}
}

// add converts d and records it if it falls in an analysed open file;
// each fix remembers the documents it was computed against.
func (res *result) add(conv *converter, docs map[string]*document, d analysis.Diagnostic) {
	file, fd, ok := conv.finding(d)
	if _, open := res.docs[file]; !ok || !open {
		return
	}
	for _, fx := range fd.fixes {
		for f := range fx.edits {
			fx.base[f] = docs[f]
		}
	}
	key := fmt.Sprintf("%s:%v:%s", file, fd.diag.Range, fd.diag.Message)
	if res.seen[key] {
		return // the same file analysed as package and test variant
	}
	res.seen[key] = true
	res.findings[file] = append(res.findings[file], fd)
}

// rootFailure returns an error when no analysis of the file's packages
// ran, typically because the package does not type-check yet; the first
// package error says why.
func rootFailure(graph *checker.Graph, roots []*packages.Package) error {
	var first error
	for _, act := range graph.Roots {
		if act.Err == nil {
			return nil
		}
		if first == nil {
			first = act.Err
		}
	}
	for _, p := range roots {
		if len(p.Errors) > 0 {
			return fmt.Errorf("%v: %s", first, p.Errors[0].Msg)
		}
	}
	return first
}

// load returns the packages holding path: the cached package re-checked
// when cache can serve, else a fresh load with go/packages, which cache
// then keeps. A _test.go file belongs to several package variants and is
// always loaded afresh. The memo, nil for packages not cached, holds the
// analyzers' outcomes on the dependencies.
func load(cfg *packages.Config, path string, cache *loadCache, scan driver.FactScan) (roots []*packages.Package, memo *factMemo, rechecked bool, err error) {
	if !cfg.Tests {
		if e := cache.lookup(path, cfg.Overlay); e != nil {
			if np, err := recheck(e.pkg, cfg.Overlay); err == nil {
				return []*packages.Package{np}, e.facts, true, nil
			}
		}
	}
	pkgs, err := loadFresh(cfg, path, scan)
	if err != nil {
		return nil, nil, false, err
	}
	for _, p := range pkgs {
		if slices.Contains(p.CompiledGoFiles, path) {
			roots = append(roots, p)
		}
	}
	if len(roots) == 0 {
		return nil, nil, false, loadProblem(path, pkgs)
	}
	if !cfg.Tests && len(roots) == 1 {
		if e := cache.add(roots[0], cfg.Overlay); e != nil {
			memo = e.facts
		}
	}
	return roots, memo, false, nil
}

// loadFresh loads the packages holding path. When every open buffer holds
// what its file on disk holds, the overlay changes nothing, and the
// dependencies that cannot carry facts come from export data
// (driver.LoadForFacts), as they do for the command: a cold open costs
// about what loading the package for an analyzer without facts costs.
// go/packages trusts no export data under an overlay, so after an edit
// every dependency is type-checked from source, once; the cache then
// serves the edits that follow.
func loadFresh(cfg *packages.Config, path string, scan driver.FactScan) ([]*packages.Package, error) {
	if scan != nil && sameAsDisk(cfg.Overlay) {
		onDisk := *cfg
		onDisk.Overlay = nil
		return driver.LoadForFacts(&onDisk, []string{"file=" + path}, scan)
	}
	return packages.Load(cfg, "file="+path)
}

// sameAsDisk reports whether every file of overlay holds its text.
func sameAsDisk(overlay map[string][]byte) bool {
	for name, text := range overlay {
		disk, err := os.ReadFile(name)
		if err != nil || !bytes.Equal(disk, text) {
			return false
		}
	}
	return true
}

// loadProblem explains why no package holding path was loaded, using the
// errors go/packages attached to what it did return.
func loadProblem(path string, pkgs []*packages.Package) error {
	var msgs []string
	for _, p := range pkgs {
		for _, e := range p.Errors {
			msgs = append(msgs, e.Msg)
		}
	}
	if len(msgs) == 0 {
		return fmt.Errorf("no package found containing %s", path)
	}
	return fmt.Errorf("cannot load the package of %s: %s", path, strings.Join(msgs, "; "))
}

// converter turns go/analysis positions into protocol ranges, reading each
// file's text from the overlay or, for files not open, from disk; a file
// whose text no longer has the size it was parsed with has changed since,
// and positions in it are not converted.
type converter struct {
	enc     encoding
	overlay map[string][]byte
	fset    *token.FileSet
	texts   map[string][]byte
	// severity maps a diagnostic category to an LSP severity.
	severity func(category string) int
}

// text returns the contents of file as the analysis saw them.
func (c *converter) text(file string) []byte {
	if t, ok := c.overlay[file]; ok {
		return t
	}
	if t, ok := c.texts[file]; ok {
		return t
	}
	t, _ := os.ReadFile(file)
	c.texts[file] = t
	return t
}

// span returns the file and protocol range of [pos, end); an end of
// token.NoPos means an empty range at pos, as in analysis.TextEdit.
func (c *converter) span(pos, end token.Pos) (string, Range, bool) {
	tf := c.fset.File(pos)
	if tf == nil {
		return "", Range{}, false
	}
	if !end.IsValid() || end < pos {
		end = pos
	}
	if int(end) > tf.Base()+tf.Size() {
		end = token.Pos(tf.Base() + tf.Size())
	}
	file := filepath.Clean(tf.Name())
	text := c.text(file)
	if len(text) != tf.Size() {
		return "", Range{}, false
	}
	return file, c.enc.toRange(text, tf.Offset(pos), tf.Offset(end)), true
}

// finding converts one diagnostic.
func (c *converter) finding(d analysis.Diagnostic) (string, finding, bool) {
	file, rng, ok := c.span(d.Pos, d.End)
	if !ok {
		return "", finding{}, false
	}
	pd := Diagnostic{
		Range:    rng,
		Severity: c.severity(d.Category),
		Code:     d.Category,
		Source:   "overfact",
		Message:  d.Message,
	}
	if d.URL != "" {
		pd.CodeDescription = &CodeDescription{Href: d.URL}
	}
	for _, r := range d.Related {
		if rf, rr, ok := c.span(r.Pos, r.End); ok {
			pd.RelatedInformation = append(pd.RelatedInformation, DiagnosticRelatedInformation{
				Location: Location{URI: pathToURI(rf), Range: rr},
				Message:  r.Message,
			})
		}
	}
	fd := finding{diag: pd}
	for _, sf := range d.SuggestedFixes {
		fx := fix{title: sf.Message, edits: make(map[string][]TextEdit), base: make(map[string]*document)}
		complete := true
		for _, e := range sf.TextEdits {
			ef, er, ok := c.span(e.Pos, e.End)
			if !ok {
				complete = false // part of a fix would be worse than none
				break
			}
			fx.edits[ef] = append(fx.edits[ef], TextEdit{Range: er, NewText: string(e.NewText)})
		}
		if complete && len(fx.edits) > 0 {
			fd.fixes = append(fd.fixes, fx)
		}
	}
	return file, fd, true
}

// readingOverlay returns copies of as, and of the analyzers they require,
// whose passes read the files named in overlay from it. The checker's
// Pass.ReadFile reads the disk, but the syntax of an open file comes from
// its buffer, and an analyzer or fix builder that reads the source must
// see the text its positions refer to: a fix built from the disk would be
// computed for a text the editor does not show.
//
// Every analyzer of the graph is copied, so that no analyzer appears both
// as itself and as its copy (the two would declare the same fact types),
// and each original runs with the pass it expects: its own identity, and
// its requirements' results keyed by the originals.
func readingOverlay(as []*analysis.Analyzer, overlay map[string][]byte) []*analysis.Analyzer {
	orig := make(map[*analysis.Analyzer]*analysis.Analyzer) // copy -> original
	copies := make(map[*analysis.Analyzer]*analysis.Analyzer)
	var copyOf func(a *analysis.Analyzer) *analysis.Analyzer
	copyOf = func(a *analysis.Analyzer) *analysis.Analyzer {
		if c, ok := copies[a]; ok {
			return c
		}
		c := *a
		copies[a], orig[&c] = &c, a
		c.Requires = make([]*analysis.Analyzer, len(a.Requires))
		for i, r := range a.Requires {
			c.Requires[i] = copyOf(r)
		}
		c.Run = func(pass *analysis.Pass) (any, error) {
			p := unwrapped(pass, a, orig)
			disk := pass.ReadFile
			p.ReadFile = func(name string) ([]byte, error) {
				if text, ok := overlay[filepath.Clean(name)]; ok {
					return text, nil
				}
				return disk(name)
			}
			return a.Run(p)
		}
		return &c
	}
	out := make([]*analysis.Analyzer, len(as))
	for i, a := range as {
		out[i] = copyOf(a)
	}
	return out
}
