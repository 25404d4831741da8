package partfile

import (
	"fmt"

	"panto/geom"
)

// shapeKeys are the keys that give an outline; a table uses exactly one of them.
var shapeKeys = []string{"points", "circle", "rect", "path"}

// slotKeys give a straight slot by its centreline and width.
var slotKeys = []string{"from", "to", "width"}

// outline reads the one shape key of t (or, when slots is true, a slot's keys) as a region.
func (t table) outline(slots bool) (geom.Region, error) {
	key, err := t.shapeKey(slots)
	if err != nil {
		return geom.Region{}, err
	}
	var c geom.Contour
	switch key {
	case "points":
		c, err = t.at("points").polygon(t.m["points"])
	case "circle":
		c, err = t.at("circle").circle(t.m["circle"])
	case "rect":
		c, err = t.at("rect").rect(t.m["rect"])
	case "path":
		c, err = t.at("path").pathShape(t.m["path"])
	default:
		var s slot
		s, err = t.slot()
		c = geom.Capsule(s.from, s.to, s.width/2)
	}
	if err != nil {
		return geom.Region{}, err
	}
	return geom.NewRegion(c), nil
}

// shapeKey returns which shape key t uses, or "from/to/width" for a slot, and complains when
// there is none or more than one.
func (t table) shapeKey(slots bool) (string, error) {
	var found []string
	for _, k := range shapeKeys {
		if t.has(k) {
			found = append(found, k)
		}
	}
	if slots && (t.has("from") || t.has("to") || t.has("width")) {
		found = append(found, "from/to/width")
	}
	switch {
	case len(found) == 0 && slots:
		return "", t.errf("no shape: give one of points, circle, rect or path, or a slot's from, to and width")
	case len(found) == 0:
		return "", t.errf("no shape: give one of points, circle, rect or path")
	case len(found) > 1:
		second := found[1]
		if second == "from/to/width" {
			second = firstPresent(t, slotKeys)
		}
		return "", t.at(second).errf("give only one shape, found both %s and %s", found[0], found[1])
	}
	return found[0], nil
}

func firstPresent(t table, keys []string) string {
	for _, k := range keys {
		if t.has(k) {
			return k
		}
	}
	return keys[0]
}

// polygon reads points = [[x, y], [x, y, corner radius], ...].
func (l loc) polygon(v any) (geom.Contour, error) {
	a, err := l.list(v)
	if err != nil {
		return nil, err
	}
	if len(a) < 3 {
		return nil, l.errf("an outline needs at least 3 points, got %d", len(a))
	}
	pts := make([]geom.Vec, len(a))
	radii := make([]float64, len(a))
	for i, x := range a {
		e := l.elem(i)
		ns, err := e.numbers(x, 2, 3, "[x, y] or [x, y, corner radius]")
		if err != nil {
			return nil, err
		}
		pts[i] = geom.V(ns[0], ns[1]).Mul(l.t.r.scale)
		if len(ns) == 3 {
			if radii[i], err = e.radius(ns[2]); err != nil {
				return nil, err
			}
		}
	}
	c, err := geom.RoundedPolygon(pts, radii)
	if err != nil {
		return nil, l.errf("%v", err)
	}
	return c, nil
}

// inline reads an inline table and checks its keys.
func (l loc) inline(v any, known ...string) (map[string]any, error) {
	m, ok := v.(map[string]any)
	if !ok {
		return nil, l.errf("must be a table such as { %s = ... }, got %s", known[0], describe(v))
	}
	for k := range m {
		if !contains(known, k) {
			l.t.r.noteUnknown(l.path+"."+k, &Error{File: l.t.r.file, Line: l.t.r.lines.line(l.path + "." + k),
				Msg: unknownKeyMsg(k, l.t.label+" "+l.key, known)})
		}
	}
	for _, k := range known {
		if _, ok := m[k]; !ok && k != "corner" {
			return nil, l.errf("missing %s", k)
		}
	}
	return m, nil
}

func contains(ks []string, k string) bool {
	for _, x := range ks {
		if x == k {
			return true
		}
	}
	return false
}

// circle reads circle = { center = [x, y], diameter = d }.
func (l loc) circle(v any) (geom.Contour, error) {
	m, err := l.inline(v, "center", "diameter")
	if err != nil {
		return nil, err
	}
	c, err := l.sub("center").point(m["center"])
	if err != nil {
		return nil, err
	}
	d, err := l.sub("diameter").length(m["diameter"])
	if err != nil {
		return nil, err
	}
	return geom.Circle(c, d/2), nil
}

