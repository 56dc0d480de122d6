package main

import (
	"fmt"
	"runtime"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// Panic containment. A Go panic that escapes an event handler or Render
// ends the WebAssembly program: the page freezes with nothing said. Every
// handler of the sheet therefore starts with
//
//	defer s.contain("what the handler does, in words")
//
// and Render with `defer s.containRender(&ui)`. A contained panic leaves
// the scenario, the link and the saved copy as they were before the event,
// keeps every box as typed, and shows a banner that names what failed.

// fault is the last contained panic.
type fault struct {
	what string // what the page was doing, in words ("drawing the answer card")
	msg  string // the panic's own text
}

// contain is deferred by event handlers: it recovers a panic, records what
// failed and makes the figures on screen match the inputs again (or shows
// none). It does not save the scenario, so the link and localStorage keep
// the last state that computed without a fault.
func (s *sheet) contain(what string) {
	r := recover()
	if r == nil {
		return
	}
	s.noteFault(what, r)
	func() {
		defer func() {
			if recover() != nil {
				s.res = scenario.Result{} // no figures rather than stale ones
				s.vm = present.Sheet{View: s.vm.View, Name: s.vm.Name, Cautions: present.Cautions}
			}
		}()
		s.res = scenario.Evaluate(scenario.Read(s.d.Scen))
		s.vm = present.Build(&s.d, s.res)
	}()
}

// containRender is deferred by Render: on a panic it draws a plain sheet
// that still holds every input, so the person can correct or copy them.
// (A card's own failure is contained by the card, containPart, which
// names it by its title.)
func (s *sheet) containRender(ui *app.UI) {
	r := recover()
	if r == nil {
		return
	}
	s.noteFault("drawing the sheet", r)
	*ui = s.fallbackSheet()
}

// containPart is deferred by a component's Render: a panic there is
// recorded for the banner, naming what was drawn, and the part is drawn
// as an empty placeholder, rather than ending the program.
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

// noteFault records a contained panic and logs it with its stack to the
// browser console for whoever debugs it.
func (s *sheet) noteFault(what string, r any) {
	s.fault = &fault{what: what, msg: fmt.Sprint(r)}
	buf := make([]byte, 8<<10)
	buf = buf[:runtime.Stack(buf, false)]
	app.Logf("fieldhead: contained a panic while %s: %v\n%s", what, r, buf)
}

// testPanic panics when the page was started with the test-only switch
// window.fieldheadPanicTest set to where (the browser test sets it through
// the DevTools protocol; no link, parameter or input can set it).
func (s *sheet) testPanic(where string) {
	if !app.IsClient {
		return
	}
	v := app.Window().Get("fieldheadPanicTest")
	if v.Truthy() && v.String() == where {
		panic("deliberate panic for the browser test (" + where + ")")
	}
}

// faultBanner tells what failed, that nothing typed is lost, and how to
// carry on.
func (s *sheet) faultBanner() app.UI {
	if s.fault == nil {
		return nil
	}
	return app.Div().Class("banner fault").ID("fault").Attr("role", "alert").Body(
		spanText("tag", "Fault"),
		app.Text(" Fieldhead hit an internal error while "+s.fault.what+" ("+s.fault.msg+"). "+
			"Your inputs are kept, in the boxes, in the link and on this device; change any of them to try again."),
		act("fault-dismiss", "act", "Dismiss", func(ctx app.Context, e app.Event) { s.fault = nil }),
	)
}

// fallbackSheet is drawn when Render fails: the banner, and every
// parameter of the scenario as a labelled box, as the link holds it.
// Editing a box goes through the usual handler, so a fix brings the full
// sheet back.
func (s *sheet) fallbackSheet() app.UI {
	var rows []app.UI
	for _, p := range scenario.AllParams() {
		if s.d.Scen.Get(p) == "" {
			continue
		}
		id := "in-" + present.DomID(p)
		rows = append(rows, formBody("field", "f-"+present.DomID(p),
			app.Label().For(id).Class("lbl").Text(scenario.Label(p)),
			app.Input().Type("text").ID(id).Class("box wide").
				Attr("autocomplete", "off").Attr("spellcheck", "false").
				Value(s.d.Scen.Get(p)).OnInput(s.onBox(p), app.EventScope(p)),
		))
	}
	return app.Div().ID("sheet").Class("sheet fallback").Body(
		s.faultBanner(),
		app.Main().Body(app.Section().Class("card").ID("fallback-inputs").Body(
			append([]app.UI{app.H2().Text("Inputs of this sheet")}, rows...)...,
		)),
		cautions(present.Cautions),
	)
}

// keepSavedSheet handles a link refused as a whole (too long, say): rather
// than open an empty sheet, and then write that empty sheet over the one
// saved on this device, it opens the saved sheet (else the demo) and says
// why the link was not used.
func keepSavedSheet(sc scenario.Scenario, msg string, fromLink bool) (scenario.Scenario, string) {
	if msg == "" || !fromLink || sc.Encode() != "" {
		return sc, msg
	}
	if saved := storageGet(storageKey); saved != "" {
		if s, err := scenario.Parse(saved); err == nil {
			return s, present.LinkRefused(msg, true)
		}
	}
	return scenario.Demo(), present.LinkRefused(msg, false)
}
