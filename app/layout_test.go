//go:build !wasm

package main

import (
	"bytes"
	"fmt"
	"math"
	"net/http/httptest"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"
)

// The page's fit on phones and on paper.

// demoView is one view of one of the demos, as a share link's query.
type demoView struct {
	demo string // "demo" or "turbine demo"
	view struct{ Key, Hint string }
	link string
}

// demoViews lists every view of the demo and of the turbine demo.
func demoViews() []demoView {
	var out []demoView
	for _, d := range []struct {
		name string
		sc   scenario.Scenario
	}{{"demo", scenario.Demo()}, {"turbine demo", scenario.TurbineDemo()}} {
		for _, v := range present.Views {
			s := d.sc.Clone()
			_ = s.Set("view", v.Key)
			out = append(out, demoView{demo: d.name, view: v, link: s.Encode()})
		}
	}
	return out
}

// usDemoViews is demoViews with each demo in US units (usDemo).
func usDemoViews(t *testing.T) []demoView {
	t.Helper()
	var out []demoView
	for _, d := range []struct {
		name string
		sc   scenario.Scenario
	}{{"US demo", scenario.Demo()}, {"US turbine demo", scenario.TurbineDemo()}} {
		us := usDemo(t, d.sc)
		for _, v := range present.Views {
			s := us.Clone()
			_ = s.Set("view", v.Key)
			out = append(out, demoView{demo: d.name, view: v, link: s.Encode()})
		}
	}
	return out
}

// phoneWidths are the widths TestPhoneWidths lays the pages out at, CSS
// px: small and common phones, a tablet upright and across, a laptop.
var phoneWidths = []int64{320, 360, 390, 412, 768, 1024, 1280}

// pumpTestViews lists the views of the pump-test demo
// (scenario.PumpTestDemo: five readings, a guarantee and a pump tag) that
// show the test: the Pump view, with its test card and the tested curve,
// band and cross on the chart, and the Report.
func pumpTestViews() []demoView {
	var out []demoView
	for _, v := range present.Views {
		if v.Key != "pump" && v.Key != "report" {
			continue
		}
		s := scenario.PumpTestDemo()
		_ = s.Set("view", v.Key)
		out = append(out, demoView{demo: "pump-test demo", view: v, link: s.Encode()})
	}
	return out
}

// bandsView is the demo's Pump view with every instrument's accuracy
// given, so the field check shows its uncertainty lines (long ones).
func bandsView(t *testing.T) demoView {
	t.Helper()
	s := scenario.Demo()
	for _, kv := range [][2]string{{"view", "pump"}, {"etam", "92%"}, {"gcs", "1.6%"}, {"gss", "600kPa"},
		{"gcd", "1.6%"}, {"gsd", "1000kPa"}, {"uqm", "2%"}, {"upin", "1.5%"}, {"uz", "1cm"}, {"grade", "2B"}} {
		if err := s.Set(kv[0], kv[1]); err != nil {
			t.Fatalf("%s: %v", kv[0], err)
		}
	}
	dv := demoView{demo: "demo with accuracies", link: s.Encode()}
	dv.view.Key, dv.view.Hint = "pump", "bands"
	return dv
}

