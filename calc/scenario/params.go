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
	// units narrows the unit picker to the units a value of this kind is
	// given in (the zero value: those of a reading); a value typed or
	// linked in any other unit of Dim is still read.
	units unitRange
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
// parameters (sN.…) follow the single run's. A row without a Kind is a
// quantity (KindQuantity is the zero Kind). The rows are plain values, no
// calls, so that the compiler lays the table out as data: built by calls
// at start-up it was 48 KB of init code in the wasm.
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
	{Name: "gly", Label: "glycol share by mass", Box: "Glycol share", Hint: "(% by mass)", Dim: calc.Dimensionless, SI: "%", US: "%", Group: "gly", Missing: "enter the glycol share of the mix, e.g. 30 % by mass"},
	{Name: "glyv", Label: "glycol share by volume", Box: "Glycol share", Hint: "(% by volume, glycol and water measured apart)", Dim: calc.Dimensionless, SI: "%", US: "%", Group: "gly", Missing: "enter the glycol share of the mix by volume, e.g. 30 %"},
	{Name: "t", Label: "temperature", Box: "Temperature", Dim: calc.Temperature, SI: "°C", US: "°F", Missing: "enter the liquid temperature"},
	{Name: "rho", Label: "density", Box: "Density", Dim: calc.Density, SI: "kg/m³", US: "lb/ft³", Missing: "enter the liquid's density"},
	{Name: "mu", Label: "viscosity", Box: "Viscosity", Hint: "(dynamic)", Dim: calc.DynamicViscosity, SI: "mPa·s", US: "cP", Missing: "enter the liquid's dynamic viscosity"},
	{Name: "pv", Label: "vapour pressure", Box: "Vapour pressure", Hint: "(absolute)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the liquid's vapour pressure (absolute; 0 if negligible)"},
	{Name: "alt", Label: "site altitude", Box: "Site altitude", Hint: "(above sea level)", Dim: calc.Length, SI: "m", US: "ft", Group: "site", Missing: "enter the site altitude"},
	{Name: "baro", Label: "barometer", Box: "Barometer", Hint: "(absolute)", Dim: calc.Pressure, SI: "kPa", US: "psi", Group: "site", Missing: "enter the barometer reading"},
	{Name: "pl", Label: "line pressure", Box: "Line pressure", Hint: "(blank: mean of the points, else the site)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the pressure in the line"},
	{Name: "plref", Label: "gauge/absolute of the line pressure", Kind: KindChoice, choices: refChoices},

	{Name: "p1", Label: "pressure at 1", Box: "Pressure", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the pressure at point 1 (0 for a surface open to the air)"},
	{Name: "p1ref", Label: "gauge/absolute at 1", Kind: KindChoice, choices: refChoices},
	{Name: "z1", Label: "elevation of 1", Box: "Elevation", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the elevation of point 1"},
	{Name: "v1", Label: "velocity at 1", Box: "Mean velocity", Hint: "(0 at a tank surface)", Dim: calc.Velocity, SI: "m/s", US: "ft/s", Group: "pt1", Missing: "enter the velocity at point 1 (0 for a large tank surface), or its diameter"},
	{Name: "d1", Label: "diameter at 1", Box: "Inside diameter", Hint: "(velocity = flow ÷ area)", Dim: calc.Length, SI: "mm", US: "in", Group: "pt1", Missing: "enter the inside diameter at point 1"},
	{Name: "p2", Label: "pressure at 2", Box: "Pressure", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the pressure at point 2 (0 for a surface open to the air)"},
	{Name: "p2ref", Label: "gauge/absolute at 2", Kind: KindChoice, choices: refChoices},
	{Name: "z2", Label: "elevation of 2", Box: "Elevation", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the elevation of point 2"},
	{Name: "v2", Label: "velocity at 2", Box: "Mean velocity", Hint: "(0 at a tank surface)", Dim: calc.Velocity, SI: "m/s", US: "ft/s", Group: "pt2", Missing: "enter the velocity at point 2 (0 for a large tank surface), or its diameter"},
	{Name: "d2", Label: "diameter at 2", Box: "Inside diameter", Hint: "(velocity = flow ÷ area)", Dim: calc.Length, SI: "mm", US: "in", Group: "pt2", Missing: "enter the inside diameter at point 2"},

	{Name: "q", Label: "flow", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Group: "qby", Missing: "enter the flow, or the heat load it carries"},
	{Name: "hp", Label: "pump head", Box: "Pump head", Hint: "(added; blank if none)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the pump head (0 if there is no pump)"},
	{Name: "ht", Label: "turbine head", Box: "Turbine head", Hint: "(taken; blank if none)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the turbine head (0 if there is no turbine)"},
	{Name: "hf", Label: "friction head", Box: "Friction head", Hint: "(all losses, 1 to 2)", Dim: calc.Length, SI: "m", US: "ft", Group: "fric", Missing: "enter the friction head, or describe the pipe run to compute it"},
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

	{Name: "l", Label: "length of the run", Box: "Length of the run", Dim: calc.Length, units: unitsDistance, SI: "m", US: "ft", Segment: true, SegLabel: "length", SegBox: "Length", Group: "fric", Missing: "enter the length of the pipe run"},
	{Name: "d", Label: "inside diameter", Box: "Inside diameter", Dim: calc.Length, SI: "mm", US: "in", Segment: true, SegLabel: "inside diameter", SegBox: "Inside diameter", Group: "pipe", Missing: "enter the inside diameter, or pick a nominal size and schedule"},
	{Name: "nps", Label: "nominal size", Box: "Nominal size", Kind: KindChoice, Segment: true, SegLabel: "nominal size", SegBox: "Nominal size", Group: "pipe", choices: npsChoices},
	{Name: "sch", Label: "schedule", Box: "Schedule or class", Kind: KindChoice, Segment: true, SegLabel: "schedule", SegBox: "Schedule or class", Group: "pipe", choices: schChoices},
	{Name: "mat", Label: "material", Box: "Material", Kind: KindChoice, Segment: true, SegLabel: "material", SegBox: "Material", Group: "rough", choices: matChoices},
	{Name: "eps", Label: "roughness", Box: "Absolute roughness", Dim: calc.Length, units: unitsFine, SI: "mm", US: "in", Segment: true, SegLabel: "roughness", SegBox: "Absolute roughness", Group: "rough", Missing: "enter the roughness, or pick a material"},
	{Name: "fit", Label: "fittings", Box: "Fittings", Kind: KindFittings, Segment: true, SegLabel: "fittings", SegBox: "Fittings", choices: fitChoices},
	{Name: "k", Label: "extra ΣK", Box: "Extra loss coefficient ΣK", Hint: "(optional)", Kind: KindNumber, Segment: true, SegLabel: "extra ΣK", SegBox: "Extra loss coefficient ΣK"},
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
	{Name: "vlo", Label: "velocity band, low end", Box: "Velocity band from", Dim: calc.Velocity, SI: "m/s", US: "ft/s", Missing: "enter the low end of the velocity band"},
	{Name: "vhi", Label: "velocity band, high end", Box: "to", Dim: calc.Velocity, SI: "m/s", US: "ft/s", Missing: "enter the high end of the velocity band"},
	{Name: "grad", Label: "loss gradient limit", Box: "Friction loss at most", Hint: "(head per 100 of pipe length)", Kind: KindNumber},

	{Name: "cv", Label: "value to convert", Box: "Pressure, water column or head", Kind: KindQuantity, Dim: calc.Pressure, units: unitsAll,
		SI: "kPa", US: "psi", ExtraUnits: []string{"m", "ft"}, Missing: "enter a value to convert"},
	{Name: "cvref", Label: "gauge/absolute", Kind: KindChoice, choices: refChoices},

	{Name: "pq", Label: "data-sheet flows", Kind: KindList, Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the data-sheet flows, e.g. 0,20,40,55,70L/s"},
	{Name: "ph", Label: "data-sheet heads", Kind: KindList, Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the data-sheet heads, one per flow, e.g. 62,59,52,44,33m"},
	{Name: "peff", Label: "data-sheet efficiencies", Kind: KindList, Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the data-sheet efficiencies, one per flow"},
	{Name: "pnpsh", Label: "data-sheet NPSH required", Kind: KindList, Dim: calc.Length, SI: "m", US: "ft", Group: "npsh", Missing: "enter the data-sheet NPSH required, one per flow"},
	{Name: "spd", Label: "speed", Box: "Speed", Hint: "(% of the data sheet's, rpm, or drive Hz; blank: 100 %)", Kind: KindQuantity,
		Dim: calc.Dimensionless, SI: "%", US: "%", ExtraUnits: []string{"rpm", "Hz"}, Missing: "enter the speed as a share of the data sheet's, in rpm, or as the drive's frequency in Hz"},
	{Name: "nrat", Label: "rated speed", Box: "Rated speed", Hint: "(the data sheet's; optional)", Dim: calc.Frequency, SI: "rpm", US: "rpm", Missing: "enter the data sheet's speed in rpm"},
	{Name: "fmains", Label: "mains frequency", Box: "Mains frequency", Hint: "(the rated speed's supply; optional)", Dim: calc.Frequency, SI: "Hz", US: "Hz", Missing: "enter the mains frequency the rated speed is given at (50 or 60 Hz)"},
	{Name: "qsp", Label: "flow to reach by speed", Box: "Flow to reach by a speed change", Hint: "(on this line; optional)", Dim: calc.Flow, SI: "L/s", US: "gpm", Group: "spfor", Missing: "enter the flow the speed should give"},
	{Name: "hsp", Label: "head to reach by speed", Box: "Head to reach by a speed change", Hint: "(on this line; optional)", Dim: calc.Length, SI: "m", US: "ft", Group: "spfor", Missing: "enter the head the speed should give"},
	{Name: "pumps", Label: "pumps working together", Box: "Pumps working together", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"1", "one pump"}, {"2p", "two in parallel"}, {"2s", "two in series"},
			{"3p", "three in parallel"}, {"3s", "three in series"}}
	}},
	{Name: "zp", Label: "pump centreline elevation", Box: "Pump centreline elevation", Hint: "(for NPSH)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the pump centreline elevation"},
	{Name: "pafter", Label: "pump position on the line", Box: "Pump position", Hint: "(for the profile and the suction side of NPSH)", Kind: KindNumber},
	{Name: "npshr", Label: "NPSH required (typed)", Box: "NPSH required", Hint: "(at the operating flow)", Dim: calc.Length, SI: "m", US: "ft", Group: "npsh", Missing: "enter the NPSH required"},
	{Name: "hs", Label: "suction loss (typed)", Box: "Suction loss", Hint: "(typed; blank: from the segments before the pump)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the head lost between the source and the pump inlet"},

	{Name: "ps", Label: "suction gauge reading", Box: "Suction gauge", Hint: "(reading)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the gauge reading"},
	{Name: "pd", Label: "discharge gauge reading", Box: "Discharge gauge", Hint: "(reading)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the gauge reading"},
	{Name: "zs", Label: "suction gauge height", Box: "Suction gauge height", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the suction gauge's height"},
	{Name: "zd", Label: "discharge gauge height", Box: "Discharge gauge height", Hint: "(same datum)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the discharge gauge's height"},
	{Name: "ds", Label: "pipe diameter at the suction gauge", Box: "Pipe inside diameter at the suction gauge", Dim: calc.Length, SI: "mm", US: "in", Group: "gsp", Missing: "enter the pipe's inside diameter at the suction gauge"},
	{Name: "dsn", Label: "pipe size at the suction gauge", Box: "Nominal size at the suction gauge", Kind: KindChoice, Group: "gsp", choices: npsChoices},
	{Name: "dss", Label: "pipe schedule at the suction gauge", Box: "Schedule or class", Kind: KindChoice, Group: "gsp", choices: schChoices},
	{Name: "dd", Label: "pipe diameter at the discharge gauge", Box: "Pipe inside diameter at the discharge gauge", Dim: calc.Length, SI: "mm", US: "in", Group: "gdp", Missing: "enter the pipe's inside diameter at the discharge gauge"},
	{Name: "ddn", Label: "pipe size at the discharge gauge", Box: "Nominal size at the discharge gauge", Kind: KindChoice, Group: "gdp", choices: npsChoices},
	{Name: "dds", Label: "pipe schedule at the discharge gauge", Box: "Schedule or class", Kind: KindChoice, Group: "gdp", choices: schChoices},
	{Name: "qm", Label: "measured flow", Box: "Measured flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the measured flow"},
	{Name: "pin", Label: "motor electrical input", Box: "Motor electrical input", Hint: "(power meter; optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input"},
	{Name: "etam", Label: "motor efficiency", Box: "Motor efficiency", Hint: "(nameplate; optional)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the motor's efficiency"},
	{Name: "gcs", Label: "suction gauge accuracy class", Box: "Suction gauge class", Hint: "(EN 837-1, ± % of span; optional)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the suction gauge's accuracy class, e.g. 1.6%"},
	{Name: "gss", Label: "suction gauge span", Box: "Suction gauge span", Hint: "(full scale less the scale's start)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge's span, e.g. 600kPa for −100 to 500 kPa"},
	{Name: "gcd", Label: "discharge gauge accuracy class", Box: "Discharge gauge class", Hint: "(EN 837-1, ± % of span; optional)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the discharge gauge's accuracy class, e.g. 1.0%"},
	{Name: "gsd", Label: "discharge gauge span", Box: "Discharge gauge span", Hint: "(full scale less the scale's start)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge's span, e.g. 1000kPa for 0 to 10 bar"},
	{Name: "uqm", Label: "flow meter accuracy", Box: "Flow meter accuracy", Hint: "(± % of reading; optional)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the flow meter's accuracy in % of reading"},
	{Name: "upin", Label: "power meter accuracy", Box: "Power meter accuracy", Hint: "(± % of reading; optional)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the power meter's accuracy in % of reading"},
	{Name: "uz", Label: "gauge height accuracy", Box: "Gauge heights known to", Hint: "(± each; optional)", Dim: calc.Length, SI: "mm", US: "in", Missing: "enter how well each gauge's height is known"},
	{Name: "grade", Label: "acceptance grade", Box: "Acceptance grade", Hint: "(ISO 9906; factors from memory)", Kind: KindChoice, choices: gradeChoices},
	// A test at several points (pumptests.go): readings 2 to
	// calc.TestMaxReadings, each a flow, two gauges and the motor's
	// input, taken with the instruments above; reading 1 is qm, ps, pd
	// and pin. Then the guarantee point the test is judged against.
	{Name: "qm2", Label: "measured flow, reading 2", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 2"}, {Name: "ps2", Label: "suction gauge, reading 2", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 2"}, {Name: "pd2", Label: "discharge gauge, reading 2", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 2"}, {Name: "pin2", Label: "motor input, reading 2", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 2"},
	{Name: "qm3", Label: "measured flow, reading 3", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 3"}, {Name: "ps3", Label: "suction gauge, reading 3", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 3"}, {Name: "pd3", Label: "discharge gauge, reading 3", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 3"}, {Name: "pin3", Label: "motor input, reading 3", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 3"},
	{Name: "qm4", Label: "measured flow, reading 4", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 4"}, {Name: "ps4", Label: "suction gauge, reading 4", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 4"}, {Name: "pd4", Label: "discharge gauge, reading 4", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 4"}, {Name: "pin4", Label: "motor input, reading 4", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 4"},
	{Name: "qm5", Label: "measured flow, reading 5", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 5"}, {Name: "ps5", Label: "suction gauge, reading 5", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 5"}, {Name: "pd5", Label: "discharge gauge, reading 5", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 5"}, {Name: "pin5", Label: "motor input, reading 5", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 5"},
	{Name: "qm6", Label: "measured flow, reading 6", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 6"}, {Name: "ps6", Label: "suction gauge, reading 6", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 6"}, {Name: "pd6", Label: "discharge gauge, reading 6", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 6"}, {Name: "pin6", Label: "motor input, reading 6", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 6"},
	{Name: "qm7", Label: "measured flow, reading 7", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 7"}, {Name: "ps7", Label: "suction gauge, reading 7", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 7"}, {Name: "pd7", Label: "discharge gauge, reading 7", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 7"}, {Name: "pin7", Label: "motor input, reading 7", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 7"},
	{Name: "qm8", Label: "measured flow, reading 8", Box: "Flow", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the flow of reading 8"}, {Name: "ps8", Label: "suction gauge, reading 8", Box: "Suction gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the suction gauge of reading 8"}, {Name: "pd8", Label: "discharge gauge, reading 8", Box: "Discharge gauge", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the discharge gauge of reading 8"}, {Name: "pin8", Label: "motor input, reading 8", Box: "Motor input", Hint: "(optional)", Dim: calc.Power, SI: "kW", US: "kW", Missing: "enter the motor's electrical input of reading 8"},
	{Name: "qg", Label: "guarantee flow", Box: "Guarantee flow", Hint: "(blank: the duty flow)", Dim: calc.Flow, SI: "L/s", US: "gpm", Missing: "enter the guaranteed flow"},
	{Name: "hg", Label: "guarantee head", Box: "Guarantee head", Hint: "(blank: the data sheet's at that flow)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the guaranteed head"},
	{Name: "etag", Label: "guarantee efficiency", Box: "Guarantee efficiency", Hint: "(pump alone; blank: the data sheet's)", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the guaranteed efficiency of the pump alone"},
	{Name: "tag", Label: "pump tag", Box: "Pump tag", Hint: "(e.g. BS-3 P1; sheets of one tag make its history)", Kind: KindText, Placeholder: "BS-3 P1"},
	{Name: "hours", Label: "running hours per year", Box: "Running hours per year", Hint: "(optional, for a yearly cost)", Kind: KindNumber},
	{Name: "tariff", Label: "energy tariff per kWh", Box: "Energy tariff per kWh", Hint: "(any currency; optional)", Kind: KindNumber},
	{Name: "etat", Label: "turbine-and-generator efficiency", Box: "Turbine-and-generator efficiency", Dim: calc.Dimensionless, SI: "%", US: "%", Missing: "enter the turbine-and-generator efficiency"},

	// Surge on a fast closure at point 2 (calc.Surge): a closure time asks for it.
	{Name: "tc", Label: "valve closing time", Box: "Valve closing time", Hint: "(at point 2; for a surge estimate)", Dim: calc.Duration, SI: "s", US: "s", Missing: "enter the time the valve takes to close"},
	{Name: "dv", Label: "velocity stopped", Box: "Velocity stopped", Hint: "(blank: the whole flow velocity)", Dim: calc.Velocity, SI: "m/s", US: "ft/s", Missing: "enter the change of velocity at the valve"},
	{Name: "wall", Label: "wall thickness", Box: "Wall thickness", Hint: "(blank: from the size picked)", Dim: calc.Length, SI: "mm", US: "in", Missing: "enter the pipe's wall thickness"},
	{Name: "epipe", Label: "wall's elastic modulus", Box: "Wall's elastic modulus", Hint: "(blank: from the material)", Dim: calc.Pressure, units: unitsModulus, SI: "GPa", US: "ksi", Missing: "enter the elastic modulus of the pipe wall"},
	{Name: "kliq", Label: "liquid's bulk modulus", Box: "Liquid's bulk modulus", Hint: "(blank for water and seawater)", Dim: calc.Pressure, units: unitsModulus, SI: "GPa", US: "ksi", Missing: "enter the liquid's bulk modulus"},
	{Name: "cr", Label: "restraint factor", Box: "Restraint factor c", Hint: "(blank: 1, expansion joints throughout)", Kind: KindNumber},
	{Name: "zv", Label: "closing valve's elevation", Box: "Elevation of the valve", Hint: "(same datum as the pump's; blank: at the pump)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the elevation of the valve that closes"},

	// Heating and cooling loops (loop.go, heat.go, valve.go): a closed
	// loop's switch and its static pressure, the flow from a heat load,
	// the control valves' circuit, and a seawater or brine's salinity.
	{Name: "loop", Label: "kind of line", Box: "The line is", Kind: KindChoice, choices: func() []Choice {
		return []Choice{{"0", "between two points"}, {"1", "a closed loop"}}
	}},
	{Name: "pexp", Label: "loop's static pressure", Box: "Static pressure of the loop", Hint: "(where the expansion vessel or pressurisation unit connects; for NPSH and the valves)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the loop's static pressure where its expansion vessel or pressurisation unit connects"},
	{Name: "pexpref", Label: "gauge/absolute of the loop's static pressure", Kind: KindChoice, choices: refChoices},
	{Name: "zexp", Label: "elevation of the vessel's connection", Box: "Elevation of that connection", Hint: "(same datum as the pump's)", Dim: calc.Length, SI: "m", US: "ft", Missing: "enter the elevation where the expansion vessel or pressurisation unit connects"},
	{Name: "load", Label: "heat load", Box: "Heat load", Hint: "(heating or cooling)", Dim: calc.Power, units: unitsAll, SI: "kW", US: "Btu/h", Group: "qby", Missing: "enter the heating or cooling load the flow carries"},
	{Name: "tsup", Label: "supply temperature", Box: "Supply temperature", Hint: "(to the load)", Dim: calc.Temperature, SI: "°C", US: "°F", Missing: "enter the supply temperature (the liquid going to the load)"},
	{Name: "tret", Label: "return temperature", Box: "Return temperature", Hint: "(from the load)", Dim: calc.Temperature, SI: "°C", US: "°F", Missing: "enter the return temperature (the liquid coming back from the load)"},
	{Name: "dpc", Label: "drop of the valve's circuit", Box: "Drop of the circuit the valves control", Hint: "(blank: the rest of the line)", Dim: calc.Pressure, SI: "kPa", US: "psi", Missing: "enter the pressure drop of the circuit whose flow the valve varies, without the valve"},
	{Name: "sal", Label: "salinity", Box: "Salinity", Hint: "(g/kg, absolute; blank: 35)", Kind: KindNumber},

	// The values kept as typed though they look like slips (slips.go).
	{Name: KeepParam, Label: "values kept as typed", Kind: KindText},
}

// refChoices are the two ways a pressure is read: gauge or absolute.
func refChoices() []Choice { return []Choice{{"g", "gauge"}, {"a", "absolute"}} }

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
	r, n, f := paramRef(name)
	if r == nil {
		return Param{}, 0, false
	}
	p = *r
	if n > 0 {
		p.Name, p.Label, p.Box = name, "segment "+strconv.Itoa(n)+" "+r.SegLabel, r.SegBox
		if f == "z" {
			p.Missing = "enter the elevation of the end of segment " + strconv.Itoa(n)
		}
	}
	return p, n, true
}

// paramRef is name's row of Table (nil for a name it lacks), with the
// segment's number and field for a segment's parameter "s3.d": what
// Lookup copies and words, found without either.
func paramRef(name string) (r *Param, seg int, field string) {
	if n, f := splitSegment(name); n > 0 {
		r, found := byName[f]
		if !found || !r.Segment || n > MaxSegments {
			return nil, 0, ""
		}
		return r, n, f
	}
	r, found := byName[name]
	if !found || r.SegmentOnly {
		return nil, 0, ""
	}
	return r, 0, ""
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
