package scenario

import (
	"math"
	"strconv"
	"strings"
	"sync"

	"fieldhead/calc"
)

// Kind says how a parameter's value is written in the link.
type Kind uint8

const (
	KindQuantity Kind = iota // a number and its unit: q=45L/s
	KindList                 // numbers with one unit after the last: pq=0,20,40L/s
	KindChoice               // one of the parameter's Choices: liq=water
	KindNumber               // a plain number without a unit: k=2.5
	KindText                 // free text: name=…
	KindFittings             // key:count pairs: fit=gate:2,exit:1
)

// Param describes one parameter of the vocabulary. The table of them,
// Table, is the one place a parameter is declared: the link's order, the
// parsing, the app's boxes and pickers, the labels of errors and of the
// report, and the messages for a missing value are all read from it.
type Param struct {
	Name  string // in the link
	Label string // in words, lower case ("flow"), for lists of fields and the report
	// Box is the label of the parameter's own input, as a sentence start
	// ("Flow"); Hint a short note after it ("(optional)").
	Box, Hint string
	Kind      Kind
	Dim       calc.Dimension // Quantity and List only
	SI, US    string         // default units of a value typed without one
	// ExtraUnits are offered by the unit picker besides those of Dim (the
	// Convert value also takes a head of the liquid in m or ft).
	ExtraUnits []string
	// Segment marks a parameter each segment of a line has too, written
	// sN.<Name>; SegLabel is its label there ("length"), SegBox its box's.
	Segment          bool
	SegLabel, SegBox string
	// SegmentOnly marks a segment's parameter with no single-run
	// counterpart (sN.z, sN.cmp): there is no bare z or cmp.
	SegmentOnly bool
	// Group is the either/or group the parameter belongs to ("" none): the
	// link holds only the chosen side's parameters.
	Group string
	// Missing says what to enter when the value is needed but absent.
	Missing string
	// Placeholder is the greyed example in an empty box.
	Placeholder string
	choices     func() []Choice
}

