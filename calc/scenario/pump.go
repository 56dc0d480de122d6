package scenario

import (
	"math"

	"fieldhead/calc"
)

// PumpResult is the pump of a scenario on its line.
type PumpResult struct {
	Base     calc.PumpCurve // the data sheet as typed
	Single   calc.PumpCurve // one pump at the scenario's speed
	Curve    calc.PumpCurve // at speed and in the arrangement (the curve that meets the line)
	Speed    float64        // share of the data sheet's speed
	Count    int            // identical pumps
	Parallel bool           // in parallel (else in series, when Count > 1)

	// System is the system curve over the flows of the chart; NPSHa the
	// NPSH available over the same flows when the pump's elevation is known.
	// Both are worked out only for the views that draw them (Pump, Report,
	// or no view named).
	System []calc.CurvePoint
	NPSHa  []calc.CurvePoint
	// Operating is where Curve meets the system curve, nil when they do
	// not meet (Result.Errors says why) or the line is not described.
	Operating *calc.OperatingResult
	// BEP is the best-efficiency point of Curve, SingleBEP that of one
	// pump at its speed (Single); nil without data-sheet efficiencies.
	BEP, SingleBEP *calc.BEP
	// SpeedFor is the speed that meets the flow qsp on the line, nil
	// when not asked for or not found (Result.Errors says why).
	SpeedFor *SpeedSolution
	// Rated is the data sheet's speed, Hz (nrat), and Mains the supply
	// frequency it is given at, Hz (fmains); 0 when not given.
	Rated, Mains float64
}

// pump reads the data sheet, speed and arrangement, then finds the
// operating point on the balance's line. The pump stands without an
// operating point when the line's part cannot be worked out.
func (e *eval) pump() (*PumpResult, problems) {
	if !e.has("pq") && !e.has("ph") {
		return nil, nil
	}
	pr := &PumpResult{Speed: 1, Count: 1}
	g := e.gather()
	qs, hs := g.list("pq"), g.list("ph")
	if g.failed() {
		return nil, g.problems()
	}
	pts := make([]calc.PumpPoint, len(qs))
	for i := range qs {
		pts[i] = calc.PumpPoint{Q: qs[i], H: hs[i]}
	}
	// The efficiencies and NPSH required are optional: one in error leaves
	// the head curve and what reads only it standing, without them.
	for _, opt := range []string{"peff", "pnpsh"} {
		vs, ok := e.in.Value(opt)
		if !ok {
			continue
		}
		if opt == "peff" {
			e.sheetEfficiencies(vs.List)
		}
		for i, v := range vs.List {
			if opt == "peff" {
				pts[i].Eff = v
			} else {
				pts[i].NPSHr = v
			}
		}
	}
	base, err := calc.FitPump(pts)
	if err != nil {
		g.failErr("pq", err)
		return nil, g.problems()
	}
	pr.Base = base
	if _, top, drooping := base.Unstable(); drooping {
		e.warnCalc("pump", calc.Warn("ph", calc.CautionDroopingCurve, calc.Fig(top, calc.Flow)))
	}
	for _, ref := range []struct {
		name string
		v    *float64
	}{{"nrat", &pr.Rated}, {"fmains", &pr.Mains}} {
		*ref.v = e.in.Num(ref.name) // 0 when absent or Bad
	}
	pr.Speed = e.speed(&g)
	if g.failed() {
		return nil, g.problems()
	}
	single, err := base.AtSpeed(pr.Speed)
	if err != nil {
		g.failErr("spd", err)
		return nil, g.problems()
	}
	pr.Single, pr.Curve = single, single
	if e.in.Bad("pumps") {
		return nil, nil // Read reported it
	}
	switch a := e.in.Choice("pumps"); a {
	case "", "1":
	default:
		pr.Count, pr.Parallel = int(a[0]-'0'), a[1] == 'p'
		c, err := single.Combine(pr.Count, pr.Parallel)
		if err != nil {
			g.failErr("pumps", err)
			return nil, g.problems()
		}
		pr.Curve = c
	}
	e.bep(pr)
	b := e.bal
	if b == nil {
		return pr, nil // the balance's own errors say what is missing
	}
	if b.Unknown != calc.SolvePumpHead {
		e.warnCalc("pump", calc.Warn("solve", calc.CautionOperatingNeedsHp))
		return pr, nil
	}
	if e.drawsCurves() {
		qmax := math.Max(pr.Curve.MaxFlow(), b.Q)
		sys, err := calc.SystemCurve(*b, calc.Flows(qmax, 41))
		if err != nil {
			g.failErr("q", err)
			return pr, g.problems()
		}
		pr.System = sys
	}
	op, err := calc.OperatingPoint(pr.Curve, *b)
	if err != nil {
		g.failErr("pq", err)
		return pr, g.problems()
	}
	pr.Operating = &op
	if _, top, drooping := pr.Curve.Unstable(); drooping && op.Q <= top {
		e.warnCalc("pump", calc.Warn("q", calc.CautionOperatingUnstable, calc.Fig(op.Q, calc.Flow), calc.Fig(top, calc.Flow)))
	}
	e.regionCheck(pr.BEP, op.Q, "q", "pump")
	// Every problem above returned early: the speed for a duty is the
	// pump's last part, with problems of its own.
	var ps problems
	pr.SpeedFor, ps = e.speedFor(pr)
	return pr, ps
}

