package lsp

import (
	"fmt"
	"net/url"
	"path/filepath"
	"runtime"
	"strings"
	"sync"
)

// document is one state of an open editor buffer. A document is never
// changed after it is stored: every change stores a new one, so a pointer
// to a document identifies one text, and two pointers are equal only if
// the buffer has not changed in between (a reopen or an undo back to an
// earlier version at the same number still makes a new document).
type document struct {
	uri     string // as the client sent it, so replies use its spelling
	path    string // absolute, cleaned file name
	version int32
	text    []byte
	// outOfStep, when not nil, says why text may no longer be the client's
	// buffer: a change could not be applied. Nothing computed from text is
	// offered for the document until a full-text change or a reopen.
	outOfStep error
}

// inStep reports whether the document's text is known to be the client's.
func (d *document) inStep() bool { return d != nil && d.outOfStep == nil }

// documents holds the open buffers; it is safe for concurrent use.
type documents struct {
	mu     sync.Mutex
	byPath map[string]*document
}

func newDocuments() *documents {
	return &documents{byPath: make(map[string]*document)}
}

// open records a buffer the client opened. A second open of the same
// buffer without a close in between replaces it: the client's text is the
// truth, whatever its version number says. It returns the new document and
// the one it replaced, if any.
func (ds *documents) open(uri string, version int32, text string) (d, replaced *document, err error) {
	path, err := uriToPath(uri)
	if err != nil {
		return nil, nil, err
	}
	d = &document{uri: uri, path: path, version: version, text: []byte(text)}
	ds.mu.Lock()
	defer ds.mu.Unlock()
	replaced = ds.byPath[path]
	ds.byPath[path] = d
	return d, replaced, nil
}

// change applies the content changes of one didChange notification in
// order, each range being interpreted against the text left by the previous
// change (LSP 3.17 "DidChangeTextDocumentParams"), and returns the new
// document.
//
// A change that cannot be applied (a range outside the text, or one that
// ends before it starts) leaves the server without the client's text. The
// document is then stored out of step, with the error as its cause, and
// returned with that error; later incremental changes cannot be applied
// either and keep it out of step. A full-text change, in this notification
// or a later one, puts it back in step.
func (ds *documents) change(uri string, version int32, changes []contentChange, enc encoding) (*document, error) {
	path, err := uriToPath(uri)
	if err != nil {
		return nil, err
	}
	ds.mu.Lock()
	defer ds.mu.Unlock()
	d, ok := ds.byPath[path]
	if !ok {
		return nil, fmt.Errorf("change of %s, which is not open", uri)
	}
	text, cause := d.text, d.outOfStep
	for i, c := range changes {
		switch {
		case c.Range == nil:
			text, cause = []byte(c.Text), nil
		case cause == nil:
			if next, err := applyChange(text, c, enc); err != nil {
				cause = fmt.Errorf("change %d of version %d: %w", i+1, version, err)
			} else {
				text = next
			}
		}
	}
	// Replace rather than mutate: snapshots taken earlier keep their text.
	nd := &document{uri: d.uri, path: path, version: version, text: text, outOfStep: cause}
	ds.byPath[path] = nd
	return nd, cause
}

// applyChange returns text with one content change applied.
func applyChange(text []byte, c contentChange, enc encoding) ([]byte, error) {
	if c.Range == nil {
		return []byte(c.Text), nil
	}
	start, err := enc.toOffset(text, c.Range.Start)
	if err != nil {
		return nil, err
	}
	end, err := enc.toOffset(text, c.Range.End)
	if err != nil {
		return nil, err
	}
	if end < start {
		return nil, fmt.Errorf("change range ends before it starts")
	}
	out := make([]byte, 0, len(text)-(end-start)+len(c.Text))
	out = append(out, text[:start]...)
	out = append(out, c.Text...)
	return append(out, text[end:]...), nil
}

// setText replaces a buffer's text with the full text the client sent
// (didSave with includeText), which also puts it back in step.
func (ds *documents) setText(path string, text string) {
	ds.mu.Lock()
	defer ds.mu.Unlock()
	if d, ok := ds.byPath[path]; ok && (d.outOfStep != nil || string(d.text) != text) {
		ds.byPath[path] = &document{uri: d.uri, path: path, version: d.version, text: []byte(text)}
	}
}

// close forgets a buffer and returns it, or nil if it was not open.
func (ds *documents) close(path string) *document {
	ds.mu.Lock()
	defer ds.mu.Unlock()
	d := ds.byPath[path]
	delete(ds.byPath, path)
	return d
}

// get returns the current state of the buffer for path, or nil.
func (ds *documents) get(path string) *document {
	ds.mu.Lock()
	defer ds.mu.Unlock()
	return ds.byPath[path]
}

// snapshot returns every open buffer. Documents are never mutated after
// they are stored, so the copies are consistent with one another.
func (ds *documents) snapshot() map[string]*document {
	ds.mu.Lock()
	defer ds.mu.Unlock()
	m := make(map[string]*document, len(ds.byPath))
	for p, d := range ds.byPath {
		m[p] = d
	}
	return m
}

// uriToPath converts a file URI (RFC 8089) into a cleaned absolute path.
func uriToPath(uri string) (string, error) {
	u, err := url.Parse(uri)
	if err != nil {
		return "", err
	}
	if u.Scheme != "file" {
		return "", fmt.Errorf("unsupported URI scheme %q in %s", u.Scheme, uri)
	}
	p := u.Path
	if runtime.GOOS == "windows" {
		// file:///C:/x has Path "/C:/x".
		p = strings.TrimPrefix(p, "/")
	}
	p = filepath.FromSlash(p)
	if !filepath.IsAbs(p) {
		return "", fmt.Errorf("URI %s does not name an absolute path", uri)
	}
	return filepath.Clean(p), nil
}

// pathToURI converts an absolute path into a file URI.
func pathToURI(path string) string {
	p := filepath.ToSlash(path)
	if !strings.HasPrefix(p, "/") {
		p = "/" + p
	}
	return (&url.URL{Scheme: "file", Path: p}).String()
}
