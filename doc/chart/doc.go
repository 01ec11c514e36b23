// Package chart draws x–y charts for calculation sheets — stress against
// depth, settlement against time on a log axis, allowable pressure against
// footing width — as vector primitives (draw.Items) that a layout.Drawing
// places on the page. No raster images; the same Chart gives the same
// items.
//
// # Axes
//
// Each axis is linear or log10, ranged from the data unless Min or Max is
// given; an automatic end is widened to the next tick (linear) or decade
// (log). Linear steps are 1, 2, 2.5 or 5 × 10ⁿ, as many as leave the
// labels clear of each other; labels print exactly the decimals the step
// needs (0.3, never 0.30000000000000004) with a true minus sign. A log
// axis has ticks at the decades (also at 2 and 5 when the range is under
// about two decades), unlabelled minor ticks at 2…9, and thins its decade
// labels when they would crowd. Reverse runs an axis downward (depth,
// settlement) or leftward; Opposite puts the x axis along the top (usual
// for a depth profile) or the y axis at the right. Axis.Ticks replaces the
// major ticks (TimeTicks gives days then years for a time axis).
//
// Text is never rotated: the y axis title is set horizontally above the
// plot (below it when the x axis is along the top), the x axis title
// beside the x tick labels. Every string is measured with the document's
// fonts (doc/layout/fonts), so labels keep clear of the frame, and tick
// labels that would still collide are dropped.
//
// # Series
//
// Series are told apart by dash pattern (Solid, Dashed, Dotted, DashDot,
// LongDash, DashDotDot, or any on/off lengths) and marker shape, assigned
// in series order unless chosen — never by colour alone, so a black-and-white
// print reads; colour (Palette) only supports them. Emphasis draws a
// heavier line with filled markers; Band draws a broad light band under the
// other curves, for an envelope the caller gives (an engine's governing
// limit, with Regions where each limit governs: the chart computes none).
// Markers sit at data points, thinned
// so they keep about 14 pt apart. Curves are clipped to the plot and dashed
// by this package (each dash a solid polyline), so a pattern runs on
// through the points of a dense curve.
//
// # Labels in the plot
//
// Guides — reference lines such as a settlement limit, or Faint ones for
// layer boundaries —
// annotations (a label at a data point with a short leader, optionally
// with guides to both axes) and the legend are placed where they cover
// least: each candidate place is scored by the length of curve under it,
// the markers and the labels already placed. The legend goes in the corner
// (or edge middle) of the plot that covers nothing, preferring the one
// with most room round it; when every place would cover something, it is
// set in rows below the chart instead.
//
// # Errors
//
// Input that cannot be drawn — mismatched X and Y, an empty chart, a
// non-finite value, a value ≤ 0 on a log axis, Min ≥ Max, text the fonts
// lack, a chart too small for its labels — is reported as an *Error naming
// the part, the field, the value and what is valid. No NaN reaches a
// coordinate.
//
// Draw returns the items; Drawing wraps them in a layout.Drawing block.
package chart
