package stress

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Explain appends to t the working of the stress increase Δσ = q_net · I
// at depth zb below the underside of footing f, with every formula written
// out in sheet notation (symbols B, L, z_b, q_net, m, n, I_sigma,
// Delta_sigma ...), labels the steps with caseName, and returns Δσ (Pa).
// Every value is its step's formula evaluated (trace.Trace.Eval); it
// agrees with q_net · Influence(f, o, zb) to rounding. A formula out of
// its domain is returned as the error (and is t's).
func Explain(t *trace.Trace, f site.Footing, o Options, zb, qn float64, caseName string) (float64, error) {
	if err := validPoint(f, o, zb); err != nil {
		return 0, err
	}
	e := explainer{t: t, c: caseName, f: f, zb: zb, qn: qn}
	var ds float64
	switch {
	case o.Method == Spread:
		ds = e.spread(o)
	case f.Shape == site.Strip:
		ds = e.strip(o.Point)
	case f.Shape == site.Circle:
		ds = e.circle(o.Point)
	default:
		ds = e.rect(o.Point)
	}
	if err := t.Err(); err != nil {
		return 0, err
	}
	return ds, nil
}

type explainer struct {
	t      *trace.Trace
	c      string
	f      site.Footing
	zb, qn float64
}

func (e *explainer) v(sym string, v float64, unit string) trace.Value {
	return trace.Value{Symbol: sym, V: v, Unit: unit}
}

// eval records a formula step and returns its value.
func (e *explainer) eval(sym string, f trace.Expr, in []trace.Value, unit string, ref trace.Ref, note string) float64 {
	return e.t.Eval(trace.Step{Symbol: sym, Formula: f, Inputs: in, Unit: unit, Ref: ref, Note: note, Case: e.c})
}

// Newmark formulas for the symbol pairs Explain uses, built once (an Expr
// is immutable, so steps may share it).
var newmarkCached = map[string]trace.Expr{
	"m": NewmarkExpr("m", "n"), "m_1": NewmarkExpr("m_1", "n_1"), "m_2": NewmarkExpr("m_2", "n_2"),
	"m_3": NewmarkExpr("m_3", "n_3"), "m_4": NewmarkExpr("m_4", "n_4"),
}

// NewmarkExpr is Newmark's corner formula in the symbols named m and n.
func NewmarkExpr(m, n string) trace.Expr {
	mm, nn := trace.S(m), trace.S(n)
	m2, n2 := trace.Pow(mm, trace.N(2)), trace.Pow(nn, trace.N(2))
	v := trace.Add(m2, n2, trace.N(1))
	m2n2 := trace.Mul(m2, n2)
	mnv := trace.Mul(trace.N(2), mm, nn, trace.Fn("sqrt", v))
	return trace.Mul(trace.Div(trace.N(1), trace.Mul(trace.N(4), trace.S("pi"))),
		trace.Add(trace.Mul(trace.Div(mnv, trace.Add(v, m2n2)), trace.Div(trace.Add(v, trace.N(1)), v)),
			trace.Fn("atan2", mnv, trace.Sub(v, m2n2))))
}

