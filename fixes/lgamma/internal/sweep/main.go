// Command sweep evaluates the functions of package lgamma for the
// accuracy sweep of scripts/lgamma-mpmath.sh. It reads one call per line,
//
//	Name arg arg …
//
// with float arguments in any form strconv.ParseFloat accepts (the
// script writes them in hexadecimal, so they round-trip exactly) and
// integer arguments in decimal, and writes one line per call: the float
// result in hexadecimal ('x' format), or for the exact integer forms the
// value and "true"/"false", or "panic" if the call panicked.
package main

import (
	"bufio"
	"fmt"
	"math"
	"os"
	"strconv"
	"strings"

	"github.com/overfact/overfact/fixes/lgamma"
)

type call struct {
	nf, ni int // float and int arguments, floats first
	f      func(f []float64, i []int64) string
}

func fl(v float64) string { return strconv.FormatFloat(v, 'x', -1, 64) }

func pair(v int64, ok bool) string { return fmt.Sprintf("%d %t", v, ok) }

var calls = map[string]call{
	"LogGamma":          {1, 0, func(f []float64, _ []int64) string { return fl(lgamma.LogGamma(f[0])) }},
	"MathLgamma":        {1, 0, func(f []float64, _ []int64) string { v, _ := math.Lgamma(f[0]); return fl(v) }},
	"GammaRatio":        {2, 0, func(f []float64, _ []int64) string { return fl(lgamma.GammaRatio(f[0], f[1])) }},
	"LogGammaRatio":     {2, 0, func(f []float64, _ []int64) string { return fl(lgamma.LogGammaRatio(f[0], f[1])) }},
	"Beta":              {2, 0, func(f []float64, _ []int64) string { return fl(lgamma.Beta(f[0], f[1])) }},
	"LogBeta":           {2, 0, func(f []float64, _ []int64) string { return fl(lgamma.LogBeta(f[0], f[1])) }},
	"StirlingRemainder": {1, 0, func(f []float64, _ []int64) string { return fl(lgamma.StirlingRemainder(f[0])) }},
	"Rising":            {1, 1, func(f []float64, i []int64) string { return fl(lgamma.Rising(f[0], int(i[0]))) }},
	"LogRising":         {1, 1, func(f []float64, i []int64) string { return fl(lgamma.LogRising(f[0], int(i[0]))) }},
	"PowOverFactorial":  {1, 1, func(f []float64, i []int64) string { return fl(lgamma.PowOverFactorial(f[0], int(i[0]))) }},
	"LogPowOverFactorial": {1, 1, func(f []float64, i []int64) string {
		return fl(lgamma.LogPowOverFactorial(f[0], int(i[0])))
	}},
	"PoissonPMF":    {1, 1, func(f []float64, i []int64) string { return fl(lgamma.PoissonPMF(int(i[0]), f[0])) }},
	"PoissonLogPMF": {1, 1, func(f []float64, i []int64) string { return fl(lgamma.PoissonLogPMF(int(i[0]), f[0])) }},
	"BinomialPMF": {1, 2, func(f []float64, i []int64) string {
		return fl(lgamma.BinomialPMF(int(i[0]), int(i[1]), f[0]))
	}},
	"BinomialLogPMF": {1, 2, func(f []float64, i []int64) string {
		return fl(lgamma.BinomialLogPMF(int(i[0]), int(i[1]), f[0]))
	}},
	"LogFactorial": {0, 1, func(_ []float64, i []int64) string { return fl(lgamma.LogFactorial(int(i[0]))) }},
	"Factorial":    {0, 1, func(_ []float64, i []int64) string { return fl(lgamma.Factorial(int(i[0]))) }},
	"Choose":       {0, 2, func(_ []float64, i []int64) string { return fl(lgamma.Choose(int(i[0]), int(i[1]))) }},
	"LogChoose":    {0, 2, func(_ []float64, i []int64) string { return fl(lgamma.LogChoose(int(i[0]), int(i[1]))) }},
	"Falling":      {0, 2, func(_ []float64, i []int64) string { return fl(lgamma.Falling(int(i[0]), int(i[1]))) }},
	"LogFalling":   {0, 2, func(_ []float64, i []int64) string { return fl(lgamma.LogFalling(int(i[0]), int(i[1]))) }},
	"Catalan":      {0, 1, func(_ []float64, i []int64) string { return fl(lgamma.Catalan(int(i[0]))) }},
	"HypergeometricPMF": {0, 4, func(_ []float64, i []int64) string {
		return fl(lgamma.HypergeometricPMF(int(i[0]), int(i[1]), int(i[2]), int(i[3])))
	}},
	"HypergeometricLogPMF": {0, 4, func(_ []float64, i []int64) string {
		return fl(lgamma.HypergeometricLogPMF(int(i[0]), int(i[1]), int(i[2]), int(i[3])))
	}},
	"Multinomial": {0, -1, func(_ []float64, i []int64) string { return fl(lgamma.Multinomial(ints(i)...)) }},
	"LogMultinomial": {0, -1, func(_ []float64, i []int64) string {
		return fl(lgamma.LogMultinomial(ints(i)...))
	}},
	"ChooseInt64":      {0, 2, func(_ []float64, i []int64) string { return pair(lgamma.ChooseInt64(i[0], i[1])) }},
	"MustChooseInt64":  {0, 2, func(_ []float64, i []int64) string { return pair(lgamma.MustChooseInt64(i[0], i[1]), true) }},
	"FactorialInt64":   {0, 1, func(_ []float64, i []int64) string { return pair(lgamma.FactorialInt64(i[0])) }},
	"FallingInt64":     {0, 2, func(_ []float64, i []int64) string { return pair(lgamma.FallingInt64(i[0], i[1])) }},
	"CatalanInt64":     {0, 1, func(_ []float64, i []int64) string { return pair(lgamma.CatalanInt64(i[0])) }},
	"MultinomialInt64": {0, -1, func(_ []float64, i []int64) string { return pair(lgamma.MultinomialInt64(i...)) }},
}

