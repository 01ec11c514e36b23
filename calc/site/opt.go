package site

// Opt is an optional parameter: Set is false when the value was not given.
type Opt struct {
	V   float64
	Set bool
}

// Some returns a given value.
func Some(v float64) Opt { return Opt{V: v, Set: true} }

// Or returns the value if given, else d.
func (o Opt) Or(d float64) float64 {
	if o.Set {
		return o.V
	}
	return d
}
