package main

import (
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// summaryWriter prints the human summary of `panto check`, lengths in u.
type summaryWriter struct {
	w io.Writer
	u pantograph.Units
}

// writeSummary prints the human summary of `panto check`, every length in u.
func writeSummary(w io.Writer, p pantograph.Part, s pantograph.Summary, u pantograph.Units) {
	sw := summaryWriter{w: w, u: u}
	title := s.Name
	if title == "" {
		title = "part"
	}
	fmt.Fprintf(w, "%s  (%s)\n", title, p.Source)
	fmt.Fprintf(w, "  drawn in     %s%s\n", sw.unitsWords(s.Units), sw.stockWords(s.Stock))
	if b := s.Bounds; !b.IsEmpty() {
		size := b.Size()
		fmt.Fprintf(w, "  size         %s x %s, from %s to %s\n", u.Number(size.X), u.Length(size.Y),
			u.Point(b.Min.X, b.Min.Y), u.Point(b.Max.X, b.Max.Y))
		fmt.Fprintf(w, "  area         %s (the profile less its through openings)\n", u.Area(s.Area))
	}
	fmt.Fprintf(w, "  features     %d\n", len(s.Features))
	for i, f := range p.All() {
		fmt.Fprintf(w, "    %-10s %-22s %s\n", f.Kind, quoteName(s.Features[i].Name), sw.featureWords(f))
	}
	fmt.Fprintf(w, "  smallest inside corner  %s\n", sw.measureWords(s.MinInsideRadius, "R"))
	fmt.Fprintf(w, "  narrowest gap           %s\n", sw.measureWords(s.NarrowestGap, ""))
	fmt.Fprintf(w, "  %s\n", sw.cutterWords(s))
	writeProblems(w, s.Problems)
}

func quoteName(n string) string {
	if n == "" {
		return "-"
	}
	return strconv.Quote(n)
}

func (sw summaryWriter) unitsWords(drawn pantograph.Units) string {
	in, shown := "millimetres", "millimetres"
	if drawn == pantograph.Inch {
		in = "inches"
	}
	if sw.u == pantograph.Inch {
		shown = "inches"
	}
	if in == shown {
		return in
	}
	return in + " (shown here in " + shown + ")"
}

func (sw summaryWriter) stockWords(s pantograph.Stock) string {
	switch {
	case s.Thickness > 0 && s.Material != "":
		return fmt.Sprintf("; stock %s, %s thick", s.Material, sw.u.Length(s.Thickness))
	case s.Thickness > 0:
		return fmt.Sprintf("; stock %s thick", sw.u.Length(s.Thickness))
	}
	return ""
}

// featureWords describes one feature in a few words.
func (sw summaryWriter) featureWords(f pantograph.Feature) string {
	u := sw.u
	depth := f.Depth.String()
	if !f.Depth.Through && f.Depth.Given() {
		depth = u.Length(f.Depth.MM) + " deep"
	}
	switch f.Kind {
	case pantograph.KindProfile:
		return "outside edge, cut through"
	case pantograph.KindCutout:
		return "opening, cut through"
	case pantograph.KindPocket:
		return "recess, " + depth
	case pantograph.KindHoles:
		n := "hole"
		if len(f.Centers) != 1 {
			n = "holes"
		}
		return fmt.Sprintf("%d %s Ø%s, %s", len(f.Centers), n, u.Length(f.Diameter), depth)
	case pantograph.KindSlot:
		return fmt.Sprintf("slot %s wide, %s between centres, %s", u.Length(f.Width), u.Length(f.From.Dist(f.To)), depth)
	case pantograph.KindGroove:
		width := "as wide as the cutter"
		if f.Width > 0 {
			width = u.Length(f.Width) + " wide"
		}
		return fmt.Sprintf("engraved line, %s, %s", width, depth)
	}
	return ""
}

// measureWords says a measure and the feature it comes from.
func (sw summaryWriter) measureWords(m pantograph.Measure, prefix string) string {
	at := sw.u.Point(m.At.X, m.At.Y)
	switch {
	case !m.Found:
		return "none"
	case prefix == "R" && m.MM == 0:
		return fmt.Sprintf("sharp (%s°), in %s at %s", numfmt.Trim(m.Angle*180/math.Pi, 1), m.Feature, at)
	}
	return fmt.Sprintf("%s%s, in %s at %s", prefix, sw.u.Length(m.MM), m.Feature, at)
}

// cutterWords says what the measures mean for the cutter: the largest that makes the part as
// drawn, or, where an inside corner is sharp, that none does and what cutters leave there.
func (sw summaryWriter) cutterWords(s pantograph.Summary) string {
	d, sharp := s.LargestCutter()
	switch {
	case sharp:
		var left []string
		for _, c := range sw.cuttersUpTo(d) {
			left = append(left, fmt.Sprintf("Ø%s leaves %s", sw.u.Length(c), sw.u.Length(s.MinInsideRadius.CornerLeft(c))))
		}
		return "largest cutter: none as drawn; every cutter leaves material in the sharp inside corner at " +
			sw.u.Point(s.MinInsideRadius.At.X, s.MinInsideRadius.At.Y) + "\n    (" + strings.Join(left, "; ") + ")"
	case math.IsInf(d, 1):
		return "largest cutter that makes it as drawn: any size"
	}
	return fmt.Sprintf("largest cutter that makes it as drawn: Ø%s", sw.u.Length(d))
}

// cuttersUpTo lists a few common cutter sizes no larger than limit, the largest first, to show
// what each leaves in a sharp corner: for a part in inches 1/16, 1/32 and 1/64 in, else 1, 0.5,
// 0.3 and 0.2 mm (common practice, no source: the usual small end mills).
func (sw summaryWriter) cuttersUpTo(limit float64) []float64 {
	sizes := []float64{1, 0.5, 0.3, 0.2}
	if sw.u == pantograph.Inch {
		sizes = []float64{25.4 / 16, 25.4 / 32, 25.4 / 64}
	}
	var out []float64
	for _, c := range sizes {
		if c <= limit {
			out = append(out, c)
		}
	}
	if len(out) == 0 {
		out = append(out, sizes[len(sizes)-1])
	}
	return out
}

// writeProblems lists the problems, or says there are none.
func writeProblems(w io.Writer, ps []pantograph.Problem) {
	if len(ps) == 0 {
		fmt.Fprintln(w, "  no problems found")
		return
	}
	var errs, warns int
	for _, p := range ps {
		if p.Severity == pantograph.Error {
			errs++
		} else {
			warns++
		}
	}
	fmt.Fprintf(w, "  problems     %s, %s\n", plural(errs, "error"), plural(warns, "warning"))
	for _, p := range ps {
		line := ""
		if p.Where.Line > 0 {
			line = fmt.Sprintf("line %d: ", p.Where.Line)
		}
		fmt.Fprintf(w, "    %s%s: %s: %s\n", line, p.Severity, p.Label, p.Message)
	}
}

func plural(n int, word string) string {
	if n == 1 {
		return "1 " + word
	}
	return fmt.Sprintf("%d %ss", n, word)
}

// num formats a length in mm for people (numfmt.MM).
func num(v float64) string { return numfmt.MM(v) }

func point(x, y float64) string { return numfmt.Point(x, y) }
