// Package compose is the render stage's first half: it turns an evaluated
// package (eval.Result) into the layout input model (layout.Doc) and
// stops; doc/layout lays the Doc out. It computes nothing of its own —
// every number it prints comes from the evaluator or the engine's traces
// — it only chooses how each is shown.
//
// Entry points:
//
//	Document(res, opt) (layout.Doc, source.List)   the layout input
//	Created(res, epoch) (time.Time, source.List)   the document date
//
// The page template is the package's template field: a built-in one (a4,
// letter) or a YAML file read through the package's Inside reader; a file
// that cannot be read or used is an error at the field. Images are read
// the same way, errors at the image's path. Every block carries the
// source span it prints, so layout problems come back from
// layout.Document at the source line they concern.
//
// # What a package prints as
//
// A cover sheet (project data, the list of sheets with their page
// numbers, a summary of the checks, the revision history and a checker's
// sign-off box), the summary of results (summary.go: the design basis
// from package.yaml, a row per footing block with its governing verdicts
// and page, the open items), then every sheet in file-name order, then
// one end sheet (matter.go): the appendix (working moved out of the main
// flow by detail = governing, when there is any), the check register
// (condition, demand, capacity, utilisation, verdict, page), the input
// register (one table; block tables pointed to, not repeated; the assumed
// values, each once with every block that assumed it), the references
// list and the cautions (every engine caution, most severe first, with
// where it was raised, one row for a caution raised alike in several
// places, and the standing cautions). Each sheet is a layout sheet of
// its own, so each has its own PDF bookmark and the title block on
// every page; the end sheet's sections share one row of the contents.
//
// Page numbers printed in text (summary, check register, appendix
// pointers) and the cover's contents are page references
// (layout.PageRef: pageOf, sheetPages) to anchors: the layout fills them
// in once it knows where the anchors land. The changed lines of a render
// --since become the Doc's change bars (layout.Bars).
//
// Formulas. The engine's formulas (trace.Expr) and the sheet's
// expressions, converted to the same form, are typeset by one converter
// (fromExpr, convert.go) into eqn nodes; a table cell computed from other
// symbols prints the expression the evaluator parsed, with its place.
//
// Detail. package.yaml's detail (governing, the default, or full) says
// how much of each engine block is printed in place. With governing the
// compact tables keep only the cases within 10 % of the governing
// utilisation (the others go to the appendix) and leave out the demand
// and resistance the case summary gives, each citation prints once per
// block, and no working is written out twice (repeat.go): a step already
// printed on the sheet is listed by value, one printed alike on an
// earlier sheet on the same ground by value with its page, one whose
// formula is already written out by its value and inputs, the long
// settlement formulas once in the package; rows the same in every column
// of a compact table print once in its caption, and a settlement's
// repeated per-layer working is printed in full once (the layer with the
// most steps) and tabulated for all. With full everything is written out
// in place.
//
// Title block fields come from the sheet's front matter laid over
// package.yaml: Rev is the sheet's revision, else the latest entry of
// revisions (the one with the latest date); Date is the sheet's date,
// else that revision's date. A blank checked prints NOT CHECKED (layout).
//
// Calc lines. An input (a number with a unit, no symbol) prints as
// symbol = value, as written; a computed symbol as
// symbol = formula = formula with values substituted = result, where a
// substituted value is the value its own line prints (so the checker can
// find it) and the result is shown with the line's rounding (":decimals")
// while later lines use the full-precision value. A formula that is a
// lone symbol skips the substituted step. Checks print both sides (with
// substituted values when a side is a formula), the relation, the
// utilisation and OK or NOT OK, and link from the check register.
//
// References. Citations [KEY] in prose and in notes print as [n], linked
// to the references list. References are numbered in order of first
// citation across the package (cover first, then the sheets in order;
// an engine block cites the publications of its methods where it prints
// them); package references never cited follow, then nothing else. A
// key a sheet redefines with other text is a separate reference.
//
// Engine blocks print the engine's own numbers, never recomputed:
//
//   - ground: the block's statements (groundwater) and the layer table,
//     each column's symbol over its unit, each layer's source cited;
//   - footing: shape and dimensions, the table of characteristic actions
//     (a cell computed from other symbols shows its expression and value)
//     and a section sketch (doc/sketch) on the ground of the first
//     analysis that uses the footing, with B′ of its governing case;
//   - bearing: a summary of every case (combination, drainage, V_d, H_d,
//     R_d, utilisation, verdict; the governing case marked) and the
//     governing check, the steps common to every case, the governing case
//     in full (symbol = formula = values = result, note, reference
//     clause), then every other case compactly — one table per drainage
//     condition, a row per symbol and a column per case, so every number
//     is on the page — and sliding the same way;
//   - settlement: the serviceability load, the working group by group
//     (representative sublayers and the first time step in full), the
//     stress table by sublayer, the settlement by layer, the time table,
//     the stress–depth and settlement–time charts (doc/chart) and the
//     limit check;
//   - capacity: allowable pressure against width from bearing and from
//     settlement with the governing mechanism, the working at the
//     footing's own width, and the chart.
//
// An engine caution is boxed after the step that raised it (those of the
// calculation as a whole after the summary) and listed, linked, in the
// cautions summary at the end. A substituted line too wide to set even
// broken is replaced by the list of values that enter it.
//
// Running text: a short symbol written in sheet notation in prose, notes
// and engine messages (c_u, N_γ, σ′_v0) prints as math; longer words with
// underscores (local_shear) stay as they are.
package compose
