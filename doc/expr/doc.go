// Package expr reads plinth's statement lines and expressions, checks
// their dimensions and evaluates them.
//
// Every function takes the text and base, the file offset of its first
// byte; every token, node and Error carries file offsets [Pos, End).
// A line yields all the errors that can be found in it (the parser
// recovers at ")", ",", "->", "#" and the end of the line), sorted by
// position, each saying what was expected.
//
// # Grammar
//
// EBNF; spaces and tabs separate tokens anywhere except inside a number's
// unit (see below).
//
//	line       = [ statement ] [ note ] .
//	statement  = assign | check .
//	assign     = symbol "=" expr [ "->" display ] .
//	check      = "check" expr compare expr .
//	compare    = "<=" | "<" | ">=" | ">" | "==" | "≤" | "≥" .
//	display    = unit [ ":" digits ] .              (decimals, 0 to 12)
//	note       = "#" { any character } .            (# always starts the note)
//	ref        = symbol [ "->" display ] .          (inside prose braces {…})
//
//	expr       = term { ( "+" | "-" ) term } .
//	term       = unary { ( "*" | "/" ) unary } .
//	unary      = ( "-" | "+" ) unary | power .
//	power      = primary [ "^" exponent ] .
//	exponent   = ( "-" | "+" ) exponent | power .
//	primary    = number [ unit ] | symbol | "pi" | "g" | call | "(" expr ")" .
//	call       = function "(" [ expr { "," expr } ] ")" .
//	function   = "sqrt" | "abs" | "min" | "max" | "exp" | "ln" | "log10"
//	           | "sin" | "cos" | "tan" | "cot" | "asin" | "acos" | "atan" | "atan2"
//	           | "floor" | "ceil" | "round" .
//
//	number     = digits [ "." { digit } ] [ exp ] | "." digits [ exp ] .
//	exp        = ( "e" | "E" ) [ "+" | "-" ] digits .
//	symbol     = part { "." part } .                (F1.R_d: a block result)
//	part       = letter { letter | digit | "_" | "'" } .
//	unit       = see package github.com/plinth-calc/plinth/calc/units .
//
// "×", "·" and "⋅" are "*", "−" is "-", "÷" is "/", "→" is "->". A letter is
// any Unicode letter, so φ and γ may be typed directly.
//
// Precedence, loosest first: + -, then * /, then unary sign, then ^. So
// -x^2 is −(x²), 2^-1 is 0.5 (an exponent may carry a sign), 2^3^2 is
// 2^9 = 512 (right-associative), and a - b - c and a / b * c group to the
// left. Parentheses stay in the tree as Paren nodes for the typesetter.
//
// # Units after numbers
//
// A unit follows its number, after optional spaces, as one run without
// spaces: "18 kN/m3", "3 m2/yr", "30deg", "30 °", "5%", "0.12 m2/MN",
// "2 kN*m". The run may contain "*", "/", "·" (when a name follows), "^"
// with a signed power, digits, ² and ³. Hence
//
//	2 kN/h    is 2 kN per hour (the unit kN/h),
//	2 kN / h  is (2 kN) divided by the symbol h,
//	2 m^2     is 2 m² but 2 m ^ 2 is (2 m)² = 4 m².
//
// There is no implied multiplication: a word after a number must be a
// unit, so "2 B" is an error that says to write "2 * B", and "60 kpa"
// suggests "kPa".
//
// # Names
//
// pi is the constant π; pi, check and the function names cannot be
// assigned; names with "." are block results and cannot be assigned either.
// How a name prints (base, primes, subscript, Greek letters) is
// doc/notation's.
//
// # Dimensions
//
// Dims (and, for a whole statement, EvalAssign and EvalCheck) check that:
//
//   - + - and the comparisons of a check join equal dimensions ("cannot add
//     m and kPa", at the operator);
//   - sin cos tan take an angle (tan(30) → "tan needs an angle: write 30
//     deg"); asin acos atan take a pure number and give an angle in rad;
//     atan2 takes two values of one dimension and gives an angle. To use an
//     angle as a plain number of radians divide it by 1 rad;
//   - exp ln log10 take pure numbers;
//   - floor ceil round take pure numbers too: rounding an SI value (0.6 m
//     → 1 m, while 600 mm is also 0.6 m) would surprise, so write
//     round(B / 1 mm) * 1 mm;
//   - abs keeps the dimension; min and max take two or more arguments of
//     one dimension;
//   - sqrt halves the powers, which must be even;
//   - x^p: p is a pure number; a dimensioned x needs p to be a constant
//     (numbers and pi only) that gives whole powers ((B^2)^0.5 is a
//     length; B^0.5 is an error);
//   - a display unit (-> kPa) has the dimension of the result.
//
// Undefined symbols are errors of KindUndefined at the symbol.
//
// # Evaluation
//
// All values are SI float64; angles are radians. A direct evaluator walks
// the tree.
// Eval gets the value from govaluate on the canonical form — fully
// parenthesised, every symbol an escaped positional parameter "[$0]" (so
// names such as phi' never reach govaluate's lexer), every number
// a parameter "[#0]" (govaluate cannot read 1e3 and a formatted float would
// be rounded), unary minus as "(-(x))", powers as "(a ** b)" — and runs
// the direct evaluator as well, which places domain errors (division by zero, sqrt of
// a negative, ln 0, asin 2, tan 90°, overflow) at the node where they happen and
// also catches an infinity that govaluate would let vanish (1/(1/0) = 0).
// A disagreement beyond 1e-9 relative is a KindInternal error. No panic
// escapes: govaluate runs under recover.
//
// Compiled govaluate expressions are cached by canonical string. Because
// numbers and symbols are parameters, lines of the same shape share an
// entry. The cache is emptied when it holds 4096 entries.
package expr
