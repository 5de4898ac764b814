package ranges

import (
	"go/ast"
	"go/constant"
	"go/types"
	"os"
	"testing"
)

// TestBruteForce runs the functions of corpus_test.go for every
// argument in [-30, 30] and checks soundness: each value a probe saw is
// inside the range computed for the probed expression, both when the
// parameter range is given as Entry and when nothing is known, for
// several MaxVisits settings (so through different widenings). The
// reference is the execution of the Go code itself.
func TestBruteForce(t *testing.T) {
	src, err := os.ReadFile("corpus_test.go")
	if err != nil {
		t.Fatal(err)
	}
	p := check(t, string(src))
	const lo, hi = -30, 30
	checked := map[int]int{}
	for name, run := range corpus {
		fd := p.fn(t, name)
		param := p.info.Defs[fd.Type.Params.List[0].Names[0]]
		calls := probeCalls(p, fd)
		for _, entry := range []map[string]Interval{nil, {"n": Span(lo, hi)}} {
			for _, visits := range []int{1, 3, 40} {
				opts := Options{MaxVisits: visits}
				if entry != nil {
					opts.Entry = map[types.Object]Interval{param: entry["n"]}
				}
				f := Analyze(p.info, fd, opts)
				clear(probes)
				for n := lo; n <= hi; n++ {
					run(n)
				}
				// Probes in functions doseBool calls are checked below with
				// those functions' own analysis.
				for id, call := range calls {
					got := f.Of(call.Args[1])
					for _, v := range probes[id] {
						checked[id]++
						if !got.Contains(int64(v)) {
							t.Errorf("%s probe %d: value %d not in computed %v (entry %v)", name, id, v, got, entry)
							break
						}
					}
					if testing.Verbose() && visits == 3 {
						t.Logf("%s probe %d: %v (entry %v)", name, id, got, entry)
					}
				}
			}
		}
	}
	// topDose has two parameters; analyse it with nothing known.
	fd := p.fn(t, "topDose")
	f := Analyze(p.info, fd, Options{})
	clear(probes)
	for n := lo; n <= hi; n++ {
		doseBool(n)
	}
	for id, call := range probeCalls(p, fd) {
		got := f.Of(call.Args[1])
		for _, v := range probes[id] {
			checked[id]++
			if !got.Contains(int64(v)) {
				t.Errorf("topDose probe %d: %d not in %v", id, v, got)
			}
		}
	}
	for id := 1; id <= 46; id++ {
		if checked[id] == 0 {
			t.Errorf("probe %d never ran: the corpus does not exercise it", id)
		}
	}
}

// probeCalls maps probe ids to their calls inside fd.
func probeCalls(p *program, fd *ast.FuncDecl) map[int]*ast.CallExpr {
	out := map[int]*ast.CallExpr{}
	ast.Inspect(fd, func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if !ok || len(call.Args) != 2 {
			return true
		}
		if id, ok := call.Fun.(*ast.Ident); !ok || id.Name != "probe" {
			return true
		}
		v := p.info.Types[call.Args[0]].Value
		if v == nil {
			return true
		}
		k, _ := constant.Int64Val(v)
		out[int(k)] = call
		return true
	})
	return out
}
