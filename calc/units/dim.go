package units

import (
	"strconv"
	"strings"
)

// Dim is a dimension: the exponents of length (L), mass (M), time (T) and
// plane angle (A). Angle is kept as a dimension of its own, although SI
// treats it as dimensionless, so that the trigonometric functions can insist
// on an angle: tan(30) is an error while tan(30 deg) is right.
type Dim struct{ L, M, T, A int8 }

// None is the dimension of a pure number.
var None Dim

// Common dimensions, named for the engine and the tests.
var (
	Length      = Dim{L: 1}
	Area        = Dim{L: 2}
	Volume      = Dim{L: 3}
	Mass        = Dim{M: 1}
	Time        = Dim{T: 1}
	Angle       = Dim{A: 1}
	Force       = Dim{L: 1, M: 1, T: -2}
	Pressure    = Dim{L: -1, M: 1, T: -2} // stress, pressure, modulus
	UnitWeight  = Dim{L: -2, M: 1, T: -2} // force per volume
	LineLoad    = Dim{M: 1, T: -2}        // force per length
	Moment      = Dim{L: 2, M: 1, T: -2}  // force times length
	Compliance  = Dim{L: 1, M: -1, T: 2}  // 1/pressure, e.g. m_v
	Diffusivity = Dim{L: 2, T: -1}        // area per time, e.g. c_v
	Velocity    = Dim{L: 1, T: -1}
	Accel       = Dim{L: 1, T: -2} // acceleration, e.g. g
	Density     = Dim{L: -3, M: 1} // mass per volume (t/m3 = Mg/m3)
)

// IsNone reports whether d is dimensionless.
func (d Dim) IsNone() bool { return d == None }

// Mul returns the dimension of a product. Exponents wrap silently beyond
// the range of int8; use MulOK where inputs are not trusted.
func (d Dim) Mul(e Dim) Dim { r, _ := d.MulOK(e); return r }

// Div returns the dimension of a quotient (wrapping like Mul).
func (d Dim) Div(e Dim) Dim { r, _ := d.DivOK(e); return r }

// Pow returns the dimension of d raised to the integer n (wrapping like Mul).
func (d Dim) Pow(n int) Dim { r, _ := d.PowOK(n); return r }

// MulOK is Mul that reports false when an exponent leaves [-127, 127].
func (d Dim) MulOK(e Dim) (Dim, bool) {
	return fromInts(int(d.L)+int(e.L), int(d.M)+int(e.M), int(d.T)+int(e.T), int(d.A)+int(e.A))
}

// DivOK is Div that reports false when an exponent leaves [-127, 127].
func (d Dim) DivOK(e Dim) (Dim, bool) {
	return fromInts(int(d.L)-int(e.L), int(d.M)-int(e.M), int(d.T)-int(e.T), int(d.A)-int(e.A))
}

// PowOK is Pow that reports false when an exponent leaves [-127, 127].
func (d Dim) PowOK(n int) (Dim, bool) {
	if n > 127 || n < -127 {
		if d == None {
			return None, true
		}
		return None, false
	}
	return fromInts(int(d.L)*n, int(d.M)*n, int(d.T)*n, int(d.A)*n)
}

// Root returns the dimension whose n-th power is d; false when an exponent
// of d is not divisible by n (the square root of m3, say) or n < 1.
func (d Dim) Root(n int) (Dim, bool) {
	if n < 1 {
		return None, false
	}
	if int(d.L)%n != 0 || int(d.M)%n != 0 || int(d.T)%n != 0 || int(d.A)%n != 0 {
		return None, false
	}
	return Dim{L: int8(int(d.L) / n), M: int8(int(d.M) / n), T: int8(int(d.T) / n), A: int8(int(d.A) / n)}, true
}

func fromInts(l, m, t, a int) (Dim, bool) {
	ok := in8(l) && in8(m) && in8(t) && in8(a)
	return Dim{L: int8(l), M: int8(m), T: int8(t), A: int8(a)}, ok
}

func in8(x int) bool { return x >= -127 && x <= 127 }

// String writes the dimension as base symbols with powers, for example
// "L^-1 M T^-2" for a stress, "A" for an angle and "1" for a pure number.
func (d Dim) String() string {
	if d == None {
		return "1"
	}
	var b strings.Builder
	for i, e := range [4]int8{d.L, d.M, d.T, d.A} {
		if e == 0 {
			continue
		}
		if b.Len() > 0 {
			b.WriteByte(' ')
		}
		b.WriteByte("LMTA"[i])
		if e != 1 {
			b.WriteByte('^')
			b.WriteString(strconv.Itoa(int(e)))
		}
	}
	return b.String()
}
