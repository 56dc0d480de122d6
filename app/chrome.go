package main

import (
	"strconv"

	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// topBar is the bar with the name, the views and the unit system.
type topBar struct {
	app.Compo
	S           *sheet
	Tabs, Units []present.Button
}

// Render draws the bar.
func (t *topBar) Render() (ui app.UI) {
	defer containPart(t.S, "the top bar", &ui)
	brand := divBody("brand", app.Raw(brandMark), app.Span().Text("Fieldhead"))
	tabs := make([]app.UI, len(t.Tabs))
	for i, b := range t.Tabs {
		tabs[i] = button(t.S, b)
	}
	units := make([]app.UI, len(t.Units))
	for i, b := range t.Units {
		units[i] = button(t.S, b)
	}
	return app.Header().Class("topbar").Body(
		brand,
		app.Nav().Class("tabs").Aria("label", "views").Body(tabs...),
		divBody("units",
			spanText("switch-label", "Units"),
			app.Div().Class("segs").Attr("role", "group").Aria("label", "unit system").Body(units...),
		),
	)
}

// brandMark is the icon, drawn inline so it needs no request.
const brandMark = `<svg class="mark" viewBox="0 0 100 100" aria-hidden="true"><rect width="100" height="100" rx="14" fill="currentColor"/><g fill="#fbfaf4" transform="translate(4 4) scale(.92)"><rect x="18" y="70" width="24" height="6"/><rect x="58" y="26" width="24" height="6"/><rect x="46.5" y="36" width="7" height="42"/><polygon points="50,18 62,40 38,40"/></g></svg>`

// shareRow holds the actions on the whole sheet.
func (s *sheet) shareRow() app.UI {
	body := []app.UI{
		act("copy-link", "act main", "Copy link", s.onCopy),
		act("print", "act", "Print sheet", s.onPrint),
		act("demo", "act", "Demo", s.onDemo),
		act("blank", "act", "New sheet", s.onBlank),
	}
	if s.copyNote != "" {
		body = append(body, app.Span().Class("note").ID("copy-note").Attr("role", "status").Text(s.copyNote))
	}
	if s.showLink {
		body = append(body, app.Input().Type("text").ID("share-url").Class("box wide link").
			ReadOnly(true).Aria("label", "share link").Value(s.link()))
	}
	return divBody("share", body...)
}

// installRow offers to install Fieldhead on this device while the browser
// allows it (show), with onInstall on its button. It sits at the foot of
// the sheet, after the cautions: the offer comes whenever the browser
// decides, often while the person types, and in the share row it pushed
// every card down a row (on a phone, the answer by 56 px) under their
// finger.
func installRow(show bool, onInstall app.EventHandler) app.UI {
	if !show {
		return nil
	}
	return app.Div().Class("install-row").Attr("role", "region").Aria("label", "this device").Body( // a landmark, as the title row
		app.Span().Text("Fieldhead opens without a connection once visited. Installed, it also has its own icon and window:"),
		act("install", "act", "Install on this device", onInstall))
}

// act is a button of the page's own (not of the view model); not inlined,
// as a copy of go-app's builders per button made the wasm larger.
//
//go:noinline
func act(id, class, text string, h app.EventHandler) app.UI {
	return app.Button().Type("button").ID(id).Class(class).Text(text).OnClick(h)
}

// pageTitle is the document's title: the sheet's name, then ours, so that
// a tab, a bookmark and a printed page's header name the sheet.
func pageTitle(name string) string {
	if name == "" {
		return "Fieldhead"
	}
	return name + " — Fieldhead"
}

// installable reports whether the browser has offered installation: go-app
// keeps beforeinstallprompt for our own button. Apple's browsers have no
// prompt ("Add to Home Screen" in their share menu), so no button there.
func installable(ctx app.Context) bool {
	return app.IsClient && ctx.IsAppInstallable() && !ctx.IsAppleBrowser()
}

// OnAppInstallChange is go-app's signal that the offer changed: a
// beforeinstallprompt event, or the site installed.
func (s *sheet) OnAppInstallChange(ctx app.Context) {
	defer s.contain("updating the install button")
	s.install = installable(ctx)
}

// onInstall shows the browser's install prompt; the offer is used up
// whatever the person answers.
func (s *sheet) onInstall(ctx app.Context, e app.Event) {
	defer s.contain("installing Fieldhead")
	if installable(ctx) {
		ctx.ShowAppInstallPrompt()
	}
	s.install = false
}

// quietFirstInstall stops go-app's "has been updated, reload" message on a
// page no service worker served: our worker's clients.claim on a first
// visit looks like an update to app.js. A real update still shows (update.go
// checks the caches on controllerchange); a signal before start is missed.
func quietFirstInstall() {
	if !app.IsClient {
		return
	}
	win := app.Window()
	perf := win.Get("performance")
	if !perf.Truthy() || !perf.Get("getEntriesByType").Truthy() || !win.Get("goappOnUpdate").Truthy() {
		return
	}
	nav := perf.Call("getEntriesByType", "navigation")
	if nav.Length() > 0 && nav.Index(0).Get("workerStart").Float() > 0 {
		return // a worker served this page: an installed worker is news
	}
	win.Set("goappOnUpdate", app.FuncOf(func(app.Value, []app.Value) any { return nil })) // kept for the page's life
}

// linkProblem reports a link that could not be read whole.
func (s *sheet) linkProblem() app.UI {
	if s.linkErr == "" {
		return nil
	}
	return app.Div().Class("banner").ID("link-error").Attr("role", "alert").Body(
		spanText("tag", "Link"),
		app.Text(" "+present.LinkBanner(s.linkErr, s.damaged)),
	)
}

// unverified says that a sheet from a damaged link has no trusted figure
// yet, with the button that confirms its values; it prints too.
func (s *sheet) unverified() app.UI {
	if s.vm.Unverified == "" {
		return nil
	}
	return app.Div().Class("banner unverified-note").ID("unverified").Attr("role", "alert").Body(
		spanText("tag", "Unverified"), app.Text(" "+s.vm.Unverified+" "), button(s, s.vm.Verify))
}

// storeBanner says when sheets cannot be kept on this device.
func (s *sheet) storeBanner() app.UI {
	if s.bk.problem == "" || s.vm.View == "book" {
		return nil
	}
	return app.Div().Class("banner").ID("store-problem").Attr("role", "status").Body(
		spanText("tag", "Device"),
		app.Text(" Sheets cannot be kept on this device ("+s.bk.problem+"). This sheet still works from its link: copy the link to keep it."))
}

// others lists problems with inputs that this view uses but does not draw.
func others(items []string) app.UI {
	if len(items) == 0 {
		return nil
	}
	lis := make([]app.UI, len(items))
	for i, t := range items {
		lis[i] = app.Li().Text(t)
	}
	return app.Div().Class("banner").ID("other-errors").Attr("role", "alert").Body(
		spanText("tag", "Check"),
		app.Text(" Inputs of this sheet not shown here:"),
		app.Ul().Body(lis...),
	)
}

// cautions draws the caution box.
func cautions(list []string) app.UI {
	items := make([]app.UI, len(list))
	for i, c := range list {
		items[i] = app.Li().Text(c)
	}
	return app.Aside().Class("cautions").ID("cautions").Body(
		app.H2().Text("Before you act on these figures"),
		app.Ul().Body(items...),
	)
}

// printHead and printFoot appear on the printed sheet only.
func (s *sheet) printHead() app.UI {
	var note app.UI
	if s.vm.View != "report" { // printed with the browser's own command, not Print sheet
		note = app.P().Class("print-note").Text("This is the input form of one view. Print sheet prints the whole record: inputs, results, charts, link and signatures.")
	}
	return divBody("print-only",
		divBody("printhead",
			app.Div().Class("ph-name").Text("Fieldhead — "+s.vm.Name),
			app.Div().Class("ph-date").Text("Printed "+nowText())),
		note,
	)
}

func (s *sheet) printFoot() app.UI {
	var names []app.UI
	for i, m := range s.vm.Methods {
		sep := "; "
		if i == len(s.vm.Methods)-1 {
			sep = "."
		}
		names = append(names, app.Text(m.What+sep))
	}
	return divBody("print-only printfoot",
		app.P().Body(append([]app.UI{app.Strong().Text("Methods (listed on the Report view): ")}, names...)...),
		app.P().Body(app.Strong().Text("This sheet as a link: "), spanText("linktext", s.link())),
	)
}

// linkRecord draws the share link on the Report: its QR code beside a
// short form a person can read off the paper; the whole link on the screen
// only (printed, it ran over eight lines).
func linkRecord(link string) app.UI {
	code := qrSVG(link, "QR code of this sheet's link")
	say := "Scan the code with a phone's camera to open this calculation; the whole link has " + strconv.Itoa(len(link)) + " characters."
	if code == "" {
		say = "The link is too long for a QR code (" + strconv.Itoa(len(link)) + " characters): open the sheet on the device it was made on and use Copy link."
	}
	var qr app.UI = app.Div().Class("slot")
	if code != "" {
		qr = divBody("qrbox", app.Raw(code))
	}
	return divBody("linkrec", qr,
		divBody("linkwords",
			app.P().Class("linkshort").ID("report-short-url").Text(shortLink(link)),
			app.P().Class("muted small").Text(say),
			app.P().Class("linktext screen-only").ID("report-url").Text(link),
		),
	)
}

// signoff is the Report's place for the people who did and saw the test,
// filled in by hand on the printed sheet: a commissioning record is signed.
func (s *sheet) signoff() app.UI {
	if s.vm.View != "report" {
		return nil
	}
	who := func(role string) app.UI {
		line := func(what string) app.UI {
			return divBody("signfield", app.Div().Class("signline"), spanText("signlabel", what))
		}
		return divBody("signrow", app.H3().Text(role),
			divBody("signfields", line("name"), line("signature"), line("date")))
	}
	return app.Section().Class("card rsec signoff").ID("signoff").Body(
		app.H2().Text("Signed for the record"),
		app.P().Class("muted small").Text("Filled in by hand on the printed sheet, by whoever made the readings and whoever saw them made."),
		who("Tested by"),
		who("Witnessed by"),
	)
}
