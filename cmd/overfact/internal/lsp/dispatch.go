package lsp

// Dispatch: the read loop, and the routing of each message to its handler by
// method; responses and notifications go out through jsonrpc.go's frameWriter.

import (
	"context"
	"encoding/json"
)

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

// handle dispatches one message body; done reports that exit was received.
func (s *server) handle(body []byte) (done bool, err error) {
	m, err := decodeMessage(body)
	if err != nil {
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
		s.shutdown()
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

// notification handles one notification; unknown ones are ignored, as
// LSP 3.17 asks of methods starting with "$/" and allows for the rest.
func (s *server) notification(method string, params json.RawMessage) (done bool, err error) {
	if method == "exit" {
		return true, s.exit()
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
