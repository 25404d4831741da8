package partfile

import (
	"fmt"
	"math"
	"os"
	"slices"

	"github.com/BurntSushi/toml"

	"panto/pantograph"
)

// A machine file describes a pantograph mill with its tools and printer, in TOML:
//
//	name  = "bench pantograph"       free text
//	units = "mm"                     "mm" (default) or "in": the unit of every length below
//	[ratio]                          REQUIRED: min and max, or settings = [2, 3, 5, 10]
//	  pivot                          "end" (default: the copy lies as the template) or
//	                                 "between" (pivot between stylus and cutter: turned 180°)
//	[copy_table]  travel = [x, y]    how far the table moves
//	  fixing_spacing = [x, y]        centre distance of its clamps or T-slots, for the plate
//	  fixing_size                    diameter of its clamp bolts
//	[work_table]  travel = [x, y]
//	[dials.copy_x] (copy_y, work_x, work_y, depth)
//	  pitch, divisions               REQUIRED in a dial: advance per turn, graduations per turn
//	  units, backlash, count_up      the screw's units (default: the file's), lost motion on
//	                                 reversing in the screw's units, which way counting up
//	                                 moves the table: "right" or "left" (X dials), "away" or
//	                                 "toward" (Y), "down" or "up" (depth); reversed = true is
//	                                 the older way to say the second
//	[spindle]     min_rpm, max_rpm
//	[[stylus]]    name, diameter, tip ("round", the default, or "pointed")
//	[[cutter]]    name, diameter, material ("hss" or "carbide"), flutes
//	[[drill]]     name, diameter, material
//	[printer]     bed = [x, y], height, scale = [sx, sy], hole_growth, accuracy (default 0.1 mm)
//	[[stock_material]] name, hss_drill, hss_mill, ... (see machine_materials.go)
//
// Only [ratio] is required of the file, because a pantograph mill is its ratio: without it no
// template size can be checked against the machine, and a ratio the linkage cannot be set to
// would pass unnoticed. A dial must give pitch and divisions because without either it has no
// reading. A round stylus, a cutter and a drill must give their diameter. Everything else may
// be left out and reads as 0, "not stated". Dial pitch and backlash stay in the screw's own
// units, because that is what the dial reads; every other length is converted to mm.

// machineTopKeys are the keys a machine file may have outside any table.
var machineTopKeys = []string{"name", "units", "ratio", "copy_table", "work_table", "dials",
	"spindle", "stylus", "cutter", "drill", "printer", "stock_material"}

// dialKeys are the dials under [dials], and dialFields the keys of each.
var (
	dialKeys   = []string{"copy_x", "copy_y", "work_x", "work_y", "depth"}
	dialFields = []string{"pitch", "divisions", "units", "backlash", "count_up", "reversed"}
)

// maxPrintAccuracy bounds [printer] accuracy, mm: a printer that strays further than this is
// no use for templates, and a larger figure is a slip (common practice, no source).
const maxPrintAccuracy = 2.0

// minRatio is the smallest ratio a machine may state: the template is never smaller than the
// part in this method (DESIGN.md: the template is R times larger).
const minRatio = 1

// Printer scale corrections outside minPrinterScale..maxPrinterScale are taken for mistakes
// (a percentage such as 100.4 written for 1.004): a printer that is off by a factor of two is
// not corrected by scaling (common practice, no source: printers measure within a few percent).
const (
	minPrinterScale = 0.5
	maxPrinterScale = 2
)

// ReadMachineFile reads the machine file at path; messages name the file as path.
func ReadMachineFile(path string) (pantograph.Machine, error) {
	src, err := os.ReadFile(path)
	if err != nil {
		return pantograph.Machine{}, err
	}
	return ReadMachine(path, src)
}

