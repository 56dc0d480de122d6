//go:build !wasm

package main

import (
	"fmt"
	"net/http/httptest"
	"strconv"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
	"github.com/chromedp/chromedp/kb"

	"fieldhead/calc/scenario"
)

// TestFocusAfterActions works the Line view and the views' tabs from the
// keyboard alone (WCAG 2.1 SC 2.1.1 Keyboard, 2.4.3 Focus Order): after
// adding, moving and removing a segment the focus is on the control that
// belongs to the same segment, or the next sensible one, never dropped to
// the page (a data-sheet point likewise); a view opened by a button or a
// tab is shown from its top with the focus on its tab; the picker that
// adds a fitting adds only on an explicit choice (Enter, or a pick from its
// list), not for each arrow key that browses it closed, and shows its
// placeholder again afterwards.
func TestFocusAfterActions(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	sc := scenario.Demo()
	_ = sc.Set("view", "line")
	b.navigate(srv.URL + "/?" + sc.Encode())
	b.js(`(() => { window.confirm = () => true; return ""; })()`) // removing a segment asks first

	focused := func() string { return b.js(`document.activeElement ? document.activeElement.id : ""`) }
	press := func(id, key string) {
		t.Helper()
		b.js(fmt.Sprintf(`document.getElementById(%q).focus(); ""`, id))
		if err := chromedp.Do(b.ctx, chromedp.KeyEvent(key)); err != nil {
			t.Fatal(err)
		}
		time.Sleep(300 * time.Millisecond)
	}
	segments := func() int {
		n, _ := strconv.Atoi(b.js(`String(document.querySelectorAll("[id^=seg-del-]").length)`))
		return n
	}
	want := func(after, id string) {
		t.Helper()
		if got := focused(); got != id {
			t.Errorf("after %s the focus is on %q, want #%s", after, got, id)
		}
	}

	n := segments()
	if n == 0 {
		t.Fatal("the demo's Line view has no segments")
	}
	press("seg-add", kb.Enter)
	if segments() != n+1 {
		t.Fatalf("Enter on Add did not add a segment (%d, want %d)", segments(), n+1)
	}
	want("adding a segment", fmt.Sprintf("in-s%d-l", n+1))

	b.typeInto(fmt.Sprintf("#in-s%d-l", n+1), "12m")
	first := b.value("#in-s1-l")
	press("seg-down-1", kb.Enter)
	if got := b.value("#in-s2-l"); got != first {
		t.Errorf("moving segment 1 down: segment 2's length is %q, want %q", got, first)
	}
	want("moving segment 1 down", "seg-down-2")
	press("seg-up-2", kb.Enter)
	want("moving segment 2 up to the top (its up button disabled there)", "seg-down-1")

	last := n + 1
	press(fmt.Sprintf("seg-del-%d", last), kb.Enter)
	if segments() != n {
		t.Fatalf("Enter on remove did not remove segment %d", last)
	}
	want("removing the last segment", fmt.Sprintf("seg-del-%d", n))
	if n > 1 {
		press("seg-del-1", kb.Enter)
		want("removing segment 1", "seg-del-1")
	}

	// The fitting picker of segment 1.
	pick := "add-s1-fit"
	count := func() int {
		v, _ := strconv.Atoi(b.js(`String([...document.querySelectorAll("#f-s1-fit .count, .fittings .count")].filter((e) => e.closest(".card") === document.getElementById("` + pick + `").closest(".card")).reduce((s, e) => s + Number(e.textContent), 0))`))
		return v
	}
	if !b.jsBool(fmt.Sprintf(`!!document.getElementById(%q)`, pick)) {
		t.Fatalf("no #%s on the Line view", pick)
	}
	before := count()
	for i := 0; i < 3; i++ {
		press(pick, kb.ArrowDown)
	}
	if got := count(); got != before {
		t.Errorf("three arrow keys on the closed fitting picker added %d fittings; browsing must add none", got-before)
	}
	if b.value("#"+pick) == "" {
		t.Error("the arrow keys did not browse the fitting picker")
	}
	press(pick, kb.Enter)
	if got := count(); got != before+1 {
		t.Errorf("Enter on the fitting picker made %d fittings of %d, want one more", got, before)
	}
	if v := b.value("#" + pick); v != "" {
		t.Errorf("after adding, the fitting picker shows %q, not its placeholder", v)
	}
	want("adding a fitting", pick)
	press(pick, kb.ArrowDown)
	press(pick, kb.Tab)
	if v := b.value("#" + pick); v != "" {
		t.Errorf("left after browsing, the fitting picker shows %q, not its placeholder", v)
	}
	if got := count(); got != before+1 {
		t.Errorf("browsing and leaving the picker changed the fittings to %d, want %d", got, before+1)
	}
	// A pick from the open list: a change that follows no key.
	b.js(fmt.Sprintf(`(() => { const s = document.getElementById(%q); s.value = s.options[2].value; s.dispatchEvent(new Event("change", {bubbles: true})); return ""; })()`, pick))
	time.Sleep(300 * time.Millisecond)
	if got := count(); got != before+2 {
		t.Errorf("a pick from the list made %d fittings, want %d", got, before+2)
	}

	// The data sheet on the Pump view: a new point's first cell, then the
	// remove button of the point that takes a removed one's place.
	press("view-pump", kb.Enter)
	rows := func() int {
		n, _ := strconv.Atoi(b.js(`String(document.querySelectorAll("#datasheet tbody tr").length)`))
		return n
	}
	r := rows()
	press("row-add", kb.Enter)
	if rows() != r+1 {
		t.Fatalf("Enter on Add a point made %d rows of %d", rows(), r)
	}
	want("adding a data-sheet point", fmt.Sprintf("in-pq-%d", r))
	press("row-del-2", kb.Enter)
	want("removing data-sheet point 2", "row-del-2")

	// Views: a button that opens another view, and a tab, from below.
	press("view-balance", kb.Enter)
	want("opening Balance with its tab", "view-balance")
	b.js(`(() => { window.scrollTo(0, document.body.scrollHeight); return ""; })()`)
	press("to-line", kb.Enter)
	if !b.jsBool(`document.getElementById("sheet").classList.contains("view-line")`) {
		t.Fatal("Open the Line view did not open it")
	}
	want("Open the Line view (its button gone)", "view-line")
	if y := b.js(`String(window.scrollY)`); y != "0" {
		t.Errorf("the Line view opened %s px down, want its top", y)
	}
	b.js(`(() => { window.scrollTo(0, document.body.scrollHeight); return ""; })()`)
	press("view-pump", kb.Enter)
	want("opening Pump with its tab", "view-pump")
	if y := b.js(`String(window.scrollY)`); y != "0" {
		t.Errorf("the Pump view opened %s px down, want its top", y)
	}
	b.noProblems("keyboard focus")
}
