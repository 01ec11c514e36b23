// Package sketch draws a shallow footing for a calculation sheet as
// vector primitives (draw.Items) that a layout.Drawing places on the page:
// a section through B, to scale, and for a pad a small plan beside it.
//
// The section shows the ground line with its hatching, each soil layer in
// a light tint with its boundary carried out to a label column naming the
// layer and the depth of its top, a working platform in its own fill with
// gravel marks, the footing and its column (or a strip's wall) in a light
// concrete fill, the depth D and the width B dimensioned, the effective
// width B′ as a dashed dimension against the side the load's resultant
// moves to, the groundwater level as the inverted-triangle symbol with its
// depth, and the characteristic actions as given: V down onto the column,
// H at the column's head, M as a curved arrow round its top, each labelled
// ("V = 1270 kN"; per metre for a strip). The section reaches 2B below the
// base, further when the dimensions need it; groundwater deeper than that
// is stated under the sketch instead.
//
// The input is a plain Footing of numbers and strings — metres, kN, kNm,
// depths below ground level — with no tie to the engine. Draw fits the
// sketch to w × h points; invalid input (an unknown shape, a width ≤ 0,
// layers out of order, B′ > B, a size too small to draw in) is an *Error
// naming the parameter, its value and what is valid.
package sketch
