// Command app is Fieldhead: in the browser (GOOS=js GOARCH=wasm) it runs the
// calculator page; natively it writes the static site and can serve it.
//
// Everything the page computes comes from fieldhead/calc/scenario; this
// package only renders inputs and results and keeps the share link, the
// saved state and the page chrome.
package main

import (
	"runtime/debug"
	"sync"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

func main() {
	if warmUp() { // in the worker that compiles the wasm (warm.go)
		return
	}
	registerRoutes()
	if app.IsClient {
		// The live heap is 1–2 MB; the collector's default goal (twice that,
		// at least 4 MB) collects every dozen edits or so, a pause of several
		// ms on a slow phone mid-edit. Five times (at least 16 MB) is rarer.
		debug.SetGCPercent(400)
		markTime("fieldhead-main") // the Go program started (make bench)
	}
	app.RunWhenOnBrowser()
	native() // not reached in the browser: RunWhenOnBrowser blocks there
}

var routesOnce sync.Once

// registerRoutes tells go-app which component each path shows. The site
// writer needs the routes too: an unrouted path pre-renders as "not found".
func registerRoutes() {
	routesOnce.Do(func() {
		app.Route("/", newSheet)
		// Any other path under the site (index.html, a bookmark with a
		// stray path) opens the same sheet: the query carries the scenario.
		routeAnyPath()
	})
}
