package drawing

import (
	_ "embed" // the fonts are embedded so drawings look the same on every machine

	"fmt"

	"github.com/tdewolff/canvas"

	"panto/geom"
)

//go:embed fonts/DejaVuSans.ttf
var sansRegular []byte

//go:embed fonts/DejaVuSans-Bold.ttf
var sansBold []byte

// Fonts are the faces drawings and sheets are lettered in.
type Fonts struct {
	family *canvas.FontFamily
}

// LoadFonts parses the embedded fonts. Each writer loads its own, so nothing is shared
// between goroutines.
func LoadFonts() (*Fonts, error) {
	fam := canvas.NewFontFamily("DejaVu Sans")
	if err := fam.LoadFont(sansRegular, 0, canvas.FontRegular); err != nil {
		return nil, fmt.Errorf("drawing: loading the regular font: %w", err)
	}
	if err := fam.LoadFont(sansBold, 0, canvas.FontBold); err != nil {
		return nil, fmt.Errorf("drawing: loading the bold font: %w", err)
	}
	// No ligatures: "fi" set as one glyph comes out of a PDF as "ﬁ", and a search for a
	// feature named "fixing screws" would not find it.
	fam.SetFeatures("-liga,-clig")
	return &Fonts{family: fam}, nil
}

// Face returns a black face of size points, bold when asked.
func (f *Fonts) Face(size float64, bold bool) *canvas.FontFace {
	style := canvas.FontRegular
	if bold {
		style = canvas.FontBold
	}
	return f.family.Face(size, canvas.Black, style)
}

// Width returns the width in mm of s set in a face of size points.
func (f *Fonts) Width(s string, size float64, bold bool) float64 {
	return f.Face(size, bold).TextWidth(s)
}

// ink returns the box the glyphs of s take, set in a face of size points with its baseline
// anchored at the origin as align says, in mm, +Y up.
func (f *Fonts) ink(s string, size float64, bold bool, align canvas.TextAlign) geom.Box {
	r := canvas.NewTextLine(f.Face(size, bold), s, align).OutlineBounds()
	return geom.Box{Min: geom.V(r.X0, r.Y0), Max: geom.V(r.X1, r.Y1)}
}
