package eval

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// unknownStmts reports each statement of a ground or footing block whose
// name the block does not read (its spec's Statements; any other is
// refused, so no input is printed under a block that does not use it),
// with the nearest known name (or the list of them); the block's word
// options are named in the list too.
func (e *evaluator) unknownStmts(kind sheet.Kind, name string, lines []sheet.Line) bool {
	known := kind.Spec().StatementNames()
	all := append(append([]string{}, known...), sheet.OptionNames(kind)...)
	ok := true
	for _, l := range lines {
		st, isStmt := l.(*sheet.Stmt)
		if !isStmt {
			continue
		}
		a, isAssign := st.X.(*expr.Assign)
		if !isAssign || containsStr(known, a.Sym.Name) {
			continue
		}
		hint := fmt.Sprintf("a %s block takes %s", kind, strings.Join(all, ", "))
		if n, near := nearestStmt(a.Sym.Name, all); near {
			hint = fmt.Sprintf("did you mean %s?", n)
		}
		e.errs.AddHint(symSpan(st, a), hint, "%s %s does not use %s", kind, name, a.Sym.Name)
		ok = false
	}
	return ok
}

// nearestStmt is sheet.Nearest, or else the longest known name of three
// or more letters that the statement's name extends (water_table → water,
// gamma_conc → gamma_c).
func nearestStmt(name string, known []string) (string, bool) {
	if n, ok := suggest.Nearest(name, known); ok {
		return n, true
	}
	best := ""
	for _, k := range known {
		if len(k) >= 3 && len(k) > len(best) && strings.HasPrefix(name, k) {
			best = k
		}
	}
	return best, best != ""
}
