package geom

import (
	"slices"
	"testing"
)

func TestRows(t *testing.T) {
	type item struct {
		row int
		v   string
	}
	tests := []struct {
		name  string
		n     int
		items []item
		want  [][]string
	}{
		{"no rows", 0, nil, [][]string{}},
		{"empty rows", 3, nil, [][]string{{}, {}, {}}},
		{"one row", 1, []item{{0, "a"}, {0, "b"}}, [][]string{{"a", "b"}}},
		{"rows given out of order keep their items' order", 4,
			[]item{{2, "a"}, {0, "b"}, {2, "c"}, {3, "d"}, {0, "e"}},
			[][]string{{"b", "e"}, {}, {"a", "c"}, {"d"}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			rs := newRows[string](tc.n)
			for _, it := range tc.items {
				rs.count(it.row)
			}
			rs.allot()
			for _, it := range tc.items {
				rs.place(it.row, it.v)
			}
			if rs.len() != tc.n {
				t.Errorf("got %d rows, want %d", rs.len(), tc.n)
			}
			got := make([][]string, tc.n)
			for r := range got {
				got[r] = append([]string{}, rs.row(r)...)
			}
			if !slices.EqualFunc(got, tc.want, slices.Equal) {
				t.Errorf("got %q, want %q", got, tc.want)
			}
			if len(rs.items) != len(tc.items) {
				t.Errorf("got %d items, want %d", len(rs.items), len(tc.items))
			}
		})
	}
}

func TestIndexRows(t *testing.T) {
	tests := []struct {
		name string
		keys []int32
		n    int
		want [][]int32
	}{
		{"no keys", nil, 2, [][]int32{{}, {}}},
		{"each its own", []int32{1, 0, 2}, 3, [][]int32{{1}, {0}, {2}}},
		{"shared keys, increasing indices", []int32{2, 0, 2, 0, 1, 2}, 4,
			[][]int32{{1, 3}, {4}, {0, 2, 5}, {}}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			rs := indexRows(tc.keys, tc.n)
			for k, want := range tc.want {
				if got := rs.row(k); !slices.Equal(got, want) {
					t.Errorf("row %d: got %v, want %v", k, got, want)
				}
			}
		})
	}
}

func TestSortedRows(t *testing.T) {
	items := []int{0, 0, 2, 3, 3, 3}
	rs := sortedRows(items, 5, func(v int) int { return v })
	tests := []struct {
		row, first, count int
	}{
		{0, 0, 2}, {1, 2, 0}, {2, 2, 1}, {3, 3, 3}, {4, 6, 0},
	}
	for _, tc := range tests {
		if got := rs.first(tc.row); got != tc.first {
			t.Errorf("row %d first: got %d, want %d", tc.row, got, tc.first)
		}
		if got := len(rs.row(tc.row)); got != tc.count {
			t.Errorf("row %d length: got %d, want %d", tc.row, got, tc.count)
		}
	}
	// The rows are items itself, not a copy.
	rs.row(3)[0] = 9
	if items[3] != 9 {
		t.Errorf("row shares no memory with items: got items[3] = %d, want 9", items[3])
	}
}
