//go:build !wasm

package main

import (
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/chromedp/cdproto/emulation"
	"github.com/chromedp/chromedp"
)

// TestSitePolicy reads the generated site: the Content-Security-Policy is
// the first element after the character set of every page and allows only
// the page's own origin plus WebAssembly compilation; no page or stylesheet
// refers to another origin, and there is no inline script, style attribute
// or event-handler attribute for the policy to have to allow. (Source for
// the rules: the CSP Level 3 specification, W3C, on <meta http-equiv>
// delivery and on 'wasm-unsafe-eval'; the rest is this project's policy.)
func TestSitePolicy(t *testing.T) {
	site := testSite(t)
	tokens := strings.Fields(contentSecurityPolicy)
	for _, tok := range tokens {
		switch strings.TrimSuffix(tok, ";") {
		case "'unsafe-inline'", "'unsafe-eval'", "'unsafe-hashes'", "*", "http:", "https:", "data:", "blob:":
			t.Errorf("the policy allows %s", tok)
		}
	}
	for _, dir := range []string{"default-src 'self'", "script-src 'self' 'wasm-unsafe-eval'", "style-src 'self'",
		"connect-src 'self'", "img-src 'self'", "font-src 'self'", "object-src 'none'"} {
		if !strings.Contains(contentSecurityPolicy, dir+";") && !strings.HasSuffix(contentSecurityPolicy, dir) {
			t.Errorf("the policy lacks %q", dir)
		}
	}

	var pages []string
	err := filepath.Walk(site, func(path string, info os.FileInfo, err error) error {
		if err == nil && strings.HasSuffix(path, ".html") {
			pages = append(pages, path)
		}
		return err
	})
	if err != nil || len(pages) == 0 {
		t.Fatalf("no pages in %s: %v", site, err)
	}
	foreignRef := regexp.MustCompile(`(?i)(src|href)="(//|[a-z][a-z0-9+.-]*:)`)
	inlineScript := regexp.MustCompile(`(?is)<script(?:\s[^>]*)?>\s*[^<\s]`)
	handlerAttr := regexp.MustCompile(`(?i)<[a-z][^>]*\son[a-z]+=`)
	styleAttr := regexp.MustCompile(`(?i)<[a-z][^>]*\sstyle=`)
	for _, p := range pages {
		b, err := os.ReadFile(p)
		if err != nil {
			t.Fatal(err)
		}
		html := string(b)
		head := `<meta charset="UTF-8">` + "\n    " + cspMeta
		if !strings.Contains(html, head) {
			t.Errorf("%s: the policy is not the first element after <meta charset>", p)
		}
		if strings.Count(html, "Content-Security-Policy") != 1 {
			t.Errorf("%s: want exactly one policy", p)
		}
		for _, m := range foreignRef.FindAllString(html, -1) {
			// og:url-style metadata is not a fetch; only src/href load.
			t.Errorf("%s: a reference to another origin or scheme: %s", p, m)
		}
		if m := inlineScript.FindString(html); m != "" {
			t.Errorf("%s: an inline script: %.60s", p, m)
		}
		if m := handlerAttr.FindString(html); m != "" {
			t.Errorf("%s: an event-handler attribute: %.60s", p, m)
		}
		if m := styleAttr.FindString(html); m != "" {
			t.Errorf("%s: a style attribute: %.60s", p, m)
		}
	}
	for _, css := range []string{siteAsset(t, site, "app.css"), siteAsset(t, site, "web/fieldhead.css")} {
		b, err := os.ReadFile(css)
		if err != nil {
			t.Fatal(err)
		}
		if s := strings.ToLower(string(b)); strings.Contains(s, "@import") || strings.Contains(s, "url(") {
			t.Errorf("%s loads something (@import or url()): keep the stylesheets self-contained", css)
		}
	}
	// The service worker caches only the site's own files.
	w, err := os.ReadFile(filepath.Join(site, "app-worker.js"))
	if err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile(`const resourcesToCache = (\[.*?\]);`).FindSubmatch(w)
	if m == nil {
		t.Fatal("app-worker.js: no resourcesToCache")
	}
	var cached []string
	if err := json.Unmarshal(m[1], &cached); err != nil {
		t.Fatal(err)
	}
	for _, u := range cached {
		if !strings.HasPrefix(u, "/") || strings.HasPrefix(u, "//") {
			t.Errorf("the worker caches %q, not a path of the site", u)
		}
	}
}

