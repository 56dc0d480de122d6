package scenario

import (
	"fieldhead/calc"
)

// TestResult is a pump test at several points (readings 1 to
// calc.TestMaxReadings): each reading worked out with its band, the tested
// curves through them and their shortfall from the data sheet
// (calc.CheckPumpTest).
type TestResult struct {
	calc.PumpTest
	// Reading holds, for each of PumpTest.Points (by rising flow), the
	// reading's number on the sheet (1 for qm, ps, pd, pin; k for qmk…).
	Reading []int
	// Bands is true when the instruments' accuracies were given, so that
	// the points' boxes and the curve's band are not zero.
	Bands bool
}

// GuaranteeResult is the test judged against the guarantee point under
// an acceptance grade (calc.PumpTest.AcceptGuarantee).
type GuaranteeResult struct {
	calc.GuaranteeAcceptance
	// FlowFrom, HeadFrom and EffFrom say where each figure of the
	// guarantee point came from.
	FlowFrom, HeadFrom, EffFrom GuaranteeSource
}

// GuaranteeSource says where a figure of the guarantee point came from.
type GuaranteeSource uint8

const (
	FromTyped GuaranteeSource = iota // typed (qg, hg, etag)
	FromDuty                         // the flow: the duty flow q
	FromSheet                        // the data sheet's at the guarantee flow
	FromNone                         // no efficiency: none typed, none on the data sheet
)

// testWanted reports whether the sheet holds a test at several points, or
// a single reading to judge by a guarantee flow.
func (e *eval) testWanted() bool {
	n := len(e.in.ReadingsGiven())
	return n >= 2 || n == 1 && e.has("qg")
}

// test works out the readings as a test at several points, with the
// instruments and the gauges' setup of the field check.
func (e *eval) test() (*TestResult, problems) {
	if !e.testWanted() || e.res.Fluid == nil {
		return nil, nil
	}
	g := e.gather()
	zs, zd := g.quantity("zs"), g.quantity("zd")
	ds := e.gaugeBore(&g, "gsp", "ds", "dsn", "dss")
	dd := e.gaugeBore(&g, "gdp", "dd", "ddn", "dds")
	var readings []calc.TestReading
	var nums []int
	for _, k := range e.in.ReadingsGiven() {
		ps := e.gaugeReading(&g, ReadingParam("ps", k))
		pd := e.gaugeReading(&g, ReadingParam("pd", k))
		r := calc.TestReading{Q: g.quantity(ReadingParam("qm", k)), Ps: ps, Pd: pd}
		if p := ReadingParam("pin", k); e.has(p) {
			r.PowerIn = g.quantity(p)
		}
		readings, nums = append(readings, r), append(nums, k)
	}
	var motor float64
	if v, good := e.in.Value("etam"); good {
		motor = v.SI
	}
	a, given := e.accuracy(&g)
	if g.failed() {
		return nil, g.problems()
	}
	var curve *calc.PumpCurve
	if e.res.Pump != nil {
		curve = &e.res.Pump.Single
	}
	t, err := calc.CheckPumpTest(*e.res.Fluid, calc.TestSetup{Zs: zs, Zd: zd, Ds: ds, Dd: dd, MotorEff: motor, Accuracy: a}, readings, curve)
	if err != nil {
		g.record(testProblem(err, nums))
		return nil, g.problems()
	}
	tr := TestResult{PumpTest: t, Bands: given}
	for _, p := range t.Points {
		tr.Reading = append(tr.Reading, nums[p.Item-1])
	}
	return &tr, nil
}

// testProblem is an error of calc.CheckPumpTest as a problem of the
// reading's own parameter: calc names a reading's field with its place in
// the list.
func testProblem(err error, nums []int) *calc.FieldError {
	fe, ok := err.(*calc.FieldError)
	if !ok {
		return problemOf("qm", err)
	}
	c := *fe
	if f, k := ReadingOf(fe.Field); k == 1 && fe.Item >= 1 && fe.Item <= len(nums) {
		c.Field, c.Item = ReadingParam(f, nums[fe.Item-1]), 0
		if c.Reason == calc.ReasonFlowTwice && len(c.Figures) > 0 {
			if i := int(c.Figures[0].Value); i >= 1 && i <= len(nums) {
				c.Figures[0].Value = float64(nums[i-1]) // the earlier reading's number
			}
		}
		return &c
	}
	return problemOf(fe.Field, err)
}

