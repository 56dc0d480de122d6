package chart

import (
	"math"
	"strconv"
	"strings"
)

// drawBands draws hatched x-ranges and vertical guides.
func (r *renderer) drawBands(b []byte, p *panel) []byte {
	q := p.plot
	for _, bd := range p.c.Bands {
		if math.IsNaN(bd.X0) || math.IsNaN(bd.X1) {
			continue
		}
		x0, x1 := bd.X0, bd.X1
		if x0 > x1 {
			x0, x1 = x1, x0
		}
		if x0 == x1 {
			if !finite(x0) {
				continue
			}
			x := r.x.px(x0)
			if x < q.l || x > q.r {
				continue
			}
			b = append(b, `<path d="M`...)
			b = appendNum(b, x)
			b = append(b, ' ')
			b = appendNum(b, q.t)
			b = append(b, 'V')
			b = appendNum(b, q.b)
			b = append(b, `" stroke="`+ink2+`" stroke-width="1.5" stroke-dasharray="6 4"/>`...)
			if bd.Label != "" {
				w := textWidth(bd.Label, fontSmall)
				r.bandLabels = append(r.bandLabels, pendingLabel{x: x, y: q.t, lines: []string{bd.Label}, colour: ink2, p: p,
					spots: []rect{{x + 5, q.t + 4, x + 5 + w, q.t + 22}, {x - 5 - w, q.t + 4, x - 5, q.t + 22},
						{x + 5, q.t + 24, x + 5 + w, q.t + 42}, {x - 5 - w, q.t + 24, x - 5, q.t + 42}}})
			}
			continue
		}
		l, rr := q.l, q.r
		if finite(x0) {
			l = math.Max(l, r.x.px(x0))
		}
		if finite(x1) {
			rr = math.Min(rr, r.x.px(x1))
		}
		if !(rr > l) {
			continue
		}
		band := rect{l, q.t, rr, q.b}
		b = append(b, `<rect x="`...)
		b = appendNum(b, l)
		b = append(b, `" y="`...)
		b = appendNum(b, q.t)
		b = append(b, `" width="`...)
		b = appendNum(b, rr-l)
		b = append(b, `" height="`...)
		b = appendNum(b, q.b-q.t)
		if bd.Tint {
			// A range to keep to: a flat tint edged by two thin rules.
			b = append(b, `" fill="`+tint+`" data-band="tint"/><path d="`...)
			b = appendPt(appendPt(b, 'M', l, q.t), 'V', q.b, math.NaN())
			b = appendPt(appendPt(b, 'M', rr, q.t), 'V', q.b, math.NaN())
			b = append(b, `" stroke="`+ink2+`" stroke-width="1"/>`...)
		} else {
			b = append(b, `" fill="#f1f2f3"/><path d="`...)
			// 45° hatching every 12 px, anchored to the page so that bands
			// next to each other line up.
			h := q.b - q.t
			start := math.Floor((l-h)/12) * 12
			for k := start; k <= rr; k += 12 {
				ax, ay, bx, by, ok := clipSegment(band, k, q.b, k+h, q.t)
				if !ok {
					continue
				}
				b = appendPt(appendPt(b, 'M', ax, ay), 'L', bx, by)
			}
			b = append(b, `M0 0" stroke="`+hatch+`" stroke-width="1"/>`...)
		}
		if bd.Label != "" {
			// Along the top of the band: centred, else against one side,
			// on the first row free of other band labels.
			w := textWidth(bd.Label, fontSmall)
			var spots []rect
			for row := 0.0; row < 3; row++ {
				t := q.t + 4 + 20*row
				for _, lx := range [...]float64{(l+rr)/2 - w/2, l + 4, rr - 4 - w} {
					spots = append(spots, rect{lx, t, lx + w, t + 18})
				}
			}
			r.bandLabels = append(r.bandLabels, pendingLabel{x: (l + rr) / 2, y: q.t, lines: []string{bd.Label}, colour: ink2, p: p, spots: spots})
		}
	}
	return b
}

// pendingLabel is a label waiting for its place: a marker's, a band's or
// a line's name. spots, when set, are its only candidate boxes; else the
// boxes around (x, y) are tried.
type pendingLabel struct {
	x, y   float64
	lines  []string
	colour string
	p      *panel
	spots  []rect
	bold   bool
	size   float64
	key    string // data-line of a line's name
}

