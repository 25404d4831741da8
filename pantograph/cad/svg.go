package cad

import (
	"bytes"
	"encoding/xml"
	"errors"
	"fmt"
	"io"
	"math"
	"strings"

	"panto/geom"
	"panto/pantograph"
)

// svgFrame is what an open element passes to its children.
type svgFrame struct {
	m     affine
	layer string
	skip  bool // inside defs, text, clip paths and the like: not drawn as outlines
}

// maxSVGDepth bounds element nesting; real drawings nest a handful of groups.
const maxSVGDepth = 1000

// svgReader walks an SVG document.
type svgReader struct {
	file  string
	dec   *xml.Decoder
	src   []byte
	found *Drawing
	opts  Options
	stack []svgFrame
}

// ReadSVG reads an SVG drawing into loose segments in millimetres, +Y up. The size comes from
// the root's width and height (with units) and viewBox; a file sized in px or not at all is
// read at 96 px per inch with a warning, unless opts.Units says what a user unit is.
func ReadSVG(file string, src []byte, opts Options) (*Drawing, error) {
	r := &svgReader{file: file, dec: xml.NewDecoder(bytes.NewReader(src)), src: src,
		found: &Drawing{File: file}, opts: opts}
	r.dec.Strict = true
	r.dec.CharsetReader = func(_ string, in io.Reader) (io.Reader, error) { return in, nil }
	rootSeen := false
	for {
		off := r.dec.InputOffset()
		tok, err := r.dec.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			return nil, &Error{File: file, Line: r.lineAt(r.dec.InputOffset()), Msg: "not well-formed XML: " + xmlMsg(err)}
		}
		switch t := tok.(type) {
		case xml.StartElement:
			if !rootSeen {
				if t.Name.Local != "svg" {
					return nil, &Error{File: file, Line: r.lineAt(off), Msg: fmt.Sprintf("the root element is <%s>, not <svg>: is this an SVG file?", t.Name.Local)}
				}
				rootSeen = true
				if err := r.root(t, r.lineAt(off)); err != nil {
					return nil, err
				}
				continue
			}
			if err := r.start(t, r.lineAt(off)); err != nil {
				return nil, err
			}
		case xml.EndElement:
			if len(r.stack) > 0 {
				r.stack = r.stack[:len(r.stack)-1]
			}
		}
	}
	if !rootSeen {
		return nil, &Error{File: file, Msg: "no <svg> element: is this an SVG file?"}
	}
	return r.found, nil
}

// lineAt returns the line of byte offset off.
func (r *svgReader) lineAt(off int64) int {
	off = max(0, min(off, int64(len(r.src))))
	return 1 + bytes.Count(r.src[:off], []byte("\n"))
}

// xmlMsg strips the position the XML package adds, since the error names the line itself.
func xmlMsg(err error) string {
	var se *xml.SyntaxError
	if errors.As(err, &se) {
		return se.Msg
	}
	return err.Error()
}

// attr returns the attribute with the local name n, or "".
func attr(t xml.StartElement, n string) string {
	for _, a := range t.Attr {
		if a.Name.Local == n && (a.Name.Space == "" || n == "label") {
			return strings.TrimSpace(a.Value)
		}
	}
	return ""
}

// notDrawn are elements whose content is not part of the drawing's outlines.
var notDrawn = map[string]bool{"defs": true, "symbol": true, "clipPath": true, "mask": true,
	"pattern": true, "marker": true, "text": true, "title": true, "desc": true, "metadata": true,
	"style": true, "linearGradient": true, "radialGradient": true, "filter": true, "script": true,
	"foreignObject": true, "image": true, "use": true, "switch": true}

