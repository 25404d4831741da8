package dxf

import (
	"math"
	"strconv"

	"panto/geom"
)

// header writes the drawing variables: the file version, millimetres, and the next free handle
// (written large enough that no handle this writer gives can reach it).
func (e *encoder) header() {
	e.pair(0, "SECTION")
	e.pair(2, "HEADER")
	e.pair(9, "$ACADVER")
	e.pair(1, "AC1015")
	e.pair(9, "$HANDSEED")
	e.pair(5, "FFFFFFF")
	e.pair(9, "$INSUNITS")
	e.int(70, 4)
	e.pair(9, "$MEASUREMENT")
	e.int(70, 1)
	e.pair(0, "ENDSEC")
}

// table writes a table head; the caller writes its records and ENDTAB.
func (e *encoder) table(name string, count int) string {
	e.pair(0, "TABLE")
	e.pair(2, name)
	h := e.newHandle()
	e.pair(330, "0")
	e.pair(100, "AcDbSymbolTable")
	e.int(70, count)
	return h
}

// record writes the common head of a table record.
func (e *encoder) record(kind, owner, subclass string) {
	e.pair(0, kind)
	e.newHandle()
	e.pair(330, owner)
	e.pair(100, "AcDbSymbolTableRecord")
	e.pair(100, subclass)
}

func (e *encoder) tables(layers []Layer) {
	e.pair(0, "SECTION")
	e.pair(2, "TABLES")
	e.ltypes()
	t := e.table("LAYER", len(layers))
	for _, l := range layers {
		e.record("LAYER", t, "AcDbLayerTableRecord")
		e.pair(2, l.Name)
		e.int(70, 0)
		e.int(62, l.Color)
		e.pair(6, "Continuous")
		e.pair(390, "0")
	}
	e.pair(0, "ENDTAB")
	t = e.table("STYLE", 1)
	e.record("STYLE", t, "AcDbTextStyleTableRecord")
	e.pair(2, "Standard")
	e.int(70, 0)
	e.num(40, 0)
	e.num(41, 1)
	e.num(50, 0)
	e.int(71, 0)
	e.num(42, 2.5)
	e.pair(3, "txt")
	e.pair(4, "")
	e.pair(0, "ENDTAB")
	t = e.table("APPID", 1)
	e.record("APPID", t, "AcDbRegAppTableRecord")
	e.pair(2, "ACAD")
	e.int(70, 0)
	e.pair(0, "ENDTAB")
	t = e.table("BLOCK_RECORD", 2)
	for _, n := range []string{"*Model_Space", "*Paper_Space"} {
		e.record("BLOCK_RECORD", t, "AcDbBlockTableRecord")
		e.pair(2, n)
	}
	e.pair(0, "ENDTAB")
	e.pair(0, "ENDSEC")
}

// ltypes writes the line types every DXF reader expects to find.
func (e *encoder) ltypes() {
	t := e.table("LTYPE", 3)
	for _, n := range []string{"ByBlock", "ByLayer", "Continuous"} {
		e.record("LTYPE", t, "AcDbLinetypeTableRecord")
		e.pair(2, n)
		e.int(70, 0)
		desc := ""
		if n == "Continuous" {
			desc = "Solid line"
		}
		e.pair(3, desc)
		e.int(72, 65)
		e.int(73, 0)
		e.num(40, 0)
	}
	e.pair(0, "ENDTAB")
}

// blocks writes the two layout blocks a drawing of this version must have.
func (e *encoder) blocks() {
	e.pair(0, "SECTION")
	e.pair(2, "BLOCKS")
	for _, n := range []string{"*Model_Space", "*Paper_Space"} {
		e.pair(0, "BLOCK")
		e.newHandle()
		e.pair(100, "AcDbEntity")
		e.pair(8, "0")
		e.pair(100, "AcDbBlockBegin")
		e.pair(2, n)
		e.int(70, 0)
		e.point(10, geom.Vec{})
		e.pair(3, n)
		e.pair(1, "")
		e.pair(0, "ENDBLK")
		e.newHandle()
		e.pair(100, "AcDbEntity")
		e.pair(8, "0")
		e.pair(100, "AcDbBlockEnd")
	}
	e.pair(0, "ENDSEC")
}