// drawMarkers draws marker symbols, uncertainty boxes and drop lines;
// the labels are placed after everything else so they sit on top.
func (r *renderer) drawMarkers(b []byte, p *panel, labels []pendingLabel) ([]byte, []pendingLabel) {
	q := p.plot
	for _, m := range p.c.Markers {
		if !finite(m.X) || !finite(m.Y) {
			continue
		}
		ys := r.yScale(p, m.Y2)
		x, y := r.x.px(m.X), ys.px(m.Y)
		if !q.contains(x, y) {
			continue
		}
		col := r.colour(m.Accent)
		if m.Drop {
			b = append(b, `<path d="M`...)
			b = appendNum(b, x)
			b = append(b, ' ')
			b = appendNum(b, y)
			b = append(b, 'V')
			b = appendNum(b, q.b)
			b = append(b, 'M')
			b = appendNum(b, x)
			b = append(b, ' ')
			b = appendNum(b, y)
			b = append(b, 'H')
			if m.Y2 && p.hasY2 {
				b = appendNum(b, q.r)
			} else {
				b = appendNum(b, q.l)
			}
			b = append(b, `" fill="none" stroke="`...)
			b = append(b, col...)
			b = append(b, `" stroke-width="1.6" stroke-dasharray="2 4"/>`...)
		}
		if (m.DX > 0 || m.DY > 0) && finite(m.DX) && finite(m.DY) {
			b = r.uncertaintyBox(b, p, m, ys, col)
		}
		shape := m.Shape
		if shape == AutoShape {
			shape = Target
		}
		if m.Key != "" {
			b = append(b, `<g data-mark="`...)
			b = appendText(b, m.Key)
			b = append(b, `">`...)
		}
		b = appendShape(b, shape, x, y, col)
		if m.Key != "" {
			b = append(b, "</g>"...)
		}
		r.pl.marks = append(r.pl.marks, rect{x - 10, y - 10, x + 10, y + 10})
		if m.Label != "" {
			labels = append(labels, pendingLabel{x: x, y: y, lines: strings.Split(m.Label, "\n"), colour: col, p: p, bold: true, size: fontText})
		}
	}
	return b, labels
}

// uncertaintyBox draws the ± of a measurement around its mark: a thin
// rectangle 2·DX by 2·DY in data units, faintly tinted, and whiskers from
// the mark to its four sides, clipped to the plot. A box too small to see
// (under 3 px) keeps its whiskers' end ticks, so it still shows.
func (r *renderer) uncertaintyBox(b []byte, p *panel, m Marker, ys *scale, col string) []byte {
	q := p.plot
	x0, x1 := r.x.px(m.X-m.DX), r.x.px(m.X+m.DX)
	y0, y1 := ys.px(m.Y+m.DY), ys.px(m.Y-m.DY)
	x0, x1 = math.Max(x0, q.l), math.Min(x1, q.r)
	y0, y1 = math.Max(y0, q.t), math.Min(y1, q.b)
	if !(x1 >= x0 && y1 >= y0) {
		return b
	}
	x, y := r.x.px(m.X), ys.px(m.Y)
	b = append(b, `<g data-mark="uncertainty"><rect x="`...)
	b = appendNum(b, x0)
	b = append(b, `" y="`...)
	b = appendNum(b, y0)
	b = append(b, `" width="`...)
	b = appendNum(b, x1-x0)
	b = append(b, `" height="`...)
	b = appendNum(b, y1-y0)
	b = append(b, `" fill="`+tint+`" fill-opacity="0.7" stroke="`...)
	b = append(b, col...)
	b = append(b, `" stroke-width="1.4"/><path d="`...)
	b = appendPt(appendPt(b, 'M', x0, y), 'H', x1, math.NaN())
	b = appendPt(appendPt(b, 'M', x, y0), 'V', y1, math.NaN())
	// End ticks across each whisker.
	for _, e := range [...][4]float64{{x0, y - 4, 0, 8}, {x1, y - 4, 0, 8}, {x - 4, y0, 8, 0}, {x - 4, y1, 8, 0}} {
		b = appendPt(appendPt(b, 'M', e[0], e[1]), 'l', e[2], e[3])
	}
	b = append(b, `" fill="none" stroke="`...)
	b = append(b, col...)
	b = append(b, `" stroke-width="1.4"/></g>`...)
	r.pl.marks = append(r.pl.marks, rect{x0 - 4, y0 - 4, x1 + 4, y1 + 4})
	return b
}

