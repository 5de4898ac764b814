#!/usr/bin/env bash
# lgamma-digits-probe.sh: evidence for the lgamma-digits findings of the
# corpus run (docs/corpus.md). It calls gonum v0.17.0's exponentials of
# log-gamma differences at growing arguments and prints their relative
# error against mpmath (Debian package python3-mpmath) at 40 digits:
# distuv.Chi.Mean, √2·Γ((K+1)/2)/Γ(K/2) as exp(lgamma − lgamma)
# (chi.go:62), and the factor exp(lgamma(0.5+b) − lgamma(b))/√π of
# NoncentralT.CDF, b = df/2 (noncentralt.go:112), reproduced from its
# source line by line; and the same forms in go-moremath (whose
# mathx/beta.go and stats/tdist.go golang.org/x/perf/internal/stats
# copies): mathx.Beta, the coefficient bt of mathx.BetaInc reproduced
# from its source line (with b = a and x = 0.4995), and
# stats.TDist.PDF at 0. Also the exponentials of log-gamma sums summed
# in another function: gonum's combin.GeneralizedBinomial (exp of
# LogGeneralizedBinomial) and mathext.Beta (exp of internal Lbeta),
# go-moremath's mathx.Choose past its table (exp of lchoose) and
# stats.HypergeometicDist.PMF (exp of three Lchoose values); and
# gonum's distuv.Binomial.Prob, math.Exp of the method LogProb, a sum
# of three log-gamma values and two logarithms (binomial.go:72).
#
#   scripts/lgamma-digits-probe.sh     # seconds, after the module download
set -euo pipefail
python3 -c 'import mpmath' 2>/dev/null || { echo "needs python3-mpmath (apt-get install python3-mpmath)" >&2; exit 2; }
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
export GOWORK=off GOFLAGS=-mod=mod
cd "$tmp"
go mod init probe.example/lgamma >/dev/null 2>&1
go get gonum.org/v1/gonum@v0.17.0 github.com/aclements/go-moremath@v0.0.0-20210112150236-f10218a38794 >/dev/null 2>&1
cat >main.go <<'GO'
package main

import (
	"fmt"
	"math"

	"github.com/aclements/go-moremath/mathx"
	"github.com/aclements/go-moremath/stats"
	"gonum.org/v1/gonum/mathext"
	"gonum.org/v1/gonum/stat/combin"
	"gonum.org/v1/gonum/stat/distuv"
)

// lgamma is noncentralt.go's and mathx's own.
func lgamma(x float64) float64 { y, _ := math.Lgamma(x); return y }

func main() {
	for _, k := range []float64{1e3, 1e5, 1e7, 1e9} {
		fmt.Printf("chi %g %.17g\n", k, distuv.Chi{K: k}.Mean())
	}
	for _, df := range []float64{1e3, 1e5, 1e7, 1e9} {
		b := 0.5 * df
		albeta := math.Log(math.Sqrt(math.Pi)) + lgamma(b) - lgamma(0.5+b)
		fmt.Printf("nct %g %.17g\n", df, math.Exp(-albeta))
	}
	for _, a := range []float64{1e3, 1e5, 1e7, 1e9} {
		fmt.Printf("beta %g %.17g\n", a, mathx.Beta(a, 3.5))
		fmt.Printf("tpdf %g %.17g\n", a, stats.TDist{V: a}.PDF(0))
	}
	for _, n := range []float64{1e3, 1e5, 1e7} {
		fmt.Printf("gbinom %g %.17g\n", n, combin.GeneralizedBinomial(n, 20))
		fmt.Printf("choose %g %.17g\n", n, mathx.Choose(int(n), 20))
		fmt.Printf("gbeta %g %.17g\n", n, mathext.Beta(n, 3.5))
		h := stats.HypergeometicDist{N: int(n), K: int(n) / 2, Draws: 10}
		fmt.Printf("hyper %g %.17g\n", n, h.PMF(5))
		fmt.Printf("bprob %g %.17g\n", n, distuv.Binomial{N: n, P: 0.5}.Prob(n/2))
	}
	for _, a := range []float64{1e3, 1e5, 1e7} {
		// BetaInc's coefficient, as mathx/beta.go:44 writes it.
		x, b := 0.4995, a
		bt := math.Exp(lgamma(a+b) - lgamma(a) - lgamma(b) +
			a*math.Log(x) + b*math.Log(1-x))
		fmt.Printf("binc %g %.17g\n", a, bt)
	}
}
GO
go run . >out.txt
python3 - out.txt <<'PY'
import sys, mpmath
mpmath.mp.dps = 40
for line in open(sys.argv[1]):
    kind, x, v = line.split()
    x, v = mpmath.mpf(x), mpmath.mpf(v)
    if kind == 'chi':
        ref = mpmath.sqrt(2) * mpmath.exp(mpmath.loggamma((x + 1) / 2) - mpmath.loggamma(x / 2))
        what = 'Chi{K: %s}.Mean()' % mpmath.nstr(x, 3)
    elif kind == 'nct':
        ref = mpmath.exp(mpmath.loggamma(0.5 + x / 2) - mpmath.loggamma(x / 2)) / mpmath.sqrt(mpmath.pi)
        what = 'NoncentralT exp(-albeta), df = %s' % mpmath.nstr(x, 3)
    elif kind == 'beta':
        ref = mpmath.beta(x, mpmath.mpf(3.5))
        what = 'mathx.Beta(%s, 3.5)' % mpmath.nstr(x, 3)
    elif kind == 'binc':
        t = mpmath.mpf(0.4995)
        ref = mpmath.exp(mpmath.loggamma(2 * x) - 2 * mpmath.loggamma(x) + x * mpmath.log(t) + x * mpmath.log(1 - t))
        what = 'BetaInc coefficient bt, a = b = %s' % mpmath.nstr(x, 3)
    elif kind in ('gbinom', 'choose'):
        ref = mpmath.binomial(x, 20)
        what = '%s(%s, 20)' % ('combin.GeneralizedBinomial' if kind == 'gbinom' else 'mathx.Choose', mpmath.nstr(x, 3))
    elif kind == 'gbeta':
        ref = mpmath.beta(x, mpmath.mpf(3.5))
        what = 'mathext.Beta(%s, 3.5)' % mpmath.nstr(x, 3)
    elif kind == 'hyper':
        big = int(x)
        ref = mpmath.binomial(big // 2, 5) * mpmath.binomial(big - big // 2, 5) / mpmath.binomial(big, 10)
        what = 'HypergeometicDist{N: %s, K: N/2, Draws: 10}.PMF(5)' % mpmath.nstr(x, 3)
    elif kind == 'bprob':
        ref = mpmath.binomial(x, x / 2) * mpmath.mpf(0.5) ** x
        what = 'distuv.Binomial{N: %s, P: 0.5}.Prob(N/2)' % mpmath.nstr(x, 3)
    else:
        ref = mpmath.exp(mpmath.loggamma((x + 1) / 2) - mpmath.loggamma(x / 2)) / mpmath.sqrt(x * mpmath.pi)
        what = 'stats.TDist{V: %s}.PDF(0)' % mpmath.nstr(x, 3)
    print('%-52s relative error %s' % (what, mpmath.nstr(abs(v - ref) / ref, 3)))
PY
