package bearing

import (
	"math"

	"github.com/plinth-calc/plinth/calc/trace"
)

// terzaghiNg holds Terzaghi's Nγ for φ = 0°, 1°, …, 50° as evaluated
// numerically by Kumbhojkar (1993) and tabulated in Das, Principles of
// Foundation Engineering, 7th ed. (2011), Table 3.1. The values were
// transcribed from memory of that table and have since been confirmed,
// every degree from 1° to 50°, by an independent log-spiral evaluation of
// Kumbhojkar's mechanism (bearing_test TestKumbhojkarLogSpiral: agreement
// to the printed two decimals, 28° within 0.05 %). Terzaghi's own (1943)
// chart values, still found in older tables (e.g. 19.7 at 30°, 100.4 at
// 40°), are a different published set: plinth uses Kumbhojkar's.
var terzaghiNg = [...]float64{
	0.00, 0.01, 0.04, 0.06, 0.10, 0.14, 0.20, 0.27, 0.35, 0.44, // 0–9
	0.56, 0.69, 0.85, 1.04, 1.26, 1.52, 1.82, 2.18, 2.59, 3.07, // 10–19
	3.64, 4.31, 5.09, 6.00, 7.08, 8.34, 9.84, 11.60, 13.70, 16.18, // 20–29
	19.13, 22.65, 26.87, 31.94, 38.04, 45.41, 54.36, 65.27, 78.61, 95.03, // 30–39
	115.31, 140.51, 171.99, 211.56, 261.60, 325.34, 407.11, 512.84, 650.67, 831.99, // 40–49
	1072.80, // 50
}

// TerzaghiNgamma returns Terzaghi's Nγ at φ (radians) by linear
// interpolation in the Kumbhojkar (1993) table (Das 2011, Table 3.1),
// 0 ≤ φ ≤ 50°.
func TerzaghiNgamma(phi float64) float64 {
	d := phi * 180 / math.Pi
	if d != d {
		return math.NaN()
	}
	if d <= 0 {
		return 0
	}
	if d >= 50 {
		return terzaghiNg[50]
	}
	i := int(d)
	f := d - float64(i)
	return terzaghiNg[i] + f*(terzaghiNg[i+1]-terzaghiNg[i])
}

// kpTanDelta holds Kp·tanδ = Ks·tanφ′ of the granular upper layer for
// φ′ = 35°, 40°, 45° (BR 470, 2004, Table A2, derived there from Meyerhof
// & Hanna 1978). First quoted from memory; confirmed against two
// independent public reproductions of BR 470 Table A2 (3.1, 5.5, 10.0).
// That they lie on the low, conservative side of Meyerhof & Hanna's chart
// (as for a very weak lower layer, q2/q1 → 0) is plinth's reading, not
// checked against the chart.
var kpTanDelta = [3]float64{3.1, 5.5, 10.0}

// KpTanDelta returns Ks·tanφ′ at φ′ (radians), interpolating ln(Kp·tanδ)
// linearly in φ′ between the BR 470 values and extrapolating the same line
// outside 35°–45° (the caller raises a caution there). Linear
// interpolation of the values themselves, as some design aids do, gives
// slightly more between the nodes (4.30 against 4.13 at 37.5°); the
// log-linear reading is the lower.
func KpTanDelta(phi float64) float64 {
	d := phi * 180 / math.Pi
	x := (d - 35) / 5 // 0 at 35°, 1 at 40°, 2 at 45°
	i := int(math.Floor(x))
	if i < 0 {
		i = 0
	}
	if i > 1 {
		i = 1
	}
	l0, l1 := math.Log(kpTanDelta[i]), math.Log(kpTanDelta[i+1])
	return math.Exp(l0 + (x-float64(i))*(l1-l0))
}

// CaRatio returns Meyerhof & Hanna's adhesion ratio ca/c1 for a bearing
// ratio q2/q1 in [0, 1], read as the straight line from 0.6 at q2/q1 = 0
// to 1.0 at q2/q1 = 1 (plinth's reading of their chart, from memory, not
// confirmed against the chart; use Options.CaRatio to enter a value read
// from it). A published worked example suggests the line is on the low,
// safe side: Murthy, Geotechnical Engineering (2002), Example 12.17 (stiff
// over medium clay, q2/q1 = 0.23, q_u = 623 kPa) implies ca/c1 of about
// 0.83 where this line gives 0.69 (back-calculated from Das's rectangular
// form; the chart reading itself is not printed in the reproduction).
//
// It is the formula the two-layer working prints for r_a, evaluated.
func CaRatio(q2q1 float64) float64 {
	v, err := trace.Eval(fRa, []trace.Value{{Symbol: "r_q", V: q2q1}})
	if err != nil {
		return math.NaN()
	}
	return v
}
