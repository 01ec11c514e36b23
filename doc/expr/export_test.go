package expr

// Run exposes the govaluate path to the property test.
var Run = run
