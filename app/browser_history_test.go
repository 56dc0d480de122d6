//go:build !wasm

package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strconv"
	"testing"
	"time"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"

	"github.com/chromedp/chromedp"
)

// TestBrowserPumpTestHistory enters three readings on the demo's Pump view
// (with accuracies, the motor's efficiency and grade 2B), and sees the
// tested curve on the chart and the guarantee verdict the view model gives
// (this checks that the page and the core agree, not the physics); then
// imports three dated sheets of one pump tag (scenario.HistoryDemo) and
// sees the history with its chart and a cost figure. The pump-test demo
// (five readings) shows its tested curve, band, readings, cross and origin
// line. Screenshots at 768 and 390 px: pumptest-chart-<w>.png,
// pumptest-card-<w>.png, pumptest5-{chart,card,verdict}-<w>.png,
// history-<w>.png.
func TestBrowserPumpTestHistory(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	sc := scenario.Demo()
	for _, kv := range [][2]string{{"view", "pump"}, {"etam", "93%"}, {"gcs", "1%"}, {"gss", "200kPa"}, {"gcd", "1%"},
		{"gsd", "1000kPa"}, {"uqm", "2%"}, {"upin", "1%"}, {"uz", "10mm"}, {"grade", "2B"}} {
		_ = sc.Set(kv[0], kv[1])
	}
	want := sc.Clone()
	readings := [][4]string{{"20", "-12", "548", "21.5"}, {"30", "-14", "508", "26"}}
	for i, r := range readings {
		k := string(rune('2' + i))
		for j, f := range []string{"qm", "ps", "pd", "pin"} {
			_ = want.Set(f+k, r[j]+[]string{"L/s", "kPa", "kPa", "kW"}[j])
		}
	}
	res := scenario.Evaluate(scenario.Read(want))
	if res.Guarantee == nil {
		t.Fatalf("the sheet has no guarantee verdict: %v", res.Errors)
	}
	d := scenario.NewDraft(want)
	verdict, _ := present.Build(&d, res).Text("guarantee-level")

	for _, w := range []int{768, 390} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(w), 1024)); err != nil {
			t.Fatal(err)
		}
		b.navigate(srv.URL + "/?" + sc.Encode())
		for i, r := range readings {
			k := string(rune('2' + i))
			if !b.poll(`document.querySelector("#reading-add") !== null`, 5*time.Second) {
				t.Fatal("no button to add a reading")
			}
			b.js(`(document.querySelector("#reading-add").click(), "")`)
			if !b.poll(`document.querySelector("#in-qm`+k+`") !== null`, 5*time.Second) {
				t.Fatalf("no box for reading %s", k)
			}
			for j, f := range []string{"qm", "ps", "pd", "pin"} {
				b.typeInto("#in-"+f+k, r[j])
			}
		}
		quoted, _ := json.Marshal(verdict)
		if !b.poll(`(document.querySelector("#guarantee-level") || {}).textContent === `+string(quoted), 10*time.Second) {
			t.Errorf("%d px: the verdict shows %q, the view model %q", w, b.js(`(document.querySelector("#guarantee-level") || {}).textContent || ""`), verdict)
		}
		if !b.poll(`document.querySelector('#pump-chart svg [data-series="tested"]') !== null && document.querySelectorAll('#pump-chart svg [data-mark="measured"]').length === 3 && document.querySelector('#pump-chart svg [data-series="cross"]') !== null`, 5*time.Second) {
			t.Errorf("%d px: the chart lacks the tested curve, three readings or the cross", w)
		}
		if got := b.js(`String(document.querySelectorAll("#test-table tbody tr").length)`); got != "3" {
			t.Errorf("%d px: the test table has %s rows, want 3", w, got)
		}
		b.js(`(document.querySelector('#pump-chart').scrollIntoView(), "")`)
		b.shot("pumptest-chart-" + strconv.Itoa(w))
		b.js(`(document.querySelector('#test').scrollIntoView(), "")`)
		b.shot("pumptest-card-" + strconv.Itoa(w))
	}

	// The history: three dated sheets of one tag, imported.
	importHistory(t, b, srv.URL)
	if got := b.js(`String(document.querySelectorAll("#history-1-table tbody tr").length)`); got != "3" {
		t.Errorf("the history has %s rows, want the three sheets", got)
	}
	if got := b.text("#history-1-cost-3"); got == "" || got == "—" {
		t.Errorf("the last visit has no cost figure: %q", got)
	}
	for _, w := range []int{768, 390} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(w), 1024)); err != nil {
			t.Fatal(err)
		}
		time.Sleep(300 * time.Millisecond)
		b.js(`(document.querySelector('#history-1').scrollIntoView(), "")`)
		b.shot("history-" + strconv.Itoa(w))
	}

	// The pump-test demo's five readings (opened after the history: a
	// sheet opened is kept in the site book, and this one has the tag): the tested curve, its band's
	// edges, five readings in their boxes, the cross and the origin line.
	five := scenario.PumpTestDemo()
	for _, w := range []int{768, 390} {
		if err := chromedp.Do(b.ctx, chromedp.EmulateViewport(int64(w), 1024)); err != nil {
			t.Fatal(err)
		}
		b.navigate(srv.URL + "/?" + five.Encode())
		if !b.poll(`(() => { const s = document.querySelector('#pump-chart svg'); return !!s && !!s.querySelector('[data-series="tested"]') && s.querySelectorAll('[data-series="tested-band"]').length === 2 && s.querySelectorAll('[data-mark="measured"]').length === 5 && !!s.querySelector('[data-series="cross"]') && !!s.querySelector('[data-series="origin-line"]'); })()`, 10*time.Second) {
			t.Errorf("%d px: the five-reading test's chart lacks the tested curve, its band, a reading, the cross or the origin line", w)
		}
		if got := b.js(`String(document.querySelectorAll("#test-table tbody tr").length)`); got != "5" {
			t.Errorf("%d px: the test table has %s rows, want 5", w, got)
		}
		b.js(`(document.querySelector('#pump-chart').scrollIntoView(), "")`)
		b.shot("pumptest5-chart-" + strconv.Itoa(w))
		b.js(`(document.querySelector('#test-table').scrollIntoView(), "")`)
		b.shot("pumptest5-card-" + strconv.Itoa(w))
		b.js(`(document.querySelector('#guarantee-level').scrollIntoView(), "")`)
		b.shot("pumptest5-verdict-" + strconv.Itoa(w))
	}
}

