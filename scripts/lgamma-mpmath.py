#!/usr/bin/env python3
"""Accuracy sweep of fixes/lgamma against mpmath (Debian python3-mpmath).

Generates random and adversarial inputs for every function, evaluates
them with the Go driver fixes/lgamma/internal/sweep (one process, all
calls on stdin), computes the true values with mpmath at 60 digits plus
the decimal size of the arguments (so cancellation between large
logarithms cannot reach the reference), and prints per function and
input class the number of calls, the largest error in ulps of the true
value and relative, and the worst input.

A "wrong" call is one whose special value (NaN, ±Inf, 0, sign, ok flag,
panic) differs from the true one, or an exact integer form off by any
amount. Those are listed in full and make the script exit 1.

Usage (from the repository root; scripts/lgamma-mpmath.sh wraps it):
    python3 scripts/lgamma-mpmath.py DRIVER [N] [SEED]
N scales the random samples per class (default 400).
"""
import math
import random
import subprocess
import sys
from collections import defaultdict

from mpmath import mp, mpf

DRIVER = sys.argv[1]
N = int(sys.argv[2]) if len(sys.argv) > 2 else 400
rng = random.Random(int(sys.argv[3]) if len(sys.argv) > 3 else 1)
MAXI = 2**63 - 1
INF = float("inf")


def hexf(x):
    if x != x:
        return "NaN"
    if x in (INF, -INF):
        return "+Inf" if x > 0 else "-Inf"
    return x.hex()


def logu(lo, hi):
    """A float spread logarithmically over [lo, hi], lo > 0."""
    return math.exp(rng.uniform(math.log(lo), math.log(hi)))


def logi(lo, hi):
    return max(lo, min(hi, int(round(logu(max(lo, 1), hi)))))


def near(x, k=8):
    """x and floats within k ulps of it."""
    out = [x]
    a = b = x
    for _ in range(k):
        a, b = math.nextafter(a, -INF), math.nextafter(b, INF)
        out += [a, b]
    return out


# ---- references ---------------------------------------------------------

def dps_for(*args):
    m = 1
    for a in args:
        if isinstance(a, float) and not math.isfinite(a):
            continue
        m = max(m, abs(a))
    return 60 + int(math.log10(m + 1))


def lg(x):
    """ln|Γ(x)| for real x that is not a pole."""
    return mp.re(mp.loggamma(x))


def gsign(x):
    if x > 0:
        return 1
    return -1 if int(math.floor(x)) % 2 != 0 else 1


def isneg_int(x):
    return x <= 0 and x == int(x)


class Ref:
    """A reference: exp(log) * sign, or an exact value. kind: 'log' means
    the result is the log itself; 'val' means the result is sign*e^log."""


