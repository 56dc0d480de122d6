package scenario

import (
	"fieldhead/calc"
)

// Heat is the load a flow carries between the supply and return
// temperatures: the flow worked out from a load typed (FromLoad), or the
// load the sheet's flow carries.
type Heat struct {
	calc.HeatFlow
	FromLoad bool // the flow comes from the load (qby=load)
}

// flowFromLoad reports whether the sheet gives its flow as a heat load.
func (e *eval) flowFromLoad() bool { return e.in.Side("qby") == "load" }

// hasFlow reports whether the sheet gives a flow, typed or as a load.
func (e *eval) hasFlow() bool {
	if e.flowFromLoad() {
		return e.has("load")
	}
	return e.has("q")
}

// flow is the sheet's flow, m³/s: typed, or the one that carries the load
// typed. A load that cannot be turned into a flow has its errors recorded
// under the load, its temperatures or the liquid.
func (e *eval) flow(g *gather) float64 {
	if !e.flowFromLoad() {
		return g.quantity("q")
	}
	if !e.has("load") {
		g.bad("load", calc.Missing)
		return 0
	}
	q, ok := e.knownFlow()
	if !ok {
		g.fail()
	}
	return q
}

// knownFlow is the sheet's flow, m³/s, and whether it is known: typed and
// usable, or worked out from the load.
func (e *eval) knownFlow() (float64, bool) {
	if !e.flowFromLoad() {
		v, ok := e.in.Value("q")
		return v.SI, ok
	}
	if h := e.res.Heat; h != nil && h.FromLoad {
		return h.Flow, true
	}
	return 0, false
}

// carrier is the liquid as a carrier of heat, at the pressure its
// properties were taken at. g fails for a liquid of typed properties,
// whose specific heat the sheet does not hold (recorded on param).
func (e *eval) carrier(g *gather, param string) calc.HeatCarrier {
	fl := e.res.Fluid
	c := calc.HeatCarrier{Pressure: fl.Pressure}
	switch e.in.Choice("liq") {
	case "", "water":
		c.Liquid = calc.HeatWater
	case "seawater":
		c.Liquid, c.Salinity = calc.HeatSeawater, e.salinity()
	case "eg", "pg":
		if e.res.Glycol == nil {
			g.fail()
			return c
		}
		c.Liquid, c.Glycol, c.Share = calc.HeatGlycol, e.res.Glycol.Glycol, e.res.Glycol.MassFraction
	default:
		g.bad(param, calc.Inconsistent).With("liq").Because(calc.ReasonHeatLiquid)
	}
	return c
}

// heatFromLoad works out the flow that carries the load typed (qby=load).
func (e *eval) heatFromLoad() (*Heat, problems) {
	if !e.flowFromLoad() || !e.has("load") || e.res.Fluid == nil {
		return nil, nil
	}
	g := e.gather()
	load, ts, tr := g.quantity("load"), g.quantity("tsup"), g.quantity("tret")
	if g.failed() {
		return nil, g.problems()
	}
	c := e.carrier(&g, "load")
	if g.failed() {
		return nil, g.problems()
	}
	hf, err := calc.FlowForLoad(c, load, ts, tr)
	if err != nil {
		g.failErr("load", err)
		return nil, g.problems()
	}
	for _, w := range hf.Props.Warnings {
		e.warnCalc("heat", w)
	}
	return &Heat{HeatFlow: hf, FromLoad: true}, nil
}

// heatOfFlow works out the load the sheet's flow carries between the
// supply and return temperatures typed: the balance's flow when it solved
// for it, else the flow typed.
func (e *eval) heatOfFlow() (*Heat, problems) {
	if e.flowFromLoad() || !e.has("tsup") && !e.has("tret") || e.res.Fluid == nil {
		return nil, nil
	}
	g := e.gather()
	var q float64
	switch {
	case e.res.Balance != nil && e.bal != nil && e.bal.Unknown == calc.SolveFlow:
		q = e.res.Balance.Q
	case e.has("q"):
		q = g.quantity("q")
		if g.failed() {
			return nil, g.problems()
		}
	default:
		return nil, nil
	}
	ts, tr := g.quantity("tsup"), g.quantity("tret")
	if g.failed() {
		return nil, g.problems()
	}
	c := e.carrier(&g, "tsup")
	if g.failed() {
		return nil, g.problems()
	}
	hf, err := calc.LoadOfFlow(c, q, ts, tr)
	if err != nil {
		g.failErr("tsup", err)
		return nil, g.problems()
	}
	for _, w := range hf.Props.Warnings {
		e.warnCalc("heat", w)
	}
	return &Heat{HeatFlow: hf}, nil
}

// salinity is the seawater's absolute salinity, kg/kg: sal (g/kg) when
// given, else 35 g/kg.
func (e *eval) salinity() float64 {
	if v, ok := e.in.Value("sal"); ok {
		return v.SI / 1000
	}
	return calc.SeawaterSalinity
}
