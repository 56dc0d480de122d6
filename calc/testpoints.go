package calc

import (
	"errors"
	"math"
	"sort"
)

// TestMaxReadings is the most readings CheckPumpTest takes, as many as a
// data sheet's points (PumpMaxPoints).
const TestMaxReadings = PumpMaxPoints

// TestReading is one reading of a pump test at several points: what
// changes from point to point as the discharge valve is throttled.
type TestReading struct {
	Q       float64 // measured flow, m³/s
	Ps, Pd  float64 // suction and discharge gauge pressures, Pa (gauge)
	PowerIn float64 // measured electrical input to the motor, W; 0 = not measured
}

// TestSetup is what every reading of a test shares: the gauges' heights
// (any common datum), the pipe's inside diameters at the gauges, the
// motor's efficiency (a share; 0 = not known) and the instruments'
// accuracy, as in FieldReadings and Accuracy.
type TestSetup struct {
	Zs, Zd   float64 // m
	Ds, Dd   float64 // m
	MotorEff float64
	Accuracy Accuracy
}

// TestPoint is one reading worked out.
type TestPoint struct {
	Item  int        // the reading's 1-based place in the list given
	Check FieldCheck // as CheckPump works it out, with its warnings
	Bands FieldBands // as FieldCheck.Uncertainty propagates the accuracies
	// HeadU and EffU are the half-widths of the tested head curve's band
	// (m) and of the tested pump-efficiency curve's band (a share) at
	// this flow: the point's band with the flow meter's part taken along
	// the curve (see CheckPumpTest). For a single reading, which has no
	// curve, they equal Bands.Head.U and Bands.Pump.U.
	HeadU, EffU float64
}

// Shortfall is how far a tested pump falls short of its data sheet at one
// flow: Short = Sheet − Tested (positive: below the data sheet; negative:
// above it), Share = Short/Sheet, and U the tested value's band there.
// Heads are in m, efficiencies in shares.
type Shortfall struct {
	Flow                    float64 // m³/s
	Sheet, Tested, Short, U float64
	Share                   float64
}

// SheetComparison compares a test with its data sheet over the flows both
// cover, From to To (equal for a single reading): the largest head
// shortfall, and with efficiencies on both the largest shortfall of the
// pump's own efficiency (HasEff). The shortfall at each tested flow is in
// each point's Check (Deviation, DeviationPct and EffDeviation, with the
// opposite sign: tested minus data sheet).
type SheetComparison struct {
	From, To float64
	Head     Shortfall
	HasEff   bool
	Eff      Shortfall
}

// PumpTest is a pump tested at one to TestMaxReadings flows: each reading
// worked out with its band, and from two readings on the tested head
// curve and (when every reading has a pump efficiency) the tested
// efficiency curve through them, each with its band.
type PumpTest struct {
	Points []TestPoint // by rising flow
	// HasSheet is true when a data sheet was given and shares flows with
	// the test; Sheet is then the comparison.
	HasSheet bool
	Sheet    SheetComparison

	head, headU, eff, effU pchip
	hasEff                 bool
}

