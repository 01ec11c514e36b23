package settle_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// Schmertmann worked value: a 2.5 m square footing at 0.8 m in sand
// (γ = 17 kN/m³ above the water table at 0.8 m, γ_sat = 19.8 kN/m³),
// 1000 kN plus its own weight and backfill (23.5 × 0.5 + 18 × 0.3 kPa),
// E = 18 MPa throughout: 0.017 m ± 1 %. Worked solution of a university
// exercise (ENCN452, University of Canterbury, 2013) as encoded in the
// open test suite of eng-tools/geofound (tests/test_settlement.py);
// Schmertmann et al. (1978) diagram, C_2 = 1.
func TestSchmertmannWorked(t *testing.T) {
	g := site.Ground{Water: site.Some(0.8), Layers: []site.Layer{
		{Name: "Sand", Top: 0, Gamma: 17e3, GammaSat: site.Some(19.8e3), E: site.Some(18e6)},
	}}
	v := 1000e3 + (23.5e3*0.5+18e3*0.3)*2.5*2.5
	in := settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2.5, D: 0.8}, V: site.Some(v),
		Method: settle.Schmertmann, Sublayers: 400}
	r := mustCompute(t, in)
	near(t, "s_i (m)", r.Si, 0.017, 0.017*0.01, "ENCN452 worked solution via eng-tools/geofound")
}

// Hand calculation to Schmertmann et al. (1978): with uniform E the sum
// Σ I_z Δz is the area of the diagram, ½(I_z0 + I_zp) z_p + ½ I_zp
// (z_max − z_p); C_1 = 1 − 0.5 σ′_v0/q_net; I_zp = 0.5 + 0.1 √(q_net/σ′_vp).
func TestSchmertmannHand(t *testing.T) {
	for _, c := range []struct {
		shape   site.Shape
		b, l    float64
		zp, zm  float64
		iz0, kq float64
	}{
		{site.Square, 2, 2, 1, 4, 0.1, 2.5},
		{site.Strip, 2, 0, 2, 8, 0.2, 3.5},
		{site.Rectangle, 2, 11, 1.5, 6, 0.15, 3.0}, // L/B = 5.5: halfway (common practice interpolation)
		{site.Circle, 2, 0, 1, 4, 0.1, 2.5},
	} {
		g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, Qc: site.Some(8e6)}}}
		f := site.Footing{Name: "F", Shape: c.shape, B: c.b, L: c.l, D: 1}
		in := settle.Input{Ground: g, Footing: f, Q: site.Some(200 * kPa), Method: settle.Schmertmann, Sublayers: 2000, Life: site.Some(10 * settle.Year)}
		r := mustCompute(t, in)
		qn := 200*kPa - 18*kPa
		c1 := 1 - 0.5*18*kPa/qn
		izp := 0.5 + 0.1*math.Sqrt(qn/(18*kPa*(1+c.zp)))
		area := 0.5*(c.iz0+izp)*c.zp + 0.5*izp*(c.zm-c.zp)
		want := c1 * qn * area / (c.kq * 8e6)
		near(t, c.shape.String()+" s_i", r.Si, want, want*2e-5, "hand calculation, Schmertmann et al. 1978")
		s := r.Schm
		near(t, "z_max", s.Zmax, c.zm, 1e-12, "Schmertmann et al. 1978")
		near(t, "I_zp", s.Izp, izp, 1e-12, "Schmertmann et al. 1978")
		near(t, "C_2(10 yr)", s.C2, 1.4, 1e-12, "C_2 = 1 + 0.2 log(t/0.1 yr), Schmertmann 1970")
		near(t, "creep", r.Ssec, r.Si*0.4, 1e-15, "s_i (C_2 − 1)")
		near(t, "z_inf", r.ZInf, 1+c.zm, 1e-12, "the diagram depth")
	}
	// 1970: triangle 0 – 0.6 – 0 over 2B, E = 2 q_c: area 0.6 B.
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, Qc: site.Some(8e6)}}}
	in := settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}, Q: site.Some(200 * kPa),
		Method: settle.Schmertmann, Schmertmann1970: true, Sublayers: 2000}
	r := mustCompute(t, in)
	qn := 182 * kPa
	want := (1 - 0.5*18/182) * qn * 0.6 * 2 / (2 * 8e6)
	near(t, "1970 s_i", r.Si, want, want*2e-5, "hand calculation, Schmertmann 1970")
}

