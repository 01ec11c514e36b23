package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Num constants that carry a unit, so formulas in kPa, m and years stay
// dimensionally honest in SI.
var (
	kPa1 = trace.Num{V: 1e3, Unit: "kPa"}
	m1   = trace.Num{V: 1, Unit: "m"}
	mm1  = trace.Num{V: 1e-3, Unit: "mm"}
	yr01 = trace.Num{V: 0.1 * Year, Unit: "yr"}
	yr3  = trace.Num{V: 3 * Year, Unit: "yr"}
)

// schmPart is one value of the strain influence diagram: a formula in B
// (and L), or a value read from the diagram (f nil).
type schmPart struct {
	sym  string
	f    trace.Expr
	v    float64 // f == nil
	unit string
	note string
	show bool // written as a step
}

// Formulas of the strain influence diagram: x = (L/B − 1)/9 interpolates
// between the square (x = 0) and the strip (x = 1).
var (
	fxLBx     = trace.Div(trace.Sub(trace.Div(trace.S("L"), trace.S("B")), trace.N(1)), trace.N(9))
	fxHalfB   = trace.Div(trace.S("B"), trace.N(2))
	fx2B      = trace.Mul(trace.N(2), trace.S("B"))
	fx4B      = trace.Mul(trace.N(4), trace.S("B"))
	fxZpLB    = trace.Mul(trace.Add(trace.N(0.5), trace.Mul(trace.N(0.5), fxLBx)), trace.S("B"))
	fxZmaxLB  = trace.Mul(trace.Add(trace.N(2), trace.Mul(trace.N(2), fxLBx)), trace.S("B"))
	fxIz0LB   = trace.Add(trace.N(0.1), trace.Mul(trace.N(0.1), fxLBx))
	fxKqLB    = trace.Add(trace.N(2.5), fxLBx)
	fxC1      = trace.Fn("max", trace.N(0.5), trace.Sub(trace.N(1), trace.Mul(trace.N(0.5), trace.Div(trace.S("sigma'_v0"), trace.S("q_net")))))
	fxIzp     = trace.Add(trace.N(0.5), trace.Mul(trace.N(0.1), trace.Fn("sqrt", trace.Div(trace.S("q_net"), trace.S("sigma'_vp")))))
	fxZinfMax = trace.Add(trace.S("D"), trace.S("z_max"))
	fxIzAbove = trace.Add(trace.S("I_z0"), trace.Mul(trace.Sub(trace.S("I_zp"), trace.S("I_z0")), trace.Div(trace.S("z_b"), trace.S("z_p"))))
	fxIzBelow = trace.Mul(trace.S("I_zp"), trace.Div(trace.Sub(trace.S("z_max"), trace.S("z_b")), trace.Sub(trace.S("z_max"), trace.S("z_p"))))
	fxEsQc    = trace.Mul(trace.S("k_q"), trace.S("q_c"))
	fxDsSchm  = trace.Div(trace.Mul(trace.S("C_1"), trace.S("q_net"), trace.S("I_z"), trace.S("h")), trace.S("E_s"))
	fxSiSchm  = trace.Mul(trace.S("C_1"), trace.S("q_net"), trace.S("Sigma_Iz"))
	fxC2      = trace.Add(trace.N(1), trace.Mul(trace.N(0.2), trace.Fn("log10", trace.Div(trace.S("t_life"), yr01))))
	fxCreepC2 = trace.Mul(trace.S("s_i"), trace.Sub(trace.S("C_2"), trace.N(1)))
)