// ReadMachine reads a machine file from src; name is used in messages and as Machine.Source.
// Mistakes are returned as *Error naming the file, line and key.
func ReadMachine(name string, src []byte) (pantograph.Machine, error) {
	var m map[string]any
	if _, err := toml.Decode(string(src), &m); err != nil {
		return pantograph.Machine{}, syntaxError(name, src, err)
	}
	r := &reader{file: name, lines: indexLines(string(src)), scale: 1}
	top := table{r: r, m: m}
	mc := pantograph.Machine{Source: name, Units: pantograph.MM}
	steps := []func(table, *pantograph.Machine) error{
		readMachineHead, readRatio, readTables, readDials, readSpindle, readStyli, readCutters,
		readDrills, readPrinter, readStockMaterials,
	}
	top.checkKeys(machineTopKeys...)
	var err error
	for _, step := range steps {
		if err = step(top, &mc); err != nil {
			break
		}
	}
	if err = r.finish(err); err != nil {
		return pantograph.Machine{}, err
	}
	return mc, nil
}

// readMachineHead reads name and units; units set the scale of every later length.
func readMachineHead(top table, mc *pantograph.Machine) error {
	var err error
	if v, ok := top.m["name"]; ok {
		if mc.Name, err = top.at("name").text(v); err != nil {
			return err
		}
	}
	if v, ok := top.m["units"]; ok {
		if mc.Units, err = top.at("units").units(v); err != nil {
			return err
		}
		if mc.Units == pantograph.Inch {
			top.r.scale = pantograph.MMPerInch
		}
	}
	return nil
}

// units reads "mm" or "in".
func (l loc) units(v any) (pantograph.Units, error) {
	u, err := l.text(v)
	if err != nil {
		return "", err
	}
	if u := pantograph.Units(u); u == pantograph.MM || u == pantograph.Inch {
		return u, nil
	}
	return "", l.errf(`must be "mm" or "in", got %q`, u)
}

// child returns the table under key inside t, e.g. [dials.copy_x] inside [dials], or an error
// when the key holds something else.
func (t table) child(key string, v any) (table, error) {
	path := join(t.path, key)
	m, ok := v.(map[string]any)
	if !ok {
		if _, list := v.([]map[string]any); list {
			return table{}, t.at(key).errf("write [%s] once, with single brackets", path)
		}
		return table{}, t.at(key).errf("must be a table, written [%s] on a line of its own, got %s", path, describe(v))
	}
	return table{r: t.r, path: path, label: "[" + path + "]", m: m}, nil
}

// optChild returns the table under key and whether it is there.
func (t table) optChild(key string, known ...string) (table, bool, error) {
	v, ok := t.m[key]
	if !ok {
		return table{}, false, nil
	}
	c, err := t.child(key, v)
	if err == nil {
		err = c.checkKeys(known...)
	}
	return c, err == nil, err
}

// readRatio reads [ratio]: min and max for a linkage set anywhere between, or fixed settings.
func readRatio(top table, mc *pantograph.Machine) error {
	t, ok, err := top.optChild("ratio", "min", "max", "settings", "pivot")
	if err != nil {
		return err
	}
	if !ok {
		return &Error{File: top.r.file, Msg: "no [ratio]: say what the linkage can be set to, for example\n" +
			"  [ratio]\n  min = 2\n  max = 10\nor, for a machine with fixed settings,\n  [ratio]\n  settings = [2, 5, 10]"}
	}
	if err := readPivot(t, mc); err != nil {
		return err
	}
	if t.has("settings") {
		if t.has("min") || t.has("max") {
			return t.errf("give min and max (a linkage set anywhere between) or settings (fixed ones), not both")
		}
		return readSettings(t, &mc.Ratio)
	}
	if !t.has("min") || !t.has("max") {
		return t.errf("give both min and max, or settings = [...] for fixed settings")
	}
	if mc.Ratio.Min, err = t.at("min").ratio(t.m["min"]); err != nil {
		return err
	}
	if mc.Ratio.Max, err = t.at("max").ratio(t.m["max"]); err != nil {
		return err
	}
	if mc.Ratio.Min > mc.Ratio.Max {
		return t.at("max").errf("must not be less than min (%g), got %g", mc.Ratio.Min, mc.Ratio.Max)
	}
	return nil
}

