package partfile

import (
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"panto/pantograph"
)

// ratioHead is the one table every machine file needs; it ends on line 3.
const ratioHead = `[ratio]
min = 2
max = 10
`

func readMachine(t *testing.T, src string) pantograph.Machine {
	t.Helper()
	m, err := ReadMachine("m.toml", []byte(src))
	if err != nil {
		t.Fatalf("ReadMachine: %v", err)
	}
	return m
}

// TestReadMachineEveryKey reads a file setting every key once and checks where each lands.
func TestReadMachineEveryKey(t *testing.T) {
	m := readMachine(t, `name = "test mill"
units = "mm"
[ratio]
settings = [10, 2, 5, 5]
[copy_table]
travel = [250, 150]
fixing_spacing = [100, 50]
fixing_size = 6
[work_table]
travel = [60, 40.5]
[dials.copy_x]
pitch = 2
divisions = 100
units = "mm"
backlash = 0.08
reversed = true
[dials.copy_y]
pitch = 2
divisions = 100
[dials.work_x]
pitch = 1
divisions = 50
[dials.work_y]
pitch = 1.5
divisions = 75
[dials.depth]
pitch = 0.1
divisions = 100
units = "in"
backlash = 0.002
[spindle]
min_rpm = 2000
max_rpm = 15000
[[stylus]]
name = "big"
diameter = 4
tip = "round"
[[stylus]]
tip = "pointed"
[[cutter]]
name = "fine"
diameter = 0.3
material = "carbide"
flutes = 2
[[drill]]
diameter = 0.5
material = "hss"
[printer]
bed = [220, 200]
height = 250
scale = [1.002, 0.999]
hole_growth = 0.3
`)
	want := pantograph.Machine{
		Name: "test mill", Source: "m.toml", Units: pantograph.MM,
		// settings sorted and each kept once; min and max are the ends
		Ratio:     pantograph.RatioRange{Min: 2, Max: 10, Settings: []float64{2, 5, 10}},
		CopyTable: pantograph.Travel{X: 250, Y: 150},
		Fixing:    pantograph.Fixing{Spacing: pantograph.Travel{X: 100, Y: 50}, Size: 6},
		WorkTable: pantograph.Travel{X: 60, Y: 40.5},
		Dials: pantograph.Dials{
			CopyX: pantograph.Dial{Pitch: 2, Divisions: 100, Units: pantograph.MM, Backlash: 0.08, Reversed: true},
			CopyY: pantograph.Dial{Pitch: 2, Divisions: 100, Units: pantograph.MM},
			WorkX: pantograph.Dial{Pitch: 1, Divisions: 50, Units: pantograph.MM},
			WorkY: pantograph.Dial{Pitch: 1.5, Divisions: 75, Units: pantograph.MM},
			// an inch screw on a metric machine keeps its inch pitch and backlash
			Depth: pantograph.Dial{Pitch: 0.1, Divisions: 100, Units: pantograph.Inch, Backlash: 0.002},
		},
		Spindle: pantograph.Spindle{MinRPM: 2000, MaxRPM: 15000},
		Styli: []pantograph.Stylus{{Name: "big", Diameter: 4, Tip: pantograph.TipRound},
			{Name: "stylus 2", Tip: pantograph.TipPointed}},
		Cutters: []pantograph.Cutter{{Name: "fine", Diameter: 0.3, Material: "carbide", Flutes: 2}},
		Drills:  []pantograph.Drill{{Name: "drill 1", Diameter: 0.5, Material: "hss"}},
		Printer: pantograph.Printer{Bed: pantograph.Travel{X: 220, Y: 200}, Height: 250,
			ScaleX: 1.002, ScaleY: 0.999, HoleGrowth: 0.3},
	}
	checkMachine(t, m, want)
}