// schmDiagram returns the 1978 strain-influence diagram for the footing:
// z_p and z_max, the depths of the peak and of the bottom below the base,
// I_z at the base and the modulus factor k_q = E_s/q_c, each interpolated
// linearly in L/B between the square (L/B = 1: B/2, 2B, 0.1, 2.5) and the
// strip (L/B ≥ 10: B, 4B, 0.2, 3.5) as Schmertmann et al. (1978) suggest
// for intermediate shapes (the interpolation is common practice), with
// the inputs of the formulas (B, then L). The 1970 diagram is the square
// one with I_z = 0 at the base and E_s = 2 q_c.
func (k *calc) schmDiagram() (lbv float64, in []trace.Value, p [4]schmPart) {
	f := k.f
	in = []trace.Value{val("B", f.B, "m"), val("L", f.L, "m")}
	const (
		peak = "depth of the peak below the base"
		bot  = "depth of the bottom of the diagram"
	)
	if k.c.Schmertmann1970 {
		return 1, in[:1], [4]schmPart{
			{sym: "z_p", f: fxHalfB, unit: "m"},
			{sym: "z_max", f: fx2B, unit: "m", show: true},
			{sym: "I_z0", v: 0},
			{sym: "k_q", v: 2},
		}
	}
	switch lbv = lb(f); lbv {
	case 1:
		return lbv, in[:1], [4]schmPart{
			{sym: "z_p", f: fxHalfB, unit: "m", note: peak + " (square or circle)", show: true},
			{sym: "z_max", f: fx2B, unit: "m", note: bot, show: true},
			{sym: "I_z0", v: 0.1, note: "I_z at the base (square or circle)", show: true},
			{sym: "k_q", v: 2.5},
		}
	case 10:
		return lbv, in[:1], [4]schmPart{
			{sym: "z_p", f: trace.S("B"), unit: "m", note: peak + " (strip, L/B ≥ 10)", show: true},
			{sym: "z_max", f: fx4B, unit: "m", note: bot, show: true},
			{sym: "I_z0", v: 0.2, note: "I_z at the base (strip)", show: true},
			{sym: "k_q", v: 3.5},
		}
	}
	return lbv, in, [4]schmPart{
		{sym: "z_p", f: fxZpLB, unit: "m", note: peak + " (B/2 square to B strip)", show: true},
		{sym: "z_max", f: fxZmaxLB, unit: "m", note: bot + " (2B square to 4B strip)", show: true},
		{sym: "I_z0", f: fxIz0LB, note: "I_z at the base (0.1 square to 0.2 strip)", show: true},
		{sym: "k_q", f: fxKqLB, note: "E_s/q_c (2.5 square to 3.5 strip)", show: true},
	}
}

// value is the part's value: its formula evaluated, or the diagram's.
func (p schmPart) value(in []trace.Value) float64 {
	if p.f == nil {
		return p.v
	}
	v, _ := trace.Eval(p.f, in) // B and L are given and positive
	return v
}

// schmGeom returns L/B and the diagram's z_p, z_max, I_z0 and k_q, from
// the formulas the working prints (schmDiagram).
func (k *calc) schmGeom() (lbv, zp, zmax, iz0, kq float64) {
	lbv, in, p := k.schmDiagram()
	return lbv, p[0].value(in), p[1].value(in), p[2].value(in), p[3].value(in)
}

func izAt(zb, zp, zmax, iz0, izp float64) float64 {
	switch {
	case zb <= zp:
		return iz0 + (izp-iz0)*zb/zp
	case zb < zmax:
		return izp * (zmax - zb) / (zmax - zp)
	}
	return 0
}