// readPivot reads [ratio] pivot: "end" (the default) or "between".
func readPivot(t table, mc *pantograph.Machine) error {
	mc.Pivot = pantograph.PivotEnd
	v, ok := t.m["pivot"]
	if !ok {
		return nil
	}
	l := t.at("pivot")
	s, err := l.text(v)
	if err != nil {
		return err
	}
	switch p := pantograph.Pivot(s); p {
	case pantograph.PivotEnd, pantograph.PivotBetween:
		mc.Pivot = p
		return nil
	}
	return l.errf(`must be "end" (the fixed pivot at the end of the arms: the copy lies as the template) `+
		`or "between" (the pivot between stylus and cutter: the copy is turned 180°), got %q`, s)
}

// readSettings reads the fixed ratio settings, sorted, each once.
func readSettings(t table, rr *pantograph.RatioRange) error {
	l := t.at("settings")
	a, err := l.list(t.m["settings"])
	if err != nil {
		return err
	}
	if len(a) == 0 {
		return l.errf("no settings given: list the ratios the linkage can be set to, e.g. [2, 5, 10]")
	}
	for i, v := range a {
		s, err := l.elem(i).ratio(v)
		if err != nil {
			return err
		}
		rr.Settings = append(rr.Settings, s)
	}
	slices.Sort(rr.Settings)
	rr.Settings = slices.Compact(rr.Settings)
	rr.Min, rr.Max = rr.Settings[0], rr.Settings[len(rr.Settings)-1]
	return nil
}

// ratio reads a ratio R: a plain number, at least minRatio.
func (l loc) ratio(v any) (float64, error) {
	f, err := l.number(v)
	if err != nil {
		return 0, err
	}
	if f < minRatio {
		return 0, l.errf("a ratio is template size : part size and must be at least %d, got %v", minRatio, f)
	}
	return f, nil
}

// positive reads a plain number greater than 0, not converted.
func (l loc) positive(v any) (float64, error) {
	f, err := l.number(v)
	if err != nil {
		return 0, err
	}
	if f <= 0 {
		return 0, l.errf("must be greater than 0, got %v", f)
	}
	return f, nil
}

// count reads a whole number greater than 0.
func (l loc) count(v any) (int, error) {
	f, err := l.positive(v)
	if err != nil {
		return 0, err
	}
	if f != math.Trunc(f) || f > math.MaxInt32 {
		return 0, l.errf("must be a whole number, got %v", f)
	}
	return int(f), nil
}

// flag reads true or false.
func (l loc) flag(v any) (bool, error) {
	b, ok := v.(bool)
	if !ok {
		return false, l.errf("must be true or false, got %s", describe(v))
	}
	return b, nil
}

// pair reads [x, y] of two numbers each read by one, e.g. a travel or a pair of scale factors.
func (l loc) pair(v any, one func(loc, any) (float64, error)) (float64, float64, error) {
	a, ok := v.([]any)
	if !ok || len(a) != 2 {
		return 0, 0, l.errf("must be two numbers written [x, y], got %s", describeValue(v))
	}
	x, err := one(l.elem(0), a[0])
	if err != nil {
		return 0, 0, err
	}
	y, err := one(l.elem(1), a[1])
	return x, y, err
}

// describeValue shows a value for messages, listing a list's entries.
func describeValue(v any) string {
	if a, ok := v.([]any); ok {
		return describeList(a)
	}
	return describe(v)
}

