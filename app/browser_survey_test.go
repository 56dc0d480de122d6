//go:build !wasm

package main

import (
	"encoding/json"
	"fmt"
	"net/http/httptest"
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
	b, srv := tabletTab(t)
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

// TestBrowserSurveyMade pastes a 12-point survey into the Line view of a
// sheet with no pipe yet at 768 × 1024: 11 segments are made and a line
// says so, with "Give segment 1's pipe to the others" disabled until
// segment 1 has a pipe; once its nominal size, schedule and material are
// picked, the button gives them to the other ten, as
// scenario.Draft.GivePipe does natively, and no segment lacks a pipe.
// Then the demo: its exit moves to the survey's last segment.
// Screenshot survey-made-768.
func TestBrowserSurveyMade(t *testing.T) {
	b, srv := tabletTab(t)
	sc, err := scenario.Parse("view=line&q=45L/s&t=18C&z2=211m")
	if err != nil {
		t.Fatal(err)
	}
	var rows strings.Builder
	rows.WriteString("Chainage\tElevation\n")
	for i := 0; i < 12; i++ {
		fmt.Fprintf(&rows, "%d\t%d\n", i*50, 200+i)
	}
	paste := rows.String()
	want := scenario.NewDraft(sc.Clone())
	want.PasteProfile(paste)

	b.navigate(srv.URL + "/?" + sc.Encode())
	b.js(`document.querySelector("details.survey").open = true, "ok"`)
	b.js(`document.getElementById("survey-text").value = ` + jsString(paste) + `, "ok"`)
	if err := clickID(b, "survey-paste"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.querySelectorAll(".seg .seg-del, [id^=seg-del-]").length === 11`, 5*time.Second) {
		t.Fatalf("segments after the paste: %s", b.js(`String(document.querySelectorAll("[id^=seg-del-]").length)`))
	}
	if made := b.text("#survey-text-made"); made != want.SurveyMade || !strings.HasPrefix(made, "Made 11 segments from the survey's 12 points") {
		t.Errorf("made line %q, want %q", made, want.SurveyMade)
	}
	if !b.jsBool(`document.getElementById("survey-pipe").disabled`) {
		t.Error("the pipe button is enabled while segment 1 has no pipe")
	}
	pick := func(id, value string) {
		b.js(fmt.Sprintf(`(() => { const s = document.getElementById(%q); s.value = %q; s.dispatchEvent(new Event("change", {bubbles: true})); return ""; })()`, id, value))
	}
	pick("in-s1-nps", "8")
	if !b.poll(`!!document.getElementById("in-s1-sch")`, 3*time.Second) {
		t.Fatal("no schedule picker for segment 1")
	}
	pick("in-s1-sch", "40")
	pick("in-s1-mat", "steel")
	if !b.poll(`!document.getElementById("survey-pipe").disabled`, 3*time.Second) {
		t.Fatal("the pipe button stays disabled after segment 1's pipe was picked")
	}
	// The status line follows the edits made since the paste.
	if got := b.text("#survey-text-status"); !strings.HasPrefix(got, "10 segments have no pipe yet") {
		t.Errorf("status after segment 1's pipe %q", got)
	}
	b.js(`document.getElementById("survey-pipe").scrollIntoView({block: "center"}), "ok"`)
	b.shot("survey-made-768")
	if err := clickID(b, "survey-pipe"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("s11.nps=8") && location.search.includes("s11.mat=steel")`, 5*time.Second) {
		t.Errorf("link after giving the pipe %q", b.js("location.search"))
	}
	if !b.poll(`document.getElementById("survey-text-status").hidden`, 3*time.Second) {
		t.Errorf("status after giving the pipe %q", b.text("#survey-text-status"))
	}
	if made := b.text("#survey-text-made"); made != "Segment 1's pipe given to 10 segments without one." {
		t.Errorf("made line after the pipe %q", made)
	}
	if !b.poll(`document.getElementById("survey-pipe").hidden`, 3*time.Second) {
		t.Error("the pipe button still shows with every segment piped")
	}
	b.noProblems("giving segment 1's pipe")

	// The demo: the exit leaves segment 2 for the survey's last segment.
	demo := scenario.Demo()
	_ = demo.Set("view", "line")
	b.navigate(srv.URL + "/?" + demo.Encode())
	b.js(`document.querySelector("details.survey").open = true, "ok"`)
	b.js(`document.getElementById("survey-text").value = "0\t212\n8\t214.5\n300\t230\n640\t251", "ok"`)
	if err := clickID(b, "survey-paste"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("s3.fit=exit")`, 5*time.Second) {
		t.Errorf("the exit is not on segment 3: %q", b.js("location.search"))
	}
	if made := b.text("#survey-text-made"); !strings.Contains(made, "The line's end fittings (1 exit) moved from segment 2 to segment 3, the last.") {
		t.Errorf("made line %q", made)
	}
	b.js(`document.getElementById("survey-text-made").scrollIntoView({block: "center"}), "ok"`)
	b.shot("survey-exit-768")
	b.noProblems("pasting onto the demo")
}

// TestBrowserUnitSwitch presses US on the demo's Line view at 768 × 1024
// and reads every box and unit picker of every view: each holds the
// value scenario.Draft's switch writes (the one rule of draft_units.go),
// in the US default unit; the Line view's point and pump lines are in
// feet (the issue: "Pump centreline 214.5 m" beside "Point 1 elevation
// 695.5 ft"). Pressing SI gives back the demo's link. Screenshot
// units-us-line-768.
func TestBrowserUnitSwitch(t *testing.T) {
	b, srv := tabletTab(t)
	demo := scenario.Demo()
	_ = demo.Set("view", "line")
	b.navigate(srv.URL + "/?" + demo.Encode())
	want := scenario.NewDraft(demo.Clone())
	want.Choose("units", "us")
	if err := clickID(b, "units-us"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("units=us") && location.search.includes("z1=695.5ft")`, 5*time.Second) {
		t.Fatalf("link after pressing US %q", b.js("location.search"))
	}
	for _, view := range []string{"line", "balance", "pump", "regime", "convert"} {
		if err := clickID(b, "view-"+view); err != nil {
			t.Fatal(err)
		}
		if !b.poll(`location.search.includes("view=`+view+`")`, 3*time.Second) {
			t.Fatalf("view %s not opened", view)
		}
		boxes := b.js(`JSON.stringify([...document.querySelectorAll("input[type=text][id^=in-]")].filter(e => e.value !== "").map(e => {
			const u = document.getElementById("unit-" + e.id.slice(3)); return [e.id, e.value, u ? u.value : ""]; }))`)
		var got [][3]string
		if err := json.Unmarshal([]byte(boxes), &got); err != nil {
			t.Fatalf("%s: %v: %s", view, err, boxes)
		}
		if len(got) < 3 {
			t.Errorf("%s: only %d boxes with a value: %s", view, len(got), boxes)
		}
		for _, g := range got {
			p := strings.ReplaceAll(strings.TrimPrefix(g[0], "in-"), "-", ".")
			row, _, ok := scenario.Lookup(p)
			if !ok {
				continue // a data-sheet cell, a title
			}
			if row.Kind == scenario.KindList { // the data sheet as text: the list as the link holds it
				if g[1] != want.Typed(p) {
					t.Errorf("%s: list %s shows %q, the switch writes %q", view, p, g[1], want.Typed(p))
				}
				continue
			}
			box, unit := want.Box(p)
			if g[1] != box || (g[2] != "" && g[2] != unit) {
				t.Errorf("%s: box %s shows %q %q, the switch writes %q %q", view, p, g[1], g[2], box, unit)
			}
			if u := scenario.DefaultUnit(p, true); g[2] != "" && g[2] != u {
				t.Errorf("%s: box %s in %q, want the US unit %s", view, p, g[2], u)
			}
		}
		if view == "line" {
			text := b.text(".seglist")
			for _, w := range []string{"elevation 695.5 ft", "centreline 703.74 ft"} {
				if !strings.Contains(text, w) {
					t.Errorf("the Line view's list lacks %q", w)
				}
			}
			if strings.Contains(text, " m ") || strings.Contains(text, "214.5 m") {
				t.Errorf("the Line view's list still shows metres: %q", text)
			}
			b.js(`document.getElementById("segments").scrollIntoView(), "ok"`)
			b.shot("units-us-line-768")
		}
	}
	if err := clickID(b, "units-si"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`location.search.includes("z1=212m") && location.search.includes("q=45L%2Fs") || location.search.includes("q=45L/s")`, 5*time.Second) {
		t.Errorf("link after pressing SI again %q", b.js("location.search"))
	}
	b.noProblems("switching units")
}

// tabletTab opens a tab at a tablet's width (768 × 1024) and serves the
// site for it.
func tabletTab(t *testing.T) (*tab, *httptest.Server) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(768, 1024)); err != nil {
		t.Fatal(err)
	}
	return b, srv
}
