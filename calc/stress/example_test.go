package stress_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

func ExampleNewmark() {
	i, _ := stress.Newmark(1, 1)
	fmt.Printf("I(1, 1) = %.4f\n", i)
	// Output: I(1, 1) = 0.1752
}

func ExampleRect() {
	// Centre of a 2 m × 3 m rectangle, 1.5 m down.
	i, _ := stress.Rect(2, 3, 0, 0, 1.5)
	fmt.Printf("Δσ/q = %.4f\n", i)
	// Output: Δσ/q = 0.5803
}

func ExampleCircle() {
	axis, _ := stress.Circle(1, 0, 1)
	edge, _ := stress.Circle(1, 1, 1)
	fmt.Printf("axis %.3f, edge %.3f\n", axis, edge)
	// Output: axis 0.646, edge 0.332
}

func ExampleStrip() {
	i, _ := stress.Strip(2, 0, 2)
	fmt.Printf("Δσ/q = %.3f\n", i)
	// Output: Δσ/q = 0.550
}

func ExampleSpreadRect() {
	i, _ := stress.SpreadRect(2, 3, 1, stress.DefaultAngle) // 2:1
	fmt.Printf("Δσ/q = %.3f\n", i)
	// Output: Δσ/q = 0.500
}

func ExampleSpreadStrip() {
	i, _ := stress.SpreadStrip(1.5, 1.5, stress.DefaultAngle)
	fmt.Printf("Δσ/q = %.3f\n", i)
	// Output: Δσ/q = 0.500
}

func ExampleSpreadCircle() {
	i, _ := stress.SpreadCircle(2, 1, stress.DefaultAngle)
	fmt.Printf("Δσ/q = %.3f\n", i)
	// Output: Δσ/q = 0.444
}

func ExampleNet() {
	// 180 kPa gross at 1.2 m depth in ground of 18 kN/m³.
	fmt.Printf("q_net = %.1f kPa\n", stress.Net(180e3, 1.2*18e3)/1e3)
	// Output: q_net = 158.4 kPa
}

func ExampleInfluence() {
	f := site.Footing{Name: "P1", Shape: site.Rectangle, B: 2.4, L: 3, D: 1}
	for _, p := range []stress.Point{stress.Centre, stress.Characteristic, stress.Corner} {
		i, _ := stress.Influence(f, stress.Options{Point: p}, 2)
		fmt.Printf("%-14s %.4f\n", p, i)
	}
	// Output:
	// centre         0.4839
	// characteristic 0.3054
	// corner         0.2053
}

func ExampleExplain() {
	var t trace.Trace
	f := site.Footing{Shape: site.Square, B: 2, D: 1}
	ds, _ := stress.Explain(&t, f, stress.Options{}, 2, 100e3, "")
	for _, s := range t.Steps {
		fmt.Printf("%s = %.4g\n", s.Symbol, s.Value)
	}
	fmt.Println(trace.Verify(t, 1e-9) == nil, ds == t.Steps[len(t.Steps)-1].Value)
	// Output:
	// m = 0.5
	// n = 0.5
	// I_sigma = 0.08403
	// Delta_sigma = 3.361e+04
	// true true
}

func ExampleFunc() {
	f := site.Footing{Shape: site.Strip, B: 1.5}
	at, _ := stress.Func(f, stress.Options{})
	fmt.Printf("%.3f %.3f\n", at(0.75), at(3))
	// Output: 0.818 0.306
}

func ExampleParseMethod() {
	m, ok := stress.ParseMethod("2:1")
	fmt.Println(m, ok)
	// Output: spread true
}

func ExampleOffset() {
	f := site.Footing{Shape: site.Rectangle, B: 2, L: 3}
	x, y := stress.Offset(f, stress.Characteristic)
	fmt.Printf("x = %.2f m, y = %.2f m\n", x, y)
	// Output: x = 0.74 m, y = 1.11 m
}

func ExampleParsePoint() {
	p, ok := stress.ParsePoint("characteristic")
	fmt.Println(p, ok)
	// Output: characteristic true
}
