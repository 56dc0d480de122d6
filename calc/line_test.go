package calc

import (
	"bufio"
	"errors"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"
)

// lnReadTSV reads a reference table of testdata/refs: rows of
// tab-separated fields keyed by the header line, comments skipped.
func lnReadTSV(t *testing.T, name string) []map[string]string {
	t.Helper()
	fh, err := os.Open("../testdata/refs/" + name)
	if err != nil {
		t.Fatal(err)
	}
	defer fh.Close()
	var head []string
	var rows []map[string]string
	sc := bufio.NewScanner(fh)
	for sc.Scan() {
		line := sc.Text()
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		f := strings.Split(line, "\t")
		if head == nil {
			head = f
			continue
		}
		if len(f) != len(head) {
			t.Fatalf("%s: row %q has %d fields, want %d", name, line, len(f), len(head))
		}
		row := map[string]string{}
		for i, h := range head {
			row[h] = f[i]
		}
		rows = append(rows, row)
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	if len(rows) == 0 {
		t.Fatalf("%s: no rows", name)
	}
	return rows
}

// lnNum parses a field of a reference row.
func lnNum(t *testing.T, row map[string]string, key string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(row[key], 64)
	if err != nil {
		t.Fatalf("field %s of %v: %v", key, row, err)
	}
	return v
}

// lnRefCase is one line of line.tsv at one flow.
type lnRefCase struct {
	fl   Fluid
	q    float64
	line Line
	rows []map[string]string
}

// lnLoadRefs groups line.tsv by case and flow, in file order.
func lnLoadRefs(t *testing.T) (map[string]*lnRefCase, []string) {
	cases := map[string]*lnRefCase{}
	var order []string
	for _, row := range lnReadTSV(t, "line.tsv") {
		key := row["case"] + "@" + row["q"]
		c := cases[key]
		if c == nil {
			c = &lnRefCase{fl: Fluid{Density: lnNum(t, row, "rho"), Viscosity: lnNum(t, row, "mu")}, q: lnNum(t, row, "q")}
			cases[key] = c
			order = append(order, key)
		}
		c.line.Segments = append(c.line.Segments, Segment{
			Run:  Run{Length: lnNum(t, row, "l"), Diameter: lnNum(t, row, "d"), Roughness: lnNum(t, row, "eps"), ExtraK: lnNum(t, row, "k")},
			EndZ: lnNum(t, row, "end_z")})
		c.rows = append(c.rows, row)
	}
	return cases, order
}

// lnClose reports whether got is within rel of want (absolute for want 0).
func lnClose(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Max(math.Abs(want), 1e-300) || (want == 0 && got == 0)
}

// TestLineReference: every segment of the series lines in line.tsv
// (python3-mpmath at 40 digits: 64/Re or Colebrook–White by Lambert W,
// Darcy–Weisbach, Borda–Carnot expansion and the textbook contraction
// loss), within 1e-11 relative.
func TestLineReference(t *testing.T) {
	cases, order := lnLoadRefs(t)
	for _, key := range order {
		c := cases[key]
		res, err := c.line.Evaluate(c.fl, c.q)
		if err != nil {
			t.Fatalf("%s: %v", key, err)
		}
		var total float64
		for i, row := range c.rows {
			s := res.Segments[i]
			for _, chk := range []struct {
				name      string
				got, want float64
			}{
				{"re", s.Reynolds, lnNum(t, row, "re")},
				{"f", s.Friction, lnNum(t, row, "f")},
				{"major", s.MajorLoss, lnNum(t, row, "major")},
				{"minor", s.MinorLoss, lnNum(t, row, "minor")},
				{"transition", s.TransitionLoss, lnNum(t, row, "transition")},
			} {
				// python3-mpmath reference (line.tsv), 1e-11 relative.
				if !lnClose(chk.got, chk.want, 1e-11) {
					t.Errorf("%s segment %d %s = %.16g, want %.16g (line.tsv)", key, i+1, chk.name, chk.got, chk.want)
				}
			}
			total += lnNum(t, row, "major") + lnNum(t, row, "minor") + lnNum(t, row, "transition")
		}
		// Sum of the python3-mpmath segment losses (line.tsv).
		if !lnClose(res.TotalLoss, total, 1e-11) || res.TotalLoss != res.TotalLossLow || res.TotalLoss != res.TotalLossHigh {
			t.Errorf("%s: total %.16g (%g…%g), want %.16g (line.tsv)", key, res.TotalLoss, res.TotalLossLow, res.TotalLossHigh, total)
		}
		if !lnClose(res.MajorLoss+res.MinorLoss+res.TransitionLoss, res.TotalLoss, 1e-14) {
			t.Errorf("%s: split %g+%g+%g does not add to %g", key, res.MajorLoss, res.MinorLoss, res.TransitionLoss, res.TotalLoss)
		}
	}
}

// TestLineOneSegmentIsRun: a line of one segment is the run itself (the
// definition of Line.Evaluate: no transitions without a neighbour).
func TestLineOneSegmentIsRun(t *testing.T) {
	run := Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "exit", Count: 1}}}
	rr, err := run.Evaluate(testLiquid, 0.045)
	if err != nil {
		t.Fatal(err)
	}
	lr, err := Line{Segments: []Segment{{Run: run, EndZ: 30}}}.Evaluate(testLiquid, 0.045)
	if err != nil {
		t.Fatal(err)
	}
	if lr.TotalLoss != rr.TotalLoss || lr.Segments[0].TransitionLoss != 0 {
		t.Errorf("one segment: %g, run %g", lr.TotalLoss, rr.TotalLoss)
	}
}

