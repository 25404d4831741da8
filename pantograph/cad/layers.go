package cad

import "panto/pantograph"

// The layers of panto's own part drawings. export/dxf.PartDrawing writes each kind of feature
// on its own layer under these names, and Classify reads the same names back as default layer
// rules, so a part drawing panto wrote imports without any --layer. Slots are written with the
// cut-outs: a drawing cannot tell them apart.
const (
	LayerProfile = "PROFILE"
	LayerCutouts = "CUTOUTS"
	LayerPockets = "POCKETS"
	LayerHoles   = "HOLES"
	LayerGrooves = "GROOVES"
	LayerLabels  = "LABELS"
)

// defaultRule returns the rule for a layer panto's own part drawings use, and false for any
// other name. Names match exactly, as panto writes them. Pockets get no depth: a drawing does
// not carry one, so it must come from a --layer rule or the part file. Labels are text, which
// the readers leave out anyway; any lines on that layer are left out too.
func defaultRule(name string) (LayerRule, bool) {
	switch name {
	case LayerProfile:
		return LayerRule{Kind: pantograph.KindProfile}, true
	case LayerCutouts:
		return LayerRule{Kind: pantograph.KindCutout}, true
	case LayerPockets:
		return LayerRule{Kind: pantograph.KindPocket}, true
	case LayerHoles:
		return LayerRule{Kind: pantograph.KindHoles}, true
	case LayerGrooves:
		return LayerRule{Kind: pantograph.KindGroove}, true
	case LayerLabels:
		return LayerRule{Ignore: true}, true
	}
	return LayerRule{}, false
}

// rule returns what the outlines on layer name are: the caller's rule when Options.Layers
// has one, else panto's own default for that name, else no rule (Classify decides by shape).
func (o Options) rule(name string) LayerRule {
	if r, ok := o.Layers[name]; ok {
		return r
	}
	r, _ := defaultRule(name)
	return r
}
