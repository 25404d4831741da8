package cad

import (
	"fmt"
	"math"
	"path/filepath"
	"slices"
	"sort"
	"strings"

	"panto/geom"
	"panto/pantograph"
)

// outline is a closed chain found in the drawing, with where it came from.
type outline struct {
	c     geom.Contour
	layer string
	rule  LayerRule
	first Item // the item of its first segment, for messages
	n     int  // how many items it was made of
}

// classifier holds what Classify needs while it works.
type classifier struct {
	sh    *Drawing
	opts  Options
	scale float64 // mm per drawing unit
	rep   Report
	part  pantograph.Part
}

// Classify joins the drawing's segments into outlines and decides what each one is; see the
// package doc for the rules. It fails when an outline does not close (listing every loose
// end) or when there is no closed outline to be the profile.
func Classify(sh *Drawing, opts Options) (pantograph.Part, Report, error) {
	k := &classifier{sh: sh, opts: opts, scale: unitScale(sh.Units)}
	k.rep = Report{File: sh.File, UnitsNote: sh.UnitsNote, Warnings: append([]string(nil), sh.Warnings...),
		Skipped: sh.skippedText()}
	name := strings.TrimSuffix(filepath.Base(sh.File), filepath.Ext(sh.File))
	k.part = pantograph.Part{Name: name, Units: sh.Units, Source: sh.File,
		Stock: pantograph.Stock{Material: opts.Material, Thickness: opts.Thickness * k.scale}}
	outs, grooves, err := k.outlines()
	if err != nil {
		return pantograph.Part{}, k.rep, err
	}
	if err := k.pickProfile(outs); err != nil {
		return pantograph.Part{}, k.rep, err
	}
	k.part.Features = append(k.part.Features, grooves...)
	return k.part, k.rep, nil
}

// layers returns the drawing's items by layer, layers in order of first appearance.
func (k *classifier) layers() ([]string, map[string][]Item) {
	var names []string
	by := map[string][]Item{}
	for _, it := range k.sh.Items {
		if _, ok := by[it.Layer]; !ok {
			names = append(names, it.Layer)
		}
		by[it.Layer] = append(by[it.Layer], it)
	}
	return names, by
}

// outlines joins each layer's segments; it returns the closed outlines and the grooves, or an
// error listing the loose ends of every outline that does not close.
func (k *classifier) outlines() ([]outline, []pantograph.Feature, error) {
	names, by := k.layers()
	var outs []outline
	var grooves []pantograph.Feature
	var open []string
	firstOpenLine := 0
	for _, name := range names {
		items := by[name]
		rule := k.opts.rule(name)
		if rule.Ignore {
			why := "as asked"
			if _, asked := k.opts.Layers[name]; !asked {
				why = "the layer of panto's labels"
			}
			k.rep.Made = append(k.rep.Made, fmt.Sprintf("layer %q: %d segment(s) left out, %s", name, len(items), why))
			continue
		}
		segs := make([]geom.Segment, len(items))
		for i, it := range items {
			segs[i] = it.Seg
		}
		res := geom.JoinLoose(segs, k.opts.joinTol())
		k.noteDropped(name, items, res)
		for ci, ch := range res.Chains {
			switch {
			case rule.Kind == pantograph.KindGroove:
				grooves = append(grooves, k.groove(ch, items[ch.Src[0]], rule, len(grooves)+1))
			case ch.Closed:
				outs = append(outs, outline{c: ch.Contour(), layer: name, rule: rule, first: items[slices.Min(ch.Src)], n: len(ch.Segs)})
			default:
				if firstOpenLine == 0 {
					firstOpenLine = items[ch.Src[0]].Line
				}
				open = append(open, k.openText(name, items, res, ci))
			}
		}
	}
	// Take the outlines in the order they were drawn, so the report reads down the file.
	sort.SliceStable(outs, func(i, j int) bool { return outs[i].first.Line < outs[j].first.Line })
	if len(open) > 0 {
		return nil, nil, &Error{File: k.sh.File, Line: firstOpenLine, Msg: fmt.Sprintf(
			"%d outline(s) do not close within %g mm:\n%s\nClose them in the drawing; or, if the gaps are slips of the "+
				"pen, join ends that far apart with --join MM; or map the layer with --layer NAME=ignore "+
				"(construction lines) or --layer NAME=groove (engraved lines).",
			len(open), k.opts.joinTol(), strings.Join(open, "\n"))}
	}
	return outs, grooves, nil
}

// noteDropped reports duplicates and zero-length segments that joining left out.
func (k *classifier) noteDropped(layer string, items []Item, res geom.LooseResult) {
	if len(res.Duplicates) > 0 {
		k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("layer %q: %d segment(s) drawn twice, kept once (first at line %d, %s)",
			layer, len(res.Duplicates), items[res.Duplicates[0]].Line, items[res.Duplicates[0]].What))
	}
	if len(res.Degenerate) > 0 {
		k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("layer %q: %d segment(s) shorter than %g mm left out (first at line %d, %s)",
			layer, len(res.Degenerate), k.opts.joinTol(), items[res.Degenerate[0]].Line, items[res.Degenerate[0]].What))
	}
}

