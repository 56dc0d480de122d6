//go:build !wasm

package main

import (
	"fmt"
	"math"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
	"fieldhead/calc/scenario/present"
)

// The contrast of the palette in web/fieldhead.css, by the formulas of
// WCAG 2.1 (W3C Recommendation, 2018/2023): "relative luminance" and
// "contrast ratio" in its definitions section; the thresholds of
// SC 1.4.3 Contrast (Minimum) — 4.5:1 for text, 3:1 for large text
// (at least 18 pt, or 14 pt bold) — and SC 1.4.11 Non-text Contrast — 3:1
// for user-interface components and graphical objects.
//
// The pairs are found in the stylesheet itself, so a new rule is checked
// without anyone listing it:
//   - a rule that sets color and background: that pair (every colour of a
//     gradient background);
//   - a rule that sets color only: against the background of the rule its
//     selector descends from (".tab.on .tab-hint" sits on ".tab.on"), else
//     against the page's two surfaces, the paper and the white cards;
//   - a rule that sets a background only: every text colour that sits on
//     the surfaces must also read on it, since any text may land there;
//   - the non-text parts listed in uiPairs (focus ring, borders of inputs,
//     bars, hazard stripes) at 3:1.
// Print rules are left out (paper, black on white).

// rgb is an sRGB colour, 0–255 per channel.
type rgb struct{ r, g, b float64 }

func (c rgb) String() string { return fmt.Sprintf("#%02x%02x%02x", int(c.r), int(c.g), int(c.b)) }

// luminance is the relative luminance of WCAG 2.1 (definitions): each
// channel c/255 linearised as c/12.92 at or below 0.03928, else
// ((c+0.055)/1.055)^2.4; L = 0.2126 R + 0.7152 G + 0.0722 B.
func luminance(c rgb) float64 {
	lin := func(v float64) float64 {
		v /= 255
		if v <= 0.03928 {
			return v / 12.92
		}
		return math.Pow((v+0.055)/1.055, 2.4)
	}
	return 0.2126*lin(c.r) + 0.7152*lin(c.g) + 0.0722*lin(c.b)
}

// contrast is the contrast ratio of WCAG 2.1: (L1 + 0.05) / (L2 + 0.05),
// L1 the lighter.
func contrast(a, b rgb) float64 {
	la, lb := luminance(a), luminance(b)
	if la < lb {
		la, lb = lb, la
	}
	return (la + 0.05) / (lb + 0.05)
}

func TestContrastFormula(t *testing.T) {
	// WCAG 2.1, definition of contrast ratio: ratios range from 1:1 to 21:1
	// (black on white).
	if got := contrast(rgb{0, 0, 0}, rgb{255, 255, 255}); math.Abs(got-21) > 1e-9 {
		t.Errorf("black on white = %.4f, want 21", got)
	}
	if got := contrast(rgb{119, 119, 119}, rgb{119, 119, 119}); got != 1 {
		t.Errorf("a colour on itself = %.4f, want 1", got)
	}
	// From memory: #767676 on white is the darkest common grey at about
	// 4.54:1, just above the 4.5:1 of SC 1.4.3; #777777 falls just below.
	if got := contrast(rgb{0x76, 0x76, 0x76}, rgb{255, 255, 255}); got < 4.5 || got > 4.6 {
		t.Errorf("#767676 on white = %.3f, want about 4.54", got)
	}
	if got := contrast(rgb{0x77, 0x77, 0x77}, rgb{255, 255, 255}); got >= 4.5 {
		t.Errorf("#777777 on white = %.3f, want just under 4.5", got)
	}
}

// cssRule is one rule of the stylesheet: a single selector and its
// declarations (a rule with a selector list becomes one per selector).
type cssRule struct {
	sel   string
	decls map[string]string
	print bool // inside @media print
}

