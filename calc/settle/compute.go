package settle

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// Compute runs one settlement calculation: stresses by sublayer, immediate,
// consolidation and secondary settlement by layer, the settlement–time
// curve, and the check against the limit, with the full working in
// Result.Trace. Input errors are returned as *site.RangeError,
// *site.InputError or site.Errors.
//
// Every number with a step comes from the step's formula; an input that
// drives a formula outside its domain (a NaN or infinite value) is an
// error, never a NaN in the result.
func Compute(in Input) (*Result, error) { return compute(in, true) }

// Quiet is Compute without the working: the same numbers by the same
// formulas (Result.Trace holds no steps), for callers that try many
// footings and print one (calc/size's trials).
func Quiet(in Input) (*Result, error) { return compute(in, false) }

func compute(in Input, full bool) (*Result, error) {
	r, k, err := run(in, full)
	if k != nil && k.err() != nil {
		return nil, k.err() // the first formula out of its domain, the cause of any later error
	}
	if err != nil {
		return nil, err
	}
	return r, nil
}

func run(in Input, full bool) (*Result, *calc, error) {
	c, err := in.validate()
	if err != nil {
		return nil, nil, err
	}
	r := &Result{Stress: c.Stress, Point: c.point, Q: c.q, Limit: c.limit, Depth: c.Depth.Rule}
	k := &calc{c: c, g: c.Ground, f: c.Footing, r: r, full: full, t: &r.Trace, imm: map[int]string{}, con: map[int]string{}}
	if full {
		// room for the usual working: load, zone, ~25 steps a layer, time
		r.Trace.Steps = make([]trace.Step, 0, 48+28*len(c.Ground.Layers)+8*len(c.Times))
	}
	k.so = stress.Options{Method: c.Stress, Point: c.point, Angle: c.angle}
	if k.infl, err = stress.Func(k.f, k.so); err != nil {
		return nil, k, err
	}
	k.load()
	if c.rigidSet {
		k.warn("load", "rigid", trace.SevNote, trace.Ref{Source: stress.Grasshoff1955, Clause: "characteristic point"},
			"rigid footing: stresses and settlement are taken at the characteristic point, where a flexible footing settles as much as a rigid one")
	}
	r.Q, r.QNet, r.SigmaV0, r.U0 = c.q, k.qn, k.sv, k.u
	D := k.f.D
	method := c.Method
	if k.qn <= 0 && method == Auto {
		// The zone for the choice is the deeper of the methods' zones, as
		// no stress-ratio depth exists for a load that adds no stress.
		method = k.resolve(D + math.Max(2*k.f.B, math.Pow(k.f.B, 0.763)))
	}
	if k.qn <= 0 && method != BurlandBurbidge {
		// Burland & Burbidge (1985) have a recompression branch
		// (q′ ≤ σ′_vo); the other methods work from the net pressure only.
		r.Method = method
		r.ZInf = D
		k.warn("load", "net-nonpositive", trace.SevNote, trace.Ref{}, "the net bearing pressure is not positive: the "+method.String()+" method works from the net pressure and has no recompression branch, so the load adds no settlement by it (heave is not modelled)", val("q_net", k.qn, "kPa"))
		k.finish()
		return r, k, nil
	}
	var zinf float64
	switch method {
	case Auto, Elastic, Consolidation, Combined:
		if zinf, err = k.depth(); err != nil {
			return nil, k, err
		}
	}
	if method == Auto {
		method = k.resolve(zinf)
	}
	r.Method = method
	switch method {
	case Elastic, Consolidation, Combined:
		if err := k.sublayers(D, zinf); err != nil {
			return nil, k, err
		}
		if method != Consolidation {
			k.elastic(method == Combined)
		}
		if method != Elastic {
			if err := k.consolidation(method); err != nil {
				return nil, k, err
			}
		}
	case Schmertmann:
		_, _, zmax, _, _ := k.schmGeom()
		if err := k.sublayers(D, D+zmax); err != nil {
			return nil, k, err
		}
		if err := k.schmertmann(); err != nil {
			return nil, k, err
		}
	case BurlandBurbidge:
		if err := k.burland(); err != nil {
			return nil, k, err
		}
	}
	k.layers()
	if c.SkemptonBjerrum.Set {
		k.skemptonBjerrum(c.SkemptonBjerrum.V)
	}
	k.totals(method)
	k.timing()
	k.finish()
	return r, k, nil
}

// resolve chooses a method from the layers' data (method = auto).
func (k *calc) resolve(zinf float64) Method {
	g, f := k.g, k.f
	D := f.D
	over := func(i int, bot float64) bool { return g.Layers[i].Top < bot && g.Bottom(i) > D }
	why := ""
	var m Method
	fine := false
	for i, l := range g.Layers {
		if over(i, zinf) && l.Fine() {
			fine = true
		}
	}
	_, _, zmax, _, _ := k.schmGeom()
	allE, allN := true, true
	for i, l := range g.Layers {
		if over(i, D+zmax) && !l.E.Set && !l.Qc.Set {
			allE = false
		}
		if over(i, D+math.Max(2*f.B, math.Pow(f.B, 0.763))) && !l.N.Set {
			allN = false
		}
	}
	switch {
	case fine:
		m, why = Combined, "a fine-grained layer lies within the zone of influence: immediate settlement by Steinbrenner (E_u, E′) plus consolidation of the fine layers"
	case allE:
		m, why = Schmertmann, "granular ground with E′ or q_c in every layer within the strain influence depth"
	case allN:
		m, why = BurlandBurbidge, "granular ground with SPT N in every layer within the depth of influence"
	default:
		m, why = Elastic, "granular ground without q_c or N throughout: elastic (Steinbrenner) with the E′ given"
	}
	k.warn("settlement", "auto-method", trace.SevNote, trace.Ref{}, "method chosen from the layers' data: "+m.String()+" ("+why+")")
	return m
}

