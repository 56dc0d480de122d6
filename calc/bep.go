package calc

import "math"

// Preferred operating region of a centrifugal pump as shares of its
// best-efficiency flow: 70 % to 120 %, after ANSI/HI 9.6.3 (from memory;
// the standard narrows it for pumps of high suction specific speed, and the
// allowable region beyond it is the maker's to state).
const (
	PreferredRegionLow  = 0.70
	PreferredRegionHigh = 1.20
)

// BEP is a pump's best-efficiency point.
type BEP struct {
	Q, Eff float64 // flow, m³/s, and the efficiency there (a share)
	H      float64 // the curve's head at Q, m
	// AtEdge is true when the data sheet's highest efficiency is its first
	// or last point: the peak may lie beyond the sheet, and Q is that
	// point's flow.
	AtEdge bool
}

// Region returns the preferred operating region's flows, m³/s:
// PreferredRegionLow·Q to PreferredRegionHigh·Q.
func (b BEP) Region() (lo, hi float64) {
	return PreferredRegionLow * b.Q, PreferredRegionHigh * b.Q
}

// InRegion reports whether flow q lies in the preferred operating region.
func (b BEP) InRegion(q float64) bool {
	lo, hi := b.Region()
	return q >= lo && q <= hi
}

// BestEfficiency returns the curve's best-efficiency point, found from its
// data-sheet efficiencies: the peak of the parabola through the point of
// highest efficiency and its two neighbours (three-point peak
// interpolation, the usual way to locate a maximum between tabulated
// values). The monotone interpolation the curve draws peaks exactly at a
// data point by construction (it never overshoots), so it would only ever
// return the highest point; the parabola puts the peak between points
// where the neighbours say it lies. The peak is kept within the
// neighbours' flows. When the highest efficiency is the first or last
// point, that point is returned with AtEdge set. ok is false when the
// curve has no efficiencies.
func (c PumpCurve) BestEfficiency() (b BEP, ok bool) {
	if !c.hasEff {
		return BEP{}, false
	}
	pts := c.points
	k := 0
	for i, p := range pts {
		if p.Eff > pts[k].Eff {
			k = i
		}
	}
	if k == 0 || k == len(pts)-1 {
		h, _ := c.Head(pts[k].Q)
		return BEP{Q: pts[k].Q, Eff: pts[k].Eff, H: h, AtEdge: true}, true
	}
	q, e := parabolaPeak(pts[k-1].Q, pts[k-1].Eff, pts[k].Q, pts[k].Eff, pts[k+1].Q, pts[k+1].Eff)
	if math.IsNaN(q) || q < pts[k-1].Q || q > pts[k+1].Q {
		q, e = pts[k].Q, pts[k].Eff
	}
	h, _ := c.Head(q)
	return BEP{Q: q, Eff: e, H: h}, true
}

// parabolaPeak returns the vertex of the parabola through three points
// with x0 < x1 < x2; NaN when they are collinear.
func parabolaPeak(x0, y0, x1, y1, x2, y2 float64) (x, y float64) {
	a, b := x1-x0, x1-x2
	den := a*(y1-y2) - b*(y1-y0)
	if den == 0 {
		return math.NaN(), math.NaN()
	}
	x = x1 - 0.5*(a*a*(y1-y2)-b*b*(y1-y0))/den
	// Lagrange form of the parabola at x.
	l0 := (x - x1) * (x - x2) / ((x0 - x1) * (x0 - x2))
	l1 := (x - x0) * (x - x2) / ((x1 - x0) * (x1 - x2))
	l2 := (x - x0) * (x - x1) / ((x2 - x0) * (x2 - x1))
	return x, y0*l0 + y1*l1 + y2*l2
}
