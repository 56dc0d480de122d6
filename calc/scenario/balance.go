package scenario

import (
	"math"
	"strings"

	"fieldhead/calc"
)

// balanceParams are the parameters that belong to the energy balance.
var balanceParams = []string{"p1", "p2", "z1", "z2", "v1", "v2", "d1", "d2", "hp", "ht", "hf", "solve"}

func (e *eval) wantsBalance() bool {
	for _, p := range balanceParams {
		if e.s.Has(p) {
			return true
		}
	}
	return false
}

// balance reads the two points and the heads, solves, and fills
// Result.Balance (and Result.Run when the run sets the friction).
func (e *eval) balance(run *RunResult, line *calc.Line) {
	solve := calc.SolvePumpHead
	if e.s.Has("solve") {
		u, err := calc.ParseUnknown(strings.TrimSpace(e.s.Get("solve")))
		if err != nil {
			e.failErr("solve", err)
			return
		}
		solve = u
	}
	if e.res.Fluid == nil {
		return // the liquid's own error says why
	}
	if e.s.Has("l") && run == nil {
		return // the run's errors say why
	}
	if e.s.SegmentCount() > 0 && line == nil {
		return // the segments' errors say why
	}
	b := calc.Balance{Fluid: *e.res.Fluid, SitePressure: e.res.SitePressure, Unknown: solve}
	switch e.s.Get("alpha") {
	case "", "auto":
		b.Alpha = calc.AlphaFromRegime
	case "1":
		b.Alpha = calc.AlphaUnity
	case "pl":
		b.Alpha = calc.AlphaProfile
	default:
		e.bad("alpha", calc.UnknownChoice).Typed(e.s.Get("alpha"))
		return
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
	b.Q = need("q", calc.SolveFlow)
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
		if e.s.Has("pafter") {
			n, err := number("pafter", e.s.Get("pafter"))
			if err != nil || n != math.Trunc(n) || n < 0 || int(n) > len(line.Segments) {
				e.bad("pafter", calc.OutOfRange).Typed(e.s.Get("pafter")).Within(calc.Num(0), calc.Num(float64(len(line.Segments)))).Because(calc.ReasonPumpAfter)
				return
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

// pressure reads p1 or p2 as absolute Pa, honouring pNref and a gauge or
// absolute unit suffix (psig, bara, kPa(a)…).
func (e *eval) pressure(param string, unknown, solve calc.Unknown, ok *bool) float64 {
	if solve == unknown {
		return 0
	}
	text := e.s.Get(param)
	if strings.TrimSpace(text) == "" {
		e.bad(param, calc.Missing)
		*ok = false
		return 0
	}
	p, ref, err := calc.ParsePressure(param, text, DefaultUnit(param, e.us))
	if err != nil {
		e.failErr(param, err)
		*ok = false
		return 0
	}
	abs, good := e.absolute(param+"ref", ref)
	if !good {
		*ok = false
		return 0
	}
	if abs {
		return p
	}
	return p + e.res.SitePressure
}

// absolute decides whether a pressure is absolute: its unit's suffix wins,
// then the ref parameter (g or a), then gauge.
func (e *eval) absolute(refParam string, ref calc.PressureRef) (bool, bool) {
	abs, ok := isAbsolute(e.s.Get(refParam), ref)
	if !ok {
		e.bad(refParam, calc.UnknownChoice).Typed(e.s.Get(refParam))
	}
	return abs, ok
}

// isAbsolute is the rule of absolute without recording anything: false
// for ok when refText is neither blank, g nor a (and the unit has no suffix).
func isAbsolute(refText string, ref calc.PressureRef) (abs, ok bool) {
	switch ref {
	case calc.Absolute:
		return true, true
	case calc.Gauge:
		return false, true
	}
	switch strings.TrimSpace(refText) {
	case "", "g":
		return false, true
	case "a":
		return true, true
	}
	return false, false
}

// point reads the velocity or diameter of point n.
func (e *eval) point(n string, p *calc.Point, ok *bool) {
	switch {
	case e.s.Has("d" + n):
		d, good := e.quantity("d" + n)
		if good && !(d > 0) {
			e.bad("d"+n, calc.NotPositive).Got(calc.Fig(d, calc.Length))
			good = false
		}
		*ok = *ok && good
		p.D = d
	default:
		v, good := e.quantity("v" + n)
		*ok = *ok && good
		p.V = v
	}
}

// optionalHead reads hp or ht; absent means no such machine.
func (e *eval) optionalHead(param string, unknown, solve calc.Unknown, ok *bool) float64 {
	if solve == unknown || !e.s.Has(param) {
		return 0
	}
	v, good := e.quantity(param)
	*ok = *ok && good
	return v
}