// overflowJS lists what does not fit the width the page is laid out for:
// the document wider than the window; any element whose right edge passes
// the window's; any box whose content is wider than the box and that cuts
// it or scrolls it (overflow other than visible, or paint containment), but the visually
// hidden names (.sr, clipped on purpose); any chart text that passes the
// edge of its SVG; and any picker whose chosen option's text is wider
// than the room the picker gives it.
const overflowJS = `(() => {
  const out = [];
  const name = (e) => e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + (e.className && typeof e.className === "string" ? "." + e.className.trim().split(/\s+/).join(".") : "") +
    (e.firstElementChild && e.firstElementChild.id ? " > #" + e.firstElementChild.id : "");
  const W = document.documentElement.clientWidth;
  // A box cuts what passes it when its overflow is not visible, or when it
  // contains its paint (CSS Containment: a card, contain: content).
  const clips = (cs) => cs.overflowX !== "visible" || /paint|content|strict/.test(cs.contain);
  if (document.documentElement.scrollWidth > W) out.push("the document is " + document.documentElement.scrollWidth + " px wide in " + W);
  for (const e of document.querySelectorAll("body *")) {
    if (e.closest(".sr, svg, script, style, head") || e.getClientRects().length === 0) continue;
    const cs = getComputedStyle(e);
    if (cs.visibility === "hidden") continue;
    const r = e.getBoundingClientRect();
    let inside = false; // within a box that clips or scrolls: that box is reported
    for (let a = e.parentElement; a && a !== document.body; a = a.parentElement) if (clips(getComputedStyle(a))) { inside = true; break; }
    if (!inside && r.right > W + 0.5) out.push(name(e) + " reaches " + Math.round(r.right) + " px of " + W);
    if (e.tagName !== "SELECT" && e.tagName !== "INPUT" && clips(cs) && e.scrollWidth > e.clientWidth + 1)
      out.push(name(e) + " cuts or scrolls its content: " + e.scrollWidth + " px in " + e.clientWidth + " (overflow " + cs.overflowX + ", contain " + cs.contain + ")");
  }
  // A chart's text inside its drawing: the SVG cuts what passes its
  // viewBox.
  for (const t of document.querySelectorAll(".chart svg text")) {
    if (t.getClientRects().length === 0 || t.textContent.trim() === "") continue;
    const vb = t.ownerSVGElement.viewBox.baseVal, bb = t.getBBox();
    if (bb.x < vb.x - 0.5 || bb.x + bb.width > vb.x + vb.width + 0.5)
      out.push("chart text “" + t.textContent + "” runs past the chart's edge (" + Math.round(bb.x) + " to " + Math.round(bb.x + bb.width) + " of " + vb.width + ")");
  }
  // A picker's text: its chosen option in the picker's own font, against
  // its inner width less the arrow (about a line's height; none when
  // the picker is drawn without one).
  const probe = document.createElement("span");
  probe.style.cssText = "position:absolute;visibility:hidden;white-space:pre";
  document.body.append(probe);
  for (const s of document.querySelectorAll("select")) {
    if (s.getClientRects().length === 0 || s.selectedIndex < 0) continue;
    // A picker laid over a face that shows its choice (app/field.go): the
    // face must show the chosen text whole.
    const face = s.nextElementSibling && s.nextElementSibling.classList.contains("pickface") ? s.nextElementSibling : null;
    if (face && face.getClientRects().length > 0) {
      if (face.textContent !== s.options[s.selectedIndex].text) out.push("picker " + name(s) + " shows “" + face.textContent + "” for “" + s.options[s.selectedIndex].text + "”");
      if (face.scrollWidth > face.clientWidth + 1) out.push("picker " + name(s) + " cuts its choice: " + face.scrollWidth + " px in " + face.clientWidth);
      continue;
    }
    const cs = getComputedStyle(s);
    probe.style.font = cs.font;
    probe.textContent = s.options[s.selectedIndex].text;
    const arrow = cs.appearance === "none" ? 0 : parseFloat(cs.fontSize);
    const room = s.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight) - arrow;
    if (probe.getBoundingClientRect().width > room + 0.5)
      out.push("picker " + name(s) + " cuts “" + probe.textContent + "”: " + Math.round(probe.getBoundingClientRect().width) + " px of text in " + Math.round(room));
  }
  probe.remove();
  return out;
})()`

