package main

import (
	"fmt"
	"io"
	"runtime"
	"runtime/debug"

	"golang.org/x/mod/module"
	"golang.org/x/mod/semver"

	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/driver"
)

// helperRelease is the version of the helper module that the root
// go.mod requires, the helper of a build made from a checkout
// (TestHelperReleaseMatchesGoMod keeps the two equal; docs/release.md
// moves both).
const helperRelease = "v0.1.0"

// helperModule is the helper module the fixes of this build import, at
// the version matching it. Both modules are tagged together (see
// docs/release.md), so a command installed with go install …@vX.Y.Z
// asks for fixes/lgamma vX.Y.Z; any other build asks for helperRelease.
func helperModule() driver.Helper {
	v := moduleVersion()
	if !semver.IsValid(v) || module.IsPseudoVersion(v) || semver.Build(v) != "" {
		v = helperRelease
	}
	return driver.Helper{Path: fixes.HelperPath, Version: v}
}

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
	v := moduleVersion()
	fmt.Fprintf(w, "overfact %s", v)
	if rev := vcsRevision(); rev != "" {
		fmt.Fprintf(w, " (revision %s)", rev)
	} else if v == "(devel)" {
		// In a checkout's workspace the go command's default,
		// -buildvcs=auto, records no revision.
		fmt.Fprint(w, " (no revision recorded: build with -buildvcs=true)")
	}
	fmt.Fprintf(w, " built with %s for %s/%s\n", runtime.Version(), runtime.GOOS, runtime.GOARCH)
	return 0
}
