package main

import (
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The Pump view: the data sheet, where the pump runs on the line, the NPSH
// margin, the field check from gauge readings and, for a line that feeds a
// turbine, the turbine's output.

// sheetColumn is one column of the data-sheet table: a list parameter.
type sheetColumn struct {
	param, head, name string
	optional          bool
}

var sheetColumns = []sheetColumn{
	{"pq", "Flow Q", "flow", false},
	{"ph", "Head H", "head", false},
	{"peff", "η", "efficiency", true},
	{"pnpsh", "NPSHr", "NPSH required", true},
}

// Data sheets have 3 to 8 points.
const (
	minRows = 3
	maxRows = 8
)

// listCells splits a list parameter's text into its values as typed and the
// unit written after the last one (for the column's picker); a unit the
// picker does not list stays in its cell.
func (s *sheet) listCells(p string) (cells []string, unit string) {
	text := strings.TrimSpace(s.scen.Get(p))
	if text == "" {
		return nil, ""
	}
	sep := ","
	if strings.Contains(text, ";") {
		sep = ";"
	}
	cells = strings.Split(text, sep)
	for i := range cells {
		cells[i] = strings.TrimSpace(cells[i])
	}
	last := len(cells) - 1
	cells[last], unit = s.splitForBox(p, cells[last])
	return cells, unit
}

// listUnit is the unit of a list column: as written in the link, else the
// one picked, else the default.
func (s *sheet) listUnit(p string) string {
	if _, u := s.listCells(p); u != "" {
		return u
	}
	return s.unitFor(p)
}

// sheetRows is the number of rows the data-sheet table shows.
func (s *sheet) sheetRows() int {
	n := max(minRows, s.rows)
	for _, c := range sheetColumns {
		cells, _ := s.listCells(c.param)
		n = max(n, len(cells))
	}
	return n
}

// writeList stores a column's cells as the list parameter: values joined by
// commas (semicolons when a value has a decimal comma), the column's unit
// after the last value. A column with no value at all leaves the link.
func (s *sheet) writeList(p string, cells []string, unit string) {
	empty := true
	sep := ","
	for _, c := range cells {
		if strings.TrimSpace(c) != "" {
			empty = false
		}
		if strings.Contains(c, ",") {
			sep = ";"
		}
	}
	text := ""
	if !empty {
		out := make([]string, len(cells))
		for i, c := range cells {
			out[i] = strings.TrimSpace(c)
		}
		last := len(out) - 1
		if num, u := scenario.Split(out[last]); num != "" && u == "" {
			out[last] += unit
		}
		text = strings.Join(out, sep)
	}
	_ = s.scen.Set(p, text)
	s.box[p] = text
	s.pick[p] = unit
}

// padded returns a column's cells, n long.
func (s *sheet) padded(p string, n int) []string {
	cells, _ := s.listCells(p)
	for len(cells) < n {
		cells = append(cells, "")
	}
	return cells
}

func (s *sheet) onCell(p string, row int) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("recalculating after an edit to the data sheet")
		v := ctx.JSSrc().Get("value").String()
		unit := s.listUnit(p)
		s.rows = s.sheetRows() // the rows shown stay while the lists change
		cells := s.padded(p, s.rows)
		cells[row] = v
		// Empty rows at the end are not part of the list.
		end := len(cells)
		for end > 0 && strings.TrimSpace(cells[end-1]) == "" {
			end--
		}
		s.writeList(p, cells[:end], unit)
		s.changed()
	}
}

func (s *sheet) onListUnit(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("changing a unit of the data sheet")
		u := ctx.JSSrc().Get("value").String()
		s.pick[p] = u
		cells, _ := s.listCells(p)
		if len(cells) > 0 {
			s.writeList(p, cells, u)
		}
		s.changed()
	}
}

func (s *sheet) onListText(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("recalculating after an edit to the data sheet")
		v := ctx.JSSrc().Get("value").String()
		_ = s.scen.Set(p, strings.TrimSpace(v))
		s.box[p] = v
		s.changed()
	}
}

func (s *sheet) onRowRemove(row int) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("removing a data-sheet point")
		n := s.sheetRows()
		if n <= minRows {
			return
		}
		for _, c := range sheetColumns {
			if !s.scen.Has(c.param) {
				continue
			}
			unit := s.listUnit(c.param)
			cells := s.padded(c.param, n)
			cells = append(cells[:row], cells[row+1:]...)
			for len(cells) > 0 && strings.TrimSpace(cells[len(cells)-1]) == "" {
				cells = cells[:len(cells)-1]
			}
			s.writeList(c.param, cells, unit)
		}
		s.rows = n - 1
		s.changed()
	}
}