// A sand's settlement has no time dependence beyond creep: the curve is
// s_i·C_2(t) (Schmertmann) and s_i·f_t(t) (Burland & Burbidge).
func TestSandTime(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, Qc: site.Some(6e6), N: site.Some(15)}}}
	times := []float64{0, 0.05 * settle.Year, 0.1 * settle.Year, 1 * settle.Year, 3 * settle.Year, 30 * settle.Year}
	in := settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}, Q: site.Some(150 * kPa), Times: times}
	r := mustCompute(t, in)
	if r.Method != settle.Schmertmann {
		t.Fatalf("auto chose %v", r.Method)
	}
	for _, p := range r.Curve {
		c2 := math.Max(1, 1+0.2*math.Log10(p.T/(0.1*settle.Year)))
		if p.T == 0 {
			c2 = 1
		}
		near(t, "Schmertmann s(t)", p.S, r.Si*c2, 1e-15, "C_2(t), no consolidation")
		if p.Sc != 0 || p.U != 1 {
			t.Errorf("sand shows consolidation: %+v", p)
		}
	}
	if r.T50.Set || r.T90.Set {
		t.Error("a sand has t_50 or t_90")
	}
	in.Method = settle.BurlandBurbidge
	r = mustCompute(t, in)
	for _, p := range r.Curve {
		ft := 1.0
		if p.T >= 3*settle.Year {
			ft = 1.3 + 0.2*math.Log10(p.T/(3*settle.Year))
		}
		near(t, "B&B s(t)", p.S, r.Si*ft, 1e-15, "f_t(t) for t ≥ 3 years")
	}
}

// Burland & Burbidge (1985) by hand, equations of the paper's §6:
// I_c = 1.71/N̄^1.4, z_I = B^0.763, s = f_s f_l (q′ − ⅔σ′_vo) B^0.7 I_c
// (q′ > σ′_vo), q′ B^0.7 I_c/3 (q′ ≤ σ′_vo); f_s = (1.25 (L/B)/(L/B +
// 0.25))², f_l = (H/z_I)(2 − H/z_I), f_t = 1 + R_3 + R log(t/3): R_3 = 0.3,
// R = 0.2 static (0.7, 0.8 fluctuating). Verification pass: the three
// settlement forms (q′B^0.7 I_c normally consolidated, (q′ − ⅔σ′_vo)B^0.7
// I_c and q′B^0.7 I_c/3), the N corrections 15 + ½(N − 15) (very fine or
// silty sand below the water table, N > 15) and 1.25N (gravel), and z_I =
// 2B where N decreases with depth are confirmed against Tomlinson, Pile
// Design and Construction Practice, eqs 5.26–5.31 (reproduced at
// issuhub.com); f_l = (H/z_I)(2 − H/z_I) as quoted in an eng-tips.com
// thread; the constants 1.71, 1.4, 0.763, 1.25, 0.25 and R_3, R are from
// memory of the paper (its public copies could not be read past the
// notation), standard values not contradicted by any source seen.
func TestBurlandBurbidgeHand(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, N: site.Some(20)}}}
	in := settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}, Q: site.Some(150 * kPa), Method: settle.BurlandBurbidge}
	r := mustCompute(t, in)
	ic := 1.71 / math.Pow(20, 1.4)
	want := (150 - 2.0/3*18) * math.Pow(2, 0.7) * ic * 1e-3
	near(t, "s_i (normal)", r.Si, want, 1e-15, "B&B 1985 §6, q′ > σ′_vo")
	near(t, "z_I", r.BB.ZI, math.Pow(2, 0.763), 1e-15, "B&B 1985")
	near(t, "f_t(50 yr)", r.BB.Ft, 1.3+0.2*math.Log10(50.0/3), 1e-15, "B&B 1985")
	near(t, "s_total", r.Total, want*r.BB.Ft, 1e-15, "s_i f_t")
	// Over-consolidated, q′ ≤ σ′_vo: one third.
	oc := in
	oc.Ground.Layers[0].SigmaP = site.Some(300 * kPa)
	r = mustCompute(t, oc)
	near(t, "s_i (q′ ≤ σ′_vo)", r.Si, 150*math.Pow(2, 0.7)*ic/3*1e-3, 1e-15, "B&B 1985 §6")
	// Thin sand over clay: f_l; strip: f_s = 1.5625; 5 × 2 m rectangle.
	thin := in
	thin.Ground = site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, N: site.Some(20)}, {Name: "Clay", Top: 2, Gamma: 18e3, Cu: site.Some(50e3), N: site.Some(8)}}}
	r = mustCompute(t, thin)
	zi := math.Pow(2, 0.763)
	near(t, "f_l", r.BB.Fl, (1/zi)*(2-1/zi), 1e-15, "B&B 1985")
	strip := in
	strip.Footing = site.Footing{Name: "S", Shape: site.Strip, B: 2, D: 1}
	near(t, "f_s strip", mustCompute(t, strip).BB.Fs, 1.5625, 0, "B&B 1985, L/B → ∞")
	rect := in
	rect.Footing = site.Footing{Name: "R", Shape: site.Rectangle, B: 2, L: 5, D: 1}
	near(t, "f_s L/B = 2.5", mustCompute(t, rect).BB.Fs, math.Pow(1.25*2.5/2.75, 2), 1e-15, "B&B 1985")
	// N corrections: gravel 1.25 N; silty sand below the water table 15 + (N − 15)/2.
	gr := in
	gr.Grain = settle.Gravel
	near(t, "gravel N̄", mustCompute(t, gr).BB.NBar, 25, 1e-12, "B&B 1985")
	si := in
	si.Grain = settle.FineSilty
	si.Ground.Water = site.Some(0.5)
	near(t, "silty N̄", mustCompute(t, si).BB.NBar, 17.5, 1e-12, "B&B 1985 (Terzaghi & Peck)")
	// N decreasing with depth: z_I = 2B.
	dec := in
	dec.Ground = site.Ground{Layers: []site.Layer{{Name: "Dense", Top: 0, Gamma: 18e3, N: site.Some(30)}, {Name: "Loose", Top: 2, Gamma: 18e3, N: site.Some(10)}}}
	r = mustCompute(t, dec)
	near(t, "z_I decreasing", r.BB.ZI, 4, 0, "B&B 1985: 2B where N decreases")
	near(t, "N̄ over 2B", r.BB.NBar, (30*1+10*3)/4.0, 1e-12, "thickness-weighted mean")
	// Missing N is an input error naming N.
	miss := in
	miss.Ground.Layers[0].N = site.Opt{}
	var ie *site.InputError
	if _, err := settle.Compute(miss); !errors.As(err, &ie) || ie.Param != "N" {
		t.Errorf("missing N: %v", err)
	}
}

