package main

import "github.com/maxence-charriere/go-app/v10/pkg/app"

// Shapes of element the cards draw again and again. Each of go-app's
// builder calls written out costs the wasm a few hundred bytes where it is
// written (an interface call, its resume point, the conversion to app.UI),
// so a shape written in many places is written once here.

// divBody is app.Div().Class(class).Body(body...).
func divBody(class string, body ...app.UI) app.UI { return app.Div().Class(class).Body(body...) }

// spanText is app.Span().Class(class).Text(text).
func spanText(class, text string) app.UI { return app.Span().Class(class).Text(text) }

// formBody is a form of its own around a box or a picker and what goes
// with it (its label, its unit, its notes). Chromium's autofill reads, on
// every change of a control, the control's whole form, or every control
// in no form when it is in none (70-odd on a view): 11.5 ms of the main
// thread per key at 4x CPU, 1.8 ms with a form per field (make bench
// -edits-only -trace; TestControlsInSmallForms). Its method is dialog,
// which outside a dialog submits nothing: Enter in a lone box does nothing.
func formBody(class, id string, body ...app.UI) app.UI {
	f := app.FormAsDiv().Attr("method", "dialog") // the Div's type: no Form type in the wasm
	if class != "" {
		f = f.Class(class)
	}
	if id != "" {
		f = f.ID(id)
	}
	return f.Body(body...)
}
