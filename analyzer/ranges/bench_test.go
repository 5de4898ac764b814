package ranges

import (
	"fmt"
	"go/ast"
	"go/types"
	"testing"
)

// BenchmarkAnalyzeHuge measures Analyze on generated functions of
// growing size; ns/op divided by the line count should stay flat if the
// walk is linear.
func BenchmarkAnalyzeHuge(b *testing.B) {
	for _, lines := range []int{5000, 20000, 80000} {
		src, _ := genHuge(lines)
		p := check(b, src)
		fd := p.fn(b, "plan")
		b.Run(fmt.Sprintf("lines=%d", lines), func(b *testing.B) {
			for b.Loop() {
				Analyze(p.info, fd, Options{})
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(lines), "ns/line")
		})
	}
}

// BenchmarkStdlib analyses every function of a few standard packages
// and reports the cost per AST node next to a plain ast.Inspect.
func BenchmarkStdlib(b *testing.B) {
	var funcs []*ast.FuncDecl
	var infos []*types.Info
	nodes := 0
	for _, path := range corpusPackages {
		_, files, info := loadStd(b, path)
		for _, f := range files {
			for _, d := range f.Decls {
				if fd, ok := d.(*ast.FuncDecl); ok && fd.Body != nil {
					funcs = append(funcs, fd)
					infos = append(infos, info)
					ast.Inspect(fd, func(ast.Node) bool { nodes++; return true })
				}
			}
		}
	}
	for _, visits := range []int{1, 3, 20000} {
		b.Run(fmt.Sprintf("analyze/visits=%d", visits), func(b *testing.B) {
			for b.Loop() {
				for i, fd := range funcs {
					Analyze(infos[i], fd, Options{MaxVisits: visits})
				}
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(nodes), "ns/node")
		})
	}
	b.Run("inspect", func(b *testing.B) {
		for b.Loop() {
			for _, fd := range funcs {
				ast.Inspect(fd, func(ast.Node) bool { return true })
			}
		}
		b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(nodes), "ns/node")
	})
}
