//go:build !wasm

package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"log"
	"os"
	"sort"
	"strconv"
	"strings"

	"github.com/chromedp/cdproto/cdp"
	"github.com/chromedp/cdproto/profiler"
	"github.com/chromedp/chromedp"
)

// editsOnly is -edits-only: one page load, then the timed edits, and
// with -profile Chromium's sampling profile of the timed edits, the
// functions that took the most time listed by their own time (the
// wasm's functions are named when the site's wasm keeps its name
// section: build it without -s for this).
func editsOnly(link string) {
	s := openShown(link)
	defer s.cancel()
	start := func() {
		if *profileTop <= 0 {
			return
		}
		if _, err := chromedp.Run(s.ctx, chromedp.Evaluate[string](mutationsJS)); err != nil {
			log.Fatal(err)
		}
		if _, err := chromedp.Call(s.ctx, profiler.Enable, cdp.Empty{}); err != nil {
			log.Fatal(err)
		}
		if _, err := chromedp.Call(s.ctx, profiler.SetSamplingInterval, profiler.SetSamplingIntervalParams{Interval: 100}); err != nil {
			log.Fatal(err)
		}
		if _, err := chromedp.Call(s.ctx, profiler.Start, cdp.Empty{}); err != nil {
			log.Fatal(err)
		}
	}
	var cpu0 float64
	stopTrace := func() {}
	times, phases := timeEdits(s, func() {
		if *traceTo != "" {
			stopTrace = startTrace(s, *traceTo)
		}
		if *floor {
			if _, err := chromedp.Run(s.ctx, chromedp.Evaluate[string](floorJS)); err != nil {
				log.Fatal(err)
			}
		}
		if *evalJS != "" {
			if _, err := chromedp.Run(s.ctx, chromedp.Evaluate[any](*evalJS)); err != nil {
				log.Fatal(err)
			}
		}
		start()
		cpu0 = rendererCPU(s.profile)
	})
	cpu := rendererCPU(s.profile) - cpu0
	stopTrace()
	var mean [4]float64
	for _, ph := range phases {
		for k := range mean {
			mean[k] += ph[k] / float64(len(times))
		}
	}
	fmt.Printf("edits %d, %g× CPU: p10 %.1f ms, p50 %.1f ms, p95 %.1f ms; phases (mean ms): keydown→input %.1f, input→DOM %.1f, DOM→frame %.1f, frame→painted %.1f\n",
		len(times), *throttle, percentile(times, 10), percentile(times, 50), percentile(times, 95), mean[0], mean[1], mean[2], mean[3])
	// Keys alternate, Backspace first (timeEdits): the flow goes from 45 to
	// 4 L/s and back, and the sheet's warnings with it.
	var del, dig []float64
	for i, t := range times {
		if (*warmup+i)%2 == 0 {
			del = append(del, t)
		} else {
			dig = append(dig, t)
		}
	}
	fmt.Printf("by key: Backspace p50 %.1f, p95 %.1f ms; a digit p50 %.1f, p95 %.1f ms\n", percentile(del, 50), percentile(del, 95), percentile(dig, 50), percentile(dig, 95))
	fmt.Printf("renderer CPU time per edit (unthrottled, less sensitive to the machine's load): %.1f ms\n", cpu/float64(len(times)))
	if *profileTop <= 0 {
		return
	}
	res, err := chromedp.Call(s.ctx, profiler.Stop, cdp.Empty{})
	if err != nil {
		log.Fatal(err)
	}
	printProfile(res.Profile, *profileTop)
	muts, err := chromedp.Run(s.ctx, chromedp.Evaluate[string](`JSON.stringify(Object.entries(window.fieldheadMutations).sort((a, b) => b[1] - a[1]).slice(0, 40))`))
	if err != nil {
		log.Fatal(err)
	}
	regions, err := chromedp.Run(s.ctx, chromedp.Evaluate[string](`[...document.querySelectorAll("#sheet > *, #sheet > main > *, section.card")].map(e => e.tagName.toLowerCase() + "." + e.className.split(" ")[0] + (e.id ? "#" + e.id : "") + ": " + e.getElementsByTagName("*").length).join("\\n")`))
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("\nelements under each part of the page:\n%s\n", regions)
	fmt.Printf("\nDOM mutations during the timed edits (kind, where: count):\n%s\n", strings.ReplaceAll(muts, "],[", "]\n["))
}

// floor is -floor: the timed edits never reach the Go program.
var floor = flag.Bool("floor", false, "with -edits-only: time the edits with the page's own part only (the box's input event stopped before the program; the answer's text set to the box's, in the same frame), the browser's floor under an edit on this page")

// evalJS is -eval: a script run in the page before the timed edits, to
// see what a change to the page would do before making it.
var evalJS = flag.String("eval", "", "with -edits-only: JavaScript to run in the page before the timed edits (an experiment on the page as loaded)")

// floorJS stops each input event of the flow box before the Go program
// sees it and writes the box's text into the answer, so that an edit costs
// only what the browser does: the key, the event, one changed text, the
// frame. It runs after editJS, whose own input listener (same node, same
// phase, added first) still records the event's time.
const floorJS = `(() => {
  const box = document.getElementById("in-q");
  const out = document.getElementById("answer-value");
  document.addEventListener("input", (e) => {
    if (e.target !== box) return;
    e.stopImmediatePropagation();
    out.textContent = box.value + " L/s";
  }, true);
  return "";
})()`

