package partfile

import (
	"math"
	"testing"

	"panto/pantograph"
)

// issueExample is the part file shape every reader of panto must accept, word for word.
const issueExample = `name = "pump port plate"
units = "mm"                  # "mm" or "in"; inches converted to mm on reading
datum = [0, 0]                # part-frame point the dials are zeroed on; default [0, 0]
[stock]
material = "brass"
thickness = 1.2
[profile]                     # the outside edge; one of points | circle | rect
points = [[0,0], [14,0], [14,8,1.5], [0,8]]   # [x, y] or [x, y, corner radius]
[[cutout]]                    # through opening; shape keys as profile, or slot
name = "window"
circle = { center = [7,4], diameter = 3 }
[[pocket]]                    # blind recess
name = "seat"
rect = { min = [2,2], size = [3,2], corner = 0.3 }
depth = 0.4
[[holes]]                     # drilled holes of one size
name = "ports"
diameter = 0.4
depth = "through"             # or a number
at = [[2,2], [12,2]]
[[slot]]                      # straight slot: centreline and width
name = "adjuster"
from = [3,4]
to = [6,4]
width = 0.8
depth = "through"
[[groove]]                    # engraved line as wide as the cutter
name = "index mark"
points = [[7,0.5], [7,1.5]]
depth = 0.05
`

func TestReadIssueExample(t *testing.T) {
	p := read(t, issueExample)
	if len(p.Features) != 5 {
		t.Fatalf("got %d features, want 5", len(p.Features))
	}
	// The example is not self-consistent, and the checks say so: the slot runs into the window
	// (derived: its tip (6.4, 4) is 0.6 from the window's centre, 1.5 − 0.6 = 0.9 inside), and
	// the port at (2, 2) sits on the seat's corner.
	ps := pantograph.Check(p, pantograph.DefaultOptions())
	var slotWindow bool
	for _, pr := range ps {
		if pr.Severity == pantograph.Error && pr.Label == `[[slot]] "adjuster"` && math.Abs(pr.Amount-0.9) < 1e-6 {
			slotWindow = true
		}
	}
	if !slotWindow {
		t.Errorf("got %v, want the slot breaking 0.9 mm into the window", ps)
	}
}

// TestSampleAreas checks the area of the part region of two samples, worked out by hand.
func TestSampleAreas(t *testing.T) {
	tests := []struct {
		file string
		want float64
	}{
		// derived: bar 27 × 8, two half-disc feet r4 (16π), above the bar an 18 × 5 block less
		// two quarter discs r5 (12.5π) plus the boss half-disc r4 (8π); less pivots 2·π·0.3²,
		// screws 2·π·0.6², steady pin π·0.4², window 6 × 3 less (4 − π)·1²
		{"../../samples/clock-bridge.toml",
			306 + 11.5*math.Pi - (2*0.09+2*0.36+0.16)*math.Pi - (18 - (4 - math.Pi))},
	}
	for _, tc := range tests {
		t.Run(tc.file, func(t *testing.T) {
			p, err := ReadFile(tc.file)
			if err != nil {
				t.Fatal(err)
			}
			if got := pantograph.Summarize(p, pantograph.DefaultOptions()).Area; math.Abs(got-tc.want) > 1e-9 {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}
