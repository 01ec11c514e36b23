package site

import (
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
)

// Stress is the formula of a total vertical stress with its inputs
// (Overburden).
type Stress struct {
	F      trace.Expr    // nil at ground level with no water above it
	In     []trace.Value // the unit weights and thicknesses F names
	Layers []int         // the 0-based layers F names, in order, each once
	Wet    bool          // a term below the water table (γ_sat,i·h_w,i)
	Flood  bool          // the free water above ground level (γ_w·h_w0)
}

// Note is the legend of the symbols of s a note beside it needs: h_w0
// and h_w when the formula has them, else "".
func (s Stress) Note() string {
	var p []string
	if s.Flood {
		p = append(p, "h_w0: free water above ground level")
	}
	if s.Wet {
		p = append(p, "h_w: thickness below the water table")
	}
	return strings.Join(p, "; ")
}

// Overburden returns the formula of the total vertical stress at depth z
// below ground level and its inputs,
//
//	σ_v0 = γ_w·h_w0 + Σ γ_i·h_i + Σ γ_sat,i·h_w,i
//
// (common practice; Craig's Soil Mechanics, 8th ed., §3.4, from memory):
// the free water standing above ground level, then each layer i above z
// by its bulk unit weight over its thickness above the water table and
// its saturated unit weight over its thickness below it, as Strata cuts
// them. The bearing and settlement engines both print σ_v0 by it, so the
// same stress at the same depth is one step with one notation, and the
// document prints it once. Its value is SigmaV(z).
func (g Ground) Overburden(z float64) Stress {
	var s Stress
	var terms []trace.Expr
	if h0 := g.Flood(); h0 > 0 {
		s.Flood = true
		terms = append(terms, fxFlood)
		s.In = append(s.In, trace.Value{Symbol: "gamma_w", V: g.Gw(), Unit: "kN/m3"}, trace.Value{Symbol: "h_w0", V: h0, Unit: "m"})
	}
	for _, st := range g.Strata(z) {
		y := layerSyms(st.Layer)
		if n := len(s.Layers); n == 0 || s.Layers[n-1] != st.Layer {
			s.Layers = append(s.Layers, st.Layer)
		}
		if st.Wet {
			s.Wet = true
			terms = append(terms, y.wet)
			s.In = append(s.In, trace.Value{Symbol: y.gs, V: st.Gamma, Unit: "kN/m3"}, trace.Value{Symbol: y.hw, V: st.H(), Unit: "m"})
		} else {
			terms = append(terms, y.dry)
			s.In = append(s.In, trace.Value{Symbol: y.g, V: st.Gamma, Unit: "kN/m3"}, trace.Value{Symbol: y.h, V: st.H(), Unit: "m"})
		}
	}
	if len(terms) > 0 {
		s.F = trace.Add(terms[0], terms[1:]...)
	}
	return s
}

// overburdenSyms are the symbols and terms of one layer in Overburden.
type overburdenSyms struct {
	dry, wet     trace.Expr // γ_i·h_i and γ_sat,i·h_w,i
	g, h, gs, hw string
}

// The terms of the first layers, made once (an Expr is immutable): the
// settlement engine writes σ_v0 at every sublayer of every point.
var (
	fxFlood  = trace.Mul(trace.S("gamma_w"), trace.S("h_w0"))
	overSyms [64]overburdenSyms
)

func init() {
	for i := range overSyms {
		overSyms[i] = newOverburdenSyms(i)
	}
}

func newOverburdenSyms(i int) overburdenSyms {
	d := strconv.Itoa(i + 1)
	s := overburdenSyms{g: "gamma_" + d, h: "h_" + d, gs: "gamma_sat," + d, hw: "h_w," + d}
	s.dry = trace.Mul(trace.S(s.g), trace.S(s.h))
	s.wet = trace.Mul(trace.S(s.gs), trace.S(s.hw))
	return s
}

// layerSyms returns the overburden symbols of layer i (0-based).
func layerSyms(i int) overburdenSyms {
	if i < len(overSyms) {
		return overSyms[i]
	}
	return newOverburdenSyms(i)
}