func (s *sheet) onRowAdd(ctx app.Context, e app.Event) {
	defer s.contain("adding a data-sheet point")
	if n := s.sheetRows(); n < maxRows {
		s.rows = n + 1
	}
}

// listUnitPicker is the unit select of a data-sheet column.
func (s *sheet) listUnitPicker(p, head string) app.UI {
	cur := s.listUnit(p)
	var opts []app.UI
	found := false
	for _, u := range scenario.UnitChoices(p, s.us()) {
		if u == "" {
			continue
		}
		found = found || u == cur
		opts = append(opts, app.Option().Value(u).Selected(u == cur).Text(u))
	}
	if !found && cur != "" {
		opts = append([]app.UI{app.Option().Value(cur).Selected(true).Text(cur)}, opts...)
	}
	return app.Select().ID("unit-"+p).Class("unit").Aria("label", "unit of "+strings.ToLower(head)).
		OnChange(s.onListUnit(p)).Body(opts...)
}

// dataSheetCard is the data-sheet table: 3 to 8 rows of Q, H and, when
// given, η and NPSHr.
func (s *sheet) dataSheetCard() app.UI {
	n := s.sheetRows()
	cols := sheetColumns
	if s.current("npsh") == "typed" {
		cols = cols[:3]
	}
	head := []app.UI{app.Th().Scope("col").Text("#")}
	for _, c := range cols {
		s.shown[c.param] = true
		label := []app.UI{app.Span().Class("colname").Text(c.head)}
		if c.optional {
			label = append(label, app.Span().Class("hint").Text(" optional"))
		}
		head = append(head, app.Th().Scope("col").Body(
			app.Div().Body(label...),
			s.listUnitPicker(c.param, c.name),
		))
	}
	head = append(head, app.Th().Scope("col").Body(app.Span().Class("sr").Text("remove")))
	cells := map[string][]string{}
	for _, c := range cols {
		cells[c.param] = s.padded(c.param, n)
	}
	var rows []app.UI
	for i := 0; i < n; i++ {
		num := strconv.Itoa(i + 1)
		tr := []app.UI{app.Th().Scope("row").Text(num)}
		for _, c := range cols {
			bad := s.res.Errors[c.param] != nil
			tr = append(tr, app.Td().Body(
				app.Input().Type("text").ID("in-"+c.param+"-"+strconv.Itoa(i)).Class(classIf("box cell", bad, "bad")).
					Attr("inputmode", "decimal").Attr("autocomplete", "off").Attr("spellcheck", "false").
					Aria("label", c.name+", point "+num).Aria("invalid", bad).
					Value(cells[c.param][i]).OnInput(s.onCell(c.param, i), app.EventScope(c.param, i)),
			))
		}
		tr = append(tr, app.Td().Body(
			app.Button().Type("button").Class("step").ID("row-del-"+num).Aria("label", "remove point "+num).
				Disabled(n <= minRows).Text("✕").OnClick(s.onRowRemove(i), app.EventScope(i)),
		))
		rows = append(rows, app.Tr().Body(tr...))
	}
	body := []app.UI{
		app.H2().Text("Pump data sheet"),
		app.P().Class("muted small").Text("Points read off the maker's curve for one pump at full speed, lowest flow first (3 to 8). Efficiency and NPSH required are optional, but give them at every point or not at all."),
		app.Div().Class("tablewrap").Body(
			app.Table().Class("grid datasheet").ID("datasheet").Body(
				app.THead().Body(app.Tr().Body(head...)),
				app.TBody().Body(rows...),
			)),
	}
	for _, c := range cols {
		body = append(body, s.fieldNotes(c.param)...)
	}
	body = append(body, app.Button().Type("button").ID("row-add").Class("act").Disabled(n >= maxRows).
		Text("+ Add a point").OnClick(s.onRowAdd))
	var text []app.UI
	for _, c := range cols {
		id := "in-" + c.param
		text = append(text, app.Div().Class("field").Body(
			app.Label().For(id).Class("lbl").Text("Data-sheet "+c.name+" ("+c.param+"), comma separated, unit after the last"),
			app.Input().Type("text").ID(id).Class("box wide").Attr("autocomplete", "off").Attr("spellcheck", "false").
				Value(s.scen.Get(c.param)).OnInput(s.onListText(c.param)),
		))
	}
	body = append(body, app.Details().Class("astext").Body(append([]app.UI{app.Summary().Text("Data sheet as text")}, text...)...))
	return app.Section().Class("card").ID("datasheet-card").Body(body...)
}

