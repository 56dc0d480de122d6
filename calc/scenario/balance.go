package scenario

import (
	"fieldhead/calc"
)

// balanceParams are the parameters that belong to the energy balance.
var balanceParams = []string{"p1", "p2", "z1", "z2", "v1", "v2", "d1", "d2", "hp", "ht", "hf", "solve"}

func (e *eval) wantsBalance() bool {
	if e.isLoop() {
		return true
	}
	for _, p := range balanceParams {
		if e.has(p) {
			return true
		}
	}
	return false
}

// balance reads the two points and the heads, solves, and fills
// Result.Balance (and Result.Run when the run sets the friction).
func (e *eval) balance(run *RunResult, line *calc.Line) {
	if e.isLoop() {
		if !e.siteKnown() || e.res.Fluid == nil || e.has("l") && run == nil || e.in.Segments > 0 && line == nil {
			return // their own errors say why
		}
		if b, ok := e.loopBalance(run, line); ok {
			e.solveBalance(b, run)
		}
		return
	}
	solve := calc.SolvePumpHead
	if e.has("solve") {
		u, err := calc.ParseUnknown(e.in.Choice("solve"))
		if err != nil {
			e.failErr("solve", err)
			return
		}
		solve = u
	}
	if !e.siteKnown() {
		return // the site's own error says why
	}
	if e.res.Fluid == nil {
		return // the liquid's own error says why
	}
	if e.has("l") && run == nil {
		return // the run's errors say why
	}
	if e.in.Segments > 0 && line == nil {
		return // the segments' errors say why
	}
	b := calc.Balance{Fluid: *e.res.Fluid, SitePressure: e.res.SitePressure, Unknown: solve}
	switch e.in.Choice("alpha") {
	case "", "auto":
		b.Alpha = calc.AlphaFromRegime
	case "1":
		b.Alpha = calc.AlphaUnity
	case "pl":
		b.Alpha = calc.AlphaProfile
	default:
		return // Read reported it
	}
	ok := true
	need := func(param string, unknown calc.Unknown) float64 {
		if solve == unknown {
			return 0
		}
		v, good := e.quantity(param)
		ok = ok && good
		return v
	}
	b.In.P = e.pressure("p1", calc.SolveP1, solve, &ok)
	b.Out.P = e.pressure("p2", calc.SolveP2, solve, &ok)
	b.In.Z = need("z1", calc.SolveZ1)
	b.Out.Z = need("z2", calc.SolveZ2)
	if solve != calc.SolveFlow {
		q, good := e.flow()
		ok = ok && good
		b.Q = q
	}
	e.point("1", &b.In, &ok)
	e.point("2", &b.Out, &ok)
	b.PumpHead = e.optionalHead("hp", calc.SolvePumpHead, solve, &ok)
	b.TurbineHead = e.optionalHead("ht", calc.SolveTurbineHead, solve, &ok)
	switch {
	case line != nil:
		if solve == calc.SolveFrictionHead {
			e.bad("solve", calc.Inconsistent).With("hf").Because(calc.ReasonHfFromSegments)
			return
		}
		b.Line = line
		b.PumpAfter = 0
		if len(line.Segments) > 1 {
			b.PumpAfter = 1
		}
		if e.has("pafter") {
			n, ok := e.quantity("pafter")
			if !ok {
				return // Read reported it
			}
			b.PumpAfter = int(n)
		}
	case run != nil:
		if solve == calc.SolveFrictionHead {
			e.bad("solve", calc.Inconsistent).With("hf").Because(calc.ReasonHfFromRun)
			return
		}
		spec := e.runSpec
		b.Run = &spec
	default:
		b.FrictionHead = need("hf", calc.SolveFrictionHead)
	}
	if !ok {
		return
	}
	e.solveBalance(b, run)
}

// solveBalance solves b and fills Result.Balance (and Result.Run when the
// run sets the friction).
func (e *eval) solveBalance(b calc.Balance, run *RunResult) {
	solve := b.Unknown
	e.bal = &b
	br, err := b.Solve()
	if err != nil {
		e.failErr(solve.String(), err)
		return
	}
	e.res.Balance = &br
	e.res.Line = br.Line
	if fl := e.res.Fluid; len(br.Profile) > 0 {
		shift := (fl.VapourPressure - e.res.SitePressure) / (fl.Density * calc.StandardGravity)
		for _, n := range br.Profile {
			e.res.VapourLine = append(e.res.VapourLine, n.Z+shift)
		}
	}
	for _, w := range br.Warnings {
		e.warnCalc("balance", w)
	}
	if run != nil && br.Run != nil {
		run.RunResult = *br.Run
		run.Flow = br.Q
		e.res.Run = run
	}
}

// pressure is p1 or p2 as absolute Pa: gauge or absolute as Read settled
// it, a gauge pressure on the site pressure.
func (e *eval) pressure(param string, unknown, solve calc.Unknown, ok *bool) float64 {
	if solve == unknown {
		return 0
	}
	p, good := e.quantity(param)
	if !good {
		*ok = false
		return 0
	}
	if e.in.vals[param].Abs {
		return p
	}
	return p + e.res.SitePressure
}

// point reads the velocity or the diameter of point n, whichever side of
// its group the inputs use.
func (e *eval) point(n string, p *calc.Point, ok *bool) {
	if e.in.Side("pt"+n) == "d" {
		d, good := e.quantity("d" + n)
		*ok = *ok && good
		p.D = d
		return
	}
	v, good := e.quantity("v" + n)
	*ok = *ok && good
	p.V = v
}

// optionalHead reads hp or ht; absent means no such machine.
func (e *eval) optionalHead(param string, unknown, solve calc.Unknown, ok *bool) float64 {
	if solve == unknown {
		return 0
	}
	v, good := e.optional(param)
	*ok = *ok && good
	return v
}
