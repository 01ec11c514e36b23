package site

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// RangeError reports an input outside its valid range. Value, Min and Max
// are in Unit (display units, e.g. kPa, deg), not SI, so the message reads
// as the engineer wrote the input. Where names the layer or footing.
type RangeError struct {
	Where   string
	Layer   int // 1-based index of the layer concerned; 0 when not a layer
	Param   string
	Value   float64
	Min     float64
	Max     float64
	Unit    string
	Reason  string // optional: why the range is what it is
	OpenMin bool   // Min itself is outside the range ("greater than")
}

func (e *RangeError) Error() string {
	var b strings.Builder
	if e.Where != "" {
		b.WriteString(e.Where)
		b.WriteString(": ")
	}
	u := e.Unit
	if u != "" {
		u = " " + u
	}
	// Said the way an engineer reads a limit: "B = 0 m: must be at
	// least 0.1 m", "phi' = 52 deg: must be at most 50 deg".
	fmt.Fprintf(&b, "%s = %s%s: ", e.Param, num(e.Value), u)
	switch {
	case e.Value != e.Value:
		b.WriteString("not a number")
	case e.Value < e.Min || (e.OpenMin && e.Value == e.Min):
		if e.OpenMin {
			fmt.Fprintf(&b, "must be greater than %s%s", num(e.Min), u)
		} else {
			fmt.Fprintf(&b, "must be at least %s%s", num(e.Min), u)
		}
	case e.Value > e.Max:
		fmt.Fprintf(&b, "must be at most %s%s", num(e.Max), u)
	default:
		fmt.Fprintf(&b, "must lie from %s to %s%s", num(e.Min), num(e.Max), u)
	}
	if e.Reason != "" {
		b.WriteString(" (")
		b.WriteString(e.Reason)
		b.WriteString(")")
	}
	return b.String()
}

func num(v float64) string { return strconv.FormatFloat(v, 'g', 6, 64) }

// InputError reports an input that is inconsistent rather than out of a
// numeric range (layers out of order, a missing required parameter).
type InputError struct {
	Where string
	Layer int // 1-based index of the layer concerned; 0 when not a layer
	Param string
	Msg   string
}

func (e *InputError) Error() string {
	s := e.Msg
	if e.Param != "" {
		s = e.Param + ": " + s
	}
	if e.Where != "" {
		s = e.Where + ": " + s
	}
	return s
}

// Errors is a list of input errors; it is returned as one error.
type Errors []error

func (l Errors) Error() string {
	parts := make([]string, len(l))
	for i, e := range l {
		parts[i] = e.Error()
	}
	return strings.Join(parts, "; ")
}

// Err returns nil for an empty list, else the list.
func (l Errors) Err() error {
	if len(l) == 0 {
		return nil
	}
	return l
}

// check appends a RangeError when v (SI) scaled by 1/scale lies outside
// [min, max] (display units). openMin excludes min itself.
func (l *Errors) check(where, param string, v, scale, min, max float64, openMin bool, unit string) {
	l.checkLayer(where, 0, param, v, scale, min, max, openMin, unit)
}

// Range is check for the engine packages: it appends a RangeError when v
// (SI) / scale is NaN, infinite or outside [min, max] (display units;
// openMin excludes min), and reports whether v was in range.
func (l *Errors) Range(where, param string, v, scale, min, max float64, openMin bool, unit string) bool {
	n := len(*l)
	l.checkLayer(where, 0, param, v, scale, min, max, openMin, unit)
	return len(*l) == n
}

// checkLayer is check for a parameter of layer n (1-based).
func (l *Errors) checkLayer(where string, n int, param string, v, scale, min, max float64, openMin bool, unit string) {
	d := v / scale
	if d < min || d > max || (openMin && d == min) || d != d || math.IsInf(d, 0) {
		*l = append(*l, &RangeError{Where: where, Layer: n, Param: param, Value: d, Min: min, Max: max, Unit: unit, OpenMin: openMin})
	}
}

// Unwrap lets errors.As and errors.Is reach each error of the list.
func (l Errors) Unwrap() []error { return l }
