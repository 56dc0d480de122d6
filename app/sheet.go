package main

import (
	"errors"
	"strings"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// storageKey is the localStorage entry that keeps the last scenario: the
// same query string as the share link.
const storageKey = "fieldhead.scenario"

// sheet is the page: the sheet being edited, its result and view model,
// and the page's own state (the link, notices). It keeps state and
// handles events; the cards draw the view model (card.go, field.go).
type sheet struct {
	app.Compo

	d       scenario.Draft
	res     scenario.Result
	vm      present.Sheet
	linkErr string // a problem with the link as a whole (unknown parameter, …)
	loaded  bool   // false while pre-rendered on the server, before the wasm runs

	base      string         // page URL without the query
	query     lazyQuery      // the scenario's signed link, also in the URL and in localStorage
	damaged   bool           // opened from a link that arrived damaged, not yet edited
	copyNote  string         // result of the last "Copy link"
	showLink  bool           // show the link as selectable text
	fault     *fault         // the last contained panic, shown in a banner (guard.go)
	update    bool           // a newer version of the site is installed (update.go)
	wide      int            // chart width drawn last (see chartWidth)
	bk        book           // the sheets kept on this device (book.go)
	ctx       app.Context    // the sheet's own context, from OnMount
	pending   bool           // a write of the sheet is put off (save)
	edits     int            // edits so far, for save to see a pause
	install   bool           // the browser offers to install the site (chrome.go)
	mounted   map[*card]bool // the cards on the page (card.OnMount)
	stale     bool           // cards redrawn alone since the sheet was last drawn (redrawCards)
	cardsOnly int            // edits drawn by redrawCards
	later     bool           // the first draw: cards past the first firstCards wait for the first paint
	leaving   leaveWatch     // a put-off save written when the page is left or hidden
}

// firstCards is how many of a view's cards, in the order of its
// arrangement, the page draws before its first paint: the answer alone
// (each view's arrangement starts with it). The others follow one frame
// later, so that the first answer on screen does not wait for the inputs,
// the charts and the long cards; meanwhile they show as the page showed
// them before the wasm (lend). With the answer and the two inputs beside
// it first, a cold share link's answer came 75 ms later on average and
// the whole sheet 60 ms later (make bench -cold-only, five alternated
// rounds at 4× CPU: 1 169 against 1 093 ms).
const firstCards = 1

// newSheet is the route's component. In the browser it restores the
// scenario from the link, else from localStorage, else the demo.
func newSheet() app.Composer {
	s := &sheet{}
	if app.IsServer { // the site writer's page: the demo, drawn before the wasm runs (loader.go)
		s.adopt(scenario.Demo(), "")
		s.wide = chartWidth()
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
		msg := present.LinkErrorText(err)
		var d *scenario.DamagedLink
		s.damaged = errors.As(err, &d) && u.RawQuery != ""
		sc, msg = keepSavedSheet(sc, msg, u.RawQuery != "")
		s.adopt(sc, msg)
		if s.damaged {
			s.d.Damaged(d)
			s.build() // worded again, unverified
		}
	}
	s.loaded = true
	s.later = true
	markTime("fieldhead-evaluated") // the sheet read, worked out and worded (make bench)
	s.wide = chartWidth()
	return s
}

// OnMount draws the cards put off by the first draw once it is painted,
// then records when the whole sheet reached the screen.
func (s *sheet) OnMount(ctx app.Context) {
	s.ctx = ctx
	markTime("fieldhead-mounted") // the first draw in the page (make bench)
	if app.IsClient {
		leave := func(hiddenOnly bool) app.Func {
			return app.FuncOf(func(app.Value, []app.Value) any {
				doc := app.Window().Get("document")
				if s.pending && (!hiddenOnly || doc.Get("visibilityState").String() == "hidden") {
					s.flush()
					s.snapshot()
				}
				return nil
			})
		}
		s.leaving = leaveWatch{pagehide: leave(false), hidden: leave(true)}
		if s.pending { // a write put off before the mount (save)
			s.leaving.set(true)
		}
	}
	s.watchUpdates(ctx)
	s.install = installable(ctx)
	quietFirstInstall()
	if app.IsClient && s.loaded {
		s.startBook(ctx)
	}
	if app.IsClient && s.loaded {
		// Until then, the cards put off keep the place they had before
		// the wasm ran (the written demo or the kept sheet's snapshot,
		// both of this very sheet), inert, rather than leave the screen.
		lend()
		// The rest of the cards once the first ones are painted: the
		// second frame's callback runs after the first frame's paint and
		// what the page queued behind it.
		app.Window().Call("requestAnimationFrame", once(func(app.Value) {
			app.Window().Call("requestAnimationFrame", once(func(app.Value) {
				app.Window().Call("setTimeout", once(func(app.Value) {
					ctx.Dispatch(func(ctx app.Context) {
						s.later = false
						ctx.Defer(func(ctx app.Context) {
							// The whole sheet is drawn: the time, for the
							// browser tests and anyone timing the page.
							if perf := app.Window().Get("performance"); perf.Truthy() {
								app.Window().Set("fieldheadFirstResult", perf.Call("now").Float())
							}
							if s.pending { // what save put off before the mount
								s.flush()
							}
							// The sheet as opened is kept now (save put it
							// off): its snapshot a little later, unless an
							// edit keeps it anew.
							app.Window().Call("setTimeout", once(func(app.Value) {
								ctx.Dispatch(func(ctx app.Context) {
									ctx.PreventUpdate()
									if !s.pending {
										s.snapshot()
									}
								})
							}), snapshotDelay)
						})
					})
				}), 0)
			}))
		}))
	}
}

// OnResize redraws the charts when they need another width.
func (s *sheet) OnResize(ctx app.Context) {
	if w := chartWidth(); w != s.wide {
		s.wide = w
		return
	}
	ctx.PreventUpdate()
}

// openNew makes sc a new sheet (New sheet, Demo): the open one stays kept.
func (s *sheet) openNew(sc scenario.Scenario) {
	s.bk.id, s.bk.created = newID(), nowMs()
	for _, r := range s.bk.kept {
		if sameSheet(r.Link, sc) { // the demo kept before, unchanged
			s.bk.id, s.bk.created = r.ID, r.Created
		}
	}
	s.adopt(sc, "")
}

// onImport reads a sheets file chosen in the site book.
func (s *sheet) onImport(ctx app.Context, e app.Event) {
	defer s.contain("reading a sheets file")
	files := ctx.JSSrc().Get("files")
	if !files.Truthy() || files.Length() == 0 {
		return
	}
	files.Index(0).Call("text").Call("then", once(func(v app.Value) {
		text := v.String()
		ctx.Dispatch(func(ctx app.Context) {
			defer s.contain("adding the sheets of a sheets file")
			s.bk.importSheets(text)
			s.build()
		})
	}))
}

// adopt makes sc the sheet, with nothing of the previous one held aside.
func (s *sheet) adopt(sc scenario.Scenario, linkErr string) {
	if linkErr == "" {
		s.damaged = false
	}
	s.d.Reset(sc)
	s.linkErr = linkErr
	s.copyNote, s.showLink = "", false
	s.evaluate()
}

// evaluate recomputes the result and the view model and saves the
// scenario in the URL and in localStorage.
func (s *sheet) evaluate() {
	s.testPanic("evaluate")
	s.res = scenario.Evaluate(scenario.Read(s.d.Scen))
	s.query = lazyQuery{} // signed when first needed: most edits draw no link
	s.build()
	s.save()
}

// save writes the sheet into the address bar, the saved copy and the site
// book once typing pauses (saveDelay after the last edit), not during a
// burst: the writes cost about as much as an edit (the address bar's
// replaceState alone a few ms on a phone) and would delay the next key's
// answer. A page being left or hidden writes at once (OnMount).
func (s *sheet) save() {
	if !app.IsClient {
		return
	}
	if s.ctx.Src() == nil {
		// Before the page is mounted: written once the whole sheet is
		// drawn (OnMount), not before the first draw, where signing the
		// link, the address bar and the saved copy held a cold share link's
		// answer back by 20–40 ms at 4× CPU (make bench -cold-only: its
		// profile, and its phases in alternated rounds).
		s.pending = true
		s.leaving.set(true)
		return
	}
	s.edits++
	if s.pending { // the timer is armed: it waits again for this edit
		return
	}
	s.pending = true
	s.leaving.set(true)
	ctx := s.ctx
	var arm func()
	arm = func() {
		seen := s.edits
		app.Window().Call("setTimeout", once(func(app.Value) {
			ctx.Dispatch(func(ctx app.Context) {
				defer s.contain("keeping the sheet")
				if !s.pending { // written meanwhile (pagehide)
					ctx.PreventUpdate()
					return
				}
				if s.edits != seen { // typed since: wait for the pause
					arm()
					ctx.PreventUpdate()
					return
				}
				s.flush()
				s.snapshot()
				if s.vm.View != "book" && !s.stale {
					ctx.PreventUpdate() // nothing on screen changes
				} else {
					s.build() // the book lists the sheet as kept now
				}
			})
		}), saveDelay)
	}
	arm()
}

// leaveWatch writes a put-off save when the page is left or hidden. Its
// listeners are on the page only while a save is put off: a page being
// left otherwise spent about 20 ms at 4× CPU (make bench, an offline
// reload's trace) starting the Go program only to find nothing to write.
type leaveWatch struct {
	pagehide, hidden app.Func // the handlers, made once (OnMount)
}

// set adds the listeners (on) or removes them; the browser ignores a
// listener added twice or removed when absent. A phone may end a page in
// the background without pagehide: hence visibilitychange too. It also
// tells the browser tests whether a save is put off (fieldheadPending).
func (l leaveWatch) set(on bool) {
	app.Window().Set("fieldheadPending", on)
	if l.pagehide == nil { // before the page is mounted
		return
	}
	f := "removeEventListener"
	if on {
		f = "addEventListener"
	}
	app.Window().Call(f, "pagehide", l.pagehide)
	app.Window().Get("document").Call(f, "visibilitychange", l.hidden)
}

// saveDelay is how long, in ms, save waits after the last edit.
const saveDelay = 400

// flush writes what save put off: the sheet into the address bar, the
// title, the saved copy and the site book. The snapshot is apart
// (snapshot): the sheet opened is written once drawn whole and its snapshot
// taken a second later (OnMount).
func (s *sheet) flush() {
	s.pending = false
	if app.IsClient {
		s.leaving.set(false)
	}
	replaceQuery(s.query.of(s.d.Scen))
	app.Window().Get("document").Set("title", pageTitle(s.vm.Name))
	if !s.damaged { // a damaged link never replaces a kept sheet
		storageSet(storageKey, s.query.of(s.d.Scen))
		s.bk.keep(s.d.Scen, s.res, s.damaged)
	}
}

// snapshot keeps the kept sheet as drawn, for the next visit to paint
// before the wasm runs (web/prerender.js, which also says why nothing in
// it can run). Only once the sheet is on the page: before, the page holds
// the written demo.
func (s *sheet) snapshot() {
	if !app.IsClient || s.ctx.Src() == nil || s.damaged { // a damaged link never replaces a kept sheet
		return
	}
	defer func() { _ = recover() }() // a snapshot is a convenience: never a fault
	if snap := app.Window().Get("fieldheadSnapshot"); snap.Truthy() {
		snap.Call("take", s.query.of(s.d.Scen))
	}
}

// snapshotDelay is how long, in ms, after the sheet is first drawn its
// snapshot is taken: after the first paint, not in its way.
const snapshotDelay = 1000

// build makes the view model, with what only the page knows: the link
// and the time on the printed sheet.
func (s *sheet) build() {
	s.vm = present.Build(&s.d, s.res)
	if s.vm.View == "book" {
		s.vm.Cards = append([]present.Card{s.bk.card()}, s.bk.histories(s.d.US())...)
	}
	if s.vm.View == "report" {
		s.vm.SetText("report-url", s.link())
		s.vm.SetText("report-date", nowText())
	}
}

// link is the full share link.
func (s *sheet) link() string {
	if q := s.query.of(s.d.Scen); q != "" {
		return s.base + "?" + q
	}
	return s.base
}

// lazyQuery is a sheet's link's query (scenario.Scenario.Sign), signed
// once per change when first asked for: signing costs about a tenth of an
// edit's Go time, and an edit typed into a box draws no link (the address
// bar and the saved copy wait for a pause in the typing). The zero value
// is unsigned.
type lazyQuery struct {
	query  string
	signed bool
}

// of is the query of sc, the scenario the query was last reset for.
func (l *lazyQuery) of(sc scenario.Scenario) string {
	if !l.signed {
		l.query, l.signed = sc.Sign(), true
	}
	return l.query
}

// Event handlers: each changes the Draft one way, then recomputes.

// onBox records what is typed into a box.
func (s *sheet) onBox(p string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("recalculating after an edit to " + scenario.Label(p))
		if p == "book-search" {
			s.bk.state.Search = ctx.JSSrc().Get("value").String()
			s.build()
			return
		}
		before, note, damaged := s.vm, s.copyNote, s.damaged
		if s.d.Type(p, ctx.JSSrc().Get("value").String()) {
			s.copyNote, s.damaged = "", false
			s.evaluate()
		} else {
			// Only the box changed (a space, a unit half typed): the scenario,
			// its result and the link stay; the view model follows the box.
			s.build()
		}
		if note == s.copyNote && damaged == s.damaged {
			s.redrawCards(ctx, before)
		}
	}
}