// mutationsJS counts the page's DOM mutations by kind and place.
const mutationsJS = `(() => {
  window.fieldheadMutations = {};
  const where = (n) => {
    const e = n.nodeType === 1 ? n : n.parentElement;
    if (!e) return "?";
    const card = e.closest("section");
    return e.tagName.toLowerCase() + (e.id ? "#" + e.id : "") + (card ? " in " + card.id : "");
  };
  new MutationObserver((rs) => {
    for (const r of rs) {
      const k = r.type + (r.attributeName ? ":" + r.attributeName : "") + " " + where(r.target);
      window.fieldheadMutations[k] = (window.fieldheadMutations[k] || 0) + 1;
    }
  }).observe(document.body, {childList: true, subtree: true, characterData: true, attributes: true});
  return "";
})()`

// profileJSON is -profile-json: where to write the whole profile too
// (Chromium's .cpuprofile form, which DevTools' Performance panel reads).
var profileJSON = flag.String("profile-json", "", "with -profile: also write the whole CPU profile to this file (a .cpuprofile DevTools reads)")

// printProfile lists the functions with the most samples at the top of
// the stack (self) and, for the same names, anywhere on it (total).
func printProfile(p *profiler.Profile, top int) {
	if *profileJSON != "" {
		if b, err := json.Marshal(p); err != nil {
			log.Print(err)
		} else if err := os.WriteFile(*profileJSON, b, 0o644); err != nil {
			log.Print(err)
		}
	}
	byID := map[int64]*profiler.ProfileNode{}
	parent := map[int64]int64{}
	for _, n := range p.Nodes {
		byID[n.ID] = n
		for _, c := range n.Children {
			parent[c] = n.ID
		}
	}
	name := func(n *profiler.ProfileNode) string {
		f := n.CallFrame.FunctionName
		if f == "" {
			f = "(anonymous)"
		}
		u := n.CallFrame.URL
		if i := strings.LastIndex(u, "/"); i >= 0 {
			u = u[i+1:]
		}
		if u != "" && !strings.HasSuffix(u, ".wasm") {
			f += " [" + u + "]"
		}
		return f
	}
	self := map[string]float64{}
	total := map[string]float64{}
	var all float64
	for i, id := range p.Samples {
		dt := 0.0
		if i+1 < len(p.TimeDeltas) {
			dt = float64(p.TimeDeltas[i+1]) / 1000
		}
		n := byID[id]
		all += dt
		self[name(n)] += dt
		seen := map[string]bool{}
		for cur, ok := id, true; ok; cur, ok = parent[cur] {
			k := name(byID[cur])
			if !seen[k] {
				seen[k] = true
				total[k] += dt
			}
		}
	}
	type row struct {
		k    string
		v, t float64
	}
	rows := func(m map[string]float64) []row {
		var out []row
		for k, v := range m {
			out = append(out, row{k, v, total[k]})
		}
		sort.Slice(out, func(i, j int) bool { return out[i].v > out[j].v })
		if len(out) > top {
			out = out[:top]
		}
		return out
	}
	fmt.Fprintf(os.Stdout, "profile: %.0f ms sampled\nself ms   total ms  function\n", all)
	for _, r := range rows(self) {
		fmt.Printf("%8.1f  %8.1f  %s\n", r.v, r.t, r.k)
	}
	fmt.Printf("\nby total:\n")
	for _, r := range rows(total) {
		fmt.Printf("%8.1f  %8.1f  %s\n", self[r.k], r.v, r.k)
	}
}

// rendererCPU is the CPU time, in ms, the renderer processes of the
// Chromium using profile have taken so far (Linux: /proc).
func rendererCPU(profile string) float64 {
	var total float64
	dirs, _ := os.ReadDir("/proc")
	for _, d := range dirs {
		if d.Name()[0] < '0' || d.Name()[0] > '9' {
			continue
		}
		cmd, err := os.ReadFile("/proc/" + d.Name() + "/cmdline")
		if err != nil || !strings.Contains(string(cmd), "--type=renderer") || !strings.Contains(string(cmd), profile) {
			continue
		}
		st, err := os.ReadFile("/proc/" + d.Name() + "/stat")
		if err != nil {
			continue
		}
		f := strings.Fields(string(st[strings.LastIndexByte(string(st), ')')+1:]))
		if len(f) < 13 {
			continue
		}
		ut, _ := strconv.ParseFloat(f[11], 64)
		stt, _ := strconv.ParseFloat(f[12], 64)
		total += (ut + stt) * 10 // clock ticks of 10 ms (USER_HZ 100)
	}
	return total
}

// startProfile starts Chromium's sampling profiler in the page of s and
// returns the function that stops it and lists the *profileTop functions
// that took the most time (a reload keeps the page's V8 isolate, so the
// profile spans it).
func startProfile(s *browserSession) func() {
	for _, err := range []error{
		func() error { _, err := chromedp.Call(s.ctx, profiler.Enable, cdp.Empty{}); return err }(),
		func() error {
			_, err := chromedp.Call(s.ctx, profiler.SetSamplingInterval, profiler.SetSamplingIntervalParams{Interval: 100})
			return err
		}(),
		func() error { _, err := chromedp.Call(s.ctx, profiler.Start, cdp.Empty{}); return err }(),
	} {
		if err != nil {
			log.Fatal(err)
		}
	}
	return func() {
		res, err := chromedp.Call(s.ctx, profiler.Stop, cdp.Empty{})
		if err != nil {
			log.Fatal(err)
		}
		printProfile(res.Profile, *profileTop)
	}
}
