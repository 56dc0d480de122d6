package chart

import (
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"
	"testing"
)

// rendered draws c and returns its renderer (for the label boxes it
// placed) and the SVG text.
func rendered(c Chart) (*renderer, string) {
	r := newRenderer(&c)
	return r, string(r.render(nil))
}

// TestPlaceLabelsApart: no two label boxes the chart draws intersect, on
// the demo's pump chart at a desktop's and a phone's width and on a
// crowded chart (ten labelled points in a small plot, some on top of each
// other); every box lies inside its SVG; a label that finds no free spot
// is written under the plot, numbered. The figures are invented.
func TestPlaceLabelsApart(t *testing.T) {
	crowded := demoPumpInput()
	crowded.Width, crowded.Height = 300, 320
	for i := 0; i < 10; i++ {
		q := 30 + float64(i%4)*3
		crowded.Measured = append(crowded.Measured, Marker{X: q, Y: 45 - float64(i%3), DX: 1, DY: 1.5,
			Label: fmt.Sprintf("reading %d\n%.1f L/s, %.1f m", i+1, q, 45-float64(i%3))})
	}
	phone := demoPumpInput()
	phone.Width = 360
	cases := map[string]PumpSystemInput{"demo 720": demoPumpInput(), "demo 360": phone, "crowded 300": crowded}
	cases["demo 720"] = func() PumpSystemInput { in := demoPumpInput(); in.Width = 720; return in }()
	for name, in := range cases {
		t.Run(name, func(t *testing.T) {
			c := PumpSystemChart(in)
			r, svg := rendered(c)
			boxes := r.labelBoxes
			if len(boxes) < 3 {
				t.Fatalf("only %d labels placed", len(boxes))
			}
			for i := range boxes {
				a := boxes[i]
				if a.l < 0 || a.r > r.w || a.t < 0 || a.b > r.h {
					t.Errorf("label box %d %+v outside the picture %.0f × %.0f", i, a, r.w, r.h)
				}
				for j := i + 1; j < len(boxes); j++ {
					if a.overlaps(boxes[j]) {
						t.Errorf("label boxes %d %+v and %d %+v intersect", i, a, j, boxes[j])
					}
				}
			}
			checkInside(t, readSVG(t, svg))
		})
	}
	// The crowded chart cannot place every label beside its point: the
	// rest are numbered notes under the plot, none lost.
	_, svg := rendered(PumpSystemChart(crowded))
	for i := 1; i <= 10; i++ {
		if !regexp.MustCompile(`>(\d+\s+)?reading ` + strconv.Itoa(i) + `( |<)`).MatchString(svg) {
			t.Errorf("reading %d's label is neither on the plot nor in the notes", i)
		}
	}
}

// TestPlacerFirstFree: the placer takes the first candidate that is
// inside its bounds and free of labels, prefers one clear of symbols and
// lines, and refuses when none is free.
func TestPlacerFirstFree(t *testing.T) {
	nan := math.NaN()
	pl := placer{bounds: rect{0, 0, 100, 100}}
	if i := pl.place([]rect{{-5, 0, 10, 10}, {0, 0, 10, 10}}, nan, nan); i != 1 {
		t.Errorf("took spot %d, want 1 (the first is outside the bounds)", i)
	}
	if i := pl.place([]rect{{5, 5, 15, 15}, {20, 0, 30, 10}}, nan, nan); i != 1 {
		t.Errorf("took spot %d, want 1 (the first overlaps a label)", i)
	}
	pl.marks = append(pl.marks, rect{40, 0, 50, 10})
	if i := pl.place([]rect{{40, 0, 50, 10}, {60, 0, 70, 10}}, nan, nan); i != 1 {
		t.Errorf("took spot %d, want 1 (the first covers a symbol)", i)
	}
	pl.segs = append(pl.segs, [4]float64{60, 20, 70, 30})
	if i := pl.place([]rect{{58, 18, 72, 32}, {80, 20, 90, 30}}, nan, nan); i != 1 {
		t.Errorf("took spot %d, want 1 (the first crosses a line)", i)
	}
	if i := pl.place([]rect{{0, 0, 10, 10}, {22, 2, 28, 8}}, nan, nan); i != -1 {
		t.Errorf("took spot %d, want none (every spot overlaps a label)", i)
	}
	// A spot whose leader from the point (25, 90) would cross a label
	// (at 20–30, 50–60) is not free; one beside the point is.
	pl.taken = append(pl.taken, rect{20, 50, 30, 60})
	if i := pl.place([]rect{{20, 20, 30, 25}, {30, 80, 40, 85}}, 25, 90); i != 1 {
		t.Errorf("took spot %d, want 1 (the first one's leader crosses a label)", i)
	}
}

