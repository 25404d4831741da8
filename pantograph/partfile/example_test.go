package partfile_test

import (
	"fmt"

	"panto/pantograph"
	"panto/pantograph/partfile"
)

func ExampleRead() {
	src := []byte(`
name = "washer"
units = "in"
[stock]
material = "brass"
thickness = 0.02
[profile]
circle = { center = [0, 0], diameter = 0.5 }
[[holes]]
name = "bore"
diameter = 0.125
depth = "through"
at = [[0, 0]]
`)
	part, err := partfile.Read("washer.toml", src)
	if err != nil {
		fmt.Println(err)
		return
	}
	s := pantograph.Summarize(part, pantograph.DefaultOptions())
	fmt.Printf("%s: %.2f mm across, %d features, %d problems\n",
		part.Name, s.Bounds.Size().X, len(s.Features), len(s.Problems))
	fmt.Printf("bore Ø%.4f mm\n", part.Features[0].Diameter)

	_, err = partfile.Read("washer.toml", []byte("[profile]\ncircle = { center = [0, 0], diamter = 1 }\n"))
	fmt.Println(err)
	// Output:
	// washer: 12.70 mm across, 2 features, 0 problems
	// bore Ø3.1750 mm
	// washer.toml:2: unknown key `diamter` in [profile] circle — did you mean `diameter`?
}