// TestSecurity opens the page in Chromium with markup and script in the
// sheet title, goes through every view and the print layout, and checks:
// the markup is shown as text and never runs; the policy is in force (an
// injected inline handler, style attribute and foreign image are refused,
// as the CSP Level 3 specification, W3C, says a policy without
// 'unsafe-inline' and with img-src 'self' must); the page never requests
// anything from another origin; and a link over the size limit leaves the
// saved sheet alone (this project's rule for bad links). The service
// worker's own fetches are its resourcesToCache, checked by TestSitePolicy.
func TestSecurity(t *testing.T) {
	site := testSite(t)
	b := newTab(t)
	srv := newSiteServer(t, site)
	origin := srv.URL

	// The attack: a share link whose title is markup with script.
	const title = `<img src=x onerror="window.fieldheadInjected=1"><script>window.fieldheadInjected=2</script><b>bold?</b>`
	sc := scenario.Demo()
	if err := sc.Set("name", title); err != nil {
		t.Fatal(err)
	}
	want := scenario.Evaluate(scenario.Read(sc))
	b.navigate(origin + "/?" + sc.Encode())
	if want.Balance != nil {
		if got, w := b.text("#answer-value"), scenario.Show(want.Balance.Value, calc.Length, want.US); got != w {
			t.Errorf("with markup in the title the answer is %q, want %q", got, w)
		}
	}
	if got := b.value("#in-name"); got != title {
		t.Errorf("the title box shows %q, want the markup as typed %q", got, title)
	}
	time.Sleep(300 * time.Millisecond) // let an injected onerror fire, if any could
	if b.jsBool("window.fieldheadInjected !== undefined") {
		t.Error("markup from the link ran script")
	}
	if b.jsBool(`document.querySelector('img[src="x"], #sheet script, #sheet b') !== null`) {
		t.Error("markup from the link became elements")
	}
	if got := b.js("document.querySelector('.printhead .ph-name').textContent"); !strings.Contains(got, title) {
		t.Errorf("the printed title should show the markup as text, shows %q", got)
	}
	b.shot("security-markup-as-text")

	// Every view the page offers, and the print layout.
	tabs, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string](`[...document.querySelectorAll(".tabs .tab")].map((e) => e.id)`))
	if err != nil || len(tabs) == 0 {
		t.Fatalf("no view tabs: %v", err)
	}
	for _, id := range tabs {
		if err := chromedp.Do(b.ctx, chromedp.Click(chromedp.ID(id)), chromedp.Sleep(300*time.Millisecond)); err != nil {
			t.Fatalf("opening %s: %v", id, err)
		}
	}
	if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{Media: "print"}); err != nil {
		t.Fatal(err)
	}
	time.Sleep(200 * time.Millisecond)
	if _, err := chromedp.Call(b.ctx, emulation.SetEmulatedMedia, emulation.SetEmulatedMediaParams{}); err != nil {
		t.Fatal(err)
	}
	// Wait for the service worker to have cached the site: its requests
	// for the files go through the same checks.
	if !b.poll("navigator.serviceWorker.controller !== null", 30*time.Second) {
		t.Error("the service worker never took control")
	}
	b.noProblems("after every view")

	// The policy is in force: an inline handler, a style attribute and a
	// request to another origin, injected from outside the page, are all
	// refused and reported.
	const probeURL = "http://fieldhead-csp-probe.invalid/probe.png"
	b.js(`(() => {
  document.body.insertAdjacentHTML("beforeend",
    '<div id="csp-probe" style="width: 123px" onclick="window.fieldheadInjected = 3">probe</div>');
  document.getElementById("csp-probe").click();
  new Image().src = "` + probeURL + `";
  return "";
})()`)
	if !b.poll("window.fieldheadViolations.length >= 3", 5*time.Second) {
		t.Errorf("the policy did not refuse the probes; violations: %v", b.violations())
	}
	if b.jsBool("window.fieldheadInjected !== undefined") {
		t.Error("an injected inline event handler ran: the policy is not in force")
	}
	if got := b.js(`getComputedStyle(document.getElementById("csp-probe")).width`); got == "123px" {
		t.Error("an injected style attribute applied: the policy is not in force")
	}
	var kinds []string
	for _, v := range b.violations() {
		kinds = append(kinds, strings.Fields(v)[0])
	}
	for _, k := range []string{"script-src-attr", "style-src-attr", "img-src"} {
		if !strings.Contains(strings.Join(kinds, " "), k) {
			t.Errorf("no %s violation for its probe; got %v", k, kinds)
		}
	}

	// A link refused as a whole (over the size limit) opens the sheet
	// saved on this device, says why, and leaves the saved copy alone.
	// The last view opened is saved once typing pauses (400 ms): wait for
	// it, or the navigation below saves it and seems to change the copy.
	last := strings.TrimPrefix(tabs[len(tabs)-1], "view-")
	if !b.poll("(localStorage.getItem('"+storageKey+"') || '').includes('view="+last+"&')", 5*time.Second) {
		t.Errorf("the %s view was never saved", last)
	}
	saved := b.js("localStorage.getItem('" + storageKey + "')")
	b.js(`window.fieldheadFirstResult = 0; ""`)
	b.navigate(origin + "/?z1=3m&name=" + strings.Repeat("x", scenario.MaxQueryBytes))
	if got := b.text("#link-error"); !strings.Contains(got, "longer than") || !strings.Contains(got, "saved on this device") {
		t.Errorf("an over-long link should be refused with a reason and the saved sheet shown; the notice says %q", got)
	}
	if got := b.value("#in-name"); got != title {
		t.Errorf("after an over-long link the title box shows %.40q, want the saved sheet's", got)
	}
	if got := b.js("localStorage.getItem('" + storageKey + "')"); got != saved {
		t.Errorf("an over-long link changed the saved sheet")
	}
	b.shot("security-link-too-long")

	if f := b.foreign(origin, probeURL); len(f) > 0 {
		t.Errorf("requests to other origins: %s", strings.Join(f, ", "))
	}
	b.mu.Lock()
	n := len(b.requests)
	b.mu.Unlock()
	if n == 0 {
		t.Error("no requests recorded at all: the recorder is not working")
	}
	t.Logf("%d requests, all to %s (the refused probe aside); the probes' violations: %v", n, origin, kinds)
	if ex := b.thrown(); len(ex) > 0 {
		t.Errorf("the page threw: %s", strings.Join(ex, "\n"))
	}
}

