// Package vary is the sensitivity helper: it tabulates a check's
// utilisation against one parameter over a range, or at a list of its
// values, and finds, by Brent's method (calc/solve), each value of the
// parameter at which the utilisation crosses 1.
//
//	Table(f Func, lo, hi float64, n int, o Options) (*Result, error)
//	Values(f Func, ps []float64, o Options) (*Result, error)
//	Rank(rs []*Result) []int
//
// f is any engine check seen as a function of one parameter (the platform
// design at a fixed thickness against c_u, a bearing check against φ′):
// it returns the utilisation, or an error that stops the table and is
// returned as a *RowError with the row and the parameter value it came
// from. Table has n evenly spaced values from lo to hi inclusive; Values
// takes the caller's values, which must rise. Between two neighbouring
// rows where util − 1 changes sign the crossing is solved for (a crossing
// that falls between rows and back again within one interval is not seen:
// the rows set the resolution). Result.Trace records each crossing as a
// solved step in the parameter's symbol. Several parameters, each varied
// on its own, are ordered by Rank: the widest spread of utilisation first,
// the order of a tornado diagram. The package does no I/O and never
// returns NaN.
package vary
