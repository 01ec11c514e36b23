package chart_test

import (
	"math"

	"github.com/plinth-calc/plinth/doc/chart"
)

// The demo charts: an invented pad footing at an invented site, with
// numbers of the right size (not checked calculations).

// boussinesqCentre is the vertical stress under the centre of a uniformly
// loaded B × L rectangle at depth z, as a fraction of the pressure: four
// times the corner value, Fadum's closed form as given by Craig, Soil
// Mechanics, 7th ed., §5.2 (from memory; demo data only).
func boussinesqCentre(b, l, z float64) float64 {
	if z <= 0 {
		return 1
	}
	m, n := b/2/z, l/2/z
	s := m*m + n*n + 1
	a := 2 * m * n * math.Sqrt(s) / (s + m*m*n*n) * (s + 1) / s
	d := s - m*m*n*n
	t := math.Atan(2 * m * n * math.Sqrt(s) / d)
	if d < 0 {
		t += math.Pi
	}
	return 4 * (a + t) / (4 * math.Pi)
}

func stressDepth() chart.Chart {
	const B, L, D, q, water = 2.4, 3.0, 1.0, 165.0, 2.0
	layers := []struct {
		name   string
		top    float64
		g, gs  float64
		bottom float64
	}{{"Made ground", 0, 18, 18, 0.6}, {"Firm clay", 0.6, 19, 20, 5.0}, {"Dense sand", 5.0, 20, 21, 12}}
	sv := func(z float64) float64 {
		s := 0.0
		for _, ly := range layers {
			top, bot := ly.top, math.Min(ly.bottom, z)
			if bot <= top {
				continue
			}
			dry := math.Max(0, math.Min(bot, water)-top)
			s += ly.g*dry + ly.gs*(bot-top-dry)
		}
		return s - 9.81*math.Max(0, z-water)
	}
	var z, s0, ds, sf []float64
	for d := D; d <= 9.0001; d += 0.25 {
		z = append(z, d)
		s0 = append(s0, sv(d))
		net := q - sv(D)
		ds = append(ds, net*boussinesqCentre(B, L, d-D))
		sf = append(sf, sv(d)+net*boussinesqCentre(B, L, d-D))
	}
	var z0, sv0 []float64
	for d := 0.0; d <= D+1e-9; d += 0.25 {
		z0, sv0 = append(z0, d), append(sv0, sv(d))
	}
	return chart.Chart{W: 360, H: 330, Title: "Stresses below the centre of pad P1",
		X: chart.Axis{Title: "Vertical stress (kPa)", Opposite: true, Min: chart.At(0)},
		Y: chart.Axis{Title: "Depth below ground level (m)", Reverse: true, Min: chart.At(0), Max: chart.At(9)},
		Series: []chart.Series{
			{Name: "σ′v0 in situ", X: append(sv0, s0...), Y: append(z0, z...), Style: chart.Lines},
			{Name: "Δσ from the footing", X: ds, Y: z},
			{Name: "σ′f final", X: sf, Y: z, Emphasis: true},
		},
		Guides: []chart.Guide{{OnY: true, Value: 0, Label: "Made ground", Faint: true}, {OnY: true, Value: 0.6, Label: "Firm clay", Faint: true},
			{OnY: true, Value: 5.0, Label: "Dense sand", Faint: true}, {OnY: true, Value: D, Label: "underside of footing"}},
	}
}

// consolidation is Terzaghi's average degree of consolidation U(T_v).
func consolidation(tv float64) float64 {
	u := 1.0
	for m := 0; m < 60; m++ {
		M := math.Pi * float64(2*m+1) / 2
		u -= 2 / (M * M) * math.Exp(-M*M*tv)
	}
	return u
}