// parseCSS reads the rules of a stylesheet without comments. Nested
// at-rules (@media) are opened and their rules kept, marked if print.
func parseCSS(src string) []cssRule {
	src = regexp.MustCompile(`(?s)/\*.*?\*/`).ReplaceAllString(src, "")
	var out []cssRule
	var stack []string // preludes of the open blocks
	start := 0
	for i := 0; i < len(src); i++ {
		switch src[i] {
		case '{':
			prelude := strings.TrimSpace(src[start:i])
			if j := strings.LastIndexAny(prelude, ";}"); j >= 0 {
				prelude = strings.TrimSpace(prelude[j+1:])
			}
			stack = append(stack, prelude)
			start = i + 1
		case '}':
			if len(stack) == 0 {
				start = i + 1
				continue
			}
			prelude := stack[len(stack)-1]
			stack = stack[:len(stack)-1]
			body := src[start:i]
			start = i + 1
			if strings.HasPrefix(prelude, "@") {
				continue // the end of an @media block
			}
			print := false
			for _, p := range stack {
				if strings.Contains(p, "print") {
					print = true
				}
			}
			decls := map[string]string{}
			for _, d := range strings.Split(body, ";") {
				k, v, ok := strings.Cut(d, ":")
				if ok {
					v = strings.TrimSpace(strings.TrimSuffix(strings.TrimSpace(v), "!important"))
					decls[strings.TrimSpace(k)] = v
				}
			}
			for _, sel := range strings.Split(prelude, ",") {
				out = append(out, cssRule{sel: strings.Join(strings.Fields(sel), " "), decls: decls, print: print})
			}
		}
	}
	return out
}

// palette holds the custom properties of :root.
type palette map[string]string

// colours resolves the colours in a CSS value: #rgb, #rrggbb and
// var(--name) of the palette, in order. Keywords that paint nothing of
// their own (inherit, currentColor, transparent, none) give none. Any
// other colour form is an error, so a new notation cannot slip past.
func (p palette) colours(v string) ([]rgb, error) {
	var out []rgb
	v = regexp.MustCompile(`var\(\s*(--[a-z0-9-]+)\s*\)`).ReplaceAllStringFunc(v, func(m string) string {
		name := regexp.MustCompile(`--[a-z0-9-]+`).FindString(m)
		if c, ok := p[name]; ok {
			return c
		}
		return "UNKNOWN(" + name + ")"
	})
	if strings.Contains(v, "UNKNOWN(") {
		return nil, fmt.Errorf("unknown custom property in %q", v)
	}
	for _, bad := range []string{"rgb(", "rgba(", "hsl(", "hwb(", "lab(", "lch(", "oklab(", "oklch(", "color("} {
		if strings.Contains(v, bad) {
			return nil, fmt.Errorf("colour notation %s in %q: use #rrggbb or a palette variable", bad, v)
		}
	}
	for _, word := range strings.FieldsFunc(v, func(r rune) bool { return r == ' ' || r == ',' || r == '(' || r == ')' }) {
		if named[strings.ToLower(word)] {
			return nil, fmt.Errorf("named colour %q in %q: use #rrggbb or a palette variable", word, v)
		}
	}
	for _, h := range regexp.MustCompile(`#[0-9a-fA-F]{3,8}\b`).FindAllString(v, -1) {
		c, err := parseHex(h)
		if err != nil {
			return nil, err
		}
		out = append(out, c)
	}
	return out, nil
}

// named are CSS colour names the palette must not use (a short list of the
// likely ones; the check is a guard, not a CSS validator).
var named = map[string]bool{"black": true, "white": true, "red": true, "green": true, "blue": true, "yellow": true,
	"orange": true, "gray": true, "grey": true, "silver": true, "navy": true, "maroon": true, "purple": true}

func parseHex(h string) (rgb, error) {
	h = strings.TrimPrefix(h, "#")
	switch len(h) {
	case 3:
		h = string([]byte{h[0], h[0], h[1], h[1], h[2], h[2]})
	case 6:
	default:
		return rgb{}, fmt.Errorf("colour #%s: use #rgb or #rrggbb (no transparency, it hides the real contrast)", h)
	}
	n, err := strconv.ParseUint(h, 16, 32)
	if err != nil {
		return rgb{}, err
	}
	return rgb{float64(n >> 16 & 255), float64(n >> 8 & 255), float64(n & 255)}, nil
}

// graphics are selectors whose background is a shape, not a surface for
// text; they are checked as non-text in uiPairs.
var graphics = map[string]bool{".hbar": true, ".hbar.neg": true, ".hbar.unknown": true, ".btrack": true}

