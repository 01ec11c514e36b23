package trace

// Compact moves the steps and their inputs into storage of exactly their
// size. An engine that builds its trace into generous buffers (sized for
// the most steps a case can take, its inputs in one shared array) calls
// it before returning, so a package of many calculations does not hold
// the spare room of every one. The steps and values are unchanged.
func (t *Trace) Compact() {
	n := 0
	for _, s := range t.Steps {
		n += len(s.Inputs)
	}
	values := make([]Value, 0, n)
	steps := make([]Step, len(t.Steps))
	copy(steps, t.Steps)
	for i := range steps {
		in := steps[i].Inputs
		if len(in) == 0 {
			continue
		}
		k := len(values)
		values = append(values, in...)
		steps[i].Inputs = values[k:len(values):len(values)]
	}
	t.Steps = steps
}