// importHistory opens the site book at base and imports the three dated
// sheets of one pump tag of scenario.HistoryDemo, then waits for their
// history's chart and table (#history-1).
func importHistory(t *testing.T, b *tab, base string) {
	t.Helper()
	file := filepath.Join(t.TempDir(), "history.txt")
	if err := os.WriteFile(file, []byte(scenario.WriteKept("history", scenario.HistoryDemo())), 0o644); err != nil {
		t.Fatal(err)
	}
	b.navigate(base + "/?view=book")
	if !b.poll(`document.querySelector("#book-import") !== null`, 10*time.Second) {
		t.Fatal("no import in the site book")
	}
	// The book may redraw its picker just after it appears (the node
	// found is then gone): a few tries.
	var err error
	for try := 0; try < 5; try++ {
		if err = chromedp.Do(b.ctx, chromedp.SetUploadFiles(chromedp.CSS("#book-import"), []string{file})); err == nil {
			break
		}
		time.Sleep(300 * time.Millisecond)
	}
	if err != nil {
		t.Fatal(err)
	}
	if !b.poll(`document.querySelector("#history-1 svg") !== null && document.querySelectorAll("#history-1-table tbody tr").length >= 3`, 10*time.Second) {
		t.Fatalf("no history of three sheets: %s", b.js(`(document.querySelector("#history-1") || {}).textContent || "none"`))
	}
	// The page shows the imported sheets before the store has written
	// them (IndexedDB is asynchronous); a navigation before then would
	// lose them, so wait for the store to hold them.
	b.js(`(() => { window.__kept = -1; const r = indexedDB.open("fieldhead"); r.onsuccess = () => {
  const poll = () => { const g = r.result.transaction("sheets", "readonly").objectStore("sheets").getAll();
    g.onsuccess = () => { window.__kept = g.result.filter(x => String(x.link).includes("tag=")).length; if (window.__kept < 3) setTimeout(poll, 100); }; };
  poll(); }; return ""; })()`)
	if !b.poll(`window.__kept >= 3`, 10*time.Second) {
		t.Fatalf("the store holds %s sheets with a pump tag, not the three imported", b.js(`String(window.__kept)`))
	}
}
