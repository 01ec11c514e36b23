package compose_test

import (
	"fmt"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
)

// cellText is the plain text of a table cell (math runs left out).
func cellText(c layout.Cell) string {
	var b strings.Builder
	for _, r := range c {
		b.WriteString(r.Text)
	}
	return b.String()
}

// TestSummary: the summary of results lists every footing block of the
// example, and each row's bearing, sliding and settlement verdicts and
// utilisations are those of the governing checks in the check register,
// which is what check --json prints (cmd/plinth builds its checks list
// from the same eval.Result.Checks).
func TestSummary(t *testing.T) {
	res := evaluate(t, "../../examples/brackenfield")
	doc, d := compose.Document(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	var table *layout.Table
	for _, sh := range doc.Sheets {
		if sh.Bookmark != "Summary of results" {
			continue
		}
		for _, b := range sh.Blocks {
			if tb, ok := b.(*layout.Table); ok && len(tb.Header) > 0 && cellText(tb.Header[0]) == "Foundation" {
				table = tb
			}
		}
	}
	if table == nil {
		t.Fatal("no summary of results table")
	}
	rows := map[string]layout.Row{}
	for _, r := range table.Rows {
		rows[strings.TrimSpace(r.Cells[0][0].Text)] = r
	}
	var footings []*eval.Block
	for _, s := range res.Sheets {
		for _, b := range s.Blocks() {
			if b.Footing != nil {
				footings = append(footings, b)
			}
		}
	}
	if len(footings) == 0 || len(rows) != len(footings) {
		t.Fatalf("summary has %d rows for %d footing blocks", len(rows), len(footings))
	}
	col := map[string]int{"bearing": 1, "sliding": 2, "settlement": 3}
	for _, f := range footings {
		row, ok := rows[f.Name]
		if !ok {
			t.Errorf("footing %s is not in the summary", f.Name)
			continue
		}
		for kind, j := range col {
			var worst *eval.Check
			for _, ch := range res.Checks {
				if strings.HasPrefix(ch.Text, f.Name+" "+kind+":") && (worst == nil || ch.Util > worst.Util) {
					worst = ch
				}
			}
			got := cellText(row.Cells[j])
			if worst == nil {
				if got != "—" {
					t.Errorf("%s %s: summary says %q, the register has no such check", f.Name, kind, got)
				}
				continue
			}
			if !strings.Contains(got, worst.Verdict()) || worst.OK && strings.Contains(got, "NOT OK") {
				t.Errorf("%s %s: summary %q, register verdict %s", f.Name, kind, got, worst.Verdict())
			}
			if kind != "settlement" && !strings.Contains(got, fmt.Sprintf("%.2f", worst.Util)) {
				t.Errorf("%s %s: summary %q lacks utilisation %.2f", f.Name, kind, got, worst.Util)
			}
		}
	}
}

// TestDetail: detail = full prints every case in place, with no
// appendix; the default (governing) moves the distant cases there, so
// the sheets themselves (cover to the last calculation sheet) are
// shorter.
func TestDetail(t *testing.T) {
	res := evaluate(t, "../../examples/brackenfield")
	count := func() (main, total int, apx bool) {
		pages, d := pagesOf(res, compose.Options{})
		if d.HasErrors() {
			t.Fatal(d)
		}
		doc, _ := compose.Document(res, compose.Options{})
		for _, sh := range doc.Sheets {
			if strings.HasPrefix(sh.Bookmark, "Appendix") {
				apx = true
			}
		}
		last := 1 + len(res.Sheets) // cover, summary, the sheets
		for _, pg := range pages.Pages {
			if pg.Sheet <= last {
				main++
			}
		}
		return main, len(pages.Pages), apx
	}
	gov, govTotal, govApx := count()
	res.Src.Meta.Detail.Value = "full"
	full, fullTotal, fullApx := count()
	if !govApx || fullApx {
		t.Errorf("appendix: governing %v, full %v; want true, false", govApx, fullApx)
	}
	if gov >= full {
		t.Errorf("the sheets take %d pages with detail = governing, %d with full: want fewer", gov, full)
	}
	t.Logf("pages to the last sheet: governing %d, full %d; in all: governing %d, full %d", gov, full, govTotal, fullTotal)
}
