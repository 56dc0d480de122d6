//go:build !wasm

package main

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io/fs"
	"log"
	"net"
	"net/http"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"

	"fieldhead/app/internal/static"
	"fieldhead/app/internal/wasmdata"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// routeAnyPath routes every path under the site to the sheet (the site
// writer pre-renders them).
func routeAnyPath() { app.RouteWithRegexp("^/.*", newSheet) }

// native is the command-line role: write the static site, and serve it
// when asked.
func native() {
	out := flag.String("out", "build/site", "folder to write the static site into")
	wasm := flag.String("wasm", "build/app.wasm", "the compiled app.wasm to put in the site")
	assets := flag.String("web", "web", "folder of our static assets (stylesheet, icon)")
	prefix := flag.String("prefix", "", "URL path the site is deployed under, e.g. /tools/fieldhead")
	serve := flag.String("serve", "", "after writing, serve the site on this address, e.g. :8000")
	flag.StringVar(&buildStamp, "stamp", "", "extra text mixed into the version, to make open pages offer an update without a code change")
	flag.BoolVar(&keepLines, "lines", keepLines, "keep the wasm's file and line tables, so that a panic's trace gives lines (99 KB more brotli; for debugging)")
	flag.BoolVar(&wasmAlias, "wasm-alias", wasmAlias, "also name the wasm web/app.wasm (a symbolic link; for the tests, not for deployment)")
	flag.StringVar(&compressCache, "cache", compressCache, "folder keeping the compressed copies between builds (\"\" for none)")
	eval := flag.String("eval", "", "instead of writing the site, read this sheets file and write its results table (CSV) to standard output")
	evalUS := flag.Bool("us", false, "with -eval: figures in US customary units (default SI)")
	flag.Parse()

	if *eval != "" {
		if err := evalCSV(*eval, *evalUS, os.Stdout, os.Stderr); err != nil {
			log.Fatal(err)
		}
		return
	}

	p, err := cleanPrefix(*prefix)
	if err != nil {
		log.Fatal(err)
	}
	if err := writeSite(*out, *wasm, *assets, p); err != nil {
		log.Fatal(err)
	}
	fmt.Printf("Fieldhead: static site written to %s\n", *out)
	if *serve == "" {
		return
	}
	ln, err := net.Listen("tcp", *serve)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("Fieldhead is served at %s (Ctrl-C stops it)\n", siteURL(ln.Addr(), *serve, p))
	log.Fatal(http.Serve(ln, siteHandler(*out, p)))
}

// cleanPrefix normalises a deployment sub-path to "" or "/a/b".
func cleanPrefix(p string) (string, error) {
	p = strings.Trim(strings.TrimSpace(p), "/")
	if p == "" {
		return "", nil
	}
	if strings.ContainsAny(p, "?#\\ ") || strings.Contains(p, "..") {
		return "", fmt.Errorf("prefix %q: use a plain URL path such as /tools/fieldhead", p)
	}
	return "/" + p, nil
}

// siteURL is the address to print for a person to open.
func siteURL(addr net.Addr, asked, prefix string) string {
	host := "localhost"
	if h, _, err := net.SplitHostPort(asked); err == nil && h != "" && h != "0.0.0.0" && h != "::" {
		host = h
	}
	port := "80"
	if ta, ok := addr.(*net.TCPAddr); ok {
		port = strconv.Itoa(ta.Port)
	}
	return "http://" + net.JoinHostPort(host, port) + prefix + "/"
}

// siteHandler serves a written site folder, under prefix when given, as a
// well-set static host does (internal/static): the compressed copy the
// browser accepts, hashed names cached for good, the rest revalidated.
func siteHandler(dir, prefix string) http.Handler {
	return static.Handler(dir, prefix)
}

