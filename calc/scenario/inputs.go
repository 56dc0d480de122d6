package scenario

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"unicode"

	"fieldhead/calc"
)

// Inputs is a scenario read once (Read): every parameter given, turned into
// what it means (SI values, the unit as typed, gauge or absolute, lists,
// fittings, components, pipe sizes and materials looked up), each
// either/or group resolved to one side, and every problem found in the
// inputs themselves. Evaluate works from Inputs alone; nothing after Read
// reads the link's text.
//
// A value that cannot be used is Bad: its problem is in Problems, under
// its own name or under the parameter it needs (a pressure's gauge or
// absolute switch, the other side of a group). Evaluate leaves out every
// result that reads a Bad input (Uses).
type Inputs struct {
	US bool // the sheet is in US customary units
	// View is the view named (blank or unknown: none).
	View string
	// Segments is the number of segments of the line, 0 for none.
	Segments int
	// Problems holds what is wrong with each input, keyed by parameter.
	Problems map[string]*calc.FieldError

	vals   map[string]Value
	sides  map[string]string
	anyBad bool // some value is Bad
}

// Value is one parameter as read.
type Value struct {
	SI   float64        // a quantity in SI (a share as a fraction), or a plain number
	List []float64      // a list's values, SI
	Dim  calc.Dimension // what a quantity was read as (spd: a share or a frequency; cv: a pressure or a head)
	Unit string         // the unit as typed; "" when none was (the sheet's default applied)
	Abs  bool           // a pressure given absolute, by its unit or by its gauge/absolute switch
	Text string         // a choice's value or free text, trimmed
	// Fittings, Components, Pipe and Material are what a fitting list,
	// a segment's components, a nominal size (with its schedule) and a
	// material key name.
	Fittings   []calc.FittingCount
	Components []calc.Component
	Pipe       *calc.PipeSize
	Material   *calc.Material
	Bad        bool // given but not usable; Problems says why

	ref calc.PressureRef // a pressure's own suffix, before its switch is read
}

// Given reports whether param holds a value, usable or not.
func (in *Inputs) Given(param string) bool { _, ok := in.vals[param]; return ok }

// Bad reports whether param holds a value that cannot be used.
func (in *Inputs) Bad(param string) bool { return in.vals[param].Bad }

// OK reports whether param holds a usable value.
func (in *Inputs) OK(param string) bool { v, ok := in.vals[param]; return ok && !v.Bad }

// Value returns param as read; ok is false when it is absent or Bad.
func (in *Inputs) Value(param string) (Value, bool) {
	v, ok := in.vals[param]
	return v, ok && !v.Bad
}

// Num is param's SI value (or plain number), 0 when absent or Bad.
func (in *Inputs) Num(param string) float64 { v, _ := in.Value(param); return v.SI }

// Choice is param's choice or text as given (even when Bad), "" when absent.
func (in *Inputs) Choice(param string) string { return in.vals[param].Text }

// Side is the side of an either/or group the inputs use ("s2.pipe" for a
// segment's): the side whose parameters are given, else the group's
// first. When both sides are given both are Bad.
func (in *Inputs) Side(group string) string {
	if s, ok := in.sides[group]; ok {
		return s
	}
	if g, ok := LookupGroup(group); ok {
		return g.Sides[0].Key
	}
	return ""
}

// RunSegment is the segment the Run view shows (rseg), 1 when not given.
func (in *Inputs) RunSegment() int {
	v, ok := in.Value("rseg")
	if !ok {
		return 1
	}
	k, err := strconv.Atoi(v.Text)
	if err != nil || k < 1 {
		return 1
	}
	return k
}

// AnyBad reports whether any of params is Bad.
func (in *Inputs) AnyBad(params ...string) bool {
	for _, p := range params {
		if in.vals[p].Bad {
			return true
		}
	}
	return false
}

// lookedUp are the choices checked by looking them up rather than
// against their list.
var lookedUp = map[string]bool{"nps": true, "sch": true, "mat": true, "dsn": true, "dss": true, "ddn": true, "dds": true}

