package size_test

import (
	"fmt"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/size"
)

// grid is an invented building: n × m columns at 6 m centres, the
// reactions varying by position (corner, edge, interior bays).
func grid(n, m int) []size.Row {
	var rows []size.Row
	for i := 0; i < n; i++ {
		for j := 0; j < m; j++ {
			edge := 0
			if i == 0 || i == n-1 {
				edge++
			}
			if j == 0 || j == m-1 {
				edge++
			}
			G := []float64{900e3, 600e3, 350e3}[edge] + float64((i*7+j*3)%5)*20e3
			rows = append(rows, size.Row{Name: fmt.Sprintf("%c%d", 'A'+i, j+1), X: 6 * float64(j), Y: 6 * float64(i), Actions: acts(G, G/3, 0)})
		}
	}
	return rows
}

func base() size.Input {
	return size.Input{Bearing: bearing.Input{Ground: clay(), Footing: site.Footing{Shape: site.Square, D: 1}},
		Settle: &settle.Input{Limit: site.Some(0.025)}}
}

// Every row of a schedule is sized exactly as the sizing of that footing
// alone; the neighbours of a regular grid are the grid lines (Gabriel
// graph: 2·n·m − n − m pairs); each pair's distortion is |s_A − s_B|/L by
// hand.
func TestScheduleAgreesWithRows(t *testing.T) {
	rows := grid(10, 10)
	s, err := size.SizeSchedule(size.ScheduleInput{Base: base(), Rows: rows})
	if err != nil {
		t.Fatal(err)
	}
	for i, r := range rows {
		in := base()
		in.Bearing.Footing.Name = r.Name
		in.Bearing.Actions = r.Actions
		one, err := size.Size(in)
		if err != nil {
			t.Fatal(err)
		}
		if one.B != s.Rows[i].B || one.At.Util() != s.Rows[i].At.Util() || one.Settle.Total != s.Rows[i].Settle.Total {
			t.Errorf("%s: schedule B %v util %v, alone %v %v", r.Name, s.Rows[i].B, s.Rows[i].At.Util(), one.B, one.At.Util())
		}
	}
	if want := 2*10*10 - 10 - 10; len(s.Pairs) != want {
		t.Errorf("%d neighbour pairs, want %d", len(s.Pairs), want)
	}
	for _, p := range s.Pairs {
		if p.Spacing != 6 {
			t.Errorf("pair %s–%s at %v m: not a grid line", rows[p.A].Name, rows[p.B].Name, p.Spacing)
		}
		beta := math.Abs(s.Rows[p.A].Settle.Total-s.Rows[p.B].Settle.Total) / 6
		if math.Abs(p.Diff.Beta-beta) > 1e-15 {
			t.Errorf("β = %v, hand %v", p.Diff.Beta, beta)
		}
		if p.Diff.Beta > s.BetaMax {
			t.Error("BetaMax is not the largest")
		}
	}
	for _, r := range s.Rows {
		if r.At.Util() > s.UtilMax {
			t.Error("UtilMax is not the largest")
		}
	}
}

func TestScheduleBadRows(t *testing.T) {
	rows := grid(2, 2)
	rows[1].Name = rows[0].Name
	rows[3].X, rows[3].Y = rows[2].X, rows[2].Y
	rows[2].Actions = nil
	_, err := size.SizeSchedule(size.ScheduleInput{Base: base(), Rows: rows})
	if err == nil {
		t.Fatal("no error")
	}
	errs, _ := err.(site.Errors)
	if len(errs) != 3 {
		t.Errorf("want 3 row errors, got %v", err)
	}
	t.Log(err)
}

// A 200-row schedule sized with settlement. Target: under 1 s end to end
// through check (this is the engine part).
func BenchmarkSchedule200(b *testing.B) {
	rows := grid(10, 20)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := size.SizeSchedule(size.ScheduleInput{Base: base(), Rows: rows}); err != nil {
			b.Fatal(err)
		}
	}
}

// Rows with the same depth, ground and actions are marked like the first
// of them (Schedule.Like), and are sized the same: equal width and
// utilisation (they are sized independently all the same).
func TestScheduleLikeRows(t *testing.T) {
	rows := []size.Row{
		{Name: "A1", X: 0, Actions: acts(350e3, 120e3, 0)},
		{Name: "A2", X: 6, Actions: acts(600e3, 200e3, 0)},
		{Name: "A3", X: 12, Actions: acts(600e3, 200e3, 0)},
		{Name: "A4", X: 18, Actions: acts(350e3, 120e3, 0)},
		{Name: "A5", X: 24, D: site.Some(1.5), Actions: acts(350e3, 120e3, 0)},
	}
	s, err := size.SizeSchedule(size.ScheduleInput{Base: base(), Rows: rows})
	if err != nil {
		t.Fatal(err)
	}
	if want := []int{-1, -1, 1, 0, -1}; fmt.Sprint(s.Like) != fmt.Sprint(want) {
		t.Fatalf("Like = %v, want %v", s.Like, want)
	}
	for i, j := range s.Like {
		if j >= 0 && (s.Rows[i].B != s.Rows[j].B || s.Rows[i].At.Util() != s.Rows[j].At.Util()) {
			t.Errorf("%s like %s: B %v util %v, against %v %v", rows[i].Name, rows[j].Name, s.Rows[i].B, s.Rows[i].At.Util(), s.Rows[j].B, s.Rows[j].At.Util())
		}
	}
}
