package cad

import (
	"fmt"
	"math"
	"strings"

	"panto/geom"
)

// unitMM returns millimetres per CSS unit u ("" and "px" are px, 1/96 inch, by CSS Values).
func unitMM(u string) float64 {
	switch u {
	case "mm":
		return 1
	case "cm":
		return 10
	case "q":
		return 0.25
	case "in":
		return 25.4
	case "pt":
		return 25.4 / 72
	case "pc":
		return 25.4 / 6
	}
	return 25.4 / 96
}

// isPhysical reports whether u is a unit of physical length rather than px or none.
func isPhysical(u string) bool { return u != "" && u != "px" }

// parseLength reads a CSS length such as "10mm" or "250"; an empty or percentage length gives 0,
// which callers read as absent.
func parseLength(s string) (float64, string, error) {
	if s == "" || strings.HasSuffix(s, "%") {
		return 0, "", nil
	}
	p := &pathScanner{s: s}
	v, err := p.number()
	if err != nil {
		return 0, "", err
	}
	u := strings.ToLower(strings.TrimSpace(p.s[p.i:]))
	switch u {
	case "", "px", "mm", "cm", "q", "in", "pt", "pc":
	default:
		return 0, "", fmt.Errorf("%q: unit %q is not a length panto knows (mm, cm, in, pt, pc, px)", clip(s), u)
	}
	if !(v > 0) {
		return 0, "", fmt.Errorf("%q: must be greater than 0", clip(s))
	}
	return v, u, nil
}

// parseTransform reads an SVG transform list: translate, scale, rotate, matrix, skewX, skewY,
// applied right to left as SVG says.
func parseTransform(s string) (affine, error) {
	m := identity()
	rest := strings.TrimSpace(s)
	for rest != "" {
		open := strings.IndexByte(rest, '(')
		shut := strings.IndexByte(rest, ')')
		if open < 0 || shut < open {
			return affine{}, fmt.Errorf("expected name(numbers), got %q", clip(rest))
		}
		name := strings.TrimSpace(rest[:open])
		args, err := plainNumbers(rest[open+1 : shut])
		if err != nil {
			return affine{}, fmt.Errorf("%s: %v", name, err)
		}
		t, err := oneTransform(name, args)
		if err != nil {
			return affine{}, err
		}
		m = t.then(m) // the rightmost applies first
		rest = strings.TrimLeft(rest[shut+1:], " ,\t\r\n")
	}
	if !m.isFinite() {
		return affine{}, fmt.Errorf("%q gives numbers too large to draw", clip(s))
	}
	return m, nil
}

func oneTransform(name string, a []float64) (affine, error) {
	bad := func(want string) (affine, error) {
		return affine{}, fmt.Errorf("%s takes %s, got %d numbers", name, want, len(a))
	}
	switch name {
	case "translate":
		switch len(a) {
		case 1:
			return translation(a[0], 0), nil
		case 2:
			return translation(a[0], a[1]), nil
		}
		return bad("1 or 2 numbers")
	case "scale":
		switch len(a) {
		case 1:
			return scaling(a[0], a[0]), nil
		case 2:
			return scaling(a[0], a[1]), nil
		}
		return bad("1 or 2 numbers")
	case "rotate":
		switch len(a) {
		case 1:
			return rotation(a[0] * math.Pi / 180), nil
		case 3:
			return translation(-a[1], -a[2]).then(rotation(a[0] * math.Pi / 180)).then(translation(a[1], a[2])), nil
		}
		return bad("1 or 3 numbers")
	case "matrix":
		if len(a) != 6 {
			return bad("6 numbers")
		}
		return affine{a[0], a[1], a[2], a[3], a[4], a[5]}, nil
	case "skewX", "skewY":
		if len(a) != 1 {
			return bad("1 number")
		}
		k := math.Tan(a[0] * math.Pi / 180)
		if name == "skewX" {
			return affine{a: 1, c: k, d: 1}, nil
		}
		return affine{a: 1, b: k, d: 1}, nil
	}
	return affine{}, fmt.Errorf("%q is not a transform (translate, scale, rotate, matrix, skewX, skewY)", name)
}

// pointString formats a point in the drawing's units for messages.
func pointString(p geom.Vec, perMM float64) string {
	return fmt.Sprintf("(%.4f, %.4f)", p.X*perMM, p.Y*perMM)
}
