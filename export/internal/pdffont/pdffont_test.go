package pdffont

import (
	"bytes"
	"encoding/binary"
	"fmt"
	"os"
	"testing"
)

// sampleFont reads a TrueType font shipped with the drawings.
func sampleFont(t *testing.T) []byte { return sampleFontF(t) }

// sampleFontF reads the font for a test or a fuzz target.
func sampleFontF(t testing.TB) []byte {
	t.Helper()
	b, err := os.ReadFile("../../drawing/fonts/DejaVuSans.ttf")
	if err != nil {
		t.Fatal(err)
	}
	return b
}

// setModified returns a copy of font with its head "modified" field set to secs.
func setModified(t *testing.T, font []byte, secs uint64) []byte {
	t.Helper()
	return setDates(t, font, 0, secs)
}

// setDates returns a copy of font with its head "created" (unless 0) and "modified" fields
// set, the checksums left stale.
func setDates(t *testing.T, font []byte, created, modified uint64) []byte {
	t.Helper()
	f := append([]byte(nil), font...)
	_, head, err := findHead(f)
	if err != nil {
		t.Fatal(err)
	}
	if created != 0 {
		binary.BigEndian.PutUint64(f[head+headCreated:], created)
	}
	binary.BigEndian.PutUint64(f[head+headModified:], modified)
	return f
}

// TestCheckCatchesFaults shows that Check and VerifyFont can fail: each case spoils a fixed
// PDF or font in one way.
func TestCheckCatchesFaults(t *testing.T) {
	font := setModified(t, sampleFont(t), 3_900_000_000)
	fixed := append([]byte(nil), font...)
	if err := FixHead(fixed); err != nil {
		t.Fatal(err)
	}
	damaged := append([]byte(nil), fixed...)
	damaged[len(damaged)/2]++ // one byte in the middle of some table
	good, err := Fix(buildPDF(font))
	if err != nil {
		t.Fatal(err)
	}
	if err := Check(good); err != nil {
		t.Fatalf("fixed PDF: %v", err)
	}
	if err := VerifyFont(fixed); err != nil {
		t.Fatalf("fixed font: %v", err)
	}
	// A font with valid checksums whose modified date alone differs from created.
	dated := setModified(t, fixed, 3_900_000_000)
	rec, head, _ := findHead(dated)
	binary.BigEndian.PutUint32(dated[head+headAdjust:], 0)
	binary.BigEndian.PutUint32(dated[rec+4:], Checksum(dated[head:head+headLen]))
	binary.BigEndian.PutUint32(dated[head+headAdjust:], checksumMagic-Checksum(dated))
	if err := VerifyFont(dated); err == nil {
		t.Errorf("font modified after created: got no error, want one")
	}
	shifted := append([]byte("%comment\n"), good...) // every offset now 9 bytes short
	for _, tc := range []struct {
		name string
		pdf  []byte
	}{
		{"font not fixed", buildPDF(font)},
		{"font damaged", buildPDF(damaged)},
		{"offsets wrong", shifted},
		{"no font", []byte("%PDF-1.7\nxref\n0 1\n0000000000 65535 f \ntrailer\n<<>>\nstartxref\n9\n%%EOF\n")},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if err := Check(tc.pdf); err == nil {
				t.Errorf("got no error, want one")
			}
		})
	}
}

