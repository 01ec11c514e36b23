package design

import (
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Components of an action's effect, the index into Load.Use and
// Load.Gamma: vertical, horizontal along B and L, moments along B and L.
const (
	CV = iota
	CHB
	CHL
	CMB
	CML
	NComp
)

// CompNames are the components' names as printed ("V", "H_B", ...).
var CompNames = [NComp]string{"V", "H_B", "H_L", "M_B", "M_L"}

// Comp returns component k of a.
func Comp(a site.Action, k int) float64 {
	return [NComp]float64{a.V, a.HB, a.HL, a.MB, a.ML}[k]
}

// Use says how one component of one action enters a design load.
type Use int8

const (
	Out  Use = iota // left out: zero, or a favourable variable effect (γ_Q = 0)
	GSup            // permanent, unfavourable: γ_G,sup
	GInf            // permanent, favourable: γ_G,inf
	Q               // variable, unfavourable: γ_Q (·ψ0 when accompanying)
)

// Load is one design combination of a footing's actions.
type Load struct {
	Name        string      // "DA1-C1 · Wind leading · G inf on V · left out as favourable: Imposed"
	Combination string      // "DA1-C1"
	Index       int         // index of the combination in the approach
	Set         Combination // the partial factors
	Leading     int         // index of the leading variable action, -1 if none
	// GSup is the family: true for the greatest vertical load (downward
	// effects unfavourable), false for the least (downward effects
	// favourable: sliding, uplift, eccentricity, inclination).
	GSup bool
	// Per action, parallel to the actions, and per component (CV ...):
	// Use is how the effect enters, Gamma the partial factor applied
	// (0 = left out), Factor = Gamma·Psi. Psi is the combination factor
	// of the action (1 for permanent and leading actions).
	Use           [][NComp]Use
	Gamma, Factor [][NComp]float64
	Psi           []float64
	// LeftOut names what was left out as favourable, as printed in the
	// name: an action ("Imposed") or one component of it ("Surcharge V").
	LeftOut           []string
	V, HB, HL, MB, ML float64 // design values, N and N·m (per metre for a strip)
}

// nets returns the net characteristic value of each component (every
// action at factor 1). A horizontal action or moment of the net's sign
// (either sign where the net is zero) is unfavourable; one against it is
// favourable.
func nets(acts []site.Action) [NComp]float64 {
	var n [NComp]float64
	for _, a := range acts {
		for k := range NComp {
			n[k] += Comp(a, k)
		}
	}
	return n
}

// adverse reports whether component k of a is unfavourable in the family
// of the greatest vertical load (gsup) or of the least (!gsup): a
// downward V is unfavourable only in the first, an upward V only in the
// second; a horizontal action or moment with the net's sign in both.
func adverse(a site.Action, k int, gsup bool, net [NComp]float64) bool {
	v := Comp(a, k)
	switch {
	case v == 0:
		return false
	case k == CV:
		return (v > 0) == gsup
	}
	return net[k] == 0 || (v > 0) == (net[k] > 0)
}

// uses returns how each component of a enters a load of the family gsup
// (EN 1990:2002 6.4.3.2(3), Table A1.2(B)): permanent effects at γ_G,sup
// where unfavourable and γ_G,inf where favourable (always γ_G,inf for an
// action marked favourable); variable effects at γ_Q where unfavourable
// and left out (γ_Q = 0) where favourable (always, for one marked
// favourable).
func uses(a site.Action, gsup bool, net [NComp]float64) [NComp]Use {
	var u [NComp]Use
	for k := range NComp {
		if Comp(a, k) == 0 {
			continue
		}
		bad := adverse(a, k, gsup, net) && !a.Favourable
		switch {
		case a.Kind == site.Permanent && bad:
			u[k] = GSup
		case a.Kind == site.Permanent:
			u[k] = GInf
		case bad:
			u[k] = Q
		}
	}
	return u
}

// Loads returns the design loads of every combination of ap by EN
// 1990:2002 eq. (6.10), each effect factored by whether it is
// unfavourable (Table A1.2(B), 6.4.3.2(3)). For each combination there
// are two families: the greatest vertical load ("G sup": downward effects
// unfavourable) and, where any action has a horizontal component, a
// moment or an upward V, the least vertical load ("G inf": downward
// effects favourable, upward ones, horizontal actions and moments
// unfavourable; "G inf on V" where a permanent action's horizontal
// component or moment is then at a γ_G,sup above γ_G,inf). In each
// family every variable action with an unfavourable effect leads in turn
// (the others at γ_Q·ψ0); variable effects that are favourable in the
// family are left out, so an
// action whose effects differ (a surcharge whose V resists sliding and
// whose H drives it) is split: its V is left out of the least-V family
// while its H stays. The cases per combination are at most twice the
// number of variable actions, whatever their number. With no variable
// action the single "permanent only" load of each family is used.
// Identical loads within a combination are listed once.
func Loads(acts []site.Action, ap Approach) []Load {
	net := nets(acts)
	least := false
	for _, a := range acts {
		least = least || a.V < 0 || a.HB != 0 || a.HL != 0 || a.MB != 0 || a.ML != 0
	}
	fams := []bool{true}
	if least {
		fams = append(fams, false)
	}
	tags := Tags(acts)
	var out []Load
	for ci, c := range ap.Combinations {
		start := len(out)
		add := func(lead int, gsup bool) {
			l := build(acts, tags, net, ap, ci, c, lead, gsup)
			for _, o := range out[start:] {
				if o.V == l.V && o.HB == l.HB && o.HL == l.HL && o.MB == l.MB && o.ML == l.ML {
					return
				}
			}
			out = append(out, l)
		}
		for _, gsup := range fams {
			n := 0
			for i, a := range acts {
				if a.Kind != site.Variable {
					continue
				}
				u := uses(a, gsup, net)
				for k := range NComp {
					if u[k] == Q {
						add(i, gsup)
						n++
						break
					}
				}
			}
			if n == 0 {
				add(-1, gsup)
			}
		}
	}
	return out
}

func build(acts []site.Action, tags []string, net [NComp]float64, ap Approach, ci int, c Combination, lead int, gsup bool) Load {
	n := len(acts)
	l := Load{
		Combination: ap.CombinationName(ci), Index: ci, Set: c, Leading: lead, GSup: gsup,
		Use: make([][NComp]Use, n), Gamma: make([][NComp]float64, n), Factor: make([][NComp]float64, n),
		Psi: make([]float64, n),
	}
	as := c.Actions
	supH := false
	for i, a := range acts {
		u := uses(a, gsup, net)
		psi := 1.0
		if a.Kind == site.Variable && i != lead {
			psi = a.Psi0.Or(ap.Psi0())
		}
		l.Use[i], l.Psi[i] = u, psi
		var out []string
		all := true
		for k := range NComp {
			g, p := 0.0, 1.0
			switch u[k] {
			case GSup:
				g = as.GammaGSup
				supH = supH || k != CV && as.GammaGSup != as.GammaGInf
			case GInf:
				g = as.GammaGInf
			case Q:
				g, p = as.GammaQ, psi
			}
			if a.Kind == site.Variable && Comp(a, k) != 0 {
				if u[k] == Out {
					out = append(out, CompNames[k])
				} else {
					all = false
				}
			}
			l.Gamma[i][k], l.Factor[i][k] = g, g*p
		}
		l.V += l.Factor[i][CV] * a.V
		l.HB += l.Factor[i][CHB] * a.HB
		l.HL += l.Factor[i][CHL] * a.HL
		l.MB += l.Factor[i][CMB] * a.MB
		l.ML += l.Factor[i][CML] * a.ML
		switch {
		case len(out) == 0:
		case all:
			l.LeftOut = append(l.LeftOut, name(acts, tags, i))
		default:
			l.LeftOut = append(l.LeftOut, name(acts, tags, i)+" "+strings.Join(out, ", "))
		}
	}
	lead2 := "permanent only"
	if lead >= 0 {
		lead2 = name(acts, tags, lead) + " leading"
	}
	g := "G sup"
	switch {
	case !gsup && supH:
		g = "G inf on V"
	case !gsup:
		g = "G inf"
	}
	l.Name = l.Combination + " · " + lead2 + " · " + g
	if len(l.LeftOut) > 0 {
		l.Name += " · left out as favourable: " + strings.Join(l.LeftOut, "; ")
	}
	return l
}

// name is the action's name, or its tag where it has none.
func name(acts []site.Action, tags []string, i int) string {
	if acts[i].Name == "" {
		return tags[i]
	}
	return acts[i].Name
}

// Tags returns the first word of each action's name reduced to ASCII
// letters and digits, for use in symbols (V_k_Dead for "Dead load"); an
// empty or repeated tag becomes G1, Q2, ... by kind and position.
func Tags(acts []site.Action) []string {
	out := make([]string, len(acts))
	seen := map[string]bool{}
	for i, a := range acts {
		var b strings.Builder
		first, _, _ := strings.Cut(strings.TrimSpace(a.Name), " ")
		for _, r := range first {
			if r < 128 && (r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r >= '0' && r <= '9') {
				b.WriteRune(r)
			}
		}
		t := b.String()
		if t == "" || seen[t] || t[0] >= '0' && t[0] <= '9' {
			k := "G"
			if a.Kind == site.Variable {
				k = "Q"
			}
			t = k + strconv.Itoa(i+1)
		}
		seen[t] = true
		out[i] = t
	}
	return out
}

// PsiDefaulted lists the names of variable actions that give no ψ0 and
// so take the approach's default when not leading (only where there is
// more than one variable action, since a lone one always leads; one
// marked favourable is never in a load and does not count).
func PsiDefaulted(acts []site.Action) []string {
	var vars, out []string
	for _, a := range acts {
		if a.Kind == site.Variable && !a.Favourable {
			vars = append(vars, a.Name)
			if !a.Psi0.Set {
				out = append(out, a.Name)
			}
		}
	}
	if len(vars) < 2 {
		return nil
	}
	return out
}

// Sources used by Record.
var (
	refA3   = trace.Ref{Source: trace.EN1997, Clause: "Annex A, Table A.3"}
	refPsi  = trace.Ref{Source: trace.EN1990, Clause: "Annex A1, Table A1.1 (ψ0)"}
	refComb = trace.Ref{Source: trace.EN1990, Clause: "6.4.3.2, eq. (6.10)"}
	refFav  = trace.Ref{Source: trace.EN1990, Clause: "Annex A1, Table A1.2(B) note; 6.4.3.2(3)"}
)

// gammaSym is the symbol of the factor of a use.
var gammaSym = [...]string{Out: "", GSup: "gamma_G_sup", GInf: "gamma_G_inf", Q: "gamma_Q"}

// Record appends the working of l to t under case name cas: the partial
// factors used (from EN 1997-1 Table A.3 as the approach gives them), what
// was left out as favourable (γ_Q = 0) and what of a split action stayed,
// the ψ0 of non-leading variable actions, and the design values V_d,
// H_B_d, H_L_d, M_B_d, M_L_d, each evaluated from its printed sum (it
// agrees with l's, from Loads, to rounding). unitF and unitM are the
// display units of forces and moments ("kN", "kNm"; "kN/m", "kNm/m" for
// a strip). A sum out of its domain (an overflow) is t's error, for the
// caller to return (t.Err).
func (l Load) Record(t *trace.Trace, acts []site.Action, cas, unitF, unitM string) {
	tags := Tags(acts)
	var used [4]bool
	for i := range acts {
		for k := range NComp {
			used[l.Use[i][k]] = true
		}
	}
	as := l.Set.Actions
	if used[GSup] {
		t.Take(trace.Step{Symbol: "gamma_G_sup", Kind: trace.Tabulated, Value: as.GammaGSup, Ref: refA3, Note: "partial factor, permanent unfavourable (" + as.Name + ")", Case: cas})
	}
	if used[GInf] {
		t.Take(trace.Step{Symbol: "gamma_G_inf", Kind: trace.Tabulated, Value: as.GammaGInf, Ref: refA3, Note: "partial factor, permanent favourable (" + as.Name + ")", Case: cas})
	}
	if used[Q] {
		t.Take(trace.Step{Symbol: "gamma_Q", Kind: trace.Tabulated, Value: as.GammaQ, Ref: refA3, Note: "partial factor, variable unfavourable (" + as.Name + ")", Case: cas})
	}
	if len(l.LeftOut) > 0 {
		var parts []string
		for i, a := range acts {
			var out, in []string
			for k := range NComp {
				if a.Kind != site.Variable || Comp(a, k) == 0 {
					continue
				}
				if l.Use[i][k] == Out {
					out = append(out, CompNames[k])
				} else {
					in = append(in, CompNames[k])
				}
			}
			if len(out) == 0 {
				continue
			}
			p := name(acts, tags, i) + " " + strings.Join(out, ", ")
			if a.Favourable {
				p += " (marked favourable)"
			}
			if len(in) > 0 {
				p += " (split: its " + strings.Join(in, ", ") + " at γ_Q)"
			}
			parts = append(parts, p)
		}
		t.Take(trace.Step{Symbol: "gamma_Q_inf", Kind: trace.Given, Value: 0, Ref: refFav, Note: "variable effects favourable here, left out: " + strings.Join(parts, "; "), Case: cas})
	}
	for i, a := range acts {
		if a.Kind == site.Variable && l.uses(i, Q) && i != l.Leading {
			note, kind := "combination factor of "+a.Name, trace.Given
			if !a.Psi0.Set {
				note += ": assumed, default (EN 1990 Table A1.1, imposed loads); give psi_0 to change it"
				kind = trace.Tabulated
			}
			t.Take(trace.Step{Symbol: "psi_0_" + tags[i], Kind: kind, Value: l.Psi[i], Ref: refPsi, Note: note, Case: cas})
		}
	}
	syms := [NComp]string{"V_d", "H_B_d", "H_L_d", "M_B_d", "M_L_d"}
	kSyms := [NComp]string{"V_k_", "H_B_k_", "H_L_k_", "M_B_k_", "M_L_k_"}
	for k := range NComp {
		unit := unitF
		if k >= CMB {
			unit = unitM
		}
		var f trace.Expr
		var in []trace.Value
		for i, a := range acts {
			v := Comp(a, k)
			u := l.Use[i][k]
			if u == Out || v == 0 {
				continue
			}
			g, ks := gammaSym[u], kSyms[k]+tags[i]
			term := trace.Mul(trace.S(g), trace.S(ks))
			in = append(in, trace.Value{Symbol: g, V: l.Gamma[i][k]})
			if u == Q && i != l.Leading {
				p := "psi_0_" + tags[i]
				term = trace.Mul(trace.S(g), trace.S(p), trace.S(ks))
				in = append(in, trace.Value{Symbol: p, V: l.Psi[i]})
			}
			in = append(in, trace.Value{Symbol: ks, V: v, Unit: unit})
			if f == nil {
				f = term
			} else {
				f = trace.Add(f, term)
			}
		}
		switch {
		case f == nil && k != CV:
			continue // a component no action has is left out of the working
		case f == nil:
			t.Take(trace.Step{Symbol: syms[k], Kind: trace.Given, Value: 0, Unit: unit, Ref: refComb, Note: "design action effect", Case: cas})
		default:
			t.Eval(trace.Step{Symbol: syms[k], Formula: f, Inputs: in, Unit: unit, Ref: refComb, Note: "design action effect", Case: cas})
		}
	}
}

// uses reports whether any component of action i enters l as u.
func (l Load) uses(i int, u Use) bool {
	for k := range NComp {
		if l.Use[i][k] == u {
			return true
		}
	}
	return false
}
