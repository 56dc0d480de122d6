//go:build !wasm

package static

import (
	"bytes"
	"compress/gzip"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/andybalholm/brotli"
)

func write(t *testing.T, dir string, files map[string]string) {
	t.Helper()
	for name, body := range files {
		p := filepath.Join(dir, filepath.FromSlash(name))
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte(body), 0o644); err != nil {
			t.Fatal(err)
		}
	}
}

// TestFingerprint: a file's hashed name follows what it points at (this
// project's rule: a new wasm gives app.js a new name too), references are
// rewritten with the site's prefix, the fixed names stay.
func TestFingerprint(t *testing.T) {
	names := func(wasm string) map[string]string {
		dir := t.TempDir()
		write(t, dir, map[string]string{
			"index.html":           `<script src="/p/app.js"></script>`,
			"app.js":               `fetch("/p/web/app.wasm"); register("/p/app-worker.js")`,
			"app-worker.js":        `const files = ["/p/app.js","/p/web/app.wasm","/p/manifest.webmanifest"];`,
			"manifest.webmanifest": `{"icons":[{"src":"/p/web/icon.svg"}]}`,
			"web/app.wasm":         wasm,
			"web/icon.svg":         "<svg/>",
		})
		renames, err := Fingerprint(dir, "/p")
		if err != nil {
			t.Fatal(err)
		}
		for _, fixed := range []string{"index.html", "app-worker.js", "manifest.webmanifest"} {
			if _, err := os.Stat(filepath.Join(dir, fixed)); err != nil {
				t.Errorf("%s was renamed", fixed)
			}
		}
		page, _ := os.ReadFile(filepath.Join(dir, "index.html"))
		if !strings.Contains(string(page), `"`+renames["/p/app.js"]+`"`) {
			t.Errorf("the page refers to %s, want %s", page, renames["/p/app.js"])
		}
		js, _ := os.ReadFile(filepath.Join(dir, filepath.FromSlash(strings.TrimPrefix(renames["/p/app.js"], "/p/"))))
		if !strings.Contains(string(js), `"`+renames["/p/web/app.wasm"]+`"`) || !strings.Contains(string(js), `"/p/app-worker.js"`) {
			t.Errorf("app.js is %s", js)
		}
		manifest, _ := os.ReadFile(filepath.Join(dir, "manifest.webmanifest"))
		if !strings.Contains(string(manifest), renames["/p/web/icon.svg"]) {
			t.Errorf("the manifest is %s", manifest)
		}
		for old, now := range renames {
			if !Hashed(now) || !strings.HasPrefix(now, strings.TrimSuffix(old, filepath.Ext(old))+".") {
				t.Errorf("%s became %s", old, now)
			}
		}
		return renames
	}
	a, b := names("wasm one"), names("wasm two")
	if a["/p/web/app.wasm"] == b["/p/web/app.wasm"] || a["/p/app.js"] == b["/p/app.js"] {
		t.Errorf("a changed wasm must rename it and the app.js that loads it: %v, %v", a, b)
	}
	if a["/p/web/icon.svg"] != b["/p/web/icon.svg"] {
		t.Error("an unchanged icon changed its name")
	}
}

// TestFingerprintCircle: files that refer to each other cannot each name
// the other's hash; that is an error, not a loop.
func TestFingerprintCircle(t *testing.T) {
	dir := t.TempDir()
	write(t, dir, map[string]string{"a.js": `"/b.js"`, "b.js": `"/a.js"`})
	if _, err := Fingerprint(dir, ""); err == nil {
		t.Error("no error for a.js and b.js naming each other")
	}
}

// TestCompress: the copies decode to the file (RFC 7932 brotli, RFC 1952
// gzip), and a second run takes them from the cache folder, which keeps
// only the last run's entries.
func TestCompress(t *testing.T) {
	dir, cache := t.TempDir(), t.TempDir()
	body := strings.Repeat("Fieldhead compresses its text files. ", 200)
	write(t, dir, map[string]string{"a.js": body, "icon.png": "not text"})
	if err := Compress(dir, cache); err != nil {
		t.Fatal(err)
	}
	br, _ := os.ReadFile(filepath.Join(dir, "a.js.br"))
	if d, err := io.ReadAll(brotli.NewReader(bytes.NewReader(br))); err != nil || string(d) != body {
		t.Errorf("a.js.br does not decode to a.js (%v)", err)
	}
	gz, _ := os.ReadFile(filepath.Join(dir, "a.js.gz"))
	r, err := gzip.NewReader(bytes.NewReader(gz))
	if err != nil {
		t.Fatal(err)
	}
	if d, err := io.ReadAll(r); err != nil || string(d) != body {
		t.Errorf("a.js.gz does not decode to a.js (%v)", err)
	}
	if _, err := os.Stat(filepath.Join(dir, "icon.png.br")); err == nil {
		t.Error("a PNG was compressed again")
	}
	// Mark the cached brotli copy: a second run must use it as it is.
	entries, _ := os.ReadDir(cache)
	if len(entries) != 2 {
		t.Fatalf("cache holds %d entries, want 2", len(entries))
	}
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".br") {
			os.WriteFile(filepath.Join(cache, e.Name()), []byte("from the cache"), 0o644)
		}
	}
	if err := Compress(dir, cache); err != nil {
		t.Fatal(err)
	}
	if b, _ := os.ReadFile(filepath.Join(dir, "a.js.br")); string(b) != "from the cache" {
		t.Error("the second run compressed again instead of using the cache")
	}
	write(t, dir, map[string]string{"a.js": "changed"})
	os.Remove(filepath.Join(dir, "a.js.br"))
	os.Remove(filepath.Join(dir, "a.js.gz"))
	if err := Compress(dir, cache); err != nil {
		t.Fatal(err)
	}
	if entries, _ := os.ReadDir(cache); len(entries) != 2 {
		t.Errorf("after a change the cache holds %d entries, want this run's 2", len(entries))
	}
}
