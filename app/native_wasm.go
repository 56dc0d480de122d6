//go:build wasm

package main

import (
	"strings"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// native does nothing in the browser build.
func native() {}

// routeAnyPath routes the page's own path to the sheet. The page has no
// links to other paths, so that is the only one it can show; go-app's
// RouteWithRegexp, which the site writer uses, is left out of the wasm
// with regexp (app/third_party/README.md). The path is the one go-app looks
// up: without the site's prefix.
func routeAnyPath() {
	p := strings.TrimPrefix(app.Window().URL().Path, app.Getenv("GOAPP_ROOT_PREFIX"))
	if !strings.HasPrefix(p, "/") {
		p = "/" + p
	}
	app.Route(p, newSheet)
}
