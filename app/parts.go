package main

import (
	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// Parts of the sheet drawn as components of their own (the inputs: field;
// the top bar: topBar; the pickers: selectBox). On every edit the
// sheet draws itself again and go-app compares the new tree with the page;
// a component is compared by its fields instead, and drawn again only when
// one of them changed. An edit then redraws the field being typed in and
// the figures that depend on it, not every input of the view (make bench:
// "edit → updated result").
//
// Each part's Render is a function of its exported fields alone (S, the
// sheet, is only there for the event handlers), so a part that compares
// equal draws exactly what is on screen. Whatever a part shows is worked
// out by the sheet's own Render, which also keeps its bookkeeping (fields
// drawn, for the list of other inputs to check). Handlers carry an
// EventScope naming what they act on: go-app keeps a handler whose code is
// unchanged, and without the scope a box reused for another parameter
// (velocity ⇄ diameter, altitude ⇄ barometer) would write to the old one.

// note is what fieldNotes draws under a field: its error and whether a
// warning names it.
type note struct {
	Msg  string // the error, without the leading "p: "
	Warn bool   // a warning is about this value
}

// noteFor is p's note in the current result.
func (s *sheet) noteFor(p string) note {
	return note{Msg: s.message(p), Warn: s.warnsAbout(p)}
}

// warnsAbout reports whether a warning of the result (as warnings() merges
// them) names p.
func (s *sheet) warnsAbout(p string) bool {
	for _, w := range s.res.Warnings {
		if w.Param == p {
			return true
		}
	}
	if b := s.res.Balance; b != nil {
		for _, w := range b.Warnings {
			if w.Field != p {
				continue
			}
			dup := false
			for _, o := range s.res.Warnings {
				if o.Text == w.Text {
					dup = true
					break
				}
			}
			if !dup {
				return true
			}
		}
	}
	return false
}

// ui draws the note: the error beside its field, and a pointer to the
// warnings when one is about the value.
func (n note) ui(p string) []app.UI {
	var out []app.UI
	if n.Msg != "" {
		out = append(out, app.P().ID("err-"+domID(p)).Class("msg err").Attr("role", "alert").Body(
			app.Span().Class("tag").Text("Check"), app.Text(" "+n.Msg)))
	}
	if n.Warn {
		out = append(out, app.P().Class("msg warn").Body(
			app.Span().Class("tag").Text("Warning"), app.Text(" about this value: read it beside the result")))
	}
	return out
}

// containPart is deferred by a part's Render: a panic there is recorded
// for the banner and the part is drawn as an empty placeholder, rather
// than ending the program.
func containPart(s *sheet, what string, ui *app.UI) {
	r := recover()
	if r == nil {
		return
	}
	if s != nil {
		s.noteFault("drawing "+what, r)
	}
	*ui = app.Div().Class("field")
}

// fieldKind says which input a field part draws.
type fieldKind uint8

const (
	boxField    fieldKind = iota // a value and its unit picker (quantity)
	plainField                   // a text box alone, full width (plain)
	choiceField                  // a picker of an enumerated parameter (choice)
	switchField                  // the switch of an either/or group (toggle)
	refField                     // gauge or absolute, as two buttons (ref)
)

// field is one input of the sheet. A single component type draws every
// kind: each type of component costs the page its own copy of go-app's
// component methods.
type field struct {
	app.Compo
	S           *sheet
	Kind        fieldKind
	P           string // the parameter, or the group of a switch
	Label, Hint string
	Box         string // the text in the box
	Placeholder string
	Cur         string // the choice shown by a switch or a gauge/absolute pair
	Bad         bool
	Numeric     bool     // the numeric keypad
	Note        note     // under the field (not for a switch)
	Options     []selOpt // the unit picker's or the picker's options
}

// Render draws the field.
func (f *field) Render() (ui app.UI) {
	defer containPart(f.S, "an input", &ui)
	switch f.Kind {
	case switchField:
		return f.switchUI()
	case refField:
		return f.refUI()
	}
	id := "in-" + domID(f.P)
	var body []app.UI
	if f.Kind == choiceField {
		body = []app.UI{
			app.Label().For(id).Class("lbl").Text(f.Label),
			&selectBox{ID: id, Class: classIf("pick", f.Bad, "bad"), Options: f.Options, Param: f.P, S: f.S},
		}
	} else {
		cls := "box"
		if f.Kind == plainField {
			cls = "box wide"
		}
		in := app.Input().Type("text").ID(id).Class(classIf(cls, f.Bad, "bad")).
			Attr("autocomplete", "off").Attr("spellcheck", "false").Aria("invalid", f.Bad)
		if f.Numeric {
			in = in.Attr("inputmode", "decimal")
		}
		if f.Placeholder != "" {
			in = in.Placeholder(f.Placeholder)
		}
		in = in.Value(f.Box).OnInput(f.S.onBox(f.P), app.EventScope(f.P))
		label := app.Label().For(id).Class("lbl").Body(app.Text(f.Label), hintUI(f.Hint))
		if f.Kind == plainField {
			body = []app.UI{label, in}
		} else {
			body = []app.UI{label, app.Div().Class("entry").Body(in,
				&selectBox{ID: "unit-" + domID(f.P), Class: "unit", Label: "unit", Options: f.Options, Param: f.P, Unit: true, S: f.S})}
		}
	}
	body = append(body, f.Note.ui(f.P)...)
	return app.Div().Class(classIf("field", f.Bad, "has-err")).ID("f-" + domID(f.P)).Body(body...)
}

// switchUI draws a group's switch.
func (f *field) switchUI() app.UI {
	opts := groupOptions(f.P)
	buttons := make([]app.UI, 0, len(opts))
	for _, o := range opts {
		on := o.key == f.Cur
		buttons = append(buttons, app.Button().
			Type("button").
			ID("sw-"+domID(f.P)+"-"+o.key).
			Class(classIf("seg", on, "on")).
			Aria("pressed", on).
			Text(o.label).
			OnClick(f.S.switchTo(f.P, o.key), app.EventScope(f.P, o.key)))
	}
	return app.Div().Class("switch").Body(
		app.Span().Class("switch-label").Text(f.Label),
		app.Div().Class("segs").Aria("label", f.Label).Body(buttons...),
	)
}

// refUI draws the gauge/absolute choice of a pressure.
func (f *field) refUI() app.UI {
	var btns []app.UI
	for _, c := range choicesOf(f.P) {
		on := c.Value == f.Cur
		btns = append(btns, app.Button().Type("button").ID("sw-"+f.P+"-"+c.Value).
			Class(classIf("seg", on, "on")).Aria("pressed", on).Text(c.Label).
			OnClick(f.S.choose(f.P, c.Value), app.EventScope(f.P, c.Value)))
	}
	out := []app.UI{app.Div().Class("segs small").Aria("label", "pressure reference").Body(btns...)}
	out = append(out, f.Note.ui(f.P)...)
	return app.Div().Class("ref").Body(out...)
}

// topBar is the bar with the name, the views and the unit system.
type topBar struct {
	app.Compo
	S      *sheet
	View   string // the view shown ("" before the program runs: none marked)
	US     bool
	Loaded bool
}

// Render draws the bar.
func (t *topBar) Render() (ui app.UI) {
	defer containPart(t.S, "the top bar", &ui)
	var tabs []app.UI
	for _, c := range choicesOf("view") {
		if viewHints[c.Value] == "" {
			continue // a view this page does not draw yet
		}
		on := c.Value == t.View && t.Loaded
		tabs = append(tabs, app.Button().Type("button").ID("view-"+c.Value).
			Class(classIf("tab", on, "on")).Aria("pressed", on).
			OnClick(t.S.choose("view", c.Value), app.EventScope("view", c.Value)).Body(
			app.Span().Class("tab-name").Text(c.Label),
			app.Span().Class("tab-hint").Text(viewHints[c.Value]),
		))
	}
	var units []app.UI
	for _, c := range choicesOf("units") {
		on := (c.Value == "us") == t.US
		units = append(units, app.Button().Type("button").ID("units-"+c.Value).
			Class(classIf("seg", on, "on")).Aria("pressed", on).Text(c.Label).
			OnClick(t.S.choose("units", c.Value), app.EventScope("units", c.Value)))
	}
	return app.Header().Class("topbar").Body(
		app.Div().Class("brand").Body(app.Raw(brandMark), app.Span().Text("Fieldhead")),
		app.Nav().Class("tabs").Aria("label", "views").Body(tabs...),
		app.Div().Class("units").Body(
			app.Span().Class("switch-label").Text("Units"),
			app.Div().Class("segs").Aria("label", "unit system").Body(units...),
		),
	)
}

// choiceOptions lists the options of p's picker with cur chosen: the blank
// choice first when given, and a value the vocabulary does not know kept
// (and said to be unknown) rather than dropped.
func choiceOptions(p, cur, blank string) []selOpt {
	choices := choicesOf(p)
	opts := make([]selOpt, 0, len(choices)+2)
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
	return opts
}
