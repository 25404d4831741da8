package drawing

import (
	"bytes"
	"testing"

	"panto/export/internal/pdffont"
	"panto/geom"
	"panto/pantograph"
)

// TestPDFDeterministic encodes each PDF twice: the embedded fonts must be dated as created
// (not from the clock) with valid checksums and offsets, and the two runs byte-equal. The
// date check is what fails if the fonts still carry the clock, whichever second the runs
// fall in.
func TestPDFDeterministic(t *testing.T) {
	part := pantograph.Part{Name: "test plate", Profile: pantograph.Feature{Kind: pantograph.KindProfile,
		Region: geom.NewRegion(geom.Polygon(geom.V(0, 0), geom.V(15, 0), geom.V(15, 5), geom.V(0, 5)))}}
	for _, tc := range []struct {
		name string
		enc  func(*bytes.Buffer) error
	}{
		{"template", func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(150, 50), A4()) }},
		{"tiled template", func(b *bytes.Buffer) error { return EncodeTemplatePDF(b, seatPlan(600, 400), Letter()) }},
		{"uncompressed template", func(b *bytes.Buffer) error { return encodeTemplatePDF(b, seatPlan(150, 50), A4(), false) }},
		{"part", func(b *bytes.Buffer) error { return EncodePartPDF(b, part, seatPlan(150, 50), A4()) }},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var a, b bytes.Buffer
			if err := tc.enc(&a); err != nil {
				t.Fatal(err)
			}
			if err := tc.enc(&b); err != nil {
				t.Fatal(err)
			}
			if err := pdffont.Check(a.Bytes()); err != nil {
				t.Error(err)
			}
			if !bytes.Equal(a.Bytes(), b.Bytes()) {
				t.Errorf("two encodings differ: got %d and %d bytes, want equal", a.Len(), b.Len())
			}
		})
	}
}
