package chart

import (
	"github.com/plinth-calc/plinth/calc/units"
	"math"
	"strconv"
	"strings"
)

// Tick is a tick mark on an axis; Label "" draws the mark without a label.
type Tick struct {
	V     float64
	Label string
}

// Scale is an axis resolved against its data: the range drawn, the major
// ticks with their labels and, on a log axis, the minor ticks (2…9 in each
// decade).
type Scale struct {
	Min, Max float64
	Log      bool
	Step     float64 // tick step of a linear axis; 0 on a log axis
	Major    []Tick
	Minor    []float64
}

// relative tolerance for "is this a multiple of the step"
const eps = 1e-9

// Scale resolves a over data spanning lo…hi with at most n labelled
// intervals. Ends the axis leaves automatic (Min or Max nil) are widened to
// the next tick (a linear axis) or decade (a log axis); given ends are kept.
// A linear axis whose data lie on one side of zero, reaching within a
// factor of two of it (lo ≤ hi/2), starts from zero.
// Steps are 1, 2, 2.5 or 5 × 10ⁿ. A single value, or all values equal,
// gives a range around it. A value ≤ 0 on a log axis, a non-finite value,
// or Min ≥ Max is an *Error.
func (a Axis) Scale(lo, hi float64, n int) (Scale, error) { return a.scale(lo, hi, n, "axis") }

func (a Axis) scale(lo, hi float64, n int, where string) (Scale, error) {
	for _, v := range []struct {
		p string
		x *float64
	}{{"Min", a.Min}, {"Max", a.Max}} {
		if v.x == nil {
			continue
		}
		if !finite(*v.x) {
			return Scale{}, &Error{Where: where, Param: v.p, Value: num(*v.x), Want: "must be a finite number"}
		}
		if a.Log && *v.x <= 0 {
			return Scale{}, &Error{Where: where, Param: v.p, Value: num(*v.x), Want: "must be > 0 on a log axis"}
		}
	}
	if a.Min != nil && a.Max != nil && *a.Min >= *a.Max {
		return Scale{}, &Error{Where: where, Param: "Min", Value: num(*a.Min), Want: "must be less than Max = " + num(*a.Max)}
	}
	if !finite(lo) || !finite(hi) {
		return Scale{}, &Error{Where: where, Param: "data range", Value: num(lo) + " to " + num(hi), Want: "must be finite"}
	}
	if lo > hi {
		lo, hi = hi, lo
	}
	if a.Min != nil {
		lo = *a.Min
	}
	if a.Max != nil {
		hi = *a.Max
	}
	if lo > hi { // a given end beyond all the data
		if a.Min != nil {
			hi = lo
		} else {
			lo = hi
		}
	}
	n = max(n, 1)
	var s Scale
	var err error
	if a.Log {
		s, err = logScale(lo, hi, n, a.Min != nil, a.Max != nil, where)
	} else {
		s = linScale(lo, hi, n, a.Min != nil, a.Max != nil)
	}
	if err != nil {
		return Scale{}, err
	}
	if a.Ticks != nil {
		s.Major = s.Major[:0]
		for _, t := range a.Ticks {
			if t.V >= s.Min-eps*math.Abs(s.Min) && t.V <= s.Max+eps*math.Abs(s.Max) {
				s.Major = append(s.Major, t)
			}
		}
	}
	return s, nil
}

func linScale(lo, hi float64, n int, fixLo, fixHi bool) Scale {
	// data reaching within a factor of two of zero are drawn from zero
	if !fixLo && lo > 0 && lo <= hi/2 {
		lo = 0
	}
	if !fixHi && hi < 0 && hi >= lo/2 {
		hi = 0
	}
	if hi-lo <= 1e-12*math.Max(math.Abs(lo), math.Abs(hi)) {
		d := math.Abs(lo) / 2
		if d == 0 {
			d = 1
		}
		switch {
		case !fixLo && !fixHi:
			lo, hi = lo-d, hi+d
		case !fixHi:
			hi += 2 * d
		default:
			lo -= 2 * d
		}
	}
	step := niceStep(lo, hi, n, fixLo, fixHi)
	if !fixLo {
		lo = math.Floor(lo/step+eps) * step
	}
	if !fixHi {
		hi = math.Ceil(hi/step-eps) * step
	}
	s := Scale{Min: lo, Max: hi, Step: step}
	d := decimals(step)
	for i := math.Ceil(lo/step - eps); i <= math.Floor(hi/step+eps); i++ {
		v := i * step
		s.Major = append(s.Major, Tick{V: v, Label: fixed(v, d)})
	}
	return s
}

// niceStep is the smallest step of 1, 2, 2.5 or 5 × 10ᵏ giving at most n
// intervals over lo…hi (after widening the automatic ends).
func niceStep(lo, hi float64, n int, fixLo, fixHi bool) float64 {
	k := math.Floor(math.Log10((hi-lo)/float64(n))) - 1
	for ; ; k++ {
		p := math.Pow(10, k)
		for _, m := range []float64{1, 2, 2.5, 5} {
			step := m * p
			a, b := lo/step, hi/step
			if fixLo {
				a = math.Ceil(a - eps)
			} else {
				a = math.Floor(a + eps)
			}
			if fixHi {
				b = math.Floor(b + eps)
			} else {
				b = math.Ceil(b - eps)
			}
			if b-a <= float64(n) {
				return step
			}
		}
	}
}

