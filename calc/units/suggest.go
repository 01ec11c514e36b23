package units

import "github.com/plinth-calc/plinth/internal/suggest"

// Suggest returns the known unit name nearest to the unknown name by the
// one rule of internal/suggest (letter case first, then at most one edit
// for names of up to four letters and two for longer ones; a single
// letter is never corrected except for its case), ties going to the
// earlier name in the table; "" when none is close or name is known.
func Suggest(name string) string {
	n, _ := suggest.Nearest(name, unitNames)
	return n
}

// unitNames are the names of the table, in its order.
var unitNames = func() []string {
	out := make([]string, len(names))
	for i, n := range names {
		out[i] = n.name
	}
	return out
}()
