package severity

import "strconv"

// Level ranks a caution, lowest first, in the order of the hazard
// statements of ANSI Z535.4 and ISO 3864-2 (WARNING above CAUTION)
// without their DANGER:
//
//	Note     NOTE     information: a choice made, a value assumed
//	Caution  CAUTION  a method used near its limits, or an assumption
//	                  the engineer must confirm
//	Warning  WARNING  a result that may be unsafe or is missing: a limit
//	                  exceeded, a check not made, a layer left out
type Level int

const (
	Note Level = iota
	Caution
	Warning
)

// Words are the levels' words in Level order: the heading of a caution
// box and the words of "> [!WORD]".
var Words = []string{"NOTE", "CAUTION", "WARNING"}

var meanings = []string{
	"information (a choice made, a value assumed)",
	"a method used near its limits or an assumption the engineer must confirm",
	"a result that may be unsafe or is missing (a limit exceeded, a check not made, a layer left out)",
}

// Valid reports whether l is one of Note, Caution and Warning.
func (l Level) Valid() bool { return l >= Note && l <= Warning }

// String is the level's word ("CAUTION"); a level out of range prints as
// Level(n).
func (l Level) String() string {
	if !l.Valid() {
		return "Level(" + strconv.Itoa(int(l)) + ")"
	}
	return Words[l]
}

// Meaning says what the level stands for, as the cautions list explains
// it ("information (a choice made, a value assumed)"); "" out of range.
func (l Level) Meaning() string {
	if !l.Valid() {
		return ""
	}
	return meanings[l]
}

// Parse reads a level's word, in capitals as Words has it.
func Parse(word string) (Level, bool) {
	for i, w := range Words {
		if w == word {
			return Level(i), true
		}
	}
	return 0, false
}
