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
func (e *eval) balance(run *RunResult, line *calc.Line) problems {
	g := e.gather()
	if e.isLoop() {
		if !e.siteKnown() || e.res.Fluid == nil || e.has("l") && run == nil || e.in.Segments > 0 && line == nil {
			return nil // their own errors say why
		}
		b := e.loopBalance(&g, run, line)
		if g.failed() {
			return g.problems()
		}
		e.solveBalance(&g, b, run)
		return g.problems()
	}
	solve := calc.SolvePumpHead
	if e.has("solve") {
		u, err := calc.ParseUnknown(e.in.Choice("solve"))
		if err != nil {
			g.failErr("solve", err)
			return g.problems()
		}
		solve = u
	}
	if !e.siteKnown() {
		return nil // the site's own error says why
	}
	if e.res.Fluid == nil {
		return nil // the liquid's own error says why
	}
	if e.has("l") && run == nil {
		return nil // the run's errors say why
	}
	if e.in.Segments > 0 && line == nil {
		return nil // the segments' errors say why
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
		return nil // Read reported it
	}
	need := func(param string, unknown calc.Unknown) float64 {
		if solve == unknown {
			return 0
		}
		return g.quantity(param)
	}
	b.In.P = e.pressure(&g, "p1", calc.SolveP1, solve)
	b.Out.P = e.pressure(&g, "p2", calc.SolveP2, solve)
	b.In.Z = need("z1", calc.SolveZ1)
	b.Out.Z = need("z2", calc.SolveZ2)
	if solve != calc.SolveFlow {
		b.Q = e.flow(&g)
	}
	e.point(&g, "1", &b.In)
	e.point(&g, "2", &b.Out)
	b.PumpHead = e.optionalHead(&g, "hp", calc.SolvePumpHead, solve)
	b.TurbineHead = e.optionalHead(&g, "ht", calc.SolveTurbineHead, solve)
	switch {
	case line != nil:
		if solve == calc.SolveFrictionHead {
			g.bad("solve", calc.Inconsistent).With("hf").Because(calc.ReasonHfFromSegments)
			return g.problems()
		}
		b.Line = line
		b.PumpAfter = 0
		if len(line.Segments) > 1 {
			b.PumpAfter = 1
		}
		if e.has("pafter") {
			v, ok := e.in.Value("pafter")
			if !ok {
				return g.problems() // Read reported it
			}
			b.PumpAfter = int(v.SI)
		}
	case run != nil:
		if solve == calc.SolveFrictionHead {
			g.bad("solve", calc.Inconsistent).With("hf").Because(calc.ReasonHfFromRun)
			return g.problems()
		}
		spec := e.runSpec
		b.Run = &spec
	default:
		b.FrictionHead = need("hf", calc.SolveFrictionHead)
	}
	if g.failed() {
		return g.problems()
	}
	e.solveBalance(&g, b, run)
	return g.problems()
}

// solveBalance solves b and fills Result.Balance (and Result.Run when the
// run sets the friction).
func (e *eval) solveBalance(g *gather, b calc.Balance, run *RunResult) {
	solve := b.Unknown
	e.bal = &b
	br, err := b.Solve()
	if err != nil {
		g.failErr(solve.String(), err)
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
func (e *eval) pressure(g *gather, param string, unknown, solve calc.Unknown) float64 {
	if solve == unknown {
		return 0
	}
	p := g.quantity(param)
	if !e.in.OK(param) {
		return 0
	}
	if e.in.vals[param].Abs {
		return p
	}
	return p + e.res.SitePressure
}

// point reads the velocity or the diameter of point n, whichever side of
// its group the inputs use.
func (e *eval) point(g *gather, n string, p *calc.Point) {
	if e.in.Side("pt"+n) == "d" {
		p.D = g.quantity("d" + n)
		return
	}
	p.V = g.quantity("v" + n)
}

// optionalHead reads hp or ht; absent means no such machine.
func (e *eval) optionalHead(g *gather, param string, unknown, solve calc.Unknown) float64 {
	if solve == unknown {
		return 0
	}
	return g.optional(param)
}
