// Package trace records how an engine result was reached, so the document
// can print the working and a checker can follow every number by hand.
//
// A calculation appends Steps to a Trace in the order they were computed.
// Each Step names its symbol in plinth's sheet notation (text before the
// first "_" is the base, the rest the subscript; trailing primes mark
// effective-stress quantities; Greek names such as phi and gamma become
// Greek letters), holds a structured formula (an Expr tree, not a formatted
// string) and the values substituted into it, its result in SI units with
// the unit to display it in, and the published Ref it comes from. Cautions
// record where a method is near or past its limits, and Sources lists every
// publication cited, once, in order of first use.
//
// Eval evaluates a formula with its inputs, and Verify replays a whole
// trace, so tests can prove that what the document prints reproduces the
// number the engine computed.
package trace
