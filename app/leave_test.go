//go:build !wasm

package main

import (
	"testing"
	"time"

	"github.com/chromedp/cdproto/domdebugger"
	"github.com/chromedp/cdproto/runtime"
	"github.com/chromedp/chromedp"
)

// TestLeaveWrites types into a box and leaves the page at once, before
// the pause the save waits for (saveDelay): the edit is kept all the same,
// written as the page is left, and the sheet opened again shows it. The
// page listens for being left only while a save is put off (leaveWatch):
// the listeners are counted with the DevTools protocol's
// DOMDebugger.getEventListeners.
func TestLeaveWrites(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	origin := newSiteServer(t, site).URL
	b.navigate(origin + "/")
	listening := func() int {
		t.Helper()
		n := 0
		for _, target := range []string{"window", "document"} {
			obj, err := chromedp.Call(b.ctx, runtime.Evaluate, runtime.EvaluateParams{Expression: target})
			if err != nil {
				t.Fatal(err)
			}
			ls, err := chromedp.Call(b.ctx, domdebugger.GetEventListeners, domdebugger.GetEventListenersParams{ObjectID: obj.Result.ObjectID})
			if err != nil {
				t.Fatal(err)
			}
			for _, l := range ls.Listeners {
				if l.Type == "pagehide" || l.Type == "visibilitychange" {
					n++
				}
			}
		}
		return n
	}
	time.Sleep(1500 * time.Millisecond) // the sheet as opened is kept, a pause after it is drawn
	b.poll("!window.fieldheadPending", 5*time.Second)
	if n := listening(); n != 0 {
		t.Errorf("with nothing to write, the page listens for being left (%d listeners)", n)
	}
	before := b.js(`document.getElementById("in-q").value`)
	typed := before + "7"
	b.js(`(() => { const e = document.getElementById("in-q"); e.focus(); e.setSelectionRange(e.value.length, e.value.length); return ""; })()`)
	if err := chromedp.Do(b.ctx, chromedp.SendKeys(chromedp.ID("in-q"), "7")); err != nil {
		t.Fatal(err)
	}
	if !b.jsBool("window.fieldheadPending === true") {
		t.Fatal("no save put off after typing")
	}
	if n := listening(); n != 2 {
		t.Errorf("a save put off: the page has %d listeners for being left, want 2 (pagehide, visibilitychange)", n)
	}
	if err := chromedp.Do(b.ctx, chromedp.Navigate("about:blank")); err != nil {
		t.Fatal(err)
	}
	b.navigate(origin + "/")
	if got := b.js(`document.getElementById("in-q").value`); got != typed {
		t.Errorf("left at once after typing: the sheet opened again shows flow %q, want %q (was %q)", got, typed, before)
	}
}
