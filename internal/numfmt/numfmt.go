// Package numfmt is panto's one place for writing numbers: for people (messages, reports,
// sheets, drawings), for JSON and for the files other programs read (part files, DXF). Every
// panto package that prints a number calls it, so the same length reads the same everywhere.
//
// Rules:
//   - For people a length in mm has three decimals, a micrometre, as fine as a bench
//     pantograph's dials read at the part; inches have four, a ten-thousandth, a tenth of the
//     finest common inch division. Trailing zeros and a trailing point are dropped.
//   - Nothing ever reads "-0": a value that rounds to zero at the decimals shown is 0.
//   - JSON keeps a nanometre (1e-6 mm), far below anything cut and enough to hide float noise
//     such as 13.999999999999998.
//   - Files keep a billionth of their unit: finer than any machine, coarse enough that float
//     noise (31.000000000000004) does not reach the file, and read back within 1e-9.
package numfmt

import (
	"math"
	"strconv"
	"strings"
)

// MM formats a length in mm for people: to the micrometre, trailing zeros dropped ("2.5",
// "0.001", "12").
func MM(v float64) string { return Trim(v, 3) }

// Inch formats a length in inches for people: to a ten-thousandth, trailing zeros dropped.
func Inch(v float64) string { return Trim(v, 4) }

// Trim formats v with at most decimals decimals, trailing zeros and point dropped, never "-0".
func Trim(v float64, decimals int) string {
	s := Fixed(v, decimals)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return s
}

// Fixed formats v with exactly decimals decimals ("0.500"), never "-0.000".
func Fixed(v float64, decimals int) string {
	if math.Abs(v) < 0.5*math.Pow(10, -float64(decimals)) {
		v = 0
	}
	return strconv.FormatFloat(v, 'f', decimals, 64)
}

// Point formats a point for people: "(x, y)" in mm.
func Point(x, y float64) string { return "(" + MM(x) + ", " + MM(y) + ")" }

// jsonScale is what JSON numbers are rounded to: a nanometre, in mm.
const jsonScale = 1e6

// JSON rounds a length (mm, or any quantity of like size) to a nanometre for JSON output,
// never -0.
func JSON(v float64) float64 { return roundTo(v, jsonScale) }

// fileScale is what numbers in written files are rounded to: a billionth of their unit.
const fileScale = 1e9

// File formats v for a file another program reads: rounded to a billionth, as short as
// round-trips ("31", "0.4", "12.345678901").
func File(v float64) string { return strconv.FormatFloat(roundTo(v, fileScale), 'f', -1, 64) }

// roundTo rounds v to 1/scale, never returning -0. Values too large to scale are returned as
// they are (they are whole numbers already at that size).
func roundTo(v, scale float64) float64 {
	r := math.Round(v*scale) / scale
	if math.IsInf(r, 0) && !math.IsInf(v, 0) {
		r = v
	}
	if r == 0 {
		return 0
	}
	return r
}
