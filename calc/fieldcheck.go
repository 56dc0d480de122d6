package calc

import (
	"math"
)

// Thresholds of CheckPump's warnings on the measured wire-to-water
// efficiency.
const (
	// FieldEfficiencyLow: below this wire-to-water efficiency the pump,
	// motor or readings deserve a look (common practice for pump sets of
	// some kilowatts and up, which usually reach 0.5–0.8).
	FieldEfficiencyLow = 0.3
)

// fieldVacuum is the lowest gauge reading accepted, Pa: full vacuum at
// standard sea-level pressure (ISO 2533, 101.325 kPa). Higher sites have
// less to lose, so this only rejects readings that are impossible
// anywhere.
const fieldVacuum = -101325.0

// FieldReadings are readings taken on a running pump. Pressures are gauge
// readings; the heights are those of the gauges (any common datum); the
// diameters are the pipe's inside diameters where the gauges are.
type FieldReadings struct {
	Ps, Pd  float64 // suction and discharge gauge pressures, Pa (gauge)
	Zs, Zd  float64 // heights of the suction and discharge gauges, m
	Ds, Dd  float64 // inside diameters at the gauges, m
	Q       float64 // measured flow, m³/s
	PowerIn float64 // measured electrical input to the motor, W; 0 = not measured
	// MotorEff is the motor's efficiency (from its nameplate or data
	// sheet, a share, 0 < η ≤ 1); 0 = not known.
	MotorEff float64
}

// FieldCheck is a running pump's performance worked out from readings.
type FieldCheck struct {
	Q             float64 // the measured flow, m³/s
	Head          float64 // pump total head, m
	PressureHead  float64 // (pd − ps)/(ρg), m
	ElevationHead float64 // zd − zs, m
	VelocityHead  float64 // (Vd² − Vs²)/(2g), m
	Vs, Vd        float64 // mean velocities at the gauges, m/s
	// HydraulicPower is ρ·g·Q·H, W.
	HydraulicPower float64
	// Efficiency is the wire-to-water efficiency, hydraulic power over
	// the measured electrical input (motor, drive and pump together);
	// 0 when the input was not measured.
	Efficiency float64
	// HasCurve is true when a curve was given and covers Q; CurveHead is
	// then the data-sheet head at Q, Deviation = Head − CurveHead (m) and
	// DeviationPct that as a percentage of CurveHead.
	HasCurve                           bool
	CurveHead, Deviation, DeviationPct float64
	// CurveEfficiency is the data-sheet pump efficiency at Q (pump alone,
	// without the motor), 0 when not available.
	CurveEfficiency float64
	// ShaftPower is the power the motor gives the pump's shaft,
	// PowerIn·MotorEff, and PumpEfficiency the pump's own efficiency,
	// HydraulicPower/ShaftPower; both 0 unless PowerIn and MotorEff are
	// given.
	ShaftPower, PumpEfficiency float64
	// HasEffDeviation is true when both PumpEfficiency and
	// CurveEfficiency are known; EffDeviation is then their difference,
	// PumpEfficiency − CurveEfficiency (a share: −0.05 is 5 points below
	// the data sheet).
	HasEffDeviation bool
	EffDeviation    float64
	Warnings        []Warning
}