// redrawCards draws an edit by redrawing only the cards whose part of
// the view model changed, when nothing else the sheet draws has: go-app
// would otherwise render the sheet's own tree and compare it with the page
// (the sheet is an ancestor of the box the event came from). Each changed
// card is given its new part and redrawn alone (Context.Redraw, our go-app
// copy). The sheet's text that follows the link (the printed foot) is drawn
// again once typing pauses (save). It returns whether it did.
func (s *sheet) redrawCards(ctx app.Context, before present.Sheet) bool {
	if s.fault != nil || s.ctx.Src() == nil || len(before.Cards) != len(s.vm.Cards) || len(s.mounted) != len(s.vm.Cards) {
		return false
	}
	a, b := before, s.vm
	a.Cards, b.Cards = nil, nil
	if !same(&a, &b) {
		return false
	}
	byID := make(map[string]*card, len(s.mounted))
	for c := range s.mounted {
		if _, dup := byID[c.C.ID]; dup || !c.Mounted() {
			return false
		}
		byID[c.C.ID] = c
	}
	var redraw []int
	var kept [][]bool // per card redrawn, its unchanged blocks (sameBlocks)
	for i, nc := range s.vm.Cards {
		c := byID[nc.ID]
		if c == nil || before.Cards[i].ID != nc.ID {
			return false
		}
		if c.W != s.wide {
			redraw, kept = append(redraw, i), append(kept, nil)
		} else if sm, all := sameBlocks(c.C, nc); !all {
			redraw, kept = append(redraw, i), append(kept, sm)
		}
	}
	ctx.PreventUpdate() // the box's field, its card and the sheet
	for k, i := range redraw {
		c := byID[s.vm.Cards[i].ID]
		c.C, c.W = s.vm.Cards[i], s.wide
		c.same, c.sameAt = kept[k], nil
		if len(c.C.Blocks) > 0 {
			c.sameAt = &c.C.Blocks[0]
		}
		c.ctx.Redraw()
	}
	s.stale = true
	s.cardsOnly++
	if s.cardsOnly == 1 { // for the browser tests; a call out per edit costs 0.1 ms at 4× CPU
		app.Window().Set("fieldheadCardsOnly", s.cardsOnly)
	}
	return true
}

