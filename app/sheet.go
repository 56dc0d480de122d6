package main

import (
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// storageKey is the localStorage entry that keeps the last scenario: the
// same query string as the share link.
const storageKey = "fieldhead.scenario"

// sheet is the whole page: one scenario, its result, and the text of every
// input box as typed. The scenario is the single source of truth; boxes and
// unit pickers only hold what a person is in the middle of typing.
type sheet struct {
	app.Compo

	scen    scenario.Scenario
	res     scenario.Result
	linkErr string // a problem with the link as a whole (unknown parameter, …)
	loaded  bool   // false while pre-rendered on the server, before the wasm runs

	box  map[string]string // text in each input box
	pick map[string]string // unit chosen in each picker ("" = the default unit)
	mode map[string]string // explicit choice of an either/or group, see groups

	base     string          // page URL without the query
	query    string          // s.scen.Encode(), also in the URL and in localStorage
	copyNote string          // result of the last "Copy link"
	showLink bool            // show the link as selectable text
	fault    *fault          // the last contained panic, shown in a banner (guard.go)
	update   bool            // a newer version of the site is installed (update.go)
	shown    map[string]bool // parameters drawn in this render
	warned   map[string]bool // warnings drawn in this render

	segs int // segment cards shown on the Line view beyond those in the scenario (a new, empty one)
	rows int // rows of the pump data sheet shown (at least those in the scenario)
	wide int // chart width drawn last (see chartWidth)
}

// newSheet is the route's component. In the browser it restores the
// scenario from the link, else from localStorage, else the demo.
func newSheet() app.Composer {
	s := &sheet{}
	if app.IsServer {
		return s
	}
	u := app.Window().URL()
	base := *u
	base.RawQuery, base.Fragment = "", ""
	s.base = base.String()
	query := u.RawQuery
	if query == "" {
		query = storageGet(storageKey)
	}
	if query == "" {
		s.adopt(scenario.Demo(), "")
	} else {
		sc, err := scenario.Parse(query)
		msg := ""
		if err != nil {
			msg = err.Error()
		}
		sc, msg = keepSavedSheet(sc, msg, u.RawQuery != "")
		s.adopt(sc, msg)
	}
	s.loaded = true
	return s
}

// OnMount records when the first result reached the screen, for the
// browser test and for anyone timing the page.
func (s *sheet) OnMount(ctx app.Context) {
	s.watchUpdates(ctx)
	if app.IsClient && s.loaded {
		perf := app.Window().Get("performance")
		if perf.Truthy() {
			app.Window().Set("fieldheadFirstResult", perf.Call("now").Float())
		}
	}
}

// adopt makes sc the current scenario and fills the boxes from it.
func (s *sheet) adopt(sc scenario.Scenario, linkErr string) {
	s.scen = sc
	s.linkErr = linkErr
	s.box = map[string]string{}
	s.pick = map[string]string{}
	s.mode = map[string]string{}
	s.segs, s.rows = 0, 0
	for _, p := range allParams() {
		raw := sc.Get(p)
		if raw == "" {
			continue
		}
		s.box[p], s.pick[p] = s.splitForBox(p, raw)
	}
	s.evaluate()
}

// splitForBox decides what a box and its picker show for a stored text:
// "45L/s" → "45" with L/s picked; a unit the picker does not list stays in
// the box as typed.
func (s *sheet) splitForBox(p, raw string) (box, pick string) {
	if !hasUnits(p) {
		return raw, ""
	}
	num, unit := scenario.Split(raw)
	if unit == "" {
		return num, ""
	}
	if num == "" {
		return raw, ""
	}
	if u, err := calc.LookupUnit(unit); err == nil && listed(p, u.Symbol) {
		return num, u.Symbol
	}
	if listed(p, unit) {
		return num, unit
	}
	return raw, ""
}

// hasUnits reports whether a parameter takes a value with a unit picker.
func hasUnits(p string) bool {
	_, ok := scenario.DimensionOf(p)
	return ok && len(scenario.UnitChoices(p, false)) > 0
}

// listed reports whether unit is in the picker of p, in either system.
func listed(p, unit string) bool {
	for _, us := range []bool{false, true} {
		for _, u := range scenario.UnitChoices(p, us) {
			if u == unit {
				return true
			}
		}
	}
	return false
}

// us reports whether US customary units are the defaults.
func (s *sheet) us() bool { return s.scen.Get("units") == "us" }

// unitFor is the unit a number typed into p's box is taken in.
func (s *sheet) unitFor(p string) string {
	if s.pick[p] != "" {
		return s.pick[p]
	}
	return scenario.DefaultUnit(p, s.us())
}

// compose is the scenario text for p's box: the box as typed if it holds a
// unit, else the number and the picker's unit.
func (s *sheet) compose(p string) string {
	text := strings.TrimSpace(s.box[p])
	if text == "" || !hasUnits(p) {
		return text
	}
	num, unit := scenario.Split(text)
	if unit != "" || num == "" {
		return text
	}
	if s.pick[p] == "" {
		s.pick[p] = s.unitFor(p) // the unit is fixed once a number is typed
	}
	return num + s.pick[p]
}

// store writes p from its box into the scenario.
func (s *sheet) store(p string) {
	_ = s.scen.Set(p, s.compose(p))
}

// setParam sets a parameter directly (choices, counts) and its box.
func (s *sheet) setParam(p, text string) {
	s.box[p], s.pick[p] = s.splitForBox(p, text)
	_ = s.scen.Set(p, text)
}

// evaluate recomputes the result and saves the scenario in the URL and in
// localStorage.
func (s *sheet) evaluate() {
	s.testPanic("evaluate")
	s.res = scenario.Evaluate(s.scen)
	s.query = s.scen.Encode()
	if app.IsClient {
		replaceQuery(s.query)
		storageSet(storageKey, s.query)
	}
}

// changed is called after any edit.
func (s *sheet) changed() {
	s.copyNote = ""
	s.evaluate()
}

// link is the full share link.
func (s *sheet) link() string {
	if s.query == "" {
		return s.base
	}
	return s.base + "?" + s.query
}

// view is the view the scenario opens on.
func (s *sheet) view() string {
	switch v := s.scen.Get("view"); v {
	case "convert", "regime", "line", "pump", "report":
		return v
	}
	return "balance"
}

// solve is the parameter the balance solves for.
func (s *sheet) solve() string {
	if v := s.scen.Get("solve"); v != "" {
		return v
	}
	return "hp"
}

// Event handlers.

func (s *sheet) onBox(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("recalculating after an edit to " + labelFor(p))
		s.box[p] = ctx.JSSrc().Get("value").String()
		before := s.scen.Get(p)
		s.store(p)
		if s.scen.Get(p) == before {
			// Only the box changed (a space, a unit picked once a number is
			// typed): the scenario, its result and the link stay as they are.
			s.copyNote = ""
			return
		}
		s.changed()
	}
}

func (s *sheet) onPick(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("changing the unit of " + labelFor(p))
		u := ctx.JSSrc().Get("value").String()
		if u == "" {
			return
		}
		s.pick[p] = u
		if num, unit := scenario.Split(s.box[p]); unit != "" && num != "" {
			s.box[p] = num // the picker replaces a typed unit
		}
		s.store(p)
		s.changed()
	}
}

func (s *sheet) onChoice(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("choosing the " + labelFor(p))
		s.setParam(p, ctx.JSSrc().Get("value").String())
		s.changed()
	}
}

func (s *sheet) choose(p, v string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("switching the " + labelFor(p))
		s.setParam(p, v)
		s.changed()
	}
}