// openText describes open chain ci: where it starts in the file and where its loose ends are,
// in the drawing's units.
func (k *classifier) openText(layer string, items []Item, res geom.LooseResult, ci int) string {
	ch := res.Chains[ci]
	first := items[ch.Src[0]]
	var b strings.Builder
	fmt.Fprintf(&b, "  layer %q, %d segment(s) from %s at line %d:", layer, len(ch.Segs), first.What, first.Line)
	for _, e := range res.LooseEnds() {
		if e.Chain != ci {
			continue
		}
		fmt.Fprintf(&b, " loose end at %s", k.pt(e.At))
		if !math.IsInf(e.Width, 0) {
			fmt.Fprintf(&b, " (gap of %.4g %s to %s)", e.Width/k.scale, k.sh.Units, k.pt(e.Nearest))
		}
		b.WriteString(";")
	}
	return strings.TrimSuffix(b.String(), ";")
}

// pt formats a point in the drawing's units.
func (k *classifier) pt(p geom.Vec) string { return pointString(p, 1/k.scale) }

// len formats a length in the drawing's units.
func (k *classifier) len(mm float64) string { return fmt.Sprintf("%.4g %s", mm/k.scale, k.sh.Units) }

func (k *classifier) where(it Item) pantograph.Where {
	return pantograph.Where{File: k.sh.File, Line: it.Line}
}

func (k *classifier) from(o outline) string {
	layer := ""
	if o.layer != "" {
		layer = fmt.Sprintf(" on layer %q", o.layer)
	}
	return fmt.Sprintf("%s at line %d%s", o.first.What, o.first.Line, layer)
}

// groove makes an engraved line of a chain on a groove layer.
func (k *classifier) groove(ch geom.LooseChain, first Item, rule LayerRule, n int) pantograph.Feature {
	var path []geom.Vec
	for i, s := range ch.Segs {
		pts := s.Flatten(k.opts.chordTol())
		if i > 0 {
			pts = pts[1:]
		}
		path = append(path, pts...)
	}
	f := pantograph.Feature{Kind: pantograph.KindGroove, Name: fmt.Sprintf("groove %d", n), Path: path,
		Depth: pantograph.Depth{MM: rule.Depth * k.scale}, Where: k.where(first)}
	k.rep.Made = append(k.rep.Made, fmt.Sprintf("%s: %s at line %d on layer %q, %d points", f.Label(), first.What, first.Line, first.Layer, len(path)))
	return f
}

// pickProfile chooses the profile and classifies every other outline.
func (k *classifier) pickProfile(outs []outline) error {
	best := -1
	for pass := 0; pass < 2 && best < 0; pass++ {
		for i, o := range outs {
			ok := o.rule.Kind == pantograph.KindProfile || pass == 1 && o.rule.Kind == ""
			if ok && (best < 0 || math.Abs(o.c.Area()) > math.Abs(outs[best].c.Area())) {
				best = i
			}
		}
	}
	if best < 0 {
		return &Error{File: k.sh.File, Msg: "no closed outline that could be the profile: the drawing needs the part's outside edge drawn as one closed outline"}
	}
	p := outs[best]
	reg := geom.NewRegion(p.c)
	k.part.Profile = pantograph.Feature{Kind: pantograph.KindProfile, Region: reg,
		Depth: pantograph.Depth{Through: true}, Where: k.where(p.first)}
	size := reg.Bounds().Size()
	k.rep.Made = append(k.rep.Made, fmt.Sprintf("profile: %s, %s × %s, %d segment(s)",
		k.from(p), k.len(size.X), k.len(size.Y), p.n))
	k.validate("profile", p)
	var rest []outline
	for i, o := range outs {
		if i != best {
			rest = append(rest, o)
		}
	}
	k.features(reg, rest)
	return nil
}

// validate warns when an outline crosses itself or is otherwise not a clean contour.
func (k *classifier) validate(label string, o outline) {
	if err := o.c.Validate(); err != nil {
		k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("%s (%s): %v", label, k.from(o), err))
	}
}

// holeKey groups holes of one diameter and depth.
type holeKey struct {
	d     float64 // diameter rounded to a nanometre
	depth float64
}

