package fixes

import (
	"fmt"
	"go/constant"
	"go/token"
	"go/types"
	"strings"
	"testing"
)

// TestDomainTestsAgree checks that the two tests written from one domain
// are each other's negation: on every integer grid point of the
// operands, go/types' constant evaluation finds the operands outside the
// domain (any outside test true) exactly where not every inside test
// holds. The float-count bounds of a helper are checked to lie within its
// operand domain.
func TestDomainTestsAgree(t *testing.T) {
	grid := []int64{-2, -1, 0, 1, 2, 3}
	eval := func(expr string) bool {
		tv, err := types.Eval(token.NewFileSet(), nil, token.NoPos, expr)
		if err != nil {
			t.Fatalf("%s: %v", expr, err)
		}
		return constant.BoolVal(tv.Value)
	}
	names := []string{"Multinomial"}
	for name := range domains {
		names = append(names, name)
	}
	for _, name := range names {
		n := 4
		d, ok := domainOf(name, n)
		if !ok {
			t.Fatalf("no domain for %s", name)
		}
		ops := make([]any, n)
		var walk func(i int)
		walk = func(i int) {
			if i < n {
				for _, v := range grid {
					ops[i] = fmt.Sprintf("(%d)", v)
					walk(i + 1)
				}
				return
			}
			var in, out, counts []string
			for _, b := range d.bounds {
				in = append(in, b.inside(ops))
				out = append(out, b.outside(ops))
			}
			for _, b := range d.counts {
				counts = append(counts, b.inside(ops))
			}
			inside := eval(strings.Join(in, " && "))
			if outside := eval(strings.Join(out, " || ")); inside == outside {
				t.Fatalf("%s at %v: inside %v (%s), outside %v (%s)", name, ops, inside, strings.Join(in, " && "), outside, strings.Join(out, " || "))
			}
			if len(counts) > 0 && eval(strings.Join(counts, " && ")) && !inside {
				t.Fatalf("%s at %v: the float counts' bounds hold outside the domain", name, ops)
			}
		}
		walk(0)
	}
}
