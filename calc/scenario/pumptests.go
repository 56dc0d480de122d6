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
func (e *eval) test() {
	if !e.testWanted() || e.res.Fluid == nil {
		return
	}
	ok := true
	get := func(p string) float64 {
		v, good := e.quantity(p)
		ok = ok && good
		return v
	}
	zs, zd := get("zs"), get("zd")
	ds, g1 := e.gaugeBore("gsp", "ds", "dsn", "dss")
	dd, g2 := e.gaugeBore("gdp", "dd", "ddn", "dds")
	ok = ok && g1 && g2
	var readings []calc.TestReading
	var nums []int
	for _, k := range e.in.ReadingsGiven() {
		ps, g1 := e.gaugeReading(ReadingParam("ps", k))
		pd, g2 := e.gaugeReading(ReadingParam("pd", k))
		r := calc.TestReading{Q: get(ReadingParam("qm", k)), Ps: ps, Pd: pd}
		ok = ok && g1 && g2
		if p := ReadingParam("pin", k); e.has(p) {
			r.PowerIn = get(p)
		}
		readings, nums = append(readings, r), append(nums, k)
	}
	var motor float64
	if v, good := e.in.Value("etam"); good {
		motor = v.SI
	}
	a, given, good := e.accuracy()
	if !ok || !good {
		return
	}
	var curve *calc.PumpCurve
	if e.res.Pump != nil {
		curve = &e.res.Pump.Single
	}
	t, err := calc.CheckPumpTest(*e.res.Fluid, calc.TestSetup{Zs: zs, Zd: zd, Ds: ds, Dd: dd, MotorEff: motor, Accuracy: a}, readings, curve)
	if err != nil {
		e.failTest(err, nums)
		return
	}
	tr := TestResult{PumpTest: t, Bands: given}
	for _, p := range t.Points {
		tr.Reading = append(tr.Reading, nums[p.Item-1])
	}
	e.res.Test = &tr
}

// failTest records an error of calc.CheckPumpTest under the reading's own
// parameter: calc names a reading's field with its place in the list.
func (e *eval) failTest(err error, nums []int) {
	fe, ok := err.(*calc.FieldError)
	if !ok {
		e.failErr("qm", err)
		return
	}
	c := *fe
	if f, k := ReadingOf(fe.Field); k == 1 && fe.Item >= 1 && fe.Item <= len(nums) {
		c.Field, c.Item = ReadingParam(f, nums[fe.Item-1]), 0
		if c.Reason == calc.ReasonFlowTwice && len(c.Figures) > 0 {
			if i := int(c.Figures[0].Value); i >= 1 && i <= len(nums) {
				c.Figures[0].Value = float64(nums[i-1]) // the earlier reading's number
			}
		}
		e.record(&c)
		return
	}
	e.failErr(fe.Field, err)
}

// guarantee judges the test against the guarantee point under the grade:
// the flow typed (qg) or the duty flow (q); the head and efficiency typed
// (hg, etag) or the data sheet's at that flow.
func (e *eval) guarantee() {
	t := e.res.Test
	if t == nil || !e.has("grade") {
		return
	}
	g, ok := calc.LookupGrade(e.in.Choice("grade"))
	if !ok {
		return // Read reported it
	}
	var gr GuaranteeResult
	var gp calc.Guarantee
	switch {
	case e.has("qg"):
		if gp.Q, ok = e.quantity("qg"); !ok {
			return
		}
	case e.has("q"):
		if gp.Q, ok = e.quantity("q"); !ok {
			return
		}
		gr.FlowFrom = FromDuty
	default:
		e.warnCalc("test", calc.Warn("qg", calc.CautionGuaranteeNoFlow))
		return
	}
	var sheet calc.Guarantee
	hasSheet := false
	if e.res.Pump != nil {
		sheet, hasSheet = calc.SheetGuarantee(e.res.Pump.Single, gp.Q)
	}
	if e.has("hg") {
		if gp.H, ok = e.quantity("hg"); !ok {
			return
		}
	} else if hasSheet {
		gp.H, gr.HeadFrom = sheet.H, FromSheet
	} else {
		e.warnCalc("test", calc.Warn("hg", calc.CautionGuaranteeNoHead, calc.Fig(gp.Q, calc.Flow)))
		return
	}
	switch {
	case e.has("etag"):
		if gp.Eff, ok = e.quantity("etag"); !ok {
			return
		}
	case hasSheet && sheet.Eff > 0:
		gp.Eff, gr.EffFrom = sheet.Eff, FromSheet
	default:
		gr.EffFrom = FromNone
	}
	a, err := t.AcceptGuarantee(gp, g)
	if err != nil {
		e.failErr("qg", err)
		return
	}
	gr.GuaranteeAcceptance = a
	e.res.Guarantee = &gr
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
