package chart

import "strings"

func (r *renderer) noData(b []byte, h float64) []byte {
	c := r.c
	r.h = h
	b = r.header(b)
	top := pad
	if c.Title != "" {
		b = r.text(b, pad, pad+18, c.Title, "start", fontTitle, true, Ink)
		top += 34
	}
	b = append(b, `<rect x="`...)
	b = appendNum(b, pad)
	b = append(b, `" y="`...)
	b = appendNum(b, top)
	b = append(b, `" width="`...)
	b = appendNum(b, r.w-2*pad)
	b = append(b, `" height="`...)
	b = appendNum(b, h-top-pad)
	b = append(b, `" fill="none" stroke="`+gridColour+`" stroke-width="2" stroke-dasharray="8 6"/>`...)
	note := c.NoData
	if note == "" {
		note = "no data to plot"
	}
	b = r.text(b, r.w/2, (top+h-pad)/2+6, note, "middle", 16, false, ink2)
	return append(b, "</svg>"...)
}

func (r *renderer) header(b []byte) []byte {
	c := r.c
	b = append(b, `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 `...)
	b = appendNum(b, r.w)
	b = append(b, ' ')
	b = appendNum(b, r.h)
	// No style attribute: a page's Content-Security-Policy may refuse
	// inline styles; the page's stylesheet sets display and height.
	b = append(b, `" width="100%" preserveAspectRatio="xMidYMid meet" role="img" font-family="`...)
	b = appendText(b, r.font)
	b = append(b, `" font-size="15"`...)
	title := c.Title
	if title == "" {
		title = "chart"
	}
	b = append(b, ` aria-label="`...)
	b = appendText(b, title)
	b = append(b, `"><title>`...)
	b = appendText(b, title)
	b = append(b, `</title><desc>`...)
	b = appendText(b, r.desc())
	b = append(b, `</desc><rect width="100%" height="100%" fill="`+paper+`"/>`...)
	return b
}

// desc composes the accessible description.
func (r *renderer) desc() string {
	c := r.c
	if c.Desc != "" {
		return c.Desc
	}
	var sb strings.Builder
	sb.WriteString("Line chart")
	if c.YLabel != "" && c.XLabel != "" {
		sb.WriteString(" of " + c.YLabel + " against " + c.XLabel)
	}
	var names, marks []string
	for _, pn := range r.panels {
		p := pn.c
		for _, s := range p.Series {
			if s.Name != "" {
				names = append(names, s.Name)
			}
		}
		for _, m := range p.Markers {
			if m.Label != "" {
				marks = append(marks, strings.ReplaceAll(m.Label, "\n", " "))
			}
		}
	}
	if len(names) > 0 {
		sb.WriteString(". Lines: " + strings.Join(names, "; "))
	}
	if len(marks) > 0 {
		sb.WriteString(". Marked: " + strings.Join(marks, "; "))
	}
	sb.WriteString(".")
	return sb.String()
}

// text appends one <text> element.
func (r *renderer) text(b []byte, x, y float64, s, anchor string, size float64, bold bool, fill string) []byte {
	b = append(b, `<text x="`...)
	b = appendNum(b, x)
	b = append(b, `" y="`...)
	b = appendNum(b, y)
	b = append(b, '"')
	if anchor != "start" {
		b = append(b, ` text-anchor="`...)
		b = append(b, anchor...)
		b = append(b, '"')
	}
	if size != fontText {
		b = append(b, ` font-size="`...)
		b = appendNum(b, size)
		b = append(b, '"')
	}
	if bold {
		b = append(b, ` font-weight="700"`...)
	}
	b = append(b, ` fill="`...)
	b = append(b, fill...)
	b = append(b, `">`...)
	b = appendText(b, s)
	return append(b, "</text>"...)
}

