package scenario

import (
	"fieldhead/calc"
)

// ValveResult is one control valve of the line (a component given by its
// Kv or Cv) at the balance's flow.
type ValveResult struct {
	Segment int    // the segment it is on, 1-based
	Name    string // as typed
	Kv      float64
	FL, XFz float64 // from its data sheet; 0 when not given
	// Drop is the valve's drop at the flow, Pa, and Head the same as a
	// head of the liquid, m.
	Drop, Head float64
	// CircuitDrop is the drop of the circuit whose flow it varies, Pa:
	// dpc typed (CircuitTyped), else the rest of the line (its friction,
	// fittings, changes of diameter and other components).
	CircuitDrop  float64
	CircuitTyped bool
	Authority    calc.Authority
	// Inlet is the absolute pressure at the valve's inlet, Pa, taken with
	// the valve at the end of its segment (the lowest inlet pressure the
	// segment offers when it is level); 0 when the sheet does not fix the
	// line's pressure (a closed loop without its static pressure).
	Inlet float64
	// Check is the IEC 60534-2-1 liquid check, nil without FL or Inlet.
	Check *calc.ValveCheck
}

// valves checks each control valve of the line at the balance's flow: its
// authority, and with FL from its data sheet, choked flow and (with xFz)
// incipient cavitation.
func (e *eval) valves() ([]ValveResult, problems) {
	br := e.res.Balance
	if br == nil || br.Line == nil || e.bal == nil || e.bal.Line == nil || e.res.Fluid == nil {
		return nil, nil
	}
	fl := *e.res.Fluid
	rhog := fl.Density * calc.StandardGravity
	g := e.gather()
	dpc, typed := 0.0, e.has("dpc")
	if typed {
		if dpc = g.quantity("dpc"); g.failed() {
			return nil, g.problems()
		}
	}
	var out []ValveResult
	// The line's pressures are known unless a closed loop leaves its
	// static pressure out.
	pressures := !e.isLoop() || e.has("pexp")
	for i, seg := range e.bal.Line.Segments {
		if i >= len(br.Line.Segments) {
			break
		}
		losses := br.Line.Segments[i].Components
		for j, c := range seg.Components {
			if c.Kind != calc.ComponentValve || j >= len(losses) {
				continue
			}
			param := SegmentParam(i+1, "cmp")
			v := ValveResult{Segment: i + 1, Name: c.Name, Kv: c.Kv, FL: c.FL, XFz: c.XFz,
				Drop: losses[j].Pressure, Head: losses[j].Head, CircuitDrop: dpc, CircuitTyped: typed}
			if !typed {
				v.CircuitDrop = br.Line.TotalLoss*rhog - v.Drop
				if v.CircuitDrop < 0 {
					v.CircuitDrop = 0
				}
			}
			if v.Drop > 0 {
				a, err := calc.ValveAuthority(v.Drop, v.CircuitDrop)
				if err != nil {
					g.failErr(param, err)
					continue
				}
				v.Authority = a
				for _, w := range a.Warnings {
					w.Field, w.Segment = "cmp", i+1
					e.warnCalc("valve", w)
				}
			}
			if pressures {
				for _, n := range br.Profile {
					if n.Segment == i+1 {
						v.Inlet = n.Pressure + v.Drop // the segment's last node
					}
				}
			}
			if c.FL > 0 && v.Inlet > 0 {
				ck, err := calc.CheckValveLiquid(calc.ValveLiquid{Kv: c.Kv, FL: c.FL, XFz: c.XFz, P1: v.Inlet, Drop: v.Drop,
					Density: fl.Density, VapourPressure: fl.VapourPressure})
				if err != nil {
					g.failErr(param, err)
					continue
				}
				v.Check = &ck
				for _, w := range ck.Warnings {
					w.Field, w.Segment = "cmp", i+1
					e.warnCalc("valve", w)
				}
			} else if c.FL > 0 && !pressures {
				g.bad("pexp", calc.Missing).Because(calc.ReasonValveNeedsStatic)
			}
			out = append(out, v)
		}
	}
	return out, g.problems()
}
