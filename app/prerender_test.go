//go:build !wasm

package main

import (
	"fmt"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"sync/atomic"
	"testing"
	"time"

	"github.com/chromedp/cdproto/network"
	"github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// demoAnswer is the demo's answer as the sheet words it (the page drawn by
// the site writer shows it; scenario.Demo and present.Build decide it).
func demoAnswer(t *testing.T) string {
	t.Helper()
	var d scenario.Draft
	d.Reset(scenario.Demo())
	a, _ := present.Build(&d, scenario.Evaluate(scenario.Read(d.Scen))).Text("answer-value")
	if a == "" || a == "—" {
		t.Fatalf("the demo has no answer (%q): the checks below would prove nothing", a)
	}
	return a
}

// TestPrerenderedPage: the written page holds the demo sheet with its
// answer, inert, go-app's full-window loader replaced by our small status
// note, and the script that decides whether the demo may be shown.
// (Source: this project's rule for the page before the wasm runs, issue
// 13 item 5; `inert` and role=status as the HTML and WAI-ARIA 1.2
// specifications define them.)
func TestPrerenderedPage(t *testing.T) {
	dir := t.TempDir()
	registerRoutes()
	if err := app.GenerateStaticWebsite(dir, newHandler("", "test", 0)); err != nil {
		t.Fatal(err)
	}
	if err := fixMetadata(dir, ""); err != nil { // patchLoaderHTML too
		t.Fatal(err)
	}
	b, err := os.ReadFile(filepath.Join(dir, "index.html"))
	if err != nil {
		t.Fatal(err)
	}
	page := string(b)
	want := demoAnswer(t)
	for _, s := range []string{
		`<div id="app-wasm-loader" role="status">`,
		// The first paint waits for the written answer (the HTML
		// standard's rel=expect with blocking=render), asked for before
		// prerender.js, which takes it away when another sheet is shown.
		`<link rel="expect" href="#answer-value" blocking="render">` + "\n    " + `<script src="/web/prerender.js"></script>`,
	} {
		if !strings.Contains(page, s) {
			t.Errorf("index.html lacks %s", s)
		}
	}
	// go-app writes attributes in map order: look at the tag whole.
	if !regexp.MustCompile(`<div [^>]*id="answer-value"[^>]*>` + regexp.QuoteMeta(want) + `<`).MatchString(page) {
		t.Errorf("index.html lacks the demo's answer %s", want)
	}
	root := regexp.MustCompile(`<div [^>]*id="sheet"[^>]*>`).FindString(page)
	title := regexp.MustCompile(`<div [^>]*class="titlerow"[^>]*>`).FindString(page)
	if !strings.Contains(root, "prerendered") || !strings.Contains(title, " inert") {
		t.Errorf("the written sheet is not marked prerendered, its title row inert: %s %s", root, title)
	}
	if strings.Contains(page, "goapp-app-info") {
		t.Error("index.html still has go-app's full-window loader")
	}
	head, _, _ := strings.Cut(page, "</head>")
	if !strings.Contains(head, `<script src="/web/prerender.js"></script>`) {
		t.Error("the prerender script is not a blocking script in <head>: the demo could show on a share link")
	}
}

// TestBeforeWasm opens the site in Chromium with the wasm's request
// blocked, then allowed: a bare visit on a fresh device shows the demo's
// answer from the written page at once; a share link, or a device that
// keeps a sheet, shows no demo answer before the wasm draws its own
// sheet. Screenshots at 768×1024 and 390×844, before and after.
// (Source: issue 13 item 5 and this project's rule that no answer is
// shown that is not the link's; the demo answer from present.Build.)
func TestBeforeWasm(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	origin := newSiteServer(t, site).URL
	want := demoAnswer(t)
	block := func(on bool) { blockWasm(t, b, on) }
	open := func(u string) {
		if err := chromedp.Do(b.ctx, chromedp.Navigate(u)); err != nil {
			t.Fatalf("opening %s: %v", u, err)
		}
	}
	shows := func(s string) bool { return b.jsBool(fmt.Sprintf("document.body.innerText.includes(%q)", s)) }
	size := func(w, h int64) {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(w, h)); err != nil {
			t.Fatal(err)
		}
	}
	// Where the answer card is: its top, and its distance below the share
	// row.
	cardTop := `(() => { const c = document.querySelector("#answer-card").getBoundingClientRect(); return Math.round(c.top + scrollY) + " " + Math.round(c.top - document.querySelector(".share").getBoundingClientRect().bottom); })()`

	// axe-core (Deque's rules, as TestAxe runs them) on the page before the wasm.
	axeNone := func(where string) {
		vs, _ := b.runAxe(axeScript(t))
		for _, v := range vs {
			t.Errorf("%s: axe-core rule %s (%s, %d elements): %s\n  %s", where, v.ID, v.Impact, v.Count, v.Help, strings.Join(v.Nodes, "\n  "))
		}
	}

	block(true)
	tops := map[int64]string{}
	for _, vp := range [][2]int64{{768, 1024}, {390, 844}} {
		size(vp[0], vp[1])
		open(origin + "/")
		if !b.poll(`document.getElementById("app-wasm-loader-label") !== null`, 10*time.Second) {
			t.Fatal("the page has no starting note")
		}
		time.Sleep(300 * time.Millisecond) // the blocked fetch fails, app.js writes the error in the note
		if b.jsBool("window.fieldheadFirstResult > 0") {
			t.Fatal("the wasm ran although its request was blocked")
		}
		if got := b.text("#answer-value"); got != want || !shows(want) {
			t.Errorf("%d px, wasm blocked, bare visit: answer %q (shown: %v), want the demo's %q", vp[0], got, shows(want), want)
		}
		note := b.js(`(() => { const r = document.getElementById("app-wasm-loader").getBoundingClientRect(); return r.width + "×" + r.height; })()`)
		if b.jsBool(`(() => { const n = document.getElementById("app-wasm-loader"); return !n.classList.contains("failed") && n.getBoundingClientRect().height > 80; })()`) {
			t.Errorf("%d px: the starting note is %s px, not a small note", vp[0], note)
		}
		if !b.jsBool(`[...document.querySelectorAll("#sheet input, #sheet select, #sheet textarea, #sheet .share button")].every((e) => e.closest("[inert]"))`) {
			t.Error("a box or button of the written sheet is not inert: what is typed into it would be lost when the wasm draws")
		}
		tops[vp[0]] = b.js(cardTop)
		t.Logf("%d×%d, wasm blocked: answer %q shown, note %s px (%q), answer card at, below the share row: %s px", vp[0], vp[1], want, note, b.text("#app-wasm-loader-label"), tops[vp[0]])
		b.shot(fmt.Sprintf("before-wasm-%d", vp[0]))
		axeNone(fmt.Sprintf("%d px, wasm blocked, bare visit", vp[0]))
	}

	// A share link (another sheet), and a bare visit on a device keeping a sheet.
	query, linkAnswer := otherSheet(t)
	share := origin + "/?" + query
	open(share)
	time.Sleep(300 * time.Millisecond)
	if shows(want) || b.jsBool(`getComputedStyle(document.querySelector("#answer-value")).visibility !== "hidden"`) {
		t.Errorf("a share link showed the demo's answer %q before the wasm ran", want)
	}
	if !shows("Fieldhead is starting") && !shows("Fieldhead could not start") {
		t.Error("a share link shows no starting note")
	}
	b.shot("before-wasm-share-390")
	axeNone("390 px, wasm blocked, share link")
	b.js(`localStorage.setItem("` + storageKey + `", "z2=31m"); ""`)
	open(origin + "/")
	time.Sleep(300 * time.Millisecond)
	if shows(want) {
		t.Errorf("a device keeping a sheet showed the demo's answer %q before the wasm ran", want)
	}

	// The wasm takes over: the demo on a fresh device, then the link's sheet.
	block(false)
	b.js(`localStorage.clear(); ""`) // no wasm has run yet to keep a sheet again
	for _, vp := range [][2]int64{{768, 1024}, {390, 844}} {
		size(vp[0], vp[1])
		b.js(`window.fieldheadFirstResult = 0; ""`)
		b.navigate(origin + "/")
		if got := b.text("#answer-value"); got != want {
			t.Errorf("%d px, after the wasm: answer %q, want %q", vp[0], got, want)
		}
		if b.jsBool(`document.getElementById("app-wasm-loader") !== null || document.querySelector("#sheet [inert], .prerendered") !== null`) {
			t.Error("after the wasm the starting note or the inert sheet remains")
		}
		after := b.js(cardTop)
		t.Logf("%d×%d, live: answer card at, below the share row: %s px (written page: %s px)", vp[0], vp[1], after, tops[vp[0]])
		if strings.Fields(after)[1] != strings.Fields(tops[vp[0]])[1] {
			t.Errorf("%d px: the answer card moved against the share row when the wasm drew (%s → %s px)", vp[0], tops[vp[0]], after)
		}
		b.shot(fmt.Sprintf("after-wasm-%d", vp[0]))
	}
	b.js(`window.fieldheadFirstResult = 0; ""`)
	b.navigate(share)
	if got := b.text("#answer-value"); got != linkAnswer || got == want {
		t.Errorf("after the wasm, the share link's answer is %q, want %q", got, linkAnswer)
	}
	b.noProblems("before and after the wasm")
}

