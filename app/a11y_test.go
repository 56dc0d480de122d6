//go:build !wasm

package main

import (
	"fmt"
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario"

	"github.com/chromedp/chromedp"
	"github.com/chromedp/chromedp/kb"
)

// unlabelledJS lists the form controls without an accessible name: no
// <label> with text, no aria-label, no aria-labelledby to an element with
// text; and the buttons and summaries with neither text nor aria-label.
// (WCAG 2.1 SC 1.3.1 Info and Relationships, 3.3.2 Labels or Instructions,
// 4.1.2 Name, Role, Value.)
const unlabelledJS = `(() => {
  const named = (e) => {
    if (e.labels && [...e.labels].some((l) => l.textContent.trim() !== "")) return true;
    if ((e.getAttribute("aria-label") || "").trim() !== "") return true;
    return (e.getAttribute("aria-labelledby") || "").split(/\s+/).filter(Boolean)
      .some((id) => { const l = document.getElementById(id); return l && l.textContent.trim() !== ""; });
  };
  const bad = [];
  // An element under the hidden attribute is not exposed at all: it needs no name.
  for (const e of document.querySelectorAll("input, select, textarea")) {
    if (e.type !== "hidden" && !e.closest("[hidden]") && !named(e)) bad.push(e.tagName.toLowerCase() + "#" + e.id);
  }
  for (const e of document.querySelectorAll("button, summary, a[href]")) {
    if (!e.closest("[hidden]") && e.textContent.trim() === "" && (e.getAttribute("aria-label") || "").trim() === "") bad.push(e.tagName.toLowerCase() + "#" + e.id);
  }
  return bad;
})()`

// focusablesJS marks and counts the controls a keyboard must reach: every
// visible enabled control that takes the focus in document order.
const focusablesJS = `(() => {
  const all = [...document.querySelectorAll('a[href], button, input, select, textarea, summary, [tabindex]')]
    .filter((e) => !e.disabled && e.type !== "hidden" && e.tabIndex >= 0 && e.getClientRects().length > 0 &&
      getComputedStyle(e).visibility !== "hidden" &&
      !(e.closest("details:not([open])") && e.tagName !== "SUMMARY")); // a closed <details> hides its content
  window.fieldheadFocusables = all;
  window.fieldheadReached = new Set();
  window.fieldheadFocusProblems = [];
  return all.length;
})()`

// recordFocusJS records the element the keyboard is on, and whether it
// shows that it has the focus (:focus-visible with an outline of at least
// 2 CSS px; WCAG 2.1 SC 2.4.7 Focus Visible), whole: the outline's box
// (the element's border box grown by outline-offset and outline-width)
// must lie inside the padding box of every ancestor that clips what
// passes it (overflow other than visible, or paint containment), or part
// of the ring is cut away — on a two-way switch, all of it but a sliver.
const recordFocusJS = `(() => {
  const e = document.activeElement;
  if (!e || e === document.body) return "";
  window.fieldheadReached.add(e);
  const cs = getComputedStyle(e);
  const shown = e.matches(":focus-visible") && cs.outlineStyle !== "none" && parseFloat(cs.outlineWidth) >= 2;
  const named = (el) => el.tagName.toLowerCase() + (el.id ? "#" + el.id : "") + (el.className ? "." + String(el.className).split(" ")[0] : "");
  const name = named(e);
  if (!shown) window.fieldheadFocusProblems.push(name + " (outline " + cs.outlineStyle + " " + cs.outlineWidth + ")");
  const d = (parseFloat(cs.outlineWidth) || 0) + (parseFloat(cs.outlineOffset) || 0);
  const r = e.getBoundingClientRect();
  for (let a = e.parentElement; shown && a && a !== document.documentElement; a = a.parentElement) {
    const s = getComputedStyle(a);
    if (s.overflowX === "visible" && s.overflowY === "visible" && !/paint|content|strict/.test(s.contain)) continue;
    const q = a.getBoundingClientRect();
    const cut = [r.left - d < q.left + parseFloat(s.borderLeftWidth) - 0.5 && "left", r.top - d < q.top + parseFloat(s.borderTopWidth) - 0.5 && "top",
      r.right + d > q.right - parseFloat(s.borderRightWidth) + 0.5 && "right", r.bottom + d > q.bottom - parseFloat(s.borderBottomWidth) + 0.5 && "bottom"].filter(Boolean);
    if (cut.length > 0) {
      window.fieldheadFocusProblems.push(name + " (ring cut at its " + cut.join(", ") + " by " + named(a) + ", overflow " + s.overflowX + "/" + s.overflowY + ", contain " + s.contain + ")");
      break;
    }
  }
  return name;
})()`

