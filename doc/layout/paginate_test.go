package layout

import "testing"

// testEngine is an engine on the A4 template with a text column of the
// given height.
func testEngine(t *testing.T, h float64) *engine {
	tpl, err := BuiltinTemplate("a4")
	if err != nil {
		t.Fatal(err)
	}
	return &engine{tpl: tpl, bodyY: 50, bodyH: h, bodyX: 40}
}

// stack is n pieces of height h with gap g above each.
func stack(n int, h, g float64) []*piece {
	ps := make([]*piece, n)
	for i := range ps {
		ps[i] = &piece{box: &Box{Kind: "line", H: h}, before: g}
	}
	return ps
}

// TestPaginateTakesBackShortTail: a sheet whose last page would hold only
// a short tail is set with its spacing reduced when that saves the page
// (vertical glue shrinking, as a typesetter does), never below minShrink
// of it; pieces stay in order, inside the column, apart.
func TestPaginateTakesBackShortTail(t *testing.T) {
	const col = 700.0
	cases := []struct {
		name  string
		ps    []*piece
		pages int
		gap   float64 // the space between the first two pieces, as set
	}{
		// 50 × (12 + 4) = 800 − 4: 96 pt over one page at full spacing;
		// at 0.65 of it the stack is 50·12 + 49·2.6 = 727 (two pages),
		// at 0.5, 50·12 + 49·2 = 698: one page.
		{"taken back", stack(50, 12, 4), 1, 2},
		// a long tail is not worth squeezing: two pages, full spacing
		{"long tail", stack(70, 12, 4), 2, 4},
		// a short tail that even the least spacing cannot take back
		{"cannot", stack(59, 12, 4), 2, 4},
		{"one page", stack(10, 12, 4), 1, 4},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			e := testEngine(t, col)
			pages, _ := e.paginate(0, c.ps)
			if len(pages) != c.pages {
				t.Fatalf("%d pages, want %d", len(pages), c.pages)
			}
			if g := pages[0].Boxes[1].Y - (pages[0].Boxes[0].Y + pages[0].Boxes[0].H); g < c.gap-1e-9 || g > c.gap+1e-9 {
				t.Errorf("gap %.2f pt, want %.2f", g, c.gap)
			}
			n := 0
			for _, pg := range pages {
				prev := e.bodyY
				for _, b := range pg.Boxes {
					if b.Y < prev-1e-9 || b.Y+b.H > e.bodyY+e.bodyH+1e-6 {
						t.Errorf("box at %.1f–%.1f: out of order or outside the column", b.Y, b.Y+b.H)
					}
					prev = b.Y + b.H
					n++
				}
			}
			if n != len(c.ps) {
				t.Errorf("%d boxes placed, want %d", n, len(c.ps))
			}
		})
	}
}
