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

// schmGeom returns the 1978 strain-influence diagram for the footing:
// depth of the peak and of the bottom (m below the base), I_z at the base,
// and the modulus factor E_s/q_c, each interpolated linearly in L/B
// between the square (L/B = 1: B/2, 2B, 0.1, 2.5) and the strip
// (L/B ≥ 10: B, 4B, 0.2, 3.5) as Schmertmann et al. (1978) suggest for
// intermediate shapes (the interpolation is common practice). The 1970
// diagram is the square one with I_z = 0 at the base and E_s = 2 q_c.
func (k *calc) schmGeom() (lbv, zp, zmax, iz0, kq float64) {
	B := k.f.B
	if k.c.Schmertmann1970 {
		return 1, B / 2, 2 * B, 0, 2
	}
	lbv = lb(k.f)
	x := (lbv - 1) / 9
	return lbv, (0.5 + 0.5*x) * B, (2 + 2*x) * B, 0.1 + 0.1*x, 2.5 + x
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
	lbv, zp, zmax, iz0, kq := k.schmGeom()
	cs := "Schmertmann"
	sm := &Schm{Version: ver, LB: lbv, Zp: zp, Zmax: zmax, Iz0: iz0}
	k.r.Schm = sm
	sm.C1 = math.Max(0.5, 1-0.5*k.se/k.qn)
	k.add(cs, "C_1", fFn("max", fN(0.5), fSub(fN(1), fMul(fN(0.5), fDiv(fS("sigma'_v0"), fS("q_net"))))), []trace.Value{val("sigma'_v0", k.se, "kPa"), val("q_net", k.qn, "kPa")}, sm.C1, "", ref70, "embedment factor (σ′_v0 at the base)")
	if ver == 1978 {
		switch {
		case lbv == 1:
			k.add(cs, "z_p", fDiv(fS("B"), fN(2)), []trace.Value{val("B", f.B, "m")}, zp, "m", ref, "depth of the peak below the base (square or circle)")
			k.add(cs, "z_max", fMul(fN(2), fS("B")), []trace.Value{val("B", f.B, "m")}, zmax, "m", ref, "depth of the bottom of the diagram")
			k.add(cs, "I_z0", nil, nil, iz0, "", ref, "I_z at the base (square or circle)")
		case lbv == 10:
			k.add(cs, "z_p", fS("B"), []trace.Value{val("B", f.B, "m")}, zp, "m", ref, "depth of the peak below the base (strip, L/B ≥ 10)")
			k.add(cs, "z_max", fMul(fN(4), fS("B")), []trace.Value{val("B", f.B, "m")}, zmax, "m", ref, "depth of the bottom of the diagram")
			k.add(cs, "I_z0", nil, nil, iz0, "", ref, "I_z at the base (strip)")
		default:
			k.warn(cs, "schmertmann-shape", trace.SevNote, ref, fmt.Sprintf("L/B = %.3g: the I_z diagram and E_s/q_c are interpolated linearly in L/B between the square and strip cases (common practice)", lbv))
			xin := []trace.Value{val("B", f.B, "m"), val("L", f.L, "m")}
			xe := fDiv(fSub(fDiv(fS("L"), fS("B")), fN(1)), fN(9))
			k.add(cs, "z_p", fMul(fAdd(fN(0.5), fMul(fN(0.5), xe)), fS("B")), xin, zp, "m", ref, "depth of the peak below the base (B/2 square to B strip)")
			k.add(cs, "z_max", fMul(fAdd(fN(2), fMul(fN(2), xe)), fS("B")), xin, zmax, "m", ref, "depth of the bottom of the diagram (2B square to 4B strip)")
			k.add(cs, "I_z0", fAdd(fN(0.1), fMul(fN(0.1), xe)), xin, iz0, "", ref, "I_z at the base (0.1 square to 0.2 strip)")
			k.add(cs, "k_q", fAdd(fN(2.5), xe), xin, kq, "", ref, "E_s/q_c (2.5 square to 3.5 strip)")
		}
		_, _, svp := k.overburden(cs+": peak", D+zp)
		if svp <= 0 {
			return &site.InputError{Where: f.Name, Param: "gamma_sat", Msg: "the vertical effective stress at the peak of the strain influence diagram is not positive: the saturated unit weight must exceed that of water"}
		}
		sm.SigmaVp = svp
		sm.Izp = 0.5 + 0.1*math.Sqrt(k.qn/svp)
		k.add(cs, "I_zp", fAdd(fN(0.5), fMul(fN(0.1), fFn("sqrt", fDiv(fS("q_net"), fS("sigma'_vp"))))), []trace.Value{val("q_net", k.qn, "kPa"), val("sigma'_vp", svp, "kPa")}, sm.Izp, "", ref, "peak strain influence factor")
	} else {
		sm.Izp = 0.6
		k.add(cs, "I_zp", nil, nil, 0.6, "", ref, "peak strain influence factor (1970 diagram)")
		k.add(cs, "z_max", fMul(fN(2), fS("B")), []trace.Value{val("B", f.B, "m")}, zmax, "m", ref, "")
	}
	k.add(cs, "z_inf", fAdd(fS("D"), fS("z_max")), []trace.Value{val("D", D, "m"), val("z_max", zmax, "m")}, D+zmax, "m", ref, "bottom of the strain influence diagram (the zone for this method)")
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
	si := sm.C1 * k.qn * sum
	k.r.Si = si
	if k.full {
		best := -1
		for j, s := range k.r.Sub {
			if s.Si > 0 && (best < 0 || s.Si > k.r.Sub[best].Si) {
				best = j
			}
		}
		if best >= 0 {
			s := k.r.Sub[best]
			l := k.g.Layers[s.Layer]
			rc := fmt.Sprintf("%s: sublayer %d (representative)", s.Name, best+1)
			k.add(rc, "z", fAdd(fS("z_t"), fDiv(fS("h"), fN(2))), []trace.Value{val("z_t", s.Top, "m"), val("h", s.H, "m")}, s.Z, "m", trace.Ref{}, "mid-depth of the sublayer")
			zb := s.Z - D
			k.add(rc, "z_b", fSub(fS("z"), fS("D")), []trace.Value{val("z", s.Z, "m"), val("D", D, "m")}, zb, "m", trace.Ref{}, "depth below the base")
			if zb <= zp {
				k.add(rc, "I_z", fAdd(fS("I_z0"), fMul(fSub(fS("I_zp"), fS("I_z0")), fDiv(fS("z_b"), fS("z_p")))), []trace.Value{val("I_z0", iz0, ""), val("I_zp", sm.Izp, ""), val("z_b", zb, "m"), val("z_p", zp, "m")}, s.Iz, "", ref, "above the peak")
			} else {
				k.add(rc, "I_z", fMul(fS("I_zp"), fDiv(fSub(fS("z_max"), fS("z_b")), fSub(fS("z_max"), fS("z_p")))), []trace.Value{val("I_zp", sm.Izp, ""), val("z_max", zmax, "m"), val("z_b", zb, "m"), val("z_p", zp, "m")}, s.Iz, "", ref, "below the peak")
			}
			if l.E.Set {
				k.add(rc, "E_s", nil, nil, s.E, "MPa", trace.Ref{}, "E′ of the layer, given")
			} else {
				k.add(rc, "E_s", fMul(fS("k_q"), fS("q_c")), []trace.Value{val("k_q", kq, ""), val("q_c", l.Qc.V, "MPa")}, s.E, "MPa", ref, "modulus from cone resistance (2.5 q_c square to 3.5 q_c strip; 2 q_c in 1970)")
			}
			k.add(rc, "Delta_s", fDiv(fMul(fS("C_1"), fS("q_net"), fS("I_z"), fS("h")), fS("E_s")), []trace.Value{val("C_1", sm.C1, ""), val("q_net", k.qn, "kPa"), val("I_z", s.Iz, ""), val("h", s.H, "m"), val("E_s", s.E, "MPa")}, s.Si, "mm", ref, "settlement of the sublayer")
		}
		k.add(cs, "Sigma_Iz", nil, nil, sum, "m3/MN", ref, "Σ I_z Δz / E_s over the sublayers (stress table)")
		k.add(cs, "s_i", fMul(fS("C_1"), fS("q_net"), fS("Sigma_Iz")), []trace.Value{val("C_1", sm.C1, ""), val("q_net", k.qn, "kPa"), val("Sigma_Iz", sum, "m3/MN")}, si, "mm", ref, "settlement at t = 0.1 yr (C_2 = 1)")
	}
	life := k.life(cs)
	sm.C2 = 1 + 0.2*math.Log10(life/(0.1*Year))
	k.add(cs, "C_2", fAdd(fN(1), fMul(fN(0.2), fFn("log10", fDiv(fS("t_life"), yr01)))), []trace.Value{val("t_life", life, "yr")}, sm.C2, "", ref70, "creep factor at the design life t_life")
	sec := si * (sm.C2 - 1)
	k.add(cs, "s_creep", fMul(fS("s_i"), fSub(fS("C_2"), fN(1))), []trace.Value{val("s_i", si, "mm"), val("C_2", sm.C2, "")}, sec, "mm", ref70, "creep after 0.1 yr (secondary)")
	k.creep = func(t float64) float64 {
		if t <= 0.1*Year {
			return 0
		}
		return si * 0.2 * math.Log10(t/(0.1*Year))
	}
	k.sandSec = sec
	return nil
}

