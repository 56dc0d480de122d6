package main

import (
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// field is one input, drawn from its part of the view model. A component
// of its own: go-app compares F with the field on screen and draws it
// again only when it changed (S, the sheet, is compared by pointer and is
// there for the event handlers). Handlers carry an EventScope naming the
// parameter: go-app keeps a handler whose code is unchanged, and without
// the scope a box reused for another parameter would write to the old one.
type field struct {
	app.Compo
	S *sheet
	F present.Field
}

// Render draws the field.
func (f *field) Render() (ui app.UI) {
	defer containPart(f.S, "an input", &ui)
	x := f.F
	switch x.Kind {
	case present.FieldRef:
		var btns []app.UI
		for _, o := range x.Options {
			btns = append(btns, app.Button().Type("button").ID("sw-"+x.Param+"-"+o.Value).
				Class(classIf("seg", o.Selected, "on")).Aria("pressed", o.Selected).Text(o.Text).
				OnClick(f.S.onAct(present.Action{Do: "choose", Param: x.Param, Value: o.Value}), app.EventScope(x.Param, o.Value)))
		}
		return divBody("ref", append([]app.UI{
			app.Div().Class("segs small").Attr("role", "group").Aria("label", x.Label).Body(btns...)}, notes(f.S, x)...)...)
	case present.FieldSolved:
		return app.Div().Class("field is-unknown").ID("f-" + present.DomID(x.Param)).Body(append([]app.UI{
			app.Div().Class("lbl").Text(x.Label),
			app.Div().Class("solved").ID("solved-"+x.Param).Body(
				spanText("tag", "Unknown"),
				spanText("solved-val", x.Solved)),
		}, notes(f.S, x)...)...)
	}
	bad := x.Error != ""
	var body []app.UI
	if x.Kind == present.FieldPicker {
		// A choice can be longer than the picker is wide (on a phone, in
		// a segment's card), and a <select> cannot wrap its text: the
		// stylesheet lays the picker, transparent, over a face that shows
		// the choice whole on as many lines as it needs (the face is
		// hidden from screen readers, which read the picker itself).
		body = []app.UI{
			app.Label().For(x.ID).Class("lbl").Text(x.Label),
			divBody("pickwrap",
				&selectBox{ID: x.ID, Class: classIf("pick", bad, "bad"), Options: x.Options, Param: x.Param, S: f.S},
				app.Div().Class("pickface").Aria("hidden", true).Text(chosen(x.Options))),
		}
	} else {
		cls := "box"
		if x.Kind == present.FieldPlain {
			cls = "box wide"
		}
		in := app.Input().Type("text").ID(x.ID).Class(classIf(cls, bad, "bad")).
			Attr("autocomplete", "off").Attr("spellcheck", "false").Aria("invalid", bad)
		if x.Numeric {
			in = in.Attr("inputmode", "decimal")
		}
		if x.Placeholder != "" {
			in = in.Placeholder(x.Placeholder)
		}
		in = in.Value(x.Box).OnInput(f.S.onBox(x.Param), app.EventScope(x.Param))
		label := app.Label().For(x.ID).Class("lbl").Body(app.Text(x.Label), hint(x.Hint))
		if x.Kind == present.FieldPlain {
			body = []app.UI{label, in}
		} else {
			body = []app.UI{label, divBody("entry", in,
				&selectBox{ID: "unit-" + present.DomID(x.Param), Class: "unit", Label: "unit of " + x.Label, Options: x.Options, Param: x.Param, Unit: true, S: f.S})}
		}
	}
	body = append(body, notes(f.S, x)...)
	return formBody(classIf("field", bad, "has-err"), "f-"+present.DomID(x.Param), body...)
}

// notes draws a field's problem beside it, and a pointer to the warnings
// when one is about its value.
func notes(s *sheet, x present.Field) []app.UI {
	var out []app.UI
	if x.Error != "" {
		out = append(out, app.P().ID("err-"+present.DomID(x.Param)).Class("msg err").Attr("role", "alert").Body(
			spanText("tag", "Check"), app.Text(" "+x.Error)))
	}
	if x.Suspect != "" {
		out = append(out, app.P().Class("msg warn suspect").Body(spanText("tag", "Check"), app.Text(" "+x.Suspect)))
	}
	if x.Keep != nil {
		out = append(out, app.P().Class("msg keep").Body(button(s, *x.Keep)))
	}
	if x.Warn {
		out = append(out, app.P().Class("msg warn").Body(
			spanText("tag", "Warning"), app.Text(" about this value: read it beside the result")))
	}
	return out
}

// hint is a short grey explanation after a label.
func hint(h string) app.UI {
	if h == "" {
		return nil
	}
	return spanText("hint", " "+h)
}

// selectBox is a <select> drawn as a component, so that its options are
// compared as values and drawn only when they changed.
type selectBox struct {
	app.Compo
	ID, Class string
	Label     string // aria-label ("" when a <label for> names it)
	Options   []present.Option
	Param     string
	Unit      bool   // a unit picker rather than a choice
	List      bool   // the unit of a data-sheet column
	Fit       bool   // the picker that adds a fitting
	S         *sheet // the sheet whose handlers it calls (compared by pointer)

	keys     app.Func // the fitting picker's own key listener (focus.go)
	fitKey   string   // the last key seen on the fitting picker, "" after a pick
	fitKeyAt float64  // its event's timeStamp, ms
}

// OnMount gives the fitting picker a key listener of its own, which runs
// as the key is pressed (see fitKeyDown).
func (b *selectBox) OnMount(ctx app.Context) {
	if !b.Fit || !app.IsClient {
		return
	}
	el := ctx.JSSrc()
	b.keys = app.FuncOf(func(_ app.Value, args []app.Value) any {
		if len(args) > 0 && b.S != nil && b.Fit {
			b.fitKeyDown(args[0], el)
		}
		return nil
	})
	el.Call("addEventListener", "keydown", b.keys)
	el.Call("addEventListener", "keypress", b.keys)
}

// OnDismount removes the key listener.
func (b *selectBox) OnDismount() {
	if b.keys != nil {
		b.keys.Release()
		b.keys = nil
	}
}

// Render draws the select.
func (b *selectBox) Render() app.UI {
	opts := make([]app.UI, len(b.Options))
	for i, o := range b.Options {
		opts[i] = app.Option().Value(o.Value).Selected(o.Selected).Text(o.Text)
	}
	var h app.EventHandler
	switch {
	case b.List:
		h = b.S.onPicked(b.Param, "list-unit")
	case b.Unit:
		h = b.S.onPicked(b.Param, "unit")
	default:
		h = b.S.onPicked(b.Param, "choose")
	}
	sel := app.Select().ID(b.ID).Class(b.Class)
	if b.Fit { // adds only on an explicit choice (focus.go)
		sel = sel.OnChange(b.onFitChange, app.EventScope(b.Param, b.Fit)).OnBlur(b.onFitBlur)
	} else {
		sel = sel.OnChange(h, app.EventScope(b.Param, b.Unit, b.List, b.Fit))
	}
	if b.Label != "" {
		sel = sel.Aria("label", b.Label)
	}

	return sel.Body(opts...)
}

// classIf returns base, plus extra when cond holds.
func classIf(base string, cond bool, extra string) string {
	if cond {
		return base + " " + extra
	}
	return base
}

// chosen is the text of the selected option (the first when none is).
func chosen(opts []present.Option) string {
	for _, o := range opts {
		if o.Selected {
			return o.Text
		}
	}
	if len(opts) > 0 {
		return opts[0].Text
	}
	return ""
}