// missedJS lists the controls the Tab key never reached.
const missedJS = `window.fieldheadFocusables.filter((e) => !window.fieldheadReached.has(e))
  .map((e) => e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + " " + (e.textContent || e.value || "").trim().slice(0, 30))`

// tabThrough walks the page with the Tab key from wherever the focus is
// and reports, under where, each control it never reached and each stop
// whose focus is not visible whole (recordFocusJS). It returns the number
// of controls.
func tabThrough(t *testing.T, b *tab, where string) int {
	t.Helper()
	n := b.js(`String(` + focusablesJS + `)`)
	var count int
	fmt.Sscan(n, &count)
	// Round the page twice at most (the walk starts wherever the last
	// click left the focus, and wraps at the end).
	for i := 0; i < 2*count+6; i++ {
		if err := chromedp.Do(b.ctx, chromedp.KeyEvent(kb.Tab)); err != nil {
			t.Fatal(err)
		}
		b.js(recordFocusJS)
		if b.jsBool(`window.fieldheadFocusables.every((e) => window.fieldheadReached.has(e))`) {
			break
		}
	}
	missed, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](missedJS))
	if err != nil {
		t.Fatal(err)
	}
	if len(missed) > 0 {
		t.Errorf("%s: the Tab key never reached %d of %d controls: %s", where, len(missed), count, strings.Join(missed, "; "))
	}
	problems, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](`window.fieldheadFocusProblems`))
	if err != nil {
		t.Fatal(err)
	}
	if len(problems) > 0 {
		t.Errorf("%s: focus not visible (whole) on %d of %d controls: %s", where, len(problems), count, strings.Join(problems, "; "))
	}
	return count
}

// TestFocusRingWhole: on the Balance and Line views of the demo, on a
// tablet (1024 px) and the narrowest phone (320 px, where the solve-for
// grid has two columns), every control the Tab key reaches shows its focus
// ring whole, cut by no box that clips its content (WCAG 2.1 SC 2.4.7
// Focus Visible; recordFocusJS). The check itself is checked: a switch
// whose frame clips again is reported.
func TestFocusRingWhole(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	for _, w := range []int64{1024, 320} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(w, 740, chromedp.EmulatePortrait, chromedp.EmulateMobile, chromedp.EmulateTouch)); err != nil {
			t.Fatal(err)
		}
		for _, view := range []string{"line", "balance"} {
			sc := scenario.Demo()
			if err := sc.Set("view", view); err != nil {
				t.Fatal(err)
			}
			b.navigate(srv.URL + "/?" + sc.Encode())
			where := fmt.Sprintf("%s view, %d px", view, w)
			count := tabThrough(t, b, where)
			if count < 20 {
				t.Errorf("%s: only %d controls to walk: the page is not the sheet", where, count)
			}
			t.Logf("%s: %d controls, each ring checked whole", where, count)
		}
	}
	// The check finds a cut ring: the solve-for grid's frame clipping again (Balance, 320 px).
	b.js(`(() => { const g = document.querySelector(".solve-grid"); if (g) g.style.overflow = "hidden"; return ""; })()`)
	if !b.jsBool(`!!document.querySelector(".solve-grid .seg")`) {
		t.Fatal("no solve-for grid on the Balance view to check the check with")
	}
	b.js(`String(` + focusablesJS + `)`)
	b.js(`document.querySelector(".solve-grid .seg:not(.on)").focus(); ""`)
	b.js(recordFocusJS)
	if got := b.js(`window.fieldheadFocusProblems.join("; ")`); !strings.Contains(got, "ring cut") {
		t.Errorf("a ring cut by the solve-for grid's frame was not reported (%q)", got)
	}
}

