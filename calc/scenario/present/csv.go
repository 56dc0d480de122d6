package present

import (
	"math"
	"strconv"
	"strings"
	"unicode"
	"unicode/utf8"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The results table: one row per sheet for the office, as the site book
// saves it and `-eval` writes it. Its rule for units: one unit system for
// the whole table, chosen when it is saved (SI or US customary), never
// the open sheet's; every figure's column names its unit in the header
// row, so a column holds one unit whatever units each sheet is kept in,
// and a spreadsheet can sort, sum and compare it. The sheet's own units
// are a column of their own.

// csvKind says what a column holds.
type csvKind uint8

const (
	csvText   csvKind = iota // words, or a figure with its own words
	csvNumber                // a plain number, no unit
	csvFigure                // a quantity in the column's unit
)

// csvColumn is one column of the results table: its head, the result
// family it belongs to, the unit its figures are in (by the display unit
// of a parameter or a dimension) and how a sheet fills it.
type csvColumn struct {
	head  string
	part  scenario.Part // the result it reads; 0 for the sheet itself
	or    scenario.Part // another result it reads, when part is not held
	kind  csvKind
	param string         // figures in this parameter's display unit…
	dim   calc.Dimension // …or in this dimension's, when param is ""
	// unitNote replaces the unit's symbol in the head ("% points").
	unitNote string
	// One of num, text and value fills the cell (plain functions, so the
	// table is data the linker lays out, not start-up code): num gives a
	// figure (SI), absent when ok is false; text a text, "" leaving the
	// cell empty; value either, given the column's unit u for a text that
	// quotes figures.
	num   func(r *scenario.Result) (v float64, ok bool)
	text  func(r *scenario.Result) string
	value func(r *scenario.Result, u calc.Unit) (v float64, text string, ok bool)
}

// get fills the cell: its figure (SI) or its text, ok false when empty.
func (c csvColumn) get(r *scenario.Result, u calc.Unit) (float64, string, bool) {
	switch {
	case c.num != nil:
		v, ok := c.num(r)
		return v, "", ok
	case c.text != nil:
		t := c.text(r)
		return 0, t, t != ""
	}
	return c.value(r, u)
}

// yesNo words a flag.
func yesNo(b bool) string {
	if b {
		return "yes"
	}
	return "no"
}

// theRun is the run a sheet shows: the Run view's, else the single run.
func theRun(r *scenario.Result) *scenario.RunResult {
	if r.RunView != nil && r.RunView.Run != nil {
		return r.RunView.Run
	}
	return r.Run
}

// worstHighPoint is the high point to report: the first where the column
// breaks, else the one whose grade line lies furthest below the crown.
func worstHighPoint(r *scenario.Result) *calc.HighPoint {
	if r.Balance == nil || len(r.Balance.HighPoints) == 0 {
		return nil
	}
	hps := r.Balance.HighPoints
	best := 0
	for i, hp := range hps {
		if hp.Breaks {
			return &hps[i]
		}
		if hp.BelowCrown > hps[best].BelowCrown {
			best = i
		}
	}
	return &hps[best]
}

// sizingRows are the sizing table's row of the run's own size and its
// smallest size that fits; nil when there is none.
func sizingRows(r *scenario.Result) (here, fits *calc.SizingRow) {
	if r.RunView == nil || r.RunView.Sizing == nil || r.RunView.Run == nil {
		return nil, nil
	}
	rows := r.RunView.Sizing.Rows
	for i := range rows {
		if here == nil && sameBore(rows[i].Pipe.ID, r.RunView.Run.Diameter) {
			here = &rows[i]
		}
		if fits == nil && rows[i].Fits() {
			fits = &rows[i]
		}
	}
	return here, fits
}

// speedIn is the speed for a duty in rpm (f, the rated speed) or as the
// drive's frequency (the mains).
func speedIn(f func(pr *scenario.PumpResult) float64) func(*scenario.Result) (float64, bool) {
	return func(r *scenario.Result) (float64, bool) {
		if r.Pump == nil || r.Pump.SpeedFor == nil || f(r.Pump) <= 0 {
			return 0, false
		}
		return r.Pump.SpeedFor.Ratio * f(r.Pump), true
	}
}

// csvColumns are the columns of the results table, by result family:
// every scenario.Part has at least one (TestResultsCSVEveryPart).
var csvColumns = []csvColumn{
	// The sheet.
	{head: "title", text: func(r *scenario.Result) string { return r.Inputs.Choice("name") }},
	{head: "pump tag", text: func(r *scenario.Result) string { return r.Inputs.Choice("tag") }},
	{head: "sheet's own units", text: func(r *scenario.Result) string { return map[bool]string{true: "US", false: "SI"}[r.US] }},

	// The liquid and the site.
	{head: "liquid", part: scenario.PartLiquid, text: func(r *scenario.Result) string {
		if r.Fluid == nil {
			return ""
		}
		if g := r.Glycol; g != nil {
			return g.Glycol.String() + " " + glyPercent(g.MassFraction) + " by mass"
		}
		if l := r.Inputs.Choice("liq"); l != "" {
			return l
		}
		return "water"
	}},
	{head: "temperature", part: scenario.PartLiquid, kind: csvFigure, param: "t", num: func(r *scenario.Result) (float64, bool) {
		return r.Fluid.Temperature, r.Fluid.Temperature > 0
	}},
	{head: "density", part: scenario.PartLiquid, kind: csvFigure, param: "rho", num: func(r *scenario.Result) (float64, bool) { return r.Fluid.Density, true }},
	{head: "site pressure, absolute", part: scenario.PartSite, kind: csvFigure, param: "baro", num: func(r *scenario.Result) (float64, bool) {
		// Shown when a result used it: alone it is the default of a sheet
		// with nothing worked out yet.
		for _, p := range scenario.Parts() {
			if p != scenario.PartSite && r.Worked(p) {
				return r.SitePressure, true
			}
		}
		return 0, false
	}},

	// The balance.
	{head: "flow", part: scenario.PartBalance, kind: csvFigure, param: "q", num: func(r *scenario.Result) (float64, bool) { return r.Balance.Q, true }},
	{head: "solved for", part: scenario.PartBalance, text: func(r *scenario.Result) string { return scenario.Label(r.Balance.Solve.String()) }},
	{head: "pump head", part: scenario.PartBalance, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Balance.PumpHead, true }},
	{head: "turbine head", part: scenario.PartBalance, kind: csvFigure, param: "ht", num: func(r *scenario.Result) (float64, bool) { return r.Balance.TurbineHead, true }},
	{head: "friction and fittings", part: scenario.PartBalance, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) { return r.Balance.FrictionHead, true }},
	{head: "pump hydraulic power", part: scenario.PartBalance, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) { return r.Balance.PumpPower, true }},
	{head: "high point: segment", part: scenario.PartBalance, text: func(r *scenario.Result) string {
		if hp := worstHighPoint(r); hp != nil {
			return strconv.Itoa(hp.Segment)
		}
		return ""
	}},
	{head: "high point: distance from point 1", part: scenario.PartBalance, kind: csvFigure, param: "l", num: func(r *scenario.Result) (float64, bool) {
		if hp := worstHighPoint(r); hp != nil {
			return hp.Distance, true
		}
		return 0, false
	}},
	{head: "high point: grade line below the pipe crown", part: scenario.PartBalance, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) {
		if hp := worstHighPoint(r); hp != nil && !hp.Breaks {
			return hp.BelowCrown, true
		}
		return 0, false
	}},
	{head: "high point: column breaks", part: scenario.PartBalance, text: func(r *scenario.Result) string {
		if hp := worstHighPoint(r); hp != nil {
			return yesNo(hp.Breaks)
		}
		return ""
	}},
	{head: "largest flow the line carries full", part: scenario.PartBalance, kind: csvFigure, param: "q", value: func(r *scenario.Result, _ calc.Unit) (float64, string, bool) {
		br := r.Balance
		hp := worstHighPoint(r)
		switch {
		case hp == nil || !hp.Breaks:
			return 0, "", false
		case br.FullFlowKnown:
			return br.FullFlow, "", true
		case br.FullFlowErr != nil:
			return 0, "not found", true
		}
		return 0, "none: the column breaks even with no flow", true
	}},

	// The line of segments.
	{head: "line losses", part: scenario.PartLine, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) { return r.Line.TotalLoss, true }},
	{head: "component drops, total", part: scenario.PartLine, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) {
		return r.Line.ComponentLoss, hasComponents(r.Line)
	}},
	{head: "component drops, each", part: scenario.PartLine, kind: csvText, param: "hf", value: func(r *scenario.Result, u calc.Unit) (float64, string, bool) {
		var parts []string
		for i, s := range r.Line.Segments {
			for _, c := range s.Components {
				parts = append(parts, "segment "+strconv.Itoa(i+1)+" "+c.Name+": "+csvNumberText(u.FromSI(c.Head)))
			}
		}
		return 0, strings.Join(parts, "; "), len(parts) > 0
	}},

	// Loops: the heat the flow carries, the control valves.
	{head: "line kind", part: scenario.PartBalance, text: func(r *scenario.Result) string {
		if r.Inputs.IsLoop() {
			return "closed loop"
		}
		return "two points"
	}},
	{head: "heat load carried", part: scenario.PartHeat, kind: csvFigure, param: "load", num: func(r *scenario.Result) (float64, bool) { return r.Heat.Load, true }},
	{head: "flow carrying the load", part: scenario.PartHeat, kind: csvFigure, param: "q", num: func(r *scenario.Result) (float64, bool) { return r.Heat.Flow, true }},
	{head: "control valves: authority, each", part: scenario.PartValves, text: func(r *scenario.Result) string {
		parts := make([]string, 0, len(r.Valves))
		for _, v := range r.Valves {
			parts = append(parts, "segment "+strconv.Itoa(v.Segment)+" "+v.Name+": "+csvNumberText(v.Authority.N))
		}
		return strings.Join(parts, "; ")
	}},
	{head: "control valves: choked or cavitating", part: scenario.PartValves, text: func(r *scenario.Result) string {
		var parts []string
		for _, v := range r.Valves {
			switch {
			case v.Check == nil:
				parts = append(parts, v.Name+": not checked")
			case v.Check.Choked:
				parts = append(parts, v.Name+": choked")
			case v.Check.Cavitation:
				parts = append(parts, v.Name+": cavitating")
			default:
				parts = append(parts, v.Name+": neither")
			}
		}
		return strings.Join(parts, "; ")
	}},

	// The run and its sizing.
	{head: "run: velocity", part: scenario.PartRun, or: scenario.PartRunView, kind: csvFigure, dim: calc.Velocity, num: func(r *scenario.Result) (float64, bool) { return theRun(r).Velocity, true }},
	{head: "run: Reynolds number", part: scenario.PartRun, or: scenario.PartRunView, kind: csvNumber, num: func(r *scenario.Result) (float64, bool) { return theRun(r).Reynolds, true }},
	{head: "run: regime", part: scenario.PartRun, or: scenario.PartRunView, text: func(r *scenario.Result) string { return theRun(r).Regime.String() }},
	{head: "run: friction factor", part: scenario.PartRun, or: scenario.PartRunView, kind: csvNumber, num: func(r *scenario.Result) (float64, bool) { return theRun(r).Friction, true }},
	{head: "run: friction and fittings", part: scenario.PartRun, or: scenario.PartRunView, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) { return theRun(r).TotalLoss, true }},
	{head: "run shown: segment", part: scenario.PartRunView, text: func(r *scenario.Result) string {
		if r.RunView.Segment > 0 {
			return strconv.Itoa(r.RunView.Segment)
		}
		return ""
	}},
	{head: "sizing: pipe class", part: scenario.PartSizing, text: func(r *scenario.Result) string {
		sz := r.RunView.Sizing
		return sz.Catalogue.Name + ", " + scenario.ClassName(sz.Catalogue.Key, sz.Class)
	}},
	{head: "sizing: this run's size fits", part: scenario.PartSizing, text: func(r *scenario.Result) string {
		here, _ := sizingRows(r)
		switch {
		case here == nil:
			return "not in the class"
		case here.Err != nil:
			return "not worked out"
		}
		return yesNo(here.Fits())
	}},
	// A head per 100 of pipe's length is the same number in m per 100 m
	// and ft per 100 ft.
	{head: "sizing: this run's pipe friction, head per 100 of pipe", part: scenario.PartSizing, kind: csvNumber, num: func(r *scenario.Result) (float64, bool) {
		if here, _ := sizingRows(r); here != nil && here.Err == nil {
			return here.Gradient * 100, true
		}
		return 0, false
	}},
	{head: "sizing: smallest size that fits", part: scenario.PartSizing, text: func(r *scenario.Result) string {
		if _, fits := sizingRows(r); fits != nil {
			return sizeName(fits.Pipe)
		}
		return "none"
	}},
	{head: "sizing: loss of the run in that size", part: scenario.PartSizing, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) {
		if _, fits := sizingRows(r); fits != nil {
			return fits.Run.TotalLoss, true
		}
		return 0, false
	}},

	// The pump on the line.
	{head: "pump speed used", part: scenario.PartPump, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) { return r.Pump.Speed, true }},
	{head: "operating flow", part: scenario.PartOperating, kind: csvFigure, param: "q", num: func(r *scenario.Result) (float64, bool) { return r.Pump.Operating.Q, true }},
	{head: "operating head", part: scenario.PartOperating, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Pump.Operating.H, true }},
	{head: "pump efficiency at the operating point", part: scenario.PartOperating, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) {
		return r.Pump.Operating.Eff, r.Pump.Operating.Eff > 0
	}},
	{head: "shaft power at the operating point", part: scenario.PartOperating, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) {
		return r.Pump.Operating.ShaftPower, r.Pump.Operating.ShaftPower > 0
	}},
	{head: "speed for the duty", part: scenario.PartSpeedFor, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) { return r.Pump.SpeedFor.Ratio, true }},
	{head: "speed for the duty", part: scenario.PartSpeedFor, kind: csvFigure, param: "nrat", num: speedIn(func(pr *scenario.PumpResult) float64 { return pr.Rated })},
	{head: "drive frequency for the duty", part: scenario.PartSpeedFor, kind: csvFigure, param: "fmains", num: speedIn(func(pr *scenario.PumpResult) float64 { return pr.Mains })},
	{head: "duty: flow", part: scenario.PartSpeedFor, kind: csvFigure, param: "q", num: func(r *scenario.Result) (float64, bool) { return r.Pump.SpeedFor.Q, true }},
	{head: "duty: head the line needs", part: scenario.PartSpeedFor, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Pump.SpeedFor.H, true }},

	// NPSH.
	{head: "NPSH available", part: scenario.PartNPSH, kind: csvFigure, param: "npshr", num: func(r *scenario.Result) (float64, bool) { return r.NPSH.Available, true }},
	{head: "NPSH required", part: scenario.PartNPSH, kind: csvFigure, param: "npshr", num: func(r *scenario.Result) (float64, bool) {
		return r.NPSH.Required, r.NPSH.Level != calc.NPSHUnrated
	}},
	{head: "NPSH margin", part: scenario.PartNPSH, kind: csvFigure, param: "npshr", num: func(r *scenario.Result) (float64, bool) {
		return r.NPSH.Margin, r.NPSH.Level != calc.NPSHUnrated
	}},
	{head: "NPSH verdict", part: scenario.PartNPSH, text: func(r *scenario.Result) string { return npshWord(r.NPSH.Level) }},

	// The field check, its bands and its verdict.
	{head: "measured flow", part: scenario.PartField, kind: csvFigure, param: "qm", num: func(r *scenario.Result) (float64, bool) { return r.Field.Q, true }},
	{head: "measured pump head", part: scenario.PartField, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Field.Head, true }},
	{head: "measured hydraulic power", part: scenario.PartField, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) { return r.Field.HydraulicPower, true }},
	{head: "wire-to-water efficiency", part: scenario.PartField, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) {
		return r.Field.Efficiency, r.Field.Efficiency > 0
	}},
	{head: "head below (−) or above the data sheet", part: scenario.PartField, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) {
		return r.Field.Deviation, r.Field.HasCurve
	}},
	{head: "pump efficiency from the readings", part: scenario.PartPumpAlone, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) { return r.Field.PumpEfficiency, true }},
	{head: "shaft power from the readings", part: scenario.PartPumpAlone, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) { return r.Field.ShaftPower, true }},
	{head: "± measured flow", part: scenario.PartBands, kind: csvFigure, param: "qm", num: func(r *scenario.Result) (float64, bool) { return r.FieldBands.Flow.U, true }},
	{head: "± measured pump head", part: scenario.PartBands, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.FieldBands.Head.U, true }},
	{head: "± measured hydraulic power", part: scenario.PartBands, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) { return r.FieldBands.Power.U, true }},
	{head: "± wire-to-water efficiency", part: scenario.PartBands, kind: csvFigure, param: "peff", unitNote: "% points", num: func(r *scenario.Result) (float64, bool) {
		return r.FieldBands.Wire.U, r.Field != nil && r.Field.Efficiency > 0
	}},
	{head: "± pump efficiency", part: scenario.PartBands, kind: csvFigure, param: "peff", unitNote: "% points", num: func(r *scenario.Result) (float64, bool) {
		return r.FieldBands.Pump.U, r.Field != nil && r.Field.PumpEfficiency > 0
	}},
	{head: "acceptance grade", part: scenario.PartAcceptance, text: func(r *scenario.Result) string { return r.Acceptance.Grade.Name }},
	{head: "acceptance verdict", part: scenario.PartAcceptance, text: func(r *scenario.Result) string { return r.Acceptance.Verdict.String() }},
	{head: "acceptance: head allowed, low", part: scenario.PartAcceptance, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Acceptance.Head.Low, true }},
	{head: "acceptance: head allowed, high", part: scenario.PartAcceptance, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) { return r.Acceptance.Head.High, true }},
	{head: "acceptance: pump efficiency allowed, at least", part: scenario.PartAcceptance, kind: csvFigure, param: "peff", num: func(r *scenario.Result) (float64, bool) {
		return r.Acceptance.Efficiency.Low, r.Acceptance.Efficiency.Verdict != calc.VerdictNone
	}},

	// Energy.
	// The test at several points and its guarantee verdict.
	{head: "test: readings", part: scenario.PartTest, kind: csvNumber, num: func(r *scenario.Result) (float64, bool) { return float64(len(r.Test.Points)), true }},
	{head: "test: lowest flow", part: scenario.PartTest, kind: csvFigure, param: "qm", num: func(r *scenario.Result) (float64, bool) { return r.Test.MinFlow(), true }},
	{head: "test: highest flow", part: scenario.PartTest, kind: csvFigure, param: "qm", num: func(r *scenario.Result) (float64, bool) { return r.Test.MaxFlow(), true }},
	{head: "test: largest head shortfall from the data sheet", part: scenario.PartTest, kind: csvFigure, param: "hp", num: func(r *scenario.Result) (float64, bool) {
		return r.Test.Sheet.Head.Short, r.Test.HasSheet
	}},
	{head: "test: flow of the largest head shortfall", part: scenario.PartTest, kind: csvFigure, param: "qm", num: func(r *scenario.Result) (float64, bool) {
		return r.Test.Sheet.Head.Flow, r.Test.HasSheet
	}},
	{head: "test: largest pump efficiency shortfall", part: scenario.PartTest, kind: csvFigure, param: "peff", unitNote: "% points", num: func(r *scenario.Result) (float64, bool) {
		return r.Test.Sheet.Eff.Short, r.Test.HasSheet && r.Test.Sheet.HasEff
	}},
	{head: "guarantee: flow", part: scenario.PartGuarantee, kind: csvFigure, param: "qg", num: func(r *scenario.Result) (float64, bool) { return r.Guarantee.Guarantee.Q, true }},
	{head: "guarantee: head", part: scenario.PartGuarantee, kind: csvFigure, param: "hg", num: func(r *scenario.Result) (float64, bool) { return r.Guarantee.Guarantee.H, true }},
	{head: "guarantee: pump efficiency", part: scenario.PartGuarantee, kind: csvFigure, param: "etag", num: func(r *scenario.Result) (float64, bool) {
		return r.Guarantee.Guarantee.Eff, r.Guarantee.Guarantee.Eff > 0
	}},
	{head: "guarantee: grade", part: scenario.PartGuarantee, text: func(r *scenario.Result) string { return r.Guarantee.Grade.Name }},
	{head: "guarantee: flow and head verdict", part: scenario.PartGuarantee, text: func(r *scenario.Result) string { return r.Guarantee.FlowHead.String() }},
	{head: "guarantee: pump efficiency where the curve meets the origin line", part: scenario.PartGuarantee, kind: csvFigure, param: "etag", num: func(r *scenario.Result) (float64, bool) {
		e := r.Guarantee.Efficiency
		return e.Value, e.Status == calc.EffRead
	}},
	{head: "guarantee: verdict", part: scenario.PartGuarantee, text: func(r *scenario.Result) string { return r.Guarantee.Verdict.String() }},

	{head: "energy per volume pumped", part: scenario.PartEnergy, kind: csvFigure, dim: calc.SpecificEnergy, num: func(r *scenario.Result) (float64, bool) { return r.Energy.PerVolume, true }},
	{head: "energy per volume and head", part: scenario.PartEnergy, kind: csvFigure, dim: calc.SpecificEnergyHead, num: func(r *scenario.Result) (float64, bool) { return r.Energy.PerVolumeHead, true }},
	{head: "energy basis", part: scenario.PartEnergy, text: func(r *scenario.Result) string {
		if r.Energy.Measured {
			return "measured input"
		}
		return "operating point"
	}},
	{head: "yearly cost (tariff's currency)", part: scenario.PartEnergy, kind: csvNumber, num: func(r *scenario.Result) (float64, bool) {
		return r.Energy.YearCost, r.Energy.YearCost > 0
	}},

	// The turbine.
	{head: "turbine net head", part: scenario.PartTurbine, kind: csvFigure, param: "ht", num: func(r *scenario.Result) (float64, bool) { return r.Turbine.NetHead, true }},
	{head: "turbine output", part: scenario.PartTurbine, kind: csvFigure, dim: calc.Power, num: func(r *scenario.Result) (float64, bool) { return r.Turbine.Power, true }},

	// Surge.
	{head: "surge: wave speed", part: scenario.PartSurge, kind: csvFigure, dim: calc.Velocity, num: func(r *scenario.Result) (float64, bool) { return r.Surge.WaveSpeed, true }},
	{head: "surge: wave round trip", part: scenario.PartSurge, kind: csvFigure, param: "tc", num: func(r *scenario.Result) (float64, bool) { return r.Surge.Period, true }},
	{head: "surge: closure", part: scenario.PartSurge, text: func(r *scenario.Result) string {
		if r.Surge.Fast {
			return "fast, within 2L/a: the full rise"
		}
		return "slower than 2L/a: the rise is an upper bound"
	}},
	{head: "surge: Joukowsky pressure rise", part: scenario.PartSurge, kind: csvFigure, dim: calc.Pressure, num: func(r *scenario.Result) (float64, bool) { return r.Surge.DeltaP, true }},
	{head: "surge: Joukowsky rise as head", part: scenario.PartSurge, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) { return r.Surge.DeltaH, true }},
	{head: "surge: peak pressure at point 2 (static + rise), gauge", part: scenario.PartSurge, kind: csvFigure, dim: calc.Pressure, num: func(r *scenario.Result) (float64, bool) {
		return r.Surge.Peak, r.Surge.StaticKnown
	}},
	{head: "surge: low swing reaches the vapour pressure", part: scenario.PartSurge, text: func(r *scenario.Result) string {
		if !r.Surge.StaticKnown {
			return "not known: no static pressure at the valve"
		}
		return yesNo(r.Surge.ColumnParts)
	}},

	// Convert.
	{head: "converted: gauge pressure", part: scenario.PartConvert, kind: csvFigure, dim: calc.Pressure, num: func(r *scenario.Result) (float64, bool) { return r.Convert.Gauge, true }},
	{head: "converted: absolute pressure", part: scenario.PartConvert, kind: csvFigure, dim: calc.Pressure, num: func(r *scenario.Result) (float64, bool) { return r.Convert.Absolute, true }},
	{head: "converted: head of the liquid", part: scenario.PartConvert, kind: csvFigure, param: "hf", num: func(r *scenario.Result) (float64, bool) {
		return r.Convert.Head, r.Fluid != nil
	}},
}

