package scenario

import (
	"math"
	"strings"
	"testing"

	"fieldhead/calc"
)

// richSheet is the demo with what a unit switch must also carry: a value
// held aside by a group's switch (the altitude, while the barometer is
// used), a second test reading, a bare number (the sheet's unit), a
// pressure with an absolute marker, a decimal comma, a head typed in the
// Convert box, a data-sheet list with an empty cell, a kept slip, a speed
// in rpm, the components' text and a value that cannot be read.
func richSheet() Draft {
	d := NewDraft(Demo())
	for _, kv := range [][2]string{
		{"baro", "98.2kPa"}, {"rq2", "30L/s"}, {"rps2", "-12kPa"}, {"rpd2", "470kPa"},
		{"z2", "251"}, {"pl", "101kPa(a)"}, {"hs", "1,25m"}, {"cv", "10m"},
		{"pnpsh", "0,,2.6,3.4,4.6m"}, {"spd", "1450rpm"}, {"nrat", "1480rpm"},
		{"s2.cmp", "strainer:12kPa@45L/s, valve:kv40"}, {"wall", "8.18mm"},
		{"tc", "abc"},
	} {
		_ = d.Scen.Set(kv[0], kv[1])
	}
	d.Stash = map[string]string{"alt": "210m"}
	_ = d.Scen.Set("alt", "")
	d.Type("ps", "415Pa")
	d.Keep("ps")
	return d
}

// figureOf reads what Read makes of param in s: its SI value or list.
func figureOf(in *Inputs, p string) ([]float64, bool) {
	v, ok := in.Value(p)
	if !ok || v.Bad {
		return nil, false
	}
	if v.List != nil {
		return v.List, true
	}
	return []float64{v.SI}, true
}

// stepOf is the step (in SI) a typed value's figures were written to:
// the last decimal of each number in its unit (for a list, the finest).
func stepOf(t *testing.T, p, text string, us bool) float64 {
	t.Helper()
	step := math.Inf(1)
	cells := []string{text}
	if row, _, _ := Lookup(p); row.Kind == KindList {
		cells, _ = (Scenario{raw: map[string]string{p: text}}).Cells(p)
	}
	_, last := Split(cells[len(cells)-1])
	for _, c := range cells {
		if c == "" {
			continue
		}
		f, ok := readFigure(p, c, last, us)
		if !ok {
			t.Fatalf("%s: %q cannot be read", p, c)
		}
		step = math.Min(step, f.step)
	}
	return step
}

// checkSwitched walks every value of before (in the system of !us) and of
// after (switched to us): a row whose two systems' defaults differ is
// written in the new system's unit and means the same quantity to within
// a twentieth of the step it was typed to; any other value is as typed.
func checkSwitched(t *testing.T, what string, before, after Scenario, us bool) {
	t.Helper()
	before, after = withoutGaps(t, what, before, after)
	inB, inA := Read(before), Read(after)
	for _, k := range before.sortedKeys() {
		was, now := before.Get(k), after.Get(k)
		vb, okB := figureOf(&inB, k)
		if !switched(k) || !okB {
			if now != was && k != "units" {
				t.Errorf("%s: %s %q became %q; only values with units of the other system change", what, k, was, now)
			}
			continue
		}
		va, okA := figureOf(&inA, k)
		if !okA || len(va) != len(vb) {
			t.Errorf("%s: %s %q became %q, which does not read as the same figures", what, k, was, now)
			continue
		}
		tol := stepOf(t, k, was, !us) / 20
		for i := range vb {
			if d := math.Abs(va[i] - vb[i]); d > tol*(1+1e-9) {
				t.Errorf("%s: %s %q became %q: moved by %g SI, more than a twentieth of the typed step (%g)", what, k, was, now, d, tol)
			}
		}
		row, _, _ := Lookup(k)
		_, unit := Split(now)
		if u, ref := pressureRef(unit); ref != "" { // psi(a): the marker stays
			unit = u.Symbol
		}
		want := DefaultUnit(k, us)
		if v, _ := inB.Value(k); v.Dim != row.Dim { // a head in the Convert box
			want = calc.DefaultUnit(v.Dim, us).Symbol
		}
		if unit != want {
			t.Errorf("%s: %s %q became %q, in %q rather than the %s system's %s", what, k, was, now, unit, system(us), want)
		}
	}
}

