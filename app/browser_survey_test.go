//go:build !wasm

package main

import (
	"strings"
	"testing"
	"time"

	"fieldhead/calc/scenario"

	"github.com/chromedp/chromedp"
)

// TestBrowserSurvey pastes a survey table with one bad row into the Line
// view of the demo at a tablet's width (768 × 1024): the good rows become
// the segments (their slope lengths, as scenario.Draft.PasteProfile makes
// them natively), the bad row is named and the pasted text stays in the
// box; a clean paste then empties it. Screenshots at 768 and 390 px.
func TestBrowserSurvey(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(768, 1024)); err != nil {
		t.Fatal(err)
	}
	demo := scenario.Demo()
	_ = demo.Set("view", "line")
	b.navigate(srv.URL + "/?" + demo.Encode())
	paste := "Chainage\tElevation\n0\t212\n8\t214,5\nx\t220\n640\t251\n"
	want := scenario.NewDraft(demo)
	want.PasteProfile(paste)
	b.js(`document.querySelector("details.survey").open = true, "ok"`)
	b.js(`document.getElementById("survey-text").value = ` + jsString(paste) + `, "ok"`)
	if err := clickID(b, "survey-paste"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("s2.l=`+want.Scen.Get("s2.l")+`")`, 5*time.Second) {
		t.Errorf("link after the paste %q, want s2.l=%s", b.js("location.search"), want.Scen.Get("s2.l"))
	}
	if notes := b.text(".survey-notes"); !strings.Contains(notes, `line 4: the chainage "x" is not a number`) {
		t.Errorf("notes %q", notes)
	}
	if v := b.js(`document.getElementById("survey-text").value`); v != paste {
		t.Errorf("the pasted text is not kept: %q", v)
	}
	b.js(`document.getElementById("survey-text").scrollIntoView(), "ok"`)
	b.shot("survey-768")
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(390, 844)); err != nil {
		t.Fatal(err)
	}
	b.js(`document.getElementById("survey-text").scrollIntoView(), "ok"`)
	b.shot("survey-390")
	b.js(`document.getElementById("survey-text").value = "0;212\n640;251", "ok"`)
	if err := clickID(b, "survey-paste"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.getElementById("survey-text").value === "" && location.search.includes("s1.l=641.1")`, 5*time.Second) {
		t.Errorf("a clean paste: box %q, link %q", b.js(`document.getElementById("survey-text").value`), b.js("location.search"))
	}
	b.noProblems("pasting a survey")
}

// jsString quotes s as a JavaScript string literal.
func jsString(s string) string {
	r := strings.NewReplacer(`\`, `\\`, `"`, `\"`, "\n", `\n`, "\t", `\t`)
	return `"` + r.Replace(s) + `"`
}
