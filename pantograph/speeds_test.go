package pantograph

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestRPM(t *testing.T) {
	tests := []struct {
		name  string
		vc, d float64
		want  float64
	}{
		{"30 m/min at 0.5 mm", 30, 0.5, 19099}, // derived: 30000/(π·0.5) = 19098.6
		{"76 m/min at 3 mm", 76, 3, 8064},      // derived: 76000/(π·3) = 8063.8
		// derived from the inch form n ≈ 3.82·SFM/D: 100 SFM = 30.48 m/min, 0.25 in = 6.35 mm
		// gives 1528 rpm.
		{"inch form", 30.48, 6.35, 1528},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			if got := RPM(tc.vc, tc.d); math.Abs(got-tc.want) > 0.5 {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestSpeedForCap(t *testing.T) {
	// 30 m/min is not a table value, so build the case from a table one: brass milling HSS is
	// 45 m/min (low end of 45–135, shop speed tables); at 0.5 mm that is 28 648 rpm (derived).
	tests := []struct {
		name    string
		s       Spindle
		want    float64
		capped  bool
		hasNote bool
	}{
		{"no limit", Spindle{}, 28648, false, false},
		{"capped at 15000", Spindle{MaxRPM: 15000}, 15000, true, true},
		{"under the top", Spindle{MaxRPM: 30000}, 28648, false, false},
		{"below the lowest", Spindle{MinRPM: 40000}, 40000, false, true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			brass, _ := DefaultMaterials().Find("brass")
			sp := speedFor(tc.s, brass, "hss", 0.5, ToolMill)
			if math.Abs(sp.RPM-tc.want) > 0.5 || sp.Capped != tc.capped || (sp.Note != "") != tc.hasNote {
				t.Errorf("got %.1f capped %v note %q, want %v capped %v note %v", sp.RPM, sp.Capped, sp.Note, tc.want, tc.capped, tc.hasNote)
			}
		})
	}
}

func TestSurfaceSpeed(t *testing.T) {
	tests := []struct {
		material, tool string
		kind           ToolKind
		want           float64
	}{
		{"clock brass", "hss", ToolDrill, 61},    // shop speed tables: brass drilling ~61
		{"Brass", "carbide", ToolMill, 90},       // 45 × 2: carbide about 2× HSS
		{"6082 aluminium", "hss", ToolDrill, 76}, // aluminium drilling ~76
		{"silver steel", "hss", ToolMill, 12},    // tool steel milling 12–21, low end
		{"mild steel", "hss", ToolDrill, 34},     // mild steel drilling ~34
		{"stainless steel", "hss", ToolMill, 12}, // counted as tool steel: before "steel"
	}
	for _, tc := range tests {
		t.Run(tc.material, func(t *testing.T) {
			mat, ok := DefaultMaterials().Find(tc.material)
			if !ok {
				t.Fatalf("%q not in the speed table", tc.material)
			}
			if got := mat.SurfaceSpeed(tc.tool, tc.kind); got != tc.want {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

func TestFeedGuide(t *testing.T) {
	// derived: 0.005 × 0.5 mm = 2.5 µm/tooth × 2 flutes × 15000 rpm = 75 mm/min.
	if f, _, ok := feedGuide(0.5, 15000, 0, ToolMill, MM); !ok || math.Abs(f-75) > 1e-9 {
		t.Errorf("end mill: got %v %v, want 75 true", f, ok)
	}
	// derived: 1 µm/rev × 15000 rpm = 15 mm/min.
	if f, _, ok := feedGuide(0.6, 15000, 0, ToolDrill, MM); !ok || math.Abs(f-15) > 1e-9 {
		t.Errorf("drill: got %v %v, want 15 true", f, ok)
	}
	if _, _, ok := feedGuide(2, 5000, 2, ToolMill, MM); ok {
		t.Errorf("a 2 mm cutter got a micro feed guide")
	}
}

func TestMaterials(t *testing.T) {
	table := MaterialsFor(&Machine{Materials: []StockMaterial{
		{Name: "Boxwood", Group: "wood", HSSDrill: 100, HSSMill: 90, CarbideDrill: 150, CarbideMill: 140, StepShare: 0.5, Source: "the shop's own trials"},
		{Name: "brass", Group: "free-cutting brass", HSSDrill: 80, HSSMill: 70, CarbideDrill: 160, CarbideMill: 140, StepShare: 0.5, Source: "the shop's own trials"},
	}})
	tests := []struct {
		material string
		want     string // the row found, "" for none
		drill    float64
	}{
		{"clock brass", "brass", 80}, // the machine file's row replaces the built-in one
		{"boxwood", "boxwood", 100},  // and adds its own, names matched without case
		{"Silver Steel", "silver steel", 18},
		{"stainless steel", "stainless", 18}, // the longest name found wins over "steel"
		{"mild steel", "mild steel", 34},
		{"unobtainium", "", 0},
		{"", "", 0},
	}
	for _, tc := range tests {
		t.Run(tc.material, func(t *testing.T) {
			r, err := table.Resolve(tc.material)
			switch {
			case tc.want == "" && (err == nil || !errors.Is(err, ErrMaterial) || !strings.Contains(err.Error(), "boxwood")):
				t.Errorf("got %v, want an error listing the known materials", err)
			case tc.want != "" && (err != nil || r.Name != tc.want || r.HSSDrill != tc.drill):
				t.Errorf("got %+v, %v; want %s at %v m/min", r, err, tc.want, tc.drill)
			}
		})
	}
}
