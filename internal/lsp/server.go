package lsp

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"log"
	"path/filepath"
	"strings"
	"sync"
	"time"

	"golang.org/x/tools/go/analysis"
)

// Options configures a server. The zero value is usable.
type Options struct {
	// Analyzers are run on each analysed package; nil means overfact's
	// own analyzer.
	Analyzers []*analysis.Analyzer
	// Debounce is how long the server waits after a change before it
	// analyses, so that typing does not start one analysis per keystroke;
	// zero means 300ms, a negative value no wait.
	Debounce time.Duration
	// Log receives the server's trace of its own work; nil discards it.
	Log io.Writer
	// Severity maps a diagnostic's category to an LSP severity
	// (SeverityError ... SeverityHint); nil means the overfact scheme.
	Severity func(category string) int
}

// defaultDebounce is long enough to cover the gap between keystrokes of a
// typist and short enough to feel immediate (common practice in editors'
// "on idle" hooks).
const defaultDebounce = 300 * time.Millisecond

// server states.
const (
	stateNew = iota
	stateRunning
	stateShutdown
)

// server is one connection's worth of state.
type server struct {
	opts Options
	ctx  context.Context
	out  *frameWriter
	log  *log.Logger
	docs *documents
	pkgs loadCache // packages kept between analyses

	mu         sync.Mutex // guards the fields below
	state      int
	enc        encoding
	docChanges bool                   // client accepts WorkspaceEdit.documentChanges
	cache      map[string]*fileResult // latest published findings per path
	timers     map[string]*time.Timer // pending analyses per path
	reported   map[string]bool        // paths whose load problem was logged
	closing    bool

	analysisMu sync.Mutex     // one analysis at a time: the machine is shared
	wg         sync.WaitGroup // timers and request goroutines in flight
}

// fileResult is what the server last published for one file.
type fileResult struct {
	version  int32
	findings []finding
}

// Serve runs a language server reading requests from in and writing
// responses and notifications to out until the client sends exit, in ends,
// or ctx is done. It returns nil after an orderly shutdown and exit.
func Serve(ctx context.Context, in io.Reader, out io.Writer, opts Options) error {
	opts = withDefaults(opts)
	ctx, cancel := context.WithCancel(ctx)
	s := &server{
		opts:     opts,
		ctx:      ctx,
		out:      &frameWriter{w: out},
		log:      log.New(opts.Log, "overfact lsp: ", log.Ltime|log.Lmicroseconds),
		docs:     newDocuments(),
		enc:      encUTF16,
		cache:    make(map[string]*fileResult),
		timers:   make(map[string]*time.Timer),
		reported: make(map[string]bool),
	}
	err := s.loop(ctx, newFrameReader(in))
	s.stop()
	cancel()
	s.wg.Wait()
	return err
}

func withDefaults(opts Options) Options {
	if opts.Analyzers == nil {
		opts.Analyzers = defaultAnalyzers()
	}
	if opts.Debounce == 0 {
		opts.Debounce = defaultDebounce
	} else if opts.Debounce < 0 {
		opts.Debounce = 0
	}
	if opts.Log == nil {
		opts.Log = io.Discard
	}
	if opts.Severity == nil {
		opts.Severity = defaultSeverity
	}
	return opts
}

// frame is one read from the input: a body or the error that replaced it.
type frame struct {
	body []byte
	err  error
}

// loop reads and dispatches messages. Reading happens on its own goroutine
// so that a cancelled ctx ends Serve even while the client is silent.
func (s *server) loop(ctx context.Context, fr *frameReader) error {
	frames := make(chan frame)
	go func() {
		for {
			body, err := fr.next()
			select {
			case frames <- frame{body, err}:
			case <-ctx.Done():
				return
			}
			if err != nil && err != errNoLength {
				return
			}
		}
	}()
	for {
		var f frame
		select {
		case <-ctx.Done():
			return ctx.Err()
		case f = <-frames:
		}
		switch {
		case f.err == errNoLength:
			s.log.Printf("skipping a message without Content-Length")
			continue
		case f.err != nil:
			return s.endOfInput(f.err)
		}
		if done, err := s.handle(f.body); done {
			return err
		}
	}
}

// endOfInput decides what an end of the input means: the normal end of a
// connection after shutdown, or a client that went away.
func (s *server) endOfInput(err error) error {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.state == stateShutdown {
		return nil
	}
	if err == io.EOF {
		return errors.New("input closed before shutdown")
	}
	return fmt.Errorf("reading input: %w", err)
}