// readTables reads the travel of [copy_table] and [work_table], and how a template plate is
// bolted to the copy table.
func readTables(top table, mc *pantograph.Machine) error {
	for _, tt := range []struct {
		key   string
		to    *pantograph.Travel
		known []string
	}{
		{"copy_table", &mc.CopyTable, []string{"travel", "fixing_spacing", "fixing_size"}},
		{"work_table", &mc.WorkTable, []string{"travel"}},
	} {
		t, ok, err := top.optChild(tt.key, tt.known...)
		if err != nil {
			return err
		}
		if ok && t.has("travel") {
			if tt.to.X, tt.to.Y, err = t.at("travel").pair(t.m["travel"], loc.length); err != nil {
				return err
			}
		}
		if ok && tt.key == "copy_table" {
			if err := readFixing(t, &mc.Fixing); err != nil {
				return err
			}
		}
	}
	return nil
}

// maxFixingSize is the largest clamp bolt a copy table takes, in mm: an inch (common practice,
// no source: bench pantographs clamp with M6 to M10 or 1/4 to 3/8 in bolts). A larger size is
// taken for a mistake, such as a bolt size written in mm in an inch file.
const maxFixingSize = 25.4

// readFixing reads fixing_spacing and fixing_size of [copy_table].
func readFixing(t table, f *pantograph.Fixing) error {
	var err error
	if v, ok := t.m["fixing_spacing"]; ok {
		if f.Spacing.X, f.Spacing.Y, err = t.at("fixing_spacing").pair(v, loc.length); err != nil {
			return err
		}
	}
	if v, ok := t.m["fixing_size"]; ok {
		l := t.at("fixing_size")
		if f.Size, err = l.length(v); err == nil && f.Size > maxFixingSize {
			err = l.errf("must be the clamp bolts' diameter, at most %g mm (1 in), got %.4g mm",
				maxFixingSize, f.Size)
		}
	}
	return err
}

// readDials reads [dials.copy_x] and the other dials.
func readDials(top table, mc *pantograph.Machine) error {
	t, ok, err := top.optChild("dials", dialKeys...)
	if err != nil || !ok {
		return err
	}
	to := map[string]*pantograph.Dial{"copy_x": &mc.Dials.CopyX, "copy_y": &mc.Dials.CopyY,
		"work_x": &mc.Dials.WorkX, "work_y": &mc.Dials.WorkY, "depth": &mc.Dials.Depth}
	for _, key := range dialKeys {
		d, ok, err := t.optChild(key, dialFields...)
		if err != nil {
			return err
		}
		if ok {
			if *to[key], err = readDial(d, key, mc.Units); err != nil {
				return err
			}
		}
	}
	return nil
}

// readDial reads the dial named key; its units default to the file's.
func readDial(t table, key string, fileUnits pantograph.Units) (pantograph.Dial, error) {
	d := pantograph.Dial{Units: fileUnits}
	var err error
	for _, key := range []string{"pitch", "divisions"} {
		if !t.has(key) {
			return d, t.errf("%s missing: a dial needs the screw's pitch (advance per turn) and "+
				"the number of divisions on its collar, e.g. pitch = 2, divisions = 100", key)
		}
	}
	if v, ok := t.m["units"]; ok {
		if d.Units, err = t.at("units").units(v); err != nil {
			return d, err
		}
	}
	if d.Pitch, err = t.at("pitch").positive(t.m["pitch"]); err != nil {
		return d, err
	}
	if d.Divisions, err = t.at("divisions").count(t.m["divisions"]); err != nil {
		return d, err
	}
	if v, ok := t.m["backlash"]; ok {
		if d.Backlash, err = t.at("backlash").number(v); err == nil && d.Backlash < 0 {
			err = t.at("backlash").errf("must be 0 or more, got %v", d.Backlash)
		}
		if err != nil {
			return d, err
		}
	}
	d.Reversed, err = readCountUp(t, key)
	return d, err
}

// countUpWords are the words count_up takes for each dial: which way counting up moves the
// table (X to the operator's right or left, Y away or toward, the knee down or up), the first
// word of each pair being the plain direction (+X, +Y, down into the work).
var countUpWords = map[string][2]string{"copy_x": {"right", "left"}, "work_x": {"right", "left"},
	"copy_y": {"away", "toward"}, "work_y": {"away", "toward"}, "depth": {"down", "up"}}