// CheckPumpTest works out a pump test at several points: each reading as
// CheckPump does (with the data sheet c, nil for none) and its bands as
// FieldCheck.Uncertainty does, on liquid fl, with setup s shared by all.
// Readings may come in any order; they are sorted by flow.
//
// From two readings on, the tested head curve runs through the points by
// the monotone piecewise cubic interpolation of the data sheet (FitPump:
// Fritsch & Carlson, 1980), and so does the pump's own efficiency when
// every reading has one (the input power and the motor's efficiency
// given). Neither is extrapolated beyond the tested flows. A tested curve
// need not fall with flow: the readings say what it does.
//
// The band. A curve is judged at a flow, so an error of the flow meter
// moves a point along the curve as well as changing the value worked out
// from it: the meter's part of a point's band on the curve is
// (∂H/∂Q − H′)·u_Q, where ∂H/∂Q = 2·hv/Q is the value's own sensitivity
// (the velocity-head term, as in Uncertainty) and H′ the tested curve's
// slope there; for the efficiency (∂η/∂Q − η′)·u_Q with ∂η/∂Q =
// η·(H + 2·hv)/(Q·H). The other readings' parts are the point's own. The
// band between points is the points' half-widths interpolated by the same
// monotone scheme, which keeps it between its neighbours' (no overshoot,
// never below zero): first order, each reading's errors independent of the
// others' (a meter's bias common to all readings would shift the whole
// curve; that is not modelled). A single reading has no slope, so its band
// is the one-reading field check's, unchanged.
//
// With a data sheet, the largest shortfall over the flows both cover is
// found where the difference of the two curves, a cubic between their
// knots, peaks (extrema in closed form, not on a grid).
//
// Errors: fewer than 1 or more than TestMaxReadings readings (field
// "qm", TooFew or TooMany); any error of CheckPump, a reading's fields
// ("qm", "ps", "pd", "pin") with the reading's Item; an accuracy's
// (Uncertainty's fields); two readings at one flow ("qm", Inconsistent,
// ReasonFlowTwice: Item the later reading, Figures[0] the earlier's item).
func CheckPumpTest(fl Fluid, s TestSetup, readings []TestReading, c *PumpCurve) (PumpTest, error) {
	n := len(readings)
	if n < 1 || n > TestMaxReadings {
		return PumpTest{}, countErr("qm", n, 1, TestMaxReadings)
	}
	pts := make([]TestPoint, n)
	for i, r := range readings {
		fc, err := CheckPump(fl, FieldReadings{Ps: r.Ps, Pd: r.Pd, Zs: s.Zs, Zd: s.Zd, Ds: s.Ds, Dd: s.Dd,
			Q: r.Q, PowerIn: r.PowerIn, MotorEff: s.MotorEff}, c)
		if err != nil {
			return PumpTest{}, atReading(err, i+1)
		}
		b, err := fc.Uncertainty(fl, s.Accuracy)
		if err != nil {
			return PumpTest{}, err
		}
		pts[i] = TestPoint{Item: i + 1, Check: fc, Bands: b, HeadU: b.Head.U, EffU: b.Pump.U}
	}
	sort.SliceStable(pts, func(i, j int) bool { return pts[i].Check.Q < pts[j].Check.Q })
	for i := 1; i < n; i++ {
		if pts[i].Check.Q == pts[i-1].Check.Q {
			a, b := pts[i-1].Item, pts[i].Item
			return PumpTest{}, NewFieldError("qm", Inconsistent).At(max(a, b)).Got(Fig(pts[i].Check.Q, Flow)).
				Because(ReasonFlowTwice, Num(float64(min(a, b))))
		}
	}
	t := PumpTest{Points: pts, hasEff: true}
	for _, p := range pts {
		t.hasEff = t.hasEff && p.Check.PumpEfficiency > 0
	}
	if n >= 2 {
		x := make([]float64, n)
		y := make([]float64, n)
		for i, p := range pts {
			x[i], y[i] = p.Check.Q, p.Check.Head
		}
		t.head = newPchip(x, y)
		if t.hasEff {
			for i, p := range pts {
				y[i] = p.Check.PumpEfficiency
			}
			t.eff = newPchip(x, y)
		}
		for i := range pts {
			p := &pts[i]
			fc, uq := p.Check, p.Bands.Flow.U
			p.HeadU = alongCurve(p.Bands.Head, (2*fc.VelocityHead/fc.Q-t.head.d[i])*uq)
			if t.hasEff {
				deta := fc.PumpEfficiency * (fc.Head + 2*fc.VelocityHead) / (fc.Q * fc.Head)
				p.EffU = alongCurve(p.Bands.Pump, (deta-t.eff.d[i])*uq)
			}
		}
		for i, p := range pts {
			y[i] = p.HeadU
		}
		t.headU = newPchip(x, y)
		if t.hasEff {
			for i, p := range pts {
				y[i] = p.EffU
			}
			t.effU = newPchip(x, y)
		}
	}
	if c != nil {
		t.Sheet, t.HasSheet = t.compare(*c)
	}
	return t, nil
}

// atReading marks a reading's own field in err with the reading's item;
// the shared fields (heights, diameters, the motor, the liquid) stay as
// they are.
func atReading(err error, item int) error {
	var fe *FieldError
	if errors.As(err, &fe) {
		switch fe.Field {
		case "qm", "ps", "pd", "pin":
			fe.At(item)
		}
	}
	return err
}

// alongCurve is b's half-width with its flow-meter term ("qm") replaced by
// the signed term qm (root-sum-square).
func alongCurve(b Band, qm float64) float64 {
	s := qm * qm
	for _, t := range b.Terms {
		if t.Field != "qm" {
			s += t.U * t.U
		}
	}
	return math.Sqrt(s)
}

