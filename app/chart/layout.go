package chart

import (
	"math"
	"strings"
)

// Sizes in viewBox px. At the default width of 800 the smallest text is
// 14 px, the usual 15 px.
const (
	pad        = 12.0
	fontTitle  = 20.0
	fontText   = 15.0
	fontSmall  = 14.0
	legendRow  = 26.0
	minPlotH   = 80.0 // px, and at least a share of the width, see render
	sampleW    = 52.0 // legend sample length
	tickLen    = 6.0
	gridColour = "#cdd2d6"
	areaFill   = "#eceae2" // a warm grey, lighter than the tint
	hatch      = "#a9b0b6"
	tint       = "#e9e6da" // the page's track colour: a range to keep to, a measurement's box
	ink2       = "#3b4249"
	paper      = "#ffffff"
)

type legendItem struct {
	s    *Series
	text string
	x, y float64 // sample start, text baseline
}

type panel struct {
	c                       *Chart
	height                  float64 // asked for, px
	top                     float64
	titleY                  float64 // baseline of the chart title, 0 if none
	legend                  []legendItem
	yTitleY                 float64  // baseline of the y axis titles, 0 if none
	titleLines              []string // the chart title, wrapped to the width
	yTitleLeft, yTitleRight []string // the y axis titles, wrapped
	plot                    rect
	y, y2                   scale
	hasY2                   bool
	xTicksY                 float64 // baseline of x tick labels
	xTitleY                 float64 // baseline of the x title, 0 if none
	bottom                  float64
	yExt, y2Ex              extent
	segs                    [][4]float64 // drawn line pieces, obstacles for labels
}

type renderer struct {
	c          *Chart
	accent     string
	font       string
	w, h       float64
	panels     []*panel
	x          scale
	xlo, xhi   float64 // x data limits before rounding
	xfLo, xfHi bool
	pl         placer         // labels placed so far, and what they avoid
	labelBoxes []rect         // every label box drawn, for tests
	markLabels []markLabel    // each marker's label and its mark, for tests
	bandLabels []pendingLabel // placed before the markers' labels
	labels     bool           // some marker has a label (line pieces are then kept)
	markerN    int            // Points series seen, for automatic shapes
}

func newRenderer(c *Chart) *renderer {
	r := &renderer{c: c, accent: safeColour(c.Accent, DefaultAccent), font: c.FontFamily}
	if r.font == "" {
		r.font = "inherit"
	}
	r.w = float64(c.Width)
	if r.w <= 0 {
		r.w = 800
	}
	r.w = math.Min(math.Max(r.w, 240), 4000)
	return r
}

// safeColour accepts a CSS colour made of harmless characters only.
func safeColour(s, def string) string {
	if s == "" || len(s) > 48 {
		return def
	}
	for i := 0; i < len(s); i++ {
		c := s[i]
		if !(c >= '0' && c <= '9' || c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || strings.IndexByte("#(),.% ", c) >= 0) {
			return def
		}
	}
	return s
}

