// Package present is Fieldhead's view model: it turns a sheet being edited
// (scenario.Draft) and its result (scenario.Result) into what each card of
// the page shows, already worded and in the sheet's display units (SI, or
// US customary units in a US sheet: ft of liquid, psig and psia, gpm, °F,
// hp). Errors and warnings arrive structured from calc and scenario and are
// worded here. The page (app) only draws what Build returns.
package present

import (
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"
	"sync"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// builder carries one Build.
type builder struct {
	d      *scenario.Draft
	in     *scenario.Inputs // what the result was worked out from
	r      scenario.Result
	us     bool
	shown  map[string]bool // parameters a card draws (their problems are shown there)
	warned map[string]bool // warnings listed once
}

// Views lists the views a sheet can open on, with a hint of what each does.
var Views = []struct{ Key, Hint string }{
	{"balance", "two-point energy balance"},
	{"convert", "head ↔ pressure"},
	{"regime", "loss of a run, sizes"},
	{"line", "segments, EGL/HGL"},
	{"pump", "duty, NPSH, readings"},
	{"report", "the printed sheet"},
	{"book", "sheets on this device"},
}

// Build makes the view model of a sheet: d is the sheet being edited and r
// its result (scenario.Evaluate(scenario.Read(d.Scen))).
func Build(d *scenario.Draft, r scenario.Result) Sheet {
	b := &builder{d: d, in: &r.Inputs, r: r, us: r.US, shown: map[string]bool{}, warned: map[string]bool{}}
	sh := Sheet{View: b.view(), US: b.us, Cautions: Cautions, Methods: methodsOf(b.us)}
	sh.Name = b.in.Choice("name")
	if sh.Name == "" {
		sh.Name = "Untitled sheet"
	}
	sh.Title = b.plain("name", "", "", false)
	for _, v := range Views {
		label := v.Key
		for _, c := range scenario.Choices("view") {
			if c.Value == v.Key {
				label = c.Label
			}
		}
		sh.Tabs = append(sh.Tabs, Button{ID: "view-" + v.Key, Text: label, Hint: v.Hint, Class: "tab",
			On: v.Key == sh.View, Act: Action{Do: "choose", Param: "view", Value: v.Key}})
	}
	for _, c := range scenario.Choices("units") {
		sh.Units = append(sh.Units, Button{ID: "units-" + c.Value, Text: c.Label, Class: "seg",
			On: (c.Value == "us") == b.us, Act: Action{Do: "choose", Param: "units", Value: c.Value}})
	}
	switch sh.View {
	case "convert":
		sh.Cards = b.convertView()
	case "regime":
		sh.Cards = b.regimeView()
	case "line":
		sh.Cards = b.lineView()
	case "pump":
		sh.Cards = b.pumpView()
	case "report":
		sh.Cards = b.reportView()
	case "book":
		// The page adds the book's card (Book): the kept sheets are its own.
	default:
		sh.Cards = b.balanceView()
	}
	sh.Others = b.others(sh.View)
	if d.Unverified {
		sh.Unverified = "This sheet came from a link that arrived damaged, so no figure on it can be trusted yet. " +
			"Check the values marked at their boxes (and any the banner names) against the sender's, then confirm them."
		sh.Verify = Button{ID: "verify", Text: "The values are right", Label: "confirm that the values are the sender's", Class: "act", Act: Action{Do: "verify"}}
	}
	return sh
}

// view is the view the scenario opens on.
func (b *builder) view() string {
	v := b.d.View()
	for _, w := range Views {
		if w.Key == v {
			return v
		}
	}
	return "balance"
}

// solve is the parameter the balance solves for.
func (b *builder) solve() string {
	if v := b.in.Choice("solve"); v != "" {
		return v
	}
	return calc.SolvePumpHead.String()
}

// Figures in the sheet's units, a negative one with the minus sign
// (U+2212, minus) as the charts' ticks and the messages write it.

// show writes an SI value in the display unit of its dimension.
func (b *builder) show(v float64, dim calc.Dimension) string {
	return minus(scenario.Show(v, dim, b.us))
}

// head writes a head of the liquid (m or ft).
func (b *builder) head(v float64) string { return b.show(v, calc.Length) }

// param writes an SI value in a parameter's own display unit (mm or in for
// diameters, L/s or gpm for flows).
func (b *builder) param(p string, v float64) string { return minus(scenario.ShowParam(p, v, b.us)) }

// gauge and absolute write a pressure with its reference: "430.0 kPa
// gauge" or "62.37 psig".
func (b *builder) gauge(v float64) string    { return b.pressure(v, false) }
func (b *builder) absolute(v float64) string { return b.pressure(v, true) }

func (b *builder) pressure(v float64, abs bool) string {
	if b.us {
		t := minus(calc.FormatValue(v, "psi", 4))
		if abs {
			return t + "a"
		}
		return t + "g"
	}
	t := minus(calc.FormatValue(v, "kPa", 4))
	if abs {
		return t + " absolute"
	}
	return t + " gauge"
}

// figure writes a figure of a message: pressures as differences or as the
// message says (gauge or absolute is in its words), the rest in display
// units.
func (b *builder) figure(f calc.Figure) string { return b.show(f.Value, f.Dim) }

// percent writes a share (0.76) as a percentage.
func percent(v float64) string { return minus(calc.FormatValue(v, "%", 4)) }

// minus writes a negative figure with the minus sign (U+2212), as print
// does, not the hyphen: "−43.37 m", "got −40 °C".
func minus(s string) string {
	if strings.HasPrefix(s, "-") {
		return "−" + s[1:]
	}
	return s
}

// whole joins a figure's words with no-break spaces (U+00A0) where a line
// must not break inside it: "± 1.490 m" stays together, never "± 1.490"
// with the "m)" alone on the next line of a large fact.
func whole(s string) string { return strings.ReplaceAll(s, " ", "\u00a0") }

// number writes a dimensionless figure to digits significant digits, with
// the minus sign as every figure shown: wider than the hyphen, it reads at
// arm's length. Links, boxes and the CSV keep the hyphen their parsers read
// (calc.FormatNumber).
func number(x float64, digits int) string { return minus(calc.FormatNumber(x, digits)) }

// plainNumber writes a dimensionless number for reading at a glance:
// three significant digits, thousands grouped with narrow no-break spaces
// (U+202F; a thin space, U+2009, let a line break inside the number).
func plainNumber(x float64) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "—"
	}
	if math.Abs(x) < 1000 {
		return number(x, 3)
	}
	mag := math.Pow(10, math.Floor(math.Log10(math.Abs(x)))-2)
	digits := strconv.FormatFloat(math.Abs(math.Round(x/mag)*mag), 'f', 0, 64)
	var out strings.Builder
	if x < 0 {
		out.WriteString("−")
	}
	for i, c := range digits {
		if i > 0 && (len(digits)-i)%3 == 0 {
			out.WriteString("\u202f") // narrow no-break space: a line never breaks inside the number
		}
		out.WriteRune(c)
	}
	return out.String()
}

