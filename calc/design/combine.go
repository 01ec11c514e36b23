package design

import (
	"strconv"
	"strings"

	"plinth/calc/site"
	"plinth/calc/trace"
)

// Load is one design combination of a footing's actions.
type Load struct {
	Name        string      // "DA1-C2 · Imposed leading · G sup"
	Combination string      // "DA1-C2"
	Index       int         // index of the combination in the approach
	Set         Combination // the partial factors
	Leading     int         // index of the leading variable action, -1 if none
	GSup        bool        // permanent actions at γ_G,sup (else γ_G,inf)
	// Per action, parallel to the actions: Gamma is the partial factor
	// applied (0 = left out as favourable), Psi the combination factor
	// (1 for permanent and leading actions), Factor = Gamma·Psi.
	Gamma, Psi, Factor []float64
	V, HB, HL, MB, ML  float64 // design values, N and N·m (per metre for a strip)
}

// Pure reports whether an action only pushes down: no horizontal load and
// no moment. Such a variable action is favourable where a lower vertical
// load is more onerous.
func pure(a site.Action) bool {
	return a.HB == 0 && a.HL == 0 && a.MB == 0 && a.ML == 0 && a.V >= 0
}

func hasHM(acts []site.Action) bool {
	for _, a := range acts {
		if a.HB != 0 || a.HL != 0 || a.MB != 0 || a.ML != 0 {
			return true
		}
	}
	return false
}

// Loads returns the design loads of every combination of ap, in order:
// for each combination, each variable action leading in turn with the
// permanent actions at γ_G,sup; then, where any action carries horizontal
// load or moment, each such variable action leading with the permanent
// actions at γ_G,inf and the purely vertical variable actions left out.
// With no variable action the single "permanent only" load is used.
// Identical loads within a combination are listed once.
func Loads(acts []site.Action, ap Approach) []Load {
	var vars, hm []int
	for i, a := range acts {
		if a.Kind == site.Variable {
			vars = append(vars, i)
			if !pure(a) {
				hm = append(hm, i)
			}
		}
	}
	sup := vars
	if len(sup) == 0 {
		sup = []int{-1}
	}
	inf := hm
	if len(inf) == 0 {
		inf = []int{-1}
	}
	tags := Tags(acts)
	var out []Load
	for ci, c := range ap.Combinations {
		start := len(out)
		add := func(lead int, gsup bool) {
			l := build(acts, tags, ap, ci, c, lead, gsup)
			for _, o := range out[start:] {
				if o.V == l.V && o.HB == l.HB && o.HL == l.HL && o.MB == l.MB && o.ML == l.ML {
					return
				}
			}
			out = append(out, l)
		}
		for _, lead := range sup {
			add(lead, true)
		}
		if hasHM(acts) {
			for _, lead := range inf {
				add(lead, false)
			}
		}
	}
	return out
}