// Table lists every parameter in the order Encode writes them; segment
// parameters (sN.…) follow the single run's.
var Table = []Param{
	{Name: "view", Label: "view", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"balance", "Balance"}, {"convert", "Convert"}, {"regime", "Run and sizes"},
			{"line", "Line"}, {"pump", "Pump"}, {"report", "Report"}, {"book", "Site book"}}
	}},
	{Name: "units", Label: "unit system", Kind: KindChoice, choices: func() []Choice { return []Choice{{"si", "SI"}, {"us", "US"}} }},
	{Name: "name", Label: "sheet title", Box: "Sheet title", Hint: "(site, equipment, date)", Kind: KindText},

	{Name: "liq", Label: "liquid", Box: "Liquid", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"water", "Water"}, {"seawater", "Seawater or brine"}, {"eg", "Ethylene glycol in water"},
			{"pg", "Propylene glycol in water"}, {"custom", "Other liquid (typed properties)"}}
	}},
	grp(q("gly", "glycol share by mass", "Glycol share", "(% by mass)", calc.Dimensionless, "%", "%", "enter the glycol share of the mix, e.g. 30 % by mass"), "gly"),
	grp(q("glyv", "glycol share by volume", "Glycol share", "(% by volume, glycol and water measured apart)", calc.Dimensionless, "%", "%", "enter the glycol share of the mix by volume, e.g. 30 %"), "gly"),
	q("t", "temperature", "Temperature", "", calc.Temperature, "°C", "°F", "enter the liquid temperature"),
	q("rho", "density", "Density", "", calc.Density, "kg/m³", "lb/ft³", "enter the liquid's density"),
	q("mu", "viscosity", "Viscosity", "(dynamic)", calc.DynamicViscosity, "mPa·s", "cP", "enter the liquid's dynamic viscosity"),
	q("pv", "vapour pressure", "Vapour pressure", "(absolute)", calc.Pressure, "kPa", "psi", "enter the liquid's vapour pressure (absolute; 0 if negligible)"),
	grp(q("alt", "site altitude", "Site altitude", "(above sea level)", calc.Length, "m", "ft", "enter the site altitude"), "site"),
	grp(q("baro", "barometer", "Barometer", "(absolute)", calc.Pressure, "kPa", "psi", "enter the barometer reading"), "site"),
	q("pl", "line pressure", "Line pressure", "(blank: mean of the points, else the site)", calc.Pressure, "kPa", "psi", "enter the pressure in the line"),
	ref("plref", "gauge/absolute of the line pressure"),

	q("p1", "pressure at 1", "Pressure", "", calc.Pressure, "kPa", "psi", "enter the pressure at point 1 (0 for a surface open to the air)"),
	ref("p1ref", "gauge/absolute at 1"),
	q("z1", "elevation of 1", "Elevation", "", calc.Length, "m", "ft", "enter the elevation of point 1"),
	grp(q("v1", "velocity at 1", "Mean velocity", "(0 at a tank surface)", calc.Velocity, "m/s", "ft/s", "enter the velocity at point 1 (0 for a large tank surface), or its diameter"), "pt1"),
	grp(q("d1", "diameter at 1", "Inside diameter", "(velocity = flow ÷ area)", calc.Length, "mm", "in", "enter the inside diameter at point 1"), "pt1"),
	q("p2", "pressure at 2", "Pressure", "", calc.Pressure, "kPa", "psi", "enter the pressure at point 2 (0 for a surface open to the air)"),
	ref("p2ref", "gauge/absolute at 2"),
	q("z2", "elevation of 2", "Elevation", "", calc.Length, "m", "ft", "enter the elevation of point 2"),
	grp(q("v2", "velocity at 2", "Mean velocity", "(0 at a tank surface)", calc.Velocity, "m/s", "ft/s", "enter the velocity at point 2 (0 for a large tank surface), or its diameter"), "pt2"),
	grp(q("d2", "diameter at 2", "Inside diameter", "(velocity = flow ÷ area)", calc.Length, "mm", "in", "enter the inside diameter at point 2"), "pt2"),

	grp(q("q", "flow", "Flow", "", calc.Flow, "L/s", "gpm", "enter the flow, or the heat load it carries"), "qby"),
	q("hp", "pump head", "Pump head", "(added; blank if none)", calc.Length, "m", "ft", "enter the pump head (0 if there is no pump)"),
	q("ht", "turbine head", "Turbine head", "(taken; blank if none)", calc.Length, "m", "ft", "enter the turbine head (0 if there is no turbine)"),
	grp(q("hf", "friction head", "Friction head", "(all losses, 1 to 2)", calc.Length, "m", "ft", "enter the friction head, or describe the pipe run to compute it"), "fric"),
	{Name: "solve", Label: "solve for", Kind: KindChoice, choices: func() []Choice {
		return []Choice{
			{"hp", "pump head"}, {"ht", "turbine head"}, {"hf", "friction head"},
			{"p1", "pressure at 1"}, {"p2", "pressure at 2"},
			{"z1", "elevation of 1"}, {"z2", "elevation of 2"}, {"q", "flow"},
		}
	}},
	{Name: "alpha", Label: "α", Box: "Kinetic-energy factor α", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"auto", "from the regime (2 laminar, 1 turbulent)"}, {"1", "1 everywhere"}, {"pl", "power-law profile estimate"}}
	}},

	seg(grp(q("l", "length of the run", "Length of the run", "", calc.Length, "m", "ft", "enter the length of the pipe run"), "fric"), "length", "Length"),
	seg(grp(q("d", "inside diameter", "Inside diameter", "", calc.Length, "mm", "in", "enter the inside diameter, or pick a nominal size and schedule"), "pipe"), "inside diameter", ""),
	seg(grp(Param{Name: "nps", Label: "nominal size", Box: "Nominal size", Kind: KindChoice, choices: npsChoices}, "pipe"), "nominal size", ""),
	seg(grp(Param{Name: "sch", Label: "schedule", Box: "Schedule or class", Kind: KindChoice, choices: schChoices}, "pipe"), "schedule", ""),
	seg(grp(Param{Name: "mat", Label: "material", Box: "Material", Kind: KindChoice, choices: matChoices}, "rough"), "material", ""),
	seg(grp(q("eps", "roughness", "Absolute roughness", "", calc.Length, "mm", "in", "enter the roughness, or pick a material"), "rough"), "roughness", ""),
	seg(Param{Name: "fit", Label: "fittings", Box: "Fittings", Kind: KindFittings, choices: fitChoices}, "fittings", ""),
	seg(Param{Name: "k", Label: "extra ΣK", Box: "Extra loss coefficient ΣK", Hint: "(optional)", Kind: KindNumber}, "extra ΣK", ""),
	{Name: "fm", Label: "friction method", Box: "Friction factor method", Kind: KindChoice, choices: func() []Choice {
		return []Choice{
			{calc.MethodColebrook.String(), "Colebrook–White"},
			{calc.MethodSwameeJain.String(), "Swamee–Jain (explicit)"},
			{calc.MethodHaaland.String(), "Haaland (explicit)"},
			{calc.MethodHazenWilliams.String(), "Hazen–Williams (water)"},
		}
	}},
	{Name: "chw", Label: "Hazen–Williams C", Box: "Hazen–Williams C", Hint: "(blank: from the material)", Kind: KindNumber},
	{Name: "z", Label: "end elevation", Kind: KindQuantity, Dim: calc.Length, SI: "m", US: "ft",
		Segment: true, SegmentOnly: true, SegLabel: "elevation of its end", SegBox: "Elevation at its end"},
	{Name: "cmp", Label: "components", Kind: KindText, Segment: true, SegmentOnly: true, SegLabel: "components",
		SegBox: "Components", Hint: "(optional: name:drop@flow or name:cv25 / name:kv40, comma separated)",
		Placeholder: "chiller:45kPa@12L/s, valve:kv40"},

	// The Run view: which run it shows, and its sizing table's class and
	// marks (the marks' defaults are calc.DefaultSizingLimits, common
	// practice).
	{Name: "rseg", Label: "run shown", Box: "Run shown", Kind: KindChoice, choices: rsegChoices},
	{Name: "szsch", Label: "pipe class to size across", Box: "Sizes from", Hint: "(blank: the run's own class)", Kind: KindChoice, choices: schChoices,
		Missing: "pick the pipe class whose sizes the table compares"},
	q("vlo", "velocity band, low end", "Velocity band from", "", calc.Velocity, "m/s", "ft/s", "enter the low end of the velocity band"),
	q("vhi", "velocity band, high end", "to", "", calc.Velocity, "m/s", "ft/s", "enter the high end of the velocity band"),
	{Name: "grad", Label: "loss gradient limit", Box: "Friction loss at most", Hint: "(head per 100 of pipe length)", Kind: KindNumber},

	{Name: "cv", Label: "value to convert", Box: "Pressure, water column or head", Kind: KindQuantity, Dim: calc.Pressure,
		SI: "kPa", US: "psi", ExtraUnits: []string{"m", "ft"}, Missing: "enter a value to convert"},
	ref("cvref", "gauge/absolute"),

	list("pq", "data-sheet flows", calc.Flow, "L/s", "gpm", "enter the data-sheet flows, e.g. 0,20,40,55,70L/s"),
	list("ph", "data-sheet heads", calc.Length, "m", "ft", "enter the data-sheet heads, one per flow, e.g. 62,59,52,44,33m"),
	list("peff", "data-sheet efficiencies", calc.Dimensionless, "%", "%", "enter the data-sheet efficiencies, one per flow"),
	grp(list("pnpsh", "data-sheet NPSH required", calc.Length, "m", "ft", "enter the data-sheet NPSH required, one per flow"), "npsh"),
	{Name: "spd", Label: "speed", Box: "Speed", Hint: "(% of the data sheet's, rpm, or drive Hz; blank: 100 %)", Kind: KindQuantity,
		Dim: calc.Dimensionless, SI: "%", US: "%", ExtraUnits: []string{"rpm", "Hz"}, Missing: "enter the speed as a share of the data sheet's, in rpm, or as the drive's frequency in Hz"},
	q("nrat", "rated speed", "Rated speed", "(the data sheet's; optional)", calc.Frequency, "rpm", "rpm", "enter the data sheet's speed in rpm"),
	q("fmains", "mains frequency", "Mains frequency", "(the rated speed's supply; optional)", calc.Frequency, "Hz", "Hz", "enter the mains frequency the rated speed is given at (50 or 60 Hz)"),
	grp(q("qsp", "flow to reach by speed", "Flow to reach by a speed change", "(on this line; optional)", calc.Flow, "L/s", "gpm", "enter the flow the speed should give"), "spfor"),
	grp(q("hsp", "head to reach by speed", "Head to reach by a speed change", "(on this line; optional)", calc.Length, "m", "ft", "enter the head the speed should give"), "spfor"),
	{Name: "pumps", Label: "pumps working together", Box: "Pumps working together", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"1", "one pump"}, {"2p", "two in parallel"}, {"2s", "two in series"},
			{"3p", "three in parallel"}, {"3s", "three in series"}}
	}},
	q("zp", "pump centreline elevation", "Pump centreline elevation", "(for NPSH)", calc.Length, "m", "ft", "enter the pump centreline elevation"),
	{Name: "pafter", Label: "pump position on the line", Box: "Pump position", Hint: "(for the profile and the suction side of NPSH)", Kind: KindNumber},
	grp(q("npshr", "NPSH required (typed)", "NPSH required", "(at the operating flow)", calc.Length, "m", "ft", "enter the NPSH required"), "npsh"),
	q("hs", "suction loss (typed)", "Suction loss", "(typed; blank: from the segments before the pump)", calc.Length, "m", "ft", "enter the head lost between the source and the pump inlet"),

	q("ps", "suction gauge reading", "Suction gauge", "(reading)", calc.Pressure, "kPa", "psi", "enter the gauge reading"),
	q("pd", "discharge gauge reading", "Discharge gauge", "(reading)", calc.Pressure, "kPa", "psi", "enter the gauge reading"),
	q("zs", "suction gauge height", "Suction gauge height", "", calc.Length, "m", "ft", "enter the suction gauge's height"),
	q("zd", "discharge gauge height", "Discharge gauge height", "(same datum)", calc.Length, "m", "ft", "enter the discharge gauge's height"),
	grp(q("ds", "pipe diameter at the suction gauge", "Pipe inside diameter at the suction gauge", "", calc.Length, "mm", "in", "enter the pipe's inside diameter at the suction gauge"), "gsp"),
	grp(Param{Name: "dsn", Label: "pipe size at the suction gauge", Box: "Nominal size at the suction gauge", Kind: KindChoice, choices: npsChoices}, "gsp"),
	grp(Param{Name: "dss", Label: "pipe schedule at the suction gauge", Box: "Schedule or class", Kind: KindChoice, choices: schChoices}, "gsp"),
	grp(q("dd", "pipe diameter at the discharge gauge", "Pipe inside diameter at the discharge gauge", "", calc.Length, "mm", "in", "enter the pipe's inside diameter at the discharge gauge"), "gdp"),
	grp(Param{Name: "ddn", Label: "pipe size at the discharge gauge", Box: "Nominal size at the discharge gauge", Kind: KindChoice, choices: npsChoices}, "gdp"),
	grp(Param{Name: "dds", Label: "pipe schedule at the discharge gauge", Box: "Schedule or class", Kind: KindChoice, choices: schChoices}, "gdp"),
	q("qm", "measured flow", "Measured flow", "", calc.Flow, "L/s", "gpm", "enter the measured flow"),
	q("pin", "motor electrical input", "Motor electrical input", "(power meter; optional)", calc.Power, "kW", "kW", "enter the motor's electrical input"),
	q("etam", "motor efficiency", "Motor efficiency", "(nameplate; optional)", calc.Dimensionless, "%", "%", "enter the motor's efficiency"),
	q("gcs", "suction gauge accuracy class", "Suction gauge class", "(EN 837-1, ± % of span; optional)", calc.Dimensionless, "%", "%", "enter the suction gauge's accuracy class, e.g. 1.6%"),
	q("gss", "suction gauge span", "Suction gauge span", "(full scale less the scale's start)", calc.Pressure, "kPa", "psi", "enter the suction gauge's span, e.g. 600kPa for −100 to 500 kPa"),
	q("gcd", "discharge gauge accuracy class", "Discharge gauge class", "(EN 837-1, ± % of span; optional)", calc.Dimensionless, "%", "%", "enter the discharge gauge's accuracy class, e.g. 1.0%"),
	q("gsd", "discharge gauge span", "Discharge gauge span", "(full scale less the scale's start)", calc.Pressure, "kPa", "psi", "enter the discharge gauge's span, e.g. 1000kPa for 0 to 10 bar"),
	q("uqm", "flow meter accuracy", "Flow meter accuracy", "(± % of reading; optional)", calc.Dimensionless, "%", "%", "enter the flow meter's accuracy in % of reading"),
	q("upin", "power meter accuracy", "Power meter accuracy", "(± % of reading; optional)", calc.Dimensionless, "%", "%", "enter the power meter's accuracy in % of reading"),
	q("uz", "gauge height accuracy", "Gauge heights known to", "(± each; optional)", calc.Length, "mm", "in", "enter how well each gauge's height is known"),
	{Name: "grade", Label: "acceptance grade", Box: "Acceptance grade", Hint: "(ISO 9906; factors from memory)", Kind: KindChoice, choices: gradeChoices},
	// A test at several points (pumptests.go): readings 2 to
	// calc.TestMaxReadings, each a flow, two gauges and the motor's
	// input, taken with the instruments above; reading 1 is qm, ps, pd
	// and pin. Then the guarantee point the test is judged against.
	rq(2), rps(2), rpd(2), rpin(2),
	rq(3), rps(3), rpd(3), rpin(3),
	rq(4), rps(4), rpd(4), rpin(4),
	rq(5), rps(5), rpd(5), rpin(5),
	rq(6), rps(6), rpd(6), rpin(6),
	rq(7), rps(7), rpd(7), rpin(7),
	rq(8), rps(8), rpd(8), rpin(8),
	q("qg", "guarantee flow", "Guarantee flow", "(blank: the duty flow)", calc.Flow, "L/s", "gpm", "enter the guaranteed flow"),
	q("hg", "guarantee head", "Guarantee head", "(blank: the data sheet's at that flow)", calc.Length, "m", "ft", "enter the guaranteed head"),
	q("etag", "guarantee efficiency", "Guarantee efficiency", "(pump alone; blank: the data sheet's)", calc.Dimensionless, "%", "%", "enter the guaranteed efficiency of the pump alone"),
	{Name: "tag", Label: "pump tag", Box: "Pump tag", Hint: "(e.g. BS-3 P1; sheets of one tag make its history)", Kind: KindText, Placeholder: "BS-3 P1"},
	{Name: "hours", Label: "running hours per year", Box: "Running hours per year", Hint: "(optional, for a yearly cost)", Kind: KindNumber},
	{Name: "tariff", Label: "energy tariff per kWh", Box: "Energy tariff per kWh", Hint: "(any currency; optional)", Kind: KindNumber},
	q("etat", "turbine-and-generator efficiency", "Turbine-and-generator efficiency", "", calc.Dimensionless, "%", "%", "enter the turbine-and-generator efficiency"),

	// Surge on a fast closure at point 2 (calc.Surge): a closure time asks for it.
	q("tc", "valve closing time", "Valve closing time", "(at point 2; for a surge estimate)", calc.Duration, "s", "s", "enter the time the valve takes to close"),
	q("dv", "velocity stopped", "Velocity stopped", "(blank: the whole flow velocity)", calc.Velocity, "m/s", "ft/s", "enter the change of velocity at the valve"),
	q("wall", "wall thickness", "Wall thickness", "(blank: from the size picked)", calc.Length, "mm", "in", "enter the pipe's wall thickness"),
	q("epipe", "wall's elastic modulus", "Wall's elastic modulus", "(blank: from the material)", calc.Pressure, "GPa", "ksi", "enter the elastic modulus of the pipe wall"),
	q("kliq", "liquid's bulk modulus", "Liquid's bulk modulus", "(blank for water and seawater)", calc.Pressure, "GPa", "ksi", "enter the liquid's bulk modulus"),
	{Name: "cr", Label: "restraint factor", Box: "Restraint factor c", Hint: "(blank: 1, expansion joints throughout)", Kind: KindNumber},

	// Heating and cooling loops (loop.go, heat.go, valve.go): a closed
	// loop's switch and its static pressure, the flow from a heat load,
	// the control valves' circuit, and a seawater or brine's salinity.
	{Name: "loop", Label: "kind of line", Box: "The line is", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"0", "between two points"}, {"1", "a closed loop"}}
	}},
	q("pexp", "loop's static pressure", "Static pressure of the loop", "(where the expansion vessel or pressurisation unit connects; for NPSH and the valves)",
		calc.Pressure, "kPa", "psi", "enter the loop's static pressure where its expansion vessel or pressurisation unit connects"),
	ref("pexpref", "gauge/absolute of the loop's static pressure"),
	q("zexp", "elevation of the vessel's connection", "Elevation of that connection", "(same datum as the pump's)", calc.Length, "m", "ft",
		"enter the elevation where the expansion vessel or pressurisation unit connects"),
	grp(q("load", "heat load", "Heat load", "(heating or cooling)", calc.Power, "kW", "Btu/h", "enter the heating or cooling load the flow carries"), "qby"),
	q("tsup", "supply temperature", "Supply temperature", "(to the load)", calc.Temperature, "°C", "°F", "enter the supply temperature (the liquid going to the load)"),
	q("tret", "return temperature", "Return temperature", "(from the load)", calc.Temperature, "°C", "°F", "enter the return temperature (the liquid coming back from the load)"),
	q("dpc", "drop of the valve's circuit", "Drop of the circuit the valves control", "(blank: the rest of the line)", calc.Pressure, "kPa", "psi",
		"enter the pressure drop of the circuit whose flow the valve varies, without the valve"),
	{Name: "sal", Label: "salinity", Box: "Salinity", Hint: "(g/kg, absolute; blank: 35)", Kind: KindNumber},

	// The values kept as typed though they look like slips (slips.go).
	{Name: KeepParam, Label: "values kept as typed", Kind: KindText},
}