// MinFlow and MaxFlow return the tested flows' range, m³/s (0 for a test
// without readings).
func (t PumpTest) MinFlow() float64 {
	if len(t.Points) == 0 {
		return 0
	}
	return t.Points[0].Check.Q
}

// MaxFlow: see MinFlow.
func (t PumpTest) MaxFlow() float64 {
	if len(t.Points) == 0 {
		return 0
	}
	return t.Points[len(t.Points)-1].Check.Q
}

// HasCurve reports whether the test has a tested curve (two readings or
// more).
func (t PumpTest) HasCurve() bool { return len(t.Points) >= 2 }

// HasEfficiency reports whether every reading has the pump's own
// efficiency (input power and motor efficiency given), so that the tested
// efficiency curve exists (with two readings or more).
func (t PumpTest) HasEfficiency() bool { return len(t.Points) > 0 && t.hasEff }

// knots returns the tested flows.
func (t PumpTest) knots() []float64 {
	x := make([]float64, len(t.Points))
	for i, p := range t.Points {
		x[i] = p.Check.Q
	}
	return x
}

// Head returns the tested head at flow q, m, its band's half-width u, m,
// and true; false when q lies outside the tested flows (a single reading:
// at any flow but its own).
func (t PumpTest) Head(q float64) (h, u float64, ok bool) {
	switch {
	case len(t.Points) == 0 || q < t.MinFlow() || q > t.MaxFlow() || math.IsNaN(q):
		return 0, 0, false
	case len(t.Points) == 1:
		return t.Points[0].Check.Head, t.Points[0].HeadU, true
	}
	return t.head.eval(q), t.headU.eval(q), true
}

// Efficiency returns the tested pump efficiency at flow q (a share), its
// band's half-width u, and true; false when q lies outside the tested
// flows or HasEfficiency is false.
func (t PumpTest) Efficiency(q float64) (eta, u float64, ok bool) {
	switch {
	case !t.HasEfficiency() || q < t.MinFlow() || q > t.MaxFlow() || math.IsNaN(q):
		return 0, 0, false
	case len(t.Points) == 1:
		return t.Points[0].Check.PumpEfficiency, t.Points[0].EffU, true
	}
	return t.eff.eval(q), t.effU.eval(q), true
}

// compare finds the largest shortfalls from data sheet c over the flows
// both cover; false when they share none.
func (t PumpTest) compare(c PumpCurve) (SheetComparison, bool) {
	lo, hi := math.Max(t.MinFlow(), c.MinFlow()), math.Min(t.MaxFlow(), c.MaxFlow())
	if !(lo <= hi) || len(c.points) == 0 {
		return SheetComparison{}, false
	}
	out := SheetComparison{From: lo, To: hi}
	knots := t.knots()
	for _, p := range c.points {
		knots = append(knots, p.Q)
	}
	worst := func(sheet, tested, band func(float64) float64, sheetD, testedD func(float64) float64) Shortfall {
		short := func(q float64) float64 { return sheet(q) - tested(q) }
		q := lo
		if hi > lo {
			brk := cubicBreaks(func(q float64) float64 { return sheetD(q) - testedD(q) }, lo, hi, knots)
			_, _, q, _ = extremes(short, brk)
		}
		sf := Shortfall{Flow: q, Sheet: sheet(q), Tested: tested(q), U: band(q)}
		sf.Short = sf.Sheet - sf.Tested
		if sf.Sheet != 0 {
			sf.Share = sf.Short / sf.Sheet
		}
		return sf
	}
	hsheet := func(q float64) float64 { h, _ := c.Head(q); return h }
	htest := func(q float64) float64 { h, _, _ := t.Head(q); return h }
	hband := func(q float64) float64 { _, u, _ := t.Head(q); return u }
	out.Head = worst(hsheet, htest, hband, c.head.slope, t.head.slope)
	if t.HasEfficiency() && c.HasEfficiency() {
		esheet := func(q float64) float64 { e, _ := c.Efficiency(q); return e }
		etest := func(q float64) float64 { e, _, _ := t.Efficiency(q); return e }
		eband := func(q float64) float64 { _, u, _ := t.Efficiency(q); return u }
		out.Eff, out.HasEff = worst(esheet, etest, eband, c.eff.slope, t.eff.slope), true
	}
	return out, true
}
