package calc

import "math"

// The authority band of common practice (from memory): a control valve
// whose open drop is under a quarter of its circuit's total controls
// poorly (most of its stroke changes the flow little); about a half is the
// usual aim.
const (
	AuthorityMinimum = 0.25 // the usual minimum valve authority
	AuthorityAim     = 0.5  // the usual aim
)

// Authority is a control valve's authority at its design flow.
type Authority struct {
	// N = Δp_valve / (Δp_valve + Δp_circuit), from 0 (the valve takes
	// none of the drop) to 1 (all of it).
	N float64
	// BelowMinimum: N is under AuthorityMinimum; BelowAim: under
	// AuthorityAim (so also true when BelowMinimum is).
	BelowMinimum, BelowAim bool
	// Warnings: CautionValveAuthorityLow below the minimum, else
	// CautionValveAuthorityBelowAim below the aim (field "cmp").
	Warnings []Warning
}

// ValveAuthority returns the authority of a control valve whose drop,
// fully open at the design flow, is valveDrop (Pa, > 0), in a circuit
// whose other parts (pipe, fittings, coil: whatever carries the flow the
// valve varies, but not the valve) drop circuitDrop (Pa, ≥ 0) at that
// flow: N = valveDrop / (valveDrop + circuitDrop) (common practice, from
// memory). N is 1 with no circuit drop. Errors: *FieldError naming
// "dpvalve" (NotPositive) or "dpcircuit" (Negative); either beyond
// 1 GPa or not finite is AboveLimit.
func ValveAuthority(valveDrop, circuitDrop float64) (Authority, error) {
	const max = 1e9
	switch {
	case math.IsNaN(valveDrop) || valveDrop <= 0:
		return Authority{}, NewFieldError("dpvalve", NotPositive).Got(Fig(valveDrop, Pressure))
	case valveDrop > max:
		return Authority{}, NewFieldError("dpvalve", AboveLimit).Got(Fig(valveDrop, Pressure)).AtMost(Fig(max, Pressure))
	case math.IsNaN(circuitDrop) || circuitDrop < 0:
		return Authority{}, NewFieldError("dpcircuit", Negative).Got(Fig(circuitDrop, Pressure))
	case circuitDrop > max:
		return Authority{}, NewFieldError("dpcircuit", AboveLimit).Got(Fig(circuitDrop, Pressure)).AtMost(Fig(max, Pressure))
	}
	a := Authority{N: valveDrop / (valveDrop + circuitDrop)}
	a.BelowMinimum, a.BelowAim = a.N < AuthorityMinimum, a.N < AuthorityAim
	switch {
	case a.BelowMinimum:
		a.Warnings = []Warning{Warn("cmp", CautionValveAuthorityLow, Num(a.N), Num(AuthorityMinimum))}
	case a.BelowAim:
		a.Warnings = []Warning{Warn("cmp", CautionValveAuthorityBelowAim, Num(a.N), Num(AuthorityAim))}
	}
	return a, nil
}

// WaterCriticalPressure is the critical pressure of water, 22.064 MPa
// (IAPWS-IF97), the pc of the IEC 60534-2-1 liquid critical pressure
// ratio factor FF for water and aqueous liquids.
const WaterCriticalPressure = 22.064e6

// ValveRefDensity returns ρ0, the density of water at 15 °C that
// IEC 60534-2-1 takes for the relative density ρ1/ρ0 of its liquid sizing
// equations: IAPWS-IF97 region 1 at 288.15 K and 101.325 kPa,
// 999.10 kg/m³.
func ValveRefDensity() float64 { return if97Region1DensityCore(288.15, 101325) }

// ValveLiquid is what the IEC 60534-2-1 liquid check of a control valve
// needs.
type ValveLiquid struct {
	Kv float64 // flow coefficient at the opening considered, m³/h at 1 bar
	// FL is the liquid pressure recovery factor of the valve (without
	// attached fittings) at that opening, from its data sheet: 0 < FL ≤ 1.
	FL float64
	// XFz is the valve's incipient-cavitation factor from its data sheet,
	// 0 < XFz ≤ 1; 0 when not given (no cavitation check).
	XFz float64
	P1  float64 // absolute pressure at the valve's inlet, Pa
	// Drop is the pressure difference across the valve, p1 − p2, Pa.
	Drop float64
	// Density ρ1 (kg/m³) and vapour pressure pv (Pa) of the liquid at the
	// inlet; CriticalPressure pc (Pa), WaterCriticalPressure when 0.
	Density, VapourPressure, CriticalPressure float64
}

// ValveCheck is the result of the IEC 60534-2-1 liquid check.
type ValveCheck struct {
	FF float64 // liquid critical pressure ratio factor, 0.96 − 0.28·√(pv/pc)
	// ChokedDrop is the drop at which the flow chokes, FL²·(p1 − FF·pv),
	// Pa; ChokedFlow the flow there, the most the valve passes at this
	// opening and inlet state, m³/s.
	ChokedDrop, ChokedFlow float64
	// Flow is the flow the drop passes, m³/s: Kv·√(Δp/(ρ1/ρ0)) below
	// ChokedDrop, ChokedFlow at or above it (Choked true).
	Flow   float64
	Choked bool
	// IncipientDrop is xFz·(p1 − pv), Pa, and Cavitation is true when the
	// drop reaches it; both zero and false when XFz is not given.
	IncipientDrop float64
	Cavitation    bool
	// Warnings: CautionValveChoked, CautionValveCavitation (field "cmp").
	Warnings []Warning
}

