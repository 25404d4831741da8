package cad

import (
	"fmt"
	"math"
	"strconv"

	"panto/geom"
)

// maxSegments bounds the segments one drawing may produce, blocks inserted included: 200 000
// is far more than any part outline needs, even with splines cut into chords, and keeps a
// hostile file from running the reader and the classification out of time and memory.
const maxSegments = 200_000

// maxBlockDepth bounds how deeply blocks may insert blocks; real drawings nest a few levels.
const maxBlockDepth = 16

// dxfReader turns entities into Items.
type dxfReader struct {
	file  string
	f     *dxfFile
	found *Drawing
	tol   float64 // chord tolerance in mm
	stack []string
	uses  int        // block uses so far, bounded by maxSegments so that empty blocks cannot loop on
	via   *dxfEntity // the outermost INSERT being read, named in messages instead of block lines
}

// entities reads es under map m; inherit is the layer of the INSERT they belong to, for
// entities on layer 0, which by DXF's rule take the layer of their insert.
func (r *dxfReader) entities(es []dxfEntity, m affine, inherit string) error {
	for _, e := range es {
		if err := r.entity(e, m, inherit); err != nil {
			return err
		}
	}
	return nil
}

// entity reads one entity.
func (r *dxfReader) entity(e dxfEntity, m affine, inherit string) error {
	layer := e.str(8)
	if layer == "" {
		layer = "0"
	}
	if layer == "0" && inherit != "" {
		layer = inherit
	}
	ocs := m
	if z, err := e.num(r.file, 230, 1); err != nil {
		return err
	} else if z < 0 {
		// Seen from below, the entity's own x axis points along −X (DXF's arbitrary-axis rule
		// for the extrusion (0, 0, −1)); y is unchanged. Arcs drawn so turn the other way.
		ocs = scaling(-1, 1).then(m)
	}
	em := emitter{r: r, e: e, layer: layer}
	switch e.kind {
	case "LINE":
		return r.line(em, m)
	case "ARC", "CIRCLE":
		return r.arc(em, ocs)
	case "LWPOLYLINE":
		return r.lwpolyline(em, ocs)
	case "POLYLINE":
		return r.polyline(em, ocs)
	case "ELLIPSE":
		return r.ellipse(em, m)
	case "SPLINE":
		return r.spline(em, m)
	case "INSERT":
		return r.insert(e, ocs, layer)
	}
	r.found.skip(e.kind)
	return nil
}

// emitter adds segments of one entity to the drawing found.
type emitter struct {
	r     *dxfReader
	e     dxfEntity
	layer string
}

func (o emitter) errf(format string, args ...any) error {
	return &Error{File: o.r.file, Line: o.e.line, What: o.e.kind, Msg: fmt.Sprintf(format, args...)}
}

// add maps s through m and adds it.
func (o emitter) add(m affine, s geom.Segment) error {
	for _, t := range m.segment(s, o.r.tol) {
		if err := o.addMapped(t); err != nil {
			return err
		}
	}
	return nil
}

// addMapped adds a segment already in millimetres, dropping ones too short to matter.
func (o emitter) addMapped(s geom.Segment) error {
	if !s.A.IsFinite() || !s.B.IsFinite() || !s.Center.IsFinite() {
		return o.errf("a coordinate is too large to be a drawing of a part")
	}
	if s.A == s.B && !s.IsArc() {
		return nil
	}
	if len(o.r.found.Items) >= maxSegments {
		return o.errf("more than %d segments: this drawing is far larger than any part panto makes", maxSegments)
	}
	it := Item{Seg: s, Layer: o.layer, Line: o.e.line, What: o.e.kind}
	if v := o.r.via; v != nil {
		// The user finds an inserted block by its INSERT, not by the block's definition.
		it.Line, it.What = v.line, fmt.Sprintf("%s of INSERT %q", o.e.kind, v.str(2))
	}
	o.r.found.Items = append(o.r.found.Items, it)
	return nil
}

// nums reads the numbers with the given codes, defaulting to 0.
func (o emitter) nums(codes ...int) ([]float64, error) {
	out := make([]float64, len(codes))
	for i, c := range codes {
		v, err := o.e.num(o.r.file, c, 0)
		if err != nil {
			return nil, err
		}
		out[i] = v
	}
	return out, nil
}

