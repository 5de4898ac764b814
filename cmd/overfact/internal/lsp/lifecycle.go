package lsp

// Lifecycle: initialize (capability negotiation), shutdown and exit.

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
)

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

// shutdown answers the shutdown request: from now on the server only
// waits for exit.
func (s *server) shutdown() {
	s.mu.Lock()
	defer s.mu.Unlock()
	s.state = stateShutdown
}

// exit handles the exit notification; it is an error unless shutdown came
// first (LSP 3.17 "Exit Notification": exit code 1 in that case).
func (s *server) exit() error {
	s.mu.Lock()
	defer s.mu.Unlock()
	if s.state != stateShutdown {
		return errors.New("exit before shutdown")
	}
	return nil
}
