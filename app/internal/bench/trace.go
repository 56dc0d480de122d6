//go:build !wasm

package main

import (
	"encoding/json"
	"flag"
	"log"
	"os"
	"strings"
	"sync"

	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/tracing"
	"github.com/chromedp/chromedp"
)

// traceTo is -trace: with -return-only, Chromium's trace of one repeat
// visit (the last; of the last offline reload too, beside it); with
// -cold-only, of the last cold load; with -edits-only, of the timed edits;
// with -phone-only, of the phone-class first visit (and of the bare
// page's, beside it);
// written in the trace event format that chrome://tracing and Perfetto read.
var traceTo = flag.String("trace", "", "with -return-only, -cold-only, -edits-only or -phone-only: write Chromium's trace to this file (-edits-only: of the timed edits; -return-only: of the last repeat visit, and of the last offline reload to its name with -offline; -cold-only: of the last cold load, to its name with -cold; -phone-only: of the first visit to a never-seen link, and of the bare page's to its name with -bare)")

// traceLast starts tracing load i of -loads when it is the last (traceIf).
func traceLast(s *browserSession, i int, suffix string) func() {
	if i != *loads-1 {
		return func() {}
	}
	return traceIf(s, suffix)
}

// traceIf starts tracing when -trace is given, into its file with suffix
// before ".json"; it returns what stops the trace (nothing to stop
// otherwise).
func traceIf(s *browserSession, suffix string) func() {
	if *traceTo == "" {
		return func() {}
	}
	return startTrace(s, strings.TrimSuffix(*traceTo, ".json")+suffix+".json")
}

// startTrace starts tracing the page of s and returns the function that
// stops it and writes the trace to path.
func startTrace(s *browserSession, path string) func() {
	done := make(chan struct{})
	var once sync.Once // a listener stays registered: a later trace's end reaches it too
	var events []any
	if err := chromedp.Listen(s.ctx, func(ev any) {
		switch e := ev.(type) {
		case *tracing.EventDataCollected:
			for _, v := range e.Value {
				events = append(events, v)
			}
		case *tracing.EventTracingComplete:
			once.Do(func() { close(done) })
		}
	}); err != nil {
		log.Fatal(err)
	}
	cats := []string{"devtools.timeline", "v8.execute", "blink.user_timing", "loading", "disabled-by-default-devtools.timeline", "disabled-by-default-devtools.timeline.frame", "toplevel", "blink", "v8", "disabled-by-default-v8.compile"}
	if _, err := chromedp.Call(s.ctx, tracing.Start, tracing.StartParams{TraceConfig: &tracing.TraceConfig{IncludedCategories: cats}}); err != nil {
		log.Fatal(err)
	}
	return func() {
		if _, err := chromedp.Call(s.ctx, tracing.End, cdp.Empty{}); err != nil {
			log.Fatal(err)
		}
		<-done
		b, err := json.Marshal(map[string]any{"traceEvents": events})
		if err != nil {
			log.Fatal(err)
		}
		if err := os.WriteFile(path, b, 0o644); err != nil {
			log.Fatal(err)
		}
		log.Printf("trace: %s (%d events)", path, len(events))
	}
}
