package main

import (
	"fmt"
	"runtime"
	"strings"

	"fieldhead/calc/scenario"

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
			}
		}()
		s.res = scenario.Evaluate(s.scen)
	}()
}

// containRender is deferred by Render: on a panic it names the part that
// failed (from the stack) and draws a plain sheet that still holds every
// input, so the person can correct or copy them.
func (s *sheet) containRender(ui *app.UI) {
	r := recover()
	if r == nil {
		return
	}
	s.noteFault("drawing "+panicPart(), r)
	*ui = s.fallbackSheet()
}

// noteFault records a contained panic and logs it with its stack to the
// browser console for whoever debugs it.
func (s *sheet) noteFault(what string, r any) {
	s.fault = &fault{what: what, msg: fmt.Sprint(r)}
	buf := make([]byte, 8<<10)
	buf = buf[:runtime.Stack(buf, false)]
	app.Logf("fieldhead: contained a panic while %s: %v\n%s", what, r, buf)
}

// partNames put the sheet's drawing functions in words for the banner. A
// function not listed is named by its Go name, which still says where.
var partNames = map[string]string{
	"Render":       "the sheet",
	"header":       "the top bar",
	"balanceView":  "the Balance view",
	"convertView":  "the Convert view",
	"regimeView":   "the Regime view",
	"lineView":     "the Line view",
	"pumpView":     "the Pump view",
	"reportView":   "the Report view",
	"answerCard":   "the answer",
	"answerText":   "the answer",
	"answerLines":  "the lines under the answer",
	"budgetCard":   "“Where the head goes”",
	"pointCard":    "a point of the balance",
	"betweenCard":  "“Between the points”",
	"liquidCard":   "“Liquid and site”",
	"regimeCard":   "the flow in the run",
	"convertCard":  "the converted values",
	"runInputs":    "the pipe run inputs",
	"fittings":     "the fitting list",
	"fittingsFor":  "the fitting list",
	"warningList":  "the warnings",
	"fieldNotes":   "a field's messages",
	"quantity":     "an input",
	"unitOptions":  "a unit picker",
	"noteFor":      "a field's messages",
	"choice":       "a picker",
	"plain":        "an input",
	"toggle":       "a switch",
	"shareRow":     "the sheet actions",
	"orphans":      "the list of other inputs to check",
	"printHead":    "the printed sheet's heading",
	"printFoot":    "the printed sheet's footer",
	"linkProblem":  "the link notice",
	"updateBanner": "the update notice",
}

// guardFuncs are this file's own functions, skipped when naming the part
// that panicked.
var guardFuncs = map[string]bool{
	"contain": true, "containRender": true, "noteFault": true, "testPanic": true, "panicPart": true,
}

// panicPart names the innermost function of this program on the stack of
// the panic being recovered ("the answer", or a Go name such as
// "lineChart"). It is called from a deferred function, where the frames of
// the panic are still on the stack.
func panicPart() string {
	pcs := make([]uintptr, 64)
	n := runtime.Callers(1, pcs)
	frames := runtime.CallersFrames(pcs[:n])
	self, _ := frames.Next()
	// This program's functions are "main.…" in the page and
	// "fieldhead/app.…" in its tests: take the prefix from this function.
	own := strings.TrimSuffix(self.Function, "panicPart")
	afterPanic := false
	for {
		f, more := frames.Next()
		if strings.HasPrefix(f.Function, "runtime.gopanic") {
			afterPanic = true
		} else if afterPanic && strings.HasPrefix(f.Function, own) {
			name := f.Function[strings.LastIndexByte(f.Function, '.')+1:]
			if strings.HasPrefix(name, "func") { // a closure: name its enclosing method
				trimmed := strings.TrimSuffix(f.Function, "."+name)
				name = trimmed[strings.LastIndexByte(trimmed, '.')+1:]
			}
			if !guardFuncs[name] {
				if words := partNames[name]; words != "" {
					return words
				}
				return name
			}
		}
		if !more {
			return "the sheet"
		}
	}
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
		app.Span().Class("tag").Text("Fault"),
		app.Text(" Fieldhead hit an internal error while "+s.fault.what+" ("+s.fault.msg+"). "+
			"Your inputs are kept, in the boxes, in the link and on this device; change any of them to try again."),
		app.Button().Type("button").ID("fault-dismiss").Class("act").Text("Dismiss").
			OnClick(func(ctx app.Context, e app.Event) { s.fault = nil }),
	)
}

// fallbackSheet is drawn when Render fails: the banner, and every
// parameter of the scenario as a labelled box, as the link holds it.
// Editing a box goes through the usual handler, so a fix brings the full
// sheet back.
func (s *sheet) fallbackSheet() app.UI {
	var rows []app.UI
	for _, p := range s.presentParams() {
		id := "in-" + p
		rows = append(rows, app.Div().Class("field").ID("f-"+p).Body(
			app.Label().For(id).Class("lbl").Text(labelFor(p)),
			app.Input().Type("text").ID(id).Class("box wide").
				Attr("autocomplete", "off").Attr("spellcheck", "false").
				Value(s.scen.Get(p)).OnInput(s.onBox(p), app.EventScope(p)),
		))
	}
	return app.Div().ID("sheet").Class("sheet fallback").Body(
		s.faultBanner(),
		app.Main().Body(app.Section().Class("card").ID("fallback-inputs").Body(
			append([]app.UI{app.H2().Text("Inputs of this sheet")}, rows...)...,
		)),
		cautions(),
	)
}

// presentParams lists the scenario's parameters in link order.
func (s *sheet) presentParams() []string {
	var out []string
	for _, p := range scenario.Params {
		if s.scen.Get(p) != "" {
			out = append(out, p)
		}
	}
	for n := 1; n <= scenario.MaxSegments; n++ {
		for _, f := range scenario.SegmentFields {
			if p := scenario.SegmentParam(n, f); s.scen.Get(p) != "" {
				out = append(out, p)
			}
		}
	}
	return out
}

// labelFor names a parameter in words for the fallback sheet.
func labelFor(p string) string {
	if l := paramLabels[p]; l != "" {
		return l
	}
	return p
}

// keepSavedSheet handles a link refused as a whole (too long, say): rather
// than open an empty sheet, and then write that empty sheet over the one
// saved on this device, it opens the saved sheet (else the demo) and says
// why the link was not used.
func keepSavedSheet(sc scenario.Scenario, msg string, fromLink bool) (scenario.Scenario, string) {
	if msg == "" || !fromLink || sc.Encode() != "" {
		return sc, msg
	}
	note := "the link could not be used (" + msg + "); "
	if saved := storageGet(storageKey); saved != "" {
		if s, err := scenario.Parse(saved); err == nil {
			return s, note + "this is the sheet saved on this device"
		}
	}
	return scenario.Demo(), note + "this is the demo"
}
