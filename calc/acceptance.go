package calc

import (
	"math"
	"strings"
)

// Grade is an acceptance grade of ISO 9906 (2012) for pump tests: its
// tolerance factors as shares, low and high ends (a one-sided factor has
// 0 on the other side).
//
// Every factor below is quoted from memory, not from the standard's text;
// summaries in circulation contradict each other. Check them against
// ISO 9906:2012 Table 8 (from memory) before relying on a verdict.
type Grade struct {
	Name              string
	FlowLow, FlowHigh float64 // t_Q
	HeadLow, HeadHigh float64 // t_H
	PowerHigh         float64 // t_P (upper only)
	EffLow            float64 // t_η (lower only; 0: no shortfall allowed)
	Use               string  // who usually orders it (common practice, from memory)
}

// Grades are ISO 9906's acceptance grades, tolerance factors from memory
// (flow / head / power / efficiency): 1U +10 % / +6 % / +10 % / ≥ 0; 1E
// ±5 % / ±3 % / +4 % / ≥ 0; 1B ±5 % / ±3 % / +4 % / −3 %; 2B ±8 % / ±5 % /
// +8 % / −5 %; 2U +16 % / +10 % / +16 % / −5 %; 3B ±9 % / ±7 % / +9 % /
// −7 %.
var Grades = []Grade{
	{Name: "1B", FlowLow: -0.05, FlowHigh: 0.05, HeadLow: -0.03, HeadHigh: 0.03, PowerHigh: 0.04, EffLow: -0.03, Use: "commonly ordered by water utilities"},
	{Name: "1E", FlowLow: -0.05, FlowHigh: 0.05, HeadLow: -0.03, HeadHigh: 0.03, PowerHigh: 0.04, EffLow: 0, Use: "where the energy used matters most"},
	{Name: "1U", FlowLow: 0, FlowHigh: 0.10, HeadLow: 0, HeadHigh: 0.06, PowerHigh: 0.10, EffLow: 0, Use: "one-sided: never below the guarantee"},
	{Name: "2B", FlowLow: -0.08, FlowHigh: 0.08, HeadLow: -0.05, HeadHigh: 0.05, PowerHigh: 0.08, EffLow: -0.05, Use: "commonly ordered for irrigation"},
	{Name: "2U", FlowLow: 0, FlowHigh: 0.16, HeadLow: 0, HeadHigh: 0.10, PowerHigh: 0.16, EffLow: -0.05, Use: "one-sided: never below the guarantee"},
	{Name: "3B", FlowLow: -0.09, FlowHigh: 0.09, HeadLow: -0.07, HeadHigh: 0.07, PowerHigh: 0.09, EffLow: -0.07, Use: "pumps sold without a test"},
}

// LookupGrade finds a grade by name ("2b" is 2B); ok is false for none.
func LookupGrade(name string) (Grade, bool) {
	for _, g := range Grades {
		if strings.EqualFold(g.Name, strings.TrimSpace(name)) {
			return g, true
		}
	}
	return Grade{}, false
}

// Verdict is the outcome of judging a measured value against a tolerance.
type Verdict uint8

const (
	// VerdictNone: nothing to judge (no guarantee value).
	VerdictNone Verdict = iota
	// Within: the value and its whole band lie within the tolerance.
	Within
	// Outside: the value and its whole band lie outside the tolerance.
	Outside
	// CannotTell: the band straddles a limit of the tolerance: this test
	// cannot decide, whatever the value.
	CannotTell
)

func (v Verdict) String() string {
	return [...]string{"none", "within", "outside", "cannot tell"}[v]
}

// Judgement is one quantity judged against its tolerance: the allowed
// range Low to High, and the verdict for the measured value ± band. A
// lower limit alone (an efficiency) has NoUpperLimit set and High 0:
// every figure stays finite.
type Judgement struct {
	Verdict      Verdict
	Low, High    float64
	NoUpperLimit bool
}

// judgeAtLeast places value ± band against a lower limit alone.
func judgeAtLeast(value, band, low float64) Judgement {
	j := judge(value, band, low, math.MaxFloat64)
	j.High, j.NoUpperLimit = 0, true
	return j
}

// judge places value ± band against [low, high].
func judge(value, band, low, high float64) Judgement {
	j := Judgement{Low: low, High: high}
	switch {
	case value-band >= low && value+band <= high:
		j.Verdict = Within
	case value+band < low || value-band > high:
		j.Verdict = Outside
	default:
		j.Verdict = CannotTell
	}
	return j
}

// Acceptance is a field check judged under a grade.
type Acceptance struct {
	Grade      Grade
	Head       Judgement // the measured head against the data sheet's at the measured flow
	Efficiency Judgement // the pump's efficiency against the data sheet's (VerdictNone without both)
	Verdict    Verdict   // Outside if either is outside, else CannotTell if either cannot tell, else Within
	// Improve names the reading whose accuracy limits the undecided
	// quantity most ("" unless the verdict is CannotTell).
	Improve string
}

// Accept judges field check fc, with its bands (zero bands: the readings
// taken as exact), under grade g. The data sheet's head and efficiency at
// the measured flow stand for the guarantee; the head must lie within
// H_G·(1 + t_H) at the low and high ends, the pump's efficiency at or
// above η_G·(1 + t_η). A single measured point is judged at its own flow,
// so the flow tolerance t_Q, which widens the ISO 9906 cross when a whole
// measured curve is compared with a guarantee point, is not used: the
// verdict is the stricter for it. A value whose band straddles a limit
// gives CannotTell, naming the reading that dominates that band.
// Validity: a pump at the data sheet's speed (or its curve scaled to the
// test speed by the affinity laws). ok is false when fc has no data-sheet
// head to compare with.
func Accept(fc FieldCheck, bands FieldBands, g Grade) (a Acceptance, ok bool) {
	if !fc.HasCurve || !(fc.CurveHead > 0) {
		return Acceptance{}, false
	}
	a.Grade = g
	hg := fc.CurveHead
	a.Head = judge(fc.Head, bands.Head.U, hg*(1+g.HeadLow), hg*(1+g.HeadHigh))
	if fc.HasEffDeviation {
		eg := fc.CurveEfficiency
		a.Efficiency = judgeAtLeast(fc.PumpEfficiency, bands.Pump.U, eg*(1+g.EffLow))
	}
	switch {
	case a.Head.Verdict == Outside || a.Efficiency.Verdict == Outside:
		a.Verdict = Outside
	case a.Head.Verdict == CannotTell || a.Efficiency.Verdict == CannotTell:
		a.Verdict = CannotTell
		// The reading to improve: that which dominates the band of the
		// undecided quantity whose band is widest against its tolerance.
		ratio := func(j Judgement, band, width float64) float64 {
			switch {
			case j.Verdict != CannotTell:
				return -1
			case width > 0:
				return band / width
			}
			return math.Inf(1)
		}
		h := ratio(a.Head, bands.Head.U, hg*(g.HeadHigh-g.HeadLow))
		e := ratio(a.Efficiency, bands.Pump.U, -fc.CurveEfficiency*g.EffLow)
		if h >= e {
			a.Improve = bands.Head.Dominant()
		} else {
			a.Improve = bands.Pump.Dominant()
		}
	default:
		a.Verdict = Within
	}
	return a, true
}
