//go:build !wasm

package main

import (
	"bytes"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
)

// contentSecurityPolicy is the policy of every page. Static hosts cannot be
// relied on to send headers, so it travels in the page as a <meta
// http-equiv> element, placed first in <head> so that it governs every
// element after it.
//
//   - Everything comes from the page's own origin ('self'): scripts, the
//     stylesheets, images, the manifest, the service worker and any fetch.
//     No fonts, scripts or styles from anywhere else.
//   - 'wasm-unsafe-eval' lets the page compile app.wasm, and allows nothing
//     else: no eval, no new Function.
//   - go-app's generated page has no inline script (its bootstrap is
//     app.js), so no hash or 'unsafe-inline' is needed for scripts. Nor
//     for styles: the sheet draws no style attributes (bar widths are data
//     attributes matched by the stylesheet), so an injected style="" is
//     refused too.
//   - object-src 'none', base-uri 'self' and form-action 'self' close the
//     remaining ways to load or send elsewhere. frame-ancestors cannot be
//     set from a <meta> element; a host that can send headers should add
//     it.
const contentSecurityPolicy = "default-src 'self'; " +
	"script-src 'self' 'wasm-unsafe-eval'; " +
	"style-src 'self'; " +
	"img-src 'self'; " +
	"font-src 'self'; " +
	"connect-src 'self'; " +
	"manifest-src 'self'; " +
	"worker-src 'self'; " +
	"object-src 'none'; " +
	"base-uri 'self'; " +
	"form-action 'self'"

// cspMeta is the element that carries the policy.
const cspMeta = `<meta http-equiv="Content-Security-Policy" content="` + contentSecurityPolicy + `">`

// buildStamp is mixed into the site's version (flag -stamp): a deployment
// can force open pages to offer an update, and the browser test deploys a
// "changed build" this way.
var buildStamp string

// addCSP puts the policy first in the <head> of every generated page,
// right after the character set (which must stay in the first bytes).
func addCSP(out string) error {
	return filepath.WalkDir(out, func(path string, d fs.DirEntry, err error) error {
		if err != nil || d.IsDir() || !strings.HasSuffix(path, ".html") {
			return err
		}
		page, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		if bytes.Contains(page, []byte("Content-Security-Policy")) {
			return nil
		}
		charset := []byte(`<meta charset="UTF-8">`)
		i := bytes.Index(page, charset)
		if i < 0 {
			return fmt.Errorf("%s: no <meta charset> to put the Content-Security-Policy after", path)
		}
		at := i + len(charset)
		var b bytes.Buffer
		b.Write(page[:at])
		b.WriteString("\n    " + cspMeta)
		b.Write(page[at:])
		return os.WriteFile(path, b.Bytes(), 0o644)
	})
}
