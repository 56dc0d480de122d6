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
		out = append(out, app.P().ID("err-"+domID(p)).Class("msg err").Attr("role", "alert").Body(
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
	id := "in-" + domID(p)
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
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + domID(p)).Body(body...)
}

// unitPicker draws the unit select of p. When the box holds a unit of its
// own the picker says so instead of pretending to apply.
func (s *sheet) unitPicker(p string) app.UI {
	id := "unit-" + domID(p)
	num, typed := scenario.Split(s.box[p])
	if num == "" {
		typed = "" // not a number at all: the picker still says what a number would mean
	}
	cur := s.unitFor(p)
	choices := unitChoicesOf(p, s.us())
	found := false
	for _, u := range choices {
		if u == cur {
			found = true
		}
	}
	if !found && cur != "" {
		choices = append([]string{cur}, choices...)
	}
	opts := make([]selOpt, 0, len(choices)+1)
	if typed != "" {
		opts = append(opts, selOpt{"", "as typed", true})
	}
	for _, u := range choices {
		if u == "" {
			continue // a plain number: not a unit to pick
		}
		opts = append(opts, selOpt{u, u, typed == "" && u == cur})
	}
	return &selectBox{ID: id, Class: "unit", Label: "unit", Options: opts, Param: p, Unit: true, S: s}
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
	return app.Div().Class("field is-unknown").ID("f-" + domID(p)).Body(body...)
}

// choice draws a select for an enumerated parameter.
func (s *sheet) choice(p, label string, blank string) app.UI {
	s.shown[p] = true
	id := "in-" + domID(p)
	cur := s.scen.Get(p)
	choices := choicesOf(p)
	opts := make([]selOpt, 0, len(choices)+1)
	known := false
	for _, c := range choices {
		if c.Value == cur {
			known = true
		}
	}
	if blank != "" {
		opts = append(opts, selOpt{"", blank, cur == ""})
	}
	if !known && cur != "" {
		opts = append(opts, selOpt{cur, cur + " (not recognised)", true})
	}
	for _, c := range choices {
		opts = append(opts, selOpt{c.Value, c.Label, c.Value == cur})
	}
	bad := s.res.Errors[p] != ""
	body := []app.UI{
		app.Label().For(id).Class("lbl").Text(label),
		&selectBox{ID: id, Class: classIf("pick", bad, "bad"), Options: opts, Param: p, S: s},
	}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + domID(p)).Body(body...)
}

// plain draws a text input without a unit (counts, coefficients, the title).
func (s *sheet) plain(p, label, hint string, numeric bool) app.UI {
	s.shown[p] = true
	id := "in-" + domID(p)
	bad := s.res.Errors[p] != ""
	in := app.Input().Type("text").ID(id).Class(classIf("box wide", bad, "bad")).
		Attr("autocomplete", "off").Attr("spellcheck", "false").Aria("invalid", bad).
		Value(s.box[p]).OnInput(s.onBox(p))
	if numeric {
		in = in.Attr("inputmode", "decimal")
	}
	body := []app.UI{app.Label().For(id).Class("lbl").Body(app.Text(label), hintUI(hint)), in}
	body = append(body, s.fieldNotes(p)...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-" + domID(p)).Body(body...)
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
