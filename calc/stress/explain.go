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
// It gives the same value as q_net · Influence(f, o, zb).
func Explain(t *trace.Trace, f site.Footing, o Options, zb, qn float64, caseName string) (float64, error) {
	if err := validPoint(f, o, zb); err != nil {
		return 0, err
	}
	e := explainer{t: t, c: caseName, f: f, zb: zb, qn: qn}
	if o.Method == Spread {
		return e.spread(o), nil
	}
	switch f.Shape {
	case site.Strip:
		return e.strip(o.Point), nil
	case site.Circle:
		return e.circle(o.Point), nil
	}
	return e.rect(o.Point), nil
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

func (e *explainer) add(sym string, f trace.Expr, in []trace.Value, val float64, unit string, ref trace.Ref, note string) float64 {
	return e.t.Add(trace.Step{Symbol: sym, Formula: f, Inputs: in, Value: val, Unit: unit, Ref: ref, Note: note, Case: e.c})
}

var (
	fS   = trace.S
	fN   = trace.N
	fMul = trace.Mul
	fDiv = trace.Div
	fPow = trace.Pow
	fAdd = trace.Add
	fSub = trace.Sub
	fFn  = trace.Fn
)

// Newmark formulas for the symbol pairs Explain uses, built once (an Expr
// is immutable, so steps may share it).
var newmarkCached = map[string]trace.Expr{
	"m": NewmarkExpr("m", "n"), "m_1": NewmarkExpr("m_1", "n_1"), "m_2": NewmarkExpr("m_2", "n_2"),
	"m_3": NewmarkExpr("m_3", "n_3"), "m_4": NewmarkExpr("m_4", "n_4"),
}

// NewmarkExpr is Newmark's corner formula in the symbols named m and n.
func NewmarkExpr(m, n string) trace.Expr {
	mm, nn := fS(m), fS(n)
	m2, n2 := fPow(mm, fN(2)), fPow(nn, fN(2))
	v := fAdd(m2, n2, fN(1))
	m2n2 := fMul(m2, n2)
	mnv := fMul(fN(2), mm, nn, fFn("sqrt", v))
	return fMul(fDiv(fN(1), fMul(fN(4), fS("pi"))),
		fAdd(fMul(fDiv(mnv, fAdd(v, m2n2)), fDiv(fAdd(v, fN(1)), v)),
			fFn("atan2", mnv, fSub(v, m2n2))))
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
			return fS(sym)
		case 0.5:
			return fDiv(fS(sym), fN(2))
		}
		return fMul(fN(k), fS(sym))
	}
	var isyms []string
	var ivals []float64
	for i, pt := range parts {
		ms, ns, is := "m", "n", "I_sigma"
		if len(parts) > 1 {
			d := string(rune('1' + i))
			ms, ns, is = "m_"+d, "n_"+d, "I_sigma,"+d
		}
		m := pt.kx * f.B / e.zb
		n := pt.ky * l / e.zb
		e.add(ms, fDiv(side(pt.kx, "B"), fS("z_b")), in(), m, "", trace.Ref{}, "")
		e.add(ns, fDiv(side(pt.ky, lsym), fS("z_b")), in(), n, "", trace.Ref{}, "")
		iv := newmark(m, n)
		e.add(is, newmarkCached[ms], []trace.Value{e.v(ms, m, ""), e.v(ns, n, "")}, iv, "", refN, "Newmark influence factor")
		isyms = append(isyms, is)
		ivals = append(ivals, iv)
	}
	ins := []trace.Value{e.v("q_net", e.qn, "kPa")}
	var sum trace.Expr
	var total float64
	for i, s := range isyms {
		ins = append(ins, e.v(s, ivals[i], ""))
		total += ivals[i]
		if sum == nil {
			sum = fS(s)
		} else {
			sum = fAdd(sum, fS(s))
		}
	}
	fx := fMul(fS("q_net"), sum)
	if factor != 1 {
		fx = fMul(fN(factor), fS("q_net"), sum)
	}
	ds := factor * e.qn * total
	note := "Boussinesq stress increase at the " + p.String()
	ref := refB
	if p == Characteristic {
		ref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point at 0.37 B, 0.37 L from the centre"}
		e.t.Cite(Newmark1935)
	}
	e.add("Delta_sigma", fx, ins, ds, "kPa", ref, note)
	return ds
}

