// Package notation holds the rules of plinth's symbol notation, the way a
// name written in a sheet or an engine trace prints: the text before the
// first "_" is the base and the rest the subscript, further "_" printing
// as commas ("q_ult_net" → q with subscript "ult,net"); trailing primes
// print as ′ ("phi'_d" → φ′ with subscript d); Greek names become Greek
// letters ("gamma" γ, "Gamma" Γ, "pi" π); a dotted block prefix
// ("F1.R_d") stays before the symbol.
//
// It is a leaf: the typesetter (doc/layout/eqn) splits symbols with it,
// and compose reads it to tell a symbol written in running text from a
// word. Split takes a name apart; Greek maps a letter's name.
package notation