func settlementTime() chart.Chart {
	const sc, cv, hd = 31.0, 3.0 / 365.25, 2.2 // mm, m²/day, m
	var t, s []float64
	for k := 0.0; k <= 5.0001; k += 0.125 {
		d := math.Pow(10, k)
		t = append(t, d)
		s = append(s, sc*consolidation(cv*d/(hd*hd)))
	}
	t50 := 0.197 * hd * hd / cv
	t90 := 0.848 * hd * hd / cv
	return chart.Chart{W: 420, H: 250,
		X:      chart.Axis{Title: "Time after loading (log scale)", Log: true, Ticks: chart.TimeTicks(1, 1e5)},
		Y:      chart.Axis{Title: "Settlement (mm)", Reverse: true, Min: chart.At(0)},
		Series: []chart.Series{{Name: "consolidation settlement, Firm clay", X: t, Y: s, Style: chart.Lines}},
		Guides: []chart.Guide{{OnY: true, Value: 25, Label: "limit 25 mm"}},
		Notes: []chart.Annotation{{X: t50, Y: sc / 2, Text: "t₅₀ = 0.66 yr", Guides: true},
			{X: t90, Y: 0.9 * sc, Text: "t₉₀ = 2.8 yr", Guides: true}},
	}
}

func capacity() chart.Chart {
	var b, qb, qs []float64
	for w := 1.0; w <= 4.0001; w += 0.25 {
		b = append(b, w)
		qb = append(qb, 95+62*w)
		qs = append(qs, 610/math.Pow(w, 0.85))
	}
	bear := chart.Series{Name: "bearing resistance", X: b, Y: qb}
	sett := chart.Series{Name: "settlement 25 mm", X: b, Y: qs}
	// the envelope and where each limit governs, as an engine gives them
	// (the curves cross where 95 + 62w = 610/w^0.85, by bisection)
	env := chart.Series{Name: "governing (lower)", Style: chart.Band, X: b}
	for i := range b {
		env.Y = append(env.Y, math.Min(qb[i], qs[i]))
	}
	lo, hi := 1.0, 4.0
	for range 60 {
		if m := (lo + hi) / 2; 95+62*m < 610/math.Pow(m, 0.85) {
			lo = m
		} else {
			hi = m
		}
	}
	regs := []chart.Region{{From: 1, To: lo, Label: "bearing resistance governs"}, {From: lo, To: 4, Label: "settlement 25 mm governs"}}
	return chart.Chart{W: 420, H: 260,
		X:       chart.Axis{Title: "Footing width B (m)"},
		Y:       chart.Axis{Title: "Allowable net pressure (kPa)", Min: chart.At(0)},
		Series:  []chart.Series{env, bear, sett},
		Regions: regs,
		Guides:  []chart.Guide{{Value: 2.4, Label: "B = 2.4 m"}},
	}
}

func many() chart.Chart {
	c := chart.Chart{W: 300, H: 200, Title: "Six curves",
		X: chart.Axis{Title: "x (m)"}, Y: chart.Axis{Title: "y (kN)"}}
	for k := 0; k < 6; k++ {
		s := chart.Series{Name: "curve " + string(rune('A'+k))}
		for x := -0.5; x <= 3.0001; x += 0.5 {
			s.X = append(s.X, x)
			s.Y = append(s.Y, float64(k)*0.8+x*x*0.3-x*0.2)
		}
		c.Series = append(c.Series, s)
	}
	return c
}

func single() chart.Chart {
	return chart.Chart{W: 200, H: 140, X: chart.Axis{Title: "x"}, Y: chart.Axis{Title: "y", Log: true},
		Series: []chart.Series{{Name: "one point", X: []float64{0.3}, Y: []float64{50}}}}
}

// opposite exercises the other placements: x along the top and reversed,
// y at the right on a log scale, regions under the plot, a note.
func opposite() chart.Chart {
	var x, y []float64
	for k := 0.0; k <= 10; k++ {
		x = append(x, k)
		y = append(y, 3*math.Pow(10, k/4))
	}
	return chart.Chart{W: 320, H: 220,
		X:       chart.Axis{Title: "Distance from the wall (m)", Opposite: true, Reverse: true},
		Y:       chart.Axis{Title: "Pressure (kPa)", Opposite: true, Log: true},
		Series:  []chart.Series{{Name: "pressure", X: x, Y: y, Marker: chart.Diamond}},
		Regions: []chart.Region{{From: 0, To: 4, Label: "near"}, {From: 4, To: 10, Label: "far"}},
		Notes:   []chart.Annotation{{X: 4, Y: 30, Text: "change at 4 m"}},
		Guides:  []chart.Guide{{OnY: true, Value: 100, Label: "100 kPa"}},
	}
}
