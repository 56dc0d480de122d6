//go:build !wasm

package main

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"
)

// TestBrowserLinePump opens the demo's share link on the Line, Pump and
// Report views and the turbine demo's on the Pump view. As in TestBrowser,
// the expected texts are the core's own results (scenario.Evaluate,
// formatted by scenario.Show and ShowParam): this checks that the page and
// the core agree and that the charts are on the page, not the physics,
// which calc's tests check against their sources.
func TestBrowserLinePump(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)

	demo := scenario.Demo()
	want := scenario.Evaluate(scenario.Read(demo))
	if want.Balance == nil || want.Balance.Line == nil || want.Pump == nil || want.Pump.Operating == nil ||
		want.NPSH == nil || want.Field == nil {
		t.Fatalf("the demo does not evaluate in full: %v", want.Errors)
	}
	us := want.US
	op := want.Pump.Operating

	// fullShot saves the viewport and the whole page.
	fullShot := func(name string) {
		t.Helper()
		b.shot(name)
		full, err := chromedp.Run(b.ctx, chromedp.FullScreenshot(100))
		if err != nil {
			t.Fatalf("full screenshot %s: %v", name, err)
		}
		if err := os.WriteFile(filepath.Join(b.shots, name+"-full.png"), full, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	expect := func(sel, want string) {
		t.Helper()
		if got := b.waitText(sel, want); got != want {
			t.Errorf("%s shows %q, the core gives %q", sel, got, want)
		}
	}
	// charts counts the inline SVG images inside sel.
	charts := func(sel string) string {
		t.Helper()
		return b.js(fmt.Sprintf("String(document.querySelectorAll(%q).length)", sel+` .chart:not(.print-only) svg[role="img"]`))
	}
	// noScroll checks that the page is no wider than the screen (a page
	// too wide also widens a phone's layout viewport, so both are read).
	noScroll := func(name string, width int) {
		t.Helper()
		expr := fmt.Sprintf("String(Math.max(document.documentElement.scrollWidth, window.innerWidth) - %d)", width)
		if over := b.js(expr); over != "0" {
			t.Errorf("%s: the page is %s px wider than the screen", name, over)
		}
	}

	// 1. The Pump view of the demo: operating point, NPSH, field check, chart.
	pumpLink := demo.Clone()
	if err := pumpLink.Set("view", "pump"); err != nil {
		t.Fatal(err)
	}
	b.navigate(srv.URL + "/?" + pumpLink.Encode())
	expect("#op-q", scenario.ShowParam("q", op.Q, us))
	expect("#op-h", scenario.Show(op.H, calc.Length, us))
	expect("#op-eff", scenario.ShowParam("peff", op.Eff, us))
	expect("#op-shaft", scenario.Show(op.ShaftPower, calc.Power, us))
	expect("#op-hyd", scenario.Show(op.HydraulicPower, calc.Power, us))
	expect("#npsh-a", scenario.Show(want.NPSH.Available, calc.Length, us))
	expect("#npsh-r", scenario.Show(want.NPSH.Required, calc.Length, us))
	expect("#npsh-margin", scenario.Show(want.NPSH.Margin, calc.Length, us))
	expect("#npsh-ratio", calc.FormatNumber(want.NPSH.Ratio, 3))
	expect("#npsh-note", present.WarningText(want.NPSH.Note.Code, want.NPSH.Note.Figures, us))
	pumpDraft := scenario.NewDraft(pumpLink)
	if level, _ := present.Build(&pumpDraft, want).Text("npsh-level"); b.js(`document.querySelector("#npsh-level").textContent`) != level {
		t.Errorf("the NPSH verdict shows %q, want %q for level %s", b.js(`document.querySelector("#npsh-level").textContent`), level, want.NPSH.Level)
	}
	expect("#field-head", scenario.Show(want.Field.Head, calc.Length, us))
	expect("#field-eff", scenario.ShowParam("peff", want.Field.Efficiency, us))
	if got := charts("#pump-chart"); got != "1" {
		t.Errorf("the Pump view should hold the pump chart as one inline <svg role=img>, found %s", got)
	}
	if got := b.js(`document.querySelector('#pump-chart svg').getAttribute('aria-label') || ""`); got == "" {
		t.Error("the pump chart has no accessible name")
	}
	fullShot("pump-1024x768")

	// The data-sheet table holds the link's points, one per row.
	if got := b.value("#in-pq-4"); got != "70" {
		t.Errorf("the data sheet's fifth flow shows %q, the demo link has 70", got)
	}
	// A bad data-sheet head: its message beside the table, the field
	// check (which does not need the curve to meet the line) stays.
	b.typeInto("#in-ph-2", "x")
	if !b.poll(`document.querySelector("#err-ph") !== null`, 5*time.Second) {
		t.Error("no message beside the data sheet after a bad head")
	}
	if got := b.text("#field-head"); got != scenario.Show(want.Field.Head, calc.Length, us) {
		t.Errorf("the field check should stay while the data sheet is bad, shows %q", got)
	}
	b.typeInto("#in-ph-2", "52")
	expect("#op-q", scenario.ShowParam("q", op.Q, us))
	if got := b.js("location.search"); got != "?"+pumpLink.Sign() {
		t.Errorf("after restoring the head the link is %q, want the demo's %q", got, "?"+pumpLink.Sign())
	}

	// 2. The Line view: total loss, per-segment table, profile chart.
	if err := clickID(b, "view-line"); err != nil {
		t.Fatal(err)
	}
	l := want.Balance.Line
	expect("#line-loss", scenario.Show(l.TotalLoss, calc.Length, us))
	expect("#seg-total", scenario.Show(l.TotalLoss, calc.Length, us))
	if got := b.js(`String(document.querySelectorAll("#seg-table tbody tr").length)`); got != fmt.Sprint(len(l.Segments)) {
		t.Errorf("the segment table has %s rows, the line %d segments", got, len(l.Segments))
	}
	if got := charts("#profile-chart"); got != "1" {
		t.Errorf("the Line view should hold the profile chart as one inline <svg role=img>, found %s", got)
	}
	if b.js(`document.querySelector("#pump-node") ? "yes" : "no"`) != "yes" {
		t.Error("the Line view does not show where the pump sits")
	}
	fullShot("line-1024x768")

	// Reorder: segment 1 down swaps the segments' parameters in the link;
	// segment 2 up restores the demo.
	if err := clickID(b, "seg-down-1"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("s1.l=632m") && location.search.includes("s2.l=8m")`, 5*time.Second) {
		t.Errorf("moving segment 1 down should swap the segments in the link, which is %q", b.js("location.search"))
	}
	if err := clickID(b, "seg-up-2"); err != nil {
		t.Fatal(err)
	}
	lineLink := demo.Clone()
	if err := lineLink.Set("view", "line"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(fmt.Sprintf("location.search === %q", "?"+lineLink.Sign()), 5*time.Second) {
		t.Errorf("moving it back should restore the demo's link, which is %q", b.js("location.search"))
	}
	// Add a segment: it takes the last one's pipe and asks for its length;
	// remove it again.
	if err := clickID(b, "seg-add"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.querySelector('#err-s3-l') !== null && location.search.includes("s3.nps=8")`, 5*time.Second) {
		t.Errorf("a new segment should carry the last one's pipe and ask for its length; link %q", b.js("location.search"))
	}
	b.js(`String(window.confirm = () => true)`)
	if err := clickID(b, "seg-del-3"); err != nil {
		t.Fatal(err)
	}
	expect("#line-loss", scenario.Show(l.TotalLoss, calc.Length, us))

	// 3. The Report view: the whole sheet, both charts, the link as text.
	if err := clickID(b, "view-report"); err != nil {
		t.Fatal(err)
	}
	main, _ := scenario.ShowSolved(demo, want)
	expect("#report-answer", main)
	expect("#report-op", scenario.ShowParam("q", op.Q, us)+" at "+scenario.Show(op.H, calc.Length, us))
	if got := charts("#report-charts"); got != "2" {
		t.Errorf("the report should hold both charts as inline <svg role=img>, found %s", got)
	}
	reportLink := demo.Clone()
	if err := reportLink.Set("view", "report"); err != nil {
		t.Fatal(err)
	}
	if got := b.text("#report-url"); !strings.HasSuffix(got, "?"+reportLink.Sign()) {
		t.Errorf("the report's link is %q, want the scenario %q", got, reportLink.Encode())
	}
	for _, p := range []string{"pq", "zp", "pin", "ps", "etat"} {
		if demo.Has(p) && !strings.Contains(b.text("#report-inputs"), p) {
			t.Errorf("the report's inputs do not list %s", p)
		}
	}
	if got := b.js(`String(document.querySelectorAll("#report-segments tbody tr").length)`); got != fmt.Sprint(len(l.Segments)) {
		t.Errorf("the report's segment table has %s rows, the line %d segments", got, len(l.Segments))
	}
	fullShot("report-1024x768")
	if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
		t.Fatal(err)
	}
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(794, 1123)); err != nil {
		t.Fatal(err)
	}
	fullShot("report-print")
	if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
		t.Fatal(err)
	}
	pdf, err := chromedp.Run(b.ctx, chromedp.PrintToPDF())
	if err != nil {
		t.Fatalf("printing the report: %v", err)
	}
	if err := os.WriteFile(filepath.Join(b.shots, "report.pdf"), pdf, 0o644); err != nil {
		t.Fatal(err)
	}

	// 4. Phones: the Line and Pump views fit 360 px.
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(360, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
		t.Fatal(err)
	}
	for _, v := range []string{"line", "pump"} {
		if err := clickID(b, "view-"+v); err != nil {
			t.Fatal(err)
		}
		time.Sleep(300 * time.Millisecond)
		noScroll(v+" at 360 px", 360)
		fullShot(v + "-360x740")
	}
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768)); err != nil {
		t.Fatal(err)
	}

	// 5. The turbine demo: output at the flow and at the best flow.
	tw := scenario.Evaluate(scenario.Read(scenario.TurbineDemo()))
	if tw.Turbine == nil || tw.BestTurbine == nil {
		t.Fatalf("the turbine demo does not evaluate: %v", tw.Errors)
	}
	b.navigate(srv.URL + "/?" + scenario.TurbineDemo().Encode())
	expect("#turb-power", scenario.Show(tw.Turbine.Power, calc.Power, tw.US))
	expect("#turb-net", scenario.Show(tw.Turbine.NetHead, calc.Length, tw.US))
	expect("#turb-best", scenario.Show(tw.BestTurbine.Power, calc.Power, tw.US))
	if got := charts("#profile-chart"); got != "1" {
		t.Errorf("the turbine view should hold the profile chart, found %s", got)
	}
	fullShot("turbine-1024x768")
	b.noProblems("Line, Pump and Report views")
}
