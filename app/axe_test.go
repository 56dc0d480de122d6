//go:build !wasm

package main

import (
	"encoding/json"
	"fmt"
	"net/http/httptest"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario/present"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"
)

// The page checked by axe-core (Deque's open-source rules engine, pinned
// in app/testdata/package.json and package-lock.json, installed into
// app/testdata/node_modules by `make npm`). Its script is read from disk
// and evaluated in the page through the DevTools protocol: the page's
// Content-Security-Policy admits scripts of its own origin only, so axe is
// injected, never loaded by URL.

// axeScript is testdata/node_modules/axe-core/axe.min.js (tests run in
// app/), or a skip (a failure under FIELDHEAD_BROWSER=1) when `make npm`
// has not run.
func axeScript(t *testing.T) string {
	t.Helper()
	path := filepath.Join("testdata", "node_modules", "axe-core", "axe.min.js")
	b, err := os.ReadFile(path)
	if err != nil {
		needBrowser(t, "axe-core is not installed: run `make npm` (npm ci --prefix app/testdata) (%v)", err)
	}
	return string(b)
}

// axeRunJS runs axe on the whole document with its default rule set (the
// WCAG 2.0/2.1 A and AA rules and the best practices), plus the rule that
// is off by default and that the symbol buttons (↑ ↓ ✕ − +) need:
// label-content-name-mismatch (WCAG 2.1 SC 2.5.3 Label in Name). It
// returns the violations as JSON: rule id, impact, help and up to five
// nodes with axe's summary of what is wrong; and in the same form the
// checks axe could not decide ("needs review"), which the test lists.
const axeRunJS = `(async () => {
  const r = await axe.run(document, {
    resultTypes: ["violations", "incomplete"],
    rules: { "label-content-name-mismatch": { enabled: true } },
  });
  const list = (vs) => vs.map((v) => ({
    id: v.id, impact: v.impact, help: v.help, count: v.nodes.length,
    nodes: v.nodes.slice(0, 5).map((n) => n.target.join(" ") + ": " + (n.failureSummary || "").replace(/\s+/g, " ")),
  }));
  return JSON.stringify({violations: list(r.violations), incomplete: list(r.incomplete)});
})()`

// axeViolation is one rule that failed, as axeRunJS reports it.
type axeViolation struct {
	ID     string   `json:"id"`
	Impact string   `json:"impact"`
	Help   string   `json:"help"`
	Count  int      `json:"count"`
	Nodes  []string `json:"nodes"`
}

// runAxe injects axe-core into the page (once per document) and returns
// its violations.
func (b *tab) runAxe(script string) (violations, review []axeViolation) {
	b.t.Helper()
	if !b.jsBool(`typeof window.axe !== "undefined"`) {
		if _, err := chromedp.Run(b.ctx, chromedp.Evaluate[chromedp.Void](script+"\n;undefined")); err != nil {
			b.t.Fatalf("injecting axe-core: %v", err)
		}
	}
	out, err := chromedp.Run(b.ctx, chromedp.Evaluate[string](axeRunJS, chromedp.EvalAwaitPromise))
	if err != nil {
		b.t.Fatalf("running axe-core: %v", err)
	}
	var r struct{ Violations, Incomplete []axeViolation }
	if err := json.Unmarshal([]byte(out), &r); err != nil {
		b.t.Fatalf("reading axe-core's result %q: %v", out, err)
	}
	return r.Violations, r.Incomplete
}

