package chart

import (
	"math"
	"strings"
	"sync"
	"testing"
)

func ramp(n int, f func(float64) float64) (x, y []float64) {
	for i := 0; i < n; i++ {
		v := float64(i)
		x = append(x, v)
		y = append(y, f(v))
	}
	return x, y
}

func TestWellFormedAndLabelled(t *testing.T) {
	x, y := ramp(30, func(v float64) float64 { return 60 - 0.03*v*v })
	x2, y2 := ramp(30, func(v float64) float64 { return 20 + 0.02*v*v })
	cases := []struct {
		name string
		c    Chart
		want []string // text that must appear as character data
	}{
		{"plain", Chart{Title: "plain", XLabel: "flow Q (L/s)", YLabel: "head H (m)",
			Series: []Series{{Name: "pump", X: x, Y: y}, {Name: "line", X: x2, Y: y2, Style: Dashed}}},
			[]string{"flow Q (L/s)", "head H (m)", "pump", "line"}},
		{"every style", Chart{XLabel: "x (m)", YLabel: "y (m)", Series: []Series{
			{Name: "solid", X: x, Y: y}, {Name: "dashed", X: x, Y: y2, Style: Dashed},
			{Name: "dotted", X: x2, Y: y, Style: Dotted}, {Name: "dash-dot", X: x2, Y: y2, Style: DashDot},
			{Name: "long dash", X: x, Y: y, Style: LongDash}, {Name: "area", X: x, Y: y2, Style: Area},
			{Name: "points", X: x, Y: y, Style: Points}}},
			[]string{"solid", "dashed", "dotted", "dash-dot", "long dash", "area", "points"}},
		{"markers and bands", Chart{XLabel: "Q", YLabel: "H",
			Series:  []Series{{Name: "s", X: x, Y: y}},
			Markers: []Marker{{X: 10, Y: 57, Label: "duty\n10 L/s", Accent: true, Drop: true}, {X: 20, Y: 48, Label: "b", Shape: Diamond}},
			Bands:   []Band{{X0: 25, X1: math.Inf(1), Label: "beyond data sheet"}, {X0: 5, X1: 5, Label: "guide"}}},
			[]string{"duty", "10 L/s", "beyond data sheet", "guide"}},
		{"second axis and lower panel", Chart{XLabel: "Q (L/s)", YLabel: "H (m)",
			Series: []Series{{Name: "head", X: x, Y: y}, {Name: "eff", X: x, Y: y2, Y2: true, Style: Dotted}},
			Y2:     &Axis{Label: "η (%)"},
			Lower:  &Chart{YLabel: "NPSH (m)", Series: []Series{{Name: "NPSHr", X: x, Y: y2}}}},
			[]string{"head", "eff (right axis)", "η (%)", "NPSH (m)", "NPSHr"}},
		{"narrow phone width", Chart{Width: 360, XLabel: "distance (m)", YLabel: "elevation (m)",
			Series: []Series{{Name: "pipe", X: x, Y: y}}},
			[]string{"distance (m)", "elevation (m)", "pipe"}},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			s := tc.c.SVG()
			p := readSVG(t, s)
			checkInside(t, p)
			for _, w := range tc.want {
				if !strings.Contains(p.text, w) {
					t.Errorf("text %q missing from %q", w, p.text)
				}
			}
			// Accessibility: role and a title element (WAI-ARIA 1.1 "img" role, common practice for SVG).
			if p.attr("role") != "img" || p.elements["title"] != 1 || p.elements["desc"] != 1 {
				t.Errorf("want role=img, one <title>, one <desc>; got role %q, %v", p.attr("role"), p.elements)
			}
			// Responsive sizing: width 100 %, aspect from the viewBox (SVG 1.1 §7.7-7.8).
			if p.attr("width") != "100%" || p.attr("preserveAspectRatio") != "xMidYMid meet" {
				t.Errorf("sizing attributes: width %q, preserveAspectRatio %q", p.attr("width"), p.attr("preserveAspectRatio"))
			}
			for _, bad := range []string{"NaN", "Inf", "<script", "@import", "url(", "<image", "<style", "href"} {
				if strings.Contains(s, bad) {
					t.Errorf("output contains %q", bad)
				}
			}
		})
	}
}

