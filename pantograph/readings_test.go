package pantograph_test

import (
	"fmt"
	"math"
	"path/filepath"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// TestReadingsRecomputed plans every sample on every sample machine (and without one), mirrored
// and turned as a machinist might, and recomputes each drilled hole's dial readings straight
// from the part and machine files by the rules of the method, not from the plan:
//
//   - the template seat is T = R · turn(θ) · mirror · (P − datum), θ the template's turn
//     (180° by default where the machine's pivot lies between stylus and cutter);
//   - the copy table moves by T, the linkage taking the cutter there, so the copy dials count
//     T in their screw's units (negated where counting up moves the table the other way);
//   - the part lies on the stock as S = turn(−copy turn) · T / R, and the work table moves by
//     −S to bring it under the cutter that stays put;
//   - every reading is the move from the datum reading, and shows whole turns and divisions of
//     the count with the rest as the remainder.
//
// It also checks that every pass of every row is set on a whole division of the depth dial
// (bar a blind depth between divisions, kept for the last pass) and goes no deeper than the
// step-down rule: half the cutter's diameter in brass and aluminium, halved below 1 mm, and
// 0.05 mm for an engraver (rules of thumb, from memory, as the sheet says).
func TestReadingsRecomputed(t *testing.T) {
	machines := []string{"", "bench-pantograph", "inch-engraver"}
	for _, sample := range []string{"pump-port-plate", "clock-bridge", "calibration-coupon"} {
		part, err := partfile.ReadFile(filepath.Join("..", "samples", sample+".toml"))
		if err != nil {
			t.Fatal(err)
		}
		for _, mname := range machines {
			var m *pantograph.Machine
			if mname != "" {
				mc, err := partfile.ReadMachineFile(filepath.Join("..", "samples", "machines", mname+".machine.toml"))
				if err != nil {
					t.Fatal(err)
				}
				m = &mc
			}
			for _, ratio := range []float64{4, 5, 8} {
				for _, layout := range []pantograph.Setup{{}, {Mirror: true}, {Rotate: geom.Degrees(90), Rotated: true}} {
					s := layout
					s.Ratio, s.Cutter = ratio, 0.3
					name := fmt.Sprintf("%s/%s/%g/mirror %v turn %v", sample, mname, ratio, s.Mirror, s.Rotate.Degrees())
					t.Run(name, func(t *testing.T) { checkReadings(t, part, m, s) })
				}
			}
		}
	}
}

// checkReadings plans part on m with s and checks the sheet by the rules above.
func checkReadings(t *testing.T, part pantograph.Part, m *pantograph.Machine, s pantograph.Setup) {
	p, err := pantograph.PlanPart(part, s, m)
	if err != nil {
		t.Fatal(err)
	}
	if !p.Done() {
		t.Skip("the machine cannot do this job (ratio or copy-table travel)")
	}
	var mc pantograph.Machine
	turn, copyTurn := s.Rotate, geom.Angle(0)
	if m != nil {
		mc = *m
		if m.Pivot == pantograph.PivotBetween {
			copyTurn = geom.Degrees(180)
			if !s.Rotated {
				turn = copyTurn
			}
		}
	}
	sheet, err := pantograph.BuildSheet(p, mc, pantograph.SheetOptions{})
	if err != nil {
		t.Fatal(err)
	}
	datum := sheet.Rows[0].Where
	holes := 0
	for _, f := range part.Features {
		for _, c := range f.Centers {
			v := c.Sub(part.Datum)
			if s.Mirror {
				v.X = -v.X
			}
			tpl := geom.Rotate(turn).Apply(v).Mul(s.Ratio)
			row := rowAt(sheet, tpl)
			if row == nil {
				continue // the hole is milled, not drilled
			}
			holes++
			stock := geom.Rotate(-copyTurn).Apply(tpl.Mul(1 / s.Ratio))
			checkAxis(t, "copy X", mc.Dials.CopyX, datum.CopyX, row.CopyX, tpl.X, s.Ratio)
			checkAxis(t, "copy Y", mc.Dials.CopyY, datum.CopyY, row.CopyY, tpl.Y, s.Ratio)
			checkAxis(t, "work X", mc.Dials.WorkX, datum.WorkX, row.WorkX, -stock.X, 1)
			checkAxis(t, "work Y", mc.Dials.WorkY, datum.WorkY, row.WorkY, -stock.Y, 1)
		}
	}
	// Every other position (the start of a traced or engraved feature, a hole milled for want
	// of a drill) follows the same rules from its template point.
	for _, r := range sheet.Rows {
		if r.Where == nil {
			continue
		}
		tpl := r.Where.Template
		stock := geom.Rotate(-copyTurn).Apply(tpl.Mul(1 / s.Ratio))
		checkAxis(t, "copy X", mc.Dials.CopyX, datum.CopyX, r.Where.CopyX, tpl.X, s.Ratio)
		checkAxis(t, "work X", mc.Dials.WorkX, datum.WorkX, r.Where.WorkX, -stock.X, 1)
		checkAxis(t, "work Y", mc.Dials.WorkY, datum.WorkY, r.Where.WorkY, -stock.Y, 1)
	}
	t.Logf("%d drilled holes recomputed from the part file", holes)
	checkPasses(t, sheet, mc.Dials.Depth)
}

// rowAt returns the position of the sheet row at template point at, or nil.
func rowAt(s pantograph.Sheet, at geom.Vec) *pantograph.Position {
	for _, r := range s.Rows {
		if r.What == pantograph.StepDrill && r.Where.Template.Dist(at) < 1e-9 {
			return r.Where
		}
	}
	return nil
}

// checkAxis checks one reading: the count from the datum is the move in the screw's units, its
// sign turned on a reversed dial, and the turns, divisions and remainder are that count's.
func checkAxis(t *testing.T, name string, d pantograph.Dial, datum, got pantograph.Reading, moveMM, scale float64) {
	t.Helper()
	if d.Pitch == 0 {
		return // no dial: positions in mm only
	}
	unit := 1.0
	if d.Units == pantograph.Inch {
		unit = 25.4
	}
	want := moveMM / unit
	if d.Reversed {
		want = -want
	}
	if c := got.Count - datum.Count; math.Abs(c-want) > 1e-9 {
		t.Errorf("%s: the reading is %v from the datum's, want a move of %v", name, c, want)
	}
	div := d.Pitch / float64(d.Divisions)
	n := got.Count / div
	whole := math.Floor(n + 1e-6)
	if got.Turns*d.Divisions+got.Divisions != int(whole) || math.Abs(got.Remainder-math.Max(0, n-whole)) > 1e-6 {
		t.Errorf("%s: %v for a count of %v (%v divisions)", name, got, got.Count, n)
	}
	if atPart := got.Remainder * div * unit / scale; math.Abs(got.AtPart-atPart) > 1e-9 {
		t.Errorf("%s: the remainder is worth %v at the part, want %v", name, got.AtPart, atPart)
	}
}

// checkPasses checks every row's passes against the dial and the step-down rule.
func checkPasses(t *testing.T, s pantograph.Sheet, depth pantograph.Dial) {
	t.Helper()
	q := 0.0
	if depth.Pitch > 0 {
		q = depth.Pitch / float64(depth.Divisions)
		if depth.Units == pantograph.Inch {
			q *= 25.4
		}
	}
	for _, r := range s.Rows {
		if r.What != pantograph.StepMill && r.What != pantograph.StepEngrave {
			continue
		}
		rule := 0.05 // an engraver (rule of thumb)
		if r.What == pantograph.StepMill {
			rule = 0.5 * 0.3 / 2 // brass or aluminium: 0.5 × D, halved for the Ø0.3 cutter
		}
		prev := 0.0
		for k, p := range r.Passes {
			if p.Depth-prev > rule+1e-9 {
				t.Errorf("step %d pass %d goes %v deeper, more than the rule's %v", r.Step, k+1, p.Depth-prev, rule)
			}
			last := k == len(r.Passes)-1
			if q > 0 && !(last && !r.Through) && math.Abs(p.Depth/q-math.Round(p.Depth/q)) > 1e-6 {
				t.Errorf("step %d pass %d at %v is between divisions of %v", r.Step, k+1, p.Depth, q)
			}
			prev = p.Depth
		}
		if len(r.Passes) > 0 && math.Abs(prev-r.Depth) > 1e-12 {
			t.Errorf("step %d: the last pass is at %v, not the depth %v", r.Step, prev, r.Depth)
		}
	}
}
