package main

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/size"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/source"
)

// The JSON printed by "plinth check --json". This is an interface: fields
// are added, never renamed or removed; the README documents it.
type jsonReport struct {
	Variant   bool           `json:"variant"`
	Overrides []jsonOverride `json:"overrides"`
	Symbols   []jsonSymbol   `json:"symbols"`
	Checks    []jsonCheck    `json:"checks"`
	Blocks    []jsonBlock    `json:"blocks"`
	Errors    []jsonError    `json:"errors"`
	// Context lists the sheets evaluated only because a single sheet
	// given alone uses them (their symbols are not listed).
	Context []string `json:"context"`
	// Version is the plinth that wrote the report (see Version).
	Version string `json:"version"`
}

// jsonBlock is one ground, footing, bearing, settlement or capacity block.
// Values are SI (N, Pa, m, s, rad).
type jsonBlock struct {
	Kind      string             `json:"kind"`
	Name      string             `json:"name"`
	File      string             `json:"file"`
	Line      int                `json:"line"`
	Cases     []jsonCase         `json:"cases"`
	Governing *jsonCase          `json:"governing"`
	Cautions  []jsonCaution      `json:"cautions"`
	Results   map[string]float64 `json:"results"`
}

// jsonCase is one checked case: a bearing or sliding case (one design
// combination under one drainage condition), or one width of a capacity
// table.
type jsonCase struct {
	Name        string             `json:"name"`
	Check       string             `json:"check"` // bearing, sliding, settlement, capacity, differential
	Drainage    string             `json:"drainage,omitempty"`
	Combination string             `json:"combination,omitempty"`
	VD          float64            `json:"V_d"`
	HD          float64            `json:"H_d"`
	RD          float64            `json:"R_d"`
	Util        float64            `json:"util"`
	OK          bool               `json:"ok"`
	Factors     map[string]float64 `json:"factors"`
}

type jsonCaution struct {
	Code     string `json:"code"`
	Severity string `json:"severity"`
	Message  string `json:"message"`
	Case     string `json:"case"`
}

type jsonOverride struct {
	Arg   string `json:"arg"`
	Sheet string `json:"sheet"`
	Name  string `json:"name"`
}

type jsonSymbol struct {
	Name    string   `json:"name"`
	Value   float64  `json:"value"` // in Unit
	Unit    string   `json:"unit"`
	ValueSI float64  `json:"value_si"`
	SIUnit  string   `json:"si_unit"`
	File    string   `json:"file"`
	Line    int      `json:"line"`
	Note    string   `json:"note"`
	Input   bool     `json:"input"`
	Set     bool     `json:"set"` // overridden by --set
	Cites   []string `json:"cites"`
}

type jsonCheck struct {
	Expr        string   `json:"expr"`
	LHS         float64  `json:"lhs"` // in Unit
	RHS         float64  `json:"rhs"`
	Unit        string   `json:"unit"`
	Op          string   `json:"op"`
	Utilisation *float64 `json:"utilisation"` // null when undefined
	OK          bool     `json:"ok"`
	File        string   `json:"file"`
	Line        int      `json:"line"`
	Note        string   `json:"note"`
	// Reason says why a NOT OK engine check could not be verified
	// ("not verified: …"); empty otherwise.
	Reason string `json:"reason,omitempty"`
}

type jsonError struct {
	File    string `json:"file"`
	Line    int    `json:"line"`
	Col     int    `json:"col"`
	Message string `json:"message"`
}

