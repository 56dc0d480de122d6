package scenario

import (
	"strconv"
	"strings"

	"fieldhead/calc"
)

// The parts of the pump view that judge a test and a duty: efficiencies
// guarded against 100× slips, speed in %, rpm or drive Hz, the
// best-efficiency point and preferred region, the speed for a flow, and
// the energy per volume pumped.

// SpeedSolution is the speed at which the pumps meet a flow on the line.
type SpeedSolution struct {
	Q, H  float64        // the flow asked for, m³/s, and the line's head there, m
	Ratio float64        // the speed, a share of the data sheet's
	Curve calc.PumpCurve // the pumps' curve at that speed, in their arrangement
	// ByHead is true when a head (hsp) was asked for, Q being the flow
	// at which the line needs it.
	ByHead bool
}

// EnergyResult is the energy per volume pumped and its basis.
type EnergyResult struct {
	calc.Energy
	Measured bool    // from the field check's measured input (else the operating point)
	Shaft    bool    // the power is the shaft power (no motor efficiency known)
	Power    float64 // the power used, W
	Q, H     float64 // flow, m³/s, and head, m
}

// pct writes a percentage as typed: "90", "0.9", "52", "97.5".
//
// Deprecated: messages are worded in present/errors.go; kept for code
// written against it.
func pct(v float64) string { return strconv.FormatFloat(v, 'g', 4, 64) }

// isFrequency reports whether unit text names a speed or frequency unit
// (rpm, Hz).
func isFrequency(u string) bool {
	if strings.TrimSpace(u) == "" {
		return false
	}
	unit, err := calc.LookupUnit(u)
	return err == nil && unit.Dim == calc.Frequency
}

// sheetEfficiencies warns of an implausibly high data-sheet efficiency
// (Read refused fractions typed into the percentage boxes).
func (e *eval) sheetEfficiencies(vs []float64) {
	for i, v := range vs {
		if v > calc.PumpEfficiencyHigh && v <= 1 {
			e.warnCalc("pump", calc.Warn("peff", calc.CautionSheetEffHigh, calc.Num(float64(i+1)), calc.Num(v), calc.Num(calc.PumpEfficiencyHigh)))
			break
		}
	}
}

// speed reads the speed as a share of the data sheet's: typed in %, in
// rpm (over the rated speed nrat) or as a drive's frequency in Hz (over
// the mains frequency fmains, the rated speed's supply: an induction
// motor's speed follows the supply frequency nearly in proportion, common
// practice). Above 100 % it warns of overspeed.
func (e *eval) speed(g *gather) float64 {
	if !e.has("spd") {
		return 1
	}
	v, ok := e.in.Value("spd")
	if !ok {
		g.fail() // Read reported it
		return 0
	}
	ratio := v.SI
	if v.Dim == calc.Frequency {
		unit, _ := calc.LookupUnit(v.Unit)
		ref := "nrat"
		if unit.Symbol == "Hz" {
			ref = "fmains"
		}
		if !e.has(ref) {
			g.bad("spd", calc.Missing).With(ref).Typed(unit.Symbol).Because(calc.ReasonSpeedReference)
			return 0
		}
		base, ok := e.in.Value(ref)
		if !ok {
			g.fail() // Read reported it
			return 0
		}
		ratio = v.SI / base.SI
	}
	if ratio > 1 && ratio <= calc.PumpSpeedRatioMax {
		e.warnCalc("pump", calc.Warn("spd", calc.CautionOverspeed, calc.Num(ratio)))
	}
	return ratio
}

// bep finds the best-efficiency point of the pumps as they run and of one
// pump at its speed, and flags an operating point outside the preferred
// region.
func (e *eval) bep(pr *PumpResult) {
	if b, ok := pr.Curve.BestEfficiency(); ok {
		pr.BEP = &b
	}
	if b, ok := pr.Single.BestEfficiency(); ok {
		pr.SingleBEP = &b
	}
	if pr.BEP != nil && pr.BEP.AtEdge {
		e.warnCalc("pump", calc.Warn("peff", calc.CautionBEPAtEnd))
	}
}

// regionCheck warns when flow q of the pumps lies outside the preferred
// operating region.
func (e *eval) regionCheck(b *calc.BEP, q float64, param, topic string) {
	if b == nil || b.InRegion(q) {
		return
	}
	lo, hi := b.Region()
	w := calc.Warn(param, calc.CautionOperatingOffRegion, calc.Fig(q, calc.Flow), calc.Fig(lo, calc.Flow), calc.Fig(hi, calc.Flow),
		calc.Num(calc.PreferredRegionLow), calc.Num(calc.PreferredRegionHigh))
	if param != "q" {
		w = calc.Warn(param, calc.CautionMeasuredOffRegion, calc.Fig(q, calc.Flow), calc.Fig(lo, calc.Flow), calc.Fig(hi, calc.Flow),
			calc.Num(calc.PreferredRegionLow), calc.Num(calc.PreferredRegionHigh))
	}
	e.warnCalc(topic, w)
}