// rect reads rect = { min = [x, y], size = [w, h], corner = r } (corner optional).
func (l loc) rect(v any) (geom.Contour, error) {
	m, err := l.inline(v, "min", "size", "corner")
	if err != nil {
		return nil, err
	}
	lo, err := l.sub("min").point(m["min"])
	if err != nil {
		return nil, err
	}
	size, err := l.sub("size").point(m["size"])
	if err != nil {
		return nil, err
	}
	if size.X <= 0 || size.Y <= 0 {
		return nil, l.sub("size").errf("width and height must be greater than 0, got %s", describe(m["size"]))
	}
	var r float64
	if cv, ok := m["corner"]; ok {
		if r, err = l.sub("corner").radius(cv); err != nil {
			return nil, err
		}
	}
	if 2*r > min(size.X, size.Y) {
		return nil, l.sub("corner").errf("corner radius %v is more than half the rectangle's smaller side",
			r/l.t.r.scale)
	}
	return geom.Rect(lo, size, r)
}

// pathShape reads path = [ { at = [x, y] }, { line = [x, y] }, { arc = [x, y], through = [x, y] } ... ],
// closed back to the start with a straight line when it does not end there.
func (l loc) pathShape(v any) (geom.Contour, error) {
	a, err := l.list(v)
	if err != nil {
		return nil, err
	}
	if len(a) < 2 {
		return nil, l.errf("a path needs a start (at) and at least 2 more steps, got %d entries", len(a))
	}
	var c geom.Contour
	var start, cur geom.Vec
	for i, x := range a {
		e := l.elem(i)
		seg, to, err := e.step(x, i == 0, cur)
		if err != nil {
			return nil, err
		}
		if i == 0 {
			start = to
		} else {
			if to.Near(cur) {
				return nil, e.errf("goes nowhere: it ends where the path already is, %v", cur.Mul(1/l.t.r.scale))
			}
			c = append(c, seg)
		}
		cur = to
	}
	if !cur.Near(start) {
		c = append(c, geom.Line(cur, start))
	}
	if len(c) < 2 {
		return nil, l.errf("a path needs at least 2 steps besides its start")
	}
	return c, nil
}

// step reads one path entry: the start { at } or a step { line } / { arc, through } from cur.
func (l loc) step(v any, first bool, cur geom.Vec) (geom.Segment, geom.Vec, error) {
	m, ok := v.(map[string]any)
	if !ok {
		return geom.Segment{}, geom.Vec{}, l.errf("must be a table such as { line = [x, y] }, got %s", describe(v))
	}
	var known []string
	switch {
	case first:
		known = []string{"at"}
	case m["arc"] != nil || m["through"] != nil:
		known = []string{"arc", "through"}
	default:
		known = []string{"line"}
	}
	for k := range m {
		if !contains(known, k) {
			msg := unknownKeyMsg(k, l.t.label+" "+l.key, known)
			if first {
				msg = fmt.Sprintf("a path starts with { at = [x, y] }; %s", msg)
			}
			l.t.r.noteUnknown(l.path+"."+k, &Error{File: l.t.r.file, Line: l.t.r.lines.line(l.path), Msg: msg})
		}
	}
	for _, k := range known {
		if _, ok := m[k]; !ok {
			return geom.Segment{}, geom.Vec{}, l.errf("missing %s", k)
		}
	}
	to, err := l.sub(known[0]).point(m[known[0]])
	if err != nil || len(known) == 1 {
		return geom.Line(cur, to), to, err
	}
	mid, err := l.sub("through").point(m["through"])
	if err != nil {
		return geom.Segment{}, geom.Vec{}, err
	}
	if mid.Near(cur) || mid.Near(to) {
		return geom.Segment{}, geom.Vec{}, l.sub("through").errf("must lie between the arc's ends, not on one of them")
	}
	return geom.ArcThrough(cur, mid, to), to, nil
}

// slot is a straight slot's centreline and width, in mm.
type slot struct {
	from, to geom.Vec
	width    float64
}

// slot reads from, to and width.
func (t table) slot() (slot, error) {
	var s slot
	for _, k := range slotKeys {
		if !t.has(k) {
			return s, t.errf("a slot needs from, to and width; %s is missing", k)
		}
	}
	var err error
	if s.from, err = t.at("from").point(t.m["from"]); err != nil {
		return s, err
	}
	if s.to, err = t.at("to").point(t.m["to"]); err != nil {
		return s, err
	}
	s.width, err = t.at("width").length(t.m["width"])
	return s, err
}
