package main

import (
	"fmt"
	"math"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// solveLabels name the unknown above the answer.
var solveLabels = map[string]string{
	"hp": "Pump head", "ht": "Turbine head", "hf": "Friction head",
	"p1": "Pressure at point 1", "p2": "Pressure at point 2",
	"z1": "Elevation of point 1", "z2": "Elevation of point 2", "q": "Flow",
}

// balanceView is the two-point energy balance.
func (s *sheet) balanceView() app.UI {
	return app.Div().Class("layout").Body(
		app.Div().Class("area-answer").Body(s.answerCard()),
		app.Div().Class("area-inputs").Body(
			app.Div().Class("points").Body(s.pointCard("1", "in"), s.pointCard("2", "out")),
			s.betweenCard(),
			s.liquidCard(),
		),
		app.Div().Class("area-more").Body(s.budgetCard()),
	)
}

// pointCard is one end of the balance.
func (s *sheet) pointCard(n, role string) app.UI {
	body := []app.UI{
		app.H2().Body(app.Span().Class("num").Text(n), app.Text(" Point "+n+" ("+role+")")),
		s.quantity("p"+n, "Pressure", ""),
		s.ref("p" + n + "ref"),
		s.quantity("z"+n, "Elevation", ""),
		s.toggle("pt"+n, "Speed of the liquid here, from"),
	}
	if s.current("pt"+n) == "d" {
		body = append(body, s.quantity("d"+n, "Inside diameter", "(velocity = flow ÷ area)"))
	} else {
		body = append(body, s.quantity("v"+n, "Mean velocity", "(0 at a tank surface)"))
	}
	if b := s.res.Balance; b != nil {
		ps := b.In
		if n == "2" {
			ps = b.Out
		}
		us := s.us()
		line := "velocity " + scenario.Show(ps.Velocity, calc.Velocity, us)
		if ps.HasRegime {
			line += " · Re " + plainNumber(ps.Reynolds) + " (" + ps.Regime.String() + ")"
		}
		line += fmt.Sprintf(" · α %.2g", ps.Alpha)
		line += " · total head " + scenario.Show(ps.TotalHead, calc.Length, us)
		body = append(body, app.P().Class("computed").Text(line))
	}
	return app.Section().Class("card point").ID("point-" + n).Body(body...)
}

// betweenCard holds the flow and the heads between the points.
func (s *sheet) betweenCard() app.UI {
	body := []app.UI{
		app.H2().Text("Between the points"),
		app.Div().Class("row2").Body(
			s.quantity("q", "Flow", ""),
			s.quantity("hp", "Pump head", "(added; blank if none)"),
			s.quantity("ht", "Turbine head", "(taken; blank if none)"),
		),
	}
	if n := s.segmentCount(); n > 0 {
		body = append(body, s.lineSummary(n))
	} else {
		body = append(body, s.toggle("fric", "Friction head between the points"))
		if s.current("fric") == "hf" {
			body = append(body, s.quantity("hf", "Friction head", "(all losses, 1 to 2)"))
		} else {
			body = append(body, s.runInputs(false)...)
			if r := s.res.Run; r != nil {
				body = append(body, app.P().Class("computed").ID("run-line").Text(fmt.Sprintf(
					"pipe friction %s + fittings %s = %s · Re %s (%s)",
					scenario.Show(r.MajorLoss, calc.Length, s.us()), scenario.Show(r.MinorLoss, calc.Length, s.us()),
					scenario.Show(r.TotalLoss, calc.Length, s.us()), plainNumber(r.Reynolds), r.Regime)))
			}
		}
	}
	body = append(body, s.choice("alpha", "Kinetic-energy factor α", ""))
	return app.Section().Class("card between").Body(body...)
}

// answerCard is the "Solve for" choice and the answer in large type.
func (s *sheet) answerCard() app.UI {
	s.shown["solve"] = true
	cur := s.solve()
	var btns []app.UI
	for _, c := range choicesOf("solve") {
		on := c.Value == cur
		btns = append(btns, app.Button().Type("button").ID("solve-"+c.Value).
			Class(classIf("seg", on, "on")).Aria("pressed", on).Text(c.Label).
			OnClick(s.choose("solve", c.Value)))
	}
	label := solveLabels[cur]
	if label == "" {
		label = cur
	}
	body := []app.UI{
		app.H2().Text("Solve for"),
		app.Div().Class("solve-grid").Body(btns...),
	}
	body = append(body, s.fieldNotes("solve")...)
	ans := []app.UI{app.Div().Class("answer-label").Text(label + " (the unknown)")}
	if b := s.res.Balance; b != nil {
		ans = append(ans, app.Div().Class("answer-value").ID("answer-value").Text(s.answerText()))
		for _, line := range s.answerLines() {
			ans = append(ans, app.Div().Class("answer-sub").Text(line))
		}
	} else {
		ans = append(ans,
			app.Div().Class("answer-value none").ID("answer-value").Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(s.toCheck(balanceInputs()...)))
	}
	body = append(body, app.Div().Class("answer").ID("answer").Body(ans...))
	body = append(body, s.warningList("balance", "run", "site", "liquid")...)
	return app.Section().Class("card answer-card").Body(body...)
}

// answerText is the solved unknown in the unit system's display unit; a
// pressure is shown the way its point's gauge reads it (gauge unless the
// point is marked absolute).
func (s *sheet) answerText() string {
	b := s.res.Balance
	if b == nil {
		return "—"
	}
	return s.valueText(b.Value)
}

func (s *sheet) valueText(v float64) string {
	p := s.solve()
	us := s.us()
	switch p {
	case "p1", "p2":
		if s.scen.Get(p+"ref") == "a" {
			return scenario.ShowParam(p, v, us) + " abs"
		}
		return scenario.ShowParam(p, v-s.res.SitePressure, us) + " gauge"
	}
	return scenario.ShowParam(p, v, us)
}

// answerLines are the smaller lines under the answer.
func (s *sheet) answerLines() []string {
	b := s.res.Balance
	us := s.us()
	var out []string
	if b.Transitional && b.ValueLow != b.ValueHigh {
		out = append(out, "transitional flow: between "+s.valueText(b.ValueLow)+" and "+s.valueText(b.ValueHigh))
	}
	switch s.solve() {
	case "p1", "p2":
		if s.scen.Get(s.solve()+"ref") == "a" {
			out = append(out, scenario.ShowParam(s.solve(), b.Value-s.res.SitePressure, us)+" gauge")
		} else {
			out = append(out, scenario.ShowParam(s.solve(), b.Value, us)+" absolute")
		}
	}
	if b.PumpHead > 0 {
		out = append(out, "hydraulic power of the pump "+scenario.Show(b.PumpPower, calc.Power, us))
	}
	if b.TurbineHead > 0 {
		out = append(out, "hydraulic power to the turbine "+scenario.Show(b.TurbinePower, calc.Power, us)+" (before machine losses)")
	}
	out = append(out, "at a flow of "+scenario.ShowParam("q", b.Q, us)+", friction and fittings "+scenario.Show(b.FrictionHead, calc.Length, us))
	if pr := s.res.Pump; pr != nil && pr.Operating != nil {
		out = append(out, "the data-sheet pump runs at "+scenario.ShowParam("q", pr.Operating.Q, us)+" and "+
			scenario.Show(pr.Operating.H, calc.Length, us)+" (Pump view)")
	}
	return out
}

// budgetCard is "Where the head goes": each term of the balance as a bar.
func (s *sheet) budgetCard() app.UI {
	b := s.res.Balance
	body := []app.UI{app.H2().Text("Where the head goes")}
	if b == nil {
		body = append(body, app.P().Class("muted").Text("Shown once the balance has an answer."))
		return app.Section().Class("card budget").ID("budget").Body(body...)
	}
	us := s.us()
	maxAbs := 0.0
	for _, it := range b.Budget {
		maxAbs = math.Max(maxAbs, math.Abs(it.Head))
	}
	if maxAbs == 0 {
		maxAbs = 1
	}
	unknown := s.solve()
	side := func(sign int, title string) app.UI {
		var rows []app.UI
		total := 0.0
		for _, it := range b.Budget {
			if it.Side != sign {
				continue
			}
			total += it.Head
			isUnknown := it.Key == unknown || (unknown == "hf" && (it.Key == "major" || it.Key == "minor"))
			if it.Head == 0 && !isUnknown {
				continue
			}
			w := math.Abs(it.Head) / maxAbs * 100
			cls := "hbar"
			if it.Head < 0 {
				cls += " neg"
			}
			if isUnknown {
				cls += " unknown"
			}
			rows = append(rows, app.Li().Class(classIf("brow", isUnknown, "is-unknown")).Body(
				app.Div().Class("blabel").Text(it.Label),
				app.Div().Class("btrack").Body(app.Div().Class(cls).DataSet("w", int(math.Round(w)))),
				app.Div().Class("bval").Body(
					app.Strong().Text(scenario.Show(it.Head, calc.Length, us)),
					app.Span().Class("bpa").Text(scenario.Show(it.Pressure, calc.Pressure, us)),
				),
			))
		}
		if len(rows) == 0 {
			rows = append(rows, app.Li().Class("brow muted").Text("nothing on this side"))
		}
		return app.Div().Class("bside").Body(
			app.H3().Body(app.Text(title), app.Span().Class("btotal").Text(" "+scenario.Show(total, calc.Length, us))),
			app.Ul().Class("bars").Body(rows...),
		)
	}
	body = append(body,
		side(+1, "Supplied at point 1 and by the pump"),
		side(-1, "Used at point 2, by the line and the turbine"),
		app.P().Class("muted small").Text("Heads in metres (or feet) of the liquid, gauge basis; elevations measured from the lower point. Terms that are zero are left out. Hatched bars are negative."),
	)
	return app.Section().Class("card budget").ID("budget").Body(body...)
}

// balanceInputs are the parameters the balance may depend on.
func balanceInputs() []string {
	var out []string
	for _, p := range scenario.Params {
		if p != "cv" && p != "cvref" {
			out = append(out, p)
		}
	}
	return out
}

// plainNumber writes a dimensionless number for reading at a glance:
// three significant digits, thousands grouped with thin spaces.
func plainNumber(x float64) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "—"
	}
	if math.Abs(x) < 1000 {
		return fmt.Sprintf("%.3g", x)
	}
	mag := math.Pow(10, math.Floor(math.Log10(math.Abs(x)))-2)
	r := math.Round(x/mag) * mag
	digits := fmt.Sprintf("%.0f", math.Abs(r))
	out := ""
	for i, c := range digits {
		if i > 0 && (len(digits)-i)%3 == 0 {
			out += "\u2009"
		}
		out += string(c)
	}
	if r < 0 {
		out = "−" + out
	}
	return out
}
