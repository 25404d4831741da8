package geom

// unionFind splits the numbers 0, 1, 2, … into groups that are merged pair by pair. Each group
// is represented by its smallest member, so the groups and their representatives come out the
// same whatever order the pairs are merged in, and the first-numbered member of a group can
// speak for it.
type unionFind struct {
	parent []int
}

// newUnionFind returns n members, each in a group of its own.
func newUnionFind(n int) *unionFind {
	u := &unionFind{parent: make([]int, n)}
	for i := range u.parent {
		u.parent[i] = i
	}
	return u
}

// add appends a member in a group of its own and returns its number.
func (u *unionFind) add() int {
	i := len(u.parent)
	u.parent = append(u.parent, i)
	return i
}

// find returns the representative of i's group, halving the path to it on the way so that
// later finds are shorter.
func (u *unionFind) find(i int) int {
	for u.parent[i] != i {
		u.parent[i] = u.parent[u.parent[i]]
		i = u.parent[i]
	}
	return i
}

// union merges the groups of i and j.
func (u *unionFind) union(i, j int) {
	ri, rj := u.find(i), u.find(j)
	u.parent[max(ri, rj)] = min(ri, rj)
}
