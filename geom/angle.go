package geom

import "math"

// Angle is an angle in radians. It exists so that callers who think in degrees say so.
type Angle float64

// Degrees returns an Angle from a value in degrees.
func Degrees(d float64) Angle { return Angle(d * math.Pi / 180) }

// Degrees returns the angle in degrees.
func (a Angle) Degrees() float64 { return float64(a) * 180 / math.Pi }

// Radians returns the angle in radians.
func (a Angle) Radians() float64 { return float64(a) }

// normAngle returns a in [0, 2π).
func normAngle(a float64) float64 {
	a = math.Mod(a, 2*math.Pi)
	if a < 0 {
		a += 2 * math.Pi
	}
	return a
}
