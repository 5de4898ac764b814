#!/usr/bin/env bash
# bench.sh measures what overfact costs on gonum v0.17.0 with its tests:
# overfact loaded as the command loads it (export data for the
# dependencies that cannot carry facts), and with every dependency from
# source, against an inspect-only no-op analyzer loaded as it needs itself
# (export data for every dependency), all under go/analysis/checker, runs
# interleaved, medians of N (default 5), each run in a process of its own
# so that peak memory is per side. It then runs the helper module's
# microbenchmarks.
#
# Run from the repository root:   scripts/bench.sh [N]
# Needs only Go and access to the module proxy.
set -euo pipefail
cd "$(dirname "$0")/.."
n=${1:-5}
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT
export GOWORK=off GOFLAGS=-mod=mod

echo "== machine"
echo "nproc: $(nproc)"
grep -m1 'model name' /proc/cpuinfo || true
grep MemTotal /proc/meminfo || true
go version
echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}"

mkdir -p "$work/mod"
(cd "$work/mod" && go mod init bench.example/run >/dev/null 2>&1 && go get -t gonum.org/v1/gonum/...@v0.17.0 >/dev/null 2>&1)
GOWORK="$PWD/go.work" GOFLAGS= go build -o "$work/bench" ./harness/bench # the checkout builds in its workspace

echo "== overfact against a no-op analyzer on export data, gonum.org/v1/gonum/... (tests included)"
(cd "$work/mod" && "$work/bench" -mode compare -n "$n" -dir "$work/mod" gonum.org/v1/gonum/...)

echo "== helper module microbenchmarks"
(cd fixes/lgamma && GOWORK= GOFLAGS= go test -run XXX -bench . -benchmem .)