func q(name, label, box, hint string, dim calc.Dimension, si, us, missing string) Param {
	return Param{Name: name, Label: label, Box: box, Hint: hint, Kind: KindQuantity, Dim: dim, SI: si, US: us, Missing: missing}
}

func list(name, label string, dim calc.Dimension, si, us, missing string) Param {
	return Param{Name: name, Label: label, Kind: KindList, Dim: dim, SI: si, US: us, Missing: missing}
}

func ref(name, label string) Param {
	return Param{Name: name, Label: label, Kind: KindChoice, choices: func() []Choice { return []Choice{{"g", "gauge"}, {"a", "absolute"}} }}
}

func grp(p Param, group string) Param { p.Group = group; return p }

func seg(p Param, label, box string) Param {
	p.Segment, p.SegLabel, p.SegBox = true, label, box
	if box == "" {
		p.SegBox = p.Box
	}
	return p
}

func npsChoices() []Choice {
	var out []Choice
	seen := map[string]bool{}
	for _, p := range calc.PipeSizes() {
		if !seen[p.NPS] {
			seen[p.NPS] = true
			out = append(out, Choice{p.NPS, p.NPS})
		}
	}
	return out
}

// schChoices are the classes of every pipe catalogue, each named with its
// catalogue and standard, so that one list never mixes notations unsaid.
func schChoices() []Choice {
	var out []Choice
	for _, c := range calc.Catalogues() {
		for _, class := range c.Classes {
			out = append(out, Choice{class, c.Name + ", " + ClassName(c.Key, class) + " (" + c.Standard + ")"})
		}
	}
	return out
}