// start handles an element below the root.
func (r *svgReader) start(t xml.StartElement, line int) error {
	if len(r.stack) == 0 {
		return &Error{File: r.file, Line: line, What: "<" + t.Name.Local + ">", Msg: "an element after </svg>: a file holds one drawing"}
	}
	parent := r.stack[len(r.stack)-1]
	if len(r.stack) >= maxSVGDepth {
		return &Error{File: r.file, Line: line, What: "<" + t.Name.Local + ">", Msg: fmt.Sprintf("elements nest more than %d deep", maxSVGDepth)}
	}
	f := parent
	name := t.Name.Local
	if parent.skip || t.Name.Space != "" && t.Name.Space != svgNS {
		f.skip = true
		r.stack = append(r.stack, f)
		return nil
	}
	if notDrawn[name] || hidden(t) {
		if hidden(t) {
			name += " hidden"
		}
		r.found.skip("<" + name + ">")
		f.skip = true
		r.stack = append(r.stack, f)
		return nil
	}
	tr, err := parseTransform(attr(t, "transform"))
	if err != nil {
		return &Error{File: r.file, Line: line, What: "<" + name + ">", Msg: "transform: " + err.Error()}
	}
	f.m = tr.then(parent.m)
	if name == "g" || name == "svg" {
		if l := attr(t, "label"); l != "" {
			f.layer = l
		} else if id := attr(t, "id"); id != "" {
			f.layer = id
		}
		if name == "svg" {
			x, y := attr(t, "x"), attr(t, "y")
			xy, _ := plainNumbers(x + " " + y)
			if len(xy) == 2 {
				f.m = translation(xy[0], xy[1]).then(f.m)
			}
		}
	}
	r.stack = append(r.stack, f)
	return r.shape(t, f, line)
}

// hidden reports whether an element is not displayed (display="none", also in its style), as
// drawing programs write hidden layers: what the user does not see is not part of the part.
func hidden(t xml.StartElement) bool {
	if attr(t, "display") == "none" {
		return true
	}
	style := strings.ReplaceAll(attr(t, "style"), " ", "")
	return strings.Contains(";"+style, ";display:none")
}

// svgNS is the SVG namespace; elements of other namespaces (editor metadata) are not drawn.
const svgNS = "http://www.w3.org/2000/svg"

// shape draws one shape element.
func (r *svgReader) shape(t xml.StartElement, f svgFrame, line int) error {
	name := t.Name.Local
	what := "<" + name + ">"
	if id := attr(t, "id"); id != "" {
		what = fmt.Sprintf("<%s id=%q>", name, id)
	}
	segs, err := shapeSegments(t, f.m, r.opts.chordTol())
	if err != nil {
		return &Error{File: r.file, Line: line, What: what, Msg: err.Error()}
	}
	if segs == nil && !drawnShapes[name] && name != "g" && name != "svg" && name != "a" {
		r.found.skip("<" + name + ">")
	}
	for _, s := range segs {
		if !s.A.IsFinite() || !s.B.IsFinite() || !s.Center.IsFinite() {
			return &Error{File: r.file, Line: line, What: what, Msg: "a coordinate is too large to be a drawing of a part"}
		}
		if len(r.found.Items) >= maxSegments {
			return &Error{File: r.file, Line: line, What: what, Msg: fmt.Sprintf("more than %d segments: far larger than any part", maxSegments)}
		}
		r.found.Items = append(r.found.Items, Item{Seg: s, Layer: f.layer, Line: line, What: what, Name: attr(t, "id")})
	}
	return nil
}

var drawnShapes = map[string]bool{"path": true, "rect": true, "circle": true, "ellipse": true,
	"line": true, "polyline": true, "polygon": true}

// shapeSegments returns the segments of a shape element in millimetres, or nil for elements
// that draw nothing.
func shapeSegments(t xml.StartElement, m affine, tol float64) ([]geom.Segment, error) {
	switch t.Name.Local {
	case "path":
		return pathData(attr(t, "d"), m, tol)
	case "rect":
		return rectSegments(t, m, tol)
	case "circle", "ellipse":
		v, err := numAttrs(t, "cx", "cy", "r", "rx", "ry")
		if err != nil {
			return nil, err
		}
		rx, ry := v[2], v[2]
		if t.Name.Local == "ellipse" {
			rx, ry = v[3], v[4]
		}
		if !(rx > 0 && ry > 0) {
			return nil, nil // a zero radius disables the element
		}
		return ellipseArc(m, geom.V(v[0], v[1]), rx, ry, 0, 0, 2*math.Pi, tol), nil
	case "line":
		v, err := numAttrs(t, "x1", "y1", "x2", "y2")
		if err != nil {
			return nil, err
		}
		return []geom.Segment{geom.Line(m.apply(geom.V(v[0], v[1])), m.apply(geom.V(v[2], v[3])))}, nil
	case "polyline", "polygon":
		return polySegments(t, m)
	}
	return nil, nil
}

