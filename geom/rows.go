package geom

// rows is n lists packed into one array, in compressed-row form: row r is
// items[start[r]:start[r+1]], its items in the order they were placed. Indexes that would
// otherwise keep a slice per row (the cuts of each segment, the pieces at each point, the boxes
// in each cell of a grid) use it because it costs two allocations however many rows and items
// there are, where slices grown by appends cost at least one a row.
//
// It is built in two passes over the same items: count every item's row, allot, then place
// every item; the rows are whole once the last item is placed. The passes are written out by
// the caller rather than handed over as a function, which would cost an allocation per index in
// closures.
type rows[T any] struct {
	start []int32
	items []T
}

// newRows returns n empty rows, ready for counting.
func newRows[T any](n int) rows[T] { return rows[T]{start: make([]int32, n+1)} }

// count adds one to the items of row r.
func (rs *rows[T]) count(r int) { rs.start[r+1]++ }

// allot makes room for the items counted, ready for placing. Until the items are placed,
// start[r+1] is where row r's next item goes, so that placing the last item of a row leaves it
// at the row's end, which is where the next row starts: no second array of positions.
func (rs *rows[T]) allot() {
	var total int32
	for r := 1; r < len(rs.start); r++ {
		n := rs.start[r]
		rs.start[r] = total
		total += n
	}
	rs.items = make([]T, total)
}

// place appends v to row r; each row takes as many as were counted for it.
func (rs *rows[T]) place(r int, v T) {
	rs.items[rs.start[r+1]] = v
	rs.start[r+1]++
}

// indexRows groups the indices of keys by their key, which lies in [0, n): row k lists in
// increasing order every i with keys[i] == k.
func indexRows(keys []int32, n int) rows[int32] {
	rs := newRows[int32](n)
	for _, k := range keys {
		rs.count(int(k))
	}
	rs.allot()
	for i, k := range keys {
		rs.place(int(k), int32(i))
	}
	return rs
}

// sortedRows makes n rows over items already in order of their row (rowOf), without copying
// them: only the row starts need counting.
func sortedRows[T any](items []T, n int, rowOf func(T) int) rows[T] {
	start := make([]int32, n+1)
	for _, v := range items {
		start[rowOf(v)+1]++
	}
	for r := 1; r <= n; r++ {
		start[r] += start[r-1]
	}
	return rows[T]{start: start, items: items}
}

// row returns row r's items; they share memory with the index, so sorting them in place
// sorts the row.
func (rs rows[T]) row(r int) []T { return rs.items[rs.start[r]:rs.start[r+1]] }

// len returns how many rows there are.
func (rs rows[T]) len() int { return len(rs.start) - 1 }

// first returns the position in items of row r's first item.
func (rs rows[T]) first(r int) int { return int(rs.start[r]) }
