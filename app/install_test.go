//go:build !wasm

package main

import (
	"net/http/httptest"
	"strings"
	"sync"
	"testing"
	"time"

	"fieldhead/calc/scenario"

	"github.com/chromedp/chromedp"
)

// TestInstallAndTitle checks the pieces of an installed site the page
// owns. The title names the sheet (WCAG 2.1 SC 2.4.2 Page Titled) and
// follows its edits. The install button appears when the browser offers
// installation (a beforeinstallprompt event, Web App Manifest spec,
// "installation process"), opens the browser's prompt, and goes once the
// offer is used or the site installed (the appinstalled event). It sits
// after the cautions, so its coming and going moves no card (content that
// moves under a finger: the layout-shift rule of web practice, common
// practice). Headless
// Chromium offers nothing by itself, so the test sends the two events the
// browser would send, with a prompt that only records that it was shown.
// A first visit logs no "updated" message: nothing was updated.
func TestInstallAndTitle(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	b := newTab(t)
	var mu sync.Mutex
	var logs []string
	go func() {
		for m, err := range chromedp.Console(b.browser) {
			if err != nil {
				return
			}
			mu.Lock()
			logs = append(logs, m.String())
			mu.Unlock()
		}
	}()
	demo := scenario.Demo()
	b.navigate(srv.URL + "/?" + demo.Encode())

	// The title.
	name := strings.TrimSpace(demo.Get("name"))
	if name == "" {
		t.Fatal("the demo has no name to put in the title")
	}
	if got := b.js(`document.title`); got != name+" — Fieldhead" {
		t.Errorf("the title is %q, want the sheet's name first: %q", got, name+" — Fieldhead")
	}
	b.typeInto("#in-name", "Pump house 4")
	if !b.poll(`document.title === "Pump house 4 — Fieldhead"`, 5*time.Second) {
		t.Errorf("after renaming the sheet the title is %q", b.js(`document.title`))
	}

	// The install button.
	const offer = `(() => { const e = new Event("beforeinstallprompt", {cancelable: true});
  e.prompt = () => { window.fieldheadPromptShown = (window.fieldheadPromptShown || 0) + 1; return Promise.resolve(); };
  e.userChoice = Promise.resolve({outcome: "dismissed", platform: ""});
  window.dispatchEvent(e); return ""; })()`
	if b.jsBool(`document.getElementById("install") !== null`) {
		t.Log("the browser offered installation by itself")
	}
	b.js(offer)
	if !b.poll(`document.getElementById("install") !== null`, 5*time.Second) {
		t.Fatal("no install button after the browser offered installation")
	}
	// The offer comes whenever the browser decides: the button's coming
	// and going moves nothing before it (the cautions come first).
	const cardsAt = `[...document.querySelectorAll(".card, #cautions")].map((e) => Math.round(e.getBoundingClientRect().top + scrollY)).join(" ")`
	with := b.js(cardsAt)
	if b.jsBool(`!!(document.getElementById("install").compareDocumentPosition(document.getElementById("cautions")) & Node.DOCUMENT_POSITION_FOLLOWING)`) {
		t.Error("the install button comes before the cautions: its arrival moves what the person reads")
	}
	if err := clickID(b, "install"); err != nil {
		t.Fatal(err)
	}
	if !b.poll(`window.fieldheadPromptShown === 1`, 5*time.Second) {
		t.Error("the install button did not open the browser's prompt")
	}
	if !b.poll(`document.getElementById("install") === null`, 5*time.Second) {
		t.Error("the install button stays after its prompt was used")
	}
	if without := b.js(cardsAt); without != with {
		t.Errorf("the cards and cautions moved when the install button went: at %s with it, %s without", with, without)
	}
	b.js(offer)
	if !b.poll(`document.getElementById("install") !== null`, 5*time.Second) {
		t.Fatal("no install button after a second offer")
	}
	b.js(`(() => { window.dispatchEvent(new Event("appinstalled")); return ""; })()`)
	if !b.poll(`document.getElementById("install") === null`, 5*time.Second) {
		t.Error("the install button stays once the site is installed")
	}

	// A first visit: once the service worker controls the page, nothing
	// may say the site was updated.
	if !b.poll(`!!navigator.serviceWorker && navigator.serviceWorker.controller !== null`, 30*time.Second) {
		t.Fatal("the service worker never took control")
	}
	time.Sleep(time.Second)
	mu.Lock()
	for _, l := range logs {
		if strings.Contains(strings.ToLower(l), "updated") {
			t.Errorf("a first visit logs %q", l)
		}
	}
	mu.Unlock()
	if b.jsBool(`document.getElementById("update") !== null`) {
		t.Error("a first visit offers an update")
	}
	b.noProblems("install and title")
}
