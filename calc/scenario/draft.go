package scenario

import (
	"slices"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// Draft is a sheet being edited: its scenario and the little a page holds
// aside from it. Every box of the page is drawn from the scenario; only the
// text of the box being typed in is held as typed (so that "45 L/" is not
// rewritten while the unit is half written), with the unit picked for an
// empty box, the side chosen in an either/or group whose parameters are all
// empty, and the values of a group's other side (restored when switched
// back). Every edit of the page is a method here, so what a page can do to
// a sheet is tested without a browser.
type Draft struct {
	Scen Scenario

	Edit, Text string            // the parameter being typed in, and its text as typed
	Unit       map[string]string // unit picked for a box with no number yet
	Side       map[string]string // group → side chosen (see CurrentSide)
	Stash      map[string]string // parameter → value kept while its group's other side is used
	Segments   int               // segment cards shown, at least the scenario's (a new one may be empty)
	Rows       int               // data-sheet rows shown, at least the lists' length
	Readings   int               // test readings shown, at least the highest given (ShownReadings)
	// Was holds each value's text before and after the last unit switch
	// (see switchUnits), so switching back gives back what was typed.
	Was map[string]unitMemo
	// Survey is a pasted survey table kept while some of its rows could
	// not be used, SurveyNotes what PasteProfile said of it (see there),
	// SurveyMade the line saying what it made.
	Survey      string
	SurveyNotes []string
	SurveyMade  string
	// Unverified is set for a sheet opened from a link that arrived
	// damaged: every figure is shown unverified until the person confirms
	// the values (Verify). Suspect lists the values the link's check names
	// as possibly altered (DamagedLink.Suspect).
	Unverified bool
	Suspect    []string
}

// Damaged marks the sheet as opened from a damaged link (d from Parse):
// unverified, with the values its check suspects.
func (d *Draft) Damaged(dl *DamagedLink) {
	d.Unverified, d.Suspect = true, append([]string(nil), dl.Suspect...)
}

// Verify records that the person checked the values of a sheet opened
// from a damaged link: its figures are shown as answers again.
func (d *Draft) Verify() { d.Unverified, d.Suspect = false, nil }

// NewDraft starts editing sc with nothing held aside.
func NewDraft(sc Scenario) Draft { return Draft{Scen: sc} }

// Reset replaces the scenario and drops everything held aside, so that
// nothing of the previous sheet stays in a box.
func (d *Draft) Reset(sc Scenario) { *d = NewDraft(sc) }

// US reports whether the sheet uses US customary units.
func (d *Draft) US() bool { return d.Scen.Get("units") == "us" }

// endEdit forgets the text held for the box being typed in: after any edit
// but typing, every box shows the scenario again.
func (d *Draft) endEdit() { d.Edit, d.Text = "", "" }

// Box is what the box of param shows and the unit its picker shows: the
// scenario's text split into number and unit ("45L/s" → "45", "L/s"), or
// the text as typed while it is being typed. A unit the picker does not
// list stays in the box. unit is "" when the box holds a unit of its own or
// the parameter takes none.
func (d *Draft) Box(param string) (box, unit string) {
	if param == d.Edit && d.Edit != "" {
		num, u := Split(d.Text)
		if num != "" && u != "" || !hasUnits(param) {
			return d.Text, ""
		}
		return d.Text, d.unitFor(param)
	}
	raw := d.Scen.Get(param)
	if !hasUnits(param) {
		return raw, ""
	}
	box, unit = Boxed(param, raw)
	if box == "" && unit == "" {
		unit = d.unitFor(param)
	}
	if box != "" && unit == "" {
		if _, u := Split(box); u == "" {
			unit = DefaultUnit(param, d.US())
		}
	}
	return box, unit
}

// View is the view the sheet is open on, as its link names it ("" none):
// the page's state, not an input of the results.
func (d *Draft) View() string { return strings.TrimSpace(d.Scen.Get("view")) }

// Typed is param's value as the person typed it (kept whole in the
// scenario), for a record of the inputs; "" when blank.
func (d *Draft) Typed(param string) string { return d.Scen.Get(param) }

// Cells is a list parameter's values as typed, one per cell, and the
// list's unit (Scenario.Cells).
func (d *Draft) Cells(param string) ([]string, string) { return d.Scen.Cells(param) }

// unitFor is the unit a number typed into param's empty box is taken in.
func (d *Draft) unitFor(param string) string {
	if u := d.Unit[param]; u != "" {
		return u
	}
	if _, u := Split(d.Scen.Get(param)); u != "" {
		if _, unit := Boxed(param, d.Scen.Get(param)); unit != "" {
			return unit
		}
	}
	return DefaultUnit(param, d.US())
}

// Boxed splits a value as the link holds it into a box's number and a
// picker's unit: "45L/s" → "45", "L/s". A unit that no picker of param
// lists (in either unit system) stays in the box, and unit is "".
func Boxed(param, raw string) (box, unit string) {
	num, u := Split(raw)
	if u == "" || num == "" {
		return raw, ""
	}
	if cu, err := calc.LookupUnit(u); err == nil && listed(param, cu.Symbol) {
		return num, cu.Symbol
	}
	if listed(param, u) {
		return num, u
	}
	return raw, ""
}

// hasUnits reports whether a parameter's box has a unit picker.
func hasUnits(param string) bool {
	p, _, _ := paramRef(param) // Lookup would copy the row and word a segment's label
	return p != nil && (p.Kind == KindQuantity || p.Kind == KindList)
}

// listed reports whether unit is in a picker of param, in either system.
func listed(param, unit string) bool {
	for _, us := range []bool{false, true} {
		if slices.Contains(unitChoicesKept(param, us), unit) {
			return true
		}
	}
	return false
}

// Type records text typed into param's box: the scenario takes the number
// with the picker's unit (or the text as typed when it names a unit of its
// own). It reports whether the scenario changed.
func (d *Draft) Type(param, text string) bool {
	_, unit := d.Box(param)
	d.Edit, d.Text = param, text
	return d.set(param, compose(param, text, unit))
}

// compose is the scenario's text for a box's text and its picker's unit.
func compose(param, text, unit string) string {
	t := strings.TrimSpace(text)
	if t == "" || !hasUnits(param) {
		return t
	}
	num, u := Split(t)
	if u != "" || num == "" || unit == "" {
		return t
	}
	return num + unit
}

// set stores text as param's value and reports whether it changed. A
// value kept as typed (Keep) that changes is no longer kept: the new one
// is judged afresh.
func (d *Draft) set(param, text string) bool {
	before := d.Scen.Get(param)
	_ = d.Scen.Set(param, text)
	changed := d.Scen.Get(param) != before
	if changed && param != KeepParam {
		d.markKept(param, false)
	}
	return changed
}

// Keep keeps param's value as typed though it looks like a slip (a 415 Pa
// gauge reading, a 0.02 % meter): the link lists it under keep, and the
// value is taken as it stands until it changes.
func (d *Draft) Keep(param string) {
	d.endEdit()
	d.markKept(param, true)
}

// markKept adds param to the keep list, or takes it off.
func (d *Draft) markKept(param string, on bool) {
	var names []string
	found := false
	for _, n := range strings.Split(d.Scen.Get(KeepParam), ",") {
		n = strings.TrimSpace(n)
		switch {
		case n == "":
		case n == param:
			found = true
			if on {
				names = append(names, n)
			}
		default:
			names = append(names, n)
		}
	}
	if on && !found {
		if _, _, ok := Lookup(param); !ok {
			return
		}
		names = append(names, param)
	}
	if !on && !found {
		return
	}
	_ = d.Scen.Set(KeepParam, strings.Join(names, ","))
}

// PickUnit sets the unit of param's box; a unit typed in the box gives way
// to it.
func (d *Draft) PickUnit(param, unit string) {
	box, _ := d.Box(param)
	d.endEdit()
	num, _ := Split(box)
	if num == "" {
		if d.Unit == nil {
			d.Unit = map[string]string{}
		}
		d.Unit[param] = unit
		return
	}
	d.set(param, num+unit)
}

// Choose sets a choice, a count or any parameter to text as it is. The
// unit system ("units") is switched by the one rule of draft_units.go:
// every box's value is rewritten in the new system's units.
func (d *Draft) Choose(param, text string) {
	d.endEdit()
	if param == "units" {
		d.switchUnits(text)
		return
	}
	d.set(param, text)
}

// Switch moves an either/or group to one side: the other side's values
// leave the scenario and are kept aside, and the side's own values, kept
// from before, come back.
func (d *Draft) Switch(group, side string) {
	d.endEdit()
	g, ok := LookupGroup(group)
	if !ok {
		return
	}
	if d.Side == nil {
		d.Side = map[string]string{}
	}
	if d.Stash == nil {
		d.Stash = map[string]string{}
	}
	d.Side[group] = side
	for _, sd := range g.Sides {
		for _, p := range sd.Params {
			if sd.Key == side {
				if v, kept := d.Stash[p]; kept && !d.Scen.Has(p) {
					d.set(p, v)
				}
				delete(d.Stash, p)
			} else if d.Scen.Has(p) {
				d.Stash[p] = d.Scen.Get(p)
				d.set(p, "")
			}
		}
	}
}

// SideOf is the side of group the sheet uses (Scenario.CurrentSide with
// the side chosen last).
func (d *Draft) SideOf(group string) string {
	g, ok := LookupGroup(group)
	if !ok {
		return ""
	}
	return d.Scen.CurrentSide(g, d.Side[group])
}

// SegmentCount is the number of segments in the scenario: the highest N
// with any sN. parameter.
func (s Scenario) SegmentCount() int {
	n := 0
	for k := range s.raw {
		if i, _ := splitSegment(k); i > n && s.Has(k) {
			n = i
		}
	}
	return n
}

// ShownSegments is the number of segment cards: the scenario's and a new
// one still empty.
func (d *Draft) ShownSegments() int { return max(d.Scen.SegmentCount(), d.Segments) }

// segment is everything a draft holds for one segment.
type segment struct{ raw, side, stash map[string]string }

func (d *Draft) takeSegment(n int) segment {
	st := segment{map[string]string{}, map[string]string{}, map[string]string{}}
	for _, f := range SegmentFields {
		p := SegmentParam(n, f)
		st.raw[f] = d.Scen.Get(p)
		if v, ok := d.Stash[p]; ok {
			st.stash[f] = v
		}
	}
	for _, g := range []string{"pipe", "rough"} {
		st.side[g] = d.Side[SegmentParam(n, g)]
	}
	return st
}

func (d *Draft) putSegment(n int, st segment) {
	for _, f := range SegmentFields {
		p := SegmentParam(n, f)
		_ = d.Scen.Set(p, st.raw[f])
		delete(d.Stash, p)
		if v, ok := st.stash[f]; ok {
			d.keep(p, v)
		}
	}
	for _, g := range []string{"pipe", "rough"} {
		if d.Side != nil || st.side[g] != "" {
			if d.Side == nil {
				d.Side = map[string]string{}
			}
			d.Side[SegmentParam(n, g)] = st.side[g]
		}
	}
}

func (d *Draft) keep(p, v string) {
	if d.Stash == nil {
		d.Stash = map[string]string{}
	}
	d.Stash[p] = v
}

// MoveSegment swaps segment n with its neighbour (delta −1 up, +1 down).
// The pump keeps its place in the order (after the same number of
// segments).
func (d *Draft) MoveSegment(n, delta int) {
	d.endEdit()
	m := n + delta
	if n < 1 || m < 1 || n > d.ShownSegments() || m > d.ShownSegments() {
		return
	}
	a, b := d.takeSegment(n), d.takeSegment(m)
	d.putSegment(n, b)
	d.putSegment(m, a)
}

// RemoveSegment removes segment n; the later ones move up a number, and a
// pump after a removed segment moves up with them.
func (d *Draft) RemoveSegment(n int) {
	d.endEdit()
	count := d.ShownSegments()
	if n < 1 || n > count {
		return
	}
	for i := n; i < count; i++ {
		d.putSegment(i, d.takeSegment(i+1))
	}
	d.putSegment(count, segment{})
	d.Segments = count - 1
	if v := strings.TrimSpace(d.Scen.Get("pafter")); v != "" {
		if k, err := strconv.Atoi(v); err == nil && k >= n && k > 0 {
			d.set("pafter", strconv.Itoa(k-1))
		}
	}
}

// runFields are the single run's parameters that become segment 1's when
// a line is started from the run.
var runFields = []string{"l", "d", "nps", "sch", "mat", "eps", "fit", "k"}

// AddSegment adds a segment at the end. The first segment of a sheet that
// has a single pipe run takes that run over (a link holds one or the
// other); a later one starts with the previous segment's pipe and wall.
func (d *Draft) AddSegment() {
	d.endEdit()
	count := d.ShownSegments()
	if count >= MaxSegments {
		return
	}
	if count == 0 && d.Scen.Has("l") {
		for _, f := range runFields {
			d.set(SegmentParam(1, f), d.Scen.Get(f))
			d.set(f, "")
		}
		for _, g := range []string{"pipe", "rough"} {
			if d.Side[g] != "" {
				if d.Side == nil {
					d.Side = map[string]string{}
				}
				d.Side[SegmentParam(1, g)] = d.Side[g]
			}
		}
		if d.Scen.Has("hf") { // the line now sets the friction; the value is kept aside
			d.keep("hf", d.Scen.Get("hf"))
			d.set("hf", "")
		}
		d.Segments = 1
		return
	}
	next := count + 1
	if count > 0 {
		prev := d.takeSegment(count)
		st := segment{raw: map[string]string{}, side: prev.side, stash: map[string]string{}}
		for _, f := range []string{"d", "nps", "sch", "mat", "eps"} {
			st.raw[f] = prev.raw[f]
		}
		d.putSegment(next, st)
	}
	d.Segments = next
}

// StepFitting changes the count of fitting key in param's list ("fit",
// "s2.fit") by delta, adding the kind when it is not there. A list that
// cannot be read is left alone (its box says why).
func (d *Draft) StepFitting(param, key string, delta int) {
	d.endEdit()
	list, err := ParseFittings(d.Scen.Get(param))
	if err != nil {
		return
	}
	found := false
	for i := range list {
		if list[i].Key == key {
			list[i].Count += delta
			found = true
		}
	}
	if !found && delta > 0 {
		list = append(list, calc.FittingCount{Key: key, Count: delta})
	}
	kept := list[:0]
	for _, f := range list {
		if f.Count > 0 {
			kept = append(kept, f)
		}
	}
	d.set(param, FormatFittings(kept)) // a K given with "@" stays
}
