package main

import (
	"fmt"
	"io"
	"runtime"
	"runtime/debug"
)

// moduleVersion returns the version of the main module as the go
// command recorded it: a tag such as v0.1.0 when installed with
// go install ...@version, "(devel)" when built in a checkout.
func moduleVersion() string {
	info, ok := debug.ReadBuildInfo()
	if !ok || info.Main.Version == "" {
		return "(unknown)"
	}
	return info.Main.Version
}

// vcsRevision returns the commit the binary was built from, if the go
// command stamped it.
func vcsRevision() string {
	info, ok := debug.ReadBuildInfo()
	if !ok {
		return ""
	}
	rev, dirty := "", false
	for _, s := range info.Settings {
		switch s.Key {
		case "vcs.revision":
			rev = s.Value
		case "vcs.modified":
			dirty = s.Value == "true"
		}
	}
	if rev != "" && dirty {
		rev += "+dirty"
	}
	return rev
}

// runVersion implements "overfact version".
func runVersion(w io.Writer) int {
	fmt.Fprintf(w, "overfact %s", moduleVersion())
	if rev := vcsRevision(); rev != "" {
		fmt.Fprintf(w, " (revision %s)", rev)
	}
	fmt.Fprintf(w, " built with %s for %s/%s\n", runtime.Version(), runtime.GOOS, runtime.GOARCH)
	return 0
}
