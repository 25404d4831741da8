// This file writes a pantograph.Part as a part file, the TOML text Read reads, laid out for a
// machinist to read and edit, with comments saying where each feature came from. Reading the
// file back gives the same geometry (see the round-trip tests).

package partfile

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"strings"

	"panto/geom"
	"panto/internal/numfmt"
	"panto/pantograph"
)

// Encoder writes part files. Header lines, if any, are written as comments at the top.
type Encoder struct {
	Header []string
}

// Encode writes p as a part file with no header.
func Encode(w io.Writer, p pantograph.Part) error { return Encoder{}.Encode(w, p) }

// Encode writes p in its own units (p.Units; millimetres when empty).
func (e Encoder) Encode(w io.Writer, p pantograph.Part) error {
	pw := &writer{b: bufio.NewWriter(w), scale: 1, units: pantograph.MM}
	if p.Units == pantograph.Inch {
		pw.scale, pw.units = pantograph.MMPerInch, pantograph.Inch
	}
	for _, h := range e.Header {
		pw.linef("# %s", h)
	}
	if len(e.Header) > 0 {
		pw.linef("")
	}
	pw.head(p)
	if err := pw.outlineTable("[profile]", p.Profile); err != nil {
		return fmt.Errorf("partfile: profile: %w", err)
	}
	for _, f := range p.Features {
		if err := pw.feature(f); err != nil {
			return fmt.Errorf("partfile: %s: %w", f.Label(), err)
		}
	}
	return pw.b.Flush()
}

// writer writes one part file; lengths are divided by scale to be in the file's units.
type writer struct {
	b     *bufio.Writer
	scale float64
	units pantograph.Units
}

func (w *writer) linef(format string, args ...any) {
	fmt.Fprintf(w.b, format, args...)
	w.b.WriteByte('\n')
}

func (w *writer) head(p pantograph.Part) {
	w.linef("name = %s", quote(p.Name))
	w.linef("units = %s            # every length below is in %s", quote(string(w.units)), unitWord(w.units))
	w.linef("datum = %s            # the point the dials are zeroed on", w.point(p.Datum))
	w.linef("")
	w.linef("[stock]")
	if p.Stock.Material != "" {
		w.linef("material = %s", quote(p.Stock.Material))
	} else {
		w.linef(`# material = "brass"`)
	}
	if p.Stock.Thickness > 0 {
		w.linef("thickness = %s", w.num(p.Stock.Thickness))
	} else {
		w.linef("# thickness = 1.5     # give it: depths are checked against it")
	}
}

func unitWord(u pantograph.Units) string {
	if u == pantograph.Inch {
		return "inches"
	}
	return "millimetres"
}

// num formats a length in the file's units, rounded to a billionth of a unit so that float
// noise (31.000000000000004) does not reach the file.
func (w *writer) num(mm float64) string {
	return numfmt.File(mm / w.scale)
}

func (w *writer) point(p geom.Vec) string {
	return "[" + w.num(p.X) + ", " + w.num(p.Y) + "]"
}

// source returns a comment naming where the feature was drawn, or "".
func source(f pantograph.Feature) string {
	if f.Where.File == "" {
		return ""
	}
	return "# from " + f.Where.String()
}

// quote writes s as a TOML basic string.
func quote(s string) string {
	var b strings.Builder
	b.WriteByte('"')
	for _, r := range s {
		switch {
		case r == '"' || r == '\\':
			b.WriteByte('\\')
			b.WriteRune(r)
		case r < 0x20 || r == 0x7f:
			fmt.Fprintf(&b, `\u%04X`, r)
		default:
			b.WriteRune(r)
		}
	}
	b.WriteByte('"')
	return b.String()
}

// errHoles is returned for a region with holes, which a part file outline cannot hold.
var errHoles = errors.New("an outline with islands cannot be written as one part-file shape")

