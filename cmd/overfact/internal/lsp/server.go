package lsp

// The server: its options, its state, and Serve, which runs one connection.

import (
	"context"
	"fmt"
	"io"
	"log"
	"sync"
	"time"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/internal/driver"
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
	// FactScan, when set, tells from syntax which dependencies may carry
	// the analyzers' facts, so that the others come from export data
	// (driver.LoadForFacts); nil means overfact's own scan when Analyzers
	// is nil, and every dependency from source otherwise.
	FactScan driver.FactScan
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
	releasing  bool // a release of closed packages' state is pending

	analysisMu sync.Mutex     // one analysis at a time: the machine is shared
	publishMu  sync.Mutex     // orders publications of one document's findings and their withdrawal
	wg         sync.WaitGroup // timers and request goroutines in flight

	// analyzeFn, when set, replaces the loading and analysis of a
	// package, so that the protocol's handling can be fuzzed at the
	// speed of its own code.
	analyzeFn func(docs map[string]*document, path string, enc encoding) (*result, error)
}

// Serve runs a language server reading requests from in and writing
// responses and notifications to out until the client sends exit, in ends,
// or ctx is done. It returns nil after an orderly shutdown and exit.
func Serve(ctx context.Context, in io.Reader, out io.Writer, opts Options) error {
	return serve(ctx, in, out, opts, nil)
}

// serve is Serve with the package analysis replaced by analyzeFn, if set.
func serve(ctx context.Context, in io.Reader, out io.Writer, opts Options, analyzeFn func(map[string]*document, string, encoding) (*result, error)) error {
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

		analyzeFn: analyzeFn,
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
		if opts.FactScan == nil {
			opts.FactScan = analyzer.MayCarryFacts
		}
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

func (s *server) encoding() encoding {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.enc
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

// analyze analyses the package of path against the open buffers docs.
func (s *server) analyze(docs map[string]*document, path string) (*result, error) {
	if s.analyzeFn != nil {
		return s.analyzeFn(docs, path, s.encoding())
	}
	return analyze(s.ctx, &s.opts, &s.pkgs, docs, path, s.encoding())
}