// numAttrs reads the named attributes as plain numbers (or px), 0 when absent.
func numAttrs(t xml.StartElement, names ...string) ([]float64, error) {
	out := make([]float64, len(names))
	for i, n := range names {
		s := strings.TrimSuffix(attr(t, n), "px")
		if s == "" {
			continue
		}
		v, err := plainNumbers(s)
		if err != nil || len(v) != 1 {
			return nil, fmt.Errorf("%s=%q: expected a plain number (units on coordinates are not read)", n, clip(attr(t, n)))
		}
		out[i] = v[0]
	}
	return out, nil
}

// plainNumbers reads a list of numbers separated by spaces or commas.
func plainNumbers(s string) ([]float64, error) {
	p := &pathScanner{s: s}
	var out []float64
	for p.more() {
		v, err := p.number()
		if err != nil {
			return nil, err
		}
		out = append(out, v)
	}
	if p.skipSep(); p.i < len(p.s) {
		return nil, fmt.Errorf("unexpected %q", clip(p.s[p.i:]))
	}
	return out, nil
}

func polySegments(t xml.StartElement, m affine) ([]geom.Segment, error) {
	v, err := plainNumbers(attr(t, "points"))
	if err != nil {
		return nil, fmt.Errorf("points: %v", err)
	}
	if len(v)%2 == 1 {
		return nil, fmt.Errorf("points: an odd count of numbers (%d): every point needs x and y", len(v))
	}
	var out []geom.Segment
	n := len(v) / 2
	last := n - 1
	if t.Name.Local == "polygon" {
		last = n
	}
	for i := 0; i < last && n > 1; i++ {
		j := (i + 1) % n
		a, b := m.apply(geom.V(v[2*i], v[2*i+1])), m.apply(geom.V(v[2*j], v[2*j+1]))
		if a != b {
			out = append(out, geom.Line(a, b))
		}
	}
	return out, nil
}

// rectSegments draws a rectangle, its corners rounded by rx and ry when given.
func rectSegments(t xml.StartElement, m affine, tol float64) ([]geom.Segment, error) {
	v, err := numAttrs(t, "x", "y", "width", "height", "rx", "ry")
	if err != nil {
		return nil, err
	}
	x, y, w, h := v[0], v[1], v[2], v[3]
	if !(w > 0 && h > 0) {
		return nil, nil
	}
	rx, ry := v[4], v[5]
	if attr(t, "rx") == "" {
		rx = ry
	}
	if attr(t, "ry") == "" {
		ry = rx
	}
	rx, ry = math.Min(math.Max(rx, 0), w/2), math.Min(math.Max(ry, 0), h/2)
	pt := func(px, py float64) geom.Vec { return m.apply(geom.V(px, py)) }
	if rx == 0 || ry == 0 {
		return []geom.Segment{geom.Line(pt(x, y), pt(x+w, y)), geom.Line(pt(x+w, y), pt(x+w, y+h)),
			geom.Line(pt(x+w, y+h), pt(x, y+h)), geom.Line(pt(x, y+h), pt(x, y))}, nil
	}
	var out []geom.Segment
	corner := func(cx, cy, a0 float64) {
		out = append(out, ellipseArc(m, geom.V(cx, cy), rx, ry, 0, a0, math.Pi/2, tol)...)
	}
	line := func(ax, ay, bx, by float64) {
		if ax != bx || ay != by {
			out = append(out, geom.Line(pt(ax, ay), pt(bx, by)))
		}
	}
	line(x+rx, y, x+w-rx, y)
	corner(x+w-rx, y+ry, -math.Pi/2)
	line(x+w, y+ry, x+w, y+h-ry)
	corner(x+w-rx, y+h-ry, 0)
	line(x+w-rx, y+h, x+rx, y+h)
	corner(x+rx, y+h-ry, math.Pi/2)
	line(x, y+h-ry, x, y+ry)
	corner(x+rx, y+ry, math.Pi)
	return out, nil
}

// root reads the <svg> element's size and sets the map from user units to millimetres, +Y up.
func (r *svgReader) root(t xml.StartElement, line int) error {
	m, err := r.userToMM(t, line)
	if err != nil {
		return err
	}
	r.stack = append(r.stack, svgFrame{m: m})
	return nil
}

