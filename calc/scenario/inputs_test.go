package scenario

import (
	"strings"
	"testing"

	"fieldhead/calc"
)

// groupCases gives, for each either/or group, a scenario that needs it and
// a value for each side's parameters (the group's meaning in doc.go).
var groupCases = map[string]struct {
	base  string
	sides map[string]string // side key → its parameters as a query
}{
	"qby": {"view=balance&liq=water&t=10C&loop=1&l=100m&nps=3&sch=40&mat=steel&tsup=7C&tret=12C",
		map[string]string{"q": "q=5L/s", "load": "load=100kW"}},
	"pt1": {"view=balance&liq=water&t=20C&p1=100kPa&z1=0m&p2=0kPa&z2=0m&v2=0m/s&q=5L/s&solve=hp&hf=0m",
		map[string]string{"v": "v1=2m/s", "d": "d1=50mm"}},
	"pt2": {"view=balance&liq=water&t=20C&p1=100kPa&z1=0m&v1=0m/s&p2=0kPa&z2=0m&q=5L/s&solve=hp&hf=0m",
		map[string]string{"v": "v2=2m/s", "d": "d2=50mm"}},
	"fric": {"view=balance&liq=water&t=20C&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&q=5L/s&solve=hp&d=80mm&mat=steel",
		map[string]string{"run": "l=100m", "hf": "hf=3m"}},
	"pipe": {"view=balance&liq=water&t=20C&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&q=5L/s&solve=hp&l=100m&mat=steel",
		map[string]string{"nps": "nps=3&sch=40", "d": "d=80mm"}},
	"rough": {"view=balance&liq=water&t=20C&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&q=5L/s&solve=hp&l=100m&d=80mm",
		map[string]string{"mat": "mat=steel", "eps": "eps=0.05mm"}},
	"gly": {"view=balance&liq=pg&t=7C&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&q=5L/s&solve=hp&hf=2m",
		map[string]string{"m": "gly=30%", "v": "glyv=30%"}},
	"site": {"view=balance&liq=water&t=18C&p1=0kPa&z1=212m&v1=0m/s&p2=0kPa&z2=251m&v2=0m/s&q=45L/s&solve=hp&hf=5m",
		map[string]string{"alt": "alt=210m", "baro": "baro=98kPa"}},
	"gsp": {"view=pump&liq=water&t=18C&qm=41L/s&ps=-18kPa&pd=430kPa&zs=214m&zd=214.8m&dd=202.7mm",
		map[string]string{"d": "ds=254.5mm", "nps": "dsn=10&dss=40"}},
	"gdp": {"view=pump&liq=water&t=18C&qm=41L/s&ps=-18kPa&pd=430kPa&zs=214m&zd=214.8m&ds=254.5mm",
		map[string]string{"d": "dd=202.7mm", "nps": "ddn=8&dds=40"}},
	"spfor": {Demo().Encode(),
		map[string]string{"q": "qsp=40L/s", "h": "hsp=50m"}},
	"npsh": {strings.Replace(Demo().Encode(), "&pnpsh=", "&x=", 1),
		map[string]string{"sheet": "pnpsh=2,2.5,3,4,5.5m", "typed": "npshr=4m"}},
}

// with adds a query's parameters to a scenario, replacing any given.
func with(t *testing.T, base string, adds ...string) Scenario {
	t.Helper()
	s, err := Parse(base)
	if err != nil && !strings.Contains(base, "&x=") {
		t.Fatalf("%s: %v", base, err)
	}
	for _, a := range adds {
		for _, kv := range strings.Split(a, "&") {
			k, v, _ := strings.Cut(kv, "=")
			if err := s.Set(k, v); err != nil {
				t.Fatal(err)
			}
		}
	}
	return s
}

// TestGroupOneRule: for every either/or group, the side the Draft shows is
// the side Evaluate uses, and both sides given is an error on every value
// of both, never a silent choice (the rule of calc/scenario/doc.go, "one
// reading of the inputs").
func TestGroupOneRule(t *testing.T) {
	for _, g := range Groups {
		c, ok := groupCases[g.Key]
		if !ok {
			t.Errorf("group %s has no case here", g.Key)
			continue
		}
		for _, sd := range g.Sides {
			s := with(t, c.base, c.sides[sd.Key])
			d := NewDraft(s)
			in := Read(s)
			if got := d.SideOf(g.Key); got != sd.Key {
				t.Errorf("%s with %s: the Draft shows side %q", g.Key, c.sides[sd.Key], got)
			}
			if got := in.Side(g.Key); got != sd.Key {
				t.Errorf("%s with %s: Read uses side %q", g.Key, c.sides[sd.Key], got)
			}
			for _, p := range sd.Params {
				if in.Bad(p) {
					t.Errorf("%s with %s: %s is in error: %v", g.Key, c.sides[sd.Key], p, in.Problems[p])
				}
			}
		}
		var all []string
		for _, sd := range g.Sides {
			all = append(all, c.sides[sd.Key])
		}
		s := with(t, c.base, all...)
		r := Evaluate(Read(s))
		for _, sd := range g.Sides {
			for _, p := range sd.Params {
				fe := r.Errors[p]
				if fe == nil || fe.Reason != calc.ReasonBothSides {
					t.Errorf("%s with both sides: %s has %v, want both sides given", g.Key, p, fe)
				}
			}
		}
	}
}

