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
func (e *eval) flow() (float64, bool) {
	if !e.flowFromLoad() {
		return e.quantity("q")
	}
	if !e.has("load") {
		e.bad("load", calc.Missing)
		return 0, false
	}
	if h := e.res.Heat; h != nil && h.FromLoad {
		return h.Flow, true
	}
	return 0, false
}

// carrier is the liquid as a carrier of heat, at the pressure its
// properties were taken at. ok is false for a liquid of typed properties,
// whose specific heat the sheet does not hold (recorded on param).
func (e *eval) carrier(param string) (calc.HeatCarrier, bool) {
	fl := e.res.Fluid
	c := calc.HeatCarrier{Pressure: fl.Pressure}
	switch e.in.Choice("liq") {
	case "", "water":
		c.Liquid = calc.HeatWater
	case "seawater":
		c.Liquid, c.Salinity = calc.HeatSeawater, e.salinity()
	case "eg", "pg":
		if e.res.Glycol == nil {
			return c, false
		}
		c.Liquid, c.Glycol, c.Share = calc.HeatGlycol, e.res.Glycol.Glycol, e.res.Glycol.MassFraction
	default:
		e.bad(param, calc.Inconsistent).With("liq").Because(calc.ReasonHeatLiquid)
		return c, false
	}
	return c, true
}

// heatFromLoad works out the flow that carries the load typed (qby=load).
func (e *eval) heatFromLoad() {
	if !e.flowFromLoad() || !e.has("load") || e.res.Fluid == nil {
		return
	}
	load, ok1 := e.quantity("load")
	ts, ok2 := e.quantity("tsup")
	tr, ok3 := e.quantity("tret")
	if !ok1 || !ok2 || !ok3 {
		return
	}
	c, ok := e.carrier("load")
	if !ok {
		return
	}
	hf, err := calc.FlowForLoad(c, load, ts, tr)
	if err != nil {
		e.failErr("load", err)
		return
	}
	e.res.Heat = &Heat{HeatFlow: hf, FromLoad: true}
	for _, w := range hf.Props.Warnings {
		e.warnCalc("heat", w)
	}
}

// heatOfFlow works out the load the sheet's flow carries between the
// supply and return temperatures typed: the balance's flow when it solved
// for it, else the flow typed.
func (e *eval) heatOfFlow() {
	if e.flowFromLoad() || !e.has("tsup") && !e.has("tret") || e.res.Fluid == nil {
		return
	}
	var q float64
	switch {
	case e.res.Balance != nil && e.bal != nil && e.bal.Unknown == calc.SolveFlow:
		q = e.res.Balance.Q
	case e.has("q"):
		v, ok := e.quantity("q")
		if !ok {
			return
		}
		q = v
	default:
		return
	}
	ts, ok1 := e.quantity("tsup")
	tr, ok2 := e.quantity("tret")
	if !ok1 || !ok2 {
		return
	}
	c, ok := e.carrier("tsup")
	if !ok {
		return
	}
	hf, err := calc.LoadOfFlow(c, q, ts, tr)
	if err != nil {
		e.failErr("tsup", err)
		return
	}
	e.res.Heat = &Heat{HeatFlow: hf}
	for _, w := range hf.Props.Warnings {
		e.warnCalc("heat", w)
	}
}

// salinity is the seawater's absolute salinity, kg/kg: sal (g/kg) when
// given, else 35 g/kg.
func (e *eval) salinity() float64 {
	if v, ok := e.in.Value("sal"); ok {
		return v.SI / 1000
	}
	return calc.SeawaterSalinity
}
