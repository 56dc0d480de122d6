package scenario

import "fieldhead/calc"

// Part names one result of Evaluate, for the table of the inputs each
// reads (Inputs.Uses).
type Part uint8

// The parts of a Result, each nil (or zero) when an input it reads is in
// error or missing.
const (
	PartSite       Part = iota + 1 // SitePressure
	PartLiquid                     // Fluid (and Glycol's properties)
	PartRun                        // Run: the single pipe run at the flow
	PartLine                       // Line: the segments at the flow
	PartBalance                    // Balance
	PartRunView                    // RunView.Run: the run the Run view shows
	PartSizing                     // RunView.Sizing
	PartPump                       // Pump: the curve at speed, in its arrangement
	PartOperating                  // Pump.Operating
	PartSpeedFor                   // Pump.SpeedFor
	PartNPSH                       // NPSH (available; the required and margin read more)
	PartField                      // Field: head, hydraulic power, wire-to-water
	PartPumpAlone                  // Field.PumpEfficiency and ShaftPower
	PartBands                      // FieldBands
	PartAcceptance                 // Acceptance
	PartEnergy                     // Energy
	PartTurbine                    // Turbine
	PartSurge                      // Surge
	PartConvert                    // Convert
	PartHeat                       // Heat: the load a flow carries, or the flow for a load
	PartValves                     // Valves: authority and the IEC 60534-2-1 check
	PartTest                       // Test: the readings as a test at several points
	PartGuarantee                  // Guarantee: the test judged by the guarantee point
	partEnd
)

var partNames = [...]string{"", "site", "liquid", "run", "line", "balance", "run view", "sizing", "pump",
	"operating point", "speed for a duty", "NPSH", "field check", "pump-alone efficiency", "bands",
	"acceptance", "energy", "turbine", "surge", "convert", "heat", "valves",
	"test", "guarantee"}

// String names the part in words, for test messages and logs.
func (p Part) String() string {
	if int(p) < len(partNames) {
		return partNames[p]
	}
	return "part?"
}

// Parts lists every Part.
func Parts() []Part {
	out := make([]Part, 0, partEnd-1)
	for p := PartSite; p < partEnd; p++ {
		out = append(out, p)
	}
	return out
}

// Worked reports whether part p was worked out: r holds it. (Named apart
// from Scenario.Has, which asks whether a raw parameter was typed.)
func (r *Result) Worked(p Part) bool {
	switch p {
	case PartSite:
		return r.SitePressure > 0
	case PartLiquid:
		return r.Fluid != nil
	case PartRun:
		return r.Run != nil
	case PartLine:
		return r.Line != nil
	case PartBalance:
		return r.Balance != nil
	case PartRunView:
		return r.RunView != nil && r.RunView.Run != nil
	case PartSizing:
		return r.RunView != nil && r.RunView.Sizing != nil
	case PartPump:
		return r.Pump != nil
	case PartOperating:
		return r.Pump != nil && r.Pump.Operating != nil
	case PartSpeedFor:
		return r.Pump != nil && r.Pump.SpeedFor != nil
	case PartNPSH:
		return r.NPSH != nil
	case PartField:
		return r.Field != nil
	case PartPumpAlone:
		return r.Field != nil && r.Field.PumpEfficiency > 0
	case PartBands:
		return r.FieldBands != nil
	case PartAcceptance:
		return r.Acceptance != nil
	case PartEnergy:
		return r.Energy != nil
	case PartTurbine:
		return r.Turbine != nil
	case PartSurge:
		return r.Surge != nil
	case PartConvert:
		return r.Convert != nil
	case PartHeat:
		return r.Heat != nil
	case PartValves:
		return len(r.Valves) > 0
	case PartTest:
		return r.Test != nil
	case PartGuarantee:
		return r.Guarantee != nil
	}
	return false
}

// drop removes part p from r, with what is worked out from it.
func (r *Result) drop(p Part) {
	switch p {
	case PartSite:
		r.SitePressure = 0
	case PartLiquid:
		r.Fluid = nil
	case PartRun:
		r.Run = nil
	case PartLine:
		r.Line = nil
	case PartBalance:
		r.Balance, r.VapourLine = nil, nil
	case PartRunView:
		if r.RunView != nil {
			r.RunView.Run = nil
		}
	case PartSizing:
		if r.RunView != nil {
			r.RunView.Sizing = nil
		}
	case PartPump:
		r.Pump = nil
	case PartOperating:
		if r.Pump != nil {
			r.Pump.Operating, r.Pump.System, r.Pump.NPSHa = nil, nil, nil
		}
	case PartSpeedFor:
		if r.Pump != nil {
			r.Pump.SpeedFor = nil
		}
	case PartNPSH:
		r.NPSH = nil
		if r.Pump != nil {
			r.Pump.NPSHa = nil
		}
	case PartField:
		r.Field = nil
	case PartPumpAlone:
		if r.Field != nil {
			r.Field.PumpEfficiency, r.Field.ShaftPower = 0, 0
		}
	case PartBands:
		r.FieldBands = nil
	case PartAcceptance:
		r.Acceptance = nil
	case PartEnergy:
		r.Energy = nil
	case PartTurbine:
		r.Turbine, r.BestTurbine = nil, nil
	case PartSurge:
		r.Surge = nil
	case PartConvert:
		r.Convert = nil
	case PartHeat:
		r.Heat = nil
	case PartValves:
		r.Valves = nil
	case PartTest:
		r.Test, r.Guarantee = nil, nil
	case PartGuarantee:
		r.Guarantee = nil
	}
}