// checkMachine compares two machines field by field, so a failure names the field.
func checkMachine(t *testing.T, got, want pantograph.Machine) {
	t.Helper()
	pairs := []struct {
		name      string
		got, want any
	}{
		{"name", got.Name, want.Name}, {"source", got.Source, want.Source}, {"units", got.Units, want.Units},
		{"ratio min", got.Ratio.Min, want.Ratio.Min}, {"ratio max", got.Ratio.Max, want.Ratio.Max},
		{"copy table", got.CopyTable, want.CopyTable}, {"work table", got.WorkTable, want.WorkTable},
		{"fixing", got.Fixing, want.Fixing},
		{"dials", got.Dials, want.Dials}, {"spindle", got.Spindle, want.Spindle}, {"printer", got.Printer, want.Printer},
	}
	for _, p := range pairs {
		if p.got != p.want {
			t.Errorf("%s: got %+v, want %+v", p.name, p.got, p.want)
		}
	}
	if !slices.Equal(got.Ratio.Settings, want.Ratio.Settings) {
		t.Errorf("ratio settings: got %v, want %v", got.Ratio.Settings, want.Ratio.Settings)
	}
	if !slices.Equal(got.Styli, want.Styli) {
		t.Errorf("styli: got %+v, want %+v", got.Styli, want.Styli)
	}
	if !slices.Equal(got.Cutters, want.Cutters) {
		t.Errorf("cutters: got %+v, want %+v", got.Cutters, want.Cutters)
	}
	if !slices.Equal(got.Drills, want.Drills) {
		t.Errorf("drills: got %+v, want %+v", got.Drills, want.Drills)
	}
}

// TestReadMachineDefaults reads the smallest machine file: only [ratio].
// TestReadMachineMaterials reads [[stock_material]] rows: speeds in m/min in a metric file and
// in surface feet a minute in an inch one (derived: 200 SFM × 0.3048 = 60.96 m/min); carbide
// twice HSS and a step share of 0.25 when not given.
func TestReadMachineMaterials(t *testing.T) {
	for _, tc := range []struct {
		units string
		drill float64
	}{{"mm", 200}, {"in", 200 * 0.3048}} {
		src := "units = \"" + tc.units + "\"\n" + ratioHead + "[[stock_material]]\nname = \"Boxwood\"\nhss_drill = 200\nhss_mill = 100\n"
		m, err := ReadMachine("m.toml", []byte(src))
		if err != nil {
			t.Fatal(err)
		}
		if len(m.Materials) != 1 {
			t.Fatalf("got %d materials, want 1", len(m.Materials))
		}
		r := m.Materials[0]
		if r.Name != "boxwood" || math.Abs(r.HSSDrill-tc.drill) > 1e-9 || math.Abs(r.CarbideDrill-2*tc.drill) > 1e-9 ||
			r.StepShare != 0.25 || !strings.Contains(r.Source, "m.toml") {
			t.Errorf("%s file: got %+v, want boxwood at %v m/min", tc.units, r, tc.drill)
		}
		if got, err := pantograph.MaterialsFor(&m).Resolve("seasoned boxwood"); err != nil || got.Name != "boxwood" {
			t.Errorf("%s file: resolving boxwood: %+v %v", tc.units, got, err)
		}
	}
}

func TestReadMachineDefaults(t *testing.T) {
	m := readMachine(t, ratioHead)
	want := pantograph.Machine{Source: "m.toml", Units: pantograph.MM, Ratio: pantograph.RatioRange{Min: 2, Max: 10}}
	checkMachine(t, m, want)
	if m.Ratio.Settings != nil || m.Styli != nil {
		t.Errorf("got settings %v, styli %v, want none", m.Ratio.Settings, m.Styli)
	}
}