func (k *calc) schmertmann() error {
	f, c := k.f, k.c
	D := f.D
	ref := trace.Ref{Source: Schmertmann1978, Clause: "improved strain influence diagrams"}
	ver := 1978
	if c.Schmertmann1970 {
		ref = trace.Ref{Source: Schmertmann1970, Clause: "strain influence factor (2B–0.6 diagram)"}
		ver = 1970
	}
	ref70 := trace.Ref{Source: Schmertmann1970, Clause: "C_1 and C_2"}
	lbv, gin, parts := k.schmDiagram()
	cs := "Schmertmann"
	sm := &Schm{Version: ver, LB: lbv}
	k.r.Schm = sm
	sm.C1 = k.eval(cs, "C_1", fxC1, []trace.Value{val("sigma'_v0", k.se, "kPa"), val("q_net", k.qn, "kPa")}, "", ref70, "embedment factor (σ′_v0 at the base)")
	if ver == 1978 && lbv != 1 && lbv != 10 {
		k.warn(cs, "schmertmann-shape", trace.SevNote, ref, fmt.Sprintf("L/B = %.3g: the I_z diagram and E_s/q_c are interpolated linearly in L/B between the square and strip cases (common practice)", lbv))
	}
	var geom [4]float64
	record := func(i int) {
		p := parts[i]
		switch {
		case !p.show:
			geom[i] = p.value(gin)
		case p.f == nil:
			geom[i] = k.take(cs, p.sym, trace.Tabulated, p.v, p.unit, ref, p.note)
		default:
			geom[i] = k.eval(cs, p.sym, p.f, gin, p.unit, ref, p.note)
		}
	}
	if ver == 1978 {
		for i := range parts {
			record(i)
		}
		_, _, svp := k.overburden(cs+": peak", D+geom[0], false)
		if svp <= 0 {
			return &site.InputError{Where: f.Name, Param: "gamma_sat", Msg: "the vertical effective stress at the peak of the strain influence diagram is not positive: the saturated unit weight must exceed that of water"}
		}
		sm.SigmaVp = svp
		sm.Izp = k.eval(cs, "I_zp", fxIzp, []trace.Value{val("q_net", k.qn, "kPa"), val("sigma'_vp", svp, "kPa")}, "", ref, "peak strain influence factor")
	} else {
		sm.Izp = k.take(cs, "I_zp", trace.Tabulated, 0.6, "", ref, "peak strain influence factor (1970 diagram)")
		for i := range parts {
			record(i)
		}
	}
	zp, zmax, iz0, kq := geom[0], geom[1], geom[2], geom[3]
	sm.Zp, sm.Zmax, sm.Iz0 = zp, zmax, iz0
	k.eval(cs, "z_inf", fxZinfMax, []trace.Value{val("D", D, "m"), val("z_max", zmax, "m")}, "m", ref, "bottom of the strain influence diagram (the zone for this method)")
	warnedFine := false
	var sum float64
	for _, lr := range k.layerRanges() {
		l := k.g.Layers[lr.layer]
		if l.Fine() && !warnedFine {
			k.warn(cs, "method-soil", trace.SevWarning, ref, fmt.Sprintf("%s is fine-grained: Schmertmann's method is for sands; its long-term settlement is not covered", k.layerName(lr.layer)))
			warnedFine = true
		}
		var E float64
		switch {
		case l.E.Set:
			E = l.E.V
		case l.Qc.Set:
			E = kq * l.Qc.V
		default:
			k.warn(cs, "no-stiffness", trace.SevWarning, trace.Ref{}, fmt.Sprintf("%s: no E′ or q_c given: the layer adds no settlement", k.layerName(lr.layer)))
			k.unverified(fmt.Sprintf("%s has no E′ or q_c for Schmertmann's method", k.layerName(lr.layer)))
			continue
		}
		// The stress table: I_z and Δs of every sublayer.
		for j := lr.first; j < lr.end; j++ {
			s := &k.r.Sub[j]
			s.Iz = izAt(s.Z-D, zp, zmax, iz0, sm.Izp)
			s.E = E
			s.Case = "I_z"
			sum += s.Iz * s.H / E
			s.Si = sm.C1 * k.qn * s.Iz * s.H / E
		}
	}
	sm.Sum = sum
	if k.full {
		best := -1
		for j, s := range k.r.Sub {
			if s.Si > 0 && (best < 0 || s.Si > k.r.Sub[best].Si) {
				best = j
			}
		}
		if best >= 0 {
			k.explainSchm(best, ref, zp, zmax, iz0, kq)
		}
	}
	k.take(cs, "Sigma_Iz", trace.Summed, sum, "m3/MN", ref, "Σ I_z Δz / E_s over the sublayers (stress table)")
	si := k.eval(cs, "s_i", fxSiSchm, []trace.Value{val("C_1", sm.C1, ""), val("q_net", k.qn, "kPa"), val("Sigma_Iz", sum, "m3/MN")}, "mm", ref, "settlement at t = 0.1 yr (C_2 = 1)")
	k.r.Si = si
	life := k.life(cs)
	sm.C2 = k.eval(cs, "C_2", fxC2, []trace.Value{val("t_life", life, "yr")}, "", ref70, "creep factor at the design life t_life")
	k.sandSec = k.eval(cs, "s_creep", fxCreepC2, []trace.Value{val("s_i", si, "mm"), val("C_2", sm.C2, "")}, "mm", ref70, "creep after 0.1 yr (secondary)")
	k.creep = func(t float64) float64 { // the same formulas at time t
		if t <= 0.1*Year {
			return 0
		}
		c2, _ := trace.Eval(fxC2, []trace.Value{val("t_life", t, "yr")})
		v, _ := trace.Eval(fxCreepC2, []trace.Value{val("s_i", si, "mm"), val("C_2", c2, "")})
		return v
	}
	return nil
}