// TestUncertaintyBoxSize: the measured point's box spans ±DX and ±DY in
// the chart's own units: its width over the plot's width is 2·DX over the
// flow axis' span, its height likewise in head. The figures are invented
// (a reading of 41 L/s ± 0.82, 50.8 m ± 1.9).
func TestUncertaintyBoxSize(t *testing.T) {
	in := demoPumpInput()
	in.Measured = []Marker{{X: 41, Y: 50.8, DX: 0.82, DY: 1.9, Label: "measured"}}
	c := PumpSystemChart(in)
	r, svg := rendered(c)
	m := regexp.MustCompile(`<g data-mark="uncertainty"><rect x="([^"]+)" y="([^"]+)" width="([^"]+)" height="([^"]+)"`).FindStringSubmatch(svg)
	if m == nil {
		t.Fatal("no uncertainty box drawn")
	}
	num := func(s string) float64 { v, _ := strconv.ParseFloat(s, 64); return v }
	p := r.panels[0]
	wantW := 2 * 0.82 / (r.x.hi - r.x.lo) * (p.plot.r - p.plot.l)
	wantH := 2 * 1.9 / (p.y.hi - p.y.lo) * (p.plot.b - p.plot.t)
	if math.Abs(num(m[3])-wantW) > 0.1 || math.Abs(num(m[4])-wantH) > 0.1 {
		t.Errorf("box %s × %s px, want %.2f × %.2f", m[3], m[4], wantW, wantH)
	}
	if cx, cy := num(m[1])+num(m[3])/2, num(m[2])+num(m[4])/2; math.Abs(cx-r.x.px(41)) > 0.1 || math.Abs(cy-p.y.px(50.8)) > 0.1 {
		t.Errorf("box centred at (%.1f, %.1f), the point is at (%.1f, %.1f)", cx, cy, r.x.px(41), p.y.px(50.8))
	}
	if !regexp.MustCompile(`<g data-mark="measured"><circle[^>]* fill="#ffffff"`).MatchString(svg) {
		t.Error("the measured point is not drawn as an open circle")
	}
}

// TestLabelsByTheirMarks measures the distance from each marker's label to
// its mark (box edge to point, viewBox px) on the demo's pump chart and on
// a test at five flows with a guarantee point, at a tablet's and a phone's
// width: each is at most labelReach, or the label is numbered under the
// plot. The figures are invented.
func TestLabelsByTheirMarks(t *testing.T) {
	test := demoPumpInput()
	for i, p := range [][2]float64{{20, 58}, {30, 54.2}, {41, 46.7}, {50, 40.7}, {58, 34}} {
		test.Measured = append(test.Measured, Marker{X: p[0], Y: p[1], DX: 0.8, DY: 1.2,
			Label: fmt.Sprintf("reading %d\n%.1f L/s, %.1f m", i+1, p[0], p[1])})
	}
	test.Tested = Curve{Name: "tested", X: []float64{20, 30, 41, 50, 58}, Y: []float64{58, 54.2, 46.7, 40.7, 34}}
	test.Guarantee = &Marker{X: 45, Y: 49.7, Label: "guarantee\n45 L/s, 49.7 m"}
	test.Cross = &TolCross{X: 45, Y: 49.7, X0: 41.4, X1: 48.6, Y0: 47.2, Y1: 52.1}
	for _, w := range []int{720, 360} {
		for name, in := range map[string]PumpSystemInput{"demo": demoPumpInput(), "test": test} {
			in.Width = w
			r, _ := rendered(PumpSystemChart(in))
			if len(r.markLabels) == 0 {
				t.Fatalf("%s %d: no marker labels", name, w)
			}
			for _, m := range r.markLabels {
				if m.numbered {
					t.Logf("%s %d: %q numbered under the plot", name, w, m.text)
					continue
				}
				nx, ny := m.box.nearest(m.x, m.y)
				d := math.Hypot(nx-m.x, ny-m.y)
				t.Logf("%s %d: %q %.1f px from its mark", name, w, m.text, d)
				if d > labelReach {
					t.Errorf("%s %d: %q sits %.1f px from its mark, more than %d", name, w, m.text, d, labelReach)
				}
			}
		}
	}
}

