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