// otherSheet is the demo with the upper level at 31 m: its link's query
// and its answer as present.Build words it.
func otherSheet(t *testing.T) (query, answer string) {
	t.Helper()
	sc := scenario.Demo()
	if err := sc.Set("z2", "31 m"); err != nil {
		t.Fatal(err)
	}
	var d scenario.Draft
	d.Reset(sc)
	answer, _ = present.Build(&d, scenario.Evaluate(scenario.Read(sc))).Text("answer-value")
	return sc.Encode(), answer
}

// TestCompiledInWorker opens a share link on a device the site has never
// seen: the page starts the program from the module the worker web/start.js
// made compiled (web/start.js again, in the worker, which reads the wasm's
// address from its name), not from a compile of its own, and shows the
// link's answer. (On a visit the service worker serves, app.js may run
// before start.js and compile on the page, as designed: only a first visit
// is checked.)
// (Source: the HTML standard's Worker constructor and its options' name,
// and present.Build for the answer.)
func TestCompiledInWorker(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	origin := newSiteServer(t, site).URL
	query, want := otherSheet(t)
	b.navigate(origin + "/?" + query)
	if by := b.js(`window.fieldheadCompiledBy || "nothing"`); by != "worker" {
		t.Errorf("a share link's wasm was compiled by the %s, want the worker (web/start.js)", by)
	}
	if got := b.text("#answer-value"); got != want {
		t.Errorf("a share link's answer is %q, want %q", got, want)
	}
	if b.jsBool(`document.querySelector('link[rel="expect"]') !== null`) {
		t.Error("a share link's page still holds the written demo's rel=expect: its first paint waited for the hidden demo's answer")
	}
	b.noProblems("a share link compiled in the worker")
}

