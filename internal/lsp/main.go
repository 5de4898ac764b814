package lsp

import (
	"context"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"
)

// Main runs the server on standard input and output with arguments as given
// after "overfact lsp", and returns the process exit code: 0 after an
// orderly shutdown, 1 otherwise, 2 for bad arguments.
func Main(args []string) int {
	fs := flag.NewFlagSet("overfact lsp", flag.ContinueOnError)
	fs.SetOutput(os.Stderr)
	debounce := fs.Duration("debounce", defaultDebounce, "wait this long after an edit before analysing")
	quiet := fs.Bool("quiet", false, "do not trace the server's work on standard error")
	fs.Usage = func() {
		fmt.Fprintln(fs.Output(), "usage: overfact lsp [-debounce d] [-quiet]\n\nRuns the overfact language server on standard input and output.")
		fs.PrintDefaults()
	}
	if err := fs.Parse(args); err != nil {
		return 2
	}
	if fs.NArg() > 0 {
		fs.Usage()
		return 2
	}
	var logw io.Writer = os.Stderr
	if *quiet {
		logw = io.Discard
	}
	d := *debounce
	if d == 0 {
		d = -1 // Options reads zero as "default"
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	defer stop()
	if err := Serve(ctx, os.Stdin, os.Stdout, Options{Debounce: d, Log: logw}); err != nil {
		fmt.Fprintln(os.Stderr, "overfact lsp:", err)
		return 1
	}
	return 0
}
