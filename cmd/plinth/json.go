package main

import (
	"math"

	"plinth/calc/units"
	"plinth/doc/eval"
	"plinth/doc/source"
)

// The JSON printed by "plinth check --json". This is an interface: fields
// are added, never renamed or removed; the README documents it.
type jsonReport struct {
	Variant   bool           `json:"variant"`
	Overrides []jsonOverride `json:"overrides"`
	Symbols   []jsonSymbol   `json:"symbols"`
	Checks    []jsonCheck    `json:"checks"`
	Errors    []jsonError    `json:"errors"`
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
}

type jsonError struct {
	File    string `json:"file"`
	Line    int    `json:"line"`
	Col     int    `json:"col"`
	Message string `json:"message"`
}

// report builds the JSON object for a run.
func report(res *eval.Result, diags source.List) jsonReport {
	r := jsonReport{Overrides: []jsonOverride{}, Symbols: []jsonSymbol{}, Checks: []jsonCheck{}, Errors: []jsonError{}}
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
			Op: c.Op, OK: c.OK, File: p.Path, Line: p.Line, Note: c.Note.Value,
		}
		if c.HasUtil() && !math.IsInf(c.Util, 0) {
			u := c.Util
			jc.Utilisation = &u
		}
		r.Checks = append(r.Checks, jc)
	}
	return r
}