// uiPairs are the non-text parts, SC 1.4.11, 3:1: the focus ring against
// what it is drawn on, the border of inputs, the bars against their track,
// the hazard stripes.
var uiPairs = []struct{ what, fg, bg string }{
	{"focus ring on the paper", "var(--accent)", "var(--paper)"},
	{"focus ring on a card", "var(--accent)", "#fff"},
	{"input border on a card", "var(--ink)", "#fff"},
	{"button border on the paper", "var(--ink)", "var(--paper)"},
	{"bar on its track", "var(--ink)", "var(--track)"},
	{"the unknown's bar on its track", "var(--accent)", "var(--track)"},
	{"hazard stripe of a warning", "var(--ink)", "#fff"},
	{"answer card's frame on the paper", "var(--accent)", "var(--paper)"},
}

// largeText reports whether a rule's own font size makes its text "large"
// under SC 1.4.3 (18 pt = 24 px, or 14 pt ≈ 18.7 px bold), taking the
// root size at its smallest, 17 px on phones.
func largeText(d map[string]string) bool {
	const root = 17.0
	m := regexp.MustCompile(`^([0-9.]+)rem$`).FindStringSubmatch(d["font-size"])
	if m == nil {
		return false
	}
	px, _ := strconv.ParseFloat(m[1], 64)
	px *= root
	w, _ := strconv.Atoi(d["font-weight"])
	return px >= 24 || (px >= 18.66 && w >= 700)
}

func TestPaletteContrast(t *testing.T) {
	b, err := os.ReadFile(filepath.Join("..", "web", "fieldhead.css"))
	if err != nil {
		t.Fatal(err)
	}
	rules := parseCSS(string(b))
	pal := palette{}
	bySel := map[string]map[string]string{}
	for _, r := range rules {
		if r.sel == ":root" {
			for k, v := range r.decls {
				if strings.HasPrefix(k, "--") {
					pal[k] = v
				}
			}
		}
		if !r.print {
			if bySel[r.sel] == nil {
				bySel[r.sel] = map[string]string{}
			}
			for k, v := range r.decls {
				bySel[r.sel][k] = v
			}
		}
	}
	for _, need := range []string{"--paper", "--ink", "--ink-2", "--accent", "--accent-ink"} {
		if pal[need] == "" {
			t.Fatalf("the palette has no %s", need)
		}
	}
	bgOf := func(d map[string]string) string {
		if v := d["background-color"]; v != "" {
			return v
		}
		return d["background"]
	}
	must := func(v string) []rgb {
		t.Helper()
		cs, err := pal.colours(v)
		if err != nil {
			t.Fatal(err)
		}
		return cs
	}
	surfaces := append(must(bgOf(bySel["html"])), must(bgOf(bySel[".card"]))...)
	if len(surfaces) != 2 {
		t.Fatalf("want the paper (html) and the card (.card) surfaces, got %v", surfaces)
	}

	type pair struct {
		where  string
		fg, bg rgb
		min    float64
	}
	var pairs []pair
	add := func(where string, fg, bg []rgb, min float64) {
		for _, f := range fg {
			for _, g := range bg {
				pairs = append(pairs, pair{where, f, g, min})
			}
		}
	}
	var surfaceText []rgb // text colours that sit on the surfaces
	var bgOnly []struct {
		sel string
		bg  []rgb
	}
	sels := make([]string, 0, len(bySel))
	for s := range bySel {
		sels = append(sels, s)
	}
	sort.Strings(sels)
	for _, sel := range sels {
		d := bySel[sel]
		if graphics[sel] || sel == ":root" {
			continue
		}
		if (strings.HasSuffix(sel, "::before") || strings.HasSuffix(sel, "::after")) && (d["content"] == `""` || d["content"] == `''`) {
			continue // a drawn shape (a stripe), checked in uiPairs
		}
		fg, bg := must(d["color"]), must(bgOf(d))
		min := 4.5
		if largeText(d) {
			min = 3
		}
		switch {
		case len(fg) > 0 && len(bg) > 0:
			add(sel, fg, bg, min)
		case len(fg) > 0:
			// On the background of the rule it descends from, else on the surfaces.
			under := surfaces
			for s := sel; strings.Contains(s, " "); {
				s = s[:strings.LastIndex(s, " ")]
				if pd, ok := bySel[s]; ok && bgOf(pd) != "" {
					under = must(bgOf(pd))
					break
				}
			}
			add(sel, fg, under, min)
			if len(under) == 2 && under[0] == surfaces[0] {
				surfaceText = append(surfaceText, fg...)
			}
		case len(bg) > 0:
			bgOnly = append(bgOnly, struct {
				sel string
				bg  []rgb
			}{sel, bg})
		}
	}
	// Body text is a text colour on the surfaces too.
	surfaceText = append(surfaceText, must(bySel["html"]["color"])...)
	for _, s := range bgOnly {
		add(s.sel+" (any text on it)", surfaceText, s.bg, 4.5)
	}
	for _, u := range uiPairs {
		add("non-text: "+u.what, must(u.fg), must(u.bg), 3)
	}

	seen := map[string]bool{}
	failed := 0
	lowest, lowestAt := math.Inf(1), ""
	for _, p := range pairs {
		key := p.where + p.fg.String() + p.bg.String()
		if seen[key] {
			continue
		}
		seen[key] = true
		r := contrast(p.fg, p.bg)
		if r < p.min {
			failed++
			t.Errorf("%s: %s on %s is %.2f:1, below %.1f:1", p.where, p.fg, p.bg, r, p.min)
		}
		if r/p.min < lowest {
			lowest, lowestAt = r/p.min, fmt.Sprintf("%s: %s on %s, %.2f:1 against %.1f:1", p.where, p.fg, p.bg, r, p.min)
		}
	}
	if len(seen) < 20 {
		t.Errorf("only %d pairs found: the stylesheet parser is missing rules", len(seen))
	}
	t.Logf("%d colour pairs checked, %d below the WCAG 2.1 AA minimum; the closest is %s", len(seen), failed, lowestAt)
}

