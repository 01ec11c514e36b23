// Package eval is the evaluation stage: it takes a parsed package
// (sheet.Package) and produces every symbol's value with its unit, every
// check's verdict and, for engine blocks, the engine's results and traces.
// Nothing downstream computes anything of its own.
//
// Entry point: Package(p, opt) (*Result, source.List).
//
// Scoping. A symbol belongs to the sheet that defines it, once. A sheet
// reads another sheet's symbols only when its front matter lists that sheet
// under uses; redefining a used symbol is an error naming both places.
// Sheets are evaluated in file-name order, except that a sheet named in
// uses is always evaluated before the sheets that use it (a uses cycle is
// an error). Inside a sheet statements are evaluated in document order: a
// symbol used above its definition is an error naming where it is defined.
// Prose interpolations ({q_Ed}) are resolved after the whole sheet, so
// prose may quote any symbol of its sheet or of the sheets it uses.
//
// Statements inside a ground or footing block belong to the block: B = 2.4 m
// in "footing P1" defines P1.B, read as B inside the block and as P1.B
// elsewhere. Engine results are symbols under the footing's name (or the
// block's "as" prefix).
//
// Overrides. --set name=value replaces an input (a statement whose
// expression holds no symbol) for a variant run; sheet.md:name=value picks
// the sheet where a name is defined on several. The value must have the
// input's dimension.
//
// Display units. A statement's "-> unit[:decimals]" wins. Otherwise an
// input keeps the unit it was written in, and a computed value takes the
// unit of its operands where they agree (B − 2e with B in m stays in m),
// else the standard display unit for its dimension (kPa for stress, kN/m3
// for unit weight; see calc/units.Display).
package eval
