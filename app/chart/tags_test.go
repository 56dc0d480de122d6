package chart

import (
	"fmt"
	"regexp"
	"strings"
	"testing"
)

// TestProfileTagsGradeLines: the energy and the hydraulic grade line are
// told apart without colour (WCAG 2.1 SC 1.4.1 Use of Color), even where
// they lie within a line's width of each other: each has its own dash
// pattern and its tag written on the line, EGL above and HGL below. The
// figures are invented; the EGL is 0.1 m above the HGL, as in a line
// whose velocity head is small against its elevation range.
func TestProfileTagsGradeLines(t *testing.T) {
	hgl := []float64{212, 255, 252, 251}
	egl := []float64{212.1, 255.1, 252.1, 251.1}
	svg := ProfileChart(ProfileInput{Title: "t", DistanceLabel: "distance (m)", HeadLabel: "head (m)",
		Distance: []float64{0, 10, 300, 640}, Pipe: []float64{211, 214.5, 230, 250}, EGL: egl, HGL: hgl,
		Width: 320, Height: 360}).SVG()
	dashOf := func(key string) string {
		m := regexp.MustCompile(`<path [^>]*data-series="` + key + `"[^>]*>`).FindString(svg)
		if m == "" {
			t.Fatalf("no path with data-series=%q in %s", key, svg)
		}
		return regexp.MustCompile(`stroke-dasharray="([^"]*)"`).FindStringSubmatch(m + `stroke-dasharray=""`)[1]
	}
	if dashOf("egl") == dashOf("hgl") {
		t.Errorf("EGL and HGL share the dash pattern %q", dashOf("egl"))
	}
	tagY := func(key, tag string) float64 {
		m := regexp.MustCompile(`<g data-line="` + key + `"><text x="[^"]*" y="([^"]*)"[^>]*>` + tag + `</text></g>`).FindStringSubmatch(svg)
		if m == nil {
			t.Fatalf("no tag %q on the %s line", tag, key)
		}
		var y float64
		if _, err := fmt.Sscan(m[1], &y); err != nil {
			t.Fatal(err)
		}
		return y
	}
	// The tags never overlap (the placer keeps label boxes apart, see
	// TestPlaceLabelsApart); the EGL's stays the upper one.
	if e, h := tagY("egl", "EGL"), tagY("hgl", "HGL"); e >= h-fontSmall/2 {
		t.Errorf("the EGL tag (baseline %.1f) should sit above the HGL tag (%.1f)", e, h)
	}
	if strings.Count(svg, "data-line=") != 2 {
		t.Errorf("want 2 tags, found %d", strings.Count(svg, "data-line="))
	}
}

// TestNarrowChartWrapsTitles: drawn for a phone (a viewBox 280 wide), a
// chart's title and axis titles break onto more lines rather than run past
// the right edge, where the SVG would cut them. The titles are invented.
func TestNarrowChartWrapsTitles(t *testing.T) {
	const w = 280
	title, yl := "Along the line at 45.00 L/s, both grade lines", "elevation and head (m, gauge basis)"
	c := ProfileChart(ProfileInput{Title: title, DistanceLabel: "distance (m)", HeadLabel: yl,
		Distance: []float64{0, 640}, Pipe: []float64{211, 250}, EGL: []float64{212, 251}, HGL: []float64{212, 251},
		Width: w, Height: 440})
	svg := c.SVG()
	for _, s := range []struct {
		text string
		size float64
	}{{title, fontTitle}, {yl, fontText}} {
		lines := wrapText(s.text, s.size, w-2*pad)
		if len(lines) < 2 {
			t.Errorf("%q should need two lines at %d px, got %q", s.text, w, lines)
		}
		for _, l := range lines {
			if textWidth(l, s.size) > w-2*pad {
				t.Errorf("line %q is %.0f px wide, over %.0f", l, textWidth(l, s.size), w-2*pad)
			}
			if !strings.Contains(svg, ">"+l+"</text>") {
				t.Errorf("the SVG does not draw the line %q", l)
			}
		}
	}
}
