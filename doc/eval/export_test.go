package eval

import "github.com/plinth-calc/plinth/doc/sheet"

// SetTestHook installs f to run before each block is evaluated; nil
// removes it.
func SetTestHook(f func(sheet.Block)) { testHook = f }
