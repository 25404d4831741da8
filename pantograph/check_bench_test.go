package pantograph

import (
	"fmt"
	"testing"

	"panto/geom"
)

// BenchmarkCheckHoleGrid checks a plate with n × n drilled holes, to show how the pairwise
// checks grow with the number of holes.
func BenchmarkCheckHoleGrid(b *testing.B) {
	for _, n := range []int{5, 10, 20} {
		var at []geom.Vec
		for i := range n {
			for j := range n {
				at = append(at, geom.V(1+float64(i)*18/float64(n), 1+float64(j)*8/float64(n)))
			}
		}
		p := plate(holes("grid", 0.2, through, at...))
		b.Run(fmt.Sprintf("%dx%d", n, n), func(b *testing.B) {
			for b.Loop() {
				Summarize(p, DefaultOptions())
			}
		})
	}
}
