package partfile

import "testing"

func TestIndexLines(t *testing.T) {
	src := `# a comment with [brackets] and = signs
name = "x # not a comment"
[stock]
thickness = 1   # trailing comment
[profile]
path = [
  { at = [0, 0] },   # start
  { line = [1, 0] },
  { arc = [1, 1],
    through = [2, 0.5] },
]
[[holes]]
diameter = 1
[[holes]]
at = [[1, 1],
      [2, 2]]
"quoted key" = 3
text = """
[not a table]
"""
after = 1
`
	x := indexLines(src)
	tests := []struct {
		path string
		want int // line numbers counted in src above
	}{
		{"name", 2},
		{"stock", 3},
		{"stock.thickness", 4},
		{"profile.path", 6},
		{"profile.path[0]", 7},
		{"profile.path[0].at", 7},
		{"profile.path[1].line", 8},
		{"profile.path[2]", 9},
		{"profile.path[2].through", 10},
		{"holes", 12},
		{"holes#0.diameter", 13},
		{"holes#1", 14},
		{"holes#1.at[1]", 16},
		{"holes#1.quoted key", 17},
		{"holes#1.after", 21},
		{"holes#1.nosuch", 14},        // falls back to the table
		{"profile.path[2].arc[1]", 9}, // falls back to the array element
		{"nosuch", 0},
	}
	for _, tc := range tests {
		t.Run(tc.path, func(t *testing.T) {
			if got := x.line(tc.path); got != tc.want {
				t.Errorf("got %d, want %d", got, tc.want)
			}
		})
	}
}

func TestIndexLinesNeverStalls(t *testing.T) {
	// Malformed input the TOML library would reject; the scan must still end.
	for _, src := range []string{"[", "[[", "a = [", "a = {", "a = [}]", "= 1", "a = \"", "a = '''", "[a.\"b\n"} {
		indexLines(src)
	}
}

func TestEditDistance(t *testing.T) {
	tests := []struct {
		a, b string
		want int // derived by counting edits
	}{
		{"diameter", "diameter", 0},
		{"diamter", "diameter", 1},
		{"daimeter", "diameter", 2},
		{"", "abc", 3},
		{"depht", "depth", 2},
		{"Ø", "O", 1},
	}
	for _, tc := range tests {
		if got := editDistance(tc.a, tc.b); got != tc.want {
			t.Errorf("editDistance(%q, %q): got %d, want %d", tc.a, tc.b, got, tc.want)
		}
	}
}

func TestUnknownKeyMsg(t *testing.T) {
	known := []string{"name", "diameter", "depth", "at"}
	tests := []struct{ key, want string }{
		{"diamter", "unknown key `diamter` in [[holes]] — did you mean `diameter`?"},
		{"dept", "unknown key `dept` in [[holes]] — did you mean `depth`?"},
		{"diam", "unknown key `diam` in [[holes]] — did you mean `diameter`?"},
		{"colour", "unknown key `colour` in [[holes]] — known keys here: name, diameter, depth, at"},
	}
	for _, tc := range tests {
		if got := unknownKeyMsg(tc.key, "[[holes]]", known); got != tc.want {
			t.Errorf("got %q, want %q", got, tc.want)
		}
	}
}
