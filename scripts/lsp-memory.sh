#!/usr/bin/env bash
# lsp-memory.sh measures the memory of the language server over a long
# editing session: cmd/overfact/internal/lsp/memclient writes a module of N small
# packages (default 120, each importing fmt and math, each with a finding
# that has a quick fix) into a temporary directory, starts "overfact lsp"
# on it as an editor would, and for each package in turn opens its file,
# waits for the diagnostics, asks for the quick fixes, edits the buffer,
# waits for the new diagnostics and closes the file. It prints the
# server's RSS and peak RSS (VmHWM, from /proc/PID/status) as it goes, and
# at the end the peak against the 1 GiB target.
#
# Run from the repository root:   scripts/lsp-memory.sh [N]
set -euo pipefail
cd "$(dirname "$0")/.."
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-lspmem.XXXXXX")
trap 'rm -rf "$work"' EXIT

echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version); nproc $(nproc)"
go build -o "$work/overfact" ./cmd/overfact
go build -o "$work/memclient" ./cmd/overfact/internal/lsp/memclient
"$work/memclient" -server "$work/overfact" -packages "${1:-120}"
