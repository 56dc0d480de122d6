//go:build !wasm

package main

import (
	"fmt"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"
)

// smallTargetsJS lists the visible controls smaller than 44 × 44 CSS px,
// the sheet's touch rule (WCAG 2.1 SC 2.5.5 Target Size, enhanced): every
// button, input, picker, text area and summary, measured where it takes a
// touch (a transparent picker or file input over its face is as large as
// the face).
const smallTargetsJS = `(() => {
  const out = [];
  for (const e of document.querySelectorAll("button, input, select, textarea, summary")) {
    if (e.type === "hidden" || e.disabled || e.getClientRects().length === 0 || e.closest(".sr, [inert]")) continue;
    if (getComputedStyle(e).visibility === "hidden") continue;
    const r = e.getBoundingClientRect();
    if (r.width < 43.5 || r.height < 43.5)
      out.push(e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + " " + (e.type || "") + " " + r.width.toFixed(0) + "×" + r.height.toFixed(0));
  }
  return out;
})()`

// TestTouchTargets opens every view of both demos, the pump-test demo's
// Pump view and Report and the site book with a pump's history at 320 px
// (a phone) and 1024 px (a tablet in landscape) and fails on any control under 44 × 44
// CSS px: the data sheet's cells and the site book's file picker were the
// last ones (issue 23). The check is checked with a 20 px button.
func TestTouchTargets(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	pages := 0
	for _, w := range []int64{320, 1024} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(w, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		for _, dv := range demoViews() {
			b.navigate(srv.URL + "/?" + dv.link)
			pages++
			small, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](smallTargetsJS))
			if err != nil {
				t.Fatal(err)
			}
			if len(small) > 0 {
				t.Errorf("%s, %s view, %d px: controls under 44 × 44 px: %s", dv.demo, dv.view.Key, w, strings.Join(small, "; "))
			}
		}
	}
	// The test card and the pump's history, in a tab of their own.
	bt := newTab(t)
	importHistory(t, bt, srv.URL)
	for _, w := range []int64{320, 1024} {
		if err := chromedp.Do(bt.ctx, chromedp.EmulateViewport(w, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		links := map[string]string{"pump history": "view=book"}
		for _, dv := range pumpTestViews() {
			links[dv.demo+", "+dv.view.Key+" view"] = dv.link
		}
		for where, link := range links {
			bt.navigate(srv.URL + "/?" + link)
			if where == "pump history" && !bt.poll(`document.querySelector("#history-1 svg") !== null`, 10*time.Second) {
				t.Fatalf("%d px: the site book shows no history", w)
			}
			pages++
			small, err := chromedp.Run(bt.ctx, chromedp.Evaluate[[]string](smallTargetsJS))
			if err != nil {
				t.Fatal(err)
			}
			if len(small) > 0 {
				t.Errorf("%s, %d px: controls under 44 × 44 px: %s", where, w, strings.Join(small, "; "))
			}
		}
	}
	b.js(`(() => { const e = document.createElement("button"); e.id = "small-probe"; e.textContent = "x"; document.querySelector("main").append(e); e.style.cssText = "min-height:0;min-width:0;width:20px;height:20px;padding:0"; return ""; })()`)
	if got := b.js(`String(` + smallTargetsJS + `)`); !strings.Contains(got, "small-probe") {
		t.Errorf("a 20 px button was not reported (%q)", got)
	}
	t.Logf("%d pages checked for touch targets", pages)
}

// TestForcedColours: in a forced-colours mode (Windows' contrast themes;
// CSS Color Adjustment Level 1) the system paints every fill in its own
// colours, so the open view's tab and the chosen side of each switch must
// stand apart from the others by more than a fill: each, and only each,
// is underlined, and its background is the system's selection colour
// (WCAG 2.1 SC 1.4.1 Use of Color, 1.4.11 Non-text Contrast). Chromium
// emulates the mode through the DevTools protocol.
func TestForcedColours(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{
		Features: []*emulation.MediaFeature{{Name: "forced-colors", Value: "active"}}}); err != nil {
		t.Fatal(err)
	}
	for _, dv := range demoViews()[:len(demoViews())/2] {
		b.navigate(srv.URL + "/?" + dv.link)
		if !b.jsBool(`matchMedia("(forced-colors: active)").matches`) {
			t.Fatal("Chromium does not emulate forced colours")
		}
		// Each group (the tabs, each switch): the chosen one against the others.
		got := b.js(`(() => {
  const out = [];
  const mark = (e) => { const s = getComputedStyle(e.querySelector(".tab-name") || e); return s.textDecorationLine.includes("underline"); };
  let groups = 0;
  for (const g of document.querySelectorAll(".tabs, .segs, .solve-grid")) {
    const on = g.querySelector(":scope > .on"), off = [...g.querySelectorAll(":scope > :not(.on)")];
    if (!on || off.length === 0 || on.getClientRects().length === 0) continue;
    groups++;
    const name = g.className + " " + (on.id || "");
    if (!mark(on)) out.push(name + ": the chosen one is not underlined");
    for (const o of off) if (mark(o)) out.push(name + ": " + (o.id || o.textContent) + " is underlined too");
    const bg = getComputedStyle(on).backgroundColor;
    if (off.some((o) => getComputedStyle(o).backgroundColor === bg)) out.push(name + ": the chosen one has the others' background " + bg);
  }
  return groups + "|" + out.join("; ");
})()`)
		n, problems, _ := strings.Cut(got, "|")
		where := fmt.Sprintf("%s view in forced colours", dv.view.Key)
		if n == "0" {
			t.Errorf("%s: no tabs or switches found", where)
		}
		if problems != "" {
			t.Errorf("%s: %s", where, problems)
		}
		if dv.view.Key == "balance" {
			b.shot("forced-colours-balance")
		}
	}
}
