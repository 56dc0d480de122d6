//go:build !wasm

// Package headless holds the one set of Chromium options that Fieldhead's
// browser tests and its benchmark start the browser with.
package headless

import "github.com/chromedp/chromedp"

// Options returns the allocator options for headless Chromium at path, at
// w×h, with the profile folder dir ("" lets chromedp make a temporary one).
// The background-networking flags keep Chromium from calling out to hosts
// this machine cannot reach; --no-sandbox is needed when running as root.
func Options(path, dir string, w, h int) []chromedp.ExecAllocatorOption {
	opts := []chromedp.ExecAllocatorOption{
		chromedp.ExecPath(path),
		chromedp.Headless,
		chromedp.NoSandbox,
		chromedp.DisableGPU,
		chromedp.NoFirstRun,
		chromedp.NoDefaultBrowserCheck,
		chromedp.Flag("disable-background-networking", true),
		chromedp.Flag("disable-component-update", true),
		chromedp.Flag("disable-sync", true),
		chromedp.Flag("disable-quic", true),
		chromedp.WindowSize(w, h),
	}
	if dir != "" {
		opts = append(opts, chromedp.UserDataDir(dir))
	}
	return opts
}
