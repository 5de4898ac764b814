#!/usr/bin/env bash
# lsp-latency.sh measures how long "overfact lsp" makes an editor wait:
# cmd/overfact/internal/lsp/memclient -latency starts the server as an editor would and
#   - opens gonum v0.17.0's stat/distuv/binomial.go cold (a fresh server,
#     twice: the first may also build gonum's export data into the go
#     build cache) and times the first diagnostics (target 1.5 s);
#   - opens a generated 2,000-line file and times N edits (default 20),
#     each from the change to the diagnostics of its version, and prints
#     the median beyond the server's 300 ms debounce (target 100 ms).
#
# Run from the repository root:   scripts/lsp-latency.sh [N]
# Needs only Go and access to the module proxy.
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-lsplat.XXXXXX")
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work"' EXIT

echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version); nproc $(nproc)"
go build -o "$work/overfact" ./cmd/overfact
go build -o "$work/memclient" ./cmd/overfact/internal/lsp/memclient
# A scratch copy of gonum (the module cache is read-only), its
# dependencies downloaded, as a checkout an editor opens would be.
src=$(cd "$work" && GOWORK=off GOFLAGS=-mod=mod go mod download -json gonum.org/v1/gonum@v0.17.0 | awk -F'"' '/"Dir"/{print $4}')
cp -r "$src" "$work/gonum"
chmod -R u+w "$work/gonum"
(cd "$work/gonum" && GOWORK=off go mod download)
GOWORK=off "$work/memclient" -server "$work/overfact" -latency -open "$work/gonum/stat/distuv/binomial.go" -edits "${1:-20}"
