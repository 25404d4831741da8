package pantograph

import (
	"fmt"
	"math"
)

// This file plans depth: the passes a cutter takes down to a feature's depth, or through the
// stock and a little past it, and the pecks a drill takes. REFERENCES.md gives peck depths; it
// gives no step-down for milling, so the milling rule below is common practice stated from
// memory and the sheet says so.

// ToolKind is what a tool does to the stock. It decides the depth rule (passes or pecks), the
// break-through allowance and the surface speed.
type ToolKind int

// The tool kinds.
const (
	ToolMill    ToolKind = iota + 1 // an end mill or slot drill tracing an edge
	ToolEngrave                     // an engraver running along a groove
	ToolDrill                       // a drill sunk at a seat
)

// String names the kind: "mill", "engrave" or "drill".
func (k ToolKind) String() string {
	switch k {
	case ToolMill:
		return "mill"
	case ToolEngrave:
		return "engrave"
	case ToolDrill:
		return "drill"
	}
	return "unknown tool"
}

// PassRule is a step-down rule with where it comes from.
type PassRule struct {
	StepDown float64 // mm per pass
	Rule     string  // the rule in words, with its source
}

// Step-down shares of the cutter diameter per pass in full-width cutting, by material group:
// half the diameter in soft metals, a quarter in mild steel, a tenth in tool steel, halved again
// for micro cutters, which break before they wear (common practice, from memory; no published
// source in REFERENCES.md).
func millShare(group string) float64 {
	switch group {
	case groupAluminium, groupBrass:
		return 0.5
	case groupMild:
		return 0.25
	}
	return 0.1
}

// engraveStep is the depth per pass of an engraver, mm: a few hundredths, whatever its width,
// because the point is the weakest part (common practice, from memory).
const engraveStep = 0.05

// minStep is the smallest step-down planned, mm: finer passes than this rub rather than cut
// and are below what a depth dial is read to on most bench machines (common practice, from
// memory).
const minStep = 0.01

// millPassRule returns the step-down for milling or engraving material with a tool of kind
// and diameter d mm.
func millPassRule(kind ToolKind, d float64, material string) PassRule {
	g, _ := materialGroup(material)
	if kind == ToolEngrave {
		return PassRule{engraveStep, fmt.Sprintf("engraver: %.2f mm per pass (common practice, from memory)", engraveStep)}
	}
	share := millShare(g)
	rule := fmt.Sprintf("%g × D in %s", share, g)
	if d < microTool {
		share /= 2
		rule = fmt.Sprintf("%g × D in %s, halved for a cutter under %g mm", share*2, g, microTool)
	}
	step := math.Max(share*d, minStep)
	return PassRule{step, rule + " (common practice, from memory)"}
}

// breakThroughMill is how far past the stock a through cut goes, mm, so the last pass parts
// the piece cleanly from the stock's underside (common practice, from memory).
const breakThroughMill = 0.05

// drillPointShare is the length of a 118° drill point as a share of the diameter:
// (D/2)/tan(59°) = 0.300·D (derived).
const drillPointShare = 0.3004

// breakThrough returns how far past the stock a through cut with a tool of kind and diameter d
// must go: for a drill its point length plus the milling allowance, so the full diameter
// comes through; for a cutter the allowance alone.
func breakThrough(kind ToolKind, d float64) float64 {
	if kind == ToolDrill {
		return drillPointShare*d + breakThroughMill
	}
	return breakThroughMill
}

// totalDepth returns how deep the tool goes for a feature of depth dep in stock thick mm: the
// depth itself, or through the stock plus the break-through allowance.
func totalDepth(dep Depth, thick float64, kind ToolKind, d float64) float64 {
	if dep.Through {
		return thick + breakThrough(kind, d)
	}
	return dep.MM
}

// Passes returns the depths, from the top face in mm, at the bottom of each pass: equal passes
// no deeper than step each, the last at total. It returns nil for total ≤ 0.
func Passes(total, step float64) []float64 {
	if !(total > 0) || !(step > 0) {
		return nil
	}
	n := int(math.Ceil(total/step - divisionSnap))
	out := make([]float64, n)
	for i := range out {
		out[i] = total * float64(i+1) / float64(n)
	}
	out[n-1] = total
	return out
}

// Peck shares of the drill diameter: ordinary drills 2–3 D per peck, the low end used; micro
// drills (under 1 mm) 0.5–1 D for the first peck then 0.25–0.5 D, the low ends used (tooling
// tech tips; micro values from memory).
const (
	peckShare       = 2.0
	microFirstShare = 0.5
	microPeckShare  = 0.25
)

// peckRule describes the peck schedule for a drill of d mm, with its source.
func peckRule(d float64) string {
	if d < microTool {
		return fmt.Sprintf("micro drill: first peck %g × D, then %g × D, clear chips each time, no dwell at the bottom (tooling tech tips; micro values from memory)", microFirstShare, microPeckShare)
	}
	return fmt.Sprintf("peck %g × D, clear chips each time (tooling tech tips: 2–3 D, low end)", peckShare)
}

// pecks returns the depth at the bottom of each peck of a drill of d mm down to total mm.
func pecks(total, d float64) []float64 {
	if !(total > 0) || !(d > 0) {
		return nil
	}
	first, then := peckShare*d, peckShare*d
	if d < microTool {
		first, then = microFirstShare*d, microPeckShare*d
	}
	var out []float64
	at := math.Min(first, total)
	for {
		out = append(out, at)
		if at >= total-divisionSnap*then {
			out[len(out)-1] = total
			return out
		}
		at = math.Min(at+then, total)
	}
}
