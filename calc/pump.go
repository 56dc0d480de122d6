package calc

import "math"

// Limits on the number of data-sheet points of a pump curve.
const (
	PumpMinPoints = 3 // fewest data-sheet points FitPump accepts
	PumpMaxPoints = 8 // most data-sheet points FitPump accepts
)

// PumpPoint is one point read off a pump's data sheet: flow Q (m³/s), head
// H (m of the liquid), and optionally the pump's efficiency Eff (a
// fraction, 0–1; 0 means not given) and the NPSH it requires, NPSHr (m; 0
// means not given).
type PumpPoint struct {
	Q, H, Eff, NPSHr float64
}

// PumpCurve is a pump's head (and, when given, efficiency and NPSHr)
// against flow, interpolated between data-sheet points by a monotone
// piecewise cubic Hermite curve (Fritsch & Carlson, 1980; see FitPump). It
// is defined only between the first and the last data-sheet flow: the
// curve is never extrapolated. The zero value has no points; build one
// with FitPump.
type PumpCurve struct {
	points    []PumpPoint
	head      pchip
	eff       pchip // empty when no efficiencies were given
	npsh      pchip // empty when no NPSHr values were given
	hasEff    bool
	hasNPSH   bool
	npshStart int // index of the first point with an NPSHr value
}

