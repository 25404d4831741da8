package cad

import (
	"fmt"
	"sort"
	"strings"

	"panto/geom"
	"panto/pantograph"
)

// Item is one loose segment read from a drawing, in millimetres, +Y up.
type Item struct {
	Seg   geom.Segment
	Layer string // the DXF layer or the SVG group it was drawn in; "" when none
	Line  int    // line in the file of the entity or element it came from
	What  string // the entity or element, e.g. "LWPOLYLINE" or "<path>", for messages
	Name  string // the SVG element's id, which names the feature it becomes; "" when none
}

// Drawing is what a reader found in a file: the segments and what it had to decide or skip.
type Drawing struct {
	File      string
	Items     []Item
	Units     pantograph.Units // the drawing's units, for the part file and messages
	UnitsNote string           // where the units came from, e.g. "$INSUNITS 4 (mm)"
	Warnings  []string
	Skipped   map[string]int // entities or elements not read, by name
}

func (s *Drawing) warnf(format string, args ...any) {
	s.Warnings = append(s.Warnings, fmt.Sprintf(format, args...))
}

func (s *Drawing) skip(name string) {
	if s.Skipped == nil {
		s.Skipped = map[string]int{}
	}
	s.Skipped[name]++
}

// skippedText lists the skipped names with counts, sorted, e.g. "3 TEXT, 1 DIMENSION".
func (s *Drawing) skippedText() string {
	names := make([]string, 0, len(s.Skipped))
	for n := range s.Skipped {
		names = append(names, n)
	}
	sort.Strings(names)
	parts := make([]string, len(names))
	for i, n := range names {
		parts[i] = fmt.Sprintf("%d %s", s.Skipped[n], n)
	}
	return strings.Join(parts, ", ")
}

// Error is a drawing that cannot be read, placed as exactly as the reader can.
type Error struct {
	File string
	Line int    // 0 when no line can be named
	What string // the entity or element, e.g. "ARC" or "<path>"; may be empty
	Msg  string
}

func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
	}
	b.WriteString(": ")
	if e.What != "" {
		b.WriteString(e.What + ": ")
	}
	b.WriteString(e.Msg)
	return b.String()
}
