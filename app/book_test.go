//go:build !wasm

package main

import (
	"fmt"
	"net/http/httptest"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/cdproto/browser"
	"github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"

	"fieldhead/calc/scenario"
)

// keptTitles lists the titles in the site book, top to bottom.
func keptTitles(b *tab) []string {
	b.t.Helper()
	s := b.js(`[...document.querySelectorAll("section.kept h2")].map(e => e.textContent.trim()).join("\n")`)
	if s == "" {
		return nil
	}
	return strings.Split(s, "\n")
}

// openBook shows the site book and waits for the list (the store is
// read asynchronously).
func openBook(t *testing.T, b *tab, atLeast int) []string {
	t.Helper()
	b.js(`(document.querySelector("#view-book").click(), "")`)
	if !b.poll(fmt.Sprintf(`document.querySelectorAll("section.kept").length >= %d`, atLeast), 10*time.Second) {
		t.Fatalf("the site book shows %v, want at least %d sheets", keptTitles(b), atLeast)
	}
	return keptTitles(b)
}

func hasString(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

// TestSiteBook: sheets are kept on the device and nothing is lost — edit
// sheet A, open a link to B, and A is still in the book with its edit; New
// sheet and Demo keep everything; delete and undo; a sheets file saved from
// the book and added in a fresh profile gives the same sheets; with the
// store blocked the sheet still computes and says it cannot be kept.
// (This project's rules for kept sheets; the sheets file format is
// scenario.WriteSheets'.)
func TestSiteBook(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)

	a := scenario.Demo()
	_ = a.Set("name", "Sheet A")
	b.navigate(srv.URL + "/?" + a.Sign())
	b.typeInto("#in-z2", "252")
	if !b.poll(`location.search.includes("z2=252m")`, 5*time.Second) {
		t.Fatal("the edit did not reach the link")
	}
	tb := scenario.TurbineDemo()
	_ = tb.Set("name", "Sheet B")
	b.navigate(srv.URL + "/?" + tb.Sign())
	titles := openBook(t, b, 2)
	if !hasString(titles, "Sheet A") || !hasString(titles, "Sheet B") || titles[0] != "Sheet B" {
		t.Errorf("the book holds %v, want Sheet B then Sheet A", titles)
	}
	// A kept with its edit: open it and read the box.
	id := b.js(`[...document.querySelectorAll("section.kept")].find(e => e.querySelector("h2").textContent.trim() == "Sheet A").id.slice(5)`)
	b.js(fmt.Sprintf(`(document.querySelector("#book-open-%s").click(), "")`, id))
	b.js(`(document.querySelector("#view-balance").click(), "")`)
	if !b.poll(`document.querySelector("#in-z2") && document.querySelector("#in-z2").value == "252"`, 5*time.Second) {
		t.Errorf("Sheet A reopened shows z2 %q, want its edit 252", b.value("#in-z2"))
	}

	b.js(`(document.querySelector("#blank").click(), "")`)
	b.js(`(document.querySelector("#demo").click(), "")`)
	time.Sleep(500 * time.Millisecond)
	titles = openBook(t, b, 3)
	if !hasString(titles, "Sheet A") || !hasString(titles, "Sheet B") || !hasString(titles, scenario.Demo().Get("name")) {
		t.Errorf("after New sheet and Demo the book holds %v", titles)
	}

	// Delete B, then undo.
	idB := b.js(`[...document.querySelectorAll("section.kept")].find(e => e.querySelector("h2").textContent.trim() == "Sheet B").id.slice(5)`)
	b.js(fmt.Sprintf(`(document.querySelector("#book-del-%s").click(), "")`, idB))
	time.Sleep(300 * time.Millisecond)
	if hasString(keptTitles(b), "Sheet B") || !b.jsBool(`document.querySelector("#book-undo") !== null`) {
		t.Errorf("after deleting B: %v, undo offered %v", keptTitles(b), b.jsBool(`document.querySelector("#book-undo") !== null`))
	}
	b.js(`(document.querySelector("#book-undo").click(), "")`)
	time.Sleep(300 * time.Millisecond)
	if !hasString(keptTitles(b), "Sheet B") {
		t.Errorf("after undo: %v", keptTitles(b))
	}
	before := keptTitles(b)
	b.shot("site-book")

	// Save the book as a sheets file, then add it in a fresh profile.
	dir := t.TempDir()
	if _, err := chromedp.Call(b.ctx, browser.SetDownloadBehavior, browser.SetDownloadBehaviorParams{
		Behavior: browser.SetDownloadBehaviorBehaviorAllow, DownloadPath: dir}); err != nil {
		t.Fatal(err)
	}
	b.js(`(document.querySelector("#book-export").click(), "")`)
	var file string
	for deadline := time.Now().Add(10 * time.Second); time.Now().Before(deadline) && file == ""; time.Sleep(100 * time.Millisecond) {
		m, _ := filepath.Glob(filepath.Join(dir, "fieldhead-sheets-*.txt"))
		if len(m) == 1 {
			file = m[0]
		}
	}
	if file == "" {
		t.Fatal("no sheets file was saved")
	}
	text, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	lines, bad := scenario.ReadSheets(string(text))
	if len(bad) > 0 || len(lines) != len(before) {
		t.Errorf("the sheets file holds %d sheets (%v bad) for %d kept", len(lines), bad, len(before))
	}

	c := newTab(t)
	blank := scenario.Scenario{}
	_ = blank.Set("view", "book")
	c.navigate(srv.URL + "/?" + blank.Encode())
	if err := chromedp.Do(c.ctx, chromedp.SetUploadFiles(chromedp.CSS("#book-import"), []string{file})); err != nil {
		t.Fatal(err)
	}
	if !c.poll(fmt.Sprintf(`document.querySelectorAll("section.kept").length >= %d`, len(before)), 10*time.Second) {
		t.Fatalf("after adding the file the fresh book holds %v", keptTitles(c))
	}
	for _, title := range before {
		if !hasString(keptTitles(c), title) {
			t.Errorf("the fresh book lacks %q: %v", title, keptTitles(c))
		}
	}
	if !strings.Contains(c.text("#book-notice"), "Added") {
		t.Errorf("no notice of what was added: %q", c.text("#book-notice"))
	}

	// The store blocked: the sheet computes and says it cannot be kept.
	d := newTab(t)
	if _, err := chromedp.Call(d.ctx, page.AddScriptToEvaluateOnNewDocument,
		page.AddScriptToEvaluateOnNewDocumentParams{Source: `Object.defineProperty(window, "indexedDB", {get() { return undefined; }});`}); err != nil {
		t.Fatal(err)
	}
	d.navigate(srv.URL + "/?" + scenario.Demo().Sign())
	if got := d.text("#answer-value"); got == "" || got == "—" {
		t.Errorf("with the store blocked the demo shows %q", got)
	}
	if !d.poll(`document.querySelector("#store-problem") !== null`, 5*time.Second) {
		t.Error("with the store blocked no notice says sheets cannot be kept")
	}
	b.noProblems("the site book")
}
