package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Sources of the tilt solution.
var (
	PoulosDavis1974 = trace.Source{Key: "PoulosDavis1974", Citation: "Poulos, H.G. & Davis, E.H. (1974). Elastic Solutions for Soil and Rock Mechanics. John Wiley & Sons, New York."}
	Borowicka1943   = trace.Source{Key: "Borowicka1943", Citation: "Borowicka, H. (1943). Über ausmittig belastete starre Platten auf elastisch-isotropem Untergrund. Ingenieur-Archiv 14(1), 1–8."}
	RHW1970         = trace.Source{Key: "RichartHallWoods1970", Citation: "Richart, F.E., Hall, J.R. & Woods, R.D. (1970). Vibrations of Soils and Foundations. Prentice-Hall, Englewood Cliffs, NJ."}
)

// TiltInput is a rigid footing under a serviceability moment.
type TiltInput struct {
	Ground  site.Ground
	Footing site.Footing
	// Actions are the characteristic actions and Factors the factor of
	// each in the serviceability combination (design.Service.Factor), so
	// M = Σ f_i M_i.
	Actions []site.Action
	Factors []float64
	// LongTerm takes the drained E′ where the founding layer gives it,
	// for a long-term (quasi-permanent) load; otherwise a fine-grained
	// layer's E_u is used (short term).
	LongTerm bool
}

// TiltAxis is the tilt from one moment component.
type TiltAxis struct {
	Dir   string  // "B" (M_B, the resultant moving along B) or "L"
	M     float64 // SLS moment, N·m
	A, C  float64 // side along the tilt and the other side, m
	R     float64 // radius of the circle (or the equivalent radius for rocking), m
	Tan   float64 // tan θ
	Theta float64 // θ, rad
	Delta float64 // settlement difference between the two edges across A, m
}

// Tilt is the rotation of a rigid footing under moment.
type Tilt struct {
	Layer  int     // founding layer
	E, Nu  float64 // modulus and Poisson's ratio used
	Kind   string  // "E_u" (undrained, short term) or "E'" (drained, long term)
	Axes   []TiltAxis
	Trace  trace.Trace
	Values []trace.Value // theta_B, omega_B (tan θ_B), delta_s_B (and _L)
}