// bbN returns the N value of layer i corrected as Burland & Burbidge
// (1985) give: 15 + (N − 15)/2 for very fine or silty sand below the water
// table with N > 15 (after Terzaghi & Peck), 1.25 N for gravel.
func (k *calc) bbN(i int, z float64) float64 {
	n := k.g.Layers[i].N.V
	switch k.c.Grain {
	case FineSilty:
		if k.g.Water.Set && z > k.g.Water.V && n > 15 {
			return 15 + 0.5*(n-15)
		}
	case Gravel:
		return 1.25 * n
	}
	return n
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
			out = append(out, seg{layer: i, top: a, bot: b, n: k.bbN(i, (a+b)/2)})
		}
		return out, nil
	}
	zI := math.Pow(B, 0.763)
	k.add(cs, "z_I", fMul(fPow(fDiv(fS("B"), m1), fN(0.763)), m1), []trace.Value{val("B", B, "m")}, zI, "m", trace.Ref{Source: BB1985, Clause: "depth of influence, N constant or increasing with depth"}, "")
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
		zI = 2 * B
		k.add(cs, "z_I", fMul(fN(2), fS("B")), []trace.Value{val("B", B, "m")}, zI, "m", ref, "N decreases with depth: z_I = 2B")
		k.warn(cs, "bb-decreasing", trace.SevNote, ref, "N decreases with depth within 2B: the depth of influence is taken as 2B")
	}
	bb.ZI = zI
	if err := k.sublayers(D, D+zI); err != nil {
		return err
	}
	k.add(cs, "z_inf", fAdd(fS("D"), fS("z_I")), []trace.Value{val("D", D, "m"), val("z_I", zI, "m")}, D+zI, "m", ref, "bottom of the depth of influence (the zone for this method)")
	zavg := math.Min(zI, H)
	segs, err := segsTo(zavg)
	if err != nil {
		return err
	}
	var num, den float64
	var terms []trace.Expr
	var in []trace.Value
	for _, s := range segs {
		h := s.bot - s.top
		num += s.n * h
		den += h
		ns, hs := fmt.Sprintf("N_%d", s.layer+1), fmt.Sprintf("h_%d", s.layer+1)
		l := g.Layers[s.layer]
		if s.n != l.N.V {
			k.add(cs, ns, nil, nil, s.n, "", ref, fmt.Sprintf("N corrected from %g (%s)", l.N.V, map[Grain]string{FineSilty: "very fine or silty sand below the water table", Gravel: "gravel: 1.25 N"}[c.Grain]))
		}
		terms = append(terms, fMul(fS(ns), fS(hs)))
		in = append(in, val(ns, s.n, ""), val(hs, h, "m"))
	}
	bb.NBar = num / den
	if len(terms) == 1 {
		k.add(cs, "N_bar", fS(fmt.Sprintf("N_%d", segs[0].layer+1)), in[:1], bb.NBar, "", ref, "average N over the depth of influence (one layer)")
	} else {
		var hsum trace.Expr = fS(in[1].Symbol)
		for i := 3; i < len(in); i += 2 {
			hsum = fAdd(hsum, fS(in[i].Symbol))
		}
		k.add(cs, "N_bar", fDiv(fAdd(terms[0], terms[1:]...), hsum), in, bb.NBar, "", ref, "average N over the depth of influence, weighted by thickness")
	}
	if bb.NBar <= 0 {
		return &site.RangeError{Where: f.Name, Param: "N (average)", Value: bb.NBar, Min: 0, Max: 300, Reason: "Burland & Burbidge's method needs N > 0"}
	}
	bb.Ic = 1.71 / math.Pow(bb.NBar, 1.4)
	k.add(cs, "I_c", fDiv(fN(1.71), fPow(fS("N_bar"), fN(1.4))), []trace.Value{val("N_bar", bb.NBar, "")}, bb.Ic, "", ref, "compressibility index, mm per kPa per m^0.7")
	switch f.Shape {
	case site.Strip:
		bb.Fs = 1.5625
		k.add(cs, "f_s", fPow(fN(1.25), fN(2)), nil, bb.Fs, "", ref, "shape factor, L/B → ∞")
	case site.Rectangle:
		r := f.L / f.B
		bb.Fs = math.Pow(1.25*r/(r+0.25), 2)
		lb := fDiv(fS("L"), fS("B"))
		k.add(cs, "f_s", fPow(fDiv(fMul(fN(1.25), lb), fAdd(lb, fN(0.25))), fN(2)), []trace.Value{val("L", f.L, "m"), val("B", f.B, "m")}, bb.Fs, "", ref, "shape factor")
	default:
		bb.Fs = 1
		k.add(cs, "f_s", nil, nil, 1, "", ref, "shape factor: 1 for a square or circle")
	}
	if H < zI {
		bb.Fl = H / zI * (2 - H/zI)
		k.add(cs, "f_l", fMul(fDiv(fS("H_s"), fS("z_I")), fSub(fN(2), fDiv(fS("H_s"), fS("z_I")))), []trace.Value{val("H_s", H, "m"), val("z_I", zI, "m")}, bb.Fl, "", ref, "thickness factor: the granular layer ends within z_I")
	} else {
		bb.Fl = 1
		k.add(cs, "f_l", nil, nil, 1, "", ref, "the granular layer extends below z_I")
	}
	bb.QEff = c.q - k.u
	k.add(cs, "q'", fSub(fS("q"), fS("u_0")), []trace.Value{val("q", c.q, "kPa"), val("u_0", k.u, "kPa")}, bb.QEff, "kPa", ref, "gross effective bearing pressure")
	fl := g.At(D)
	lf := g.Layers[fl]
	sp := k.se
	var spx trace.Expr = fS("sigma'_v0")
	spin := []trace.Value{val("sigma'_v0", k.se, "kPa")}
	switch {
	case lf.SigmaP.Set && lf.SigmaP.V > sp:
		sp = lf.SigmaP.V
		spx, spin = nil, nil
	case lf.OCR.Set && lf.OCR.V > 1:
		sp = lf.OCR.V * k.se
		spx = fMul(fS("OCR"), fS("sigma'_v0"))
		spin = append(spin, val("OCR", lf.OCR.V, ""))
	}
	bb.SigmaVo = sp
	k.add(cs, "sigma'_vo", spx, spin, sp, "kPa", ref, "maximum previous effective overburden at the base (the overburden removed, or σ′_p where greater)")
	unitsNote := "s in mm with q′, σ′_vo in kPa and B in m"
	B07 := fPow(fDiv(fS("B"), m1), fN(0.7))
	var si float64
	if bb.QEff <= 0 {
		bb.OC = true
		k.add(cs, "s_i", nil, nil, 0, "mm", ref, "q′ ≤ 0: the base is not loaded in effective stress; no settlement")
		k.warn(cs, "bb-uplift", trace.SevCaution, ref, "the gross effective bearing pressure q′ is not positive (the pore pressure at the base exceeds the applied pressure): Burland & Burbidge's method gives no settlement and heave is not modelled", val("q'", bb.QEff, "kPa"))
	} else if bb.QEff <= sp {
		bb.OC = true
		si = bb.Fs * bb.Fl * bb.QEff / 1e3 * math.Pow(B, 0.7) * bb.Ic / 3 * 1e-3
		k.add(cs, "s_i", fMul(fS("f_s"), fS("f_l"), fDiv(fS("q'"), kPa1), B07, fDiv(fS("I_c"), fN(3)), mm1),
			[]trace.Value{val("f_s", bb.Fs, ""), val("f_l", bb.Fl, ""), val("q'", bb.QEff, "kPa"), val("B", B, "m"), val("I_c", bb.Ic, "")}, si, "mm", ref, "q′ ≤ σ′_vo: recompression, one third of the virgin value; "+unitsNote)
	} else {
		si = bb.Fs * bb.Fl * (bb.QEff - 2*sp/3) / 1e3 * math.Pow(B, 0.7) * bb.Ic * 1e-3
		k.add(cs, "s_i", fMul(fS("f_s"), fS("f_l"), fDiv(fSub(fS("q'"), fMul(fDiv(fN(2), fN(3)), fS("sigma'_vo"))), kPa1), B07, fS("I_c"), mm1),
			[]trace.Value{val("f_s", bb.Fs, ""), val("f_l", bb.Fl, ""), val("q'", bb.QEff, "kPa"), val("sigma'_vo", sp, "kPa"), val("B", B, "m"), val("I_c", bb.Ic, "")}, si, "mm", ref, "q′ > σ′_vo (σ′_vo = 0 for a normally consolidated sand at the surface); "+unitsNote)
	}
	k.r.Si = si
	r3, rr := 0.3, 0.2
	if c.Fluctuating {
		r3, rr = 0.7, 0.8
	}
	ft := func(t float64) float64 {
		if t < 3*Year {
			return 1
		}
		return 1 + r3 + rr*math.Log10(t/(3*Year))
	}
	life := k.life(cs)
	bb.Ft = ft(life)
	if life >= 3*Year {
		k.add(cs, "f_t", fAdd(fN(1), fS("R_3"), fMul(fS("R"), fFn("log10", fDiv(fS("t_life"), yr3)))), []trace.Value{val("R_3", r3, ""), val("R", rr, ""), val("t_life", life, "yr")}, bb.Ft, "", trace.Ref{Source: BB1985, Clause: "time factor f_t (t ≥ 3 years)"}, "time factor at the design life t_life")
	} else {
		k.add(cs, "f_t", nil, nil, 1, "", ref, "f_t is given for t ≥ 3 years only")
	}
	if len(c.Times) > 0 {
		k.warn(cs, "bb-time", trace.SevNote, ref, "Burland & Burbidge give time-dependent settlement for t ≥ 3 years only: earlier points of the curve show the immediate settlement")
	}
	sec := si * (bb.Ft - 1)
	k.add(cs, "s_creep", fMul(fS("s_i"), fSub(fS("f_t"), fN(1))), []trace.Value{val("s_i", si, "mm"), val("f_t", bb.Ft, "")}, sec, "mm", ref, "time-dependent settlement at the design life (secondary)")
	k.creep = func(t float64) float64 { return si * (ft(t) - 1) }
	k.sandSec = sec
	return nil
}