func (r *renderer) render(b []byte) []byte {
	c := r.c
	h := float64(c.Height)
	if h <= 0 {
		h = math.Round(r.w * 0.6)
	}
	h = math.Max(h, 160)
	main := &panel{c: c, hasY2: c.Y2 != nil, height: h}
	r.panels = append(r.panels, main)
	// The strips below, a chain of Lower charts (at most a few; a cycle
	// is cut).
	for lc, n := c.Lower, 0; lc != nil && lc != c && n < 8; lc, n = lc.Lower, n+1 {
		lowerH := float64(lc.Height)
		if lowerH <= 0 {
			lowerH = math.Round(h / 2)
		}
		r.panels = append(r.panels, &panel{c: lc, hasY2: lc.Y2 != nil, height: math.Max(lowerH, 140)})
	}

	// X limits from every panel; they do not depend on the layout.
	var xe extent
	drawable := false
	for _, p := range r.panels {
		for i := range p.c.Series {
			s := &p.c.Series[i]
			n := min(len(s.X), len(s.Y))
			for j := 0; j < n; j++ {
				if finite(s.X[j]) && finite(s.Y[j]) {
					xe.add(s.X[j])
					drawable = true
				}
			}
			if s.Y2 {
				p.hasY2 = true
			}
		}
		for _, m := range p.c.Markers {
			if finite(m.X) && finite(m.Y) {
				xe.add(m.X)
				drawable = true
			}
			if m.Y2 {
				p.hasY2 = true
			}
			if m.Label != "" {
				r.labels = true
			}
		}
	}
	if !drawable {
		return r.noData(b, h)
	}
	r.xlo, r.xhi, r.xfLo, r.xfHi = limits(xe, c.XMin, c.XMax)

	// Y extents, from the points inside the x limits.
	inX := func(x float64) bool { return x >= r.xlo && x <= r.xhi }
	for _, p := range r.panels {
		for i := range p.c.Series {
			s := &p.c.Series[i]
			e := &p.yExt
			if s.Y2 && p.hasY2 {
				e = &p.y2Ex
			}
			n := min(len(s.X), len(s.Y))
			for j := 0; j < n; j++ {
				if finite(s.X[j]) && inX(s.X[j]) {
					e.add(s.Y[j])
				}
			}
		}
		for _, m := range p.c.Markers {
			if finite(m.X) && inX(m.X) {
				if m.Y2 && p.hasY2 {
					p.y2Ex.add(m.Y)
				} else {
					p.yExt.add(m.Y)
				}
			}
		}
	}

	// Vertical layout, panel by panel.
	y := 0.0
	for i, p := range r.panels {
		ph := p.height
		p.top = y
		y += pad
		if i == 0 && c.Title != "" {
			p.titleY = y + 18
			p.titleLines = wrapText(c.Title, fontTitle, r.w-2*pad)
			y += 34 + 24*float64(len(p.titleLines)-1)
		}
		y = r.layoutLegend(p, y)
		if p.c.YLabel != "" || (p.hasY2 && p.c.Y2 != nil && p.c.Y2.Label != "") {
			// The axis titles share the width: each keeps to its half when
			// there are two, and wraps onto more lines when it is longer.
			room := r.w - 2*pad
			var right string
			if p.hasY2 && p.c.Y2 != nil {
				right = p.c.Y2.Label
			}
			if right != "" && textWidth(p.c.YLabel, fontText)+textWidth(right, fontText)+16 > room {
				room = (room - 16) / 2
			}
			p.yTitleLeft = wrapText(p.c.YLabel, fontText, room)
			p.yTitleRight = wrapText(right, fontText, room)
			p.yTitleY = y + 14
			y += 26 + 18*float64(max(len(p.yTitleLeft), len(p.yTitleRight))-1)
		} else {
			y += 10
		}
		p.plot.t = y
		last := i == len(r.panels)-1
		below := tickLen + 22.0
		if last && c.XLabel != "" {
			below += 26
		}
		below += pad
		// The plot keeps a usable height however many legend rows there
		// are: the picture grows instead (its aspect follows the viewBox).
		minH := math.Max(minPlotH, 0.38*r.w)
		if i > 0 {
			minH = math.Max(minPlotH*0.85, 0.18*r.w)
		}
		p.plot.b = math.Max(p.top+ph-below, p.plot.t+minH)
		p.xTicksY = p.plot.b + tickLen + 17
		if last && c.XLabel != "" {
			p.xTitleY = p.xTicksY + 26
		}
		p.bottom = p.plot.b + below
		y = p.bottom
		if !last {
			y += 6
		}

		// Y scales now that the plot height is known.
		ny := max(int((p.plot.b-p.plot.t)/50)+1, 3)
		lo, hi, fl, fh := limits(p.yExt, p.c.YMin, p.c.YMax)
		lo, hi = atLeast(lo, hi, fl, fh, p.c.YSpan)
		lo, hi, fl, fh = headroom(lo, hi, fl, fh)
		p.y = niceScale(lo, hi, fl, fh, ny)
		p.y.p0, p.y.p1 = p.plot.b, p.plot.t
		if p.hasY2 {
			var mn, mx *float64
			if p.c.Y2 != nil {
				mn, mx = p.c.Y2.Min, p.c.Y2.Max
			}
			lo, hi, fl, fh := headroom(limits(p.y2Ex, mn, mx))
			p.y2 = niceScale(lo, hi, fl, fh, ny)
			p.y2.p0, p.y2.p1 = p.plot.b, p.plot.t
		}
	}
	r.h = y

	// Horizontal layout: room for the widest y tick labels on each side.
	lw, rw := 0.0, 0.0
	for _, p := range r.panels {
		for _, t := range p.y.ticks {
			lw = math.Max(lw, textWidth(r.yLabel(&p.y, t), fontText))
		}
		if p.hasY2 {
			for _, t := range p.y2.ticks {
				rw = math.Max(rw, textWidth(r.yLabel(&p.y2, t), fontText))
			}
		}
	}
	left := pad + lw + tickLen + 6
	right := r.w - pad
	if rw > 0 {
		right = r.w - pad - rw - tickLen - 6
	}
	r.layoutX(left, right, rw > 0)
	for _, p := range r.panels {
		p.plot.l, p.plot.r = r.x.p0, r.x.p1
	}

	return r.draw(b)
}

