package pantograph_test

import (
	"math"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// TestReadingsHandWorked checks the dial readings of the pump port plate's port at (8, 4) on the
// bench machine at 8:1, worked by hand from the physics of the two tables.
//
// The datum is (2.5, 2.5), so the port is 5.5 mm right of and 1.5 mm above the datum on the
// part. The copy table carries the template: its seat is at 8 × (5.5, 1.5) = (44, 12) template
// mm, and the copy table moves by that, +44 mm on copy X. Where the linkage's pivot is between
// stylus and cutter the copy is turned 180°, the template is turned 180° to make up for it, the
// seat is at (−44, −12) and the copy table moves −44 mm. The work table carries the stock under
// a cutter that stays put: to bring the port, 5.5 mm right of the datum on the stock, under the
// cutter, the table moves 5.5 mm left, −5.5 mm: 275 divisions of the 1 mm / 50 screw (0.02 mm),
// whichever way the template is turned for the linkage (derived).
func TestReadingsHandWorked(t *testing.T) {
	part, err := partfile.ReadFile("../samples/pump-port-plate.toml")
	if err != nil {
		t.Fatal(err)
	}
	bench, err := partfile.ReadMachineFile("../samples/machines/bench-pantograph.machine.toml")
	if err != nil {
		t.Fatal(err)
	}
	between := bench
	between.Pivot = pantograph.PivotBetween
	tests := []struct {
		name           string
		m              pantograph.Machine
		setup          pantograph.Setup
		seat           geom.Vec
		copyX, workDiv float64 // copy X move from the datum (mm), work X from the datum (divisions)
	}{
		{"pivot at the end", bench, pantograph.Setup{Ratio: 8, Cutter: 0.5}, geom.V(44, 12), 44, -275},
		{"pivot between, turned by default", between, pantograph.Setup{Ratio: 8, Cutter: 0.5}, geom.V(-44, -12), -44, -275},
		{"pivot between, --rotate 180", between,
			pantograph.Setup{Ratio: 8, Cutter: 0.5, Rotate: geom.Degrees(180), Rotated: true}, geom.V(-44, -12), -44, -275},
		// A turn beyond the linkage's turns the part on the stock: the port lies 5.5 mm left of
		// the datum and the work table moves +5.5 mm (derived).
		{"pivot at the end, --rotate 180", bench,
			pantograph.Setup{Ratio: 8, Cutter: 0.5, Rotate: geom.Degrees(180), Rotated: true}, geom.V(-44, -12), -44, 275},
		// A mirrored part (a die) lies mirrored on the stock too (derived).
		{"mirrored", bench, pantograph.Setup{Ratio: 8, Cutter: 0.5, Mirror: true}, geom.V(-44, 12), -44, 275},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			p, err := pantograph.PlanPart(part, tc.setup, &tc.m)
			if err != nil {
				t.Fatal(err)
			}
			s, err := pantograph.BuildSheet(p, tc.m, pantograph.SheetOptions{})
			if err != nil {
				t.Fatal(err)
			}
			datum, port := s.Rows[0].Where, portRow(t, s, tc.seat)
			dx := (port.CopyX.Count - datum.CopyX.Count) * 1 // copy X screw in mm
			if math.Abs(dx-tc.copyX) > 1e-9 {
				t.Errorf("copy X: %v mm from the datum reading, want %v", dx, tc.copyX)
			}
			div := s.Dials.WorkX.Division
			if got := (port.WorkX.Count - datum.WorkX.Count) / div; math.Abs(got-tc.workDiv) > 1e-6 {
				t.Errorf("work X: %v divisions from the datum reading, want %v", got, tc.workDiv)
			}
		})
	}
}

// portRow returns the position of the sheet row at template seat at.
func portRow(t *testing.T, s pantograph.Sheet, at geom.Vec) *pantograph.Position {
	t.Helper()
	for _, r := range s.Rows {
		if r.Where != nil && r.Where.Template.Dist(at) < 1e-9 {
			return r.Where
		}
	}
	t.Fatalf("no row at seat %v", at)
	return nil
}