// withoutGaps returns before and after with the empty cells of each
// data-sheet list read as 0 (a list being filled in reads as missing an
// item; its other cells are still converted), after checking that the
// gaps stayed where they were.
func withoutGaps(t *testing.T, what string, before, after Scenario) (Scenario, Scenario) {
	t.Helper()
	b, a := before.Clone(), after.Clone()
	for _, p := range ListColumns {
		cb, ub := before.Cells(p)
		ca, ua := after.Cells(p)
		if len(cb) != len(ca) {
			t.Errorf("%s: %s %q became %q: not the same cells", what, p, before.Get(p), after.Get(p))
			continue
		}
		gap := false
		for i := range cb {
			if (cb[i] == "") != (ca[i] == "") {
				t.Errorf("%s: %s %q became %q: an empty cell moved", what, p, before.Get(p), after.Get(p))
			}
			if cb[i] == "" {
				cb[i], ca[i], gap = "0", "0", true
			}
		}
		if gap {
			_ = b.Set(p, strings.Join(cb, ",")+ub)
			_ = a.Set(p, strings.Join(ca, ",")+ua)
		}
	}
	return b, a
}

func system(us bool) string {
	if us {
		return "US"
	}
	return "SI"
}

// TestUnitSwitchEveryBox switches the demos, and a sheet with every kind
// of box, to US units and back: every box is in the new system's units
// with the same value (to a twentieth of its typed step), and switching
// back gives back every text as typed; a value edited in between is
// converted instead. Then from a sheet written in US units, with nothing
// remembered, to SI.
func TestUnitSwitchEveryBox(t *testing.T) {
	for _, c := range []struct {
		name string
		d    Draft
	}{{"demo", NewDraft(Demo())}, {"turbine demo", NewDraft(TurbineDemo())}, {"rich sheet", richSheet()}} {
		d := c.d
		si := d.Scen.Clone()
		stash := map[string]string{}
		for k, v := range d.Stash {
			stash[k] = v
		}
		keep := d.Scen.Get(KeepParam)
		d.Choose("units", "us")
		if !d.US() {
			t.Fatalf("%s: not switched", c.name)
		}
		checkSwitched(t, c.name+" to US", si, d.Scen, true)
		boxesMatch(t, c.name+" to US", &d)
		if got := d.Scen.Get(KeepParam); got != keep {
			t.Errorf("%s: the values kept as typed were %q, now %q; a switch keeps them", c.name, keep, got)
		}
		for k, v := range stash {
			st := Scenario{raw: map[string]string{k: v}}
			sw := Scenario{raw: map[string]string{k: d.Stash[k], "units": "us"}}
			checkSwitched(t, c.name+" held aside", st, sw, true)
		}
		us := d.Scen.Clone()

		d.Choose("units", "si")
		if got, want := d.Scen.Encode(), si.Encode(); got != want {
			t.Errorf("%s: back to SI\n got %s\nwant %s (every text as typed)", c.name, got, want)
		}
		for k, v := range stash {
			if d.Stash[k] != v {
				t.Errorf("%s: %s held aside is %q after switching back, want %q", c.name, k, d.Stash[k], v)
			}
		}

		// Switched again, edited, switched back: the edited value is
		// converted, the others come back as typed.
		d.Choose("units", "us")
		if got := d.Scen.Encode(); got != us.Encode() {
			t.Errorf("%s: to US a second time\n got %s\nwant %s", c.name, got, us.Encode())
		}
		d.Type("z1", "700")
		d.Choose("units", "si")
		if d.Scen.Get("z1") != "213.36m" { // 700 ft × 0.3048 m/ft (exact, NIST SP 811): 213.36 m
			t.Errorf("%s: z1 edited to 700 ft, back in SI %q, want 213.36m", c.name, d.Scen.Get("z1"))
		}
		_ = d.Scen.Set("z1", si.Get("z1"))
		if got, want := d.Scen.Encode(), si.Encode(); got != want {
			t.Errorf("%s: z1 edited, back to SI: the others\n got %s\nwant %s (as typed)", c.name, got, want)
		}

		// A sheet written in US units, nothing remembered, to SI.
		fresh := NewDraft(us.Clone())
		fresh.Choose("units", "si")
		checkSwitched(t, c.name+" written in US, to SI", us, fresh.Scen, false)
		boxesMatch(t, c.name+" written in US, to SI", &fresh)
	}
}