// handle dispatches one message body; done reports that exit was received.
func (s *server) handle(body []byte) (done bool, err error) {
	var m message
	if err := json.Unmarshal(body, &m); err != nil {
		s.log.Printf("malformed message: %v", err)
		if id := guessID(body); id != nil {
			s.replyError(id, codeParseError, "parse error: "+err.Error())
		}
		return false, nil
	}
	switch {
	case m.Method == "" && m.ID != nil:
		return false, nil // a response; the server sends no requests
	case m.Method == "":
		s.replyError(m.ID, codeInvalidRequest, "message has neither method nor id")
		return false, nil
	case m.ID == nil:
		return s.notification(m.Method, m.Params)
	default:
		s.request(m.ID, m.Method, m.Params)
		return false, nil
	}
}

// request answers one request. Requests that may wait for an analysis run
// on their own goroutine so that notifications keep flowing.
func (s *server) request(id *json.RawMessage, method string, params json.RawMessage) {
	s.mu.Lock()
	state := s.state
	s.mu.Unlock()
	switch {
	case method == "initialize":
		if state != stateNew {
			s.replyError(id, codeInvalidRequest, "initialize sent twice")
			return
		}
		s.reply(id, s.initialize(params))
		return
	case state == stateNew:
		s.replyError(id, codeServerNotInitialized, "server not initialized")
		return
	case state == stateShutdown:
		s.replyError(id, codeInvalidRequest, "server is shutting down")
		return
	}
	switch method {
	case "shutdown":
		s.mu.Lock()
		s.state = stateShutdown
		s.mu.Unlock()
		s.reply(id, nil)
	case "textDocument/codeAction":
		var p codeActionParams
		if err := json.Unmarshal(params, &p); err != nil {
			s.replyError(id, codeInvalidParams, err.Error())
			return
		}
		s.goRequest(func() { s.reply(id, s.codeActions(p)) })
	default:
		s.replyError(id, codeMethodNotFound, "method not supported: "+method)
	}
}

// goRequest runs f on its own goroutine, recovering a panic into the log.
func (s *server) goRequest(f func()) {
	s.wg.Add(1)
	go func() {
		defer s.wg.Done()
		defer s.recoverTo("request")
		f()
	}()
}

func (s *server) recoverTo(what string) {
	if p := recover(); p != nil {
		s.log.Printf("panic in %s: %v", what, p)
		s.showLog(logError, fmt.Sprintf("overfact: internal error in %s: %v", what, p))
	}
}

// initialize negotiates the position encoding and reports capabilities.
func (s *server) initialize(params json.RawMessage) *initializeResult {
	var p initializeParams
	if err := json.Unmarshal(params, &p); err != nil {
		s.log.Printf("initialize params: %v (using defaults)", err)
	}
	s.mu.Lock()
	defer s.mu.Unlock()
	if g := p.Capabilities.General; g != nil {
		s.enc = chooseEncoding(g.PositionEncodings)
	}
	if w := p.Capabilities.Workspace; w != nil && w.WorkspaceEdit != nil {
		s.docChanges = w.WorkspaceEdit.DocumentChanges
	}
	s.state = stateRunning
	return &initializeResult{
		Capabilities: serverCapabilities{
			PositionEncoding: string(s.enc),
			TextDocumentSync: textDocumentSync{
				OpenClose: true,
				Change:    syncIncremental,
				Save:      saveOptions{IncludeText: false},
			},
			CodeActionProvider: codeActionProvider{CodeActionKinds: []string{kindQuickFix}},
		},
		ServerInfo: serverInfo{Name: "overfact"},
	}
}

// notification handles one notification; unknown ones are ignored, as
// LSP 3.17 asks of methods starting with "$/" and allows for the rest.
func (s *server) notification(method string, params json.RawMessage) (done bool, err error) {
	if method == "exit" {
		s.mu.Lock()
		defer s.mu.Unlock()
		if s.state != stateShutdown {
			return true, errors.New("exit before shutdown")
		}
		return true, nil
	}
	s.mu.Lock()
	running := s.state == stateRunning
	s.mu.Unlock()
	if !running {
		return false, nil // before initialize or after shutdown: dropped
	}
	defer s.recoverTo(method)
	var perr error
	switch method {
	case "textDocument/didOpen":
		perr = decodeThen(params, s.didOpen)
	case "textDocument/didChange":
		perr = decodeThen(params, s.didChange)
	case "textDocument/didSave":
		perr = decodeThen(params, s.didSave)
	case "textDocument/didClose":
		perr = decodeThen(params, s.didClose)
	}
	if perr != nil {
		s.log.Printf("%s: %v", method, perr)
	}
	return false, nil
}

