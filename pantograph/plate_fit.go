package pantograph

import (
	"math"

	"panto/geom"
)

// This file says how a template plate prints on the machine file's printer: in one piece (turned
// a quarter turn when that helps) or in how many pieces. ratios, plan and make all ask it, so
// they agree.

// bedMargin is the room kept clear round a piece on the printer's bed, mm: the skirt a slicer
// lays round the print and the bed's unusable edge (common practice, no source).
const bedMargin = 5.0

// PrintFit says how a plate prints on a printer's bed.
type PrintFit struct {
	Size    geom.Vec // the plate as printed, mm: its footprint with the printer's scale applied
	Bed     Travel   // the bed, mm; zero when the machine file states none
	FitsBed bool     // it prints in one piece (true when no bed is stated)
	Turned  bool     // a quarter turn on the bed is what makes it fit
	Tiles   int      // pieces it prints in: 1 when it fits the bed
}

// FitPlate says how plate pl prints on machine m's printer bed (m may be nil: no bed stated,
// so it fits). A plate too large for the bed is counted in pieces that each fit it less the
// margin, on a grid, taken the way round that needs fewer.
func FitPlate(pl Plate, m *Machine) PrintFit {
	f := PrintFit{Size: geom.V(pl.Size.X*pl.ScaleX, pl.Size.Y*pl.ScaleY), FitsBed: true, Tiles: 1}
	if m == nil || m.Printer.Bed.X <= 0 || m.Printer.Bed.Y <= 0 {
		return f
	}
	f.Bed = m.Printer.Bed
	use := geom.V(f.Bed.X-2*bedMargin, f.Bed.Y-2*bedMargin)
	upright := pieces(f.Size, use)
	turned := pieces(geom.V(f.Size.Y, f.Size.X), use)
	f.Tiles, f.Turned = upright, false
	if turned < upright {
		f.Tiles, f.Turned = turned, true
	}
	f.FitsBed = f.Tiles == 1
	return f
}

// pieces returns how many pieces of at most use a plate of size needs on a grid.
func pieces(size, use geom.Vec) int {
	if use.X <= 0 || use.Y <= 0 {
		return math.MaxInt32
	}
	nx := math.Ceil(size.X/use.X - plateFitTol)
	ny := math.Ceil(size.Y/use.Y - plateFitTol)
	return int(math.Max(1, nx) * math.Max(1, ny))
}
