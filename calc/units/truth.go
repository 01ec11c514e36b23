package units

import (
	"math"
	"strconv"
)

// maxExtra bounds the digits Apart and Beside add: values closer than
// this cannot be told apart in print and are shown at the last attempt.
const maxExtra = 10

// Apart formats l and r (SI values of one dimension, both shown in u, with
// decimals dl and dr as in Format) so that the printed numbers stand in the
// same order as the values: a value below its limit never prints equal to
// it or above it, and one above never prints equal or below. Equal values
// print equal. Where the rules of Format would break this, both sides get
// one more digit at a time until it holds ("24.95" against "25", not "25"
// against "25").
func Apart(l, r float64, u Unit, dl, dr int) (ls, rs string) {
	want := cmp(l, r)
	for extra := 0; ; extra++ {
		ls, rs = format(l, u, dl, extra), format(r, u, dr, extra)
		if want == 0 || want == 2 || extra == maxExtra {
			return ls, rs
		}
		a, ea := strconv.ParseFloat(ls, 64)
		b, eb := strconv.ParseFloat(rs, 64)
		if ea != nil || eb != nil || cmp(a, b) == want {
			return ls, rs
		}
	}
}

// Beside formats v (SI, in u with decimals d as in Format) so that the
// printed number stands on the same side of each bound as v does: a
// value below a bound never prints equal to it or above it, one above
// never equal or below, one equal to it prints equal to it (25 mm shown in
// m to two decimals prints 0.025, not 0.03). Bounds are SI
// values of v's dimension, the values it is compared with; digits are
// added one at a time until every bound holds.
func Beside(v float64, bounds []float64, u Unit, d int) string {
	for extra := 0; ; extra++ {
		s := format(v, u, d, extra)
		x, err := strconv.ParseFloat(s, 64)
		if err != nil || extra == maxExtra {
			return s
		}
		ok := true
		for _, b := range bounds {
			want, bb := cmp(v, b), shown(b, u)
			if want == 0 && math.Abs(x-bb) <= 2e-3*math.Abs(bb) {
				continue // equal: printed equal to about the automatic rule's precision (0.333 for 1/3)
			}
			if want != 2 && cmp(x, bb) != want {
				ok = false
				break
			}
		}
		if ok {
			return s
		}
	}
}

// Utilisation writes a utilisation to two decimals ("0.57", "1.00"), with
// more where two would print it on or across 1: 0.996 prints "0.996",
// not "1.00"; 1.004 prints "1.004". NaN and infinities print as Format
// prints them.
func Utilisation(x float64) string { return Beside(x, []float64{1}, Dimensionless, 2) }

// Relation is the relation a check's two sides stand in when the check
// fails: the negation of op ("<=" fails as ">", ">=" as "<", "<" as ">=",
// ">" as "<=", "==" as "!="). A check that holds keeps op.
func Relation(op string, ok bool) string {
	if ok {
		return op
	}
	switch op {
	case "<=":
		return ">"
	case "<":
		return ">="
	case ">=":
		return "<"
	case ">":
		return "<="
	case "==":
		return "!="
	}
	return op
}

// shown is a bound in u, rounded to 12 significant figures so that a limit
// written as 25 mm compares as 25 and not as 25.000000000000004.
func shown(b float64, u Unit) float64 {
	x, _ := strconv.ParseFloat(strconv.FormatFloat(b/u.factor(), 'g', 12, 64), 64)
	return x
}

func cmp(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	case a == b:
		return 0
	}
	return 2 // unordered (NaN): no order to keep
}
