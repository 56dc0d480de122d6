package main

import (
	"fmt"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// liquidCard is the liquid, its temperature and the site pressure.
func (s *sheet) liquidCard() app.UI {
	us := s.us()
	body := []app.UI{
		app.H2().Text("Liquid and site"),
		s.choice("liq", "Liquid", ""),
	}
	if s.scen.Get("liq") == "custom" {
		body = append(body, app.Div().Class("row2").Body(
			s.quantity("rho", "Density", ""),
			s.quantity("mu", "Viscosity", "(dynamic)"),
			s.quantity("pv", "Vapour pressure", "(absolute)"),
		))
	} else {
		body = append(body, s.quantity("t", "Temperature", ""))
	}
	if f := s.res.Fluid; f != nil {
		body = append(body, app.P().Class("computed").ID("fluid").Text(fmt.Sprintf("%s: density %s · viscosity %s · vapour pressure %s",
			f.Name, scenario.Show(f.Density, calc.Density, us), scenario.Show(f.Viscosity, calc.DynamicViscosity, us),
			scenario.Show(f.VapourPressure, calc.Pressure, us))))
	}
	body = append(body, s.toggle("site", "Site pressure from"))
	if s.current("site") == "baro" {
		body = append(body, s.quantity("baro", "Barometer", "(absolute)"))
	} else {
		body = append(body, s.quantity("alt", "Site altitude", "(above sea level)"))
	}
	if s.res.SitePressure > 0 {
		note := s.res.SiteNote
		if note != "" {
			note = " — " + note
		}
		body = append(body, app.P().Class("computed").Text("site pressure "+scenario.Show(s.res.SitePressure, calc.Pressure, us)+" absolute"+note))
	}
	body = append(body, s.warningList("liquid", "site")...)
	return app.Section().Class("card liquid").Body(body...)
}

// runInputs are the inputs of one pipe run. withFlow adds the flow (the
// Regime view has no other place for it).
func (s *sheet) runInputs(withFlow bool) []app.UI {
	var out []app.UI
	row := []app.UI{}
	if withFlow {
		row = append(row, s.quantity("q", "Flow", ""))
	}
	row = append(row, s.quantity("l", "Length of the run", ""))
	out = append(out, app.Div().Class("row2").Body(row...))
	out = append(out, s.toggle("pipe", "Pipe given by"))
	if s.current("pipe") == "d" {
		out = append(out, s.quantity("d", "Inside diameter", ""))
	} else {
		out = append(out, app.Div().Class("row2").Body(
			s.choice("nps", "Nominal size", "choose…"),
			s.choice("sch", "Schedule or class", "choose…"),
		))
	}
	out = append(out, s.toggle("rough", "Wall roughness from"))
	if s.current("rough") == "eps" {
		out = append(out, s.quantity("eps", "Absolute roughness", ""))
	} else {
		out = append(out, s.choice("mat", "Material", "choose…"))
	}
	out = append(out, s.fittings())
	out = append(out, app.Div().Class("row2").Body(
		s.plain("k", "Extra loss coefficient ΣK", "(optional)", true),
		s.choice("fm", "Friction factor method", ""),
	))
	if s.scen.Get("fm") == calc.MethodHazenWilliams.String() {
		out = append(out, s.plain("chw", "Hazen–Williams C", "(blank: from the material)", true))
	}
	return out
}

// regimeView is Reynolds number, regime, α and friction of one pipe run.
func (s *sheet) regimeView() app.UI {
	inputs := append([]app.UI{app.H2().Text("Pipe run")}, s.runInputs(true)...)
	return app.Div().Class("layout").Body(
		app.Div().Class("area-answer").Body(s.regimeCard()),
		app.Div().Class("area-inputs").Body(
			app.Section().Class("card run").Body(inputs...),
			s.liquidCard(),
		),
	)
}

// regimeCard shows the run's results.
func (s *sheet) regimeCard() app.UI {
	body := []app.UI{app.H2().Text("Flow in the run")}
	r := s.res.Run
	if r == nil {
		body = append(body,
			app.Div().Class("answer").ID("answer").Body(
				app.Div().Class("answer-value none").ID("answer-value").Text("—"),
				app.Div().Class("answer-sub").ID("answer-why").Text(s.toCheck("liq", "t", "rho", "mu", "pv", "q", "l", "d", "nps", "sch", "mat", "eps", "fit", "k", "fm", "chw"))))
		return app.Section().Class("card answer-card").Body(body...)
	}
	us := s.us()
	friction := fmt.Sprintf("%.4f", r.Friction)
	if r.FrictionLow != r.FrictionHigh {
		friction = fmt.Sprintf("%.4f (between %.4f and %.4f)", r.Friction, r.FrictionLow, r.FrictionHigh)
	}
	total := scenario.Show(r.TotalLoss, calc.Length, us)
	if r.TotalLossLow != r.TotalLossHigh {
		total += " (between " + scenario.Show(r.TotalLossLow, calc.Length, us) + " and " + scenario.Show(r.TotalLossHigh, calc.Length, us) + ")"
	}
	pipe := scenario.ShowParam("d", r.Diameter, us) + " inside"
	if r.Pipe != nil {
		pipe = fmt.Sprintf("NPS %s %s (%s): %s", r.Pipe.NPS, r.Pipe.Schedule, r.Pipe.Standard, pipe)
	}
	rough := scenario.ShowParam("eps", r.Roughness, us)
	if r.Material != nil {
		rough += " (" + r.Material.Name + ")"
	}
	body = append(body,
		app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-label").Text("Reynolds number"),
			app.Div().Class("answer-value").ID("answer-value").Text(plainNumber(r.Reynolds)),
			app.Div().Class("regime regime-"+r.Regime.String()).ID("regime").Text(r.Regime.String()+" flow"),
		),
		app.Dl().Class("facts").Body(
			fact("mean velocity", scenario.Show(r.Velocity, calc.Velocity, us)),
			fact("kinetic-energy factor α", fmt.Sprintf("%.3g", r.Alpha)),
			fact("Darcy friction factor f", friction),
			fact("pipe friction", scenario.Show(r.MajorLoss, calc.Length, us)),
			fact("fittings", scenario.Show(r.MinorLoss, calc.Length, us)+fmt.Sprintf(" (ΣK %.3g)", r.SumK)),
			factStrong("friction head of the run", total),
			fact("pipe", pipe),
			fact("roughness", rough),
			fact("length", scenario.ShowParam("l", r.Length, us)),
		),
	)
	body = append(body, s.warningList("run", "liquid")...)
	return app.Section().Class("card answer-card").Body(body...)
}