func ints(v []int64) []int {
	r := make([]int, len(v))
	for i, x := range v {
		r[i] = int(x)
	}
	return r
}

// eval runs one line; a panic becomes the result "panic".
func eval(line string) (out string, err error) {
	fields := strings.Fields(line)
	c, ok := calls[fields[0]]
	if !ok {
		return "", fmt.Errorf("unknown function %q", fields[0])
	}
	args := fields[1:]
	if c.ni >= 0 && len(args) != c.nf+c.ni {
		return "", fmt.Errorf("%s: want %d arguments, have %d", fields[0], c.nf+c.ni, len(args))
	}
	fs := make([]float64, c.nf)
	for j := range fs {
		if fs[j], err = strconv.ParseFloat(args[j], 64); err != nil {
			return "", err
		}
	}
	is := make([]int64, len(args)-c.nf)
	for j := range is {
		if is[j], err = strconv.ParseInt(args[c.nf+j], 10, 64); err != nil {
			return "", err
		}
	}
	defer func() {
		if recover() != nil {
			out = "panic"
		}
	}()
	return c.f(fs, is), nil
}

func main() {
	in := bufio.NewScanner(os.Stdin)
	in.Buffer(make([]byte, 1<<20), 1<<20)
	w := bufio.NewWriter(os.Stdout)
	defer w.Flush()
	for in.Scan() {
		if strings.TrimSpace(in.Text()) == "" {
			continue
		}
		out, err := eval(in.Text())
		if err != nil {
			fmt.Fprintln(os.Stderr, "sweep:", err)
			os.Exit(2)
		}
		fmt.Fprintln(w, out)
	}
	if err := in.Err(); err != nil {
		fmt.Fprintln(os.Stderr, "sweep:", err)
		os.Exit(2)
	}
}