// Problems, worded.

// problem is the worded problem with p, without the parameter's name ("" if none).
func (b *builder) problem(p string) string {
	fe := b.r.Errors[p]
	if fe == nil {
		return ""
	}
	return ErrorText(fe, b.us)
}

// named is p's problem preceded by its label, for lists.
func (b *builder) named(p string) string {
	return scenario.Label(p) + ": " + b.problem(p)
}

// toCheck says which of params have problems, or that inputs are missing.
// whyNone says why part has no answer: the inputs it reads (scenario's
// table of them, Inputs.Uses) that are in error or missing.
func (b *builder) whyNone(part scenario.Part) string { return b.toCheck(b.in.Uses(part)...) }

func (b *builder) toCheck(params ...string) string {
	var names []string
	seen := map[string]bool{}
	for _, p := range params {
		if b.r.Errors[p] != nil && !seen[p] {
			seen[p] = true
			names = append(names, scenario.Label(p))
		}
	}
	if len(names) == 0 {
		return "No answer yet: complete the inputs."
	}
	return "No answer yet. Check: " + strings.Join(names, ", ") + "."
}

// warnsAbout reports whether a warning names p.
func (b *builder) warnsAbout(p string) bool {
	for _, w := range b.r.Warnings {
		if w.Param == p {
			return true
		}
	}
	return false
}

// caution words a warning from calc: by its Code, or its sentence.
func (b *builder) caution(w calc.Warning) string {
	if w.Code != calc.CautionText {
		return warningText(w.Code, w.Figures, b.us, b.view())
	}
	return w.Words(b.figure)
}

// warnText words a warning, naming its segment.
func (b *builder) warnText(w scenario.Warning) string {
	t := b.caution(w.Calc())
	if w.Segment > 0 {
		t = "segment " + strconv.Itoa(w.Segment) + ": " + t
	}
	return t
}