func (e *explainer) circle(p Point) float64 {
	f := e.f
	ref := trace.Ref{Source: Boussinesq1885, Clause: "uniformly loaded circle"}
	if p == Centre {
		ds := e.qn * circleAxis(f.B/2, e.zb)
		fx := fMul(fS("q_net"), fSub(fN(1), fPow(fAdd(fN(1), fPow(fDiv(fS("B"), fMul(fN(2), fS("z_b"))), fN(2))), fN(-1.5))))
		e.add("Delta_sigma", fx, []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}, ds, "kPa", ref, "Boussinesq stress increase on the axis of a circle")
		return ds
	}
	r, _ := Offset(f, p)
	var rf trace.Expr = fDiv(fS("B"), fN(2))
	rref := trace.Ref{}
	if p == Characteristic {
		rf = fMul(fN(CharCircle), fDiv(fS("B"), fN(2)))
		rref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point of a circle, r = 0.845 R"}
	}
	e.add("r", rf, []trace.Value{e.v("B", f.B, "m")}, r, "m", rref, "distance of the point from the centre")
	iv := circle(f.B/2, r, e.zb)
	e.add("I_sigma", fFn("I_circle", fDiv(fS("r"), fDiv(fS("B"), fN(2))), fDiv(fS("z_b"), fDiv(fS("B"), fN(2)))),
		[]trace.Value{e.v("r", r, "m"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}, iv, "",
		trace.Ref{Source: Boussinesq1885, Clause: "point-load solution integrated over the circle"}, "numerical integration (adaptive Gauss–Legendre)")
	ds := e.qn * iv
	e.add("Delta_sigma", fMul(fS("q_net"), fS("I_sigma")), []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("I_sigma", iv, "")}, ds, "kPa", ref, "Boussinesq stress increase off the axis of a circle")
	return ds
}

func (e *explainer) strip(p Point) float64 {
	f := e.f
	x, _ := Offset(f, p)
	var xf trace.Expr
	switch p {
	case Corner, MidB, MidL:
		xf = fDiv(fS("B"), fN(2))
	case Characteristic:
		xf = fMul(fN(CharRect), fS("B"))
	}
	if xf != nil {
		ref := trace.Ref{}
		if p == Characteristic {
			ref = trace.Ref{Source: Grasshoff1955, Clause: "characteristic point at 0.37 B from the centre line"}
		}
		e.add("x", xf, []trace.Value{e.v("B", f.B, "m")}, x, "m", ref, "offset of the point from the centre line")
	} else {
		e.add("x", nil, nil, 0, "m", trace.Ref{}, "on the centre line")
	}
	in := []trace.Value{e.v("x", x, "m"), e.v("B", f.B, "m"), e.v("z_b", e.zb, "m")}
	hb := fDiv(fS("B"), fN(2))
	t1 := math.Atan((x + f.B/2) / e.zb)
	d := math.Atan((x - f.B/2) / e.zb)
	a := t1 - d
	e.add("alpha", fSub(fFn("atan", fDiv(fAdd(fS("x"), hb), fS("z_b"))), fFn("atan", fDiv(fSub(fS("x"), hb), fS("z_b")))), in, a, "deg", trace.Ref{}, "angle the strip subtends at the point")
	e.add("delta", fFn("atan", fDiv(fSub(fS("x"), hb), fS("z_b"))), in, d, "deg", trace.Ref{}, "")
	ds := e.qn / math.Pi * (a + math.Sin(a)*math.Cos(a+2*d))
	fx := fMul(fDiv(fS("q_net"), fS("pi")), fAdd(fS("alpha"), fMul(fFn("sin", fS("alpha")), fFn("cos", fAdd(fS("alpha"), fMul(fN(2), fS("delta")))))))
	e.add("Delta_sigma", fx, []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("alpha", a, "deg"), e.v("delta", d, "deg")}, ds, "kPa",
		trace.Ref{Source: PoulosDavis, Clause: "uniform strip load"}, "Boussinesq stress increase below a strip")
	return ds
}

func (e *explainer) spread(o Options) float64 {
	f := e.f
	th := o.angle()
	k := 2 * e.zb * math.Tan(th)
	ref := trace.Ref{Source: HoltzKovacs, Clause: "2:1 (load-spread) method"}
	tanT := fFn("tan", fS("theta"))
	grow := func(sym string) trace.Expr { return fAdd(fS(sym), fMul(fN(2), fS("z_b"), tanT)) }
	in := []trace.Value{e.v("q_net", e.qn, "kPa"), e.v("B", f.B, "m")}
	var fx trace.Expr
	var ds float64
	switch f.Shape {
	case site.Strip:
		fx = fDiv(fMul(fS("q_net"), fS("B")), grow("B"))
		ds = e.qn * f.B / (f.B + k)
	case site.Circle:
		fx = fDiv(fMul(fS("q_net"), fPow(fS("B"), fN(2))), fPow(grow("B"), fN(2)))
		ds = e.qn * f.B * f.B / ((f.B + k) * (f.B + k))
	case site.Square:
		fx = fDiv(fMul(fS("q_net"), fPow(fS("B"), fN(2))), fPow(grow("B"), fN(2)))
		ds = e.qn * f.B * f.B / ((f.B + k) * (f.B + k))
	default:
		l := f.Length()
		in = append(in, e.v("L", l, "m"))
		fx = fDiv(fMul(fS("q_net"), fS("B"), fS("L")), fMul(grow("B"), grow("L")))
		ds = e.qn * f.B * l / ((f.B + k) * (l + k))
	}
	in = append(in, e.v("z_b", e.zb, "m"), e.v("theta", th, "deg"))
	e.add("Delta_sigma", fx, in, ds, "kPa", ref, "average stress increase by load spread")
	if o.Point != Centre {
		e.t.Warn(trace.Caution{Code: "spread-point", Severity: trace.SevNote, Message: "the load-spread method gives the average stress over the spread area; the " + o.Point.String() + " point was not used for the stress", Ref: ref})
	}
	return ds
}
