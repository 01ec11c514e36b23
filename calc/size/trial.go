package size

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// eval runs every check at width B through the engines that print them.
func (z *sizer) eval(B float64) *trial {
	z.evals++
	f := z.footing(B)
	t := &trial{f: f}
	t.B = B
	t.L = f.L
	acts := z.in.Bearing.Actions
	if z.in.SelfWeight != nil {
		sw := *z.in.SelfWeight
		sw.Footing = f
		w, err := design.Weight(sw, &t.wt)
		if err != nil {
			t.err = err
			return t
		}
		t.w = w
		acts = append([]site.Action{{Name: "Self weight and backfill", Kind: site.Permanent, V: w}}, acts...)
	}
	bin := z.in.Bearing
	bin.Footing, bin.Actions = f, acts
	br, err := bearing.Check(bin)
	if err != nil {
		t.err = err
		return t
	}
	if len(br.Cases) == 0 {
		t.err = &site.InputError{Where: "size", Param: "actions", Msg: "every design load lifts the base (V_d ≤ 0) at B = " + fmt.Sprintf("%.3g m", B) + ": no width makes bearing apply"}
		return t
	}
	t.b = br
	t.Checks = append(t.Checks, bearingChecks(br)...)
	if br.GoverningSliding >= 0 {
		c := br.Sliding[br.GoverningSliding]
		t.Checks = append(t.Checks, Check{Name: "sliding", Util: c.Util, OK: c.OK, Detail: c.Name})
	}
	if ec, ok := z.eccentricity(br, f); ok {
		t.Checks = append(t.Checks, ec)
	}
	bearingOK := true
	for _, c := range t.Checks {
		bearingOK = bearingOK && c.OK
	}
	switch {
	case z.in.Settle != nil && !bearingOK:
		// Not computed: the width already fails, and a pressure beyond the
		// settlement methods' range would be refused for no purpose.
		t.Checks = append(t.Checks, Check{Name: "settlement", Util: 0, OK: true, Detail: "not computed: the width fails in bearing, sliding or eccentricity"})
	case z.in.Settle != nil:
		unit := "kN"
		if f.Shape == site.Strip {
			unit = "kN/m"
		}
		svc, err := design.ServiceLoad(acts, z.in.Service, &t.load, unit)
		if err != nil {
			t.err = err
			return t
		}
		sin := *z.in.Settle
		sin.Ground, sin.Footing = z.in.Bearing.Ground, f
		sin.Q, sin.V = site.Opt{}, site.Some(svc.V)
		sr, err := settle.Quiet(sin) // the working is written for the chosen width only
		t.sin = sin
		if err != nil {
			t.err = err
			return t
		}
		if len(sr.Unverified) > 0 {
			t.err = &site.InputError{Where: "size", Param: "settlement", Msg: "the settlement cannot be verified (" + sr.Unverified[0] + "), so no width can be shown to pass"}
			return t
		}
		t.svc, t.s = svc, sr
		t.Checks = append(t.Checks, Check{Name: "settlement", Util: sr.Util, OK: sr.OK, Detail: fmt.Sprintf("s_total = %.1f mm against %.0f mm", sr.Total*1e3, sr.Limit*1e3)})
	}
	t.OK = true
	for i, c := range t.Checks {
		if !c.OK {
			t.OK = false
		}
		if c.Util > t.Checks[t.Governing].Util {
			t.Governing = i
		}
	}
	return t
}

// bearingChecks is one check per drainage condition: the highest
// utilisation among its cases.
func bearingChecks(br *bearing.Result) []Check {
	var out []Check
	for _, d := range []bearing.Drainage{bearing.Undrained, bearing.Drained} {
		best := -1
		for i, c := range br.Cases {
			if c.Drainage == d && (best < 0 || c.Util > br.Cases[best].Util) {
				best = i
			}
		}
		if best < 0 {
			continue
		}
		c := br.Cases[best]
		name := "bearing (short term)"
		if d == bearing.Drained {
			name = "bearing (long term)"
		}
		out = append(out, Check{Name: name, Util: c.Util, OK: c.OK, Detail: c.Name})
	}
	return out
}

