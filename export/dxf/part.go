package dxf

import (
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

// TemplateDrawing returns the template for cutting on a laser or router, as the planner made it
// (pantograph.TemplateForCutting, which allows for the kerf): the outline, the openings the
// stylus traces inside, the seats, the groove centrelines and a numbered label per feature,
// each on its own layer, in template mm.
func TemplateDrawing(ct pantograph.CutTemplate) Drawing {
	d := Drawing{Layers: []Layer{{LayerOutline, 7}, {LayerOpenings, 1}, {LayerSeats, 3},
		{LayerGrooves, 6}, {LayerLabels, 8}}}
	for _, r := range ct.Outline {
		d.region(LayerOutline, r)
	}
	for _, r := range ct.Openings {
		d.region(LayerOpenings, r)
	}
	for _, s := range ct.Seats {
		d.Circles = append(d.Circles, Circle{Layer: LayerSeats, Center: s.At, Radius: s.Radius})
	}
	for _, g := range ct.Grooves {
		d.Polylines = append(d.Polylines, Polyline{Layer: LayerGrooves, Points: g})
	}
	for _, l := range ct.Labels {
		d.Texts = append(d.Texts, Text{Layer: LayerLabels, At: l.At, Height: templateLabelHeight, Value: l.Text})
	}
	return d
}
