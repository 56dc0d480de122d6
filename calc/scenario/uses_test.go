package scenario

import (
	"slices"
	"strings"
	"testing"
)

// usesBases are whole sheets to break one input at a time: the demo (line,
// pump, readings, NPSH), the turbine demo, and single-run sheets with the
// Run view, surge, accuracies, acceptance and energy; a test at five flows
// judged by the duty flow (PumpTestDemo); one reading by a typed guarantee.
func usesBases(t *testing.T) map[string]Scenario {
	run := "view=regime&liq=water&t=18C&alt=210m&p1=0kPa&z1=212m&v1=0m/s&p2=0kPa&z2=251m&v2=0m/s&q=45L/s&solve=hp" +
		"&l=640m&nps=8&sch=40&mat=steel&fit=gate:2,exit:1&k=0.5&tc=2s&cr=1&szsch=40&vlo=0.6m/s&vhi=2.4m/s&grad=4"
	field := Demo().Encode() + "&view=pump&etam=93%&gcs=1%&gss=200kPa&gcd=1%&gsd=1000kPa&uqm=2%&upin=1%&uz=10mm&grade=2B&hours=4000&tariff=0.12&tc=3s"
	// Closed loops: a flow typed and its load, the static pressure, a
	// checked valve and its circuit; a load giving the flow; seawater of
	// a stated salinity.
	loop := "loop=1&liq=pg&gly=30%&t=7C&q=12L/s&tsup=7C&tret=12C&pexp=150kPa&pexpref=g&zexp=10m&zp=0m&dpc=90kPa&alt=100m" +
		"&s1.l=60m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.fit=elbow90:6&s1.z=4m&s2.l=60m&s2.nps=3&s2.sch=40&s2.mat=steel" +
		"&s2.cmp=chiller:45kPa@12L/s,valve:kv40 fl0.9 xfz0.4&pq=0,10,15L/s&ph=40,35,25m&pnpsh=2,3,4m"
	load := "loop=1&liq=water&t=7C&load=250kW&tsup=7C&tret=12C&baro=100kPa&l=120m&nps=3&sch=40&mat=steel&fit=gate:2&tc=2s"
	sea := "liq=seawater&sal=60&t=20C&q=20L/s&p1=0kPa&z1=0m&v1=0m/s&p2=0kPa&z2=10m&v2=0m/s&solve=hp&l=100m&nps=4&sch=40&mat=steel&pl=200kPa"
	out := map[string]Scenario{"demo": Demo(), "turbine": TurbineDemo(), "test": PumpTestDemo()}
	// One reading judged by a typed guarantee point, read absolute.
	one := Demo()
	for _, kv := range [][2]string{{"ps", "83kPa(a)"}, {"qg", "45L/s"}, {"hg", "50m"}, {"etag", "72%"}, {"grade", "1B"}, {"uqm", "2%"}} {
		_ = one.Set(kv[0], kv[1])
	}
	out["one"] = one
	for name, q := range map[string]string{"run": run, "field": strings.Replace(field, "view=balance&", "", 1), "loop": loop, "load": load, "sea": sea} {
		s, err := Parse(q)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		out[name] = s
	}
	return out
}

// breakValue is a text param cannot read.
func breakValue(param string) string {
	p, _, _ := Lookup(param)
	switch p.Kind {
	case KindChoice:
		return "nonesuch"
	case KindFittings:
		return "nonesuch:1"
	case KindText:
		return "nonesuch"
	}
	return "x"
}

// TestUsesExactly breaks each input of whole sheets in turn: every part
// that lists it in Uses is left out, and every other part the sheet had
// stays (an input in error feeds nothing, and blanks nothing it does not
// feed).
func TestUsesExactly(t *testing.T) {
	for name, base := range usesBases(t) {
		whole := Evaluate(Read(base))
		for _, p := range whole.Inputs.sortedGiven() {
			if p == "view" || p == "units" || p == "name" || p == "cmp" || strings.HasSuffix(p, ".cmp") {
				continue
			}
			s := base.Clone()
			_ = s.Set(p, breakValue(p))
			in := Read(s)
			if !in.Bad(p) {
				continue // read another way ("x" is a fitting key? no: kept)
			}
			r := Evaluate(in)
			for _, part := range Parts() {
				if !whole.Worked(part) {
					continue
				}
				declared := slices.Contains(in.Uses(part), p)
				if got := r.Worked(part); got == declared {
					if declared {
						t.Errorf("%s with %s in error: the %s is still worked out, though it reads it", name, p, part)
					} else {
						t.Errorf("%s with %s in error: the %s is left out, though Uses does not list %s", name, p, part, p)
					}
				}
			}
		}
	}
}

// TestUsesNamesParameters: every name Uses lists is a parameter of the
// vocabulary (a misspelt name would never match an input in error).
func TestUsesNamesParameters(t *testing.T) {
	for name, base := range usesBases(t) {
		in := Read(base)
		for _, part := range Parts() {
			for _, p := range in.Uses(part) {
				if !isKnown(p) {
					t.Errorf("%s: the %s lists %q, not a parameter", name, part, p)
				}
			}
		}
	}
}
