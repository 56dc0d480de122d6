package chart

import (
	"math"
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
				anchor, tx := "start", x+5
				if x+5+w > q.r {
					anchor, tx = "end", x-5
				}
				r.late = r.haloText(r.late, tx, q.t+18, []string{bd.Label}, anchor, fontSmall, false, ink2)
				l := tx
				if anchor == "end" {
					l = tx - w
				}
				r.placed = append(r.placed, rect{l, q.t + 4, l + w, q.t + 22})
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
			b = append(b, 'M')
			b = appendNum(b, ax)
			b = append(b, ' ')
			b = appendNum(b, ay)
			b = append(b, 'L')
			b = appendNum(b, bx)
			b = append(b, ' ')
			b = appendNum(b, by)
		}
		b = append(b, `M0 0" stroke="`+hatch+`" stroke-width="1"/>`...)
		if bd.Label != "" {
			w := textWidth(bd.Label, fontSmall)
			anchor, tx := "middle", (l+rr)/2
			switch {
			case w+8 <= rr-l:
			case rr >= q.r-1:
				anchor, tx = "end", rr-4
			default:
				anchor, tx = "start", l+4
			}
			r.late = r.haloText(r.late, tx, q.t+18, []string{bd.Label}, anchor, fontSmall, false, ink2)
			lx := tx - w/2
			if anchor == "end" {
				lx = tx - w
			} else if anchor == "start" {
				lx = tx
			}
			r.placed = append(r.placed, rect{lx, q.t + 4, lx + w, q.t + 22})
		}
	}
	return b
}

type pendingLabel struct {
	x, y   float64
	lines  []string
	colour string
	p      *panel
}

// drawMarkers draws marker symbols and drop lines; the labels are placed
// after everything else so they sit on top.
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
		shape := m.Shape
		if shape == AutoShape {
			shape = Target
		}
		b = appendShape(b, shape, x, y, col)
		r.placed = append(r.placed, rect{x - 10, y - 10, x + 10, y + 10})
		if m.Label != "" {
			labels = append(labels, pendingLabel{x, y, strings.Split(m.Label, "\n"), col, p})
		}
	}
	return b, labels
}

// placeLabel writes a marker label in the spot around it that lies inside
// the plot and covers the fewest other labels, symbols and line pieces.
func (r *renderer) placeLabel(b []byte, l pendingLabel) []byte {
	const size = fontText
	w := 0.0
	for _, s := range l.lines {
		w = math.Max(w, textWidth(s, size))
	}
	h := float64(len(l.lines)) * size * 1.2
	type spot struct {
		dx, dy float64 // offset of the box's top-left from the point
		anchor string
	}
	spots := [...]spot{
		{12, -12 - h, "start"},    // above right
		{12, 10, "start"},         // below right
		{-12 - w, -12 - h, "end"}, // above left
		{-12 - w, 10, "end"},      // below left
		{-w / 2, -16 - h, "middle"},
		{-w / 2, 16, "middle"},
		{28, -28 - h, "start"}, // farther out
		{28, 26, "start"},
		{-28 - w, -28 - h, "end"},
		{-28 - w, 26, "end"},
	}
	q := l.p.plot
	best, bestScore := 0, math.Inf(1)
	for i, s := range spots {
		box := rect{l.x + s.dx - 2, l.y + s.dy, l.x + s.dx + w + 2, l.y + s.dy + h}
		score := 0.0
		if box.l < q.l+2 || box.r > q.r-2 || box.t < q.t+2 || box.b > q.b-2 {
			score += 1000
		}
		for _, o := range r.placed {
			if box.l < o.r && box.r > o.l && box.t < o.b && box.b > o.t {
				score += 20
			}
		}
		for _, g := range l.p.segs {
			if _, _, _, _, hit := clipSegment(box, g[0], g[1], g[2], g[3]); hit {
				score++
			}
		}
		if i >= 6 {
			score += 0.5 // prefer labels close to their point
		}
		if score < bestScore {
			best, bestScore = i, score
		}
	}
	s := spots[best]
	box := rect{l.x + s.dx, l.y + s.dy, l.x + s.dx + w, l.y + s.dy + h}
	r.placed = append(r.placed, box)
	tx := box.l
	switch s.anchor {
	case "end":
		tx = box.r
	case "middle":
		tx = (box.l + box.r) / 2
	}
	return r.haloText(b, tx, box.t+size*0.95, l.lines, s.anchor, size, true, l.colour)
}

// appendShape appends a marker symbol centred on (x, y).
func appendShape(b []byte, s Shape, x, y float64, col string) []byte {
	P := func(b []byte, dx, dy float64) []byte {
		b = appendNum(b, x+dx)
		b = append(b, ' ')
		return appendNum(b, y+dy)
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
		b = append(b, `<path d="M`...)
		b = P(b, 0, -7)
		b = append(b, 'L')
		b = P(b, 6.5, 4.5)
		b = append(b, 'L')
		b = P(b, -6.5, 4.5)
		b = append(b, 'Z')
		return end(b, "2.2")
	case Diamond:
		b = append(b, `<path d="M`...)
		b = P(b, 0, -7)
		b = append(b, 'L')
		b = P(b, 7, 0)
		b = append(b, 'L')
		b = P(b, 0, 7)
		b = append(b, 'L')
		b = P(b, -7, 0)
		b = append(b, 'Z')
		return end(b, "2.2")
	case Cross:
		b = append(b, `<path d="M`...)
		b = P(b, -5, -5)
		b = append(b, "l10 10m0-10l-10 10"...)
		b = append(b, `" stroke="`...)
		b = append(b, col...)
		return append(b, `" stroke-width="2.8" stroke-linecap="round"/>`...)
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
