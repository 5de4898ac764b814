#!/usr/bin/env bash
# realcorpus.sh scores overfact against hand labels of real code: the
# functions with factorial-like arithmetic in published Go modules, each
# labelled BAD (silently returns a wrong value for an input its signature
# admits while the true result fits its type) or SAFE, and the functions
# computing exponentials of log-gamma sums also DIGITS-BAD (off by more
# than 1e-12 relative for an admitted input) or DIGITS-SAFE, in
# testdata/realcorpus/labels.tsv.
#
# For every module@version named there it
#   1. fetches the module from the module proxy into a throwaway module
#      (nothing of it is written to this repository),
#   2. runs `overfact -json -test=false PACKAGES` on it, with the package
#      patterns of testdata/realcorpus/modules.tsv (labels cover non-test
#      files),
#   3. matches the findings to the labelled functions (a finding counts for
#      the function whose lines hold it), lgamma-digits findings against
#      the digits labels and all others against the overflow labels, and
#      prints per dimension, per module and in total BAD found (TP), BAD
#      missed (FN), functions with findings that are not labelled bad (FP,
#      each listed), recall and precision, then every missed BAD function
#      with its shape, and the two dimensions combined,
#   4. runs the probes: in a scratch copy of each module it writes an
#      in-package test that calls each BAD and DIGITS-BAD function at its
#      probe input and compares the value with an exact math/big
#      reference; PASS means the wrong value (or, for digits, a finite
#      value off by more than 1e-12 relative) is shown, FAIL means the
#      label is wrong (or the probe is).
#
# Run from the repository root:   scripts/realcorpus.sh
# Output files go to $OUT (default: a new temporary directory, printed).
# Needs Go and the module proxy. Exit status: non-zero when a probe FAILs,
# a probe package does not build, or the labels do not match the source.
set -euo pipefail
cd "$(dirname "$0")/.."
repo=$(pwd)
labels="$repo/testdata/realcorpus/labels.tsv"
modules="$repo/testdata/realcorpus/modules.tsv"
helpers="$repo/testdata/realcorpus/helpers"
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-realcorpus.XXXXXX")
OUT=${OUT:-$work/out}
mkdir -p "$OUT"
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work/mods" "$work/probe" "$work/bin"' EXIT
export GOWORK=off GOFLAGS=-mod=mod

echo "== building (overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)})"
mkdir -p "$work/bin"
go build -o "$work/bin/overfact" ./cmd/overfact
go build -o "$work/bin/realcorpus" ./internal/realcorpus

mods=$(grep -v '^#' "$modules" | tail -n +2 | cut -f1,2 | tr '\t' '@')
echo "== modules: $(echo "$mods" | wc -l)"
scoreargs=()
for mv in $mods; do
	m=${mv%@*}
	patterns=$(grep -v '^#' "$modules" | awk -F'\t' -v m="$m" '$1 == m {print $3}')
	slug=$(echo "$mv" | tr '/@' '__')
	dir="$work/mods/$slug"
	mkdir -p "$dir"
	(cd "$dir" && go mod init realcorpus.example/run >/dev/null 2>&1 && go get "$mv" >/dev/null 2>"$OUT/$slug.get.err") ||
		{ echo "go get $mv failed:"; cat "$OUT/$slug.get.err"; exit 1; }
	src=$(cd "$dir" && go list -m -f '{{.Dir}}' "$m")
	rc=0
	(cd "$dir" && "$work/bin/overfact" -json -test=false $patterns) >"$OUT/$slug.json" 2>"$OUT/$slug.err" || rc=$?
	# 0: no findings, 3: findings; 1: errors (reported in the JSON and stderr)
	echo "$mv: overfact exit status $rc, $(grep -c '"posn"' "$OUT/$slug.json" || true) findings"
	if [ $rc -ne 0 ] && [ $rc -ne 3 ]; then head -5 "$OUT/$slug.err"; fi
	scoreargs+=("$mv" "$src" "$OUT/$slug.json")
	echo "$src" >"$OUT/$slug.dir"
done

echo "== score"
"$work/bin/realcorpus" score -labels "$labels" -modules "$modules" "${scoreargs[@]}" | tee "$OUT/score.md"

echo "== probes: each BAD and DIGITS-BAD function at its probe input against math/big"
failed=0
for mv in $mods; do
	m=${mv%@*}
	slug=$(echo "$mv" | tr '/@' '__')
	src=$(cat "$OUT/$slug.dir")
	pdir="$work/probe/$slug"
	mkdir -p "$work/probe"
	cp -r "$src" "$pdir"
	chmod -R u+w "$pdir"
	# The copy resolves its own checksums: some published go.sum files do not
	# parse with today's go command.
	rm -f "$pdir/go.sum"
	pkgs=$("$work/bin/realcorpus" probes -labels "$labels" -helpers "$helpers" "$m" "$pdir")
	[ -n "$pkgs" ] || continue
	rc=0
	(cd "$pdir" && go test -count=1 -run '^TestOverfactProbe$' -v $pkgs) >"$OUT/$slug.probe.txt" 2>&1 || rc=$?
	grep '^PROBE ' "$OUT/$slug.probe.txt" || true
	if [ $rc -ne 0 ]; then
		echo "$mv: probe build or run failed (exit $rc):"
		grep -v '^PROBE ' "$OUT/$slug.probe.txt" | head -30
		failed=1
	fi
done
pass=$(cat "$OUT"/*.probe.txt 2>/dev/null | grep -c '^PROBE PASS' || true)
fail=$(cat "$OUT"/*.probe.txt 2>/dev/null | grep -c '^PROBE FAIL' || true)
bad=$(grep -v '^#' "$labels" | tail -n +2 | awk -F'\t' '$7 == "BAD" || $7 == "DIGITS-BAD"' | wc -l)
echo "== probes: $pass PASS (wrong value shown), $fail FAIL, of $bad BAD and DIGITS-BAD labels"
[ "$fail" -eq 0 ] && [ "$pass" -eq "$bad" ] || failed=1
echo "== results in $OUT"
exit $failed
