package main

import (
	"math"

	"fieldhead/app/chart"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The two charts. The view model gives their data in display units with
// their titles; this file only hands them to the SVG drawing of app/chart
// at the width the window needs.

// chartWidth is the width of a chart's viewBox for the window the page
// has now (see chartWidthFor).
func chartWidth() int {
	w := 1024
	if app.IsClient {
		if iw := app.Window().Get("innerWidth"); iw.Truthy() {
			w = iw.Int()
		}
	}
	return chartWidthFor(w)
}

// chartWidthFor is the width of a chart's viewBox in a window w CSS px
// wide: the width the chart is shown at (estimated from the layout of
// web/fieldhead.css) times 14/12.5, so that its smallest text, 14 viewBox
// px (app/chart), is at least 12.5 CSS px on the screen; in steps of 20 px
// so that a resize redraws the charts now and then, not on every pixel;
// between 280 and 720.
func chartWidthFor(w int) int {
	var shown float64
	switch {
	case w <= 600: // phones: sheet padding 2×10, card padding 2×10, borders 2×2
		shown = float64(w - 44)
	case w < 1000: // one column: sheet padding 2×16, card padding 2×14, borders
		shown = float64(w - 64)
	default: // two columns, the charts in the wider (1.45 : 1, gap 14) of a sheet at most 1400 wide
		shown = float64(min(w, 1432)-32-14)*1.45/2.45 - 32
	}
	vb := int(shown*14/12.5) / 20 * 20
	return max(280, min(720, vb))
}

// Print draws the charts for paper, wider than the screen's widest (720):
// at the text width of A4 (182 mm, 688 CSS px) or Letter (187.9 mm) the
// smallest text, 14 viewBox px, is 12 CSS px or 9 pt there, and the pump
// chart with its two panels below (140 px each at least) stays short
// enough to share a page with its headings and caption.
const (
	printChartWidth    = 800
	printPumpHeight    = 290
	printProfileHeight = 340
)

// chartSVG draws a chart of the view model as SVG text, w viewBox px wide;
// print asks for the paper's proportions.
func chartSVG(c *present.Chart, w int, print bool) string {
	switch c.Kind {
	case "pump":
		return pumpChart(c, w, print).SVG()
	case "history":
		return historyChart(c, w).SVG()
	}
	return profileChart(c, w, print).SVG()
}

// chartFigure draws a chart with its caption, w viewBox px wide. With
// paper, the printed sheet (the Report) also holds a copy drawn for paper,
// shown in print only: the screen's copy, drawn for a phone, would print
// narrow or tall.
func chartFigure(c *present.Chart, w int, paper bool) app.UI {
	body := []app.UI{divBody(classIf("chart", paper, "screen-only"), app.Raw(chartSVG(c, w, false)))}
	if paper {
		body = append(body, divBody("chart print-only", app.Raw(chartSVG(c, printChartWidth, true))))
	}
	if c.Caption != "" {
		body = append(body, app.P().Class("caption").Text(c.Caption))
	}
	return app.Figure().Class("figure").ID(c.ID).Body(body...)
}

func curve(c present.Curve) chart.Curve { return chart.Curve{Name: c.Name, X: c.X, Y: c.Y} }

func bands(bs []present.Band) []chart.Band {
	var out []chart.Band
	for _, b := range bs {
		x1 := b.X1
		if x1 < b.X0 {
			x1 = math.Inf(1) // to the right edge
		}
		out = append(out, chart.Band{X0: b.X0, X1: x1, Label: b.Label, Tint: b.Keep})
	}
	return out
}

// pumpChart is the pump and system chart.
func pumpChart(c *present.Chart, w int, print bool) chart.Chart {
	in := chart.PumpSystemInput{Title: c.Title, FlowLabel: c.XLabel, HeadLabel: c.YLabel,
		EfficiencyLabel: c.Y2Label, NPSHLabel: c.Y3Label, Bands: bands(c.Bands), Width: w, Height: 460}
	if print {
		in.Height = printPumpHeight
	}
	for _, cu := range c.Curves {
		switch cu.Role {
		case present.RolePump, present.RolePumpBase:
			in.Pumps = append(in.Pumps, curve(cu))
		case present.RoleSpeed:
			in.Speeds = append(in.Speeds, curve(cu))
		case present.RoleDataPoints:
			in.DataPoints = curve(cu)
		case present.RoleSystem:
			in.Systems = append(in.Systems, curve(cu))
		case present.RoleEfficiency:
			in.Efficiency = curve(cu)
		case present.RoleNPSHRequired:
			in.NPSHRequired = curve(cu)
		case present.RoleNPSHAvailable:
			in.NPSHAvailable = curve(cu)
		case present.RoleTested:
			in.Tested = curve(cu)
		case present.RoleTestedBand:
			in.TestedBand = append(in.TestedBand, curve(cu))
		case present.RoleOriginLine:
			in.Origin = curve(cu)
		}
	}
	for _, m := range c.Markers {
		mk := chart.Marker{X: m.X, Y: m.Y, Label: m.Label, DX: m.DX, DY: m.DY}
		switch m.Role {
		case present.MarkPeak:
			in.Peaks = append(in.Peaks, mk)
		case present.MarkMeasured:
			in.Measured = append(in.Measured, mk)
		case present.MarkGuarantee:
			in.Guarantee = &mk
			if x := m.Cross; x != nil {
				in.Cross = &chart.TolCross{X: m.X, Y: m.Y, X0: x.X0, X1: x.X1, Y0: x.Y0, Y1: x.Y1}
			}
		default:
			in.Operating = append(in.Operating, mk)
		}
	}
	return chart.PumpSystemChart(in)
}

// profileChart is the grade lines along the line.
func profileChart(c *present.Chart, w int, print bool) chart.Chart {
	in := chart.ProfileInput{Title: c.Title, DistanceLabel: c.XLabel, HeadLabel: c.YLabel, Bands: bands(c.Bands),
		Width: w, Height: 440}
	if print {
		in.Height = printProfileHeight
	}
	for _, cu := range c.Curves {
		if len(cu.X) > 0 && in.Distance == nil {
			in.Distance = cu.X
		}
		switch cu.Role {
		case present.RolePipe:
			in.Pipe, in.PipeName = cu.Y, cu.Name
		case present.RoleEGL:
			in.EGL, in.EGLName = cu.Y, cu.Name
		case present.RoleHGL:
			in.HGL, in.HGLName = cu.Y, cu.Name
		case present.RoleVapour:
			in.Vapour, in.VapourName = cu.Y, cu.Name
		}
	}
	for _, m := range c.Markers {
		mk := chart.Marker{X: m.X, Y: m.Y, Label: m.Label}
		if m.Pump {
			mk.Shape = chart.Triangle
		}
		in.Nodes = append(in.Nodes, mk)
	}
	return chart.ProfileChart(in)
}

// historyChart is a pump's history: head against the days since its
// first sheet, with strips for its efficiencies and its energy per volume
// (the chart language of the pump chart: readings from the site are open
// rings, what they work out to the accent line). Each axis fits its data,
// as the head's does, no narrower than the view model's least span: a
// strip from 0 drew a pump losing six points of efficiency in a year as
// a flat line.
func historyChart(c *present.Chart, w int) chart.Chart {
	out := chart.Chart{Title: c.Title, XLabel: c.XLabel, YLabel: c.YLabel, XMin: chart.Fix(0), Direct: true,
		Width: w, Height: 300, YSpan: c.YSpan}
	eff := &chart.Chart{YLabel: c.Y2Label, YSpan: c.Y2Span, Height: 160}
	energy := &chart.Chart{YLabel: c.Y3Label, YSpan: c.Y3Span, Height: 140}
	line := func(cu present.Curve, st chart.Style, key string) chart.Series {
		return chart.Series{Name: cu.Name, X: cu.X, Y: cu.Y, Style: st, Accent: true, Key: key}
	}
	for _, cu := range c.Curves {
		switch cu.Role {
		case present.RoleHistoryHead:
			s := line(cu, chart.Solid, "history-head")
			s.Heavy = true
			out.Series = append(out.Series, s, chart.Series{X: cu.X, Y: cu.Y, Style: chart.Points, Shape: chart.Ring, Key: "history-readings"})
		case present.RoleHistoryPumpEff:
			eff.Series = append(eff.Series, line(cu, chart.Solid, "history-pump-eff"))
		case present.RoleHistoryWireEff:
			// Wire to water is the pump's efficiency times the motor's,
			// so its line runs under the pump's: its name goes below it,
			// clear of the other line.
			s := line(cu, chart.Dashed, "history-wire-eff")
			s.TagBelow = true
			eff.Series = append(eff.Series, s)
		case present.RoleHistoryEnergy:
			energy.Series = append(energy.Series, line(cu, chart.Solid, "history-energy"))
		}
	}
	last := &out
	for _, st := range []*chart.Chart{eff, energy} {
		if len(st.Series) > 0 {
			last.Lower, last = st, st
		}
	}
	return out
}