// readCountUp reads which way counting up moves the dial's table, from count_up (its words) or
// the older reversed = true / false, and reports whether that is against the axis.
func readCountUp(t table, key string) (bool, error) {
	words := countUpWords[key]
	if t.has("count_up") && t.has("reversed") {
		return false, t.at("reversed").errf("give count_up = %q or %q, not reversed as well", words[0], words[1])
	}
	if v, ok := t.m["reversed"]; ok {
		return t.at("reversed").flag(v)
	}
	v, ok := t.m["count_up"]
	if !ok {
		return false, nil
	}
	l := t.at("count_up")
	s, err := l.text(v)
	switch {
	case err != nil:
		return false, err
	case s == words[0]:
		return false, nil
	case s == words[1]:
		return true, nil
	}
	return false, l.errf("says which way counting up moves the table: %q or %q, got %q", words[0], words[1], s)
}

// readSpindle reads [spindle] min_rpm and max_rpm.
func readSpindle(top table, mc *pantograph.Machine) error {
	t, ok, err := top.optChild("spindle", "min_rpm", "max_rpm")
	if err != nil || !ok {
		return err
	}
	for _, f := range []struct {
		key string
		to  *float64
	}{{"min_rpm", &mc.Spindle.MinRPM}, {"max_rpm", &mc.Spindle.MaxRPM}} {
		if v, ok := t.m[f.key]; ok {
			if *f.to, err = t.at(f.key).positive(v); err != nil {
				return err
			}
		}
	}
	if s := mc.Spindle; s.MinRPM > 0 && s.MaxRPM > 0 && s.MinRPM > s.MaxRPM {
		return t.at("max_rpm").errf("must not be less than min_rpm (%g), got %g", s.MinRPM, s.MaxRPM)
	}
	return nil
}

// readPrinter reads [printer].
func readPrinter(top table, mc *pantograph.Machine) error {
	t, ok, err := top.optChild("printer", "bed", "height", "scale", "hole_growth", "accuracy")
	if err != nil || !ok {
		return err
	}
	p := &mc.Printer
	if v, ok := t.m["bed"]; ok {
		if p.Bed.X, p.Bed.Y, err = t.at("bed").pair(v, loc.length); err != nil {
			return err
		}
	}
	if v, ok := t.m["height"]; ok {
		if p.Height, err = t.at("height").length(v); err != nil {
			return err
		}
	}
	if v, ok := t.m["scale"]; ok {
		if p.ScaleX, p.ScaleY, err = t.at("scale").pair(v, loc.scaleFactor); err != nil {
			return err
		}
	}
	if v, ok := t.m["accuracy"]; ok {
		l := t.at("accuracy")
		if p.Accuracy, err = l.length(v); err == nil && p.Accuracy > maxPrintAccuracy {
			err = l.errf("is how far a printed edge may stray, at most %g mm, got %.4g mm", maxPrintAccuracy, p.Accuracy)
		}
		if err != nil {
			return err
		}
	}
	if v, ok := t.m["hole_growth"]; ok {
		// any sign: FDM holes print small (grow them), some resin printers print them large
		f, err := t.at("hole_growth").number(v)
		p.HoleGrowth = f * t.r.scale
		return err
	}
	return nil
}

// scaleFactor reads a printer's scale correction, a factor near 1.
func (l loc) scaleFactor(v any) (float64, error) {
	f, err := l.positive(v)
	if err == nil && (f < minPrinterScale || f > maxPrinterScale) {
		err = l.errf("must be a factor near 1, such as 1.004 for a printer that prints 0.4 %% small, got %v", f)
	}
	return f, err
}

// item is one table of an array of tables such as [[stylus]], with the name it goes by.
type item struct {
	table
	name string
}

