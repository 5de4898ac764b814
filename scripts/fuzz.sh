#!/usr/bin/env bash
# fuzz.sh fuzzes the overfact analyzer and its fixes (harness/fuzz,
# FuzzAnalyzer) with one worker, so that it can run beside other work on a
# small machine. Minimizing each new interesting input is capped at 20 executions
# (the default is 60s, during which no new inputs are tried).
#
# Run from the repository root:   scripts/fuzz.sh [DURATION]   (default 10m)
# A failing input is written to harness/fuzz/testdata/fuzz/FuzzAnalyzer/;
# go test ./harness/fuzz then replays it.
set -euo pipefail
cd "$(dirname "$0")/.."
echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version)"
exec go test -run XXX -fuzz FuzzAnalyzer -fuzztime "${1:-10m}" -fuzzminimizetime 20x -parallel 1 ./harness/fuzz
