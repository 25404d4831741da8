package pantograph

import (
	"fmt"
	"strconv"
	"strings"

	"panto/geom"
)

// This file is panto's own lettering for the template plate: capitals, digits and a few signs
// drawn as strokes on a grid four units wide and six high, and turned into printable outlines
// by giving every stroke a round-ended width. Strokes keep the letters legible at a few
// millimetres, where a printer's nozzle cannot follow the curves of a book face.

// glyphStrokes holds each character's strokes: polylines separated by ";", points "x,y" on the
// 4 × 6 grid, y up. A single point is a dot.
func glyphStrokes(r rune) (string, bool) {
	s, ok := map[rune]string{
		'0': "1,0 0,1 0,5 1,6 3,6 4,5 4,1 3,0 1,0",
		'1': "1,5 2,6 2,0;1,0 3,0",
		'2': "0,5 1,6 3,6 4,5 4,4 0,0 4,0",
		'3': "0,6 4,6 2,3.5 3,3.5 4,2.5 4,1 3,0 1,0 0,1",
		'4': "3,0 3,6 0,2 4,2",
		'5': "4,6 0,6 0,3.5 3,3.5 4,2.5 4,1 3,0 0,0",
		'6': "4,6 2,6 0,4 0,1 1,0 3,0 4,1 4,2 3,3 0,3",
		'7': "0,6 4,6 1,0",
		'8': "1,3 0,4 0,5 1,6 3,6 4,5 4,4 3,3 1,3 0,2 0,1 1,0 3,0 4,1 4,2 3,3",
		'9': "0,0 2,0 4,2 4,5 3,6 1,6 0,5 0,4 1,3 4,3",
		'A': "0,0 0,4 2,6 4,4 4,0;0,2.5 4,2.5",
		'B': "0,0 0,6 3,6 4,5 4,4 3,3 0,3;3,3 4,2 4,1 3,0 0,0",
		'C': "4,5 3,6 1,6 0,5 0,1 1,0 3,0 4,1",
		'D': "0,0 0,6 2.5,6 4,4.5 4,1.5 2.5,0 0,0",
		'E': "4,6 0,6 0,0 4,0;0,3 3,3",
		'F': "4,6 0,6 0,0;0,3 3,3",
		'G': "4,5 3,6 1,6 0,5 0,1 1,0 3,0 4,1 4,3 2,3",
		'H': "0,0 0,6;4,0 4,6;0,3 4,3",
		'I': "1,6 3,6;2,6 2,0;1,0 3,0",
		'J': "4,6 4,1 3,0 1,0 0,1",
		'K': "0,0 0,6;4,6 0,2;1.5,3.5 4,0",
		'L': "0,6 0,0 4,0",
		'M': "0,0 0,6 2,3 4,6 4,0",
		'N': "0,0 0,6 4,0 4,6",
		'O': "1,0 0,1 0,5 1,6 3,6 4,5 4,1 3,0 1,0",
		'P': "0,0 0,6 3,6 4,5 4,4 3,3 0,3",
		'Q': "1,0 0,1 0,5 1,6 3,6 4,5 4,1 3,0 1,0;2.5,1.5 4,0",
		'R': "0,0 0,6 3,6 4,5 4,4 3,3 0,3;2,3 4,0",
		'S': "4,5 3,6 1,6 0,5 0,4 1,3 3,3 4,2 4,1 3,0 1,0 0,1",
		'T': "0,6 4,6;2,6 2,0",
		'U': "0,6 0,1 1,0 3,0 4,1 4,6",
		'V': "0,6 2,0 4,6",
		'W': "0,6 1,0 2,3 3,0 4,6",
		'X': "0,0 4,6;0,6 4,0",
		'Y': "0,6 2,3 4,6;2,3 2,0",
		'Z': "0,6 4,6 0,0 4,0",
		'-': "1,3 3,3",
		'+': "2,1 2,5;0,3 4,3",
		'=': "0,2 4,2;0,4 4,4",
		'.': "2,0",
		',': "2,0.5 1.5,-1",
		':': "2,1;2,4",
		'/': "0,0 4,6",
		'(': "3,6 1.5,4.5 1.5,1.5 3,0",
		')': "1,6 2.5,4.5 2.5,1.5 1,0",
		'#': "1,0 1,6;3,0 3,6;0,2 4,2;0,4 4,4",
		'Ø': "1,0 0,1 0,5 1,6 3,6 4,5 4,1 3,0 1,0;0,0 4,6",
		'?': "0,5 1,6 3,6 4,5 4,4 2,3 2,2;2,0",
		'_': "0,0 4,0",
	}[r]
	return s, ok
}

// Lettering proportions, in grid units of a sixth of the cap height: a stroke one unit wide
// keeps letters four units wide open, and six units from one letter to the next leaves a clear
// unit between strokes (common practice for stroke lettering, no source).
const (
	glyphAdvance = 6.0
	glyphWidth   = 4.0
	glyphHeight  = 6.0
	strokeUnits  = 1.0
)

// TextWidth returns how wide text set at cap height h is, from the left edge of the first
// stroke to the right edge of the last.
func TextWidth(text string, h float64) float64 {
	n := len([]rune(text))
	if n == 0 {
		return 0
	}
	u := h / glyphHeight
	return u * (glyphAdvance*float64(n-1) + glyphWidth + strokeUnits)
}

// TextOutlines returns text set at cap height h with the lower left corner of its strokes'
// box at at, as regions ready to print. Lower-case letters are set as capitals; characters
// the lettering lacks are set as "?".
func TextOutlines(text string, at geom.Vec, h float64) ([]geom.Region, error) {
	u := h / glyphHeight
	r := u * strokeUnits / 2
	origin := at.Add(geom.V(r, r))
	var caps []geom.Region
	for i, ch := range []rune(strings.ToUpper(text)) {
		strokes, ok := glyphStrokes(ch)
		if ch == ' ' {
			continue
		}
		if !ok {
			strokes, _ = glyphStrokes('?')
		}
		base := origin.Add(geom.V(u*glyphAdvance*float64(i), 0))
		for _, line := range strings.Split(strokes, ";") {
			pts, err := parseStroke(line)
			if err != nil {
				return nil, fmt.Errorf("lettering %q: %w", ch, err)
			}
			for k := range pts {
				pts[k] = base.Add(pts[k].Mul(u))
			}
			if len(pts) == 1 {
				caps = append(caps, geom.NewRegion(geom.Circle(pts[0], r)))
			}
			for k := 1; k < len(pts); k++ {
				caps = append(caps, geom.NewRegion(geom.Capsule(pts[k-1], pts[k], r)))
			}
		}
	}
	if len(caps) == 0 {
		return nil, nil
	}
	return geom.Union(caps...), nil
}

// parseStroke reads "x,y x,y ..." into points.
func parseStroke(s string) ([]geom.Vec, error) {
	var pts []geom.Vec
	for _, f := range strings.Fields(s) {
		xy := strings.Split(f, ",")
		if len(xy) != 2 {
			return nil, fmt.Errorf("bad point %q", f)
		}
		x, err1 := strconv.ParseFloat(xy[0], 64)
		y, err2 := strconv.ParseFloat(xy[1], 64)
		if err1 != nil || err2 != nil {
			return nil, fmt.Errorf("bad point %q", f)
		}
		pts = append(pts, geom.V(x, y))
	}
	return pts, nil
}