// haloText is text with a white outline so it stays legible over lines.
func (r *renderer) haloText(b []byte, x, y float64, lines []string, anchor string, size float64, bold bool, fill string) []byte {
	b = append(b, `<text x="`...)
	b = appendNum(b, x)
	b = append(b, `" y="`...)
	b = appendNum(b, y)
	b = append(b, `" text-anchor="`...)
	b = append(b, anchor...)
	b = append(b, `" font-size="`...)
	b = appendNum(b, size)
	b = append(b, '"')
	if bold {
		b = append(b, ` font-weight="700"`...)
	}
	b = append(b, ` fill="`...)
	b = append(b, fill...)
	b = append(b, `" stroke="`+paper+`" stroke-width="5" stroke-linejoin="round" paint-order="stroke">`...)
	for i, l := range lines {
		if i == 0 {
			b = appendText(b, l)
			continue
		}
		b = append(b, `<tspan x="`...)
		b = appendNum(b, x)
		b = append(b, `" dy="`...)
		b = appendNum(b, size*1.2)
		b = append(b, `">`...)
		b = appendText(b, l)
		b = append(b, "</tspan>"...)
	}
	return append(b, "</text>"...)
}

// bare appends a text element that takes fill and size from its group.
func (r *renderer) bare(b []byte, x, y float64, s, anchor string) []byte {
	b = append(b, `<text x="`...)
	b = appendNum(b, x)
	b = append(b, `" y="`...)
	b = appendNum(b, y)
	b = append(b, `" text-anchor="`...)
	b = append(b, anchor...)
	b = append(b, `">`...)
	b = appendText(b, s)
	return append(b, "</text>"...)
}

func (r *renderer) colour(accent bool) string {
	if accent {
		return r.accent
	}
	return Ink
}

func (r *renderer) draw(b []byte) []byte {
	// The body first: the labels' places depend on what is drawn, and the
	// picture's height on the labels that find no place (notes below).
	var body []byte
	c := r.c
	if c.Title != "" {
		for i, l := range r.panels[0].titleLines {
			body = r.text(body, pad, r.panels[0].titleY+24*float64(i), l, "start", fontTitle, true, Ink)
		}
	}
	var labels []pendingLabel
	for _, p := range r.panels {
		body = r.drawBands(body, p)
		body = r.drawAreas(body, p)
		body = r.drawGrid(body, p)
		body = r.drawSeries(body, p)
		body, labels = r.drawMarkers(body, p, labels)
		body = r.drawAxes(body, p)
		body = r.drawLegend(body, p)
	}
	var tags []pendingLabel
	for _, p := range r.panels {
		tags = append(tags, r.tagLabels(p)...)
	}
	// The markers' labels before the lines' names: a name can sit
	// anywhere along its line, and names placed first would wall a point
	// in.
	all := append(append(r.bandLabels, labels...), tags...)
	body, notes := r.placeLabels(body, all)
	y := r.h - 4
	for _, l := range noteLines(notes, r.w-2*pad) {
		y += 20
		for _, n := range l {
			body = r.text(body, pad+n.x, y, n.text, "start", fontSmall, false, Ink)
		}
	}
	if len(notes) > 0 {
		r.h = y + 10
	}
	b = r.header(b)
	b = append(b, body...)
	return append(b, "</svg>"...)
}

// placedNote is a piece of a note's text and where its line starts it.
type placedNote struct {
	x    float64
	text string
}

// noteLines lays the numbered notes under a plot out in lines width
// wide: side by side, noteGap apart, as many whole notes as fit a line (a
// wide chart, on paper, keeps its height for the plot), and a note wider
// than a line wrapped on lines of its own.
func noteLines(notes []string, width float64) [][]placedNote {
	var out [][]placedNote
	var line []placedNote
	x := 0.0
	for i, n := range notes {
		t := itoa(i+1) + "  " + n
		w := textWidth(t, fontSmall)
		if w > width {
			if line != nil {
				out, line, x = append(out, line), nil, 0
			}
			for _, l := range wrapText(t, fontSmall, width) {
				out = append(out, []placedNote{{0, l}})
			}
			continue
		}
		if line != nil && x+noteGap+w > width {
			out, line, x = append(out, line), nil, 0
		}
		if line != nil {
			x += noteGap
		}
		line = append(line, placedNote{x, t})
		x += w
	}
	if line != nil {
		out = append(out, line)
	}
	return out
}

// noteGap is the space between two notes on a line, viewBox px.
const noteGap = 20
