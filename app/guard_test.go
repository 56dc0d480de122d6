//go:build !wasm

package main

import (
	"fmt"
	"strings"
	"testing"
	"time"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

// TestContainNative: a panic in a handler is recovered, recorded with what
// the handler was doing, and the figures are recomputed from the inputs.
// (The behaviour is this project's rule for the page; no external source.)
func TestContainNative(t *testing.T) {
	s := &sheet{d: scenario.NewDraft(scenario.Demo())}
	func() {
		defer s.contain("testing the guard")
		var m map[string]int
		m["boom"]++ // a real runtime panic: assignment to a nil map
	}()
	if s.fault == nil || s.fault.what != "testing the guard" || !strings.Contains(s.fault.msg, "nil map") {
		t.Fatalf("fault recorded as %+v", s.fault)
	}
	if want := scenario.Evaluate(scenario.Read(s.d.Scen)); s.res.Balance == nil || want.Balance == nil || s.res.Balance.Value != want.Balance.Value {
		t.Errorf("after the panic the figures should be those of the inputs")
	}

	if s.fallbackSheet() == nil {
		t.Fatal("no fallback sheet")
	}
	if got := scenario.AllParams(); len(got) == 0 || got[0] != "view" {
		t.Errorf("the fallback lists %v, want every parameter in link order", got)
	}
}

// TestContainPartNames: a panic while drawing a card is recorded with the
// card's title, words the page gives it (not a Go function name, which a
// rename would change; this project's rule).
func TestContainPartNames(t *testing.T) {
	s := &sheet{}
	c := &card{S: s, C: present.Card{Title: "Where the head goes", Blocks: []present.Block{{Kind: present.BlockAnswer}}}}
	_ = c.Render() // an answer block without its answer: a nil dereference, contained
	if s.fault == nil || s.fault.what != "drawing the card “Where the head goes”" {
		t.Errorf("fault recorded as %+v", s.fault)
	}
}

// paste puts v into an input with one input event, as pasting does.
func paste(b *tab, sel, v string) {
	b.t.Helper()
	b.js(fmt.Sprintf(`(() => { const e = document.querySelector(%q); e.value = %q; e.dispatchEvent(new Event("input", {bubbles: true})); return ""; })()`, sel, v))
}

// TestPanicContainment runs the page with the test-only panic switch
// (window.fieldheadPanicTest, set through the DevTools protocol; no link or
// input reaches it). A panic while recalculating after an edit, and one
// while drawing the sheet, must each leave the program running: a banner
// names what failed, every input is still there, the link and the saved
// copy are untouched by the failed edit, and the page computes again once
// the switch is off. (This project's rule for faults; the expected figures
// are scenario.Evaluate's own.)
func TestPanicContainment(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	demo := scenario.Demo()
	b.navigate(srv.URL + "/?" + demo.Encode())
	want := scenario.Evaluate(scenario.Read(demo))
	if want.Balance == nil {
		t.Fatalf("the demo does not evaluate: %v", want.Errors)
	}
	show := func(r scenario.Result) string { return scenario.Show(r.Balance.Value, calc.Length, r.US) }
	if got := b.text("#answer-value"); got != show(want) {
		t.Fatalf("answer %q, want %q", got, show(want))
	}
	query := b.js("location.search")
	saved := b.js("localStorage.getItem('" + storageKey + "')")

	// 1. A panic inside the handler of an edit.
	b.js(`window.fieldheadPanicTest = "evaluate"; ""`)
	b.typeInto("#in-z2", "252")
	if !b.poll(`document.getElementById("fault") !== null`, 5*time.Second) {
		t.Fatalf("no fault banner after a panic in the edit handler; page: %.300s", b.js("document.body.innerText"))
	}
	if got := b.text("#fault"); !strings.Contains(got, "recalculating after an edit to elevation of 2") || !strings.Contains(got, "deliberate panic") {
		t.Errorf("the banner should name what failed, says %q", got)
	}
	b.shot("panic-banner-edit")
	if got := b.value("#in-z2"); got != "252" {
		t.Errorf("the edited box shows %q, want what was typed (252)", got)
	}
	if got := b.value("#in-z1"); got != "212" {
		t.Errorf("another box shows %q, want 212", got)
	}
	if got := b.js("location.search"); got != query {
		t.Errorf("the failed edit changed the link: %q, was %q", got, query)
	}
	if got := b.js("localStorage.getItem('" + storageKey + "')"); got != saved {
		t.Errorf("the failed edit changed the saved copy")
	}
	// The figures match the boxes (the guard recomputed them).
	edited := demo.Clone()
	_ = edited.Set("z2", "252m")
	if we := scenario.Evaluate(scenario.Read(edited)); we.Balance != nil {
		if got := b.waitText("#answer-value", show(we)); got != show(we) {
			t.Errorf("after the contained panic the answer is %q, want %q for the boxes shown", got, show(we))
		}
	}
	// Switch off, edit again: the program is alive and computes and saves.
	b.js(`window.fieldheadPanicTest = ""; ""`)
	b.typeInto("#in-z2", "251")
	if got := b.waitText("#answer-value", show(want)); got != show(want) {
		t.Errorf("after the panic, editing gives %q, want %q", got, show(want))
	}
	if !b.poll(`location.search.includes("z2=251m")`, 5*time.Second) {
		t.Errorf("after the panic, an edit no longer reaches the link: %q", b.js("location.search"))
	}

	// 2. A panic while drawing the sheet.
	b.js(`window.fieldheadPanicTest = "render"; ""`)
	paste(b, "#in-z1", "211") // one input event, as a paste: a drawing fault replaces the page and its focus
	if !b.poll(`document.getElementById("fallback-inputs") !== null`, 5*time.Second) {
		t.Fatalf("no fallback sheet after a panic in Render; page: %.300s", b.js("document.body.innerText"))
	}
	if got := b.text("#fault"); !strings.Contains(got, "drawing the sheet") {
		t.Errorf("the banner should say drawing failed, says %q", got)
	}
	b.shot("panic-banner-render")
	// Every parameter of the scenario is still on screen, as the link holds it.
	for _, p := range []string{"z1", "z2", "q", "t", "name"} {
		if got, w := b.value("#in-"+p), strings.ReplaceAll(demo.Get(p), "212m", "211m"); got != w {
			t.Errorf("fallback: %s shows %q, want %q", p, got, w)
		}
	}
	b.js(`window.fieldheadPanicTest = ""; ""`)
	paste(b, "#in-z1", "212m")
	if !b.poll(`document.getElementById("answer-value") !== null`, 5*time.Second) {
		t.Fatal("the full sheet did not come back after the drawing fault")
	}
	if got := b.waitText("#answer-value", show(want)); got != show(want) {
		t.Errorf("after the drawing fault the answer is %q, want %q", got, show(want))
	}
	if err := clickID(b, "fault-dismiss"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.getElementById("fault") === null`, 5*time.Second) {
		t.Error("the banner does not go away when dismissed")
	}
	b.noProblems("after the contained panics")
}
