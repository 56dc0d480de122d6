package main

import (
	"strings"

	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// unknowns are the parameters the balance can solve for.
var unknowns = map[string]bool{"hp": true, "ht": true, "hf": true, "p1": true, "p2": true, "z1": true, "z2": true, "q": true}

// message is the text of p's error, without the leading "p: " that names
// the parameter (the field's own label already says which it is).
func (s *sheet) message(p string) string {
	m := s.res.Errors[p]
	return strings.TrimPrefix(m, p+": ")
}

// fieldNotes draws p's error and the warnings about p, in place.
func (s *sheet) fieldNotes(p string) []app.UI {
	var out []app.UI
	if m := s.message(p); m != "" {
		out = append(out, app.P().ID("err-"+p).Class("msg err").Attr("role", "alert").Body(
			app.Span().Class("tag").Text("Check"), app.Text(" "+m)))
	}
	for _, w := range s.warnings() {
		if w.Param == p {
			out = append(out, app.P().Class("msg warn").Body(
				app.Span().Class("tag").Text("Warning"), app.Text(" about this value: read it beside the result")))
			break
		}
	}
	return out
}

// quantity draws an input for a value with a unit: a box (numeric keypad)
// and a unit picker. A unit typed in the box wins over the picker. When p is
// the balance's unknown the box gives way to the answer.
func (s *sheet) quantity(p, label, hint string) app.UI {
	s.shown[p] = true
	if unknowns[p] && s.view() == "balance" && s.solve() == p {
		return s.unknownField(p, label)
	}
	bad := s.res.Errors[p] != ""
	id := "in-" + p
	picker := s.unitPicker(p)
	body := []app.UI{
		app.Label().For(id).Class("lbl").Body(app.Text(label), hintUI(hint)),
		app.Div().Class("entry").Body(
			app.Input().Type("text").ID(id).Class(classIf("box", bad, "bad")).
				Attr("inputmode", "decimal").Attr("autocomplete", "off").Attr("spellcheck", "false").
				Aria("invalid", bad).
				Placeholder(placeholder(p)).
				Value(s.box[p]).
				OnInput(s.onBox(p)),
			picker,
		),
	}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + p).Body(body...)
}

// unitPicker draws the unit select of p. When the box holds a unit of its
// own the picker says so instead of pretending to apply.
func (s *sheet) unitPicker(p string) app.UI {
	id := "unit-" + p
	num, typed := scenario.Split(s.box[p])
	if num == "" {
		typed = "" // not a number at all: the picker still says what a number would mean
	}
	cur := s.unitFor(p)
	choices := scenario.UnitChoices(p, s.us())
	found := false
	for _, u := range choices {
		if u == cur {
			found = true
		}
	}
	if !found && cur != "" {
		choices = append([]string{cur}, choices...)
	}
	opts := make([]app.UI, 0, len(choices)+1)
	if typed != "" {
		opts = append(opts, app.Option().Value("").Selected(true).Text("as typed"))
	}
	for _, u := range choices {
		opts = append(opts, app.Option().Value(u).Selected(typed == "" && u == cur).Text(u))
	}
	return app.Select().ID(id).Class("unit").Aria("label", "unit").
		OnChange(s.onPick(p)).Body(opts...)
}

// placeholder is the greyed example in an empty box.
func placeholder(p string) string {
	switch p {
	case "t":
		return "e.g. 18"
	case "alt":
		return "e.g. 210"
	case "baro":
		return "e.g. 98.8"
	}
	return ""
}

// hintUI is a short grey explanation after a label.
func hintUI(hint string) app.UI {
	if hint == "" {
		return nil
	}
	return app.Span().Class("hint").Text(" " + hint)
}

// unknownField shows the balance's unknown in place of its input.
func (s *sheet) unknownField(p, label string) app.UI {
	val := "—"
	if b := s.res.Balance; b != nil {
		val = s.answerText()
	}
	body := []app.UI{
		app.Div().Class("lbl").Body(app.Text(label)),
		app.Div().Class("solved").ID("solved-"+p).Body(
			app.Span().Class("tag").Text("Unknown"),
			app.Span().Class("solved-val").Text(val),
		),
	}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class("field is-unknown").ID("f-" + p).Body(body...)
}

// choice draws a select for an enumerated parameter.
func (s *sheet) choice(p, label string, blank string) app.UI {
	s.shown[p] = true
	id := "in-" + p
	cur := s.scen.Get(p)
	choices := scenario.Choices(p)
	opts := make([]app.UI, 0, len(choices)+1)
	known := false
	for _, c := range choices {
		if c.Value == cur {
			known = true
		}
	}
	if blank != "" {
		opts = append(opts, app.Option().Value("").Selected(cur == "").Text(blank))
	}
	if !known && cur != "" {
		opts = append(opts, app.Option().Value(cur).Selected(true).Text(cur+" (not recognised)"))
	}
	for _, c := range choices {
		opts = append(opts, app.Option().Value(c.Value).Selected(c.Value == cur).Text(c.Label))
	}
	bad := s.res.Errors[p] != ""
	body := []app.UI{
		app.Label().For(id).Class("lbl").Text(label),
		app.Select().ID(id).Class(classIf("pick", bad, "bad")).OnChange(s.onChoice(p)).Body(opts...),
	}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + p).Body(body...)
}

// plain draws a text input without a unit (counts, coefficients, the title).
func (s *sheet) plain(p, label, hint string, numeric bool) app.UI {
	s.shown[p] = true
	id := "in-" + p
	bad := s.res.Errors[p] != ""
	in := app.Input().Type("text").ID(id).Class(classIf("box wide", bad, "bad")).
		Attr("autocomplete", "off").Attr("spellcheck", "false").Aria("invalid", bad).
		Value(s.box[p]).OnInput(s.onBox(p))
	if numeric {
		in = in.Attr("inputmode", "decimal")
	}
	body := []app.UI{app.Label().For(id).Class("lbl").Body(app.Text(label), hintUI(hint)), in}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + p).Body(body...)
}

// ref draws the gauge/absolute choice of a pressure as two buttons.
func (s *sheet) ref(p string) app.UI {
	s.shown[p] = true
	cur := s.scen.Get(p)
	if cur == "" {
		cur = "g"
	}
	var btns []app.UI
	for _, c := range scenario.Choices(p) {
		on := c.Value == cur
		btns = append(btns, app.Button().Type("button").ID("sw-"+p+"-"+c.Value).
			Class(classIf("seg", on, "on")).Aria("pressed", on).Text(c.Label).
			OnClick(s.choose(p, c.Value)))
	}
	out := []app.UI{app.Div().Class("segs small").Aria("label", "pressure reference").Body(btns...)}
	out = append(out, s.fieldNotes(p)...)
	return app.Div().Class("ref").Body(out...)
}