// TestLineSplitSegment: cutting a uniform pipe into equal-diameter pieces
// changes nothing (Darcy–Weisbach losses are additive in length and no
// transition loss arises without a change of diameter).
func TestLineSplitSegment(t *testing.T) {
	whole := Run{Length: 300, Diameter: 0.15, Roughness: 0.05e-3, ExtraK: 3}
	rr, err := whole.Evaluate(testLiquid, 0.03)
	if err != nil {
		t.Fatal(err)
	}
	var l Line
	for i := 0; i < 3; i++ {
		l.Segments = append(l.Segments, Segment{Run: Run{Length: 100, Diameter: 0.15, Roughness: 0.05e-3, ExtraK: 1}, EndZ: float64(i)})
	}
	lr, err := l.Evaluate(testLiquid, 0.03)
	if err != nil {
		t.Fatal(err)
	}
	if !lnClose(lr.TotalLoss, rr.TotalLoss, 1e-13) || lr.TransitionLoss != 0 {
		t.Errorf("split: %.16g (transitions %g), whole %.16g", lr.TotalLoss, lr.TransitionLoss, rr.TotalLoss)
	}
}

// TestLineExpansionLimit: a segment opening into a very much larger one
// loses the whole upstream velocity head (Borda–Carnot with d2 ≫ d1: the
// exit loss, K → 1).
func TestLineExpansionLimit(t *testing.T) {
	l := Line{Segments: []Segment{
		{Run: Run{Length: 0, Diameter: 0.05}},
		{Run: Run{Length: 0, Diameter: 50}},
	}}
	lr, err := l.Evaluate(testLiquid, 0.002)
	if err != nil {
		t.Fatal(err)
	}
	v := 0.002 / (math.Pi * 0.05 * 0.05 / 4)
	if got, want := lr.Segments[1].TransitionLoss, v*v/(2*StandardGravity); !lnClose(got, want, 1e-5) {
		t.Errorf("expansion into a large pipe: %.8g m, want %.8g m (Borda–Carnot, K → 1)", got, want)
	}
}

