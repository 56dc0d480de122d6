package chart

// layoutLegend places the legend entries of p in rows starting at y and
// returns the y below them.
func (r *renderer) layoutLegend(p *panel, y float64) float64 {
	if r.c.Direct {
		return y // the lines are named on the plot
	}
	x := pad
	rows := 0
	for i := range p.c.Series {
		s := &p.c.Series[i]
		if s.Name == "" {
			continue
		}
		text := s.Name
		if s.Y2 && p.hasY2 {
			text += " (right axis)"
		}
		w := sampleW + 8 + textWidth(text, fontText)
		if rows == 0 || (x > pad && x+w > r.w-pad) {
			rows++
			x = pad
		}
		p.legend = append(p.legend, legendItem{s: s, text: text, x: x, y: y + float64(rows-1)*legendRow + 17})
		x += w + 24
	}
	if rows > 0 {
		y += float64(rows)*legendRow + 4
	}
	return y
}

func (r *renderer) drawLegend(b []byte, p *panel) []byte {
	for _, it := range p.legend {
		s := it.s
		col := r.colour(s.Accent)
		y := it.y - 5
		switch s.Style {
		case Points:
			b = appendShape(b, r.pointShape(s), it.x+sampleW/2, y, col)
		case Area:
			fill, op := areaFill, ""
			if s.Accent {
				fill, op = r.accent, ` fill-opacity="0.16"`
			}
			b = append(b, `<rect x="`...)
			b = appendNum(b, it.x)
			b = append(b, `" y="`...)
			b = appendNum(b, y-2)
			b = append(b, `" width="52" height="12" fill="`...)
			b = append(b, fill...)
			b = append(b, '"')
			b = append(b, op...)
			b = append(b, "/>"...)
			b = append(b, `<path d="M`...)
			b = appendNum(b, it.x)
			b = append(b, ' ')
			b = appendNum(b, y-2)
			b = append(b, `h52"`...)
			b = appendStroke(b, s, col)
			b = append(b, "/>"...)
		default:
			b = append(b, `<path d="M`...)
			b = appendNum(b, it.x)
			b = append(b, ' ')
			b = appendNum(b, y)
			b = append(b, `h52"`...)
			b = appendStroke(b, s, col)
			b = append(b, "/>"...)
		}
		b = r.text(b, it.x+sampleW+8, it.y, it.text, "start", fontText, false, Ink)
	}
	return b
}
