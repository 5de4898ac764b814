#!/usr/bin/env bash
# numerics-report.sh prints the figures docs/numerics.md records for the
# helper module fixes/lgamma:
#   1. the accuracy table of every function against math/big references
#      (TestAccuracy; LGAMMA_LONG=1 widens the sweeps),
#   2. lgamma and gonum against exact math/big values (internal/reference),
#   3. ns/op of every exported function (median of COUNT runs, default 3),
#   4. the LogFactorial (n < 1024) vs math.Lgamma(float64(n)+1) speed
#      ratio, measured pair by pair in COUNT+2 rounds, and its median.
#
# Run from the repository root:   scripts/numerics-report.sh
# Takes a few minutes on 2 cores.
set -euo pipefail
cd "$(dirname "$0")/.."
count=${COUNT:-3}

echo "== machine"
echo "nproc: $(nproc)"
grep -m1 'model name' /proc/cpuinfo || true
go version
echo "overfact at $(git rev-parse --short HEAD 2>/dev/null || echo unknown)"
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg 2>/dev/null || echo unknown)"

echo
echo "== accuracy against math/big (go test -run 'TestAccuracy\$' -v ./fixes/lgamma)"
go test -count=1 -run 'TestAccuracy$' -v ./fixes/lgamma | sed -n '/function /,/^--- /p' | sed '/^--- /d;/^ *$/d'

echo
echo "== lgamma and gonum v0.17.0 against exact values (go test -run TestPrecisionAgainstExact -v ./internal/reference)"
go test -count=1 -run 'TestPrecisionAgainstExact$' -v ./internal/reference | sed -n '/exact value/,/^--- /p' | sed '/^--- /d;/^ *$/d'

echo
echo "== benchmarks (go test -run '^\$' -bench . -benchtime=300ms -count=$count ./fixes/lgamma), median ns/op"
out=$(go test -run '^$' -bench . -benchtime=300ms -count="$count" ./fixes/lgamma)
echo "$out" | awk '
	/^Benchmark/ {
		name = $1; sub(/-[0-9]+$/, "", name); sub(/^Benchmark/, "", name)
		if (!(name in n)) order[++m] = name
		v[name, ++n[name]] = $3
	}
	function median(name,   i, j, t, a, c) {
		c = n[name]
		for (i = 1; i <= c; i++) a[i] = v[name, i] + 0
		for (i = 1; i <= c; i++) for (j = i + 1; j <= c; j++) if (a[j] < a[i]) { t = a[i]; a[i] = a[j]; a[j] = t }
		return c % 2 ? a[(c + 1) / 2] : (a[c / 2] + a[c / 2 + 1]) / 2
	}
	END {
		for (i = 1; i <= m; i++) {
			med[order[i]] = median(order[i])
			printf "%-28s %10.1f ns/op\n", order[i], med[order[i]]
		}
	}'

# The ratio is taken pair by pair: each round runs the two benchmarks back
# to back, so both see the same load on a shared machine.
echo
echo "== LogFactorial(n < 1024) vs math.Lgamma(float64(n)+1), $((count + 2)) rounds of"
echo "   go test -run '^\$' -bench 'LogFactorialSmall$|LgammaBaseline$' -benchtime=300ms ./fixes/lgamma"
for i in $(seq $((count + 2))); do
	go test -run '^$' -bench 'LogFactorialSmall$|LgammaBaseline$' -benchtime=300ms ./fixes/lgamma |
		awk '/^BenchmarkLogFactorialSmall/ { a = $3 } /^BenchmarkLgammaBaseline/ { b = $3 }
			END { printf "%.2f %.2f %.2f\n", a, b, b / a }'
done | sort -k3 -n | awk '
	{ r[NR] = $3; printf "LogFactorial %6.2f ns/op   math.Lgamma %6.2f ns/op   ratio %.1fx\n", $1, $2, $3 }
	END { printf "median speed-up: %.1fx (target >= 4x)\n", r[int((NR + 1) / 2)] }'
