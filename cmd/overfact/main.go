// The overfact command finds factorial arithmetic that overflows its
// type and states the first input at which it breaks.
//
// One binary serves every way it is run:
//
//	overfact [flags] PACKAGES       analyse packages (go/packages patterns)
//	overfact bounds [TYPE...]       print the overflow thresholds table
//	overfact version                print the module and Go versions
//	overfact lsp                    serve the Language Server Protocol on stdin/stdout
//	overfact helper [DEST]          copy the helper module into the current module
//	overfact help [SUBCOMMAND]      print the usage
//	go vet -vettool=$(which overfact) PACKAGES
//	go fix -fixtool=$(which overfact) PACKAGES
//
// Under go vet and go fix the command speaks their unit protocol
// (-V=full, -flags, and one .cfg file per package), handled by
// unitchecker. Standalone, it exits 0 when clean, 3 when it reports
// findings, 1 on errors and 2 on a bad command line. See docs/command.md for every flag.
package main

import (
	"os"

	"golang.org/x/tools/go/analysis/unitchecker"

	"github.com/overfact/overfact/analyzer"
)

func main() {
	args := os.Args[1:]
	if isUnitProtocol(args) {
		// unitchecker parses os.Args itself and exits.
		unitchecker.Main(analyzer.Analyzer)
		return
	}
	os.Exit(dispatch(args))
}

// isUnitProtocol reports whether the command was started by the go
// command as a vet or fix tool: to describe itself (-V=full), to list
// its flags (-flags), or to analyse one unit described by a .cfg file,
// always the last argument.
func isUnitProtocol(args []string) bool {
	if len(args) == 0 {
		return false
	}
	for _, a := range args {
		if a == "-V=full" || a == "-V" || a == "--V=full" || a == "-flags" || a == "--flags" {
			return true
		}
	}
	return isVetConfig(args[len(args)-1])
}

// dispatch runs the subcommand args[0] names, or else the standalone
// analysis, and returns the exit code.
func dispatch(args []string) int {
	if len(args) > 0 {
		if c := lookup(args[0]); c != nil {
			return c.run(args[1:], os.Stdout, os.Stderr)
		}
	}
	return runAnalysis(args)
}
