package driver

import (
	"crypto/sha256"
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"os"
	"sync"

	"golang.org/x/tools/go/analysis"
)

// sources records what the analysis saw of each file: the SHA-256 of the
// text it parsed. -fix computes its edits for that text, so before it
// touches a file it checks the file still holds it; a file edited while
// the analysis ran (by an editor, or by another -fix) is left alone,
// since edits computed for the old text would corrupt the new one. A hash
// rather than the size: an edit that keeps the size changes offsets too.
type sources struct {
	mu      sync.Mutex
	sums    map[string][sha256.Size]byte
	changed map[string]bool // parsed twice, with different texts
}

func newSources() *sources {
	return &sources{sums: make(map[string][sha256.Size]byte), changed: make(map[string]bool)}
}

// parseFile is a packages.Config.ParseFile that records the text of every
// file it parses from disk; the files in overlay are -fix's own edited
// text, not the disk's. It parses as go/packages does by default.
func (s *sources) parseFile(overlay map[string][]byte) func(*token.FileSet, string, []byte) (*ast.File, error) {
	return func(fset *token.FileSet, name string, src []byte) (*ast.File, error) {
		if _, ok := overlay[name]; !ok {
			s.record(name, src)
		}
		return parser.ParseFile(fset, name, src, parseMode)
	}
}

// record notes that name was parsed from src. The first text seen is the
// one the analysis used; a later, different one marks the file changed.
func (s *sources) record(name string, src []byte) {
	sum := sha256.Sum256(src)
	s.mu.Lock()
	defer s.mu.Unlock()
	if old, ok := s.sums[name]; !ok {
		s.sums[name] = sum
	} else if old != sum {
		s.changed[name] = true
	}
}

// check returns an error unless content is the text the analysis parsed
// as name.
func (s *sources) check(name string, content []byte) error {
	s.mu.Lock()
	sum, ok := s.sums[name]
	changed := s.changed[name]
	s.mu.Unlock()
	switch {
	case !ok:
		return fmt.Errorf("%s was not analysed", name)
	case changed || sha256.Sum256(content) != sum:
		return fmt.Errorf("%s changed since it was analysed", name)
	}
	return nil
}

// knows reports whether name was parsed (an assembly or cgo file a pass
// may read was not).
func (s *sources) knows(name string) bool {
	s.mu.Lock()
	defer s.mu.Unlock()
	_, ok := s.sums[name]
	return ok
}

// withSources returns a copy of a whose passes read the files named in
// overlay from it, and every other file from the disk only if it still
// holds the text that was parsed. The checker's Pass.ReadFile reads the
// disk; a fix builder that reads the source must see the text the syntax
// came from, which in a later round of -fix is the edited text, and in
// any round is never a newer text that the positions do not describe.
func withSources(a *analysis.Analyzer, overlay map[string][]byte, src *sources) *analysis.Analyzer {
	wrapped := *a
	wrapped.Run = func(pass *analysis.Pass) (any, error) {
		disk := pass.ReadFile
		if disk == nil {
			disk = os.ReadFile
		}
		// A pass reads a file once (and checks its hash once): every fix
		// of its findings reads the file, and with thousands of them in
		// a large file the reads, not the fixes, would cost the most.
		// The text kept is the one the positions describe, which a later
		// read could only refuse.
		var mu sync.Mutex
		read := make(map[string][]byte)
		pass.ReadFile = func(name string) ([]byte, error) {
			if content, ok := overlay[name]; ok {
				return content, nil
			}
			mu.Lock()
			defer mu.Unlock()
			if content, ok := read[name]; ok {
				return content, nil
			}
			content, err := disk(name)
			if err != nil {
				return nil, err
			}
			if src.knows(name) {
				if err := src.check(name, content); err != nil {
					return nil, err
				}
			}
			read[name] = content
			return content, nil
		}
		return a.Run(pass)
	}
	return &wrapped
}
