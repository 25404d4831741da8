// Package partfile reads and writes part files, TOML descriptions of a part in its own drawing
// units, and reads machine files.
//
// A part file has a name, its units ("mm", the default, or "in"; inches are converted to
// millimetres on reading), a datum ([x, y], default [0, 0]), a [stock] table (material,
// thickness), one [profile] table giving the outside edge, and any number of [[cutout]],
// [[pocket]], [[holes]], [[slot]] and [[groove]] tables. An outline is given by exactly one of
//
//	points = [[x, y], [x, y, corner radius], ...]       straight edges, corners optionally rounded
//	circle = { center = [x, y], diameter = d }
//	rect   = { min = [x, y], size = [w, h], corner = r } corner optional
//	path   = [ { at = [x, y] }, { line = [x, y] }, { arc = [x, y], through = [x, y] }, ... ]
//
// A path starts at `at`, each step runs from where the last ended, an arc runs through its
// `through` point, and the path closes back to its start with a straight line. A cut-out may
// instead be a slot (from, to, width). Every feature table takes an optional name, which
// defaults to its kind and number ("holes 2"). Depths are "through" or a number; a groove's
// width is optional (0: as wide as the cutter). See the samples directory for whole files.
//
// Mistakes are returned as *Error naming the file, line and key. Read checks the file's form
// and sizes only; pantograph.Check judges the part (features outside the profile, overlaps).
// Encode writes a Part back as a part file that reads to the same geometry, as 'panto import'
// does for a drawing.
//
// # Machine files
//
// The package also reads machine files (ReadMachine, ReadMachineFile): TOML descriptions of a
// pantograph mill with its dials, tools and printer. The two formats share the TOML reading,
// the line index behind every message, and the unknown-key suggestions; machine.go describes
// the machine file's keys. There is no machine-file writer.
package partfile

import (
	"fmt"
	"os"
	"slices"

	"github.com/BurntSushi/toml"

	"panto/geom"
	"panto/pantograph"
)

// topKeys are the keys a part file may have outside any table.
var topKeys = []string{"name", "units", "datum", "stock", "profile", "cutout", "pocket", "holes", "slot", "groove"}

// ReadFile reads the part file at path; messages name the file as path.
func ReadFile(path string) (pantograph.Part, error) {
	src, err := os.ReadFile(path)
	if err != nil {
		return pantograph.Part{}, err
	}
	return Read(path, src)
}

// Read reads a part file from src; name is used in messages and as Part.Source.
func Read(name string, src []byte) (pantograph.Part, error) {
	var m map[string]any
	if _, err := toml.Decode(string(src), &m); err != nil {
		return pantograph.Part{}, syntaxError(name, src, err)
	}
	r := &reader{file: name, lines: indexLines(string(src)), scale: 1}
	top := table{r: r, m: m}
	r.checkTables(top)
	p := pantograph.Part{Source: name, Units: pantograph.MM}
	err := r.readHead(top, &p)
	if err == nil {
		err = r.readProfile(top, &p)
	}
	if err == nil {
		err = r.readFeatures(top, &p)
	}
	if err = r.finish(err); err != nil {
		return pantograph.Part{}, err
	}
	return p, nil
}

// checkTables notes the unknown keys of every table before anything is read, so that one
// reading reports them all even when a later mistake stops it.
func (r *reader) checkTables(top table) {
	top.checkKeys(topKeys...)
	for key, known := range map[string][]string{"stock": {"material", "thickness"}, "profile": shapeKeys} {
		if m, ok := top.m[key].(map[string]any); ok {
			table{r: r, path: key, label: "[" + key + "]", m: m}.checkKeys(known...)
		}
	}
	for _, k := range featureOrder {
		list, _ := top.m[string(k)].([]map[string]any)
		for i, m := range list {
			label := fmt.Sprintf("[[%s]] #%d", k, i+1)
			if name, ok := m["name"].(string); ok {
				label = pantograph.Feature{Kind: k, Name: name}.Label()
			}
			table{r: r, path: fmt.Sprintf("%s#%d", k, i), label: label, m: m}.checkKeys(featureKeys[k]...)
		}
	}
}