// TestReadMachineInches checks that inch lengths become mm and dial pitches stay in inches.
func TestReadMachineInches(t *testing.T) {
	const in = 25.4 // mm per inch, exact by definition
	m := readMachine(t, `units = "in"
`+ratioHead+`[copy_table]
travel = [12, 6]
fixing_spacing = [4, 2]
fixing_size = 0.25
[dials.copy_x]
pitch = 0.1
divisions = 100
backlash = 0.004
[dials.depth]
pitch = 1
divisions = 50
units = "mm"
[[stylus]]
diameter = 0.125
[[cutter]]
diameter = 0.015625
[[drill]]
diameter = 0.028
[printer]
bed = [8, 8]
height = 10
hole_growth = 0.01
`)
	checks := []struct {
		name      string
		got, want float64
	}{
		{"copy travel x", m.CopyTable.X, 12 * in},
		{"copy travel y", m.CopyTable.Y, 6 * in},
		{"fixing spacing x", m.Fixing.Spacing.X, 4 * in},
		{"fixing spacing y", m.Fixing.Spacing.Y, 2 * in},
		{"fixing bolt", m.Fixing.Size, 0.25 * in},
		{"copy x pitch, in inches", m.Dials.CopyX.Pitch, 0.1},
		{"copy x backlash, in inches", m.Dials.CopyX.Backlash, 0.004},
		{"depth pitch, in its own mm", m.Dials.Depth.Pitch, 1},
		{"stylus", m.Styli[0].Diameter, 0.125 * in},
		{"cutter", m.Cutters[0].Diameter, 0.015625 * in},
		{"drill", m.Drills[0].Diameter, 0.028 * in},
		{"bed x", m.Printer.Bed.X, 8 * in},
		{"height", m.Printer.Height, 10 * in},
		{"hole growth", m.Printer.HoleGrowth, 0.01 * in},
		{"ratio, no unit", m.Ratio.Max, 10},
	}
	for _, c := range checks {
		if !near(c.got, c.want, 1e-12) {
			t.Errorf("%s: got %v, want %v", c.name, c.got, c.want)
		}
	}
	if m.Units != pantograph.Inch || m.Dials.CopyX.Units != pantograph.Inch || m.Dials.Depth.Units != pantograph.MM {
		t.Errorf("units: got file %q, copy x %q, depth %q; want in, in, mm", m.Units, m.Dials.CopyX.Units, m.Dials.Depth.Units)
	}
}