// TestBothSidesBlanks: the links of the issue that asked for one reading:
// each gives errors on the boxes of both sides, and no result that reads
// them (before, each computed from one side while the box showed the other).
func TestBothSidesBlanks(t *testing.T) {
	tests := []struct {
		query  string
		params []string
		blank  func(Result) bool
	}{
		{"view=balance&liq=water&t=20C&p1=100kPa&z1=0m&v1=2m/s&d1=50mm&p2=0kPa&z2=0m&v2=0m/s&q=5L/s&solve=hp&hf=0m",
			[]string{"v1", "d1"}, func(r Result) bool { return r.Balance == nil }},
		{"view=balance&liq=water&t=18C&alt=210m&baro=98kPa&p1=0kPa&z1=212m&v1=0m/s&p2=0kPa&z2=251m&v2=0m/s&q=45L/s&solve=hp&hf=5m",
			[]string{"alt", "baro"}, func(r Result) bool { return r.Balance == nil && r.Fluid == nil && r.SitePressure == 0 }},
		{"view=balance&liq=pg&gly=30%&glyv=30%&t=7C&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&q=5L/s&solve=hp&hf=2m",
			[]string{"gly", "glyv"}, func(r Result) bool { return r.Fluid == nil && r.Balance == nil }},
		{Demo().Encode() + "&npshr=4m",
			// The NPSH available reads neither: it stands, unrated.
			[]string{"pnpsh", "npshr"}, func(r Result) bool {
				return r.NPSH != nil && r.NPSH.Level == calc.NPSHUnrated && r.NPSH.Available > 0 && r.Pump != nil && !r.Pump.Curve.HasNPSHr()
			}},
	}
	for _, tc := range tests {
		s, err := Parse(tc.query)
		if err != nil {
			t.Fatal(err)
		}
		r := Evaluate(Read(s))
		for _, p := range tc.params {
			if fe := r.Errors[p]; fe == nil || fe.Reason != calc.ReasonBothSides {
				t.Errorf("%s: %s has %v, want both sides given", tc.query, p, fe)
			}
		}
		if !tc.blank(r) {
			t.Errorf("%s: a result was computed from one side of a group given both ways", tc.query)
		}
	}
}

// TestInputInErrorFeedsNothing: an input in error blanks what reads it and
// leaves what does not (the links).
func TestInputInErrorFeedsNothing(t *testing.T) {
	// An altitude outside ISO 2533's troposphere: no site pressure, so no
	// liquid at its line pressure, no balance, and not the standard sea
	// level in its place.
	s, _ := Parse("view=balance&liq=water&t=18C&alt=21000m&p1=0kPa&z1=212m&v1=0m/s&p2=0kPa&z2=251m&v2=0m/s&q=45L/s&l=640m&nps=8&sch=40&mat=steel")
	r := Evaluate(Read(s))
	if r.Errors["alt"] == nil {
		t.Error("alt=21000m: no error on the altitude")
	}
	if r.Balance != nil || r.Fluid != nil || r.SitePressure != 0 {
		t.Errorf("alt=21000m: the balance (%v), liquid (%v) or site pressure (%g) was worked out from an altitude in error", r.Balance != nil, r.Fluid != nil, r.SitePressure)
	}
	for _, w := range r.Warnings {
		if w.Code == calc.CautionStandardAtmosphere || w.Code == calc.CautionNoAbsolutePressure {
			t.Errorf("alt=21000m: warning %v from a site pressure that was not given", w.Code)
		}
	}

	// A motor efficiency in error blanks the pump-alone figures only: the
	// measured head, hydraulic power and wire-to-water efficiency stand.
	d := Demo()
	_ = d.Set("etam", "0.93")
	r = Evaluate(Read(d))
	if r.Errors["etam"] == nil {
		t.Fatal("etam=0.93: no error on the motor efficiency")
	}
	if r.Field == nil {
		t.Fatal("etam=0.93: the whole field check is blank")
	}
	if r.Field.Head <= 0 || r.Field.HydraulicPower <= 0 || r.Field.Efficiency <= 0 {
		t.Errorf("etam=0.93: head %g, hydraulic power %g, wire-to-water %g; want them all", r.Field.Head, r.Field.HydraulicPower, r.Field.Efficiency)
	}
	if r.Field.PumpEfficiency != 0 || r.Field.ShaftPower != 0 {
		t.Errorf("etam=0.93: pump efficiency %g and shaft power %g from a motor efficiency in error", r.Field.PumpEfficiency, r.Field.ShaftPower)
	}
}
