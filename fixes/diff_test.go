package fixes_test

import (
	"bufio"
	"bytes"
	"fmt"
	"math"
	"math/big"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"strconv"
	"strings"
	"sync"
	"testing"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/fixes/lgamma"
)

// A diffCase runs one function of a testdata package, before and after
// its fixes, over a grid of inputs.
type diffCase struct {
	pkg, fn string
	loops   []string // loop clauses, outermost first, over int variables
	args    string   // the call's arguments, in the loop variables
	typ     string   // the function's result type
	ref     func([]float64) *big.Float
	guard   bool // a range guard: where the original is right, the fixed code returns the same bits
	noBreak bool // the original stays right on this grid (the fix must not hurt)
	// call, when set, is the call to make instead of fn(args), relative
	// to the package (for a method on a composite literal); args still
	// names the reference's inputs.
	call string
}

var diffCases = []diffCase{
	{pkg: "probebinom", fn: "Rotas", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refChoose},
	{pkg: "probebinom", fn: "RotasU", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "uint64(n), uint64(k)", typ: "uint64", ref: refChoose},
	{pkg: "probebinom", fn: "RotaShare", loops: []string{"n := 0; n <= 400; n += 3", "k := 0; k <= n; k += 1 + n/9"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "probebinom", fn: "Orders", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refFalling},
	{pkg: "probebinom", fn: "OrdersF", loops: []string{"n := 0; n <= 250; n += 5", "k := 0; k <= 40 && k <= n; k += 3"}, args: "n, k", typ: "float64", ref: refFalling},
	{pkg: "probebinom", fn: "Shifts", loops: []string{"a := 0; a <= 12; a++", "b := 0; b <= 12; b += 2", "c := 0; c <= 12; c += 3"}, args: "a, b, c", typ: "int", ref: refMultinomial},
	{pkg: "probebinom", fn: "ShiftsF", loops: []string{"a := 0; a <= 90; a += 9", "b := 0; b <= 90; b += 10", "c := 0; c <= 40; c += 8"}, args: "a, b, c", typ: "float64", ref: refMultinomial},
	{pkg: "probebinom", fn: "Queues", loops: []string{"n := 0; n <= 40; n++"}, args: "n", typ: "int", ref: refCatalan},
	{pkg: "probebinom", fn: "QueuesF", loops: []string{"n := 0; n <= 250; n++"}, args: "n", typ: "float64", ref: refCatalan},
	{pkg: "probeloop", fn: "Ways", loops: []string{"n := 0; n <= 68; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refChoose},
	{pkg: "probeloop", fn: "Orders", loops: []string{"n := 0; n <= 30; n++", "k := 0; k <= n; k++"}, args: "int64(n), int64(k)", typ: "int64", ref: refFalling},
	{pkg: "probeloop", fn: "WaysU", loops: []string{"n := 0; n <= 68; n++", "k := 0; k <= n; k++"}, args: "uint64(n), uint64(k)", typ: "uint64", ref: refChoose},
	{pkg: "probeloop", fn: "Ranged", loops: []string{"n := 0; n <= 68; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refChoose},
	{pkg: "probeloop", fn: "Odds", loops: []string{"n := 0; n <= 1100; n += 37", "k := 0; k <= n; k += 1 + n/7"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "probeguard", fn: "Orderings", loops: []string{"n := 0; n <= 30; n++"}, args: "int64(n)", typ: "int64", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Rec", loops: []string{"n := 0; n <= 20; n++"}, args: "int32(n)", typ: "int32", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Short", loops: []string{"n := 0; n <= 25; n++"}, args: "uint(n)", typ: "uint", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Count", loops: []string{"n := 0; n <= 25; n++"}, args: "uint64(n)", typ: "uint64", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Small", loops: []string{"n := 0; n <= 40; n++"}, args: "n", typ: "float32", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Spread", loops: []string{"n := 0; n <= 180; n++"}, args: "n", typ: "float64", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Lit", loops: []string{"n := 0; n <= 25; n++"}, args: "n", typ: "int", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Level", loops: []string{"n := 0; n <= 180; n++"}, args: "float64(n)", typ: "float64", ref: refFactorial, guard: true},
	{pkg: "probeguard", fn: "Plan{}.Orders", loops: []string{"n := 0; n <= 25; n++"}, args: "n", typ: "int", ref: refFactorial, guard: true},
	{pkg: "probebinom", fn: "Rotas32", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n; k++"}, args: "int32(n), int32(k)", typ: "int32", ref: refChoose},
	{pkg: "probebinom", fn: "Stepwise", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refChoose},
	{pkg: "probebinom", fn: "Named", loops: []string{"n := 0; n <= 400; n += 3", "k := 0; k <= n; k += 1 + n/9"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "probeterm", fn: "Arrivals", loops: []string{"k := 0; k <= 260; k += 4", "l := 1; l <= 200; l *= 3"}, args: "k, float64(l) / 2", typ: "float64", ref: refPoisson},
	{pkg: "probeterm", fn: "Load", loops: []string{"a := 1; a <= 200; a *= 4", "k := 0; k <= 260; k += 5"}, args: "float64(a) / 2, k", typ: "float64", ref: refPowFact},
	{pkg: "probeterm", fn: "Defects", loops: []string{"n := 10; n <= 1000; n *= 3", "k := 0; k <= n; k += 1 + n/11"}, args: "k, n, 0.125", typ: "float64", ref: refBinomialPMF},
	{pkg: "probeterm", fn: "Lot", loops: []string{"total := 70; total <= 250; total += 60", "k := 0; k <= 30; k += 2"}, args: "k, total, 30, 40", typ: "float64", ref: refHypergeometric},
	{pkg: "probeterm", fn: "Spread", loops: []string{"a := 1; a <= 220; a += 7", "b := 1; b <= 220; b += 11"}, args: "float64(a), float64(b)", typ: "float64", ref: refGammaRatio},
	{pkg: "probeterm", fn: "Mix", loops: []string{"a := 1; a <= 200; a += 9", "b := 1; b <= 200; b += 13"}, args: "float64(a), float64(b)", typ: "float64", ref: refBeta},
	{pkg: "probeimports", fn: "Plans", loops: []string{"n := 0; n <= 300; n += 7", "k := 0; k <= n; k += 1 + n/5"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "probeimports", fn: "Tail", loops: []string{"n := 0; n <= 300; n += 7", "k := 0; k <= 30 && k <= n; k += 3"}, args: "n, k", typ: "float64", ref: refFalling},
	// The real analyzer's fix packages.
	{pkg: "fixratio", fn: "Rotas", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refChoose},
	{pkg: "fixratio", fn: "RotaShare", loops: []string{"n := 0; n <= 400; n += 3", "k := 0; k <= n; k += 1 + n/9"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "fixratio", fn: "Orders", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refFalling},
	{pkg: "fixratio", fn: "Shifts", loops: []string{"a := 0; a <= 90; a += 9", "b := 0; b <= 90; b += 10", "c := 0; c <= 40; c += 8"}, args: "a, b, c", typ: "float64", ref: refMultinomial},
	{pkg: "fixratio", fn: "Rotas32", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n; k++"}, args: "int32(n), int32(k)", typ: "int32", ref: refChoose},
	{pkg: "fixratio", fn: "Queues", loops: []string{"n := 0; n <= 40; n++"}, args: "n", typ: "int", ref: refCatalan},
	// Nine float factorials over one another, in log space where they
	// leave float64; below 0 each is the loop's empty product, as written.
	{pkg: "fixratio", fn: "ShiftTable", loops: []string{"a := 0; a <= 300; a += 37", "b := 0; b <= 300; b += 41", "c := -2; c <= 200; c += 53", "d := 0; d <= 200; d += 29"}, args: "a, b, c, d", typ: "float64", ref: refTable},
	{pkg: "fixterm", fn: "Arrivals", loops: []string{"k := 0; k <= 260; k += 4", "l := 1; l <= 200; l *= 3"}, args: "k, float64(l) / 2", typ: "float64", ref: refPoisson},
	// The power multiplied up by a loop: +Inf from lambda^k past
	// float64, the term NaN or 0 where it is not.
	{pkg: "fixterm", fn: "Walkins", loops: []string{"k := -3; k <= 260; k += 4", "l := 1; l <= 200; l *= 3"}, args: "k, float64(l) / 2", typ: "float64", ref: refPoissonLoop},
	{pkg: "fixterm", fn: "Load", loops: []string{"a := 1; a <= 200; a *= 4", "k := 0; k <= 260; k += 5"}, args: "float64(a) / 2, k", typ: "float64", ref: refPowFact},
	// A factorial of 16 bits called on uint16(k): for k < 0 the
	// conversion wraps and the original divides by the factorial of
	// 2^16 − |k| wrapped to 16 bits (0: its factors hold 2^16 many times
	// over), where the term is its power over the empty product; the
	// original's loop of up to 65535 trips stays quick.
	{pkg: "fixterm", fn: "Clicks", loops: []string{"k := -4; k <= 260; k += 3", "l := 1; l <= 200; l *= 3"}, args: "k, float64(l) / 2", typ: "float64", ref: refPoissonSigned},
	{pkg: "fixterm", fn: "Spread16", loops: []string{"a := 1; a <= 200; a *= 4", "k := -4; k <= 260; k += 5"}, args: "float64(a) / 2, k", typ: "float64", ref: refPowFactSigned},
	// Outside 0 ≤ k ≤ n the rewrite keeps the expression as written
	// (fixes/domain.go): fact(0)/(fact(1)·fact(−1)) is 1 where C(0, 1)
	// is 0, and MustFallingInt64 panics for k < 0. n stays below the
	// guard that -fix gives fact itself (21).
	{pkg: "fixratio", fn: "Rotas", loops: []string{"n := 0; n <= 17; n++", "k := -3; k <= n+3; k++"}, args: "n, k", typ: "int", ref: refRatioChoose, noBreak: true},
	{pkg: "fixratio", fn: "Orders", loops: []string{"n := 0; n <= 17; n++", "k := -3; k <= n+3; k++"}, args: "n, k", typ: "int", ref: refRatioFalling, noBreak: true},
	{pkg: "fixratio", fn: "Pairings", loops: []string{"n := 0; n <= 65; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: scaled(2, refChoose)},
	{pkg: "fixratio", fn: "TripleShare", loops: []string{"n := 0; n <= 400; n += 3", "k := 0; k <= n; k += 1 + n/9"}, args: "n, k", typ: "float64", ref: scaled(3, refChoose)},
	{pkg: "fixterm", fn: "Blocking", loops: []string{"a := 1; a <= 200; a *= 4", "c := 0; c <= 260; c += 5"}, args: "float64(a) / 2, c", typ: "float64", ref: refErlangB},
	{pkg: "fixconv", fn: "Spread", loops: []string{"n := 0; n <= 175; n++"}, args: "int64(n)", typ: "float64", ref: refFactorial},
	{pkg: "fixconv", fn: "Spread32", loops: []string{"n := 0; n <= 40; n++"}, args: "int64(n)", typ: "float32", ref: refFactorial},
	{pkg: "fixconv", fn: "Count", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int64", ref: refFactorial},
	{pkg: "fixconv", fn: "CountU", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "uint64", ref: refFactorial},
	{pkg: "fixconv", fn: "Count32", loops: []string{"n := 0; n <= 20; n++"}, args: "n", typ: "int32", ref: refFactorial},
	{pkg: "fixterm", fn: "Lot", loops: []string{"total := 70; total <= 250; total += 60", "k := 0; k <= 30; k += 2"}, args: "k, total, 30, 40", typ: "float64", ref: refHypergeometric},
	{pkg: "fixterm", fn: "Spread", loops: []string{"a := 1; a <= 220; a += 7", "b := 1; b <= 220; b += 11"}, args: "float64(a), float64(b)", typ: "float64", ref: refGammaRatio},
	{pkg: "fixterm", fn: "Mix", loops: []string{"a := 1; a <= 200; a += 9", "b := 1; b <= 200; b += 13"}, args: "float64(a), float64(b)", typ: "float64", ref: refBeta},
	// Outside positive arguments the Beta function keeps the code's own
	// product, as a Product chain: Γ(200)·Γ(−50.5) is +Inf·tiny in
	// float64, over Γ(149.5), where B(200, −50.5) is finite.
	{pkg: "fixterm", fn: "Mix", loops: []string{"a := 1; a <= 220; a += 9", "m := 0; m <= 160; m += 11"}, args: "float64(a), -float64(m) - 0.5", typ: "float64", ref: refBetaGamma},
	{pkg: "fixterm", fn: "FillMoment", loops: []string{"k := 0; k <= 338; k += 2"}, args: "k, 0.5", typ: "float64", ref: refFillMoment, noBreak: true},
	{pkg: "fixterm", fn: "FillDensity", loops: []string{"a := 1; a <= 400; a += 13", "b := 1; b <= 400; b += 17"}, args: "float64(a), float64(b), 0.5", typ: "float64", ref: refFillDensity},
	{pkg: "fixterm", fn: "Drift", loops: []string{"b := 20; b <= 200; b += 30", "k := 0; k <= 150; k += 5"}, args: "k, float64(b), 1.5", typ: "float64", ref: refDrift},
	// Loops that leave early: nothing but Past is fixed, and every
	// function keeps its values (Labeled(25) is 24, not a panic).
	{pkg: "fixexit", fn: "Labeled", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int", ref: refFactorialTo(4), noBreak: true},
	{pkg: "fixexit", fn: "Jumped", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int", ref: refFactorialTo(4), noBreak: true},
	{pkg: "fixexit", fn: "Skipped", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int", ref: refFactorialTo(5), noBreak: true},
	{pkg: "fixexit", fn: "Capped", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int", ref: refCapped, noBreak: true},
	{pkg: "fixexit", fn: "Until", loops: []string{"n := 0; n <= 30; n++"}, args: "n, 5", typ: "int", ref: refFactorialTo(4), noBreak: true},
	{pkg: "fixexit", fn: "Thirty", loops: []string{"s := 1; s <= 21; s++"}, args: "s", typ: "int", ref: refThirty, noBreak: true},
	{pkg: "fixexit", fn: "OddCrates", loops: []string{"n := 0; n <= 34; n++"}, args: "n", typ: "int", ref: refOddProduct, noBreak: true},
	{pkg: "fixexit", fn: "Past", loops: []string{"n := 0; n <= 30; n++"}, args: "n", typ: "int", ref: refFactorial, guard: true},
	{pkg: "fixloop", fn: "Ways", loops: []string{"n := 0; n <= 68; n++", "k := -3; k <= n; k++"}, args: "n, k", typ: "int", ref: refLoopChoose},
	{pkg: "fixloop", fn: "WaysChecked", loops: []string{"n := 0; n <= 68; n++", "k := -3; k <= n; k++"}, args: "n, k", typ: "int", ref: refCheckedChoose},
	{pkg: "fixloop", fn: "Rolls", loops: []string{"n := 0; n <= 40; n++", "k := -3; k <= n; k++"}, args: "n, k", typ: "int", ref: refLoopFalling},
	{pkg: "fixloop", fn: "RollsUp", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int", ref: refFalling},
	{pkg: "fixloop", fn: "WaysU", loops: []string{"n := 0; n <= 68; n++", "k := 0; k <= n; k++"}, args: "uint64(n), uint64(k)", typ: "uint64", ref: refChoose},
	// A falling factorial over k! in two loops: C(n, k) exactly where
	// it fits, though the numerator wraps from n = 21; outside
	// 0 ≤ k ≤ n the quotient as written, 1 with no trip and 0 past a
	// zero factor (k ≤ 63 keeps the wrapped k! nonzero).
	{pkg: "fixloop", fn: "Committees", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int64", ref: refChoose},
	{pkg: "fixloop", fn: "Committees", loops: []string{"n := 0; n <= 60; n++", "k := -3; k <= n+3; k++"}, args: "n, k", typ: "int64", ref: refLoopChoose},
	{pkg: "fixloop", fn: "Interleavings", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "uint64(n), uint64(k)", typ: "uint64", ref: refChoose},
	// The loop's n is the sum across+up; no side ≤ 0 runs it.
	{pkg: "fixloop", fn: "Routes", loops: []string{"a := -3; a <= 45; a++", "u := 0; u <= 45; u++"}, args: "a, u", typ: "int", ref: refRoutes},
	// Factors written off the counter; k past n, where the falling
	// factorial is 0 (the unsigned loop start wraps for k > n+2).
	{pkg: "fixloop", fn: "Picks", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n+4; k++"}, args: "uint64(n), uint64(k)", typ: "uint64", ref: refFalling},
	{pkg: "fixloop", fn: "Draws", loops: []string{"n := 0; n <= 40; n++", "k := 0; k <= n+4; k++"}, args: "int64(n), int64(k)", typ: "int64", ref: refFalling},
	{pkg: "fixguard", fn: "Orderings", loops: []string{"n := 0; n <= 30; n++"}, args: "int64(n)", typ: "int64", ref: refFactorial, guard: true},
	{pkg: "fixguard", fn: "Rec", loops: []string{"n := 0; n <= 20; n++"}, args: "int32(n)", typ: "int32", ref: refFactorial, guard: true},
	// A float64 n! returned as it is is +Inf exactly where n! is beyond
	// float64, the IEEE value: no finding, no guard, and no panic past 170.
	{pkg: "fixguard", fn: "Spread", loops: []string{"n := 0; n <= 180; n++"}, args: "n", typ: "float64", ref: refFactorial, noBreak: true},
	{pkg: "fixguard", fn: "Pairings", loops: []string{"n := 0; n <= 45; n++"}, args: "int64(n)", typ: "int64", ref: refDoubleFactorial, guard: true},
	{pkg: "fixguard", fn: "PairingsRec", loops: []string{"n := 0; n <= 25; n++"}, args: "int32(n)", typ: "int32", ref: refDoubleFactorial, guard: true},
	// Guards before a product loop whose product the function returns,
	// times a constant: the grids cross each first bad value, and
	// LateSlots' stays below its own early return at n > 40.
	{pkg: "fixguard", fn: "Swaps", loops: []string{"n := 0; n <= 30; n++"}, args: "int64(n)", typ: "int64", ref: scaled(2, refFactorial), guard: true},
	{pkg: "fixguard", fn: "OddBays", loops: []string{"n := 0; n <= 45; n++"}, args: "int64(n)", typ: "int64", ref: refDoubleFactorial, guard: true},
	{pkg: "fixguard", fn: "LateSlots", loops: []string{"n := 0; n <= 40; n++"}, args: "int64(n)", typ: "int64", ref: refProductFrom(4), guard: true},
	{pkg: "fixguard", fn: "Wear", loops: []string{"n := 0; n <= 20; n++"}, args: "int32(n)", typ: "int32", ref: refRisingFrom(5), guard: true},
	// A clamped argument: the guard at the entry tests the caller's n.
	{pkg: "fixguard", fn: "Capped", loops: []string{"n := 0; n <= 40; n++"}, args: "int64(n)", typ: "int64", ref: refFactorialTo(25), guard: true},
	{pkg: "fixguard", fn: "Line", loops: []string{"n := 0; n <= 40; n++"}, args: "int64(n)", typ: "int64", ref: refFactorialTo(30), guard: true},
	// Right before the fixes wherever the factorial inside them overflows
	// (the term or sum is finite, or below the smallest float64): no fix
	// may make them panic there.
	{pkg: "fixseries", fn: "Decay", loops: []string{"k := 0; k <= 260; k += 3"}, args: "1, k", typ: "float64", ref: refDecay, noBreak: true},
	{pkg: "fixseries", fn: "ExpSeries", loops: []string{"x := 1; x <= 16; x *= 2", "n := 0; n <= 260; n += 7"}, args: "float64(x) / 2, n", typ: "float64", ref: refExpSeries, noBreak: true},
	{pkg: "fixseries", fn: "ExpSeries", loops: []string{"x := 100; x <= 300; x += 100", "n := 100; n <= 400; n += 20"}, args: "float64(x), n", typ: "float64", ref: refExpSeries},
	{pkg: "fixseries", fn: "CoolingSum", loops: []string{"x := 1; x <= 300; x += 23", "n := 0; n <= 400; n += 20"}, args: "float64(x), int64(n)", typ: "float64", ref: refExpSeries},
	{pkg: "fixseries", fn: "CoolingPower", loops: []string{"x := 1; x <= 300; x += 23", "n := 0; n <= 400; n += 20"}, args: "float64(x), n", typ: "float64", ref: refExpSeries},
	{pkg: "fixseries", fn: "LateCount", loops: []string{"l := 50; l <= 700; l += 130", "n := 0; n <= 900; n += 45"}, args: "float64(l), n", typ: "float64", ref: refPoissonCDF},
	{pkg: "fixseries", fn: "ModeNorm", loops: []string{"n := 0; n <= 290; n++"}, args: "n", typ: "float64", ref: refModeNorm},
	{pkg: "fixseries", fn: "Tail", loops: []string{"n := 0; n <= 260; n += 3"}, args: "n", typ: "float64", ref: refTail, noBreak: true},
	{pkg: "probemany", fn: "Hands", loops: []string{"n := 0; n <= 66; n++", "k := 0; k <= n; k += 2"}, args: "n, k", typ: "int", ref: refChoose},
	// Loops the value model reads as C(n, k); the grids cross the
	// product's overflow (n ≥ 1021 in float64, 62 in int64) below
	// C(n, n/2)'s own (1030, 67), and take in k > n and negative
	// operands, where the original's answers must be kept.
	{pkg: "fixmodel", fn: "Draws", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "fixmodel", fn: "DrawsUp", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "fixmodel", fn: "Folded", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "fixmodel", fn: "Odds", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose},
	// Float operands: the helper serves the whole numbers of its domain
	// (the loop stays for the others; this grid holds whole numbers).
	{pkg: "fixmodel", fn: "Scaled", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose, call: "Scaled(float64(n), float64(k))"},
	// Stepped leaves 1 for a negative k (a loop of no trips): k ≥ 0 here.
	{pkg: "fixmodel", fn: "Stepped", loops: []string{"n := -3; n <= 1060; n += 7", "k := 0; k <= n+3; k += 1 + max(n, 0)/45"}, args: "n, k", typ: "float64", ref: refChoose, call: "Stepped(float64(n), float64(k))"},
	{pkg: "fixmodel", fn: "Ticket.Ways", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose, call: "Ticket{Pool: float64(n), Picks: float64(k)}.Ways()"},
	// A table of running weights C(n−1, k) whose steps the code reads:
	// past C(n−1, ⌊(n−1)/2⌋)'s limit the original stays +Inf where the
	// weight fits again (C(1099, 984) ≈ 1e160).
	// Pascal's rule with a memo: right wherever C(n, k) fits, wrapped
	// past it (from n = 67 in int64, 34 in int32), where the guard must
	// panic.
	{pkg: "fixpascal", fn: "Picks", loops: []string{"n := 0; n <= 72; n++", "k := -1; k <= n+1; k++"}, args: "int64(n), int64(k)", typ: "int64", ref: refChoose, guard: true},
	// Lattice paths C(r+c, r): wrong from r + c = 67 at r = c.
	{pkg: "fixpascal", fn: "Routes", loops: []string{"r := -1; r <= 40; r++", "c := -1; c <= 40; c += 3"}, args: "int64(r + c), int64(r)", typ: "int64", ref: refChoose, guard: true, call: "Routes(int64(r), int64(c))"},
	{pkg: "fixpascal", fn: "SmallPicks", loops: []string{"n := 0; n <= 38; n++", "k := -1; k <= n+1; k++"}, args: "n, k", typ: "int32", ref: refChoose, guard: true, call: "SmallPicks(k, n)"},
	{pkg: "fixbinompeak", fn: "Weights", loops: []string{"n := 2; n <= 1100; n += 37", "k := 0; k < n; k += 1 + n/9"}, args: "n-1, k", typ: "float64", ref: refChoose, call: "Weights(n)[k]"},
	{pkg: "fixbinompeak", fn: "Combin", loops: []string{"n := -3; n <= 1060; n += 7", "k := -2; k <= n+3; k += 1 + n/45"}, args: "n, k", typ: "float64", ref: refChoose, call: "Combin(float64(n), float64(k))"},
	{pkg: "fixmodel", fn: "Unchecked", loops: []string{"n := -30; n <= 1060; n += 7", "k := -3; k <= n+3 || k <= 25; k += 1 + max(n, 0)/45"}, args: "n, k", typ: "float64", ref: refLoopChoose},
	// Counts kept in float64: the helper runs where they hold whole
	// numbers in the shape's domain (integer grids up to n = 1100, past
	// the factorial's 171 and C(n, n/2)'s 1030); elsewhere (quarters,
	// k > n, negative n) the original's own arithmetic is kept exactly.
	{pkg: "fixcounts", fn: "Stalls", loops: []string{"n := 0; n <= 1100; n += 7", "k := 0; k <= n; k += 1 + n/9"}, args: "float64(n), float64(k)", typ: "float64", ref: refChoose},
	{pkg: "fixcounts", fn: "Stalls", loops: []string{"n := -8; n <= 60; n += 3", "k := -4; k <= 70; k += 3"}, args: "float64(n) / 4, float64(k) / 4", typ: "float64", ref: refTallyChoose, noBreak: true},
	{pkg: "fixcounts", fn: "Stalls", loops: []string{"n := 0; n <= 40; n++", "k := n + 1; k <= n+30; k += 7"}, args: "float64(n), float64(k)", typ: "float64", ref: refTallyChoose, noBreak: true},
	// Past 170 the factorials alone overflow: fractions (the floors'
	// ratio) and k > n (n!/k!) are taken in log space, where the original
	// divides +Inf by +Inf.
	{pkg: "fixcounts", fn: "Stalls", loops: []string{"n := 680; n <= 1200; n += 61", "k := 40; k <= 3000; k += 217"}, args: "float64(n) / 4, float64(k) / 4", typ: "float64", ref: refTallyChoose},
	// e^−λ·Σ λ^k/k! with e^−λ folded into each term: right where λ^k
	// overflows (the reference takes e^−λ from math.Exp, so λ ≤ 700).
	{pkg: "fixcounts", fn: "Queue", loops: []string{"l := 50; l <= 700; l += 130", "n := 0; n <= 1100; n += 45"}, args: "float64(l), n", typ: "float64", ref: refPoissonCDF},
	// ln Γ(x) past 171.62, where Γ(x) is +Inf; x > 0 only (the original
	// is kept at or below 0).
	{pkg: "fixloggamma", fn: "Spread", loops: []string{"n := 1; n <= 900; n += 7"}, args: "float64(n) / 2", typ: "float64", ref: refLogGamma},
	{pkg: "fixcounts", fn: "Arrivals", loops: []string{"k := 0; k <= 260; k += 4", "l := 1; l <= 200; l *= 3"}, args: "float64(k), float64(l) / 2", typ: "float64", ref: refPoisson},
	{pkg: "fixcounts", fn: "Rentals", loops: []string{"n := 1; n <= 1100; n += 37", "k := 0; k <= n; k += 1 + n/11"}, args: "float64(k), float64(n), 0.125", typ: "float64", ref: refBinomialPMF},
	// Binomial probabilities over integer binomial functions, on a grid
	// that leaves their domain (p = 1.5, k past n, a load smaller than
	// its flawed pots): the expression kept as written takes each count
	// from the float helper of its function's form, where the
	// functions' own fixes would panic.
	{pkg: "fixkept", fn: "Cracked", loops: []string{"n := 0; n <= 100; n += 3", "k := -3; k <= n+3; k += 1 + n/9"}, args: "n, k, 1.5", typ: "float64", ref: keptPMF(loopChooseBig)},
	{pkg: "fixkept", fn: "Cracked", loops: []string{"n := 0; n <= 100; n += 3", "k := 0; k <= n; k += 1 + n/9"}, args: "n, k, 0.25", typ: "float64", ref: refBinomialPMFnk},
	// k past n with a p whose power leaves float64: the count is 0, and
	// so is the product, where the float64 arithmetic says 0·Inf = NaN.
	{pkg: "fixkept", fn: "Cracked", loops: []string{"n := 0; n <= 10; n++", "k := 140; k <= 160; k += 5"}, args: "n, k, 150.5", typ: "float64", ref: keptPMF(loopChooseBig)},
	{pkg: "fixkept", fn: "Glazed", loops: []string{"n := 0; n <= 10; n++", "k := 140; k <= 160; k += 5"}, args: "int64(n), int64(k), 150.5", typ: "float64", ref: keptPMF(ratioChooseBig)},
	{pkg: "fixkept", fn: "Flawed", loops: []string{"total := 40; total <= 120; total += 20", "k := 0; k <= 30; k += 3"}, args: "total, 70, 30, k", typ: "float64", ref: refKeptHypergeometric},
	{pkg: "fixkept", fn: "Glazed", loops: []string{"n := -3; n <= 60; n += 2", "k := -3; k <= n+3; k += 1 + n/9"}, args: "int64(n), int64(k), 1.5", typ: "float64", ref: keptPMF(ratioChooseBig)},
	// A sum of binomial probabilities with p outside [0, 1]: the terms
	// alternate in sign and leave float64 (−33.5^300 ≈ 1e457), so the
	// original's float64 sum is +Inf − Inf = NaN where the true sum, led
	// by its largest term, overflows too: the fixed loop panics there.
	{pkg: "fixkept", fn: "Passed", loops: []string{"n := 300; n <= 600; n += 100", "c := 0; c <= 5; c++"}, args: "n, c, 34.5", typ: "float64", ref: refKeptPMFSum},
	// Counts of an int64 binomial function that is 0 outside 0 ≤ k ≤ n,
	// converted to float64 by their callers: taken from the float helper
	// of that form, they are right past int64 (n ≥ 62) up to where
	// C(lot, drawn) leaves float64, and a sample larger than the sound
	// items gives 0 whatever the lot's count; a binomial probability kept
	// as written outside its domain (k past n, p = 150.5) is 0 there,
	// where the float64 arithmetic says 0·Inf = NaN.
	{pkg: "fixconvbinom", fn: "MissAll", loops: []string{"lot := 0; lot <= 1020; lot += 17", "bad := 0; bad <= lot; bad += 1 + lot/5", "drawn := 0; drawn <= lot; drawn += 1 + lot/7"}, args: "lot, bad, drawn", typ: "float64", ref: refMissAll},
	{pkg: "fixconvbinom", fn: "Exactly", loops: []string{"n := -3; n <= 100; n += 3", "k := -3; k <= n+3; k += 1 + max(n, 0)/9"}, args: "n, k, 1.5", typ: "float64", ref: keptPMF(zeroChooseBig)},
	{pkg: "fixconvbinom", fn: "Exactly", loops: []string{"n := 0; n <= 10; n++", "k := 140; k <= 160; k += 5"}, args: "n, k, 150.5", typ: "float64", ref: keptPMF(zeroChooseBig)},
	{pkg: "fixkept", fn: "Passed", loops: []string{"n := 0; n <= 100; n += 3", "c := 0; c <= n; c += 1 + n/9"}, args: "n, c, 0.25", typ: "float64", ref: refKeptPMFSum},
	// Falling-factorial loops over float counts, k past n included: the
	// loop multiplies by 0 there, after +Inf from n = 171 on (NaN as
	// written); for a negative n its k factors are all negative.
	{pkg: "fixmodel", fn: "Queues", loops: []string{"n := -10; n <= 250; n += 13", "k := 0; k <= n+40; k += 7"}, args: "float64(n), float64(k)", typ: "float64", ref: refProductDown},
	{pkg: "fixmodel", fn: "QueuesDown", loops: []string{"n := -10; n <= 250; n += 13", "k := 0; k <= n+40; k += 7"}, args: "float64(n), float64(k)", typ: "float64", ref: refProductDown},
	// A binomial probability over a coefficient its loop multiplies up:
	// past C(1029, 514) the coefficient is +Inf and the product NaN or
	// +Inf; for k > n it is 0 where a power of p = 150.5 is +Inf.
	{pkg: "fixmodel", fn: "Winners", loops: []string{"n := 0; n <= 2000; n += 97", "k := 0; k <= n; k += 1 + n/7"}, args: "n, k, 0.375", typ: "float64", ref: refBinomialPMFnk},
	{pkg: "fixmodel", fn: "Winners", loops: []string{"n := 0; n <= 10; n++", "k := 140; k <= 160; k += 5"}, args: "n, k, 150.5", typ: "float64", ref: keptPMF(loopChooseBig)},
	{pkg: "fixmodel", fn: "Prizes", loops: []string{"n := 0; n <= 2000; n += 97", "k := 0; k <= n; k += 1 + n/7"}, args: "n, k, 0.375", typ: "float64", ref: refBinomialPMFnk},
	{pkg: "fixmodel", fn: "Prizes", loops: []string{"n := 0; n <= 10; n++", "k := 140; k <= 160; k += 5"}, args: "n, k, 150.5", typ: "float64", ref: keptPMF(loopChooseBig)},
	{pkg: "fixmodel", fn: "Desk.Tickets", loops: []string{"n := -2; n <= 70; n++", "k := -2; k <= n+2; k++"}, args: "n, k", typ: "int64", ref: refChoose, call: "Desk{N: int64(n), K: int64(k)}.Tickets()"},
}

// negativeNCases run the binomial loops over negative n, where the loop
// computes the generalised coefficient; they need a helper module whose
// Choose family accepts a negative n.
var negativeNCases = []diffCase{
	{pkg: "fixloop", fn: "Ways", loops: []string{"n := -40; n <= 5; n++", "k := -3; k <= 40; k++"}, args: "n, k", typ: "int", ref: refLoopChoose, noBreak: true},
	{pkg: "fixloop", fn: "WaysChecked", loops: []string{"n := -40; n <= 5; n++", "k := -3; k <= 40; k++"}, args: "n, k", typ: "int", ref: refCheckedChoose, noBreak: true},
	{pkg: "fixloop", fn: "Routes", loops: []string{"a := 0; a <= 40; a++", "u := -80; u <= 0; u += 3"}, args: "a, u", typ: "int", ref: refRoutes, noBreak: true},
}

// generalisedChoose reports whether the helper module in the tree
// computes C(-3, 2) = 6, the generalised binomial coefficient (common
// practice: C(n, k) = (−1)^k·C(k−n−1, k) for n < 0).
func generalisedChoose() (ok bool) {
	defer func() {
		if recover() != nil {
			ok = false
		}
	}()
	return lgamma.MustChooseInt64(-3, 2) == 6
}

// TestDifferential compiles each testdata package twice, as written and
// as fixed, runs both over the grids of diffCases in one generated
// program, and compares both with exact math/big references: where the
// reference fits the result type the fixed code must match it (exactly
// for integers, within 1e-12 relative for floats); where it does not,
// integer code must panic; and the original must be wrong somewhere on
// the grid, or the case would not show the fix doing anything.
func TestDifferential(t *testing.T) {
	t.Parallel()
	if _, err := exec.LookPath("go"); err != nil {
		t.Skip("no go command")
	}
	cases := append(diffCases[:len(diffCases):len(diffCases)], lgammaDiffCases...)
	if generalisedChoose() {
		cases = append(cases[:len(cases):len(cases)], negativeNCases...)
	} else {
		t.Log("the helper module in the tree rejects a negative n in MustChooseInt64: the binomial loops are not compared over negative n")
	}
	pkgs := diffPackages(cases)
	mod := t.TempDir()
	// Packages named fix* are the real analyzer's, in the repository's
	// testdata; the others are the probe's, in this package's.
	for _, real := range []bool{false, true} {
		root, a := filepath.Join("testdata", "src"), probe
		if real {
			root, a = filepath.Join("..", "testdata", "src"), analyzer.Analyzer
		}
		var some []string
		for _, p := range pkgs {
			if realAnalyzerPkg(p) == real {
				some = append(some, p)
			}
		}
		dir := gopath(t, root, some...)
		for _, p := range some {
			copyDir(t, caseDir(root, p), filepath.Join(mod, "orig", p), false)
		}
		applyFirstFixes(t, dir, a, some...)
		for _, p := range some {
			copyDir(t, filepath.Join(dir, "src", p), filepath.Join(mod, "fixed", p), false)
		}
	}
	helper, err := filepath.Abs("lgamma")
	if err != nil {
		t.Fatal(err)
	}
	gomod := fmt.Sprintf("module difftest\n\ngo 1.22\n\nrequire %s v0.0.0\n\nreplace %s => %s\n", fixes.HelperPath, fixes.HelperPath, helper)
	write(t, filepath.Join(mod, "go.mod"), gomod)
	write(t, filepath.Join(mod, "main.go"), diffMain(pkgs, cases))
	cmd := exec.Command("go", "run", ".")
	cmd.Dir = mod
	cmd.Env = append(os.Environ(), "GOWORK=off", "GOFLAGS=-mod=mod", "GOPROXY=off")
	var stderr bytes.Buffer
	cmd.Stderr = &stderr
	out, err := cmd.Output()
	if err != nil {
		t.Fatalf("go run: %v\n%s", err, stderr.Bytes())
	}
	checkDiff(t, out, cases)
}

// analyzerPackage reports whether p is one of the real analyzer's
// packages in the repository's testdata (its fix* packages and those
// fixPackages adds), not one of the probe's.
func analyzerPackage(p string) bool {
	if strings.HasPrefix(p, "fix") {
		return true
	}
	for _, q := range fixPackages {
		if q == p {
			return true
		}
	}
	return false
}

// pkgIdent turns a package directory whose name has a hyphen into an
// identifier for the generated program's imports.
func pkgIdent(p string) string { return strings.ReplaceAll(p, "-", "_") }

func diffPackages(cases []diffCase) []string {
	var pkgs []string
	seen := make(map[string]bool)
	for _, c := range cases {
		if !seen[c.pkg] {
			seen[c.pkg] = true
			pkgs = append(pkgs, c.pkg)
		}
	}
	return pkgs
}

func write(t *testing.T, name, content string) {
	t.Helper()
	if err := os.WriteFile(name, []byte(content), 0o644); err != nil {
		t.Fatal(err)
	}
}

// diffMain writes the program that prints, for every case and input,
// "index|args|original|fixed", with "panic" for a call that panicked.
func diffMain(pkgs []string, cases []diffCase) string {
	var b strings.Builder
	b.WriteString("package main\n\nimport (\n\t\"fmt\"\n\t\"strconv\"\n")
	for _, p := range pkgs {
		fmt.Fprintf(&b, "\to_%s \"difftest/orig/%s\"\n\tf_%s \"difftest/fixed/%s\"\n", pkgIdent(p), p, pkgIdent(p), p)
	}
	b.WriteString(`)

func run(f func() any) (s string) {
	defer func() {
		if recover() != nil {
			s = "panic"
		}
	}()
	switch v := f().(type) {
	case float64:
		return strconv.FormatFloat(v, 'g', -1, 64)
	case float32:
		return strconv.FormatFloat(float64(v), 'g', -1, 32)
	default:
		return fmt.Sprint(v)
	}
}

func show(i int, args []any, o, f func() any) {
	fmt.Printf("%d|%s|%s|%s\n", i, fmt.Sprint(args...), run(o), run(f))
}

func main() {
`)
	for i, c := range cases {
		b.WriteString("\t{\n")
		for _, l := range c.loops {
			fmt.Fprintf(&b, "\tfor %s {\n", l)
		}
		call := fmt.Sprintf("%s(%s)", c.fn, c.args)
		if c.call != "" {
			call = c.call
		}
		fmt.Fprintf(&b, "\tshow(%d, []any{%s}, func() any { return o_%s.%s }, func() any { return f_%s.%s })\n",
			i, spaced(c.args), pkgIdent(c.pkg), call, pkgIdent(c.pkg), call)
		for range c.loops {
			b.WriteString("\t}\n")
		}
		b.WriteString("\t}\n")
	}
	b.WriteString("}\n")
	return b.String()
}

// spaced makes fmt.Sprint put a space between every argument.
func spaced(args string) string {
	parts := strings.Split(args, ",")
	for i, p := range parts {
		parts[i] = "\" \", " + strings.TrimSpace(p)
	}
	return strings.Join(parts, ", ")
}

type caseStats struct{ runs, broke int }

func checkDiff(t *testing.T, out []byte, cases []diffCase) {
	type line struct {
		f   []string
		x   []float64
		ref *big.Float
	}
	var lines []line
	sc := bufio.NewScanner(bytes.NewReader(out))
	for sc.Scan() {
		f := strings.Split(sc.Text(), "|")
		if len(f) != 4 {
			t.Fatalf("bad line %q", sc.Text())
		}
		if i, err := strconv.Atoi(f[0]); err != nil || i < 0 || i >= len(cases) {
			t.Fatalf("bad case index in %q", sc.Text())
		}
		var x []float64
		for _, a := range strings.Fields(f[1]) {
			v, err := strconv.ParseFloat(a, 64)
			if err != nil {
				t.Fatalf("bad argument %q", a)
			}
			x = append(x, v)
		}
		lines = append(lines, line{f: f, x: x})
	}
	// The math/big references are most of this test's time and
	// independent of each other: they are computed on every processor.
	var wg sync.WaitGroup
	workers := runtime.GOMAXPROCS(0)
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			for j := w; j < len(lines); j += workers {
				i, _ := strconv.Atoi(lines[j].f[0])
				lines[j].ref = cases[i].ref(lines[j].x)
			}
		}(w)
	}
	wg.Wait()
	stats := make([]caseStats, len(cases))
	for _, l := range lines {
		f, ref := l.f, l.ref
		i, _ := strconv.Atoi(f[0])
		c := cases[i]
		stats[i].runs++
		if !right(c.typ, f[2], ref, c.guard) {
			stats[i].broke++
		}
		if !right(c.typ, f[3], ref, c.guard) {
			t.Errorf("%s.%s(%s): fixed = %s, original = %s, want %s", c.pkg, c.fn, f[1], f[3], f[2], describe(c.typ, ref))
		}
		if c.guard && fits(c.typ, ref) && f[2] != f[3] {
			t.Errorf("%s.%s(%s): guarded = %s, original = %s; want the same", c.pkg, c.fn, f[1], f[3], f[2])
		}
	}
	for i, s := range stats {
		c := cases[i]
		switch {
		case s.runs == 0:
			t.Errorf("%s.%s never ran", c.pkg, c.fn)
		case s.broke == 0 && !c.noBreak:
			t.Errorf("%s.%s: the original was right on all %d inputs; the grid does not reach its overflow", c.pkg, c.fn, s.runs)
		}
		t.Logf("%s.%s: %d inputs, original wrong on %d, fixed right on all", c.pkg, c.fn, s.runs, s.broke)
	}
}

// limits of the result types, as exact big floats.
func limit(typ string) *big.Float {
	switch typ {
	case "int", "int64":
		return fl(math.MaxInt64)
	case "uint", "uint64":
		return bf(new(big.Int).SetUint64(math.MaxUint64))
	case "int32":
		return fl(math.MaxInt32)
	case "float32":
		return fl(math.MaxFloat32)
	}
	return fl(math.MaxFloat64)
}

func isFloat(typ string) bool { return strings.HasPrefix(typ, "float") }

func fits(typ string, ref *big.Float) bool {
	return new(big.Float).Abs(ref).Cmp(limit(typ)) <= 0
}

// right reports whether the printed result got is a correct outcome for
// reference ref: the value itself when it fits (floats within 1e-12
// relative, 1e-6 for float32, and an absolute 1e-300 near underflow); a
// panic when it does not, or for a float (unless loud is set, as for a
// range guard) an infinity.
func right(typ, got string, ref *big.Float, loud bool) bool {
	if !fits(typ, ref) {
		return got == "panic" || !loud && isFloat(typ) && (got == "+Inf" || got == "-Inf")
	}
	if got == "panic" {
		return false
	}
	v, _, err := big.ParseFloat(got, 10, refPrec, big.ToNearestEven)
	if err != nil {
		return false
	}
	if !isFloat(typ) {
		return v.Cmp(ref) == 0
	}
	tol := 1e-12
	if typ == "float32" {
		tol = 1e-6
	}
	diff := new(big.Float).Sub(v, ref)
	d, _ := new(big.Float).Abs(diff).Float64()
	r, _ := new(big.Float).Abs(ref).Float64()
	return d <= tol*r || d <= 1e-300
}

func describe(typ string, ref *big.Float) string {
	if !fits(typ, ref) {
		return "a panic (true value " + ref.Text('g', 6) + " overflows " + typ + ")"
	}
	return ref.Text('g', 17)
}