// npsh works out the NPSH available at the pump from the suction side
// alone: the source (p1, z1), the liquid and the site, the pump's
// elevation (zp), and the suction loss, typed (hs) or from the segments
// before the pump. The flow is the operating point's when there is one,
// else the duty flow q; NPSHr is typed (npshr), else the data sheet's at
// that flow. With a balance it also gives NPSHa over the chart's flows.
func (e *eval) npsh(line *calc.Line) problems {
	if !e.has("zp") || e.res.Fluid == nil || !e.siteKnown() || e.in.Bad("loop") {
		return nil
	}
	fl := *e.res.Fluid
	g := e.gather()
	src := calc.NPSHInput{PumpZ: g.quantity("zp")}
	if e.isLoop() {
		// The loop's static pressure at its vessel's connection, carried
		// by elevation to the pump's inlet.
		src.SurfacePressure, src.SurfaceZ = e.loopStatic(&g)
	} else if b := e.bal; b != nil && b.Unknown != calc.SolveP1 && b.Unknown != calc.SolveZ1 {
		src.SurfacePressure, src.SurfaceZ = b.In.P, b.In.Z
	} else {
		src.SurfacePressure = e.pressure(&g, "p1", calc.SolveP1, calc.SolvePumpHead)
		src.SurfaceZ = g.quantity("z1")
	}
	pr := e.res.Pump
	var q float64
	haveQ := false
	switch {
	case pr != nil && pr.Operating != nil:
		q, haveQ = pr.Operating.Q, true
	case e.bal != nil && e.bal.Unknown != calc.SolveFlow:
		q, haveQ = e.bal.Q, true
	case e.hasFlow():
		q, haveQ = e.knownFlow()
	}
	typed := e.has("hs")
	if typed {
		src.SuctionLoss = g.quantity("hs")
	}
	after := 0
	if !typed && e.in.Segments > 0 {
		after = e.pumpAfter(e.in.Segments)
		if after < 0 {
			return g.problems()
		}
		if after > 0 && line == nil {
			return g.problems() // the segments' own errors say why: no suction loss of zero in their place
		}
		if after > 0 && !haveQ {
			e.flow(&g) // says the flow is needed
			g.fail()
		}
	}
	switch {
	case e.in.AnyBad("npshr", "pnpsh"):
		// The NPSH required in error: the NPSH available stands, unrated
		// (the box says why); no margin from a value in error.
	case e.in.Side("npsh") == "typed" && e.has("npshr"):
		src.NPSHr = e.in.Num("npshr")
	case pr != nil && pr.Operating != nil:
		src.NPSHr = pr.Operating.NPSHr
	case pr != nil && pr.Curve.HasNPSHr() && haveQ:
		if v, in := pr.Curve.NPSHr(q); in {
			src.NPSHr = v
		}
	}
	if g.failed() {
		return g.problems()
	}
	sb := calc.Balance{Fluid: fl, Line: line, PumpAfter: after}
	in := func(q float64) (calc.NPSHInput, error) {
		x := src
		if !typed && line != nil && after > 0 {
			l, err := calc.SuctionLoss(sb, q)
			if err != nil {
				return calc.NPSHInput{}, err
			}
			x.SuctionLoss = l
		}
		return x, nil
	}
	x, err := in(q)
	if err != nil {
		g.failErr("pafter", err)
		return g.problems()
	}
	r, err := calc.NPSH(fl, x)
	if err != nil {
		g.failErr("zp", err)
		return g.problems()
	}
	e.res.NPSH = &r
	e.res.NPSHFlow = q
	e.res.NPSHSuction = NPSHSuction{Typed: typed, After: after}
	if !typed && e.in.Segments == 0 {
		e.warnCalc("npsh", calc.Warn("hs", calc.CautionSuctionLossZero))
	}
	if pr != nil {
		// The curve stops at the first flow it cannot be worked out at (the
		// suction side's own limits, e.g. a Reynolds number beyond the
		// friction formula's): the chart draws what is known, and says so.
		for _, p := range pr.System {
			x, err := in(p.Q)
			var a calc.NPSHResult
			if err == nil {
				a, err = calc.NPSH(fl, x)
			}
			if err != nil {
				e.warnCalc("npsh", calc.Warn("zp", calc.CautionNPSHCurveCut, calc.Fig(p.Q, calc.Flow)))
				return nil
			}
			pr.NPSHa = append(pr.NPSHa, calc.CurvePoint{Q: p.Q, H: a.Available})
		}
	}
	return nil
}

