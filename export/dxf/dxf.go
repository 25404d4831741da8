// Package dxf writes drawings as ASCII DXF (AutoCAD 2000 form, read by laser cutters, CNC
// router programs and CAD programs alike), in millimetres ($INSUNITS 4) with +Y up.
//
// Outlines are written as closed LWPOLYLINEs whose arcs stay arcs (a bulge, the tangent of a
// quarter of the arc's sweep, negative when clockwise), whole circles as CIRCLEs, loose
// segments as LINEs and ARCs, engraved lines as open LWPOLYLINEs and labels as TEXT, each on a
// named layer. The output depends only on the drawing: the same drawing gives the same bytes.
package dxf

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"panto/geom"
	"panto/internal/numfmt"
)

// Drawing is what to write. Every length is in millimetres.
type Drawing struct {
	Layers    []Layer // layers to declare, in order; layers used but not listed get colour 7
	Outlines  []Outline
	Circles   []Circle
	Segments  []Segment
	Polylines []Polyline
	Texts     []Text
}

// Layer is a named layer with an AutoCAD colour number (1 red, 2 yellow, 3 green, 4 cyan,
// 5 blue, 6 magenta, 7 white or black).
type Layer struct {
	Name  string
	Color int
}

// Outline is a closed contour.
type Outline struct {
	Layer   string
	Contour geom.Contour
}

// Circle is a whole circle.
type Circle struct {
	Layer  string
	Center geom.Vec
	Radius float64
}

// Segment is a loose line or arc.
type Segment struct {
	Layer string
	Seg   geom.Segment
}

// Polyline is a chain of straight lines through Points, closed back to the first when Closed.
type Polyline struct {
	Layer  string
	Points []geom.Vec
	Closed bool
}

// Text is a one-line label whose lower left corner is At, Height mm tall.
type Text struct {
	Layer  string
	At     geom.Vec
	Height float64
	Value  string
}

// Encode writes d to w.
func Encode(w io.Writer, d Drawing) error {
	if err := d.validate(); err != nil {
		return err
	}
	e := &encoder{b: bufio.NewWriter(w), handle: 0x100}
	e.header()
	e.tables(d.layers())
	e.blocks()
	e.entities(d)
	e.objects()
	e.pair(0, "EOF")
	return e.b.Flush()
}

// validate rejects what would make a broken file: names DXF cannot hold, numbers that are not
// finite, empty outlines.
func (d Drawing) validate() error {
	for _, l := range d.layers() {
		if l.Name == "" || strings.ContainsAny(l.Name, "<>/\\\":;?*|=`\n\r") {
			return fmt.Errorf("dxf: layer name %q: use letters, digits, spaces, - and _", l.Name)
		}
	}
	for i, o := range d.Outlines {
		if len(o.Contour) == 0 {
			return fmt.Errorf("dxf: outline %d has no segments", i)
		}
		for _, s := range o.Contour {
			if !finite(s.A, s.B, s.Center) {
				return fmt.Errorf("dxf: outline %d: %w", i, errNotFinite)
			}
		}
	}
	for i, c := range d.Circles {
		if !finite(c.Center) || !(c.Radius > 0) || math.IsInf(c.Radius, 0) {
			return fmt.Errorf("dxf: circle %d: radius must be a finite number greater than 0", i)
		}
	}
	for i, t := range d.Texts {
		if strings.ContainsAny(t.Value, "\n\r") || !(t.Height > 0) || !finite(t.At) {
			return fmt.Errorf("dxf: text %d: one line, a height greater than 0 and a finite place", i)
		}
	}
	for i, p := range d.Polylines {
		if len(p.Points) < 2 || !finite(p.Points...) {
			return fmt.Errorf("dxf: polyline %d: needs at least 2 finite points", i)
		}
	}
	return nil
}

var errNotFinite = errors.New("a coordinate is not a finite number")

func finite(ps ...geom.Vec) bool {
	for _, p := range ps {
		if !p.IsFinite() {
			return false
		}
	}
	return true
}

// layers returns the declared layers followed by any used but not declared, layer "0" first.
func (d Drawing) layers() []Layer {
	out := []Layer{{Name: "0", Color: 7}}
	seen := map[string]bool{"0": true}
	add := func(name string, color int) {
		if !seen[name] {
			seen[name] = true
			out = append(out, Layer{Name: name, Color: color})
		}
	}
	for _, l := range d.Layers {
		add(l.Name, max(1, min(255, l.Color)))
	}
	for _, o := range d.Outlines {
		add(o.Layer, 7)
	}
	for _, c := range d.Circles {
		add(c.Layer, 7)
	}
	for _, s := range d.Segments {
		add(s.Layer, 7)
	}
	for _, p := range d.Polylines {
		add(p.Layer, 7)
	}
	for _, t := range d.Texts {
		add(t.Layer, 7)
	}
	return out
}

// encoder writes groups and hands out entity handles.
type encoder struct {
	b      *bufio.Writer
	handle int
}

func (e *encoder) pair(code int, v string) {
	fmt.Fprintf(e.b, "%3d\n%s\n", code, v)
}

func (e *encoder) int(code, v int) { e.pair(code, strconv.Itoa(v)) }

// num writes a number rounded to a nanometre, so float noise does not reach the file.
func (e *encoder) num(code int, v float64) {
	e.pair(code, numfmt.File(v))
}

func (e *encoder) point(code int, p geom.Vec) {
	e.num(code, p.X)
	e.num(code+10, p.Y)
	e.num(code+20, 0)
}

// newHandle writes a fresh handle (group 5) and returns it.
func (e *encoder) newHandle() string {
	e.handle++
	h := strings.ToUpper(strconv.FormatInt(int64(e.handle), 16))
	e.pair(5, h)
	return h
}
