package main

import (
	"strings"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// Updates. The service worker (worker.go) caches each version of the site
// under its own name, installs a new version as soon as the browser finds a
// changed app-worker.js (on any page load with a network), takes over the
// open pages and deletes the older caches. The running page keeps the code
// it started with; this file notices the takeover and offers a reload.
//
// go-app reports an installed worker through OnAppUpdate, but also on the
// very first visit (the first worker taking control looks the same), and it
// misses a worker found before its listener was attached. So both signals,
// go-app's and the worker's controllerchange event, lead to one check: is
// there a cache of this site for a version other than the page's own?

// OnAppUpdate is go-app's signal that a service worker was installed.
func (s *sheet) OnAppUpdate(ctx app.Context) {
	s.checkUpdate(ctx)
}

// watchUpdates is called once the sheet is on screen.
func (s *sheet) watchUpdates(ctx app.Context) {
	if !app.IsClient {
		return
	}
	sw := app.Window().Get("navigator").Get("serviceWorker")
	if !sw.Truthy() {
		return
	}
	changed := app.FuncOf(func(this app.Value, args []app.Value) any {
		ctx.Dispatch(s.checkUpdate)
		return nil
	})
	sw.Call("addEventListener", "controllerchange", changed) // kept for the page's life
	s.checkUpdate(ctx)
}

// checkUpdate looks for a cache of this site under another version and, if
// there is one, shows the update banner.
func (s *sheet) checkUpdate(ctx app.Context) {
	defer s.contain("checking for a new version")
	win := app.Window()
	ctrl := win.Get("navigator").Get("serviceWorker").Get("controller")
	caches := win.Get("caches")
	if !ctrl.Truthy() || !caches.Truthy() {
		return
	}
	// The worker names its caches "fieldhead@<site folder URL>#<version>".
	scope := win.Get("URL").New("./", ctrl.Get("scriptURL")).Get("href").String()
	prefix := "fieldhead@" + scope + "#"
	mine := prefix + app.Getenv("GOAPP_VERSION")
	var done, failed app.Func
	release := func() {
		done.Release()
		failed.Release()
	}
	done = app.FuncOf(func(this app.Value, args []app.Value) any {
		defer release()
		keys := args[0]
		for i := 0; i < keys.Length(); i++ {
			k := keys.Index(i).String()
			if strings.HasPrefix(k, prefix) && k != mine {
				ctx.Dispatch(func(ctx app.Context) { s.update = true })
				break
			}
		}
		return nil
	})
	failed = app.FuncOf(func(this app.Value, args []app.Value) any {
		release()
		return nil
	})
	caches.Call("keys").Call("then", done, failed)
}

// updateBanner offers the installed new version. Reloading keeps the sheet:
// the scenario is in the address bar and in localStorage after every edit.
func (s *sheet) updateBanner() app.UI {
	if !s.update {
		return nil
	}
	return app.Div().Class("banner update").ID("update").Attr("role", "status").Body(
		spanText("tag", "New"),
		app.Text(" An updated Fieldhead is installed on this device. Switch to it now; this sheet and every input come along. "),
		act("update-reload", "act main", "Switch to the update", func(ctx app.Context, e app.Event) {
			defer s.contain("reloading for the new version")
			s.evaluate() // the link and the saved copy hold the latest inputs
			ctx.Reload()
		}),
	)
}
