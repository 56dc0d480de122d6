//go:build !wasm

package main

import (
	"fmt"
	"net/http/httptest"
	"strings"
	"testing"
	"time"
	"unicode/utf8"

	"github.com/chromedp/chromedp"

	"fieldhead/calc/scenario"
)

// TestClosedLoopByHand enters a chilled-water loop from New sheet as a
// person would — 30 % propylene glycol at 7 °C, 12 L/s, 120 m of NPS 3
// schedule 40 steel with four long-radius elbows, a chiller of 45 kPa at
// 12 L/s, a coil of 3.2 m at 12 L/s and a valve of Kv 40 — counting every
// tap (a button, a box focused; a picker is two: open, choose) and every
// key. It must take at most 70 together, and give the same pump head as
// the same line typed as two points with every level, pressure and speed
// zero (both from the core's own figure for each link, and on the page).
// A 768 px screenshot of the loop sheet is written (loop-768.png).
func TestClosedLoopByHand(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	b.navigate(srv.URL + "/")
	b.js(`String(window.confirm = () => true)`)
	taps, keys := 0, 0
	wait := func(sel string) {
		t.Helper()
		if !b.poll(fmt.Sprintf("document.querySelector(%q) !== null", sel), 5*time.Second) {
			t.Fatalf("no %s on the page", sel)
		}
	}
	tap := func(sel string) {
		t.Helper()
		wait(sel)
		b.js(fmt.Sprintf(`(document.querySelector(%q).click(), "")`, sel))
		taps++
		b.poll("!window.fieldheadPending", 5*time.Second)
	}
	pick := func(sel, value string) {
		t.Helper()
		wait(sel)
		b.js(fmt.Sprintf(`(() => { const e = document.querySelector(%q); e.value = %q; e.dispatchEvent(new Event("change", {bubbles: true})); return ""; })()`, sel, value))
		taps += 2
		time.Sleep(150 * time.Millisecond)
		b.poll("!window.fieldheadPending", 5*time.Second)
	}
	typ := func(sel, text string) {
		t.Helper()
		wait(sel)
		b.typeInto(sel, text)
		taps++
		keys += utf8.RuneCountInString(text)
	}
	more := func(name string) {
		t.Helper()
		b.js(fmt.Sprintf(`([...document.querySelectorAll("button")].find(x => x.textContent.includes(%q)).click(), "")`, "one more "+name))
		taps++
		time.Sleep(100 * time.Millisecond)
	}

	// New sheet is where the count starts.
	wait("#blank")
	b.js(`(document.querySelector("#blank").click(), "")`)
	time.Sleep(300 * time.Millisecond)
	tap("#loop-1")
	pick("#in-liq", "pg")
	typ("#in-gly", "30")
	typ("#in-t", "7")
	typ("#in-q", "12")
	typ("#in-s1-l", "120")
	pick("#in-s1-nps", "3")
	pick("#in-s1-sch", "40")
	pick("#in-s1-mat", "steel")
	pick("#add-s1-fit", "elbow90lr")
	for i := 0; i < 3; i++ {
		more("90° elbow, long radius")
	}
	typ("#in-s1-cmp", "chiller:45kPa@12L/s,coil:3.2m@12L/s,v:kv40")
	time.Sleep(300 * time.Millisecond)
	b.poll("!window.fieldheadPending", 5*time.Second)
	t.Logf("the loop took %d taps and %d keys (%d together)", taps, keys, taps+keys)
	if taps+keys > 70 {
		t.Errorf("the loop took %d taps and %d keys, %d together: more than 70", taps, keys, taps+keys)
	}

	loop := pageScenario(b)
	if loop.Get("loop") != "1" || loop.Get("s1.fit") != "elbow90lr:4" {
		t.Fatalf("the page's link is not the loop entered: %s", loop.Encode())
	}
	loopHead := b.text("#answer-value")
	r := scenario.Evaluate(scenario.Read(loop))
	if r.Balance == nil {
		t.Fatalf("no balance for the loop entered: %v", r.Errors)
	}
	// The open form: the same line between two points, every level,
	// pressure and speed zero.
	open := loop.Clone()
	for _, kv := range [][2]string{{"loop", ""}, {"p1", "0kPa"}, {"z1", "0m"}, {"v1", "0m/s"}, {"p2", "0kPa"}, {"z2", "0m"}, {"v2", "0m/s"}, {"s1.z", "0m"}} {
		if err := open.Set(kv[0], kv[1]); err != nil {
			t.Fatal(err)
		}
	}
	ro := scenario.Evaluate(scenario.Read(open))
	if ro.Balance == nil {
		t.Fatalf("no balance for the open form: %v", ro.Errors)
	}
	if d := r.Balance.Value - ro.Balance.Value; d > 1e-9 || d < -1e-9 {
		t.Errorf("pump head: loop %.9g m, open form %.9g m", r.Balance.Value, ro.Balance.Value)
	}
	if !strings.Contains(strings.ToLower(b.text("#answer")), "closed loop") {
		t.Errorf("the answer does not say closed loop: %q", b.text("#answer"))
	}
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(768, 1024)); err != nil {
		t.Fatal(err)
	}
	time.Sleep(400 * time.Millisecond)
	b.shot("loop-768")
	b.js(`(window.scrollTo(0, 0), "")`)
	time.Sleep(200 * time.Millisecond)
	b.shot("loop-768-top")
	_ = chromedp.Do(b.ctx, chromedp.EmulateViewport(1024, 768))

	b.navigate(srv.URL + "/?" + open.Encode())
	if got := b.text("#answer-value"); got != loopHead || loopHead == "" || loopHead == "—" {
		t.Errorf("the page shows %q for the loop and %q for the open form", loopHead, got)
	}
	b.noProblems("the loop entered by hand")
}