// CheckValveLiquid makes the IEC 60534-2-1 liquid check of a control valve
// in turbulent flow, with the piping geometry factor FP = 1 (a valve of
// the pipe's size, no reducers):
//
//	non-choked:  Q = Kv·√(Δp/(ρ1/ρ0)),  Kv in m³/h, Δp in bar, ρ0 water at 15 °C;
//	choked when  Δp ≥ ΔpChoked = FL²·(p1 − FF·pv),  FF = 0.96 − 0.28·√(pv/pc),
//	             Q = Kv·FL·√((p1 − FF·pv)/(ρ1/ρ0));
//	incipient cavitation when Δp ≥ xFz·(p1 − pv).
//
// (The equations as python3-fluids' control_valve implements them, which
// cites the standard; the check here was compared with it.) Valves with
// reducers (FP < 1, FLP) and laminar flow (the Reynolds factor FR) are not
// covered. A drop of zero passes no flow.
//
// Errors, as *FieldError: "kv" (NotPositive), "fl" and "xfz" (OutOfRange,
// ReasonValveFactor), "p1" (NotPositive; BelowLimit with
// ReasonValveInletBoils when p1 is not above pv), "dp" (Negative),
// "rho" (NotPositive), "pv" (Negative) and "pc" (BelowLimit: above pv).
func CheckValveLiquid(v ValveLiquid) (ValveCheck, error) {
	pc := v.CriticalPressure
	if pc == 0 {
		pc = WaterCriticalPressure
	}
	bad := func(x float64) bool { return math.IsNaN(x) || math.IsInf(x, 0) }
	factor := func(field string, x float64) *FieldError {
		return NewFieldError(field, OutOfRange).Got(Num(x)).Within(Num(0), Num(1)).Because(ReasonValveFactor)
	}
	switch {
	case bad(v.Kv) || !(v.Kv > 0) || v.Kv > componentMax:
		return ValveCheck{}, NewFieldError("kv", NotPositive).Got(Num(v.Kv))
	case bad(v.FL) || !(v.FL > 0) || v.FL > 1:
		return ValveCheck{}, factor("fl", v.FL)
	case bad(v.XFz) || v.XFz < 0 || v.XFz > 1:
		return ValveCheck{}, factor("xfz", v.XFz)
	case bad(v.Density) || !(v.Density > 0):
		return ValveCheck{}, NewFieldError("rho", NotPositive).Got(Fig(v.Density, Density))
	case bad(v.VapourPressure) || v.VapourPressure < 0:
		return ValveCheck{}, NewFieldError("pv", Negative).Got(Fig(v.VapourPressure, Pressure))
	case bad(pc) || !(pc > v.VapourPressure):
		return ValveCheck{}, NewFieldError("pc", BelowLimit).Got(Fig(pc, Pressure)).AtLeast(Fig(v.VapourPressure, Pressure))
	case bad(v.P1) || !(v.P1 > 0):
		return ValveCheck{}, NewFieldError("p1", NotPositive).Got(Fig(v.P1, Pressure)).Because(ReasonAbsolutePressure)
	case v.P1 <= v.VapourPressure:
		return ValveCheck{}, NewFieldError("p1", BelowLimit).Got(Fig(v.P1, Pressure)).AtLeast(Fig(v.VapourPressure, Pressure)).Because(ReasonValveInletBoils)
	case bad(v.Drop) || v.Drop < 0:
		return ValveCheck{}, NewFieldError("dp", Negative).Got(Fig(v.Drop, Pressure))
	}
	rel := v.Density / ValveRefDensity()
	flow := func(dp float64) float64 { return v.Kv * kvFlowUnit * math.Sqrt(dp/kvDropUnit/rel) }
	out := ValveCheck{FF: 0.96 - 0.28*math.Sqrt(v.VapourPressure/pc)}
	out.ChokedDrop = v.FL * v.FL * (v.P1 - out.FF*v.VapourPressure)
	out.ChokedFlow = flow(out.ChokedDrop)
	out.Flow, out.Choked = flow(v.Drop), v.Drop >= out.ChokedDrop
	if out.Choked {
		out.Flow = out.ChokedFlow
		out.Warnings = append(out.Warnings, Warn("cmp", CautionValveChoked, Fig(v.Drop, Pressure), Fig(out.ChokedDrop, Pressure), Fig(out.ChokedFlow, Flow)))
	}
	if v.XFz > 0 {
		out.IncipientDrop = v.XFz * (v.P1 - v.VapourPressure)
		if out.Cavitation = v.Drop >= out.IncipientDrop; out.Cavitation {
			out.Warnings = append(out.Warnings, Warn("cmp", CautionValveCavitation, Fig(v.Drop, Pressure), Fig(out.IncipientDrop, Pressure)))
		}
	}
	return out, nil
}