// CheckPump works out the head and efficiency a running pump delivers from
// field readings r on liquid fl:
//
//	H = (pd − ps)/(ρg) + (zd − zs) + (Vd² − Vs²)/(2g)
//
// the total head between the gauge points (the energy equation with α = 1
// at both, the usual convention for pump head, taking the flow at the
// gauges as turbulent), hydraulic power ρ·g·Q·H, and the wire-to-water
// efficiency hydraulic power / PowerIn. With a curve c (nil for none) the
// head is compared with the data sheet at Q; beyond the sheet's flows a
// warning says there is nothing to compare with.
//
// With the motor's efficiency as well, the shaft power PowerIn·MotorEff and
// the pump's own efficiency hydraulic power / shaft power (the usual split
// of a wire-to-water test, common practice).
//
// Warnings flag an efficiency above 1 (the readings cannot all be right),
// one below 0.3, a wire-to-water efficiency above the data sheet's pump
// efficiency at Q (the motor's losses make it lower, so a reading or a
// unit is wrong), a pump efficiency above 1, and a head at or below zero. Errors name the fields "ps", "pd",
// "zs", "zd", "ds", "dd", "qm", "pin", "etam" and "rho".
func CheckPump(fl Fluid, r FieldReadings, c *PumpCurve) (FieldCheck, error) {
	finite := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	switch {
	case !finite(fl.Density) || !(fl.Density > 0):
		return FieldCheck{}, NewFieldError("rho", NotPositive).Got(Fig(fl.Density, Density))
	case !finite(r.Ps) || r.Ps < fieldVacuum:
		return FieldCheck{}, NewFieldError("ps", BelowLimit).Got(Fig(r.Ps, Pressure)).Because(ReasonBelowVacuum)
	case !finite(r.Pd) || r.Pd < fieldVacuum:
		return FieldCheck{}, NewFieldError("pd", BelowLimit).Got(Fig(r.Pd, Pressure)).Because(ReasonBelowVacuum)
	case !finite(r.Zs):
		return FieldCheck{}, NewFieldError("zs", NotFinite)
	case !finite(r.Zd):
		return FieldCheck{}, NewFieldError("zd", NotFinite)
	case !finite(r.Ds) || !(r.Ds > 0):
		return FieldCheck{}, NewFieldError("ds", Missing)
	case !finite(r.Dd) || !(r.Dd > 0):
		return FieldCheck{}, NewFieldError("dd", Missing)
	case !finite(r.Q) || !(r.Q > 0):
		return FieldCheck{}, NewFieldError("qm", NotPositive).Got(Fig(r.Q, Flow))
	case !finite(r.PowerIn) || r.PowerIn < 0:
		return FieldCheck{}, NewFieldError("pin", Negative).Got(Fig(r.PowerIn, Power))
	case !finite(r.MotorEff) || r.MotorEff < 0 || r.MotorEff > 1:
		return FieldCheck{}, NewFieldError("etam", OutOfRange).Got(Num(r.MotorEff)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
	}
	g := StandardGravity
	rhog := fl.Density * g
	fc := FieldCheck{Q: r.Q}
	fc.Vs = r.Q / (math.Pi * r.Ds * r.Ds / 4)
	fc.Vd = r.Q / (math.Pi * r.Dd * r.Dd / 4)
	fc.PressureHead = (r.Pd - r.Ps) / rhog
	fc.ElevationHead = r.Zd - r.Zs
	fc.VelocityHead = (fc.Vd*fc.Vd - fc.Vs*fc.Vs) / (2 * g)
	fc.Head = fc.PressureHead + fc.ElevationHead + fc.VelocityHead
	fc.HydraulicPower = rhog * r.Q * fc.Head
	if fc.Head <= 0 {
		fc.Warnings = append(fc.Warnings, Warn("pd", CautionHeadNotPositive, Fig(fc.Head, Length)))
	}
	if r.PowerIn > 0 {
		fc.Efficiency = fc.HydraulicPower / r.PowerIn
		switch {
		case fc.Efficiency > 1:
			fc.Warnings = append(fc.Warnings, Warn("pin", CautionWireAbove100, Num(fc.Efficiency)))
		case fc.Efficiency < FieldEfficiencyLow && fc.Head > 0:
			fc.Warnings = append(fc.Warnings, Warn("pin", CautionWireLow, Num(fc.Efficiency), Num(FieldEfficiencyLow)))
		}
	}
	if c != nil {
		if h, ok := c.Head(r.Q); ok {
			fc.HasCurve, fc.CurveHead = true, h
			fc.Deviation = fc.Head - h
			if h > 0 {
				fc.DeviationPct = 100 * fc.Deviation / h
			}
			if e, ok := c.Efficiency(r.Q); ok {
				fc.CurveEfficiency = e
				if fc.Efficiency > e {
					fc.Warnings = append(fc.Warnings, Warn("pin", CautionWireAbovePump, Num(fc.Efficiency), Num(e)))
				}
			}
		} else {
			fc.Warnings = append(fc.Warnings, Warn("qm", CautionFlowOffSheet, Fig(r.Q, Flow), Fig(c.MinFlow(), Flow), Fig(c.MaxFlow(), Flow)))
		}
	}
	if r.PowerIn > 0 && r.MotorEff > 0 {
		fc.ShaftPower = r.PowerIn * r.MotorEff
		fc.PumpEfficiency = fc.HydraulicPower / fc.ShaftPower
		switch {
		case fc.PumpEfficiency > 1:
			fc.Warnings = append(fc.Warnings, Warn("etam", CautionPumpEffAbove100, Num(fc.PumpEfficiency)))
		case fc.PumpEfficiency > PumpEfficiencyHigh:
			fc.Warnings = append(fc.Warnings, Warn("etam", CautionPumpEffHigh, Num(fc.PumpEfficiency), Num(PumpEfficiencyHigh)))
		}
		if fc.CurveEfficiency > 0 {
			fc.HasEffDeviation, fc.EffDeviation = true, fc.PumpEfficiency-fc.CurveEfficiency
		}
	}
	return fc, nil
}
