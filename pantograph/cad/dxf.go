package cad

import (
	"bufio"
	"bytes"
	"fmt"
	"math"
	"strconv"
	"strings"

	"panto/pantograph"
)

// dxfGroup is one group of an ASCII DXF file: a code line and a value line.
type dxfGroup struct {
	code int
	val  string
	line int // line of the code
}

// dxfEntity is a code-0 group and the groups after it, up to the next code 0.
type dxfEntity struct {
	kind   string
	line   int
	groups []dxfGroup
	verts  []dxfEntity // the VERTEX entities of a POLYLINE
}

// maxDXFGroups bounds the groups read from one file; 50 million is a DXF of about 400 MB, far
// beyond any drawing of a part a hand can hold.
const maxDXFGroups = 50_000_000

// scanDXF splits src into groups, checking that every code is a number.
func scanDXF(file string, src []byte) ([]dxfGroup, error) {
	if bytes.HasPrefix(src, []byte("AutoCAD Binary DXF")) {
		return nil, &Error{File: file, Line: 1, Msg: "this is a binary DXF; save the drawing as ASCII DXF and import that"}
	}
	sc := bufio.NewScanner(bytes.NewReader(src))
	sc.Buffer(make([]byte, 0, 64*1024), 16*1024*1024)
	var gs []dxfGroup
	line := 0
	for sc.Scan() {
		line++
		codeText := strings.TrimSpace(sc.Text())
		if codeText == "" && !sc.Scan() {
			break // blank lines at the very end
		} else if codeText == "" {
			return nil, &Error{File: file, Line: line, Msg: "a group code is missing: expected a number on this line"}
		}
		code, err := strconv.Atoi(codeText)
		if err != nil {
			return nil, &Error{File: file, Line: line, Msg: fmt.Sprintf("expected a group code (a whole number), got %q; is this a DXF file?", clip(codeText))}
		}
		if !sc.Scan() {
			return nil, &Error{File: file, Line: line, Msg: fmt.Sprintf("group code %d has no value: the file ends here", code)}
		}
		line++
		if code == 999 {
			continue // a comment
		}
		gs = append(gs, dxfGroup{code: code, val: strings.TrimRight(sc.Text(), "\r"), line: line - 1})
		if len(gs) > maxDXFGroups {
			return nil, &Error{File: file, Line: line, Msg: "too many groups: this drawing is far larger than any part panto makes"}
		}
	}
	if err := sc.Err(); err != nil {
		return nil, &Error{File: file, Line: line + 1, Msg: "cannot read: " + err.Error()}
	}
	return gs, nil
}

// clip shortens text quoted in a message.
func clip(s string) string {
	if len(s) > 40 {
		return s[:40] + "…"
	}
	return s
}

// dxfFile is a DXF split into what the reader needs.
type dxfFile struct {
	insunits    int // $INSUNITS; −1 when absent
	insunitLine int
	blocks      map[string]dxfBlock
	entities    []dxfEntity
	eofSeen     bool
}

type dxfBlock struct {
	base     [2]float64
	entities []dxfEntity
}

// splitDXF walks the groups section by section.
func splitDXF(file string, gs []dxfGroup) (*dxfFile, error) {
	f := &dxfFile{insunits: -1, blocks: map[string]dxfBlock{}}
	for i := 0; i < len(gs); {
		g := gs[i]
		if g.code != 0 {
			return nil, &Error{File: file, Line: g.line, Msg: fmt.Sprintf("expected 0 SECTION or 0 EOF, got group %d %q", g.code, clip(g.val))}
		}
		switch strings.TrimSpace(g.val) {
		case "EOF":
			f.eofSeen = true
			return f, nil
		case "SECTION":
		default:
			return nil, &Error{File: file, Line: g.line, Msg: fmt.Sprintf("expected 0 SECTION or 0 EOF, got 0 %q", clip(g.val))}
		}
		end := i + 1
		for end < len(gs) && !(gs[end].code == 0 && strings.TrimSpace(gs[end].val) == "ENDSEC") {
			end++
		}
		if end == len(gs) {
			return nil, &Error{File: file, Line: g.line, Msg: "section never ends: 0 ENDSEC is missing"}
		}
		if i+1 < end && gs[i+1].code == 2 {
			if err := f.section(file, strings.TrimSpace(gs[i+1].val), gs[i+2:end]); err != nil {
				return nil, err
			}
		}
		i = end + 1
	}
	return f, nil
}

func (f *dxfFile) section(file, name string, gs []dxfGroup) error {
	switch name {
	case "HEADER":
		return f.header(file, gs)
	case "BLOCKS":
		return f.blocksSection(file, groupEntities(gs))
	case "ENTITIES":
		f.entities = joinPolylines(groupEntities(gs))
	}
	return nil
}

// header reads $INSUNITS, the only header variable the reader needs.
func (f *dxfFile) header(file string, gs []dxfGroup) error {
	for i, g := range gs {
		if g.code != 9 || strings.TrimSpace(g.val) != "$INSUNITS" {
			continue
		}
		if i+1 >= len(gs) || gs[i+1].code != 70 {
			return &Error{File: file, Line: g.line, What: "$INSUNITS", Msg: "expected group 70 with the units number after it"}
		}
		n, err := strconv.Atoi(strings.TrimSpace(gs[i+1].val))
		if err != nil {
			return &Error{File: file, Line: gs[i+1].line, What: "$INSUNITS", Msg: fmt.Sprintf("expected a whole number, got %q", clip(gs[i+1].val))}
		}
		f.insunits, f.insunitLine = n, gs[i+1].line+1
	}
	return nil
}

