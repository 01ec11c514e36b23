package settle_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestNotVerifiedWithoutData: a layer in the zone of influence without
// the data its method needs makes the check NOT OK with the reason, never
// "0 mm, OK" (issue: no pass without data). Inputs are invented; the
// rule is plinth's (a check cannot pass on a layer it could not compute).
func TestNotVerifiedWithoutData(t *testing.T) {
	clay := func(l site.Layer) site.Ground {
		l.Name, l.Top, l.Gamma = "Clay", 0, 19e3
		l.Cu = site.Some(60e3)
		return site.Ground{Name: "g", Layers: []site.Layer{l}}
	}
	sand := func(l site.Layer) site.Ground {
		l.Name, l.Top, l.Gamma, l.Type = "Sand", 0, 19e3, site.Coarse
		l.Phi = site.Some(32 * 3.141592653589793 / 180)
		return site.Ground{Name: "g", Layers: []site.Layer{l}}
	}
	pad := site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}
	yr := 365.25 * 86400.0
	for _, c := range []struct {
		name   string
		in     settle.Input
		reason string // "" when the check is verified
	}{
		{"clay without stiffness", settle.Input{Ground: clay(site.Layer{}), Footing: pad, V: site.Some(400e3)}, "Clay has no E_u, E′, m_v or C_c"},
		{"clay with m_v, no c_v, no times", settle.Input{Ground: clay(site.Layer{Mv: site.Some(0.1e-6), Eu: site.Some(20e6)}), Footing: pad, V: site.Some(400e3)}, ""},
		{"clay with m_v, no c_v, times asked", settle.Input{Ground: clay(site.Layer{Mv: site.Some(0.1e-6), Eu: site.Some(20e6)}), Footing: pad, V: site.Some(400e3), Times: []float64{yr}}, "Clay has no c_v for the time curve asked for"},
		{"Schmertmann without E′ or q_c", settle.Input{Ground: sand(site.Layer{}), Footing: pad, V: site.Some(400e3), Method: settle.Schmertmann}, "Sand has no E′ or q_c for Schmertmann's method"},
		{"Schmertmann with q_c", settle.Input{Ground: sand(site.Layer{Qc: site.Some(8e6)}), Footing: pad, V: site.Some(400e3), Method: settle.Schmertmann}, ""},
	} {
		t.Run(c.name, func(t *testing.T) {
			r := mustCompute(t, c.in)
			got := strings.Join(r.Unverified, "; ")
			switch {
			case c.reason == "" && (got != "" || !r.OK):
				t.Errorf("unverified %q, OK %v; want verified", got, r.OK)
			case c.reason != "" && (r.OK || !strings.Contains(got, c.reason)):
				t.Errorf("unverified %q, OK %v; want NOT OK for %q", got, r.OK, c.reason)
			}
			if c.reason != "" {
				found := false
				for _, ca := range r.Trace.Cautions {
					found = found || ca.Code == "not-verified"
				}
				if !found {
					t.Error("no not-verified caution")
				}
			}
		})
	}
}
