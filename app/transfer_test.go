//go:build !wasm

package main

import (
	"bytes"
	"compress/gzip"
	"crypto/sha256"
	"encoding/hex"
	"io"
	"io/fs"
	"net/http"
	"net/http/httptest"
	"os"
	"path"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"fieldhead/app/internal/static"

	"github.com/andybalholm/brotli"
	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// siteAsset is the file of a written site that was built as rel (say
// "app.js"), now under its content-hashed name.
func siteAsset(t *testing.T, site, rel string) string {
	t.Helper()
	ext := path.Ext(rel)
	matches, err := filepath.Glob(filepath.Join(site, filepath.FromSlash(strings.TrimSuffix(rel, ext)+".*"+ext)))
	if err != nil {
		t.Fatal(err)
	}
	var found []string
	for _, m := range matches {
		if static.Hashed(filepath.Base(m)) {
			found = append(found, m)
		}
	}
	if len(found) != 1 {
		t.Fatalf("%s: want one hashed copy in %s, found %v", rel, site, found)
	}
	return found[0]
}

// TestPatchLoader: the app.js go-app generates is changed in exactly the
// places loader.go says, and a text that no longer matches is refused.
// (Source: go-app v10.1.11's generated app.js, as the site writer gets it.)
func TestPatchLoader(t *testing.T) {
	dir := t.TempDir()
	registerRoutes()
	if err := app.GenerateStaticWebsite(dir, newHandler("", "test", 0)); err != nil {
		t.Fatal(err)
	}
	orig, err := os.ReadFile(filepath.Join(dir, "app.js"))
	if err != nil {
		t.Fatal(err)
	}
	js, err := patchLoader(string(orig))
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(orig), `fetchWithProgress("/web/app.wasm", showProgress)`) {
		t.Fatal("go-app's app.js has no progress wrapper: the check below would prove nothing")
	}
	if strings.Contains(js, `fetchWithProgress("/web/app.wasm"`) ||
		!strings.Contains(js, `fieldheadInstantiate("/web/app.wasm", go.importObject, instantiateStreaming)`) ||
		!strings.Contains(js, `onMain(fetch(url), imports)`) {
		t.Error("the wasm is not started from the worker's module, or else fetched straight into instantiateStreaming")
	}
	if regexp.MustCompile(`(?m)^goappInitServiceWorker\(\);`).MatchString(js) {
		t.Error("the worker is still registered before the wasm loads")
	}
	run := strings.Index(js, "go.run(wasm.instance);")
	reg := strings.Index(js, "goappInitServiceWorker(); // Fieldhead")
	if run < 0 || reg < run {
		t.Error("the worker is not registered after the wasm starts")
	}
	if fail := strings.Index(js, "fieldheadLoadFailed(loader, loaderIcon, loaderLabel); // Fieldhead"); fail < 0 || strings.Contains(js, "loaderLabel.innerText = err") ||
		!strings.Contains(js, "function fieldheadLoadFailed(") {
		t.Error("a failed start still writes the browser's error, not ours")
	}
	if _, err := patchLoader(js); err == nil {
		t.Error("patching twice should fail: the texts it replaces are gone")
	}
}

