package present

import (
	"strings"
	"unicode"
	"unicode/utf8"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// csvColumn is one column of the results table: its head, the unit its
// figures are in (by the display unit of a parameter or a dimension), and
// how a sheet fills it.
type csvColumn struct {
	head  string
	param string         // figures in this parameter's display unit…
	dim   calc.Dimension // …or in this dimension's, when param is ""
	plain bool           // a text or a plain number, no unit
	value func(s scenario.Scenario, r scenario.Result) (float64, string, bool)
}

// csvColumns are the inputs and headline results of a sheet.
var csvColumns = []csvColumn{
	{head: "title", plain: true, value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		return 0, r.Inputs.Choice("name"), true
	}},
	{head: "liquid", plain: true, value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		l := r.Inputs.Choice("liq")
		if l == "" {
			l = "water"
		}
		if g := r.Glycol; g != nil {
			l = g.Glycol.String() + " " + glyPercent(g.MassFraction) + " by mass"
		}
		return 0, l, true
	}},
	{head: "temperature", param: "t", value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Fluid == nil || r.Fluid.Temperature == 0 {
			return 0, "", false
		}
		return r.Fluid.Temperature, "", true
	}},
	{head: "site pressure, absolute", param: "baro", value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		return r.SitePressure, "", r.SitePressure > 0
	}},
	{head: "flow", param: "q", value: balance(func(b *calc.BalanceResult) float64 { return b.Q })},
	{head: "solved for", plain: true, value: func(s scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Balance == nil {
			return 0, "", false
		}
		return 0, r.Balance.Solve.String(), true
	}},
	{head: "pump head", param: "hp", value: balance(func(b *calc.BalanceResult) float64 { return b.PumpHead })},
	{head: "turbine head", param: "ht", value: balance(func(b *calc.BalanceResult) float64 { return b.TurbineHead })},
	{head: "friction and fittings", param: "hf", value: balance(func(b *calc.BalanceResult) float64 { return b.FrictionHead })},
	{head: "pump hydraulic power", dim: calc.Power, value: balance(func(b *calc.BalanceResult) float64 { return b.PumpPower })},
	{head: "operating flow", param: "q", value: operating(func(o *calc.OperatingResult) float64 { return o.Q })},
	{head: "operating head", param: "hp", value: operating(func(o *calc.OperatingResult) float64 { return o.H })},
	{head: "pump efficiency at the operating point", param: "peff", value: operating(func(o *calc.OperatingResult) float64 { return o.Eff })},
	{head: "shaft power at the operating point", dim: calc.Power, value: operating(func(o *calc.OperatingResult) float64 { return o.ShaftPower })},
	{head: "NPSH available", param: "npshr", value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.NPSH == nil {
			return 0, "", false
		}
		return r.NPSH.Available, "", true
	}},
	{head: "NPSH margin", param: "npshr", value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.NPSH == nil || r.NPSH.Level == calc.NPSHUnrated {
			return 0, "", false
		}
		return r.NPSH.Margin, "", true
	}},
	{head: "measured pump head", param: "hp", value: field(func(f *calc.FieldCheck) (float64, bool) { return f.Head, true })},
	{head: "measured flow", param: "qm", value: field(func(f *calc.FieldCheck) (float64, bool) { return f.Q, true })},
	{head: "wire-to-water efficiency", param: "peff", value: field(func(f *calc.FieldCheck) (float64, bool) { return f.Efficiency, f.Efficiency > 0 })},
	{head: "pump efficiency from the readings", param: "peff", value: field(func(f *calc.FieldCheck) (float64, bool) { return f.PumpEfficiency, f.PumpEfficiency > 0 })},
	{head: "head below (−) or above the data sheet", param: "hp", value: field(func(f *calc.FieldCheck) (float64, bool) { return f.Deviation, f.HasCurve })},
	{head: "turbine output", dim: calc.Power, value: func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Turbine == nil {
			return 0, "", false
		}
		return r.Turbine.Power, "", true
	}},
	{head: "problems", plain: true, value: func(s scenario.Scenario, r scenario.Result) (float64, string, bool) {
		return 0, problemList(r), true
	}},
}

func balance(f func(*calc.BalanceResult) float64) func(scenario.Scenario, scenario.Result) (float64, string, bool) {
	return func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Balance == nil {
			return 0, "", false
		}
		return f(r.Balance), "", true
	}
}

func operating(f func(*calc.OperatingResult) float64) func(scenario.Scenario, scenario.Result) (float64, string, bool) {
	return func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Pump == nil || r.Pump.Operating == nil {
			return 0, "", false
		}
		return f(r.Pump.Operating), "", true
	}
}

func field(f func(*calc.FieldCheck) (float64, bool)) func(scenario.Scenario, scenario.Result) (float64, string, bool) {
	return func(_ scenario.Scenario, r scenario.Result) (float64, string, bool) {
		if r.Field == nil {
			return 0, "", false
		}
		v, ok := f(r.Field)
		return v, "", ok
	}
}

// problemList names the inputs a sheet has problems with.
func problemList(r scenario.Result) string {
	var names []string
	for _, p := range scenario.AllParams() {
		if r.Errors[p] != nil {
			names = append(names, scenario.Label(p))
		}
	}
	return strings.Join(names, "; ")
}

// ResultsCSV writes one row per sheet: its inputs and headline results,
// figures in the display units of one unit system (us) named in the
// header, so that sheets in SI and in US units line up; the sheet's link
// is the last column. A figure a sheet does not have is left empty.
func ResultsCSV(sheets []scenario.Scenario, us bool) string {
	var b strings.Builder
	head := make([]string, 0, len(csvColumns)+1)
	units := make([]calc.Unit, len(csvColumns))
	for i, c := range csvColumns {
		h := c.head
		if !c.plain {
			if c.param != "" {
				units[i] = displayUnit(c.param, us)
			} else {
				units[i] = calc.DefaultUnit(c.dim, us)
			}
			h += " (" + units[i].Symbol + ")"
		}
		head = append(head, h)
	}
	head = append(head, "link")
	writeCSV(&b, head)
	for _, s := range sheets {
		r := scenario.Evaluate(scenario.Read(s))
		row := make([]string, 0, len(head))
		for i, c := range csvColumns {
			v, text, ok := c.value(s, r)
			switch {
			case !ok:
				row = append(row, "")
			case c.plain:
				row = append(row, text)
			default:
				row = append(row, calc.FormatNumber(units[i].FromSI(v), 6))
			}
		}
		row = append(row, s.Sign())
		writeCSV(&b, row)
	}
	return b.String()
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
