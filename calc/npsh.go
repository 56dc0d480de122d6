package calc

import (
	"math"
)

// NPSH margin thresholds used by NPSH.
const (
	// NPSHMarginRatio is the lowest ratio NPSHa/NPSHr taken as adequate
	// without further thought: 1.1, the low end of the range of NPSH
	// margin ratios (about 1.1 to 2.0, by application and suction
	// energy) in ANSI/HI 9.6.1 — recalled from memory, not checked against
	// the document.
	NPSHMarginRatio = 1.1
	// NPSHMarginMin is the smallest margin NPSHa − NPSHr taken as
	// adequate, m: about 0.6 m (2 ft) is a common rule of thumb in
	// practice (common practice, from memory), since the data sheet's
	// NPSHr is the point where the head has already dropped by 3 %.
	NPSHMarginMin = 0.6
)

// NPSHLevel grades the NPSH margin.
type NPSHLevel int

// NPSH margin levels.
const (
	NPSHOK      NPSHLevel = iota // margin adequate by NPSHMarginRatio and NPSHMarginMin
	NPSHCaution                  // NPSHa above NPSHr, but by less than those margins
	NPSHDanger                   // NPSHa below NPSHr (or not above zero): the pump will cavitate
	NPSHUnrated                  // no NPSHr given: only NPSHa is known
)

// String returns "ok", "caution", "danger" or "no NPSHr".
func (l NPSHLevel) String() string {
	switch l {
	case NPSHOK:
		return "ok"
	case NPSHCaution:
		return "caution"
	case NPSHDanger:
		return "danger"
	case NPSHUnrated:
		return "no NPSHr"
	}
	return "unknown"
}

// NPSHInput are the conditions at the pump's suction.
type NPSHInput struct {
	SurfacePressure float64 // absolute pressure on the source liquid's surface, Pa
	SurfaceZ        float64 // elevation of the source liquid's surface, m
	PumpZ           float64 // elevation of the pump's reference (impeller eye / centreline), m
	SuctionLoss     float64 // head lost between the source and the pump inlet at the flow, m
	NPSHr           float64 // NPSH the pump requires at the flow, m; 0 = not given
}

// NPSHResult is the NPSH available at the pump against the NPSH it
// requires.
type NPSHResult struct {
	// The terms of NPSHa, heads in m of the liquid: the absolute pressure
	// on the source surface, the source surface above the pump (negative
	// for a suction lift), the suction losses and the vapour pressure.
	// Available = PressureHead + StaticHead − LossHead − VapourHead.
	PressureHead, StaticHead, LossHead, VapourHead float64
	// SurfacePressure is the absolute pressure on the source surface, Pa
	// (PressureHead's pressure).
	SurfacePressure float64

	Available float64 // NPSHa, m
	Required  float64 // NPSHr, m (0 when not given)
	Margin    float64 // NPSHa − NPSHr, m
	Ratio     float64 // NPSHa / NPSHr (0 when NPSHr is not given)
	Level     NPSHLevel
	Note      Warning // the verdict and the guidance it rests on, in words (Field empty)
}

