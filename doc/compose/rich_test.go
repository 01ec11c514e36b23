package compose

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// TestRichText: symbols in sheet notation inside plinth's own text print
// as math, option words in the code face, everything else as text, and
// every run is marked as plinth's own.
func TestRichText(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"s = m_v Δσ′ H", "text(s = ) math(m_{v}) text( Δσ′ H)"},
		{"Eu+mv or E' (drained)", "text(Eu+mv or ) math(E′) text( (drained))"},
		{"gamma_w and phi' here", "math(γ_{w}) text( and ) math(φ′) text( here)"},
		{"[C_1 and C_2]", "text([) math(C_{1}) text( and ) math(C_{2}) text(])"},
		{"consider local_shear = yes", "text(consider ) code(local_shear) text( = yes)"},
		{"the layers' data, B's width, Terzaghi's", "text(the layers' data, B's width, Terzaghi's)"},
		{"inverse of U(T_v)", "text(inverse of U() math(T_{v}) text())"},
	} {
		got := ""
		for i, r := range richText(c.in, layout.Regular) {
			if !r.Own {
				t.Errorf("%q: run %d not marked Own", c.in, i)
			}
			if i > 0 {
				got += " "
			}
			switch {
			case r.Math != nil:
				got += "math(" + eqn.String(r.Math) + ")"
			case r.Style == layout.Mono:
				got += "code(" + r.Text + ")"
			default:
				got += "text(" + r.Text + ")"
			}
		}
		if got != c.want {
			t.Errorf("richText(%q)\n got %s\nwant %s", c.in, got, c.want)
		}
	}
}

// TestPlainSym: a chart label prints a symbol's subscript in the font's
// subscript characters, or with the sheet's underscore when a letter has
// none (Unicode's subscript letters: a e h i j k l m n o p r s t u v x).
func TestPlainSym(t *testing.T) {
	for in, want := range map[string]string{
		"c_u": "cᵤ", "phi'": "φ′", "sigma'_v0": "σ′ᵥ₀", "N_q": "N_q", "B": "B", "q_ult": "qᵤₗₜ",
	} {
		if got := plainSym(in); got != want {
			t.Errorf("plainSym(%q) = %q, want %q", in, got, want)
		}
	}
}
