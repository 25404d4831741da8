package cad

import (
	"fmt"
	"math"
	"strconv"

	"panto/geom"
)

// pathScanner reads the numbers and flags of SVG path data and point lists.
type pathScanner struct {
	s string
	i int
}

func (p *pathScanner) skipSep() {
	for p.i < len(p.s) && (p.s[p.i] == ' ' || p.s[p.i] == ',' || p.s[p.i] == '\t' || p.s[p.i] == '\n' || p.s[p.i] == '\r' || p.s[p.i] == '\f') {
		p.i++
	}
}

// more reports whether a number follows.
func (p *pathScanner) more() bool {
	p.skipSep()
	if p.i >= len(p.s) {
		return false
	}
	c := p.s[p.i]
	return c == '-' || c == '+' || c == '.' || c >= '0' && c <= '9'
}

// number reads one number: sign, digits, a point, digits, an exponent. "1.5.5" is 1.5 then .5.
func (p *pathScanner) number() (float64, error) {
	p.skipSep()
	start := p.i
	if p.i < len(p.s) && (p.s[p.i] == '-' || p.s[p.i] == '+') {
		p.i++
	}
	digits := p.digits()
	if p.i < len(p.s) && p.s[p.i] == '.' {
		p.i++
		digits += p.digits()
	}
	if digits == 0 {
		return 0, fmt.Errorf("expected a number at %q", clip(p.s[start:]))
	}
	if p.i < len(p.s) && (p.s[p.i] == 'e' || p.s[p.i] == 'E') {
		j := p.i + 1
		if j < len(p.s) && (p.s[j] == '-' || p.s[j] == '+') {
			j++
		}
		if j < len(p.s) && p.s[j] >= '0' && p.s[j] <= '9' {
			p.i = j
			p.digits()
		}
	}
	v, err := strconv.ParseFloat(p.s[start:p.i], 64)
	if err != nil || math.IsInf(v, 0) {
		return 0, fmt.Errorf("number %q is out of range", clip(p.s[start:p.i]))
	}
	return v, nil
}

func (p *pathScanner) digits() int {
	n := 0
	for p.i < len(p.s) && p.s[p.i] >= '0' && p.s[p.i] <= '9' {
		p.i++
		n++
	}
	return n
}

// flag reads an arc flag, 0 or 1, which may stand without a separator before the next number.
func (p *pathScanner) flag() (bool, error) {
	p.skipSep()
	if p.i < len(p.s) && (p.s[p.i] == '0' || p.s[p.i] == '1') {
		p.i++
		return p.s[p.i-1] == '1', nil
	}
	return false, fmt.Errorf("expected an arc flag, 0 or 1, at %q", clip(p.s[p.i:]))
}

// numbers reads n numbers.
func (p *pathScanner) numbers(n int) ([]float64, error) {
	out := make([]float64, n)
	for i := range out {
		v, err := p.number()
		if err != nil {
			return nil, err
		}
		out[i] = v
	}
	return out, nil
}

// pathBuilder turns path commands into segments in millimetres.
type pathBuilder struct {
	m        affine
	tol      float64
	segs     []geom.Segment
	cur      geom.Vec // current point, user units
	start    geom.Vec // start of the subpath
	ctrl     geom.Vec // last control point, for S and T
	lastCmd  byte
	maxItems int
}

func (b *pathBuilder) lineTo(p geom.Vec) {
	if p != b.cur {
		b.segs = append(b.segs, geom.Line(b.m.apply(b.cur), b.m.apply(p)))
	}
	b.cur = p
}

// bezier adds a cubic (or, with three points, quadratic) Bézier from the current point,
// flattened within tol after mapping; Béziers are affine invariant, so the control points are
// mapped first.
func (b *pathBuilder) bezier(pts ...geom.Vec) {
	cp := []geom.Vec{b.m.apply(b.cur)}
	for _, p := range pts {
		cp = append(cp, b.m.apply(p))
	}
	b.segs = flattenBezier(b.segs, cp, b.tol, 0)
	b.cur = pts[len(pts)-1]
}

// bezierDepth bounds the halving of one Bézier: 2^16 chords is far more than any tolerance on a
// drawing of a part needs.
const bezierDepth = 16