// warnings is the block of the warnings of the given topics (and of those
// about the whole scenario), each listed once on a view; match, when not
// nil, picks warnings by another rule.
func (b *builder) warnings(match func(scenario.Warning) bool, topics ...string) Block {
	want := map[string]bool{"": true}
	for _, t := range topics {
		want[t] = true
	}
	var items []string
	for _, w := range b.r.Warnings {
		t := b.warnText(w)
		if (want[w.Topic] || (match != nil && match(w))) && !b.warned[t] {
			b.warned[t] = true
			items = append(items, t)
		}
	}
	return Block{Kind: BlockWarnings, Items: items}
}

// allWarnings words every warning once.
func (b *builder) allWarnings() []string {
	var out []string
	seen := map[string]bool{}
	for _, w := range b.r.Warnings {
		if t := b.warnText(w); !seen[t] {
			seen[t] = true
			out = append(out, t)
		}
	}
	return out
}

// others lists the problems with inputs the view uses but does not draw.
func (b *builder) others(view string) []string {
	var keys []string
	for p := range b.r.Errors {
		if b.shown[p] || !uses(view, p) {
			continue
		}
		keys = append(keys, p)
	}
	// sort.Slice, whose code the wasm has already: sort.Strings would add
	// a sort of its own for strings.
	sort.Slice(keys, func(i, j int) bool { return keys[i] < keys[j] })
	out := make([]string, 0, len(keys))
	for _, k := range keys {
		out = append(out, b.named(k))
	}
	return out
}

// uses reports whether a view's figures depend on p.
func uses(view, p string) bool {
	switch view {
	case "convert":
		return oneOf(p, "view", "units", "name", "liq", "gly", "glyv", "t", "rho", "mu", "pv", "alt", "baro", "pl", "plref", "cv", "cvref")
	case "regime":
		if n, f := scenario.SegmentOf(p); n > 0 {
			return oneOf(f, "l", "d", "nps", "sch", "mat", "eps", "fit", "k")
		}
		return oneOf(p, "view", "units", "name", "liq", "gly", "glyv", "t", "rho", "mu", "pv", "pl", "plref", "q", "l", "d", "nps", "sch", "mat", "eps", "fit", "k", "fm", "chw",
			"rseg", "szsch", "vlo", "vhi", "grad")
	case "balance", "line", "pump":
		return p != "cv" && p != "cvref"
	case "book":
		return false
	}
	return true
}

func oneOf(p string, set ...string) bool {
	for _, s := range set {
		if s == p {
			return true
		}
	}
	return false
}

// Inputs.

// field starts the Field of p with what every kind shares.
func (b *builder) field(p string, kind FieldKind, label, hint string) Field {
	b.shown[p] = true
	row, _, _ := scenario.Lookup(p)
	if label == "" {
		label = row.Box
	}
	if hint == "" {
		hint = row.Hint
	}
	f := Field{Param: p, Kind: kind, ID: "in-" + DomID(p), Label: label, Hint: hint,
		Placeholder: row.Placeholder, Error: b.problem(p), Warn: b.warnsAbout(p)}
	if b.d.Unverified && slices.Contains(b.d.Suspect, p) {
		f.Suspect = "this value may have been altered on the way (the link's check names it): check it against the sender's"
	}
	if scenario.Slippable(b.r.Errors[p]) {
		f.Keep = &Button{ID: "keep-" + DomID(p), Text: "Keep as typed", Label: "keep the " + scenario.Label(p) + " as typed", Class: "act",
			Act: Action{Do: "keep", Param: p}}
	}
	return f
}

// quantity is the box and unit picker of a value; when p is the balance's
// unknown on the Balance view, its answer stands in its place.
func (b *builder) quantity(p, label, hint string) Field {
	f := b.field(p, FieldQuantity, label, hint)
	if b.view() == "balance" && b.solve() == p {
		f.Kind, f.Solved = FieldSolved, "—"
		if b.r.Balance != nil {
			f.Solved = b.solvedText(b.r.Balance.Value)
		}
		return f
	}
	f.Numeric = true
	box, unit := b.d.Box(p)
	f.Box = box
	f.Options = b.unitOptions(p, box, unit)
	return f
}

