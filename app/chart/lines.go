package chart

import "math"

// dash returns the stroke-dasharray for a style at stroke width w ("" for solid).
func dash(st Style, w float64) string {
	k := w / 2.5
	var d []float64
	switch st {
	case Dashed:
		d = []float64{9, 5}
	case Dotted:
		d = []float64{0.5, 5.5}
	case DashDot:
		d = []float64{13, 5, 1, 5}
	case LongDash:
		d = []float64{22, 6}
	default:
		return ""
	}
	var b []byte
	for i, v := range d {
		if i > 0 {
			b = append(b, ' ')
		}
		b = appendNum(b, v*k)
	}
	return string(b)
}

func strokeWidth(s *Series) float64 {
	switch {
	case s.Heavy:
		return 4.5
	case s.Style == Area:
		return 2
	case s.Style == Dotted:
		return 3.2
	}
	return 2.6
}

// appendStroke appends stroke attributes for a series line.
func appendStroke(b []byte, s *Series, colour string) []byte {
	w := strokeWidth(s)
	b = append(b, ` fill="none" stroke="`...)
	b = append(b, colour...)
	b = append(b, `" stroke-width="`...)
	b = appendNum(b, w)
	b = append(b, `" stroke-linejoin="round"`...)
	st := s.Style
	if st == Area {
		st = Solid
	}
	if d := dash(st, w); d != "" {
		b = append(b, ` stroke-dasharray="`...)
		b = append(b, d...)
		b = append(b, '"')
	}
	if st == Dotted || st == Solid {
		b = append(b, ` stroke-linecap="round"`...)
	} else {
		b = append(b, ` stroke-linecap="butt"`...)
	}
	return b
}

// drawSeries draws the line series and the Points series of a panel.
func (r *renderer) drawSeries(b []byte, p *panel) []byte {
	for i := range p.c.Series {
		s := &p.c.Series[i]
		ys := r.yScale(p, s.Y2)
		col := r.colour(s.Accent)
		if s.Style == Points {
			shape := r.pointShape(s)
			n := min(len(s.X), len(s.Y))
			for j := 0; j < n; j++ {
				if !finite(s.X[j]) || !finite(s.Y[j]) {
					continue
				}
				x, y := r.x.px(s.X[j]), ys.px(s.Y[j])
				if p.plot.contains(x, y) {
					b = appendShape(b, shape, x, y, col)
					r.pl.marks = append(r.pl.marks, rect{x - 7, y - 7, x + 7, y + 7})
				}
			}
			continue
		}
		mark := len(b)
		b = append(b, `<path d="`...)
		start := len(b)
		var dots []pt
		b, dots = r.linePath(b, p, s, ys)
		if len(b) > start {
			b = append(b, '"')
			b = appendStroke(b, s, col)
			if s.Key != "" {
				b = append(b, ` data-series="`...)
				b = appendText(b, s.Key)
				b = append(b, '"')
			}
			b = append(b, "/>"...)
		} else {
			b = b[:mark]
		}
		for _, q := range dots {
			b = append(b, `<circle cx="`...)
			b = appendNum(b, q.x)
			b = append(b, `" cy="`...)
			b = appendNum(b, q.y)
			b = append(b, `" r="`...)
			b = appendNum(b, strokeWidth(s)*1.2)
			b = append(b, `" fill="`...)
			b = append(b, col...)
			b = append(b, `"/>`...)
		}
	}
	return b
}

// tagLabels are the names written on the lines: each tagged series' Tag,
// or with Chart.Direct its Name. The spots are at the line's last point
// in the plot, left of it above or below (the side TagBelow prefers
// first), then at points farther back along the line.
func (r *renderer) tagLabels(p *panel) []pendingLabel {
	var out []pendingLabel
	for i := range p.c.Series {
		s := &p.c.Series[i]
		name := s.Tag
		if name == "" && r.c.Direct {
			name = s.Name
		}
		if name == "" || s.Style == Points {
			continue
		}
		ys := r.yScale(p, s.Y2)
		w := textWidth(name, fontSmall)*boldWidth + 4 // drawn bold
		h := fontSmall * 1.2
		// The preferred side all along the walk first, then the other:
		// two lines close together keep their order (EGL above HGL).
		var first, second, later, farther []rect
		var ex, ey float64
		at := func(x, y float64) {
			if first == nil {
				ex, ey = x, y
			}
			above := rect{x - 4 - w, y - 5 - h, x - 4, y - 5}
			below := rect{x - 4 - w, y + 5, x - 4, y + 5 + h}
			if s.TagBelow {
				above, below = below, above
			}
			first, second = append(first, above), append(second, below)
			// The same beginning at the point, for lines whose left
			// stretch is crowded or which start near the axis.
			right := func(a rect) rect { return rect{x + 4, a.t, x + 4 + w, a.b} }
			later = append(later, right(above), right(below))
			// A little farther off the line, either side.
			off := func(a rect, dy float64) rect { return rect{a.l, a.t + dy, a.r, a.b + dy} }
			d := 16.0
			if s.TagBelow {
				d = -d
			}
			farther = append(farther, off(above, -d), off(below, d), off(right(above), -d), off(right(below), d))
		}
		// Walk back from the last point in the plot, along the line, a
		// spot every 14 px or so (between vertices too: a profile has few).
		n := min(len(s.X), len(s.Y))
		var px, py float64
		have := false
		for j := n - 1; j >= 0 && len(first) < 80; j-- {
			if !finite(s.X[j]) || !finite(s.Y[j]) {
				have = false
				continue
			}
			x, y := r.x.px(s.X[j]), ys.px(s.Y[j])
			if have {
				steps := int(math.Min(math.Hypot(x-px, y-py)/14, 80))
				for k := 1; k <= steps && len(first) < 80; k++ {
					f := float64(k) / float64(steps+1)
					if qx, qy := px+(x-px)*f, py+(y-py)*f; p.plot.contains(qx, qy) {
						at(qx, qy)
					}
				}
			}
			if p.plot.contains(x, y) {
				at(x, y)
			}
			px, py, have = x, y, true
		}
		var spots []rect
		if first != nil {
			// Past the end, to its right, when there is room.
			right := rect{ex + 6, ey - h/2, ex + 6 + w, ey + h/2}
			spots = append(append(append(append(append(spots, first[0], right), first[1:]...), second...), later...), farther...)
		}
		if spots != nil {
			out = append(out, pendingLabel{lines: []string{name}, colour: r.colour(s.Accent), p: p, spots: spots,
				bold: true, size: fontSmall, key: s.Key, x: ex, y: ey})
		}
	}
	return out
}