// report builds the JSON object for a run.
func report(res *eval.Result, diags source.List) jsonReport {
	r := jsonReport{Overrides: []jsonOverride{}, Symbols: []jsonSymbol{}, Checks: []jsonCheck{}, Blocks: []jsonBlock{}, Errors: []jsonError{}, Context: []string{}, Version: Version()}
	for _, d := range diags {
		if d.Severity != source.Error {
			continue
		}
		p := d.Pos()
		msg := d.Msg
		if d.Hint != "" {
			msg += "; " + d.Hint
		}
		r.Errors = append(r.Errors, jsonError{File: p.Path, Line: p.Line, Col: p.Col, Message: msg})
	}
	if res == nil || diags.HasErrors() {
		return r
	}
	r.Variant = res.Variant()
	for _, t := range res.Context {
		r.Context = append(r.Context, t.Name())
	}
	for _, o := range res.Overrides {
		r.Overrides = append(r.Overrides, jsonOverride{Arg: o.Arg, Sheet: o.Target.Sheet.Name(), Name: o.Target.Name})
	}
	for _, s := range res.Sheets {
		for _, y := range s.Symbols {
			p := y.Span.Pos()
			cites := y.Cites
			if cites == nil {
				cites = []string{}
			}
			r.Symbols = append(r.Symbols, jsonSymbol{
				Name: y.Name, Value: y.Value(), Unit: y.Unit.Name,
				ValueSI: y.Q.V, SIUnit: units.SI(y.Q.Dim).Name,
				File: p.Path, Line: p.Line, Note: y.Note.Value,
				Input: y.Input, Set: y.Override != nil, Cites: cites,
			})
		}
	}
	for _, c := range res.Checks {
		p := c.Span.Pos()
		jc := jsonCheck{
			Expr: c.Text, LHS: c.L.In(c.Unit), RHS: c.R.In(c.Unit), Unit: c.Unit.Name,
			Op: c.Op, OK: c.OK, File: p.Path, Line: p.Line, Note: c.Note.Value, Reason: c.Unverified,
		}
		if c.HasUtil() && !math.IsInf(c.Util, 0) {
			u := c.Util
			jc.Utilisation = &u
		}
		r.Checks = append(r.Checks, jc)
	}
	for _, s := range res.Sheets {
		for _, b := range s.Blocks() {
			r.Blocks = append(r.Blocks, blockJSON(b))
		}
	}
	return r
}