// refParams names the gauge/absolute switch of the pressures that take one.
var refParams = map[string]string{"p1": "p1ref", "p2": "p2ref", "pl": "plref", "cv": "cvref", "pexp": "pexpref"}

// Read reads every parameter of s exactly once. It never fails: problems
// are in Inputs.Problems.
func Read(s Scenario) Inputs {
	in := Inputs{Problems: map[string]*calc.FieldError{}, vals: make(map[string]Value, len(s.raw)), sides: map[string]string{}}
	r := reader{in: &in, s: s}
	switch u := strings.TrimSpace(s.Get("units")); u {
	case "", "si":
	case "us":
		in.US = true
	default:
		r.bad("units", calc.UnknownChoice).Typed(u)
	}
	in.Segments = s.SegmentCount()
	for name, text := range s.raw {
		if strings.TrimSpace(text) == "" {
			continue
		}
		in.vals[name] = r.read(name, text)
	}
	if v := in.vals["view"]; !v.Bad {
		in.View = v.Text
	}
	r.pressureRefs()
	r.slips()
	r.groups()
	r.lookups()
	r.counts()
	r.site()
	r.glycolShare()
	// A value whose problem was recorded under its name is Bad.
	for name, v := range in.vals {
		if _, bad := in.Problems[name]; bad && !v.Bad {
			v.Bad = true
			in.vals[name] = v
		}
		in.anyBad = in.anyBad || in.vals[name].Bad
	}
	return in
}

// reader carries one Read.
type reader struct {
	in *Inputs
	s  Scenario
}

func (r *reader) bad(param string, k calc.Kind) *calc.FieldError {
	return problems(r.in.Problems).bad(param, k)
}
func (r *reader) record(fe *calc.FieldError)   { problems(r.in.Problems).record(fe) }
func (r *reader) fail(param string, err error) { problems(r.in.Problems).failAt(param, err) }

// taint marks param Bad without a problem of its own: one it needs has one.
func (r *reader) taint(param string) {
	if v, ok := r.in.vals[param]; ok {
		v.Bad = true
		r.in.vals[param] = v
	}
}

// read reads one parameter's text by its kind, then checks it against its
// own limits (those that need no other input).
func (r *reader) read(name, text string) Value {
	// Only the row's Kind and Dim are read: Lookup would copy the whole
	// row and word a segment's label, for every value on every edit.
	p := &Param{}
	if row, _, _ := paramRef(name); row != nil {
		p = row
	}
	base := name
	if n, f := splitSegment(name); n > 0 {
		base = f
	}
	t := strings.TrimSpace(text)
	v := Value{Text: t}
	if strings.IndexFunc(text, unicode.IsControl) >= 0 {
		// Kept verbatim for its box; never read (a line break inside
		// "flow meter" is damage, not a value).
		r.bad(name, calc.NotANumber).Typed(strconv.QuoteToASCII(text)).Because(calc.ReasonDamagedValue)
		v.Bad = true
		return v
	}
	var err error
	switch p.Kind {
	case KindQuantity:
		v, err = r.quantity(name, base, t, p)
	case KindList:
		v.List, v.Unit, err = readList(name, t, p.Dim, DefaultUnit(name, r.in.US))
		v.Dim = p.Dim
	case KindChoice:
		// Sizes, classes and materials are checked by looking them up
		// (lookups), which reads their other spellings ("DN150", "SDR 17").
		if cs := Choices(name); len(cs) > 0 && !lookedUp[base] && !oneOf(t, cs) {
			r.bad(name, calc.UnknownChoice).Typed(t)
			v.Bad = true
		}
		return v
	case KindNumber:
		v.SI, err = number(name, t)
	case KindFittings:
		v.Fittings, err = ParseFittings(t)
	case KindText:
		switch base {
		case "cmp":
			v.Components, err = ParseComponents(t)
		case "name":
			if !printable(text) || len(text) > 200 {
				r.bad(name, calc.AboveLimit).AtMost(calc.Num(200)).Because(calc.ReasonTitle)
				v.Bad = true
			}
			v.Text = t
		}
	}
	if err != nil {
		if p.Kind == KindList {
			r.failList(name, err)
		} else {
			r.fail(name, err)
		}
		v.Bad = true
		return v
	}
	if fe := ownLimits(base, t, v); fe != nil {
		fe.Field = name
		r.record(fe)
		v.Bad = true
	}
	return v
}