// atLeast widens the limits of an axis to span at least span, about
// their middle, moving only the ends that are not fixed; a lower end at or
// above 0 stays so.
func atLeast(lo, hi float64, fixLo, fixHi bool, span float64) (float64, float64) {
	d := span - (hi - lo)
	if !(span > 0) || !finite(span) || !(d > 0) || (fixLo && fixHi) {
		return lo, hi
	}
	switch {
	case fixLo:
		hi += d
	case fixHi:
		lo -= d
	default:
		lo, hi = lo-d/2, hi+d/2
		if lo < 0 && lo+d/2 >= 0 {
			lo, hi = 0, hi-lo
		}
	}
	return lo, hi
}

// headroom widens unfixed y limits by 1 % of the span, so that a line
// at the very top or bottom of the data does not merge with the frame.
func headroom(lo, hi float64, fixLo, fixHi bool) (float64, float64, bool, bool) {
	d := (hi/2 - lo/2) * 0.02 // 1 % of the span, without overflow
	if !fixLo && finite(lo-d) {
		lo -= d
	}
	if !fixHi && finite(hi+d) {
		hi += d
	}
	return lo, hi, fixLo, fixHi
}

// layoutX picks the x scale for a plot from left to right, with fewer ticks
// when labels would touch, and pulls the right edge in when the last label
// would stick out of the picture.
func (r *renderer) layoutX(left, right float64, y2 bool) {
	for pass := 0; pass < 2; pass++ {
		// Of the tick counts whose labels do not touch, the one whose
		// rounded limits waste the least width (data to 1110: 0–1200 where
		// seven labels fit, else 0–1500, not 0–2000); more ticks on a tie.
		var best scale
		for n := int((right-left)/70) + 1; n >= 2; n-- {
			r.x = niceScale(r.xlo, r.xhi, r.xfLo, r.xfHi, n)
			r.x.p0, r.x.p1 = left, right
			if n > 2 && (r.xCrowded() || len(r.x.ticks) > int((right-left)/100)+3) {
				continue
			}
			if best.ticks == nil || r.x.hi-r.x.lo < best.hi-best.lo {
				best = r.x
			}
		}
		// The ends alone (0 and 50 for data to 45 on a phone) say little:
		// a step of 2.5 × 10^k, which Heckbert's 1-2-5 leaves out, may
		// give ticks between them (0, 25, 50) that fit.
		if len(best.ticks) == 2 && best.step > 0 {
			e := math.Floor(math.Log10(best.step))
			for _, d := range []float64{2.5 * math.Pow(10, e), 2.5 * math.Pow(10, e-1)} {
				if d >= best.step {
					continue
				}
				r.x = stepScale(r.xlo, r.xhi, r.xfLo, r.xfHi, d)
				r.x.p0, r.x.p1 = left, right
				if n := len(r.x.ticks); r.x.step > 0 && n > 2 && n <= int((right-left)/100)+3 && !r.xCrowded() {
					best = r.x
					break
				}
			}
		}
		r.x = best
		if y2 || len(r.x.ticks) == 0 {
			return
		}
		lastT := r.x.ticks[len(r.x.ticks)-1]
		half := textWidth(r.xLabel(lastT), fontText) / 2
		if over := r.x.px(lastT) + half - (r.w - 4); over > 0 {
			right -= over
			continue
		}
		return
	}
}

func (r *renderer) xCrowded() bool {
	prevR := math.Inf(-1)
	for _, t := range r.x.ticks {
		w := textWidth(r.xLabel(t), fontText)
		x := r.x.px(t)
		if x-w/2 < prevR+10 {
			return true
		}
		prevR = x + w/2
	}
	return false
}

func bigOf(s *scale) float64 { return math.Max(math.Abs(s.lo), math.Abs(s.hi)) }

func (r *renderer) xLabel(t float64) string { return tickLabel(t, r.x.step, bigOf(&r.x)) }

func (r *renderer) yLabel(s *scale, t float64) string { return tickLabel(t, s.step, bigOf(s)) }

func (r *renderer) yScale(p *panel, y2 bool) *scale {
	if y2 && p.hasY2 {
		return &p.y2
	}
	return &p.y
}

// wrapText breaks s at spaces into lines no wider than room (a single word
// wider than room keeps a line of its own). The titles are bold, about a
// tenth wider than textWidth's estimate: the room is taken 12 % narrower.
func wrapText(s string, size, room float64) []string {
	room /= 1.12
	if s == "" {
		return nil
	}
	var lines []string
	line := ""
	for _, w := range strings.Fields(s) {
		if line != "" && textWidth(line+" "+w, size) > room {
			lines = append(lines, line)
			line = w
			continue
		}
		if line != "" {
			line += " "
		}
		line += w
	}
	return append(lines, line)
}
