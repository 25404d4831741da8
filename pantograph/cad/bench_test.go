package cad

import (
	"math/rand"
	"strings"
	"testing"
)

// BenchmarkReadDXF reads a plate with 2 000 loose arcs and lines in random order.
func BenchmarkReadDXF(b *testing.B) {
	rng := rand.New(rand.NewSource(1))
	var ents []string
	for k := 0; k < 100; k++ {
		for _, s := range randomOutline(rng) {
			ents = append(ents, dxfEntityOf(s))
		}
	}
	src := []byte(dxfDoc(4, "", ents...))
	b.SetBytes(int64(len(src)))
	b.ResetTimer()
	for range b.N {
		if _, err := ReadDXF("b.dxf", src, Options{}); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkReadSVG reads 100 outlines of path data with arcs.
func BenchmarkReadSVG(b *testing.B) {
	rng := rand.New(rand.NewSource(1))
	var body strings.Builder
	for k := 0; k < 100; k++ {
		body.WriteString(`<path d="` + svgPath(rng, randomOutline(rng)) + `"/>` + "\n")
	}
	src := []byte(svgDoc(`width="100mm" height="100mm" viewBox="0 0 100 100"`, body.String()))
	b.SetBytes(int64(len(src)))
	b.ResetTimer()
	for range b.N {
		if _, err := ReadSVG("b.svg", src, Options{}); err != nil {
			b.Fatal(err)
		}
	}
}