// failList records a list's error, keeping the item calc named.
func (r *reader) failList(name string, err error) {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		c := *fe
		c.Field = name
		r.record(&c)
		return
	}
	r.fail(name, err)
}

// quantity reads a dimensioned value: a pressure with its gauge or
// absolute suffix (those with a switch), the Convert value as a pressure
// or a head, the speed as a share or a frequency. p is a row of Table:
// read, never written.
func (r *reader) quantity(name, base, t string, p *Param) (Value, error) {
	v := Value{Text: t, Dim: p.Dim}
	_, v.Unit = Split(t)
	def := DefaultUnit(name, r.in.US)
	var err error
	switch {
	case refParams[base] != "" || isGauge(base):
		var ref calc.PressureRef
		v.SI, ref, err = calc.ParsePressure(name, t, def)
		if err != nil && name == "cv" {
			if h, herr := calc.Parse(name, t, calc.Length, ""); herr == nil {
				v.SI, v.Dim = h, calc.Length
				return v, nil
			}
			var fe *calc.FieldError
			if errors.As(err, &fe) {
				fe.Reason = calc.ReasonOrHead
			}
		}
		v.ref, v.Abs = ref, ref == calc.Absolute
	case name == "spd" && isFrequency(v.Unit):
		v.Dim = calc.Frequency
		v.SI, err = calc.Parse(name, t, calc.Frequency, "")
	default:
		v.SI, err = calc.Parse(name, t, p.Dim, def)
	}
	return v, err
}

// ownLimits checks a value against the limits it has on its own (base is
// the parameter's name without a segment's prefix); nil when it is within
// them.
func ownLimits(base, text string, v Value) *calc.FieldError {
	switch base {
	case "d", "d1", "d2", "wall", "tc":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Got(calc.Fig(v.SI, v.Dim))
		}
	case "l", "eps", "hs":
		if v.SI < 0 {
			return calc.NewFieldError(base, calc.Negative).Got(calc.Fig(v.SI, calc.Length))
		}
	case "k":
		if v.SI < 0 {
			return calc.NewFieldError(base, calc.Negative).Typed(text)
		}
	case "chw", "grad":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Typed(text)
		}
	case "nrat", "fmains":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive)
		}
	case "baro":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Got(calc.Fig(v.SI, calc.Pressure)).Because(calc.ReasonAbsolutePressure)
		}
	case "dv":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Got(calc.Fig(v.SI, calc.Velocity)).Because(calc.ReasonVelocityChange)
		}
	case "kliq":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Got(calc.Fig(v.SI, calc.Pressure)).Because(calc.ReasonBulkModulus, calc.Fig(2.2e9, calc.Pressure))
		}
	case "epipe":
		if !(v.SI > 0) {
			return calc.NewFieldError(base, calc.NotPositive).Got(calc.Fig(v.SI, calc.Pressure)).Because(calc.ReasonWallModulus, calc.Fig(200e9, calc.Pressure), calc.Fig(1e9, calc.Pressure))
		}
	case "sal":
		if !(v.SI >= 0 && v.SI <= calc.SeawaterMaxSalinity*1000) {
			return calc.NewFieldError(base, calc.OutOfRange).Got(calc.Num(v.SI/1000)).Within(calc.Num(0), calc.Num(calc.SeawaterMaxSalinity)).Because(calc.ReasonSeawaterSalinity)
		}
	case "load":
		if v.SI < 0 {
			return calc.NewFieldError(base, calc.Negative).Got(calc.Fig(v.SI, calc.Power))
		}
	case "dpc":
		if v.SI < 0 {
			return calc.NewFieldError(base, calc.Negative).Got(calc.Fig(v.SI, calc.Pressure))
		}
	case "cr":
		if !(v.SI > 0 && v.SI <= 2) {
			return calc.NewFieldError(base, calc.OutOfRange).Got(calc.Num(v.SI)).Within(calc.Num(0), calc.Num(2)).Because(calc.ReasonRestraint)
		}
	}
	return nil
}