// ClassName writes a catalogue's class as its trade writes it:
// "schedule 40", "type L", "SDR 11", "class K9".
func ClassName(catalogue, class string) string {
	switch catalogue {
	case "steel", "ss":
		return "schedule " + class
	case "copper":
		return "type " + class
	case "pe":
		return strings.Replace(class, "SDR", "SDR ", 1)
	case "di":
		return "class " + class
	case "pvc":
		if strings.HasPrefix(class, "PVC-SDR") {
			return "SDR " + strings.TrimPrefix(class, "PVC-SDR")
		}
		return "schedule " + strings.TrimPrefix(class, "PVC")
	}
	return class
}

// gradeChoices are ISO 9906's acceptance grades with their head and
// efficiency tolerances (from memory), each written to at most three
// significant digits: 0.07·100 is 7.000000000000001 in binary floating
// point, and a label shows the tolerance, not the arithmetic.
func gradeChoices() []Choice {
	pct := func(share float64) string {
		t := strconv.FormatFloat(math.Abs(share*100), 'g', 3, 64)
		if share < 0 {
			t = "−" + t
		}
		return t + " %"
	}
	var out []Choice
	for _, g := range calc.Grades {
		eff := "η not below the guarantee"
		if g.EffLow < 0 {
			eff = "η " + pct(g.EffLow)
		}
		head := "H ±" + pct(g.HeadHigh)
		if g.HeadLow == 0 {
			head = "H 0 to +" + pct(g.HeadHigh)
		}
		out = append(out, Choice{g.Name, "grade " + g.Name + ": " + head + ", " + eff + " (" + g.Use + ")"})
	}
	return out
}

