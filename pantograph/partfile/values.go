package partfile

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"panto/geom"
	"panto/pantograph"
)

// reader holds what every value needs while one file is read.
type reader struct {
	file  string
	lines lineIndex
	scale float64 // mm per drawing unit
	// unknown collects every unknown key met, so that one reading reports all the typos of a
	// file; reading goes on past them (see finish). noted keeps each from being told twice.
	unknown Errors
	noted   map[string]bool
}

// noteUnknown records an unknown key at path once.
func (r *reader) noteUnknown(path string, e *Error) {
	if r.noted == nil {
		r.noted = map[string]bool{}
	}
	if !r.noted[path] {
		r.noted[path] = true
		r.unknown = append(r.unknown, e)
	}
}

// finish returns what a reading ends with: every unknown key when there were any, since they
// explain whatever else went wrong (a misspelt key is also a missing one), else err.
func (r *reader) finish(err error) error {
	if len(r.unknown) == 0 {
		return err
	}
	slices.SortStableFunc(r.unknown, func(a, b *Error) int { return a.Line - b.Line })
	if len(r.unknown) == 1 {
		return r.unknown[0]
	}
	return r.unknown
}

// table is one TOML table of the part file, with how to name it in messages.
type table struct {
	r     *reader
	path  string // path in the line index, e.g. "holes#2"
	label string // as shown to the user, e.g. `[[holes]] "pivots"`
	m     map[string]any
}

// loc is where a value sits: its path in the line index and the key as shown to the user.
type loc struct {
	t    table
	path string
	key  string
}

func (t table) at(key string) loc { return loc{t: t, path: join(t.path, key), key: key} }

// sub is a key inside an inline table.
func (l loc) sub(key string) loc {
	return loc{t: l.t, path: l.path + "." + key, key: l.key + "." + key}
}

// elem is entry i (counted from 0) of an array.
func (l loc) elem(i int) loc {
	return loc{t: l.t, path: fmt.Sprintf("%s[%d]", l.path, i), key: fmt.Sprintf("%s (entry %d)", l.key, i+1)}
}

func (l loc) errf(format string, args ...any) error {
	return &Error{File: l.t.r.file, Line: l.t.r.lines.line(l.path), Table: l.t.label, Key: l.key,
		Msg: fmt.Sprintf(format, args...)}
}

// errf reports a problem with the table as a whole, on its header line.
func (t table) errf(format string, args ...any) error {
	return &Error{File: t.r.file, Line: t.r.lines.line(t.path), Table: t.label, Msg: fmt.Sprintf(format, args...)}
}

// checkKeys records every unknown key of the table, with a suggestion, for finish to report;
// it returns nil so that reading goes on.
func (t table) checkKeys(known ...string) error {
	var bad []string
	for k := range t.m {
		if !slices.Contains(known, k) {
			bad = append(bad, k)
		}
	}
	if len(bad) == 0 {
		return nil
	}
	slices.SortFunc(bad, func(a, b string) int {
		return t.r.lines.line(join(t.path, a)) - t.r.lines.line(join(t.path, b))
	})
	where := t.label
	if where == "" {
		where = "the top level of the file"
	}
	for _, k := range bad {
		l := t.at(k)
		t.r.noteUnknown(l.path, &Error{File: t.r.file, Line: t.r.lines.line(l.path), Msg: unknownKeyMsg(k, where, known)})
	}
	return nil
}

// has reports whether the table sets key.
func (t table) has(key string) bool { _, ok := t.m[key]; return ok }

// describe names a TOML value's type for messages, quoting short values.
func describe(v any) string {
	switch v := v.(type) {
	case string:
		return fmt.Sprintf("text %q", v)
	case bool:
		return fmt.Sprintf("%t", v)
	case int64, float64:
		return fmt.Sprintf("%v", v)
	case []any, []map[string]any:
		return "a list"
	case map[string]any:
		return "a table"
	}
	return fmt.Sprintf("%v", v)
}

// number reads a plain number, as written (not converted to mm).
func (l loc) number(v any) (float64, error) {
	var f float64
	switch v := v.(type) {
	case int64:
		f = float64(v)
	case float64:
		f = v
	default:
		return 0, l.errf("must be a number, got %s", describe(v))
	}
	if math.IsNaN(f) || math.IsInf(f, 0) {
		return 0, l.errf("must be a finite number, got %v", f)
	}
	return f, nil
}

// length reads a size that must be greater than 0, converted to mm.
func (l loc) length(v any) (float64, error) {
	f, err := l.number(v)
	if err != nil {
		return 0, err
	}
	if f <= 0 {
		return 0, l.errf("must be greater than 0, got %v", f)
	}
	return f * l.t.r.scale, nil
}

// radius reads a corner radius: 0 or more, converted to mm.
func (l loc) radius(v any) (float64, error) {
	f, err := l.number(v)
	if err != nil {
		return 0, err
	}
	if f < 0 {
		return 0, l.errf("corner radius must be 0 or more, got %v", f)
	}
	return f * l.t.r.scale, nil
}

// list reads an array.
func (l loc) list(v any) ([]any, error) {
	a, ok := v.([]any)
	if !ok {
		return nil, l.errf("must be a list, got %s", describe(v))
	}
	return a, nil
}

// point reads [x, y] in drawing units and returns it in mm.
func (l loc) point(v any) (geom.Vec, error) {
	ns, err := l.numbers(v, 2, 2, "[x, y]")
	if err != nil {
		return geom.Vec{}, err
	}
	return geom.V(ns[0], ns[1]).Mul(l.t.r.scale), nil
}

// numbers reads a list of lo to hi numbers, as written.
func (l loc) numbers(v any, lo, hi int, form string) ([]float64, error) {
	a, ok := v.([]any)
	if !ok || len(a) < lo || len(a) > hi {
		return nil, l.errf("must be a point written %s, got %s", form, describe(v))
	}
	out := make([]float64, len(a))
	for i, x := range a {
		f, err := l.number(x)
		if err != nil {
			return nil, l.errf("must be a point written %s, got %s", form, describeList(a))
		}
		out[i] = f
	}
	return out, nil
}

// describeList shows a short list of values for messages.
func describeList(a []any) string {
	parts := make([]string, len(a))
	for i, x := range a {
		parts[i] = describe(x)
	}
	return "[" + strings.Join(parts, ", ") + "]"
}

// points reads a list of [x, y] points.
func (l loc) points(v any) ([]geom.Vec, error) {
	a, err := l.list(v)
	if err != nil {
		return nil, err
	}
	out := make([]geom.Vec, len(a))
	for i, x := range a {
		if out[i], err = l.elem(i).point(x); err != nil {
			return nil, err
		}
	}
	return out, nil
}

// text reads a string.
func (l loc) text(v any) (string, error) {
	s, ok := v.(string)
	if !ok {
		return "", l.errf("must be text in quotes, got %s", describe(v))
	}
	return s, nil
}

// depth reads "through" or a depth greater than 0, converted to mm.
func (l loc) depth(v any) (pantograph.Depth, error) {
	if s, ok := v.(string); ok {
		if s == "through" {
			return pantograph.Depth{Through: true}, nil
		}
		return pantograph.Depth{}, l.errf(`must be "through" or a number, got %s`, describe(v))
	}
	f, err := l.number(v)
	if err != nil {
		return pantograph.Depth{}, l.errf(`must be "through" or a number, got %s`, describe(v))
	}
	if f <= 0 {
		return pantograph.Depth{}, l.errf(`must be greater than 0 (or "through"), got %v`, f)
	}
	return pantograph.Depth{MM: f * l.t.r.scale}, nil
}
