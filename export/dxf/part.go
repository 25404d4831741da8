package dxf

import (
	"fmt"
	"math"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/cad"
)

// The layers of a part drawing, one per kind of feature so that a CAD program can show, hide
// or colour them apart. The names live in package cad, which reads them back as default
// layer rules, so that panto imports its own part drawings as written.
const (
	LayerProfile = cad.LayerProfile
	LayerCutouts = cad.LayerCutouts
	LayerPockets = cad.LayerPockets
	LayerHoles   = cad.LayerHoles
	LayerGrooves = cad.LayerGrooves
	LayerLabels  = cad.LayerLabels
)

// PartDrawing returns the part at true size in the part frame: the profile, cut-outs and
// slots, pockets, holes and grooves each on their own layer, and each feature's name as a
// label at the middle of what it covers.
func PartDrawing(p pantograph.Part) Drawing {
	d := Drawing{Layers: []Layer{{LayerProfile, 7}, {LayerCutouts, 1}, {LayerPockets, 5},
		{LayerHoles, 3}, {LayerGrooves, 6}, {LayerLabels, 8}}}
	d.region(LayerProfile, p.Profile.Region)
	size := p.Profile.Region.Bounds().Size()
	h := labelHeight(math.Min(size.X, size.Y))
	for _, f := range p.Features {
		var box geom.Box
		switch f.Kind {
		case pantograph.KindHoles:
			box = geom.EmptyBox()
			for _, c := range f.Centers {
				d.Circles = append(d.Circles, Circle{Layer: LayerHoles, Center: c, Radius: f.Diameter / 2})
				box = box.AddPoint(c)
			}
		case pantograph.KindGroove:
			d.Polylines = append(d.Polylines, Polyline{Layer: LayerGrooves, Points: f.Path})
			box = geom.EmptyBox()
			for _, q := range f.Path {
				box = box.AddPoint(q)
			}
		case pantograph.KindPocket:
			d.region(LayerPockets, f.Region)
			box = f.Region.Bounds()
		default:
			d.region(LayerCutouts, f.Region)
			box = f.Region.Bounds()
		}
		if !box.IsEmpty() && f.Name != "" {
			d.Texts = append(d.Texts, Text{Layer: LayerLabels, At: box.Center(), Height: h, Value: f.Name})
		}
	}
	return d
}

// labelHeight is a thirtieth of the part's smaller side, so labels stay legible without
// covering the features (common practice, no source).
func labelHeight(side float64) float64 { return math.Max(side/30, 0.1) }

// region adds every contour of r as an outline on layer.
func (d *Drawing) region(layer string, r geom.Region) {
	for _, c := range r.Contours() {
		if len(c) > 0 {
			d.Outlines = append(d.Outlines, Outline{Layer: layer, Contour: c})
		}
	}
}

// The layers of a template drawing.
const (
	LayerOutline  = "OUTLINE"
	LayerOpenings = "OPENINGS"
	LayerSeats    = "SEATS"
)

// templateLabelHeight is the height of template labels: 3 mm reads easily on a plate held at
// arm's length and is cut cleanly by a laser (common practice, no source).
const templateLabelHeight = 3.0

// TemplateDrawing returns the template of a plan in the template frame (mm on the copy table):
// the outline, the openings the stylus traces inside, a seat for every drilled hole (a circle
// of the stylus's diameter), groove centrelines and a numbered label per feature, each on its
// own layer. A laser cuts kerf wide centred on the line, so kerf > 0 moves the outline out by
// kerf/2 and openings and seats in by kerf/2, so that the parts cut come out at the template's
// size. It fails when the kerf closes an opening or a seat.
func TemplateDrawing(pl pantograph.Plan, kerf float64) (Drawing, error) {
	if kerf < 0 || math.IsNaN(kerf) || math.IsInf(kerf, 0) {
		return Drawing{}, fmt.Errorf("dxf: kerf must be 0 or more, got %g", kerf)
	}
	d := Drawing{Layers: []Layer{{LayerOutline, 7}, {LayerOpenings, 1}, {LayerSeats, 3},
		{LayerGrooves, 6}, {LayerLabels, 8}}}
	for _, f := range pl.Features {
		if err := d.templateFeature(f, kerf/2); err != nil {
			return Drawing{}, fmt.Errorf("dxf: %s: %w", f.Label, err)
		}
		if box := f.TemplateBounds; !box.IsEmpty() && f.Status != pantograph.StatusLost {
			d.Texts = append(d.Texts, Text{Layer: LayerLabels, At: box.Center(), Height: templateLabelHeight,
				Value: fmt.Sprintf("%d %s", f.Number, f.Name)})
		}
	}
	return d, nil
}

func (d *Drawing) templateFeature(f pantograph.PlannedFeature, half float64) error {
	switch {
	case f.Kind == pantograph.KindProfile:
		return d.offsetRegions(LayerOutline, f.TemplateRegions, half)
	case len(f.Seats) > 0:
		r := f.Stylus/2 - half
		if !(r > 0) {
			return fmt.Errorf("the kerf (%g mm) closes the %g mm seats", 2*half, f.Stylus)
		}
		for _, s := range f.Seats {
			d.Circles = append(d.Circles, Circle{Layer: LayerSeats, Center: s, Radius: r})
		}
	case len(f.Path) > 0:
		d.Polylines = append(d.Polylines, Polyline{Layer: LayerGrooves, Points: f.Path})
	default:
		return d.offsetRegions(LayerOpenings, f.TemplateRegions, -half)
	}
	return nil
}

// offsetRegions adds the regions moved by by (outward when positive) to layer.
func (d *Drawing) offsetRegions(layer string, rs []geom.Region, by float64) error {
	for _, r := range rs {
		res := r.Offset(by)
		if len(res.Regions) == 0 || len(res.Vanished) > 0 {
			return fmt.Errorf("the kerf (%g mm) closes an opening", 2*math.Abs(by))
		}
		for _, o := range res.Regions {
			d.region(layer, o)
		}
	}
	return nil
}