// rsegChoices are the runs the Run view can show: a segment of the line
// by number (blank: the single run, or segment 1).
func rsegChoices() []Choice {
	out := make([]Choice, MaxSegments)
	for i := range out {
		n := strconv.Itoa(i + 1)
		out[i] = Choice{n, "segment " + n}
	}
	return out
}

func matChoices() []Choice {
	var out []Choice
	for _, m := range calc.MaterialTable() {
		out = append(out, Choice{m.Key, m.Name})
	}
	return out
}

func fitChoices() []Choice {
	var out []Choice
	for _, f := range calc.FittingTable() {
		out = append(out, Choice{f.Key, f.Name})
	}
	return out
}

// byName indexes Table.
var byName = func() map[string]*Param {
	m := make(map[string]*Param, len(Table))
	for i := range Table {
		m[Table[i].Name] = &Table[i]
	}
	return m
}()

// Lookup returns the description of a parameter; a segment's parameter
// ("s3.d") is described by its row ("d") with the segment's labels. ok is
// false for a name that is not in the vocabulary.
func Lookup(name string) (p Param, seg int, ok bool) {
	if n, f := splitSegment(name); n > 0 {
		r, found := byName[f]
		if !found || !r.Segment || n > MaxSegments {
			return Param{}, 0, false
		}
		p = *r
		p.Name, p.Label, p.Box = name, "segment "+strconv.Itoa(n)+" "+r.SegLabel, r.SegBox
		if f == "z" {
			p.Missing = "enter the elevation of the end of segment " + strconv.Itoa(n)
		}
		return p, n, true
	}
	r, found := byName[name]
	if !found || r.SegmentOnly {
		return Param{}, 0, false
	}
	return *r, 0, true
}

