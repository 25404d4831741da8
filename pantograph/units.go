package pantograph

import (
	"math"
	"strconv"

	"panto/internal/numfmt"
)

// Length formats a length given in mm in these units for people: "1.6 mm", or "0.0625 in" for
// a part drawn in inches, so that an inch part's plan and sheet speak inches throughout. The
// zero Units is millimetres.
func (u Units) Length(mm float64) string { return u.Number(mm) + " " + u.Word() }

// Number formats a length given in mm as a bare number in these units (no unit word): mm to a
// micrometre, inches to a ten-thousandth, or to five places where that is exact, so that
// fractional sizes such as 1/32 in read 0.03125 rather than a rounded 0.0312.
func (u Units) Number(mm float64) string {
	if u != Inch {
		return numfmt.MM(mm)
	}
	in := mm / MMPerInch
	if five := numfmt.Trim(in, 5); math.Abs(parse(five)-in) < inchExact {
		return five
	}
	return numfmt.Inch(in)
}

// inchExact is how near five decimals must come to an inch value to print it with five: far
// under the 5e-6 in the fifth place stands for, and above the rounding of mm → in (derived).
const inchExact = 1e-9

// parse reads back a number numfmt wrote.
func parse(s string) float64 {
	v, _ := strconv.ParseFloat(s, 64)
	return v
}

// Word is the units' short name, "mm" or "in".
func (u Units) Word() string {
	if u == Inch {
		return "in"
	}
	return "mm"
}

// FromMM converts a length in mm into these units.
func (u Units) FromMM(mm float64) float64 {
	if u == Inch {
		return mm / MMPerInch
	}
	return mm
}

// Point formats a point given in mm in these units: "(1.5, 2)".
func (u Units) Point(x, y float64) string { return "(" + u.Number(x) + ", " + u.Number(y) + ")" }

// Area formats an area given in mm² in these units: "1.717 mm²" or "1.7424 in²"; an area too
// small for those decimals keeps two significant digits ("4.2e-05 mm²"), so a small uncut
// sliver is not reported as none.
func (u Units) Area(mm2 float64) string {
	v, word, decimals := mm2, " mm²", 3
	if u == Inch {
		v, word, decimals = mm2/(MMPerInch*MMPerInch), " in²", 4
	}
	if a := math.Abs(v); a > 0 && a < math.Pow(10, -float64(decimals)) {
		return strconv.FormatFloat(v, 'g', 2, 64) + word
	}
	return numfmt.Trim(v, decimals) + word
}
