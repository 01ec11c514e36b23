package notation

import (
	"fmt"
	"testing"
)

// Symbol rows follow SHEET-FORMAT.md §2.
func TestCut(t *testing.T) {
	for _, r := range []struct {
		in, base string
		primes   int
		sub      string
	}{
		{"gamma_sat", "gamma", 0, "sat"},
		{"q_ult_net", "q", 0, "ult,net"},
		{"phi'_d", "phi", 1, "d"},
		{"phi'", "phi", 1, ""},
		{"sigma_v'", "sigma", 0, "v'"},
		{"gamma_phi'", "gamma", 0, "phi'"},
		{"B'", "B", 1, ""},
		{"c''", "c", 2, ""},
		{"F1.R_d", "F1.R", 0, "d"},
		{"F2_vesic.util", "F2_vesic.util", 0, ""},
		{"φ", "φ", 0, ""},
	} {
		b, p, s := cut(r.in)
		if b != r.base || p != r.primes || s != r.sub {
			t.Errorf("cut(%q) = %q %d %q, want %q %d %q", r.in, b, p, s, r.base, r.primes, r.sub)
		}
	}
	for in, want := range map[string]string{"gamma": "γ", "Gamma": "Γ", "phi": "φ", "sigma": "σ", "nu": "ν", "delta": "δ", "alpha": "α", "pi": "π", "Omega": "Ω", "psi": "ψ"} {
		if got, ok := Greek(in); !ok || got != want {
			t.Errorf("Greek(%q) = %q, %v", in, got, ok)
		}
	}
	if _, ok := Greek("q"); ok {
		t.Errorf("Greek(q) should be false")
	}
}

func ExampleSplit() {
	for _, name := range []string{"q_ult_net", "phi'_d", "gamma_sat", "F1.R_d", "sigma_v'", "gamma_phi'", "Delta_sigma'_v"} {
		p := Split(name)
		fmt.Printf("%s: prefix %q base %q primes %d sub %q\n", name, p.Prefix, p.Base, p.Primes, p.Sub)
	}
	// Output:
	// q_ult_net: prefix "" base "q" primes 0 sub "ult,net"
	// phi'_d: prefix "" base "φ" primes 1 sub "d"
	// gamma_sat: prefix "" base "γ" primes 0 sub "sat"
	// F1.R_d: prefix "F1" base "R" primes 0 sub "d"
	// sigma_v': prefix "" base "σ" primes 0 sub "v′"
	// gamma_phi': prefix "" base "γ" primes 0 sub "φ′"
	// Delta_sigma'_v: prefix "" base "Δσ" primes 1 sub "v"
}