func TestFontSizes(t *testing.T) {
	// Brief: text readable on a tablet, at least 14 px at a width of 800 (design requirement).
	x, y := ramp(5, func(v float64) float64 { return v })
	c := Chart{Title: "t", XLabel: "x", YLabel: "y", Series: []Series{{Name: "a", X: x, Y: y}},
		Bands: []Band{{X0: 1, X1: 2, Label: "band"}}, Markers: []Marker{{X: 2, Y: 2, Label: "m"}}}
	p := readSVG(t, c.SVG())
	if p.w != 800 {
		t.Fatalf("default width %v, want 800", p.w)
	}
	n := 0
	for _, a := range p.attrs {
		if a.Name.Local == "font-size" {
			n++
			if v := parseF(a.Value); v < 14 {
				t.Errorf("font-size %v < 14", v)
			}
		}
	}
	if n == 0 {
		t.Error("no font-size found")
	}
	// System fonts only: the family is inherited unless the caller names one.
	if got := p.attr("font-family"); got != "inherit" {
		t.Errorf("font-family %q, want inherit", got)
	}
}

func parseF(s string) float64 {
	var v float64
	for _, f := range strings.Fields(s) {
		x := 0.0
		frac := 0.0
		for _, c := range f {
			switch {
			case c >= '0' && c <= '9' && frac == 0:
				x = x*10 + float64(c-'0')
			case c >= '0' && c <= '9':
				x += float64(c-'0') * frac
				frac /= 10
			case c == '.':
				frac = 0.1
			}
		}
		v = x
	}
	return v
}

func TestEscaping(t *testing.T) {
	// XML 1.0 §2.4: "<" and "&" must be escaped in character data, quotes in attributes.
	evil := `<script>alert("x")</script> & 'q'`
	x, y := ramp(4, func(v float64) float64 { return v })
	c := Chart{Title: evil, XLabel: evil, YLabel: evil, NoData: evil,
		Series:  []Series{{Name: evil, X: x, Y: y}},
		Markers: []Marker{{X: 1, Y: 1, Label: evil}},
		Bands:   []Band{{X0: 2, X1: 3, Label: evil}},
		Y2:      &Axis{Label: evil}, Accent: `red" onload="alert(1)`, FontFamily: `x" onload="y`}
	for _, cc := range []Chart{c, {Title: evil, NoData: evil}} {
		s := cc.SVG()
		p := readSVG(t, s)
		if strings.Contains(s, "<script") || strings.Contains(s, `onload="`) {
			t.Errorf("markup leaked: %s", s)
		}
		if !strings.Contains(p.text, `<script>alert("x")</script> & 'q'`) {
			t.Errorf("label did not come back as text: %q", p.text)
		}
	}
	// Characters XML forbids are replaced, so the document stays well-formed.
	readSVG(t, Chart{Title: "bell\x07 nul\x00 bad\xff utf8 \uFFFE", Series: []Series{{Name: "\x1b[31m", X: x, Y: y}}}.SVG())
}

func TestDegenerateInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	one := []float64{1}
	cases := []struct {
		name   string
		c      Chart
		noData bool
	}{
		{"zero chart", Chart{}, true},
		{"empty series", Chart{Series: []Series{{Name: "e"}}}, true},
		{"all NaN", Chart{Series: []Series{{X: []float64{nan, nan}, Y: []float64{1, 2}}}}, true},
		{"all Inf", Chart{Series: []Series{{X: []float64{inf, -inf}, Y: []float64{inf, 2}}}}, true},
		{"marker NaN only", Chart{Markers: []Marker{{X: nan, Y: 1, Label: "m"}}}, true},
		{"single point", Chart{Series: []Series{{Name: "p", X: one, Y: one}}}, false},
		{"single marker", Chart{Markers: []Marker{{X: 3, Y: 4, Label: "op"}}}, false},
		{"all equal", Chart{Series: []Series{{X: []float64{2, 2, 2}, Y: []float64{5, 5, 5}}}}, false},
		{"all zero", Chart{Series: []Series{{X: []float64{0, 0}, Y: []float64{0, 0}, Style: Area}}}, false},
		{"NaN breaks", Chart{Series: []Series{{X: []float64{0, 1, nan, 3, 4, inf, 6}, Y: []float64{0, 1, 2, nan, 4, 5, 6}}}}, false},
		{"mismatched lengths", Chart{Series: []Series{{X: []float64{0, 1, 2, 3}, Y: []float64{1, 2}}}}, false},
		{"huge", Chart{Series: []Series{{X: []float64{-1e308, 1e308}, Y: []float64{-1.7e308, 1.7e308}, Style: Area}}}, false},
		{"huge offset", Chart{Series: []Series{{X: []float64{1e15, 1e15 + 1}, Y: []float64{1e300, 1.0000001e300}}}}, false},
		{"tiny", Chart{Series: []Series{{X: []float64{0, 1e-300}, Y: []float64{5e-324, 1e-310}}}}, false},
		{"reversed fixed limits", Chart{XMin: Fix(10), XMax: Fix(0), YMin: Fix(5), YMax: Fix(5),
			Series: []Series{{X: []float64{-5, 20}, Y: []float64{-5, 20}, Style: Area}}}, false},
		{"limits exclude all data", Chart{XMin: Fix(100), XMax: Fix(200),
			Series:  []Series{{X: []float64{0, 1}, Y: []float64{0, 1}}},
			Markers: []Marker{{X: 0.5, Y: 0.5, Label: "off"}}}, false},
		{"NaN limits", Chart{XMin: Fix(nan), YMax: Fix(inf), Series: []Series{{X: one, Y: one}}}, false},
		{"negative size", Chart{Width: -5, Height: -5, Series: []Series{{X: one, Y: one}}}, false},
		{"only second axis", Chart{Y2: &Axis{Label: "η"}, Series: []Series{{X: []float64{0, 1}, Y: []float64{0, 1}, Y2: true}}}, false},
		{"empty lower", Chart{Lower: &Chart{YLabel: "lower"}, Series: []Series{{X: []float64{0, 1}, Y: []float64{0, 1}}}}, false},
		{"bands only", Chart{Bands: []Band{{X0: nan, X1: 1}, {X0: inf, X1: inf}}}, true},
		{"many ticks asked", Chart{Width: 4000, Height: 4000, Series: []Series{{X: []float64{0, 1}, Y: []float64{0, 1}}}}, false},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			var s string
			func() {
				defer func() {
					if e := recover(); e != nil {
						t.Fatalf("panic: %v", e)
					}
				}()
				s = tc.c.SVG()
			}()
			p := readSVG(t, s)
			checkInside(t, p)
			if got := strings.Contains(p.text, "no data to plot"); got != tc.noData {
				t.Errorf("no-data note shown = %v, want %v; text %q", got, tc.noData, p.text)
			}
			if strings.Contains(s, "NaN") || strings.Contains(s, "Inf") {
				t.Errorf("non-finite number in output")
			}
		})
	}
}

func TestGreyscaleDistinct(t *testing.T) {
	// Brief: series must differ by dash pattern or shape, not colour alone.
	seen := map[string]Style{}
	for _, st := range []Style{Solid, Dashed, Dotted, DashDot, LongDash} {
		d := dash(st, 2.6)
		if o, dup := seen[d]; dup {
			t.Errorf("styles %d and %d share dash pattern %q", o, st, d)
		}
		seen[d] = st
	}
	// Automatic shapes of successive Points series differ.
	c := Chart{Series: []Series{{Style: Points}, {Style: Points}, {Style: Points}, {Style: Points}}}
	r := newRenderer(&c)
	r.panels = []*panel{{c: &c}}
	shapes := map[Shape]bool{}
	for i := range c.Series {
		shapes[r.pointShape(&c.Series[i])] = true
	}
	if len(shapes) != 4 {
		t.Errorf("4 Points series got %d distinct shapes", len(shapes))
	}
}

func TestConcurrentAndDeterministic(t *testing.T) {
	// No global mutable state: parallel renders agree byte for byte (design requirement).
	x, y := ramp(50, math.Sqrt)
	c := Chart{Title: "c", Series: []Series{{Name: "a", X: x, Y: y}}, Markers: []Marker{{X: 9, Y: 3, Label: "m"}}}
	want := c.SVG()
	var wg sync.WaitGroup
	errs := make(chan string, 8)
	for i := 0; i < 8; i++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			if got := c.SVG(); got != want {
				errs <- got
			}
		}()
	}
	wg.Wait()
	close(errs)
	for e := range errs {
		t.Errorf("render differs: %d bytes vs %d", len(e), len(want))
	}
}

func TestClipping(t *testing.T) {
	// A line leaving fixed limits is cut at the plot edge, not drawn outside (Liang–Barsky 1984 clipping).
	c := Chart{XMin: Fix(0), XMax: Fix(10), YMin: Fix(0), YMax: Fix(10),
		Series: []Series{{Name: "steep", X: []float64{-100, 5, 100}, Y: []float64{-100, 5, 1000}, Style: Area}}}
	p := readSVG(t, c.SVG())
	checkInside(t, p)
}
