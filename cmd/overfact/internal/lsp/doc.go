// Package lsp implements the overfact language server: a Language Server
// Protocol 3.17 server over a byte stream (stdio in practice) that publishes
// overfact's findings for the Go files an editor has open and offers their
// suggested fixes as quick-fix code actions.
//
// The server analyses unsaved buffer contents: every open document is given
// to golang.org/x/tools/go/packages as an overlay, the package of the changed
// file is loaded with its dependencies from source, and the analyzers run
// through golang.org/x/tools/go/analysis/checker, so facts computed on
// dependencies reach the analysed package as they do under go vet. The
// loaded dependencies are kept, so that after an edit only the edited
// package is parsed, type-checked and analysed again (reuse.go, memo.go).
//
// The transport is JSON-RPC 2.0 with Content-Length framing, written here on
// top of encoding/json because the x/tools implementations are internal.
// The server is meant to run beside gopls, not to replace it: it answers only
// the lifecycle, document synchronisation and code action requests.
//
// The files follow the protocol's areas, as gopls's server does:
//
//   - jsonrpc.go: Content-Length framing and JSON-RPC messages (transport);
//   - protocol.go, position.go: the protocol's types and position encodings;
//   - server.go: options, per-connection state, Serve;
//   - dispatch.go: the read loop and routing of requests and notifications;
//   - lifecycle.go: initialize, shutdown, exit;
//   - textsync.go and documents.go: didOpen/didChange/didSave/didClose and
//     the store of open buffers;
//   - diagnostics.go: scheduling analyses and publishing their findings;
//   - codeaction.go: quick fixes;
//   - analyze.go, reuse.go, memo.go: loading and analysing a package, and
//     what is kept between analyses.
package lsp