// Burland & Burbidge (1985), §6 (the recompression branch quoted in the
// package documentation): s = f_s f_l q′ B^0.7 I_c/3 for q′ ≤ σ′_vo and
// f_s f_l [σ′_vo B^0.7 I_c/3 + (q′ − σ′_vo) B^0.7 I_c] above it, so s is
// continuous at q′ = σ′_vo and a compensated footing (q_net ≤ 0) still
// settles by recompression. Property test over widths, depths, water
// levels and pressures from ½σ_v0 to 2σ_v0 at the base: (1) below σ_v0
// the engine gives the recompression value (tolerance 1e-12 relative);
// (2) the two sides of q′ = σ′_vo agree to 1e-6 relative for a step of
// 1e-9 σ_v0 (continuity); (3) s is non-decreasing in q. Hand check of one
// row: B = 2 m square, D = 1 m, γ = 18 kN/m³, N = 20, q = 18 kPa = σ_v0:
// I_c = 1.71/20^1.4 = 0.02571, s = 18 × 2^0.7 × 0.02571/3 = 0.2506 mm.
func TestBurlandBurbidgeContinuity(t *testing.T) {
	hand := func(q float64) float64 {
		g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, N: site.Some(20)}}}
		in := settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}, Q: site.Some(q), Method: settle.BurlandBurbidge}
		return mustCompute(t, in).Si
	}
	near(t, "s_i at q = σ_v0", hand(18*kPa), 18*math.Pow(2, 0.7)*(1.71/math.Pow(20, 1.4))/3*1e-3, 1e-15, "hand calculation, B&B 1985 §6")
	for _, b := range []float64{0.8, 2, 5} {
		for _, d := range []float64{0.5, 1.5, 4} {
			for _, w := range []site.Opt{{}, site.Some(0.3), site.Some(d + 1)} {
				g := site.Ground{Water: w, Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), N: site.Some(18)}}}
				f := site.Footing{Name: "F", Shape: site.Rectangle, B: b, L: 1.6 * b, D: d}
				sv := g.SigmaV(d)
				s := func(q float64) (*settle.Result, float64) {
					in := settle.Input{Ground: g, Footing: f, Q: site.Some(q), Method: settle.BurlandBurbidge}
					r := mustCompute(t, in)
					return r, r.Si
				}
				prev := -1.0
				for _, x := range []float64{0.5, 0.75, 0.9, 1, 1.1, 1.5, 2} {
					r, si := s(x * sv)
					if si < prev {
						t.Errorf("B=%g D=%g water=%v: s(%g σ_v0) = %g < %g: not monotone", b, d, w, x, si, prev)
					}
					prev = si
					if x <= 1 {
						bb := r.BB
						want := bb.Fs * bb.Fl * bb.QEff / 1e3 * math.Pow(b, 0.7) * bb.Ic / 3 * 1e-3
						if want <= 0 || math.Abs(si-want) > 1e-12*want {
							t.Errorf("B=%g D=%g water=%v q=%g σ_v0: s_i = %g, want recompression %g (B&B 1985 §6)", b, d, w, x, si, want)
						}
					}
				}
				_, lo := s(sv * (1 - 1e-9))
				_, hi := s(sv * (1 + 1e-9))
				if math.Abs(hi-lo) > 1e-6*hi {
					t.Errorf("B=%g D=%g water=%v: s jumps at q′ = σ′_vo: %g to %g", b, d, w, lo, hi)
				}
			}
		}
	}
}

