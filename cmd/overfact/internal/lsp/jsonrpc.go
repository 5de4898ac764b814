package lsp

import (
	"bufio"
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"regexp"
	"strconv"
	"strings"
	"sync"
)

// JSON-RPC 2.0 and LSP error codes (JSON-RPC 2.0 specification section 5.1;
// LSP 3.17 "ErrorCodes").
const (
	codeParseError           = -32700
	codeInvalidRequest       = -32600
	codeMethodNotFound       = -32601
	codeInvalidParams        = -32602
	codeInternalError        = -32603
	codeServerNotInitialized = -32002
	codeRequestFailed        = -32803
)

// message is any JSON-RPC 2.0 message: a request has ID and Method, a
// notification only Method, a response ID and Result or Error.
type message struct {
	JSONRPC string           `json:"jsonrpc"`
	ID      *json.RawMessage `json:"id,omitempty"`
	Method  string           `json:"method,omitempty"`
	Params  json.RawMessage  `json:"params,omitempty"`
	Result  json.RawMessage  `json:"result,omitempty"`
	Error   *rpcError        `json:"error,omitempty"`
}

// rpcError is the error object of a JSON-RPC response.
type rpcError struct {
	Code    int    `json:"code"`
	Message string `json:"message"`
}

func (e *rpcError) Error() string { return fmt.Sprintf("jsonrpc error %d: %s", e.Code, e.Message) }

// decodeMessage decodes a message body. Member names are matched exactly,
// as JSON-RPC 2.0 names them: encoding/json alone would take "ID" or "iD"
// for "id", and so answer a notification as a request.
func decodeMessage(body []byte) (*message, error) {
	var members map[string]json.RawMessage
	if err := json.Unmarshal(body, &members); err != nil {
		return nil, err
	}
	m := new(message)
	for name, dst := range map[string]any{"jsonrpc": &m.JSONRPC, "id": &m.ID, "method": &m.Method, "params": &m.Params, "result": &m.Result, "error": &m.Error} {
		if raw, ok := members[name]; ok {
			if err := json.Unmarshal(raw, dst); err != nil {
				return nil, fmt.Errorf("member %q: %w", name, err)
			}
		}
	}
	return m, nil
}

// errNoLength reports a header block without a usable Content-Length; the
// body that may follow cannot be delimited, so the reader resynchronises on
// the next header.
var errNoLength = errors.New("jsonrpc: header without Content-Length")

// maxFrame bounds one message body; a larger length is treated as corrupt
// framing rather than allocated.
const maxFrame = 64 << 20

// frameReader splits a byte stream into Content-Length delimited frames
// (LSP 3.17 "Base Protocol").
type frameReader struct {
	r *bufio.Reader
}

func newFrameReader(r io.Reader) *frameReader {
	return &frameReader{r: bufio.NewReaderSize(r, 64<<10)}
}

// next returns the body of the next frame. It returns io.EOF when the stream
// ends between frames, io.ErrUnexpectedEOF when it ends inside one, and
// errNoLength for a header block it cannot use; after errNoLength the caller
// may call next again, which skips input until a line carrying a
// Content-Length header.
func (fr *frameReader) next() ([]byte, error) {
	length := -1
	sawHeader := false
	for {
		line, err := fr.r.ReadString('\n')
		if err != nil {
			if err == io.EOF && line == "" && !sawHeader {
				return nil, io.EOF
			}
			return nil, io.ErrUnexpectedEOF
		}
		line = strings.TrimRight(line, "\r\n")
		if line == "" {
			if !sawHeader {
				continue // stray blank line between frames
			}
			if length < 0 {
				return nil, errNoLength
			}
			break
		}
		// A header may be glued to the end of garbage (a body whose length
		// was unknown); resynchronise on the header name wherever it starts.
		if i := indexFold(line, "content-length:"); i >= 0 {
			n, err := strconv.Atoi(strings.TrimSpace(line[i+len("content-length:"):]))
			if err != nil || n < 0 || n > maxFrame {
				length = -1
			} else {
				length = n
			}
			sawHeader = true
			continue
		}
		if k, _, ok := strings.Cut(line, ":"); ok && isToken(k) {
			sawHeader = true
			continue // Content-Type or another header of the block
		}
		if !sawHeader {
			continue // garbage before a header: skip it
		}
		// Garbage inside a header block: the block is unusable.
		return nil, errNoLength
	}
	body := make([]byte, length)
	if _, err := io.ReadFull(fr.r, body); err != nil {
		return nil, io.ErrUnexpectedEOF
	}
	return body, nil
}

// indexFold is strings.Index ignoring ASCII case; sub is lower case. It
// compares bytes, so that its index is one into s: lower-casing s first
// would not do, since strings.ToLower replaces each invalid UTF-8 byte
// with the three bytes of U+FFFD and so shifts the index.
func indexFold(s, sub string) int {
	for i := 0; i+len(sub) <= len(s); i++ {
		j := 0
		for j < len(sub) && lowerASCII(s[i+j]) == sub[j] {
			j++
		}
		if j == len(sub) {
			return i
		}
	}
	return -1
}

func lowerASCII(c byte) byte {
	if 'A' <= c && c <= 'Z' {
		return c + 'a' - 'A'
	}
	return c
}

// isToken reports whether s is a plausible header field name (RFC 7230
// token characters, simplified to letters, digits and '-').
func isToken(s string) bool {
	if s == "" {
		return false
	}
	for _, c := range s {
		if !(c == '-' || c >= '0' && c <= '9' || c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z') {
			return false
		}
	}
	return true
}

// idPattern finds a request id in a body that is not valid JSON, so that a
// parse error can still be answered to the request that caused it.
var idPattern = regexp.MustCompile(`"id"\s*:\s*(-?[0-9]+|"(?:[^"\\]|\\.)*")`)

// guessID returns the id a malformed body seems to carry, or nil.
func guessID(body []byte) *json.RawMessage {
	m := idPattern.FindSubmatch(body)
	if m == nil {
		return nil
	}
	raw := json.RawMessage(bytes.Clone(m[1]))
	if !json.Valid(raw) {
		return nil
	}
	return &raw
}

// frameWriter writes frames; it is safe for concurrent use.
type frameWriter struct {
	mu sync.Mutex
	w  io.Writer
}

// write encodes m as one frame.
func (fw *frameWriter) write(m *message) error {
	m.JSONRPC = "2.0"
	body, err := json.Marshal(m)
	if err != nil {
		return err
	}
	fw.mu.Lock()
	defer fw.mu.Unlock()
	if _, err := fmt.Fprintf(fw.w, "Content-Length: %d\r\n\r\n", len(body)); err != nil {
		return err
	}
	_, err = fw.w.Write(body)
	return err
}