// newHandler describes the page for go-app. version changes whenever the
// wasm or an asset changes, so an installed copy updates itself.
func newHandler(prefix, version string, wasmSize int64) *app.Handler {
	h := &app.Handler{
		Name:            "Fieldhead",
		ShortName:       "Fieldhead",
		Title:           "Fieldhead — liquid line and pump sheet",
		Description:     "Offline calculator for liquid piping and pumps: energy balance between two points, head and pressure conversion, flow regime and friction.",
		Lang:            "en",
		Author:          "Fieldhead contributors",
		BackgroundColor: colourPaper,
		ThemeColor:      colourAccent,
		LoadingLabel:    "Fieldhead is starting…", // no percentage: loader.go
		Icon: app.Icon{
			Default:  "/web/icon-192.png",
			Large:    "/web/icon-512.png",
			Maskable: "/web/icon-512.png",
			SVG:      "/web/icon.svg",
		},
		Styles:             []string{"/web/fieldhead.css"},
		CacheableResources: []string{"/web/prerender.js", "/web/start.js", "/web/icon.svg", "/web/icon-192.png", "/web/icon-512.png"},
		RawHeaders: []string{
			// No paint before the written answer is read: the parser
			// otherwise yields a frame after each short stretch of the
			// page, and each partial layout delays the answer
			// (DEVELOPERS.md). prerender.js takes it away when the written
			// sheet is not the one shown.
			`<link rel="expect" href="#answer-value" blocking="render">`,
			`<script src="` + prefix + `/web/prerender.js"></script>`, // blocking: before the first paint (loader.go)
			`<meta name="color-scheme" content="light">`,
			`<meta name="format-detection" content="telephone=no">`,
		},
		StartURL:              "/index.html",
		Version:               version,
		ServiceWorkerTemplate: workerJS,
	}
	if wasmSize > 0 {
		h.WasmContentLength = strconv.FormatInt(wasmSize, 10)
	}
	if prefix != "" {
		h.Resources = app.PrefixedLocation(prefix)
	}
	return h
}

// writeSite generates the static site into out: go-app's pages, manifest
// and service worker, then our assets, icons and the wasm.
func writeSite(out, wasmPath, assets, prefix string) error {
	registerRoutes()
	wasm, err := os.ReadFile(wasmPath)
	if err != nil {
		return fmt.Errorf("reading the wasm (build it first with GOOS=js GOARCH=wasm): %w", err)
	}
	// No file and line tables in the runtime's function table: a panic's
	// trace names the functions but not their lines, for 99 KB less
	// brotli (app/internal/wasmdata); -lines keeps them.
	if !keepLines {
		if wasm, err = wasmdata.DropLines(wasm); err != nil {
			return fmt.Errorf("dropping the wasm's line tables (-lines keeps them): %w", err)
		}
	}
	// The same memory in a hundred-odd data segments instead of the
	// linker's 100 000: a tenth less brotli (app/internal/wasmdata).
	if wasm, err = wasmdata.Merge(wasm, wasmdata.DefaultGap); err != nil {
		return fmt.Errorf("joining the wasm's data segments: %w", err)
	}
	sum := sha256.New()
	sum.Write(wasm)
	type file struct {
		name string
		data []byte
	}
	var files []file
	err = filepath.WalkDir(assets, func(path string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		rel, err := filepath.Rel(assets, path)
		if err != nil {
			return err
		}
		data, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		files = append(files, file{rel, data})
		sum.Write([]byte(rel))
		sum.Write(data)
		return nil
	})
	if err != nil {
		return fmt.Errorf("reading assets: %w", err)
	}
	for _, size := range []int{192, 512} {
		png, err := iconPNG(size)
		if err != nil {
			return err
		}
		files = append(files, file{fmt.Sprintf("icon-%d.png", size), png})
	}
	sum.Write([]byte(prefix))
	sum.Write([]byte(buildStamp))
	version := hex.EncodeToString(sum.Sum(nil))[:12]

	if err := os.RemoveAll(out); err != nil {
		return err
	}
	if err := os.MkdirAll(filepath.Join(out, "web"), 0o755); err != nil {
		return err
	}
	if err := app.GenerateStaticWebsite(out, newHandler(prefix, version, int64(len(wasm)))); err != nil {
		return fmt.Errorf("generating the site: %w", err)
	}
	if err := addCSP(out); err != nil {
		return err
	}
	if err := fixMetadata(out, prefix); err != nil {
		return err
	}
	if err := patchSiteLoader(out); err != nil {
		return err
	}
	files = append(files, file{"app.wasm", wasm})
	for _, f := range files {
		dst := filepath.Join(out, "web", f.name)
		if err := os.MkdirAll(filepath.Dir(dst), 0o755); err != nil {
			return err
		}
		if err := os.WriteFile(dst, f.data, 0o644); err != nil {
			return err
		}
	}
	if _, err := os.Stat(filepath.Join(out, "index.html")); err != nil {
		return errors.New("the generated site has no index.html")
	}
	// For transfer: content-hashed names, then a brotli and a gzip copy
	// of each text and wasm file (internal/static).
	renames, err := static.Fingerprint(out, prefix)
	if err != nil {
		return err
	}
	if err := static.Compress(out, compressCache); err != nil {
		return err
	}
	if !wasmAlias {
		return nil
	}
	hashedWasm := strings.TrimPrefix(renames[prefix+"/web/app.wasm"], prefix+"/web/")
	if hashedWasm == "" {
		return errors.New("the wasm was not given a hashed name")
	}
	return os.Symlink(hashedWasm, filepath.Join(out, "web", "app.wasm"))
}

