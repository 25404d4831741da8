package pdffont

import (
	"bytes"
	"compress/zlib"
	"errors"
	"fmt"
	"io"
	"regexp"
	"sort"
	"strconv"
	"strings"
)

// Patterns in the PDF writer's output. They are functions, not package variables, so the
// package keeps no globals.
func fontFileRef() *regexp.Regexp { return regexp.MustCompile(`/FontFile2 ?(\d+) 0 R`) }
func lengthKey() *regexp.Regexp   { return regexp.MustCompile(`/Length ?(\d+)`) }
func startXref() *regexp.Regexp   { return regexp.MustCompile(`startxref\s+(\d+)\s+%%EOF\s*$`) }
func xrefHead() *regexp.Regexp    { return regexp.MustCompile(`^xref\s+0 (\d+)\s+`) }

// xrefEntry is one line of a classic cross-reference table.
type xrefEntry struct {
	num  int    // object number
	off  int    // byte offset of "num 0 obj"
	tail string // the rest of the line: generation and n/f
}

// Fix returns pdf with every embedded TrueType font (FontFile2 stream) passed through
// FixHead, the streams recompressed, and the cross-reference table and startxref moved to
// match. It reads the single classic xref table the PDF writer emits, nothing more general;
// a PDF without TrueType fonts comes back unchanged.
func Fix(pdf []byte) ([]byte, error) {
	fonts := map[int]bool{}
	for _, m := range fontFileRef().FindAllSubmatch(pdf, -1) {
		n, _ := strconv.Atoi(string(m[1]))
		fonts[n] = true
	}
	if len(fonts) == 0 {
		return pdf, nil
	}
	xrefAt, entries, err := readXref(pdf)
	if err != nil {
		return nil, err
	}
	var used []xrefEntry
	for _, e := range entries {
		if e.num > 0 && strings.HasSuffix(e.tail, "n") {
			used = append(used, e)
		}
	}
	sort.Slice(used, func(i, j int) bool { return used[i].off < used[j].off })
	if len(used) == 0 || used[0].off > xrefAt || used[len(used)-1].off > xrefAt {
		return nil, errors.New("pdffont: object offsets outside the file")
	}
	var out bytes.Buffer
	out.Write(pdf[:used[0].off])
	moved := map[int]int{}
	for i, e := range used {
		end := xrefAt
		if i+1 < len(used) {
			end = used[i+1].off
		}
		moved[e.num] = out.Len()
		obj := pdf[e.off:end]
		if fonts[e.num] {
			if obj, err = fixObject(obj); err != nil {
				return nil, fmt.Errorf("pdffont: object %d: %w", e.num, err)
			}
		}
		out.Write(obj)
	}
	if err := writeXref(&out, pdf[xrefAt:], entries, moved); err != nil {
		return nil, err
	}
	return out.Bytes(), nil
}

// readXref finds the xref table through startxref and reads its entries.
func readXref(pdf []byte) (int, []xrefEntry, error) {
	m := startXref().FindSubmatch(pdf)
	if m == nil {
		return 0, nil, errors.New("pdffont: no startxref")
	}
	at, _ := strconv.Atoi(string(m[1]))
	if at >= len(pdf) {
		return 0, nil, errors.New("pdffont: startxref past the end")
	}
	h := xrefHead().FindSubmatch(pdf[at:])
	if h == nil {
		return 0, nil, errors.New("pdffont: no classic xref table at startxref")
	}
	n, _ := strconv.Atoi(string(h[1]))
	lines := pdf[at+len(h[0]):]
	if n < 1 || n > len(lines)/20 {
		return 0, nil, errors.New("pdffont: xref table cut short")
	}
	entries := make([]xrefEntry, n)
	for i := range entries {
		l := lines[20*i : 20*i+20] // every xref line is exactly 20 bytes (ISO 32000-1 7.5.4)
		off, err := strconv.Atoi(string(l[:10]))
		if err != nil {
			return 0, nil, fmt.Errorf("pdffont: xref line %d: %w", i, err)
		}
		entries[i] = xrefEntry{num: i, off: off, tail: string(bytes.TrimSpace(l[10:]))}
	}
	return at, entries, nil
}

// writeXref writes the xref table with the moved offsets, then the old trailer and a new
// startxref.
func writeXref(out *bytes.Buffer, old []byte, entries []xrefEntry, moved map[int]int) error {
	t := bytes.Index(old, []byte("trailer"))
	if t < 0 {
		return errors.New("pdffont: no trailer after the xref table")
	}
	at := out.Len()
	fmt.Fprintf(out, "xref\n0 %d\n", len(entries))
	for _, e := range entries {
		off := e.off
		if o, ok := moved[e.num]; ok {
			off = o
		}
		fmt.Fprintf(out, "%010d %s \n", off, e.tail)
	}
	trailer := old[t:]
	out.Write(trailer[:bytes.LastIndex(trailer, []byte("startxref"))])
	fmt.Fprintf(out, "startxref\n%d\n%%%%EOF\n", at)
	return nil
}

// fixObject rewrites one "N 0 obj << … /Length L >> stream … endstream endobj" whose stream
// is a Flate-compressed font program.
func fixObject(obj []byte) ([]byte, error) {
	s := bytes.Index(obj, []byte("stream\n"))
	if s < 0 {
		return nil, errors.New("no stream")
	}
	dict := obj[:s]
	if !bytes.Contains(dict, []byte("/FlateDecode")) || bytes.Contains(dict, []byte("/DecodeParms")) {
		return nil, errors.New("font stream is not plain Flate")
	}
	m := lengthKey().FindSubmatchIndex(dict)
	if m == nil {
		return nil, errors.New("no /Length")
	}
	n, _ := strconv.Atoi(string(dict[m[2]:m[3]]))
	data := obj[s+len("stream\n"):]
	if n > len(data) {
		return nil, errors.New("/Length past the object")
	}
	font, err := inflate(data[:n])
	if err != nil {
		return nil, err
	}
	if err := FixHead(font); err != nil {
		return nil, err
	}
	z := deflate(font)
	var b bytes.Buffer
	b.Write(dict[:m[2]])
	b.WriteString(strconv.Itoa(len(z)))
	b.Write(dict[m[3]:])
	b.WriteString("stream\n")
	b.Write(z)
	b.Write(data[n:])
	return b.Bytes(), nil
}

// inflate undoes a zlib (FlateDecode) stream.
func inflate(z []byte) ([]byte, error) {
	r, err := zlib.NewReader(bytes.NewReader(z))
	if err != nil {
		return nil, err
	}
	defer r.Close()
	return io.ReadAll(r)
}

// deflate compresses b as a zlib stream; Go's compressor gives the same bytes for the same
// input every time.
func deflate(b []byte) []byte {
	var z bytes.Buffer
	w := zlib.NewWriter(&z)
	w.Write(b) // writes to a bytes.Buffer cannot fail
	w.Close()
	return z.Bytes()
}
