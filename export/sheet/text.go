package sheet

import (
	"bufio"
	"io"
	"strings"

	"panto/pantograph"
)

// textWidth is the width text lines are wrapped to: fits a terminal and a printed page in a
// 10-point fixed font.
const textWidth = 96

// EncodeText writes s as plain text: a header, the dials, the warnings and safety cautions
// (read before starting), one block per step with a box to tick, then the notes on the rules.
func EncodeText(w io.Writer, s pantograph.Sheet) error {
	bw := bufio.NewWriter(w)
	// line writes text after indent; lines too long are broken at spaces and carried on under
	// the column hang runes further in.
	line := func(indent string, hang int, text string) {
		for _, l := range wrap(text, textWidth-len(indent), hang) {
			bw.WriteString(strings.TrimRight(indent+l, " ") + "\n")
		}
	}
	t := title(s)
	line("", 0, t)
	line("", 0, strings.Repeat("=", len([]rune(t))))
	for _, h := range header(s) {
		line("", labelWidth, padRight(h[0], labelWidth)+h[1])
	}
	bw.WriteString("\nDials\n")
	for _, d := range s.Dials.List() {
		line("  ", 8, padRight(d.Name, 8)+dialLine(d, s.Units))
	}
	section(bw, line, "Warnings", s.Warnings, "none: every feature comes out as drawn")
	section(bw, line, "Safety", s.Cautions, "")
	bw.WriteString("\nSteps (tick each box when done)\n")
	for _, r := range s.Rows {
		bw.WriteString("\n")
		line("", 4, "[ ] "+stepTitle(r))
		for _, l := range rowLines(r, s) {
			line("      ", 2, l)
		}
		for _, l := range passTable(passCells(r, s), textWidth-8) {
			line("        ", 0, l)
		}
	}
	section(bw, line, "Notes", s.Notes, "")
	return bw.Flush()
}

// passTable sets cells as "[ ] cell" in columns of one width, as many to a line as fit in
// width runes, so every pass has its own box and the table stays short.
func passTable(cells []string, width int) []string {
	if len(cells) == 0 {
		return nil
	}
	col := 0
	for _, c := range cells {
		col = max(col, len([]rune(c))+6)
	}
	per := max(1, width/col)
	var out []string
	for i := 0; i < len(cells); i += per {
		var b strings.Builder
		for j := i; j < min(i+per, len(cells)); j++ {
			b.WriteString(padRight("[ ] "+cells[j], col))
		}
		out = append(out, strings.TrimRight(b.String(), " "))
	}
	return out
}

// labelWidth is the width of the header's label column.
const labelWidth = 11

// section writes a titled list, or empty when there is nothing.
func section(bw *bufio.Writer, line func(string, int, string), name string, items []string, empty string) {
	bw.WriteString("\n" + name + "\n")
	if len(items) == 0 && empty != "" {
		line("  ", 0, empty)
	}
	for _, it := range items {
		line("  ", 2, "- "+it)
	}
}

// padRight pads s with spaces to n runes, with at least one space after it.
func padRight(s string, n int) string {
	if k := len([]rune(s)); k < n {
		return s + strings.Repeat(" ", n-k)
	}
	return s + " "
}

// wrap breaks text into lines of at most width runes at spaces; continuation lines start with
// hang spaces. A word longer than a line is left whole.
func wrap(text string, width, hang int) []string {
	var out []string
	r := []rune(text)
	for len(r) > width {
		cut := -1
		for i := width; i > hang; i-- {
			if r[i] == ' ' {
				cut = i
				break
			}
		}
		for i := width + 1; cut < 0 && i < len(r); i++ {
			if r[i] == ' ' {
				cut = i
			}
		}
		if cut < 0 {
			break
		}
		out = append(out, string(r[:cut]))
		r = append([]rune(strings.Repeat(" ", hang)), []rune(strings.TrimLeft(string(r[cut:]), " "))...)
	}
	return append(out, string(r))
}
