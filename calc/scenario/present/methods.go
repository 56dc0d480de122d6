package present

import (
	"sync"

	"fieldhead/calc"
)

// Methods name the methods behind the figures and their sources, figures
// in SI: the one list the page, the printed sheet and the README's
// "Methods and sources" use (TestREADMEMethods checks the README holds
// each line as it is here).
var Methods = methodsFor(false)

// methodsOf is the list in the sheet's units, made once and shared by
// every view model (never changed in place; its capacity is its length):
// it was worded again on every edit, and a shared list compares with the
// one on the page at once.
func methodsOf(us bool) []Method {
	if !us {
		return Methods[:len(Methods):len(Methods)]
	}
	methodsUSOnce.Do(func() {
		m := methodsFor(true)
		methodsUS = m[:len(m):len(m)]
	})
	return methodsUS
}

var (
	methodsUSOnce sync.Once
	methodsUS     []Method
)

// methodsFor is the list with its figures in the sheet's units.
func methodsFor(us bool) []Method {
	margin := minus(calc.FormatValue(calc.NPSHMarginMin, "m", 1))
	if us {
		margin = minus(calc.FormatValue(calc.NPSHMarginMin, "ft", 1))
	}
	mixTemp, mixFit, mixTop := "20 °C", "40 °C", "100 °C"
	if us {
		mixTemp, mixFit, mixTop = "68 °F", "104 °F", "212 °F"
	}
	energy := calc.DefaultUnit(calc.SpecificEnergy, us).Symbol + " and per 100 " + calc.DefaultUnit(calc.Length, us).Symbol + " of head"
	return []Method{
		{"Energy balance", "the steady-flow energy equation between the two points in head form (metres or feet of the flowing liquid); kinetic-energy factor α 2 in laminar and 1 in turbulent flow, or a power-law profile estimate on request; laminar below Re 2300, turbulent above 4000 (common practice), transitional flow flagged and bounded by both assumptions."},
		{"Friction factor", "Colebrook–White (1939), solved to a relative residual below 1e-13 by the method of Clamond (2009) and checked against the Lambert-W closed form (python3-mpmath) and python3-fluids; the explicit approximations of Swamee & Jain (1976; up to 2.83 % above Colebrook in its fitted range) and Haaland (1983); 64/Re in laminar flow; Hazen–Williams for water."},
		{"Fitting losses", "Darcy–Weisbach for pipe friction; fittings by loss coefficients K on the velocity head, by the pipe's size: valves, elbows, bends and tees by Crane TP-410 (K = n·f_T, f_T the fully turbulent friction factor of clean commercial steel of that size); threaded and mitred fittings and reduced-trim valves by the 2-K method of Hooper (1981); bends of r/d 2–6, multi-weld mitres, long-radius 45° elbows, stub-in tee branches and three-way plug valves by the 3-K method of Darby (1999, 2001), its nominal size from the schedule 40 bore; entrances and the exit by fixed values; sudden changes of diameter by Borda–Carnot; a K from the maker's data sheet may be given per fitting. Checked against python3-fluids."},
		{"Components", "a named drop at a rated flow, scaled with the square of the flow (common practice) and taken as rated on the liquid in service; a control valve by its flow coefficient at its present opening, Kv or Cv as IEC 60534-1 and ISA-75.01 define them, its drop growing with (Q/Kv)² and the liquid's relative density (the form of IEC 60534-2-1 for liquid flow that is not choked, from memory), Cv = 1.156 Kv checked against GNU units. Given the valve's FL (and xFz) from its data sheet, it is checked for choked flow (Δp ≥ FL²·(p1 − FF·pv), FF = 0.96 − 0.28·√(pv/pc)) and incipient cavitation (Δp ≥ xFz·(p1 − pv)) after IEC 60534-2-1, compared with python3-fluids, at the pressure of its segment's end plus its own drop (the valve taken last in its segment); its authority is its drop over that drop plus its circuit's (typed, or the rest of the line), judged against a quarter as a usual minimum and a half as a usual aim (common practice, from memory). Each component is a row of its own in the budget and the segment table."},
		{"Pipe roughness", "per material with its source: Farshad & Rieke (2006) for stainless steel and cement-mortar lining; the Moody (1944) chart values as python3-fluids tabulates them for cast iron, galvanized steel and drawn tubing; commercial steel, PE, PVC and concrete from memory."},
		{"Water", "density from IAPWS-IF97 (2007 revision) region 1, vapour pressure from the IF97 saturation line, viscosity from the IAPWS 2008 release, checked against the releases' verification tables and python3-iapws; seawater of 35 g/kg from Sharqawy, Lienhard & Zubair (2010), compressed to the line pressure in the ratio of pure water's IF97 densities, checked against the IAPWS 2008 seawater release (python3-iapws) and TEOS-10 (python3-gsw); density and viscosity at the line pressure (stated, else the mean of the points' pressures, else the site pressure), vapour pressure at saturation."},
		{"Glycol mixes", "ethylene and propylene glycol in water, 0–60 % by mass (a share by volume is converted: the glycol's volume over the glycol's and the water's measured apart at " + mixTemp + ", the pure glycols' densities from memory), from the mix's freezing point to " + mixTop + ": density, viscosity and freezing point from the fitted equations of Melinder (Properties of Secondary Working Fluids for Indirect Systems, IIR, 2010), whose tables run from the freezing point to " + mixFit + "; above " + mixFit + " the fits are extrapolated, with a warning (at 0 % they meet IAPWS water within 0.1 % in density and 2 % in viscosity up to " + mixTop + "); the density compressed to the line pressure in the ratio of water's IF97 densities; vapour pressure by Raoult's law, the water's mole fraction times its IF97 saturation pressure (an idealisation: the source gives none). The sums checked with python3-mpmath and, at 0 %, against python3-iapws; Raoult's law, the ideal-dilute freezing point and the share by volume checked with python3-iapws and GNU units. Commercial inhibited glycols differ from these pure mixes: the maker's data sheet governs."},
		{"Site pressure", "the ISO 2533 standard atmosphere at the site altitude, or the barometer reading."},
		{"Units", "conversion factors of NIST SP 811 (2008), Appendix B, checked against GNU units; conventional water-column units at their SP 811 values, kept apart from the head of the actual liquid."},
		{"Pipe dimensions", "each catalogue in its own notation: ASME B36.10M carbon steel and ASME B36.19M stainless (NPS, with DN), PVC to ASTM D1785 and D2241, checked row by row against python3-fluids; copper tube to ASTM B88, PE to ISO 4427 and cement-lined ductile iron to ISO 2531 with ISO 4179 linings from memory."},
		{"Sizing table", sizingMethod(us)},
		{"High points", "along the line the hydraulic grade line is compared with the pipe crown (the pipe's elevation plus half its bore) and with the vapour-pressure line at each segment's ends; neighbouring failing ends are one high point, reported once with its chainage and elevation; below the crown the pipe is under atmospheric pressure (keeping the grade line above the pipe is common practice), at the vapour pressure the column breaks, and the largest flow the line then carries full is found by Brent's method on the lowest pressure along it (checked against python3-mpmath); an absolute pressure below the vapour pressure is never printed."},
		{"Pump curve", "monotone piecewise cubic interpolation through the data-sheet points (Fritsch & Carlson 1980), never beyond them; a head that rises at low flow (a drooping curve) is accepted and its rising part flagged as unstable; the operating point is where it meets the system curve, each flow of which is solved in full."},
		{"Speed and arrangement", "the pump affinity laws; identical pumps in parallel add flow, in series add head."},
		{"NPSH margin", "NPSH available from the surface pressure, vapour pressure, suction height and suction losses; margin guidance after ANSI/HI 9.6.1 (from memory): ratio at least 1.1 and at least " + margin + "."},
		{"Field check", "pump total head from the gauge readings, the gauges' heights and the velocity heads at the gauges; wire-to-water efficiency is the hydraulic power over the measured electrical input; the pump's own efficiency over the input times the motor's efficiency; an efficiency of 1.5 % or less is refused as a fraction typed into a percentage box, pump efficiencies above 95 % and motor efficiencies above 98 % are flagged (common practice, from memory)."},
		{"Test uncertainty", "each instrument's accuracy taken as a limit: pressure gauges by accuracy class as a share of the span (EN 837-1), flow and power meters by a share of the reading, gauge heights by a length; propagated to first order and added in quadrature (the GUM's law of propagation, JCGM 100:2008, for independent inputs), checked against python3-uncertainties; the reading with the largest part is named."},
		{"Acceptance", "ISO 9906 (2012) grades 1B, 1E, 1U, 2B, 2U and 3B with their tolerance factors quoted from memory (flow / head / power / efficiency: 1U +10/+6/+10/≥0 %, 1E ±5/±3/+4/≥0 %, 1B ±5/±3/+4/−3 %, 2B ±8/±5/+8/−5 %, 2U +16/+10/+16/−5 %, 3B ±9/±7/+9/−7 %); the data sheet at the measured flow stands for the guarantee, the flow tolerance is not used for a single point; within, outside, or this test cannot tell when the band straddles a limit."},
		{"Best efficiency", "the best-efficiency point is the peak of the parabola through the data sheet's highest efficiency and its two neighbours; the preferred operating region 70–120 % of its flow after ANSI/HI 9.6.3 (from memory)."},
		{"Speed for a flow", "the affinity laws (Q ∝ n, H ∝ n²) and Brent's method for the speed at which the pumps meet the system curve at the flow asked for (or at the flow where the line needs the head asked for), checked against python3-scipy (PchipInterpolator, brentq); speed in rpm over the rated speed, or a drive's frequency over the mains frequency (an induction motor's speed follows its supply nearly in proportion, common practice)."},
		{"Energy", "energy per volume pumped, input power over flow, in " + energy + ", beside the least possible ρ·g·H (common practice); a yearly cost from running hours and a tariff."},
		{"Turbine", "output ρ·g·Q·H_net·η after the line's losses; the flow of most output by golden-section search; losses and net head as shares of the gross head; the no-flow pressure at the turbine inlet from point 1's level and pressure."},
		{"Surge", "a screening estimate for a valve closing at point 2, or in a closed loop: the wave speed of Korteweg (1878), a = √((K/ρ)/(1 + c·K·D/(E·e))), in the form of Wylie & Streeter, Fluid Transients in Systems (1993), with the restraint factor c (1 by default); the pressure rise of Joukowsky (1898/1900), Δp = ρ·a·Δv, for a closure within the wave's round trip 2L/a, an upper bound for a slower one; water's bulk modulus ρ·w² from the IAPWS-IF97 speed of sound (checked against python3-iapws), seawater's from the speed of sound of Mackenzie (1981, J. Acoust. Soc. Am. 70, 807–812; its coefficients as the National Physical Laboratory's guide to the speed of sound in sea-water prints them, checked against TEOS-10 in python3-gsw); the pipe materials' elastic moduli from memory; checked against the formulas re-computed in python3-mpmath."},
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