// TestSiteTransfer writes a site and checks what a host is given: hashed
// names for everything but the pages, worker and manifest; every
// reference pointing at a file that exists; brotli and gzip copies that
// decode to the file. (Source: this project's transfer rules, README's
// Deploy section; the encodings are RFC 7932 brotli and RFC 1952 gzip.)
func TestSiteTransfer(t *testing.T) {
	site := testSite(t)
	var all []string
	err := filepath.WalkDir(site, func(p string, d os.DirEntry, err error) error {
		if err == nil && !d.IsDir() {
			rel, _ := filepath.Rel(site, p)
			all = append(all, filepath.ToSlash(rel))
		}
		return err
	})
	if err != nil {
		t.Fatal(err)
	}
	fixed := map[string]bool{"index.html": true, "app-worker.js": true, "manifest.webmanifest": true}
	ref := regexp.MustCompile(`"(/[^"?#]*\.(?:js|css|wasm|png|svg|webmanifest))"`)
	for _, rel := range all {
		if strings.HasSuffix(rel, ".br") || strings.HasSuffix(rel, ".gz") || rel == "web/app.wasm" {
			continue
		}
		if !fixed[rel] && !static.Hashed(rel) {
			t.Errorf("%s has no content hash in its name", rel)
		}
		b, err := os.ReadFile(filepath.Join(site, rel))
		if err != nil {
			t.Fatal(err)
		}
		if static.Hashed(rel) {
			// The name's hash is the content's (SHA-256, first 10 hex digits).
			if got := rel[len(rel)-len(path.Ext(rel))-10 : len(rel)-len(path.Ext(rel))]; got != sha10(b) {
				t.Errorf("%s: name hash %s, content hash %s", rel, got, sha10(b))
			}
		}
		for _, m := range ref.FindAllSubmatch(b, -1) {
			if _, err := os.Stat(filepath.Join(site, filepath.FromSlash(string(m[1])))); err != nil {
				t.Errorf("%s refers to %s, which the site does not have", rel, m[1])
			}
		}
		switch path.Ext(rel) {
		case ".png":
			continue
		}
		br, err := os.ReadFile(filepath.Join(site, rel+".br"))
		if err != nil {
			t.Errorf("%s: no brotli copy", rel)
			continue
		}
		if d, err := io.ReadAll(brotli.NewReader(bytes.NewReader(br))); err != nil || !bytes.Equal(d, b) {
			t.Errorf("%s.br does not decode to the file (%v)", rel, err)
		}
		if gz, err := os.ReadFile(filepath.Join(site, rel+".gz")); err != nil || !bytes.Equal(gunzip(t, gz), b) {
			t.Errorf("%s.gz missing or not the file (%v)", rel, err)
		}
	}
	page, err := os.ReadFile(filepath.Join(site, "index.html"))
	if err != nil {
		t.Fatal(err)
	}
	// The worker that fetches and compiles the wasm (web/start.js, the
	// script that starts it) and what it loads, under their hashed names,
	// named for web/start.js, an async script fetched at high priority,
	// both before the first style sheet (startCompileFirst); no preload
	// (start.js says why).
	wasm := path.Base(siteAsset(t, site, "web/app.wasm"))
	exec := path.Base(siteAsset(t, site, "wasm_exec.js"))
	start := path.Base(siteAsset(t, site, "web/start.js"))
	tags := `<meta name="fieldhead-compile" content="/web/` + start + `" data-wasm="/web/` + wasm + `" data-exec="/` + exec + `">` +
		"\n    " + `<script async fetchpriority="high" src="/web/` + start + `"></script>`
	at, sheet := bytes.Index(page, []byte(tags)), bytes.Index(page, []byte(`rel="stylesheet"`))
	if at < 0 || sheet < 0 || at > sheet {
		t.Errorf("the page does not start the compiling worker before its style sheets, under the hashed names (want %s)", tags)
	}
	if bytes.Contains(page, []byte(`rel="preload"`)) {
		t.Error("the page preloads a file: the wasm is fetched by the compiling worker")
	}
}

