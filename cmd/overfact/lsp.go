package main

import (
	"context"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"

	"github.com/overfact/overfact/internal/lsp"
)

// runSubcommand runs the subcommands whose implementation lives in
// other packages of the project. It reports false when args[0] names
// none of them.
func runSubcommand(args []string) (int, bool) {
	switch args[0] {
	case "lsp":
		return runLSP(args[1:]), true
	}
	return 0, false
}

// runLSP implements "overfact lsp": a language server on stdin and
// stdout, for editors.
func runLSP(args []string) int {
	fs := flag.NewFlagSet("overfact lsp", flag.ContinueOnError)
	logFile := fs.String("log", "", "append the server's trace to `file`")
	fs.Usage = func() {
		fmt.Fprintf(fs.Output(), "Usage: overfact lsp [-log file]\n\nServes the Language Server Protocol on stdin and stdout.\n\n")
		fs.PrintDefaults()
	}
	if err := fs.Parse(args); err != nil {
		return 2
	}
	var logw io.Writer
	if *logFile != "" {
		f, err := os.OpenFile(*logFile, os.O_CREATE|os.O_APPEND|os.O_WRONLY, 0o644)
		if err != nil {
			fmt.Fprintf(os.Stderr, "overfact lsp: %v\n", err)
			return 1
		}
		defer f.Close()
		logw = f
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	defer stop()
	if err := lsp.Serve(ctx, os.Stdin, os.Stdout, lsp.Options{Log: logw}); err != nil {
		fmt.Fprintf(os.Stderr, "overfact lsp: %v\n", err)
		return 1
	}
	return 0
}