// layers builds the layer rows from the sublayer table.
func (k *calc) layers() {
	for _, lr := range k.layerRanges() {
		l := k.g.Layers[lr.layer]
		L := LayerResult{Layer: lr.layer, Name: k.layerName(lr.layer), Top: lr.top, Bot: lr.bot, Sublayers: lr.end - lr.first, Fine: l.Fine(), Mu: 1}
		for j := lr.first; j < lr.end; j++ {
			s := k.r.Sub[j]
			L.Si += s.Si
			L.SOed += s.Sc
		}
		L.Immediate = k.imm[lr.layer]
		L.Consol = k.con[lr.layer]
		if L.Immediate == "" && k.r.Schm != nil && L.Si > 0 {
			L.Immediate = "I_z"
		}
		L.Sc = L.SOed
		k.r.Layers = append(k.r.Layers, L)
	}
}

// sum is Σ of the symbols in in (a sum of steps), or nil for none.
func sum(in []trace.Value) trace.Expr {
	if len(in) == 0 {
		return nil
	}
	fx := trace.S(in[0].Symbol)
	for _, v := range in[1:] {
		fx = trace.Add(fx, trace.S(v.Symbol))
	}
	return fx
}

// totals writes s_i and s_c.
func (k *calc) totals(m Method) {
	r := k.r
	cs := "settlement"
	if m != Schmertmann && m != BurlandBurbidge {
		var in []trace.Value
		for _, L := range r.Layers {
			if L.Immediate != "" {
				in = append(in, val(ix("s_i,", L.Layer), L.Si, "mm"))
			}
		}
		if len(in) == 0 {
			r.Si = k.take(cs, "s_i", trace.Given, 0, "mm", trace.Ref{}, "no immediate settlement computed")
			if m == Consolidation {
				k.warn(cs, "no-immediate", trace.SevNote, trace.Ref{}, "the consolidation method gives no immediate settlement; without a method line (plinth then chooses elastic+consolidation from the layers' data) adds it from E_u and E′")
			}
		} else {
			r.Si = k.eval(cs, "s_i", sum(in), in, "mm", trace.Ref{}, "immediate settlement")
		}
	}
	var in []trace.Value
	for _, L := range r.Layers {
		if L.Consol != "" {
			in = append(in, val(ix("s_c,", L.Layer), L.Sc, "mm"))
		}
	}
	if len(in) == 0 {
		r.Sc = k.take(cs, "s_c", trace.Given, 0, "mm", trace.Ref{}, "no consolidation settlement")
	} else {
		r.Sc = k.eval(cs, "s_c", sum(in), in, "mm", trace.Ref{}, "consolidation settlement (final)")
	}
}

var (
	fxTotal = trace.Add(trace.S("s_i"), trace.S("s_c"), trace.S("s_sec"))
	fxUtil  = trace.Div(trace.S("s_total"), trace.S("s_lim"))
)

// finish writes s_sec, s_total and the limit check, and the symbols.
func (k *calc) finish() {
	r := k.r
	cs := "settlement"
	var in []trace.Value
	for _, L := range r.Layers {
		if L.Ssec > 0 {
			in = append(in, val(ix("s_sec,", L.Layer), L.Ssec, "mm"))
		}
	}
	if k.sandSec > 0 {
		in = append(in, val("s_creep", k.sandSec, "mm"))
	}
	if len(in) == 0 {
		r.Ssec = k.take(cs, "s_sec", trace.Given, 0, "mm", trace.Ref{}, "no secondary compression or creep")
	} else {
		r.Ssec = k.eval(cs, "s_sec", sum(in), in, "mm", trace.Ref{}, fmt.Sprintf("secondary compression and creep at the design life (%.4g yr)", k.c.life/Year))
	}
	r.Total = k.eval(cs, "s_total", fxTotal, []trace.Value{val("s_i", r.Si, "mm"), val("s_c", r.Sc, "mm"), val("s_sec", r.Ssec, "mm")}, "mm", trace.Ref{}, "total settlement")
	r.Util = k.eval(cs, "util", fxUtil, []trace.Value{val("s_total", r.Total, "mm"), val("s_lim", r.Limit, "mm")}, "", trace.Ref{}, "settlement against the limit")
	if zone := r.ZInf - k.f.D; zone > 0 && r.Total > zone {
		k.unverified(fmt.Sprintf("the computed settlement %.3g m exceeds the %.3g m thickness of the ground it comes from: the stiffness given is outside the range where the method has physical sense", r.Total, zone))
	}
	r.OK = r.Util <= 1 && len(r.Unverified) == 0
	if len(r.Unverified) > 0 {
		k.warn(cs, "not-verified", trace.SevWarning, trace.Ref{}, "settlement not verified: "+strings.Join(r.Unverified, "; ")+"; the total leaves that out, so the check is NOT OK until the data are given")
	}
	if r.Util > 1 {
		st, sl := units.Apart(r.Total, r.Limit, mmUnit, -1, -1) // never printed onto the limit
		k.warn(cs, "limit", trace.SevWarning, trace.Ref{}, fmt.Sprintf("the total settlement %s mm exceeds the limit %s mm", st, sl), val("s_total", r.Total, "mm"), val("s_lim", r.Limit, "mm"))
	}
	r.symbols()
}

// mmUnit prints settlements in messages by the display rules (units.Format).
var mmUnit = units.MustParse("mm")