// brokenFiguresJS lists the numbers the page breaks across lines: every
// number of its text, digits with their decimal point or comma, sign and
// exponent ("430.00", "−4.853", "1e-6"), must lie on one line. A line
// may break between a figure and its unit, or after the hyphen of
// "python3-iapws", never inside a number (a reader takes "430.0" and
// "0 kPa" for two values). The link's text, which breaks anywhere on
// purpose, is left out; so are numbers grouped by thin spaces ("268 000",
// present's grouping, whose U+2009 is a break opportunity).
const brokenFiguresJS = `(() => {
  const out = [];
  const w = document.createTreeWalker(document.querySelector("main") || document.body, NodeFilter.SHOW_TEXT, {
    acceptNode: (n) => n.parentElement.closest(".linktext, .sr, svg, script, style, select, textarea, [aria-hidden=true]") ? NodeFilter.FILTER_REJECT : NodeFilter.FILTER_ACCEPT});
  const range = document.createRange();
  while (w.nextNode()) {
    const n = w.currentNode;
    if (n.parentElement.getClientRects().length === 0) continue;
    for (const m of n.nodeValue.matchAll(/(?:(?<![\p{L}\p{N}])[−+±-])?\d+(?:[.,\u2009\u202f]\d+)*(?:[eE][−+-]?\d+)?/gu)) {
      range.setStart(n, m.index);
      range.setEnd(n, m.index + m[0].length);
      const tops = new Set([...range.getClientRects()].filter((r) => r.width > 0).map((r) => Math.round(r.bottom / 4)));
      if (tops.size > 1) {
        const e = n.parentElement;
        out.push("“" + m[0] + "” is broken across " + tops.size + " lines in " + e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + (e.className ? "." + String(e.className).split(" ")[0] : ""));
      }
    }
  }
  return out;
})()`

// chartTextJS returns the smallest chart text on the page in CSS px: the
// SVG's font size times the scale its viewBox is drawn at.
const chartTextJS = `(() => {
  let min = 1e9;
  for (const t of document.querySelectorAll(".chart svg text")) {
    if (t.getClientRects().length === 0 || t.textContent.trim() === "") continue;
    const svg = t.ownerSVGElement;
    const scale = svg.getBoundingClientRect().width / svg.viewBox.baseVal.width;
    min = Math.min(min, parseFloat(getComputedStyle(t).fontSize) * scale);
  }
  return min === 1e9 ? 0 : min;
})()`

