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
	}
	for _, s := range steps {
		if n := len(s.re.FindAllStringIndex(js, -1)); n != 1 {
			return "", fmt.Errorf("patching go-app's app.js: %s found %d times, want once", s.what, n)
		}
		js = s.re.ReplaceAllString(js, s.repl)
	}
	return js, nil
}

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
