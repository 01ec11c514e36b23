package kind

// Header is the form of a block's info string after its word.
type Header int

const (
	Bare    Header = iota // calc
	Named                 // ground NAME, footing NAME
	On                    // bearing FOOTING on GROUND [as PREFIX]
	To                    // differential FOOTING to FOOTING [as PREFIX]
	NamedOn               // schedule NAME on GROUND [as PREFIX]
)

// Value is the kind of value an option or statement takes.
type Value int

const (
	Word     Value = iota // one of Words
	Quantity              // an expression with a unit (Form says which)
	Number                // an expression giving a pure number
	List                  // comma-separated quantities
	Count                 // a whole number
	Special               // a form of its own, or one of Words (Form says which)
)

var valueNames = [...]string{Word: "word", Quantity: "quantity", Number: "number", List: "list", Count: "count", Special: "form"}

func (v Value) String() string {
	if v < 0 || int(v) >= len(valueNames) {
		return "value"
	}
	return valueNames[v]
}

// Option is one option of a block ("method = ec7"), or one statement of
// an input block ("B = 2.4 m").
type Option struct {
	Name    string
	Value   Value
	Words   []string // accepted words; nil when the value is not a word
	Form    string   // any other value accepted, in words ("a length", "FS(factor), e.g. FS(3.0)"); "" if none
	Default string   // the default, as the documentation states it
	Doc     string   // what it does, in a line
	// Repeat lets the option be given on several lines of a block, each
	// line one value (vary: one line per parameter); any other option
	// given twice is an error.
	Repeat bool
}

// Allows reports whether word is one of the option's words.
func (o Option) Allows(word string) bool {
	for _, w := range o.Words {
		if w == word {
			return true
		}
	}
	return false
}

// Result is one symbol an analysis defines under its prefix (P1.R_d).
type Result struct {
	Symbol string // "R_d"
	// Unit is the display unit; a force, moment or area of a strip is per
	// metre run (kN → kN/m, kNm → kNm/m, m2 → m2/m; see PerRun). "" for a
	// pure number.
	Unit    string
	Meaning string // printed as the symbol's note
	// When is "" for a result of every such block, else the option (or
	// the condition) that brings it: "tilt = yes", "within = yes",
	// "sliding", "Schmertmann".
	When string
}

// Spec is a block kind's declaration.
type Spec struct {
	Word       string // the block word: "bearing"
	Header     Header
	Doc        string   // what the block does, in a line
	Options    []Option // in documentation order
	Statements []Option // the statements an input block reads (ground, footing)
	Results    []Result // in the engine's order
	// RowResults are defined for each row of the block's table, under
	// PREFIX.ROW (a schedule's footings); nil for other kinds.
	RowResults []Result
}

// Option returns the option named name.
func (s *Spec) Option(name string) (Option, bool) {
	for _, o := range s.Options {
		if o.Name == name {
			return o, true
		}
	}
	return Option{}, false
}

// OptionNames are the option names in documentation order.
func (s *Spec) OptionNames() []string {
	var out []string
	for _, o := range s.Options {
		out = append(out, o.Name)
	}
	return out
}

// StatementNames are the names of the statements an input block reads.
func (s *Spec) StatementNames() []string {
	var out []string
	for _, o := range s.Statements {
		out = append(out, o.Name)
	}
	return out
}

// ResultNames are the result symbols brought by when ("" the results of
// every such block); with no argument, all of them.
func (s *Spec) ResultNames(when ...string) []string {
	var out []string
	for _, r := range s.Results {
		if len(when) == 0 || r.When == when[0] {
			out = append(out, r.Symbol)
		}
	}
	return out
}

// Result returns the result named symbol.
func (s *Spec) Result(symbol string) (Result, bool) {
	for _, r := range s.Results {
		if r.Symbol == symbol {
			return r, true
		}
	}
	return Result{}, false
}

// Meaning is the meaning of result symbol, "" when the kind has none.
func (s *Spec) Meaning(symbol string) string {
	r, _ := s.Result(symbol)
	return r.Meaning
}

// Pick returns the options of s named in names, in that order, with
// each renamed by rename when it has an entry there: a kind that reads
// another's options (capacity reads bearing's and settlement's) takes
// them from that kind's spec rather than listing them again. A name s
// lacks gives an option with no Doc, which the specs' tests refuse.
func (s *Spec) Pick(rename map[string]string, names ...string) []Option {
	var out []Option
	for _, n := range names {
		o, ok := s.Option(n)
		if !ok {
			o = Option{Name: n} // no such option: a declaration error, which TestSpecs finds (no Doc)
		}
		if r, ok := rename[n]; ok {
			o.Name = r
		}
		out = append(out, o)
	}
	return out
}

// PerRun is unit per metre run, for a strip's force, moment or area:
// kN → kN/m, kNm → kNm/m, m2 → m2/m; other units are unchanged.
func PerRun(unit string) string {
	switch unit {
	case "kN", "kNm", "m2":
		return unit + "/m"
	}
	return unit
}

// RowResult returns the row result named sym.
func (s *Spec) RowResult(sym string) (Result, bool) {
	for _, r := range s.RowResults {
		if r.Symbol == sym {
			return r, true
		}
	}
	return Result{}, false
}

// RowMeaning is the meaning of the row result sym ("" if none).
func (s *Spec) RowMeaning(sym string) string {
	r, _ := s.RowResult(sym)
	return r.Meaning
}

// Vary is the sensitivity option of the analyses that have a verdict
// (bearing, settlement, platform) and of capacity: the block evaluated
// again over a range, or at a list of values, of one input of the sheet,
// through the same engine and --set machinery. It may be given on several
// lines, one input each, each varied on its own.
var Vary = Option{Name: "vary", Value: Special, Repeat: true,
	Form:    "SYMBOL: FROM .. TO, a range of one input (site.clay.c_u: 40 kPa .. 80 kPa, or site.clay.c_u: -20 % .. +20 % of its value), or SYMBOL: V1, V2, … a list of its values (site.clay.c_u: 40 kPa, 50 kPa, 60 kPa); one line per input",
	Default: "none",
	Doc:     "the governing utilisation against each input over a range or a list of values, one input at a time, and where the verdict flips"}

// VaryResults are the results the vary option brings: under the block's
// prefix when one input is varied (P1.util_at_min), under
// PREFIX.vary.SYMBOL for each input when several are
// (P1.vary.site.clay.c_u.util_at_min; see VaryName).
var VaryResults = []Result{
	{Symbol: "util_at_min", Meaning: "governing utilisation at the least value of the input varied", When: "vary"},
	{Symbol: "util_at_max", Meaning: "governing utilisation at the greatest value of the input varied", When: "vary"},
}

// VaryName is the name under the block's prefix of a result of one input
// among several a block varies: vary.SYMBOL.RESULT.
func VaryName(symbol, result string) string { return "vary." + symbol + "." + result }

// Join is the options of several lists in order: a kind that takes its
// own options and some of another kind's (Spec.Pick).
func Join(lists ...[]Option) []Option {
	var out []Option
	for _, l := range lists {
		out = append(out, l...)
	}
	return out
}