// TestSiteHeaders serves a written site and checks each answer's headers
// against the rules of HTTP (RFC 9110 content coding and Vary, RFC 9111
// Cache-Control, immutable from RFC 8246): the encoding the request
// accepts, the right type whatever the encoding, hashed names immutable,
// the page, worker and manifest revalidated with an ETag and a 304.
func TestSiteHeaders(t *testing.T) {
	site := testSite(t)
	srv := httptest.NewServer(siteHandler(site, ""))
	defer srv.Close()
	wasm := "/web/" + path.Base(siteAsset(t, site, "web/app.wasm"))
	appJS := "/" + path.Base(siteAsset(t, site, "app.js"))
	get := func(p, accept string, extra ...string) *http.Response {
		t.Helper()
		req, _ := http.NewRequest("GET", srv.URL+p, nil)
		req.Header.Set("Accept-Encoding", accept)
		for i := 0; i+1 < len(extra); i += 2 {
			req.Header.Set(extra[i], extra[i+1])
		}
		// The transport must not decode for us: we check the bytes sent.
		res, err := (&http.Transport{DisableCompression: true}).RoundTrip(req)
		if err != nil {
			t.Fatal(err)
		}
		t.Cleanup(func() { res.Body.Close() })
		return res
	}
	raw, err := os.ReadFile(filepath.Join(site, filepath.FromSlash(wasm)))
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		path, accept, enc, typ, cache string
	}{
		{wasm, "gzip, deflate, br, zstd", "br", "application/wasm", static.CacheImmutable},
		{wasm, "gzip", "gzip", "application/wasm", static.CacheImmutable},
		{wasm, "br;q=0, gzip", "gzip", "application/wasm", static.CacheImmutable},
		{wasm, "", "", "application/wasm", static.CacheImmutable},
		{wasm, "identity", "", "application/wasm", static.CacheImmutable},
		{wasm, "*", "br", "application/wasm", static.CacheImmutable},
		{appJS, "br", "br", "text/javascript; charset=utf-8", static.CacheImmutable},
		{"/", "br", "br", "text/html; charset=utf-8", static.CacheRevalidate},
		{"/index.html", "gzip", "gzip", "text/html; charset=utf-8", static.CacheRevalidate},
		{"/app-worker.js", "br", "br", "text/javascript; charset=utf-8", static.CacheRevalidate},
		{"/manifest.webmanifest", "br", "br", "application/manifest+json", static.CacheRevalidate},
	} {
		res := get(c.path, c.accept)
		h := res.Header
		if res.StatusCode != 200 || h.Get("Content-Encoding") != c.enc || h.Get("Content-Type") != c.typ ||
			h.Get("Cache-Control") != c.cache || h.Get("Vary") != "Accept-Encoding" {
			t.Errorf("GET %s (Accept-Encoding %q): %d, encoding %q, type %q, cache %q, vary %q; want encoding %q, type %q, cache %q, vary Accept-Encoding",
				c.path, c.accept, res.StatusCode, h.Get("Content-Encoding"), h.Get("Content-Type"), h.Get("Cache-Control"), h.Get("Vary"),
				c.enc, c.typ, c.cache)
		}
		if c.path == wasm {
			body, _ := io.ReadAll(res.Body)
			var plain []byte
			switch c.enc {
			case "br":
				plain, err = io.ReadAll(brotli.NewReader(bytes.NewReader(body)))
			case "gzip":
				plain = gunzip(t, body)
			default:
				plain = body
			}
			if err != nil || !bytes.Equal(plain, raw) {
				t.Errorf("GET %s with %q: the body does not decode to the wasm", c.path, c.accept)
			}
		}
	}
	// Revalidation of the page: the ETag comes back as a 304 with no body.
	first := get("/", "br")
	tag := first.Header.Get("ETag")
	if tag == "" {
		t.Fatal("the page has no ETag")
	}
	if again := get("/", "br", "If-None-Match", tag); again.StatusCode != http.StatusNotModified {
		t.Errorf("revalidating the page with its ETag gave %d, want 304", again.StatusCode)
	}
	if other := get("/", "gzip", "If-None-Match", tag); other.StatusCode != http.StatusOK {
		t.Errorf("the brotli copy's ETag validated the gzip copy (%d): each encoding needs its own tag", other.StatusCode)
	}
	if res := get("/not-in-the-site.js", "br"); res.StatusCode != http.StatusNotFound {
		t.Errorf("a missing file gave %d, want 404", res.StatusCode)
	}
	if res := get("/../go.mod", ""); res.StatusCode == http.StatusOK {
		t.Error("a path outside the site was served")
	}
}