// sameBlocks compares a card's part before and after an edit: all when
// they are equal; else, when only blocks changed (the same number of
// them), which blocks are unchanged; else nil.
func sameBlocks(a, b present.Card) ([]bool, bool) {
	ab, bb := a.Blocks, b.Blocks
	if len(ab) != len(bb) {
		return nil, false
	}
	a.Blocks, b.Blocks = nil, nil
	if !same(&a, &b) {
		return nil, false
	}
	kept, all := make([]bool, len(bb)), true
	for i := range bb {
		kept[i] = same(&ab[i], &bb[i])
		all = all && kept[i]
	}
	if all {
		return nil, true
	}
	return kept, false
}

// onPicked handles a picker: a unit, a choice or a data-sheet column's
// unit (the fitting picker has its own handlers, focus.go).
func (s *sheet) onPicked(p, kind string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("changing " + scenario.Label(p))
		v := ctx.JSSrc().Get("value").String()
		switch kind {
		case "unit":
			if v == "" {
				return
			}
			s.d.PickUnit(p, v)
		case "list-unit":
			s.d.SetListUnit(p, v)
		default:
			s.d.Choose(p, v)
		}
		s.copyNote = ""
		s.evaluate()
	}
}

// onCell records a value typed into the data sheet.
func (s *sheet) onCell(p string, row int) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("recalculating after an edit to the data sheet")
		s.d.SetCell(p, row, ctx.JSSrc().Get("value").String())
		s.evaluate()
	}
}