// explainSchm writes the working of sublayer j, the largest contribution.
func (k *calc) explainSchm(j int, ref trace.Ref, zp, zmax, iz0, kq float64) {
	s := k.r.Sub[j]
	sm := k.r.Schm
	l := k.g.Layers[s.Layer]
	D := k.f.D
	rc := fmt.Sprintf("%s: sublayer %d (representative)", s.Name, j+1)
	z := k.eval(rc, "z", fxZmid, []trace.Value{val("z_t", s.Top, "m"), val("h", s.H, "m")}, "m", trace.Ref{}, "mid-depth of the sublayer")
	zb := k.eval(rc, "z_b", fxZb, []trace.Value{val("z", z, "m"), val("D", D, "m")}, "m", trace.Ref{}, "depth below the base")
	var iz float64
	if zb <= zp {
		iz = k.eval(rc, "I_z", fxIzAbove, []trace.Value{val("I_z0", iz0, ""), val("I_zp", sm.Izp, ""), val("z_b", zb, "m"), val("z_p", zp, "m")}, "", ref, "above the peak")
	} else {
		iz = k.eval(rc, "I_z", fxIzBelow, []trace.Value{val("I_zp", sm.Izp, ""), val("z_max", zmax, "m"), val("z_b", zb, "m"), val("z_p", zp, "m")}, "", ref, "below the peak")
	}
	var E float64
	if l.E.Set {
		E = k.take(rc, "E_s", trace.Given, l.E.V, "MPa", trace.Ref{}, "E′ of the layer, given")
	} else {
		E = k.eval(rc, "E_s", fxEsQc, []trace.Value{val("k_q", kq, ""), val("q_c", l.Qc.V, "MPa")}, "MPa", ref, "modulus from cone resistance (2.5 q_c square to 3.5 q_c strip; 2 q_c in 1970)")
	}
	k.eval(rc, "Delta_s", fxDsSchm, []trace.Value{val("C_1", sm.C1, ""), val("q_net", k.qn, "kPa"), val("I_z", iz, ""), val("h", s.H, "m"), val("E_s", E, "MPa")}, "mm", ref, "settlement of the sublayer")
}

