#!/usr/bin/env bash
# corpus.sh runs overfact, tests included, over three bodies of real Go
# code: the standard library of the installed toolchain, gonum v0.17.0 and
# golang.org/x/tools v0.52.0. It prints, per corpus, the packages analysed,
# crashes, analyzer errors and every finding. Then it applies overfact -fix
# to a scratch copy of gonum and builds and tests the packages it touched.
#
# Run from the repository root:   scripts/corpus.sh
# Output files go to $OUT (default: a new temporary directory, printed).
# Needs only Go and access to the module proxy; nothing is written to the
# repository.
set -euo pipefail
cd "$(dirname "$0")/.."
repo=$(pwd)
work=$(mktemp -d "${TMPDIR:-/tmp}/overfact-corpus.XXXXXX")
OUT=${OUT:-$work/out}
mkdir -p "$OUT"
trap 'chmod -R u+w "$work" 2>/dev/null; rm -rf "$work/gonum-fix" "$work/mods"' EXIT
export GOWORK=off GOFLAGS=-mod=mod

echo "== building (overfact at ${OVERFACT_REV:-$(git describe --always --dirty 2>/dev/null || echo unknown)})"
GOWORK="$PWD/go.work" GOFLAGS= go build -o "$work/bench" ./harness/bench # the checkout builds in its workspace
GOWORK="$PWD/go.work" GOFLAGS= go build -o "$work/overfact" ./cmd/overfact

# module DIR PATH VERSION makes DIR a throwaway module that requires
# PATH@VERSION and everything its tests import.
module() {
	mkdir -p "$1"
	(cd "$1" && go mod init corpus.example/run >/dev/null 2>&1 && go get -t "$2/...@$3" >/dev/null 2>&1)
}

run() { # NAME DIR PATTERN
	echo "== $1"
	local rc=0
	( cd "$2" && "$work/bench" -mode corpus -dir "$2" "$3" ) >"$OUT/$1.txt" 2>"$OUT/$1.err" || rc=$?
	head -1 "$OUT/$1.txt"
	tail -n +2 "$OUT/$1.txt"
	if [ -s "$OUT/$1.err" ]; then echo "   stderr: $OUT/$1.err"; head -20 "$OUT/$1.err"; fi
	[ $rc -eq 0 ] || { echo "   exit status $rc"; failed=1; }
}
failed=0

mkdir -p "$work/mods/std"
(cd "$work/mods/std" && go mod init corpus.example/std >/dev/null 2>&1)
run std "$work/mods/std" std
module "$work/mods/gonum" gonum.org/v1/gonum v0.17.0
run gonum "$work/mods/gonum" gonum.org/v1/gonum/...
module "$work/mods/xtools" golang.org/x/tools v0.52.0
run xtools "$work/mods/xtools" golang.org/x/tools/...

echo "== probes: gonum calls at the inputs the findings name (evidence for the verdicts)"
mkdir -p "$work/mods/gonum/probe"
cat >"$work/mods/gonum/probe/main.go" <<'GO'
// Command probe calls gonum where overfact reported overflow and prints
// what comes back next to the exact value (math/big) where one exists.
package main

import (
	"fmt"
	"math"
	"math/big"
	"os"
	"time"

	"gonum.org/v1/gonum/mathext"
	"gonum.org/v1/gonum/stat/combin"
	"gonum.org/v1/gonum/stat/distuv"
)

