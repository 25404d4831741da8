package partfile

import (
	"strings"

	"panto/pantograph"
)

// This file reads a machine file's own rows of the speed table:
//
//	[[stock_material]]
//	name = "boxwood"          what a part file calls it (matched within the part's material)
//	group = "hard wood"       optional: what the row is, for the sheet
//	hss_drill = 60            surface speeds for HSS tools, drilling and milling, REQUIRED:
//	hss_mill = 50             m/min in a file in mm, surface feet a minute in a file in inches
//	carbide_drill = 120       optional, the same for carbide (default twice HSS)
//	carbide_mill = 100
//	step_share = 0.5          optional: depth of a milling pass as a share of the cutter's
//	                          diameter (default 0.25)
//	source = "the shop's own trials"   optional: where the figures come from
//
// A row with the name of a built-in one replaces it.

// sfm is one surface foot a minute in m/min (derived: 0.3048 m per foot).
const sfm = 0.3048

// defaultStepShare is the share of the cutter's diameter a milling pass takes when a machine
// file's material does not say: a quarter, as for mild steel, neither the fastest nor the most
// timid of the built-in rows (rule of thumb, from memory).
const defaultStepShare = 0.25

// maxStepShare is the largest share of the diameter a pass may take: a full diameter deep is
// already a slot no small cutter survives (rule of thumb).
const maxStepShare = 1.0

// maxSurfaceSpeed bounds surface speeds, m/min: far above aluminium on carbide (a few hundred);
// a larger number is a slip, such as SFM written in a metric file (common practice, no source).
const maxSurfaceSpeed = 2000

// readStockMaterials reads every [[stock_material]].
func readStockMaterials(top table, mc *pantograph.Machine) error {
	items, err := top.items("stock_material", "name", "group", "hss_drill", "hss_mill",
		"carbide_drill", "carbide_mill", "step_share", "source")
	if err != nil {
		return err
	}
	k := 1.0
	if mc.Units == pantograph.Inch {
		k = sfm
	}
	for _, it := range items {
		if !it.has("name") {
			return it.errf("name missing: say what the material is called, as a part file's [stock] material names it")
		}
		m := pantograph.StockMaterial{Name: strings.ToLower(it.name), Group: it.name, StepShare: defaultStepShare,
			Source: "the machine file " + top.r.file}
		if err := readSpeeds(it, k, &m); err != nil {
			return err
		}
		if err := readMaterialWords(it, &m); err != nil {
			return err
		}
		mc.Materials = append(mc.Materials, m)
	}
	return nil
}

// readSpeeds reads the four surface speeds (k converts the file's speed units to m/min) and
// the step share.
func readSpeeds(it item, k float64, m *pantograph.StockMaterial) error {
	for _, f := range []struct {
		key      string
		to       *float64
		required bool
	}{{"hss_drill", &m.HSSDrill, true}, {"hss_mill", &m.HSSMill, true},
		{"carbide_drill", &m.CarbideDrill, false}, {"carbide_mill", &m.CarbideMill, false}} {
		v, ok := it.m[f.key]
		if !ok {
			if f.required {
				return it.errf("%s missing: give the surface speed of HSS tools (m/min, or SFM in an inch file)", f.key)
			}
			continue
		}
		l := it.at(f.key)
		s, err := l.positive(v)
		if err == nil && s*k > maxSurfaceSpeed {
			err = l.errf("must be a surface speed of at most %g m/min, got %v", float64(maxSurfaceSpeed), s)
		}
		if err != nil {
			return err
		}
		*f.to = s * k
	}
	if m.CarbideDrill == 0 {
		m.CarbideDrill = 2 * m.HSSDrill // carbide about twice HSS (tool makers' catalogues)
	}
	if m.CarbideMill == 0 {
		m.CarbideMill = 2 * m.HSSMill
	}
	if v, ok := it.m["step_share"]; ok {
		l := it.at("step_share")
		s, err := l.positive(v)
		if err == nil && s > maxStepShare {
			err = l.errf("is the depth of a pass as a share of the cutter's diameter, at most %g, got %v", maxStepShare, s)
		}
		if err != nil {
			return err
		}
		m.StepShare = s
	}
	return nil
}

// readMaterialWords reads group and source.
func readMaterialWords(it item, m *pantograph.StockMaterial) error {
	for _, f := range []struct {
		key string
		to  *string
	}{{"group", &m.Group}, {"source", &m.Source}} {
		if v, ok := it.m[f.key]; ok {
			s, err := it.at(f.key).text(v)
			if err != nil {
				return err
			}
			*f.to = s
		}
	}
	return nil
}