// eccentricity is the largest of e_B/(B/n) and e_L/(L/n) over the design
// cases (n = 3 or 6); a circle's resultant eccentricity against its
// diameter.
func (z *sizer) eccentricity(br *bearing.Result, f site.Footing) (Check, bool) {
	if z.in.Ecc == NoEcc {
		return Check{}, false
	}
	n := 3.0
	if z.in.Ecc == Sixth {
		n = 6
	}
	u, at := 0.0, ""
	for _, c := range br.Cases {
		r := c.EB / (f.B / n)
		switch f.Shape {
		case site.Circle:
			r = math.Hypot(c.EB, c.EL) / (f.B / n)
		case site.Rectangle, site.Square:
			r = math.Max(r, c.EL/(f.L/n))
		}
		if r > u {
			u, at = r, c.Name
		}
	}
	return Check{Name: "eccentricity (e ≤ " + z.in.Ecc.String() + ")", Util: u, OK: u <= 1, Detail: at}, true
}

var (
	srcSize = trace.Brent1973
	refSize = trace.Ref{Source: srcSize, Clause: "ch. 4, procedure zero"}
)

// record writes the sizing steps and the result symbols.
func (z *sizer) record(r *Result) {
	t := &r.Trace
	if z.step > 0 {
		t.Take(trace.Step{Symbol: "Delta_B", Value: z.step, Unit: "m", Note: "size increment"})
	}
	t.Take(trace.Step{Symbol: "B_max", Value: z.width(z.kmax), Unit: "m", Note: "largest width tried"})
	if !math.IsNaN(r.BReq) {
		t.Take(trace.Step{Symbol: "B_req", Kind: trace.Solved, Value: r.BReq, Unit: "m", Ref: refSize,
			Note: "width at which the governing utilisation reaches 1, solved by Brent's method"})
	}
	note := "smallest width on the increment for which every check holds"
	if z.step == 0 {
		note = "smallest of the standard sizes for which every check holds"
	}
	if r.Below != nil {
		note += fmt.Sprintf(" (the next smaller, %.3g m, fails: %s %.2f)", r.Below.B, r.Below.Checks[r.Below.Governing].Name, r.Below.Util())
	}
	t.Take(trace.Step{Symbol: "B", Kind: trace.Solved, Value: r.B, Unit: "m", Note: note + "; " + r.Search})
	switch {
	case r.Footing.Shape == site.Strip:
	case z.in.Plan == Ratio:
		t.Eval(trace.Step{Symbol: "L", Formula: trace.Mul(trace.S("r_LB"), trace.S("B")),
			Inputs: []trace.Value{{Symbol: "r_LB", V: z.in.Ratio}, {Symbol: "B", V: r.B, Unit: "m"}}, Unit: "m", Note: "length at the fixed L/B"})
	case z.in.Plan == FixedL:
		t.Take(trace.Step{Symbol: "L", Value: r.L, Unit: "m", Note: "fixed length"})
	default:
		t.Take(trace.Step{Symbol: "L", Value: r.L, Unit: "m", Note: "L = B (" + r.Footing.Shape.String() + ")"})
	}
	r.Values = []trace.Value{{Symbol: "B", V: r.B, Unit: "m"}}
	if r.Footing.Shape != site.Strip && z.in.Plan != FixedL { // a fixed L is the footing's own
		r.Values = append(r.Values, trace.Value{Symbol: "L", V: r.L, Unit: "m"})
	}
	r.Values = append(r.Values, trace.Value{Symbol: "util", V: r.At.Util()})
	if r.Below != nil {
		r.Values = append(r.Values, trace.Value{Symbol: "util_below", V: r.Below.Util()})
	}
	if !math.IsNaN(r.BReq) {
		r.Values = append(r.Values, trace.Value{Symbol: "B_req", V: r.BReq, Unit: "m"})
	}
	if r.Settle != nil {
		r.Values = append(r.Values, trace.Value{Symbol: "s_total", V: r.Settle.Total, Unit: "mm"})
	}
}