// The two branches of Burland & Burbidge (1985) §6 meet also where the
// sand is preloaded beyond the present overburden (σ′_vo = σ′_p > σ′_v0):
// s(q′ = σ′_vo ± 1e-9) agree to 1e-6 relative (hand form:
// σ′_vo B^0.7 I_c/3 on both sides). Where the net pressure is not
// positive, method = auto on sand with N chooses Burland & Burbidge and so
// gives the recompression value; the elastic method gives none and its
// note says it has no recompression branch.
func TestBurlandBurbidgePreloaded(t *testing.T) {
	g := site.Ground{Water: site.Some(0.5), Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), N: site.Some(25), SigmaP: site.Some(120 * kPa)}}}
	f := site.Footing{Name: "F", Shape: site.Square, B: 2.5, D: 1.2}
	u := 0.7 * 9.81e3
	si := func(q float64, m settle.Method) *settle.Result {
		return mustCompute(t, settle.Input{Ground: g, Footing: f, Q: site.Some(q), Method: m})
	}
	lo, hi := si(120*kPa*(1-1e-9)+u, settle.BurlandBurbidge), si(120*kPa*(1+1e-9)+u, settle.BurlandBurbidge)
	if lo.BB.SigmaVo != 120*kPa {
		t.Fatalf("σ′_vo = %g, want σ′_p", lo.BB.SigmaVo)
	}
	want := 120 * math.Pow(2.5, 0.7) * lo.BB.Ic / 3 * 1e-3
	near(t, "s below σ′_vo", lo.Si, want, 1e-6*want, "B&B 1985 §6, q′ ≤ σ′_vo")
	near(t, "s above σ′_vo", hi.Si, want, 1e-6*want, "B&B 1985 §6, q′ > σ′_vo")
	// Compensated: q = 0.8 σ_v0 at the base.
	q := 0.8 * g.SigmaV(f.D)
	g.Layers = []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), N: site.Some(25)}}
	if r := si(q, settle.Auto); r.Method != settle.BurlandBurbidge || !(r.Si > 0) {
		t.Errorf("auto, q_net < 0: method %v, s_i = %g; want Burland & Burbidge recompression", r.Method, r.Si)
	}
	g.Layers[0].E = site.Some(30e6)
	r := si(q, settle.Elastic)
	found := false
	for _, c := range r.Trace.Cautions {
		found = found || (c.Code == "net-nonpositive" && strings.Contains(c.Message, "no recompression branch"))
	}
	if r.Si != 0 || !found {
		t.Errorf("elastic, q_net < 0: s_i = %g, note found %v", r.Si, found)
	}
}