func build(acts []site.Action, tags []string, ap Approach, ci int, c Combination, lead int, gsup bool) Load {
	n := len(acts)
	l := Load{
		Combination: ap.CombinationName(ci), Index: ci, Set: c, Leading: lead, GSup: gsup,
		Gamma: make([]float64, n), Psi: make([]float64, n), Factor: make([]float64, n),
	}
	for i, a := range acts {
		g, psi := 0.0, 1.0
		switch {
		case a.Kind == site.Permanent && (a.Favourable || !gsup):
			g = c.Actions.GammaGInf
		case a.Kind == site.Permanent:
			g = c.Actions.GammaGSup
		case i == lead:
			g = c.Actions.GammaQ
		case !gsup && pure(a):
			g = 0 // favourable variable action left out
		default:
			g = c.Actions.GammaQ
			psi = a.Psi0.Or(ap.Psi0())
		}
		l.Gamma[i], l.Psi[i], l.Factor[i] = g, psi, g*psi
		f := g * psi
		l.V += f * a.V
		l.HB += f * a.HB
		l.HL += f * a.HL
		l.MB += f * a.MB
		l.ML += f * a.ML
	}
	lead2 := "permanent only"
	if lead >= 0 {
		name := acts[lead].Name
		if name == "" {
			name = tags[lead]
		}
		lead2 = name + " leading"
	}
	g := "G sup"
	if !gsup {
		g = "G inf"
	}
	l.Name = l.Combination + " · " + lead2 + " · " + g
	return l
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
// more than one variable action, since a lone one always leads).
func PsiDefaulted(acts []site.Action) []string {
	var vars, out []string
	for _, a := range acts {
		if a.Kind == site.Variable {
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
)

// Record appends the working of l to t under case name cas: the partial
// factors used, the ψ0 of non-leading variable actions, and the design
// values V_d, H_B_d, H_L_d, M_B_d, M_L_d. unitF and unitM are the display
// units of forces and moments ("kN", "kNm"; "kN/m", "kNm/m" for a strip).
func (l Load) Record(t *trace.Trace, acts []site.Action, cas, unitF, unitM string) {
	tags := Tags(acts)
	var usedSup, usedInf, usedQ bool
	for i, a := range acts {
		if l.Gamma[i] == 0 {
			continue
		}
		if a.Kind == site.Permanent {
			if a.Favourable || !l.GSup {
				usedInf = true
			} else {
				usedSup = true
			}
		} else {
			usedQ = true
		}
	}
	as := l.Set.Actions
	if usedSup {
		t.Add(trace.Step{Symbol: "gamma_G_sup", Value: as.GammaGSup, Ref: refA3, Note: "partial factor, permanent unfavourable (" + as.Name + ")", Case: cas})
	}
	if usedInf {
		t.Add(trace.Step{Symbol: "gamma_G_inf", Value: as.GammaGInf, Ref: refA3, Note: "partial factor, permanent favourable (" + as.Name + ")", Case: cas})
	}
	if usedQ {
		t.Add(trace.Step{Symbol: "gamma_Q", Value: as.GammaQ, Ref: refA3, Note: "partial factor, variable unfavourable (" + as.Name + ")", Case: cas})
	}
	for i, a := range acts {
		if a.Kind == site.Variable && l.Gamma[i] != 0 && i != l.Leading {
			note := "combination factor of " + a.Name
			if !a.Psi0.Set {
				note += " (not given: default)"
			}
			t.Add(trace.Step{Symbol: "psi_0_" + tags[i], Value: l.Psi[i], Ref: refPsi, Note: note, Case: cas})
		}
	}
	comp := []struct {
		sym, k, unit string
		get          func(site.Action) float64
		d            float64
	}{
		{"V_d", "V_k_", unitF, func(a site.Action) float64 { return a.V }, l.V},
		{"H_B_d", "H_B_k_", unitF, func(a site.Action) float64 { return a.HB }, l.HB},
		{"H_L_d", "H_L_k_", unitF, func(a site.Action) float64 { return a.HL }, l.HL},
		{"M_B_d", "M_B_k_", unitM, func(a site.Action) float64 { return a.MB }, l.MB},
		{"M_L_d", "M_L_k_", unitM, func(a site.Action) float64 { return a.ML }, l.ML},
	}
	for _, c := range comp {
		var f trace.Expr
		var in []trace.Value
		for i, a := range acts {
			v := c.get(a)
			if l.Gamma[i] == 0 || v == 0 {
				continue
			}
			var g string
			switch {
			case a.Kind == site.Permanent && (a.Favourable || !l.GSup):
				g = "gamma_G_inf"
			case a.Kind == site.Permanent:
				g = "gamma_G_sup"
			default:
				g = "gamma_Q"
			}
			term := trace.Mul(trace.S(g), trace.S(c.k+tags[i]))
			in = append(in, trace.Value{Symbol: g, V: l.Gamma[i]})
			if a.Kind == site.Variable && i != l.Leading {
				p := "psi_0_" + tags[i]
				term = trace.Mul(trace.S(g), trace.S(p), trace.S(c.k+tags[i]))
				in = append(in, trace.Value{Symbol: p, V: l.Psi[i]})
			}
			in = append(in, trace.Value{Symbol: c.k + tags[i], V: v, Unit: c.unit})
			if f == nil {
				f = term
			} else {
				f = trace.Add(f, term)
			}
		}
		if f == nil && c.sym != "V_d" {
			continue // a component no action has is left out of the working
		}
		t.Add(trace.Step{Symbol: c.sym, Formula: f, Inputs: in, Value: c.d, Unit: c.unit, Ref: refComb, Note: "design action effect", Case: cas})
	}
}
