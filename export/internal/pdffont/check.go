package pdffont

import (
	"bytes"
	"encoding/binary"
	"errors"
	"fmt"
	"strconv"
)

// Check reports whether pdf is what Fix leaves behind: startxref and every xref entry point
// where they should, and every FontFile2 font is dated as created with valid checksums. The
// writers' tests use it; it reads only the layout the PDF writer emits.
func Check(pdf []byte) error {
	at, entries, err := readXref(pdf)
	if err != nil {
		return err
	}
	if !bytes.HasPrefix(pdf[at:], []byte("xref")) {
		return fmt.Errorf("pdffont: startxref %d does not point at the xref table", at)
	}
	for _, e := range entries[1:] {
		want := fmt.Sprintf("%d 0 obj\n", e.num)
		if e.off >= len(pdf) || !bytes.HasPrefix(pdf[e.off:], []byte(want)) {
			return fmt.Errorf("pdffont: xref entry for object %d does not point at it", e.num)
		}
	}
	found := 0
	for _, m := range fontFileRef().FindAllSubmatch(pdf, -1) {
		n, _ := strconv.Atoi(string(m[1]))
		if n >= len(entries) || entries[n].off >= len(pdf) {
			return fmt.Errorf("pdffont: font object %d not in the xref table", n)
		}
		font, err := streamOf(pdf[entries[n].off:])
		if err == nil {
			err = VerifyFont(font)
		}
		if err != nil {
			return fmt.Errorf("pdffont: object %d: %w", n, err)
		}
		found++
	}
	if found == 0 {
		return errors.New("pdffont: no TrueType font in the PDF")
	}
	return nil
}

// streamOf inflates the Flate stream of the object obj starts with.
func streamOf(obj []byte) ([]byte, error) {
	s := bytes.Index(obj, []byte("stream\n"))
	if s < 0 {
		return nil, errors.New("no stream")
	}
	m := lengthKey().FindSubmatch(obj[:s])
	if m == nil {
		return nil, errors.New("no /Length")
	}
	n, _ := strconv.Atoi(string(m[1]))
	data := obj[s+len("stream\n"):]
	if n > len(data) {
		return nil, errors.New("/Length past the end")
	}
	return inflate(data[:n])
}

// VerifyFont checks a font's checksums as the OpenType spec defines them (each table
// record's checksum is the sum of the table's words, head taken with checksumAdjustment 0;
// the whole font sums to 0xB1B0AFBA) and that its "modified" date equals "created".
func VerifyFont(font []byte) error {
	_, head, err := findHead(font)
	if err != nil {
		return err
	}
	num := int(binary.BigEndian.Uint16(font[4:]))
	for i := 0; i < num; i++ {
		rec := dirStart + i*dirRecord
		if rec+dirRecord > len(font) {
			return errors.New("table directory past the end of the font")
		}
		off := int(binary.BigEndian.Uint32(font[rec+8:]))
		n := int(binary.BigEndian.Uint32(font[rec+12:]))
		if off+n > len(font) {
			return fmt.Errorf("table %q past the end of the font", font[rec:rec+4])
		}
		table := append([]byte(nil), font[off:off+n]...)
		if off == head {
			binary.BigEndian.PutUint32(table[headAdjust:], 0)
		}
		if got, want := Checksum(table), binary.BigEndian.Uint32(font[rec+4:]); got != want {
			return fmt.Errorf("table %q: checksum %#x, recorded %#x", font[rec:rec+4], got, want)
		}
	}
	if got := Checksum(font); got != checksumMagic {
		return fmt.Errorf("whole font sums to %#x, not %#x", got, uint32(checksumMagic))
	}
	if !bytes.Equal(font[head+headModified:head+headModified+8], font[head+headCreated:head+headCreated+8]) {
		return errors.New(`head "modified" differs from "created"`)
	}
	return nil
}
