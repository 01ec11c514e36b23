// Package size finds the smallest footing that passes every check: the
// width B, on a stated increment, for which bearing (short and long term),
// sliding, the eccentricity limit and the settlement limit all hold, with
// the plan rule (square, circle, strip, fixed L, or fixed L/B) holding L.
//
// The search. Let g(B) = max over the checks of utilisation − 1, each
// check computed by the engine that prints it (calc/bearing, calc/settle,
// with the self-weight of calc/design when it is included). On the
// bracket [B_min, B_max] plinth's bracketing solver (calc/solve, Brent
// 1973) finds the root B_req of g, and B is B_req rounded up to the
// increment. This assumes every check improves with width — true of the
// bearing, sliding and settlement checks under a fixed load (common
// practice), but not always when the footing's own weight and backfill
// grow with B², or where a weaker layer enters the zone of a wider base. So
// the answer is confirmed on the grid: B must pass and B − increment must
// fail. When either does not hold, or g does not change sign on the
// bracket, the search falls back to a bounded scan of every grid width from
// B_min (at most MaxTrials), and the result says which search gave it
// (Result.Search).
//
// Nothing passes for lack of data: a check the engine cannot verify (a
// settlement without stiffness in its zone) is an error here, since no
// width makes it pass; a size range in which nothing passes is a NoSize
// error naming the checks that fail at the largest width.
package size