// pumpSetupCard is the speed, the arrangement, the pump's elevation and
// the NPSH it requires.
func (s *sheet) pumpSetupCard() app.UI {
	body := []app.UI{
		app.H2().Text("Pump as installed"),
		app.Div().Class("row2").Body(
			s.quantity("spd", "Speed", "(share of the data sheet's; blank: 100 %)"),
			s.choice("pumps", "Pumps working together", ""),
		),
		s.quantity("zp", "Pump centreline elevation", "(for NPSH)"),
		s.toggle("npsh", "NPSH required"),
	}
	if s.current("npsh") == "typed" {
		body = append(body, s.quantity("npshr", "NPSH required", "(at the operating flow)"))
	}
	return app.Section().Class("card").ID("pump-setup").Body(body...)
}

// factID is a fact with an id on its value, for the browser check.
func factID(id, k, v string) app.UI {
	return app.Div().Class("fact").Body(app.Dt().Text(k), app.Dd().ID(id).Text(v))
}

// factKey is a fact in large type: a result the card is for.
func factKey(id, k, v string) app.UI {
	return app.Div().Class("fact key").Body(app.Dt().Text(k), app.Dd().ID(id).Text(v))
}

// operatingCard is where the pump runs on the line.
func (s *sheet) operatingCard() app.UI {
	us := s.us()
	body := []app.UI{app.H2().Text("Where the pump runs")}
	pr := s.res.Pump
	none := func(why string) {
		body = append(body, app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-label").Text("Operating point"),
			app.Div().Class("answer-value none").ID("op-q").Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(why)))
	}
	switch {
	case pr == nil:
		if s.scen.Has("pq") || s.scen.Has("ph") {
			none(s.toCheck("pq", "ph", "peff", "pnpsh", "spd", "pumps"))
		} else {
			none("Enter the pump's data sheet below: at least three flows and heads.")
		}
	case pr.Operating == nil:
		why := ""
		for _, p := range []string{"pq", "ph", "spd", "pumps"} {
			if m := s.message(p); m != "" {
				why = m
				break
			}
		}
		if why == "" {
			why = s.toCheck(balanceInputs()...)
		}
		none(why)
	default:
		op := pr.Operating
		ans := []app.UI{
			app.Div().Class("answer-label").Text("Operating point: flow and head"),
			app.Div().Class("answer-value op").ID("op-q").Text(scenario.ShowParam("q", op.Q, us)),
			app.Div().Class("answer-value op").ID("op-h").Text(scenario.Show(op.H, calc.Length, us)),
		}
		if b := s.res.Balance; b != nil && b.Solve == calc.SolvePumpHead {
			ans = append(ans, app.Div().Class("answer-sub").Text("duty asked for "+scenario.ShowParam("q", b.Q, us)+
				": the line needs "+scenario.Show(b.Value, calc.Length, us)+" there"))
		}
		body = append(body, app.Div().Class("answer").ID("answer").Body(ans...))
		body = append(body, app.Dl().Class("facts").Body(s.operatingFacts()...))
	}
	body = append(body, s.fieldNotes("solve")...)
	body = append(body, s.warningList("pump", "balance")...)
	return app.Section().Class("card answer-card").ID("operating").Body(body...)
}

// operatingFacts are the figures at the operating point.
func (s *sheet) operatingFacts() []app.UI {
	pr := s.res.Pump
	if pr == nil || pr.Operating == nil {
		return nil
	}
	us := s.us()
	op := pr.Operating
	eff, shaft := "not known (no efficiencies on the data sheet)", "not known (needs the efficiency)"
	if op.Eff > 0 {
		eff = scenario.ShowParam("peff", op.Eff, us)
	}
	if op.ShaftPower > 0 {
		shaft = scenario.Show(op.ShaftPower, calc.Power, us)
	}
	out := []app.UI{
		factID("op-eff", "pump efficiency η", eff),
		factID("op-shaft", "power at the pump shaft", shaft),
		factID("op-hyd", "hydraulic power (to the liquid)", scenario.Show(op.HydraulicPower, calc.Power, us)),
	}
	if op.NPSHr > 0 {
		out = append(out, fact("NPSH required here", scenario.Show(op.NPSHr, calc.Length, us)))
	}
	out = append(out, fact("pumps running", curveName(pr, us)))
	return out
}

// npshLevel is the margin's verdict in words and its badge class.
func npshLevel(l calc.NPSHLevel) (text, class string) {
	switch l {
	case calc.NPSHOK:
		return "✓ Margin adequate", "lvl-ok"
	case calc.NPSHCaution:
		return "⚠ Caution: small margin", "lvl-caution"
	case calc.NPSHDanger:
		return "✕ Danger: the pump will cavitate", "lvl-danger"
	}
	return "NPSH required not given: no margin to judge", "lvl-none"
}

