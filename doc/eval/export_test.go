package eval

import "github.com/plinth-calc/plinth/doc/sheet"

// SetTestHook installs f to run before each block is evaluated; nil
// removes it.
func SetTestHook(f func(sheet.Block)) { testHook = f }

// WithoutVary is o for a run that evaluates no vary option (as the vary
// runs themselves are made), so a test comparing a vary table with
// --set runs does not vary again in each.
func WithoutVary(o Options) Options { o.noVary = true; return o }
