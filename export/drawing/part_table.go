package drawing

import (
	"fmt"
	"math"
	"sort"
	"strconv"

	"github.com/tdewolff/canvas"

	"panto/geom"
	"panto/pantograph"
)

// This file describes every feature of a part as rows of a coordinate table, from which the
// part can be inspected: each hole's centre and diameter; a round opening's centre and
// diameter; a slot's centreline ends and width; a groove's points and its width when stated;
// and an outline corner by corner. A corner rounded by an arc tangent to both its straight
// edges is given where the edges meet (the sharp corner a square would have) with the radius
// that rounds it, as corners are dimensioned on a drawing; any other arc by its centre and
// radius, with the points where it meets its neighbours.

// tangentTol is how nearly, in radians, an arc's end must run along a straight edge to count
// as rounding the corner: the part reader builds rounded corners tangent to within rounding
// error, and a drawing's arcs joined by eye miss by far more (derived).
const tangentTol = 1e-6

// maxOutlineRows is the most rows one outline is given before it is summed up in one row: a
// drawing read from a CAD file can have hundreds of short edges, which the DXF carries better
// than a table (common practice, no source).
const maxOutlineRows = 40

// tableRow is one row of the feature table: a point of a feature with its size, all in the
// part frame in mm (the writer converts to the part's units).
type tableRow struct {
	number int
	name   string // the feature's name and kind, written on its first row only
	what   string // "hole", "corner", "centre", ...
	at     geom.Vec
	size   string  // "Ø", "R" or "width", written before sizeMM; words alone when sizeMM is 0
	sizeMM float64 // mm
	depth  pantograph.Depth
	first  bool
}

// featureRows returns the table's rows for part: the profile and every feature, in the order
// of their numbers (unnumbered ones last, in file order).
func featureRows(part pantograph.Part, numbers []int) []tableRow {
	all := part.All()
	order := make([]int, len(all))
	for i := range order {
		order[i] = i
	}
	key := func(i int) int {
		if numbers[i] == 0 {
			return math.MaxInt
		}
		return numbers[i]
	}
	sort.SliceStable(order, func(a, b int) bool { return key(order[a]) < key(order[b]) })
	var out []tableRow
	for _, i := range order {
		f := all[i]
		rows := rowsOf(f)
		for k := range rows {
			rows[k].number, rows[k].depth, rows[k].name = numbers[i], f.Depth, featureWords(f)
			if f.Kind == pantograph.KindProfile || f.Kind == pantograph.KindCutout {
				rows[k].depth = pantograph.Depth{Through: true}
			}
		}
		if len(rows) > 0 {
			rows[0].first = true
		}
		out = append(out, rows...)
	}
	return out
}

// featureWords names a feature in the table: its name and its kind in words.
func featureWords(f pantograph.Feature) string {
	kind := map[pantograph.Kind]string{pantograph.KindProfile: "profile", pantograph.KindCutout: "cut-out",
		pantograph.KindPocket: "pocket", pantograph.KindHoles: "holes", pantograph.KindSlot: "slot",
		pantograph.KindGroove: "groove"}[f.Kind]
	if f.Name == "" || f.Name == kind || f.Name == string(f.Kind) {
		return kind
	}
	return f.Name + " (" + kind + ")"
}

// rowsOf describes one feature's geometry.
func rowsOf(f pantograph.Feature) []tableRow {
	var out []tableRow
	switch f.Kind {
	case pantograph.KindHoles:
		for _, c := range f.Centers {
			out = append(out, tableRow{what: "hole", at: c, size: "Ø", sizeMM: f.Diameter})
		}
	case pantograph.KindSlot:
		out = append(out, tableRow{what: "end", at: f.From, size: "width", sizeMM: f.Width},
			tableRow{what: "end", at: f.To})
	case pantograph.KindGroove:
		for k, p := range f.Path {
			r := tableRow{what: "point", at: p}
			if k == 0 && f.Width > 0 {
				r.size, r.sizeMM = "width", f.Width
			}
			out = append(out, r)
		}
	default:
		for _, c := range f.Region.Contours() {
			out = append(out, outlineRows(c)...)
		}
	}
	return out
}

// outlineRows describes one closed contour: a circle by its centre and diameter, anything else
// corner by corner.
func outlineRows(c geom.Contour) []tableRow {
	if ctr, r, ok := circleOf(c); ok {
		return []tableRow{{what: "centre", at: ctr, size: "Ø", sizeMM: 2 * r}}
	}
	n := len(c)
	fillet := make([]bool, n)
	for i := range c {
		fillet[i] = isFillet(c[(i+n-1)%n], c[i], c[(i+1)%n])
	}
	var out []tableRow
	for i, s := range c {
		prev := (i + n - 1) % n
		if !fillet[i] && !fillet[prev] {
			what := "point"
			if !s.IsArc() && !c[prev].IsArc() {
				what = "corner"
			}
			out = append(out, tableRow{what: what, at: s.A})
		}
		switch {
		case fillet[i]:
			out = append(out, tableRow{what: "corner", at: lineMeet(c[prev], c[(i+1)%n]), size: "R", sizeMM: s.Radius()})
		case s.IsArc():
			out = append(out, tableRow{what: "arc centre", at: s.Center, size: "R", sizeMM: s.Radius()})
		}
	}
	if len(out) > maxOutlineRows {
		b := c.Bounds()
		return []tableRow{{what: "box corner", at: b.Min, size: fmt.Sprintf("%d edges:", n)},
			{what: "box corner", at: b.Max, size: "see part.dxf"}}
	}
	return out
}

