package design

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// ServiceKind selects a serviceability combination (EN 1990 6.5.3).
type ServiceKind int

const (
	// Characteristic: Σ G_k + Q_k,1 + Σ ψ0,i Q_k,i, EN 1990 eq. (6.14b),
	// each variable action leading in turn, the largest V kept.
	Characteristic ServiceKind = iota
	// QuasiPermanent: Σ G_k + Σ ψ2,i Q_k,i, EN 1990 eq. (6.16b), for
	// long-term effects such as consolidation settlement.
	QuasiPermanent
)

func (k ServiceKind) String() string {
	if k == QuasiPermanent {
		return "quasi-permanent"
	}
	return "characteristic"
}

// ParseServiceKind reads "characteristic" or "quasi-permanent".
func ParseServiceKind(s string) (ServiceKind, bool) {
	switch s {
	case "characteristic":
		return Characteristic, true
	case "quasi-permanent":
		return QuasiPermanent, true
	}
	return 0, false
}

// DefaultPsi2 is ψ2 for a variable action that gives none: 1.0, treating
// the whole variable action as permanent (conservative; common practice).
const DefaultPsi2 = 1.0

// Service is a serviceability load: the combined actions and the factor
// applied to each (parallel to the actions).
type Service struct {
	Name    string // "characteristic · Imposed leading"
	Kind    ServiceKind
	Leading int // characteristic: the leading variable action, -1 if none
	Factor  []float64
	V       float64 // N (N/m for a strip)
}

var (
	refChar = trace.Ref{Source: trace.EN1990, Clause: "6.5.3, eq. (6.14b)"}
	refQP   = trace.Ref{Source: trace.EN1990, Clause: "6.5.3, eq. (6.16b)"}
	refPsi2 = trace.Ref{Source: trace.EN1990, Clause: "Annex A1, Table A1.1 (ψ2)"}
)

// favourableSLS reports whether a variable action is left out of a
// serviceability load: marked favourable, or upward (it reduces the
// settlement; EN 1990:2002 6.5.3 with the rule of 6.4.3.2(3)).
func favourableSLS(a site.Action) bool {
	return a.Kind == site.Variable && (a.Favourable || a.V < 0)
}

// ServiceLoad combines the characteristic vertical actions for a
// serviceability check and records the working in t (unitF is the force
// display unit, "kN" or "kN/m"). Only vertical actions enter: settlement
// is computed for the vertical load, and a variable action that is
// upward or marked favourable is left out (with a note). It returns an error for no actions
// or a combined load that is not downward.
func ServiceLoad(acts []site.Action, kind ServiceKind, t *trace.Trace, unitF string) (Service, error) {
	if len(acts) == 0 {
		return Service{}, &site.InputError{Param: "actions", Msg: "no actions given"}
	}
	tags := Tags(acts)
	best := Service{Kind: kind, Leading: -1}
	try := func(lead int) {
		s := Service{Kind: kind, Leading: lead, Factor: make([]float64, len(acts))}
		for i, a := range acts {
			f := 1.0
			if a.Kind == site.Variable {
				switch {
				case favourableSLS(a):
					f = 0
				case kind == QuasiPermanent:
					f = a.Psi2.Or(DefaultPsi2)
				case i != lead:
					f = a.Psi0.Or(DefaultPsi0)
				}
			}
			s.Factor[i] = f
			s.V += f * a.V
		}
		if best.Factor == nil || s.V > best.V {
			best = s
		}
	}
	var vars []int
	var out []string
	for i, a := range acts {
		switch {
		case a.Kind != site.Variable:
		case favourableSLS(a):
			out = append(out, a.Name)
		default:
			vars = append(vars, i)
		}
	}
	if len(out) > 0 {
		t.Warn(trace.Caution{Code: "sls-favourable", Severity: trace.SevNote, Ref: refFav,
			Message: fmt.Sprintf("Left out of the serviceability load as favourable (upward, or marked favourable): %s.", strings.Join(out, ", "))})
	}
	if kind == Characteristic && len(vars) > 0 {
		for _, i := range vars {
			try(i)
		}
	} else {
		try(-1)
	}
	best.Name = kind.String()
	if best.Leading >= 0 {
		best.Name += " · " + acts[best.Leading].Name + " leading"
	}
	ref := refChar
	if kind == QuasiPermanent {
		ref = refQP
	}
	var f trace.Expr
	var in []trace.Value
	for i, a := range acts {
		if a.V == 0 || best.Factor[i] == 0 {
			continue
		}
		vk := "V_k_" + tags[i]
		in = append(in, trace.Value{Symbol: vk, V: a.V, Unit: unitF})
		term := trace.S(vk)
		if a.Kind == site.Variable && best.Factor[i] != 1 || a.Kind == site.Variable && kind == QuasiPermanent {
			psi := "psi_0_" + tags[i]
			pref, note := refPsi, "combination factor of "+a.Name
			if kind == QuasiPermanent {
				psi, pref, note = "psi_2_"+tags[i], refPsi2, "quasi-permanent factor of "+a.Name
			}
			given := a.Psi0.Set
			if kind == QuasiPermanent {
				given = a.Psi2.Set
			}
			if !given {
				note += " (not given: default)"
				t.Warn(trace.Caution{Code: "psi-default", Severity: trace.SevCaution, Ref: pref,
					Message: fmt.Sprintf("%s gives no %s; %g is used", a.Name, map[bool]string{true: "ψ2", false: "ψ0"}[kind == QuasiPermanent], best.Factor[i])})
			}
			how := trace.Given // given, or ψ2 assumed (DefaultPsi2, common practice)
			if !given && kind != QuasiPermanent {
				how = trace.Tabulated // ψ0 of EN 1990 Table A1.1, imposed loads
			}
			t.Take(trace.Step{Symbol: psi, Kind: how, Value: best.Factor[i], Ref: pref, Note: note})
			in = append(in, trace.Value{Symbol: psi, V: best.Factor[i]})
			term = trace.Mul(trace.S(psi), term)
		}
		if f == nil {
			f = term
		} else {
			f = trace.Add(f, term)
		}
	}
	if f == nil {
		f = trace.N(0)
	}
	best.V = t.Eval(trace.Step{Symbol: "V_SLS", Formula: f, Inputs: in, Unit: unitF, Ref: ref,
		Note: "serviceability vertical load, " + best.Name})
	if err := t.Err(); err != nil {
		return best, fmt.Errorf("serviceability load: %w", err)
	}
	if best.V <= 0 {
		return best, &site.InputError{Param: "V", Msg: fmt.Sprintf("the %s vertical load is %g kN, not downward: no settlement to compute", kind, best.V/1e3)}
	}
	return best, nil
}
