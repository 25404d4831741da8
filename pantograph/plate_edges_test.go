package pantograph_test

import (
	"fmt"
	"math"
	"path/filepath"
	"strings"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// The rules of the plate, re-stated here so the test derives what the stylus must find from
// the plan alone, not from the plate's own areas.
const (
	edgeMinWall       = 3.0 // a traced edge is one stylus diameter high, never under 3 mm
	edgeBoreClearance = 0.1 // a bore seat is the stylus plus 0.1 mm and the printer's hole growth
	edgeGroove        = 0.2 // a channel is the stylus (or groove) plus 0.2 mm wide
	edgeConeMin       = 2.0 // a cone's rim is R × the drill, kept within 2..8 mm; 90° included
	edgeConeMax       = 8.0
	edgeSeatFloor     = 1.0 // a bore seat leaves at least 1 mm of plate under it
	// edgeStep is how far, in mm, from the stylus's side the plate's height is read, and how
	// far inside an edge's height range it is cut: well over the chord tolerance (at most
	// 0.01 mm), well under the gap the plate keeps between areas (1 mm).
	edgeStep = 0.05
	// edgeSlack allows for the rounding of offsets and booleans (snapTol 1e-7 mm in geom) on
	// top of the chord tolerance.
	edgeSlack = 1e-6
)

// traced is one outline of the template whose edge the stylus must find on the plate.
type traced struct {
	what string
	c    geom.Contour // template frame
	left bool         // the stylus works on the outline's left: inside an opening or a channel
	of   []string     // the features it belongs to
}

// tracedOutlines returns every outline the stylus traces on the plate for plan p: in the wall
// style the profile (from outside) and each opening grown by half the printer's hole growth
// (from inside); in the groove style both sides of each channel, a band stylus + 0.2 mm wide
// round the path of the stylus's centre; in both, the outline of the grooves' channels,
// joined where grooves cross.
func tracedOutlines(p pantograph.Plan, style pantograph.PlateStyle, growth float64) []traced {
	var out []traced
	add := func(what string, rs []geom.Region, left bool, of ...string) {
		for _, r := range rs {
			for k, c := range r.Contours() {
				out = append(out, traced{fmt.Sprintf("%s, outline %d", what, k), c, left, of})
			}
		}
	}
	var caps []geom.Region
	var grooves []string
	for _, f := range p.Features {
		for i, r := range f.TemplateRegions {
			what := fmt.Sprintf("%s region %d", f.Label, i)
			switch {
			case style == pantograph.StyleGroove:
				add(what+" channel", band(f, r), true, f.Label)
			case f.Kind == pantograph.KindProfile:
				add(what, []geom.Region{r}, false, f.Label)
			default:
				add(what, []geom.Region{grown(r, growth)}, true, f.Label)
			}
		}
		for k := 1; k < len(f.Path); k++ {
			caps = append(caps, geom.NewRegion(geom.Capsule(f.Path[k-1], f.Path[k], (f.Width+edgeGroove)/2)))
			grooves = append(grooves, f.Label)
		}
	}
	for i, r := range geom.Union(caps...) {
		var of []string
		for k, c := range caps {
			if c.Bounds().Overlaps(r.Bounds()) {
				of = append(of, grooves[k])
			}
		}
		add(fmt.Sprintf("groove channel %d", i), []geom.Region{r}, true, of...)
	}
	return out
}

// grown returns opening r grown by half the printer's hole growth on every side (a printed
// opening comes out small as a hole does), or r when that does not give one region.
func grown(r geom.Region, growth float64) geom.Region {
	if growth == 0 {
		return r
	}
	if rs := r.Offset(growth / 2).Regions; len(rs) == 1 {
		return rs[0]
	}
	return r
}

// band returns the groove style's channel round region r of feature f: the path of a round
// stylus's centre (r_s outside the profile, inside an opening; the outline itself for a point),
// grown and shrunk by half the channel's width.
func band(f pantograph.PlannedFeature, r geom.Region) []geom.Region {
	centre := []geom.Region{r}
	if rs := f.Stylus / 2; f.Tip != pantograph.TipPointed && rs > 0 {
		if f.Kind != pantograph.KindProfile {
			rs = -rs
		}
		centre = r.Offset(rs).Regions
	}
	half := (f.Stylus + edgeGroove) / 2
	return geom.Difference(geom.OffsetRegions(centre, half), geom.OffsetRegions(centre, -half))
}

// plateCut is a plate's mesh ready to be cut: its top surface and its sections so far.
type plateCut struct {
	pl       pantograph.Plate
	m        geom.Mesh
	top      surface
	sections map[float64]section
}

func newPlateCut(pl pantograph.Plate, m geom.Mesh) *plateCut {
	return &plateCut{pl: pl, m: m, top: topSurface(m, pl.ScaleX, pl.ScaleY), sections: map[float64]section{}}
}

// at returns the section at height z.
func (pc *plateCut) at(z float64) section {
	s, ok := pc.sections[z]
	if !ok {
		s = sectionAt(pc.m, z, pc.pl.ScaleX, pc.pl.ScaleY)
		pc.sections[z] = s
	}
	return s
}

// missing returns the point of contour c (plate frame) farthest from the section at height z,
// and how far it is, when that is beyond the chord tolerance.
func (pc *plateCut) missing(c geom.Contour, z float64) (geom.Vec, float64, bool) {
	s, tol := pc.at(z), pc.pl.ChordTolerance+edgeSlack
	var worst geom.Vec
	far := 0.0
	for _, p := range samples(c) {
		if d := s.distance(p.at, 2*tol); d > far {
			worst, far = p.at, d
		}
	}
	return worst, far, far > tol
}

// sample is a point on a contour with the unit normal on its left.
type sample struct{ at, left geom.Vec }

// samples returns points along c every half millimetre or closer, each segment's ends included.
func samples(c geom.Contour) []sample {
	var out []sample
	for _, s := range c {
		n := int(math.Max(2, math.Ceil(s.Length()/0.5)))
		for k := range n {
			t := float64(k) / float64(n)
			out = append(out, sample{s.At(t), s.Tangent(t).Unit().Perp()})
		}
	}
	return out
}

// floorBeside returns the highest surface the stylus stands over just beside contour c (plate
// frame) on its working side, read off the middle of each segment (away from corners, where
// the point beside one segment may lie on the next).
func (pc *plateCut) floorBeside(c geom.Contour, left bool) float64 {
	side := edgeStep
	if !left {
		side = -side
	}
	f := math.NaN()
	for k, s := range c {
		if s.Length() < 4*edgeStep && k > 0 {
			continue
		}
		p := s.At(0.5).Add(s.Tangent(0.5).Unit().Perp().Mul(side))
		if h := pc.top.heightAt(p); !(h <= f) {
			f = h
		}
	}
	return f
}

// checkTraced checks that outline e stands as an edge from the floor the stylus stands on
// beside it up to one wall height w above it.
func (pc *plateCut) checkTraced(t *testing.T, e traced, w float64) {
	t.Helper()
	c := e.c.Transform(geom.Translate(pc.pl.Shift))
	f := pc.floorBeside(c, e.left)
	if math.IsNaN(f) {
		t.Errorf("%s: no plate beside it", e.what)
		return
	}
	for _, z := range []float64{f + edgeStep, f + w - edgeStep} {
		if at, d, bad := pc.missing(c, z); bad {
			t.Errorf("%s: no edge at height %.3f (the stylus stands at %.3f): %v is %.4f mm from the section",
				e.what, z, f, at.Sub(pc.pl.Shift), d)
			return
		}
	}
}

// wantSeat is a seat the plan calls for, in the template frame.
type wantSeat struct {
	what string
	at   geom.Vec
	rim  float64 // a cone's rim from the drill; unused for a bore
}

// checkSeat checks the seat at s: a bore of the stylus plus clearance and hole growth, as deep
// as the wall height but leaving 1 mm of plate, or a 90° cone of its rim, whose edges the
// section shows where the stylus drops in.
func (pc *plateCut) checkSeat(t *testing.T, s wantSeat, kind pantograph.SeatKind, bore, w float64) {
	t.Helper()
	at := s.at.Add(pc.pl.Shift)
	r := bore / 2
	if kind == pantograph.SeatCone {
		r = math.Max(edgeConeMin, math.Min(edgeConeMax, s.rim)) / 2
	}
	around := math.NaN()
	for k := range 8 {
		if h := pc.top.heightAt(geom.Polar(at, r+edgeStep, float64(k)*math.Pi/4)); !(h <= around) {
			around = h
		}
	}
	floor := pc.top.heightAt(at)
	// derived: a bore is as deep as the wall is high, leaving 1 mm of plate under it.
	want, slack := around-math.Min(w, around-edgeSeatFloor), 1e-9
	zs := []float64{floor + edgeStep, around - edgeStep}
	if kind == pantograph.SeatCone {
		// derived: a 90° cone falls as far as it runs in, so its point is r below the rim
		// and it is r/2 across at half depth. Its point stands over the middle of the
		// flattened rim, within the chord tolerance of the centre, where the cone's slope
		// of 1 raises the surface by as much.
		want, slack, zs = around-r, pc.pl.ChordTolerance+edgeSlack, []float64{around - r/2}
		r /= 2
	}
	if math.Abs(floor-want) > slack {
		t.Errorf("%s seat at %v: bottom at %.4f under a surface at %.4f, want %.4f", s.what, s.at, floor, around, want)
	}
	for _, z := range zs {
		if p, d, bad := pc.missing(geom.Circle(at, r), z); bad {
			t.Errorf("%s seat at %v: no edge at height %.3f: %v is %.4f mm from the section", s.what, s.at, z, p.Sub(pc.pl.Shift), d)
		}
	}
}

// excused reports whether the plate notes that the channel of one of the features in of is
// cut back or meets another: there the edge is known to be missing.
func excused(pl pantograph.Plate, of []string) bool {
	for _, n := range pl.Notes {
		if !strings.Contains(n, "cut back") && !strings.Contains(n, "meet") {
			continue
		}
		for _, l := range of {
			if strings.Contains(n, l) {
				return true
			}
		}
	}
	return false
}

// checkPlateEdges checks that plate pl built for plan p, whose mesh is m, carries every edge,
// seat and channel the plan's template has; growth is the printer's hole growth.
func checkPlateEdges(t *testing.T, p pantograph.Plan, pl pantograph.Plate, m geom.Mesh, growth float64) {
	t.Helper()
	pc := newPlateCut(pl, m)
	stylus := 0.0
	for _, f := range p.Features {
		stylus = math.Max(stylus, f.Stylus)
	}
	w := math.Max(edgeMinWall, stylus)
	for _, e := range tracedOutlines(p, pl.Style, growth) {
		if !excused(pl, e.of) {
			pc.checkTraced(t, e, w)
		}
	}
	var seats []wantSeat
	datum := false
	for _, f := range p.Features {
		for _, s := range f.Seats {
			seats = append(seats, wantSeat{f.Label, s, p.Setup.Ratio * f.Drill})
			datum = datum || s.Dist(geom.Vec{}) < 1e-6
		}
	}
	if !datum {
		hasSeat := false
		for _, s := range pl.Seats {
			hasSeat = hasSeat || s.Datum
		}
		if hasSeat {
			seats = append(seats, wantSeat{"datum", geom.Vec{}, edgeConeMax})
		} else if !strings.Contains(strings.Join(pl.Notes, "\n"), "datum") {
			t.Errorf("no datum seat, and no note says why: notes %q", pl.Notes)
		}
	}
	for _, s := range seats {
		pc.checkSeat(t, s, pl.Seat, stylus+edgeBoreClearance+growth, w)
	}
}

// TestPlateEdgesSamples builds the plate of every sample at several ratios, with no machine
// file and with each sample machine, in both styles, and checks that the stylus finds on it
// every edge the template has, at the height where it meets the edge.
func TestPlateEdgesSamples(t *testing.T) {
	machines := []string{"", "bench-pantograph.machine.toml", "inch-engraver.machine.toml"}
	for _, name := range []string{"pump-port-plate.toml", "clock-bridge.toml", "calibration-coupon.toml"} {
		part, err := partfile.ReadFile(filepath.Join("..", "samples", name))
		if err != nil {
			t.Fatal(err)
		}
		for _, ratio := range []float64{5, 7, 8, 10} {
			for _, mname := range machines {
				var m *pantograph.Machine
				growth := 0.0
				if mname != "" {
					mc, err := partfile.ReadMachineFile(filepath.Join("..", "samples", "machines", mname))
					if err != nil {
						t.Fatal(err)
					}
					m, growth = &mc, mc.Printer.HoleGrowth
				}
				p, err := pantograph.PlanPart(part, pantograph.Setup{Ratio: ratio, Cutter: 0.5}, m)
				if err != nil {
					t.Fatal(err)
				}
				for _, style := range []pantograph.PlateStyle{pantograph.StyleWall, pantograph.StyleGroove} {
					t.Run(fmt.Sprintf("%s %g:1 %s %s", name, ratio, mname, style), func(t *testing.T) {
						t.Parallel()
						pl, err := pantograph.BuildPlate(p, m, pantograph.PlateOptions{Style: style})
						if err != nil {
							t.Fatal(err)
						}
						m, err := pl.Mesh()
						if err != nil {
							t.Fatal(err)
						}
						checkPlateEdges(t, p, pl, m, growth)
						// Every edge of a sample is checked: none is excused by a note.
						for _, n := range pl.Notes {
							if strings.Contains(n, "cut back") || strings.Contains(n, "meet") {
								t.Errorf("note: %s", n)
							}
						}
					})
				}
			}
		}
	}
}