func main() {
	exact := new(big.Int).Binomial(62, 31)
	fmt.Printf("combin.go:41   Binomial(62, 31) = %d; exact C(62,31) = %s (fits int64: %v)\n", combin.Binomial(62, 31), exact, exact.IsInt64())
	rev := make([]int, 21)
	for i := range rev {
		rev[i] = 20 - i
	}
	fmt.Printf("combin.go:679  PermutationIndex(reverse of 0..20, 21, 21) = %d; exact 21!-1 = %s\n",
		combin.PermutationIndex(rev, 21, 21), new(big.Int).Sub(new(big.Int).MulRange(1, 21), big.NewInt(1)))
	fmt.Printf("combin.go:438  NumPermutations(21, 21) = %d; exact 21! = %s\n", combin.NumPermutations(21, 21), new(big.Int).MulRange(1, 21))
	for _, n := range []int64{14, 15} {
		p := new(big.Int).MulRange(n+1, 2*n)
		fmt.Printf("product_test.go:231 catalan's product (n+1)...(2n) at n = %d is %s (fits int64: %v)\n", n, p, p.IsInt64())
	}
	for _, c := range []float64{100.5, 172.5} {
		fmt.Printf("hypergeo.go:78 Hypergeo(1.3, 2.7, %v, -2) = %v\n", c, mathext.Hypergeo(1.3, 2.7, c, -2))
	}
	for _, c := range []float64{100.5, 170.5} {
		fmt.Printf("hyp2f1.go:165  Hypergeo(1.3, 2.7, %v, 1-1e-15) = %v\n", c, mathext.Hypergeo(1.3, 2.7, c, 1-1e-15))
	}
	for _, k := range []float64{0.1, 0.02} {
		fmt.Printf("weibull.go:39  Weibull{K: %v, λ: 1}.ExKurtosis() = %v\n", k, distuv.Weibull{K: k, Lambda: 1}.ExKurtosis())
	}
	w := distuv.Weibull{K: 1.0 / 172, Lambda: 1e-20}
	lg, _ := math.Lgamma(173)
	fmt.Printf("weibull.go:76  Weibull{K: 1/172, λ: 1e-20}.Mean() = %v; λΓ(173) = %.6g by log-gamma; Variance() = %v\n", w.Mean(), math.Exp(lg+math.Log(1e-20)), w.Variance())
	done := make(chan float64)
	go func() { done <- mathext.Hypergeo(1.5, 2.5, 204, 0.95) }()
	select {
	case v := <-done:
		fmt.Printf("hyp2f1.go:285  Hypergeo(1.5, 2.5, 204, 0.95) = %v\n", v)
	case <-time.After(20 * time.Second):
		fmt.Println("hyp2f1.go:285  Hypergeo(1.5, 2.5, 204, 0.95) has not returned after 20s")
		os.Exit(0)
	}
}
GO
(cd "$work/mods/gonum" && go run ./probe) || echo "probe failed"

echo "== overfact -fix on a scratch copy of gonum v0.17.0"
src=$(cd "$work/mods/gonum" && go list -m -f '{{.Dir}}' gonum.org/v1/gonum)
cp -r "$src" "$work/gonum-fix"
chmod -R u+w "$work/gonum-fix"
cd "$work/gonum-fix"
# Rewritten code imports the helper module, as a user would after go get.
go mod edit -require=github.com/overfact/overfact/fixes/lgamma@v0.1.0 \
	-replace=github.com/overfact/overfact/fixes/lgamma="$repo/fixes/lgamma"
go mod download
rc=0
"$work/overfact" -fix ./... >"$OUT/gonum-fix.txt" 2>&1 || rc=$?
echo "overfact -fix ./... exit status $rc ($(wc -l <"$OUT/gonum-fix.txt") lines of output in $OUT/gonum-fix.txt)"
diff -ru --exclude=go.mod --exclude=go.sum "$src" . >"$OUT/gonum-fix.diff" || true
touched=$(grep '^+++ ' "$OUT/gonum-fix.diff" | awk '{print $2}' | xargs -r -n1 dirname | sort -u | sed 's|^\./||; s|^|./|')
echo "files changed: $(grep -c '^+++ ' "$OUT/gonum-fix.diff" || true); diff in $OUT/gonum-fix.diff"
echo "packages touched: $(echo ${touched:-none})"
echo "-- go build ./..."
if go build ./...; then echo "go build ./...: ok"; else failed=1; fi
if [ -n "$touched" ]; then
	echo "-- go vet on touched packages"
	if go vet $touched; then echo "go vet: ok"; else failed=1; fi
	echo "-- go test on touched packages"
	go test $touched || failed=1
fi
echo "== results in $OUT"
# Non-zero when a corpus run had crashes or analyzer errors, or the fixed
# copy of gonum failed to build, vet or test.
exit $failed
