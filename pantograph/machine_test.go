package pantograph

import "testing"

func TestRatioRangeAllows(t *testing.T) {
	continuous := RatioRange{Min: 2, Max: 10}
	fixed := RatioRange{Min: 2, Max: 10, Settings: []float64{2, 5, 10}}
	tests := []struct {
		name  string
		r     RatioRange
		ratio float64
		want  bool
	}{
		{"inside a range", continuous, 7.3, true},
		{"range ends count", continuous, 10, true},
		{"low end", continuous, 2, true},
		{"above a range", continuous, 10.01, false},
		{"below a range", continuous, 1.99, false},
		{"rounded onto the end", continuous, 25.4 / 2.54, true}, // derived: 10, give or take rounding
		{"a setting", fixed, 5, true},
		{"between settings", fixed, 7, false},
		{"a setting computed", fixed, 0.1 * 100, true}, // derived: 10 after rounding
		{"not stated allows any", RatioRange{}, 37, true},
		{"zero never", continuous, 0, false},
		{"negative never", RatioRange{}, -2, false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := tc.r.Allows(tc.ratio); got != tc.want {
				t.Errorf("%v allows %v: got %v, want %v", tc.r, tc.ratio, got, tc.want)
			}
		})
	}
}

func TestRatioRangeString(t *testing.T) {
	tests := []struct {
		r    RatioRange
		want string
	}{
		{RatioRange{Min: 2, Max: 10}, "2:1 to 10:1, any value between"},
		{RatioRange{Min: 2, Max: 10, Settings: []float64{2, 2.5, 10}}, "fixed settings 2:1, 2.5:1, 10:1"},
		{RatioRange{}, "not stated"},
	}
	for _, tc := range tests {
		if got := tc.r.String(); got != tc.want {
			t.Errorf("got %q, want %q", got, tc.want)
		}
	}
}
