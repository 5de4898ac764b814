package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"go/types"
	"io"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// boundsLimit is the JSON form of a thresholds.Limit: the largest
// argument that fits with its exact value in decimal, and the first that
// does not. Both are absent when no argument below 2^62 overflows.
type boundsLimit struct {
	LastGood      *int64 `json:"lastGood,omitempty"`
	LastGoodValue string `json:"lastGoodValue,omitempty"`
	FirstBad      *int64 `json:"firstBad,omitempty"`
}

// boundsRow is the JSON form of a thresholds.Row.
type boundsRow struct {
	Type         string      `json:"type"`
	Bits         int         `json:"bits"`
	Factorial    boundsLimit `json:"factorial"`    // n!
	CentralRatio boundsLimit `json:"centralRatio"` // C(n, n/2) as n!/((n/2)!(n-n/2)!)
	CentralLoop  boundsLimit `json:"centralLoop"`  // C(n, n/2) by b = b*(n-k+i)/i
	CentralTrue  boundsLimit `json:"centralTrue"`  // the value C(n, n/2) itself
	// GammaFirstBad is the smallest x at which math.Gamma-like
	// evaluation in the type gives +Inf; floats only.
	GammaFirstBad *float64 `json:"gammaFirstBad,omitempty"`
}

func toBoundsLimit(l thresholds.Limit) boundsLimit {
	if l.None() {
		return boundsLimit{}
	}
	first, last := l.FirstBad, l.FirstBad-1
	b := boundsLimit{FirstBad: &first, LastGood: &last}
	if l.LastGood != nil {
		b.LastGoodValue = l.LastGood.String()
	}
	return b
}

func toBoundsRow(r thresholds.Row) boundsRow {
	out := boundsRow{
		Type:         r.Type.Name,
		Bits:         r.Type.Bits,
		Factorial:    toBoundsLimit(r.Factorial),
		CentralRatio: toBoundsLimit(r.CentralRatio),
		CentralLoop:  toBoundsLimit(r.CentralLoop),
		CentralTrue:  toBoundsLimit(r.CentralTrue),
	}
	if r.Type.Float {
		g := r.Gamma
		out.GammaFirstBad = &g
	}
	return out
}

// runBounds implements "overfact bounds [-json] [-arch ARCH] [TYPE...]".
func runBounds(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("overfact bounds", flag.ContinueOnError)
	fs.SetOutput(stderr)
	asJSON := fs.Bool("json", false, "print the table as JSON")
	arch := fs.String("arch", "amd64", "target architecture (GOARCH) deciding the size of int, uint and uintptr")
	fs.Usage = func() {
		fmt.Fprintf(stderr, "Usage: overfact bounds [-json] [-arch ARCH] [TYPE...]\n\n"+
			"Prints, for each fixed-size numeric type, where factorials, central\n"+
			"binomial coefficients and Gamma stop fitting it.\n\n")
		fs.PrintDefaults()
	}
	names, code, ok := parseFlags(fs, args, stderr)
	if !ok {
		return code
	}
	sizes := types.SizesFor("gc", *arch)
	if sizes == nil {
		fmt.Fprintf(stderr, "overfact bounds: unknown architecture %q; the gc compiler's are %s\n", *arch, strings.Join(knownArchs(), " "))
		return 2
	}
	var nums []thresholds.Num
	for _, name := range names {
		n, ok := thresholds.Named(name, sizes)
		if !ok {
			var valid []string
			for _, n := range thresholds.All(sizes) {
				valid = append(valid, n.Name)
			}
			fmt.Fprintf(stderr, "overfact bounds: %q is not a fixed-size numeric type; the types are %s\n", name, strings.Join(valid, " "))
			return 2
		}
		nums = append(nums, n)
	}
	if len(nums) == 0 {
		nums = thresholds.All(sizes)
	}
	rows := thresholds.Table(sizes, nums...)
	if *asJSON {
		return writeBoundsJSON(stdout, stderr, rows)
	}
	return writeBoundsText(stdout, rows)
}

// knownArchs returns the architectures for which go/types knows the gc
// compiler's sizes, out of the GOARCH values of "go tool dist list"
// (from memory; one go/types does not know is left out).
func knownArchs() []string {
	var out []string
	for _, a := range []string{"386", "amd64", "arm", "arm64", "loong64", "mips", "mipsle", "mips64", "mips64le", "ppc64", "ppc64le", "riscv64", "s390x", "sparc64", "wasm"} {
		if types.SizesFor("gc", a) != nil {
			out = append(out, a)
		}
	}
	return out
}

func writeBoundsJSON(stdout, stderr io.Writer, rows []thresholds.Row) int {
	out := make([]boundsRow, len(rows))
	for i, r := range rows {
		out[i] = toBoundsRow(r)
	}
	enc := json.NewEncoder(stdout)
	enc.SetIndent("", "  ")
	if err := enc.Encode(out); err != nil {
		fmt.Fprintf(stderr, "overfact bounds: %v\n", err)
		return 1
	}
	return 0
}

func writeBoundsText(stdout io.Writer, rows []thresholds.Row) int {
	tw := tabwriter.NewWriter(stdout, 0, 4, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintln(tw, "type\tn! fits to\tlargest n!\tn! breaks at\tC(n,n/2) ratio breaks at\tloop breaks at\tC(n,n/2) breaks at\tΓ(x) is +Inf from\t")
	for _, r := range rows {
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t\n",
			r.Type.Name,
			lastGood(r.Factorial), r.Factorial.LastGoodApprox(), firstBad(r.Factorial),
			firstBad(r.CentralRatio), firstBad(r.CentralLoop), firstBad(r.CentralTrue),
			gammaCell(r))
	}
	if err := tw.Flush(); err != nil {
		return 1
	}
	return 0
}

func firstBad(l thresholds.Limit) string {
	if l.None() {
		return "none"
	}
	return "n = " + strconv.FormatInt(l.FirstBad, 10)
}

func lastGood(l thresholds.Limit) string {
	if l.None() {
		return "all"
	}
	return "n = " + strconv.FormatInt(l.FirstBad-1, 10)
}

func gammaCell(r thresholds.Row) string {
	if !r.Type.Float {
		return "-"
	}
	return "x = " + strconv.FormatFloat(r.Gamma, 'g', -1, 64)
}
