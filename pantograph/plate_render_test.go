package pantograph_test

import (
	"image"
	"image/color"
	"image/png"
	"math"
	"os"
	"path/filepath"
	"testing"

	"panto/geom"
	"panto/pantograph"
	"panto/pantograph/partfile"
)

// renderMesh draws m seen from above and in front, turned by yaw about Z and tipped by pitch,
// with a z-buffer and light from the upper left: a picture to look at, not a check.
func renderMesh(m geom.Mesh, w, h int, yaw, pitch float64) *image.RGBA {
	sy, cy := math.Sincos(yaw)
	sp, cp := math.Sincos(pitch)
	view := func(p geom.Vec3) geom.Vec3 {
		x, y := p.X*cy-p.Y*sy, p.X*sy+p.Y*cy
		return geom.Vec3{X: x, Y: y*cp + p.Z*sp, Z: -y*sp + p.Z*cp} // Z toward the viewer
	}
	pts := make([]geom.Vec3, len(m.Points))
	lo := geom.Vec3{X: math.Inf(1), Y: math.Inf(1)}
	hi := geom.Vec3{X: math.Inf(-1), Y: math.Inf(-1)}
	for i, p := range m.Points {
		q := view(p)
		pts[i] = q
		lo.X, lo.Y = math.Min(lo.X, q.X), math.Min(lo.Y, q.Y)
		hi.X, hi.Y = math.Max(hi.X, q.X), math.Max(hi.Y, q.Y)
	}
	k := 0.95 * math.Min(float64(w)/(hi.X-lo.X), float64(h)/(hi.Y-lo.Y))
	for i, q := range pts {
		pts[i] = geom.Vec3{X: (q.X-lo.X)*k + 0.025*float64(w), Y: float64(h) - ((q.Y-lo.Y)*k + 0.025*float64(h)), Z: q.Z}
	}
	img := image.NewRGBA(image.Rect(0, 0, w, h))
	zbuf := make([]float64, w*h)
	for i := range zbuf {
		zbuf[i] = math.Inf(-1)
		img.Set(i%w, i/w, color.RGBA{235, 235, 240, 255})
	}
	light := geom.Vec3{X: -0.4, Y: 0.5, Z: 0.77}
	_, mhi := m.Bounds()
	top := mhi.Z
	for ti, t := range m.Triangles {
		n := view(m.Normal(ti))
		if n.Z <= 0 {
			continue // facing away
		}
		shade := 0.35 + 0.65*math.Max(0, n.Dot(light))
		// Tint by height, low blue to high orange, so levels read apart from above.
		zc := (m.Points[t[0]].Z + m.Points[t[1]].Z + m.Points[t[2]].Z) / 3 / top
		c := color.RGBA{uint8((60 + 190*zc) * shade), uint8((120 + 40*zc) * shade), uint8((230 - 170*zc) * shade), 255}
		fillTriangle(img, zbuf, pts[t[0]], pts[t[1]], pts[t[2]], c)
	}
	return img
}

// fillTriangle fills the screen triangle a, b, c where it is nearer than what is drawn.
func fillTriangle(img *image.RGBA, zbuf []float64, a, b, c geom.Vec3, col color.RGBA) {
	w, h := img.Bounds().Dx(), img.Bounds().Dy()
	x0, x1 := int(math.Max(0, math.Floor(math.Min(a.X, math.Min(b.X, c.X))))), int(math.Min(float64(w-1), math.Ceil(math.Max(a.X, math.Max(b.X, c.X)))))
	y0, y1 := int(math.Max(0, math.Floor(math.Min(a.Y, math.Min(b.Y, c.Y))))), int(math.Min(float64(h-1), math.Ceil(math.Max(a.Y, math.Max(b.Y, c.Y)))))
	area := (b.X-a.X)*(c.Y-a.Y) - (b.Y-a.Y)*(c.X-a.X)
	if area == 0 {
		return
	}
	for y := y0; y <= y1; y++ {
		for x := x0; x <= x1; x++ {
			px, py := float64(x)+0.5, float64(y)+0.5
			w0 := ((b.X-px)*(c.Y-py) - (b.Y-py)*(c.X-px)) / area
			w1 := ((c.X-px)*(a.Y-py) - (c.Y-py)*(a.X-px)) / area
			w2 := 1 - w0 - w1
			if w0 < 0 || w1 < 0 || w2 < 0 {
				continue
			}
			z := w0*a.Z + w1*b.Z + w2*c.Z
			if z > zbuf[y*w+x] {
				zbuf[y*w+x] = z
				img.SetRGBA(x, y, col)
			}
		}
	}
}

// TestRenderPlates writes a picture of each sample's plate into the folder named by
// PANTO_PLATE_PNG, for a person to look at; without it there is nothing to do.
func TestRenderPlates(t *testing.T) {
	dir := os.Getenv("PANTO_PLATE_PNG")
	if dir == "" {
		t.Skip("set PANTO_PLATE_PNG to a folder to get pictures of the sample plates")
	}
	writeLetteringPNG(t, filepath.Join(dir, "lettering.png"))
	// the bench machine spaces the fixing slots from its file
	bench, err := partfile.ReadMachineFile(filepath.Join("..", "samples", "machines", "bench-pantograph.machine.toml"))
	if err != nil {
		t.Fatal(err)
	}
	for _, name := range []string{"calibration-coupon.toml", "clock-bridge.toml", "pump-port-plate.toml"} {
		for _, v := range []struct {
			o    pantograph.PlateOptions
			m    *pantograph.Machine
			name string
		}{{name: "wall"}, {o: pantograph.PlateOptions{Style: pantograph.StyleGroove, Seat: pantograph.SeatCone}, name: "groove"},
			{m: &bench, name: "bench"}} {
			pl, err := pantograph.BuildPlate(samplePlan(t, name, ""), v.m, v.o)
			if err != nil {
				t.Fatal(err)
			}
			m, err := pl.Mesh()
			if err != nil {
				t.Fatal(err)
			}
			f, err := os.Create(filepath.Join(dir, name+"."+v.name+".png"))
			if err != nil {
				t.Fatal(err)
			}
			if err := png.Encode(f, renderMesh(m, 1600, 1100, -0.35, 0.75)); err != nil {
				t.Fatal(err)
			}
			f.Close()
			f, err = os.Create(filepath.Join(dir, name+"."+v.name+".top.png"))
			if err != nil {
				t.Fatal(err)
			}
			if err := png.Encode(f, renderMesh(m, 1600, 1100, 0, 0)); err != nil {
				t.Fatal(err)
			}
			f.Close()
		}
	}
}

// writeLetteringPNG draws every character of the lettering sunk into a slab, seen from above.
func writeLetteringPNG(t *testing.T, path string) {
	c, _ := geom.Rect(geom.V(0, 0), geom.V(260, 40), 0)
	root := geom.Terrace{Outline: c, Top: 2}
	for i, line := range []string{"0123456789 :.-/+=#?Ø", "ABCDEFGHIJKLMNOPQRSTUVWXYZ"} {
		rs, err := pantograph.TextOutlines(line, geom.V(5, 25-float64(i)*20), 8)
		if err != nil {
			t.Fatal(err)
		}
		for _, r := range rs {
			root.Children = append(root.Children, geom.RegionTerrace(r, 1, 2))
		}
	}
	m, err := geom.StepSolid(0, root, 0.005)
	if err != nil {
		t.Fatal(err)
	}
	f, err := os.Create(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if err := png.Encode(f, renderMesh(m, 1600, 300, 0, 0)); err != nil {
		t.Fatal(err)
	}
}