// TestMisleads: a spot is priced up for each earlier leader its own would
// cross and for each other mark nearer to it than its own point; crosses
// counts only a crossing inside both segments. Plane geometry, checked by
// hand.
func TestMisleads(t *testing.T) {
	for _, c := range []struct {
		name string
		seg  [8]float64
		want bool
	}{
		{"an X", [8]float64{0, 0, 10, 10, 0, 10, 10, 0}, true},
		{"a T touching at an end", [8]float64{0, 0, 10, 0, 5, 0, 5, 10}, false},
		{"parallel", [8]float64{0, 0, 10, 0, 0, 1, 10, 1}, false},
		{"apart", [8]float64{0, 0, 1, 1, 5, 5, 6, 4}, false},
	} {
		s := c.seg
		if got := crosses(s[0], s[1], s[2], s[3], s[4], s[5], s[6], s[7]); got != c.want {
			t.Errorf("%s: crosses %v, want %v", c.name, got, c.want)
		}
	}
	pl := placer{bounds: rect{0, 0, 400, 400}}
	pl.marks = []rect{{96, 96, 104, 104}, {196, 96, 204, 104}} // the own mark at (100, 100), another at (200, 100)
	near := rect{110, 110, 150, 124}                           // beside its own mark
	other := rect{205, 110, 245, 124}                          // beside the other mark
	if got := pl.misleads(near, 100, 100); got != 0 {
		t.Errorf("a spot beside its own mark costs %v, want 0", got)
	}
	if got := pl.misleads(other, 100, 100); got != 1 {
		t.Errorf("a spot beside another mark costs %v, want 1 (that mark is nearer than its own)", got)
	}
	pl.leaders = [][4]float64{{150, 50, 150, 200}} // an earlier leader, upright at x = 150
	if got := pl.misleads(other, 100, 100); got != 3 {
		t.Errorf("a spot whose leader crosses an earlier one costs %v, want 3", got)
	}
	if got := pl.misleads(other, math.NaN(), math.NaN()); got != 0 {
		t.Errorf("a label of no point costs %v, want 0", got)
	}
}

// TestNoteLines: numbered notes share a line while whole notes fit it,
// each starting noteGap after the last, and a note wider than a line is
// wrapped on lines of its own. Widths by textWidth; checked by hand.
func TestNoteLines(t *testing.T) {
	notes := []string{"reading 1 41.00 L/s, 46.71 m", "reading 5 58.00 L/s, 34.01 m", "best efficiency 55.83 L/s, 76.01 %"}
	wide := noteLines(notes, 776) // a printed chart: 800 wide, less its padding
	if len(wide) != 1 || len(wide[0]) != 3 {
		t.Fatalf("776 px: %d lines (%v), want the three notes on one", len(wide), wide)
	}
	if w0 := textWidth("1  "+notes[0], fontSmall); math.Abs(wide[0][1].x-(w0+noteGap)) > 1e-9 {
		t.Errorf("the second note starts at %v, want %v", wide[0][1].x, w0+noteGap)
	}
	narrow := noteLines(notes, 280)
	if len(narrow) != 3 {
		t.Errorf("280 px: %d lines, want one note to a line", len(narrow))
	}
	long := noteLines([]string{strings.Repeat("reading 12 ", 12)}, 280)
	if len(long) < 2 {
		t.Errorf("a note wider than the line stays on %d line", len(long))
	}
	for _, l := range long {
		if len(l) != 1 || l[0].x != 0 || textWidth(l[0].text, fontSmall) > 280 {
			t.Errorf("a wrapped note's line %v is not a line of its own within 280 px", l)
		}
	}
}
