package compose

import (
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/notation"
)

// richText sets running text, printing each short symbol written in sheet
// notation — a base of one or two letters or a Greek name, optional
// primes, "_" and a subscript (c_u, N_γ, σ′_v0, q_2, V_d, gamma_w), or a
// base with ASCII primes (E', phi') — as math (subscript lowered,
// Greek and primes as the sheet notation prints them). Longer words with
// underscores (local_shear, self_weight: option words of the sheet
// language) print in the code face, as written. The runs are
// plinth's own text (layout.Run.Own); wrap the user's text in users.
func richText(s string, style layout.Style) []layout.Run {
	var out []layout.Run
	plain := 0
	flush := func(end int) {
		if end > plain {
			out = append(out, layout.Run{Text: s[plain:end], Style: style, Own: true})
		}
	}
	for i := 0; i < len(s); {
		r, n := utf8.DecodeRuneInString(s[i:])
		if !wordRune(r) {
			i += n
			continue
		}
		j := i
		for j < len(s) {
			r2, n2 := utf8.DecodeRuneInString(s[j:])
			if !wordRune(r2) {
				break
			}
			j += n2
		}
		if name, ok := shortSymbol(s[i:j]); ok {
			flush(i)
			out = append(out, layout.Run{Math: eqn.Sym{Name: name}, Own: true})
			plain = j
		} else if word(s[i:j]) {
			flush(i)
			out = append(out, layout.Run{Text: s[i:j], Style: layout.Mono, Own: true})
			plain = j
		}
		i = j
	}
	flush(len(s))
	return out
}

// word reports whether w is an option word of the sheet language: lower
// case letters and digits joined by "_" (local_shear, two_layer).
func word(w string) bool {
	if !strings.Contains(w, "_") || strings.HasPrefix(w, "_") || strings.HasSuffix(w, "_") {
		return false
	}
	for _, r := range w {
		if !(r >= 'a' && r <= 'z' || r >= '0' && r <= '9' || r == '_') {
			return false
		}
	}
	return true
}

func wordRune(r rune) bool {
	return unicode.IsLetter(r) || unicode.IsDigit(r) || r == '_' || r == '\'' || r == '′'
}

// shortSymbol reports whether w is a short symbol in sheet notation and
// returns it with primes written as '.
func shortSymbol(w string) (string, bool) {
	base, sub, ok := strings.Cut(w, "_")
	letters := strings.TrimRight(base, "'′")
	_, greek := notation.Greek(letters)
	if n := utf8.RuneCountInString(letters); !greek && (n < 1 || n > 2) {
		return "", false
	}
	for _, r := range letters {
		if !unicode.IsLetter(r) {
			return "", false
		}
	}
	if !ok && strings.HasSuffix(w, "'") && strings.TrimRight(w, "'") == letters {
		return w, true // a primed symbol: E', phi'
	}
	if !ok || sub == "" || strings.HasSuffix(sub, "_") {
		return "", false
	}
	if utf8.RuneCountInString(strings.TrimRight(sub, "'′")) > 8 {
		return "", false
	}
	for _, r := range sub {
		if !(unicode.IsLetter(r) || unicode.IsDigit(r) || r == '_' || r == '\'' || r == '′') {
			return "", false
		}
	}
	return strings.ReplaceAll(w, "′", "'"), true
}
