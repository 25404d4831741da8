package pdffont

import (
	"encoding/binary"
	"testing"
)

// FuzzFix feeds damaged PDFs and fonts to Fix, Check and FixHead: they must return errors,
// never panic.
func FuzzFix(f *testing.F) {
	f.Add(buildPDF(tinyFont()))
	f.Add([]byte("%PDF-1.7\n/FontFile2 1 0 R\nxref\n0 2\n0000000000 65535 f \n0000000009 00000 n \ntrailer\n<<>>\nstartxref\n27\n%%EOF\n"))
	f.Fuzz(func(t *testing.T, b []byte) {
		if out, err := Fix(b); err == nil {
			_ = Check(out)
		}
		_ = FixHead(append([]byte(nil), b...))
		_ = VerifyFont(b)
	})
}

// tinyFont is the smallest font FixHead accepts: a table directory holding one head table.
// The shipped fonts are too large a seed for the fuzzer to mutate quickly.
func tinyFont() []byte {
	b := make([]byte, dirStart+dirRecord+56)
	binary.BigEndian.PutUint32(b, 0x00010000) // TrueType sfnt version
	binary.BigEndian.PutUint16(b[4:], 1)      // one table
	copy(b[dirStart:], "head")
	binary.BigEndian.PutUint32(b[dirStart+8:], dirStart+dirRecord)
	binary.BigEndian.PutUint32(b[dirStart+12:], headLen)
	binary.BigEndian.PutUint64(b[dirStart+dirRecord+headModified:], 1)
	return b
}
