// Package units holds quantities as SI float64 values with a dimension
// vector, reads unit names, and chooses display units. It is shared by the
// engine (calc/...) and the document pipeline (doc/...).
//
// # Dimensions
//
// A Dim counts the powers of length L, mass M, time T and plane angle A.
// Angle is a dimension of its own (SI calls it dimensionless) so that the
// trigonometric functions can demand one: tan(30 deg) is right, tan(30) is
// an error. Internally every angle is in radians.
//
// # Unit grammar
//
// Parse reads this grammar (EBNF; spaces are allowed only around the whole):
//
//	unit    = "" | "-" | [ "1" "/" ] factor { op factor } .
//	op      = "*" | "·" | "/" .
//	factor  = name [ power ] .
//	power   = "^" [ "-" | "+" ] digits | digits | "²" | "³" .
//	name    = one of the names below .
//
// Operators apply strictly left to right, as written: "a/b*c" is (a/b)·c
// and "kN/m/s" is kN/(m·s). Only the right-hand factor of a "/" is divided.
// A trailing digit is a power ("m3" is m³). Powers run from -9 to 9.
//
// Names (an explicit table; there is no general SI prefix rule, so "min" is
// always a minute and an unknown name gets a "did you mean" suggestion):
//
//	length    m mm cm km
//	force     N kN MN
//	stress    Pa kPa MPa GPa
//	moment    kNm MNm            (kN·m; also written kN*m, kN·m)
//	mass      kg g Mg t          (t is the tonne, 1000 kg)
//	angle     rad deg °
//	time      s min h day days week weeks month months yr year years
//	ratio     %                  (0.01); "" or "-" for a pure number
//
// yr is the Julian year of exactly 365.25 days (31 557 600 s), the year
// astronomers use (IAU, from memory); consolidation coefficients in m2/yr
// use it. NIST SP 811 (2008) B.8 lists only the 365-day, sidereal and
// tropical years, so its day factor is the check (unit_test.go). month is
// 1/12 of that year, exactly 30.4375 days (2 629 800 s). Derived units are
// written by composition: kN/m3, kN/m^3, kN/m³, m2/yr, cm2/s, m2/MN, 1/kPa,
// kN/m (strip line load), kNm/m, kN/m2.
//
// A parsed unit's Name is canonical: "*" for "·", trailing digits for
// positive powers and "^-n" for negative ones, so "kN/m^3", "kN/m³" and
// "kN/m3" all read back as "kN/m3".
//
// # Display
//
// Display picks the unit a value is shown in when the sheet names none; SI
// gives the coherent SI unit for machine output; Format writes a value with
// engineering precision. See their documentation for the tables.
package units
