package lsp

// Text document synchronisation: didOpen, didChange, didSave, didClose.

import (
	"fmt"
	"path/filepath"
	"runtime/debug"
)

func (s *server) didOpen(p didOpenParams) error {
	d, replaced, err := s.docs.open(p.TextDocument.URI, p.TextDocument.Version, p.TextDocument.Text)
	if err != nil {
		return err
	}
	if replaced != nil {
		// LSP 3.17 forbids a second open without a close, but clients
		// that restart a buffer send one; its text is the client's.
		s.log.Printf("%s opened again without a close (version %d, was %d): taking the new text", filepath.Base(d.path), d.version, replaced.version)
	}
	s.schedule(d.path, 0, false)
	return nil
}

func (s *server) didChange(p didChangeParams) error {
	path, err := uriToPath(p.TextDocument.URI)
	if err != nil {
		return err
	}
	wasInStep := s.docs.get(path).inStep()
	d, err := s.docs.change(p.TextDocument.URI, p.TextDocument.Version, p.ContentChanges, s.encoding())
	switch {
	case d == nil:
		return err
	case err != nil:
		if wasInStep {
			s.lostStep(d)
		}
		return err
	case !wasInStep:
		s.log.Printf("%s is back in step at version %d (full text received)", filepath.Base(path), d.version)
	}
	s.schedule(path, s.opts.Debounce, false)
	return nil
}

// lostStep handles a document whose text the server no longer knows: its
// findings and fixes are withdrawn, since their positions may not be the
// client's, and the user is told how to recover.
func (s *server) lostStep(d *document) {
	s.publishMu.Lock()
	defer s.publishMu.Unlock()
	s.mu.Lock()
	delete(s.cache, d.path)
	s.mu.Unlock()
	s.publish(d.uri, &d.version, nil)
	s.log.Printf("%s is out of step: %v", filepath.Base(d.path), d.outOfStep)
	s.showLog(logWarning, fmt.Sprintf("overfact: lost track of the text of %s (%v); its diagnostics and quick fixes are withheld until the editor sends the whole text again, for example by closing and reopening the file", filepath.Base(d.path), d.outOfStep))
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
	s.publishMu.Lock()
	defer s.publishMu.Unlock()
	s.mu.Lock()
	if t, ok := s.timers[path]; ok && t.Stop() {
		s.wg.Done()
	}
	delete(s.timers, path)
	delete(s.cache, path)
	delete(s.reported, path)
	s.mu.Unlock()
	s.publish(p.TextDocument.URI, nil, nil)
	s.release()
	return nil
}

// release drops, in the background, what the server keeps for packages
// none of whose files is open any more, and returns the freed memory to
// the system: an editor session opens and closes many packages, and a
// closed one is not worth its loaded dependency graph. It waits for a
// running analysis, which may be adding the package just closed. Closes
// that arrive meanwhile share one release.
func (s *server) release() {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.releasing || s.closing {
		return
	}
	s.releasing = true
	s.wg.Add(1)
	go func() {
		defer s.wg.Done()
		s.analysisMu.Lock()
		s.mu.Lock()
		s.releasing = false
		s.mu.Unlock()
		dropped := s.pkgs.forget(func(path string) bool { return s.docs.get(path) != nil })
		s.analysisMu.Unlock()
		if dropped {
			s.log.Printf("dropped the packages of closed files")
			debug.FreeOSMemory()
		}
	}()
}
