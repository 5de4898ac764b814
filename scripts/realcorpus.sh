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
# With -fix (scripts/realcorpus.sh -fix) it runs steps 1 and 2, and then
# instead of 3 and 4, for every module:
#   5. copies the module twice out of the module cache (writable, with a
#      require and a replace of the helper module fixes/lgamma, as a user
#      gets from go get), runs `overfact -fix -test=false PACKAGES` on one
#      copy, and records the files it changed (a diff) and the findings
#      left after it,
#   6. builds and vets the touched packages, and runs their own tests:
#      first on the original copy, then, for the packages whose tests
#      pass there, on the fixed copy (a package whose tests fail or do
#      not build on the original is listed with the reason),
#   7. runs one generated test in both copies: every BAD probe, and every
#      labelled function of the overflow dimension on an input grid
#      (testdata/realcorpus/grids.tsv, or one generated from a numeric
#      signature), and compares original, fixed and math/big: a BAD
#      function is right after the fix when the fixed code is right
#      (floats within 1e-9 relative, integers exact) at its probe and on
#      every grid point whose exact value fits, or panics where it does
#      not fit; still wrong otherwise; newly failing when it panics where
#      the value fits; and any function whose fixed value differs where
#      the original was right (SAFE: anywhere) has a right value changed.
#      The table per module and in total goes to $OUT/after.md.
#
# Run from the repository root:   scripts/realcorpus.sh [-fix]
# (ONLY=REGEXP scripts/realcorpus.sh ... runs the modules matching REGEXP;
# MODTESTS=0 skips the modules' own tests in -fix mode, for quick runs.)
# Output files go to $OUT (default: a new temporary directory, printed).
# Needs Go and the module proxy. Exit status: non-zero when a probe FAILs,
# a probe package does not build, or the labels do not match the source.
set -euo pipefail
fixmode=false
if [ "${1:-}" = "-fix" ]; then fixmode=true; fi
cd "$(dirname "$0")/.."
repo=$(pwd)
labels="$repo/testdata/realcorpus/labels.tsv"
modules="$repo/testdata/realcorpus/modules.tsv"
helpers="$repo/testdata/realcorpus/helpers"
grids="$repo/testdata/realcorpus/grids.tsv"
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-realcorpus.XXXXXX")
OUT=${OUT:-$work/out}
mkdir -p "$OUT"
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work/mods" "$work/probe" "$work/bin" "$work/after"' EXIT
export GOWORK=off GOFLAGS=-mod=mod

echo "== building (overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)})"
mkdir -p "$work/bin"
go build -o "$work/bin/overfact" ./cmd/overfact
go build -o "$work/bin/realcorpus" ./internal/realcorpus

mods=$(grep -v '^#' "$modules" | tail -n +2 | cut -f1,2 | tr '\t' '@')
# ONLY=REGEXP keeps the modules whose path matches (a partial run, for
# work on one module; the tables then cover only those).
if [ -n "${ONLY:-}" ]; then mods=$(echo "$mods" | grep -E "$ONLY"); fi
failed=0
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

