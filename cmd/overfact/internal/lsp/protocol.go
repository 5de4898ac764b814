package lsp

// The subset of LSP 3.17 structures the server reads or writes, named as in
// the specification so a reader can look each one up there.

// Position is a zero-based line and character offset; the character unit is
// the negotiated position encoding (UTF-16 code units unless agreed
// otherwise).
type Position struct {
	Line      uint32 `json:"line"`
	Character uint32 `json:"character"`
}

// Range is a half-open span of positions.
type Range struct {
	Start Position `json:"start"`
	End   Position `json:"end"`
}

// Location is a range inside a document.
type Location struct {
	URI   string `json:"uri"`
	Range Range  `json:"range"`
}

// DiagnosticSeverity values of LSP 3.17.
const (
	SeverityError       = 1
	SeverityWarning     = 2
	SeverityInformation = 3
	SeverityHint        = 4
)

// Diagnostic is an LSP diagnostic.
type Diagnostic struct {
	Range              Range                          `json:"range"`
	Severity           int                            `json:"severity,omitempty"`
	Code               string                         `json:"code,omitempty"`
	CodeDescription    *CodeDescription               `json:"codeDescription,omitempty"`
	Source             string                         `json:"source,omitempty"`
	Message            string                         `json:"message"`
	RelatedInformation []DiagnosticRelatedInformation `json:"relatedInformation,omitempty"`
}

// CodeDescription links a diagnostic code to its documentation.
type CodeDescription struct {
	Href string `json:"href"`
}

// DiagnosticRelatedInformation points at a second place a diagnostic concerns.
type DiagnosticRelatedInformation struct {
	Location Location `json:"location"`
	Message  string   `json:"message"`
}

// TextEdit replaces Range with NewText.
type TextEdit struct {
	Range   Range  `json:"range"`
	NewText string `json:"newText"`
}

// VersionedTextDocumentIdentifier names a document at a version; a nil
// Version means the document is not open (LSP's OptionalVersioned form).
type VersionedTextDocumentIdentifier struct {
	URI     string `json:"uri"`
	Version *int32 `json:"version"`
}

// TextDocumentEdit is the documentChanges form of a WorkspaceEdit entry.
type TextDocumentEdit struct {
	TextDocument VersionedTextDocumentIdentifier `json:"textDocument"`
	Edits        []TextEdit                      `json:"edits"`
}

// WorkspaceEdit carries edits either per URI (Changes) or, when the client
// supports it, as versioned document edits (DocumentChanges).
type WorkspaceEdit struct {
	Changes         map[string][]TextEdit `json:"changes,omitempty"`
	DocumentChanges []TextDocumentEdit    `json:"documentChanges,omitempty"`
}

// CodeAction is a quick fix offered to the client.
type CodeAction struct {
	Title       string         `json:"title"`
	Kind        string         `json:"kind,omitempty"`
	Diagnostics []Diagnostic   `json:"diagnostics,omitempty"`
	IsPreferred bool           `json:"isPreferred,omitempty"`
	Edit        *WorkspaceEdit `json:"edit,omitempty"`
}

// kindQuickFix is the CodeActionKind of every action the server offers.
const kindQuickFix = "quickfix"

// Text document synchronisation kinds (TextDocumentSyncKind).
const (
	syncFull        = 1
	syncIncremental = 2
)

type initializeParams struct {
	ProcessID    *int               `json:"processId"`
	Capabilities clientCapabilities `json:"capabilities"`
}

type clientCapabilities struct {
	General *struct {
		PositionEncodings []string `json:"positionEncodings"`
	} `json:"general"`
	Workspace *struct {
		WorkspaceEdit *struct {
			DocumentChanges bool `json:"documentChanges"`
		} `json:"workspaceEdit"`
	} `json:"workspace"`
}

type initializeResult struct {
	Capabilities serverCapabilities `json:"capabilities"`
	ServerInfo   serverInfo         `json:"serverInfo"`
}

type serverInfo struct {
	Name    string `json:"name"`
	Version string `json:"version,omitempty"`
}

type serverCapabilities struct {
	PositionEncoding   string             `json:"positionEncoding"`
	TextDocumentSync   textDocumentSync   `json:"textDocumentSync"`
	CodeActionProvider codeActionProvider `json:"codeActionProvider"`
}

type textDocumentSync struct {
	OpenClose bool        `json:"openClose"`
	Change    int         `json:"change"`
	Save      saveOptions `json:"save"`
}

type saveOptions struct {
	IncludeText bool `json:"includeText"`
}

type codeActionProvider struct {
	CodeActionKinds []string `json:"codeActionKinds"`
}

type textDocumentItem struct {
	URI        string `json:"uri"`
	LanguageID string `json:"languageId"`
	Version    int32  `json:"version"`
	Text       string `json:"text"`
}

type textDocumentIdentifier struct {
	URI string `json:"uri"`
}

type didOpenParams struct {
	TextDocument textDocumentItem `json:"textDocument"`
}

type didChangeParams struct {
	TextDocument struct {
		URI     string `json:"uri"`
		Version int32  `json:"version"`
	} `json:"textDocument"`
	ContentChanges []contentChange `json:"contentChanges"`
}

// contentChange is one TextDocumentContentChangeEvent: with a Range it
// replaces that range, without one it is the whole new text.
type contentChange struct {
	Range *Range `json:"range,omitempty"`
	Text  string `json:"text"`
}

type didSaveParams struct {
	TextDocument textDocumentIdentifier `json:"textDocument"`
	Text         *string                `json:"text,omitempty"`
}

type didCloseParams struct {
	TextDocument textDocumentIdentifier `json:"textDocument"`
}

type codeActionParams struct {
	TextDocument textDocumentIdentifier `json:"textDocument"`
	Range        Range                  `json:"range"`
	Context      struct {
		Only []string `json:"only,omitempty"`
	} `json:"context"`
}

type publishDiagnosticsParams struct {
	URI         string       `json:"uri"`
	Version     *int32       `json:"version,omitempty"`
	Diagnostics []Diagnostic `json:"diagnostics"`
}

// Message types of window/logMessage.
const (
	logError   = 1
	logWarning = 2
	logInfo    = 3
)

type logMessageParams struct {
	Type    int    `json:"type"`
	Message string `json:"message"`
}