// NPSHSuction says where the suction loss of Result.NPSH comes from.
type NPSHSuction struct {
	Typed bool // typed in (hs)
	// After is the segment the pump follows: the losses of segments 1 to
	// After; 0 with the pump at point 1 or without a line.
	After int
}

// pumpAfter is the segment the pump follows, of a line of that many: pafter, else after
// segment 1 of a line of two or more, else at point 1. −1 when pafter is
// in error (Read reported it).
func (e *eval) pumpAfter(segments int) int {
	if !e.has("pafter") {
		if segments > 1 {
			return 1
		}
		return 0
	}
	v, ok := e.in.Value("pafter")
	if !ok {
		return -1
	}
	return int(v.SI)
}

// field works out the pump's performance from gauge readings (Evaluate
// then adds its bands and acceptance). The motor efficiency feeds only the
// pump-alone figures: in error, the rest of the check still stands.
func (e *eval) field() (*calc.FieldCheck, problems) {
	if !e.has("qm") && !e.has("ps") && !e.has("pd") {
		return nil, nil
	}
	if e.res.Fluid == nil {
		return nil, nil
	}
	g := e.gather()
	r := calc.FieldReadings{Ps: e.gaugeReading(&g, "ps"), Pd: e.gaugeReading(&g, "pd"),
		Zs: g.quantity("zs"), Zd: g.quantity("zd"),
		Ds: e.gaugeBore(&g, "gsp", "ds", "dsn", "dss"), Dd: e.gaugeBore(&g, "gdp", "dd", "ddn", "dds"),
		Q: g.quantity("qm")}
	if e.has("pin") {
		r.PowerIn = g.quantity("pin")
	}
	if v, good := e.in.Value("etam"); good {
		r.MotorEff = v.SI
		if v.SI > calc.MotorEfficiencyHigh && v.SI <= 1 {
			e.warnCalc("field", calc.Warn("etam", calc.CautionMotorEffHigh, calc.Num(v.SI), calc.Num(calc.MotorEfficiencyHigh)))
		}
	}
	if g.failed() {
		return nil, g.problems()
	}
	var curve *calc.PumpCurve
	if e.res.Pump != nil {
		curve = &e.res.Pump.Single
	}
	fc, err := calc.CheckPump(*e.res.Fluid, r, curve)
	if err != nil {
		g.failErr("qm", err)
		return nil, g.problems()
	}
	for _, w := range fc.Warnings {
		e.warnCalc("field", w)
	}
	if e.res.Pump != nil {
		e.regionCheck(e.res.Pump.SingleBEP, r.Q, "qm", "field")
	}
	return &fc, nil
}

// gaugeReading is a gauge's reading as a gauge pressure, Pa: an absolute
// one less the site pressure.
func (e *eval) gaugeReading(g *gather, param string) float64 {
	p := g.quantity(param)
	if !e.in.OK(param) {
		return 0
	}
	if e.in.vals[param].Abs {
		if !e.siteKnown() {
			g.fail()
			return 0
		}
		p -= e.res.SitePressure
	}
	return p
}

// gaugeBore is the pipe's inside diameter at a gauge, m: typed, or the
// nominal size's and schedule's.
func (e *eval) gaugeBore(g *gather, group, d, nps, sch string) float64 {
	if e.in.Side(group) == "d" || !e.has(nps) && !e.has(sch) {
		return g.quantity(d)
	}
	v, good := e.in.Value(nps)
	if s, ok := e.in.Value(sch); ok && s.Pipe != nil {
		v, good = s, true
	}
	if !good || v.Pipe == nil {
		g.fail() // Read reported it
		return 0
	}
	return v.Pipe.ID
}

// turbine works out the turbine's output at the flow and the flow that
// gives the most output, when the balance solves for the turbine head and
// an efficiency is given.
func (e *eval) turbine() problems {
	if !e.has("etat") || e.bal == nil {
		return nil
	}
	g := e.gather()
	eff := g.quantity("etat")
	if g.failed() {
		return g.problems()
	}
	if e.bal.Unknown != calc.SolveTurbineHead {
		e.warnCalc("turbine", calc.Warn("etat", calc.CautionTurbineNeedsHt))
		return nil
	}
	t, err := calc.Turbine(*e.bal, eff)
	if err != nil {
		g.failErr("etat", err)
		return g.problems()
	}
	e.res.Turbine = &t
	best, err := calc.BestTurbineFlow(*e.bal, eff, 0)
	if err != nil {
		g.failErr("etat", err)
		return g.problems()
	}
	e.res.BestTurbine = &best
	for _, w := range t.Warnings {
		e.warnCalc("turbine", w)
	}
	return nil
}

// drawsCurves reports whether the scenario's view draws the system and
// NPSH curves (the Pump and Report views, and a scenario that names no
// view): solving the line at 41 flows for each is most of an evaluation,
// and an edit on another view need not wait for it.
func (e *eval) drawsCurves() bool {
	switch e.in.View {
	case "", "pump", "report":
		return true
	}
	return false
}
