//go:build !wasm

package main

import (
	"fmt"
	"os"
	"path/filepath"
	"regexp"
)

// go-app's generated app.js loads the wasm, and two of its choices cost a
// phone a download and a compile on every visit. patchLoader changes just
// those, in the generated file, and fails the build if go-app's text is no
// longer what it expects:
//
//   - The wasm goes straight from fetch() into
//     WebAssembly.instantiateStreaming. go-app wraps the response in a new
//     Response to count bytes for a progress label; Chromium keeps compiled
//     code only for a module compiled from the fetched response itself, so
//     the wrapper made every load compile the whole module again. The
//     label stays, without a percentage (newHandler's LoadingLabel).
//   - A mark, fieldhead-wasm-ready, once the module is instantiated (make bench).
//   - The service worker is registered once the wasm is running, not
//     before the download starts: its installation then takes every file
//     from the HTTP cache (worker.go) instead of downloading the site a
//     second time alongside the page on a slow link, and nothing the page
//     needs waits for it.
//   - A wasm that cannot be fetched or started (a first visit offline, a
//     download cut or blocked) is said in our words, the spinner stopped,
//     with a button that tries again (loadFailedJS); go-app wrote the
//     browser's own error ("TypeError: Failed to fetch") beside a spinner.
func patchLoader(js string) (string, error) {
	steps := []struct {
		what string
		re   *regexp.Regexp
		repl string
	}{
		{"the progress wrapper around the wasm's fetch",
			regexp.MustCompile(`fetchWithProgress\(("[^"]+"), showProgress\)`), `fetch($1)`},
		{"the service worker's registration before the wasm",
			regexp.MustCompile(`(?m)^goappInitServiceWorker\(\);\n`), ""},
		{"the start of the wasm",
			regexp.MustCompile(`(\n(\s*)go\.run\(wasm\.instance\);\n\s*loader\.remove\(\);\n)`),
			"\n${2}performance.mark(\"fieldhead-wasm-ready\"); // Fieldhead: compiled (make bench times the phases)${1}${2}goappInitServiceWorker(); // Fieldhead: after the wasm (loader.go)\n"},
		{"the failed start",
			regexp.MustCompile(`\} catch \(err\) \{\n(\s*)loaderIcon\.className = "goapp-logo";\n\s*loaderLabel\.innerText = err;\n(\s*console\.error\("loading wasm failed: ", err\);\n)`),
			"} catch (err) {\n${2}${1}fieldheadLoadFailed(loader, loaderIcon, loaderLabel); // Fieldhead: in our words, with a retry (loader.go)\n"},
	}
	for _, s := range steps {
		if n := len(s.re.FindAllStringIndex(js, -1)); n != 1 {
			return "", fmt.Errorf("patching go-app's app.js: %s found %d times, want once", s.what, n)
		}
		js = s.re.ReplaceAllString(js, s.repl)
	}
	return js + loadFailedJS, nil
}

// loadFailedJS ends app.js: what the corner note says, moved above the
// sheet, when the wasm could not be fetched or started. The written page stays as it is (the demo on
// a bare visit, readable; a link's sheet stays hidden, as no answer but
// the link's may show); the note stops turning, says what happened and
// what to do, and its button runs go-app's start again without reloading
// the page (which, offline on a first visit, would show the browser's
// error page instead of the demo).
const loadFailedJS = `
// Fieldhead: the wasm did not load (app/loader.go).
function fieldheadLoadFailed(loader, icon, label) {
  const demo = document.documentElement.classList.contains("demo-page");
  const kept = document.documentElement.classList.contains("snap-page");
  const offline = navigator.onLine === false;
  loader.classList.add("failed");
  loader.setAttribute("role", "alert");
  document.body.prepend(loader); // above the sheet, in the page's flow: it covers nothing
  icon.className = "stopped";
  label.textContent = "Fieldhead could not start: " +
    (offline ? "this device is offline and has not kept the program yet. " : "its program did not download. ") +
    (demo ? "The demo sheet below can be read but not changed." :
      kept ? "The sheet below is as this device last showed it; it can be read but not changed." :
      "This link's sheet can be shown only once it starts.") +
    " Check the connection, then try again.";
  let retry = document.getElementById("app-wasm-retry");
  if (!retry) {
    retry = document.createElement("button");
    retry.type = "button";
    retry.id = "app-wasm-retry";
    retry.className = "act";
    retry.textContent = "Try again";
    retry.addEventListener("click", () => {
      retry.remove();
      loader.classList.remove("failed");
      loader.setAttribute("role", "status");
      icon.className = "goapp-spin";
      label.textContent = "Fieldhead is starting…";
      goappInitWebAssembly();
    });
    loader.append(retry);
  }
}
`

// patchLoaderHTML replaces go-app's loader, a full-window cover over the
// demo sheet the site writer drew (sheet.go), by a small polite status note
// of ours in a corner, with the ids app.js writes to. web/prerender.js, a
// blocking script in <head>, shows the demo only where the wasm will draw
// it too: a bare link on a device that keeps no sheet.
func patchLoaderHTML(page []byte) ([]byte, error) {
	loader := regexp.MustCompile(`(?s)<aside [^>]*id="app-wasm-loader"[^>]*>.*?</aside>`) // attributes in any order
	if n := len(loader.FindAllIndex(page, -1)); n != 1 {
		return nil, fmt.Errorf("patching go-app's page: its loader found %d times, want once", n)
	}
	return loader.ReplaceAll(page, []byte(`<div id="app-wasm-loader" role="status"><span id="app-wasm-loader-icon" class="goapp-spin"></span>`+
		`<span id="app-wasm-loader-label">Fieldhead is starting…</span></div>`)), nil
}

// patchSiteLoader applies patchLoader to the site's app.js.
func patchSiteLoader(out string) error {
	p := filepath.Join(out, "app.js")
	b, err := os.ReadFile(p)
	if err != nil {
		return err
	}
	js, err := patchLoader(string(b))
	if err != nil {
		return err
	}
	return os.WriteFile(p, []byte(js), 0o644)
}

// preloadWasm is a <link> that starts the wasm's download while the page
// is still being read, rather than when app.js runs (after the
// stylesheets and scripts). It matches app.js's fetch() (same URL, CORS
// mode, same-origin credentials), so the browser hands that fetch the
// preloaded response. The site writer renames the URL to the wasm's
// hashed name with every other reference.
func preloadWasm(prefix string) string {
	return `<link rel="preload" href="` + prefix + `/web/app.wasm" as="fetch" type="application/wasm" crossorigin>`
}
