package main

import (
	"time"

	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// storageGet reads a localStorage entry; "" when absent or when storage is
// not available (private mode, blocked).
func storageGet(key string) (v string) {
	defer func() {
		if recover() != nil {
			v = ""
		}
	}()
	ls := app.Window().Get("localStorage")
	if !ls.Truthy() {
		return ""
	}
	item := ls.Call("getItem", key)
	if !item.Truthy() {
		return ""
	}
	return item.String()
}

// storageSet writes a localStorage entry, ignoring a full or blocked store
// (the link still holds the scenario).
func storageSet(key, value string) {
	defer func() { _ = recover() }()
	ls := app.Window().Get("localStorage")
	if ls.Truthy() {
		ls.Call("setItem", key, value)
	}
}

// replaceQuery puts the scenario in the address bar without a new history
// entry, keeping the path (and so a deployment sub-path).
func replaceQuery(q string) {
	defer func() { _ = recover() }()
	loc := app.Window().Get("location")
	search := ""
	if q != "" {
		search = "?" + q
	}
	// Opening a sheet from its own link (most returns) changes nothing:
	// replaceState would cost a few ms of the first draw for no change.
	if loc.Get("search").String() == search && loc.Get("hash").String() == "" {
		return
	}
	app.Window().Get("history").Call("replaceState", nil, "", loc.Get("pathname").String()+search)
}

// nowText is the local date and time for the printed sheet, written the
// one way every reader takes alike (ISO 8601, with the offset from UTC):
// the browser's own words ("12/5/2026") read as 12 May in some places. The
// wasm's local zone is the browser's offset now (Go's js/wasm time zone).
func nowText() string {
	if !app.IsClient {
		return ""
	}
	return time.Now().Format("2006-01-02 15:04 UTC-07:00")
}

// onCopy copies the share link: the asynchronous clipboard where the
// browser allows it, else the link appears selected for a manual copy.
func (s *sheet) onCopy(ctx app.Context, e app.Event) {
	defer s.contain("copying the link")
	link := s.link()
	clip := app.Window().Get("navigator").Get("clipboard")
	if !clip.Truthy() {
		s.fallbackCopy(ctx)
		return
	}
	var ok, fail app.Func
	release := func() {
		ok.Release()
		fail.Release()
	}
	ok = app.FuncOf(func(this app.Value, args []app.Value) any {
		ctx.Dispatch(func(ctx app.Context) {
			s.copyNote = "Link copied. Paste it into a message or a note."
			s.showLink = true
		})
		release()
		return nil
	})
	fail = app.FuncOf(func(this app.Value, args []app.Value) any {
		ctx.Dispatch(func(ctx app.Context) { s.fallbackCopy(ctx) })
		release()
		return nil
	})
	clip.Call("writeText", link).Call("then", ok, fail)
}

// fallbackCopy shows the link in a read-only box, selects it and tries the
// old copy command.
func (s *sheet) fallbackCopy(ctx app.Context) {
	s.showLink = true
	s.copyNote = "Select the link below and copy it."
	ctx.Defer(func(ctx app.Context) {
		defer func() { _ = recover() }()
		el := app.Window().GetElementByID("share-url")
		if !el.Truthy() {
			return
		}
		el.Call("focus")
		el.Call("select")
		if app.Window().Get("document").Call("execCommand", "copy").Bool() {
			ctx.Dispatch(func(ctx app.Context) { s.copyNote = "Link copied (it is also shown below)." })
		}
	})
}

// onPrint prints the record of the sheet, the Report, from any view: the
// Report is drawn, the browser's print dialog opened once it is on the
// page, and the view open before comes back when the dialog closes
// (afterprint). The print stylesheet turns the Report into a sheet.
func (s *sheet) onPrint(ctx app.Context, e app.Event) {
	defer s.contain("opening the print dialog")
	back := s.vm.View
	if back == "report" {
		app.Window().Call("print")
		return
	}
	s.d.Choose("view", "report")
	s.evaluate()
	ctx.Defer(func(ctx app.Context) { // after the Report is drawn
		defer s.contain("printing the report")
		win := app.Window()
		var done app.Func
		done = app.FuncOf(func(app.Value, []app.Value) any {
			win.Call("removeEventListener", "afterprint", done)
			done.Release()
			ctx.Dispatch(func(ctx app.Context) {
				defer s.contain("returning from the print dialog")
				if s.vm.View == "report" { // not moved meanwhile
					s.d.Choose("view", back)
					s.evaluate()
				}
			})
			return nil
		})
		win.Call("addEventListener", "afterprint", done)
		win.Call("print")
	})
}

// onDemo opens the demo as a sheet of its own.
func (s *sheet) onDemo(ctx app.Context, e app.Event) {
	defer s.contain("loading the demo")
	s.openNew(scenario.Demo()) // the open sheet stays in the site book
}

// onBlank starts a new sheet on the same view and unit system, for the
// same site and pump (scenario.NextSheet); the open one stays kept.
func (s *sheet) onBlank(ctx app.Context, e app.Event) {
	defer s.contain("starting a new sheet")
	s.openNew(scenario.NextSheet(s.d.Scen)) // the open sheet stays in the site book
}

// lend puts in each card the first draw put off (.card-later) that card
// as the page showed it before the wasm ran, inert (web/prerender.js,
// fieldheadSnapshot.lend): the written demo or the kept sheet's snapshot,
// which show only the sheet the wasm opens. A card shown by neither stays
// empty until it is drawn.
func lend() {
	defer func() { _ = recover() }() // a convenience: never a fault
	if snap := app.Window().Get("fieldheadSnapshot"); snap.Truthy() {
		snap.Call("lend")
	}
}

// markTime adds a mark to the page's performance timeline, where make
// bench reads the phases of a load.
func markTime(name string) {
	if !app.IsClient {
		return
	}
	if perf := app.Window().Get("performance"); perf.Truthy() {
		perf.Call("mark", name)
	}
}