// features classifies the outlines other than the profile.
func (k *classifier) features(profile geom.Region, outs []outline) {
	holeMax := k.opts.HoleMax * k.scale
	if k.opts.HoleMax == 0 {
		holeMax = DefaultHoleMaxMM
	}
	holes := map[holeKey]int{} // → index in part.Features
	count := map[pantograph.Kind]int{}
	for _, o := range outs {
		if !inside(profile, o.c) {
			k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("%s lies outside the profile: left out", k.from(o)))
			continue
		}
		d, round := circleDiameter(o.c)
		isHole := round && (o.rule.Kind == pantograph.KindHoles || o.rule.Kind == "" && d <= holeMax+1e-9)
		if o.rule.Kind == pantograph.KindHoles && !round {
			k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("%s is on a holes layer but is not a circle: made a cut-out", k.from(o)))
		}
		if isHole {
			k.hole(holes, o, d)
			continue
		}
		k.opening(o, count)
	}
	sort.SliceStable(k.part.Features, func(i, j int) bool {
		return kindOrder(k.part.Features[i].Kind) < kindOrder(k.part.Features[j].Kind)
	})
	for _, f := range k.part.Features {
		if f.Kind == pantograph.KindHoles {
			k.rep.Made = append(k.rep.Made, k.holesLine(f))
		}
	}
}

func kindOrder(kd pantograph.Kind) int {
	return strings.Index("cutout pocket holes groove", string(kd))
}

// inside reports whether contour c lies within the profile: its first point and its middle
// are in it, and its box is within the profile's.
func inside(profile geom.Region, c geom.Contour) bool {
	pb, cb := profile.Bounds().Expand(1e-6), c.Bounds()
	return pb.ContainsPoint(cb.Min) && pb.ContainsPoint(cb.Max) &&
		profile.Outer.Contains(c[0].A) && profile.Outer.Contains(c[0].Mid())
}

// circleDiameter reports whether c is one full circle, and its diameter.
func circleDiameter(c geom.Contour) (float64, bool) {
	if len(c) != 1 || !c[0].IsArc() {
		return 0, false
	}
	return 2 * c[0].Radius(), true
}

// hole adds a circle to the holes feature of its diameter and depth, making one when needed.
func (k *classifier) hole(holes map[holeKey]int, o outline, d float64) {
	depth := pantograph.Depth{Through: true}
	if o.rule.Depth > 0 {
		depth = pantograph.Depth{MM: o.rule.Depth * k.scale}
	}
	key := holeKey{d: math.Round(d * 1e6), depth: depth.MM}
	center := o.c[0].Center
	i, ok := holes[key]
	if !ok {
		f := pantograph.Feature{Kind: pantograph.KindHoles, Name: fmt.Sprintf("holes %s", k.len(d)),
			Diameter: d, Depth: depth, Where: k.where(o.first)}
		k.part.Features = append(k.part.Features, f)
		i = len(k.part.Features) - 1
		holes[key] = i
	}
	k.part.Features[i].Centers = append(k.part.Features[i].Centers, center)
}

// maxListedHoles is how many hole centres one report line lists before saying how many more.
const maxListedHoles = 6

// holesLine describes a holes feature in one report line.
func (k *classifier) holesLine(f pantograph.Feature) string {
	var at []string
	for i, c := range f.Centers {
		if i == maxListedHoles {
			at = append(at, fmt.Sprintf("and %d more", len(f.Centers)-i))
			break
		}
		at = append(at, k.pt(c))
	}
	depth := "through"
	if !f.Depth.Through {
		depth = "depth " + k.len(f.Depth.MM)
	}
	return fmt.Sprintf("%s: %d hole(s) Ø%s, %s, first a circle at line %d: at %s",
		f.Label(), len(f.Centers), k.len(f.Diameter), depth, f.Where.Line, strings.Join(at, ", "))
}

// opening adds a cut-out or pocket.
func (k *classifier) opening(o outline, count map[pantograph.Kind]int) {
	kind := pantograph.KindCutout
	depth := pantograph.Depth{Through: true}
	if o.rule.Kind == pantograph.KindPocket {
		kind, depth = pantograph.KindPocket, pantograph.Depth{MM: o.rule.Depth * k.scale}
	}
	if o.rule.Kind == pantograph.KindProfile {
		k.rep.Warnings = append(k.rep.Warnings, fmt.Sprintf("%s is a second outline on the profile layer: made a cut-out", k.from(o)))
	}
	count[kind]++
	name := fmt.Sprintf("%s %d", kind, count[kind])
	if o.first.Name != "" {
		name = o.first.Name // the drawing's own name for it, an SVG id
	}
	f := pantograph.Feature{Kind: kind, Name: name,
		Region: geom.NewRegion(o.c), Depth: depth, Where: k.where(o.first)}
	k.part.Features = append(k.part.Features, f)
	size := o.c.Bounds().Size()
	line := fmt.Sprintf("%s: %s, %s × %s", f.Label(), k.from(o), k.len(size.X), k.len(size.Y))
	if kind == pantograph.KindPocket {
		if depth.Given() {
			line += ", depth " + k.len(depth.MM)
		} else {
			line += ", no depth: give one with --layer NAME=pocket:DEPTH or in the part file"
		}
	}
	k.rep.Made = append(k.rep.Made, line)
	k.validate(f.Label(), o)
}
