// Package suggest finds the nearest known name to an unknown one, for
// "did you mean" hints: the one rule every stage uses (block words,
// options, statements, symbols, metadata keys, units, templates).
//
// The rule: a name that is itself a candidate has no suggestion; a
// candidate differing only in letter case wins ("kpa" → "kPa"), then one
// differing only in letter case and underscores ("cu" → "c_u",
// "gammasat" → "gamma_sat"); otherwise the candidate at the smallest
// edit distance (Distance), allowed up to 1 for names of up to four runes
// and 2 for longer ones, and always less than the name's length in runes
// (so a single letter is corrected only for its case). Ties go to the
// earlier candidate.
package suggest

import "strings"

// Nearest returns the candidate nearest to name by the package's rule,
// and false when none is near enough.
func Nearest(name string, candidates []string) (string, bool) {
	if name == "" {
		return "", false
	}
	for _, c := range candidates {
		if c == name {
			return "", false
		}
	}
	for _, c := range candidates {
		if strings.EqualFold(c, name) {
			return c, true
		}
	}
	for _, c := range candidates {
		if squash(c) == squash(name) {
			return c, true
		}
	}
	n := len([]rune(name))
	limit := 1
	if n > 4 {
		limit = 2
	}
	best, bestD := "", limit+1
	for _, c := range candidates {
		if d := Distance(name, c); d < bestD && d < n {
			best, bestD = c, d
		}
	}
	return best, best != ""
}

// Distance is the edit distance between a and b, on runes, counting an
// insertion, a deletion, a substitution or a transposition of two
// neighbouring runes as one edit (the optimal-string-alignment form of
// the Damerau–Levenshtein distance), so "clac" is one edit from "calc".
func Distance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	// rows i-2, i-1 and i of the table
	pp := make([]int, len(rb)+1)
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
			if i > 1 && j > 1 && ra[i-1] == rb[j-2] && ra[i-2] == rb[j-1] {
				cur[j] = min(cur[j], pp[j-2]+1)
			}
		}
		pp, prev, cur = prev, cur, pp
	}
	return prev[len(rb)]
}

// squash folds letter case and drops underscores.
func squash(s string) string { return strings.ReplaceAll(strings.ToLower(s), "_", "") }