// TestReadMachineErrors reads broken machine files and checks the line and words of the error.
func TestReadMachineErrors(t *testing.T) {
	tests := []struct {
		name string
		src  string
		line int
		frag string
	}{
		{"no ratio", `name = "x"`, 0, "no [ratio]"},
		{"syntax", ratioHead + "[spindle\n", 4, "not valid TOML"},
		{"top typo", ratioHead + "[spindel]\nmax_rpm = 1\n", 4, "unknown key `spindel` in the top level of the file — did you mean `spindle`?"},
		{"ratio typo", "[ratio]\nmin = 2\nmax = 3\nsetings = [2]\n", 4, "did you mean `settings`?"},
		{"dial name typo", ratioHead + "[dials.copy_z]\npitch = 1\ndivisions = 50\n", 4, "did you mean `copy_x`?"},
		{"dial key typo", ratioHead + "[dials.work_x]\npitch = 1\ndivisons = 50\n", 6, "did you mean `divisions`?"},
		{"stylus key typo", ratioHead + "[[stylus]]\ndiameter = 1\n[[stylus]]\nname = \"b\"\ndiamter = 2\n", 8,
			"unknown key `diamter` in [[stylus]] \"b\" — did you mean `diameter`?"},
		{"units", `units = "cm"` + "\n" + ratioHead, 1, `key units: must be "mm" or "in", got "cm"`},
		{"min and settings", "[ratio]\nmin = 2\nsettings = [2, 5]\n", 1, "not both"},
		{"max missing", "[ratio]\nmin = 2\n", 1, "give both min and max"},
		{"ratio below 1", "[ratio]\nmin = 0.5\nmax = 2\n", 2, "key min: a ratio is template size : part size and must be at least 1, got 0.5"},
		{"min above max", "[ratio]\nmin = 10\nmax = 2\n", 3, "key max: must not be less than min (10), got 2"},
		{"setting as text", "[ratio]\nsettings = [\n  2,\n  \"5\",\n]\n", 4, `key settings (entry 2): must be a number, got text "5"`},
		{"no settings", "[ratio]\nsettings = []\n", 2, "no settings given"},
		{"ratio as a value", "ratio = 10\n", 1, "must be a table, written [ratio] on a line of its own"},
		{"travel one number", ratioHead + "[copy_table]\ntravel = 250\n", 5, "key travel: must be two numbers written [x, y], got 250"},
		{"travel negative", ratioHead + "[work_table]\ntravel = [60, -40]\n", 5, "key travel (entry 2): must be greater than 0, got -40"},
		{"fixing spacing one number", ratioHead + "[copy_table]\ntravel = [250, 150]\nfixing_spacing = 100\n", 6,
			"[copy_table]: key fixing_spacing: must be two numbers written [x, y], got 100"},
		{"fixing spacing zero", ratioHead + "[copy_table]\nfixing_spacing = [100, 0]\n", 5,
			"key fixing_spacing (entry 2): must be greater than 0, got 0"},
		{"fixing size text", ratioHead + "[copy_table]\nfixing_size = \"M6\"\n", 5, `key fixing_size: must be a number, got text "M6"`},
		{"pivot word", "[ratio]\nmin = 2\nmax = 10\npivot = \"middle\"\n", 4, `key pivot: must be "end"`},
		{"count_up word", ratioHead + "[dials.copy_y]\npitch = 2\ndivisions = 100\ncount_up = \"right\"\n", 7,
			`key count_up: says which way counting up moves the table: "away" or "toward", got "right"`},
		{"count_up and reversed", ratioHead + "[dials.work_x]\npitch = 1\ndivisions = 50\ncount_up = \"left\"\nreversed = true\n", 8,
			`key reversed: give count_up = "right" or "left", not reversed as well`},
		{"material without name", ratioHead + "[[stock_material]]\nhss_drill = 60\nhss_mill = 50\n", 4, "name missing"},
		{"material without speed", ratioHead + "[[stock_material]]\nname = \"boxwood\"\nhss_mill = 50\n", 4, "hss_drill missing"},
		{"material too fast", ratioHead + "[[stock_material]]\nname = \"boxwood\"\nhss_drill = 6000\nhss_mill = 50\n", 6,
			"key hss_drill: must be a surface speed of at most 2000 m/min, got 6000"},
		{"material step share", ratioHead + "[[stock_material]]\nname = \"boxwood\"\nhss_drill = 60\nhss_mill = 50\nstep_share = 2\n", 8,
			"key step_share: is the depth of a pass as a share of the cutter's diameter, at most 1, got 2"},
		// 6 read as inches is 152.4 mm, far over the 25.4 mm limit
		{"fixing size in the wrong units", `units = "in"` + "\n" + ratioHead + "[copy_table]\nfixing_size = 6\n", 6,
			"key fixing_size: must be the clamp bolts' diameter, at most 25.4 mm (1 in), got 152.4 mm"},
		{"fixing on the work table", ratioHead + "[work_table]\nfixing_spacing = [100, 50]\n", 5, "unknown key `fixing_spacing` in [work_table]"},
		{"fixing typo", ratioHead + "[copy_table]\nfixing_spacng = [100, 50]\n", 5, "did you mean `fixing_spacing`?"},
		{"dial pitch missing", ratioHead + "[dials.copy_x]\ndivisions = 100\n", 4, "[dials.copy_x]: pitch missing"},
		{"dial zero pitch", ratioHead + "[dials.copy_x]\npitch = 0\ndivisions = 100\n", 5, "key pitch: must be greater than 0, got 0"},
		{"dial fractional divisions", ratioHead + "[dials.depth]\npitch = 1\ndivisions = 50.5\n", 6, "must be a whole number, got 50.5"},
		{"dial negative backlash", ratioHead + "[dials.depth]\npitch = 1\ndivisions = 50\nbacklash = -0.1\n", 7, "must be 0 or more"},
		{"dial reversed as text", ratioHead + "[dials.depth]\npitch = 1\ndivisions = 50\nreversed = \"yes\"\n", 7, `must be true or false, got text "yes"`},
		{"dial units", ratioHead + "[dials.depth]\npitch = 1\ndivisions = 50\nunits = \"tpi\"\n", 7, `must be "mm" or "in"`},
		{"dials as list", ratioHead + "[[dials]]\n", 4, "write [dials] once"},
		{"spindle zero", ratioHead + "[spindle]\nmax_rpm = 0\n", 5, "key max_rpm: must be greater than 0"},
		{"spindle min above max", ratioHead + "[spindle]\nmin_rpm = 9000\nmax_rpm = 3000\n", 6, "must not be less than min_rpm"},
		{"stylus single brackets", ratioHead + "[stylus]\ndiameter = 1\n", 4, "write [[stylus]] with double brackets"},
		{"stylus no diameter", ratioHead + "[[stylus]]\nname = \"a\"\n", 4, `[[stylus]] "a": diameter missing`},
		{"stylus zero", ratioHead + "[[stylus]]\ndiameter = 0\n", 5, "[[stylus]] #1: key diameter: must be greater than 0, got 0"},
		{"stylus tip", ratioHead + "[[stylus]]\ndiameter = 1\ntip = \"ball\"\n", 6, `must be "round" or "pointed", got "ball"`},
		{"pointed negative", ratioHead + "[[stylus]]\ntip = \"pointed\"\ndiameter = -1\n", 6, "must be greater than 0"},
		{"duplicate names", ratioHead + "[[stylus]]\nname = \"a\"\ndiameter = 1\n[[stylus]]\nname = \"a\"\ndiameter = 2\n", 8,
			`the name "a" is already used by the stylus on line 4`},
		{"cutter material", ratioHead + "[[cutter]]\ndiameter = 1\nmaterial = \"cobalt\"\n", 6, `must be "hss" (high-speed steel) or "carbide"`},
		{"cutter flutes", ratioHead + "[[cutter]]\ndiameter = 1\nflutes = 0\n", 6, "key flutes: must be greater than 0"},
		{"cutter diameter text", ratioHead + "[[cutter]]\ndiameter = \"0.5\"\n", 5, `must be a number, got text "0.5"`},
		{"drill missing diameter", ratioHead + "[[drill]]\nmaterial = \"hss\"\n", 4, "diameter missing"},
		{"printer bed", ratioHead + "[printer]\nbed = [220, 0]\n", 5, "key bed (entry 2): must be greater than 0"},
		{"printer scale percent", ratioHead + "[printer]\nscale = [100.2, 100.1]\n", 5, "must be a factor near 1"},
		{"printer growth text", ratioHead + "[printer]\nhole_growth = \"0.3\"\n", 5, "must be a number"},
		{"printer typo", ratioHead + "[printer]\nhole_grow = 0.3\n", 5, "did you mean `hole_growth`?"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ReadMachine("m.toml", []byte(tc.src))
			var e *Error
			if !errors.As(err, &e) {
				t.Fatalf("got %v, want a *partfile.Error", err)
			}
			if e.Line != tc.line || !strings.Contains(e.Error(), tc.frag) || e.File != "m.toml" {
				t.Errorf("got line %d: %v\nwant line %d: ...%s...", e.Line, e, tc.line, tc.frag)
			}
		})
	}
}

