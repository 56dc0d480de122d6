//go:build !wasm

package main

import (
	"context"
	"fmt"
	"net/http/httptest"
	"net/url"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"

	"github.com/chromedp/cdproto/network"
	"github.com/chromedp/cdproto/page"
	"github.com/chromedp/chromedp"

	"fieldhead/app/internal/headless"
	"fieldhead/app/internal/wasmflags"
)

// Shared pieces of the browser checks in security_test.go, offline_test.go,
// guard_test.go and a11y_test.go. Each check runs its own Chromium with a
// fresh profile; they share one built site. Like TestBrowser they skip
// without Chromium or a site unless FIELDHEAD_BROWSER=1.

var (
	siteOnce  sync.Once
	builtSite string
	siteErr   error
)

// needBrowser skips or fails (FIELDHEAD_BROWSER=1) when a check cannot run.
func needBrowser(t *testing.T, format string, args ...any) {
	t.Helper()
	msg := fmt.Sprintf(format, args...)
	if os.Getenv("FIELDHEAD_BROWSER") == "1" {
		t.Fatal(msg + " (FIELDHEAD_BROWSER=1 makes this a failure)")
	}
	t.Skip(msg + " (set FIELDHEAD_BROWSER=1 to make this a failure)")
}

// testSite is the site under test: FIELDHEAD_SITE, else one built once per
// test run into a temporary folder.
func testSite(t *testing.T) string {
	t.Helper()
	if s := os.Getenv("FIELDHEAD_SITE"); s != "" {
		if _, err := os.Stat(filepath.Join(s, "web", "app.wasm")); err != nil {
			needBrowser(t, "no built site at %s: run `make site` first (%v)", s, err)
		}
		return s
	}
	if testing.Short() {
		needBrowser(t, "-short: not building the site; run `make browser` or set FIELDHEAD_SITE")
	}
	siteOnce.Do(func() {
		dir, err := os.MkdirTemp("", "fieldhead-site-")
		if err != nil {
			siteErr = err
			return
		}
		builtSite, siteErr = buildSiteIn(dir)
	})
	if siteErr != nil {
		needBrowser(t, "could not build the site: %v", siteErr)
	}
	return builtSite
}

// tab is one Chromium with one page, recording what the checks look at:
// exceptions thrown in the page, every network request the page makes and
// every Content-Security-Policy violation it reports.
type tab struct {
	t       *testing.T
	ctx     context.Context // the page, with a time limit
	browser context.Context // the page, without one (for event streams)
	shots   string

	mu         sync.Mutex
	exceptions []string
	requests   []string // URL of every request, in order

	noWorker page.ScriptIdentifier // the script that hides Worker from the page (blockWasm)
}

// violationsJS records the page's CSP violations from its first script on.
const violationsJS = `window.fieldheadViolations = [];
document.addEventListener("securitypolicyviolation", (e) => {
  window.fieldheadViolations.push(e.violatedDirective + " " + (e.blockedURI || "") + " " + (e.sample || ""));
});`

// newTab starts Chromium (fresh profile in a temporary folder, removed
// afterwards) at 1024×768.
func newTab(t *testing.T) *tab {
	t.Helper()
	chrome := findChromium()
	if chrome == "" {
		needBrowser(t, "no Chromium found: install it with `apt-get install chromium` or set CHROMIUM")
	}
	alloc, cancelAlloc := chromedp.NewExecAllocator(context.Background(),
		headless.Options(chrome, "", 1024, 768)...)
	t.Cleanup(cancelAlloc)
	browser, cancelBrowser := chromedp.NewContext(alloc)
	t.Cleanup(cancelBrowser)
	if err := chromedp.Do(browser, chromedp.EmulateViewport(1024, 768)); err != nil {
		t.Fatalf("starting Chromium: %v", err)
	}
	ctx, cancel := context.WithTimeout(browser, 4*time.Minute)
	t.Cleanup(cancel)
	shots := os.Getenv("FIELDHEAD_SCREENSHOTS")
	if shots == "" {
		shots = filepath.Join("..", "build", "screenshots")
	}
	if err := os.MkdirAll(shots, 0o755); err != nil {
		t.Fatal(err)
	}
	b := &tab{t: t, ctx: ctx, browser: browser, shots: shots}
	if _, err := chromedp.Call(ctx, page.AddScriptToEvaluateOnNewDocument,
		page.AddScriptToEvaluateOnNewDocumentParams{Source: violationsJS}); err != nil {
		t.Fatal(err)
	}
	requests := chromedp.Events(browser, network.RequestWillBeSent)
	go func() {
		for ev, err := range requests {
			if err != nil {
				return
			}
			b.mu.Lock()
			b.requests = append(b.requests, ev.Request.URL)
			b.mu.Unlock()
		}
	}()
	go func() {
		for m, err := range chromedp.Console(browser) {
			if err != nil {
				return
			}
			if m.IsException() {
				b.mu.Lock()
				b.exceptions = append(b.exceptions, m.String())
				b.mu.Unlock()
			}
		}
	}()
	return b
}