// TestSiteMetadata: the manifest names the app's id (W3C Web Application
// Manifest, "id" member) and no page carries an Open Graph tag without an
// address (the Open Graph protocol requires absolute URLs).
func TestSiteMetadata(t *testing.T) {
	site := testSite(t)
	b, err := os.ReadFile(filepath.Join(site, "manifest.webmanifest"))
	if err != nil {
		t.Fatal(err)
	}
	var m map[string]any
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatal(err)
	}
	if id, _ := m["id"].(string); !strings.HasSuffix(id, "/") {
		t.Errorf("the manifest's id is %q", m["id"])
	}
	// Its icons are PNGs (fixMetadata): a maskable one and the sizes 192
	// and 512 an installed site needs.
	listed, _ := m["icons"].([]any)
	kinds := map[string]bool{}
	for _, ic := range listed {
		o, _ := ic.(map[string]any)
		if o["type"] != "image/png" {
			t.Errorf("the manifest lists an icon of type %v: %v", o["type"], o)
		}
		kinds[fmt.Sprint(o["sizes"], " ", o["purpose"])] = true
	}
	for _, k := range []string{"512x512 maskable", "192x192 ", "512x512 "} {
		if !kinds[k] {
			t.Errorf("the manifest has no %q icon: %v", k, listed)
		}
	}
	page, err := os.ReadFile(filepath.Join(site, "index.html"))
	if err != nil {
		t.Fatal(err)
	}
	if strings.Contains(string(page), `content="https://"`) {
		t.Error("index.html carries a placeholder address")
	}
	// The tab's icon is a PNG: an SVG one is drawn on the page's main thread
	// during the load (fixMetadata).
	icons := regexp.MustCompile(`<link [^>]*rel="icon"[^>]*>`).FindAllString(string(page), -1)
	if len(icons) != 1 || !regexp.MustCompile(`href="/web/icon-192\.[0-9a-f]{10}\.png"`).MatchString(icons[0]) {
		t.Errorf("the tab's icon is %q, want one PNG under its hashed name", icons)
	}
}