// boldWidth is how much wider bold text runs than textWidth's estimate,
// made for the regular weight. In DejaVu Sans, the widest of the usual
// faces, the label "measured 41.00 L/s, 46.71 m ± 1.905 m" is 20.35 em
// regular and 22.42 em bold (digits 1303 and 1425 units of 2048: the
// fonts' hmtx tables, read with python3-fonttools); unscaled, a bold label
// placed at the plot's right edge ran past the chart at 320 px.
const boldWidth = 1.1

// placeLabels places every pending label in the order given (bands',
// markers', then lines' names), each in the first free spot (see
// placer). A label farther than a short reach from its point gets a thin
// leader. Labels with no free spot are numbered at their point and
// returned as notes, to be written under the plot.
func (r *renderer) placeLabels(b []byte, labels []pendingLabel) ([]byte, []string) {
	var notes []string
	for _, l := range labels {
		size := l.size
		if size == 0 {
			size = fontSmall
		}
		w := 0.0
		for _, s := range l.lines {
			w = math.Max(w, textWidth(s, size))
		}
		if l.bold {
			w *= boldWidth
		}
		h := float64(len(l.lines)) * size * 1.2
		q := l.p.plot
		r.pl.bounds = rect{q.l + 2, q.t + 2, q.r - 2, q.b - 2}
		spots := l.spots
		if spots == nil {
			spots = pointSpots(l.x, l.y, w+4, h)
		}
		px, py := l.x, l.y // a marker's label may be set off with a leader
		if l.spots != nil {
			px, py = math.NaN(), math.NaN()
		}
		i := r.pl.place(spots, px, py)
		if i < 0 && l.spots == nil {
			i = r.pl.place(r.pl.scan(l.x, l.y, w+4, h), px, py)
		}
		if i >= 0 && l.spots == nil {
			// A marker's label stays by its mark: one the scan put farther
			// off is numbered instead (its leader would cross the plot).
			box := r.pl.taken[len(r.pl.taken)-1]
			if nx, ny := box.nearest(l.x, l.y); math.Hypot(nx-l.x, ny-l.y) > labelReach {
				r.pl.taken, i = r.pl.taken[:len(r.pl.taken)-1], -1
			}
		}
		if i < 0 {
			notes = append(notes, joinLines(l.lines))
			if l.spots == nil {
				r.markLabels = append(r.markLabels, markLabel{x: l.x, y: l.y, text: joinLines(l.lines), numbered: true})
			}
			// The note's number beside the point, where it finds room (the
			// note's own text names the point's figures in any case).
			n := itoa(len(notes))
			nw, nh := textWidth(n, fontSmall)+4, fontSmall*1.2
			if j := r.pl.place(pointSpots(l.x, l.y, nw, nh), math.NaN(), math.NaN()); j >= 0 {
				box := r.pl.taken[len(r.pl.taken)-1]
				r.labelBoxes = append(r.labelBoxes, box)
				b = r.haloText(b, box.l+2, box.t+fontSmall*0.95, []string{n}, "start", fontSmall, true, l.colour)
			}
			continue
		}
		box := r.pl.taken[len(r.pl.taken)-1]
		r.labelBoxes = append(r.labelBoxes, box)
		if l.spots == nil {
			r.markLabels = append(r.markLabels, markLabel{x: l.x, y: l.y, box: box, text: joinLines(l.lines)})
			// A leader from the point to the label when it sits off.
			if nx, ny, far := box.leader(l.x, l.y); far {
				b = append(b, `<path d="`...)
				b = appendPt(appendPt(b, 'M', l.x, l.y), 'L', nx, ny)
				b = append(b, `" stroke="`...)
				b = append(b, l.colour...)
				b = append(b, `" stroke-width="1.5" data-leader=""/>`...)
			}
		}
		// The text is drawn from the box's left edge: every anchor is
		// "start", so an estimate of the width errs to the right only.
		if l.key != "" {
			b = append(b, `<g data-line="`...)
			b = appendText(b, l.key)
			b = append(b, `">`...)
		}
		b = r.haloText(b, box.l+2, box.t+size*0.95, l.lines, "start", size, l.bold, l.colour)
		if l.key != "" {
			b = append(b, "</g>"...)
		}
	}
	return b, notes
}

