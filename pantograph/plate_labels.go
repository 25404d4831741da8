package pantograph

import (
	"fmt"
	"math"

	"panto/geom"
)

// This file letters the plate and lays out its front strip: the title, the check bar and the
// test square, and each feature's number beside it.

// strip puts the title, the check bar and the test square along the front of the plate.
func (d *plateDesign) strip() error {
	b := d.box
	left, right := b.Min.X+d.fix.inset, b.Max.X-d.fix.inset
	// Everything stands above the row of front fixing slots.
	row := b.Min.Y + d.fix.inset + (d.fix.hole+d.growth)/2 + 2*labelGap
	y := row + barWidth + 2*labelGap
	title := d.pl.Title
	h := titleHeight
	room := right - left - testSquare - 2*labelGap
	if w := TextWidth(title, h); w > room {
		h = math.Max(smallLabel, h*room/w)
	}
	for TextWidth(title, h) > room && len(title) > 1 {
		title = title[:len(title)-1]
	}
	if title != d.pl.Title {
		d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("the title is cut to %q to fit the plate", title))
	}
	if err := d.label(title, geom.V(left, y), h); err != nil {
		return err
	}
	bar := math.Min(checkBar, math.Floor((right-left-testSquare-4*labelGap-TextWidth("100", smallLabel))/10)*10)
	if bar < 10 {
		return fmt.Errorf("%w: no room for the check bar", ErrPlate)
	}
	by := row
	d.mark("check bar", geom.V(left, by), geom.V(bar, barWidth))
	d.pl.CheckBar = bar
	if err := d.label(fmt.Sprintf("%g", bar), geom.V(left+bar+2*labelGap, by), smallLabel); err != nil {
		return err
	}
	sq := geom.V(right-testSquare, row)
	d.mark("test square", sq, geom.V(testSquare, testSquare))
	d.pl.TestSquare = testSquare
	return nil
}

// mark adds a raised rectangle of the front strip.
func (d *plateDesign) mark(what string, at, size geom.Vec) {
	c, _ := geom.Rect(at, size, 0)
	d.add(PlateArea{What: what, Region: geom.NewRegion(c), Top: d.pl.Base + markHeight})
}

// label sinks text with its lower left corner at at.
func (d *plateDesign) label(text string, at geom.Vec, h float64) error {
	rs, err := TextOutlines(text, at, h)
	if err != nil {
		return fmt.Errorf("%w: %v", ErrPlate, err)
	}
	top := d.surfaceAt(at) - labelDepth
	for _, r := range rs {
		d.add(PlateArea{What: "label", Region: r, Top: top})
	}
	d.pl.Labels = append(d.pl.Labels, PlateLabel{Text: text, At: at, Height: h})
	d.takeBox(textBox(text, at, h).Expand(labelGap))
	return nil
}

// textBox returns the box the strokes of text at at take.
func textBox(text string, at geom.Vec, h float64) geom.Box {
	return geom.Box{Min: at, Max: at.Add(geom.V(TextWidth(text, h), h*(1+strokeUnits/glyphHeight)))}
}

// maxLabelTries is how many of a feature's seats are tried as places for its number: enough to
// get round a crowded first seat, few enough to stay quick on plates with thousands of holes.
const maxLabelTries = 8

// numbers puts each feature's number beside it, where there is room: on the island, clear of
// everything else, or on the base clear of the stylus's path round the island.
func (d *plateDesign) numbers() error {
	for _, f := range d.plan.Features {
		if f.Number == 0 || f.TemplateBounds.IsEmpty() {
			continue
		}
		text := fmt.Sprint(f.Number)
		var nears []geom.Box
		for k, s := range f.Seats {
			if k == maxLabelTries {
				break
			}
			nears = append(nears, geom.Box{Min: s, Max: s}.Expand(d.seatRadius()+2*labelGap))
		}
		switch {
		case f.Kind == KindProfile:
			b := f.TemplateBounds
			nears = append(nears, geom.Box{Min: b.Min, Max: b.Min}.Expand(f.Stylus+labelGap))
		case len(nears) == 0:
			nears = append(nears, f.TemplateBounds)
		}
		var at geom.Vec
		var h float64
		ok := false
		for _, near := range nears {
			if at, h, ok = d.roomNear(text, near); ok {
				break
			}
		}
		if !ok {
			d.pl.Notes = append(d.pl.Notes, fmt.Sprintf("no room for the number of %s", f.Label))
			continue
		}
		if err := d.label(text, at, h); err != nil {
			return err
		}
	}
	return nil
}

