//go:build reference

package geosref

/*
#include <geos_c.h>
*/
import "C"

import (
	"fmt"
	"unsafe"
)

// Buffer returns p grown by d (shrunk when d < 0) with round joins, each quarter circle drawn
// with quadSegs chords, as GEOS computes it. GEOS inscribes those chords in the true circle and
// first drops input corners that lie within |d|/100 of the chord past them on the side away from
// the growth (see the reference tests for what that means for its area).
func Buffer(p Polygon, d float64, quadSegs int) ([]Polygon, error) {
	if quadSegs < 1 {
		return nil, fmt.Errorf("geosref: quadSegs must be at least 1, got %d", quadSegs)
	}
	return with(func(c *context) ([]Polygon, error) {
		g, err := c.polygon(p)
		if err != nil {
			return nil, err
		}
		defer c.free(g)
		b := C.GEOSBufferWithStyle_r(c.h, g, C.double(d), C.int(quadSegs),
			C.GEOSBUF_CAP_ROUND, C.GEOSBUF_JOIN_ROUND, 5)
		if b == nil {
			return nil, c.fail("buffer")
		}
		defer c.free(b)
		return c.polygons(b)
	})
}

// Union returns the area covered by any of ps, as disjoint polygons.
func Union(ps ...Polygon) ([]Polygon, error) {
	return with(func(c *context) ([]Polygon, error) {
		u, err := c.union(ps)
		if err != nil {
			return nil, err
		}
		defer c.free(u)
		return c.polygons(u)
	})
}

// Difference returns the area covered by a and not by b.
func Difference(a, b []Polygon) ([]Polygon, error) {
	return binary(a, b, "difference", func(c *context, x, y *C.GEOSGeometry) *C.GEOSGeometry {
		return C.GEOSDifference_r(c.h, x, y)
	})
}

// Intersection returns the area covered by both a and b.
func Intersection(a, b []Polygon) ([]Polygon, error) {
	return binary(a, b, "intersection", func(c *context, x, y *C.GEOSGeometry) *C.GEOSGeometry {
		return C.GEOSIntersection_r(c.h, x, y)
	})
}

// Validate returns GEOS's reason why p is not a valid polygon, or nil when it is: rings that
// cross or touch along a stretch, holes outside the outer ring, and the like.
func Validate(p Polygon) error {
	_, err := with(func(c *context) (struct{}, error) {
		g, err := c.polygon(p)
		if err != nil {
			return struct{}{}, err
		}
		defer c.free(g)
		switch C.GEOSisValid_r(c.h, g) {
		case 1:
			return struct{}{}, nil
		case 0:
			r := C.GEOSisValidReason_r(c.h, g)
			defer C.GEOSFree_r(c.h, unsafe.Pointer(r))
			return struct{}{}, fmt.Errorf("geosref: invalid polygon: %s", C.GoString(r))
		}
		return struct{}{}, c.fail("validity")
	})
	return err
}

// union returns the union of ps as one GEOS geometry owned by the caller.
func (c *context) union(ps []Polygon) (*C.GEOSGeometry, error) {
	col, err := c.collection(ps)
	if err != nil {
		return nil, err
	}
	defer c.free(col)
	u := C.GEOSUnaryUnion_r(c.h, col)
	if u == nil {
		return nil, c.fail("union")
	}
	return u, nil
}

// binary unions each side, applies op to the two unions and reads the polygons out.
func binary(a, b []Polygon, name string,
	op func(c *context, x, y *C.GEOSGeometry) *C.GEOSGeometry) ([]Polygon, error) {
	return with(func(c *context) ([]Polygon, error) {
		x, err := c.union(a)
		if err != nil {
			return nil, fmt.Errorf("first operand: %w", err)
		}
		defer c.free(x)
		y, err := c.union(b)
		if err != nil {
			return nil, fmt.Errorf("second operand: %w", err)
		}
		defer c.free(y)
		r := op(c, x, y)
		if r == nil {
			return nil, c.fail(name)
		}
		defer c.free(r)
		return c.polygons(r)
	})
}
