package units

import "strings"

// Suggest returns the known unit name nearest to the unknown name, or ""
// when none is close (or name is itself known). A name that differs only in letter case wins ("kpa" → "kPa");
// otherwise the smallest edit distance (Levenshtein, on runes) of at most 1
// for names of up to three letters and 2 for longer ones, ties going to the
// earlier name in the table. A single letter is never "corrected" except
// for its case.
func Suggest(name string) string {
	if _, known := byName[name]; known || name == "" {
		return ""
	}
	for _, n := range names {
		if strings.EqualFold(n.name, name) && n.name != name {
			return n.name
		}
	}
	r := []rune(name)
	limit := 1
	if len(r) > 3 {
		limit = 2
	}
	best, bestD := "", limit+1
	for _, n := range names {
		d := distance(r, []rune(n.name))
		if d > 0 && d < bestD && d < len(r) {
			best, bestD = n.name, d
		}
	}
	return best
}

// distance is the Levenshtein edit distance between a and b.
func distance(a, b []rune) int {
	prev := make([]int, len(b)+1)
	cur := make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(b)]
}