// flattenBezier appends chords within tol of the Bézier with control points cp. The curve lies
// in the hull of its control points, so when every control point is within tol of the chord,
// so is the curve.
func flattenBezier(out []geom.Segment, cp []geom.Vec, tol float64, depth int) []geom.Segment {
	a, z := cp[0], cp[len(cp)-1]
	chord := geom.Line(a, z)
	flat := true
	for _, p := range cp[1 : len(cp)-1] {
		if chord.DistanceTo(p) > tol {
			flat = false
		}
	}
	if flat || depth >= bezierDepth || len(out) >= maxSegments {
		if a != z {
			out = append(out, chord)
		}
		return out
	}
	left, right := splitBezier(cp)
	out = flattenBezier(out, left, tol, depth+1)
	return flattenBezier(out, right, tol, depth+1)
}

// splitBezier halves a Bézier by de Casteljau's construction.
func splitBezier(cp []geom.Vec) ([]geom.Vec, []geom.Vec) {
	n := len(cp)
	left, right := make([]geom.Vec, n), make([]geom.Vec, n)
	w := append([]geom.Vec(nil), cp...)
	for k := 0; k < n; k++ {
		left[k], right[n-1-k] = w[0], w[n-1-k]
		for i := 0; i < n-1-k; i++ {
			w[i] = w[i].Lerp(w[i+1], 0.5)
		}
	}
	return left, right
}

// arcTo adds an elliptical arc to p (SVG's endpoint form), converted to centre form as the SVG
// specification's implementation notes give it: a true arc when it is circular and the map a
// similarity, chords otherwise.
func (b *pathBuilder) arcTo(rx, ry, phiDeg float64, large, sweep bool, p geom.Vec) {
	p1 := b.cur
	if p1 == p {
		return
	}
	rx, ry = math.Abs(rx), math.Abs(ry)
	if rx == 0 || ry == 0 {
		b.lineTo(p)
		return
	}
	phi := phiDeg * math.Pi / 180
	h := p1.Sub(p).Mul(0.5).Rotate(-phi)
	if l := h.X*h.X/(rx*rx) + h.Y*h.Y/(ry*ry); l > 1 {
		rx, ry = rx*math.Sqrt(l), ry*math.Sqrt(l)
	}
	num := rx*rx*ry*ry - rx*rx*h.Y*h.Y - ry*ry*h.X*h.X
	den := rx*rx*h.Y*h.Y + ry*ry*h.X*h.X
	coef := math.Sqrt(math.Max(0, num/den))
	if large == sweep {
		coef = -coef
	}
	cp := geom.V(coef*rx*h.Y/ry, -coef*ry*h.X/rx)
	center := cp.Rotate(phi).Add(p1.Lerp(p, 0.5))
	u := geom.V((h.X-cp.X)/rx, (h.Y-cp.Y)/ry)
	v := geom.V((-h.X-cp.X)/rx, (-h.Y-cp.Y)/ry)
	t1 := u.Angle()
	dt := math.Atan2(u.Cross(v), u.Dot(v))
	if !sweep && dt > 0 {
		dt -= 2 * math.Pi
	} else if sweep && dt < 0 {
		dt += 2 * math.Pi
	}
	segs := ellipseArc(b.m, center, rx, ry, phi, t1, dt, b.tol)
	if len(segs) == 1 && segs[0].IsArc() {
		segs[0].A, segs[0].B = b.m.apply(p1), b.m.apply(p) // the ends as written, exactly
	}
	b.segs = append(b.segs, segs...)
	b.cur = p
}