// speedFor solves for the speed at which the pumps deliver the flow qsp,
// or the head hsp, on the line; nil when not asked for or not found.
func (e *eval) speedFor(pr *PumpResult) (*SpeedSolution, problems) {
	byHead := e.in.Side("spfor") == "h"
	if (!e.has("qsp") && !e.has("hsp")) || e.bal == nil || e.bal.Unknown != calc.SolvePumpHead {
		return nil, nil
	}
	g := e.gather()
	var q float64
	if byHead {
		h := g.quantity("hsp")
		if g.failed() {
			return nil, g.problems()
		}
		var err error
		if q, err = calc.FlowForHead(*e.bal, h, pr.Curve.MaxFlow()); err != nil {
			g.failErr("hsp", err)
			return nil, g.problems()
		}
	} else {
		if q = g.quantity("qsp"); g.failed() {
			return nil, g.problems()
		}
	}
	param := map[bool]string{false: "qsp", true: "hsp"}[byHead]
	sys, err := calc.SystemCurve(*e.bal, []float64{q})
	if err != nil || len(sys) != 1 {
		g.failErr(param, err)
		return nil, g.problems()
	}
	h := sys[0].H
	r, err := calc.SpeedForDuty(pr.Base, pr.Count, pr.Parallel, q, h)
	if err != nil {
		g.failAt(param, err)
		return nil, g.problems()
	}
	c, err := pr.Base.AtSpeed(r)
	if err == nil && pr.Count > 1 {
		c, err = c.Combine(pr.Count, pr.Parallel)
	}
	if err != nil {
		g.failAt(param, err)
		return nil, g.problems()
	}
	if r > 1 {
		e.warnCalc("pump", calc.Warn(param, calc.CautionDutyOverspeed, calc.Num(r)))
	}
	return &SpeedSolution{Q: q, H: h, Ratio: r, Curve: c, ByHead: byHead}, nil
}

// energy works out the energy per volume pumped: from the field check's
// measured input when there is one, else from the operating point (its
// shaft power, over the motor efficiency when given).
func (e *eval) energy() (*EnergyResult, problems) {
	g := e.gather()
	hours, tariff := g.optional("hours"), g.optional("tariff")
	if g.failed() {
		return nil, nil // Read reported it
	}
	var er EnergyResult
	switch f := e.res.Field; {
	case e.measuredEnergy() && (f == nil || !(f.Efficiency > 0 && f.Head > 0)):
		return nil, nil // readings with a power meter: their energy or none, never the duty's in its place
	case f != nil && f.Efficiency > 0 && f.Head > 0:
		er = EnergyResult{Measured: true, Power: f.HydraulicPower / f.Efficiency, Q: f.Q, H: f.Head}
	case e.res.Pump != nil && e.res.Pump.Operating != nil && e.res.Pump.Operating.ShaftPower > 0:
		op := e.res.Pump.Operating
		er = EnergyResult{Power: op.ShaftPower, Shaft: true, Q: op.Q, H: op.H}
		if e.has("etam") {
			m, ok := e.in.Value("etam")
			if !ok {
				return nil, nil // Read reported it: the power drawn is not known
			}
			if m.SI > 0 {
				er.Power, er.Shaft = op.ShaftPower/m.SI, false
			}
		}
	default:
		return nil, nil
	}
	en, err := calc.EnergyUse(er.Power, er.Q, er.H, e.res.Fluid.Density, hours, tariff)
	if err != nil {
		g.failErr("hours", err)
		return nil, g.problems()
	}
	er.Energy = en
	return &er, nil
}

// measuredEnergy reports whether the energy is the readings': gauge
// readings with the motor's electrical input.
func (e *eval) measuredEnergy() bool {
	return e.has("pin") && (e.has("qm") || e.has("ps") || e.has("pd"))
}

// accuracyParams are the instruments' accuracies of a field check.
var accuracyParams = []string{"gcs", "gss", "gcd", "gsd", "uqm", "upin", "uz"}

// bands propagates the instruments' accuracy to the field check's
// results, when any accuracy is given; nil when none is or one cannot be
// used. A gauge class needs its span and a span its class.
func (e *eval) bands(fc calc.FieldCheck) (*calc.FieldBands, problems) {
	g := e.gather()
	a, given := e.accuracy(&g)
	if !given {
		return nil, nil
	}
	if a.Power > 0 && !e.has("pin") {
		e.warnCalc("field", calc.Warn("upin", calc.CautionPowerAccuracyUnused))
	}
	if g.failed() {
		return nil, g.problems()
	}
	tu, err := fc.Uncertainty(*e.res.Fluid, a)
	if err != nil {
		g.failErr("uqm", err)
		return nil, g.problems()
	}
	return &tu, nil
}

// accuracy reads the instruments' accuracies: given is false when none
// is; g fails when one cannot be used.
func (e *eval) accuracy(g *gather) (a calc.Accuracy, given bool) {
	for _, p := range accuracyParams {
		given = given || e.has(p)
	}
	if !given {
		return a, false
	}
	read := func(p string, v *float64) {
		if e.has(p) {
			*v = g.quantity(p)
		}
	}
	read("gcs", &a.ClassS)
	read("gss", &a.SpanS)
	read("gcd", &a.ClassD)
	read("gsd", &a.SpanD)
	read("uqm", &a.Flow)
	read("upin", &a.Power)
	read("uz", &a.Height)
	for _, pair := range [][2]string{{"gcs", "gss"}, {"gcd", "gsd"}} {
		for i, p := range pair {
			if e.has(p) && !e.has(pair[1-i]) {
				g.bad(pair[1-i], calc.Missing).With(p).Because(calc.ReasonGoTogether)
			}
		}
	}
	return a, true
}

// accept judges the field check under the chosen grade; nil without one,
// or when it cannot be judged (a warning says why).
func (e *eval) accept(fc calc.FieldCheck) *calc.Acceptance {
	if !e.has("grade") {
		return nil
	}
	g, ok := calc.LookupGrade(e.in.Choice("grade"))
	if !ok {
		return nil // checkAll reported it
	}
	var bands calc.FieldBands
	if e.res.FieldBands != nil {
		bands = *e.res.FieldBands
	} else {
		e.warnCalc("field", calc.Warn("grade", calc.CautionNoAccuracy))
	}
	a, ok := calc.Accept(fc, bands, g)
	if !ok {
		e.warnCalc("field", calc.Warn("grade", calc.CautionGradeNeedsSheet))
		return nil
	}
	return &a
}