func joinLines(ls []string) string { return strings.Join(ls, " ") }

func itoa(n int) string { return strconv.Itoa(n) }

// appendPt appends a path command and its point; a NaN y leaves it out
// (for H and V, which take one number).
func appendPt(b []byte, cmd byte, x, y float64) []byte {
	b = append(b, cmd)
	b = appendNum(b, x)
	if math.IsNaN(y) {
		return b
	}
	b = append(b, ' ')
	return appendNum(b, y)
}

// appendShape appends a marker symbol centred on (x, y).
func appendShape(b []byte, s Shape, x, y float64, col string) []byte {
	P := func(b []byte, dx, dy float64) []byte {
		b = appendNum(b, x+dx)
		b = append(b, ' ')
		return appendNum(b, y+dy)
	}
	// poly opens a path through the offsets (dx, dy pairs), closed.
	poly := func(b []byte, d ...float64) []byte {
		b = append(b, `<path d="`...)
		for i := 0; i+1 < len(d); i += 2 {
			b = appendPt(b, "ML"[min(i, 1)], x+d[i], y+d[i+1])
		}
		return append(b, 'Z')
	}
	end := func(b []byte, w string) []byte {
		b = append(b, `" fill="`+paper+`" stroke="`...)
		b = append(b, col...)
		b = append(b, `" stroke-width="`...)
		b = append(b, w...)
		return append(b, `" stroke-linejoin="round"/>`...)
	}
	switch s {
	case Circle:
		b = append(b, `<circle cx="`...)
		b = appendNum(b, x)
		b = append(b, `" cy="`...)
		b = appendNum(b, y)
		b = append(b, `" r="5.5`...)
		return end(b, "2.2")
	case Square:
		b = append(b, `<path d="M`...)
		b = P(b, -5, -5)
		b = append(b, "h10v10h-10Z"...)
		return end(b, "2.2")
	case Triangle:
		return end(poly(b, 0, -7, 6.5, 4.5, -6.5, 4.5), "2.2")
	case Diamond:
		return end(poly(b, 0, -7, 7, 0, 0, 7, -7, 0), "2.2")
	case Cross:
		b = append(b, `<path d="M`...)
		b = P(b, -5, -5)
		b = append(b, "l10 10m0-10l-10 10"...)
		b = append(b, `" stroke="`...)
		b = append(b, col...)
		return append(b, `" stroke-width="2.8" stroke-linecap="round"/>`...)
	case Ring:
		b = append(b, `<circle cx="`...)
		b = appendNum(b, x)
		b = append(b, `" cy="`...)
		b = appendNum(b, y)
		b = append(b, `" r="3.8`...)
		return end(b, "2")
	case Dot:
		b = append(b, `<circle cx="`...)
		b = appendNum(b, x)
		b = append(b, `" cy="`...)
		b = appendNum(b, y)
		b = append(b, `" r="4.2" fill="`...)
		b = append(b, col...)
		return append(b, `" stroke="`+paper+`" stroke-width="1.2"/>`...)
	case Gem:
		b = poly(b, 0, -7.5, 7.5, 0, 0, 7.5, -7.5, 0)
		b = append(b, `" fill="`...)
		b = append(b, col...)
		return append(b, `" stroke="`+paper+`" stroke-width="1.5" stroke-linejoin="round"/>`...)
	case Peak:
		b = poly(b, 0, -9, 8, 5, -8, 5)
		b = append(b, `" fill="`...)
		b = append(b, col...)
		return append(b, `" stroke="`+paper+`" stroke-width="1.5" stroke-linejoin="round"/>`...)
	default: // Target
		b = append(b, `<circle cx="`...)
		b = appendNum(b, x)
		b = append(b, `" cy="`...)
		b = appendNum(b, y)
		b = append(b, `" r="9`...)
		b = end(b, "2.8")
		b = append(b, `<circle cx="`...)
		b = appendNum(b, x)
		b = append(b, `" cy="`...)
		b = appendNum(b, y)
		b = append(b, `" r="3.6" fill="`...)
		b = append(b, col...)
		return append(b, `"/>`...)
	}
}
