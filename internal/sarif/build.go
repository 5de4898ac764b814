package sarif

import (
	"encoding/json"
	"fmt"
	"go/token"
	"io"
	"net/url"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"golang.org/x/tools/go/analysis"
)

// LevelWarning is the level of a result (§3.27.10) whose rule names
// none. Rules take their levels from the analyzer's severities, which are
// SARIF's words ("error", "warning").
const LevelWarning = "warning"

// A Rule describes one category of finding; it becomes a
// reportingDescriptor whose id is the diagnostic category.
type Rule struct {
	ID    string
	Title string // one sentence
	Help  string // URI of the documentation of the rule
	Level string // default level of its results; LevelWarning if empty
}

// A Builder accumulates diagnostics into a single-run log.
type Builder struct {
	root     string // absolute, cleaned source root
	log      Log
	index    map[string]int // rule id -> index in rules
	seen     map[string]bool
	files    map[string]*source
	ReadFile func(name string) ([]byte, error) // os.ReadFile unless set
	// Positions decides where a position under a //line directive is
	// reported (see Positions).
	Positions *Positions
}

// source is a file read for column conversion: its content and the
// offsets at which its lines start, or nil content when it could not be
// read.
type source struct {
	content []byte
	lines   []int
}

// NewBuilder returns a Builder for a run of the named tool whose
// artifact URIs are relative to the directory root.
func NewBuilder(tool ToolComponent, rules []Rule, root string) (*Builder, error) {
	abs, err := filepath.Abs(root)
	if err != nil {
		return nil, err
	}
	b := &Builder{
		root:      filepath.Clean(abs),
		index:     make(map[string]int),
		seen:      make(map[string]bool),
		files:     make(map[string]*source),
		ReadFile:  os.ReadFile,
		Positions: NewPositions(),
	}
	tool.Rules = nil
	b.log = Log{
		Schema:  SchemaURI,
		Version: Version,
		Runs: []Run{{
			Tool:               Tool{Driver: tool},
			OriginalURIBaseIDs: map[string]ArtifactLocation{SourceRoot: {URI: dirURI(b.root)}},
			ColumnKind:         "utf16CodeUnits",
			Results:            []Result{},
		}},
	}
	for _, r := range rules {
		b.addRule(r)
	}
	return b, nil
}

// Write encodes the log as indented JSON.
func (b *Builder) Write(w io.Writer) error {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(&b.log)
}

func (b *Builder) run() *Run { return &b.log.Runs[0] }

func (b *Builder) addRule(r Rule) int {
	if i, ok := b.index[r.ID]; ok {
		return i
	}
	if r.Level == "" {
		r.Level = LevelWarning
	}
	d := ReportingDescriptor{
		ID:                   r.ID,
		Name:                 ruleName(r.ID),
		HelpURI:              r.Help,
		DefaultConfiguration: &ReportingConfiguration{Level: r.Level},
	}
	if r.Title != "" {
		d.ShortDescription = &Message{Text: r.Title}
		d.FullDescription = &Message{Text: r.Title}
	}
	rules := &b.run().Tool.Driver.Rules
	*rules = append(*rules, d)
	b.index[r.ID] = len(*rules) - 1
	return len(*rules) - 1
}

// ruleName turns a category id such as "factorial-loop" into the
// PascalCase name SARIF recommends for reportingDescriptor.name (§3.49.7).
func ruleName(id string) string {
	var sb strings.Builder
	for _, part := range strings.FieldsFunc(id, func(r rune) bool { return r == '-' || r == '_' || r == '.' || r == ' ' }) {
		sb.WriteString(strings.ToUpper(part[:1]) + part[1:])
	}
	return sb.String()
}

// Add converts d, whose positions are in fset, into a result. A
// diagnostic with an unknown or empty category gets a rule named after
// fallback. Diagnostics already added at the same place with the same
// message (a file shared by a package and its test variant) are dropped.
//
// A finding is never dropped for a file that cannot be read: its columns
// then stay byte counts. The error result is kept for callers; it is
// always nil.
func (b *Builder) Add(fset *token.FileSet, d analysis.Diagnostic, fallback string) error {
	start, end := b.Positions.Span(fset, d.Pos, d.End)
	key := fmt.Sprintf("%s:%d:%d:%s", start.Filename, start.Offset, end.Offset, d.Message)
	if b.seen[key] {
		return nil
	}
	b.seen[key] = true

	id := d.Category
	if id == "" {
		id = fallback
	}
	idx := b.addRule(Rule{ID: id})
	loc, err := b.location(fset, d.Pos, d.End)
	if err != nil {
		return err
	}
	res := Result{
		RuleID:    id,
		RuleIndex: idx,
		Level:     b.run().Tool.Driver.Rules[idx].DefaultConfiguration.Level,
		Message:   Message{Text: d.Message},
		Locations: []Location{loc},
	}
	for i, rel := range d.Related {
		l, err := b.location(fset, rel.Pos, rel.End)
		if err != nil {
			return err
		}
		id := i + 1
		l.ID = &id
		l.Message = &Message{Text: rel.Message}
		res.RelatedLocations = append(res.RelatedLocations, l)
	}
	for _, sf := range d.SuggestedFixes {
		fix, err := b.fix(fset, sf)
		if err != nil {
			return err
		}
		res.Fixes = append(res.Fixes, fix)
	}
	b.run().Results = append(b.run().Results, res)
	return nil
}