// TestUnitSwitchFigures checks the demo's converted figures against the
// exact factors of NIST SP 811 (2008) Appendix B (1 ft = 0.3048 m, 1 in =
// 25.4 mm, 1 US gal = 3.785411784 L, 1 psi = 6.894757 kPa, °F = °C × 1.8
// + 32; GNU units gives 695.53806 ft, 713.26454 gal/min, 64.4 °F,
// −2.6106793 psi, 7.980315 in, 703.74016 ft, 62.366 psi), each written
// one digit finer than the step it was typed to.
func TestUnitSwitchFigures(t *testing.T) {
	d := NewDraft(Demo())
	d.PickUnit("hs", "m") // a unit picked for an empty box gives way to the new system's
	d.Choose("units", "us")
	for _, c := range []struct{ p, want string }{
		{"z1", "695.5ft"},    // 212 m, typed to 1 m = 3.3 ft: one decimal
		{"s1.z", "703.74ft"}, // 214.5 m, typed to 0.1 m = 0.33 ft: two decimals
		{"q", "713gpm"},      // 45 L/s, typed to 1 L/s = 15.9 gpm: none
		{"t", "64.4°F"},      // 18 °C, typed to 1 °C = 1.8 °F: one decimal
		{"ps", "-2.61psi"},   // −18 kPa, typed to 1 kPa = 0.145 psi: two decimals
		{"pd", "62.37psi"},   // 430 kPa
		{"ds", "7.9803in"},   // 202.7 mm, typed to 0.1 mm = 0.0039 in: four decimals
		{"pin", "31kW"},      // kW in both systems: as typed
		{"peff", "0,52,71,76,72%"},
		{"ph", "203.4,193.6,170.6,144.4,108.3ft"}, // 62 m = 203.41 ft …
		{"s1.nps", "8"}, {"s1.fit", "entry_sharp:1,elbow90lr:1,gate:1"},
	} {
		if got := d.Scen.Get(c.p); got != c.want {
			t.Errorf("%s after the switch to US: %q, want %q", c.p, got, c.want)
		}
	}
	if _, unit := d.Box("hs"); unit != "ft" {
		t.Errorf("the empty suction-loss box shows %q after the switch, want ft", unit)
	}
	// The answer moves by no more than the rounding of the inputs
	// explains: the pump head within 0.1 % of the SI sheet's.
	a := Evaluate(Read(Demo()))
	b := Evaluate(Read(d.Scen))
	if a.Balance == nil || b.Balance == nil {
		t.Fatal("no balance")
	}
	if r := math.Abs(b.Balance.Value/a.Balance.Value - 1); r > 1e-3 {
		t.Errorf("pump head %g m in SI, %g m after the switch: %.2g apart", a.Balance.Value, b.Balance.Value, r)
	}
}

// TestSizingDefaultsByUnits checks that a US sheet's sizing table uses
// round US marks of its own, 2 to 8 ft/s (common practice, from memory;
// 1 ft = 0.3048 m, NIST SP 811), and an SI sheet 0.6 to 2.4 m/s, both
// with a friction limit of 4 per 100 (common practice, from memory).
func TestSizingDefaultsByUnits(t *testing.T) {
	for _, c := range []struct {
		units      string
		lo, hi, gr float64
	}{{"si", 0.6, 2.4, 0.04}, {"us", 0.6096, 2.4384, 0.04}} {
		s := Demo()
		_ = s.Set("view", "regime")
		_ = s.Set("units", c.units)
		r := Evaluate(Read(s))
		if r.RunView == nil || r.RunView.Sizing == nil {
			t.Fatalf("%s: no sizing table", c.units)
		}
		lim := r.RunView.Sizing.Limits
		if math.Abs(lim.VelocityLow-c.lo) > 1e-12 || math.Abs(lim.VelocityHigh-c.hi) > 1e-12 || lim.GradientMax != c.gr {
			t.Errorf("%s: sizing marks %+v, want %g–%g m/s and %g", c.units, lim, c.lo, c.hi, c.gr)
		}
	}
}
