package main

import (
	"flag"
	"fmt"
	"io"
)

// A subcommand is a mode of the command named by its first argument.
// Every subcommand is a row of subcommands: dispatch, help and the usage
// text all read the table.
type subcommand struct {
	name    string
	args    string // the synopsis after the name
	summary string
	run     func(args []string, stdout, stderr io.Writer) int
}

// subcommands is filled in init, since "help" refers to the table.
var subcommands []subcommand

func init() {
	subcommands = []subcommand{
		{"bounds", "[-json] [-arch ARCH] [TYPE...]", "print where factorials stop fitting each type", runBounds},
		{"version", "", "print the version, VCS revision and Go version", func(_ []string, stdout, _ io.Writer) int { return runVersion(stdout) }},
		{"lsp", "[-log file]", "serve the Language Server Protocol on stdin/stdout", runLSP},
		{"helper", "[-from DIR] [DEST]", "copy the helper module into this module, wired with a replace", runHelper},
		{"help", "[SUBCOMMAND]", "print this text, or a subcommand's", runHelp},
	}
}

// lookup returns the subcommand called name, or nil.
func lookup(name string) *subcommand {
	for i := range subcommands {
		if subcommands[i].name == name {
			return &subcommands[i]
		}
	}
	return nil
}

// runHelp implements "overfact help [SUBCOMMAND]".
func runHelp(args []string, stdout, stderr io.Writer) int {
	switch {
	case len(args) == 0:
		fs := analysisFlags(nil)
		fs.SetOutput(stdout)
		usage(fs)
		return 0
	case len(args) > 1:
		fmt.Fprintf(stderr, "overfact help: want one subcommand, got %q\n", args)
		return 2
	case args[0] == "help":
		fmt.Fprintln(stdout, "Usage: overfact help [SUBCOMMAND]")
		return 0
	}
	c := lookup(args[0])
	if c == nil {
		fmt.Fprintf(stderr, "overfact help: unknown subcommand %q; the subcommands are %s\n", args[0], subcommandNames())
		return 2
	}
	return c.run([]string{"-h"}, stdout, stdout) // asked for, the usage is output
}

func subcommandNames() string {
	s := ""
	for i, c := range subcommands {
		if i > 0 {
			s += ", "
		}
		s += c.name
	}
	return s
}

// parseFlags parses args with fs, allowing flags after positional
// arguments (overfact bounds int8 -json) up to a "--", and returns the
// positional ones. A bad flag is reported in two lines, the error first,
// instead of the error followed by the whole usage; -h prints the usage.
// ok is false when the caller should exit with code.
func parseFlags(fs *flag.FlagSet, args []string, stderr io.Writer) (rest []string, code int, ok bool) {
	usage := fs.Usage
	fs.Usage = func() {}
	fs.SetOutput(io.Discard)
	defer func() {
		fs.Usage = usage
		fs.SetOutput(stderr)
	}()
	for {
		if err := fs.Parse(args); err != nil {
			fs.SetOutput(stderr)
			if err == flag.ErrHelp {
				usage()
				return nil, 0, false
			}
			fmt.Fprintf(stderr, "%s: %v\nRun '%s -h' for usage.\n", fs.Name(), err, fs.Name())
			return nil, 2, false
		}
		left := fs.Args()
		if consumed := args[:len(args)-len(left)]; len(consumed) > 0 && consumed[len(consumed)-1] == "--" {
			return append(rest, left...), 0, true
		}
		if len(left) == 0 {
			return rest, 0, true
		}
		rest = append(rest, left[0])
		args = left[1:]
	}
}