// TiltOf returns the tilt of a rigid footing on an elastic half-space
// under the serviceability moments M_B and M_L (each component on its own).
//
// A rigid circle of radius R rotates by
//
//	tan θ = 3(1 − ν²) M / (4 E R³)
//
// (Borowicka 1943; as Poulos & Davis 1974, ch. 7, the rigid circular
// plate under moment — the chapter from memory). It is the rocking
// stiffness K = 8 G R³/(3(1 − ν)) with G = E/(2(1 + ν)). A rectangle is
// taken as the circle of the same second moment of area about the axis
// of rotation, R = (C A³/(3π))^¼ with A the side along the tilt and C the
// other (Richart, Hall & Woods 1970, equivalent radius for rocking; the
// clause from memory). The edge settlements then differ by A tan θ.
//
// The modulus is that of the founding layer: for a long-term load
// (LongTerm) E′ with ν′ (default 0.3) where given; otherwise E_u with
// ν = 0.5 in a fine-grained layer that gives it (undrained, short term),
// else E′. A strip, a footing with no moment, and a
// founding layer without stiffness are errors.
func TiltOf(in TiltInput) (*Tilt, error) {
	var errs site.Errors
	if err := in.Ground.Validate(); err != nil {
		errs = append(errs, err)
	}
	if err := in.Footing.Validate(); err != nil {
		errs = append(errs, err)
	}
	f := in.Footing
	w := f.Name
	if f.Shape == site.Strip {
		errs = append(errs, &site.InputError{Where: w, Param: "tilt", Msg: "the tilt solution is for a rigid circle or rectangle, not a strip"})
	}
	if len(in.Factors) != len(in.Actions) {
		errs = append(errs, &site.InputError{Where: w, Param: "tilt", Msg: "one combination factor is needed for each action"})
	}
	if len(errs) > 0 {
		return nil, one(errs)
	}
	g := in.Ground
	li := g.At(f.D + 1e-9)
	l := g.Layers[li]
	t := &Tilt{Layer: li, Nu: l.Nu.Or(DefaultNu), Kind: "E'"}
	switch {
	case in.LongTerm && l.E.Set:
		t.E = l.E.V
	case l.Fine() && l.Eu.Set:
		t.E, t.Nu, t.Kind = l.Eu.V, 0.5, "E_u"
	case l.E.Set:
		t.E = l.E.V
	default:
		name := l.Name
		if name == "" {
			name = fmt.Sprintf("layer %d", li+1)
		}
		return nil, &site.InputError{Where: w, Layer: li, Param: "E'", Msg: fmt.Sprintf("the tilt needs the stiffness (E_u or E') of the founding layer %s", name)}
	}
	tr := &t.Trace
	cs := "tilt"
	eval := func(sym string, fx trace.Expr, vin []trace.Value, unit string, r trace.Ref, note string) float64 {
		return tr.Eval(trace.Step{Symbol: sym, Formula: fx, Inputs: vin, Unit: unit, Ref: r, Note: note, Case: cs})
	}
	given := func(sym string, v float64, unit, note string) {
		tr.Take(trace.Step{Symbol: sym, Kind: trace.Given, Value: v, Unit: unit, Note: note, Case: cs})
	}
	esym := "E'"
	if t.Kind == "E_u" {
		esym = "E_u"
		given(esym, t.E, "MPa", "undrained modulus of the founding layer (short term)")
		given("nu", t.Nu, "", "undrained Poisson's ratio")
	} else {
		given(esym, t.E, "MPa", "drained modulus of the founding layer (long term)")
		note := "Poisson's ratio"
		if !l.Nu.Set {
			note = "Poisson's ratio, assumed (common practice)"
		}
		given("nu", t.Nu, "", note)
	}
	refC := trace.Ref{Source: Borowicka1943, Clause: "rigid circle under moment"}
	tr.Cite(PoulosDavis1974)
	for _, dir := range []string{"B", "L"} {
		var fx trace.Expr
		var vin []trace.Value
		for i, a := range in.Actions {
			mi := a.MB
			if dir == "L" {
				mi = a.ML
			}
			if mi == 0 || in.Factors[i] == 0 {
				continue
			}
			ms, ps := fmt.Sprintf("M_%s,%d", dir, i+1), fmt.Sprintf("f_%d", i+1)
			term := trace.S(ms)
			vin = append(vin, val(ms, mi, "kNm"))
			if in.Factors[i] != 1 {
				term = trace.Mul(trace.S(ps), term)
				vin = append(vin, val(ps, in.Factors[i], ""))
			}
			if fx == nil {
				fx = term
			} else {
				fx = trace.Add(fx, term)
			}
		}
		if fx == nil {
			continue
		}
		msym := "M_" + dir
		m := eval(msym, fx, vin, "kNm", trace.Ref{Source: trace.EN1990, Clause: "6.5.3"}, "serviceability moment (the combination's factors on each action)")
		if m == 0 {
			continue
		}
		ax := TiltAxis{Dir: dir, M: math.Abs(m), A: f.B, C: f.Length()}
		if dir == "L" {
			ax.A, ax.C = ax.C, ax.A
		}
		rsym := "R"
		if f.Shape == site.Circle {
			ax.R = eval(rsym, trace.Div(trace.S("B"), trace.N(2)), []trace.Value{val("B", f.B, "m")}, "m", trace.Ref{}, "radius")
		} else {
			rsym = "R_" + dir
			as, csym := "B", "L"
			if dir == "L" {
				as, csym = "L", "B"
			}
			ax.R = eval(rsym, trace.Pow(trace.Div(trace.Mul(trace.S(csym), trace.Pow(trace.S(as), trace.N(3))), trace.Mul(trace.N(3), trace.S("pi"))), trace.N(0.25)),
				[]trace.Value{val(as, ax.A, "m"), val(csym, ax.C, "m")}, "m",
				trace.Ref{Source: RHW1970, Clause: "equivalent radius for rocking (from memory)"}, "circle of the same second moment of area about the axis of tilt")
		}
		tsym := "omega_" + dir
		ax.Tan = eval(tsym, trace.Div(trace.Mul(trace.N(3), trace.Sub(trace.N(1), trace.Pow(trace.S("nu"), trace.N(2))), trace.Fn("abs", trace.S(msym))), trace.Mul(trace.N(4), trace.S(esym), trace.Pow(trace.S(rsym), trace.N(3)))),
			[]trace.Value{val("nu", t.Nu, ""), val(msym, m, "kNm"), val(esym, t.E, "MPa"), val(rsym, ax.R, "m")}, "", refC,
			"tilt as a slope, tan θ (rigid circle on an elastic half-space)")
		ax.Theta = eval("theta_"+dir, trace.Fn("atan", trace.S(tsym)), []trace.Value{val(tsym, ax.Tan, "")}, "deg", trace.Ref{}, "tilt")
		ax.Delta = eval("delta_s_"+dir, trace.Mul(trace.S(sideSym(dir)), trace.S(tsym)), []trace.Value{val(sideSym(dir), ax.A, "m"), val(tsym, ax.Tan, "")}, "mm", trace.Ref{}, "settlement difference between the edges across "+sideSym(dir))
		t.Axes = append(t.Axes, ax)
		t.Values = append(t.Values, val("theta_"+dir, ax.Theta, "deg"), val(tsym, ax.Tan, ""), val("delta_s_"+dir, ax.Delta, "mm"))
	}
	if err := tr.Err(); err != nil {
		return nil, fmt.Errorf("tilt of %s: %w", w, err)
	}
	if len(t.Axes) == 0 {
		return nil, &site.InputError{Where: w, Param: "tilt", Msg: "the serviceability load has no moment (M_B, M_L): there is no tilt to compute"}
	}
	// a layered profile within the depth the rotation reaches
	amax := 0.0
	for _, ax := range t.Axes {
		amax = math.Max(amax, ax.A)
	}
	z := f.D + 2*amax // twice the side along the tilt below the base (common practice)
	if g.At(z) != li {
		tr.Warn(trace.Caution{Code: "tilt-layered", Severity: trace.SevCaution, Case: cs, Ref: trace.Ref{Source: PoulosDavis1974},
			Message: fmt.Sprintf("the tilt assumes a homogeneous elastic half-space with the founding layer's %s; other layers lie within %.3g m of ground level, so the tilt is only indicative", t.Kind, z)})
	}
	tr.Warn(trace.Caution{Code: "tilt-rigid", Severity: trace.SevNote, Case: cs, Ref: refC,
		Message: "tilt of a rigid footing on the surface of the half-space: embedment and the contact pressure's redistribution are ignored"})
	return t, nil
}

func sideSym(dir string) string {
	if dir == "L" {
		return "L"
	}
	return "B"
}