// TestWasmFetchedOnce opens a share link on a device the site has never
// seen, on a slowed link (the page's requests at 2 Mbps, so the page's
// own request for the wasm, its head start in web/start.js, is still
// downloading when the worker asks): the page asks for the wasm, yet the
// server is asked for it once, the worker compiles it, and the link's
// answer shows. A second download would double a phone's wait. (Source:
// RFC 9111, a request answered from a stored response, here one still
// being stored; the count is the server's own.)
func TestWasmFetchedOnce(t *testing.T) {
	srv, asked := wasmCountingServer(t, testSite(t), false)
	b := newTab(t)
	if _, err := chromedp.Call(b.ctx, network.EmulateNetworkConditionsByRule, network.EmulateNetworkConditionsByRuleParams{
		MatchedNetworkConditions: []*network.Conditions{{Latency: 40, DownloadThroughput: 2e6 / 8, UploadThroughput: 1e6 / 8}}}); err != nil {
		t.Fatal(err)
	}
	query, want := otherSheet(t)
	b.navigate(srv.URL + "/?" + query)
	if !b.asked(".wasm") {
		t.Error("the page never asked for the wasm itself: no head start (web/start.js)")
	}
	if n := asked.Load(); n != 1 {
		t.Errorf("the server was asked for the wasm %d times on one first visit, want once", n)
	}
	if by := b.js(`window.fieldheadCompiledBy || "nothing"`); by != "worker" {
		t.Errorf("the wasm was compiled by the %s, want the worker", by)
	}
	if got := b.text("#answer-value"); got != want {
		t.Errorf("the link's answer is %q, want %q", got, want)
	}
	b.noProblems("a first visit on a slowed link")
}

