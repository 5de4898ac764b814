package lsp

// Diagnostics: when an analysis runs (scheduling, debounce), and publishing
// its findings as textDocument/publishDiagnostics.

import (
	"fmt"
	"path/filepath"
	"strings"
	"time"
)

// fileResult is what the server last published for one file: the
// findings of one analysed state of its buffer.
type fileResult struct {
	doc      *document
	findings []finding
}

// cached returns what was last published for path, or nil.
func (s *server) cached(path string) *fileResult {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.cache[path]
}

// schedule arranges for path to be analysed after delay, replacing an
// analysis of it still waiting, so that only the newest version is analysed.
// Unless force is set, the analysis is skipped if an analysis of a sibling
// file has meanwhile published this version's findings, as when an editor
// starting up reopens every file of a package at once.
func (s *server) schedule(path string, delay time.Duration, force bool) {
	if !isGoFile(path) {
		return
	}
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.closing {
		return
	}
	if t, ok := s.timers[path]; ok && t.Stop() {
		s.wg.Done()
	}
	s.wg.Add(1)
	s.timers[path] = time.AfterFunc(delay, func() {
		defer s.wg.Done()
		defer s.recoverTo("analysis")
		s.refresh(path, !force)
	})
}

func isGoFile(path string) bool { return strings.HasSuffix(path, ".go") }

// refresh analyses the package of path against the current buffers and
// publishes the findings of each of its open files whose buffer has not
// changed meanwhile; results for a changed buffer are dropped, since the
// analysis its change scheduled will replace them.
//
// With onlyIfStale, a file whose published findings are already those of
// its current version is left alone: a code action request arriving while
// the analysis its didOpen scheduled runs then waits for that one only, and
// files of a package opened together are analysed once.
func (s *server) refresh(path string, onlyIfStale bool) {
	s.analysisMu.Lock()
	defer s.analysisMu.Unlock()
	if s.ctx.Err() != nil {
		return
	}
	docs := s.docs.snapshot()
	d, ok := docs[path]
	if !ok {
		return // closed while waiting
	}
	if r := s.cached(path); onlyIfStale && r != nil && r.doc == d {
		s.log.Printf("%s (version %d) already analysed", filepath.Base(path), d.version)
		return
	}
	start := time.Now()
	res, err := s.analyze(docs, path)
	if err != nil {
		s.reportProblem(path, err)
		res = &result{docs: map[string]*document{path: d}}
	} else {
		s.mu.Lock()
		delete(s.reported, path)
		s.mu.Unlock()
	}
	how := "loaded"
	if res.rechecked {
		how = "re-checked"
	}
	s.log.Printf("analysed %s (version %d, %s) in %v", filepath.Base(path), d.version, how, time.Since(start).Round(time.Millisecond))
	for f, ad := range res.docs {
		s.store(ad, res.findings[f])
	}
}

// reportProblem logs why a file could not be analysed, and tells the user
// once per file rather than after every keystroke.
func (s *server) reportProblem(path string, err error) {
	s.log.Printf("%v", err)
	s.mu.Lock()
	already := s.reported[path]
	s.reported[path] = true
	s.mu.Unlock()
	if already || s.ctx.Err() != nil {
		return
	}
	kind := logWarning
	if strings.HasPrefix(err.Error(), "panic") {
		kind = logError
	}
	s.showLog(kind, fmt.Sprintf("overfact: no findings for %s: %v", filepath.Base(path), firstLine(err.Error())))
}

func firstLine(s string) string {
	first, _, _ := strings.Cut(s, "\n")
	return first
}

// store records and publishes the findings of the analysed document ad if
// its buffer is still in the state analysed and in step with the client.
// The check and the publication happen under publishMu, which a change
// that puts the buffer out of step and a close also take to withdraw the
// findings, so stale findings cannot be published after the withdrawal.
func (s *server) store(ad *document, fs []finding) {
	s.publishMu.Lock()
	defer s.publishMu.Unlock()
	if d := s.docs.get(ad.path); d != ad || !d.inStep() {
		return
	}
	s.mu.Lock()
	if s.closing {
		s.mu.Unlock()
		return
	}
	s.cache[ad.path] = &fileResult{doc: ad, findings: fs}
	s.mu.Unlock()
	v := ad.version
	s.publish(ad.uri, &v, fs)
}

// publish sends textDocument/publishDiagnostics; no findings clears the
// client's list for the document.
func (s *server) publish(uri string, version *int32, fs []finding) {
	diags := make([]Diagnostic, 0, len(fs))
	for _, f := range fs {
		diags = append(diags, f.diag)
	}
	s.notify("textDocument/publishDiagnostics", publishDiagnosticsParams{URI: uri, Version: version, Diagnostics: diags})
}

func (s *server) showLog(kind int, msg string) {
	s.notify("window/logMessage", logMessageParams{Type: kind, Message: msg})
}
