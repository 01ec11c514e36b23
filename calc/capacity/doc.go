// Package capacity tabulates the allowable bearing pressure of a footing
// against its width: for each width the bearing-limited allowable pressure
// (calc/bearing with an allowable-stress approach, FS on the net ultimate
// pressure) and the settlement-limited pressure (calc/settle, the gross
// pressure giving the settlement limit), the lower of the two governing.
//
// Both pressures are service (allowable) gross pressures at the underside
// of the footing, so they compare like with like; this is why the table
// needs an allowable-stress approach FS(x) for bearing (partial-factor
// design resistances are compared with design actions, not service
// pressures). A rectangle keeps its L/B ratio as B changes; a circle's B
// is its diameter.
//
// Entry point: Table(in Input) (*Result, error).
package capacity
