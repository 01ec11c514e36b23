package fonts

import "strings"

// fallback spells characters plinth's own text may hold in characters
// every text face has. It is the one table of such spellings: vulgar
// fractions are written as fractions with a slash (a face may lack ⅔,
// and a stacked fraction belongs in a formula), the rest are near
// equivalents.
var fallback = map[rune]string{
	'½': "1/2", '⅓': "1/3", '⅔': "2/3", '¼': "1/4", '¾': "3/4",
	'⅕': "1/5", '⅖': "2/5", '⅗': "3/5", '⅘': "4/5", '⅙': "1/6", '⅚': "5/6",
	'⅛': "1/8", '⅜': "3/8", '⅝': "5/8", '⅞': "7/8",
	'′': "'", '″': "''", '−': "-", '–': "-", '—': "-", '…': "...",
	'≤': "<=", '≥': ">=", '×': "x", '·': ".", '→': "->", '“': "\"", '”': "\"",
	'‘': "'", '’': "'", '\u00a0': " ", '\u2009': " ", '\u202f': " ",
	'⁰': "^0", '¹': "^1", '²': "^2", '³': "^3", '⁴': "^4", '⁵': "^5",
	'⁶': "^6", '⁷': "^7", '⁸': "^8", '⁹': "^9", '⁻': "^-",
}

// vulgar reports whether r is a vulgar-fraction character (⅔).
func vulgar(r rune) bool {
	return r == '½' || r == '¼' || r == '¾' || r >= '⅐' && r <= '⅞'
}

// Spell rewrites plinth's own text for face f: every vulgar fraction as
// a slashed fraction ("⅔" → "2/3"), and every other character f lacks
// by the fallback table where it has an entry. Characters with no
// spelling are left for the caller to report.
func Spell(s string, f Face) string {
	font := Get(f)
	need := false
	for _, r := range s {
		if vulgar(r) || !font.Has(r) && fallback[r] != "" {
			need = true
			break
		}
	}
	if !need {
		return s
	}
	var b strings.Builder
	for _, r := range s {
		switch alt := fallback[r]; {
		case alt != "" && (vulgar(r) || !font.Has(r)):
			b.WriteString(alt)
		default:
			b.WriteRune(r)
		}
	}
	return b.String()
}