// readHead reads name, units, datum and [stock].
func (r *reader) readHead(top table, p *pantograph.Part) error {
	var err error
	if v, ok := top.m["name"]; ok {
		if p.Name, err = top.at("name").text(v); err != nil {
			return err
		}
	}
	if v, ok := top.m["units"]; ok {
		u, err := top.at("units").text(v)
		if err != nil {
			return err
		}
		switch pantograph.Units(u) {
		case pantograph.MM:
		case pantograph.Inch:
			r.scale = pantograph.MMPerInch
		default:
			return top.at("units").errf(`must be "mm" or "in", got %q`, u)
		}
		p.Units = pantograph.Units(u)
	}
	if v, ok := top.m["datum"]; ok {
		if p.Datum, err = top.at("datum").point(v); err != nil {
			return err
		}
	}
	v, ok := top.m["stock"]
	if !ok {
		return nil
	}
	st, err := r.single(top, "stock", v)
	if err != nil {
		return err
	}
	return readStock(st, &p.Stock)
}

// single returns the one table under key, or an error when it is a list of tables or a value.
func (r *reader) single(top table, key string, v any) (table, error) {
	m, ok := v.(map[string]any)
	if !ok {
		if _, list := v.([]map[string]any); list {
			return table{}, top.at(key).errf("write [%s] once, with single brackets", key)
		}
		return table{}, top.at(key).errf("must be a table, written [%s] on a line of its own, got %s", key, describe(v))
	}
	return table{r: r, path: key, label: "[" + key + "]", m: m}, nil
}

func readStock(t table, s *pantograph.Stock) error {
	if err := t.checkKeys("material", "thickness"); err != nil {
		return err
	}
	var err error
	if v, ok := t.m["material"]; ok {
		if s.Material, err = t.at("material").text(v); err != nil {
			return err
		}
	}
	if v, ok := t.m["thickness"]; ok {
		s.Thickness, err = t.at("thickness").length(v)
	}
	return err
}

// readProfile reads the [profile] table, which every part must have.
func (r *reader) readProfile(top table, p *pantograph.Part) error {
	v, ok := top.m["profile"]
	if !ok {
		return &Error{File: r.file, Msg: "no [profile]: every part needs its outside edge, for example\n" +
			"  [profile]\n  rect = { min = [0, 0], size = [20, 10] }"}
	}
	t, err := r.single(top, "profile", v)
	if err != nil {
		return err
	}
	if err := t.checkKeys(shapeKeys...); err != nil {
		return err
	}
	reg, err := t.outline(false)
	if err != nil {
		return err
	}
	p.Profile = pantograph.Feature{Kind: pantograph.KindProfile, Region: reg,
		Depth: pantograph.Depth{Through: true}, Where: pantograph.Where{File: r.file, Line: r.lines.line("profile")}}
	return nil
}

// featureKeys are the keys each kind of feature table takes.
var featureKeys = map[pantograph.Kind][]string{
	pantograph.KindCutout: append(append([]string{"name"}, shapeKeys...), slotKeys...),
	pantograph.KindPocket: append(append([]string{"name"}, shapeKeys...), "depth"),
	pantograph.KindHoles:  {"name", "diameter", "depth", "at"},
	pantograph.KindSlot:   append([]string{"name"}, append(slotKeys, "depth")...),
	pantograph.KindGroove: {"name", "points", "width", "depth"},
}

// featureOrder is the order the kinds are read in; features are then sorted by line.
var featureOrder = []pantograph.Kind{pantograph.KindCutout, pantograph.KindPocket,
	pantograph.KindHoles, pantograph.KindSlot, pantograph.KindGroove}

// readFeatures reads every [[cutout]], [[pocket]], [[holes]], [[slot]] and [[groove]] table.
func (r *reader) readFeatures(top table, p *pantograph.Part) error {
	for _, k := range featureOrder {
		v, ok := top.m[string(k)]
		if !ok {
			continue
		}
		list, ok := v.([]map[string]any)
		if !ok {
			return top.at(string(k)).errf("write [[%s]] with double brackets, once for each feature of the kind", k)
		}
		for i, m := range list {
			f, err := r.readFeature(k, i, m)
			if err != nil {
				return err
			}
			p.Features = append(p.Features, f)
		}
	}
	slices.SortStableFunc(p.Features, func(a, b pantograph.Feature) int { return a.Where.Line - b.Where.Line })
	return nil
}

