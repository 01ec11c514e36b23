package trace

// Sources cited by more than one engine package. Each engine package
// declares the rest of its own; keys are unique across the engine.
var (
	EN1997 = Source{Key: "EN1997-1", Citation: "EN 1997-1:2004 Eurocode 7: Geotechnical design – Part 1: General rules. CEN, Brussels, 2004 (recommended values; national annexes may replace them)."}
	// Brent1973 is the bracketing root finder (calc/solve) every engine
	// that solves for a value cites.
	Brent1973 = Source{Key: "Brent1973", Citation: "Brent, R.P. (1973). Algorithms for Minimization without Derivatives. Prentice-Hall, Englewood Cliffs, NJ (ch. 4)."}
	EN1990    = Source{Key: "EN1990", Citation: "EN 1990:2002 Eurocode – Basis of structural design. CEN, Brussels, 2002."}
)
