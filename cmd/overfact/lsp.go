package main

import (
	"context"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"

	"github.com/overfact/overfact/cmd/overfact/internal/lsp"
)

// runLSP implements "overfact lsp": a language server on stdin and
// stdout, for editors.
func runLSP(args []string, _, stderr io.Writer) int {
	fs := flag.NewFlagSet("overfact lsp", flag.ContinueOnError)
	logFile := fs.String("log", "", "append the server's trace to `file`")
	fs.Usage = func() {
		fmt.Fprintf(fs.Output(), "Usage: overfact lsp [-log file]\n\nServes the Language Server Protocol on stdin and stdout.\n\n")
		fs.PrintDefaults()
	}
	if rest, code, ok := parseFlags(fs, args, stderr); !ok {
		return code
	} else if len(rest) > 0 {
		fmt.Fprintf(stderr, "overfact lsp: unexpected arguments %q\n", rest)
		return 2
	}
	var logw io.Writer
	if *logFile != "" {
		f, err := os.OpenFile(*logFile, os.O_CREATE|os.O_APPEND|os.O_WRONLY, 0o644)
		if err != nil {
			fmt.Fprintf(stderr, "overfact lsp: %v\n", err)
			return 1
		}
		defer f.Close()
		logw = f
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	defer stop()
	if err := lsp.Serve(ctx, os.Stdin, os.Stdout, lsp.Options{Log: logw}); err != nil {
		fmt.Fprintf(stderr, "overfact lsp: %v\n", err)
		return 1
	}
	return 0
}
