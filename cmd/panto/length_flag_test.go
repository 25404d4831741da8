package main

import (
	"math"
	"testing"

	"panto/pantograph"
)

func TestParseLength(t *testing.T) {
	tests := []struct {
		in    string
		plain pantograph.Units
		mm    float64
	}{
		{"0.5", pantograph.MM, 0.5},
		{"0.5mm", pantograph.Inch, 0.5},
		{"1/32in", pantograph.MM, 0.79375}, // derived: 25.4 / 32
		{"0.03125 in", pantograph.MM, 0.79375},
		{"3/64", pantograph.Inch, 25.4 * 3 / 64}, // a plain fraction takes the flag's unit
		{" 2 ", pantograph.MM, 2},
	}
	for _, tc := range tests {
		l, err := parseLength(tc.in)
		if err != nil {
			t.Errorf("%q: %v", tc.in, err)
			continue
		}
		if got := l.mm(tc.plain); math.Abs(got-tc.mm) > 1e-12 {
			t.Errorf("%q in %s: got %v mm, want %v", tc.in, tc.plain, got, tc.mm)
		}
	}
	for _, bad := range []string{"", "mm", "1/0", "1/", "half", "1e999", "NaN", "0.5 ft", "1/32 inch"} {
		if _, err := parseLength(bad); err == nil {
			t.Errorf("%q: got no error", bad)
		}
	}
}