// pathData reads SVG path data d into segments in millimetres through m.
func pathData(d string, m affine, tol float64) ([]geom.Segment, error) {
	p := &pathScanner{s: d}
	b := &pathBuilder{m: m, tol: tol}
	var cmd byte
	for {
		p.skipSep()
		if p.i >= len(p.s) {
			return b.segs, nil
		}
		if c := p.s[p.i]; isPathCommand(c) {
			if cmd == 0 && c|0x20 != 'm' {
				return nil, fmt.Errorf("path data must start with M or m, got %q", clip(p.s[p.i:]))
			}
			cmd = c
			p.i++
		} else if cmd == 0 {
			return nil, fmt.Errorf("path data must start with M or m, got %q", clip(p.s[p.i:]))
		} else if cmd == 'Z' || cmd == 'z' {
			return nil, fmt.Errorf("expected a command after Z, got %q", clip(p.s[p.i:]))
		}
		if err := b.command(p, cmd); err != nil {
			return nil, err
		}
		if len(b.segs) > maxSegments {
			return nil, fmt.Errorf("more than %d segments: far larger than any part", maxSegments)
		}
		// A moveto followed by more pairs treats them as linetos.
		if cmd == 'M' {
			cmd = 'L'
		} else if cmd == 'm' {
			cmd = 'l'
		}
	}
}

func isPathCommand(c byte) bool {
	switch c | 0x20 {
	case 'm', 'l', 'h', 'v', 'c', 's', 'q', 't', 'a', 'z':
		return true
	}
	return false
}

// command reads the arguments of one command and draws it.
func (b *pathBuilder) command(p *pathScanner, cmd byte) error {
	rel := cmd >= 'a'
	up := cmd &^ 0x20
	at := func(x, y float64) geom.Vec {
		if rel {
			return b.cur.Add(geom.V(x, y))
		}
		return geom.V(x, y)
	}
	if up == 'Z' {
		b.lineTo(b.start)
		b.ctrl, b.lastCmd = b.cur, 'Z'
		return nil
	}
	n := map[byte]int{'M': 2, 'L': 2, 'H': 1, 'V': 1, 'C': 6, 'S': 4, 'Q': 4, 'T': 2, 'A': 7}[up]
	var v []float64
	var err error
	if up == 'A' {
		v, err = p.arcArgs()
	} else {
		v, err = p.numbers(n)
	}
	if err != nil {
		return fmt.Errorf("%c: %w", cmd, err)
	}
	b.draw(up, v, at, rel)
	return nil
}

// arcArgs reads rx ry rotation large-arc-flag sweep-flag x y.
func (p *pathScanner) arcArgs() ([]float64, error) {
	v, err := p.numbers(3)
	if err != nil {
		return nil, err
	}
	for k := 0; k < 2; k++ {
		f, err := p.flag()
		if err != nil {
			return nil, err
		}
		v = append(v, map[bool]float64{false: 0, true: 1}[f])
	}
	xy, err := p.numbers(2)
	return append(v, xy...), err
}

// draw performs one command with its numbers v.
func (b *pathBuilder) draw(up byte, v []float64, at func(x, y float64) geom.Vec, rel bool) {
	last := b.lastCmd
	b.lastCmd = up
	switch up {
	case 'M':
		b.cur = at(v[0], v[1])
		b.start, b.ctrl = b.cur, b.cur
	case 'L', 'T':
		to := at(v[0], v[1])
		if up == 'T' {
			c := b.cur
			if last == 'Q' || last == 'T' {
				c = b.cur.Mul(2).Sub(b.ctrl)
			}
			b.ctrl = c
			b.bezier(c, to)
			return
		}
		b.lineTo(to)
	case 'H':
		x := v[0]
		if rel {
			x += b.cur.X
		}
		b.lineTo(geom.V(x, b.cur.Y))
	case 'V':
		y := v[0]
		if rel {
			y += b.cur.Y
		}
		b.lineTo(geom.V(b.cur.X, y))
	case 'C', 'S':
		var c1 geom.Vec
		rest := v
		if up == 'C' {
			c1, rest = at(v[0], v[1]), v[2:]
		} else {
			c1 = b.cur
			if last == 'C' || last == 'S' {
				c1 = b.cur.Mul(2).Sub(b.ctrl)
			}
		}
		c2, to := at(rest[0], rest[1]), at(rest[2], rest[3])
		b.ctrl = c2
		b.bezier(c1, c2, to)
		return
	case 'Q':
		c, to := at(v[0], v[1]), at(v[2], v[3])
		b.ctrl = c
		b.bezier(c, to)
		return
	case 'A':
		b.arcTo(v[0], v[1], v[2], v[3] == 1, v[4] == 1, at(v[5], v[6]))
	}
	b.ctrl = b.cur
}
