//go:build reference

package geom

import (
	"fmt"
	"math/rand"
	"testing"
)

// TestReferencePrefilteredOffset checks the offsets of dense, jagged outlines, where the
// prefilter removes nearly all of every raw curve, against GEOS's buffer: the inputs the
// prefilter is for, at sizes too large to compare with the unfiltered offset.
func TestReferencePrefilteredOffset(t *testing.T) {
	// 20k vertices is left out: GEOS takes seconds on it, where both sizes here take under one.
	for _, n := range []int{2_000, 100_000} {
		for _, d := range []float64{2, 0.5, -0.5, -2} {
			t.Run(fmt.Sprintf("n=%d/d=%g", n, d), func(t *testing.T) {
				seed := int64(n)
				r := jaggedRegion(rand.New(rand.NewSource(seed)), n, 2)
				checkOffsetAgainstGEOS(t, seed, r, d, r.Offset(d))
			})
		}
	}
	r := benchJagged(100_000)
	for _, d := range []float64{0.5, -0.5} {
		t.Run(fmt.Sprintf("bench star/d=%g", d), func(t *testing.T) {
			checkOffsetAgainstGEOS(t, 100_000, r, d, r.Offset(d))
		})
	}
}
