package platform

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// GroundModel is the ground of the EN 1997-1 comparison: the platform
// material from the surface to depth D over the subgrade (cohesive: c_u,
// fine-grained; granular: φ′, coarse), no groundwater.
func GroundModel(p Platform, s Subgrade, D float64) site.Ground {
	top := site.Layer{Name: "Platform", Type: site.Coarse, Top: 0, Gamma: p.Gamma, Phi: site.Some(p.Phi)}
	low := site.Layer{Name: "Subgrade", Top: D, Gamma: s.Gamma}
	if s.Kind == Cohesive {
		low.Type, low.Cu = site.Fine, site.Some(s.Cu)
	} else {
		low.Type, low.Phi = site.Coarse, site.Some(s.Phi)
	}
	return site.Ground{Name: "platform over subgrade", Layers: []site.Layer{top, low}}
}

// TrackFooting is the footing of the EN 1997-1 comparison: the case's
// loaded area W × L at the surface of the platform (square when W = L).
func TrackFooting(k Case) site.Footing {
	f := site.Footing{Name: k.Label(), Shape: site.Rectangle, B: k.W, L: k.L}
	if k.L == k.W {
		f.Shape, f.L = site.Square, 0
	}
	return f
}

// ComparisonInput is the bearing.Input of the EN 1997-1 two-layer check
// of case k on a platform of thickness D: the track footing on the ground
// model, the characteristic action V = q_k·W·L of kind e.Kind, and e's
// options with the comparison's settings where they are zero (drainage
// undrained over a cohesive subgrade and drained over a granular one,
// sliding no, local shear no).
func ComparisonInput(p Platform, s Subgrade, k Case, D float64, e EC7) bearing.Input {
	o := e.Options
	if o.Drainage == bearing.DrainageAuto {
		o.Drainage = bearing.Undrained
		if s.Kind == Granular {
			o.Drainage = bearing.Drained
		}
	}
	if o.Sliding == bearing.Auto {
		o.Sliding = bearing.No
	}
	if o.LocalShear == bearing.Auto {
		o.LocalShear = bearing.No
	}
	return bearing.Input{
		Ground:  GroundModel(p, s, D),
		Footing: TrackFooting(k),
		Actions: []site.Action{{Name: "Track load", Kind: e.Kind, V: k.Q * k.W * k.L}},
		Options: o,
	}
}

// compare runs the EN 1997-1 check of every case at the design thickness.
// Its working stays in its own trace (CaseResult.EC7); a check that cannot
// be made is a warning, not an error of the design.
func (c *calc) compare() {
	e := c.o.EC7
	if e.Off {
		return
	}
	ref := trace.Ref{Source: trace.EN1997, Clause: "6.5.2 and Annex D, two-layer check by calc/bearing (Meyerhof & Hanna 1978)"}
	for i := range c.r.Cases {
		k := &c.r.Cases[i]
		in := ComparisonInput(c.in.Platform, c.in.Subgrade, c.in.Cases[i], c.r.D, e)
		br, err := bearing.Check(in)
		if err == nil && br.Governing < 0 {
			err = &site.InputError{Where: k.Name, Param: "EN 1997-1 comparison", Msg: "no bearing case could be checked: " + br.Unverified}
		}
		if err != nil {
			k.EC7Err = err
			c.t.WarnAll(trace.Caution{Code: "platform-ec7", Severity: trace.SevWarning, Ref: ref, Case: k.Name,
				Message: k.Name + ": the EN 1997-1 comparison was not made: " + err.Error()})
			continue
		}
		k.EC7 = br
		g := br.Cases[br.Governing]
		if g.TwoLayer == nil {
			c.t.WarnAll(trace.Caution{Code: "platform-ec7-one-layer", Severity: trace.SevNote, Ref: ref, Case: k.Name,
				Message: k.Name + ": in the EN 1997-1 comparison the subgrade is not checked as a weaker lower layer (it lies deeper than 2B below the track, or is not weaker): the check is of the platform material alone."})
		}
	}
}
