package eval

import "plinth/doc/sheet"

// SettleResult and CapacityResult hold the settlement and capacity
// engines' results (see settlement.go).
type SettleResult struct{}
type CapacityResult struct{}

func (e *evaluator) settlement(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	e.errs.Add(headerSpan(b.Span), "settlement blocks are not evaluated yet")
	return false
}

func (e *evaluator) capacity(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	e.errs.Add(headerSpan(b.Span), "capacity blocks are not evaluated yet")
	return false
}
