package main

import (
	"fmt"
	"strings"
)

// The generators write factorial-shaped Go that type-checks: the shapes
// overfact looks for (product loops in int, uint64 and float64, recursion,
// ratios of factorials, power-over-factorial terms, gamma ratios), some
// guarded so that they are safe, in a staffing-estimator setting.

// blocks are the bodies repeated inside the long function; %d is a unique
// index that keeps constants distinct. Every block is self-contained.
var blocks = []string{
	`	{
		f := 1
		for i := 2; i <= agents+%d; i++ {
			f *= i
		}
		total += float64(f)
	}
`,
	`	{
		f := 1.0
		for i := 2; i <= calls%%%d; i++ {
			f *= float64(i)
		}
		total += f
	}
`,
	`	if agents <= 20 {
		var f uint64 = 1
		for i := uint64(2); i <= uint64(agents); i++ {
			f *= i
		}
		total += float64(f) * %d
	}
`,
	`	{
		term := math.Pow(load, float64(agents)) / float64(stFact(agents+%d))
		total += term
	}
`,
	`	{
		r := math.Gamma(float64(calls+%d)) / math.Gamma(float64(agents+1))
		total += r
	}
`,
}

// bigFunc returns a file with one function of at least lines lines (its
// body made of the blocks above, in turn) and the small helper it calls.
func bigFunc(lines int) string {
	var b strings.Builder
	b.WriteString(`// Package staffing is generated: one very long estimator function.
package staffing

import "math"

func stFact(n int) int {
	if n < 2 {
		return 1
	}
	return n * stFact(n-1)
}

func estimate(agents, calls int, load float64) float64 {
	total := 0.0
`)
	for i := 0; strings.Count(b.String(), "\n") < lines-2; i++ {
		fmt.Fprintf(&b, blocks[i%len(blocks)], i+1)
	}
	b.WriteString("\treturn total\n}\n")
	return b.String()
}

// smallFuncs are the templates of manyFuncs; %[1]d is the function index.
var smallFuncs = []string{
	`func loopFact%[1]d(n int) int {
	f := 1
	for i := 2; i <= n; i++ {
		f *= i
	}
	return f
}
`,
	`func recFact%[1]d(n int) float64 {
	if n <= 1 {
		return 1
	}
	return float64(n) * recFact%[1]d(n-1)
}
`,
	`func choose%[1]d(n, k int) int {
	return loopFact%[2]d(n) / (loopFact%[2]d(k) * loopFact%[2]d(n-k))
}
`,
	`func poisson%[1]d(k int, lambda float64) float64 {
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / recFact%[3]d(k)
}
`,
	`func guarded%[1]d(n uint) uint64 {
	if n > 20 {
		return 0
	}
	var f uint64 = 1
	for i := uint64(2); i <= uint64(n); i++ {
		f *= i
	}
	return f
}
`,
	`func ratio%[1]d(a, b float64) float64 {
	return math.Gamma(a+%[1]d) / math.Gamma(b)
}
`,
}

// manyFuncs returns a file with n small factorial functions. Templates
// that call others refer to the nearest earlier function of the needed
// kind, so every name resolves.
func manyFuncs(n int) string {
	var b strings.Builder
	b.WriteString(`// Package shifts is generated: many small factorial functions.
package shifts

import "math"

var _ = math.Pi
`)
	k := len(smallFuncs)
	for i := range n {
		t := i % k
		// Index of the latest loopFact (template 0) and recFact (1) at or
		// before this group.
		base := i - t
		fmt.Fprintf(&b, "\n"+smallFuncs[t], i, base, base+1)
	}
	return b.String()
}
