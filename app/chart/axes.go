package chart

func (r *renderer) drawGrid(b []byte, p *panel) []byte {
	q := p.plot
	b = append(b, `<path d="`...)
	n := 0
	for _, t := range r.x.ticks {
		x := r.x.px(t)
		if x <= q.l+0.5 || x >= q.r-0.5 {
			continue
		}
		b = append(b, 'M')
		b = appendNum(b, x)
		b = append(b, ' ')
		b = appendNum(b, q.t)
		b = append(b, 'V')
		b = appendNum(b, q.b)
		n++
	}
	for _, t := range p.y.ticks {
		y := p.y.px(t)
		if y <= q.t+0.5 || y >= q.b-0.5 {
			continue
		}
		b = append(b, 'M')
		b = appendNum(b, q.l)
		b = append(b, ' ')
		b = appendNum(b, y)
		b = append(b, 'H')
		b = appendNum(b, q.r)
		n++
	}
	if n == 0 {
		b = append(b, "M0 0"...)
	}
	return append(b, `" fill="none" stroke="`+gridColour+`" stroke-width="1"/>`...)
}

func (r *renderer) drawAxes(b []byte, p *panel) []byte {
	q := p.plot
	// Frame and outward ticks.
	b = append(b, `<path d="M`...)
	b = appendNum(b, q.l)
	b = append(b, ' ')
	b = appendNum(b, q.t)
	b = append(b, 'H')
	b = appendNum(b, q.r)
	b = append(b, 'V')
	b = appendNum(b, q.b)
	b = append(b, 'H')
	b = appendNum(b, q.l)
	b = append(b, 'Z')
	for _, t := range r.x.ticks {
		b = append(b, 'M')
		b = appendNum(b, r.x.px(t))
		b = append(b, ' ')
		b = appendNum(b, q.b)
		b = append(b, "v6"...)
	}
	for _, t := range p.y.ticks {
		b = append(b, 'M')
		b = appendNum(b, q.l)
		b = append(b, ' ')
		b = appendNum(b, p.y.px(t))
		b = append(b, "h-6"...)
	}
	if p.hasY2 {
		for _, t := range p.y2.ticks {
			b = append(b, 'M')
			b = appendNum(b, q.r)
			b = append(b, ' ')
			b = appendNum(b, p.y2.px(t))
			b = append(b, "h6"...)
		}
	}
	b = append(b, `" fill="none" stroke="`+Ink+`" stroke-width="1.5" stroke-linecap="square"/>`...)

	// Tick labels.
	b = append(b, `<g fill="`+Ink+`">`...)
	for _, t := range r.x.ticks {
		b = r.bare(b, r.x.px(t), p.xTicksY, r.xLabel(t), "middle")
	}
	for _, t := range p.y.ticks {
		b = r.bare(b, q.l-tickLen-5, p.y.px(t)+5, r.yLabel(&p.y, t), "end")
	}
	if p.hasY2 {
		for _, t := range p.y2.ticks {
			b = r.bare(b, q.r+tickLen+5, p.y2.px(t)+5, r.yLabel(&p.y2, t), "start")
		}
	}
	b = append(b, "</g>"...)

	// Axis titles: the y titles stand level above their axes, so they read
	// without turning the tablet; the x title sits under the axis end.
	if p.yTitleY > 0 {
		for i, l := range p.yTitleLeft {
			b = r.text(b, pad, p.yTitleY+18*float64(i), l, "start", fontText, true, Ink)
		}
		if p.hasY2 && p.c.Y2 != nil && p.c.Y2.Label != "" {
			for i, l := range p.yTitleRight {
				b = r.text(b, r.w-pad, p.yTitleY+18*float64(i), l, "end", fontText, true, Ink)
			}
		}
	}
	if p.xTitleY > 0 {
		b = r.text(b, q.r, p.xTitleY, r.c.XLabel, "end", fontText, true, Ink)
	}
	return b
}