// TestAccessibility checks every view the page offers, with every either/or
// switch on each side: every input and picker has a label; the Tab key
// reaches every control in turn and each shows a visible focus; and the
// views, switches and pickers work from the keyboard alone, keeping the
// focus where it was. (WCAG 2.1: SC 1.3.1, 2.1.1 Keyboard, 2.4.3 Focus
// Order, 2.4.7 Focus Visible, 3.3.2, 4.1.2.)
func TestAccessibility(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	b.navigate(srv.URL + "/?" + scenario.Demo().Encode())

	tabs, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](`[...document.querySelectorAll(".tabs .tab")].map((e) => e.id)`))
	if err != nil || len(tabs) == 0 {
		t.Fatalf("no view tabs: %v", err)
	}
	labels := func(where string) {
		t.Helper()
		bad, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](unlabelledJS))
		if err != nil {
			t.Fatal(err)
		}
		if len(bad) > 0 {
			t.Errorf("%s: controls without a label or name: %s", where, strings.Join(bad, ", "))
		}
	}
	for _, view := range tabs {
		if err := clickID(b, view); err != nil {
			t.Fatal(err)
		}
		time.Sleep(200 * time.Millisecond)
		labels(view)
		// Each either/or switch to its other side, and back.
		sides, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](`[...document.querySelectorAll('.switch .seg:not(.on)')].map((e) => e.id)`))
		if err != nil {
			t.Fatal(err)
		}
		for _, id := range sides {
			on, _ := chromedp.Run(b.ctx, chromedp.Evaluate[string](fmt.Sprintf(`(() => { const e = document.getElementById(%q); const o = e && e.parentElement.querySelector(".seg.on"); return o ? o.id : ""; })()`, id)))
			if b.jsBool(fmt.Sprintf(`document.getElementById(%q) === null`, id)) || on == "" {
				continue
			}
			if err := clickID(b, id); err != nil {
				t.Fatal(err)
			}
			time.Sleep(100 * time.Millisecond)
			labels(view + " with " + id)
			if err := clickID(b, on); err != nil {
				t.Fatal(err)
			}
			time.Sleep(100 * time.Millisecond)
		}
		time.Sleep(200 * time.Millisecond) // the last switch's drawing is done

		count := tabThrough(t, b, view)
		t.Logf("%s: %d controls checked for a label, a Tab stop and a visible focus", view, count)
	}
	if err := clickID(b, "view-balance"); err != nil {
		t.Fatal(err)
	}
	time.Sleep(200 * time.Millisecond)

	// Operating by keyboard: Enter and Space press buttons, arrows change a
	// picker, and the focus stays on the control that was used.
	press := func(id, keys string) {
		t.Helper()
		b.js(fmt.Sprintf(`document.getElementById(%q).focus(); ""`, id))
		if err := chromedp.Do(b.ctx, chromedp.KeyEvent(keys)); err != nil {
			t.Fatal(err)
		}
		time.Sleep(200 * time.Millisecond)
		if got := b.js(`document.activeElement ? document.activeElement.id : ""`); got != id {
			t.Errorf("after pressing %q on #%s the focus is on %q: a keyboard user loses their place", keys, id, got)
		}
	}
	press("units-us", "\r")
	if !b.jsBool(`document.getElementById("units-us").getAttribute("aria-pressed") === "true"`) {
		t.Error("Enter on the US units button did not switch the units")
	}
	press("units-si", " ")
	if !b.jsBool(`document.getElementById("units-si").getAttribute("aria-pressed") === "true"`) {
		t.Error("Space on the SI units button did not switch the units")
	}
	press("view-convert", "\r")
	b.poll("!window.fieldheadPending", 5*time.Second) // the link is written once edits pause
	if !b.jsBool(`location.search.includes("view=convert")`) {
		t.Error("Enter on the Convert tab did not open it")
	}
	press("view-balance", " ")
	before := b.value("#unit-z2")
	press("unit-z2", kb.ArrowDown)
	if after := b.value("#unit-z2"); after == before {
		t.Errorf("the down arrow on the unit picker of z2 did not change it (still %q)", after)
	}
	press("unit-z2", kb.ArrowUp)
	if after := b.value("#unit-z2"); after != before {
		t.Errorf("the up arrow did not bring the unit back: %q, want %q", after, before)
	}
	b.noProblems("keyboard and labels")
}
