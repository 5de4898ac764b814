package fuzz

import (
	"fmt"
	"strings"
)

// Generate writes a file of package pkg with factorial-shaped functions
// chosen by the bytes of seed: product loops, recursion, ratios of
// factorials, power-over-factorial and Poisson terms, gamma ratios,
// multiplicative binomial loops, closures, some guarded and some not, over
// a range of integer and float types. The result type-checks for every
// seed; the fuzz target treats a type error as a bug of the generator.
func Generate(pkg string, seed []byte) string {
	r := &byteReader{b: seed}
	var b strings.Builder
	fmt.Fprintf(&b, "package %s\n\nimport \"math\"\n\nvar _ = math.Pi\n", pkg)
	n := 1 + r.next()%4
	for i := range n {
		g := shapes[r.next()%len(shapes)]
		b.WriteString("\n")
		g(&b, r, fmt.Sprintf("gen%d", i))
	}
	return b.String()
}

// byteReader hands out the seed bytes, then zeros.
type byteReader struct {
	b []byte
	i int
}

func (r *byteReader) next() int {
	if r.i >= len(r.b) {
		return 0
	}
	r.i++
	return int(r.b[r.i-1])
}

func (r *byteReader) pick(xs ...string) string { return xs[r.next()%len(xs)] }

var (
	accTypes   = []string{"int", "int64", "uint64", "float64", "int32", "uint", "float32"}
	paramTypes = []string{"int", "uint", "int64", "uint8", "int16"}
)

// guard returns a statement that bounds param before the arithmetic, or
// nothing; the bound comes from the seed so that both safe and unsafe
// limits occur. When open is true the statement opens a block that the
// caller must close with closeGuard.
func guard(r *byteReader, param, zero string) (stmt string, open bool) {
	c := r.next() % 40
	switch r.next() % 5 {
	case 1:
		return fmt.Sprintf("\tif %s > %d {\n\t\treturn %s\n\t}\n", param, c, zero), false
	case 2:
		return fmt.Sprintf("\tif %s >= %d {\n\t\tpanic(\"too large\")\n\t}\n", param, c), false
	case 3:
		return fmt.Sprintf("\t%s = min(%s, %d)\n", param, param, c), false
	case 4:
		return fmt.Sprintf("\tif %s < %d {\n", param, c), true
	}
	return "", false
}

// closeGuard ends the block an open guard started; the value past the
// bound is zero.
func closeGuard(b *strings.Builder, open bool, zero string) {
	if open {
		fmt.Fprintf(b, "\t}\n\treturn %s\n", zero)
	}
}

// loopBody writes a product loop over 2..n into acc of type at.
func loopBody(b *strings.Builder, r *byteReader, acc, at, n, pt string) {
	conv := func(v string) string { return at + "(" + v + ")" }
	switch r.next() % 4 {
	case 0:
		fmt.Fprintf(b, "\tfor i := %s(2); i <= %s; i++ {\n\t\t%s *= %s\n\t}\n", pt, n, acc, conv("i"))
	case 1:
		fmt.Fprintf(b, "\tfor i := %s; i > 1; i-- {\n\t\t%s = %s * %s\n\t}\n", n, acc, acc, conv("i"))
	case 2:
		fmt.Fprintf(b, "\tfor i := range %s {\n\t\t%s *= %s\n\t}\n", n, acc, conv("i+1"))
	default:
		fmt.Fprintf(b, "\tfor i := 1; i <= int(%s); i++ {\n\t\t%s *= %s\n\t}\n", n, acc, conv("i"))
	}
}

type shape func(b *strings.Builder, r *byteReader, name string)

var shapes = []shape{
	loopShape, recShape, ratioShape, powShape, poissonShape,
	gammaShape, binomLoopShape, closureShape, constShape,
}

func loopShape(b *strings.Builder, r *byteReader, name string) {
	at, pt := r.pick(accTypes...), r.pick(paramTypes...)
	fmt.Fprintf(b, "func %s(n %s) %s {\n", name, pt, at)
	g, open := guard(r, "n", "0")
	b.WriteString(g)
	fmt.Fprintf(b, "\tvar f %s = 1\n", at)
	loopBody(b, r, "f", at, "n", pt)
	b.WriteString("\treturn f\n")
	closeGuard(b, open, "0")
	b.WriteString("}\n")
}

func recShape(b *strings.Builder, r *byteReader, name string) {
	at, pt := r.pick(accTypes...), r.pick(paramTypes...)
	fmt.Fprintf(b, "func %s(n %s) %s {\n", name, pt, at)
	g, open := guard(r, "n", "0")
	b.WriteString(g)
	fmt.Fprintf(b, "\tif n <= 1 {\n\t\treturn 1\n\t}\n\treturn %s(n) * %s(n-1)\n", at, name)
	closeGuard(b, open, "0")
	b.WriteString("}\n")
}

