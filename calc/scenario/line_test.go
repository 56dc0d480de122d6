package scenario

import (
	"math"
	"strings"
	"testing"

	"fieldhead/calc"
)

// TestParseComponents reads the component syntax of sN.cmp (doc.go). The
// figures are the typed values in SI by NIST SP 811 factors (1 kPa =
// 1000 Pa, 1 L/s = 0.001 m³/s, 1 ft = 0.3048 m); a Cv is kept as its Kv
// (calc.KvFromCv, checked against GNU units in calc).
func TestParseComponents(t *testing.T) {
	cs, err := ParseComponents(" chiller:45kPa@12L/s, coil 2: 3.2m @ 12 L/s ,valve:kv40,trim:CV 25, ")
	if err != nil {
		t.Fatal(err)
	}
	want := []calc.Component{
		{Name: "chiller", RatedDrop: 45e3, RatedFlow: 0.012},
		{Name: "coil 2", RatedHead: 3.2, RatedFlow: 0.012},
		{Name: "valve", Kind: calc.ComponentValve, Kv: 40},
		{Name: "trim", Kind: calc.ComponentValve, Kv: calc.KvFromCv(25)},
	}
	if len(cs) != len(want) {
		t.Fatalf("got %+v", cs)
	}
	for i := range want {
		g, w := cs[i], want[i]
		close := func(a, b float64) bool { return math.Abs(a-b) <= 1e-12*math.Max(math.Abs(b), 1) }
		if g.Name != w.Name || g.Kind != w.Kind || !close(g.RatedDrop, w.RatedDrop) || !close(g.RatedHead, w.RatedHead) ||
			!close(g.RatedFlow, w.RatedFlow) || !close(g.Kv, w.Kv) {
			t.Errorf("item %d: %+v, want %+v", i, g, w)
		}
	}
	// A decimal comma, as every box takes one: the part after it starts
	// no component (it holds no ":").
	if cs, err := ParseComponents("coil:45,5kPa@12L/s,valve:kv43,2 fl0,9 xfz0,45"); err != nil || len(cs) != 2 ||
		cs[0].RatedDrop != 45.5e3 || cs[1].Kv != 43.2 || cs[1].FL != 0.9 || cs[1].XFz != 0.45 {
		t.Errorf("decimal commas: %+v, %v", cs, err)
	}
	if cs, err := ParseComponents("pump skid:10ft@150gpm"); err != nil || math.Abs(cs[0].RatedHead-3.048) > 1e-12 {
		t.Errorf("US units: %+v, %v", cs, err)
	}
	// Each bad item: its kind, its reason and the words the page shows
	// (SI sheet), which name the component or the item typed.
	bad := []struct {
		text   string
		kind   calc.Kind
		reason calc.Reason
		msg    string
	}{
		{"chiller", calc.UnknownChoice, calc.ReasonComponentSyntax, `"chiller": write each component as name:drop@flow`},
		{":45kPa@12L/s", calc.UnknownChoice, calc.ReasonComponentSyntax, "name:drop@flow"},
		{"valve:cv0", calc.NotPositive, calc.ReasonValveCoefficient, `"valve": the valve's Cv or Kv must be above zero`},
		{"valve:kv", calc.NotANumber, calc.ReasonValveNumber, `"valve": the valve's Kv must be a number, as in valve:kv25`},
		{"coil:-5kPa@2L/s", calc.Negative, calc.ReasonComponentDrop, `"coil": the rated drop must not be negative; got −5.000 kPa`},
		{"coil:−5kPa@2L/s", calc.Negative, calc.ReasonComponentDrop, "must not be negative"},
		{"coil:5kPa@0L/s", calc.NotPositive, calc.ReasonComponentFlow, "rated flow must be above zero"},
		{"coil:5@2L/s", calc.NoUnit, calc.ReasonComponentValue, `the drop needs a number and its unit, e.g. 45kPa or 3.2m; got "5"`},
		{"coil:5kPa@2", calc.NoUnit, calc.ReasonComponentValue, `the rated flow needs a number and its unit, e.g. 12L/s; got "2"`},
		{"coil:5L/s@2kPa", calc.UnknownUnit, calc.ReasonComponentValue, `the drop "5L/s" is not in a unit of pressure or head`},
		{"coil:5kPa@2m", calc.UnknownUnit, calc.ReasonComponentValue, `the rated flow "2m" is not in a unit of flow`},
		{"coil:5..5kPa@2L/s", calc.NotANumber, calc.ReasonComponentValue, `the drop "5..5kPa" is not a number`},
		{"strainer:orifice", calc.UnknownChoice, calc.ReasonComponentSpec, `"strainer": "orifice" is neither drop@flow`},
		{strings.Repeat("x", 41) + ":kv4", calc.AboveLimit, calc.ReasonComponentName, "at most 40 characters"},
	}
	for _, b := range bad {
		_, err := ParseComponents(b.text)
		fe, ok := err.(*calc.FieldError)
		if !ok || fe.Field != "cmp" || fe.Kind != b.kind || fe.Reason != b.reason || !strings.Contains(worded(fe, false), b.msg) {
			t.Errorf("%q: %v, want a cmp error %v (%v) with %q", b.text, err, b.kind, b.reason, b.msg)
		}
	}
}