if $fixmode; then
	echo "== overfact -fix on a copy of each module, the copy against the original and math/big"
	compareargs=()
	for mv in $mods; do
		m=${mv%@*}
		patterns=$(grep -v '^#' "$modules" | awk -F'\t' -v m="$m" '$1 == m {print $3}')
		slug=$(echo "$mv" | tr '/@' '__')
		src=$(cat "$OUT/$slug.dir")
		a="$work/after/$slug"
		mkdir -p "$a"
		for c in orig fixed; do
			cp -r "$src" "$a/$c"
			chmod -R u+w "$a/$c"
			rm -f "$a/$c/go.sum"
			# Rewritten code imports the helper module, as a user would after go get.
			(cd "$a/$c" && go mod edit -require=github.com/overfact/overfact/fixes/lgamma@v0.1.0 \
				-replace=github.com/overfact/overfact/fixes/lgamma="$repo/fixes/lgamma")
		done
		rc=0
		(cd "$a/fixed" && "$work/bin/overfact" -fix -test=false $patterns) >"$OUT/$slug.fix.txt" 2>&1 || rc=$?
		(cd "$a/fixed" && "$work/bin/overfact" -json -test=false $patterns) >"$OUT/$slug.after.json" 2>/dev/null || true
		diff -ru --exclude=go.mod --exclude=go.sum "$a/orig" "$a/fixed" >"$OUT/$slug.fix.diff" || true
		files=$(grep -c '^+++ ' "$OUT/$slug.fix.diff" || true)
		touched=$(grep '^+++ ' "$OUT/$slug.fix.diff" | awk '{print $2}' | xargs -r -n1 dirname | sort -u |
			sed "s|^$a/fixed||; s|^/||; s|^|./|; s|^\./\$|.|" | sort -u || true)
		echo "-- $mv: overfact -fix exit status $rc; findings $(grep -c '"posn"' "$OUT/$slug.json" || true) before, $(grep -c '"posn"' "$OUT/$slug.after.json" || true) after; $files files changed ($OUT/$slug.fix.diff)"
		if [ -n "$touched" ]; then
			echo "   packages touched: $(echo $touched)"
			if (cd "$a/fixed" && go build $touched) >"$OUT/$slug.build.txt" 2>&1; then echo "   go build: ok"; else
				echo "   go build: FAILED"; head -20 "$OUT/$slug.build.txt"; failed=1; fi
			if (cd "$a/fixed" && go vet $touched) >"$OUT/$slug.vet.txt" 2>&1; then echo "   go vet: ok"; elif (cd "$a/orig" && go vet $touched) >/dev/null 2>&1; then
				echo "   go vet: FAILED (ok on the original)"; head -20 "$OUT/$slug.vet.txt"; failed=1; else
				echo "   go vet: fails on the original too"; fi
			for p in $touched; do
				if [ "${MODTESTS:-1}" = 0 ]; then echo "   go test $p: skipped (MODTESTS=0)"; continue; fi
				if ! (cd "$a/orig" && go test -count=1 -timeout 15m "$p") >"$OUT/$slug.origtest.txt" 2>&1; then
					echo "   go test $p: not run on the fixed copy, it fails on the original: $(grep -m1 -E '^(FAIL|---|#|.*cannot|.*no required)' "$OUT/$slug.origtest.txt" || tail -1 "$OUT/$slug.origtest.txt")"
				elif (cd "$a/fixed" && go test -count=1 -timeout 15m "$p") >"$OUT/$slug.fixtest.txt" 2>&1; then
					echo "   go test $p: ok on the original and on the fixed copy"
				else
					echo "   go test $p: FAILED on the fixed copy (ok on the original)"; grep -E '^(--- FAIL|FAIL|panic)' "$OUT/$slug.fixtest.txt" | head -20; failed=1
				fi
			done
		fi
		pkgs=$("$work/bin/realcorpus" after-write -labels "$labels" -grids "$grids" -helpers "$helpers" "$m" "$a/orig" "$a/fixed")
		[ -n "$pkgs" ] || continue
		for c in orig fixed; do
			(cd "$a/$c" && go test -count=1 -timeout 30m -run "^TestOverfactAfter\$" -v $pkgs) >"$OUT/$slug.after.$c.txt" 2>&1 ||
				{ echo "   after-fix test failed to run in the $c copy:"; grep -v '^AFTER ' "$OUT/$slug.after.$c.txt" | head -20; failed=1; }
		done
		compareargs+=("$m" "$a/orig" "$a/fixed" "$OUT/$slug.after.orig.txt" "$OUT/$slug.after.fixed.txt")
	done
	echo "== after -fix: BAD functions against math/big, SAFE functions against the original"
	"$work/bin/realcorpus" after-compare -labels "$labels" "${compareargs[@]}" | tee "$OUT/after.md"
	echo "== results in $OUT"
	exit $failed
fi

echo "== score"
"$work/bin/realcorpus" score -labels "$labels" -modules "$modules" "${scoreargs[@]}" | tee "$OUT/score.md"

echo "== probes: each BAD and DIGITS-BAD function at its probe input against math/big"
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
# Only the modules run count (ONLY= runs a part of the corpus).
bad=$(grep -v '^#' "$labels" | tail -n +2 | awk -F'\t' -v run="$(echo "$mods" | sed 's/@.*//' | tr '\n' ' ')" \
	'BEGIN { n = split(run, r, " "); for (i = 1; i <= n; i++) sel[r[i]] = 1 }
	($7 == "BAD" || $7 == "DIGITS-BAD") && ($1 in sel)' | wc -l)
echo "== probes: $pass PASS (wrong value shown), $fail FAIL, of $bad BAD and DIGITS-BAD labels"
[ "$fail" -eq 0 ] && [ "$pass" -eq "$bad" ] || failed=1
echo "== results in $OUT"
exit $failed
