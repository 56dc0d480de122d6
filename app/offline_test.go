//go:build !wasm

package main

import (
	"context"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/chromedp/cdproto/network"
	"github.com/chromedp/chromedp"
)

// TestOfflineAndUpdate: after one visit the page reloads and computes with
// the network emulated offline (DevTools network emulation, the service
// worker offline too); then a changed build is deployed into the same
// folder, and the open page offers the update, and applying it brings the
// new version with the scenario unchanged. (The behaviour is this
// project's; the mechanisms are the Service Workers specification's
// update and claim steps, W3C.)
func TestOfflineAndUpdate(t *testing.T) {
	orig := testSite(t)
	site := filepath.Join(t.TempDir(), "site")
	if err := copyDir(orig, site); err != nil {
		t.Fatal(err)
	}
	b := newTab(t)
	srv := newSiteServer(t, site)

	sc := scenario.Demo()
	_ = sc.Set("z2", "250m")
	want := scenario.Evaluate(scenario.Read(sc))
	if want.Balance == nil {
		t.Fatalf("the scenario does not evaluate: %v", want.Errors)
	}
	show := func(r scenario.Result) string { return scenario.Show(r.Balance.Value, calc.Length, r.US) }
	b.navigate(srv.URL + "/?" + sc.Encode())
	if !b.poll("navigator.serviceWorker.controller !== null", 30*time.Second) {
		t.Fatal("the service worker never took control")
	}
	v1 := b.js(`goappGetenv("GOAPP_VERSION")`)
	// The first worker taking control is not an update.
	time.Sleep(time.Second)
	if b.jsBool(`document.getElementById("update") !== null`) {
		t.Error("the first visit offers an update")
	}

	// 1. Offline: reload, compute, edit.
	var sw context.Context // the service worker's target, once attached
	offline := func(on bool) {
		t.Helper()
		var conds []*network.Conditions
		if on {
			conds = []*network.Conditions{{Offline: true, DownloadThroughput: -1, UploadThroughput: -1}}
		}
		params := network.EmulateNetworkConditionsByRuleParams{EmulateOfflineServiceWorker: &on, MatchedNetworkConditions: conds}
		if _, err := chromedp.Call(b.ctx, network.EmulateNetworkConditionsByRule, params); err != nil {
			t.Fatalf("network emulation: %v", err)
		}
		// The worker makes its own requests: take it offline too.
		if sw == nil {
			infos, err := chromedp.Targets(b.ctx)
			if err != nil {
				t.Fatal(err)
			}
			for _, info := range infos {
				if info.Type == "service_worker" {
					ctx, cancel := chromedp.NewContext(b.browser, chromedp.WithTargetID(info.TargetID))
					t.Cleanup(cancel)
					sw = ctx
				}
			}
			if sw == nil {
				t.Fatal("no service worker target to take offline")
			}
		}
		if _, err := chromedp.Call(sw, network.EmulateNetworkConditionsByRule, params); err != nil {
			t.Fatalf("network emulation in the service worker: %v", err)
		}
	}
	offline(true)
	if err := chromedp.Do(b.ctx, chromedp.Reload()); err != nil {
		t.Fatalf("offline reload: %v", err)
	}
	b.waitResult()
	if got := b.text("#answer-value"); got != show(want) {
		t.Errorf("offline the answer is %q, want %q", got, show(want))
	}
	// The emulation is real: a file the worker does not hold cannot be fetched.
	probe, err := chromedp.Run(b.ctx, chromedp.Evaluate[string](
		`fetch("/not-cached-offline-probe").then((r) => "status " + r.status, (e) => "failed: " + e)`, chromedp.EvalAwaitPromise))
	if err != nil || !strings.HasPrefix(probe, "failed") {
		t.Errorf("the network should be off, but a fetch of an uncached file gave %s (%v)", probe, err)
	}
	edited := sc.Clone()
	_ = edited.Set("z2", "249m")
	we := scenario.Evaluate(scenario.Read(edited))
	b.typeInto("#in-z2", "249")
	if we.Balance != nil {
		if got := b.waitText("#answer-value", show(we)); got != show(we) {
			t.Errorf("offline, after an edit the answer is %q, want %q", got, show(we))
		}
	}
	b.shot("offline-reload")
	offline(false)

	// 2. A changed build lands in the same folder.
	buildStamp = "a second build, for the update check"
	err = writeSite(site, filepath.Join(orig, "web", "app.wasm"), filepath.Join("..", "web"), "")
	buildStamp = ""
	if err != nil {
		t.Fatalf("deploying the changed build: %v", err)
	}
	appJS, err := os.ReadFile(siteAsset(t, site, "app.js"))
	if err != nil {
		t.Fatal(err)
	}
	m := regexp.MustCompile(`"GOAPP_VERSION":"([^"]+)"`).FindSubmatch(appJS)
	if m == nil {
		t.Fatal("no version in the new app.js")
	}
	v2 := string(m[1])
	if v2 == v1 {
		t.Fatalf("the changed build has the same version %s", v1)
	}

	// The open page learns of it when the browser next checks the worker
	// (on a load, or its own periodic check): the page still runs v1 and
	// offers v2. The check is asked for here rather than by a reload: a
	// reload races the new worker, which takes over the open pages as soon
	// as it has installed and may serve the reload v2's code itself (seen
	// on loaded machines), leaving nothing to offer.
	b.js(`navigator.serviceWorker.getRegistration().then((r) => r.update()), ""`)
	if !b.poll(`document.getElementById("update") !== null`, 60*time.Second) {
		keys, _ := chromedp.Run(b.ctx, chromedp.Evaluate[string](`caches.keys().then((k) => k.join(", "))`, chromedp.EvalAwaitPromise))
		t.Fatalf("no update offered after a changed build; version %s, caches %s", b.js(`goappGetenv("GOAPP_VERSION")`), keys)
	}
	if got := b.js(`goappGetenv("GOAPP_VERSION")`); got != v1 {
		t.Errorf("before applying, the page runs %s, want the old %s", got, v1)
	}
	b.shot("update-banner")
	if got := b.value("#in-z2"); got != "249" {
		t.Errorf("with the update offered z2 shows %q, want 249", got)
	}

	// 3. Apply: the new version, the same scenario.
	b.js(`window.fieldheadFirstResult = 0; ""`)
	if err := clickID(b, "update-reload"); err != nil {
		t.Fatal(err)
	}
	if !b.pollAcross(`window.fieldheadFirstResult > 0 && goappGetenv("GOAPP_VERSION") === "`+v2+`"`, 60*time.Second) {
		t.Fatalf("after applying the update the page runs %s, want %s", b.js(`goappGetenv("GOAPP_VERSION")`), v2)
	}
	if got := b.value("#in-z2"); got != "249" {
		t.Errorf("after the update z2 shows %q, want 249 (the scenario must be kept)", got)
	}
	if we.Balance != nil {
		if got := b.text("#answer-value"); got != show(we) {
			t.Errorf("after the update the answer is %q, want %q", got, show(we))
		}
	}
	time.Sleep(time.Second)
	if b.jsBool(`document.getElementById("update") !== null`) {
		t.Error("the new version still offers an update")
	}
	b.shot("update-applied")
	b.noProblems("offline and update")
}