// TestPhoneWidths opens every view of both demos, in SI and in US units,
// at phone widths from 320 CSS px, on a tablet upright (768) and in
// landscape (1024) and on a laptop (1280), with the demo's Pump view with
// its instruments' accuracies (the uncertainty lines, the bold labels of
// the measured point); and at every width the pump-test demo's Pump
// view and Report (the test card, the tested curve and cross) and the
// site book with a pump's history (scenario.HistoryDemo imported):
// nothing may scroll sideways or be cut, no figure broken across lines
// (brokenFiguresJS) (WCAG 2.1 SC 1.4.10
// Reflow: content at 320 CSS px without scrolling in two directions;
// data tables may scroll, ours fold into one block per row instead), no
// picker may cut its text, and from 360 px the charts' smallest text is at
// least 12 CSS px (the size this project sets as readable at arm's length
// on a phone).
func TestPhoneWidths(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	pages := 0
	// Both demos in SI and in US units, and the demo's Pump view with
	// instrument accuracies (its uncertainty lines were once cut on
	// tablets, and its bold "measured" label ran past the chart at 320 px).
	views := append(append(demoViews(), usDemoViews(t)...), bandsView(t))
	for _, w := range phoneWidths {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(w, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		for _, dv := range views {
			demo, v := dv.demo, dv.view
			b.navigate(srv.URL + "/?" + dv.link)
			pages++
			fits(b, fmt.Sprintf("%s, %s view, %d px", demo, v.Key, w), w, v.Key == "line" || v.Key == "pump" || v.Key == "report")
			if demo == "demo" && (w == 320 || w == 360 || w == 1024) {
				b.shot(fmt.Sprintf("phone-%s-%d", v.Key, w))
			}
		}
	}
	// The test at several flows and the pump's history, in a tab of their
	// own (a tab's time limit is for one walk).
	bt := newTab(t)
	importHistory(t, bt, srv.URL)
	for _, w := range phoneWidths {
		if err := chromedp.Do(bt.ctx, chromedp.EmulateViewport(w, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		for _, dv := range pumpTestViews() {
			bt.navigate(srv.URL + "/?" + dv.link)
			pages++
			fits(bt, fmt.Sprintf("%s, %s view, %d px", dv.demo, dv.view.Key, w), w, true)
		}
		bt.navigate(srv.URL + "/?view=book")
		if !bt.poll(`document.querySelector("#history-1 svg") !== null`, 10*time.Second) {
			t.Fatalf("%d px: the site book shows no history", w)
		}
		pages++
		fits(bt, fmt.Sprintf("pump history, %d px", w), w, true)
	}
	// The check itself: an element wider than the window is reported.
	b.js(`(() => { const d = document.createElement("div"); d.id = "wide-probe"; d.textContent = "x"; d.className = "sr-probe"; d.setAttribute("data-w", "x"); document.querySelector("main").append(d); d.style.width = "2000px"; return ""; })()`)
	bad, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](overflowJS))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(strings.Join(bad, "\n"), "wide-probe") {
		t.Errorf("a 2000 px element was not reported: the check finds nothing (%v)", bad)
	}
	t.Logf("%d pages checked at phone widths", pages)
}

// fits runs TestPhoneWidths' checks on the page open in b, laid out w CSS
// px wide: the window not widened, nothing past the edge or cut
// (overflowJS), no figure broken across lines (brokenFiguresJS) and, when
// charts is set, chart text there and from 360 px at least 12 CSS px.
func fits(b *tab, where string, w int64, charts bool) {
	t := b.t
	t.Helper()
	if got := b.js(`String(window.innerWidth)`); got != fmt.Sprint(w) {
		t.Errorf("%s: the page widens the window to %s px", where, got)
	}
	bad, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](overflowJS))
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range bad {
		t.Errorf("%s: %s", where, p)
	}
	broken, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](brokenFiguresJS))
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range broken {
		t.Errorf("%s: %s", where, p)
	}
	if !charts {
		return
	}
	px, err := chromedp.Run(b.ctx, chromedp.Evaluate[float64](chartTextJS))
	if err != nil {
		t.Fatal(err)
	}
	if px == 0 {
		t.Errorf("%s: no chart text found", where)
	} else if w >= 360 && px < 12 {
		t.Errorf("%s: the charts' smallest text is %.1f CSS px, under 12", where, px)
	}
}

// Paper sizes, portrait, and the printable width inside the sheet's
// @page margin of 14 mm (web/fieldhead.css): ISO 216 A4 is 210 × 297 mm,
// ANSI/ASME Y14.1 Letter 8.5 × 11 in (215.9 × 279.4 mm). One CSS px is
// 1/96 in (CSS Values and Units Level 3).
var papers = []struct {
	name          string
	wMM, hMM      float64
	printableCSSp float64
}{
	{"A4", 210, 297, (210 - 2*14) / 25.4 * 96},
	{"Letter", 215.9, 279.4, (215.9 - 2*14) / 25.4 * 96},
}

