package sheet

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/capacity"
	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/size"
)

// OptionSpec describes one option of a block: its name, the words it
// accepts, and what other value it takes (calc/kind). doc/parse rejects
// unknown option names; the evaluator checks values against Words and
// Form.
type OptionSpec = kind.Option

// calcSpec is the calc block's: statements and checks, no options.
var calcSpec = kind.Spec{Word: "calc", Header: kind.Bare, Doc: "statements and checks"}

// Specs are the block kinds' declarations in Kind order, each declared
// once in its engine package (SHEET-FORMAT §3): their words, info-string
// forms, options, statements and result symbols. A new block kind is a
// Kind constant, its spec in its engine package and a line here.
var Specs = []*kind.Spec{
	KindCalc:         &calcSpec,
	KindGround:       &site.GroundSpec,
	KindFooting:      &site.FootingSpec,
	KindBearing:      &bearing.Spec,
	KindSettlement:   &settle.Spec,
	KindCapacity:     &capacity.Spec,
	KindDifferential: &settle.DiffSpec,
	KindSize:         &size.Spec,
	KindSchedule:     &size.ScheduleSpec,
	KindPlatform:     &platform.Spec,
}

// Spec is the declaration of kind k.
func (k Kind) Spec() *kind.Spec { return Specs[k] }

// LookupOption returns the spec of option name in a block of kind k.
func LookupOption(k Kind, name string) (OptionSpec, bool) { return Specs[k].Option(name) }

// OptionNames returns the option names of kind k in documentation order.
func OptionNames(k Kind) []string { return Specs[k].OptionNames() }