func (e *explainer) rect(p Point) float64 {
	f := e.f
	lsym, l := "L", f.Length()
	if f.Shape == site.Square {
		lsym = "B"
	}
	refN := trace.Ref{Source: Newmark1935, Clause: "corner of a uniformly loaded rectangle"}
	refB := trace.Ref{Source: Newmark1935, Clause: "superposition of corner solutions"}
	in := func(extra ...trace.Value) []trace.Value {
		out := []trace.Value{e.v("B", f.B, "m")}
		if lsym == "L" {
			out = append(out, e.v("L", l, "m"))
		}
		return append(append(out, e.v("z_b", e.zb, "m")), extra...)
	}
	type part struct{ kx, ky float64 }
	var parts []part
	factor := 1.0
	switch p {
	case Centre:
		parts, factor = []part{{0.5, 0.5}}, 4
	case Corner:
		parts = []part{{1, 1}}
	case MidB:
		parts, factor = []part{{1, 0.5}}, 2
	case MidL:
		parts, factor = []part{{0.5, 1}}, 2
	default:
		a, b := 0.5+CharRect, 0.5-CharRect
		parts = []part{{a, a}, {a, b}, {b, a}, {b, b}}
	}
	side := func(k float64, sym string) trace.Expr {
		switch k {
		case 1:
			return trace.S(sym)
		case 0.5:
			return trace.Div(trace.S(sym), trace.N(2))
		}
		return trace.Mul(trace.N(k), trace.S(sym))
	}
	ins := []trace.Value{e.v("q_net", e.qn, "kPa")}
	var sum trace.Expr
	for i, pt := range parts {
		ms, ns, is := "m", "n", "I_sigma"
		if len(parts) > 1 {
			d := string(rune('1' + i))
			ms, ns, is = "m_"+d, "n_"+d, "I_sigma,"+d
		}
		m := e.eval(ms, trace.Div(side(pt.kx, "B"), trace.S("z_b")), in(), "", trace.Ref{}, "")
		n := e.eval(ns, trace.Div(side(pt.ky, lsym), trace.S("z_b")), in(), "", trace.Ref{}, "")
		iv := e.eval(is, newmarkCached[ms], []trace.Value{e.v(ms, m, ""), e.v(ns, n, "")}, "", refN, "Newmark influence factor")
		ins = append(ins, e.v(is, iv, ""))
		if sum == nil {
			sum = trace.S(is)
		} else {
			sum = trace.Add(sum, trace.S(is))
		}
	}
	fx := trace.Mul(trace.S("q_net"), sum)
	if factor != 1 {
		fx = trace.Mul(trace.N(factor), trace.S("q_net"), sum)
	}
	note := "Boussinesq stress increase at the " + p.String()
	ref := refB
	if p == Characteristic {
		ref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point at 0.37 B, 0.37 L from the centre"}
		e.t.Cite(Newmark1935)
	}
	return e.eval("Delta_sigma", fx, ins, "kPa", ref, note)
}

// Formulas of the circle and the strip.
var (
	fxCircleAxis = trace.Mul(trace.S("q_net"), trace.Sub(trace.N(1), trace.Pow(trace.Add(trace.N(1), trace.Pow(trace.Div(trace.S("B"), trace.Mul(trace.N(2), trace.S("z_b"))), trace.N(2))), trace.N(-1.5))))
	fxHalfB      = trace.Div(trace.S("B"), trace.N(2))
	// I_circle(r/R, z/R) is the point-load solution integrated over a
	// circle of unit radius (circle, adaptive Gauss–Legendre quadrature).
	fxICircle = trace.Named("I_circle", func(a []float64) float64 {
		if !(a[0] >= 0) || !(a[1] >= 0) || math.IsInf(a[0], 0) || math.IsInf(a[1], 0) {
			return math.NaN()
		}
		return circle(1, a[0], a[1])
	}, trace.Div(trace.S("r"), fxHalfB), trace.Div(trace.S("z_b"), fxHalfB))
	fxQI     = trace.Mul(trace.S("q_net"), trace.S("I_sigma"))
	fxDelta  = trace.Fn("atan", trace.Div(trace.Sub(trace.S("x"), fxHalfB), trace.S("z_b")))
	fxAlpha  = trace.Sub(trace.Fn("atan", trace.Div(trace.Add(trace.S("x"), fxHalfB), trace.S("z_b"))), fxDelta)
	fxStrip  = trace.Mul(trace.Div(trace.S("q_net"), trace.S("pi")), trace.Add(trace.S("alpha"), trace.Mul(trace.Fn("sin", trace.S("alpha")), trace.Fn("cos", trace.Add(trace.S("alpha"), trace.Mul(trace.N(2), trace.S("delta")))))))
	fxGrowB  = grow("B")
	fxSpread = map[site.Shape]trace.Expr{
		site.Strip:     trace.Div(trace.Mul(trace.S("q_net"), trace.S("B")), fxGrowB),
		site.Circle:    trace.Div(trace.Mul(trace.S("q_net"), trace.Pow(trace.S("B"), trace.N(2))), trace.Pow(fxGrowB, trace.N(2))),
		site.Square:    trace.Div(trace.Mul(trace.S("q_net"), trace.Pow(trace.S("B"), trace.N(2))), trace.Pow(fxGrowB, trace.N(2))),
		site.Rectangle: trace.Div(trace.Mul(trace.S("q_net"), trace.S("B"), trace.S("L")), trace.Mul(fxGrowB, grow("L"))),
	}
)

