package pantograph

import (
	"fmt"
	"math"
	"strings"
)

// This file works out spindle speeds: n = 1000·v_c / (π·d) rpm for a surface speed v_c in
// m/min and a tool of d mm (the formula of any machining handbook). Surface speeds come from
// shop speed tables for HSS ("Machine Tool Speeds and Feeds" handouts); carbide runs at about
// twice HSS (tool makers' general catalogues). Where a table gives a range the low end is used:
// small tools on a light machine break before they wear. A speed above the spindle's top speed
// is capped with a note; micro tools nearly always are.

// RPM returns n = 1000·v_c / (π·d) for v_c in m/min and a tool of d mm.
func RPM(vc, d float64) float64 { return 1000 * vc / (math.Pi * d) }

// Speed is the spindle speed for one tool, with what limited it.
type Speed struct {
	SurfaceSpeed float64 // v_c, m/min
	Wanted       float64 // rpm the formula gives
	RPM          float64 // rpm to run at: Wanted, capped at the spindle's top speed
	Capped       bool
	Note         string // why RPM differs from Wanted, or that the material was guessed
}

// speedFor returns the spindle speed for a tool of kind, diameter d mm and toolMaterial cutting
// the stock mat on spindle s.
func speedFor(s Spindle, mat StockMaterial, toolMaterial string, d float64, kind ToolKind) Speed {
	vc := mat.SurfaceSpeed(toolMaterial, kind)
	sp := Speed{SurfaceSpeed: vc, Wanted: RPM(vc, d)}
	sp.RPM = sp.Wanted
	var notes []string
	switch {
	case s.MaxRPM > 0 && sp.Wanted > s.MaxRPM:
		sp.RPM, sp.Capped = s.MaxRPM, true
		notes = append(notes, fmt.Sprintf("wants %.0f rpm, capped at the spindle's top speed %.0f: feed gently", sp.Wanted, s.MaxRPM))
	case s.MinRPM > 0 && sp.Wanted < s.MinRPM:
		sp.RPM = s.MinRPM
		notes = append(notes, fmt.Sprintf("wants %.0f rpm, below the spindle's lowest %.0f: run at %.0f and cut lightly", sp.Wanted, s.MinRPM, s.MinRPM))
	}
	sp.Note = strings.Join(notes, "; ")
	return sp
}

// microTool is the diameter, in mm, below which a tool counts as micro and gets a feed guide:
// the published chip-load charts stop at Ø1.5 and give "below 1 mm ≈ 0.5–1 % of D"
// (REFERENCES.md, below 1 mm from memory).
const microTool = 1.0

// microChipShare is the chip load per tooth of a micro end mill as a share of its diameter: the
// low end of 0.5–1 % of D (chip-load charts; below 1 mm from memory).
const microChipShare = 0.005

// microDrillFeed is the feed per revolution of a micro drill, mm: about 1 µm/rev below 1 mm (a
// micro-drill maker as quoted on a forum; memory-grade).
const microDrillFeed = 0.001

// defaultFlutes is assumed when a cutter's flutes are not stated: small end mills are mostly
// two-fluted (common practice, no source).
const defaultFlutes = 2

// feedGuide returns a feed in mm/min for a micro tool of kind and diameter d mm at rpm, with
// the rule it came from (lengths in u), or ok false for a tool that is not micro. flutes 0
// means two.
func feedGuide(d, rpm float64, flutes int, kind ToolKind, u Units) (feed float64, rule string, ok bool) {
	if d >= microTool {
		return 0, "", false
	}
	if kind == ToolDrill {
		return microDrillFeed * rpm, fmt.Sprintf("about %s per rev for drills below %s (from memory)",
			u.Length(microDrillFeed), u.Length(microTool)), true
	}
	if flutes <= 0 {
		flutes = defaultFlutes
	}
	chip := microChipShare * d
	return chip * float64(flutes) * rpm,
		fmt.Sprintf("%s per tooth × %d flutes: 0.5 %% of D (low end of 0.5–1 %%, from memory)", u.Length(chip), flutes), true
}
