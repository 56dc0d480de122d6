package main

import (
	"strconv"
	"strings"

	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// fitEntry is one line of the fitting list as the editor shows it.
type fitEntry struct {
	key   string
	count int
}

// fitEntries reads the fit text for the editor; ok is false when the text
// is not a list the editor can show (the raw box then stays the way in).
func fitEntries(text string) ([]fitEntry, bool) {
	fc, err := scenario.ParseFittings(text)
	if err != nil {
		return nil, false
	}
	out := make([]fitEntry, 0, len(fc))
	for _, f := range fc {
		out = append(out, fitEntry{f.Key, f.Count})
	}
	return out, true
}

// fitText writes the editor's list back in the link's form.
func fitText(list []fitEntry) string {
	parts := make([]string, 0, len(list))
	for _, f := range list {
		if f.count > 0 {
			parts = append(parts, f.key+":"+strconv.Itoa(f.count))
		}
	}
	return strings.Join(parts, ",")
}

// fitLabel is the name of a fitting key.
func fitLabel(key string) string {
	for _, c := range choicesOf("fit") {
		if c.Value == key {
			return c.Label
		}
	}
	return key
}

// setFittings stores a new list from the editor into p ("fit", "s2.fit").
func (s *sheet) setFittings(p string, list []fitEntry) {
	s.setParam(p, fitText(list))
	s.changed()
}

// stepFitting changes the count of one kind of fitting in p's list by
// delta, adding the kind when it is not there. The list is read from the
// scenario when the button is pressed: the handlers go-app keeps from an
// earlier drawing must not write back an older list.
func (s *sheet) stepFitting(p, key string, delta int) {
	list, ok := fitEntries(s.scen.Get(p))
	if !ok {
		return
	}
	for i := range list {
		if list[i].key == key {
			list[i].count += delta
			s.setFittings(p, list)
			return
		}
	}
	if delta > 0 {
		s.setFittings(p, append(list, fitEntry{key, delta}))
	}
}

// fittings draws the fitting editor of the single run.
func (s *sheet) fittings() app.UI { return s.fittingsFor("fit") }

// fittingsFor draws the fitting editor of p ("fit", or a segment's "s2.fit"):
// one line per kind with − and +, a picker to add a kind, and the list as
// text for those who prefer typing.
func (s *sheet) fittingsFor(p string) app.UI {
	s.shown[p] = true
	list, ok := fitEntries(s.scen.Get(p))
	var rows []app.UI
	if ok {
		for _, f := range list {
			key := f.key
			rows = append(rows, app.Li().Class("fit").Body(
				app.Span().Class("fit-name").Text(fitLabel(key)),
				app.Div().Class("stepper").Body(
					app.Button().Type("button").Class("step").Aria("label", "one fewer "+fitLabel(key)).Text("−").
						OnClick(func(ctx app.Context, e app.Event) {
							defer s.contain("changing the fittings")
							s.stepFitting(p, key, -1)
						}, app.EventScope(p, key)),
					app.Span().Class("count").Text(strconv.Itoa(f.count)),
					app.Button().Type("button").Class("step").Aria("label", "one more "+fitLabel(key)).Text("+").
						OnClick(func(ctx app.Context, e app.Event) {
							defer s.contain("changing the fittings")
							s.stepFitting(p, key, +1)
						}, app.EventScope(p, key)),
				),
			))
		}
	}
	var add []app.UI
	add = append(add, app.Option().Value("").Selected(true).Text("Add a fitting…"))
	for _, c := range choicesOf("fit") {
		add = append(add, app.Option().Value(c.Value).Text(c.Label))
	}
	body := []app.UI{
		app.Div().Class("lbl").Text("Fittings"),
	}
	if len(rows) > 0 {
		body = append(body, app.Ul().Class("fits").Body(rows...))
	}
	if ok {
		addID := "add-fit"
		if p != "fit" {
			addID = "add-" + domID(p)
		}
		body = append(body, app.Select().ID(addID).Class("pick add-fit").Aria("label", "add a fitting").
			OnChange(func(ctx app.Context, e app.Event) {
				defer s.contain("adding a fitting")
				if key := ctx.JSSrc().Get("value").String(); key != "" {
					s.stepFitting(p, key, +1)
				}
			}, app.EventScope(p)).Body(add...))
	}
	body = append(body,
		app.Details().Class("astext").Open(!ok || s.res.Errors[p] != nil).Body(
			app.Summary().Text("Fittings as text"),
			s.plain(p, "key:count, comma separated", "", false),
		))
	return app.Div().Class("field fittings").Body(body...)
}
