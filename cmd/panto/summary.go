package main

import (
	"fmt"
	"io"
	"math"
	"strconv"

	"panto/internal/numfmt"
	"panto/pantograph"
)

// writeSummary prints the human summary of `panto check`.
func writeSummary(w io.Writer, p pantograph.Part, s pantograph.Summary) {
	title := s.Name
	if title == "" {
		title = "part"
	}
	fmt.Fprintf(w, "%s  (%s)\n", title, p.Source)
	fmt.Fprintf(w, "  drawn in     %s%s\n", unitsWords(s.Units), stockWords(s.Stock))
	if b := s.Bounds; !b.IsEmpty() {
		size := b.Size()
		fmt.Fprintf(w, "  size         %s x %s mm%s, from %s to %s\n", num(size.X), num(size.Y),
			inches(s.Units, size.X, size.Y), point(b.Min.X, b.Min.Y), point(b.Max.X, b.Max.Y))
		fmt.Fprintf(w, "  area         %s mm² (the profile less its through openings)\n", num(s.Area))
	}
	fmt.Fprintf(w, "  features     %d\n", len(s.Features))
	for i, f := range p.All() {
		fmt.Fprintf(w, "    %-10s %-22s %s\n", f.Kind, quoteName(s.Features[i].Name), featureWords(f))
	}
	fmt.Fprintf(w, "  smallest inside corner  %s\n", measureWords(s.MinInsideRadius, "R"))
	fmt.Fprintf(w, "  narrowest gap           %s\n", measureWords(s.NarrowestGap, ""))
	fmt.Fprintf(w, "  %s\n", cutterWords(s))
	writeProblems(w, s.Problems)
}

func quoteName(n string) string {
	if n == "" {
		return "-"
	}
	return strconv.Quote(n)
}

func unitsWords(u pantograph.Units) string {
	if u == pantograph.Inch {
		return "inches (shown here in mm)"
	}
	return "millimetres"
}

func stockWords(s pantograph.Stock) string {
	switch {
	case s.Thickness > 0 && s.Material != "":
		return fmt.Sprintf("; stock %s, %s mm thick", s.Material, num(s.Thickness))
	case s.Thickness > 0:
		return fmt.Sprintf("; stock %s mm thick", num(s.Thickness))
	}
	return ""
}

// inches repeats a size in inches for parts drawn in inches.
func inches(u pantograph.Units, x, y float64) string {
	if u != pantograph.Inch {
		return ""
	}
	return fmt.Sprintf(" (%s x %s in)", num4(x/pantograph.MMPerInch), num4(y/pantograph.MMPerInch))
}

// featureWords describes one feature in a few words.
func featureWords(f pantograph.Feature) string {
	depth := f.Depth.String()
	if !f.Depth.Through && f.Depth.Given() {
		depth = num(f.Depth.MM) + " mm deep"
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
		return fmt.Sprintf("%d %s Ø%s mm, %s", len(f.Centers), n, num(f.Diameter), depth)
	case pantograph.KindSlot:
		return fmt.Sprintf("slot %s mm wide, %s mm between centres, %s", num(f.Width), num(f.From.Dist(f.To)), depth)
	case pantograph.KindGroove:
		width := "as wide as the cutter"
		if f.Width > 0 {
			width = num(f.Width) + " mm wide"
		}
		return fmt.Sprintf("engraved line, %s, %s", width, depth)
	}
	return ""
}

// measureWords says a measure and the feature it comes from.
func measureWords(m pantograph.Measure, prefix string) string {
	switch {
	case !m.Found:
		return "none"
	case prefix == "R" && m.MM == 0:
		return fmt.Sprintf("sharp, in %s at %s", m.Feature, point(m.At.X, m.At.Y))
	}
	return fmt.Sprintf("%s%s mm, in %s at %s", prefix, num(m.MM), m.Feature, point(m.At.X, m.At.Y))
}

// cutterWords says what the measures mean for the cutter.
func cutterWords(s pantograph.Summary) string {
	d, sharp := s.LargestCutter()
	var line string
	if math.IsInf(d, 1) {
		line = "largest cutter that can make it: any size"
	} else {
		line = fmt.Sprintf("largest cutter that can make it: Ø%s mm", num(d))
	}
	if sharp {
		line += "\n  sharp inside corners: every cutter leaves its own radius there"
	}
	return line
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

// num4 formats an inch value for people (numfmt.Inch).
func num4(v float64) string { return numfmt.Inch(v) }

func point(x, y float64) string { return numfmt.Point(x, y) }
