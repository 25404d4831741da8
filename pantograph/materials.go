package pantograph

import (
	"fmt"
	"sort"
	"strings"
)

// This file is the speed table: the stock materials panto knows, with the surface speeds of
// HSS and carbide tools in them and the share of a cutter's diameter taken per pass. A machine
// file may add materials or replace a row ([[stock_material]]); a part names its material in
// free text ("clock brass", "CZ121 brass"), which is matched to the row whose name it contains,
// longest name first, so "tool steel" is found before "steel".
//
// Surface speeds for HSS come from shop speed tables ("Machine Tool Speeds and Feeds"
// handouts), the low end of each range: small tools on a light machine break before they wear.
// Carbide runs at about twice HSS (tool makers' general catalogues). The step-down shares are
// a rule of thumb from memory; no published source gives them.

// StockMaterial is one row of the speed table.
type StockMaterial struct {
	Name  string // what a part file calls it, lower case: "brass"
	Group string // the row of the published tables it takes its speeds from: "brass and bronze"
	// Surface speeds v_c in m/min for drilling and milling (engraving runs at milling speed).
	HSSDrill, HSSMill         float64
	CarbideDrill, CarbideMill float64
	// StepShare is the depth of one milling pass as a share of the cutter's diameter, in
	// full-width cutting; halved for micro cutters (see millPassRule).
	StepShare float64
	Source    string // where the speeds come from, or "rule of thumb"
}

// carbideFactor is how much faster carbide cuts than HSS: "roughly 2×" (tool makers' general
// catalogues, REFERENCES.md).
const carbideFactor = 2

// The sources the built-in rows cite.
const (
	shopTables   = "shop speed tables for HSS (low end of each range), carbide about 2× HSS (tool makers' catalogues)"
	likeBrass    = "rule of thumb: cut like brass (no published row; from memory)"
	likeToolStel = "rule of thumb: cut as slowly as tool steel (no published row; from memory)"
	likeMild     = "rule of thumb: cut as mild steel (no published row; from memory)"
)

// builtinMaterials is the speed table panto starts from. HSS drilling ~76, ~61, ~34, ~18 m/min
// and milling 76–150, 45–135, 21–37, 12–21 m/min for aluminium, brass and bronze, mild steel and
// tool steel (REFERENCES.md, shop speed tables), the low end used.
func builtinMaterials() []StockMaterial {
	row := func(name, group string, drill, mill, share float64, src string) StockMaterial {
		return StockMaterial{Name: name, Group: group, HSSDrill: drill, HSSMill: mill,
			CarbideDrill: carbideFactor * drill, CarbideMill: carbideFactor * mill, StepShare: share, Source: src}
	}
	const al, br, ms, ts = "aluminium", "brass and bronze", "mild steel", "tool steel"
	return []StockMaterial{
		row("aluminium", al, 76, 76, 0.5, shopTables),
		row("aluminum", al, 76, 76, 0.5, shopTables),
		row("dural", al, 76, 76, 0.5, shopTables),
		row("brass", br, 61, 45, 0.5, shopTables),
		row("bronze", br, 61, 45, 0.5, shopTables),
		row("copper", br, 61, 45, 0.5, likeBrass),
		row("nickel silver", br, 61, 45, 0.5, likeBrass),
		row("mild steel", ms, 34, 21, 0.25, shopTables),
		row("steel", ms, 34, 21, 0.25, shopTables),
		row("iron", ms, 34, 21, 0.25, likeMild),
		row("tool steel", ts, 18, 12, 0.1, shopTables),
		row("silver steel", ts, 18, 12, 0.1, shopTables),
		row("gauge plate", ts, 18, 12, 0.1, shopTables),
		row("drill rod", ts, 18, 12, 0.1, shopTables),
		row("stainless", ts, 18, 12, 0.1, likeToolStel),
	}
}

// Materials is a speed table: the built-in rows with a machine file's own added or replacing
// them by name.
type Materials []StockMaterial

// DefaultMaterials returns the built-in speed table.
func DefaultMaterials() Materials { return builtinMaterials() }

// MaterialsFor returns the speed table for machine m: the built-in rows with m's own
// ([[stock_material]]) replacing those of the same name and the rest added. m may be nil.
func MaterialsFor(m *Machine) Materials {
	t := DefaultMaterials()
	if m == nil {
		return t
	}
	for _, own := range m.Materials {
		own.Name = strings.ToLower(own.Name)
		i := t.index(own.Name)
		if i < 0 {
			t = append(t, own)
		} else {
			t[i] = own
		}
	}
	return t
}

func (t Materials) index(name string) int {
	for i, r := range t {
		if r.Name == name {
			return i
		}
	}
	return -1
}

// Find returns the row for a part's material: the row with the longest name contained in it,
// case aside. ok is false when no row matches, or material is empty.
func (t Materials) Find(material string) (row StockMaterial, ok bool) {
	m := strings.ToLower(strings.TrimSpace(material))
	if m == "" {
		return StockMaterial{}, false
	}
	best := -1
	for i, r := range t {
		if strings.Contains(m, r.Name) && (best < 0 || len(r.Name) > len(t[best].Name)) {
			best = i
		}
	}
	if best < 0 {
		return StockMaterial{}, false
	}
	return t[best], true
}

// Names returns the names of the rows, sorted, for messages.
func (t Materials) Names() []string {
	out := make([]string, len(t))
	for i, r := range t {
		out[i] = r.Name
	}
	sort.Strings(out)
	return out
}

// ErrMaterial is wrapped when a part's stock material is missing or not in the speed table.
var ErrMaterial = fmt.Errorf("stock material")

// Resolve returns the row for a part's material, or an error that lists the known ones: speeds
// worked out for the wrong material break tools, so panto never guesses.
func (t Materials) Resolve(material string) (StockMaterial, error) {
	if r, ok := t.Find(material); ok {
		return r, nil
	}
	known := strings.Join(t.Names(), ", ")
	if strings.TrimSpace(material) == "" {
		return StockMaterial{}, fmt.Errorf("%w missing: give [stock] material (or --material) so speeds and passes can be worked out; known: %s", ErrMaterial, known)
	}
	return StockMaterial{}, fmt.Errorf("%w %q is not in the speed table; known: %s (add it to the machine file as a [[stock_material]] with its speeds)",
		ErrMaterial, material, known)
}

// SurfaceSpeed returns v_c in m/min for a tool of kind and tool material ("carbide", anything
// else counts as HSS) in this stock. Engravers run at milling speeds.
func (r StockMaterial) SurfaceSpeed(toolMaterial string, kind ToolKind) float64 {
	carbide := strings.EqualFold(toolMaterial, "carbide")
	switch {
	case kind == ToolDrill && carbide:
		return r.CarbideDrill
	case kind == ToolDrill:
		return r.HSSDrill
	case carbide:
		return r.CarbideMill
	}
	return r.HSSMill
}
