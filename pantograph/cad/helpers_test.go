package cad

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"panto/pantograph"
)

// ent writes one DXF entity: its kind, then code/value pairs.
func ent(kind string, pairs ...any) string {
	var b strings.Builder
	fmt.Fprintf(&b, "0\n%s\n", kind)
	for i := 0; i+1 < len(pairs); i += 2 {
		fmt.Fprintf(&b, "%v\n%v\n", pairs[i], pairs[i+1])
	}
	return b.String()
}

// dxfDoc writes a whole DXF: a header with $INSUNITS (none when insunits < 0), optional
// blocks, and the entities.
func dxfDoc(insunits int, blocks string, entities ...string) string {
	var b strings.Builder
	b.WriteString("0\nSECTION\n2\nHEADER\n")
	if insunits >= 0 {
		fmt.Fprintf(&b, "9\n$INSUNITS\n70\n%d\n", insunits)
	}
	b.WriteString("0\nENDSEC\n")
	if blocks != "" {
		b.WriteString("0\nSECTION\n2\nBLOCKS\n" + blocks + "0\nENDSEC\n")
	}
	b.WriteString("0\nSECTION\n2\nENTITIES\n" + strings.Join(entities, "") + "0\nENDSEC\n0\nEOF\n")
	return b.String()
}

// square returns four LINE entities around the square of side s with lower left (x, y).
func square(layer string, x, y, s float64) []string {
	p := [][2]float64{{x, y}, {x + s, y}, {x + s, y + s}, {x, y + s}}
	var out []string
	for i := range p {
		q := p[(i+1)%4]
		out = append(out, ent("LINE", 8, layer, 10, p[i][0], 20, p[i][1], 11, q[0], 21, q[1]))
	}
	return out
}

func approx(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.IsNaN(got) || math.Abs(got-want) > tol {
		t.Errorf("%s: got %.9g, want %.9g (±%g)", what, got, want, tol)
	}
}

// holeFeatures returns the holes features of p.
func holeFeatures(p pantograph.Part) []pantograph.Feature {
	var out []pantograph.Feature
	for _, f := range p.Features {
		if f.Kind == pantograph.KindHoles {
			out = append(out, f)
		}
	}
	return out
}

// kinds counts p's features by kind.
func kinds(p pantograph.Part) map[pantograph.Kind]int {
	m := map[pantograph.Kind]int{}
	for _, f := range p.Features {
		m[f.Kind]++
	}
	return m
}