// TestPreferredEncoding: Accept-Encoding as RFC 9110 section 12.5.3 reads
// it (q=0 refuses, "*" stands for any other coding, names are
// case-insensitive).
func TestPreferredEncoding(t *testing.T) {
	for _, c := range []struct{ accept, want string }{
		{"gzip, deflate, br, zstd", "br gzip"},
		{"gzip", "gzip"},
		{"br;q=0, gzip;q=0.5", "gzip"},
		{"BR", "br"},
		{"*", "br gzip"},
		{"*;q=0, gzip", "gzip"},
		{"identity", ""},
		{"", ""},
		{"gzip;q=0", ""},
	} {
		if got := strings.Join(static.Preferred(c.accept), " "); got != c.want {
			t.Errorf("Preferred(%q) = %q, want %q", c.accept, got, c.want)
		}
	}
}

func sha10(b []byte) string {
	sum := sha256.Sum256(b)
	return hex.EncodeToString(sum[:])[:10]
}

func gunzip(t *testing.T, b []byte) []byte {
	t.Helper()
	r, err := gzip.NewReader(bytes.NewReader(b))
	if err != nil {
		t.Errorf("not gzip: %v", err)
		return nil
	}
	d, err := io.ReadAll(r)
	if err != nil {
		t.Errorf("gzip: %v", err)
	}
	return d
}

// TestSiteWrittenAlike writes the site twice from the same inputs (the
// same wasm bytes, assets and prefix) and compares every file: a page
// written differently would change its ETag and make every browser fetch
// it again after a build that changed nothing (go-app kept an element's
// attributes in a map, written in the map's changing order). It also
// finds no boolean attribute written as ="false", which HTML reads as
// true: the written demo's unit pickers showed their last unit ("212 in"
// for 212 m).
func TestSiteWrittenAlike(t *testing.T) {
	dir := t.TempDir()
	wasm := filepath.Join(dir, "app.wasm")
	if err := os.WriteFile(wasm, []byte("\x00asm\x01\x00\x00\x00"), 0o644); err != nil { // the header of an empty module (WebAssembly core spec, 5.5.16)
		t.Fatal(err)
	}
	read := func(site string) map[string][]byte {
		files := map[string][]byte{}
		err := filepath.WalkDir(site, func(p string, d fs.DirEntry, err error) error {
			if err != nil || d.IsDir() || d.Type()&fs.ModeSymlink != 0 {
				return err
			}
			rel, _ := filepath.Rel(site, p)
			files[rel], err = os.ReadFile(p)
			return err
		})
		if err != nil {
			t.Fatal(err)
		}
		return files
	}
	var sites []map[string][]byte
	for _, name := range []string{"a", "b"} {
		site := filepath.Join(dir, name)
		if err := writeSite(site, wasm, filepath.Join("..", "web"), "/tools/fh"); err != nil {
			t.Fatal(err)
		}
		sites = append(sites, read(site))
	}
	if len(sites[0]) != len(sites[1]) {
		t.Fatalf("the two writes hold %d and %d files", len(sites[0]), len(sites[1]))
	}
	for name, a := range sites[0] {
		if !bytes.Equal(a, sites[1][name]) {
			t.Errorf("%s differs between two writes of the same inputs", name)
		}
	}
	page := string(sites[0]["index.html"])
	if m := regexp.MustCompile(`\s(selected|disabled|hidden|checked|readonly|inert|open)="false"`).FindAllString(page, -1); len(m) > 0 {
		t.Errorf("index.html writes %d boolean attributes as =\"false\" (true in HTML): %q", len(m), m[0])
	}
	if !regexp.MustCompile(`<option selected value="m">m</option>`).MatchString(page) || strings.Count(page, `<option selected value="in">`) > 0 {
		t.Error("the written demo's elevation picker does not show metres alone as chosen")
	}
}
