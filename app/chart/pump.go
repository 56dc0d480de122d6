package chart

import "math"

// Curve is one named line for the canned charts: X and Y paired by index,
// NaN to break the line. An empty Curve (no points) is left out.
type Curve struct {
	Name string
	X, Y []float64
}

func (c Curve) empty() bool { return len(c.X) == 0 || len(c.Y) == 0 }

// PumpSystemInput holds what PumpSystemChart draws, in display units (the
// caller converts and writes the units into the axis titles).
//
// The chart's language (see DEVELOPERS.md): solid lines are the pump's
// side (the head it gives, the NPSH it needs), dashed lines the line's
// side (the head it needs, the NPSH it offers); the accent is what is
// worked out for this sheet, ink what was given; filled marks come from
// the data sheet, open marks from the site; a flat tint is a range to keep
// to, hatching a range to distrust. Lines are named at their ends, not in
// a legend; other quantities against flow stand in strips below the head,
// each with its own scale, never on a second axis.
type PumpSystemInput struct {
	// Title heads the chart, e.g. "BS-3 duty pump against the line".
	Title string
	// FlowLabel, HeadLabel are the axis titles, e.g. "flow Q (L/s)" and
	// "head H (m)".
	FlowLabel, HeadLabel string
	// Pumps are head–flow curves. The first (the pump as it runs, e.g.
	// "pump at 100 % speed") is drawn solid and heavy in the accent
	// colour; the others (the data sheet's curve when the pump runs
	// otherwise, pumps in parallel) thin solid ink.
	Pumps []Curve
	// Speeds are the pump's curves at other speeds (e.g. the speed that
	// meets a flow): medium solid accent.
	Speeds []Curve
	// DataPoints are the data-sheet points, drawn as small filled dots.
	DataPoints Curve
	// Systems are system curves, drawn in ink dashes (the first heavier).
	Systems []Curve
	// Operating are operating points, each a ringed dot with its label; the
	// first is in the accent colour with drop lines to both axes.
	Operating []Marker
	// Peaks are best-efficiency points: filled ink triangles.
	Peaks []Marker
	// Measured are measured points: small open ink rings, each with its
	// uncertainty box when its DX or DY is set.
	Measured []Marker
	// Tested is a test's head curve through its readings: medium solid
	// accent (worked out from the site), named at its end; TestedBand its
	// band's two edges, thin dotted accent, unnamed.
	Tested     Curve
	TestedBand []Curve
	// Guarantee is a guarantee point: a filled ink diamond (given on
	// paper) with its tolerance cross, two solid ink bars (Cross); Origin
	// the line from the origin through it, thin dash-dot ink.
	Guarantee *Marker
	Cross     *TolCross
	Origin    Curve
	// Bands are flow ranges: hatched (beyond the data sheet, unstable), or
	// tinted when Tint is set (the preferred operating region); or
	// zero-width guides.
	Bands []Band
	// Efficiency, if given, is drawn in a strip below the head, titled
	// EfficiencyLabel (e.g. "efficiency η (%)"), from 0, as a solid ink
	// line over a light area.
	Efficiency      Curve
	EfficiencyLabel string
	// NPSHRequired and NPSHAvailable, if either is given, go in the
	// bottom strip, titled NPSHLabel (e.g. "NPSH (m)"): required solid
	// ink, available dashed accent. The operating flows are marked in
	// every strip by guide lines.
	NPSHRequired, NPSHAvailable Curve
	NPSHLabel                   string
	// FlowMax and HeadMax fix the top of the axes (0 = automatic); both
	// axes start at 0.
	FlowMax, HeadMax float64
	// Accent, Width and Height are passed to the Chart.
	Accent        string
	Width, Height int
}

// TolCross is a tolerance cross in data units: the flow bar from X0 to X1 at
// head Y, the head bar from Y0 to Y1 at flow X.
type TolCross struct{ X, Y, X0, X1, Y0, Y1 float64 }

