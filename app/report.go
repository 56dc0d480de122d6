package main

import (
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The Report view is the printed sheet of the scenario: every input as
// typed, with its unit, every result, both charts, the warnings, the
// methods and their sources, the cautions (drawn by the page around every
// view) and the share link.

// methods name the methods behind the figures and their sources.
var methods = []struct{ what, how string }{
	{"Energy balance", "steady-flow energy equation between the two points in head form (metres or feet of the flowing liquid), kinetic-energy factor α 2 in laminar and 1 in turbulent flow; Reynolds number bands 2300 and 4000 (common practice)."},
	{"Friction factor", "Colebrook–White equation, solved as in Clamond (2009); the explicit Swamee–Jain (1976) and Haaland (1983) formulas, or Hazen–Williams for water, when chosen; 64/Re in laminar flow."},
	{"Head losses", "Darcy–Weisbach for pipe friction; fittings by loss coefficients K on the velocity head; sudden changes of diameter by Borda–Carnot."},
	{"Water", "density from IAPWS-IF97 region 1, vapour pressure from IF97 eq. 30 (saturation line), viscosity from the IAPWS 2008 release."},
	{"Site pressure", "ISO 2533 standard atmosphere at the site altitude, or the barometer reading."},
	{"Units", "conversion factors of NIST SP 811 (2008), Appendix B."},
	{"Pipe sizes", "inside diameters from the ASME B36.10M and B36.19M dimension tables."},
	{"Pump curve", "monotone piecewise cubic interpolation through the data-sheet points (Fritsch–Carlson 1980), never beyond them; the operating point is where it meets the system curve, each flow of which is solved in full."},
	{"Speed and arrangement", "the pump affinity laws; identical pumps in parallel add flow, in series add head."},
	{"NPSH margin", "NPSH available from the surface pressure, vapour pressure, suction height and suction losses; margin guidance after ANSI/HI 9.6.1 (from memory): ratio at least 1.1 and at least 0.6 m."},
	{"Field check", "pump total head from the gauge readings, the gauges' heights and the velocity heads at the gauges; wire-to-water efficiency is the hydraulic power over the measured electrical input."},
	{"Turbine", "output ρ·g·Q·H_net·η after the line's losses; the flow of most output by golden-section search."},
}

// inputValue writes a parameter's text for the sheet: with the default
// unit named when none was typed, lists spaced, fittings and choices in
// words.
func (s *sheet) inputValue(p string) string {
	raw := strings.TrimSpace(s.scen.Get(p))
	_, f, isSeg := segmentOf(p)
	base := p
	if isSeg {
		base = f
	}
	switch base {
	case "fit":
		if list, ok := fitEntries(raw); ok {
			var parts []string
			for _, e := range list {
				parts = append(parts, strconv.Itoa(e.count)+" × "+fitLabel(e.key))
			}
			if len(parts) > 0 {
				return strings.Join(parts, "; ")
			}
		}
		return raw
	case "pq", "ph", "peff", "pnpsh":
		cells, unit := s.listCells(p)
		if unit == "" {
			unit = scenario.DefaultUnit(p, s.us())
		}
		return strings.Join(cells, ", ") + " " + unit
	case "pafter":
		if raw == "0" {
			return "at point 1"
		}
		return "after segment " + raw
	case "name":
		return raw
	}
	if cs := choicesOf(p); len(cs) > 0 {
		for _, c := range cs {
			if c.Value == raw {
				if strings.EqualFold(c.Label, raw) {
					return raw
				}
				return c.Label + " (" + raw + ")"
			}
		}
		return raw
	}
	return s.rawShown(p)
}

// rawShown is a value as typed, its number and unit spaced for reading
// ("45L/s" → "45 L/s"); one typed without a unit names the default unit it
// is taken in.
func (s *sheet) rawShown(p string) string {
	raw := strings.TrimSpace(s.scen.Get(p))
	if !hasUnits(p) {
		return raw
	}
	num, unit := scenario.Split(raw)
	switch {
	case num == "":
		return raw
	case unit == "":
		return num + " " + scenario.DefaultUnit(p, s.us()) + " (default unit)"
	}
	return num + " " + unit
}

// inputRow is one line of the inputs table, with the parameter's error.
func (s *sheet) inputRow(p, label string) app.UI {
	s.shown[p] = true
	td := []app.UI{app.Text(s.inputValue(p))}
	if m := s.message(p); m != "" {
		td = append(td, app.Div().Class("msg err").ID("err-"+domID(p)).Body(app.Span().Class("tag").Text("Check"), app.Text(" "+m)))
	}
	return app.Tr().Body(
		app.Th().Scope("row").Text(label),
		app.Td().Class("param").Text(p),
		app.Td().Body(td...),
	)
}

// reportInputs lists every input of the scenario, the segments in a table
// of their own.
func (s *sheet) reportInputs() app.UI {
	var rows []app.UI
	for _, p := range scenario.Params {
		if p == "view" || p == "name" || !s.scen.Has(p) {
			continue
		}
		rows = append(rows, s.inputRow(p, labelOf(p)))
	}
	body := []app.UI{
		app.H2().Text("Inputs"),
		app.Table().Class("grid inputs").ID("report-inputs").Body(
			app.THead().Body(app.Tr().Body(app.Th().Scope("col").Text("input"), app.Th().Scope("col").Text("in the link"), app.Th().Scope("col").Text("value as entered"))),
			app.TBody().Body(rows...),
		),
	}
	if n := s.segmentCount(); n > 0 {
		body = append(body, app.H3().Text("Segments of the line, from point 1"), s.segmentInputs(n))
	}
	return app.Section().Class("card rsec").ID("report-inputs-card").Body(body...)
}

// segmentInputs is one row per segment: its inputs as entered, each cell
// with its parameter's error.
func (s *sheet) segmentInputs(n int) app.UI {
	cols := []struct {
		head   string
		fields []string
	}{
		{"length", []string{"l"}}, {"pipe", []string{"nps", "sch", "d"}}, {"wall", []string{"mat", "eps"}},
		{"fittings", []string{"fit"}}, {"extra ΣK", []string{"k"}}, {"end elevation", []string{"z"}},
	}
	head := []app.UI{app.Th().Scope("col").Text("segment")}
	for _, c := range cols {
		head = append(head, app.Th().Scope("col").Text(c.head))
	}
	var rows []app.UI
	for i := 1; i <= n; i++ {
		tr := []app.UI{app.Th().Scope("row").Text(strconv.Itoa(i))}
		for _, c := range cols {
			var parts, errs []app.UI
			for _, f := range c.fields {
				p := scenario.SegmentParam(i, f)
				s.shown[p] = true
				if s.scen.Has(p) {
					v := s.inputValue(p)
					switch f {
					case "nps":
						v = "NPS " + v
					case "sch":
						v = "schedule " + v
					}
					parts = append(parts, app.Div().Text(v))
				}
				if m := s.message(p); m != "" {
					errs = append(errs, app.Div().Class("msg err").ID("err-"+domID(p)).Body(app.Span().Class("tag").Text("Check"), app.Text(" "+m)))
				}
			}
			if len(parts) == 0 && c.fields[0] == "z" {
				parts = append(parts, app.Div().Class("muted").Text("at point 2"))
			}
			tr = append(tr, app.Td().Body(append(parts, errs...)...))
		}
		rows = append(rows, app.Tr().Body(tr...))
	}
	return app.Div().Class("tablewrap").Body(
		app.Table().Class("grid inputs").ID("report-segments").Body(
			app.THead().Body(app.Tr().Body(head...)),
			app.TBody().Body(rows...),
		),
		app.P().Class("muted small").Text("In the link these are sN.l, sN.nps, sN.sch, sN.d, sN.mat, sN.eps, sN.fit, sN.k and sN.z, N being the segment's number."),
	)
}

// reportResults lists every result the scenario has.
func (s *sheet) reportResults() app.UI {
	us := s.us()
	body := []app.UI{app.H2().Text("Results")}
	if b := s.res.Balance; b != nil {
		main, alt := scenario.ShowSolved(s.scen, s.res)
		label := solveLabels[s.solve()]
		if alt != "" {
			main += " (" + alt + ")"
		}
		var budget []app.UI
		for _, it := range b.Budget {
			if it.Head == 0 {
				continue
			}
			side := "supplied"
			if it.Side < 0 {
				side = "used"
			}
			budget = append(budget, app.Tr().Body(
				app.Th().Scope("row").Text(it.Label),
				app.Td().Text(side),
				app.Td().Text(scenario.Show(it.Head, calc.Length, us)),
				app.Td().Text(scenario.Show(it.Pressure, calc.Pressure, us)),
			))
		}
		body = append(body,
			app.H3().Text("Energy balance"),
			app.Dl().Class("facts").Body(
				factKey("report-answer", label+" (the unknown)", main),
				fact("at a flow of", scenario.ShowParam("q", b.Q, us)),
				fact("friction and fittings", scenario.Show(b.FrictionHead, calc.Length, us)),
			),
			app.H3().Text("Where the head goes"),
			app.Table().Class("grid").ID("report-budget").Body(
				app.THead().Body(app.Tr().Body(app.Th().Text("term"), app.Th().Text("side"), app.Th().Text("head"), app.Th().Text("as pressure"))),
				app.TBody().Body(budget...),
			),
		)
		if b.Line != nil {
			body = append(body, app.H3().Text("Losses by segment"), s.segmentGrid())
		}
	} else {
		body = append(body, app.P().Class("muted").Text("The energy balance has no answer: "+s.toCheck(balanceInputs()...)))
	}
	if f := s.operatingFacts(); f != nil {
		op := s.res.Pump.Operating
		body = append(body, app.H3().Text("Operating point"), app.Dl().Class("facts").Body(append([]app.UI{
			factKey("report-op", "flow and head",
				scenario.ShowParam("q", op.Q, us)+" at "+scenario.Show(op.H, calc.Length, us)),
		}, f...)...))
	}
	if f := s.npshFacts(); f != nil {
		body = append(body, app.H3().Text("Cavitation check (NPSH)"), app.Dl().Class("facts").Body(f...))
	}
	if f := s.fieldFacts(); f != nil {
		body = append(body, app.H3().Text("Field check from gauge readings"), app.Dl().Class("facts").Body(f...))
	}
	if t := s.res.Turbine; t != nil {
		body = append(body, app.H3().Text("Turbine"), app.Dl().Class("facts").Body(append([]app.UI{
			factKey("report-turbine", "output at "+scenario.ShowParam("q", t.Q, us), scenario.Show(t.Power, calc.Power, us)),
		}, s.turbineFacts()...)...))
	}
	return app.Section().Class("card rsec").ID("report-results").Body(body...)
}

// reportWarnings lists every warning of the scenario.
func (s *sheet) reportWarnings() app.UI {
	var items []app.UI
	for _, w := range s.warnings() {
		items = append(items, app.Li().Text(w.String()))
	}
	if len(items) == 0 {
		return app.Section().Class("card rsec").ID("report-warnings").Body(
			app.H2().Text("Warnings"), app.P().Text("None for these inputs."))
	}
	return app.Section().Class("card rsec").ID("report-warnings").Body(
		app.H2().Text("Warnings"),
		app.Div().Class("warnbox").Body(
			app.Div().Class("warnhead").Body(app.Span().Class("tag").Text("Warning"), app.Text(" Read before using the results")),
			app.Ul().Body(items...),
		),
	)
}

// reportView is the Report view.
func (s *sheet) reportView() app.UI {
	name := strings.TrimSpace(s.scen.Get("name"))
	if name == "" {
		name = "Untitled sheet"
	}
	system := "SI units"
	if s.us() {
		system = "US customary units"
	}
	var figs []app.UI
	if c := s.pumpChart(); c != nil {
		figs = append(figs, app.Section().Class("card rsec chart-sec").Body(
			app.H2().Text("Pump and system curves"),
			chartFigure("pump-chart", c, "Pump head curve through the data-sheet points, the line's system curve and the operating point where they meet; below, NPSH required and available."),
		))
	}
	if c := s.profileChart(); c != nil {
		figs = append(figs, app.Section().Class("card rsec chart-sec").Body(
			app.H2().Text("Energy and hydraulic grade lines"),
			chartFigure("profile-chart", c, "Pipe elevation, energy and hydraulic grade lines and the vapour-pressure line along the line, from point 1."),
		))
	}
	var meth []app.UI
	for _, m := range methods {
		meth = append(meth, app.Li().Body(app.Strong().Text(m.what+": "), app.Text(m.how)))
	}
	body := []app.UI{
		app.Header().Class("rhead").Body(
			app.H1().ID("report-title").Text(name),
			app.P().Class("rmeta").Body(
				app.Span().Text("Fieldhead calculation sheet · "+system),
				app.Span().ID("report-date").Text(" · "+nowText()),
			),
		),
		s.reportInputs(),
		s.reportResults(),
	}
	if len(figs) > 0 {
		body = append(body, app.Div().Class("charts").ID("report-charts").Body(figs...))
	}
	body = append(body,
		s.reportWarnings(),
		app.Section().Class("card rsec").ID("report-methods").Body(
			app.H2().Text("Methods and sources"),
			app.Ul().Class("methods").Body(meth...),
		),
		app.Section().Class("card rsec").ID("report-link").Body(
			app.H2().Text("This sheet as a link"),
			app.P().Class("linktext").ID("report-url").Text(s.link()),
			app.P().Class("muted small").Text("Open the link on any device to see and change the same calculation."),
		),
	)
	return app.Article().Class("report").Body(body...)
}
