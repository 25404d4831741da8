package numfmt

import (
	"math"
	"testing"
)

func TestTrim(t *testing.T) {
	tests := []struct {
		v        float64
		decimals int
		want     string
	}{
		{2.5, 3, "2.5"},
		{12, 3, "12"},
		{0.0005, 3, "0.001"}, // 0.0005 is a hair above a half in binary
		{0.0004, 3, "0"},
		{-0.0004, 3, "0"}, // never "-0"
		{-0.00004, 4, "0"},
		{-1.25, 3, "-1.25"},
		{13.999999999999998, 3, "14"},
		{0.03126, 4, "0.0313"},
		{100, 0, "100"},
	}
	for _, tc := range tests {
		if got := Trim(tc.v, tc.decimals); got != tc.want {
			t.Errorf("Trim(%v, %d) = %q, want %q", tc.v, tc.decimals, got, tc.want)
		}
	}
}

func TestFixedNeverNegativeZero(t *testing.T) {
	for _, v := range []float64{-0.0, -1e-12, -0.00049} {
		if got := Fixed(v, 3); got != "0.000" {
			t.Errorf("Fixed(%v, 3) = %q, want 0.000", v, got)
		}
	}
	if got := Fixed(-0.0006, 3); got != "-0.001" {
		t.Errorf("Fixed(-0.0006, 3) = %q, want -0.001", got)
	}
}

func TestMMAndInch(t *testing.T) {
	if got := MM(1.2345); got != "1.234" && got != "1.235" {
		t.Errorf("MM(1.2345) = %q", got)
	}
	if got := Inch(0.03125); got != "0.0313" && got != "0.0312" {
		t.Errorf("Inch(0.03125) = %q", got)
	}
	if got := Point(-0.0001, 2); got != "(0, 2)" {
		t.Errorf("Point = %q, want (0, 2)", got)
	}
}

func TestJSON(t *testing.T) {
	tests := []struct{ v, want float64 }{
		{13.999999999999998, 14},
		{0.1234567, 0.123457},
		{-1e-9, 0},
		{1e300, 1e300}, // too large to scale: kept
	}
	for _, tc := range tests {
		got := JSON(tc.v)
		if got != tc.want || math.Signbit(got) != math.Signbit(tc.want) {
			t.Errorf("JSON(%v) = %v, want %v", tc.v, got, tc.want)
		}
	}
}

func TestFile(t *testing.T) {
	tests := []struct {
		v    float64
		want string
	}{
		{31.000000000000004, "31"},
		{0.4, "0.4"},
		{-1e-12, "0"},
		{1 / 3.0, "0.333333333"},
	}
	for _, tc := range tests {
		if got := File(tc.v); got != tc.want {
			t.Errorf("File(%v) = %q, want %q", tc.v, got, tc.want)
		}
	}
}