// TestChartContrast draws the demo's pump chart (in US units, with
// accuracies: every kind of mark) and the profile chart, and checks every
// colour the SVG uses for text against the chart's white paper at 4.5:1
// (WCAG 2.1 SC 1.4.3), and every line and mark stroke at 3:1 (SC 1.4.11,
// graphical objects), except the grid, the hatching and the tints, which
// carry no meaning of their own (the bands are named in words).
func TestChartContrast(t *testing.T) {
	sc := scenario.Demo()
	for _, kv := range [][2]string{{"units", "us"}, {"gcs", "1.6%"}, {"gss", "250kPa"}, {"gcd", "1.6%"}, {"gsd", "1000kPa"},
		{"uqm", "2%"}, {"grade", "2B"}, {"qsp", "70L/s"}} {
		if err := sc.Set(kv[0], kv[1]); err != nil {
			t.Fatal(err)
		}
	}
	paper, _ := parseHex("#ffffff")
	decorative := map[string]bool{"#cdd2d6": true, "#a9b0b6": true, "#e9e6da": true, "#eceae2": true, "#f1f2f3": true, "#ffffff": true}
	for _, view := range []string{"pump", "line"} {
		_ = sc.Set("view", view)
		d := scenario.NewDraft(sc)
		sh := present.Build(&d, scenario.Evaluate(scenario.Read(sc)))
		var svg string
		for _, c := range sh.Cards {
			for _, bl := range c.Blocks {
				if bl.Chart != nil {
					svg += chartSVG(bl.Chart, chartWidth(), false) + chartSVG(bl.Chart, printChartWidth, true)
				}
			}
		}
		if !strings.Contains(svg, "<text") {
			t.Fatalf("%s view: no chart drawn", view)
		}
		text := regexp.MustCompile(`<text[^>]* fill="(#[0-9a-fA-F]{3,6})"`)
		for _, m := range text.FindAllStringSubmatch(svg, -1) {
			c, err := parseHex(m[1])
			if err != nil {
				t.Fatal(err)
			}
			if r := contrast(c, paper); r < 4.5 {
				t.Errorf("%s view: chart text in %s is %.2f:1 on white, under 4.5:1", view, m[1], r)
			}
		}
		for _, m := range regexp.MustCompile(`stroke="(#[0-9a-fA-F]{3,6})"`).FindAllStringSubmatch(svg, -1) {
			if decorative[strings.ToLower(m[1])] {
				continue
			}
			c, _ := parseHex(m[1])
			if r := contrast(c, paper); r < 3 {
				t.Errorf("%s view: chart stroke %s is %.2f:1 on white, under 3:1", view, m[1], r)
			}
		}
	}
}
