package lsp

// Code actions: the quick fixes offered for the findings on record.

import (
	"sort"
	"strings"
)

// codeActions answers textDocument/codeAction with the suggested fixes of
// the findings whose range meets the requested one. If the findings on
// record are older than the buffer, the file is analysed first, so a fix is
// never computed against text the client no longer has. A document that is
// out of step gets no actions, and a fix is offered only while every file
// it edits is in the state its edits were computed for.
func (s *server) codeActions(p codeActionParams) []CodeAction {
	actions := []CodeAction{} // an empty list, not null: some clients mind
	if !wantsQuickFix(p.Context.Only) {
		return actions
	}
	path, err := uriToPath(p.TextDocument.URI)
	if err != nil {
		return actions
	}
	if !s.docs.get(path).inStep() {
		return actions
	}
	s.refresh(path, true)
	d := s.docs.get(path)
	r := s.cached(path)
	if r == nil || r.doc != d || !d.inStep() {
		return actions
	}
	s.mu.Lock()
	docChanges := s.docChanges
	s.mu.Unlock()
	for _, f := range r.findings {
		if !overlaps(f.diag.Range, p.Range) {
			continue
		}
		for i, fx := range f.fixes {
			if !s.current(fx) {
				continue
			}
			actions = append(actions, CodeAction{
				Title:       fx.title,
				Kind:        kindQuickFix,
				Diagnostics: []Diagnostic{f.diag},
				IsPreferred: i == 0,
				Edit:        s.workspaceEdit(fx, docChanges),
			})
		}
	}
	return actions
}

// wantsQuickFix reports whether a CodeActionContext.only filter admits
// quick fixes; kinds are hierarchical, so "quickfix.x" is not enough but
// "quickfix" and the empty filter are.
func wantsQuickFix(only []string) bool {
	if len(only) == 0 {
		return true
	}
	for _, k := range only {
		if k == kindQuickFix || strings.HasPrefix(kindQuickFix, k+".") {
			return true
		}
	}
	return false
}

// overlaps reports whether two ranges share a position, counting ranges
// that merely touch, so that a cursor at either end of a finding selects it.
func overlaps(a, b Range) bool {
	return !before(a.End, b.Start) && !before(b.End, a.Start)
}

func before(p, q Position) bool {
	return p.Line < q.Line || p.Line == q.Line && p.Character < q.Character
}

// current reports whether every file fx edits is still in the state the
// edits were computed for: the same open, in-step document, or a file
// that was closed then and is closed now.
func (s *server) current(fx fix) bool {
	for p, base := range fx.base {
		if d := s.docs.get(p); d != base || base != nil && !base.inStep() {
			return false
		}
	}
	return true
}

// workspaceEdit converts a fix into the edit form the client accepts. Open
// documents get the version their edits were computed for in
// documentChanges, so that a client can refuse an edit made for text it
// has since changed.
func (s *server) workspaceEdit(fx fix, docChanges bool) *WorkspaceEdit {
	paths := make([]string, 0, len(fx.edits))
	for p := range fx.edits {
		paths = append(paths, p)
	}
	sort.Strings(paths)
	we := &WorkspaceEdit{}
	if !docChanges {
		we.Changes = make(map[string][]TextEdit)
	}
	for _, p := range paths {
		uri := pathToURI(p)
		var version *int32
		if d := fx.base[p]; d != nil {
			uri = d.uri
			v := d.version
			version = &v
		}
		if docChanges {
			we.DocumentChanges = append(we.DocumentChanges, TextDocumentEdit{
				TextDocument: VersionedTextDocumentIdentifier{URI: uri, Version: version},
				Edits:        fx.edits[p],
			})
		} else {
			we.Changes[uri] = fx.edits[p]
		}
	}
	return we
}
