package design_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

func ExampleLoads() {
	acts := []site.Action{
		{Name: "Dead", V: 950e3, MB: 60e3},
		{Name: "Imposed", Kind: site.Variable, V: 400e3, Psi0: site.Some(0.7)},
		{Name: "Wind", Kind: site.Variable, HB: 35e3, MB: 90e3, Psi0: site.Some(0.5)},
	}
	for _, l := range design.Loads(acts, design.DA1()) {
		fmt.Printf("%s: V_d %.1f kN, H_B_d %.2f kN\n", l.Name, l.V/1e3, l.HB/1e3)
	}
	// Output:
	// DA1-C1 · Imposed leading · G sup: V_d 1882.5 kN, H_B_d 26.25 kN
	// DA1-C1 · Wind leading · G sup: V_d 1702.5 kN, H_B_d 52.50 kN
	// DA1-C1 · Wind leading · G inf on V · left out as favourable: Imposed: V_d 950.0 kN, H_B_d 52.50 kN
	// DA1-C2 · Imposed leading · G sup: V_d 1470.0 kN, H_B_d 22.75 kN
	// DA1-C2 · Wind leading · G sup: V_d 1314.0 kN, H_B_d 45.50 kN
	// DA1-C2 · Wind leading · G inf · left out as favourable: Imposed: V_d 950.0 kN, H_B_d 45.50 kN
}

func ExampleLoad_Record() {
	acts := []site.Action{{Name: "Dead", V: 600e3}, {Name: "Imposed", Kind: site.Variable, V: 300e3}}
	l := design.Loads(acts, design.DA2())[0]
	var t trace.Trace
	l.Record(&t, acts, l.Name, "kN", "kNm")
	for _, s := range t.Steps {
		fmt.Printf("%s = %g\n", s.Symbol, s.Value)
	}
	// Output:
	// gamma_G_sup = 1.35
	// gamma_Q = 1.5
	// V_d = 1.26e+06
}

func ExampleParse() {
	for _, s := range []string{"DA1", "DA3", "FS(3)"} {
		ap, _ := design.Parse(s)
		fmt.Printf("%s: %d combination(s), allowable %v\n", ap.Name, len(ap.Combinations), ap.Allowable())
	}
	// Output:
	// DA1: 2 combination(s), allowable false
	// DA3: 1 combination(s), allowable false
	// FS(3): 1 combination(s), allowable true
}