def ref_value(name, f, i):
    """Returns the true result as an mpf (or Python int/tuple for exact
    forms, or a float special value), given float args f, int args i."""
    if name in ("LogGamma", "MathLgamma"):
        x = f[0]
        if math.isnan(x):
            return math.nan
        if math.isinf(x):
            return x
        if isneg_int(x):
            return INF
        return lg(mpf(x))
    if name in ("GammaRatio", "LogGammaRatio"):
        a, b = f
        l = lg(mpf(a)) - lg(mpf(b))
        if name == "LogGammaRatio":
            return l
        return gsign(a) * gsign(b) * mp.exp(l)
    if name in ("Beta", "LogBeta"):
        a, b = map(mpf, f)
        l = lg(a) + lg(b) - lg(mp.fadd(a, b, exact=True))
        return l if name == "LogBeta" else mp.exp(l)
    if name == "StirlingRemainder":
        n = mpf(f[0])
        return lg(n + 1) - ((n + mpf(1) / 2) * mp.log(n) - n + mp.log(2 * mp.pi) / 2)
    if name in ("Rising", "LogRising"):
        x, n = mpf(f[0]), i[0]
        v = mp.rf(x, n)
        if name == "LogRising":
            return -INF if v == 0 else mp.log(abs(v))
        return v
    if name in ("PowOverFactorial", "LogPowOverFactorial"):
        x, k = f[0], i[0]
        l = k * mp.log(abs(mpf(x))) - lg(mpf(k) + 1)
        if name == "LogPowOverFactorial":
            return l
        return (-1 if (x < 0 and k % 2) else 1) * mp.exp(l)
    if name in ("PoissonPMF", "PoissonLogPMF"):
        lam, k = mpf(f[0]), i[0]
        l = -lam if k == 0 else k * mp.log(lam) - lam - lg(mpf(k) + 1)
        return l if name == "PoissonLogPMF" else mp.exp(l)
    if name in ("BinomialPMF", "BinomialLogPMF"):
        p, k, n = mpf(f[0]), i[0], i[1]
        l = lg(mpf(n) + 1) - lg(mpf(k) + 1) - lg(mpf(n - k) + 1)
        if k:
            l += k * mp.log(p)
        if n - k:
            l += (n - k) * mp.log1p(-p)
        return l if name == "BinomialLogPMF" else mp.exp(l)
    if name in ("LogFactorial", "Factorial"):
        if i[0] < 0:
            return math.nan
        l = lg(mpf(i[0]) + 1)
        return l if name == "LogFactorial" else mp.exp(l)
    if name in ("Choose", "LogChoose"):
        n, k = i
        if k < 0:
            return 0 if name == "Choose" else -INF
        s = 1
        if n < 0:  # C(n,k) = (−1)^k C(k−n−1, k)
            n, s = k - n - 1, (-1) ** k
        if k > n:
            return 0 if name == "Choose" else -INF
        l = lg(mpf(n) + 1) - lg(mpf(k) + 1) - lg(mpf(n - k) + 1)
        return l if name == "LogChoose" else s * mp.exp(l)
    if name in ("Falling", "LogFalling"):
        n, k = i
        l = lg(mpf(n) + 1) - lg(mpf(n - k) + 1)
        return l if name == "LogFalling" else mp.exp(l)
    if name == "Catalan":
        n = i[0]
        if n < 0:
            return math.nan
        return mp.exp(lg(mpf(2 * n) + 1) - 2 * lg(mpf(n) + 1) - mp.log(n + 1))
    if name in ("HypergeometricPMF", "HypergeometricLogPMF"):
        k, N_, K, n = i

        def lc(a, b):
            return lg(mpf(a) + 1) - lg(mpf(b) + 1) - lg(mpf(a - b) + 1)
        l = lc(K, k) + lc(N_ - K, n - k) - lc(N_, n)
        return l if name == "HypergeometricLogPMF" else mp.exp(l)
    if name in ("Multinomial", "LogMultinomial"):
        s = sum(i)
        l = lg(mpf(s) + 1) - sum(lg(mpf(k) + 1) for k in i)
        return l if name == "LogMultinomial" else mp.exp(l)
    if name in ("ChooseInt64", "MustChooseInt64"):
        n, k = i
        if k < 0:
            v = 0
        elif n >= 0:
            v = math.comb(n, k) if k <= n else 0
        else:
            v = (-1) ** k * math.comb(k - n - 1, k) if k < 200 or k - n - 1 < 200 else None
        if v is None or not (-2**63 <= v <= MAXI):
            return "panic" if name.startswith("Must") else (0, False)
        return (v, True)
    if name == "FactorialInt64":
        n = i[0]
        v = math.factorial(n) if n >= 0 else None
        return (v, True) if v is not None and v <= MAXI else (0, False)
    if name == "CatalanInt64":
        n = i[0]
        v = math.comb(2 * n, n) // (n + 1) if n >= 0 else None
        return (v, True) if v is not None and v <= MAXI else (0, False)
    if name == "FallingInt64":
        n, k = i
        if n < 0 or k < 0:
            return (0, False)
        v = math.perm(n, k) if k <= n else 0
        return (v, True) if v <= MAXI else (0, False)
    if name == "MultinomialInt64":
        if any(k < 0 for k in i):
            return (0, False)
        v, t = 1, 0
        for k in i:  # product of binomials C(t, k), stopping past MaxInt64
            t += k
            m = min(k, t - k)
            if m >= 64:  # C(t, m) ≥ C(128, 64) > 2^63
                return (0, False)
            v *= math.comb(t, m)
            if v > MAXI:
                return (0, False)
        return (v, True)
    raise KeyError(name)


# ---- inputs -------------------------------------------------------------

