#!/usr/bin/env bash
# scale.sh checks that analysis time grows no worse than linearly with the
# input: a generated function of 3,125, 12,500 and 50,000 lines, and a
# generated package of 125, 500 and 2,000 small factorial functions
# (medians of N runs, default 5; each size gets at most $CASETIME, default
# 2m, of analysis, after which its first run is reported as a lower bound),
# with the heap allocations per unit beside the time: a count that the
# machine's load and caches do not change.
# Then it shows that a second
# go vet -vettool run over an unchanged module is served from the build
# cache, and runs the command at the edges of its budget (bench -mode
# edges): "overfact std" with tests, one 5 MB generated file, and -fix on
# it, with wall time and peak RSS against their targets (medians of
# EDGES_N runs, default 1). With BASELINE set to a commit, the edges are
# run alternately with overfact built from that commit, and the ratios of
# this tree to it, measured under the same load, are printed beside.
#
# Run from the repository root:   [BASELINE=rev] [EDGES_N=n] scripts/scale.sh [N]
set -euo pipefail
cd "$(dirname "$0")/.."
n=${1:-5}
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-scale.XXXXXX")
trap 'rm -rf "$work"' EXIT

echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version); nproc $(nproc)"
go build -o "$work/bench" ./harness/bench
"$work/bench" -mode scale -n "$n" -casetime "${CASETIME:-2m}"

echo "== go vet -vettool twice over an unchanged module"
go build -o "$work/overfact" ./cmd/overfact
# The module vetted is a scratch copy of gonum v0.17.0 (copied out of the
# module cache). The default build cache is kept, so compiled packages may
# be cached already; the vet results of a newly built overfact are not.
mod="$work/gonum"
src=$(cd "$work" && go mod download -json gonum.org/v1/gonum@v0.17.0 | awk -F'"' '/"Dir"/{print $4}')
cp -r "$src" "$mod"
chmod -R u+w "$mod"
(cd "$mod" && GOWORK=off go mod download)
now() { date +%s.%N; }
vet() {
	local start end rc=0
	start=$(now)
	(cd "$mod" && GOWORK=off go vet -vettool="$work/overfact" ./... >"$work/vet.out" 2>&1) || rc=$?
	end=$(now)
	awk -v a="$start" -v b="$end" -v l="$1" -v rc="$rc" -v n="$(wc -l <"$work/vet.out")" \
		'BEGIN{printf "%-26s %7.2fs  exit %d, %d lines of output\n", l, b-a, rc, n}'
}
vet "first run (new vettool)"
echo "   (go vet exits 1 when the tool reports findings; first lines of its output:)"
head -4 "$work/vet.out" | cut -c1-160 | sed 's/^/   /'
vet "second run (unchanged)"
vet "third run (unchanged)"

echo "== at the edges: overfact std, one 5 MB generated file, -fix on it"
baseline=()
if [ -n "${BASELINE:-}" ]; then
	mkdir "$work/baseline"
	git archive "$BASELINE" | tar -x -C "$work/baseline"
	(cd "$work/baseline" && go build -o "$work/overfact-baseline" ./cmd/overfact)
	baseline=(-baseline "$work/overfact-baseline")
	echo "baseline: overfact at $(git rev-parse --short "$BASELINE")"
fi
"$work/bench" -mode edges -n "${EDGES_N:-1}" -overfact "$work/overfact" "${baseline[@]}"