// readFeature reads element i of the array of tables of kind k.
func (r *reader) readFeature(k pantograph.Kind, i int, m map[string]any) (pantograph.Feature, error) {
	t := table{r: r, path: fmt.Sprintf("%s#%d", k, i), label: fmt.Sprintf("[[%s]] #%d", k, i+1), m: m}
	f := pantograph.Feature{Kind: k, Name: fmt.Sprintf("%s %d", k, i+1),
		Where: pantograph.Where{File: r.file, Line: r.lines.line(t.path)}}
	if v, ok := m["name"]; ok {
		name, err := t.at("name").text(v)
		if err != nil {
			return f, err
		}
		f.Name = name
	}
	t.label = f.Label()
	if err := t.checkKeys(featureKeys[k]...); err != nil {
		return f, err
	}
	if err := readDepth(t, &f); err != nil {
		return f, err
	}
	f.KeyLines = t.keyLines()
	return f, readShape(t, &f)
}

// keyLines returns the line of every key of t, and of every entry of its lists ("at[2]").
func (t table) keyLines() map[string]int {
	out := map[string]int{}
	for k, v := range t.m {
		l := t.at(k)
		out[k] = t.r.lines.line(l.path)
		if a, ok := v.([]any); ok {
			for i := range a {
				out[fmt.Sprintf("%s[%d]", k, i)] = t.r.lines.line(l.elem(i).path)
			}
		}
	}
	return out
}

// readDepth reads depth where the kind takes one; cut-outs are always through.
func readDepth(t table, f *pantograph.Feature) error {
	if f.Kind == pantograph.KindCutout {
		f.Depth = pantograph.Depth{Through: true}
		return nil
	}
	v, ok := t.m["depth"]
	if !ok {
		return nil // pantograph.Check reports the missing depth with the other problems
	}
	d, err := t.at("depth").depth(v)
	f.Depth = d
	return err
}

// readShape reads the geometry of a feature.
func readShape(t table, f *pantograph.Feature) error {
	var err error
	switch f.Kind {
	case pantograph.KindCutout, pantograph.KindPocket:
		f.Region, err = t.outline(f.Kind == pantograph.KindCutout)
		if err == nil && t.has("from") {
			s, _ := t.slot()
			f.From, f.To, f.Width = s.from, s.to, s.width
		}
	case pantograph.KindHoles:
		return readHoles(t, f)
	case pantograph.KindSlot:
		var s slot
		if s, err = t.slot(); err == nil {
			f.From, f.To, f.Width = s.from, s.to, s.width
			f.Region = geom.NewRegion(geom.Capsule(s.from, s.to, s.width/2))
		}
	case pantograph.KindGroove:
		return readGroove(t, f)
	}
	return err
}

func readHoles(t table, f *pantograph.Feature) error {
	var err error
	if !t.has("diameter") {
		return t.errf("diameter missing")
	}
	if f.Diameter, err = t.at("diameter").length(t.m["diameter"]); err != nil {
		return err
	}
	if !t.has("at") {
		return t.errf("at missing: give the hole centres, at = [[x, y], ...]")
	}
	f.Centers, err = t.at("at").points(t.m["at"])
	if err == nil && len(f.Centers) == 0 {
		return t.at("at").errf("no hole centres given")
	}
	return err
}

func readGroove(t table, f *pantograph.Feature) error {
	var err error
	if !t.has("points") {
		return t.errf("points missing: give the line to engrave, points = [[x, y], [x, y], ...]")
	}
	if f.Path, err = t.at("points").points(t.m["points"]); err != nil {
		return err
	}
	if len(f.Path) < 2 {
		return t.at("points").errf("a groove needs at least 2 points, got %d", len(f.Path))
	}
	if v, ok := t.m["width"]; ok {
		f.Width, err = t.at("width").length(v)
	}
	return err
}
