package partfile

import (
	"strconv"
	"strings"
)

// The TOML library reports lines for syntax errors but not where each key was written, and in
// an array of tables every element shares one key name. lineIndex fills that gap: a small scan
// of the source, run only after the library has accepted it, records the line of every table
// header, key, inline-table key and array element under a path such as
//
//	holes#2              third [[holes]] header
//	holes#2.diameter     its diameter key
//	profile.circle.center   a key inside an inline table
//	profile.points[3]    the fourth element of an array
//
// The scan never fails: on anything it does not understand it stops recording, and lookups fall
// back to the nearest enclosing path that it did record.
type lineIndex map[string]int

// indexLines scans src and returns its line index.
func indexLines(src string) lineIndex {
	s := &scanner{src: src, line: 1, idx: lineIndex{}, counts: map[string]int{}}
	s.document()
	return s.idx
}

// line returns the line of path, or of the nearest enclosing path recorded, or 0.
func (x lineIndex) line(path string) int {
	for path != "" {
		if l, ok := x[path]; ok {
			return l
		}
		cut := strings.LastIndexAny(path, ".[")
		if cut < 0 {
			return 0
		}
		path = path[:cut]
	}
	return 0
}

type scanner struct {
	src    string
	pos    int
	line   int
	idx    lineIndex
	counts map[string]int // elements seen so far of each array of tables
}

func (s *scanner) peek() byte {
	if s.pos < len(s.src) {
		return s.src[s.pos]
	}
	return 0
}

func (s *scanner) next() byte {
	c := s.peek()
	if s.pos < len(s.src) {
		s.pos++
		if c == '\n' {
			s.line++
		}
	}
	return c
}

func (s *scanner) done() bool { return s.pos >= len(s.src) }

// skipSpace skips blanks and comments, and newlines too when nl is true.
func (s *scanner) skipSpace(nl bool) {
	for !s.done() {
		switch c := s.peek(); {
		case c == ' ' || c == '\t' || c == '\r' || nl && c == '\n':
			s.next()
		case c == '#':
			for !s.done() && s.peek() != '\n' {
				s.next()
			}
		default:
			return
		}
	}
}

// document scans headers and key/value lines to the end of the source.
func (s *scanner) document() {
	prefix := ""
	for {
		s.skipSpace(true)
		if s.done() {
			return
		}
		start := s.pos
		switch {
		case strings.HasPrefix(s.src[s.pos:], "[["):
			s.pos += 2
			name := s.keyUntil("]]")
			prefix = name + "#" + strconv.Itoa(s.counts[name])
			s.counts[name]++
			s.idx[prefix] = s.line
			if _, seen := s.idx[name]; !seen {
				s.idx[name] = s.line // the array as a whole is where it first appears
			}
		case s.peek() == '[':
			s.pos++
			prefix = s.keyUntil("]")
			s.idx[prefix] = s.line
		default:
			s.keyValue(prefix)
		}
		if s.pos == start {
			return // not understood: stop recording
		}
	}
}

// keyUntil reads a (possibly dotted, possibly quoted) key up to end and consumes end.
func (s *scanner) keyUntil(end string) string {
	var parts []string
	for !s.done() {
		s.skipSpace(false)
		if strings.HasPrefix(s.src[s.pos:], end) {
			s.pos += len(end)
			break
		}
		switch c := s.peek(); c {
		case '"', '\'':
			parts = append(parts, s.quoted())
		case '.':
			s.next()
		case '\n', 0:
			return strings.Join(parts, ".")
		default:
			parts = append(parts, s.bare())
		}
	}
	return strings.Join(parts, ".")
}

// bare reads a bare key.
func (s *scanner) bare() string {
	start := s.pos
	for !s.done() {
		c := s.peek()
		if !(c == '_' || c == '-' || c >= '0' && c <= '9' || c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z') {
			break
		}
		s.next()
	}
	if s.pos == start {
		s.next() // never stall on a character we do not know
	}
	return s.src[start:s.pos]
}

// quoted reads a quoted string (basic, literal or multi-line) and returns its raw content.
func (s *scanner) quoted() string {
	q := s.next()
	delim := string(q)
	if strings.HasPrefix(s.src[s.pos:], delim+delim) {
		s.pos += 2
		delim = strings.Repeat(delim, 3)
	}
	start := s.pos
	for !s.done() {
		if q == '"' && s.peek() == '\\' {
			s.next()
			s.next()
			continue
		}
		if strings.HasPrefix(s.src[s.pos:], delim) {
			text := s.src[start:s.pos]
			s.pos += len(delim)
			return text
		}
		s.next()
	}
	return s.src[start:]
}

// keyValue reads `key = value` under prefix, recording the key's line and the value's parts.
func (s *scanner) keyValue(prefix string) {
	line := s.line
	key := s.keyUntil("=")
	path := join(prefix, key)
	s.idx[path] = line
	s.value(path)
}

// value reads one value, recording the lines of array elements and inline-table keys.
func (s *scanner) value(path string) {
	s.skipSpace(false)
	switch c := s.peek(); c {
	case '[':
		s.next()
		for i := 0; ; i++ {
			s.skipSpace(true)
			if s.done() || s.peek() == ']' {
				s.next()
				return
			}
			start := s.pos
			el := path + "[" + strconv.Itoa(i) + "]"
			s.idx[el] = s.line
			s.value(el)
			s.skipSpace(true)
			if s.peek() == ',' || s.pos == start {
				s.next()
			}
		}
	case '{':
		s.next()
		for {
			s.skipSpace(true) // TOML 1.1 lets inline tables run over several lines
			if s.done() || s.peek() == '}' {
				s.next()
				return
			}
			start := s.pos
			s.keyValue(path)
			s.skipSpace(true)
			if s.peek() == ',' || s.pos == start {
				s.next()
			}
		}
	case '"', '\'':
		s.quoted()
	default:
		for !s.done() && !strings.ContainsRune(",]}\n#", rune(s.peek())) {
			s.next()
		}
	}
}

func join(prefix, key string) string {
	if prefix == "" {
		return key
	}
	return prefix + "." + key
}
