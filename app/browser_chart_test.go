//go:build !wasm

package main

import (
	"encoding/json"
	"fmt"
	"strconv"
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/chromedp/chromedp"
)

// TestBrowserFieldCheckUS opens the demo in US units on the Pump view with
// instrument accuracies and an acceptance grade: the verdict shown is the
// view model's (present.Build of scenario.Evaluate: this checks that the
// page and the core agree, not the physics), the pump chart draws the
// measured point with its uncertainty box around it, and no figure on the
// page carries an SI unit. Screenshots of the chart at a tablet's and a
// phone's width go to the screenshots folder (chart-us-768x1024.png,
// chart-us-390x844.png).
func TestBrowserFieldCheckUS(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)

	sc := usDemo(t, scenario.Demo())
	for _, kv := range [][2]string{{"view", "pump"}, {"etam", "92%"}, {"gcs", "1.6%"}, {"gss", "87psi"},
		{"gcd", "1.6%"}, {"gsd", "145psi"}, {"uqm", "2%"}, {"upin", "1.5%"}, {"uz", "0.5in"}, {"grade", "2B"}} {
		if err := sc.Set(kv[0], kv[1]); err != nil {
			t.Fatalf("%s: %v", kv[0], err)
		}
	}
	want := scenario.Evaluate(scenario.Read(sc))
	if want.Field == nil || want.FieldBands == nil || want.Acceptance == nil || !want.US {
		t.Fatalf("the sheet does not give a US field check with bands and a verdict: %v", want.Errors)
	}
	d := scenario.NewDraft(sc)
	verdict, ok := present.Build(&d, want).Text("accept-level")
	if !ok || verdict == "" {
		t.Fatal("the view model has no verdict for the sheet")
	}

	for _, size := range []struct{ w, h int }{{768, 1024}, {390, 844}} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(size.w), int64(size.h))); err != nil {
			t.Fatal(err)
		}
		b.navigate(srv.URL + "/?" + sc.Encode())
		name := fmt.Sprintf("%d×%d", size.w, size.h)
		// textContent: the badge's style writes it in capitals.
		quoted, _ := json.Marshal(verdict)
		if !b.poll(`(document.querySelector("#accept-level") || {}).textContent === `+string(quoted), 10*time.Second) {
			t.Errorf("%s: the verdict shows %q, the view model %q", name, b.js(`(document.querySelector("#accept-level") || {}).textContent || ""`), verdict)
		}
		// The box and the measured point: both drawn, the point inside the
		// box, the box neither empty nor the whole plot.
		geo := b.js(`(() => {
			const box = document.querySelector('#pump-chart svg [data-mark="uncertainty"]');
			const pt = document.querySelector('#pump-chart svg [data-mark="measured"]');
			if (!box || !pt) return "missing";
			const a = box.getBoundingClientRect(), p = pt.getBoundingClientRect();
			const svg = document.querySelector('#pump-chart svg').getBoundingClientRect();
			const cx = p.x + p.width / 2, cy = p.y + p.height / 2;
			return [a.width, a.height, cx >= a.left && cx <= a.right && cy >= a.top && cy <= a.bottom, svg.width].join(" ");
		})()`)
		f := strings.Fields(geo)
		if len(f) != 4 {
			t.Errorf("%s: the pump chart has no uncertainty box or measured point (%s)", name, geo)
		} else {
			bw, _ := strconv.ParseFloat(f[0], 64)
			bh, _ := strconv.ParseFloat(f[1], 64)
			sw, _ := strconv.ParseFloat(f[3], 64)
			if !(bw > 0.5 && bh > 0.5 && bw < sw/2) {
				t.Errorf("%s: the uncertainty box is %.1f × %.1f px in a chart %.0f px wide", name, bw, bh, sw)
			}
			if f[2] != "true" {
				t.Errorf("%s: the measured point is not inside its uncertainty box", name)
			}
		}
		for _, bad := range siAfterNumber(b.js(visibleText)) {
			t.Errorf("%s: SI unit on the US sheet: %s", name, bad)
		}
		b.js(`(document.querySelector('#pump-chart').scrollIntoView(), "")`)
		b.shot(fmt.Sprintf("chart-us-%dx%d", size.w, size.h))
	}
}

// visibleText is every text of the page but the pickers' option lists
// (which offer every unit), the link, and the report's inputs as entered.
const visibleText = `(() => { const w = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT, {acceptNode: n => n.parentElement.closest("select, script, style, .print-only, .linktext, #report-inputs td, #report-segments td") ? NodeFilter.FILTER_REJECT : NodeFilter.FILTER_ACCEPT}); let out = []; while (w.nextNode()) out.push(w.currentNode.nodeValue); return out.join("\n"); })()`

// TestPhoneTabRows: on phones (320 to 412 px wide) the seven view tabs
// take at most two rows, each tab at least 44 px tall (WCAG 2.2 SC 2.5.8's
// enhanced target size, the sheet's touch rule) and none cut: its name
// fits its box. Screenshots: tabs-<width>.png.
func TestPhoneTabRows(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	sc := scenario.Demo()
	for _, w := range []int{320, 360, 390, 412} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(w), 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		b.navigate(srv.URL + "/?" + sc.Encode())
		got := b.js(`(() => {
			const tabs = [...document.querySelectorAll(".tabs .tab")];
			const rows = new Set(tabs.map(e => Math.round(e.getBoundingClientRect().top)));
			const low = tabs.filter(e => e.getBoundingClientRect().height < 44).length;
			const cut = tabs.filter(e => { const n = e.querySelector(".tab-name"); return n && n.scrollWidth > e.clientWidth; }).length;
			return [tabs.length, rows.size, low, cut].join(" ");
		})()`)
		var n, rows, low, cut int
		if _, err := fmt.Sscan(got, &n, &rows, &low, &cut); err != nil {
			t.Fatalf("%d px: %q: %v", w, got, err)
		}
		if n != len(present.Views) || rows > 2 || low > 0 || cut > 0 {
			t.Errorf("%d px: %d tabs in %d rows (want %d in at most 2), %d under 44 px tall, %d cut", w, n, rows, len(present.Views), low, cut)
		}
		b.shot(fmt.Sprintf("tabs-%d", w))
	}
}
