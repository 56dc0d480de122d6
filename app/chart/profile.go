package chart

// ProfileInput holds what ProfileChart draws along a line, in display units.
type ProfileInput struct {
	// Title heads the chart, e.g. "Intake to Crest reservoir".
	Title string
	// DistanceLabel, HeadLabel are the axis titles, e.g. "distance along
	// the line (m)" and "elevation, head (m)".
	DistanceLabel, HeadLabel string
	// Distance is the x value of every station; the other slices are
	// paired with it by index (nil leaves a line out, NaN breaks it).
	Distance []float64
	// Pipe is the pipe centreline elevation (solid, heavy, ink).
	Pipe []float64
	// EGL is the energy grade line (dashed, ink).
	EGL []float64
	// HGL is the hydraulic grade line (solid, accent).
	HGL []float64
	// Vapour is the vapour-pressure line: the height the HGL would have
	// where the absolute pressure equals the vapour pressure (dotted, ink).
	Vapour []float64
	// PipeName, EGLName, HGLName and VapourName override the legend
	// names (defaults "pipe", "energy grade line (EGL)", "hydraulic grade
	// line (HGL)", "vapour-pressure line").
	PipeName, EGLName, HGLName, VapourName string
	// Nodes are optional labelled stations (e.g. "1", "pump", "2"); the
	// default shape is a small open circle.
	Nodes []Marker
	// Bands are shaded distance ranges or zero-width guides.
	Bands []Band
	// Accent, Width and Height are passed to the Chart.
	Accent        string
	Width, Height int
}

// ProfileChart builds the along-the-line profile: pipe elevation, EGL, HGL
// and the vapour-pressure line against distance. The distance axis starts
// at 0, or at the smallest distance if that is negative; the height axis
// is automatic.
func ProfileChart(in ProfileInput) Chart {
	c := Chart{
		Title:  in.Title,
		XLabel: in.DistanceLabel,
		YLabel: in.HeadLabel,
		Bands:  in.Bands,
		Accent: in.Accent,
		Width:  in.Width,
		Height: in.Height,
	}
	if x0, ok := minFinite(in.Distance); ok {
		if x0 > 0 {
			x0 = 0
		}
		c.XMin = Fix(x0)
	}
	name := func(s, def string) string {
		if s == "" {
			return def
		}
		return s
	}
	add := func(y []float64, s Series) {
		if len(y) == 0 {
			return
		}
		s.X, s.Y = in.Distance, y
		c.Series = append(c.Series, s)
	}
	add(in.Pipe, Series{Name: name(in.PipeName, "pipe"), Heavy: true})
	// The EGL lies a velocity head above the HGL, often less than a line's
	// width at the chart's scale: each carries its tag, EGL above, HGL below.
	add(in.EGL, Series{Name: name(in.EGLName, "energy grade line (EGL)"), Style: Dashed, Key: "egl", Tag: "EGL"})
	add(in.HGL, Series{Name: name(in.HGLName, "hydraulic grade line (HGL)"), Accent: true, Key: "hgl", Tag: "HGL", TagBelow: true})
	add(in.Vapour, Series{Name: name(in.VapourName, "vapour-pressure line"), Style: Dotted})
	for _, m := range in.Nodes {
		if m.Shape == AutoShape {
			m.Shape = Circle
		}
		c.Markers = append(c.Markers, m)
	}
	return c
}

func minFinite(v []float64) (float64, bool) {
	m, ok := 0.0, false
	for _, x := range v {
		if finite(x) && (!ok || x < m) {
			m, ok = x, true
		}
	}
	return m, ok
}
