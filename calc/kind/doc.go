// Package kind declares what a block kind takes and gives, as data: the
// options it reads (name, kind of value, accepted words, default, what it
// does), the statements of an input block, and the result symbols an
// analysis defines (name, unit, meaning, and the option that brings it).
//
// Each engine package declares its kind's Spec once, beside the code that
// reads those options and computes those results: bearing.Spec,
// settle.Spec, settle.DiffSpec, capacity.Spec, and site.GroundSpec,
// site.FootingSpec for the input blocks. doc/sheet lists them in block
// order (sheet.Specs); the parser, the evaluator and the README's tables
// (a test in doc/sheet) read them from there, so a new block kind is
// declared in its engine package and registered in one line.
//
// kind is a leaf: it imports nothing of plinth.
package kind