func (b *Builder) location(fset *token.FileSet, pos, end token.Pos) (Location, error) {
	p, e := b.Positions.Span(fset, pos, end)
	r := b.region(p, e)
	return Location{PhysicalLocation: PhysicalLocation{
		ArtifactLocation: b.artifact(p.Filename),
		Region:           &r,
	}}, nil
}

// fix converts a suggested fix, grouping its edits by file (§3.55.3).
func (b *Builder) fix(fset *token.FileSet, sf analysis.SuggestedFix) (Fix, error) {
	byFile := make(map[string][]Replacement)
	var names []string
	for _, te := range sf.TextEdits {
		end := te.End
		if !end.IsValid() {
			end = te.Pos
		}
		// An edit applies to the bytes of the file that was compiled,
		// whatever a //line directive says.
		p, e := fset.PositionFor(te.Pos, false), fset.PositionFor(end, false)
		r := b.region(p, e)
		if _, ok := byFile[p.Filename]; !ok {
			names = append(names, p.Filename)
		}
		rep := Replacement{DeletedRegion: r}
		if len(te.NewText) > 0 {
			rep.InsertedContent = &ArtifactContent{Text: string(te.NewText)}
		}
		byFile[p.Filename] = append(byFile[p.Filename], rep)
	}
	sort.Strings(names)
	fix := Fix{ArtifactChanges: []ArtifactChange{}}
	if sf.Message != "" {
		fix.Description = &Message{Text: sf.Message}
	}
	for _, name := range names {
		fix.ArtifactChanges = append(fix.ArtifactChanges, ArtifactChange{
			ArtifactLocation: b.artifact(name),
			Replacements:     byFile[name],
		})
	}
	return fix, nil
}

// artifact returns the location of a file: relative to the source root
// when the file is inside it, an absolute file URI otherwise (a finding
// in the module cache or GOROOT).
func (b *Builder) artifact(filename string) ArtifactLocation {
	rel, err := filepath.Rel(b.root, filename)
	if err != nil || rel == ".." || strings.HasPrefix(rel, ".."+string(filepath.Separator)) || filepath.IsAbs(rel) {
		return ArtifactLocation{URI: fileURI(filename)}
	}
	return ArtifactLocation{URI: escapePath(filepath.ToSlash(rel)), URIBaseID: SourceRoot}
}

// region converts positions into a region whose columns count UTF-16
// code units of their lines in the file. A file that cannot be read, or
// a line it does not have, keeps byte columns; an unknown column (0,
// from a //line directive without one) is left out, which SARIF reads
// as the whole line (§3.30.5, §3.30.7).
func (b *Builder) region(start, end token.Position) Region {
	src := b.source(start.Filename)
	return Region{
		StartLine:   start.Line,
		StartColumn: src.column(start),
		EndLine:     end.Line,
		EndColumn:   src.column(end),
	}
}

func (b *Builder) source(filename string) *source {
	if s, ok := b.files[filename]; ok {
		return s
	}
	s := &source{}
	if c, err := b.ReadFile(filename); err == nil {
		s.content = c
		s.lines = append(s.lines, 0)
		for i, ch := range c {
			if ch == '\n' {
				s.lines = append(s.lines, i+1)
			}
		}
	}
	b.files[filename] = s
	return s
}

// column returns the UTF-16 column of p, found by its line and byte
// column rather than its offset: under a //line directive the offset is
// one in another file.
func (s *source) column(p token.Position) int {
	if p.Column < 1 {
		return 0
	}
	if p.Line < 1 || p.Line > len(s.lines) {
		return p.Column
	}
	start := s.lines[p.Line-1]
	end := len(s.content)
	if p.Line < len(s.lines) {
		end = s.lines[p.Line] - 1
	}
	if start+p.Column-1 > end {
		return p.Column
	}
	return UTF16Column(s.content, start+p.Column-1, p.Column)
}

// fileURI returns the file URI of an absolute path (RFC 8089).
func fileURI(path string) string {
	u := url.URL{Scheme: "file", Path: filepath.ToSlash(path)}
	if !strings.HasPrefix(u.Path, "/") {
		u.Path = "/" + u.Path // a Windows drive letter path
	}
	return u.String()
}

// dirURI is fileURI with the trailing slash §3.14.14 requires of a base.
func dirURI(dir string) string {
	u := fileURI(dir)
	if !strings.HasSuffix(u, "/") {
		u += "/"
	}
	return u
}

// escapePath percent-encodes each segment of a relative slash path.
func escapePath(p string) string {
	segs := strings.Split(p, "/")
	for i, s := range segs {
		segs[i] = url.PathEscape(s)
	}
	return strings.Join(segs, "/")
}