// pressureRefs settles gauge or absolute for the pressures with a switch:
// the unit's suffix wins, then the switch (g or a), then gauge. A pressure
// whose switch is unknown cannot be used.
func (r *reader) pressureRefs() {
	for p, ref := range refParams {
		v, ok := r.in.vals[p]
		if !ok {
			continue
		}
		if v.ref == calc.RefUnspecified && !v.Bad {
			switch r.in.vals[ref].Text {
			case "a":
				v.Abs = true
			case "", "g":
			default:
				v.Bad = true
			}
		}
		r.in.vals[p] = v
	}
}

// groups resolves each either/or group, the segments' included, to one
// side by the one rule the Draft shows (Scenario.sideOf). Both sides given
// is a problem on every value given, never a silent choice.
func (r *reader) groups() {
	check := func(g Group) {
		side, both := r.s.sideOf(g)
		if side == "" {
			side = g.Sides[0].Key
		}
		r.in.sides[g.Key] = side
		if !both {
			return
		}
		var given []string
		for _, sd := range g.Sides {
			for _, p := range sd.Params {
				if r.s.Has(p) {
					given = append(given, p)
				}
			}
		}
		for _, p := range given {
			other := given[0]
			if other == p {
				other = given[len(given)-1]
			}
			r.bad(p, calc.Inconsistent).With(other).Because(calc.ReasonBothSides)
			r.taint(p)
		}
	}
	for _, g := range Groups {
		check(g)
		if n, _ := splitSegment(g.Sides[0].Params[0]); n == 0 && isSegmentGroup(g) {
			for i := 1; i <= r.in.Segments; i++ {
				sg, _ := LookupGroup(SegmentParam(i, g.Key))
				check(sg)
			}
		}
	}
}

// isSegmentGroup reports whether every parameter of g is one a segment has.
func isSegmentGroup(g Group) bool {
	for _, sd := range g.Sides {
		for _, p := range sd.Params {
			if r, ok := byName[p]; !ok || !r.Segment {
				return false
			}
		}
	}
	return true
}

// lookups finds the pipe sizes (nominal size and schedule) and materials
// named: the single run's, each segment's and the gauges'.
func (r *reader) lookups() {
	pipe := func(nps, sch string) {
		if !r.in.Given(nps) && !r.in.Given(sch) {
			return
		}
		if r.in.Bad(nps) || r.in.Bad(sch) {
			r.taint(nps)
			r.taint(sch)
			return
		}
		ps, err := calc.LookupPipe(r.in.Choice(nps), r.in.Choice(sch))
		if err != nil {
			field := nps
			var fe *calc.FieldError
			if errors.As(err, &fe) && fe.Field == "sch" {
				field = sch
			}
			r.fail(field, err)
			r.taint(nps)
			r.taint(sch)
			return
		}
		for _, p := range []string{nps, sch} {
			if v, ok := r.in.vals[p]; ok {
				v.Pipe = &ps
				r.in.vals[p] = v
			}
		}
	}
	material := func(p string) {
		v, ok := r.in.vals[p]
		if !ok || v.Bad {
			return
		}
		m, err := calc.LookupMaterial(v.Text)
		if err != nil {
			r.fail(p, err)
			r.taint(p)
			return
		}
		v.Material = &m
		r.in.vals[p] = v
	}
	for _, pre := range r.runPrefixes() {
		pipe(pre+"nps", pre+"sch")
		material(pre + "mat")
	}
	pipe("dsn", "dss")
	pipe("ddn", "dds")
}

// runPrefixes are the prefixes of every run: "" and each segment's "sN.".
func (r *reader) runPrefixes() []string {
	out := []string{""}
	for i := 1; i <= r.in.Segments; i++ {
		out = append(out, SegmentParam(i, ""))
	}
	return out
}