// TestComponentsInTheSheet: a segment's components reach the budget by
// name, and a bad one is an error on that segment's box with the rest of
// the sheet kept.
func TestComponentsInTheSheet(t *testing.T) {
	const base = "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa&baro=101.325kPa&p1=0kPa&v1=0m/s&p2=0kPa&v2=0m/s&z1=10m&z2=10m&q=12L/s&solve=hp" +
		"&s1.l=100m&s1.d=100mm&s1.eps=0.05mm&s1.z=10m&s2.l=50m&s2.d=100mm&s2.eps=0.05mm"
	s, err := Parse(base + "&s2.cmp=chiller:45kPa@12L/s,valve:kv43.2")
	if err != nil {
		t.Fatal(err)
	}
	r := Evaluate(Read(s))
	if r.Balance == nil {
		t.Fatalf("errors %v", r.Errors)
	}
	var labels []string
	for _, it := range r.Balance.Budget {
		if strings.HasPrefix(it.Key, "cmp") {
			labels = append(labels, it.Label)
		}
	}
	if strings.Join(labels, "|") != "chiller (segment 2)|valve (segment 2)" {
		t.Errorf("budget components %v", labels)
	}
	s, _ = Parse(base + "&s2.cmp=valve:cv0")
	r = Evaluate(Read(s))
	if m := r.Errors["s2.cmp"]; m == nil || m.Reason != calc.ReasonValveCoefficient || !strings.Contains(worded(m, false), `"valve"`) || s.Get("s2.cmp") != "valve:cv0" {
		t.Errorf("errors %v", r.Errors)
	}
}