// userToMM works out millimetres per user unit from width, height and viewBox, and flips y so
// that +Y points up with the bottom edge of the page at y = 0.
func (r *svgReader) userToMM(t xml.StartElement, line int) (affine, error) {
	sz, err := readRootSize(t)
	if err != nil {
		return affine{}, &Error{File: r.file, Line: line, What: "<svg>", Msg: err.Error()}
	}
	kx, ky := sz.scales()
	r.found.Units = pantograph.MM
	if sz.wu == "in" || sz.hu == "in" {
		r.found.Units = pantograph.Inch
	}
	switch physical := isPhysical(sz.wu) || isPhysical(sz.hu); {
	case r.opts.Units != "" && !physical:
		kx, ky = unitScale(r.opts.Units), unitScale(r.opts.Units)
		r.found.UnitsNote = fmt.Sprintf("--units %s: one SVG user unit is 1 %s", r.opts.Units, r.opts.Units)
		r.found.Units = r.opts.Units
	case r.opts.Units != "":
		r.found.UnitsNote = fmt.Sprintf("size from width/height (--units %s sets only the part file's units)", r.opts.Units)
		r.found.Units = r.opts.Units
	case physical:
		r.found.UnitsNote = fmt.Sprintf("width %q, height %q: %.6g mm per user unit", attr(t, "width"), attr(t, "height"), kx)
	default:
		r.found.UnitsNote = "no physical size (width and height in px or absent): assumed 96 px per inch"
		r.found.warnf("%s:%d: <svg> gives no physical size; read at 96 px per inch (%.6g mm per px). "+
			"Check the part's size, or give --units mm if one unit of the drawing is a millimetre",
			r.file, line, 25.4/96)
	}
	if math.Abs(kx-ky) > 1e-9*math.Max(kx, ky) {
		// preserveAspectRatio's default (xMidYMid meet) scales uniformly by the smaller factor.
		kx, ky = math.Min(kx, ky), math.Min(kx, ky)
		r.found.warnf("%s:%d: <svg> width/height and viewBox differ in proportion: read at the smaller scale, %.6g mm per unit", r.file, line, kx)
	}
	pageH := 0.0
	if sz.vb != nil {
		pageH = sz.vb[3] * ky
	} else if sz.h > 0 {
		pageH = sz.h * unitMM(sz.hu)
	}
	ox, oy := 0.0, 0.0
	if sz.vb != nil {
		ox, oy = sz.vb[0], sz.vb[1]
	}
	return translation(-ox, -oy).then(scaling(kx, -ky)).then(translation(0, pageH)), nil
}

// rootSize is what the <svg> element says of its size.
type rootSize struct {
	w, h   float64 // 0 when absent
	wu, hu string  // their CSS units
	vb     []float64
}

func readRootSize(t xml.StartElement) (rootSize, error) {
	var sz rootSize
	if s := attr(t, "viewBox"); s != "" {
		vb, err := plainNumbers(s)
		if err != nil || len(vb) != 4 || !(vb[2] > 0 && vb[3] > 0) {
			return sz, fmt.Errorf("viewBox=%q: expected four numbers, min-x min-y width height, the sizes greater than 0", clip(s))
		}
		sz.vb = vb
	}
	var err error
	if sz.w, sz.wu, err = parseLength(attr(t, "width")); err != nil {
		return sz, fmt.Errorf("width: %v", err)
	}
	if sz.h, sz.hu, err = parseLength(attr(t, "height")); err != nil {
		return sz, fmt.Errorf("height: %v", err)
	}
	return sz, nil
}

// scales returns millimetres per user unit along x and y: CSS px without a viewBox, else the
// viewport's size over the viewBox's (a missing width or height follows the other).
func (z rootSize) scales() (float64, float64) {
	kx, ky := 25.4/96, 25.4/96
	if z.vb == nil {
		return kx, ky
	}
	if z.w > 0 {
		kx = z.w * unitMM(z.wu) / z.vb[2]
	}
	if z.h > 0 {
		ky = z.h * unitMM(z.hu) / z.vb[3]
	}
	if z.w > 0 && z.h == 0 {
		ky = kx
	} else if z.h > 0 && z.w == 0 {
		kx = ky
	}
	return kx, ky
}
