//go:build !wasm

package app

import "regexp"

// Fieldhead: RouteWithRegexp is left out of the wasm build (with
// regexp, which nothing else in the browser needs); route a path with
// Route there.

// RouteWithRegexp associates a URL path pattern with a function that generates
// a new Composer component. When a user navigates to a URL path that matches
// the given regular expression pattern, the function newComponent is invoked to
// create and mount the associated component.
//
// Example:
//
//	RouteWithRegexp("^/users/[0-9]+$", func() Composer {
//	    return NewUserComponent()
//	})
func RouteWithRegexp(pattern string, newComponent func() Composer) {
	routes.routeWithRegexp(pattern, newComponent)
}

func (r *router) routeWithRegexp(pattern string, newComponent func() Composer) {
	r.mu.Lock()
	defer r.mu.Unlock()

	r.routesWithRegexp = append(r.routesWithRegexp, regexpRoute{
		regexp:       regexp.MustCompile(pattern),
		newComponent: newComponent,
	})
}
