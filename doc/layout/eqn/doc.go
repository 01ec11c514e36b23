// Package eqn typesets plinth's formulas: a small box model in the spirit of
// TeX's math lists, drawn with the embedded fonts (layout/fonts).
//
// A formula is first a tree of Nodes — Row, Sym, Num, Text, Op, Script,
// Frac, Sqrt, Fence, Func, Space — built by the caller (doc/compose
// converts the engine's structured formulas into them; this package knows
// no engine type). Layout measures a Node at a size and returns a Box: its
// width, how far it reaches above and below the baseline, and the
// draw.Items that paint it, relative to the left end of its baseline.
// Break does the same for a formula too wide for its column, breaking it
// at top-level relations (=, ≤ …) first and at + and − after.
//
// Symbols use the sheet notation (doc/notation takes them apart): the
// text before the first "_" is the base and the rest the subscript,
// further "_" printing as commas ("q_ult_net" → q with subscript
// "ult,net"); trailing primes print as ′ ("phi'_d" → φ′ with subscript
// d); Greek names become Greek letters ("gamma" γ, "Gamma" Γ, "pi" π); a
// dotted block prefix ("F1.R_d") prints upright, as written, before the
// symbol. A single-letter base is set in italic (constants such as π
// upright), a longer base and every subscript upright, following ISO
// 80000-2's rule that descriptive subscripts are upright.
package eqn