func fact(k, v string) app.UI {
	return app.Div().Class("fact").Body(app.Dt().Text(k), app.Dd().Text(v))
}

func factStrong(k, v string) app.UI {
	return app.Div().Class("fact key").Body(app.Dt().Text(k), app.Dd().Text(v))
}

// convertView is head ↔ pressure ↔ water column, gauge ↔ absolute.
func (s *sheet) convertView() app.UI {
	in := app.Section().Class("card").Body(
		app.H2().Text("Value to convert"),
		s.quantity("cv", "Pressure, water column or head", ""),
		s.ref("cvref"),
	)
	return app.Div().Class("layout").Body(
		app.Div().Class("area-answer").Body(s.convertCard()),
		app.Div().Class("area-inputs").Body(in, s.liquidCard()),
	)
}

// convertCard lists the value in every form.
func (s *sheet) convertCard() app.UI {
	body := []app.UI{app.H2().Text("The same value as")}
	c := s.res.Convert
	if c == nil {
		body = append(body, app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-value none").ID("answer-value").Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(s.toCheck("cv", "cvref", "liq", "t", "rho", "mu", "pv", "alt", "baro"))))
		return app.Section().Class("card answer-card").Body(body...)
	}
	var rows []app.UI
	for i, r := range c.Rows {
		cls := "crow"
		if i == 0 {
			cls += " first"
		}
		rows = append(rows, app.Tr().Class(cls).Body(app.Th().Scope("row").Text(r.Label), app.Td().Text(r.Text)))
	}
	body = append(body, app.Table().Class("conv").ID("answer").Body(app.TBody().Body(rows...)))
	body = append(body, s.warningList("convert", "site", "liquid")...)
	return app.Section().Class("card answer-card").Body(body...)
}

// warnings merges the scenario's warnings with the balance's own, once each.
func (s *sheet) warnings() []scenario.Warning {
	out := append([]scenario.Warning(nil), s.res.Warnings...)
	seen := map[string]bool{}
	for _, w := range out {
		seen[w.Text] = true
	}
	if b := s.res.Balance; b != nil {
		for _, w := range b.Warnings {
			if !seen[w.Text] {
				seen[w.Text] = true
				out = append(out, scenario.Warning{Param: w.Field, Topic: "balance", Text: w.Text, Figures: w.Figures})
			}
		}
	}
	return out
}

// warningList draws the warnings of the given topics (and those about the
// scenario as a whole) as a boxed list.
func (s *sheet) warningList(topics ...string) []app.UI {
	want := map[string]bool{"": true}
	for _, t := range topics {
		want[t] = true
	}
	var items []app.UI
	for _, w := range s.warnings() {
		if want[w.Topic] && !s.warned[w.Text] {
			s.warned[w.Text] = true
			items = append(items, app.Li().Text(w.String()))
		}
	}
	if len(items) == 0 {
		return nil
	}
	return []app.UI{app.Div().Class("warnbox").Attr("role", "note").Body(
		app.Div().Class("warnhead").Body(app.Span().Class("tag").Text("Warning"), app.Text(" Read before using the result")),
		app.Ul().Body(items...),
	)}
}