// npshCard is NPSH available against required.
func (s *sheet) npshCard() app.UI {
	body := []app.UI{app.H2().Text("Cavitation check (NPSH)")}
	n := s.res.NPSH
	if n == nil {
		why := "Enter the pump centreline elevation to work out the NPSH available."
		if s.scen.Has("zp") {
			why = s.toCheck("zp", "npshr", "pafter", "t", "liq", "alt", "baro", "p1", "z1", "q")
		}
		body = append(body, app.P().Class("muted").ID("npsh-why").Text(why))
		body = append(body, s.warningList("npsh", "site", "liquid")...)
		return app.Section().Class("card npsh").ID("npsh").Body(body...)
	}
	body = append(body, app.Dl().Class("facts").Body(s.npshFacts()...))
	body = append(body, s.warningList("npsh", "site", "liquid")...)
	return app.Section().Class("card npsh").ID("npsh").Body(body...)
}

// npshFacts are the NPSH figures with the verdict.
func (s *sheet) npshFacts() []app.UI {
	n := s.res.NPSH
	if n == nil {
		return nil
	}
	us := s.us()
	text, cls := npshLevel(n.Level)
	out := []app.UI{
		app.Div().Class("level "+cls).ID("npsh-level").Attr("role", "status").Text(text),
		factID("npsh-a", "NPSH available", scenario.Show(n.Available, calc.Length, us)),
	}
	if n.Level != calc.NPSHUnrated {
		out = append(out,
			factID("npsh-r", "NPSH required", scenario.Show(n.Required, calc.Length, us)),
			factKey("npsh-margin", "margin", scenario.Show(n.Margin, calc.Length, us)),
			factID("npsh-ratio", "ratio available ÷ required", calc.FormatNumber(n.Ratio, 3)),
		)
	}
	out = append(out,
		fact("at a flow of", scenario.ShowParam("q", s.res.NPSHFlow, us)),
		app.P().Class("note-text").ID("npsh-note").Text(n.Note.String()),
	)
	return out
}

// fieldCard is the field check: gauge readings in, the pump's real
// performance out.
func (s *sheet) fieldCard() app.UI {
	body := []app.UI{
		app.H2().Text("Field check from gauge readings"),
		app.Div().Class("row2").Body(
			s.quantity("ps", "Suction gauge", "(reading)"),
			s.quantity("pd", "Discharge gauge", "(reading)"),
		),
		app.Div().Class("row2").Body(
			s.quantity("zs", "Suction gauge height", ""),
			s.quantity("zd", "Discharge gauge height", "(same datum)"),
		),
		app.Div().Class("row2").Body(
			s.quantity("ds", "Pipe inside diameter at the suction gauge", ""),
			s.quantity("dd", "Pipe inside diameter at the discharge gauge", ""),
		),
		app.Div().Class("row2").Body(
			s.quantity("qm", "Measured flow", ""),
			s.quantity("pin", "Motor electrical input", "(optional)"),
		),
	}
	if f := s.res.Field; f != nil {
		body = append(body, app.Dl().Class("facts").ID("field-results").Body(s.fieldFacts()...))
	}
	body = append(body, s.warningList("field")...)
	return app.Section().Class("card").ID("field").Body(body...)
}

// fieldFacts are the field check's figures.
func (s *sheet) fieldFacts() []app.UI {
	f := s.res.Field
	if f == nil {
		return nil
	}
	us := s.us()
	show := func(v float64) string { return scenario.Show(v, calc.Length, us) }
	out := []app.UI{
		factKey("field-head", "pump head delivered", show(f.Head)),
		fact("of which: gauge pressure difference", show(f.PressureHead)),
		fact("gauge height difference", show(f.ElevationHead)),
		fact("velocity head difference", show(f.VelocityHead)),
		factID("field-power", "hydraulic power", scenario.Show(f.HydraulicPower, calc.Power, us)),
	}
	if f.Efficiency > 0 {
		out = append(out, factKey("field-eff", "wire-to-water efficiency", scenario.ShowParam("peff", f.Efficiency, us)))
	}
	if f.HasCurve {
		out = append(out,
			fact("data-sheet head at this flow", show(f.CurveHead)),
			factID("field-dev", "below (−) or above the data sheet", show(f.Deviation)+" ("+calc.FormatNumber(f.DeviationPct, 3)+" %)"),
		)
		if f.CurveEfficiency > 0 {
			out = append(out, fact("data-sheet pump efficiency here (pump alone)", scenario.ShowParam("peff", f.CurveEfficiency, us)))
		}
	}
	return out
}