// keepLines (flag -lines) ships the wasm with the runtime's file and
// line tables, as the linker wrote them.
var keepLines bool

// wasmAlias (flag -wasm-alias) keeps the wasm's build name, web/app.wasm,
// in a written site as a symbolic link to its hashed name: the browser
// tests find the wasm of a built site by that name. No page requests it;
// `make dist` leaves it out.
var wasmAlias = true

// compressCache keeps the compressed copies between builds (flag -cache):
// brotli's best quality takes most of a minute on the wasm.
var compressCache = func() string {
	if d, err := os.UserCacheDir(); err == nil {
		return filepath.Join(d, "fieldhead", "compressed")
	}
	return ""
}()

// fixMetadata gives the manifest an id (the site's path, so an installed
// app keeps its identity across versions) and drops go-app's placeholder
// og:url and og:image, which name no address ("https://").
func fixMetadata(out, prefix string) error {
	mp := filepath.Join(out, "manifest.webmanifest")
	b, err := os.ReadFile(mp)
	if err != nil {
		return err
	}
	var m map[string]any
	if err := json.Unmarshal(b, &m); err != nil {
		return err
	}
	m["id"] = prefix + "/"
	// The PNG icons only: to judge whether the site can be installed, the
	// browser fetches the manifest's best icon on every visit, and draws an
	// SVG one with a document of its own on the page's main thread (about
	// 15–30 ms at 4× CPU during an offline reload, make bench).
	if icons, ok := m["icons"].([]any); ok {
		var png []any
		for _, ic := range icons {
			if o, ok := ic.(map[string]any); ok && o["type"] != "image/svg+xml" {
				png = append(png, ic)
			}
		}
		m["icons"] = png
	}
	if b, err = json.Marshal(m); err != nil {
		return err
	}
	if err := os.WriteFile(mp, b, 0o644); err != nil {
		return err
	}
	return filepath.WalkDir(out, func(p string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() || !strings.HasSuffix(p, ".html") {
			return err
		}
		page, err := os.ReadFile(p)
		if err != nil {
			return err
		}
		// go-app writes a tag's attributes in map order: match each meta
		// tag whole, whatever the order.
		page = metaTag.ReplaceAllFunc(page, func(tag []byte) []byte {
			if bytes.Contains(tag, []byte(`content="https://"`)) &&
				(bytes.Contains(tag, []byte(`property="og:url"`)) || bytes.Contains(tag, []byte(`property="og:image"`))) {
				return nil
			}
			return tag
		})
		if page, err = patchLoaderHTML(page); err != nil {
			return fmt.Errorf("%s: %w", p, err)
		}
		if page, err = startCompileFirst(page, prefix); err != nil {
			return fmt.Errorf("%s: %w", p, err)
		}
		// The tab's icon as a PNG: the browser draws an SVG icon with a
		// document of its own on the page's main thread, in the middle of
		// the load (about 60 ms at 4× CPU on a cold link, make bench).
		icons := 0
		page = iconTag.ReplaceAllFunc(page, func([]byte) []byte {
			icons++
			return []byte(`<link rel="icon" type="image/png" sizes="192x192" href="` + prefix + `/web/icon-192.png">`)
		})
		if icons != 1 {
			return fmt.Errorf("%s: the tab's icon found %d times, want once", p, icons)
		}
		return os.WriteFile(p, page, 0o644)
	})
}

// metaTag matches one <meta …> tag.
var metaTag = regexp.MustCompile(`<meta\s[^>]*>`)

// iconTag is go-app's <link rel="icon">, its attributes in any order.
var iconTag = regexp.MustCompile(`<link [^>]*rel="icon"[^>]*>`)
