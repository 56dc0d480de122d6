package chart

// Curve is one named line for the canned charts: X and Y paired by index,
// NaN to break the line. An empty Curve (no points) is left out.
type Curve struct {
	Name string
	X, Y []float64
}

func (c Curve) empty() bool { return len(c.X) == 0 || len(c.Y) == 0 }

// PumpSystemInput holds what PumpSystemChart draws, in display units (the
// caller converts and writes the units into the axis titles).
type PumpSystemInput struct {
	// Title heads the chart, e.g. "BS-3 duty pump against the line".
	Title string
	// FlowLabel, HeadLabel are the axis titles, e.g. "flow Q (L/s)" and
	// "head H (m)".
	FlowLabel, HeadLabel string
	// Pumps are head–flow curves. The first (the pump as it runs, e.g.
	// "pump at 100 % speed") is drawn solid and heavy in the accent colour;
	// the others (other speeds, pumps in parallel) in ink, dashed, long
	// dashed, then dotted.
	Pumps []Curve
	// DataPoints are the data-sheet points, drawn as open squares.
	DataPoints Curve
	// Systems are system curves, drawn in ink dash-dot (the first heavy).
	Systems []Curve
	// Operating are operating points, each a ringed dot with its label; the
	// first is in the accent colour with drop lines to both axes.
	Operating []Marker
	// Bands are shaded flow ranges, e.g. {X0: 70, X1: math.Inf(1),
	// Label: "beyond data sheet"}, or zero-width guides.
	Bands []Band
	// Efficiency, if given, is drawn dotted against a right-hand axis
	// titled EfficiencyLabel (e.g. "efficiency η (%)"), starting at 0.
	Efficiency      Curve
	EfficiencyLabel string
	// NPSHRequired and NPSHAvailable, if either is given, go in a panel
	// below sharing the flow axis, titled NPSHLabel (e.g. "NPSH (m)"):
	// required solid ink, available dashed accent. The operating flows are
	// marked there by guide lines.
	NPSHRequired, NPSHAvailable Curve
	NPSHLabel                   string
	// FlowMax and HeadMax fix the top of the axes (0 = automatic); both
	// axes start at 0.
	FlowMax, HeadMax float64
	// Accent, Width and Height are passed to the Chart.
	Accent        string
	Width, Height int
}

// PumpSystemChart builds the pump-and-system chart: head against flow with
// the pump curve(s), the system curve(s), the operating point(s), optional
// data-sheet points and efficiency (right axis), and an optional NPSH panel
// below on the same flow axis.
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
	}
	if in.FlowMax > 0 {
		c.XMax = Fix(in.FlowMax)
	}
	if in.HeadMax > 0 {
		c.YMax = Fix(in.HeadMax)
	}
	others := [...]Style{Dashed, LongDash, Dotted}
	for i, p := range in.Pumps {
		if p.empty() {
			continue
		}
		s := Series{Name: p.Name, X: p.X, Y: p.Y}
		if i == 0 {
			s.Accent, s.Heavy = true, true
		} else {
			s.Style = others[(i-1)%len(others)]
		}
		c.Series = append(c.Series, s)
	}
	for i, sc := range in.Systems {
		if sc.empty() {
			continue
		}
		c.Series = append(c.Series, Series{Name: sc.Name, X: sc.X, Y: sc.Y, Style: DashDot, Heavy: i == 0})
	}
	if !in.DataPoints.empty() {
		c.Series = append(c.Series, Series{Name: in.DataPoints.Name, X: in.DataPoints.X, Y: in.DataPoints.Y, Style: Points, Shape: Square})
	}
	if !in.Efficiency.empty() {
		c.Y2 = &Axis{Label: in.EfficiencyLabel, Min: Fix(0)}
		c.Series = append(c.Series, Series{Name: in.Efficiency.Name, X: in.Efficiency.X, Y: in.Efficiency.Y, Style: Dotted, Y2: true})
	}
	for i, m := range in.Operating {
		if i == 0 {
			m.Accent, m.Drop = true, true
		}
		c.Markers = append(c.Markers, m)
	}
	if !in.NPSHRequired.empty() || !in.NPSHAvailable.empty() {
		lo := &Chart{YLabel: in.NPSHLabel, YMin: Fix(0)}
		if !in.NPSHRequired.empty() {
			lo.Series = append(lo.Series, Series{Name: in.NPSHRequired.Name, X: in.NPSHRequired.X, Y: in.NPSHRequired.Y, Heavy: true})
		}
		if !in.NPSHAvailable.empty() {
			lo.Series = append(lo.Series, Series{Name: in.NPSHAvailable.Name, X: in.NPSHAvailable.X, Y: in.NPSHAvailable.Y, Style: Dashed, Accent: true, Heavy: true})
		}
		for _, m := range in.Operating {
			lo.Bands = append(lo.Bands, Band{X0: m.X, X1: m.X})
		}
		c.Lower = lo
	}
	return c
}