// turbineCard is the turbine's output on the line (solve=ht).
func (s *sheet) turbineCard() app.UI {
	us := s.us()
	body := []app.UI{
		app.H2().Text("Turbine on the line"),
		s.quantity("etat", "Turbine-and-generator efficiency", ""),
	}
	t := s.res.Turbine
	switch {
	case t != nil:
		body = append(body, app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-label").Text("Output at "+scenario.ShowParam("q", t.Q, us)),
			app.Div().Class("answer-value op").ID("turb-power").Text(scenario.Show(t.Power, calc.Power, us)),
		), app.Dl().Class("facts").Body(s.turbineFacts()...))
	case s.solve() != "ht":
		body = append(body, app.P().Class("muted").Text("The output needs the balance solved for the turbine head."),
			app.Button().Type("button").ID("to-ht").Class("act").Text("Solve for the turbine head").OnClick(s.choose("solve", "ht")))
	default:
		body = append(body, app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-value none").ID("turb-power").Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(s.toCheck(append(balanceInputs(), s.lineInputs()...)...))))
	}
	body = append(body, s.warningList("turbine", "balance")...)
	return app.Section().Class("card answer-card").ID("turbine").Body(body...)
}

// turbineFacts are the turbine's figures at the flow and at the best flow.
func (s *sheet) turbineFacts() []app.UI {
	t := s.res.Turbine
	if t == nil {
		return nil
	}
	us := s.us()
	show := func(v float64) string { return scenario.Show(v, calc.Length, us) }
	out := []app.UI{
		factID("turb-gross", "gross head (levels and pressures)", show(t.GrossHead)),
		fact("line losses at this flow", show(t.Losses)),
		fact("velocity head left at the outlet", show(t.ExitVelocityHead)),
		factKey("turb-net", "net head for the turbine", show(t.NetHead)),
		fact("hydraulic power (before the machine)", scenario.Show(t.HydraulicPower, calc.Power, us)),
	}
	if b := s.res.BestTurbine; b != nil {
		out = append(out,
			factKey("turb-best", "most output: at "+scenario.ShowParam("q", b.Q, us), scenario.Show(b.Power, calc.Power, us)),
			fact("net head at that flow", show(b.NetHead)),
		)
	}
	return out
}

// pumpChartCard holds the pump and system chart.
func (s *sheet) pumpChartCard() app.UI {
	body := []app.UI{app.H2().Text("Pump and system curves")}
	c := s.pumpChart()
	if c == nil {
		body = append(body, app.P().Class("muted").Text("Drawn once the data sheet has at least three points."))
		return app.Section().Class("card chart-card").ID("pump-chart-card").Body(body...)
	}
	caption := "Accent: the pump's head curve through the data-sheet points (squares). Dash-dot: the head the line needs at each flow. They cross at the operating point."
	if pr := s.res.Pump; pr != nil && len(pr.System) > 0 {
		caption += " At zero flow the line needs " + scenario.Show(pr.System[0].H, calc.Length, s.us()) + " (levels and pressures alone); the rest is friction, fittings and velocity head."
	}
	if c.Lower != nil {
		caption += " Lower panel: NPSH the pump requires (solid) and NPSH available at its inlet (dashed); available must stay above required."
	}
	body = append(body, chartFigure("pump-chart", c, caption))
	return app.Section().Class("card chart-card").ID("pump-chart-card").Body(body...)
}

// pumpView is the Pump view. With the balance solved for a turbine head it
// shows the turbine side instead.
func (s *sheet) pumpView() app.UI {
	if s.solve() == "ht" {
		return app.Div().Class("stack").Body(
			app.Div().Class("duo").Body(s.turbineCard(), s.profileCard()),
			app.Section().Class("card").Body(
				app.H2().Text("Pump side"),
				app.P().Class("muted").Text("The pump's operating point, NPSH and data sheet apply when the balance solves for the pump head."),
				app.Button().Type("button").ID("to-hp").Class("act").Text("Solve for the pump head").OnClick(s.choose("solve", "hp")),
			),
		)
	}
	more := []app.UI{s.pumpSetupCard(), s.fieldCard()}
	if s.scen.Has("etat") {
		more = append(more, s.turbineCard())
	}
	return app.Div().Class("stack").Body(
		app.Div().Class("duo").Body(
			app.Div().Class("col").Body(s.operatingCard(), s.npshCard()),
			s.pumpChartCard(),
		),
		app.Div().Class("duo even").Body(
			s.dataSheetCard(),
			app.Div().Class("col").Body(more...),
		),
	)
}