// decimals is the number of decimals that print multiples of step exactly.
func decimals(step float64) int {
	for d := 0; d < 12; d++ {
		x := step * math.Pow(10, float64(d))
		if math.Abs(x-math.Round(x)) <= 1e-6*x {
			return d
		}
	}
	return 12
}

// fixed formats v with d decimals by the document's one rule
// (units.Printed): a true minus sign and no "−0".
func fixed(v float64, d int) string { return units.Printed(v, units.Dimensionless, d) }

// pow10 is 10ᵏ, exactly as the decimal literal 1ek reads.
func pow10(k int) float64 {
	v, _ := strconv.ParseFloat("1e"+strconv.Itoa(k), 64)
	return v
}

func logScale(lo, hi float64, n int, fixLo, fixHi bool, where string) (Scale, error) {
	if lo <= 0 {
		return Scale{}, &Error{Where: where, Param: "data", Value: num(lo), Want: "must be > 0 on a log axis"}
	}
	if hi/lo < 1+1e-9 {
		switch {
		case !fixLo && !fixHi:
			lo, hi = lo/10, hi*10
		case !fixHi:
			hi *= 10
		default:
			lo /= 10
		}
	}
	k0 := int(math.Floor(math.Log10(lo) + eps))
	k1 := int(math.Ceil(math.Log10(hi) - eps))
	if !fixLo {
		lo = pow10(k0)
	}
	if !fixHi {
		hi = pow10(k1)
	}
	if k1 <= k0 {
		k1 = k0 + 1
	}
	in := func(v float64) bool { return v >= lo*(1-eps) && v <= hi*(1+eps) }
	s := Scale{Min: lo, Max: hi, Log: true}
	// Major ticks at the decades; a range of less than about two decades
	// also labels 2 and 5, and one within a decade labels every digit.
	var major []float64
	for _, mant := range [][]float64{{1}, {1, 2, 5}, {1, 2, 3, 4, 5, 6, 7, 8, 9}} {
		major = major[:0]
		for k := k0; k <= k1; k++ {
			for _, m := range mant {
				if v := m * pow10(k); in(v) {
					major = append(major, v)
				}
			}
		}
		if len(major) >= 3 || (len(major) >= 2 && len(mant) > 1) {
			break
		}
	}
	every := 1
	if len(major) > n+1 {
		every = (len(major) + n - 1) / n
	}
	isMajor := map[float64]bool{}
	for i, v := range major {
		t := Tick{V: v}
		if i%every == 0 {
			t.Label = logLabel(v)
		}
		s.Major = append(s.Major, t)
		isMajor[v] = true
	}
	for k := k0; k <= k1; k++ {
		for m := 2; m <= 9; m++ {
			if v := float64(m) * pow10(k); in(v) && !isMajor[v] {
				s.Minor = append(s.Minor, v)
			}
		}
	}
	return s, nil
}

var superDigits = []rune("⁰¹²³⁴⁵⁶⁷⁸⁹")

// logLabel prints m × 10ᵏ plainly from 0.0001 to 100000, else as 10ᵏ (or
// m×10ᵏ) with a superscript exponent.
func logLabel(v float64) string {
	k := int(math.Floor(math.Log10(v) + eps))
	m := math.Round(v / pow10(k))
	if k >= -4 && k <= 5 {
		return fixed(v, max(0, -k))
	}
	var b strings.Builder
	if m != 1 {
		b.WriteString(strconv.Itoa(int(m)))
		b.WriteString("×")
	}
	b.WriteString("10")
	if k < 0 {
		b.WriteString("⁻")
		k = -k
	}
	for _, c := range strconv.Itoa(k) {
		b.WriteRune(superDigits[c-'0'])
	}
	return b.String()
}

// TimeTicks returns major ticks for a log time axis in days spanning lo…hi:
// 0.1, 1, 10 and 100 days labelled "0.1 d" … "100 d", then 1, 10, 100 …
// years (365.25 days) labelled "1 yr", "10 yr" …. Use them as Axis.Ticks.
func TimeTicks(lo, hi float64) []Tick {
	var ts []Tick
	for k := -3; k <= 2; k++ {
		v := pow10(k)
		if v >= lo*(1-eps) && v <= hi*(1+eps) {
			ts = append(ts, Tick{V: v, Label: fixed(v, max(0, -k)) + " d"})
		}
	}
	for k := 0; k <= 5; k++ {
		v := 365.25 * pow10(k)
		if v >= lo*(1-eps) && v <= hi*(1+eps) {
			ts = append(ts, Tick{V: v, Label: fixed(pow10(k), 0) + " yr"})
		}
	}
	return ts
}

// frac is v's position along the scale, 0 at Min and 1 at Max.
func (s Scale) frac(v float64) float64 {
	if s.Log {
		return math.Log10(v/s.Min) / math.Log10(s.Max/s.Min)
	}
	return (v - s.Min) / (s.Max - s.Min)
}

func (s Scale) contains(v float64) bool {
	t := 1e-9 * math.Max(math.Abs(s.Min), math.Abs(s.Max))
	return v >= s.Min-t && v <= s.Max+t
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

func num(v float64) string { return strconv.FormatFloat(v, 'g', 6, 64) }
