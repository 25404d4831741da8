package stl

import (
	"bytes"
	"encoding/binary"
	"errors"
	"math"
	"testing"

	hstl "github.com/hschendel/stl"

	"panto/geom"
)

// plate returns a small closed mesh: a rounded plate with a round hole, 1 to 5 mm high.
func plate(t testing.TB) geom.Mesh {
	t.Helper()
	c, err := geom.Rect(geom.V(1, 1), geom.V(40, 20), 3)
	if err != nil {
		t.Fatal(err)
	}
	m, err := geom.NewRegion(c, geom.Circle(geom.V(20, 10), 4)).Extrude(1, 5, 0.01)
	if err != nil {
		t.Fatal(err)
	}
	return m
}

func TestEncode(t *testing.T) {
	m := plate(t)
	var buf bytes.Buffer
	if err := Encode(&buf, m, "calibration coupon"); err != nil {
		t.Fatal(err)
	}
	b := buf.Bytes()
	// 3D Systems' specification: 80-byte header, uint32 count, 50 bytes per facet.
	if got, want := int64(len(b)), 84+50*int64(len(m.Triangles)); got != want {
		t.Errorf("file size: got %d, want %d", got, want)
	}
	if got, want := Size(len(m.Triangles)), int64(len(b)); got != want {
		t.Errorf("Size: got %d, want %d", got, want)
	}
	if got, want := binary.LittleEndian.Uint32(b[80:84]), uint32(len(m.Triangles)); got != want {
		t.Errorf("count: got %d, want %d", got, want)
	}
	if bytes.HasPrefix(b, []byte("solid")) {
		t.Errorf("header starts with %q, which marks a text file", b[:5])
	}
	s, err := hstl.ReadAll(bytes.NewReader(b))
	if err != nil {
		t.Fatal(err)
	}
	if errs := s.Validate(); len(errs) != 0 {
		for i, e := range errs {
			t.Errorf("triangle %d: %+v", i, *e)
			break
		}
		t.Errorf("Validate found %d faulty triangles, want 0", len(errs))
	}
	if !s.IsInPositive() {
		t.Errorf("coordinates below zero")
	}
	for i := range m.Triangles {
		a, _, _ := m.Corners(i)
		got := s.Triangles[i].Vertices[0]
		if want := vec(a); got != want {
			t.Fatalf("triangle %d corner: got %v, want %v", i, got, want)
		}
		n := m.Normal(i)
		dot := float64(s.Triangles[i].Normal[0])*n.X + float64(s.Triangles[i].Normal[1])*n.Y + float64(s.Triangles[i].Normal[2])*n.Z
		if math.Abs(dot-1) > 1e-6 { // float32 rounding of a unit vector
			t.Fatalf("triangle %d normal: got %v, want %v", i, s.Triangles[i].Normal, n)
		}
	}
	var again bytes.Buffer
	if err := Encode(&again, m, "calibration coupon"); err != nil || !bytes.Equal(again.Bytes(), b) {
		t.Errorf("a second write differs (err %v)", err)
	}
}

func TestEncodeHeader(t *testing.T) {
	tests := []struct{ title, want string }{
		{"clock bridge", "clock bridge"},
		{"solid block", "panto solid block"},
		{string(bytes.Repeat([]byte("x"), 100)), string(bytes.Repeat([]byte("x"), 80))},
	}
	for _, tc := range tests {
		t.Run(tc.want, func(t *testing.T) {
			var buf bytes.Buffer
			if err := Encode(&buf, plate(t), tc.title); err != nil {
				t.Fatal(err)
			}
			got := string(bytes.TrimRight(buf.Bytes()[:80], "\x00"))
			if got != tc.want {
				t.Errorf("header: got %q, want %q", got, tc.want)
			}
		})
	}
}

func TestEncodeRejectsNegative(t *testing.T) {
	m := plate(t).Translate(geom.Vec3{X: -5})
	if err := Encode(&bytes.Buffer{}, m, "x"); !errors.Is(err, ErrNegative) {
		t.Errorf("got %v, want ErrNegative", err)
	}
}

func BenchmarkEncode(b *testing.B) {
	c, _ := geom.Rect(geom.V(0, 0), geom.V(400, 300), 5)
	var holes []geom.Contour
	for i := range 40 {
		for j := range 30 {
			holes = append(holes, geom.Circle(geom.V(float64(5+10*i), float64(5+10*j)), 2))
		}
	}
	m, err := geom.NewRegion(c, holes...).Extrude(0, 5, 0.0025)
	if err != nil {
		b.Fatal(err)
	}
	b.ReportMetric(float64(len(m.Triangles)), "triangles")
	b.ResetTimer()
	for range b.N {
		var buf bytes.Buffer
		if err := Encode(&buf, m, "bench"); err != nil {
			b.Fatal(err)
		}
		b.SetBytes(int64(buf.Len()))
	}
}