// hasComponents reports whether a segment of the line has components.
func hasComponents(lr *calc.LineResult) bool {
	for _, s := range lr.Segments {
		if len(s.Components) > 0 {
			return true
		}
	}
	return false
}

// npshWord is the NPSH verdict in a word or two for a cell.
func npshWord(l calc.NPSHLevel) string {
	switch l {
	case calc.NPSHOK:
		return "adequate"
	case calc.NPSHCaution:
		return "caution: small margin"
	case calc.NPSHDanger:
		return "danger: cavitates"
	}
	return "no NPSH required given"
}

// csvNumberText writes a figure of the table: six significant digits.
func csvNumberText(v float64) string { return calc.FormatNumber(v, 6) }

// problemList names the inputs a sheet has problems with, among those its
// results need (sheetProblems).
func problemList(r *scenario.Result) string {
	var names []string
	for _, p := range sheetProblems(r) {
		names = append(names, scenario.Label(p))
	}
	return strings.Join(names, "; ")
}

// sheetProblems lists the parameters in error that a sheet's results need,
// in the table's order of parameters. A problem with a value typed is
// always listed. One with a value not given (missing) is listed only when
// a result that reads it was begun: some input it reads is given and read
// by no result the sheet has, nor by one held back only by a bad value.
// So a sheet of NPSH alone, whose points and liquid the balance reads too,
// lists none of the balance's missing inputs, while a balance begun with
// a second point lists what it lacks.
func sheetProblems(r *scenario.Result) []string {
	in := &r.Inputs
	// The parts that account for their inputs: those the sheet has, and
	// those that lack nothing (a bad value holds them back).
	accounted := map[string]bool{}
	uses := map[scenario.Part][]string{}
	for _, p := range scenario.Parts() {
		uses[p] = in.Uses(p)
		complete := true
		for _, q := range uses[p] {
			if fe := r.Errors[q]; fe != nil && !in.Given(q) {
				complete = false
			}
		}
		if r.Worked(p) || complete {
			for _, q := range uses[p] {
				accounted[q] = true
			}
		}
	}
	begun := map[string]bool{} // the inputs of the parts begun
	for _, p := range scenario.Parts() {
		started := false
		for _, q := range uses[p] {
			if in.Given(q) && !accounted[q] && q != "view" {
				started = true
			}
		}
		if started {
			for _, q := range uses[p] {
				begun[q] = true
			}
		}
	}
	var out []string
	for _, p := range scenario.AllParams() {
		if r.Errors[p] != nil && (in.Given(p) || begun[p]) {
			out = append(out, p)
		}
	}
	return out
}

