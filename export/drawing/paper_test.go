package drawing

import (
	"bytes"
	"testing"

	"panto/pantograph"
)

func TestWriteFixedDates(t *testing.T) {
	// ISO 32000-1 §7.9.4 dates: the zone may be absent, Z, or an offset; each comes out as
	// 2000-01-01 00:00:00 in the same number of bytes.
	tests := []struct{ in, want string }{
		{"/CreationDate (D:20261201213612)", "/CreationDate (D:20000101000000)"},
		{"/CreationDate (D:20261201213612Z)", "/CreationDate (D:20000101000000Z)"},
		{"/CreationDate (D:20261201213612+01'00')", "/CreationDate (D:20000101000000+00'00')"},
		{"/CreationDate (D:20261201213612-05'30')", "/CreationDate (D:20000101000000+00'00')"},
		{"/CreationDate (D:20261201213612-05'30)", "/CreationDate (D:20000101000000+00'00)"},
	}
	for _, tc := range tests {
		var b bytes.Buffer
		if err := WriteFixed(&b, []byte("1 0 obj << "+tc.in+" >> endobj")); err != nil {
			t.Fatal(err)
		}
		want := "1 0 obj << " + tc.want + " >> endobj"
		if b.String() != want {
			t.Errorf("%s: got %q, want %q", tc.in, b.String(), want)
		}
	}
}

func TestPartStockWords(t *testing.T) {
	// 1/16 in is 1.5875 mm; an inch part states its stock in inches.
	tests := []struct {
		stock pantograph.Stock
		units pantograph.Units
		want  string
	}{
		{pantograph.Stock{}, pantograph.MM, ""},
		{pantograph.Stock{Material: "brass"}, pantograph.MM, "Stock: brass. "},
		{pantograph.Stock{Thickness: 1.2}, pantograph.MM, "Stock: 1.2 mm thick. "},
		{pantograph.Stock{Material: "brass", Thickness: 1.2}, pantograph.MM, "Stock: brass, 1.2 mm thick. "},
		{pantograph.Stock{Material: "aluminium", Thickness: 1.5875}, pantograph.Inch, "Stock: aluminium, 0.0625 in thick. "},
	}
	for _, tc := range tests {
		l := partLayout{part: pantograph.Part{Stock: tc.stock, Units: tc.units}}
		if got := l.stockWords(); got != tc.want {
			t.Errorf("%+v %s: got %q, want %q", tc.stock, tc.units, got, tc.want)
		}
	}
}
