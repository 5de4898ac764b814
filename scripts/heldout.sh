#!/usr/bin/env bash
# heldout.sh scores overfact on the held-out scenario sets: each set's
# five packages of testdata/src, written and labelled before any run
# (docs/blind2-labels.tsv … docs/blind5-labels.tsv),
# are copied into a throwaway module without their .golden files, the
# command built from this tree runs on it (`overfact ./...`), and
# scripts/heldout-score.py prints per set the BAD functions found
# (recall), the SAFE and NEUTRAL functions with a finding, and each miss.
#
#   scripts/heldout.sh            # all four sets
#   scripts/heldout.sh 4          # one set
set -euo pipefail
cd "$(dirname "$0")/.."
root=$PWD
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
go build -o "$tmp/overfact" ./cmd/overfact
echo "overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}"

declare -A sets=(
	[2]="exacttest puzzlebox queuedesk sparecheck spinstats"
	[3]="orbitals curveforge latticeprice outbreak fieldgene"
	[4]="annuity claimfreq bracketodds dspwindow repairshop"
	[5]="speciesrich coalesce microstates matchgoals bezierkit"
)
for n in ${@:-2 3 4 5}; do
	d=$tmp/set$n
	mkdir -p "$d"
	printf 'module heldout%s\n\ngo 1.22\n' "$n" >"$d/go.mod"
	for p in ${sets[$n]}; do
		cp -r "testdata/src/$p" "$d/"
	done
	find "$d" -name '*.golden' -delete
	(cd "$d" && "$tmp/overfact" ./... >out 2>&1) || true
	echo "== set $n (docs/blind$n-labels.tsv)"
	python3 "$root/scripts/heldout-score.py" "docs/blind$n-labels.tsv" "$d" "$d/out"
done