// guarantee judges the test against the guarantee point under the grade:
// the flow typed (qg) or the duty flow (q); the head and efficiency typed
// (hg, etag) or the data sheet's at that flow.
func (e *eval) guarantee() (*GuaranteeResult, problems) {
	t := e.res.Test
	if t == nil || !e.has("grade") {
		return nil, nil
	}
	grade, ok := calc.LookupGrade(e.in.Choice("grade"))
	if !ok {
		return nil, nil // Read reported it
	}
	g := e.gather()
	var gr GuaranteeResult
	var gp calc.Guarantee
	switch {
	case e.has("qg"):
		gp.Q = g.quantity("qg")
	case e.has("q"):
		gp.Q = g.quantity("q")
		gr.FlowFrom = FromDuty
	default:
		e.warnCalc("test", calc.Warn("qg", calc.CautionGuaranteeNoFlow))
		return nil, nil
	}
	if g.failed() {
		return nil, g.problems()
	}
	var sheet calc.Guarantee
	hasSheet := false
	if e.res.Pump != nil {
		sheet, hasSheet = calc.SheetGuarantee(e.res.Pump.Single, gp.Q)
	}
	if e.has("hg") {
		if gp.H = g.quantity("hg"); g.failed() {
			return nil, g.problems()
		}
	} else if hasSheet {
		gp.H, gr.HeadFrom = sheet.H, FromSheet
	} else {
		e.warnCalc("test", calc.Warn("hg", calc.CautionGuaranteeNoHead, calc.Fig(gp.Q, calc.Flow)))
		return nil, nil
	}
	switch {
	case e.has("etag"):
		if gp.Eff = g.quantity("etag"); g.failed() {
			return nil, g.problems()
		}
	case hasSheet && sheet.Eff > 0:
		gp.Eff, gr.EffFrom = sheet.Eff, FromSheet
	default:
		gr.EffFrom = FromNone
	}
	a, err := t.AcceptGuarantee(gp, grade)
	if err != nil {
		g.failErr("qg", err)
		return nil, g.problems()
	}
	gr.GuaranteeAcceptance = a
	return &gr, nil
}

// testDemo adds to the demo a test of the BS-3 duty pump at five flows,
// the discharge valve throttled from the reading of the visit (41 L/s),
// with the instruments' accuracies, grade 2B by the duty flow and the
// pump's tag. Invented for the demo, never a check value.
var testDemo = [][2]string{
	{"view", "pump"}, {"tag", "BS-3 P1"}, {"etam", "93%"},
	{"qm2", "20L/s"}, {"ps2", "-12kPa"}, {"pd2", "548kPa"}, {"pin2", "21.5kW"},
	{"qm3", "30L/s"}, {"ps3", "-14kPa"}, {"pd3", "508kPa"}, {"pin3", "26kW"},
	{"qm4", "50L/s"}, {"ps4", "-22kPa"}, {"pd4", "366kPa"}, {"pin4", "33.5kW"},
	{"qm5", "58L/s"}, {"ps5", "-26kPa"}, {"pd5", "296kPa"}, {"pin5", "35kW"},
	{"gcs", "1%"}, {"gss", "200kPa"}, {"gcd", "1%"}, {"gsd", "1000kPa"},
	{"uqm", "2%"}, {"upin", "1%"}, {"uz", "10mm"}, {"grade", "2B"},
	{"hours", "4000"}, {"tariff", "0.12"},
}

// PumpTestDemo returns the demo with a test of the duty pump at five flows.
func PumpTestDemo() Scenario {
	s := Demo()
	for _, kv := range testDemo {
		s.raw[kv[0]] = kv[1]
	}
	return s
}
