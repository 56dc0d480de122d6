//go:build !wasm

package main

import (
	"encoding/json"
	"net/http/httptest"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
	"github.com/chromedp/chromedp/kb"
)

// smallFormsJS lists the page's boxes and pickers that are in no form, or
// in a form of more than two controls (a box and its unit), and counts
// them all.
const smallFormsJS = `(() => {
  const bad = [];
  let n = 0;
  for (const e of document.querySelectorAll("input, select, textarea")) {
    n++;
    const name = e.localName + (e.id ? "#" + e.id : "");
    if (!e.form) bad.push(name + " in no form");
    else if (e.form.elements.length > 2) bad.push(name + " in a form of " + e.form.elements.length);
  }
  return JSON.stringify({n, bad});
})()`

// TestControlsInSmallForms: every box and picker of every view of both
// demos and of the pump-test demo is in a form of its own (with its unit's
// picker at most). Chromium's autofill (components/autofill, its form
// tracker) reads, on each change of a control, the control's whole form,
// or every control outside a form when it is in none: 70-odd on a view,
// 11.5 ms of the main thread per key at 4× CPU (make bench -edits-only
// -trace, its FormControlDidChange tasks), 1.8 ms with a form per field.
// Enter in a box then submits its form, whose method (dialog) does
// nothing outside a dialog: the page stays as it is.
func TestControlsInSmallForms(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	for _, dv := range append(demoViews(), pumpTestViews()...) {
		b.navigate(srv.URL + "/?" + dv.link)
		var got struct {
			N   int
			Bad []string
		}
		if err := json.Unmarshal([]byte(b.js(smallFormsJS)), &got); err != nil {
			t.Fatal(err)
		}
		if got.N == 0 {
			t.Errorf("%s, %s view: no box or picker found", dv.demo, dv.view.Key)
		}
		for _, s := range got.Bad {
			t.Errorf("%s, %s view: %s", dv.demo, dv.view.Key, s)
		}
	}

	// Enter in the flow box: no navigation, no reload, the box as typed.
	dv := demoViews()[0]
	b.navigate(srv.URL + "/?" + dv.link)
	before := b.js("location.href")
	b.js(`window.fieldheadStayed = true; document.getElementById("in-q").focus(); ""`)
	if err := chromedp.Do(b.ctx, chromedp.KeyEvent(kb.Enter)); err != nil {
		t.Fatal(err)
	}
	time.Sleep(500 * time.Millisecond) // a submission would navigate at once
	if !b.jsBool("window.fieldheadStayed === true") {
		t.Error("Enter in the flow box reloaded the page")
	}
	if after := b.js("location.href"); after != before {
		t.Errorf("Enter in the flow box went from %s to %s", before, after)
	}
	if got, want := b.js(`document.getElementById("in-q").value`), "45"; got != want {
		t.Errorf("after Enter the flow box holds %q, want %q", got, want)
	}
}