// TestAxe runs axe-core on every view of the demo and of the turbine demo,
// on a tablet in landscape (1024×768) and on a phone (360×740), and on
// the Report as printed (print media); then on the pump-test demo's Pump
// view and Report (the test card, the tested curve, band and cross) and
// the site book with a pump's history: any violation of any rule fails.
func TestAxe(t *testing.T) {
	site := testSite(t)
	script := axeScript(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	perRule, reviewed := map[string]int{}, map[string]int{}
	checked := 0
	check := func(b *tab, where string) {
		t.Helper()
		vs, review := b.runAxe(script)
		checked++
		for _, v := range review {
			reviewed[v.ID] += v.Count
			if testing.Verbose() {
				t.Logf("%s: needs review, axe-core rule %s (%d elements): %s\n  %s", where, v.ID, v.Count, v.Help, strings.Join(v.Nodes, "\n  "))
			}
		}
		for _, v := range vs {
			perRule[v.ID] += v.Count
			t.Errorf("%s: axe-core rule %s (%s, %d elements): %s\n  %s", where, v.ID, v.Impact, v.Count, v.Help, strings.Join(v.Nodes, "\n  "))
		}
	}
	for _, size := range []struct{ w, h int64 }{{1024, 768}, {360, 740}} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(size.w, size.h)); err != nil {
			t.Fatal(err)
		}
		for _, dv := range demoViews() {
			demo, v := dv.demo, dv.view
			b.navigate(srv.URL + "/?" + dv.link)
			where := fmt.Sprintf("%s, %s view, %d×%d", demo, v.Key, size.w, size.h)
			check(b, where)
			if v.Key == "report" {
				if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
					t.Fatal(err)
				}
				check(b, where+", print media")
				if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
					t.Fatal(err)
				}
			}
		}
	}
	// Every view of the demo in US units: another set of words and
	// figures in the same places.
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768)); err != nil {
		t.Fatal(err)
	}
	for _, dv := range usDemoViews(t) {
		if dv.demo != "US demo" {
			continue
		}
		b.navigate(srv.URL + "/?" + dv.link)
		check(b, fmt.Sprintf("%s, %s view, 1024×768", dv.demo, dv.view.Key))
	}
	// The test card, the tested curve and cross, and the pump's history,
	// in a tab of their own.
	bt := newTab(t)
	importHistory(t, bt, srv.URL)
	for _, size := range []struct{ w, h int64 }{{1024, 768}, {360, 740}} {
		if err := chromedp.Do(bt.ctx, chromedp.EmulateViewport(size.w, size.h)); err != nil {
			t.Fatal(err)
		}
		for _, dv := range pumpTestViews() {
			bt.navigate(srv.URL + "/?" + dv.link)
			where := fmt.Sprintf("%s, %s view, %d×%d", dv.demo, dv.view.Key, size.w, size.h)
			check(bt, where)
			if dv.view.Key == "report" {
				if _, err := chromedp.Call(bt.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
					t.Fatal(err)
				}
				check(bt, where+", print media")
				if _, err := chromedp.Call(bt.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
					t.Fatal(err)
				}
			}
		}
		bt.navigate(srv.URL + "/?view=book")
		if !bt.poll(`document.querySelector("#history-1 svg") !== null`, 10*time.Second) {
			t.Fatalf("%d px: the site book shows no history", size.w)
		}
		check(bt, fmt.Sprintf("pump history, %d×%d", size.w, size.h))
	}
	bt.noProblems("axe-core on the pump test and history")
	t.Logf("axe-core on %d pages; elements failing per rule: %s; needing review: %s", checked, counts(perRule), counts(reviewed))
	if want := 2*2*(len(present.Views)+1) + len(present.Views) + 2*(len(pumpTestViews())+2); checked != want {
		t.Errorf("axe ran on %d pages, want %d", checked, want)
	}
	// The check itself: an image without a text alternative, added to the
	// last page, is reported (axe-core rule image-alt, WCAG 2.1 SC 1.1.1).
	b.js(`(() => { const i = document.createElement("img"); i.src = "web/icon.svg"; i.id = "axe-probe"; document.querySelector("main").append(i); return ""; })()`)
	found := false
	probe, _ := b.runAxe(script)
	for _, v := range probe {
		found = found || v.ID == "image-alt"
	}
	if !found {
		t.Error("axe-core did not report an image without alt text: the check finds nothing")
	}
	b.noProblems("axe-core")
}

// counts lists a count per rule, sorted by rule id.
func counts(m map[string]int) string {
	var out []string
	for id, n := range m {
		out = append(out, fmt.Sprintf("%s %d", id, n))
	}
	if len(out) == 0 {
		return "none"
	}
	sort.Strings(out)
	return strings.Join(out, ", ")
}