// onAct is the handler of a button.
func (s *sheet) onAct(a present.Action) app.EventHandler { return s.onConfirmed(a, "") }

// onConfirmed is the handler of a button that asks first when confirm is
// not empty.
func (s *sheet) onConfirmed(a present.Action, confirm string) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("acting on “" + a.Do + " " + a.Param + "”")
		if confirm != "" && !app.Window().Call("confirm", confirm).Bool() {
			return
		}
		view := s.vm.View
		defer func() {
			ids, follow := s.focusTargets(a)
			s.refocus(s.vm.View != view, s.vm.View, ids, follow)
		}()
		switch a.Do {
		case "choose":
			s.d.Choose(a.Param, a.Value)
		case "switch":
			s.d.Switch(a.Param, a.Value)
		case "seg-move":
			s.d.MoveSegment(a.N, a.Step)
		case "seg-remove":
			s.d.RemoveSegment(a.N)
		case "seg-add":
			s.d.AddSegment()
		case "row-add":
			s.d.AddRow()
		case "row-remove":
			s.d.RemoveRow(a.N)
		case "reading-add":
			s.d.AddReading()
		case "reading-remove":
			s.d.RemoveReading(a.N)
		case "keep":
			s.d.Keep(a.Param)
		case "verify":
			s.d.Verify()
		case "fit-step":
			s.d.StepFitting(a.Param, a.Value, a.N)
		default:
			if !strings.HasPrefix(a.Do, "book-") {
				return
			}
			if sc := s.bk.act(a); sc != nil {
				s.adopt(*sc, "")
				return
			}
			s.build()
			return
		}
		s.copyNote = ""
		s.evaluate()
	}
}