// SegmentOf splits a segment's parameter "s3.d" into 3 and "d"; n is 0
// for any other name.
func SegmentOf(name string) (n int, field string) { return splitSegment(name) }

// splitSegment splits "s3.d" into 3 and "d"; n is 0 for any other name.
func splitSegment(name string) (n int, field string) {
	if len(name) < 4 || name[0] != 's' {
		return 0, ""
	}
	num, f, ok := strings.Cut(name[1:], ".")
	if !ok || num == "" || num[0] == '0' || len(num) > 3 {
		return 0, ""
	}
	for _, c := range num {
		if c < '0' || c > '9' {
			return 0, ""
		}
	}
	n, _ = strconv.Atoi(num)
	return n, f
}

// Label names a parameter in words ("flow", "segment 2 length"); an
// unknown name is returned as it is.
func Label(name string) string {
	if p, _, ok := Lookup(name); ok {
		return p.Label
	}
	return name
}

// Params lists every parameter of the vocabulary but the segments' in the
// order Encode writes them.
var Params = func() []string {
	var out []string
	for _, p := range Table {
		if !p.SegmentOnly {
			out = append(out, p.Name)
		}
	}
	return out
}()

// SegmentFields are the per-segment parameters: segment N's are written
// sN.l, sN.d, … (N from 1 to MaxSegments). They mean what the single-run
// parameters of the same name mean; sN.z is the elevation of the
// segment's end.
var SegmentFields = func() []string {
	var out []string
	for _, p := range Table {
		if p.Segment {
			out = append(out, p.Name)
		}
	}
	return out
}()