def gen():
    """Yields (class, name, floats, ints)."""
    c = []

    def add(cls, name, fs=(), ints=()):
        c.append((cls, name, list(fs), list(ints)))

    # LogGamma
    for x in [0.0, -0.0, INF, -INF, math.nan, 5e-324, -5e-324, 1.0, 2.0, -1.0, 2.557e305,
              2.5563481638716906e305, 2.5599833278516383e305, 2.56e305, 1.7976931348623157e308]:
        add("special/adversarial", "LogGamma", [x])
    for x in near(1.0, 40) + near(2.0, 40):
        add("near 1, 2 (±40 ulp)", "LogGamma", [x])
    for _ in range(N):
        t = logu(1e-17, 0.3) * rng.choice([-1, 1])
        add("near 1, 2 (|t| < 0.3)", "LogGamma", [rng.choice([1.0, 2.0]) + t])
        add("x in (1e-308, 1e-3)", "LogGamma", [logu(1e-308, 1e-3)])
        add("x in [1e-3, 16)", "LogGamma", [rng.uniform(1e-3, 16)])
        add("x in [16, 1e300]", "LogGamma", [logu(16, 1e300)])
        add("x in (-1e-300, 0)", "LogGamma", [-logu(5e-324, 1e-300)])
        add("x in (-20, 0)", "LogGamma", [-rng.uniform(0, 20)])
        add("x < -20", "LogGamma", [-logu(20, 1e15)])
    for _ in range(N // 4):
        add("x near poles", "LogGamma", [-rng.randint(1, 170) + rng.choice([-1, 1]) * logu(1e-15, 1e-3)])
    # zeros of ln|Γ| on the negative axis: floats next to them
    for z in neg_zeros():
        for x in near(z, 40):
            add("x near zeros of ln|Γ|, x < 0", "LogGamma", [x])
        for _ in range(max(1, N // 40)):
            add("x near zeros of ln|Γ|, x < 0", "LogGamma", [z * (1 + rng.choice([-1, 1]) * logu(1e-16, 1e-4))])
    for x in [0.5, 1.5, 3.0, 1e-300, 1e300]:
        add("special/adversarial", "MathLgamma", [x])

    # ratios and beta
    for _ in range(N):
        a = logu(1e-3, 1e6)
        add("a ≈ b", "LogGammaRatio", [a, a * (1 + rng.choice([-1, 1]) * logu(1e-16, 1e-3))])
        add("a, b in (0, 1e12)", "LogGammaRatio", [logu(1e-5, 1e12), logu(1e-5, 1e12)])
        a, b = logu(1e-3, 1e6), logu(1e-3, 1e6)
        if abs(lg(mpf(a)) - lg(mpf(b))) < 700:
            add("a, b in (0, 1e6), ratio finite", "GammaRatio", [a, b])
        a, b = -rng.uniform(0, 50), rng.uniform(-50, 50)
        if not isneg_int(a) and not isneg_int(b):
            add("a or b negative", "GammaRatio", [a, b])
        add("a, b in (1e-3, 1e10)", "LogBeta", [logu(1e-3, 1e10), logu(1e-3, 1e10)])
        a = 1 + rng.choice([-1, 1]) * logu(1e-16, 1e-2)
        add("near B = 1", "LogBeta", [a, 1 / a if rng.random() < 0.5 else 1.0])
        add("a > 2^1000, small b", "Beta", [logu(2**1000, 1e308), logu(1e-3, 16)])
        add("a > 2^1000, small b", "LogBeta", [logu(2**1000, 1e308), logu(1e-3, 1e3)])
        add("x in (1e-3, 1e12)", "StirlingRemainder", [logu(1e-3, 1e12)])
    for _ in range(max(1, N // 20)):
        # the curve B(a, b) = 1, away from (1, 1): ln B is near 0 there
        a = logu(0.05, 20)
        with mp.workdps(30):
            try:
                b = float(mp.findroot(lambda b: mp.log(mp.beta(a, b)), (mpf(1e-3), mpf(50)), solver="anderson"))
            except Exception:
                continue
        for x in near(b, 3):
            add("on B(a, b) = 1", "LogBeta", [a, x])
        # the curve Γ(a) = Γ(b), a < 1.4616 < b: ln Γ(a)/Γ(b) is near 0
        a = rng.uniform(0.2, 1.46)
        with mp.workdps(30):
            try:
                b = float(mp.findroot(lambda b: lg(b) - lg(mpf(a)), (mpf(1.4617), mpf(10)), solver="anderson"))
            except Exception:
                continue
        for x in near(b, 3):
            add("on Γ(a) = Γ(b)", "LogGammaRatio", [a, x])
    # rising factorials next to ±1, where ln|x(x+1)…| passes through 0
    for n in (2, 3, 5, 20, 40, 100):
        for target, guess in ((1, 0.5), (-1, -0.5)):
            with mp.workdps(40):
                try:
                    r = float(mp.findroot(lambda x: mp.rf(x, n) - target, guess))
                except Exception:
                    continue
            for x in near(r, 5):
                add("product near ±1", "LogRising", [x], [n])
    for a, b in [(2.557e305, 1.0), (1.000000000000001, 1.0), (1e308, 1.0), (1e305, 2.0)]:
        add("special/adversarial", "LogGammaRatio" if a < 2 else "LogGammaRatio", [a, b])
        add("special/adversarial", "Beta", [a, b])
        add("special/adversarial", "LogBeta", [a, b])

    # integer families
    for n in [0, 1, 2, 20, 21, 170, 171, 1023, 1024, 2**53 - 1, 2**53, 2**53 + 1, 2**62, MAXI]:
        add("boundaries", "LogFactorial", [], [n])
        for k in sorted({0, 1, 2, n // 2, n - 1, n} - {-1}):
            if 0 <= k <= n:
                add("boundaries, k = 0, 1, n-1, n", "LogChoose", [], [n, k])
                add("boundaries, k = 0, 1, n-1, n", "Choose", [], [n, k])
                add("boundaries, k = 0, 1, n-1, n", "LogFalling", [], [n, k])
    for _ in range(N):
        add("n in [1024, 2^63)", "LogFactorial", [], [logi(1024, MAXI)])
        n = logi(1, 10**16)
        k = rng.choice([rng.randint(0, min(n, 60)), rng.randint(0, n)])
        add("n ≤ 1e16", "Choose", [], [n, k])
        add("n ≤ 1e16", "LogChoose", [], [n, k])
        n = logi(10**16, MAXI)
        k = rng.choice([rng.randint(0, 60), rng.randint(0, n)])
        add("1e16 < n < 2^63", "Choose", [], [n, k])
        add("1e16 < n < 2^63", "LogChoose", [], [n, k])
        n = -logi(1, 10**6)
        k = rng.randint(-2, 40)
        add("n < 0 (generalised)", "Choose", [], [n, k])
        add("n < 0 (generalised)", "ChooseInt64", [], [n, k])
        n = logi(1, 10**16)
        add("n ≤ 1e16", "Falling", [], [n, rng.randint(0, min(n, 40))])
        n = logi(10**16, MAXI)
        add("1e16 < n < 2^63", "Falling", [], [n, rng.randint(0, 20)])
        parts = [logi(0, 10**rng.randint(1, 17)) for _ in range(rng.randint(2, 5))]
        add("2-5 parts up to 1e17", "LogMultinomial", [], parts)
        add("2-5 parts up to 1e17", "Multinomial", [], parts)
        n = rng.randint(0, 600)
        add("n ≤ 600", "Catalan", [], [n])
    for n in range(-1, 173):
        add("every n in [-1, 172]", "Factorial", [], [n])
        add("every n in [-1, 172]", "FactorialInt64", [], [n])
    for n in [-1, 0, 1, 34, 35, 36, 519, 520]:
        add("boundaries", "CatalanInt64", [], [n])
        add("boundaries", "Catalan", [], [n])
    for _ in range(N):
        n = logi(1, MAXI)
        k = rng.choice([rng.randint(0, min(n, 25)), rng.randint(0, n)])
        add("n < 2^63", "LogFalling", [], [n, k])
        n = logi(1, 10**6)
        add("n ≤ 1e6, k ≤ 25", "FallingInt64", [], [n, rng.randint(-1, 25)])
        parts = [logi(0, 10**rng.randint(1, 6)) for _ in range(rng.randint(1, 4))]
        add("1-4 parts up to 1e6", "MultinomialInt64", [], parts)
        x = logu(1e-3, 1e12)
        add("x in (1e-3, 1e12)", "StirlingRemainder", [float(int(x)) if rng.random() < 0.3 else x])
    for ks in [[MAXI, 1], [MAXI, MAXI], [2**62, 2**62], [1, MAXI], [MAXI]]:
        add("special/adversarial", "Multinomial", [], ks)
        add("special/adversarial", "LogMultinomial", [], ks)
    for n, k in [(-3, 2), (-1, 5), (-1, 0), (-5, -1), (-2**62, 2), (MAXI, 2)]:
        add("special/adversarial", "Choose", [], [n, k])
        add("special/adversarial", "ChooseInt64", [], [n, k])
        add("special/adversarial", "MustChooseInt64", [], [n, k])

    # probabilities
    for _ in range(N):
        lam = logu(1e-300, 1e15)
        k = max(0, int(lam + rng.gauss(0, 3) * math.sqrt(lam))) if rng.random() < 0.7 else logi(0, 10**15)
        add("λ in (1e-300, 1e15)", "PoissonPMF", [lam], [k])
        add("λ in (1e-300, 1e15)", "PoissonLogPMF", [lam], [k])
        add("k = 0", "PoissonPMF", [logu(1e-300, 745)], [0])
        n = logi(1, 10**15)
        p = rng.choice([rng.random(), logu(1e-300, 1e-3), 1 - logu(1e-16, 1e-3)])
        mean = n * p
        k = max(0, min(n, int(mean + rng.gauss(0, 3) * math.sqrt(mean * (1 - p) + 1))))
        if rng.random() < 0.2:
            k = rng.choice([0, 1, n - 1, n])
        k = max(0, min(n, k))
        add("n ≤ 1e15, p in (0, 1)", "BinomialPMF", [p], [k, n])
        add("n ≤ 1e15, p in (0, 1)", "BinomialLogPMF", [p], [k, n])
        N_ = logi(2, 10**15)
        K, d = rng.randint(0, N_), rng.randint(0, N_)
        lo, hi = max(0, d + K - N_), min(d, K)
        mean = d * K / N_
        k = max(lo, min(hi, int(mean + rng.gauss(0, 2) * math.sqrt(mean + 1))))
        add("total ≤ 1e15", "HypergeometricPMF", [], [k, N_, K, d])
        add("total ≤ 1e15", "HypergeometricLogPMF", [], [k, N_, K, d])
        x = logu(1e-3, 1e6) * rng.choice([-1, 1])
        add("|x| in (1e-3, 1e6), k ≤ 1e12", "PowOverFactorial", [x], [logi(1, 10**12)])
        add("|x| in (1e-3, 1e6), k ≤ 1e12", "LogPowOverFactorial", [x], [logi(1, 10**12)])
        x = rng.uniform(-1e3, 1e3)
        add("x in ±1e3, n ≤ 300", "Rising", [x], [rng.randint(0, 300)])
        x = logu(1e-3, 1e15) * rng.choice([-1, 1])
        n = logi(1, 10**12)
        add("|x| in (1e-3, 1e15), n ≤ 1e12", "LogRising", [x], [n])
        if x > 0 or n < 1e6:
            add("|x| in (1e-3, 1e15), n ≤ 1e12", "Rising", [x], [n])
        # the whole int64 range
        lam = logu(1e15, 9e18)
        k = max(0, int(lam + rng.gauss(0, 3) * math.sqrt(lam)))
        add("λ in (1e15, 9e18)", "PoissonPMF", [lam], [k])
        add("λ in (1e15, 9e18)", "PoissonLogPMF", [lam], [k])
        n = logi(10**15, MAXI)
        p = rng.random()
        k = max(0, min(n, int(n * p + rng.gauss(0, 3) * math.sqrt(n * p * (1 - p) + 1))))
        add("n in (1e15, 2^63)", "BinomialPMF", [p], [k, n])
        add("n in (1e15, 2^63)", "BinomialLogPMF", [p], [k, n])
        N_ = logi(10**15, MAXI)
        K, d = rng.randint(0, N_), rng.randint(0, N_)
        lo, hi = max(0, d + K - N_), min(d, K)
        mean = d * K / N_
        k = max(lo, min(hi, int(mean + rng.gauss(0, 2) * math.sqrt(mean + 1))))
        add("total in (1e15, 2^63)", "HypergeometricPMF", [], [k, N_, K, d])
        x = logu(1e-3, 1e6) * rng.choice([-1, 1])
        add("|x| in (1e-3, 1e6), k in (1e12, 2^63)", "PowOverFactorial", [x], [logi(10**12, MAXI)])
        add("|x| in (1e-3, 1e300), k in (1e12, 2^63)", "LogPowOverFactorial", [logu(1e-3, 1e300)], [logi(10**12, MAXI)])
        parts = [logi(10**15, 2**61) for _ in range(rng.randint(2, 3))]
        add("2-3 parts in (1e15, 2^61)", "LogMultinomial", [], parts)
    for p in [5e-324, 1e-310, 1e-300, 0.5, 1 - 2**-53]:
        for k in [0, 1, 9, 10]:
            add("special/adversarial", "BinomialLogPMF", [p], [k, 10])
            add("special/adversarial", "BinomialPMF", [p], [k, 10])
    return c


def neg_zeros():
    """The zeros of ln|Γ(x)| for -18 < x < -2, by mpmath's findroot."""
    zs = []
    with mp.workdps(60):
        for n in range(2, 18):
            m = mp.findroot(mp.digamma, -n - mpf(1) / 2)
            tiny = mpf(10) ** -55
            for a, b in ((-n - 1 + tiny, m), (m, -n - tiny)):
                zs.append(float(mp.findroot(lg, (a, b), solver="anderson")))
    return sorted(set(zs))


# ---- comparison ---------------------------------------------------------

def ulp(v):
    v = abs(v)
    if v == 0:
        return 5e-324
    return math.ulp(v) if v >= 2.2250738585072014e-308 else 5e-324


def parse(s):
    if s == "panic":
        return s
    if " " in s:
        v, ok = s.split()
        return (int(v), ok == "true")
    if s == "+Inf":
        return INF
    if s == "-Inf":
        return -INF
    if s == "NaN":
        return math.nan
    return float.fromhex(s)


def compare(got, want):
    """Returns (ulps, rel, wrong)."""
    if isinstance(want, (tuple, str)) or isinstance(got, (tuple, str)):
        return (0.0, 0.0, got != want)
    if isinstance(want, float) and (math.isnan(want) or math.isinf(want)):
        same = (math.isnan(want) and math.isnan(got)) or want == got
        return (0.0 if same else INF, 0.0 if same else INF, not same)
    w = mpf(want)
    wf = float(w) if abs(w) < mpf("1.8e308") else (INF if w > 0 else -INF)
    if math.isnan(got):
        return (INF, INF, True)
    if math.isinf(wf) or math.isinf(got):
        return (0.0, 0.0, False) if got == wf else (INF, INF, True)
    if w == 0:
        return (0.0, 0.0, got != 0)
    d = abs(mpf(got) - w)
    u = float(d / ulp(wf))
    # relative error only where the true value is a normal float64
    r = float(d / abs(w)) if abs(wf) >= 2.2250738585072014e-308 else 0.0
    # a wrong underflow to 0 (or a lost one) or a sign flip is a wrong value
    wrong = (got == 0) != (wf == 0) or (wf != 0 and (math.copysign(1, got) < 0) != (w < 0))
    return (u, r, wrong)


def main():
    calls = gen()
    lines = "\n".join(" ".join([n] + [hexf(x) for x in fs] + [str(v) for v in ints])
                      for _, n, fs, ints in calls) + "\n"
    out = subprocess.run([DRIVER], input=lines, capture_output=True, text=True, check=True).stdout.split("\n")
    stats = {}
    wrongs = []
    for (cls, name, fs, ints), o in zip(calls, out):
        got = parse(o)
        with mp.workdps(dps_for(*fs, *ints)):
            try:
                want = ref_value(name, fs, ints)
            except (ValueError, ZeroDivisionError, OverflowError):
                continue
            u, r, wrong = compare(got, want)
        key = (name, cls)
        s = stats.setdefault(key, [0, -1.0, -1.0, "", 0])
        s[0] += 1
        at = " ".join([repr(x) for x in fs] + [str(v) for v in ints])
        if u > s[1]:
            s[1], s[3] = u, at
        s[2] = max(s[2], r)
        if wrong:
            s[4] += 1
            wrongs.append("%s(%s) = %s, want %s" % (name, at, o, want))
    print("%-22s %-34s %6s %10s %10s %6s  %s" % ("function", "inputs", "calls", "max ulp", "max rel", "wrong", "worst at"))
    for (name, cls), (n, u, r, at, w) in sorted(stats.items()):
        print("%-22s %-34s %6d %10.3g %10.3g %6d  %s" % (name, cls, n, u, r, w, at))
    if wrongs:
        print("\nwrong values (special value, sign, underflow or exact form differs):")
        for w in wrongs[:200]:
            print("  " + w)
        sys.exit(1)


main()
