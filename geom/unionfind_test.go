package geom

import (
	"slices"
	"testing"
)

func TestUnionFind(t *testing.T) {
	tests := []struct {
		name  string
		n     int
		pairs [][2]int
		want  []int // each member's representative
	}{
		{"nothing merged", 3, nil, []int{0, 1, 2}},
		{"one pair", 3, [][2]int{{2, 1}}, []int{0, 1, 1}},
		{"a chain", 5, [][2]int{{4, 3}, {3, 2}, {2, 1}}, []int{0, 1, 1, 1, 1}},
		{"two groups joined last", 6, [][2]int{{5, 3}, {4, 1}, {1, 2}, {2, 3}}, []int{0, 1, 1, 1, 1, 1}},
		{"a member with itself", 2, [][2]int{{1, 1}}, []int{0, 1}},
		{"separate groups", 6, [][2]int{{0, 3}, {4, 1}, {5, 2}}, []int{0, 1, 2, 0, 1, 2}},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			// The representatives must not depend on the order of merging.
			for _, order := range []string{"forward", "backward"} {
				pairs := slices.Clone(tc.pairs)
				if order == "backward" {
					slices.Reverse(pairs)
				}
				u := newUnionFind(tc.n)
				for _, p := range pairs {
					u.union(p[0], p[1])
				}
				got := make([]int, tc.n)
				for i := range got {
					got[i] = u.find(i)
				}
				if !slices.Equal(got, tc.want) {
					t.Errorf("%s: got %v, want %v", order, got, tc.want)
				}
			}
		})
	}
}

func TestUnionFindAdd(t *testing.T) {
	u := newUnionFind(0)
	for want := 0; want < 4; want++ {
		if got := u.add(); got != want {
			t.Fatalf("add: got %d, want %d", got, want)
		}
	}
	u.union(3, 2)
	u.union(2, 1)
	if got := u.add(); got != 4 {
		t.Fatalf("add after union: got %d, want 4", got)
	}
	got := []int{u.find(0), u.find(1), u.find(2), u.find(3), u.find(4)}
	if want := []int{0, 1, 1, 1, 4}; !slices.Equal(got, want) {
		t.Errorf("got %v, want %v", got, want)
	}
}
