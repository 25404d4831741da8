package cad_test

import (
	"fmt"
	"os"

	"panto/pantograph/cad"
)

// A drawing in millimetres: a 20 × 10 plate with a window and two fixing holes.
func ExampleRead() {
	svg := `<svg xmlns="http://www.w3.org/2000/svg" width="20mm" height="10mm" viewBox="0 0 20 10">
  <rect width="20" height="10"/>
  <rect x="8" y="3" width="4" height="4" rx="1"/>
  <circle cx="3" cy="5" r="0.6"/>
  <circle cx="17" cy="5" r="0.6"/>
</svg>`
	part, rep, err := cad.Read("plate.svg", []byte(svg), cad.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	rep.WriteTo(os.Stdout)
	fmt.Printf("%d features; profile area %.1f mm²\n", len(part.Features), part.Profile.Region.Area())
	// Output:
	// plate.svg
	//   units: width "20mm", height "10mm": 1 mm per user unit
	//   profile: <rect> at line 2, 20 mm × 10 mm, 4 segment(s)
	//   [[cutout]] "cutout 1": <rect> at line 3, 4 mm × 4 mm
	//   [[holes]] "holes 1.2 mm": 2 hole(s) Ø1.2 mm, through, first a circle at line 4: at (3.0000, 5.0000), (17.0000, 5.0000)
	// 2 features; profile area 200.0 mm²
}