// navigate opens a URL and waits for the sheet's first result.
func (b *tab) navigate(u string) {
	b.t.Helper()
	if err := chromedp.Do(b.ctx, chromedp.Navigate(u)); err != nil {
		b.t.Fatalf("opening %s: %v", u, err)
	}
	b.waitResult()
}

// waitResult waits until the page has drawn its first result.
func (b *tab) waitResult() {
	b.t.Helper()
	if err := pollFirstResult(b.ctx, 90*time.Second); err != nil {
		page, _ := chromedp.Run(b.ctx, chromedp.Evaluate[string]("location.href + '\\n' + document.body.innerText.slice(0, 400)"))
		b.t.Fatalf("the page never showed a result: %v\npage: %s\nexceptions: %s", err, page, strings.Join(b.thrown(), "\n"))
	}
}

// pollFirstResult waits up to d until the page in ctx has drawn its first
// result. A navigation that ends while the poll runs takes its JavaScript
// context with it: it polls again in the new one.
func pollFirstResult(ctx context.Context, d time.Duration) error {
	var err error
	for try := 0; try < 3; try++ {
		_, err = chromedp.Run(ctx, chromedp.Poll[bool]("window.fieldheadFirstResult > 0", chromedp.WithPollingTimeout(d)))
		if err == nil || !strings.Contains(err.Error(), "Cannot find context") {
			return err
		}
		time.Sleep(100 * time.Millisecond)
	}
	return err
}

// js evaluates an expression to a string.
func (b *tab) js(expr string) string {
	b.t.Helper()
	s, err := chromedp.Run(b.ctx, chromedp.Evaluate[string](expr))
	if err != nil {
		b.t.Fatalf("evaluating %s: %v", expr, err)
	}
	return s
}

// jsBool evaluates an expression to a boolean.
func (b *tab) jsBool(expr string) bool {
	b.t.Helper()
	v, err := chromedp.Run(b.ctx, chromedp.Evaluate[bool](expr))
	if err != nil {
		b.t.Fatalf("evaluating %s: %v", expr, err)
	}
	return v
}

// poll waits up to d for a JavaScript condition.
func (b *tab) poll(cond string, d time.Duration) bool {
	b.t.Helper()
	_, err := chromedp.Run(b.ctx, chromedp.Poll[bool](cond, chromedp.WithPollingTimeout(d)))
	return err == nil
}

// pollAcross is poll for a condition that spans a navigation: errors
// while the old page goes and the new one comes are retried.
func (b *tab) pollAcross(cond string, d time.Duration) bool {
	b.t.Helper()
	deadline := time.Now().Add(d)
	for time.Now().Before(deadline) {
		ok, err := chromedp.Run(b.ctx, chromedp.Evaluate[bool]("(() => { try { return !!("+cond+"); } catch (e) { return false; } })()"))
		if err == nil && ok {
			return true
		}
		time.Sleep(100 * time.Millisecond)
	}
	return false
}

// text is the visible text of the first element matching sel.
func (b *tab) text(sel string) string {
	b.t.Helper()
	s, err := chromedp.Run(b.ctx, chromedp.Text(chromedp.CSS(sel)))
	if err != nil {
		b.t.Fatalf("reading %s: %v", sel, err)
	}
	return strings.TrimSpace(s)
}

// waitText waits until sel shows want and returns what it shows.
func (b *tab) waitText(sel, want string) string {
	b.t.Helper()
	deadline := time.Now().Add(10 * time.Second)
	for {
		got, err := chromedp.Run(b.ctx, chromedp.Text(chromedp.CSS(sel)))
		got = strings.TrimSpace(got)
		if (err == nil && got == want) || time.Now().After(deadline) {
			return got
		}
		time.Sleep(50 * time.Millisecond)
	}
}

// value is the value of the input matching sel.
func (b *tab) value(sel string) string {
	b.t.Helper()
	return b.js(fmt.Sprintf("document.querySelector(%q).value", sel))
}

// typeInto replaces the text of an input by typing v, key by key.
func (b *tab) typeInto(sel, v string) {
	b.t.Helper()
	err := chromedp.Do(b.ctx,
		chromedp.Focus(chromedp.CSS(sel)),
		chromedp.Evaluate[chromedp.Void](fmt.Sprintf("document.querySelector(%q).select()", sel)),
		chromedp.SendKeys(chromedp.CSS(sel), v),
	)
	if err != nil {
		b.t.Fatalf("typing into %s: %v", sel, err)
	}
	// The link and the saved copy follow shortly (sheet.save).
	b.poll("!window.fieldheadPending", 5*time.Second)
}

