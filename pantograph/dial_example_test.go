package pantograph_test

import (
	"fmt"

	"panto/pantograph"
)

// A part move of 1.234 mm at 10:1 is 12.34 mm on the copy table: on a 2 mm screw with a
// 100-division collar, 6 turns and 17 divisions.
func ExampleDial_Read() {
	d := pantograph.Dial{Pitch: 2, Divisions: 100, Units: pantograph.MM}
	fmt.Println(d.Read(d.Count(10*1.234), 10))
	// Output: 6 t 17 div
}

// A 0.5 mm cutter at 30 m/min wants 19 099 rpm; a 15 000 rpm spindle caps it.
func ExampleRPM() {
	n := pantograph.RPM(30, 0.5)
	fmt.Printf("%.0f rpm, run at %.0f\n", n, min(n, 15000))
	// Output: 19099 rpm, run at 15000
}
