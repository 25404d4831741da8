package pantograph

import "testing"

func TestUnitsLength(t *testing.T) {
	tests := []struct {
		u    Units
		mm   float64
		want string
	}{
		{MM, 1.6, "1.6 mm"},
		{"", 0.0004, "0 mm"}, // the zero Units is mm, and nothing reads -0
		{Inch, 25.4 / 16, "0.0625 in"},
		{Inch, 25.4 / 32, "0.03125 in"}, // five places where they are exact
		{Inch, 25.4 / 64, "0.0156 in"},  // 0.015625 needs six: a ten-thousandth then
		{Inch, 0.8, "0.0315 in"},        // 0.8 / 25.4 = 0.031496 (derived)
	}
	for _, tc := range tests {
		if got := tc.u.Length(tc.mm); got != tc.want {
			t.Errorf("%q.Length(%v) = %q, want %q", tc.u, tc.mm, got, tc.want)
		}
	}
	if got := Inch.Area(645.16); got != "1 in²" { // one square inch (derived: 25.4²)
		t.Errorf("Inch.Area(645.16) = %q, want 1 in²", got)
	}
}