// outlineTable writes a table holding one outline: the profile, a cut-out or a pocket.
func (w *writer) outlineTable(header string, f pantograph.Feature) error {
	if len(f.Region.Holes) > 0 {
		return errHoles
	}
	if len(f.Region.Outer) == 0 {
		return errors.New("no outline")
	}
	w.linef("")
	if s := source(f); s != "" {
		w.linef("%s", s)
	}
	w.linef("%s", header)
	if header != "[profile]" {
		w.linef("name = %s", quote(f.Name))
	}
	w.shape(f.Region.Outer)
	return nil
}

// shape writes a contour as a circle, a list of points, or a path of lines and arcs.
func (w *writer) shape(c geom.Contour) {
	if len(c) == 1 && c[0].IsFullCircle() {
		w.linef("circle = { center = %s, diameter = %s }", w.point(c[0].Center), w.num(2*c[0].Radius()))
		return
	}
	arcs := false
	for _, s := range c {
		arcs = arcs || s.IsArc()
	}
	if !arcs {
		pts := make([]string, len(c))
		for i, s := range c {
			pts[i] = w.point(s.A)
		}
		w.list("points", pts)
		return
	}
	w.linef("path = [")
	w.linef("  { at = %s },", w.point(c[0].A))
	for _, s := range c {
		if !s.IsArc() {
			w.linef("  { line = %s },", w.point(s.B))
			continue
		}
		w.linef("  { arc = %s, through = %s },    # R%s about %s", w.point(s.B), w.point(s.Mid()),
			w.num(s.Radius()), w.point(s.Center))
	}
	w.linef("]")
}

// list writes key = [items], several to a line.
func (w *writer) list(key string, items []string) {
	if len(items) <= 4 {
		w.linef("%s = [%s]", key, strings.Join(items, ", "))
		return
	}
	w.linef("%s = [", key)
	for i := 0; i < len(items); i += 4 {
		w.linef("  %s,", strings.Join(items[i:min(i+4, len(items))], ", "))
	}
	w.linef("]")
}

// depth writes a feature's depth, or a commented line asking for it.
func (w *writer) depth(d pantograph.Depth) {
	switch {
	case d.Through:
		w.linef(`depth = "through"`)
	case d.Given():
		w.linef("depth = %s", w.num(d.MM))
	default:
		w.linef(`# depth = ?           # not in the drawing: give a depth or "through"`)
	}
}

func (w *writer) feature(f pantograph.Feature) error {
	header := "[[" + string(f.Kind) + "]]"
	switch f.Kind {
	case pantograph.KindCutout:
		return w.outlineTable(header, f)
	case pantograph.KindPocket:
		if err := w.outlineTable(header, f); err != nil {
			return err
		}
		w.depth(f.Depth)
	case pantograph.KindHoles:
		w.simpleHead(header, f)
		w.linef("diameter = %s", w.num(f.Diameter))
		w.depth(f.Depth)
		pts := make([]string, len(f.Centers))
		for i, c := range f.Centers {
			pts[i] = w.point(c)
		}
		w.list("at", pts)
	case pantograph.KindSlot:
		w.simpleHead(header, f)
		w.linef("from = %s\nto = %s\nwidth = %s", w.point(f.From), w.point(f.To), w.num(f.Width))
		w.depth(f.Depth)
	case pantograph.KindGroove:
		w.simpleHead(header, f)
		pts := make([]string, len(f.Path))
		for i, p := range f.Path {
			pts[i] = w.point(p)
		}
		w.list("points", pts)
		if f.Width > 0 {
			w.linef("width = %s", w.num(f.Width))
		}
		w.depth(f.Depth)
	default:
		return fmt.Errorf("kind %q has no part-file table", f.Kind)
	}
	return nil
}

func (w *writer) simpleHead(header string, f pantograph.Feature) {
	w.linef("")
	if s := source(f); s != "" {
		w.linef("%s", s)
	}
	w.linef("%s", header)
	w.linef("name = %s", quote(f.Name))
}