func (r *dxfReader) line(em emitter, m affine) error {
	v, err := em.nums(10, 20, 11, 21)
	if err != nil {
		return err
	}
	return em.add(m, geom.Line(geom.V(v[0], v[1]), geom.V(v[2], v[3])))
}

// arc reads an ARC (start and end angles in degrees, counter-clockwise) or a CIRCLE.
func (r *dxfReader) arc(em emitter, m affine) error {
	v, err := em.nums(10, 20, 40, 50, 51)
	if err != nil {
		return err
	}
	if !(v[2] > 0) {
		return em.errf("radius (group 40) must be greater than 0, got %g", v[2])
	}
	start, sweep := 0.0, 2*math.Pi
	if em.e.kind == "ARC" {
		start = v[3] * math.Pi / 180
		sweep = math.Mod(v[4]-v[3], 360)
		if sweep <= 0 {
			sweep += 360 // an arc from 30° to 10° runs the long way round, counter-clockwise
		}
		sweep *= math.Pi / 180
	}
	return em.add(m, geom.Arc(geom.V(v[0], v[1]), v[2], start, sweep))
}

// bulgeSegment returns the segment from a to b with the given bulge: the tangent of a quarter
// of the arc's sweep, negative for clockwise, 0 for a straight line.
func bulgeSegment(a, b geom.Vec, bulge float64) geom.Segment {
	if bulge == 0 || a.Near(b) {
		return geom.Line(a, b)
	}
	sweep := 4 * math.Atan(bulge)
	chord := b.Sub(a)
	// The centre lies on the chord's perpendicular bisector, (d/2)/tan(θ/2) to the left of the
	// direction of travel (to the right when that is negative).
	h := chord.Len() / 2 / math.Tan(sweep/2)
	center := a.Lerp(b, 0.5).Add(chord.Unit().Perp().Mul(h))
	s := geom.ArcFrom(a, center, sweep)
	s.B = b
	return s
}

// vertex is a polyline vertex with the bulge of the segment leaving it.
type vertex struct {
	p     geom.Vec
	bulge float64
}

// polySegments adds the segments of a polyline through vs, closed when closed.
func (o emitter) polySegments(m affine, vs []vertex, closed bool) error {
	n := len(vs) - 1
	if closed {
		n = len(vs)
	}
	for i := 0; i < n; i++ {
		a, b := vs[i], vs[(i+1)%len(vs)]
		if a.p.Near(b.p) {
			continue
		}
		if err := o.add(m, bulgeSegment(a.p, b.p, a.bulge)); err != nil {
			return err
		}
	}
	return nil
}

func (r *dxfReader) lwpolyline(em emitter, m affine) error {
	var vs []vertex
	for _, g := range em.e.groups {
		if g.code != 10 && g.code != 20 && g.code != 42 {
			continue
		}
		v, err := parseNum(r.file, em.e.kind, g)
		if err != nil {
			return err
		}
		switch {
		case g.code == 10:
			vs = append(vs, vertex{p: geom.V(v, 0)})
		case len(vs) == 0:
			return &Error{File: r.file, Line: g.line, What: em.e.kind, Msg: fmt.Sprintf("group %d comes before the first vertex (group 10)", g.code)}
		case g.code == 20:
			vs[len(vs)-1].p.Y = v
		default:
			vs[len(vs)-1].bulge = v
		}
	}
	flags, err := em.e.num(r.file, 70, 0)
	if err != nil {
		return err
	}
	return em.polySegments(m, vs, int(flags)&1 != 0)
}

// polyline reads an old-style POLYLINE with its VERTEX entities. 3-D meshes and polyface
// meshes are not outlines and are skipped.
func (r *dxfReader) polyline(em emitter, m affine) error {
	flags, err := em.e.num(r.file, 70, 0)
	if err != nil {
		return err
	}
	if int(flags)&(16|64) != 0 {
		r.found.skip("POLYLINE mesh")
		return nil
	}
	var vs []vertex
	for _, v := range em.e.verts {
		vf, err := v.num(r.file, 70, 0)
		if err != nil {
			return err
		}
		if int(vf)&16 != 0 {
			continue // a spline frame point, not on the curve
		}
		xyb := make([]float64, 3)
		for i, c := range []int{10, 20, 42} {
			if xyb[i], err = v.num(r.file, c, 0); err != nil {
				return err
			}
		}
		vs = append(vs, vertex{p: geom.V(xyb[0], xyb[1]), bulge: xyb[2]})
	}
	return em.polySegments(m, vs, int(flags)&1 != 0)
}

