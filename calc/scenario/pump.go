package scenario

import (
	"errors"
	"math"
	"strings"

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
// operating point on the balance's line.
func (e *eval) pump() {
	if !e.s.Has("pq") && !e.s.Has("ph") {
		return
	}
	pr := &PumpResult{Speed: 1, Count: 1}
	qs, ok1 := e.list("pq")
	hs, ok2 := e.list("ph")
	if !ok1 || !ok2 {
		return
	}
	if len(qs) != len(hs) {
		e.bad("ph", calc.WrongCount).Given(len(hs)).AtMost(calc.Num(float64(len(qs)))).With("pq")
		return
	}
	pts := make([]calc.PumpPoint, len(qs))
	for i := range qs {
		pts[i] = calc.PumpPoint{Q: qs[i], H: hs[i]}
	}
	for _, opt := range []string{"peff", "pnpsh"} {
		if !e.s.Has(opt) {
			continue
		}
		vs, ok := e.list(opt)
		if !ok {
			return
		}
		if len(vs) != len(qs) {
			e.bad(opt, calc.WrongCount).Given(len(vs)).AtMost(calc.Num(float64(len(qs)))).With("pq")
			return
		}
		if opt == "peff" && !e.sheetEfficiencies(vs) {
			return
		}
		for i, v := range vs {
			if opt == "peff" {
				pts[i].Eff = v
			} else {
				pts[i].NPSHr = v
			}
		}
	}
	base, err := calc.FitPump(pts)
	if err != nil {
		e.failErr("pq", err)
		return
	}
	pr.Base = base
	if _, top, drooping := base.Unstable(); drooping {
		e.warnCalc("pump", calc.Warn("ph", calc.CautionDroopingCurve, calc.Fig(top, calc.Flow)))
	}
	for _, ref := range []struct {
		name string
		v    *float64
	}{{"nrat", &pr.Rated}, {"fmains", &pr.Mains}} {
		if e.s.Has(ref.name) {
			if v, ok := e.quantity(ref.name); ok && v > 0 {
				*ref.v = v
			} else if ok {
				e.bad(ref.name, calc.NotPositive)
			}
		}
	}
	spd, ok := e.speed()
	if !ok {
		return
	}
	pr.Speed = spd
	single, err := base.AtSpeed(pr.Speed)
	if err != nil {
		e.failErr("spd", err)
		return
	}
	pr.Single, pr.Curve = single, single
	switch a := strings.TrimSpace(e.s.Get("pumps")); a {
	case "", "1":
	default:
		if len(a) != 2 || a[0] < '2' || a[0] > '8' || (a[1] != 'p' && a[1] != 's') {
			e.bad("pumps", calc.UnknownChoice).Typed(a).Because(calc.ReasonPumpsCount)
			return
		}
		pr.Count, pr.Parallel = int(a[0]-'0'), a[1] == 'p'
		c, err := single.Combine(pr.Count, pr.Parallel)
		if err != nil {
			e.failErr("pumps", err)
			return
		}
		pr.Curve = c
	}
	e.res.Pump = pr
	e.bep(pr)
	b := e.bal
	if b == nil {
		return // the balance's own errors say what is missing
	}
	if b.Unknown != calc.SolvePumpHead {
		e.warnCalc("pump", calc.Warn("solve", calc.CautionOperatingNeedsHp))
		return
	}
	if e.drawsCurves() {
		qmax := math.Max(pr.Curve.MaxFlow(), b.Q)
		sys, err := calc.SystemCurve(*b, calc.Flows(qmax, 41))
		if err != nil {
			e.failErr("q", err)
			return
		}
		pr.System = sys
	}
	op, err := calc.OperatingPoint(pr.Curve, *b)
	if err != nil {
		e.failErr("pq", err)
		return
	}
	pr.Operating = &op
	if _, top, drooping := pr.Curve.Unstable(); drooping && op.Q <= top {
		e.warnCalc("pump", calc.Warn("q", calc.CautionOperatingUnstable, calc.Fig(op.Q, calc.Flow), calc.Fig(top, calc.Flow)))
	}
	e.regionCheck(pr.BEP, op.Q, "q", "pump")
	e.speedFor(pr)
}

// npsh works out the NPSH available at the pump from the suction side
// alone: the source (p1, z1), the liquid and the site, the pump's
// elevation (zp), and the suction loss, typed (hs) or from the segments
// before the pump. The flow is the operating point's when there is one,
// else the duty flow q; NPSHr is typed (npshr), else the data sheet's at
// that flow. With a balance it also gives NPSHa over the chart's flows.
func (e *eval) npsh(line *calc.Line) {
	if !e.s.Has("zp") || e.res.Fluid == nil {
		return
	}
	fl := *e.res.Fluid
	ok := true
	zp, good := e.quantity("zp")
	ok = ok && good
	src := calc.NPSHInput{PumpZ: zp}
	if b := e.bal; b != nil && b.Unknown != calc.SolveP1 && b.Unknown != calc.SolveZ1 {
		src.SurfacePressure, src.SurfaceZ = b.In.P, b.In.Z
	} else {
		src.SurfacePressure = e.pressure("p1", calc.SolveP1, calc.SolvePumpHead, &ok)
		z, good := e.quantity("z1")
		ok = ok && good
		src.SurfaceZ = z
	}
	pr := e.res.Pump
	var q float64
	haveQ := false
	switch {
	case pr != nil && pr.Operating != nil:
		q, haveQ = pr.Operating.Q, true
	case e.bal != nil && e.bal.Unknown != calc.SolveFlow:
		q, haveQ = e.bal.Q, true
	case e.s.Has("q"):
		q, haveQ = e.quantity("q")
	}
	typed := e.s.Has("hs")
	if typed {
		v, good := e.quantity("hs")
		if good && v < 0 {
			e.bad("hs", calc.Negative).Got(calc.Fig(v, calc.Length))
			good = false
		}
		ok = ok && good
		src.SuctionLoss = v
	}
	after := 0
	if !typed && line != nil {
		after = e.pumpAfter(line)
		if after < 0 {
			return
		}
		if after > 0 && !haveQ {
			e.quantity("q") // says the flow is needed
			ok = false
		}
	}
	switch {
	case e.s.Has("npshr"):
		v, good := e.quantity("npshr")
		ok = ok && good
		src.NPSHr = v
	case pr != nil && pr.Operating != nil:
		src.NPSHr = pr.Operating.NPSHr
	case pr != nil && pr.Curve.HasNPSHr() && haveQ:
		if v, in := pr.Curve.NPSHr(q); in {
			src.NPSHr = v
		}
	}
	if !ok {
		return
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
		e.failErr("pafter", err)
		return
	}
	r, err := calc.NPSH(fl, x)
	if err != nil {
		e.failErr("zp", err)
		return
	}
	e.res.NPSH = &r
	e.res.NPSHFlow = q
	e.res.NPSHSuction = NPSHSuction{Typed: typed, After: after}
	if !typed && line == nil {
		e.warnCalc("npsh", calc.Warn("hs", calc.CautionSuctionLossZero))
	}
	if pr != nil {
		for _, p := range pr.System {
			x, err := in(p.Q)
			if err != nil {
				return
			}
			a, err := calc.NPSH(fl, x)
			if err != nil {
				return
			}
			pr.NPSHa = append(pr.NPSHa, calc.CurvePoint{Q: p.Q, H: a.Available})
		}
	}
}

// NPSHSuction says where the suction loss of Result.NPSH comes from.
type NPSHSuction struct {
	Typed bool // typed in (hs)
	// After is the segment the pump follows: the losses of segments 1 to
	// After; 0 with the pump at point 1 or without a line.
	After int
}

// pumpAfter is the segment of line the pump follows: pafter, else after
// segment 1 of a line of two or more, else at point 1. −1 (and an error)
// when pafter is not a segment of the line.
func (e *eval) pumpAfter(line *calc.Line) int {
	n := len(line.Segments)
	if !e.s.Has("pafter") {
		if n > 1 {
			return 1
		}
		return 0
	}
	v, err := number("pafter", e.s.Get("pafter"))
	if err != nil || v != math.Trunc(v) || v < 0 || int(v) > n {
		e.bad("pafter", calc.OutOfRange).Typed(e.s.Get("pafter")).Within(calc.Num(0), calc.Num(float64(n))).Because(calc.ReasonPumpAfter)
		return -1
	}
	return int(v)
}

// field works out the pump's performance from gauge readings.
func (e *eval) field() {
	if !e.s.Has("qm") && !e.s.Has("ps") && !e.s.Has("pd") {
		return
	}
	if e.res.Fluid == nil {
		return
	}
	ok := true
	gauge := func(param string) float64 {
		text := e.s.Get(param)
		if strings.TrimSpace(text) == "" {
			e.bad(param, calc.Missing)
			ok = false
			return 0
		}
		p, ref, err := calc.ParsePressure(param, text, DefaultUnit(param, e.us))
		if err != nil {
			e.failErr(param, err)
			ok = false
			return 0
		}
		if ref == calc.Absolute {
			p -= e.res.SitePressure
		}
		return p
	}
	get := func(param string) float64 {
		v, good := e.quantity(param)
		ok = ok && good
		return v
	}
	bore := func(d, nps, sch string) float64 {
		if !e.s.Has(nps) && !e.s.Has(sch) {
			return get(d)
		}
		ps, err := calc.LookupPipe(strings.TrimSpace(e.s.Get(nps)), strings.TrimSpace(e.s.Get(sch)))
		if err != nil {
			field := nps
			var fe *calc.FieldError
			if errors.As(err, &fe) && fe.Field == "sch" {
				field = sch
			}
			e.failAt(field, err)
			ok = false
			return 0
		}
		return ps.ID
	}
	r := calc.FieldReadings{Ps: gauge("ps"), Pd: gauge("pd"), Zs: get("zs"), Zd: get("zd"),
		Ds: bore("ds", "dsn", "dss"), Dd: bore("dd", "ddn", "dds"), Q: get("qm")}
	if e.s.Has("pin") {
		r.PowerIn = get("pin")
	}
	if e.s.Has("etam") {
		v, good := e.share("etam")
		ok = ok && good
		r.MotorEff = v
		if v > calc.MotorEfficiencyHigh && v <= 1 {
			e.warnCalc("field", calc.Warn("etam", calc.CautionMotorEffHigh, calc.Num(v), calc.Num(calc.MotorEfficiencyHigh)))
		}
	}
	if !ok {
		return
	}
	var curve *calc.PumpCurve
	if e.res.Pump != nil {
		curve = &e.res.Pump.Single
	}
	fc, err := calc.CheckPump(*e.res.Fluid, r, curve)
	if err != nil {
		e.failErr("qm", err)
		return
	}
	e.res.Field = &fc
	for _, w := range fc.Warnings {
		e.warnCalc("field", w)
	}
	if e.res.Pump != nil {
		e.regionCheck(e.res.Pump.SingleBEP, r.Q, "qm", "field")
	}
	e.bands(fc)
	e.accept(fc)
}

// turbine works out the turbine's output at the flow and the flow that
// gives the most output, when the balance solves for the turbine head and
// an efficiency is given.
func (e *eval) turbine() {
	if !e.s.Has("etat") || e.bal == nil {
		return
	}
	eff, ok := e.share("etat")
	if !ok {
		return
	}
	if e.bal.Unknown != calc.SolveTurbineHead {
		e.warnCalc("turbine", calc.Warn("etat", calc.CautionTurbineNeedsHt))
		return
	}
	t, err := calc.Turbine(*e.bal, eff)
	if err != nil {
		e.failErr("etat", err)
		return
	}
	e.res.Turbine = &t
	best, err := calc.BestTurbineFlow(*e.bal, eff, 0)
	if err != nil {
		e.failErr("etat", err)
		return
	}
	e.res.BestTurbine = &best
	for _, w := range t.Warnings {
		e.warnCalc("turbine", w)
	}
}

// drawsCurves reports whether the scenario's view draws the system and
// NPSH curves (the Pump and Report views, and a scenario that names no
// view): solving the line at 41 flows for each is most of an evaluation,
// and an edit on another view need not wait for it.
func (e *eval) drawsCurves() bool {
	switch e.s.Get("view") {
	case "", "pump", "report":
		return true
	}
	return false
}