// grow is a side widened by the load spread, side + 2 z_b tan θ.
func grow(sym string) trace.Expr {
	return trace.Add(trace.S(sym), trace.Mul(trace.N(2), trace.S("z_b"), trace.Fn("tan", trace.S("theta"))))
}

func (e *explainer) circle(p Point) float64 {
	f := e.f
	ref := trace.Ref{Source: Boussinesq1885, Clause: "uniformly loaded circle"}
	if p == Centre {
		return e.eval("Delta_sigma", fxCircleAxis, []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}, "kPa", ref, "Boussinesq stress increase on the axis of a circle")
	}
	rf := fxHalfB
	rref := trace.Ref{}
	if p == Characteristic {
		rf = trace.Mul(trace.N(CharCircle), fxHalfB)
		rref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point of a circle, r = 0.845 R"}
	}
	r := e.eval("r", rf, []trace.Value{e.v("B", f.B, "m")}, "m", rref, "distance of the point from the centre")
	iv := e.eval("I_sigma", fxICircle, []trace.Value{e.v("r", r, "m"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}, "",
		trace.Ref{Source: Boussinesq1885, Clause: "point-load solution integrated over the circle"}, "numerical integration (adaptive Gauss–Legendre)")
	return e.eval("Delta_sigma", fxQI, []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("I_sigma", iv, "")}, "kPa", ref, "Boussinesq stress increase off the axis of a circle")
}

func (e *explainer) strip(p Point) float64 {
	f := e.f
	var xf trace.Expr
	switch p {
	case Corner, MidB, MidL:
		xf = fxHalfB
	case Characteristic:
		xf = trace.Mul(trace.N(CharRect), trace.S("B"))
	}
	var x float64
	if xf != nil {
		ref := trace.Ref{}
		if p == Characteristic {
			ref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point at 0.37 B from the centre line"}
		}
		x = e.eval("x", xf, []trace.Value{e.v("B", f.B, "m")}, "m", ref, "offset of the point from the centre line")
	} else {
		x = e.t.Take(trace.Step{Symbol: "x", Kind: trace.Given, Value: 0, Unit: "m", Note: "on the centre line", Case: e.c})
	}
	in := []trace.Value{e.v("x", x, "m"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}
	a := e.eval("alpha", fxAlpha, in, "deg", trace.Ref{}, "angle the strip subtends at the point")
	d := e.eval("delta", fxDelta, in, "deg", trace.Ref{}, "")
	return e.eval("Delta_sigma", fxStrip, []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("alpha", a, "deg"), e.v("delta", d, "deg")}, "kPa",
		trace.Ref{Source: PoulosDavis, Clause: "uniform strip load"}, "Boussinesq stress increase below a strip")
}

func (e *explainer) spread(o Options) float64 {
	f := e.f
	th := o.angle()
	ref := trace.Ref{Source: HoltzKovacs, Clause: "2:1 (load-spread) method"}
	in := []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("B", f.B, "m")}
	if f.Shape == site.Rectangle {
		in = append(in, e.v("L", f.Length(), "m"))
	}
	in = append(in, e.v("z_b", e.zb, "m"), e.v("theta", th, "deg"))
	ds := e.eval("Delta_sigma", fxSpread[f.Shape], in, "kPa", ref, "average stress increase by load spread")
	if o.Point != Centre {
		e.t.Warn(trace.Caution{Code: "spread-point", Severity: trace.SevNote, Message: "the load-spread method gives the average stress over the spread area; the " + o.Point.String() + " point was not used for the stress", Ref: ref})
	}
	return ds
}