// counts checks the data sheet's lists against its flows, and the
// positions that name a segment against the line.
func (r *reader) counts() {
	if q, ok := r.in.Value("pq"); ok {
		for _, p := range []string{"ph", "peff", "pnpsh"} {
			v, ok := r.in.Value(p)
			if ok && len(v.List) != len(q.List) {
				r.bad(p, calc.WrongCount).Given(len(v.List)).AtMost(calc.Num(float64(len(q.List)))).With("pq")
				r.taint(p)
			}
		}
	}
	n := r.in.Segments
	if v, ok := r.in.Value("pafter"); ok && n > 0 && (v.SI != math.Trunc(v.SI) || v.SI < 0 || v.SI > float64(n)) {
		r.bad("pafter", calc.OutOfRange).Typed(v.Text).Within(calc.Num(0), calc.Num(float64(n))).Because(calc.ReasonPumpAfter)
		r.taint("pafter")
	}
	if v, ok := r.in.vals["rseg"]; ok && n > 0 {
		k, err := strconv.Atoi(v.Text)
		if err != nil || k < 1 || k > n {
			delete(r.in.Problems, "rseg") // the range says more than the list of choices
			r.bad("rseg", calc.OutOfRange).Typed(v.Text).Within(calc.Num(1), calc.Num(float64(n))).Because(calc.ReasonRunSegment)
			r.taint("rseg")
		}
	}
}

// site checks the altitude against the standard atmosphere's range.
func (r *reader) site() {
	if v, ok := r.in.Value("alt"); ok && r.in.Side("site") == "alt" {
		if _, err := calc.StandardAtmosphere(v.SI); err != nil {
			r.fail("alt", err)
			r.taint("alt")
		}
	}
}

// glycolShare checks a glycol share against the mixes' range.
func (r *reader) glycolShare() {
	liq := r.in.Choice("liq")
	if liq != "eg" && liq != "pg" {
		return
	}
	g := calc.EthyleneGlycol
	if liq == "pg" {
		g = calc.PropyleneGlycol
	}
	for _, p := range []string{"gly", "glyv"} {
		v, ok := r.in.Value(p)
		if !ok {
			continue
		}
		var err error
		if p == "glyv" {
			_, err = calc.GlycolMassFraction(g, v.SI)
		} else {
			_, err = calc.GlycolVolumeFraction(g, v.SI)
		}
		if err != nil {
			r.fail(p, err)
			r.taint(p)
		}
	}
}

// readList reads a list such as pq=0,20,40,55,70L/s: values separated by
// commas (or by semicolons, when decimals are written with a comma), one
// unit after the last value for the whole list, or a unit on each value.
func readList(param, text string, dim calc.Dimension, def string) ([]float64, string, error) {
	sep := ","
	if strings.Contains(text, ";") {
		sep = ";"
	}
	items := strings.Split(text, sep)
	_, unit := Split(items[len(items)-1])
	out := make([]float64, 0, len(items))
	for i, it := range items {
		it = strings.TrimSpace(it)
		if it == "" {
			return nil, unit, calc.NewFieldError(param, calc.Missing).At(i + 1)
		}
		if _, u := Split(it); u == "" {
			it += unit
		}
		v, err := calc.Parse(param, it, dim, def)
		if err != nil {
			return nil, unit, atItem(err, i+1)
		}
		out = append(out, v)
	}
	return out, unit, nil
}

// sideOf is the one rule for a group's side: the side whose parameters
// the scenario holds; both is true when more than one side's are held
// (the first of them is returned). With none held, side is "".
func (s Scenario) sideOf(g Group) (side string, both bool) {
	for _, sd := range g.Sides {
		for _, p := range sd.Params {
			if s.Has(p) {
				if side != "" && side != sd.Key {
					return side, true
				}
				side = sd.Key
				break
			}
		}
	}
	return side, false
}

// sortedGiven lists the parameters given, in link order.
func (in *Inputs) sortedGiven() []string {
	out := make([]string, 0, len(in.vals))
	for k := range in.vals {
		out = append(out, k)
	}
	sortByLink(out)
	return out
}