// unitOptions are the options of p's unit picker; a unit typed in the box
// shows as "as typed" rather than a picker that pretends to apply. The
// list for a unit of p's choices is made once and shared by every view
// model after (never changed in place; its capacity is its length, so an
// append copies): a sheet has dozens of pickers, each list was made again
// on every edit, and a shared list compares with the one on the page at
// once (the page's same).
func (b *builder) unitOptions(p, box, unit string) []Option {
	num, typed := scenario.Split(box)
	asTyped := num != "" && typed != "" && unit == ""
	k := unitOptionsKey{param: p, unit: unit, us: b.us, asTyped: asTyped}
	unitOptionsMu.Lock()
	opts, ok := unitOptionsMade[k]
	unitOptionsMu.Unlock()
	if ok {
		return opts
	}
	choices := scenario.UnitChoices(p, b.us)
	known := unit == "" || slices.Contains(choices, unit)
	if asTyped {
		opts = []Option{{"", "as typed", true}}
	} else if !known {
		choices = append([]string{unit}, choices...)
	}
	for _, u := range choices {
		if u != "" {
			opts = append(opts, Option{u, u, !asTyped && u == unit})
		}
	}
	opts = opts[:len(opts):len(opts)]
	if known { // a unit no list holds (a link's) is not kept: the cache stays bounded
		unitOptionsMu.Lock()
		if unitOptionsMade == nil {
			unitOptionsMade = map[unitOptionsKey][]Option{}
		}
		unitOptionsMade[k] = opts
		unitOptionsMu.Unlock()
	}
	return opts
}

type unitOptionsKey struct {
	param, unit string
	us, asTyped bool
}

var (
	unitOptionsMu   sync.Mutex
	unitOptionsMade map[unitOptionsKey][]Option
)

// picker is the picker of an enumerated parameter; blank, when given, is
// the option for "not chosen". A value the vocabulary does not know is
// kept and said to be unknown.
func (b *builder) picker(p, label, blank string) Field {
	f := b.field(p, FieldPicker, label, "")
	cur, _ := b.d.Box(p)
	f.Options = choiceOptions(scenario.Choices(p), cur, blank)
	return f
}

func choiceOptions(choices []scenario.Choice, cur, blank string) []Option {
	opts := make([]Option, 0, len(choices)+2)
	known := false
	for _, c := range choices {
		known = known || c.Value == cur
	}
	if blank != "" {
		opts = append(opts, Option{"", blank, cur == ""})
	}
	if !known && cur != "" {
		opts = append(opts, Option{cur, cur + " (not recognised)", true})
	}
	for _, c := range choices {
		opts = append(opts, Option{c.Value, c.Label, c.Value == cur})
	}
	return opts
}

// plain is a box without a unit (a count, a coefficient, the title).
func (b *builder) plain(p, label, hint string, numeric bool) Field {
	f := b.field(p, FieldPlain, label, hint)
	f.Box, _ = b.d.Box(p)
	f.Numeric = numeric
	return f
}

// ref is the gauge/absolute choice of a pressure.
func (b *builder) ref(p string) Field {
	f := b.field(p, FieldRef, "pressure reference", "")
	cur, _ := b.d.Box(p)
	if cur == "" {
		cur = "g"
	}
	for _, c := range scenario.Choices(p) {
		f.Options = append(f.Options, Option{c.Value, c.Label, c.Value == cur})
	}
	return f
}

// fields is a block of inputs side by side.
func fields(fs ...Field) Block { return Block{Kind: BlockFields, Fields: fs} }

// toggle is the switch of an either/or group.
func (b *builder) toggle(group string) Block {
	g, _ := scenario.LookupGroup(group)
	cur := b.d.SideOf(group)
	sw := &Switch{Group: group, Label: g.Label}
	for _, sd := range g.Sides {
		sw.Sides = append(sw.Sides, Button{ID: "sw-" + DomID(group) + "-" + sd.Key, Text: sd.Label, Class: "seg",
			On: sd.Key == cur, Act: Action{Do: "switch", Param: group, Value: sd.Key}})
	}
	return Block{Kind: BlockSwitch, Switch: sw}
}

// text, muted and computed are paragraphs.
func text(class, id, t string) Block { return Block{Kind: BlockText, Class: class, ID: id, Text: t} }

// maybe is b when ok, else an empty block keeping its place.
func maybe(ok bool, b Block) Block {
	if ok {
		return b
	}
	return Block{Kind: BlockEmpty}
}

// DomID makes a parameter or group name fit for an element id that CSS
// selectors name without escaping: "s2.l" → "s2-l".
func DomID(name string) string { return strings.ReplaceAll(name, ".", "-") }
