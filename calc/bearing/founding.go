package bearing

import (
	"fmt"
	"math"
	"regexp"

	"github.com/plinth-calc/plinth/calc/trace"
)

// thinRatio: an upper layer whose thickness below the base is less than
// this fraction of B is "much thinner than the footing" (common practice:
// Meyerhof & Hanna's two-layer mechanism is meant for an upper layer of
// some fraction of B or more, not a skin of fill).
const thinRatio = 0.25

var madeGround = regexp.MustCompile(`(?i)\b(made ground|fill|topsoil)\b`)

// founding raises the cautions about the stratum the footing is founded
// in: made ground (named so in the ground model: "made ground", "fill",
// "topsoil"), whose parameters are nominal; and an upper layer much
// thinner below the base than the footing is wide, where a two-layer
// mechanism through a few centimetres of it means little and the layer
// below governs.
func (c *calc) founding() {
	g, f := c.g, c.f
	i := c.fi
	name := c.lname[i]
	if madeGround.MatchString(g.Layers[i].Name) {
		c.warn("made-ground", trace.SevCaution, trace.Ref{}, fmt.Sprintf("The footing is founded in %s, made ground or fill: its strength and stiffness vary and it may hold voids or degradable matter, so the resistance computed from its nominal parameters is not assured; found on the natural ground below, or prove the fill by testing (common practice).", name),
			val("D", f.D, "m"))
	}
	if i+1 >= len(g.Layers) {
		return
	}
	h := g.Bottom(i) - f.D
	if h < thinRatio*f.B {
		c.warn("thin-founding-layer", trace.SevCaution, trace.Ref{}, fmt.Sprintf("The base is only %.2f m above %s, much less than B = %.2f m (under %.2f B): the founding layer is a thin skin, and any two-layer mechanism through it means little; the layer below governs. Found on it (set D to its top, %.2f m, or deeper) or check it as the founding layer.",
			h, c.lname[i+1], f.B, thinRatio, g.Layers[i+1].Top), val("H", h, "m"), val("B", f.B, "m"))
	}
}

// kDeltaNote describes the interface factor δ/φ′ of sliding: given, or
// assumed, default 1 (concrete cast in situ, EN 1997-1 6.5.3(10)).
func kDeltaNote(given bool) string {
	if given {
		return "δ/φ′ (1 for concrete cast in situ, 2/3 for smooth precast), given"
	}
	return "δ/φ′: assumed, default 1 (concrete cast in situ); give interface = precast or delta to change it"
}

// factorNotes states the rules of the factor set that the working would
// otherwise leave to the reader: depth factors of a method other than
// EN 1997-1 Annex D used with EN 1997-1 partial factors, and Meyerhof's
// (1963) shape and depth factors between φ′ = 0 and 10°.
func (c *calc) factorNotes() {
	m := c.opt.Method
	if (m == Meyerhof || m == Hansen || m == Vesic) && !c.ap.Allowable() && c.f.D > 0 {
		c.warn("depth-factors-ec7", trace.SevNote, trace.Ref{Source: trace.EN1997, Clause: "Annex D"}, fmt.Sprintf("The %s method's depth factors (d_c, d_q) are used with the EN 1997-1 partial factors (%s). Annex D has no depth factors, and the partial factors were set with its form: the depth factors add resistance from the soil above the base, which must be there for the life of the footing (not excavated, not softened). Use method = ec7 to leave them out.", m.Title(), c.ap.Name))
	}
	if m != Meyerhof {
		return
	}
	l := c.g.Layers[c.fi]
	// a design φ′_d = atan(tan φ′_k / 1.25) can fall to 10° from φ′_k ≈ 12.4°
	if l.Phi.Set && l.Phi.V > 0 && math.Tan(l.Phi.V) <= 1.25*math.Tan(10*degr) {
		c.warn("meyerhof-0-10", trace.SevNote, trace.Ref{Source: SrcMeyerhof1963, Clause: "shape and depth factors"}, fmt.Sprintf("Meyerhof (1963) gives s_q = s_γ = 1 + 0.1 K_p B/L and d_q = d_γ = 1 + 0.1 √K_p D/B for φ′ > 10° and 1 for φ′ = 0. Between the two (here %s, φ′_k = %.1f°), plinth takes 1 wherever the φ′ of a case is at most 10°: the lower value, with no interpolation.", c.lname[c.fi], l.Phi.V/degr),
			val("phi'_k", l.Phi.V, "deg"))
	}
}