// TestReadMachineBadFiles reads the broken files in testdata/machines/bad; each says on its first
// line, after "# want:", the line and message fragment of the error it must give.
func TestReadMachineBadFiles(t *testing.T) {
	files, _ := filepath.Glob("../../testdata/machines/bad/*.toml")
	if len(files) == 0 {
		t.Fatal("no bad machine files")
	}
	for _, file := range files {
		t.Run(filepath.Base(file), func(t *testing.T) {
			src, err := os.ReadFile(file)
			if err != nil {
				t.Fatal(err)
			}
			first, _, _ := strings.Cut(string(src), "\n")
			want, ok := strings.CutPrefix(first, "# want: ")
			if !ok {
				t.Fatalf("first line %q does not start with # want:", first)
			}
			_, err = ReadMachineFile(file)
			if err == nil || !strings.Contains(err.Error(), want) {
				t.Errorf("got %v, want ...%s...", err, want)
			}
		})
	}
}

// TestReadMachineSamples reads the sample machine files and checks values a machinist would
// read off their comments.
func TestReadMachineSamples(t *testing.T) {
	const in = 25.4 // mm per inch, exact
	bench, err := ReadMachineFile("../../samples/machines/bench-pantograph.machine.toml")
	if err != nil {
		t.Fatal(err)
	}
	inch, err := ReadMachineFile("../../samples/machines/inch-engraver.machine.toml")
	if err != nil {
		t.Fatal(err)
	}
	checks := []struct {
		name      string
		got, want float64
	}{
		// common practice, no source: 2 mm / 100 = 0.02 mm, 1 mm / 50 = 0.02 mm a division
		{"bench copy x per division", bench.Dials.CopyX.Pitch / float64(bench.Dials.CopyX.Divisions), 0.02},
		{"bench work x per division", bench.Dials.WorkX.Pitch / float64(bench.Dials.WorkX.Divisions), 0.02},
		{"bench top speed", bench.Spindle.MaxRPM, 15000},
		{"bench printer bed", bench.Printer.Bed.X, 220},
		{"bench hole growth", bench.Printer.HoleGrowth, 0.3},
		{"bench smallest cutter", bench.Cutters[0].Diameter, 0.3},
		{"bench largest drill", bench.Drills[len(bench.Drills)-1].Diameter, 1.6},
		// common practice, no source: 10 TPI = 0.100 in a turn, 100 divisions = 0.001 in
		{"inch copy x per division", inch.Dials.CopyX.Pitch / float64(inch.Dials.CopyX.Divisions), 0.001},
		{"inch 1/8 stylus in mm", inch.Styli[1].Diameter, 0.125 * in},
		{"inch copy travel in mm", inch.CopyTable.X, 12 * in},
		// from the samples' comments: T-slots 50 mm apart on the bench mill, 1.5 in on the engraver
		{"bench T-slot pitch", bench.Fixing.Spacing.Y, 50},
		{"bench bolt", bench.Fixing.Size, 6},
		{"inch T-slot pitch in mm", inch.Fixing.Spacing.Y, 1.5 * in},
		{"inch bolt in mm", inch.Fixing.Size, 0.25 * in},
	}
	for _, c := range checks {
		if !near(c.got, c.want, 1e-12) {
			t.Errorf("%s: got %v, want %v", c.name, c.got, c.want)
		}
	}
	if !bench.Ratio.Allows(10) || bench.Ratio.Allows(12) || !inch.Ratio.Allows(8) || inch.Ratio.Allows(7) {
		t.Errorf("ratios: bench %v, inch %v", bench.Ratio, inch.Ratio)
	}
	if len(bench.Styli) != 6 || bench.Styli[5].Tip != pantograph.TipPointed || inch.Dials.CopyX.Units != pantograph.Inch {
		t.Errorf("got styli %+v, inch dial %+v", bench.Styli, inch.Dials.CopyX)
	}
}

