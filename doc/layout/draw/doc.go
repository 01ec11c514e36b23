// Package draw defines the vector primitives every page is made of: text
// at a point, lines, polylines and polygons, rectangles, images, and the
// link areas and named anchors of the document's internal links.
//
// Coordinates are points (1/72 in) with the origin at the top left and y
// growing downward, the way the page is read. Text is placed by its
// baseline. Items are plain values; Offset moves one, so a component (a
// chart, a footing sketch, a typeset equation) can build its picture at the
// origin and the layout engine places it on the page.
package draw
