package expr

// Run exposes the govaluate path to the property test.
var Run = run

// The evaluator's parts that tests check on their own.
var (
	Canonical = canonical
	Direct    = direct
	StmtDims  = stmtDims
)