// NPSH computes the net positive suction head available at the pump,
//
//	NPSHa = (p_surface − p_v)/(ρg) + (z_surface − z_pump) − h_loss
//
// with p_v the liquid's vapour pressure, and compares it with the NPSHr:
// NPSHDanger when NPSHa is below NPSHr or not above zero; NPSHCaution when
// the ratio NPSHa/NPSHr is below 1.1 or the margin below 0.6 m (the ratio
// from the low end of ANSI/HI 9.6.1's margin-ratio range of about 1.1 to
// 2.0, recalled from memory; the 0.6 m from common practice, from memory);
// otherwise NPSHOK. Higher margins are advised for large or high-energy
// pumps and for hot or dissolved-gas-laden liquids; the Note says so.
// Errors name "p1" (surface pressure), "z1", "zp", "hs" (suction loss),
// "npshr", "rho" and "pv".
func NPSH(fl Fluid, in NPSHInput) (NPSHResult, error) {
	finite := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	switch {
	case !finite(fl.Density) || !(fl.Density > 0):
		return NPSHResult{}, NewFieldError("rho", NotPositive).Got(Fig(fl.Density, Density))
	case !finite(fl.VapourPressure) || fl.VapourPressure < 0:
		return NPSHResult{}, NewFieldError("pv", Negative).Got(Fig(fl.VapourPressure, Pressure)).Because(ReasonAbsolutePressure)
	case !finite(in.SurfacePressure) || !(in.SurfacePressure > 0):
		return NPSHResult{}, NewFieldError("p1", NotPositive).Got(Fig(in.SurfacePressure, Pressure)).Because(ReasonAbsolutePressure)
	case !finite(in.SurfaceZ):
		return NPSHResult{}, NewFieldError("z1", NotFinite)
	case !finite(in.PumpZ):
		return NPSHResult{}, NewFieldError("zp", NotFinite)
	case !finite(in.SuctionLoss) || in.SuctionLoss < 0:
		return NPSHResult{}, NewFieldError("hs", Negative).Got(Fig(in.SuctionLoss, Length))
	case !finite(in.NPSHr) || in.NPSHr < 0:
		return NPSHResult{}, NewFieldError("npshr", Negative).Got(Fig(in.NPSHr, Length))
	}
	rg := fl.Density * StandardGravity
	r := NPSHResult{Required: in.NPSHr, SurfacePressure: in.SurfacePressure, PressureHead: in.SurfacePressure / rg, StaticHead: in.SurfaceZ - in.PumpZ,
		LossHead: in.SuctionLoss, VapourHead: fl.VapourPressure / rg}
	r.Available = (in.SurfacePressure-fl.VapourPressure)/rg + in.SurfaceZ - in.PumpZ - in.SuctionLoss
	minMargin := Fig(NPSHMarginMin, Length)
	if in.NPSHr == 0 {
		r.Level = NPSHUnrated
		r.Margin = r.Available
		if r.Available <= 0 {
			r.Level = NPSHDanger
			r.Note = Warn("", CautionNPSHNone, Fig(r.Available, Length))
			return r, nil
		}
		r.Note = Warn("", CautionNPSHUnrated, Fig(r.Available, Length), minMargin)
		return r, nil
	}
	r.Margin = r.Available - r.Required
	r.Ratio = r.Available / r.Required
	switch {
	case r.Available <= 0 || r.Available < r.Required:
		r.Level = NPSHDanger
		r.Note = Warn("", CautionNPSHBelow, Fig(r.Available, Length), Fig(r.Required, Length))
	case r.Ratio < NPSHMarginRatio || r.Margin < NPSHMarginMin:
		r.Level = NPSHCaution
		r.Note = Warn("", CautionNPSHLowMargin, Fig(r.Available, Length), Fig(r.Required, Length), Fig(r.Margin, Length), Num(r.Ratio), minMargin)
	default:
		r.Level = NPSHOK
		r.Note = Warn("", CautionNPSHMargin, Fig(r.Available, Length), Fig(r.Required, Length), Fig(r.Margin, Length), Num(r.Ratio), minMargin)
	}
	return r, nil
}

// SuctionLoss returns the head lost between point 1 and the pump of
// balance b at flow q (m³/s): the losses of segments 1 to b.PumpAfter of
// b.Line (friction, fittings and the diameter changes within them, on the
// design bound), for NPSHInput.SuctionLoss. A pump at point 1 (PumpAfter
// 0) has none. Without a line the error names "pafter".
func SuctionLoss(b Balance, q float64) (float64, error) {
	if b.Line == nil {
		return 0, NewFieldError("pafter", Missing).With("line").Because(ReasonSuctionSegments)
	}
	if err := b.Line.check(); err != nil {
		return 0, err
	}
	if b.PumpAfter < 0 || b.PumpAfter > len(b.Line.Segments) {
		return 0, NewFieldError("pafter", OutOfRange).Got(Num(float64(b.PumpAfter))).Within(Num(0), Num(float64(len(b.Line.Segments)))).Because(ReasonPumpAfter)
	}
	if b.PumpAfter == 0 {
		return 0, nil
	}
	suction := Line{Segments: b.Line.Segments[:b.PumpAfter]}
	lr, err := suction.Evaluate(b.Fluid, q)
	if err != nil {
		return 0, err
	}
	return lr.LossThrough(b.PumpAfter), nil
}
