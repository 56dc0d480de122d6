package scenario

import (
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// The one rule of a unit switch (Choose("units", …)): every value of a
// box with a unit picker whose row's SI and US default units differ
// (quantities, data-sheet lists, every segment's fields, values held
// aside while their group's other side is used) is rewritten in the new
// system's default unit for it; a row whose two systems share a default
// (%, kW of a motor's input, rpm, Hz, s) keeps its value as typed. A
// value is converted, never re-read: a bare number was in the old
// system's default unit and is written with the new one, so nothing
// changes meaning. The converted figure is written one digit finer than
// the step the figure was typed to (212 m, typed to 1 m = 3.3 ft, is
// 695.5 ft), so a switch moves a value by at most a twentieth of that
// step. What each value was before the switch is remembered (Draft.Was):
// switching back before the value is edited gives back its text exactly
// as typed. Text boxes that carry their units inside the text (the
// components' drops and flows, a valve's Kv or Cv) keep it as written: a
// unit there is required and named, never implied by the sheet. A value
// that cannot be read (its box says why) is left as typed.

// unitMemo is a value's text before and after the last unit switch.
type unitMemo struct{ was, made string }

// switchUnits sets the sheet's unit system to text ("si", "us") and
// rewrites every value by the rule above.
func (d *Draft) switchUnits(text string) {
	from := d.US()
	d.set("units", text)
	to := d.US()
	if from == to {
		return
	}
	memo := map[string]unitMemo{}
	convert := func(key, p, v string) string {
		if m, ok := d.Was[key]; ok && m.made == v {
			memo[key] = unitMemo{was: v, made: m.was}
			return m.was
		}
		nv, ok := convertValue(p, v, to)
		if !ok || nv == v {
			return v
		}
		memo[key] = unitMemo{was: v, made: nv}
		return nv
	}
	for _, k := range d.Scen.sortedKeys() {
		if v := d.Scen.Get(k); strings.TrimSpace(v) != "" {
			_ = d.Scen.Set(k, convert(k, k, v)) // a kept slip stays kept: the value is the same
		}
	}
	for k, v := range d.Stash {
		d.Stash[k] = convert("stash:"+k, k, v)
	}
	for k := range d.Unit {
		if switched(k) {
			delete(d.Unit, k) // an empty box takes the new system's unit
		}
	}
	d.Was = memo
}

// switched reports whether param's default unit differs between the two
// systems, so that a unit switch rewrites its value.
func switched(param string) bool {
	p, _, ok := Lookup(param)
	return ok && (p.Kind == KindQuantity || p.Kind == KindList) && p.SI != p.US
}

// convertValue writes text, param's value, in the default unit of the
// system to (true: US) by the rule above; ok is false when the value is
// left as it is.
func convertValue(param, text string, to bool) (string, bool) {
	if !switched(param) {
		return "", false
	}
	p, _, _ := Lookup(param)
	if p.Kind == KindList {
		return convertList(param, text, to)
	}
	c, ok := readFigure(param, text, "", !to)
	if !ok {
		return "", false
	}
	target := targetUnit(param, c.unit, to)
	if target.Symbol == c.unit.Symbol {
		return "", false
	}
	return formatIn(target, c.si, finer(c, target)) + target.Symbol + c.ref, true
}

// convertList converts a data-sheet list cell by cell into one unit, with
// the decimals its finest figure needs; empty cells stay empty.
func convertList(param, text string, to bool) (string, bool) {
	cells, _ := (Scenario{raw: map[string]string{param: text}}).Cells(param)
	_, last := Split(cells[len(cells)-1]) // the list's unit as written
	figs := make([]figure, len(cells))
	var target calc.Unit
	dec := 0
	same := true
	for i, c := range cells {
		if strings.TrimSpace(c) == "" {
			continue
		}
		f, ok := readFigure(param, c, last, !to)
		if !ok {
			return "", false
		}
		figs[i] = f
		target = targetUnit(param, f.unit, to)
		dec = max(dec, finer(f, target))
		same = same && f.unit.Symbol == target.Symbol
	}
	if same {
		return "", false
	}
	out := make([]string, len(cells))
	for i, c := range cells {
		if strings.TrimSpace(c) != "" {
			out[i] = formatIn(target, figs[i].si, dec)
		}
	}
	return strings.Join(out, ",") + target.Symbol, true
}

// figure is one value read for a unit switch: its SI value, the unit it
// is in, the step it was typed to (in SI), and a gauge or absolute marker
// as typed after a pressure's unit.
type figure struct {
	si, step float64
	unit     calc.Unit
	ref      string
}

// readFigure reads text, a value of param; a bare number is in unit (a
// list's unit) or else in the default unit of the system us.
func readFigure(param, text, unit string, us bool) (figure, bool) {
	num, u := Split(text)
	if num == "" {
		return figure{}, false
	}
	x, err := calc.Parse(param, num, calc.Dimensionless, "")
	if err != nil {
		return figure{}, false
	}
	if u == "" {
		u = unit
	}
	if u == "" {
		u = DefaultUnit(param, us)
	}
	f := figure{}
	cu, err := calc.LookupUnit(u)
	if err != nil {
		cu, f.ref = pressureRef(u)
		if f.ref == "" {
			return figure{}, false
		}
	}
	dim, _ := DimensionOf(param)
	p, _, _ := Lookup(param)
	if cu.Dim != dim && !extra(p, cu.Symbol) {
		return figure{}, false
	}
	f.unit, f.si = cu, cu.ToSI(x)
	f.step = math.Pow(10, -float64(decimals(x))) * cu.Factor
	return f, !math.IsNaN(f.si) && !math.IsInf(f.si, 0)
}

// extra reports whether symbol is one of the row's ExtraUnits (a head of
// liquid for the Convert value).
func extra(p Param, symbol string) bool {
	for _, e := range p.ExtraUnits {
		if e == symbol {
			return true
		}
	}
	return false
}

// pressureRef splits a gauge or absolute marker off a pressure unit as
// calc.ParsePressure reads them ("psig", "kPa(a)"); ref is the marker as
// typed, "" when u is no pressure unit with a marker.
func pressureRef(u string) (calc.Unit, string) {
	for _, m := range []string{"(absolute)", "(gauge)", "(abs)", "absolute", "gauge", "abs", "(g)", "(a)", "g", "a"} {
		n := len(u) - len(m)
		if n <= 0 || !strings.EqualFold(u[n:], m) {
			continue
		}
		if b, err := calc.LookupUnit(strings.TrimSpace(u[:n])); err == nil && b.Dim == calc.Pressure {
			return b, u[n:]
		}
	}
	return calc.Unit{}, ""
}

// targetUnit is the unit a value of param in unit u is written in after a
// switch to the system us: the row's default, or, for a value of another
// dimension the row also takes (a head typed in the Convert box), that
// dimension's default.
func targetUnit(param string, u calc.Unit, us bool) calc.Unit {
	if dim, _ := DimensionOf(param); u.Dim != dim {
		return calc.DefaultUnit(u.Dim, us)
	}
	t, err := calc.LookupUnit(DefaultUnit(param, us))
	if err != nil {
		return u
	}
	return t
}

// decimals is the number of decimals x was typed with (0 for 250, 1 for
// 214.5), at most 12.
func decimals(x float64) int {
	for d := 0; d < 12; d++ {
		s := x * math.Pow(10, float64(d))
		if math.Abs(s-math.Round(s)) <= 1e-9*math.Max(1, math.Abs(s)) {
			return d
		}
	}
	return 12
}

// finer is the number of decimals a figure needs in unit t to be one
// digit finer than the step it was typed to.
func finer(f figure, t calc.Unit) int {
	step := f.step / t.Factor
	return min(max(0, int(math.Ceil(-math.Log10(step)-1e-9))+1), 12)
}

// formatIn writes si in unit t with dec decimals, trailing zeros dropped
// ("703.74", "317", "0").
func formatIn(t calc.Unit, si float64, dec int) string {
	s := strconv.FormatFloat(t.FromSI(si), 'f', dec, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	if s == "-0" {
		s = "0"
	}
	return s
}