// TestFailedLoad opens the site with the wasm's request blocked, as on a
// first visit offline: the corner note says in words that Fieldhead could
// not start and what to do, stops turning, leaves the written demo
// readable (not covered), and offers a button that, the wasm allowed
// again, starts the sheet without reloading the page. A share link's note
// says its sheet waits for the start. Screenshots before and after.
func TestFailedLoad(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	origin := newSiteServer(t, site).URL
	want := demoAnswer(t)
	block := func(on bool) { blockWasm(t, b, on) }
	block(true)
	for _, vp := range [][2]int64{{390, 844}, {1024, 768}} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(vp[0], vp[1])); err != nil {
			t.Fatal(err)
		}
		if err := chromedp.Do(b.ctx, chromedp.Navigate(origin+"/")); err != nil {
			t.Fatal(err)
		}
		if !b.poll(`document.getElementById("app-wasm-retry") !== null`, 20*time.Second) {
			t.Fatalf("%d px: no retry button after the wasm failed; the note says %q", vp[0], b.js(`(document.getElementById("app-wasm-loader") || {}).innerText || ""`))
		}
		note := b.text("#app-wasm-loader-label")
		if !strings.Contains(note, "Fieldhead could not start") || !strings.Contains(note, "demo") || strings.Contains(note, "TypeError") {
			t.Errorf("%d px: the note says %q", vp[0], note)
		}
		if b.jsBool(`(() => { const i = document.getElementById("app-wasm-loader-icon"); return i.classList.contains("goapp-spin") || (i.getClientRects().length > 0 && getComputedStyle(i).animationName !== "none"); })()`) {
			t.Errorf("%d px: the spinner still turns", vp[0])
		}
		if got := b.text("#answer-value"); got != want {
			t.Errorf("%d px: the written demo's answer is %q, want %q", vp[0], got, want)
		}
		if b.jsBool(`(() => { const a = document.getElementById("answer-value").getBoundingClientRect(), n = document.getElementById("app-wasm-loader").getBoundingClientRect(); return a.bottom > n.top && a.top < n.bottom && a.right > n.left && a.left < n.right; })()`) {
			t.Errorf("%d px: the note covers the demo's answer", vp[0])
		}
		if b.jsBool(`(() => { const r = document.getElementById("app-wasm-retry").getBoundingClientRect(); return r.width < 44 || r.height < 44; })()`) {
			t.Errorf("%d px: the retry button is under 44 × 44 px", vp[0])
		}
		b.shot(fmt.Sprintf("failed-load-%d", vp[0]))
	}
	block(false)
	if err := clickID(b, "app-wasm-retry"); err != nil {
		t.Fatal(err)
	}
	b.waitResult()
	if got := b.text("#answer-value"); got != want {
		t.Errorf("after trying again: answer %q, want %q", got, want)
	}
	if b.jsBool(`document.getElementById("app-wasm-loader") !== null`) {
		t.Error("after trying again the note remains")
	}
	b.shot("failed-load-retried")

	// A share link: its sheet waits for the start.
	block(true)
	sc := scenario.Demo()
	_ = sc.Set("z2", "31 m")
	if err := chromedp.Do(b.ctx, chromedp.Navigate(origin+"/?"+sc.Encode())); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.getElementById("app-wasm-retry") !== null`, 20*time.Second) {
		t.Fatal("a share link: no retry button after the wasm failed")
	}
	if note := b.text("#app-wasm-loader-label"); !strings.Contains(note, "link's sheet") {
		t.Errorf("a share link: the note says %q", note)
	}

	// The worker's own fetch failing (the server refuses the wasm, on a
	// device the site has never seen): the page tries once more itself,
	// and says what failed the same way.
	srv, wasmAsked := wasmCountingServer(t, site, true)
	fresh := newTab(t)
	if err := chromedp.Do(fresh.ctx, chromedp.Navigate(srv.URL+"/")); err != nil {
		t.Fatal(err)
	}
	if !fresh.poll(`document.getElementById("app-wasm-retry") !== null`, 20*time.Second) {
		t.Fatalf("the worker's fetch refused: no retry button; the note says %q", fresh.js(`(document.getElementById("app-wasm-loader") || {}).innerText || ""`))
	}
	if note := fresh.text("#app-wasm-loader-label"); !strings.Contains(note, "Fieldhead could not start") || strings.Contains(note, "TypeError") {
		t.Errorf("the worker's fetch refused: the note says %q", note)
	}
	if n := wasmAsked.Load(); n != 2 {
		t.Errorf("the worker's fetch refused: the wasm was asked for %d times, want 2 (the worker, then the page: a bare page takes no head start)", n)
	}
}

// blockWasm makes the page's requests for the wasm fail (on) or go through.
// The worker that compiles the wasm (web/start.js) fetches it past the
// page's blocks, so while they hold the page has no Worker: it fetches the
// wasm itself (app/loader.go). TestFailedLoad blocks the worker's fetch too.
func blockWasm(t *testing.T, b *tab, on bool) {
	t.Helper()
	var pats []*network.BlockPattern
	if on {
		pats = []*network.BlockPattern{{URLPattern: "*://*:*/*.wasm", Block: true}}
	}
	if _, err := chromedp.Call(b.ctx, network.SetBlockedURLs, network.SetBlockedURLsParams{URLPatterns: pats}); err != nil {
		t.Fatalf("blocking the wasm: %v", err)
	}
	switch {
	case on && b.noWorker == "":
		r, err := chromedp.Call(b.ctx, page.AddScriptToEvaluateOnNewDocument,
			page.AddScriptToEvaluateOnNewDocumentParams{Source: `Object.defineProperty(window, "Worker", {value: undefined, configurable: true});`})
		if err != nil {
			t.Fatal(err)
		}
		b.noWorker = r.Identifier
	case !on && b.noWorker != "":
		if _, err := chromedp.Call(b.ctx, page.RemoveScriptToEvaluateOnNewDocument,
			page.RemoveScriptToEvaluateOnNewDocumentParams{Identifier: b.noWorker}); err != nil {
			t.Fatal(err)
		}
		b.noWorker = ""
	}
}

// TestSnapshot keeps a sheet in the browser, then opens it again with the
// wasm blocked: the kept sheet's snapshot is painted before the wasm (its
// answer and its boxes as they were), inert, for its own link and for a
// bare link on that device, never for another link; a snapshot written with
// a script, handlers, a style and an outside address paints none of them;
// once the wasm runs the live sheet replaces the snapshot.
func TestSnapshot(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	origin := newSiteServer(t, site).URL
	block := func(on bool) {
		t.Helper()
		blockWasm(t, b, on)
		// The worker would answer the wasm from its cache: past it, the block holds.
		if _, err := chromedp.Call(b.ctx, network.SetBypassServiceWorker, network.SetBypassServiceWorkerParams{Bypass: on}); err != nil {
			t.Fatal(err)
		}
	}
	open := func(u string) {
		t.Helper()
		if err := chromedp.Do(b.ctx, chromedp.Navigate(u)); err != nil {
			t.Fatalf("opening %s: %v", u, err)
		}
		time.Sleep(300 * time.Millisecond) // the blocked fetch fails
	}
	sheetOf := func(z2 string) (link, answer string) {
		sc := scenario.Demo()
		if err := sc.Set("z2", z2); err != nil {
			t.Fatal(err)
		}
		var d scenario.Draft
		d.Reset(sc)
		answer, _ = present.Build(&d, scenario.Evaluate(scenario.Read(sc))).Text("answer-value")
		return origin + "/?" + sc.Sign(), answer
	}
	kept, keptAnswer := sheetOf("31 m")
	other, _ := sheetOf("33 m")
	demo := demoAnswer(t)

	b.navigate(kept)
	if got := b.text("#answer-value"); got != keptAnswer {
		t.Fatalf("live: answer %q, want %q", got, keptAnswer)
	}
	if !b.poll(`Object.keys(localStorage).some((k) => k.startsWith("fieldhead.snapshot."))`, 10*time.Second) {
		t.Fatal("no snapshot kept once the sheet was drawn")
	}
	t.Logf("snapshot: %s characters, %s elements", b.js(`String(localStorage.getItem(Object.keys(localStorage).find((k) => k.startsWith("fieldhead.snapshot."))).length)`), b.js(`String(document.querySelectorAll("#sheet *").length)`))
	z2 := b.value("#in-z2")
	if z2 == "" {
		t.Fatal("the live sheet has no z2 box")
	}
	// The cards past the first screen and a half (1 152 px at 1024×768)
	// are named in the snapshot, painted as their titles until the live
	// sheet comes, and whole if it cannot come.
	later := b.js(`(() => {
		const k = Object.keys(localStorage).find((k) => k.startsWith("fieldhead.snapshot."));
		return (JSON.parse(localStorage.getItem(k)).later || []).join(",");
	})()`)
	wantLater := b.js(`[...document.querySelectorAll("#sheet section.card[id]")].filter((c) => c.getBoundingClientRect().top + scrollY >= 1.5 * innerHeight).map((c) => c.id).join(",")`)
	if later == "" || later != wantLater {
		t.Errorf("snapshot: cards to paint later %q, want those starting past 1.5 screens %q", later, wantLater)
	}
	cardsJS := `JSON.stringify([...document.querySelectorAll("#sheet section.card[id]")].map((c) => c.id + " " + [...c.querySelectorAll("input, select, button, li, dd, td, svg")].filter((e) => !e.closest(".print-only")).length))`
	liveCards := b.js(cardsJS)

	block(true)
	inert := `[...document.querySelectorAll("#sheet input, #sheet select, #sheet textarea, #sheet button")].every((e) => e.closest("[inert]"))`
	runs := `document.querySelectorAll("#sheet script, #sheet style, #sheet iframe, #sheet object, #sheet foreignObject").length === 0 &&
		[...document.querySelectorAll("#sheet *")].every((e) => [...e.attributes].every((a) => !/^on|^style$|^href$|^src$|^xlink:href$/i.test(a.name)))`
	for _, u := range []string{kept, origin + "/"} {
		open(u)
		if b.jsBool("window.fieldheadFirstResult > 0") {
			t.Fatal("the wasm ran although its request was blocked")
		}
		if got := b.text("#answer-value"); got != keptAnswer || !b.jsBool(`document.documentElement.classList.contains("snap-page") && getComputedStyle(document.querySelector("#answer-value")).visibility === "visible"`) {
			t.Errorf("%s, wasm blocked: answer %q shown: %v, want the kept sheet's %q from its snapshot", u, got, b.jsBool(`document.documentElement.classList.contains("snap-page")`), keptAnswer)
		}
		if got := b.value("#in-z2"); got != z2 {
			t.Errorf("%s, snapshot: z2 box %q, want %q as drawn", u, got, z2)
		}
		// The snapshot is painted as the parser opens the written sheet,
		// which is dropped once read: one sheet, one answer.
		if !b.jsBool(`document.querySelectorAll(".sheet").length === 1 && document.querySelectorAll("#answer-value").length === 1 && document.querySelector(".sheet").id === "sheet"`) {
			t.Errorf("%s: the written sheet is still on the page beside the snapshot: %s", u, b.js(`[...document.querySelectorAll(".sheet")].map((e) => e.id + " " + e.className).join("; ")`))
		}
		if !b.jsBool(inert) {
			t.Errorf("%s: a box or button of the snapshot is not inert", u)
		}
		if !b.jsBool(runs) {
			t.Errorf("%s: the snapshot holds a script, a handler, a style or an address", u)
		}
		if !b.jsBool(`document.querySelector("#sheet main h1") !== null && !document.querySelector("#sheet main h1").closest("[inert]")`) {
			t.Errorf("%s: the snapshot's heading is missing or inert", u)
		}
		// The program could not start: every card is painted whole.
		if !b.poll(`document.querySelector("#app-wasm-loader.failed") !== null && document.querySelector(".snap-cut") === null`, 5*time.Second) {
			t.Errorf("%s, wasm blocked: the failed start left cards painted as their titles: %s", u, b.js(`[...document.querySelectorAll(".snap-cut")].map((e) => e.id).join(", ")`))
		}
		if got := b.js(cardsJS); got != liveCards {
			t.Errorf("%s, wasm blocked: the snapshot's cards (id, boxes, buttons, items, charts) %s, want the live sheet's %s", u, got, liveCards)
		}
	}
	b.shot("snapshot-before-wasm")

	open(other)
	if b.jsBool(`document.documentElement.classList.contains("snap-page")`) || b.jsBool(`getComputedStyle(document.querySelector("#answer-value")).visibility !== "hidden"`) {
		t.Errorf("another link showed an answer before the wasm (%q): the kept sheet's snapshot is for its own link only", b.text("#answer-value"))
	}
	if b.text("#answer-value") == keptAnswer && keptAnswer != demo {
		t.Error("another link holds the kept sheet's answer")
	}

	// A snapshot changed behind the page's back paints nothing that can run.
	ck := b.js(`new URLSearchParams(localStorage.getItem("fieldhead.scenario")).get("ck")`)
	b.js(`(() => {
		const k = "fieldhead.snapshot.` + ck + `";
		const s = JSON.parse(localStorage.getItem(k));
		s.root.push(["script", {}, "window.fieldheadRan = 1"],
			["div", {"onclick": "window.fieldheadRan = 2", "style": "color: red", "id": "tampered", "class": "x"}, "text ", ["a", {"href": "https://example.org/"}, "away"]],
			["img", {"src": "x", "onerror": "window.fieldheadRan = 3"}],
			["svg", {}, ["foreignObject", {}, ["iframe", {"src": "https://example.org/"}]], ["use", {"href": "#x"}]]);
		localStorage.setItem(k, JSON.stringify(s));
		return "";
	})()`)
	open(origin + "/")
	if b.text("#answer-value") != keptAnswer {
		t.Error("the changed snapshot was not painted")
	}
	if !b.jsBool(runs) || b.jsBool(`window.fieldheadRan !== undefined`) || b.jsBool(`document.querySelector("#sheet img, #sheet use") !== null`) {
		t.Errorf("a changed snapshot painted something that can run: %s", b.js(`document.getElementById("tampered") ? document.getElementById("tampered").outerHTML : "(none)"`))
	}
	if got := b.js(`(document.getElementById("tampered") || {}).textContent || ""`); got != "text away" {
		t.Errorf("a changed snapshot's text: %q, want it kept as text", got)
	}

	// The wasm runs: the live sheet replaces the snapshot. Its first draw
	// holds the first cards; the others keep their place with the
	// snapshot's card, inert, until they are drawn (lend).
	block(false)
	if _, err := chromedp.Call(b.ctx, page.AddScriptToEvaluateOnNewDocument, page.AddScriptToEvaluateOnNewDocumentParams{Source: `
		window.fieldheadLent = [];
		window.fieldheadCut = [];
		window.fieldheadCutTitles = [];
		new MutationObserver(() => {
			for (const c of document.querySelectorAll(".card-later > section.card")) {
				if (!window.fieldheadLent.includes(c.id)) window.fieldheadLent.push(c.id + (c.inert ? "" : " (not inert)"));
			}
			for (const c of document.querySelectorAll("section.card.snap-cut")) {
				if (!window.fieldheadCut.includes(c.id)) {
					window.fieldheadCut.push(c.id);
					window.fieldheadCutTitles.push(c.id + ": " + (c.querySelector("h2") || {}).textContent);
				}
			}
		}).observe(document, {childList: true, subtree: true});`}); err != nil {
		t.Fatal(err)
	}
	b.js(`window.fieldheadFirstResult = 0; ""`)
	b.navigate(kept)
	if got := b.text("#answer-value"); got != keptAnswer {
		t.Errorf("after the wasm: answer %q, want %q", got, keptAnswer)
	}
	if b.jsBool(`document.querySelector("#sheet [inert], .prerendered, .snapshot, #tampered, .card-later, .snap-cut") !== null`) {
		t.Error("after the wasm the snapshot, an inert part, a card's place or a card painted as its title remains")
	}
	if cut := b.js(`window.fieldheadCut.join(",")`); cut != later {
		t.Errorf("before the wasm, cards painted as their titles: %q, want the snapshot's %q", cut, later)
	}
	// Each shows the live card's title.
	if got, want := b.js(`window.fieldheadCutTitles.join("; ")`), b.js(`window.fieldheadCut.map((id) => id + ": " + document.getElementById(id).querySelector("h2").textContent).join("; ")`); got != want {
		t.Errorf("before the wasm, the cards painted as their titles showed %q, want the live cards' %q", got, want)
	}
	// The live sheet's snapshot is taken whole, never with a card lent
	// from the last one: asked while a card's place is held, it keeps the
	// last snapshot as it was.
	kept1 := `localStorage.getItem(Object.keys(localStorage).find((k) => k.startsWith("fieldhead.snapshot.")))`
	before := b.js(kept1)
	b.js(`(() => {
		const slot = document.createElement("div");
		slot.className = "card-later";
		document.querySelector("#sheet main").append(slot);
		fieldheadSnapshot.take(location.search.slice(1) + "&zz=1");
		slot.remove();
		return "";
	})()`)
	if b.js(kept1) != before || strings.Contains(before, "snap-cut") {
		t.Error("a snapshot was taken while a card's place was held, or holds a card painted as its title")
	}
	lent := b.js(`window.fieldheadLent.join(", ")`)
	t.Logf("cards shown from the snapshot while the first draw held the first cards: %s", lent)
	if lent == "" || strings.Contains(lent, "not inert") {
		t.Errorf("the cards put off by the first draw were not kept on screen from the snapshot, inert: %q", lent)
	}

	// An edit redraws the cards alone (redrawCards), and draws the answer.
	b.typeInto("#in-q", "40")
	if !b.poll(`window.fieldheadCardsOnly > 0`, 5*time.Second) {
		t.Error("typing a flow redrew the whole sheet, not only its cards")
	}
	if got := b.text("#answer-value"); got == keptAnswer {
		t.Errorf("after typing a flow the answer is still %q", got)
	}
	b.noProblems("snapshot before the wasm")
}

// wasmCountingServer serves site for one check and counts the requests
// for the wasm that reach it; with refuse, it answers them 503.
func wasmCountingServer(t *testing.T, site string, refuse bool) (*httptest.Server, *atomic.Int32) {
	t.Helper()
	var asked atomic.Int32
	h := siteHandler(site, "")
	srv := httptest.NewServer(http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		if strings.HasSuffix(r.URL.Path, ".wasm") {
			asked.Add(1)
			if refuse {
				http.Error(w, "refused for the test", http.StatusServiceUnavailable)
				return
			}
		}
		h.ServeHTTP(w, r)
	}))
	t.Cleanup(srv.Close)
	return srv, &asked
}