// Uses lists the inputs part p reads, directly or through the parts it is
// worked out from, for these inputs (a group's parameters on the side in
// use; the liquid's pressure from what sets it). An input in error blanks
// every part that lists it (Evaluate), and nothing else.
func (in *Inputs) Uses(p Part) []string {
	u := uses{in: in, seen: map[Part]bool{}}
	u.part(p)
	return u.out
}

// uses gathers one Uses.
type uses struct {
	in   *Inputs
	seen map[Part]bool
	out  []string
}

// add adds params; the flow, when the sheet gives it as a heat load, is
// the load's and its temperatures'.
func (u *uses) add(params ...string) {
	for _, p := range params {
		if p == "q" && u.in.Side("qby") == "load" {
			u.out = append(u.out, "load")
			u.part(PartHeat)
			continue
		}
		u.out = append(u.out, p)
	}
}

// side adds the parameters of the side of group g in use.
func (u *uses) side(g string) {
	grp, ok := LookupGroup(g)
	if !ok {
		return
	}
	s := u.in.Side(g)
	for _, sd := range grp.Sides {
		if sd.Key == s || u.bothGiven(grp) {
			u.add(sd.Params...)
		}
	}
}

// bothGiven reports whether more than one side of grp is given (each is
// then in error, and every part reading the group reads both).
func (u *uses) bothGiven(grp Group) bool {
	n := 0
	for _, sd := range grp.Sides {
		for _, p := range sd.Params {
			if u.in.Given(p) {
				n++
				break
			}
		}
	}
	return n > 1
}

// run adds a run's parameters: prefix "" for the single run, "sN." for a
// segment.
func (u *uses) run(pre string) {
	u.add(pre+"l", pre+"fit", pre+"k", "fm", "chw")
	u.side(pre + "pipe")
	u.side(pre + "rough")
	if pre != "" {
		u.add(pre+"z", pre+"cmp")
	}
}

// loopBalance adds what a closed loop's balance reads: its flow or pump
// head, its start's elevation, its static pressure when given, and its
// line or run.
func (u *uses) loopBalance() {
	in := u.in
	u.add("loop", "solve", "alpha", "ht", "zp", "pafter")
	if in.Choice("solve") == "q" {
		u.add("hp")
	} else {
		u.add("q")
	}
	if in.Given("pexp") || in.Given("zexp") {
		u.add("zexp")
		u.pressureAt("pexp")
	}
	u.part(PartSite)
	u.part(PartLiquid)
	u.friction()
}

// friction adds what sets the balance's friction: the line, else the
// single run or the friction typed.
func (u *uses) friction() {
	if u.in.Segments > 0 {
		u.line()
		return
	}
	u.side("fric")
	if u.in.Side("fric") == "run" {
		u.run("")
	}
}

// line adds every segment's parameters.
func (u *uses) line() {
	u.add("loop") // a loop's segments end level and where it starts
	if u.in.IsLoop() {
		u.add("zp")
	}
	for i := 1; i <= u.in.Segments; i++ {
		u.run(SegmentParam(i, ""))
	}
	u.add("l") // a single run beside segments is an error
	if n := u.in.Segments; n > 0 && !u.in.Given(SegmentParam(n, "z")) {
		u.add("z2") // the last segment's end by default
	}
}

// pressureAt adds a point's pressure and its switch, and the site unless
// the pressure is absolute.
func (u *uses) pressureAt(p string) {
	u.add(p, p+"ref")
	if v, ok := u.in.vals[p]; !ok || !v.Abs {
		u.part(PartSite)
	}
}