// objects writes the root dictionary readers look for.
func (e *encoder) objects() {
	e.pair(0, "SECTION")
	e.pair(2, "OBJECTS")
	e.pair(0, "DICTIONARY")
	e.newHandle()
	e.pair(330, "0")
	e.pair(100, "AcDbDictionary")
	e.int(281, 1)
	e.pair(0, "ENDSEC")
}

// entity writes the common head of an entity.
func (e *encoder) entity(kind, layer, subclass string) {
	e.pair(0, kind)
	e.newHandle()
	e.pair(100, "AcDbEntity")
	e.pair(8, layer)
	e.pair(100, subclass)
}

func (e *encoder) entities(d Drawing) {
	e.pair(0, "SECTION")
	e.pair(2, "ENTITIES")
	for _, o := range d.Outlines {
		e.outline(o)
	}
	for _, c := range d.Circles {
		e.circle(c.Layer, c.Center, c.Radius)
	}
	for _, s := range d.Segments {
		e.segment(s.Layer, s.Seg)
	}
	for _, p := range d.Polylines {
		vs := make([]vertex, len(p.Points))
		for i, pt := range p.Points {
			vs[i] = vertex{p: pt}
		}
		e.lwpolyline(p.Layer, vs, p.Closed)
	}
	for _, t := range d.Texts {
		e.entity("TEXT", t.Layer, "AcDbText")
		e.point(10, t.At)
		e.num(40, t.Height)
		e.pair(1, t.Value)
		e.pair(100, "AcDbText")
	}
	e.pair(0, "ENDSEC")
}

func (e *encoder) circle(layer string, c geom.Vec, r float64) {
	e.entity("CIRCLE", layer, "AcDbCircle")
	e.point(10, c)
	e.num(40, r)
}

// segment writes a line, or an arc turned counter-clockwise as DXF's ARC requires.
func (e *encoder) segment(layer string, s geom.Segment) {
	if !s.IsArc() {
		e.entity("LINE", layer, "AcDbLine")
		e.point(10, s.A)
		e.point(11, s.B)
		return
	}
	if s.IsFullCircle() {
		e.circle(layer, s.Center, s.Radius())
		return
	}
	from, to := s.A, s.B
	if s.Sweep < 0 {
		from, to = to, from
	}
	e.entity("ARC", layer, "AcDbCircle")
	e.point(10, s.Center)
	e.num(40, s.Radius())
	e.pair(100, "AcDbArc")
	e.num(50, degrees(from.Sub(s.Center).Angle()))
	e.num(51, degrees(to.Sub(s.Center).Angle()))
}

func degrees(rad float64) float64 {
	d := rad * 180 / math.Pi
	if d < 0 {
		d += 360
	}
	return d
}

// vertex is a polyline vertex with the bulge of the segment leaving it.
type vertex struct {
	p     geom.Vec
	bulge float64
}

// outline writes a closed contour: a lone full circle as a CIRCLE, anything else as a closed
// LWPOLYLINE whose arcs are bulges. A full-circle arc inside a longer contour cannot be one
// bulge (its tangent is infinite) and is written as two halves.
func (e *encoder) outline(o Outline) {
	c := o.Contour
	if len(c) == 1 && c[0].IsFullCircle() {
		e.circle(o.Layer, c[0].Center, c[0].Radius())
		return
	}
	var vs []vertex
	for _, s := range c {
		if math.Abs(s.Sweep) > math.Pi*1.5 {
			h := s.Sweep / 2
			vs = append(vs, vertex{p: s.A, bulge: math.Tan(h / 4)}, vertex{p: s.At(0.5), bulge: math.Tan(h / 4)})
			continue
		}
		vs = append(vs, vertex{p: s.A, bulge: math.Tan(s.Sweep / 4)})
	}
	e.lwpolyline(o.Layer, vs, true)
}

func (e *encoder) lwpolyline(layer string, vs []vertex, closed bool) {
	e.entity("LWPOLYLINE", layer, "AcDbPolyline")
	e.int(90, len(vs))
	flags := 0
	if closed {
		flags = 1
	}
	e.int(70, flags)
	for _, v := range vs {
		e.num(10, v.p.X)
		e.num(20, v.p.Y)
		if v.bulge != 0 {
			// Written in full: a bulge rounded to 1e-9 moves a large arc's centre visibly.
			e.pair(42, strconv.FormatFloat(v.bulge, 'g', -1, 64))
		}
	}
}
