package scenario

import (
	"fieldhead/calc"
)

// A closed loop (loop=1): the liquid leaves the pump and comes back to it,
// so the balance's two points are one point, at the pump's inlet. There is
// no static head and no difference of pressure or velocity between them:
// the pump head is the friction, fittings and components round the loop.
// The loop's pressure level is set where its expansion vessel or
// pressurisation unit connects (pexp, at elevation zexp); it matters for
// NPSH and the control valves, not for the head. The points' own values
// (p1, z1, v1…), if the sheet holds any, stay in the link unread.

// isLoop reports whether the sheet describes a closed loop.
func (e *eval) isLoop() bool { return e.in.Choice("loop") == "1" }

// IsLoop reports whether the inputs describe a closed loop (loop=1).
func (in *Inputs) IsLoop() bool { return in.Choice("loop") == "1" }

// loopStartZ is the elevation of the loop's start and end, the pump's
// inlet: the pump centreline when given, else 0 (the loop's own datum).
func (e *eval) loopStartZ(g *gather) float64 {
	if !e.has("zp") {
		return 0
	}
	return g.quantity("zp")
}

// loopStatic is the loop's static pressure, absolute, at its connection
// and that connection's elevation. g fails when either is missing
// (recorded) or in error.
func (e *eval) loopStatic(g *gather) (p, z float64) {
	v, zc := g.quantity("pexp"), g.quantity("zexp")
	if !e.in.OK("pexp") || !e.in.OK("zexp") {
		return 0, 0
	}
	p = v
	if !e.in.vals["pexp"].Abs {
		if !e.siteKnown() {
			g.fail()
			return 0, 0
		}
		p += e.res.SitePressure
	}
	if !(p > 0) {
		g.bad("pexp", calc.NotPositive).Got(calc.Fig(p, calc.Pressure)).Because(calc.ReasonAbsolutePressure)
		return 0, 0
	}
	return p, zc
}

// loopBalance is the balance of a closed loop: both points at the pump's
// inlet, at rest relative to each other, the friction from the line or
// the single run. It solves for the pump head or, given one, the flow.
// It reads every input it needs whatever g holds; the balance is of no
// use once g has failed.
func (e *eval) loopBalance(g *gather, run *RunResult, line *calc.Line) calc.Balance {
	solve := calc.SolvePumpHead
	switch e.in.Choice("solve") {
	case "", "hp":
	case "q":
		solve = calc.SolveFlow
	default:
		if !e.in.Bad("solve") {
			g.bad("solve", calc.Inconsistent).With("loop").Because(calc.ReasonLoopUnknown)
		}
		g.fail()
		return calc.Balance{}
	}
	b := calc.Balance{Fluid: *e.res.Fluid, SitePressure: e.res.SitePressure, Unknown: solve, Alpha: calc.AlphaFromRegime}
	switch e.in.Choice("alpha") {
	case "", "auto":
	case "1":
		b.Alpha = calc.AlphaUnity
	case "pl":
		b.Alpha = calc.AlphaProfile
	default:
		g.fail() // Read reported it
		return b
	}
	z := e.loopStartZ(g)
	// The pressure at the pump's inlet: the loop's static pressure carried
	// by elevation from its connection; without it, the site pressure
	// stands in (gauge pressures then read from the pump's inlet), which
	// leaves the head unchanged.
	p := e.res.SitePressure
	if e.has("pexp") || e.has("zexp") {
		pc, zc := e.loopStatic(g)
		p = pc + e.res.Fluid.Density*calc.StandardGravity*(zc-z)
	}
	b.In = calc.Point{P: p, Z: z}
	b.Out = calc.Point{P: p, Z: z}
	if solve == calc.SolveFlow {
		b.PumpHead = g.quantity("hp")
	} else {
		b.Q = e.flow(g)
	}
	b.TurbineHead = g.optional("ht")
	switch {
	case line != nil:
		b.Line = line
		if e.has("pafter") {
			b.PumpAfter = int(g.quantity("pafter"))
		}
	case run != nil:
		spec := e.runSpec
		b.Run = &spec
	case e.in.Side("fric") == "hf" && e.has("hf"):
		b.FrictionHead = g.quantity("hf")
	default:
		// A loop's friction comes from its pipe: ask for the run.
		g.quantity("l")
		g.fail()
	}
	return b
}