// unit is the unit of a column's figures in the table's unit system.
func (c csvColumn) unit(us bool) calc.Unit {
	switch {
	case c.param != "":
		return displayUnit(c.param, us)
	case c.kind == csvFigure:
		return calc.DefaultUnit(c.dim, us)
	}
	return calc.Unit{Factor: 1}
}

// ResultsCSV writes the results table of sheets: a UTF-8 byte-order mark
// (spreadsheets then read °, ±, − and the titles right), a header row,
// then one row per sheet in the order given — when it was last edited,
// its results by family and the problems its results have — with figures
// in the display units of one unit system for the whole table (us: US
// customary, else SI), each named in its column's head; the sheet's
// signed link is the last column. A figure a sheet does not have is left
// empty. The page's export and `-eval` both write it.
func ResultsCSV(sheets []scenario.KeptSheet, us bool) string {
	var b strings.Builder
	b.WriteString("\uFEFF")
	head := make([]string, 0, len(csvColumns)+4)
	head = append(head, csvColumns[0].head, "edited (UTC)")
	units := make([]calc.Unit, len(csvColumns))
	for i, c := range csvColumns {
		units[i] = c.unit(us)
		if i == 0 {
			continue
		}
		h := c.head
		switch {
		case c.unitNote != "":
			h += " (" + c.unitNote + ")"
		case c.param != "" || c.kind == csvFigure:
			h += " (" + units[i].Symbol + ")"
		}
		head = append(head, h)
	}
	head = append(head, "problems", "link")
	writeCSV(&b, head)
	for _, k := range sheets {
		r := scenario.Evaluate(scenario.Read(k.Scen))
		row := make([]string, 0, len(head))
		edited := ""
		if !k.Edited.IsZero() {
			edited = k.Edited.UTC().Format("2006-01-02 15:04:05")
		}
		for i, c := range csvColumns {
			if c.part != 0 && !r.Worked(c.part) && (c.or == 0 || !r.Worked(c.or)) {
				row = append(row, "")
			} else {
				row = append(row, c.cell(&r, units[i]))
			}
			if i == 0 {
				row = append(row, edited)
			}
		}
		row = append(row, problemList(&r), k.Scen.Sign())
		writeCSV(&b, row)
	}
	return b.String()
}