// decodeThen decodes params into a P and passes it to f.
func decodeThen[P any](params json.RawMessage, f func(P) error) error {
	var p P
	if err := json.Unmarshal(params, &p); err != nil {
		return err
	}
	return f(p)
}

func (s *server) encoding() encoding {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.enc
}

func (s *server) didOpen(p didOpenParams) error {
	d, err := s.docs.open(p.TextDocument.URI, p.TextDocument.Version, p.TextDocument.Text)
	if err != nil {
		return err
	}
	s.schedule(d.path, 0, false)
	return nil
}

func (s *server) didChange(p didChangeParams) error {
	if err := s.docs.change(p.TextDocument.URI, p.TextDocument.Version, p.ContentChanges, s.encoding()); err != nil {
		return err
	}
	path, _ := uriToPath(p.TextDocument.URI)
	s.schedule(path, s.opts.Debounce, false)
	return nil
}

func (s *server) didSave(p didSaveParams) error {
	path, err := uriToPath(p.TextDocument.URI)
	if err != nil {
		return err
	}
	if p.Text != nil {
		s.docs.setText(path, *p.Text)
	}
	s.schedule(path, 0, true) // published again even if unchanged, as clients expect on save
	return nil
}

func (s *server) didClose(p didCloseParams) error {
	path, err := uriToPath(p.TextDocument.URI)
	if err != nil {
		return err
	}
	s.docs.close(path)
	s.mu.Lock()
	if t, ok := s.timers[path]; ok && t.Stop() {
		s.wg.Done()
	}
	delete(s.timers, path)
	delete(s.cache, path)
	delete(s.reported, path)
	s.mu.Unlock()
	s.publish(p.TextDocument.URI, nil, nil)
	return nil
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

// stop cancels pending analyses; running ones finish on their own.
func (s *server) stop() {
	s.mu.Lock()
	defer s.mu.Unlock()
	s.closing = true
	for p, t := range s.timers {
		if t.Stop() {
			s.wg.Done()
		}
		delete(s.timers, p)
	}
}

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
	if r := s.cached(path); onlyIfStale && r != nil && r.version == d.version {
		s.log.Printf("%s (version %d) already analysed", filepath.Base(path), d.version)
		return
	}
	start := time.Now()
	res, err := analyze(s.ctx, &s.opts, &s.pkgs, docs, path, s.encoding())
	if err != nil {
		s.reportProblem(path, err)
		res = &result{versions: map[string]int32{path: d.version}}
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
	for f, v := range res.versions {
		s.store(f, v, res.findings[f])
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

// store records and publishes the findings for path if its buffer is still
// at version v.
func (s *server) store(path string, v int32, fs []finding) {
	d := s.docs.get(path)
	if d == nil || d.version != v {
		return
	}
	s.mu.Lock()
	if s.closing {
		s.mu.Unlock()
		return
	}
	s.cache[path] = &fileResult{version: v, findings: fs}
	s.mu.Unlock()
	s.publish(d.uri, &v, fs)
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

func (s *server) notify(method string, params any) {
	raw, err := json.Marshal(params)
	if err != nil {
		s.log.Printf("encoding %s: %v", method, err)
		return
	}
	if err := s.out.write(&message{Method: method, Params: raw}); err != nil {
		s.log.Printf("writing %s: %v", method, err)
	}
}

func (s *server) reply(id *json.RawMessage, result any) {
	raw, err := json.Marshal(result)
	if err != nil {
		s.replyError(id, codeInternalError, err.Error())
		return
	}
	if err := s.out.write(&message{ID: id, Result: raw}); err != nil {
		s.log.Printf("writing response: %v", err)
	}
}

// replyError sends an error response; a nil id is sent as null, as
// JSON-RPC 2.0 requires when the request's id is unknown.
func (s *server) replyError(id *json.RawMessage, code int, msg string) {
	if id == nil {
		null := json.RawMessage("null")
		id = &null
	}
	if err := s.out.write(&message{ID: id, Error: &rpcError{Code: code, Message: msg}}); err != nil {
		s.log.Printf("writing error response: %v", err)
	}
}
