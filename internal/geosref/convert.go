//go:build reference

package geosref

/*
#include <stdlib.h>
#include <geos_c.h>
*/
import "C"

import (
	"fmt"
	"math"
	"unsafe"
)

// Polygon is an area bounded by one outer ring, less its holes. A ring lists its corners
// once each, without repeating the first at the end; its direction does not matter on input.
type Polygon struct {
	Outer [][2]float64
	Holes [][][2]float64
}

// ring makes a GEOS linear ring of pts, closing it.
func (c *context) ring(pts [][2]float64) (*C.GEOSGeometry, error) {
	if len(pts) < 3 {
		return nil, fmt.Errorf("geosref: a ring needs at least 3 points, got %d", len(pts))
	}
	buf := make([]float64, 0, 2*len(pts)+2)
	for _, p := range pts {
		buf = append(buf, p[0], p[1])
	}
	buf = append(buf, pts[0][0], pts[0][1])
	seq := C.GEOSCoordSeq_copyFromBuffer_r(c.h, (*C.double)(unsafe.Pointer(&buf[0])),
		C.uint(len(pts)+1), 0, 0)
	if seq == nil {
		return nil, c.fail("coordinate sequence")
	}
	r := C.GEOSGeom_createLinearRing_r(c.h, seq) // takes seq
	if r == nil {
		return nil, c.fail("linear ring")
	}
	return r, nil
}

// polygon makes a GEOS polygon of p; the caller owns the result.
func (c *context) polygon(p Polygon) (*C.GEOSGeometry, error) {
	shell, err := c.ring(p.Outer)
	if err != nil {
		return nil, err
	}
	n := len(p.Holes)
	holes := (**C.GEOSGeometry)(C.calloc(C.size_t(max(n, 1)), C.size_t(unsafe.Sizeof(shell))))
	defer C.free(unsafe.Pointer(holes))
	hs := unsafe.Slice(holes, max(n, 1))
	for i, h := range p.Holes {
		if hs[i], err = c.ring(h); err != nil {
			c.free(shell)
			for _, g := range hs[:i] {
				c.free(g)
			}
			return nil, fmt.Errorf("hole %d: %w", i, err)
		}
	}
	g := C.GEOSGeom_createPolygon_r(c.h, shell, holes, C.uint(n)) // takes shell and holes
	if g == nil {
		return nil, c.fail("polygon")
	}
	return g, nil
}

// collection makes a GEOS geometry collection of ps; the caller owns the result. A collection,
// unlike a multipolygon, may hold polygons that overlap, which is what a union's input is.
func (c *context) collection(ps []Polygon) (*C.GEOSGeometry, error) {
	n := len(ps)
	arr := (**C.GEOSGeometry)(C.calloc(C.size_t(max(n, 1)), C.size_t(unsafe.Sizeof(uintptr(0)))))
	defer C.free(unsafe.Pointer(arr))
	gs := unsafe.Slice(arr, max(n, 1))
	for i, p := range ps {
		g, err := c.polygon(p)
		if err != nil {
			for _, h := range gs[:i] {
				c.free(h)
			}
			return nil, fmt.Errorf("polygon %d: %w", i, err)
		}
		gs[i] = g
	}
	col := C.GEOSGeom_createCollection_r(c.h, C.GEOS_GEOMETRYCOLLECTION, arr, C.uint(n))
	if col == nil {
		return nil, c.fail("collection")
	}
	return col, nil
}

// polygons reads every polygon out of g, descending into multipolygons and collections and
// skipping points and lines (which an intersection can leave where shapes only touch).
func (c *context) polygons(g *C.GEOSGeometry) ([]Polygon, error) {
	if C.GEOSisEmpty_r(c.h, g) == 1 {
		return nil, nil
	}
	switch C.GEOSGeomTypeId_r(c.h, g) {
	case C.GEOS_POLYGON:
		p, err := c.readPolygon(g)
		if err != nil {
			return nil, err
		}
		return []Polygon{p}, nil
	case C.GEOS_MULTIPOLYGON, C.GEOS_GEOMETRYCOLLECTION:
		var out []Polygon
		n := int(C.GEOSGetNumGeometries_r(c.h, g))
		for i := 0; i < n; i++ {
			ps, err := c.polygons(C.GEOSGetGeometryN_r(c.h, g, C.int(i)))
			if err != nil {
				return nil, err
			}
			out = append(out, ps...)
		}
		return out, nil
	}
	return nil, nil
}

// readPolygon copies one GEOS polygon out.
func (c *context) readPolygon(g *C.GEOSGeometry) (Polygon, error) {
	outer, err := c.readRing(C.GEOSGetExteriorRing_r(c.h, g))
	if err != nil {
		return Polygon{}, err
	}
	p := Polygon{Outer: outer}
	n := int(C.GEOSGetNumInteriorRings_r(c.h, g))
	for i := 0; i < n; i++ {
		h, err := c.readRing(C.GEOSGetInteriorRingN_r(c.h, g, C.int(i)))
		if err != nil {
			return Polygon{}, err
		}
		p.Holes = append(p.Holes, h)
	}
	return p, nil
}

// readRing copies a ring's points, dropping the repeated closing point.
func (c *context) readRing(r *C.GEOSGeometry) ([][2]float64, error) {
	seq := C.GEOSGeom_getCoordSeq_r(c.h, r) // owned by r
	if seq == nil {
		return nil, c.fail("ring coordinates")
	}
	var size C.uint
	if C.GEOSCoordSeq_getSize_r(c.h, seq, &size) == 0 {
		return nil, c.fail("ring size")
	}
	if size == 0 {
		return nil, nil
	}
	buf := make([]float64, 2*int(size))
	if C.GEOSCoordSeq_copyToBuffer_r(c.h, seq, (*C.double)(unsafe.Pointer(&buf[0])), 0, 0) == 0 {
		return nil, c.fail("copy ring")
	}
	pts := make([][2]float64, 0, size)
	for i := 0; i+1 < len(buf); i += 2 {
		pts = append(pts, [2]float64{buf[i], buf[i+1]})
	}
	if len(pts) > 1 && pts[0] == pts[len(pts)-1] {
		pts = pts[:len(pts)-1]
	}
	return pts, nil
}

// ringArea returns the unsigned area inside a ring by the shoelace formula.
func ringArea(pts [][2]float64) float64 {
	var a float64
	for i, p := range pts {
		q := pts[(i+1)%len(pts)]
		a += p[0]*q[1] - q[0]*p[1]
	}
	return math.Abs(a) / 2
}

// Area returns the total area of ps: each outer ring's less its holes'.
func Area(ps []Polygon) float64 {
	var a float64
	for _, p := range ps {
		a += ringArea(p.Outer)
		for _, h := range p.Holes {
			a -= ringArea(h)
		}
	}
	return a
}

// ringLength returns the length of a closed ring.
func ringLength(pts [][2]float64) float64 {
	var l float64
	for i, p := range pts {
		q := pts[(i+1)%len(pts)]
		l += math.Hypot(q[0]-p[0], q[1]-p[1])
	}
	return l
}

// Perimeter returns the length of every ring of ps.
func Perimeter(ps []Polygon) float64 {
	var l float64
	for _, p := range ps {
		l += ringLength(p.Outer)
		for _, h := range p.Holes {
			l += ringLength(h)
		}
	}
	return l
}

// Vertices returns how many corners ps have in all.
func Vertices(ps []Polygon) int {
	n := 0
	for _, p := range ps {
		n += len(p.Outer)
		for _, h := range p.Holes {
			n += len(h)
		}
	}
	return n
}
