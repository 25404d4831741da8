// Package stl writes triangle meshes as binary STL files, the form every slicer reads.
//
// A file is an 80-byte header, the triangle count as a little-endian uint32, and 50 bytes per
// triangle: its outward normal and three corners as little-endian float32 (x, y, z), and a
// zero attribute word. Lengths are written in millimetres, the unit slicers assume. The old
// rule that every coordinate be positive is kept: Encode refuses a mesh that reaches below
// zero, so callers place their solid in the positive octant first.
package stl

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"strings"

	hstl "github.com/hschendel/stl"

	"panto/geom"
)

// headerSize is the fixed size of a binary STL header (3D Systems StereoLithography Interface
// Specification, 1989).
const headerSize = 80

// ErrNegative is returned by Encode for a mesh with a coordinate below zero.
var ErrNegative = errors.New("stl: mesh has a coordinate below zero; move it into the positive octant first")

// Solid returns m as a solid of the STL library, its header set to title. The header is cut to
// 80 bytes, and never starts with "solid", which would make readers take it for a text file.
func Solid(m geom.Mesh, title string) *hstl.Solid {
	s := &hstl.Solid{Name: title}
	h := make([]byte, headerSize)
	if strings.HasPrefix(strings.ToLower(title), "solid") {
		title = "panto " + title
	}
	copy(h, title)
	s.SetBinaryHeader(h)
	s.Triangles = make([]hstl.Triangle, len(m.Triangles))
	for i := range m.Triangles {
		a, b, c := m.Corners(i)
		n := m.Normal(i)
		s.Triangles[i] = hstl.Triangle{
			Normal:   vec(n),
			Vertices: [3]hstl.Vec3{vec(a), vec(b), vec(c)},
		}
	}
	return s
}

// vec converts a point to the file's single precision.
func vec(p geom.Vec3) hstl.Vec3 { return hstl.Vec3{float32(p.X), float32(p.Y), float32(p.Z)} }

// Encode writes m to w as a binary STL file whose header holds title. The bytes depend only on
// m and title.
func Encode(w io.Writer, m geom.Mesh, title string) error {
	lo, _ := m.Bounds()
	if len(m.Points) > 0 && (lo.X < 0 || lo.Y < 0 || lo.Z < 0) {
		return ErrNegative
	}
	if uint64(len(m.Triangles)) > 1<<32-1 {
		return fmt.Errorf("stl: %d triangles are more than a file can count", len(m.Triangles))
	}
	bw := bufio.NewWriter(w)
	if err := Solid(m, title).WriteAll(bw); err != nil {
		return fmt.Errorf("stl: %w", err)
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("stl: %w", err)
	}
	return nil
}

// Size returns the size in bytes of the file Encode writes for n triangles: 84 + 50·n.
func Size(n int) int64 { return headerSize + 4 + 50*int64(n) }