// TestParseValveFactors reads a control valve's data-sheet factors after its
// Kv or Cv (doc.go: valve:kv40 fl0.9 xfz0.45). IEC 60534-2-1 defines FL and
// xFz as ratios of pressure differences, so each lies above 0 and at most 1;
// the figures are the typed ones, the Cv's Kv is calc.KvFromCv (checked
// against GNU units in calc).
func TestParseValveFactors(t *testing.T) {
	good := []struct {
		text        string
		kv, fl, xfz float64
	}{
		{"valve:kv40", 40, 0, 0}, // an older link's bare Kv reads as before
		{"valve:kv40 fl0.9 xfz0.45", 40, 0.9, 0.45},
		{"valve:kv40 xfz0.45 fl0.9", 40, 0.9, 0.45}, // in either order
		{"valve:KV40 FL0.9 XFZ0.45", 40, 0.9, 0.45}, // in capitals
		{"valve:kv40 fl=0.85", 40, 0.85, 0},
		{"valve: kv 40  fl1 ", 40, 1, 0}, // 1 is allowed: no recovery at all
		{"trim:cv46 xfz0.3", calc.KvFromCv(46), 0, 0.3},
	}
	for _, g := range good {
		cs, err := ParseComponents(g.text)
		if err != nil || len(cs) != 1 {
			t.Errorf("%q: %+v, %v", g.text, cs, err)
			continue
		}
		c := cs[0]
		if c.Kind != calc.ComponentValve || math.Abs(c.Kv-g.kv) > 1e-12*g.kv || c.FL != g.fl || c.XFz != g.xfz {
			t.Errorf("%q: Kv %g FL %g xFz %g, want %g %g %g", g.text, c.Kv, c.FL, c.XFz, g.kv, g.fl, g.xfz)
		}
	}
	// Each bad factor is an error on cmp naming the component and which
	// factor, with the figure typed; never taken silently.
	bad := []struct {
		text   string
		kind   calc.Kind
		reason calc.Reason
		other  string
		msg    string
	}{
		{"valve:kv40 fl0", calc.OutOfRange, calc.ReasonValveFactor, "fl", `"valve": the valve's FL (the liquid pressure recovery factor) must be above 0 and at most 1: read it from the valve maker's data sheet; got 0`},
		{"valve:kv40 fl1.2", calc.OutOfRange, calc.ReasonValveFactor, "fl", "FL (the liquid pressure recovery factor) must be above 0 and at most 1: read it from the valve maker's data sheet; got 1.2"},
		{"valve:kv40 fl-0.5", calc.OutOfRange, calc.ReasonValveFactor, "fl", "got −0.5"},
		{"valve:kv40 fl1e-400", calc.OutOfRange, calc.ReasonValveFactor, "fl", "got 0"},
		{"valve:kv40 xfz0", calc.OutOfRange, calc.ReasonValveFactor, "xfz", "xFz (the incipient-cavitation factor) must be above 0 and at most 1"},
		{"valve:kv40 fl0.9 xfz1.5", calc.OutOfRange, calc.ReasonValveFactor, "xfz", "xFz (the incipient-cavitation factor) must be above 0 and at most 1: read it from the valve maker's data sheet; got 1.5"},
		{"valve:kv40 flx", calc.NotANumber, calc.ReasonValveNumber, "fl", `"valve": the valve's FL (the liquid pressure recovery factor) must be a number above 0 and at most 1 from its data sheet, as in valve:kv40 fl0.9 xfz0.45; got "flx"`},
		{"valve:kv40 xfz", calc.NotANumber, calc.ReasonValveNumber, "xfz", `the valve's xFz (the incipient-cavitation factor) must be a number`},
		{"valve:kv40 flNaN", calc.NotANumber, calc.ReasonValveNumber, "fl", `got "flNaN"`},
		{"valve:kv40 xfzInf", calc.NotANumber, calc.ReasonValveNumber, "xfz", `got "xfzInf"`},
		{"valve:kv40 fl0.9 fl0.8", calc.Inconsistent, calc.ReasonValveFactorTwice, "fl", `"valve": the valve's FL (the liquid pressure recovery factor) is given twice in "kv40 fl0.9 fl0.8": keep the one from its data sheet`},
		{"valve:kv40 xfz0.4 fl0.9 xfz0.5", calc.Inconsistent, calc.ReasonValveFactorTwice, "xfz", "xFz (the incipient-cavitation factor) is given twice"},
		{"valve:kv40 fx0.9", calc.UnknownChoice, calc.ReasonComponentSpec, "", `"valve": "kv40 fx0.9" is neither drop@flow`},
	}
	for _, b := range bad {
		_, err := ParseComponents(b.text)
		fe, ok := err.(*calc.FieldError)
		if !ok || fe.Field != "cmp" || fe.Kind != b.kind || fe.Reason != b.reason || fe.Other != b.other || !strings.Contains(worded(fe, false), b.msg) {
			t.Errorf("%q: %v (other %q, words %q), want a cmp error %v (%v) naming %q with %q", b.text, err, otherOf(fe), worded(fe, false), b.kind, b.reason, b.other, b.msg)
		}
	}
	// In a sheet, the error stays on the segment's box and the link keeps
	// the text as typed.
	s, err := Parse("liq=water&t=20C&baro=101.325kPa&loop=1&q=12L/s&s1.l=50m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.cmp=valve:kv40%20fl1.2")
	if err != nil {
		t.Fatal(err)
	}
	r := Evaluate(Read(s))
	if m := r.Errors["s1.cmp"]; m == nil || m.Reason != calc.ReasonValveFactor || s.Get("s1.cmp") != "valve:kv40 fl1.2" {
		t.Errorf("in a sheet: errors %v, s1.cmp %q", r.Errors, s.Get("s1.cmp"))
	}
}

// otherOf is fe's Other, "" for no error.
func otherOf(fe *calc.FieldError) string {
	if fe == nil {
		return ""
	}
	return fe.Other
}