// cell writes a column's cell for result r in unit u.
func (c csvColumn) cell(r *scenario.Result, u calc.Unit) string {
	v, text, ok := c.get(r, u)
	switch {
	case !ok:
		return ""
	case text != "" || c.kind == csvText:
		return text
	case math.IsNaN(v) || math.IsInf(v, 0):
		return "" // never reached: results are finite (TestBadInputs)
	case c.kind == csvNumber:
		return csvNumberText(v)
	}
	return csvNumberText(u.FromSI(v))
}

// writeCSV writes one record as encoding/csv's Writer does with its
// defaults (comma, "\n" after each record; a field quoted when it holds
// a comma, a quote, a line break or starts with a space, or is \.),
// without that package and bufio in the wasm.
func writeCSV(b *strings.Builder, fields []string) {
	for i, f := range fields {
		if i > 0 {
			b.WriteByte(',')
		}
		if !csvNeedsQuotes(f) {
			b.WriteString(f)
			continue
		}
		b.WriteByte('"')
		b.WriteString(strings.ReplaceAll(f, `"`, `""`))
		b.WriteByte('"')
	}
	b.WriteByte('\n')
}

func csvNeedsQuotes(f string) bool {
	if f == "" {
		return false
	}
	if f == `\.` || strings.ContainsAny(f, ",\"\r\n") {
		return true
	}
	r, _ := utf8.DecodeRuneInString(f)
	return unicode.IsSpace(r)
}
