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
	if m == nil {
		return ""
	}
	return strings.TrimPrefix(m.Error(), p+": ")
}

// fieldNotes draws p's error and the warnings about p, in place.
func (s *sheet) fieldNotes(p string) []app.UI {
	return s.noteFor(p).ui(p)
}

// quantity draws an input for a value with a unit: a box (numeric keypad)
// and a unit picker. A unit typed in the box wins over the picker. When p is
// the balance's unknown the box gives way to the answer.
func (s *sheet) quantity(p, label, hint string) app.UI {
	s.shown[p] = true
	if unknowns[p] && s.view() == "balance" && s.solve() == p {
		return s.unknownField(p, label)
	}
	return &field{S: s, Kind: boxField, P: p, Label: label, Hint: hint, Box: s.box[p], Placeholder: placeholder(p),
		Bad: s.res.Errors[p] != nil, Note: s.noteFor(p), Numeric: true, Options: s.unitOptions(p)}
}

// unitOptions are the options of p's unit picker. When the box holds a
// unit of its own the picker says so instead of pretending to apply.
func (s *sheet) unitOptions(p string) []selOpt {
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
	return opts
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
	return &field{S: s, Kind: choiceField, P: p, Label: label, Options: choiceOptions(p, s.scen.Get(p), blank),
		Bad: s.res.Errors[p] != nil, Note: s.noteFor(p)}
}

// plain draws a text input without a unit (counts, coefficients, the title).
func (s *sheet) plain(p, label, hint string, numeric bool) app.UI {
	s.shown[p] = true
	return &field{S: s, Kind: plainField, P: p, Label: label, Hint: hint, Box: s.box[p],
		Bad: s.res.Errors[p] != nil, Note: s.noteFor(p), Numeric: numeric}
}

// ref draws the gauge/absolute choice of a pressure as two buttons.
func (s *sheet) ref(p string) app.UI {
	s.shown[p] = true
	cur := s.scen.Get(p)
	if cur == "" {
		cur = "g"
	}
	return &field{S: s, Kind: refField, P: p, Cur: cur, Note: s.noteFor(p)}
}