// roomNear finds a place for text beside box b: right, left, above, below, at full and then
// small height.
func (d *plateDesign) roomNear(text string, b geom.Box) (geom.Vec, float64, bool) {
	for _, h := range []float64{labelHeight, smallLabel} {
		w, th := TextWidth(text, h), h*(1+strokeUnits/glyphHeight)
		g := labelGap + 0.5
		c := b.Center()
		for _, at := range []geom.Vec{
			geom.V(b.Max.X+g, c.Y-th/2), geom.V(b.Min.X-g-w, c.Y-th/2),
			geom.V(c.X-w/2, b.Max.Y+g), geom.V(c.X-w/2, b.Min.Y-g-th),
			geom.V(b.Max.X+g, b.Max.Y+g), geom.V(b.Min.X-g-w, b.Min.Y-g-th),
		} {
			if d.free(textBox(text, at, h)) {
				return at, h, true
			}
		}
	}
	return geom.Vec{}, 0, false
}

// free reports whether box b can take a label: on the plate above the front strip, clear of
// everything placed, and in the wall style wholly on the island or clear of it by a stylus
// diameter, so the stylus running round the island never meets a letter.
func (d *plateDesign) free(b geom.Box) bool {
	g := b.Expand(labelGap)
	inner := d.box.Expand(-d.fix.inset)
	if !inner.ContainsPoint(g.Min) || !inner.ContainsPoint(g.Max) || g.Min.Y < d.box.Min.Y+stripHeight+d.fix.extra() {
		return false
	}
	for _, t := range d.taken {
		if t.box.Overlaps(g) && (t.region == nil || meets(g, *t.region)) {
			return false
		}
	}
	if d.o.Style != StyleWall {
		return true
	}
	rect := boxRegion(g)
	for _, r := range d.islands {
		if !r.Bounds().Overlaps(g) {
			continue
		}
		in := geom.Intersection([]geom.Region{rect}, []geom.Region{r})
		if area(in) > rect.Area()*(1-1e-9) {
			return true // wholly on the island
		}
	}
	wide := g.Expand(d.stylus)
	for _, r := range d.islands {
		if r.Bounds().Overlaps(wide) && meets(wide, r) {
			return false
		}
	}
	return true
}

// takenArea is something on the plate that labels keep clear of: a box, or a region within it.
type takenArea struct {
	box    geom.Box
	region *geom.Region
}

// takeBox marks a box as taken.
func (d *plateDesign) takeBox(b geom.Box) { d.taken = append(d.taken, takenArea{box: b}) }

// takeRegion marks a region as taken.
func (d *plateDesign) takeRegion(r geom.Region) {
	d.taken = append(d.taken, takenArea{box: r.Bounds(), region: &r})
}

// meets reports whether box b and region r share any area.
func meets(b geom.Box, r geom.Region) bool {
	return area(geom.Intersection([]geom.Region{boxRegion(b)}, []geom.Region{r})) > 0
}

// boxRegion returns box b as a region.
func boxRegion(b geom.Box) geom.Region {
	c, _ := geom.Rect(b.Min, b.Size(), 0)
	return geom.NewRegion(c)
}

// area returns the total area of rs.
func area(rs []geom.Region) float64 {
	a := 0.0
	for _, r := range rs {
		a += r.Area()
	}
	return a
}