// MaxSegments is the most pipe segments a line may have.
const MaxSegments = calc.MaxSegments

// SegmentParam returns the name of field f of segment n (1-based).
func SegmentParam(n int, f string) string { return "s" + strconv.Itoa(n) + "." + f }

// AllParams lists every parameter a sheet may hold, in link order: the
// vocabulary's and every segment's.
func AllParams() []string { return append([]string(nil), allParams...) }

// allParams is AllParams, built once.
var allParams = func() []string {
	out := make([]string, 0, len(known))
	for k := range known {
		out = append(out, k)
	}
	sortByLink(out)
	return out
}()

// Group is an either/or choice of inputs: a value given one way or
// another. The link holds only the parameters of the side in use, so it
// never carries a value that is silently ignored.
type Group struct {
	Key   string
	Label string // the switch's label
	Sides []Side // the first is the default
}

// Side is one way of giving a group's value.
type Side struct {
	Key, Label string
	Params     []string
}

// Groups lists the either/or groups. A segment's group is written with the
// segment's prefix ("s2.pipe") and holds the segment's parameters.
var Groups = []Group{
	{"pt1", "Speed of the liquid here, from", []Side{{"v", "velocity", []string{"v1"}}, {"d", "inside diameter", []string{"d1"}}}},
	{"pt2", "Speed of the liquid here, from", []Side{{"v", "velocity", []string{"v2"}}, {"d", "inside diameter", []string{"d2"}}}},
	{"fric", "Friction head between the points", []Side{{"run", "from the pipe run", []string{"l"}}, {"hf", "typed in", []string{"hf"}}}},
	{"pipe", "Pipe given by", []Side{{"nps", "nominal size", []string{"nps", "sch"}}, {"d", "inside diameter", []string{"d"}}}},
	{"rough", "Wall roughness from", []Side{{"mat", "material", []string{"mat"}}, {"eps", "roughness", []string{"eps"}}}},
	{"gly", "Glycol share given", []Side{{"m", "by mass", []string{"gly"}}, {"v", "by volume", []string{"glyv"}}}},
	{"site", "Site pressure from", []Side{{"alt", "altitude", []string{"alt"}}, {"baro", "barometer", []string{"baro"}}}},
	{"gsp", "Pipe at the suction gauge given by", []Side{{"d", "inside diameter", []string{"ds"}}, {"nps", "nominal size", []string{"dsn", "dss"}}}},
	{"gdp", "Pipe at the discharge gauge given by", []Side{{"d", "inside diameter", []string{"dd"}}, {"nps", "nominal size", []string{"ddn", "dds"}}}},
	{"spfor", "Speed change to reach", []Side{{"q", "a flow", []string{"qsp"}}, {"h", "a head", []string{"hsp"}}}},
	{"npsh", "NPSH required", []Side{{"sheet", "from the data sheet", []string{"pnpsh"}}, {"typed", "typed in", []string{"npshr"}}}},
	{"qby", "Flow given as", []Side{{"q", "a flow", []string{"q"}}, {"load", "a heat load", []string{"load"}}}},
}

