package calc

import "math"

// Guarantee is the duty a pump's maker guarantees: flow Q (m³/s), head H
// (m) and, when guaranteed, the pump's own efficiency Eff (a share; 0 = not
// guaranteed).
type Guarantee struct {
	Q, H, Eff float64
}

// SheetGuarantee returns the data sheet's head and efficiency (0 when the
// sheet has none) at flow q as the guarantee point, for a contract that
// names only the duty flow; false when q lies outside the data sheet's
// flows or its head there is not above zero.
func SheetGuarantee(c PumpCurve, q float64) (Guarantee, bool) {
	h, ok := c.Head(q)
	if !ok || !(q > 0) || !(h > 0) {
		return Guarantee{}, false
	}
	e, _ := c.Efficiency(q)
	return Guarantee{Q: q, H: h, Eff: e}, true
}

// ToleranceCross is the cross of ISO 9906 drawn through the guarantee
// point (Q, H): the flow bar at head H from FlowLow to FlowHigh (m³/s),
// Q·(1 + t_Q) at each end, and the head bar at flow Q from HeadLow to
// HeadHigh (m), H·(1 + t_H) at each end. A one-sided grade (1U, 2U) has a
// bar that starts at the guarantee point itself.
type ToleranceCross struct {
	Q, H              float64
	FlowLow, FlowHigh float64
	HeadLow, HeadHigh float64
}

// CrossBasis says what a flow-and-head verdict rests on.
type CrossBasis uint8

const (
	// CrossCurve: the tested head curve through two readings or more, and
	// its band.
	CrossCurve CrossBasis = iota
	// CrossPoint: a single reading, which shows no curve: the verdict is
	// what follows for any head curve that falls with rising flow through
	// the reading's uncertainty box (see AcceptGuarantee).
	CrossPoint
)

func (b CrossBasis) String() string { return [...]string{"curve", "one point"}[b] }

// EffStatus says whether the efficiency was read at the guarantee's line.
type EffStatus uint8

const (
	EffRead          EffStatus = iota // read and judged
	EffNotGuaranteed                  // no efficiency guaranteed (Guarantee.Eff 0)
	EffNoCurve                        // the readings lack the pump's own efficiency (input power or motor efficiency)
	EffOnePoint                       // a single reading: no curve to meet the line
	EffLineMissed                     // the tested head curve does not meet the line within the tested flows
)

func (s EffStatus) String() string {
	return [...]string{"read", "not guaranteed", "no efficiency curve", "one point", "line missed"}[s]
}

// EffAtLine is the efficiency read where the tested head curve meets the
// straight line from the origin through the guarantee point: at Flow
// (m³/s) and Head (m) the tested pump efficiency Value ± U (shares), judged
// against η_G·(1 − |t_η|) with no upper limit. Status says why it was not
// read, if it was not; the figures are then 0 and Judgement's verdict
// VerdictNone.
type EffAtLine struct {
	Status     EffStatus
	Flow, Head float64
	Value, U   float64
	Judgement  Judgement
}

// GuaranteeAcceptance is a test judged against a guarantee point under an
// acceptance grade of ISO 9906.
type GuaranteeAcceptance struct {
	Grade     Grade
	Guarantee Guarantee
	Cross     ToleranceCross
	Basis     CrossBasis
	// Covered is true when the tested flows span the flow bar (always
	// false for a single reading). Beyond the tested flows the curve is not
	// known, so a part of the bar the test does not reach can neither
	// prove nor rule out a touch.
	Covered bool
	// FlowHead is the verdict on flow and head: whether the tested H(Q)
	// curve passes through or touches the cross.
	FlowHead   Verdict
	Efficiency EffAtLine
	// Verdict is Outside when either FlowHead or the efficiency is
	// outside; else CannotTell when either cannot tell, or an efficiency
	// was guaranteed but could not be read; else Within.
	Verdict Verdict
}

