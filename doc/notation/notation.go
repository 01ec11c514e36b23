package notation

import "strings"

// Parts is a symbol name taken apart by the sheet notation.
type Parts struct {
	Prefix string // block prefix before the last ".", without the dot
	Base   string // base as printed (Greek applied)
	Greek  bool   // base was a Greek name
	Primes int    // primes, printed after the base
	Sub    string // subscript as printed: parts joined by ",", Greek applied
}

// Split takes a sheet-notation name apart: "F1.phi'_d_k" → {Prefix "F1",
// Base "φ", Primes 1, Sub "d,k"}; primes ending the subscript belong to
// the subscript ("sigma_v'" → σ with subscript v′). An increment reads
// as one symbol: "Delta_sigma'_v" → Δσ′ with subscript v.
func Split(name string) Parts {
	var p Parts
	base, primes, sub := cut(name)
	if i := strings.LastIndexByte(base, '.'); i >= 0 {
		p.Prefix, base = base[:i], base[i+1:]
	}
	p.Primes = primes
	switch g, ok := Greek(base); {
	case base == "Delta" && primes == 0 && sub != "":
		first, rest, _ := strings.Cut(sub, ",")
		bare := strings.TrimRight(first, "'")
		if gb, ok := Greek(bare); ok {
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
			if g, ok := Greek(bare); ok {
				bare = g
			}
			parts[i] = bare + strings.Repeat("′", len(s)-len(strings.TrimRight(s, "'")))
		}
		p.Sub = strings.Join(parts, ",")
	}
	return p
}

// cut splits a symbol as written. The text before the first "_" is the
// base, the rest the subscript with further "_" shown as commas. Primes
// ending the base are counted; primes ending the subscript stay in it,
// so a partial factor on φ′ reads γ with subscript φ′:
//
//	gamma_sat  → ("gamma", 0, "sat")
//	q_ult_net  → ("q", 0, "ult,net")
//	phi'_d     → ("phi", 1, "d")
//	gamma_phi' → ("gamma", 0, "phi'")
//	B'         → ("B", 1, "")
//
// For a block result (F1.R_d) only the part after the last "." is split;
// the prefix stays at the front of base: ("F1.R", 0, "d").
func cut(name string) (base string, primes int, sub string) {
	prefix := ""
	if i := strings.LastIndexByte(name, '.'); i >= 0 {
		prefix, name = name[:i+1], name[i+1:]
	}
	base, sub, _ = strings.Cut(name, "_")
	trimmed := strings.TrimRight(base, "'")
	primes = len(base) - len(trimmed)
	base = trimmed
	sub = strings.ReplaceAll(sub, "_", ",")
	return prefix + base, primes, sub
}

var greek = map[string]string{
	"alpha": "α", "beta": "β", "gamma": "γ", "delta": "δ", "epsilon": "ε",
	"zeta": "ζ", "eta": "η", "theta": "θ", "iota": "ι", "kappa": "κ",
	"lambda": "λ", "mu": "μ", "nu": "ν", "xi": "ξ", "omicron": "ο",
	"pi": "π", "rho": "ρ", "sigma": "σ", "tau": "τ", "upsilon": "υ",
	"phi": "φ", "chi": "χ", "psi": "ψ", "omega": "ω",
	"Alpha": "Α", "Beta": "Β", "Gamma": "Γ", "Delta": "Δ", "Epsilon": "Ε",
	"Zeta": "Ζ", "Eta": "Η", "Theta": "Θ", "Iota": "Ι", "Kappa": "Κ",
	"Lambda": "Λ", "Mu": "Μ", "Nu": "Ν", "Xi": "Ξ", "Omicron": "Ο",
	"Pi": "Π", "Rho": "Ρ", "Sigma": "Σ", "Tau": "Τ", "Upsilon": "Υ",
	"Phi": "Φ", "Chi": "Χ", "Psi": "Ψ", "Omega": "Ω",
}

// Greek returns the Greek letter for a spelled-out base ("gamma" → "γ",
// "Gamma" → "Γ", "pi" → "π"); false when base is not a letter name.
func Greek(base string) (string, bool) {
	g, ok := greek[base]
	return g, ok
}
