package partfile

import (
	"fmt"
	"strings"
)

// prefixLen is how many leading letters an unknown key must share with a known key for the
// known key to be offered when more than maxSuggestDistance edits apart: "thru" for "through".
const prefixLen = 3

// maxSuggestDistance is the largest number of single-letter edits between an unknown key and a
// known one for the known one to be offered as what was meant: two catches a dropped, doubled or
// swapped letter (a swap is two edits) without offering unrelated keys (common practice in
// spelling suggesters, no source).
const maxSuggestDistance = 2

// unknownKeyMsg words the message for an unknown key, suggesting the nearest known key.
func unknownKeyMsg(key, table string, known []string) string {
	best, bestD := "", maxSuggestDistance+1
	for _, k := range known {
		if d := editDistance(key, k); d < bestD {
			best, bestD = k, d
		}
	}
	for _, k := range known {
		if best == "" && len(key) >= prefixLen && strings.HasPrefix(k, key[:prefixLen]) {
			best = k
		}
	}
	if best != "" {
		return fmt.Sprintf("unknown key `%s` in %s — did you mean `%s`?", key, table, best)
	}
	return fmt.Sprintf("unknown key `%s` in %s — known keys here: %s", key, table, strings.Join(known, ", "))
}

// editDistance returns the Levenshtein distance between a and b, counted in runes.
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}