// LookupGroup returns a group by key; "s2.pipe" is the pipe group of
// segment 2, with that segment's parameters.
// Groups are looked up on every reading and every edit: the segments'
// are made once, on first use, and shared (callers must not change them).
func LookupGroup(key string) (Group, bool) {
	groupsOnce.Do(func() {
		groupIndex = map[string]Group{}
		for _, g := range Groups {
			groupIndex[g.Key] = g
			if !isSegmentGroup(g) {
				continue
			}
			for i := 1; i <= MaxSegments; i++ {
				if sg, ok := makeGroup(SegmentParam(i, g.Key)); ok {
					groupIndex[sg.Key] = sg
				}
			}
		}
	})
	g, ok := groupIndex[key]
	return g, ok
}

var (
	groupsOnce sync.Once
	groupIndex map[string]Group
)

// makeGroup builds the group of key, a segment's from the table's row.
func makeGroup(key string) (Group, bool) {
	n, base := splitSegment(key)
	if n == 0 {
		base = key
	}
	for _, g := range Groups {
		if g.Key != base {
			continue
		}
		if n == 0 {
			return g, true
		}
		out := Group{Key: key, Label: g.Label}
		for _, sd := range g.Sides {
			ns := Side{Key: sd.Key, Label: sd.Label}
			for _, p := range sd.Params {
				ns.Params = append(ns.Params, SegmentParam(n, p))
			}
			out.Sides = append(out.Sides, ns)
		}
		return out, true
	}
	return Group{}, false
}

// CurrentSide is the side of group g a scenario uses: the one whose
// parameters it holds (the first such when both sides are held, which Read
// reports as a problem on each), else chosen (when it names a side), else
// the default. Read resolves groups by the same rule (sideOf).
func (s Scenario) CurrentSide(g Group, chosen string) string {
	if side, _ := s.sideOf(g); side != "" {
		return side
	}
	for _, sd := range g.Sides {
		if sd.Key == chosen {
			return chosen
		}
	}
	return g.Sides[0].Key
}