// Formulas of Burland & Burbidge's method (s in mm with q′, σ′_vo in kPa
// and B in m: the unit constants keep them dimensionally honest in SI).
var (
	fxNSilty  = trace.Add(trace.N(15), trace.Mul(trace.N(0.5), trace.Sub(trace.S("N_SPT"), trace.N(15))))
	fxNGravel = trace.Mul(trace.N(1.25), trace.S("N_SPT"))
	fxZI      = trace.Mul(trace.Pow(trace.Div(trace.S("B"), m1), trace.N(0.763)), m1)
	fxZinfI   = trace.Add(trace.S("D"), trace.S("z_I"))
	fxIc      = trace.Div(trace.N(1.71), trace.Pow(trace.S("N_bar"), trace.N(1.4)))
	fxFsStrip = trace.Pow(trace.N(1.25), trace.N(2))
	fxFsRect  = trace.Pow(trace.Div(trace.Mul(trace.N(1.25), trace.Div(trace.S("L"), trace.S("B"))), trace.Add(trace.Div(trace.S("L"), trace.S("B")), trace.N(0.25))), trace.N(2))
	fxFl      = trace.Mul(trace.Div(trace.S("H_s"), trace.S("z_I")), trace.Sub(trace.N(2), trace.Div(trace.S("H_s"), trace.S("z_I"))))
	fxQEff    = trace.Sub(trace.S("q"), trace.S("u_0"))
	fxB07     = trace.Pow(trace.Div(trace.S("B"), m1), trace.N(0.7))
	fxSiOC    = trace.Mul(trace.S("f_s"), trace.S("f_l"), trace.Div(trace.S("q'"), kPa1), fxB07, trace.Div(trace.S("I_c"), trace.N(3)), mm1)
	fxSiNC    = trace.Mul(trace.S("f_s"), trace.S("f_l"), trace.Div(trace.Sub(trace.S("q'"), trace.Mul(trace.Div(trace.N(2), trace.N(3)), trace.S("sigma'_vo"))), kPa1), fxB07, trace.S("I_c"), mm1)
	fxFt      = trace.Add(trace.N(1), trace.S("R_3"), trace.Mul(trace.S("R"), trace.Fn("log10", trace.Div(trace.S("t_life"), yr3))))
	fxCreepFt = trace.Mul(trace.S("s_i"), trace.Sub(trace.S("f_t"), trace.N(1)))
)

// bbN returns the N value of layer i corrected as Burland & Burbidge
// (1985) give: 15 + (N − 15)/2 for very fine or silty sand below the water
// table with N > 15 (after Terzaghi & Peck), 1.25 N for gravel, with the
// formula (nil: uncorrected).
func (k *calc) bbN(i int, z float64) (float64, trace.Expr) {
	n := k.g.Layers[i].N.V
	var fx trace.Expr
	switch k.c.Grain {
	case FineSilty:
		if k.g.Water.Set && z > k.g.Water.V && n > 15 {
			fx = fxNSilty
		}
	case Gravel:
		fx = fxNGravel
	}
	if fx == nil {
		return n, nil
	}
	v, _ := trace.Eval(fx, []trace.Value{val("N_SPT", n, "")})
	return v, fx
}

