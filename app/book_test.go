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

// savedFile clicks the button sel and waits for the one file the page
// saves into dir under a name matching pattern; its path and bytes.
func savedFile(t *testing.T, b *tab, sel, dir, pattern string) (string, []byte) {
	t.Helper()
	b.js(fmt.Sprintf(`(document.querySelector(%q).click(), "")`, sel))
	// The file can be seen before the browser has written it all (a loaded
	// machine once read it empty): it is read once its size holds still
	// between two looks.
	last := int64(-1)
	for deadline := time.Now().Add(10 * time.Second); time.Now().Before(deadline); time.Sleep(100 * time.Millisecond) {
		if m, _ := filepath.Glob(filepath.Join(dir, pattern)); len(m) == 1 {
			fi, err := os.Stat(m[0])
			if err != nil || fi.Size() == 0 || fi.Size() != last {
				last = -1
				if err == nil {
					last = fi.Size()
				}
				continue
			}
			data, err := os.ReadFile(m[0])
			if err != nil {
				t.Fatal(err)
			}
			return m[0], data
		}
	}
	t.Fatalf("%s saved no file %s", sel, pattern)
	return "", nil
}

// TestSiteBook: sheets are kept on the device and nothing is lost — edit
// sheet A, open a link to B, and A is still in the book with its edit; New
// sheet and Demo keep everything; delete and undo; a sheets file saved from
// the book and added in a fresh profile gives the same sheets; with the
// store blocked the sheet still computes and says it cannot be kept. The
// results table the page saves is -eval's on the saved sheets file.
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
	file, text := savedFile(t, b, "#book-export", dir, "fieldhead-sheets-*.txt")
	lines, bad := scenario.ReadSheets(string(text))
	if len(bad) > 0 || len(lines) != len(before) {
		t.Errorf("the sheets file holds %d sheets (%v bad) for %d kept", len(lines), bad, len(before))
	}
	for _, l := range lines {
		if l.Edited.IsZero() {
			t.Errorf("line %d of the sheets file has no edit time", l.Line)
		}
	}

	// The results table in US units, as the page saves it (the Blob's
	// bytes), is the one -eval writes from the sheets file, byte for byte.
	_, saved := savedFile(t, b, "#book-csv-us", dir, "fieldhead-results-us-*.csv")
	var evalOut, evalErrs strings.Builder
	if err := evalCSV(file, true, &evalOut, &evalErrs); err != nil {
		t.Fatal(err)
	}
	if string(saved) != evalOut.String() || !strings.HasPrefix(string(saved), "\uFEFF") {
		t.Errorf("the page's results table differs from -eval's:\n%q\nwant\n%q", saved, evalOut.String())
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
	if strings.Contains(c.text("main"), "edit time not known") {
		t.Error("a sheet added from the file lost its edit time")
	}
	if err := chromedp.Do(c.ctx, chromedp.EmulateViewport(768, 1024), chromedp.Sleep(300*time.Millisecond)); err != nil {
		t.Fatal(err)
	}
	full, err := chromedp.Run(c.ctx, chromedp.FullScreenshot(100))
	if err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(c.shots, "site-book-768.png"), full, 0o644); err != nil {
		t.Fatal(err)
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
