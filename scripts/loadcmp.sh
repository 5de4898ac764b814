#!/usr/bin/env bash
# loadcmp.sh checks that loading only what facts need changes nothing: it
# runs overfact, tests included, over the standard library of the
# installed toolchain, gonum v0.17.0 and golang.org/x/tools v0.52.0, once
# with every dependency type-checked from source and once as the command
# loads them (source for the dependencies that may carry facts, export
# data for the rest), and fails unless every diagnostic, fix and fact is
# the same. The standard library is also a dependency of the other two,
# which is where its packages come from export data.
#
# Run from the repository root:   scripts/loadcmp.sh
# Needs only Go and access to the module proxy; nothing is written to the
# repository.
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-loadcmp.XXXXXX")
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work"' EXIT
export GOWORK=off GOFLAGS=-mod=mod

echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version)"
GOWORK="$PWD/go.work" GOFLAGS= go build -o "$work/bench" ./harness/bench # the checkout builds in its workspace

module() { # DIR PATH VERSION: a throwaway module requiring PATH@VERSION and its tests' imports
	mkdir -p "$1"
	(cd "$1" && go mod init loadcmp.example/run >/dev/null 2>&1 && go get -t "$2/...@$3" >/dev/null 2>&1)
}
failed=0
run() { # NAME DIR PATTERN
	echo "== $1"
	(cd "$2" && "$work/bench" -mode loadcmp -dir "$2" "$3") || failed=1
}
mkdir -p "$work/std"
(cd "$work/std" && go mod init loadcmp.example/std >/dev/null 2>&1)
run std "$work/std" std
module "$work/gonum" gonum.org/v1/gonum v0.17.0
run gonum "$work/gonum" gonum.org/v1/gonum/...
module "$work/xtools" golang.org/x/tools v0.52.0
run xtools "$work/xtools" golang.org/x/tools/...
exit $failed
