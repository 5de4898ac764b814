#!/usr/bin/env bash
# golangci.sh checks overfact's golangci-lint module plugin
# (integrations/golangci) for real. It builds a custom golangci-lint v2
# with the plugin compiled in, the way "golangci-lint custom" does
# (plugin imports in cmd/golangci-lint/plugins.go, a replace directive
# for a plugin given by path, go mod tidy, go build), except that the
# golangci-lint source comes from the module proxy instead of a git clone.
# Because overfact itself is not on the proxy yet, the build also replaces
# the overfact modules by this checkout.
#
# It then runs the custom golangci-lint and standalone overfact on the
# demo module and on a module of two packages whose finding needs a fact
# from the other package, and compares their findings; and it runs
# golangci-lint run --fix and overfact -fix on copies of the demo and
# compares the fixed files, and builds them.
#
# Run from the repository root:   scripts/golangci.sh
# GCL_VERSION picks the golangci-lint release (default v2.15.0).
# Needs Go and access to the module proxy. Building golangci-lint takes
# several minutes on 2 cores, which is why this is not in .ci/run.
# Exits 1 when the findings differ or a fixed module does not build.
set -euo pipefail
cd "$(dirname "$0")/.."
repo=$(pwd)
gcl_version=${GCL_VERSION:-v2.15.0}
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-golangci.XXXXXX")
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work"' EXIT
failed=0

echo "== overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)}; $(go version); golangci-lint $gcl_version"
GOWORK="$repo/go.work" GOFLAGS= go build -o "$work/overfact" ./cmd/overfact

echo "== building golangci-lint $gcl_version with the plugin (source from the module proxy)"
export GOWORK=off GOFLAGS=
src=$(cd "$work" && go mod download -json "github.com/golangci/golangci-lint/v2@$gcl_version" | awk -F'"' '/"Dir"/{print $4}')
cp -r "$src" "$work/gcl"
chmod -R u+w "$work/gcl"
cat >"$work/gcl/cmd/golangci-lint/plugins.go" <<'GO'
package main

import (
	_ "github.com/overfact/overfact/integrations/golangci"
)
GO
start=$(date +%s)
(
	cd "$work/gcl"
	go mod edit \
		-replace "github.com/overfact/overfact/integrations/golangci=$repo/integrations/golangci" \
		-replace "github.com/overfact/overfact=$repo" \
		-replace "github.com/overfact/overfact/fixes/lgamma=$repo/fixes/lgamma"
	go mod tidy
	go build -o "$work/golangci-lint" ./cmd/golangci-lint
)
echo "built in $(($(date +%s) - start)) s"
"$work/golangci-lint" version || true

cat >"$work/golangci.yml" <<'YML'
version: "2"
run:
  relative-path-mode: wd
linters:
  default: none
  enable:
    - overfact
  settings:
    custom:
      overfact:
        type: module
        description: factorial arithmetic that overflows its type
        original-url: github.com/overfact/overfact
issues:
  max-issues-per-linter: 0
  max-same-issues: 0
output:
  formats:
    text:
      path: stdout
      print-linter-name: true
      print-issued-lines: false
      colors: false
YML

# module NAME SRC copies a module to $work/NAME and points its replace of
# the helper at this checkout.
module() {
	rm -rf "$work/$1"
	cp -r "$2" "$work/$1"
	(cd "$work/$1" && go mod edit -replace "github.com/overfact/overfact/fixes/lgamma=$repo/fixes/lgamma")
}

# compare NAME DIR: findings of both tools, as sorted file:line:col: message
# lines, with the linter name golangci-lint appends stripped. Related
# positions are left out on both sides: overfact prints them indented
# under their finding, golangci-lint as issues of their own
# ("overfact(related information): …"), which are counted apart.
compare() {
	local rc=0
	(cd "$2" && "$work/overfact" ./... 2>&1 >/dev/null) | grep -v ': 	' | sort >"$work/$1.overfact" || true
	(cd "$2" && "$work/golangci-lint" run --config "$work/golangci.yml" ./...) >"$work/$1.gcl.raw" 2>&1 || rc=$?
	grep ' (overfact)$' "$work/$1.gcl.raw" | grep -v ': overfact(related information): ' | sed 's/ (overfact)$//' | sort >"$work/$1.gcl" || true
	echo "== $1: overfact $(wc -l <"$work/$1.overfact") findings, golangci-lint $(wc -l <"$work/$1.gcl") (exit $rc), and $(grep -c ': overfact(related information): ' "$work/$1.gcl.raw" || true) related-information issues"
	if diff -u "$work/$1.overfact" "$work/$1.gcl"; then
		echo "   same findings"
	else
		echo "   findings differ (- overfact, + golangci-lint); golangci-lint's output:"
		sed 's/^/   | /' "$work/$1.gcl.raw" | head -40
		failed=1
	fi
}

module demo "$repo/testdata/demo"
compare demo "$work/demo"

# Facts across packages: kit defines a factorial, app calls it with 24.
mkdir -p "$work/facts/kit" "$work/facts/app"
printf 'module example.com/facts\n\ngo 1.21\n' >"$work/facts/go.mod"
cat >"$work/facts/kit/kit.go" <<'GO'
// Package kit is a shared maths kit.
package kit

// Factorial returns n!.
func Factorial(n int64) int64 {
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}
GO
cat >"$work/facts/app/app.go" <<'GO'
// Package app counts seatings with the kit.
package app

import "example.com/facts/kit"

// Seatings of 24 guests.
func Seatings() int64 { return kit.Factorial(24) }
GO
compare facts "$work/facts"
grep -q 'app/app.go' "$work/facts.gcl" || { echo "   golangci-lint has no finding in app/app.go: the fact did not cross packages"; failed=1; }

echo "== golangci-lint run --fix against overfact -fix on the demo"
module demo-gcl "$repo/testdata/demo"
module demo-of "$repo/testdata/demo"
(cd "$work/demo-gcl" && "$work/golangci-lint" run --config "$work/golangci.yml" --fix ./... >/dev/null 2>&1) || true
(cd "$work/demo-of" && "$work/overfact" -fix ./... 2>/dev/null) || true
changed() { diff -rq "$work/demo" "$1" | grep -c differ || true; }
echo "   files changed: golangci-lint --fix $(changed "$work/demo-gcl"), overfact -fix $(changed "$work/demo-of")"
if diff -ru "$work/demo-of" "$work/demo-gcl" >"$work/fix.diff"; then
	echo "   identical results"
else
	echo "   the results differ (- overfact -fix, + golangci-lint --fix):"
	sed 's/^/   | /' "$work/fix.diff" | head -60
fi
for d in demo-gcl demo-of; do
	if (cd "$work/$d" && go build ./... 2>&1 | sed 's/^/   | /'; exit "${PIPESTATUS[0]}"); then
		echo "   $d builds"
	else
		echo "   $d does not build"
		failed=1
	fi
done
(cd "$work/demo-gcl" && "$work/overfact" ./... 2>&1 >/dev/null) | grep -vc ': 	' | sed 's/^/   findings left after golangci-lint --fix: /' || true
exit $failed
