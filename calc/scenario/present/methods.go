package present

import "fieldhead/calc"

// Methods name the methods behind the figures and their sources, figures
// in SI: the one list the page, the printed sheet and the README's
// "Methods and sources" use (a test checks the README names each).
var Methods = methodsFor(false)

// methodsFor is the list with its figures in the sheet's units.
func methodsFor(us bool) []Method {
	margin := calc.FormatValue(calc.NPSHMarginMin, "m", 1)
	if us {
		margin = calc.FormatValue(calc.NPSHMarginMin, "ft", 1)
	}
	return []Method{
		{"Energy balance", "steady-flow energy equation between the two points in head form (metres or feet of the flowing liquid), kinetic-energy factor α 2 in laminar and 1 in turbulent flow; Reynolds number bands 2300 and 4000 (common practice)."},
		{"Friction factor", "Colebrook–White equation, solved as in Clamond (2009); the explicit Swamee–Jain (1976) and Haaland (1983) formulas, or Hazen–Williams for water, when chosen; 64/Re in laminar flow."},
		{"Head losses", "Darcy–Weisbach for pipe friction; fittings by loss coefficients K on the velocity head; sudden changes of diameter by Borda–Carnot."},
		{"Water", "density from IAPWS-IF97 region 1, vapour pressure from IF97 eq. 30 (saturation line), viscosity from the IAPWS 2008 release; seawater of 35 g/kg from Sharqawy, Lienhard & Zubair (2010)."},
		{"Site pressure", "ISO 2533 standard atmosphere at the site altitude, or the barometer reading."},
		{"Units", "conversion factors of NIST SP 811 (2008), Appendix B."},
		{"Pipe sizes", "inside diameters from the ASME B36.10M and B36.19M dimension tables."},
		{"Pump curve", "monotone piecewise cubic interpolation through the data-sheet points (Fritsch–Carlson 1980), never beyond them; the operating point is where it meets the system curve, each flow of which is solved in full."},
		{"Speed and arrangement", "the pump affinity laws; identical pumps in parallel add flow, in series add head."},
		{"NPSH margin", "NPSH available from the surface pressure, vapour pressure, suction height and suction losses; margin guidance after ANSI/HI 9.6.1 (from memory): ratio at least 1.1 and at least " + margin + "."},
		{"Field check", "pump total head from the gauge readings, the gauges' heights and the velocity heads at the gauges; wire-to-water efficiency is the hydraulic power over the measured electrical input."},
		{"Turbine", "output ρ·g·Q·H_net·η after the line's losses; the flow of most output by golden-section search."},
	}
}

// Cautions are said on every sheet, on screen and on paper.
var Cautions = []string{
	"Lines and vessels under pressure hold stored energy: isolate and release it before you open anything.",
	"Shutting a valve fast, water hammer and cavitation can break equipment and injure people.",
	"Pumps bring rotating parts and live electrical supplies: lock out and tag out before work.",
	"A wet well is a confined space: test the air and work to your entry permit.",
	"These figures are engineering estimates from the values entered here. Local codes, the makers' instructions and the judgement of a licensed professional decide any real action.",
}