// pointShape returns the shape of a Points series, choosing the next
// automatic one when it has none.
func (r *renderer) pointShape(s *Series) Shape {
	if s.Shape != AutoShape {
		return s.Shape
	}
	auto := [...]Shape{Square, Triangle, Diamond, Circle, Cross}
	// Count the automatic Points series before s, across panels, so a
	// series keeps its shape in the legend and the plot.
	k := 0
	for _, p := range r.panels {
		for i := range p.c.Series {
			t := &p.c.Series[i]
			if t == s {
				return auto[k%len(auto)]
			}
			if t.Style == Points && t.Shape == AutoShape {
				k++
			}
		}
	}
	return auto[0]
}

// linePath appends to d the path data of a series clipped to the plot,
// and returns the isolated points (no finite neighbour) to draw as dots.
func (r *renderer) linePath(d []byte, p *panel, s *Series, ys *scale) ([]byte, []pt) {
	var dots []pt
	n := min(len(s.X), len(s.Y))
	have := false
	var px, py float64 // previous point
	var ex, ey float64 // end of the last emitted piece
	var lx, ly float64 // last emitted vertex
	pen := false       // whether the last piece ends at (ex, ey)
	runLen := 0
	flushRun := func() {
		if runLen == 1 && p.plot.contains(px, py) {
			dots = append(dots, pt{px, py})
		}
		runLen = 0
	}
	for j := 0; j < n; j++ {
		x, y := math.NaN(), math.NaN()
		if finite(s.X[j]) && finite(s.Y[j]) {
			x, y = r.x.px(s.X[j]), ys.px(s.Y[j])
		}
		if !finite(x) || !finite(y) {
			if have {
				flushRun()
			}
			have, pen = false, false
			continue
		}
		if have {
			ax, ay, bx, by, ok := clipSegment(p.plot, px, py, x, y)
			if ok {
				if !pen || math.Abs(ax-ex) > 0.05 || math.Abs(ay-ey) > 0.05 {
					d = append(d, 'M')
					d = appendNum(d, ax)
					d = append(d, ' ')
					d = appendNum(d, ay)
					lx, ly = ax, ay
				}
				if math.Abs(bx-lx) >= 0.3 || math.Abs(by-ly) >= 0.3 || j == n-1 || !(bx == x && by == y) {
					d = append(d, 'L')
					d = appendNum(d, bx)
					d = append(d, ' ')
					d = appendNum(d, by)
					lx, ly = bx, by
				}
				if r.labels {
					p.segs = append(p.segs, [4]float64{ax, ay, bx, by})
				}
				ex, ey = bx, by
				pen = bx == x && by == y
			} else {
				pen = false
			}
		}
		px, py = x, y
		have = true
		runLen++
	}
	if have {
		flushRun()
	}
	return d, dots
}

// drawAreas fills the Area series of a panel down to y = 0, or to the
// nearer edge of the plot when 0 is outside the y range.
func (r *renderer) drawAreas(b []byte, p *panel) []byte {
	for i := range p.c.Series {
		s := &p.c.Series[i]
		if s.Style != Area {
			continue
		}
		ys := r.yScale(p, s.Y2)
		base := ys.px(math.Min(math.Max(0, ys.lo), ys.hi))
		fill := areaFill
		op := ""
		if s.Accent {
			fill, op = r.accent, ` fill-opacity="0.16"`
		}
		n := min(len(s.X), len(s.Y))
		var run []pt
		emit := func() {
			if len(run) >= 2 {
				poly := append(run, pt{run[len(run)-1].x, base}, pt{run[0].x, base})
				poly = clipPolygon(p.plot, poly)
				if len(poly) >= 3 {
					b = append(b, `<path d="`...)
					for k, q := range poly {
						if k == 0 {
							b = append(b, 'M')
						} else {
							b = append(b, 'L')
						}
						b = appendNum(b, q.x)
						b = append(b, ' ')
						b = appendNum(b, q.y)
					}
					b = append(b, `Z" fill="`...)
					b = append(b, fill...)
					b = append(b, '"')
					b = append(b, op...)
					b = append(b, "/>"...)
				}
			}
			run = run[:0]
		}
		for j := 0; j < n; j++ {
			x, y := math.NaN(), math.NaN()
			if finite(s.X[j]) && finite(s.Y[j]) {
				x, y = r.x.px(s.X[j]), ys.px(s.Y[j])
			}
			if !finite(x) || !finite(y) {
				emit()
				continue
			}
			// Keep far-off points within a sane pixel range for clipping.
			x = math.Max(math.Min(x, 1e7), -1e7)
			y = math.Max(math.Min(y, 1e7), -1e7)
			run = append(run, pt{x, y})
		}
		emit()
	}
	return b
}