func ratioShape(b *strings.Builder, r *byteReader, name string) {
	at := r.pick("int", "uint64", "float64", "int64")
	fmt.Fprintf(b, "func %sFact(n int) %s {\n\tvar f %s = 1\n", name, at, at)
	loopBody(b, r, "f", at, "n", "int")
	b.WriteString("\treturn f\n}\n\n")
	fmt.Fprintf(b, "func %s(n, k int) %s {\n", name, at)
	g, open := guard(r, "n", "0")
	b.WriteString(g)
	f := name + "Fact"
	switch r.next() % 4 {
	case 0: // binomial coefficient
		fmt.Fprintf(b, "\treturn %[1]s(n) / (%[1]s(k) * %[1]s(n-k))\n", f)
	case 1: // permutations
		fmt.Fprintf(b, "\treturn %[1]s(n) / %[1]s(n-k)\n", f)
	case 2: // Catalan number of n
		fmt.Fprintf(b, "\treturn %[1]s(2*n) / (%[1]s(n+1) * %[1]s(n))\n", f)
	default: // multinomial with three groups
		fmt.Fprintf(b, "\treturn %[1]s(n+k+3) / (%[1]s(n) * %[1]s(k) * %[1]s(3))\n", f)
	}
	closeGuard(b, open, "0")
	b.WriteString("}\n")
}

func powShape(b *strings.Builder, r *byteReader, name string) {
	fmt.Fprintf(b, "func %sFact(k int) float64 {\n\tf := 1.0\n", name)
	loopBody(b, r, "f", "float64", "k", "int")
	b.WriteString("\treturn f\n}\n\n")
	fmt.Fprintf(b, "func %s(x float64, k int) float64 {\n", name)
	if r.next()%2 == 0 {
		fmt.Fprintf(b, "\tif k > %d {\n\t\treturn 0\n\t}\n", r.next()%200)
	}
	fmt.Fprintf(b, "\treturn %s / %sFact(k)\n}\n", r.pick("math.Pow(x, float64(k))", "math.Pow(x, float64(k))*math.Exp(-x)"), name)
}

func poissonShape(b *strings.Builder, r *byteReader, name string) {
	fmt.Fprintf(b, "func %s(lambda float64, k int) float64 {\n\tterm := math.Exp(-lambda)\n", name)
	fmt.Fprintf(b, "\tfor i := 1; i <= k; i++ {\n\t\tterm *= lambda / float64(i)\n\t}\n")
	fmt.Fprintf(b, "\tnum := math.Pow(lambda, float64(k))\n\tden := 1.0\n")
	loopBody(b, r, "den", "float64", "k", "int")
	fmt.Fprintf(b, "\treturn %s\n}\n", r.pick("term*den/num", "num * math.Exp(-lambda) / den", "term + num/den"))
}

func gammaShape(b *strings.Builder, r *byteReader, name string) {
	fmt.Fprintf(b, "func %s(a, b float64, n int) float64 {\n", name)
	if r.next()%3 == 0 {
		fmt.Fprintf(b, "\tif a > %d || b > %d {\n\t\treturn math.NaN()\n\t}\n", r.next()%200, r.next()%200)
	}
	fmt.Fprintf(b, "\treturn %s\n", r.pick(
		"math.Gamma(a) / math.Gamma(b)",
		"math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b)",
		"math.Gamma(float64(n) + 1)",
		"math.Gamma(float64(n+1)) / (math.Gamma(a+1) * math.Gamma(float64(n)-a+1))",
		"math.Gamma(a+1) / math.Gamma(a-float64(n)+1)",
	))
	b.WriteString("}\n")
}

func binomLoopShape(b *strings.Builder, r *byteReader, name string) {
	at := r.pick("int", "uint64", "float64", "int64")
	fmt.Fprintf(b, "func %s(n, k int) %s {\n", name, at)
	g, open := guard(r, "n", "0")
	b.WriteString(g)
	fmt.Fprintf(b, "\tvar c %s = 1\n", at)
	switch r.next() % 2 {
	case 0:
		fmt.Fprintf(b, "\tfor i := 1; i <= k; i++ {\n\t\tc = c * %[1]s(n-k+i) / %[1]s(i)\n\t}\n", at)
	default: // falling factorial n(n-1)...(n-k+1)
		fmt.Fprintf(b, "\tfor i := 0; i < k; i++ {\n\t\tc *= %s(n - i)\n\t}\n", at)
	}
	b.WriteString("\treturn c\n")
	closeGuard(b, open, "0")
	b.WriteString("}\n")
}

func closureShape(b *strings.Builder, r *byteReader, name string) {
	at := r.pick(accTypes...)
	fmt.Fprintf(b, "func %s(ns []int) []%s {\n\tfact := func(n int) %s {\n\t\tvar f %s = 1\n", name, at, at, at)
	fmt.Fprintf(b, "\t\tfor i := 2; i <= n; i++ {\n\t\t\tf *= %s(i)\n\t\t}\n\t\treturn f\n\t}\n", at)
	fmt.Fprintf(b, "\tout := make([]%s, 0, len(ns))\n\tfor _, n := range ns {\n\t\tout = append(out, fact(n))\n\t}\n\treturn out\n}\n", at)
}

func constShape(b *strings.Builder, r *byteReader, name string) {
	at := r.pick("int", "uint64", "float64", "int64")
	c := r.next() % 200
	fmt.Fprintf(b, "func %sFact(n int) %s {\n\tvar f %s = 1\n", name, at, at)
	loopBody(b, r, "f", at, "n", "int")
	b.WriteString("\treturn f\n}\n\n")
	fmt.Fprintf(b, "var %sTable = [...]%s{%sFact(%d), %sFact(%d)}\n", name, at, name, c, name, c/2)
	fmt.Fprintf(b, "\nfunc %s() %s {\n\treturn %sFact(%d) / %sFact(%d)\n}\n", name, at, name, c, name, r.next()%(c+1))
}
