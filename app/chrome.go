package main

import (
	"sort"
	"strings"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// viewHints say in a few words what each view does.
var viewHints = map[string]string{
	"balance": "two-point energy balance",
	"convert": "head ↔ pressure",
	"regime":  "Re and friction",
	"line":    "segments, EGL/HGL",
	"pump":    "duty, NPSH, readings",
	"report":  "the printed sheet",
}

// paramLabels name the parameters in words, for lists of fields to check.
var paramLabels = map[string]string{
	"units": "unit system", "name": "sheet title", "view": "view",
	"liq": "liquid", "t": "temperature", "rho": "density", "mu": "viscosity", "pv": "vapour pressure",
	"alt": "site altitude", "baro": "barometer",
	"p1": "pressure at 1", "p1ref": "gauge/absolute at 1", "z1": "elevation of 1", "v1": "velocity at 1", "d1": "diameter at 1",
	"p2": "pressure at 2", "p2ref": "gauge/absolute at 2", "z2": "elevation of 2", "v2": "velocity at 2", "d2": "diameter at 2",
	"q": "flow", "hp": "pump head", "ht": "turbine head", "hf": "friction head", "solve": "solve for", "alpha": "α",
	"l": "length of the run", "d": "inside diameter", "nps": "nominal size", "sch": "schedule", "mat": "material",
	"eps": "roughness", "fit": "fittings", "k": "extra ΣK", "fm": "friction method", "chw": "Hazen–Williams C",
	"cv": "value to convert", "cvref": "gauge/absolute",
	"pq": "data-sheet flows", "ph": "data-sheet heads", "peff": "data-sheet efficiencies", "pnpsh": "data-sheet NPSH required",
	"spd": "speed", "pumps": "pumps working together", "zp": "pump centreline elevation", "pafter": "pump position on the line",
	"npshr": "NPSH required (typed)", "ps": "suction gauge reading", "pd": "discharge gauge reading",
	"zs": "suction gauge height", "zd": "discharge gauge height", "ds": "pipe diameter at the suction gauge",
	"dd": "pipe diameter at the discharge gauge", "qm": "measured flow", "pin": "motor electrical input",
	"etat": "turbine-and-generator efficiency",
}

// toCheck lists, in words, the fields with errors among params.
func (s *sheet) toCheck(params ...string) string {
	var names []string
	for _, p := range params {
		if s.res.Errors[p] != nil {
			names = append(names, labelOf(p))
		}
	}
	if len(names) == 0 {
		return "No answer yet: complete the inputs."
	}
	return "No answer yet. Check: " + strings.Join(names, ", ") + "."
}

// relevant lists, per view, the parameters whose errors matter there even
// when the view does not draw their field (so none is silently hidden).
var relevant = map[string]map[string]bool{
	"convert": set("view", "units", "name", "liq", "t", "rho", "mu", "pv", "alt", "baro", "cv", "cvref"),
	"regime":  set("view", "units", "name", "liq", "t", "rho", "mu", "pv", "q", "l", "d", "nps", "sch", "mat", "eps", "fit", "k", "fm", "chw"),
}

func set(keys ...string) map[string]bool {
	m := make(map[string]bool, len(keys))
	for _, k := range keys {
		m[k] = true
	}
	return m
}

// Render draws the page.
func (s *sheet) Render() (ui app.UI) {
	defer s.containRender(&ui)
	s.shown = map[string]bool{}
	s.warned = map[string]bool{}
	if !s.loaded {
		return app.Div().ID("sheet").Class("sheet").Body(
			s.header(),
			app.Main().Body(app.P().Class("starting").Text("Starting the calculator…")),
			cautions(),
		)
	}
	s.testPanic("render")
	var view app.UI
	switch s.view() {
	case "convert":
		view = s.convertView()
	case "regime":
		view = s.regimeView()
	case "line":
		view = s.lineView()
	case "pump":
		view = s.pumpView()
	case "report":
		view = s.reportView()
	default:
		view = s.balanceView()
	}
	title := s.plain("name", "Sheet title", "(site, equipment, date)", false)
	return app.Div().ID("sheet").Class("sheet view-"+s.view()).Body(
		s.printHead(),
		s.header(),
		app.Div().Class("notices").Body(s.faultBanner(), s.updateBanner()), // always there: a notice must not move the inputs
		app.Div().Class("titlerow").Body(title, s.shareRow()),
		s.linkProblem(),
		app.Main().Body(app.Div().Class("notices").Body(s.orphans()), view), // a stable slot: the list appearing must not re-create the inputs (and lose the focus)
		cautions(),
		s.printFoot(),
	)
}

// header is the bar with the name, the views and the sheet actions.
func (s *sheet) header() app.UI {
	return &topBar{S: s, View: s.view(), US: s.us(), Loaded: s.loaded}
}

// brandMark is the icon, drawn inline so it needs no request.
const brandMark = `<svg class="mark" viewBox="0 0 100 100" aria-hidden="true"><rect width="100" height="100" rx="14" fill="currentColor"/><g fill="#fbfaf4"><rect x="18" y="70" width="24" height="6"/><rect x="58" y="26" width="24" height="6"/><rect x="46.5" y="36" width="7" height="42"/><polygon points="50,18 62,40 38,40"/></g></svg>`

// shareRow holds the actions on the whole sheet.
func (s *sheet) shareRow() app.UI {
	body := []app.UI{
		app.Button().Type("button").ID("copy-link").Class("act main").Text("Copy link").OnClick(s.onCopy),
		app.Button().Type("button").ID("print").Class("act").Text("Print sheet").OnClick(s.onPrint),
		app.Button().Type("button").ID("demo").Class("act").Text("Demo").OnClick(s.onDemo),
		app.Button().Type("button").ID("blank").Class("act").Text("New sheet").OnClick(s.onBlank),
	}
	if s.copyNote != "" {
		body = append(body, app.Span().Class("note").ID("copy-note").Attr("role", "status").Text(s.copyNote))
	}
	if s.showLink {
		body = append(body, app.Input().Type("text").ID("share-url").Class("box wide link").
			ReadOnly(true).Aria("label", "share link").Value(s.link()))
	}
	return app.Div().Class("share").Body(body...)
}

// linkProblem reports a link that could not be read whole.
func (s *sheet) linkProblem() app.UI {
	if s.linkErr == "" {
		return nil
	}
	return app.Div().Class("banner").ID("link-error").Attr("role", "alert").Body(
		app.Span().Class("tag").Text("Link"),
		app.Text(" Part of the link was not understood and was left out: "+s.linkErr),
	)
}

// orphans lists errors about parameters that this view uses but does not
// draw, so no problem is hidden.
func (s *sheet) orphans() app.UI {
	rel := relevant[s.view()]
	var keys []string
	for p := range s.res.Errors {
		if s.shown[p] {
			continue
		}
		if s.view() == "balance" && (p == "cv" || p == "cvref") {
			continue
		}
		if rel != nil && !rel[p] {
			continue
		}
		keys = append(keys, p)
	}
	if len(keys) == 0 {
		return nil
	}
	sort.Strings(keys)
	var items []app.UI
	for _, k := range keys {
		items = append(items, app.Li().Text(s.res.Errors[k].Error()))
	}
	return app.Div().Class("banner").ID("other-errors").Attr("role", "alert").Body(
		app.Span().Class("tag").Text("Check"),
		app.Text(" Inputs of this sheet not shown here:"),
		app.Ul().Body(items...),
	)
}

// cautionText is the caution of every sheet, on screen and on paper.
var cautionText = []string{
	"Lines and vessels under pressure hold stored energy: isolate and release it before you open anything.",
	"Shutting a valve fast, water hammer and cavitation can break equipment and injure people.",
	"Pumps bring rotating parts and live electrical supplies: lock out and tag out before work.",
	"A wet well is a confined space: test the air and work to your entry permit.",
	"These figures are engineering estimates from the values entered here. Local codes, the makers' instructions and the judgement of a licensed professional decide any real action.",
}

// cautions draws the caution box.
func cautions() app.UI {
	items := make([]app.UI, 0, len(cautionText))
	for _, c := range cautionText {
		items = append(items, app.Li().Text(c))
	}
	return app.Aside().Class("cautions").ID("cautions").Body(
		app.H2().Text("Before you act on these figures"),
		app.Ul().Body(items...),
	)
}

// printHead and printFoot appear on the printed sheet only.
func (s *sheet) printHead() app.UI {
	name := strings.TrimSpace(s.scen.Get("name"))
	if name == "" {
		name = "Untitled sheet"
	}
	return app.Div().Class("print-only printhead").Body(
		app.Div().Class("ph-name").Text("Fieldhead — "+name),
		app.Div().Class("ph-date").Text("Printed "+nowText()),
	)
}

func (s *sheet) printFoot() app.UI {
	return app.Div().Class("print-only printfoot").Body(
		app.P().Body(app.Strong().Text("Methods: "), app.Text(methodsText)),
		app.P().Body(app.Strong().Text("This sheet as a link: "), app.Span().Class("linktext").Text(s.link())),
	)
}

// methodsText names the methods behind the figures, for the printed sheet.
const methodsText = "steady-flow energy balance in head form; water properties from IAPWS-IF97 (region 1 and saturation line) and the IAPWS 2008 viscosity release; site pressure from the ISO 2533 standard atmosphere; Darcy friction factor by Colebrook–White (or Swamee–Jain, Haaland, Hazen–Williams as chosen); fittings by loss coefficients K; unit factors per NIST SP 811; pipe dimensions per ASME B36.10M/B36.19M."