// TestPrintFits lays out the Report and the sheet of every view of both
// demos, and the pump-test demo's Pump view and Report, in print media at the printable width of A4 and Letter: nothing
// may pass the right edge or be cut or scroll (a printed scrollbar hides
// what is beyond it); the cautions must print; the profile chart must
// tell the energy and hydraulic grade lines apart without colour (WCAG
// 2.1 SC 1.4.1 Use of Color: different dash patterns and a label on each
// line). It then prints the Report to PDF on each paper, checks that every
// page is of that paper (checkPDF) and writes the PDF to the screenshots
// folder for a person to look at.
func TestPrintFits(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	for _, paper := range papers {
		for _, dv := range append(demoViews(), pumpTestViews()...) {
			demo, v := dv.demo, dv.view
			if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768)); err != nil {
				t.Fatal(err)
			}
			b.navigate(srv.URL + "/?" + dv.link)
			where := fmt.Sprintf("%s, %s view, printed on %s", demo, v.Key, paper.name)
			if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
				t.Fatal(err)
			}
			if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(paper.printableCSSp), 1000)); err != nil {
				t.Fatal(err)
			}
			bad, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](overflowJS))
			if err != nil {
				t.Fatal(err)
			}
			for _, p := range bad {
				t.Errorf("%s: %s", where, p)
			}
			if !b.jsBool(`(() => { const c = document.getElementById("cautions"); return !!c && c.getClientRects().length > 0 && c.innerText.trim().length > 100; })()`) {
				t.Errorf("%s: the cautions do not print", where)
			}
			if v.Key == "report" {
				if !b.jsBool(egl + ` && ` + hgl) {
					t.Errorf("%s: the profile chart does not set the grade lines apart by dash pattern and a label on each line", where)
				}
				b.shot(fmt.Sprintf("print-%s-%s", strings.ReplaceAll(demo, " ", "-"), paper.name))
				if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
					t.Fatal(err)
				}
				pdf, err := chromedp.Run(b.ctx, chromedp.PrintToPDF(func(p *page.PrintToPDFParams) {
					p.PaperWidth, p.PaperHeight = paper.wMM/25.4, paper.hMM/25.4
				}))
				if err != nil {
					t.Fatalf("%s: printing to PDF: %v", where, err)
				}
				checkPDF(t, where, pdf, paper.wMM, paper.hMM)
				name := fmt.Sprintf("report-%s-%s.pdf", strings.ReplaceAll(demo, " ", "-"), paper.name)
				if err := os.WriteFile(filepath.Join(b.shots, name), pdf, 0o644); err != nil {
					t.Fatal(err)
				}
			}
			if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
				t.Fatal(err)
			}
		}
	}
	b.noProblems("print")
}

// egl and hgl: the profile chart draws each grade line with its own dash
// pattern and writes its name on the line (a text in a group labelled
// data-line="egl" or "hgl").
const (
	egl = `(() => { const p = document.querySelector("#report-charts svg [data-series=egl]"), h = document.querySelector("#report-charts svg [data-series=hgl]"); return !!p && !!h && (p.getAttribute("stroke-dasharray") || "") !== (h.getAttribute("stroke-dasharray") || ""); })()`
	hgl = `(() => !!document.querySelector("#report-charts svg [data-line=egl] text") && !!document.querySelector("#report-charts svg [data-line=hgl] text"))()`
)

// checkPDF reads a printed PDF's pages (ISO 32000-1: the page tree's /Count
// and each page's /MediaBox, in points of 1/72 in): at least one page, and
// every page of the paper asked for, portrait, within a point.
func checkPDF(t *testing.T, where string, pdf []byte, wMM, hMM float64) {
	t.Helper()
	if !bytes.HasPrefix(pdf, []byte("%PDF-")) {
		t.Errorf("%s: not a PDF", where)
		return
	}
	count := 0
	for _, m := range regexp.MustCompile(`/Count (\d+)`).FindAllSubmatch(pdf, -1) {
		n, _ := strconv.Atoi(string(m[1]))
		count = max(count, n)
	}
	boxes := regexp.MustCompile(`/MediaBox \[0 0 ([0-9.]+) ([0-9.]+)\]`).FindAllSubmatch(pdf, -1)
	if count == 0 || len(boxes) != count {
		t.Errorf("%s: the PDF has %d pages and %d page sizes", where, count, len(boxes))
	}
	wPt, hPt := wMM/25.4*72, hMM/25.4*72
	for i, m := range boxes {
		w, _ := strconv.ParseFloat(string(m[1]), 64)
		h, _ := strconv.ParseFloat(string(m[2]), 64)
		if math.Abs(w-wPt) > 1 || math.Abs(h-hPt) > 1 {
			t.Errorf("%s: page %d is %.1f × %.1f pt, want %.1f × %.1f", where, i+1, w, h, wPt, hPt)
		}
	}
	t.Logf("%s: %d pages", where, count)
}