func (k *calc) burland() error {
	f, c, g := k.f, k.c, k.g
	D := f.D
	B := f.B
	ref := trace.Ref{Source: BB1985, Clause: "§6, design method"}
	cs := "Burland & Burbidge"
	bb := &BB{}
	k.r.BB = bb
	// Granular thickness below the base.
	H := math.Inf(1)
	for i, l := range g.Layers {
		if l.Fine() && g.Bottom(i) > D {
			H = math.Max(0, l.Top-D)
			if H == 0 {
				k.warn(cs, "method-soil", trace.SevWarning, ref, fmt.Sprintf("%s, the founding layer, is fine-grained: Burland & Burbidge's method is for sand and gravel", k.layerName(i)))
				H = math.Inf(1)
			}
			break
		}
	}
	bb.H = H
	// N by layer down to 2B, to test for N decreasing with depth.
	type seg struct {
		layer    int
		top, bot float64
		n        float64
		fx       trace.Expr // the correction, nil if none
	}
	segsTo := func(zb float64) ([]seg, error) {
		var out []seg
		for i, l := range g.Layers {
			a := math.Max(D, l.Top)
			b := math.Min(D+zb, g.Bottom(i))
			if b <= a {
				continue
			}
			if !l.N.Set {
				return nil, &site.InputError{Where: fmt.Sprintf("layer %q", k.layerName(i)), Param: "N", Msg: "Burland & Burbidge's method needs the SPT blow count N of every layer within the depth of influence"}
			}
			n, fx := k.bbN(i, (a+b)/2)
			out = append(out, seg{layer: i, top: a, bot: b, n: n, fx: fx})
		}
		return out, nil
	}
	zI := k.eval(cs, "z_I", fxZI, []trace.Value{val("B", B, "m")}, "m", trace.Ref{Source: BB1985, Clause: "depth of influence, N constant or increasing with depth"}, "")
	two, err := segsTo(math.Min(2*B, H))
	if err != nil {
		return err
	}
	decreasing := len(two) > 1
	for i := 1; i < len(two); i++ {
		if two[i].n >= two[i-1].n {
			decreasing = false
		}
	}
	if decreasing {
		zI = k.eval(cs, "z_I", fx2B, []trace.Value{val("B", B, "m")}, "m", ref, "N decreases with depth: z_I = 2B")
		k.warn(cs, "bb-decreasing", trace.SevNote, ref, "N decreases with depth within 2B: the depth of influence is taken as 2B")
	}
	bb.ZI = zI
	if err := k.sublayers(D, D+zI); err != nil {
		return err
	}
	k.eval(cs, "z_inf", fxZinfI, []trace.Value{val("D", D, "m"), val("z_I", zI, "m")}, "m", ref, "bottom of the depth of influence (the zone for this method)")
	segs, err := segsTo(math.Min(zI, H))
	if err != nil {
		return err
	}
	var terms []trace.Expr
	var in []trace.Value
	for _, s := range segs {
		ns, hs := fmt.Sprintf("N_%d", s.layer+1), fmt.Sprintf("h_%d", s.layer+1)
		l := g.Layers[s.layer]
		n := s.n
		if s.fx != nil {
			n = k.eval(cs, ns, s.fx, []trace.Value{val("N_SPT", l.N.V, "")}, "", ref, fmt.Sprintf("N corrected (%s)", map[Grain]string{FineSilty: "very fine or silty sand below the water table", Gravel: "gravel: 1.25 N"}[c.Grain]))
		}
		terms = append(terms, trace.Mul(trace.S(ns), trace.S(hs)))
		in = append(in, val(ns, n, ""), val(hs, s.bot-s.top, "m"))
	}
	if len(terms) == 1 {
		bb.NBar = k.eval(cs, "N_bar", trace.S(in[0].Symbol), in[:1], "", ref, "average N over the depth of influence (one layer)")
	} else {
		var hsum trace.Expr = trace.S(in[1].Symbol)
		for i := 3; i < len(in); i += 2 {
			hsum = trace.Add(hsum, trace.S(in[i].Symbol))
		}
		bb.NBar = k.eval(cs, "N_bar", trace.Div(trace.Add(terms[0], terms[1:]...), hsum), in, "", ref, "average N over the depth of influence, weighted by thickness")
	}
	if !(bb.NBar > 0) {
		return &site.RangeError{Where: f.Name, Param: "N (average)", Value: bb.NBar, Min: 0, Max: 300, Reason: "Burland & Burbidge's method needs N > 0"}
	}
	bb.Ic = k.eval(cs, "I_c", fxIc, []trace.Value{val("N_bar", bb.NBar, "")}, "", ref, "compressibility index, mm per kPa per m^0.7")
	switch f.Shape {
	case site.Strip:
		bb.Fs = k.eval(cs, "f_s", fxFsStrip, nil, "", ref, "shape factor, L/B → ∞")
	case site.Rectangle:
		bb.Fs = k.eval(cs, "f_s", fxFsRect, []trace.Value{val("L", f.L, "m"), val("B", f.B, "m")}, "", ref, "shape factor")
	default:
		bb.Fs = k.take(cs, "f_s", trace.Given, 1, "", ref, "shape factor: 1 for a square or circle")
	}
	if H < zI {
		bb.Fl = k.eval(cs, "f_l", fxFl, []trace.Value{val("H_s", H, "m"), val("z_I", zI, "m")}, "", ref, "thickness factor: the granular layer ends within z_I")
	} else {
		bb.Fl = k.take(cs, "f_l", trace.Given, 1, "", ref, "the granular layer extends below z_I")
	}
	bb.QEff = k.eval(cs, "q'", fxQEff, []trace.Value{val("q", c.q, "kPa"), val("u_0", k.u, "kPa")}, "kPa", ref, "gross effective bearing pressure")
	lf := g.Layers[g.At(D)]
	const spNote = "maximum previous effective overburden at the base (the overburden removed, or σ′_p where greater)"
	switch {
	case lf.SigmaP.Set && lf.SigmaP.V > k.se:
		bb.SigmaVo = k.take(cs, "sigma'_vo", trace.Given, lf.SigmaP.V, "kPa", ref, spNote)
	case lf.OCR.Set && lf.OCR.V > 1:
		bb.SigmaVo = k.eval(cs, "sigma'_vo", fxOCRp, []trace.Value{val("sigma'_v0", k.se, "kPa"), val("OCR", lf.OCR.V, "")}, "kPa", ref, spNote)
	default:
		bb.SigmaVo = k.eval(cs, "sigma'_vo", fxSe, []trace.Value{val("sigma'_v0", k.se, "kPa")}, "kPa", ref, spNote)
	}
	const unitsNote = "s in mm with q′, σ′_vo in kPa and B in m"
	var si float64
	switch {
	case bb.QEff <= 0:
		bb.OC = true
		si = k.take(cs, "s_i", trace.Given, 0, "mm", ref, "q′ ≤ 0: the base is not loaded in effective stress; no settlement")
		k.warn(cs, "bb-uplift", trace.SevCaution, ref, "the gross effective bearing pressure q′ is not positive (the pore pressure at the base exceeds the applied pressure): Burland & Burbidge's method gives no settlement and heave is not modelled", val("q'", bb.QEff, "kPa"))
	case bb.QEff <= bb.SigmaVo:
		bb.OC = true
		si = k.eval(cs, "s_i", fxSiOC, []trace.Value{val("f_s", bb.Fs, ""), val("f_l", bb.Fl, ""), val("q'", bb.QEff, "kPa"), val("B", B, "m"), val("I_c", bb.Ic, "")}, "mm", ref,
			"q′ ≤ σ′_vo: recompression, one third of the virgin value; "+unitsNote)
	default:
		si = k.eval(cs, "s_i", fxSiNC, []trace.Value{val("f_s", bb.Fs, ""), val("f_l", bb.Fl, ""), val("q'", bb.QEff, "kPa"), val("sigma'_vo", bb.SigmaVo, "kPa"), val("B", B, "m"), val("I_c", bb.Ic, "")}, "mm", ref,
			"q′ > σ′_vo (σ′_vo = 0 for a normally consolidated sand at the surface); "+unitsNote)
	}
	k.r.Si = si
	r3, rr := 0.3, 0.2
	if c.Fluctuating {
		r3, rr = 0.7, 0.8
	}
	// f_t at time t, the formula of the working (1 before 3 years).
	ft := func(t float64) float64 {
		if t < 3*Year {
			return 1
		}
		v, _ := trace.Eval(fxFt, []trace.Value{val("R_3", r3, ""), val("R", rr, ""), val("t_life", t, "yr")})
		return v
	}
	life := k.life(cs)
	if life >= 3*Year {
		bb.Ft = k.eval(cs, "f_t", fxFt, []trace.Value{val("R_3", r3, ""), val("R", rr, ""), val("t_life", life, "yr")}, "", trace.Ref{Source: BB1985, Clause: "time factor f_t (t ≥ 3 years)"}, "time factor at the design life t_life")
	} else {
		bb.Ft = k.take(cs, "f_t", trace.Given, 1, "", ref, "f_t is given for t ≥ 3 years only")
	}
	if len(c.Times) > 0 {
		k.warn(cs, "bb-time", trace.SevNote, ref, "Burland & Burbidge give time-dependent settlement for t ≥ 3 years only: earlier points of the curve show the immediate settlement")
	}
	k.sandSec = k.eval(cs, "s_creep", fxCreepFt, []trace.Value{val("s_i", si, "mm"), val("f_t", bb.Ft, "")}, "mm", ref, "time-dependent settlement at the design life (secondary)")
	k.creep = func(t float64) float64 {
		v, _ := trace.Eval(fxCreepFt, []trace.Value{val("s_i", si, "mm"), val("f_t", ft(t), "")})
		return v
	}
	return nil
}