// ellipse reads an ELLIPSE: centre, major axis end relative to it, minor/major ratio and start
// and end parameters in radians. Its points are in world coordinates already.
func (r *dxfReader) ellipse(em emitter, m affine) error {
	v, err := em.nums(10, 20, 11, 21, 40, 230)
	if err != nil {
		return err
	}
	t0, err := em.e.num(r.file, 41, 0)
	if err != nil {
		return err
	}
	t1, err := em.e.num(r.file, 42, 2*math.Pi)
	if err != nil {
		return err
	}
	major := geom.V(v[2], v[3])
	if major.Len() == 0 || !(v[4] > 0 && v[4] <= 1+1e-9) {
		return em.errf("needs a major axis (groups 11, 21) and a ratio (group 40) between 0 and 1")
	}
	sweep := math.Mod(t1-t0, 2*math.Pi)
	if sweep <= 1e-12 {
		sweep += 2 * math.Pi
	}
	if v[5] < 0 {
		// Seen from below the parameter runs the other way: the same points as the ellipse
		// seen from above between −t1 and −t0.
		t0 = -t1
	}
	rx := major.Len()
	for _, s := range ellipseArc(m, geom.V(v[0], v[1]), rx, rx*v[4], major.Angle(), t0, sweep, r.tol) {
		if err := em.addMapped(s); err != nil {
			return err
		}
	}
	return nil
}

// insert reads an INSERT: the block's entities moved so its base point lands on the insertion
// point, scaled, turned, and repeated over a grid when columns and rows are given.
func (r *dxfReader) insert(e dxfEntity, m affine, layer string) error {
	name := e.str(2)
	em := emitter{r: r, e: e, layer: layer}
	b, ok := r.f.blocks[name]
	if !ok {
		return em.errf("inserts block %q, which the file does not define", name)
	}
	if len(r.stack) >= maxBlockDepth || contains(r.stack, name) {
		return em.errf("block %q inserts itself, or blocks nest more than %d deep", name, maxBlockDepth)
	}
	v, err := em.nums(10, 20, 44, 45)
	if err != nil {
		return err
	}
	sc := make([]float64, 3)
	for i, c := range []int{41, 42, 50} {
		def := 1.0
		if c == 50 {
			def = 0
		}
		if sc[i], err = e.num(r.file, c, def); err != nil {
			return err
		}
	}
	cols, rows := e.count(70), e.count(71)
	if sc[0] == 0 || sc[1] == 0 {
		return em.errf("block %q is inserted at scale 0", name)
	}
	if math.Abs(math.Abs(sc[0])-math.Abs(sc[1])) > similarityTol*math.Abs(sc[0]) {
		r.found.warnf("line %d: block %q is stretched unequally (%g × %g): its arcs became chords within %g mm",
			e.line, name, sc[0], sc[1], r.tol)
	}
	r.stack = append(r.stack, name)
	if r.via == nil {
		r.via = &e
		defer func() { r.via = nil }()
	}
	defer func() { r.stack = r.stack[:len(r.stack)-1] }()
	for c := 0; c < cols; c++ {
		for w := 0; w < rows; w++ {
			if r.uses++; r.uses > maxSegments {
				return em.errf("blocks are inserted more than %d times: far more than any part needs", maxSegments)
			}
			bm := translation(-b.base[0], -b.base[1]).then(scaling(sc[0], sc[1])).
				then(translation(float64(c)*v[2], float64(w)*v[3])).
				then(rotation(sc[2] * math.Pi / 180)).then(translation(v[0], v[1])).then(m)
			if err := r.entities(b.entities, bm, layer); err != nil {
				return err
			}
		}
	}
	return nil
}

// count reads a column or row count of an INSERT: at least 1, and bounded, since the product
// is bounded by maxSegments anyway.
func (e dxfEntity) count(code int) int {
	n, err := strconv.Atoi(e.str(code))
	if err != nil || n < 1 {
		return 1
	}
	return min(n, maxSegments)
}

func contains(ss []string, s string) bool {
	for _, x := range ss {
		if x == s {
			return true
		}
	}
	return false
}
