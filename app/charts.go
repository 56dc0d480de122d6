package main

import (
	"math"

	"fieldhead/app/chart"
	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The two charts of the sheet. Everything drawn comes from the scenario's
// result; the app only samples the fitted pump curve at flows across the
// data sheet and converts SI values into the display units with calc's own
// unit table.

// chartSamples is the number of flows the pump curve is drawn through.
const chartSamples = 61

// chartWidth is the width of a chart's viewBox: narrower on a phone, so
// that its text (fixed in viewBox px) stays readable when the chart is
// scaled down to the screen.
func chartWidth() int {
	if app.IsClient {
		if w := app.Window().Get("innerWidth"); w.Truthy() && w.Int() < 640 {
			return 440
		}
	}
	return 720
}

// OnResize redraws the page when the charts need another width.
func (s *sheet) OnResize(ctx app.Context) {
	defer s.contain("redrawing the charts for the window's size")
	if w := chartWidth(); w != s.wide {
		s.wide = w
		return
	}
	ctx.PreventUpdate()
}

// displayUnit is the unit a parameter is shown in for the unit system, with
// its symbol for the axis titles.
func displayUnit(param string, us bool) calc.Unit {
	u, err := calc.LookupUnit(scenario.DefaultUnit(param, us))
	if err != nil {
		return calc.Unit{Factor: 1}
	}
	return u
}

// inUnit converts SI values into u, keeping NaN as a break in the line.
func inUnit(u calc.Unit, si []float64) []float64 {
	out := make([]float64, len(si))
	for i, v := range si {
		out[i] = u.FromSI(v)
	}
	return out
}

// sampleCurve evaluates f at chartSamples flows from lo to hi; flows where
// f has no value are NaN.
func sampleCurve(lo, hi float64, f func(q float64) (float64, bool)) (qs, ys []float64) {
	if !(hi > lo) {
		return nil, nil
	}
	found := false
	for i := 0; i < chartSamples; i++ {
		q := lo + (hi-lo)*float64(i)/float64(chartSamples-1)
		if i == chartSamples-1 {
			q = hi
		}
		y, ok := f(q)
		if !ok {
			y = math.NaN()
		} else {
			found = true
		}
		qs, ys = append(qs, q), append(ys, y)
	}
	if !found {
		return nil, nil
	}
	return qs, ys
}

// curveName says which pump curve is drawn: the data sheet's single pump,
// or the pumps as they run (speed, arrangement).
func curveName(pr *scenario.PumpResult, us bool) string {
	name := "one pump"
	if pr.Count > 1 {
		arr := "in series"
		if pr.Parallel {
			arr = "in parallel"
		}
		name = countWord(pr.Count) + " pumps " + arr
	}
	if pr.Speed != 1 {
		return name + " at " + calc.FormatValue(pr.Speed, "%", 3) + " speed"
	}
	return name + " at full speed"
}

func countWord(n int) string {
	words := []string{"", "one", "two", "three", "four", "five", "six", "seven", "eight"}
	if n > 0 && n < len(words) {
		return words[n]
	}
	return plainNumber(float64(n))
}

// pumpChart is the pump and system chart of the scenario, nil when there is
// no pump curve.
func (s *sheet) pumpChart() *chart.Chart {
	pr := s.res.Pump
	if pr == nil {
		return nil
	}
	us := s.us()
	qu, hu := displayUnit("q", us), displayUnit("hp", us)
	in := chart.PumpSystemInput{
		Title:     "Pump against the line",
		FlowLabel: "flow Q (" + qu.Symbol + ")",
		HeadLabel: "head H (" + hu.Symbol + ")",
		NPSHLabel: "NPSH (" + hu.Symbol + ")",
		Width:     chartWidth(),
		Height:    460,
	}
	c := pr.Curve
	qs, hs := sampleCurve(c.MinFlow(), c.MaxFlow(), c.Head)
	in.Pumps = append(in.Pumps, chart.Curve{Name: curveName(pr, us), X: inUnit(qu, qs), Y: inUnit(hu, hs)})
	if pr.Speed != 1 || pr.Count > 1 {
		b := pr.Base
		bq, bh := sampleCurve(b.MinFlow(), b.MaxFlow(), b.Head)
		in.Pumps = append(in.Pumps, chart.Curve{Name: "data sheet, one pump at full speed", X: inUnit(qu, bq), Y: inUnit(hu, bh)})
	}
	var pq, ph []float64
	for _, p := range pr.Base.Points() {
		pq, ph = append(pq, p.Q), append(ph, p.H)
	}
	in.DataPoints = chart.Curve{Name: "data-sheet points", X: inUnit(qu, pq), Y: inUnit(hu, ph)}
	if len(pr.System) > 0 {
		var sq, sh []float64
		for _, p := range pr.System {
			sq, sh = append(sq, p.Q), append(sh, p.H)
		}
		in.Systems = append(in.Systems, chart.Curve{Name: "system curve of the line", X: inUnit(qu, sq), Y: inUnit(hu, sh)})
		if last := pr.System[len(pr.System)-1].Q; last > c.MaxFlow() {
			in.Bands = append(in.Bands, chart.Band{X0: qu.FromSI(c.MaxFlow()), X1: math.Inf(1), Label: "beyond the data sheet"})
		}
	}
	if op := pr.Operating; op != nil {
		in.Operating = append(in.Operating, chart.Marker{X: qu.FromSI(op.Q), Y: hu.FromSI(op.H),
			Label: "operating point\n" + scenario.ShowParam("q", op.Q, us) + ", " + scenario.Show(op.H, calc.Length, us)})
	}
	if c.HasEfficiency() {
		pct := displayUnit("peff", us)
		eq, ey := sampleCurve(c.MinFlow(), c.MaxFlow(), c.Efficiency)
		in.Efficiency = chart.Curve{Name: "pump efficiency η", X: inUnit(qu, eq), Y: inUnit(pct, ey)}
		in.EfficiencyLabel = "efficiency η (" + pct.Symbol + ")"
	}
	if c.HasNPSHr() {
		nq, nr := sampleCurve(c.MinFlow(), c.MaxFlow(), c.NPSHr)
		in.NPSHRequired = chart.Curve{Name: "NPSH required", X: inUnit(qu, nq), Y: inUnit(hu, nr)}
	}
	if len(pr.NPSHa) > 0 {
		var aq, ah []float64
		for _, p := range pr.NPSHa {
			aq, ah = append(aq, p.Q), append(ah, p.H)
		}
		in.NPSHAvailable = chart.Curve{Name: "NPSH available", X: inUnit(qu, aq), Y: inUnit(hu, ah)}
	}
	s.wide = in.Width
	ch := chart.PumpSystemChart(in)
	return &ch
}

// profileChart is the EGL/HGL profile along the line, nil without a line.
func (s *sheet) profileChart() *chart.Chart {
	b := s.res.Balance
	if b == nil || len(b.Profile) == 0 {
		return nil
	}
	us := s.us()
	lu := displayUnit("l", us)
	zu := displayUnit("z1", us)
	n := len(b.Profile)
	dist, z, egl, hgl := make([]float64, n), make([]float64, n), make([]float64, n), make([]float64, n)
	for i, p := range b.Profile {
		dist[i], z[i], egl[i], hgl[i] = lu.FromSI(p.Distance), zu.FromSI(p.Z), zu.FromSI(p.EGL), zu.FromSI(p.HGL)
	}
	in := chart.ProfileInput{
		Title:         "Along the line at " + scenario.ShowParam("q", b.Q, us),
		DistanceLabel: "distance from point 1 (" + lu.Symbol + ")",
		HeadLabel:     "elevation and head (" + zu.Symbol + ", gauge basis)",
		Distance:      dist,
		Pipe:          z,
		EGL:           egl,
		HGL:           hgl,
		PipeName:      "pipe elevation",
		Width:         chartWidth(),
		Height:        440,
	}
	if len(s.res.VapourLine) == n {
		in.Vapour = inUnit(zu, s.res.VapourLine)
	}
	first, last := b.Profile[0], b.Profile[n-1]
	in.Nodes = append(in.Nodes,
		chart.Marker{X: dist[0], Y: zu.FromSI(first.Z), Label: "1"},
		chart.Marker{X: dist[n-1], Y: zu.FromSI(last.Z), Label: "2"})
	if b.PumpHead > 0 {
		if k := s.pumpAfter(); k >= 0 {
			for i, p := range b.Profile {
				if p.Segment == k+1 {
					in.Nodes = append(in.Nodes, chart.Marker{X: dist[i], Y: egl[i], Label: "pump", Shape: chart.Triangle})
					break
				}
			}
		}
	}
	s.wide = in.Width
	ch := chart.ProfileChart(in)
	return &ch
}

// chartFigure wraps a chart's SVG with a caption for the page.
func chartFigure(id string, c *chart.Chart, caption string) app.UI {
	if c == nil {
		return nil
	}
	body := []app.UI{app.Div().Class("chart").Body(app.Raw(c.SVG()))}
	if caption != "" {
		body = append(body, app.P().Class("caption").Text(caption))
	}
	return app.Figure().Class("figure").ID(id).Body(body...)
}
