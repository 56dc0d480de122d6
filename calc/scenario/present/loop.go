package present

import (
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The Balance view of a closed loop: the kind-of-line switch, one card for
// the loop's level (its static pressure where the expansion vessel or
// pressurisation unit connects), the flow or the heat load, the loop's pipe
// with its components, and each control valve's authority and check.

// isLoop reports whether the sheet describes a closed loop.
func (b *builder) isLoop() bool { return b.in.Choice("loop") == "1" }

// loopSwitch is the switch between a line between two points and a
// closed loop.
func (b *builder) loopSwitch() Block {
	b.shown["loop"] = true
	sw := &Switch{Group: "loop", Label: "The line is"}
	for _, c := range scenario.Choices("loop") {
		sw.Sides = append(sw.Sides, Button{ID: "loop-" + c.Value, Text: c.Label, Class: "seg",
			On: (c.Value == "1") == b.isLoop(), Act: Action{Do: "choose", Param: "loop", Value: c.Value}})
	}
	return Block{Kind: BlockSwitch, Switch: sw}
}

// loopCard stands for the two points in a closed loop: where its level is
// set, and what is left aside.
func (b *builder) loopCard() Card {
	blocks := []Block{
		text("muted", "", "Closed loop: the liquid comes back to the pump, so there is no static head and the pump head is the friction, fittings and components round the loop. "+
			"The static pressure sets the level of pressure for NPSH and the valves' check; the head does not depend on it."),
		fields(b.quantity("pexp", "", "")),
		fields(b.ref("pexpref")),
		fields(b.quantity("zexp", "", ""), b.quantity("zp", "Pump centreline elevation", "(the loop starts and ends at the pump)")),
	}
	var aside []string
	for _, p := range []string{"p1", "z1", "v1", "d1", "p2", "z2", "v2", "d2"} {
		if b.in.Given(p) {
			aside = append(aside, scenario.Label(p))
		}
	}
	if len(aside) > 0 {
		blocks = append(blocks, text("muted", "loop-aside", "Kept in this sheet but not used in a closed loop: "+strings.Join(aside, ", ")+"."))
	}
	if n := b.r.NPSH; n != nil {
		blocks = append(blocks, text("computed", "loop-npsh", "static pressure "+b.absolute(n.SurfacePressure)+" at its connection, "+b.head(n.StaticHead)+
			" above the pump · NPSH available "+b.head(n.Available)+" (Pump view)"))
	}
	return Card{ID: "loop-card", Class: "point", Title: "Closed loop", Blocks: blocks}
}

// flowFields are the flow, or the heat load and its temperatures, with the
// load the flow carries or the flow the load needs.
func (b *builder) flowFields() []Block {
	out := []Block{b.toggle("qby")}
	// With a flow given, the temperatures only add the load it carries:
	// the boxes say they may stay blank.
	sup, ret := "", ""
	if b.d.SideOf("qby") == "load" {
		out = append(out, fields(b.quantity("load", "", "")))
	} else {
		out = append(out, fields(b.quantity("q", "", "")))
		sup, ret = "(to the load; optional)", "(from the load; optional)"
	}
	out = append(out, fields(b.quantity("tsup", "", sup), b.quantity("tret", "", ret)))
	line := ""
	if h := b.r.Heat; h != nil {
		way := "heating"
		if h.Cooling {
			way = "cooling"
		}
		props := "ρ " + b.show(h.Props.Density, calc.Density) + ", cp " + number(h.Props.HeatCapacity/1000, 4) + " kJ/(kg·K) at " + b.show(h.Props.Temperature, calc.Temperature)
		if h.FromLoad {
			line = "flow for the " + way + " load: " + b.param("q", h.Flow) + " (" + props + ")"
		} else {
			line = "the flow carries " + b.param("load", h.Load) + " of " + way + " (" + props + ")"
		}
	}
	return append(out, text("computed", "heat-line", line))
}

// loopPipe is the loop's pipe on the Balance view: segment 1's inputs and
// its components while the loop has at most one segment, else the line's
// summary.
func (b *builder) loopPipe() []Block {
	n := b.in.Segments
	if n > 1 || b.in.Given("l") {
		return nil
	}
	p := func(f string) string { return scenario.SegmentParam(1, f) }
	out := b.runFields(p(""), false)
	cmp := b.plain(p("cmp"), "", "", false)
	cmp.Placeholder = "chiller:45kPa@12L/s, coil:3.2m@12L/s, valve:kv40 fl0.9"
	if b.us {
		cmp.Placeholder = "chiller:6.5psi@190gpm, valve:cv46 fl0.9"
	}
	out = append(out, fields(cmp), text("muted", "", "A drop at a rated flow scales with the flow squared. A valve: its Kv or Cv at its present opening, then its data sheet's FL and xFz if known (valve:kv40 fl0.9 xfz0.45) for the check of choked flow and cavitation."))
	line := ""
	if br := b.r.Balance; br != nil && br.Line != nil && len(br.Line.Segments) == 1 {
		r := br.Line.Segments[0]
		line = "velocity " + b.show(r.Velocity, calc.Velocity) + " · Re " + plainNumber(r.Reynolds) + " (" + r.Regime.String() +
			") · pipe friction " + b.head(r.MajorLoss) + " + fittings " + b.head(r.MinorLoss)
		if len(r.Components) > 0 {
			line += " + components: " + b.componentText(r.Components)
		}
	}
	return append(out, text("computed", "loop-line", line))
}

// valveBlocks are each control valve's authority and check, with the
// circuit drop they are judged against.
func (b *builder) valveBlocks() []Block {
	if len(b.r.Valves) == 0 && !b.in.Given("dpc") {
		return nil
	}
	var facts []Fact
	for i, v := range b.r.Valves {
		id := "valve-" + strconv.Itoa(i+1)
		circuit := "the rest of the line"
		if v.CircuitTyped {
			circuit = "the circuit typed"
		}
		val := "authority " + number(v.Authority.N, 2) + " (drop " + b.show(v.Drop, calc.Pressure) + " against " + b.show(v.CircuitDrop, calc.Pressure) + " of " + circuit +
			"; a quarter is a usual minimum, a half a usual aim, from memory)"
		switch c := v.Check; {
		case c == nil && v.FL == 0:
			val += " · not checked for choked flow: give its FL"
		case c == nil:
			val += " · not checked for choked flow: the pressure at its inlet is not known"
		case c.Choked:
			val += " · CHOKED: drop " + b.show(v.Drop, calc.Pressure) + " at or past " + b.show(c.ChokedDrop, calc.Pressure) + " (IEC 60534-2-1)"
		case c.Cavitation:
			val += " · CAVITATING: past the incipient drop " + b.show(c.IncipientDrop, calc.Pressure) + " (IEC 60534-2-1)"
		default:
			val += " · not choked (chokes at " + b.show(c.ChokedDrop, calc.Pressure) + ")"
			if c.IncipientDrop > 0 {
				val += ", below incipient cavitation (" + b.show(c.IncipientDrop, calc.Pressure) + ")"
			}
			val += ", inlet " + b.absolute(v.Inlet) + " (IEC 60534-2-1)"
		}
		facts = append(facts, Fact{ID: id, Label: "valve " + v.Name + " (segment " + strconv.Itoa(v.Segment) + ")", Value: val,
			Key: v.Check != nil && (v.Check.Choked || v.Check.Cavitation) || v.Authority.BelowMinimum})
	}
	out := []Block{fields(b.quantity("dpc", "", ""))}
	if len(facts) > 0 {
		out = append(out, Block{Kind: BlockFacts, ID: "valve-facts", Class: "facts", Facts: facts})
	}
	return append(out, b.warnings(nil, "valve", "heat"))
}