func (u *uses) part(p Part) {
	if u.seen[p] {
		return
	}
	u.seen[p] = true
	in := u.in
	solve := in.Choice("solve")
	switch p {
	case PartSite:
		u.side("site")
	case PartLiquid:
		u.add("liq")
		switch in.Choice("liq") {
		case "custom":
			u.add("rho", "mu", "pv")
			return
		case "eg", "pg":
			u.add("t")
			u.side("gly")
			u.part(PartSite)
			return
		}
		u.add("t")
		if in.Choice("liq") == "seawater" {
			u.add("sal")
		}
		switch {
		case in.Given("pl"):
			u.pressureAt("pl")
		case in.IsLoop():
			u.add("loop")
			if in.Given("pexp") {
				u.pressureAt("pexp")
			} else {
				u.part(PartSite)
			}
		case in.Given("p1") && solve != "p1" || in.Given("p2") && solve != "p2":
			for _, pt := range []string{"p1", "p2"} {
				if in.Given(pt) && solve != pt {
					u.pressureAt(pt)
				}
			}
		default:
			u.part(PartSite)
		}
	case PartRun:
		u.run("")
		u.add("q")
		u.part(PartLiquid)
	case PartLine:
		u.line()
		u.add("q")
		u.part(PartLiquid)
	case PartBalance:
		if in.IsLoop() {
			u.loopBalance()
			return
		}
		u.add("loop", "solve", "alpha", "z1", "z2", "q", "hp", "ht", "pafter")
		u.pressureAt("p1")
		u.pressureAt("p2")
		u.side("pt1")
		u.side("pt2")
		u.part(PartLiquid)
		u.friction()
	case PartRunView:
		u.add("view", "rseg", "q")
		if in.Segments > 0 {
			u.run(SegmentParam(in.RunSegment(), ""))
		} else {
			u.run("")
		}
		u.part(PartLiquid)
	case PartSizing:
		u.add("szsch", "vlo", "vhi", "grad")
		u.part(PartRunView)
	case PartPump:
		u.add("pq", "ph", "spd", "pumps")
		if v, ok := in.vals["spd"]; ok && v.Dim == calc.Frequency {
			u.add("nrat", "fmains") // the speed over the rated speed or the mains frequency
		}
	case PartOperating:
		u.part(PartPump)
		u.part(PartBalance)
	case PartSpeedFor:
		u.side("spfor")
		u.part(PartOperating)
	case PartNPSH:
		u.add("loop", "zp", "hs", "q")
		if in.IsLoop() {
			u.add("loop", "zexp")
			u.pressureAt("pexp")
		} else {
			u.add("z1")
			u.pressureAt("p1")
		}
		u.part(PartLiquid)
		if !in.Given("hs") && in.Segments > 0 {
			u.add("pafter")
			if v, ok := in.vals["pafter"]; ok && (v.Bad || v.SI > 0) || !ok && in.Segments > 1 {
				u.line() // the suction side's losses
			}
		}
	case PartField:
		u.add("qm", "ps", "pd", "zs", "zd", "pin")
		u.side("gsp")
		u.side("gdp")
		u.part(PartLiquid)
		for _, g := range []string{"ps", "pd"} {
			if v, ok := in.vals[g]; ok && v.Abs {
				u.part(PartSite)
			}
		}
	case PartPumpAlone:
		u.add("etam")
		u.part(PartField)
	case PartBands:
		u.add("gcs", "gss", "gcd", "gsd", "uqm", "upin", "uz")
		u.part(PartField)
	case PartAcceptance:
		u.add("grade")
		u.part(PartField)
		u.part(PartPump)
	case PartEnergy:
		u.add("hours", "tariff")
		if in.Given("pin") && (in.Given("qm") || in.Given("ps") || in.Given("pd")) {
			u.part(PartField)
		} else {
			u.add("etam")
			u.part(PartOperating)
		}
	case PartTurbine:
		u.add("etat")
		u.part(PartBalance)
	case PartSurge:
		u.add("tc", "dv", "cr", "kliq", "wall", "epipe", "q")
		if in.IsLoop() {
			// The static pressure at the valve: the loop's, carried from
			// its connection to the valve's elevation.
			u.add("zv", "zexp")
			if in.Given("pexp") {
				u.pressureAt("pexp")
			}
		}
		u.part(PartLiquid)
		u.part(PartSite)
		if in.Segments > 0 {
			u.line()
		} else {
			u.run("")
		}
	case PartHeat:
		u.add("tsup", "tret")
		u.part(PartLiquid)
		switch {
		case in.Side("qby") == "load":
			u.out = append(u.out, "load")
		case solve == "q" && (in.IsLoop() || in.Given("hp")):
			u.part(PartBalance)
		default:
			u.add("q")
		}
	case PartValves:
		u.add("dpc")
		u.part(PartBalance)
	case PartTest:
		u.readings()
		u.add("zs", "zd", "etam")
		u.add(accuracyParams...)
		if len(in.ReadingsGiven()) == 1 {
			u.add("qg") // one reading is judged only at a guarantee flow
		}
		u.side("gsp")
		u.side("gdp")
		u.part(PartLiquid)
	case PartGuarantee:
		u.add("grade", "qg", "hg", "etag")
		u.part(PartTest)
		if !in.Given("qg") {
			u.add("q")
		}
		if !in.Given("hg") || !in.Given("etag") {
			u.part(PartPump) // the data sheet's head or efficiency at the guarantee flow
		}
	case PartConvert:
		u.add("cv", "cvref")
		u.part(PartSite)
		if v, ok := in.vals["cv"]; ok && v.Dim == calc.Length {
			u.part(PartLiquid) // a head of the liquid
		}
	}
}

// readings adds every reading's parameters, and the site for a gauge
// read absolute.
func (u *uses) readings() {
	for _, k := range u.in.ReadingsGiven() {
		for _, f := range readingFields {
			p := ReadingParam(f, k)
			u.add(p)
			if v, ok := u.in.vals[p]; ok && v.Abs {
				u.part(PartSite)
			}
		}
	}
}
