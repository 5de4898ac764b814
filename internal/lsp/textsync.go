package lsp

// Text document synchronisation: didOpen, didChange, didSave, didClose.

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