// FuzzReadMachine feeds the reader random bytes, seeded with the sample and broken machine
// files: it must return a machine or a *partfile.Error, never panic, and a machine it returns
// must keep the promises the reader makes.
func FuzzReadMachine(f *testing.F) {
	for _, glob := range []string{"../../samples/machines/*.toml", "../../testdata/machines/bad/*.toml"} {
		files, _ := filepath.Glob(glob)
		for _, file := range files {
			if src, err := os.ReadFile(file); err == nil {
				f.Add(src)
			}
		}
	}
	f.Fuzz(func(t *testing.T, src []byte) {
		m, err := ReadMachine("fuzz.toml", src)
		if err != nil {
			_, one := err.(*Error)
			_, several := err.(Errors)
			if !one && !several {
				t.Fatalf("got error of type %T, want *partfile.Error or Errors: %v", err, err)
			}
			return
		}
		if !m.Ratio.Stated() || m.Ratio.Min < 1 || m.Ratio.Min > m.Ratio.Max {
			t.Fatalf("ratio range not kept: %+v", m.Ratio)
		}
		for _, s := range m.Styli {
			if s.Tip == pantograph.TipRound && !(s.Diameter > 0) {
				t.Fatalf("round stylus without a size: %+v", s)
			}
		}
		for _, c := range m.Cutters {
			if !(c.Diameter > 0) {
				t.Fatalf("cutter without a size: %+v", c)
			}
		}
		if f := m.Fixing; f.Spacing.X < 0 || f.Spacing.Y < 0 || f.Size < 0 || f.Size > maxFixingSize {
			t.Fatalf("fixing out of range: %+v", f)
		}
	})
}

func ExampleReadMachine() {
	src := `name = "bench pantograph"
units = "mm"
[ratio]
min = 2
max = 10
[dials.copy_x]
pitch = 2
divisions = 100
[[stylus]]
name = "4 mm"
diameter = 4
`
	m, err := ReadMachine("bench.machine.toml", []byte(src))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s: ratio %s; copy X %g mm a division; stylus %q\n", m.Name, m.Ratio,
		m.Dials.CopyX.Pitch/float64(m.Dials.CopyX.Divisions), m.Styli[0].Name)

	_, err = ReadMachine("bench.machine.toml", []byte("[ratio]\nmin = 2\nmax = 10\n[spindle]\nmax_rmp = 15000\n"))
	fmt.Println(err)
	// Output:
	// bench pantograph: ratio 2:1 to 10:1, any value between; copy X 0.02 mm a division; stylus "4 mm"
	// bench.machine.toml:5: unknown key `max_rmp` in [spindle] — did you mean `max_rpm`?
}
