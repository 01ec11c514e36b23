package sheet

import "strings"

// Nearest returns the candidate closest to name, for "did you mean"
// hints, and false when none is close. A candidate differing only in
// letter case wins, then one differing only in underscores (cu → c_u,
// gammasat → gamma_sat, site.firm_clay.cu → site.firm_clay.c_u rather than
// the equally near site.firm_clay.c'); otherwise the smallest edit distance (Levenshtein, on
// runes) up to 1 for names of up to four letters and 2 for longer ones,
// ties going to the earlier candidate. name itself is never suggested.
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
	r := []rune(name)
	limit := 1
	if len(r) > 4 {
		limit = 2
	}
	best, bestD := "", limit+1
	for _, c := range candidates {
		if d := Distance(name, c); d < bestD && d < len(r) {
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