// blockJSON converts an evaluated block.
func blockJSON(b *eval.Block) jsonBlock {
	p := b.Span.Pos()
	jb := jsonBlock{Kind: b.Kind.String(), Name: b.Name, File: p.Path, Line: p.Line,
		Cases: []jsonCase{}, Cautions: []jsonCaution{}, Results: map[string]float64{}}
	switch {
	case b.Ground != nil:
		for _, l := range b.Ground.Layers {
			for _, y := range l.Cells {
				if y != nil {
					jb.Results[y.Name] = y.Q.V
				}
			}
		}
		if b.Ground.Water != nil {
			jb.Results[b.Ground.Water.Name] = b.Ground.Water.Q.V
		}
	case b.Footing != nil:
		for _, row := range b.Footing.Rows {
			for _, y := range row {
				if y != nil {
					jb.Results[y.Name] = y.Q.V
				}
			}
		}
	}
	if br := b.Bearing; br != nil {
		for i, c := range br.Cases {
			jc := jsonCase{Name: c.Name, Check: "bearing", Drainage: c.Drainage.String(), Combination: c.Combination,
				VD: c.V, HD: c.H, RD: c.R, Util: c.Util, OK: c.OK, Factors: c.Factors}
			if jc.Factors == nil {
				jc.Factors = map[string]float64{}
			}
			jb.Cases = append(jb.Cases, jc)
			if i == br.Governing {
				g := jc
				jb.Governing = &g
			}
		}
		for _, c := range br.Sliding {
			jb.Cases = append(jb.Cases, jsonCase{Name: c.Name, Check: "sliding", Drainage: c.Drainage.String(), Combination: c.Combination,
				VD: c.V, HD: c.H, RD: c.R, Util: c.Util, OK: c.OK, Factors: map[string]float64{}})
		}
	}
	if sr := b.Settle; sr != nil {
		jc := jsonCase{Name: "total settlement, " + sr.Service.Name, Check: "settlement", VD: sr.Service.V,
			Util: sr.Util, OK: sr.OK, Factors: map[string]float64{"s_i": sr.Si, "s_c": sr.Sc, "s_sec": sr.Ssec, "s_total": sr.Total, "s_lim": sr.Limit}}
		jb.Cases = append(jb.Cases, jc)
		jb.Governing = &jc
	}
	if dr := b.Diff; dr != nil {
		jc := jsonCase{Name: dr.A.Of.Name + " to " + dr.B.Of.Name, Check: "differential", Util: dr.Util, OK: dr.OK,
			Factors: map[string]float64{"s_A": dr.A.Settle.Total, "s_B": dr.B.Settle.Total, "L": dr.Spacing,
				"delta_s": dr.Delta, "beta": dr.Beta, "beta_lim": dr.Limit}}
		jb.Cases = append(jb.Cases, jc)
		jb.Governing = &jc
	}
	if cr := b.Capacity; cr != nil {
		for i, row := range cr.Rows {
			jc := jsonCase{Name: fmt.Sprintf("B = %g m", row.B), Check: "capacity", Drainage: row.Drainage,
				RD: row.QAllow, OK: true, Factors: map[string]float64{"B": row.B, "L": row.L, "q_a_b": row.QBearing, "q_a_s": row.QSettle, "q_allow": row.QAllow}}
			jb.Cases = append(jb.Cases, jc)
			if i == cr.Own {
				g := jc
				jb.Governing = &g
			}
		}
	}
	if zr := b.Size; zr != nil {
		// one case per check at the chosen width, then at one increment
		// smaller; the governing case is the chosen width's governing check
		for _, t := range []*size.Trial{&zr.At, zr.Below} {
			if t == nil {
				continue
			}
			for i, ch := range t.Checks {
				jc := jsonCase{Name: fmt.Sprintf("B = %g m · %s", t.B, ch.Name), Check: "size", Combination: ch.Detail,
					Util: ch.Util, OK: ch.OK, Factors: map[string]float64{"B": t.B, "L": t.L}}
				jb.Cases = append(jb.Cases, jc)
				if t == &zr.At && i == t.Governing {
					g := jc
					jb.Governing = &g
				}
			}
		}
	}
	if sr := b.Schedule; sr != nil {
		// one case per footing at its chosen size, then one per pair of
		// neighbours; the governing case is the highest utilisation
		for i, row := range sr.Rows {
			gov := row.At.Checks[row.At.Governing]
			f := map[string]float64{"B": row.B, "L": row.L, "D": row.Footing.D, "x": sr.X[i], "y": sr.Y[i]}
			if row.Settle != nil {
				f["s_total"] = row.Settle.Total
			}
			jc := jsonCase{Name: sr.Names[i], Check: "size", Combination: gov.Name, Util: row.At.Util(), OK: row.At.OK, Factors: f}
			jb.Cases = append(jb.Cases, jc)
			if i == sr.RowMax {
				g := jc
				jb.Governing = &g
			}
		}
		for _, p := range sr.Pairs {
			jb.Cases = append(jb.Cases, jsonCase{Name: sr.Names[p.A] + " to " + sr.Names[p.B], Check: "differential", Util: p.Diff.Util, OK: p.Diff.OK,
				Factors: map[string]float64{"L": p.Spacing, "delta_s": p.Diff.Delta, "beta": p.Diff.Beta, "beta_lim": p.Diff.Limit}})
		}
	}
	if pr := b.Platform; pr != nil {
		for i, k := range pr.Cases {
			f := map[string]float64{"q_k": k.Q, "W": k.W, "L": k.L, "gamma_q": k.Factor, "q_d": k.QD, "R_s": k.Rs, "R_p": k.Rp, "D_req": k.DReq, "util_0": k.UtilNone, "D": pr.D}
			jc := jsonCase{Name: k.Name, Check: "platform", RD: k.Rd, Util: k.Util, OK: k.OK, Factors: f}
			jb.Cases = append(jb.Cases, jc)
			if i == pr.Governing {
				g := jc
				jb.Governing = &g
			}
		}
	}
	for _, c := range b.Cautions {
		jb.Cautions = append(jb.Cautions, jsonCaution{Code: c.Code, Severity: c.Severity.String(), Message: c.Message, Case: c.Case})
	}
	for _, y := range b.Results {
		jb.Results[strings.TrimPrefix(y.Name, b.Name+".")] = y.Q.V
	}
	return jb
}