// Render draws the page.
func (s *sheet) Render() (ui app.UI) {
	defer s.containRender(&ui)
	s.testPanic("render")
	s.stale = false
	vm := &s.vm
	root, lay, pre := app.Div().ID("sheet").Class("sheet view-"+vm.View), s.layout(), func(d app.HTMLDiv) app.HTMLDiv { return d }
	if vm.Unverified != "" {
		root = root.Class("unverified")
	}
	h1 := vm.Name + " — Fieldhead"
	if !s.loaded { // the site writer's copy: shown, its boxes and buttons inert until the wasm draws (loader.go)
		root, pre, h1 = root.Class("prerendered"), func(d app.HTMLDiv) app.HTMLDiv { return d.Attr("inert", true) }, "Fieldhead"
		lay = pre(lay.(app.HTMLDiv))
	}
	return root.Body(
		s.printHead(),
		&topBar{S: s, Tabs: vm.Tabs, Units: vm.Units},
		divBody("notices", s.faultBanner(), s.updateBanner(), s.storeBanner()), // always there: a notice must not move the inputs
		pre(app.Div().Class("titlerow")).Attr("role", "region").Aria("label", "sheet").Body(&field{S: s, F: vm.Title}, s.shareRow()),
		s.linkProblem(),
		s.unverified(),
		app.Main().Body(
			app.H1().Class("sr").Text(h1),
			divBody("notices", others(vm.Others)), // a stable slot: the list appearing must not re-create the inputs
			lay, s.signoff()),
		cautions(vm.Cautions),
		installRow(s.install, s.onInstall),
		s.printFoot(),
	)
}

