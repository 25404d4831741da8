package pdffont

import (
	"encoding/binary"
	"errors"
)

// Offsets inside an SFNT font and its head table (OpenType spec, "head" and table directory).
const (
	dirStart      = 12         // table records start after the 12-byte offset table
	dirRecord     = 16         // tag, checksum, offset, length
	headAdjust    = 8          // checksumAdjustment in the head table
	headCreated   = 20         // LONGDATETIME created
	headModified  = 28         // LONGDATETIME modified
	headLen       = 54         // length of a version 1.0 head table
	checksumMagic = 0xB1B0AFBA // checksumAdjustment = magic − sum of the whole font
)

// FixHead sets the font's "modified" date equal to its "created" date and recomputes the
// head table's checksum and the font's checksumAdjustment, so the font stays valid. It
// changes font in place; its length is unchanged.
func FixHead(font []byte) error {
	rec, head, err := findHead(font)
	if err != nil {
		return err
	}
	copy(font[head+headModified:head+headModified+8], font[head+headCreated:head+headCreated+8])
	binary.BigEndian.PutUint32(font[head+headAdjust:], 0)
	n := int(binary.BigEndian.Uint32(font[rec+12:]))
	binary.BigEndian.PutUint32(font[rec+4:], Checksum(font[head:head+n]))
	binary.BigEndian.PutUint32(font[head+headAdjust:], checksumMagic-Checksum(font))
	return nil
}

// findHead returns where the head table's directory record and the table itself start.
func findHead(font []byte) (rec, head int, err error) {
	if len(font) < dirStart {
		return 0, 0, errors.New("pdffont: font too short")
	}
	num := int(binary.BigEndian.Uint16(font[4:]))
	for i := 0; i < num; i++ {
		rec = dirStart + i*dirRecord
		if rec+dirRecord > len(font) {
			break
		}
		if string(font[rec:rec+4]) != "head" {
			continue
		}
		head = int(binary.BigEndian.Uint32(font[rec+8:]))
		n := int(binary.BigEndian.Uint32(font[rec+12:]))
		if n < headLen || head < 0 || head+n > len(font) {
			return 0, 0, errors.New("pdffont: bad head table")
		}
		return rec, head, nil
	}
	return 0, 0, errors.New("pdffont: font has no head table")
}

// Checksum is the SFNT checksum: the sum of big-endian uint32 words, the last one padded
// with zeros.
func Checksum(b []byte) uint32 {
	var sum uint32
	for i := 0; i < len(b); i += 4 {
		var w [4]byte
		copy(w[:], b[i:])
		sum += binary.BigEndian.Uint32(w[:])
	}
	return sum
}