// shot saves a screenshot of the viewport as name.png.
func (b *tab) shot(name string) {
	b.t.Helper()
	png, err := chromedp.Run(b.ctx, chromedp.CaptureScreenshot())
	if err != nil {
		b.t.Fatalf("screenshot %s: %v", name, err)
	}
	if err := os.WriteFile(filepath.Join(b.shots, name+".png"), png, 0o644); err != nil {
		b.t.Fatal(err)
	}
}

// thrown returns the exceptions the page has thrown so far.
func (b *tab) thrown() []string {
	b.mu.Lock()
	defer b.mu.Unlock()
	return append([]string(nil), b.exceptions...)
}

// asked reports whether the page itself (not a worker it started) asked
// for a URL whose path ends in suffix.
func (b *tab) asked(suffix string) bool {
	b.mu.Lock()
	defer b.mu.Unlock()
	for _, r := range b.requests {
		if u, err := url.Parse(r); err == nil && strings.HasSuffix(u.Path, suffix) {
			return true
		}
	}
	return false
}

// foreign returns the requests to any origin other than origin, except
// those the caller expects (the CSP probes).
func (b *tab) foreign(origin string, except ...string) []string {
	b.mu.Lock()
	defer b.mu.Unlock()
	var out []string
	for _, r := range b.requests {
		skip := false
		for _, e := range except {
			if r == e {
				skip = true
			}
		}
		if !skip && !sameOrigin(r, origin) {
			out = append(out, r)
		}
	}
	return out
}

// sameOrigin reports whether a requested URL is of the page's own origin.
// data: and blob: URLs are made in the page and go to no server.
func sameOrigin(raw, origin string) bool {
	u, err := url.Parse(raw)
	if err != nil {
		return false
	}
	switch u.Scheme {
	case "data", "blob":
		return true
	}
	return u.Scheme+"://"+u.Host == origin
}

// violations returns the CSP violations the page reported.
func (b *tab) violations() []string {
	b.t.Helper()
	v, err := chromedp.Run(b.ctx, chromedp.Evaluate[[]string]("window.fieldheadViolations || []"))
	if err != nil {
		b.t.Fatalf("reading the CSP violations: %v", err)
	}
	return v
}

// noProblems fails on exceptions and CSP violations seen so far.
func (b *tab) noProblems(when string) {
	b.t.Helper()
	if ex := b.thrown(); len(ex) > 0 {
		b.t.Errorf("%s: the page threw: %s", when, strings.Join(ex, "\n"))
	}
	if v := b.violations(); len(v) > 0 {
		b.t.Errorf("%s: Content-Security-Policy violations: %s", when, strings.Join(v, "; "))
	}
}

// buildSiteIn compiles the wasm and writes a site into dir/site.
func buildSiteIn(dir string) (string, error) {
	wasm := filepath.Join(dir, "app.wasm")
	if err := compileWasm(wasm); err != nil {
		return "", err
	}
	site := filepath.Join(dir, "site")
	return site, writeSite(site, wasm, filepath.Join("..", "web"), "")
}

// copyDir copies a site folder, for checks that rewrite it.
func copyDir(src, dst string) error {
	return filepath.Walk(src, func(path string, info os.FileInfo, err error) error {
		if err != nil {
			return err
		}
		rel, err := filepath.Rel(src, path)
		if err != nil {
			return err
		}
		target := filepath.Join(dst, rel)
		if info.IsDir() {
			return os.MkdirAll(target, 0o755)
		}
		data, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		return os.WriteFile(target, data, 0o644)
	})
}

// compileWasm builds the page's wasm into out.
func compileWasm(out string) error {
	cmd := exec.Command("go", append(append([]string{"build", "-trimpath", "-ldflags=-s -w"}, wasmflags.GC...), "-o", out, ".")...)
	cmd.Env = append(os.Environ(), "GOOS=js", "GOARCH=wasm")
	if b, err := cmd.CombinedOutput(); err != nil {
		return fmt.Errorf("%v\n%s", err, b)
	}
	return nil
}

// newSiteServer serves a site folder on a loopback port for one check.
func newSiteServer(t *testing.T, dir string) *httptest.Server {
	t.Helper()
	srv := httptest.NewServer(siteHandler(dir, ""))
	t.Cleanup(srv.Close)
	return srv
}

// clickID clicks the element with the given id.
func clickID(b *tab, id string) error {
	return chromedp.Do(b.ctx, chromedp.Click(chromedp.ID(id)))
}