// TestFixHead sets the modified date of the same font to two different times; after FixHead
// both must be byte-equal, dated as created, with valid checksums. The shipped font is dated
// modified = created, so some cases also move "created", or a stale head checksum would pass.
func TestFixHead(t *testing.T) {
	// Seconds since 1904-01-01: 3_900_000_000 is in 2027, 3_900_000_001 one second later;
	// 3_800_000_000 is in 2024 (derived).
	for _, tc := range []struct {
		created uint64 // 0: as shipped
		a, b    uint64 // two modified dates
	}{
		{0, 3_900_000_000, 3_900_000_001},
		{0, 0, 1 << 40},
		{3_800_000_000, 3_900_000_000, 3_900_000_001},
	} {
		t.Run(fmt.Sprint(tc.created, "/", tc.b), func(t *testing.T) {
			a, b := setDates(t, sampleFont(t), tc.created, tc.a), setDates(t, sampleFont(t), tc.created, tc.b)
			if bytes.Equal(a, b) {
				t.Fatal("inputs equal before the fix; the test would prove nothing")
			}
			for _, f := range [][]byte{a, b} {
				if err := FixHead(f); err != nil {
					t.Fatal(err)
				}
				if err := VerifyFont(f); err != nil {
					t.Error(err)
				}
			}
			if !bytes.Equal(a, b) {
				t.Errorf("got different bytes for different modified dates, want equal")
			}
		})
	}
}

func TestFixHeadBadFont(t *testing.T) {
	for _, tc := range []struct {
		name string
		font []byte
	}{
		{"empty", nil},
		{"no head", append([]byte{0, 1, 0, 0, 0, 1, 0, 16, 0, 0, 0, 0}, []byte("glyf\x00\x00\x00\x00\x00\x00\x00\x1c\x00\x00\x00\x04\x00\x00\x00\x00")...)},
		{"head past the end", append([]byte{0, 1, 0, 0, 0, 1, 0, 16, 0, 0, 0, 0}, []byte("head\x00\x00\x00\x00\x00\x00\x00\x1c\x00\x00\x00\x36")...)},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if err := FixHead(tc.font); err == nil {
				t.Errorf("got no error, want one")
			}
		})
	}
}

// buildPDF writes a small PDF in the layout the PDF writer uses, with font as a Flate
// FontFile2 stream placed between other objects, so Fix has offsets to move.
func buildPDF(font []byte) []byte {
	objs := []string{
		"<</Type/Catalog/Pages 3 0 R>>",
		"<</Producer(test)>>",
		"<</Type/Pages/Kids[]/Count 0>>",
		"<</Type/FontDescriptor/FontFile2 5 0 R>>",
		"", // the font stream
		"<</Type/Font/Subtype/Type0/FontDescriptor 4 0 R>>",
	}
	z := deflate(font)
	var b bytes.Buffer
	b.WriteString("%PDF-1.7\n")
	offs := make([]int, len(objs))
	for i, o := range objs {
		offs[i] = b.Len()
		fmt.Fprintf(&b, "%d 0 obj\n", i+1)
		if o == "" {
			fmt.Fprintf(&b, "<</Filter/FlateDecode/Length %d>>stream\n", len(z))
			b.Write(z)
			b.WriteString("\nendstream\nendobj\n")
			continue
		}
		fmt.Fprintf(&b, "%s\nendobj\n", o)
	}
	at := b.Len()
	fmt.Fprintf(&b, "xref\n0 %d\n0000000000 65535 f \n", len(objs)+1)
	for _, o := range offs {
		fmt.Fprintf(&b, "%010d 00000 n \n", o)
	}
	fmt.Fprintf(&b, "trailer\n<</Root 1 0 R/Size %d/Info 2 0 R>>\nstartxref\n%d\n%%%%EOF\n", len(objs)+1, at)
	return b.Bytes()
}

// TestFix runs Fix over two PDFs that differ only in the embedded font's modified date.
func TestFix(t *testing.T) {
	font := sampleFont(t)
	a, err := Fix(buildPDF(setModified(t, font, 3_900_000_000)))
	if err != nil {
		t.Fatal(err)
	}
	b, err := Fix(buildPDF(setModified(t, font, 3_900_000_001)))
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(a, b) {
		t.Errorf("got different PDFs for different modified dates, want equal")
	}
	if err := Check(a); err != nil {
		t.Error(err)
	}
}

func TestFixNoFonts(t *testing.T) {
	in := []byte("%PDF-1.7\nno fonts here")
	got, err := Fix(in)
	if err != nil || !bytes.Equal(got, in) {
		t.Errorf("got %q, %v, want the input unchanged", got, err)
	}
}