// FitPump fits a pump curve to 3 to 8 data-sheet points.
//
// The flows must start at zero or above and rise strictly from point to
// point. The heads must fall strictly from the highest point to the last;
// before the highest point they may rise strictly (a drooping curve, whose
// head rises at low flow: see Unstable). A curve that stays level, or
// rises again after falling, or ends on its highest point, is refused
// (field "pq" or "ph", the message names the point).
// Efficiencies are optional but all-or-none (field "peff"): when given,
// every point with a flow above zero needs one above 0 and at most 1, and
// a point at zero flow must have 0, its value by definition. NPSHr values
// are optional but all-or-none (field "pnpsh"), except that a point at zero
// flow may go without one (data sheets rarely give it); the NPSHr curve
// then starts at the first point that has one.
//
// The head is interpolated by monotone piecewise cubic Hermite
// interpolation, F. N. Fritsch and R. E. Carlson, "Monotone piecewise
// cubic interpolation", SIAM J. Numer. Anal. 17(2):238–246 (1980), with
// the slopes of Fritsch & Butland (1984) as in SLATEC PCHIM: the curve
// passes through every point, falls everywhere between them and does not
// overshoot. Efficiency and NPSHr use the same shape-preserving scheme, so
// an efficiency curve keeps its single peak at a data point's level or
// between two points without inventing a higher one.
func FitPump(points []PumpPoint) (PumpCurve, error) {
	n := len(points)
	if n < PumpMinPoints || n > PumpMaxPoints {
		return PumpCurve{}, countErr("pq", n, PumpMinPoints, PumpMaxPoints)
	}
	finite := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	effGiven, npshGiven, falling := false, false, false
	for i, p := range points {
		k := i + 1
		switch {
		case !finite(p.Q) || p.Q < 0:
			return PumpCurve{}, NewFieldError("pq", Negative).At(k).Got(Fig(p.Q, Flow))
		case i > 0 && !(p.Q > points[i-1].Q):
			return PumpCurve{}, NewFieldError("pq", BelowLimit).At(k).Got(Fig(p.Q, Flow)).AtLeast(Fig(points[i-1].Q, Flow)).Because(ReasonFlowsRising)
		case !finite(p.H) || p.H < 0:
			return PumpCurve{}, NewFieldError("ph", Negative).At(k).Got(Fig(p.H, Length))
		case i > 0 && p.H == points[i-1].H:
			return PumpCurve{}, NewFieldError("ph", Inconsistent).At(k).Got(Fig(p.H, Length)).Because(ReasonCurveLevel)
		case i > 0 && p.H > points[i-1].H && falling:
			return PumpCurve{}, NewFieldError("ph", AboveLimit).At(k).Got(Fig(p.H, Length)).AtMost(Fig(points[i-1].H, Length)).Because(ReasonCurveMustFall)
		case i > 0 && p.H < points[i-1].H:
			falling = true
		}
		effGiven = effGiven || p.Eff != 0
		npshGiven = npshGiven || p.NPSHr != 0
	}
	if !falling || points[n-1].H > points[n-2].H {
		return PumpCurve{}, NewFieldError("ph", Inconsistent).At(n).Because(ReasonCurveEndsHigh)
	}
	c := PumpCurve{points: append([]PumpPoint(nil), points...)}
	x := make([]float64, n)
	y := make([]float64, n)
	for i, p := range points {
		x[i], y[i] = p.Q, p.H
	}
	c.head = newPchip(x, y)
	if effGiven {
		for i, p := range points {
			switch {
			case p.Q == 0 && p.Eff != 0:
				return PumpCurve{}, NewFieldError("peff", Inconsistent).At(i + 1).Got(Num(p.Eff)).Because(ReasonZeroFlowEff)
			case p.Q > 0 && !(p.Eff > 0 && p.Eff <= 1):
				return PumpCurve{}, NewFieldError("peff", OutOfRange).At(i+1).Got(Num(p.Eff)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
			}
			y[i] = p.Eff
		}
		c.eff, c.hasEff = newPchip(x, y), true
	}
	if npshGiven {
		if points[0].Q == 0 && points[0].NPSHr == 0 {
			c.npshStart = 1
		}
		for i := c.npshStart; i < n; i++ {
			p := points[i]
			if !finite(p.NPSHr) || !(p.NPSHr > 0) {
				return PumpCurve{}, NewFieldError("pnpsh", NotPositive).At(i + 1).Got(Fig(p.NPSHr, Length))
			}
			y[i] = p.NPSHr
		}
		c.npsh, c.hasNPSH = newPchip(x[c.npshStart:], y[c.npshStart:]), true
	}
	return c, nil
}

// Points returns a copy of the data-sheet points the curve was fitted to
// (after any speed change or combination).
func (c PumpCurve) Points() []PumpPoint { return append([]PumpPoint(nil), c.points...) }

// MinFlow returns the first data-sheet flow, m³/s (0 when the sheet starts
// at shut-off).
func (c PumpCurve) MinFlow() float64 {
	if len(c.points) == 0 {
		return 0
	}
	return c.points[0].Q
}

// MaxFlow returns the last data-sheet flow, m³/s: the curve ends there.
func (c PumpCurve) MaxFlow() float64 {
	if len(c.points) == 0 {
		return 0
	}
	return c.points[len(c.points)-1].Q
}

// ShutoffHead returns the head at the first data-sheet point, m: the
// shut-off head when that point is at zero flow (the usual case).
func (c PumpCurve) ShutoffHead() float64 {
	if len(c.points) == 0 {
		return 0
	}
	return c.points[0].H
}

// HasEfficiency reports whether the curve carries efficiencies.
func (c PumpCurve) HasEfficiency() bool { return c.hasEff }

// HasNPSHr reports whether the curve carries NPSH-required values.
func (c PumpCurve) HasNPSHr() bool { return c.hasNPSH }

// inRange reports whether q lies within the data-sheet flows from index i.
func (c PumpCurve) inRange(q float64, i int) bool {
	return len(c.points) > i && q >= c.points[i].Q && q <= c.points[len(c.points)-1].Q
}

// Head returns the pump's head at flow q (m³/s), m, and true; false (and 0)
// when q lies outside the data sheet's flows, where the curve is not
// extrapolated.
func (c PumpCurve) Head(q float64) (float64, bool) {
	if !c.inRange(q, 0) {
		return 0, false
	}
	return c.head.eval(q), true
}

// Efficiency returns the pump's efficiency at flow q as a fraction, and
// true; false when no efficiencies were given or q lies outside the data
// sheet.
func (c PumpCurve) Efficiency(q float64) (float64, bool) {
	if !c.hasEff || !c.inRange(q, 0) {
		return 0, false
	}
	return c.eff.eval(q), true
}

// NPSHr returns the NPSH the pump requires at flow q, m, and true; false
// when no NPSHr values were given or q lies outside the flows that have
// one.
func (c PumpCurve) NPSHr(q float64) (float64, bool) {
	if !c.hasNPSH || !c.inRange(q, c.npshStart) {
		return 0, false
	}
	return c.npsh.eval(q), true
}

// Unstable returns the flows over which the head rises with flow, from
// the first data-sheet point to the highest head (a drooping curve), and
// true; false for a curve that falls everywhere. A line whose static head
// lies between the shut-off head and the highest head can meet such a
// curve twice, and a pump run there may hunt between the two points
// (common practice); pumps in parallel with such curves may not share the
// flow.
func (c PumpCurve) Unstable() (lo, hi float64, ok bool) {
	k := c.peak()
	if k == 0 {
		return 0, 0, false
	}
	return c.points[0].Q, c.points[k].Q, true
}

// peak returns the index of the highest head (0 for a falling curve).
func (c PumpCurve) peak() int {
	k := 0
	for i, p := range c.points {
		if p.H > c.points[k].H {
			k = i
		}
	}
	return k
}
