package ranges

import (
	"fmt"
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