// AcceptGuarantee judges test t against guarantee point gp under grade g,
// after ISO 9906:2012 (Rotodynamic pumps — Hydraulic performance
// acceptance tests — Grades 1, 2 and 3), as public summaries state its
// method (KSB, Centrifugal pump lexicon, "Tolerance", ksb.com/en-global/
// centrifugal-pump-lexicon/article/tolerance-2155174): flow and head are
// accepted when the tested H(Q) curve intersects or at least touches the
// tolerance cross; the efficiency is read off the tested η(Q) curve at the
// flow where the tested H(Q) curve meets the straight line from the origin
// through (Q_G, H_G), and is accepted when at least η_G·(1 − |t_η|). The
// grades' factors (Grades) are from memory. The grade's tolerances apply
// to the guarantee point only.
//
// The band. Each reading's uncertainty (CheckPumpTest) gives a band about
// the tested curve, from H − u to H + u; the true curve is taken to lie
// anywhere in it, as any continuous curve. FlowHead is Within when every
// curve in the band touches the cross, Outside when none does, and
// CannotTell when some do and some do not. A curve misses the cross only
// by staying above H_G along the whole flow bar and passing above the head
// bar's top, or below H_G along it and below the bar's foot; so the verdict
// is decided by the band's edges alone: Outside when the lower edge does
// the first (or the upper edge the second) over a fully tested bar, Within
// when neither edge can.
//
// One reading (Basis CrossPoint) shows no curve, so the verdict is what
// follows for any head curve that falls with rising flow through the
// reading's box (flow ± its band, head ± its band): Within when the box
// lies in the cross's upper-left quarter (flows Q_G·(1 + t_Q,low) to Q_G,
// heads H_G to H_G·(1 + t_H,high)) or its lower-right quarter, where such
// a curve cannot avoid a bar; Outside when the box lies wholly beyond the
// flow bar's high end and above the head bar's top, or wholly before the
// flow bar's low end and below the head bar's foot, where it cannot meet
// one; CannotTell otherwise, which is most places: one reading cannot show
// the curve's slope. The efficiency is not read (EffOnePoint).
//
// The efficiency's band is that of the tested efficiency curve at the
// crossing and the shift of the crossing by the head band, δQ = u_H/|H′ −
// H_G/Q_G|, times the efficiency curve's slope, root-sum-square (first
// order, the two taken as independent). Should the curve meet the line more
// than once (a drooping curve), the crossing nearest Q_G is read.
//
// Errors name "qm" (TooFew: a test without readings), "qg" and "hg" (not
// a finite value above zero), "etag" (an efficiency from 0 to 1) and
// "grade" (tolerance factors that are not a grade's: each low factor at or
// below zero, each high one at or above, all finite).
func (t PumpTest) AcceptGuarantee(gp Guarantee, g Grade) (GuaranteeAcceptance, error) {
	finite := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	switch {
	case len(t.Points) == 0:
		return GuaranteeAcceptance{}, countErr("qm", 0, 1, TestMaxReadings)
	case !finite(gp.Q) || !(gp.Q > 0):
		return GuaranteeAcceptance{}, NewFieldError("qg", NotPositive).Got(Fig(gp.Q, Flow))
	case !finite(gp.H) || !(gp.H > 0):
		return GuaranteeAcceptance{}, NewFieldError("hg", NotPositive).Got(Fig(gp.H, Length))
	case !finite(gp.Eff) || gp.Eff < 0 || gp.Eff > 1:
		return GuaranteeAcceptance{}, NewFieldError("etag", OutOfRange).Got(Num(gp.Eff)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
	case !gradeShape(g):
		names := make([]string, len(Grades))
		for i, gr := range Grades {
			names[i] = gr.Name
		}
		return GuaranteeAcceptance{}, NewFieldError("grade", UnknownChoice).Typed(g.Name).OneOf(names...)
	}
	a := GuaranteeAcceptance{Grade: g, Guarantee: gp, Cross: ToleranceCross{
		Q: gp.Q, H: gp.H,
		FlowLow: gp.Q * (1 + g.FlowLow), FlowHigh: gp.Q * (1 + g.FlowHigh),
		HeadLow: gp.H * (1 + g.HeadLow), HeadHigh: gp.H * (1 + g.HeadHigh),
	}}
	if len(t.Points) == 1 {
		a.Basis = CrossPoint
		a.FlowHead = pointCross(t.Points[0], a.Cross)
		a.Efficiency.Status = EffOnePoint
	} else {
		a.Basis = CrossCurve
		a.Covered = t.MinFlow() <= a.Cross.FlowLow && t.MaxFlow() >= a.Cross.FlowHigh
		a.FlowHead = t.curveCross(a.Cross)
		a.Efficiency.Status = EffNoCurve
		if t.HasEfficiency() {
			a.Efficiency = t.effAtLine(gp)
		}
	}
	if gp.Eff == 0 {
		a.Efficiency = EffAtLine{Status: EffNotGuaranteed}
	} else if a.Efficiency.Status == EffRead {
		a.Efficiency.Judgement = judgeAtLeast(a.Efficiency.Value, a.Efficiency.U, gp.Eff*(1-math.Abs(g.EffLow)))
	}
	e := a.Efficiency.Judgement.Verdict
	switch {
	case a.FlowHead == Outside || e == Outside:
		a.Verdict = Outside
	case a.FlowHead == CannotTell || e == CannotTell || gp.Eff > 0 && a.Efficiency.Status != EffRead:
		a.Verdict = CannotTell
	default:
		a.Verdict = Within
	}
	return a, nil
}

// gradeShape reports whether g's factors are finite and on the right
// sides of zero, so that the cross's bars run through the guarantee point.
func gradeShape(g Grade) bool {
	for _, v := range []float64{g.FlowLow, g.FlowHigh, g.HeadLow, g.HeadHigh, g.EffLow} {
		if math.IsNaN(v) || math.IsInf(v, 0) || math.Abs(v) >= 1 {
			return false
		}
	}
	return g.FlowLow <= 0 && g.FlowHigh >= 0 && g.HeadLow <= 0 && g.HeadHigh >= 0 && g.EffLow <= 0
}

// pointCross judges a single reading's box against cross x, for any head
// curve that falls with flow through it (see AcceptGuarantee).
func pointCross(p TestPoint, x ToleranceCross) Verdict {
	q, h := p.Check.Q, p.Check.Head
	uq, uh := p.Bands.Flow.U, p.HeadU
	qlo, qhi, hlo, hhi := q-uq, q+uq, h-uh, h+uh
	upperLeft := qlo >= x.FlowLow && qhi <= x.Q && hlo >= x.H && hhi <= x.HeadHigh
	lowerRight := qlo >= x.Q && qhi <= x.FlowHigh && hlo >= x.HeadLow && hhi <= x.H
	switch {
	case upperLeft || lowerRight:
		return Within
	case qlo >= x.FlowHigh && hlo > x.HeadHigh, qhi <= x.FlowLow && hhi < x.HeadLow:
		return Outside
	}
	return CannotTell
}

// curveCross judges the tested curve's band against cross x (see
// AcceptGuarantee).
func (t PumpTest) curveCross(x ToleranceCross) Verdict {
	// The flow bar's part within the tested flows; an empty part leaves
	// both edges free along the bar.
	lo, hi := math.Max(x.FlowLow, t.MinFlow()), math.Min(x.FlowHigh, t.MaxFlow())
	upper := func(q float64) float64 { return t.head.eval(q) + t.headU.eval(q) }
	lower := func(q float64) float64 { return t.head.eval(q) - t.headU.eval(q) }
	aboveAll := func(f, df func(float64) float64) bool { // f > H_G along the tested part of the bar
		if lo > hi {
			return true
		}
		_, fmin, _, _ := extremes(f, cubicBreaks(df, lo, hi, t.knots()))
		return fmin > x.H
	}
	belowAll := func(f, df func(float64) float64) bool {
		if lo > hi {
			return true
		}
		_, _, _, fmax := extremes(f, cubicBreaks(df, lo, hi, t.knots()))
		return fmax < x.H
	}
	dUpper := func(q float64) float64 { return t.head.slope(q) + t.headU.slope(q) }
	dLower := func(q float64) float64 { return t.head.slope(q) - t.headU.slope(q) }
	tested := x.Q >= t.MinFlow() && x.Q <= t.MaxFlow()
	covered := t.MinFlow() <= x.FlowLow && t.MaxFlow() >= x.FlowHigh
	// Some curve in the band misses the cross: it may run along the upper
	// edge above the whole bar and over the head bar's top, or along the
	// lower edge below and under its foot (untested flows leave it free).
	canMissAbove := aboveAll(upper, dUpper) && (!tested || upper(x.Q) > x.HeadHigh)
	canMissBelow := belowAll(lower, dLower) && (!tested || lower(x.Q) < x.HeadLow)
	// Every curve in the band misses: only over a fully tested bar.
	mustMissAbove := covered && aboveAll(lower, dLower) && lower(x.Q) > x.HeadHigh
	mustMissBelow := covered && belowAll(upper, dUpper) && upper(x.Q) < x.HeadLow
	switch {
	case mustMissAbove || mustMissBelow:
		return Outside
	case canMissAbove || canMissBelow:
		return CannotTell
	}
	return Within
}

// effAtLine reads the tested efficiency where the tested head curve meets
// the line from the origin through the guarantee point.
func (t PumpTest) effAtLine(gp Guarantee) EffAtLine {
	k := gp.H / gp.Q
	f := func(q float64) float64 { return t.head.eval(q) - k*q }
	df := func(q float64) float64 { return t.head.slope(q) - k }
	lo, hi := t.MinFlow(), t.MaxFlow()
	roots := cubicRoots(f, cubicBreaks(df, lo, hi, t.knots()), 1e-12*hi)
	if len(roots) == 0 {
		return EffAtLine{Status: EffLineMissed}
	}
	q := roots[0]
	for _, r := range roots[1:] {
		if math.Abs(r-gp.Q) < math.Abs(q-gp.Q) {
			q = r
		}
	}
	h, uh, _ := t.Head(q)
	eta, ue, _ := t.Efficiency(q)
	dq := hi - lo // a curve parallel to the line: the crossing is anywhere in the test
	if den := math.Abs(df(q)); uh < den*dq {
		dq = uh / den
	}
	return EffAtLine{Status: EffRead, Flow: q, Head: h, Value: eta, U: math.Hypot(ue, t.eff.slope(q)*dq)}
}