// items returns the tables of the array of tables key, each named by its name key or, when it
// has none, by its kind and number ("stylus 2"). Two tables of one kind may not share a name,
// because the name is how a plan and the dial sheet point at the tool.
func (t table) items(key string, known ...string) ([]item, error) {
	v, ok := t.m[key]
	if !ok {
		return nil, nil
	}
	list, ok := v.([]map[string]any)
	if !ok {
		return nil, t.at(key).errf("write [[%s]] with double brackets, once for each %s", key, key)
	}
	out := make([]item, len(list))
	seen := map[string]int{}
	for i, m := range list {
		it := item{table: table{r: t.r, path: fmt.Sprintf("%s#%d", key, i),
			label: fmt.Sprintf("[[%s]] #%d", key, i+1), m: m}, name: fmt.Sprintf("%s %d", key, i+1)}
		if v, ok := m["name"]; ok {
			name, err := it.at("name").text(v)
			if err != nil {
				return nil, err
			}
			it.name, it.label = name, fmt.Sprintf("[[%s]] %q", key, name)
		}
		if j, dup := seen[it.name]; dup {
			return nil, it.at("name").errf("the name %q is already used by the %s on line %d; give each %s its own name",
				it.name, key, t.r.lines.line(out[j].path), key)
		}
		seen[it.name] = i
		if err := it.checkKeys(known...); err != nil {
			return nil, err
		}
		out[i] = it
	}
	return out, nil
}

// diameter reads the required diameter of a tool, converted to mm.
func (it item) diameter() (float64, error) {
	v, ok := it.m["diameter"]
	if !ok {
		return 0, it.errf("diameter missing")
	}
	return it.at("diameter").length(v)
}

// toolMaterial reads the optional tool material, "hss" or "carbide".
func (it item) toolMaterial() (string, error) {
	v, ok := it.m["material"]
	if !ok {
		return "", nil
	}
	l := it.at("material")
	s, err := l.text(v)
	if err == nil && s != "hss" && s != "carbide" {
		err = l.errf(`must be "hss" (high-speed steel) or "carbide", got %q`, s)
	}
	return s, err
}

// readStyli reads every [[stylus]]. A pointed stylus need not give its diameter: it traces
// with its point.
func readStyli(top table, mc *pantograph.Machine) error {
	items, err := top.items("stylus", "name", "diameter", "tip")
	for _, it := range items {
		s := pantograph.Stylus{Name: it.name, Tip: pantograph.TipRound}
		if v, ok := it.m["tip"]; ok {
			l := it.at("tip")
			tip, err := l.text(v)
			if err != nil {
				return err
			}
			if s.Tip = pantograph.Tip(tip); s.Tip != pantograph.TipRound && s.Tip != pantograph.TipPointed {
				return l.errf(`must be "round" or "pointed", got %q`, tip)
			}
		}
		if s.Tip == pantograph.TipRound || it.has("diameter") {
			if s.Diameter, err = it.diameter(); err != nil {
				return err
			}
		}
		mc.Styli = append(mc.Styli, s)
	}
	return err
}

// readCutters reads every [[cutter]].
func readCutters(top table, mc *pantograph.Machine) error {
	items, err := top.items("cutter", "name", "diameter", "material", "flutes")
	for _, it := range items {
		c := pantograph.Cutter{Name: it.name}
		if c.Diameter, err = it.diameter(); err != nil {
			return err
		}
		if c.Material, err = it.toolMaterial(); err != nil {
			return err
		}
		if v, ok := it.m["flutes"]; ok {
			if c.Flutes, err = it.at("flutes").count(v); err != nil {
				return err
			}
		}
		mc.Cutters = append(mc.Cutters, c)
	}
	return err
}

// readDrills reads every [[drill]].
func readDrills(top table, mc *pantograph.Machine) error {
	items, err := top.items("drill", "name", "diameter", "material")
	for _, it := range items {
		d := pantograph.Drill{Name: it.name}
		if d.Diameter, err = it.diameter(); err != nil {
			return err
		}
		if d.Material, err = it.toolMaterial(); err != nil {
			return err
		}
		mc.Drills = append(mc.Drills, d)
	}
	return err
}
