package scenario

import (
	"fmt"
	"math"
	"reflect"
	"strings"
	"testing"
)

// TestBadLinks completes the bad-input catalogue of TestBadInputs with the
// cases it leaves out: malformed and truncated links, a link over the size
// limit, a parameter given twice, markup and script in a parameter, zero
// flows where a flow or a power divides, and numbers so large that the
// arithmetic overflows. Each row goes through Parse and Evaluate like a
// link opened in the page. The expected behaviour is this project's rule
// for bad input (calc/doc.go and the product brief): an error naming the
// field, never a panic, a NaN or an Inf, and every other input kept.
func TestBadLinks(t *testing.T) {
	// A single-run balance (no segments) with the Convert part.
	const base = "liq=water&t=18C&alt=210m&p1=0kPa&z1=212m&v1=0&p2=0kPa&z2=251m&v2=0&q=45L/s&solve=hp" +
		"&l=640m&d=202.7mm&mat=steel&cv=430kPa"
	with := func(kv ...string) string {
		s, _ := Parse(base)
		for _, p := range kv {
			k, v, _ := strings.Cut(p, "=")
			_ = s.Set(k, v)
		}
		return s.Encode()
	}
	demo := func(k, v string) string {
		s := Demo()
		_ = s.Set(k, v)
		return s.Encode()
	}
	long := strings.Repeat("x", MaxQueryBytes)
	tests := []struct {
		name    string
		query   string
		linkErr string // in Parse's error ("" = none)
		param   string // the parameter whose message must appear ("" = none expected)
		msg     string // in that message
		keep    string // a parameter that must survive, as param=value
		balance bool   // the balance must still be computed
	}{
		{"a percent escape cut short stays text", base + "&name=Alder%2", "", "", "", "name=Alder%2", true},
		{"a UTF-8 sequence cut short", base + "&name=%E2%82", "not valid UTF-8", "", "", "z1=212m", true},
		{"a bad percent escape in a value", base + "&name=%zzAlder", "", "", "", "name=%zzAlder", true},
		{"a link cut inside a fitting list", with("fit=gate:2,elb"), "", "fit", "", "fit=gate:2,elb", false},
		{"a link cut after a parameter name", base + "&k", "arrived damaged", "", "", "z1=212m", true},
		{"a link cut after the =", strings.Replace(base, "q=45L/s", "q=", 1), "", "q", "flow", "z1=212m", false},
		{"a link cut inside a unit", strings.Replace(base, "q=45L/s", "q=45L/", 1), "", "q", "", "q=45L/", false},
		{"a link cut inside a number", strings.Replace(base, "z2=251m", "z2=2.5e", 1), "", "z2", "", "z2=2.5e", false},
		{"a parameter given twice", "z1=3m&" + base, "given twice", "", "", "z1=3m", true},
		{"an empty parameter name", base + "&=5", "not a Fieldhead parameter", "", "", "z1=212m", true},
		{"markup in a number", with("z1=<b>212</b>m"), "", "z1", "length", "z1=<b>212</b>m", false},
		{"script in the title", with("name=<script>alert(1)</script>"), "", "", "", "name=<script>alert(1)</script>", true},
		{"markup with an event handler in the title", with(`name=<img src=x onerror="alert(1)">`), "", "", "", `name=<img src=x onerror="alert(1)">`, true},
		{"markup in a choice", with(`mat=<svg onload=alert(1)>`), "", "mat", "", `mat=<svg onload=alert(1)>`, false},
		{"zero flow through a pipe run", with("q=0L/s"), "", "", "", "q=0L/s", true},
		{"zero flow in the Regime view", with("view=regime", "q=0L/s"), "", "", "", "q=0L/s", true},
		{"zero flow, solving for the turbine head", with("q=0L/s", "solve=ht"), "", "", "", "q=0L/s", true},
		{"zero measured flow in the field check", demo("qm", "0L/s"), "", "qm", "above zero", "qm=0L/s", true},
		{"zero motor input: no efficiency, no division", demo("pin", "0kW"), "", "", "", "pin=0kW", true},
		{"zero pump speed in the affinity laws", demo("spd", "0%"), "", "spd", "from 10 % to 200 %", "spd=0%", true},
		{"zero diameter at a point", with("d1=0mm"), "", "d1", "", "d1=0mm", false},
		// Guards against 100× slips and impossible speeds (issue 11).
		{"a motor efficiency typed as a fraction", demo("etam", "0.9"), "", "etam", "did you mean 90 %?", "etam=0.9", true},
		{"a motor efficiency typed as a fraction with %", demo("etam", "0.92%"), "", "etam", "did you mean 92 %?", "etam=0.92%", true},
		{"a turbine efficiency typed as a fraction", with("solve=ht", "etat=0.78"), "", "etat", "did you mean 78 %?", "etat=0.78", true},
		{"data-sheet efficiencies typed as fractions", demo("peff", "0,0.52,0.71,0.76,0.72"), "", "peff", "did you mean 52 %?", "peff=0,0.52,0.71,0.76,0.72", true},
		{"one data-sheet efficiency typed as a fraction", demo("peff", "0,52,0.71,76,72%"), "", "peff", "point 3", "peff=0,52,0.71,76,72%", true},
		{"a speed in rpm without the rated speed", demo("spd", "1305rpm"), "", "spd", "rated speed", "spd=1305rpm", true},
		{"a speed in Hz without the mains frequency", demo("spd", "45Hz"), "", "spd", "mains frequency", "spd=45Hz", true},
		{"a speed in a unit of neither", demo("spd", "45kPa"), "", "spd", "", "spd=45kPa", true},
		{"a rated speed of zero", demo("nrat", "0rpm"), "", "nrat", "above zero", "nrat=0rpm", true},
		{"a flow no speed in range can reach", demo("qsp", "500L/s"), "", "qsp", "no speed in range", "qsp=500L/s", true},
		{"a head to reach below the line's static head", demo("hsp", "20m"), "", "hsp", "moves no liquid", "hsp=20m", true},
		{"a head no speed in range can give", demo("hsp", "900m"), "", "hsp", "no speed in range", "hsp=900m", true},
		{"running hours beyond a year", demo("hours", "9000"), "", "hours", "8784", "hours=9000", true},
		{"running hours as a word", demo("hours", "many"), "", "hours", "plain number", "hours=many", true},
		{"a negative tariff", demo("tariff", "-0.2"), "", "tariff", "zero or more", "tariff=-0.2", true},
		// Glycol mixes (issue 12).
		{"a glycol share above 60 % by mass", with("liq=pg", "gly=70%"), "", "gly", "between 0 and 60 % by mass", "gly=70%", false},
		{"a negative glycol share", with("liq=eg", "gly=-5%"), "", "gly", "between 0 and 60 %", "gly=-5%", false},
		{"a glycol share by volume above the range", with("liq=eg", "glyv=65%"), "", "glyv", "by volume", "glyv=65%", false},
		{"a glycol share in a unit of its own", with("liq=eg", "gly=30kg"), "", "gly", "", "gly=30kg", false},
		{"a glycol mix with no share", with("liq=pg"), "", "gly", "glycol share", "liq=pg", false},
		{"a glycol mix below its freezing point", with("liq=pg", "gly=30%", "t=-20C"), "", "t", "freezes at −12.79 °C", "t=-20C", false},
		{"a glycol mix above 100 °C", with("liq=eg", "gly=30%", "t=120C"), "", "t", "freezing point", "t=120C", false},
		{"a glycol share typed as a fraction", with("liq=pg", "gly=0.3"), "", "gly", "30 %", "gly=0.3", false},
		{"a glycol share typed as a fraction, kept", with("liq=pg", "gly=0.3", "keep=gly"), "", "", "", "gly=0.3", true},
		{"a velocity so large the head overflows", with("v1=1e200m/s"), "", "", "", "v1=1e200m/s", false},
		{"a pressure so large the head overflows", with("p1=1e300kPa", "p2=-1e300kPa", "solve=ht"), "", "", "", "p1=1e300kPa", false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			s, err := Parse(tc.query)
			switch {
			case tc.linkErr == "" && err != nil:
				t.Errorf("the link failed: %v", err)
			case tc.linkErr != "" && (err == nil || !strings.Contains(linkWorded(err), tc.linkErr)):
				t.Errorf("link error %q, want it to contain %q", linkWorded(err), tc.linkErr)
			}
			r := Evaluate(Read(s))
			if tc.param != "" {
				fe, ok := r.Errors[tc.param]
				m := ""
				if ok {
					m = worded(fe, r.US)
				}
				if !ok {
					t.Errorf("no message on %s (errors %v)", tc.param, r.Errors)
				} else if !strings.HasPrefix(m, tc.param+":") || !strings.Contains(m, tc.msg) {
					t.Errorf("message %q should name %s and say %q", m, tc.param, tc.msg)
				}
			}
			for p, fe := range r.Errors {
				if m := fe.Error(); !strings.HasPrefix(m, p+":") {
					t.Errorf("message %q on %s does not name its field", m, p)
				}
			}
			if k, v, _ := strings.Cut(tc.keep, "="); s.Get(k) != v {
				t.Errorf("%s is %q, want %q kept as given", k, s.Get(k), v)
			}
			if tc.balance && r.Balance == nil {
				t.Errorf("the balance was lost (errors %v)", r.Errors)
			}
			// A link written back never carries markup literally.
			if enc := s.Encode(); strings.ContainsAny(enc, "<>\"") {
				t.Errorf("Encode writes markup characters literally: %.80s", enc)
			}
			checkFinite(t, tc.name, r)
			deepFinite(t, "Result", reflect.ValueOf(r))
		})
	}

	// Over the size limit the link is refused as a whole, with a message
	// that says why (the page then keeps the sheet saved on the device).
	s, err := Parse(base + "&name=" + long)
	if w := linkWorded(err); !strings.Contains(w, "bytes, longer than") {
		t.Errorf("a link of %d bytes: error %q, want it refused as too long", len(base)+len(long), linkWorded(err))
	}
	if len(s.Encode()) != 0 {
		t.Errorf("a refused link should give an empty scenario, not part of one: %.60s", s.Encode())
	}
}

