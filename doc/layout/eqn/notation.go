package eqn

import (
	"strings"

	"github.com/plinth-calc/plinth/doc/expr"
)

// Parts is a symbol name taken apart by the sheet notation.
type Parts struct {
	Prefix string // block prefix before the last ".", without the dot
	Base   string // base as printed (Greek applied)
	Greek  bool   // base was a Greek name
	Primes int    // primes, printed after the base
	Sub    string // subscript as printed: parts joined by ",", Greek applied
}

// Split takes a sheet-notation name apart with the sheet language's own
// rules (expr.SplitSymbol, expr.Greek): "F1.phi'_d_k" → {Prefix "F1",
// Base "φ", Primes 1, Sub "d,k"}; primes ending the subscript belong to
// the subscript ("sigma_v'" → σ with subscript v′). An increment reads
// as one symbol: "Delta_sigma'_v" → Δσ′ with subscript v.
func Split(name string) Parts {
	var p Parts
	base, primes, sub := expr.SplitSymbol(name)
	if i := strings.LastIndexByte(base, '.'); i >= 0 {
		p.Prefix, base = base[:i], base[i+1:]
	}
	p.Primes = primes
	switch g, ok := expr.Greek(base); {
	case base == "Delta" && primes == 0 && sub != "":
		first, rest, _ := strings.Cut(sub, ",")
		bare := strings.TrimRight(first, "'")
		if gb, ok := expr.Greek(bare); ok {
			bare = gb
		}
		p.Base, p.Greek, p.Primes, sub = "Δ"+bare, true, len(first)-len(strings.TrimRight(first, "'")), rest
	case ok:
		p.Base, p.Greek = g, true
	default:
		p.Base = base
	}
	if sub != "" {
		parts := strings.Split(sub, ",")
		for i, s := range parts {
			bare := strings.TrimRight(s, "'")
			if g, ok := expr.Greek(bare); ok {
				bare = g
			}
			parts[i] = bare + strings.Repeat("′", len(s)-len(strings.TrimRight(s, "'")))
		}
		p.Sub = strings.Join(parts, ",")
	}
	return p
}