// circleOf reports whether c is a whole circle, and its centre and radius.
func circleOf(c geom.Contour) (geom.Vec, float64, bool) {
	if len(c) == 0 || !c[0].IsArc() {
		return geom.Vec{}, 0, false
	}
	sweep := 0.0
	for _, s := range c {
		if !s.IsArc() || s.Center.Dist(c[0].Center) > tangentTol*s.Radius() || math.Abs(s.Radius()-c[0].Radius()) > tangentTol*s.Radius() {
			return geom.Vec{}, 0, false
		}
		sweep += s.Sweep
	}
	return c[0].Center, c[0].Radius(), math.Abs(math.Abs(sweep)-2*math.Pi) < tangentTol
}

// isFillet reports whether arc s rounds the corner between the straight edges before and
// after it, running along each where it meets it. A half turn or more between parallel edges
// is a rounded end, not a corner.
func isFillet(before, s, after geom.Segment) bool {
	if !s.IsArc() || before.IsArc() || after.IsArc() || math.Abs(s.Sweep) >= math.Pi-tangentTol {
		return false
	}
	in, out := before.B.Sub(before.A).Unit(), after.B.Sub(after.A).Unit()
	return math.Abs(in.Cross(s.Tangent(0))) < tangentTol && in.Dot(s.Tangent(0)) > 0 &&
		math.Abs(out.Cross(s.Tangent(1))) < tangentTol && out.Dot(s.Tangent(1)) > 0
}

// lineMeet returns where the lines through segments a and b cross, or a's end when they are
// parallel (a rounded end, which has no corner).
func lineMeet(a, b geom.Segment) geom.Vec {
	da, db := a.B.Sub(a.A), b.B.Sub(b.A)
	den := da.Cross(db)
	if math.Abs(den) < tangentTol*da.Len()*db.Len() {
		return a.B
	}
	t := b.A.Sub(a.A).Cross(db) / den
	return a.A.Add(da.Mul(t))
}

// tableColumns are the left edges of the table's columns, mm from the page's left edge, and
// their headings.
var (
	tableColumns = []float64{0, 9, 58, 86, 108, 130, 152}
	tableHeads   = []string{"#", "feature", "point", "X", "Y", "size", "depth"}
)

// table writes as many rows as fit below top on page k, with the table's heading, and returns
// how many it wrote.
func (l partLayout) table(k *sketch, rows []tableRow, top float64) int {
	y := top
	head := "(" + l.unitWord() + "; X and Y from the datum). A corner is where its straight edges meet; R rounds it."
	k.text(geom.V(0, y), 10, true, "Features", canvas.Left)
	k.text(geom.V(20, y), 8, false, head, canvas.Left)
	y -= tableLine + 1
	for i, h := range tableHeads {
		k.text(geom.V(tableColumns[i], y), 8.5, true, h, canvas.Left)
	}
	k.line(geom.V(0, y-1.5), geom.V(l.size.X, y-1.5), markLine)
	n := 0
	for _, r := range rows {
		y -= tableLine
		if y < 4 {
			break
		}
		if r.first && n > 0 {
			k.line(geom.V(0, y+tableLine-1.6), geom.V(l.size.X, y+tableLine-1.6), markLine*0.5)
		}
		for j, c := range l.cells(r) {
			if c != "" {
				k.text(geom.V(tableColumns[j], y), 8.5, false, l.fit(c, j), canvas.Left)
			}
		}
		n++
	}
	return n
}

// cells returns a row's text, column by column.
func (l partLayout) cells(r tableRow) []string {
	c := make([]string, len(tableColumns))
	if r.first {
		if r.number > 0 {
			c[0] = "#" + strconv.Itoa(r.number)
		}
		c[1], c[6] = r.name, l.depth(r.depth)
	}
	c[2] = r.what
	p := r.at.Sub(l.part.Datum)
	c[3], c[4] = l.length(p.X), l.length(p.Y)
	switch {
	case r.size == "Ø" || r.size == "R":
		c[5] = r.size + l.length(r.sizeMM)
	case r.size != "" && r.sizeMM == 0:
		c[5] = r.size
	case r.size != "":
		c[5] = r.size + " " + l.length(r.sizeMM)
	}
	return c
}

// fit shortens s with an ellipsis until it fits column j.
func (l partLayout) fit(s string, j int) string {
	room := l.size.X - tableColumns[j]
	if j+1 < len(tableColumns) {
		room = tableColumns[j+1] - tableColumns[j] - 1.5
	}
	rs := []rune(s)
	for len(rs) > 1 && l.fonts.Width(string(rs), 8.5, false) > room {
		rs = append(rs[:len(rs)-2], '…')
	}
	return string(rs)
}