// layout arranges the view's cards; a card the arrangement does not name
// goes after the others.
func (s *sheet) layout() app.UI {
	vm := &s.vm
	byID := make(map[string]present.Card, len(vm.Cards))
	for _, c := range vm.Cards {
		byID[c.ID] = c
	}
	used := make(map[string]bool, len(vm.Cards))
	drawn := 0
	cards := func(ids []string) []app.UI {
		var out []app.UI
		for _, id := range ids {
			if c, ok := byID[id]; ok && !used[id] {
				used[id] = true
				if s.later && drawn >= firstCards {
					// Holds the card as shown before the wasm meanwhile (lend).
					out = append(out, app.Div().Class("card-later").Attr("data-card", id))
					continue
				}
				drawn++
				out = append(out, &card{S: s, C: c, W: s.wide})
			}
		}
		return out
	}
	var place func(a area) app.UI
	place = func(a area) app.UI {
		body := cards(a.cards)
		for _, in := range a.in {
			body = append(body, place(in))
		}
		return divBody(a.class, body...)
	}
	var root app.UI
	for _, l := range layouts {
		if l.view == vm.View {
			root = place(l.area)
		}
	}
	if root == nil {
		root = app.Article().Class("report").Body(cards(ids(vm.Cards))...)
	}
	var rest []string
	for _, c := range vm.Cards {
		if !used[c.ID] {
			rest = append(rest, c.ID)
		}
	}
	return app.Div().Body(root, divBody("stack", cards(rest)...))
}

// area is a <div> of a view's arrangement: the cards it holds, then the
// areas inside it. The arrangements are data, not code: one function
// drawing them is a fraction of the wasm that a call per area took.
type area struct {
	class string
	cards []string
	in    []area
}

// layouts are the views' arrangements; another view (the report, the
// book) lists its cards in order.
var layouts = []struct {
	view string
	area area
}{
	{"balance", area{class: "layout", in: []area{
		{class: "area-answer", cards: []string{"answer-card"}},
		{class: "area-inputs", in: []area{
			{class: "points", cards: []string{"point-1", "point-2"}},
			{class: "stack", cards: []string{"between", "liquid"}}}},
		{class: "area-more", cards: []string{"budget"}}}}},
	{"convert", area{class: "layout", in: []area{
		{class: "area-answer", cards: []string{"convert-card"}},
		{class: "area-inputs", cards: []string{"convert-in", "liquid"}}}}},
	// The run view's sizing table is wide: it follows the layout, full width.
	{"regime", area{class: "layout", in: []area{
		{class: "area-answer", cards: []string{"run-answer"}},
		{class: "area-inputs", cards: []string{"run", "liquid"}}}}},
	{"line", area{class: "stack", in: []area{
		{class: "duo", cards: []string{"line-card", "profile-card"}},
		{class: "stack", cards: []string{"seg-results", "segments"}}}}},
	{"pump", area{class: "stack", in: []area{
		{class: "duo", in: []area{
			{class: "col", cards: []string{"operating", "npsh", "turbine", "surge"}},
			{class: "col", cards: []string{"pump-chart-card", "profile-card"}}}},
		{class: "duo even", in: []area{
			{class: "col", cards: []string{"datasheet-card", "pump-side"}},
			{class: "col", cards: []string{"pump-setup", "field"}}}}}}},
}

func ids(cs []present.Card) []string {
	out := make([]string, len(cs))
	for i, c := range cs {
		out[i] = c.ID
	}
	return out
}