// PumpSystemChart builds the pump-and-system chart: head against flow with
// the pump curve(s), the system curve(s), the operating point(s), optional
// data-sheet points, best-efficiency and measured points, and optional
// strips below on the same flow axis for efficiency and NPSH.
func PumpSystemChart(in PumpSystemInput) Chart {
	c := Chart{
		Title:  in.Title,
		XLabel: in.FlowLabel,
		YLabel: in.HeadLabel,
		XMin:   Fix(0),
		YMin:   Fix(0),
		Bands:  in.Bands,
		Accent: in.Accent,
		Width:  in.Width,
		Height: in.Height,
		Direct: true,
	}
	if in.FlowMax > 0 {
		c.XMax = Fix(in.FlowMax)
	}
	if in.HeadMax > 0 {
		c.YMax = Fix(in.HeadMax)
	}
	for i, p := range in.Pumps {
		if p.empty() {
			continue
		}
		s := Series{Name: p.Name, X: p.X, Y: p.Y, Key: "pump"}
		if i == 0 {
			s.Accent, s.Heavy = true, true
		} else {
			s.Key = "pump-other"
		}
		c.Series = append(c.Series, s)
	}
	for _, p := range in.Speeds {
		if !p.empty() {
			c.Series = append(c.Series, Series{Name: p.Name, X: p.X, Y: p.Y, Accent: true, Key: "speed"})
		}
	}
	for i, sc := range in.Systems {
		if sc.empty() {
			continue
		}
		c.Series = append(c.Series, Series{Name: sc.Name, X: sc.X, Y: sc.Y, Style: Dashed, Heavy: i == 0, Key: "system", TagBelow: true})
	}
	if !in.DataPoints.empty() {
		c.Series = append(c.Series, Series{Name: in.DataPoints.Name, X: in.DataPoints.X, Y: in.DataPoints.Y, Style: Points, Shape: Dot, Key: "data"})
	}
	if !in.Tested.empty() {
		c.Series = append(c.Series, Series{Name: in.Tested.Name, X: in.Tested.X, Y: in.Tested.Y, Accent: true, Key: "tested"})
	}
	for _, e := range in.TestedBand {
		if !e.empty() {
			c.Series = append(c.Series, Series{X: e.X, Y: e.Y, Style: Dotted, Accent: true, Key: "tested-band"})
		}
	}
	if !in.Origin.empty() {
		c.Series = append(c.Series, Series{X: in.Origin.X, Y: in.Origin.Y, Style: DashDot, Key: "origin-line"})
	}
	if x := in.Cross; x != nil {
		nan := math.NaN()
		c.Series = append(c.Series, Series{X: []float64{x.X0, x.X1, nan, x.X, x.X}, Y: []float64{x.Y, x.Y, nan, x.Y0, x.Y1}, Heavy: true, Key: "cross"})
	}
	if m := in.Guarantee; m != nil {
		g := *m
		g.Shape, g.Key, g.Accent = Gem, "guarantee", false
		c.Markers = append(c.Markers, g)
	}
	for i, m := range in.Operating {
		if i == 0 {
			m.Accent, m.Drop = true, true
		}
		m.Shape, m.Key = Target, "operating"
		c.Markers = append(c.Markers, m)
	}
	for _, m := range in.Measured {
		m.Shape, m.Key, m.Accent = Ring, "measured", false
		c.Markers = append(c.Markers, m)
	}
	for _, m := range in.Peaks {
		m.Shape, m.Key, m.Accent = Peak, "peak", false
		c.Markers = append(c.Markers, m)
	}
	var guides []Band
	for _, m := range in.Operating {
		guides = append(guides, Band{X0: m.X, X1: m.X})
	}
	last := &c
	h := float64(in.Height)
	if h <= 0 {
		h = 480
	}
	if !in.Efficiency.empty() {
		st := &Chart{YLabel: in.EfficiencyLabel, YMin: Fix(0), Height: int(h * 0.36), Bands: guides,
			Series: []Series{{Name: in.Efficiency.Name, X: in.Efficiency.X, Y: in.Efficiency.Y, Style: Area, Key: "efficiency"}}}
		for _, b := range in.Bands {
			if b.Tint {
				st.Bands = append(st.Bands, Band{X0: b.X0, X1: b.X1, Tint: true})
			}
		}
		last.Lower, last = st, st
	}
	if !in.NPSHRequired.empty() || !in.NPSHAvailable.empty() {
		lo := &Chart{YLabel: in.NPSHLabel, YMin: Fix(0), Height: int(h * 0.45), Bands: guides}
		if !in.NPSHRequired.empty() {
			lo.Series = append(lo.Series, Series{Name: in.NPSHRequired.Name, X: in.NPSHRequired.X, Y: in.NPSHRequired.Y, Heavy: true, Key: "npsh-required", TagBelow: true})
		}
		if !in.NPSHAvailable.empty() {
			lo.Series = append(lo.Series, Series{Name: in.NPSHAvailable.Name, X: in.NPSHAvailable.X, Y: in.NPSHAvailable.Y, Style: Dashed, Accent: true, Heavy: true, Key: "npsh-available"})
		}
		last.Lower = lo
	}
	return c
}