// groupEntities cuts groups into entities at every code 0.
func groupEntities(gs []dxfGroup) []dxfEntity {
	var es []dxfEntity
	for _, g := range gs {
		if g.code == 0 {
			es = append(es, dxfEntity{kind: strings.TrimSpace(g.val), line: g.line})
			continue
		}
		if len(es) > 0 {
			es[len(es)-1].groups = append(es[len(es)-1].groups, g)
		}
	}
	return es
}

// joinPolylines moves the VERTEX entities after each POLYLINE into it, up to SEQEND.
func joinPolylines(es []dxfEntity) []dxfEntity {
	var out []dxfEntity
	for i := 0; i < len(es); i++ {
		e := es[i]
		if e.kind == "POLYLINE" {
			for i+1 < len(es) && es[i+1].kind == "VERTEX" {
				e.verts = append(e.verts, es[i+1])
				i++
			}
			if i+1 < len(es) && es[i+1].kind == "SEQEND" {
				i++
			}
		}
		out = append(out, e)
	}
	return out
}

func (f *dxfFile) blocksSection(file string, es []dxfEntity) error {
	es = joinPolylines(es)
	for i := 0; i < len(es); i++ {
		if es[i].kind != "BLOCK" {
			continue
		}
		head := es[i]
		name := head.str(2)
		b := dxfBlock{}
		b.base[0], _ = head.num(file, 10, 0)
		b.base[1], _ = head.num(file, 20, 0)
		for i+1 < len(es) && es[i+1].kind != "ENDBLK" {
			i++
			b.entities = append(b.entities, es[i])
		}
		if i+1 >= len(es) {
			return &Error{File: file, Line: head.line, What: "BLOCK " + strconv.Quote(name), Msg: "block never ends: 0 ENDBLK is missing"}
		}
		f.blocks[name] = b
	}
	return nil
}

// str returns the value of the first group with code, or "".
func (e dxfEntity) str(code int) string {
	for _, g := range e.groups {
		if g.code == code {
			return strings.TrimSpace(g.val)
		}
	}
	return ""
}

// num returns the number in the first group with code, def when there is none, and an error
// naming the line when the value is not a finite number.
func (e dxfEntity) num(file string, code int, def float64) (float64, error) {
	for _, g := range e.groups {
		if g.code == code {
			return parseNum(file, e.kind, g)
		}
	}
	return def, nil
}

func parseNum(file, kind string, g dxfGroup) (float64, error) {
	v, err := strconv.ParseFloat(strings.TrimSpace(g.val), 64)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, &Error{File: file, Line: g.line + 1, What: kind, Msg: fmt.Sprintf("group %d should be a number, got %q", g.code, clip(g.val))}
	}
	return v, nil
}

// dxfUnits returns millimetres per drawing unit, the units to call the drawing by, and a note
// saying where they came from. override, when not empty, wins over the file.
func dxfUnits(f *dxfFile, override pantograph.Units) (float64, pantograph.Units, string, error) {
	if override != "" {
		return unitScale(override), override, "--units " + string(override), nil
	}
	switch f.insunits {
	case -1, 0:
		what := "no $INSUNITS"
		if f.insunits == 0 {
			what = "$INSUNITS 0 (unitless)"
		}
		return 1, pantograph.MM, what + ": assumed millimetres; give --units in if the drawing is in inches", nil
	case 1:
		return pantograph.MMPerInch, pantograph.Inch, "$INSUNITS 1 (inches)", nil
	case 2:
		return 12 * pantograph.MMPerInch, pantograph.MM, "$INSUNITS 2 (feet), converted to mm", nil
	case 4:
		return 1, pantograph.MM, "$INSUNITS 4 (mm)", nil
	case 5:
		return 10, pantograph.MM, "$INSUNITS 5 (cm), converted to mm", nil
	case 6:
		return 1000, pantograph.MM, "$INSUNITS 6 (m), converted to mm", nil
	case 8:
		return 25.4e-6, pantograph.MM, "$INSUNITS 8 (microinches), converted to mm", nil
	case 9:
		return 25.4e-3, pantograph.MM, "$INSUNITS 9 (mils), converted to mm", nil
	case 13:
		return 1e-3, pantograph.MM, "$INSUNITS 13 (micrometres), converted to mm", nil
	case 14:
		return 100, pantograph.MM, "$INSUNITS 14 (decimetres), converted to mm", nil
	}
	return 0, "", "", fmt.Errorf("$INSUNITS %d is not a unit panto knows; give --units mm or --units in", f.insunits)
}

// unitScale returns millimetres per unit u.
func unitScale(u pantograph.Units) float64 {
	if u == pantograph.Inch {
		return pantograph.MMPerInch
	}
	return 1
}

// ReadDXF reads an ASCII DXF drawing (R12 or later) into loose segments in millimetres.
// Entities it does not draw (text, dimensions, hatches, points, ...) are counted in
// Drawing.Skipped.
func ReadDXF(file string, src []byte, opts Options) (*Drawing, error) {
	gs, err := scanDXF(file, src)
	if err != nil {
		return nil, err
	}
	f, err := splitDXF(file, gs)
	if err != nil {
		return nil, err
	}
	k, units, note, err := dxfUnits(f, opts.Units)
	if err != nil {
		return nil, &Error{File: file, Line: f.insunitLine, Msg: err.Error()}
	}
	sh := &Drawing{File: file, Units: units, UnitsNote: note}
	if !f.eofSeen {
		sh.warnf("the file ends without 0 EOF: it may have been cut short")
	}
	r := &dxfReader{file: file, f: f, found: sh, tol: opts.chordTol()}
	if err := r.entities(f.entities, scaling(k, k), ""); err != nil {
		return nil, err
	}
	return sh, nil
}