// TestLineErrors: every bad input gives a *FieldError naming the segment's
// field (the share-link vocabulary sN.x), never a panic.
func TestLineErrors(t *testing.T) {
	ok := Segment{Run: Run{Length: 10, Diameter: 0.1}}
	many := make([]Segment, MaxSegments+1)
	for i := range many {
		many[i] = ok
	}
	tests := []struct {
		name  string
		line  Line
		fl    Fluid
		q     float64
		field string
	}{
		{"empty", Line{}, testLiquid, 0.01, "line"},
		{"too many", Line{Segments: many}, testLiquid, 0.01, "line"},
		{"length", Line{Segments: []Segment{ok, {Run: Run{Length: -1, Diameter: 0.1}}}}, testLiquid, 0.01, "2:length"},
		{"diameter", Line{Segments: []Segment{ok, {Run: Run{Length: 1}}}}, testLiquid, 0.01, "2:d"},
		{"roughness", Line{Segments: []Segment{{Run: Run{Length: 1, Diameter: 0.1, Roughness: 0.01}}}}, testLiquid, 0.01, "1:eps"},
		{"fitting", Line{Segments: []Segment{ok, ok, {Run: Run{Length: 1, Diameter: 0.1, Fittings: []FittingCount{{Key: "nosuch", Count: 1}}}}}}, testLiquid, 0.01, "3:fit"},
		{"k", Line{Segments: []Segment{{Run: Run{Length: 1, Diameter: 0.1, ExtraK: math.NaN()}}}}, testLiquid, 0.01, "1:k"},
		{"method", Line{Segments: []Segment{{Run: Run{Length: 1, Diameter: 0.1, Method: 9}}}}, testLiquid, 0.01, "1:method"},
		{"hazen c", Line{Segments: []Segment{{Run: Run{Length: 1, Diameter: 0.1, Method: MethodHazenWilliams}}}}, testLiquid, 0.01, "1:chw"},
		{"end z", Line{Segments: []Segment{ok, {Run: ok.Run, EndZ: math.Inf(1)}}}, testLiquid, 0.01, "2:z"},
		{"viscosity", Line{Segments: []Segment{ok}}, Fluid{Density: 1000}, 0.01, "mu"},
		{"flow", Line{Segments: []Segment{ok}}, testLiquid, -1, "q"},
		{"flow NaN", Line{Segments: []Segment{ok}}, testLiquid, math.NaN(), "q"},
	}
	for _, tc := range tests {
		_, err := tc.line.Evaluate(tc.fl, tc.q)
		var fe *FieldError
		// A segment's error names the segment and its field ("2:length").
		if !errors.As(err, &fe) || segField(fe) != tc.field {
			t.Errorf("%s: got %v, want a *FieldError for %q", tc.name, err, tc.field)
		}
	}
}

// TestLineLossThrough: the suction part of a line is the sum of its
// segments and the transitions inside it (definition of LossThrough).
func TestLineLossThrough(t *testing.T) {
	cases, order := lnLoadRefs(t)
	c := cases[order[0]]
	lr, err := c.line.Evaluate(c.fl, c.q)
	if err != nil {
		t.Fatal(err)
	}
	want := lr.Segments[0].TotalLoss + lr.Segments[1].TotalLoss + lr.Segments[1].TransitionLoss
	if got := lr.LossThrough(2); got != want {
		t.Errorf("LossThrough(2) = %g, want %g", got, want)
	}
	if lr.LossThrough(0) != 0 || lr.LossThrough(99) != lr.TotalLoss {
		t.Errorf("LossThrough ends: %g, %g (total %g)", lr.LossThrough(0), lr.LossThrough(99), lr.TotalLoss)
	}
}

// segField writes a FieldError's segment and field as "2:length", or the
// field alone when no segment is named.
func segField(fe *FieldError) string {
	if fe.Segment > 0 {
		return strconv.Itoa(fe.Segment) + ":" + fe.Field
	}
	return fe.Field
}
