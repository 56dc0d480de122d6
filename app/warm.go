package main

import (
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// warmUp runs, in the worker that compiles the wasm (web/start.js,
// which has no document), the program's first steps once: the sheet the
// page will open read, worked out, worded and laid out as components, as
// newSheet and the first draw do. The browser compiles each of the
// module's functions when it is first called, on the thread that calls
// it; the module is shared with the page, whose own start then finds most
// of them compiled rather than compile them on its main thread (make bench:
// a cold share link's Go phases). It reports whether it ran; the program
// then ends. Nothing it does is seen: it is only a head start.
func warmUp() bool {
	if !app.IsClient || app.Window().Get("document").Truthy() {
		return false
	}
	defer func() { _ = recover() }() // a head start only: never a fault
	sc := scenario.Demo()
	if q := app.Window().Get("fieldheadWarmQuery"); q.Truthy() {
		if p, err := scenario.Parse(q.String()); err == nil {
			sc = p
		}
	}
	s := &sheet{wide: 720, later: true, loaded: true} // any chart width: the same code draws every width
	s.d.Reset(sc)
	s.res = scenario.Evaluate(scenario.Read(s.d.Scen))
	s.build()
	s.Render()
	return true
}
