package lsp

import (
	"fmt"
	"net/url"
	"path/filepath"
	"runtime"
	"strings"
	"sync"
)

// document is one open editor buffer.
type document struct {
	uri     string // as the client sent it, so replies use its spelling
	path    string // absolute, cleaned file name
	version int32
	text    []byte
}

// documents holds the open buffers; it is safe for concurrent use.
type documents struct {
	mu     sync.Mutex
	byPath map[string]*document
}

func newDocuments() *documents {
	return &documents{byPath: make(map[string]*document)}
}

// open records a buffer the client opened.
func (ds *documents) open(uri string, version int32, text string) (*document, error) {
	path, err := uriToPath(uri)
	if err != nil {
		return nil, err
	}
	d := &document{uri: uri, path: path, version: version, text: []byte(text)}
	ds.mu.Lock()
	ds.byPath[path] = d
	ds.mu.Unlock()
	return d, nil
}

// change applies the content changes of one didChange notification in
// order, each range being interpreted against the text left by the previous
// change (LSP 3.17 "DidChangeTextDocumentParams").
func (ds *documents) change(uri string, version int32, changes []contentChange, enc encoding) error {
	path, err := uriToPath(uri)
	if err != nil {
		return err
	}
	ds.mu.Lock()
	defer ds.mu.Unlock()
	d, ok := ds.byPath[path]
	if !ok {
		return fmt.Errorf("change of %s, which is not open", uri)
	}
	text := d.text
	for _, c := range changes {
		text, err = applyChange(text, c, enc)
		if err != nil {
			return err
		}
	}
	// Replace rather than mutate: snapshots taken earlier keep their text.
	ds.byPath[path] = &document{uri: d.uri, path: path, version: version, text: text}
	return nil
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

// setText replaces a buffer's text (didSave with includeText).
func (ds *documents) setText(path string, text string) {
	ds.mu.Lock()
	defer ds.mu.Unlock()
	if d, ok := ds.byPath[path]; ok {
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