// deepFinite fails on any NaN or Inf reachable from v: every number of a
// result returned for display.
func deepFinite(t *testing.T, path string, v reflect.Value) {
	t.Helper()
	switch v.Kind() {
	case reflect.Float32, reflect.Float64:
		if f := v.Float(); math.IsNaN(f) || math.IsInf(f, 0) {
			t.Errorf("%s = %v", path, f)
		}
	case reflect.Pointer, reflect.Interface:
		if !v.IsNil() {
			deepFinite(t, path, v.Elem())
		}
	case reflect.Struct:
		for i := 0; i < v.NumField(); i++ {
			deepFinite(t, path+"."+v.Type().Field(i).Name, v.Field(i))
		}
	case reflect.Slice, reflect.Array:
		for i := 0; i < v.Len(); i++ {
			deepFinite(t, fmt.Sprintf("%s[%d]", path, i), v.Index(i))
		}
	case reflect.Map:
		for _, k := range v.MapKeys() {
			deepFinite(t, fmt.Sprintf("%s[%v]", path, k), v.MapIndex(k))
		}
	}
}

// TestSlipWarnings: values that can be right but rarely are get a warning
// naming their field, never a silent result (issue 11). Sources: common
// practice, from memory — no pump reaches 95 % nor motor 98 %; a speed
// above the data sheet's overspeeds the pump.
func TestSlipWarnings(t *testing.T) {
	demo := func(kv ...string) Scenario {
		s := Demo()
		for i := 0; i < len(kv); i += 2 {
			_ = s.Set(kv[i], kv[i+1])
		}
		return s
	}
	for _, tc := range []struct {
		name, param, msg string
		s                Scenario
	}{
		{"overspeed", "spd", "overspeeds the pump", demo("spd", "110%")},
		{"overspeed in rpm", "spd", "overspeeds the pump", demo("spd", "1600rpm", "nrat", "1450rpm")},
		{"a speed for a flow above full speed", "qsp", "overspeed", demo("qsp", "70L/s")},
		{"a motor efficiency of 99 %", "etam", "hardly reach", demo("etam", "99%")},
		{"a pump efficiency above 95 %", "etam", "hardly reach", demo("pin", "21kW", "etam", "93%")},
		{"a data-sheet efficiency of 97 %", "peff", "hardly reach", demo("peff", "0,52,71,97,72%")},
		{"a measured flow below the preferred region", "qm", "below the preferred operating region", demo("qm", "30L/s")},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := Evaluate(Read(tc.s))
			if len(r.Errors) > 0 {
				t.Fatalf("errors %v", r.Errors)
			}
			found := false
			for _, w := range r.Warnings {
				found = found || (w.Param == tc.param && strings.Contains(warningWords(w, r.US), tc.msg))
			}
			if !found {
				t.Errorf("no warning on %s saying %q: %v", tc.param, tc.msg, r.Warnings)
			}
			deepFinite(t, "Result", reflect.ValueOf(r))
		})
	}
}
