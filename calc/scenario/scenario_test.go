package scenario

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
)

func TestParseEncodeRoundTrip(t *testing.T) {
	q := Demo().Encode()
	s, err := Parse("?" + q)
	if err != nil {
		t.Fatal(err)
	}
	if got := s.Encode(); got != q {
		t.Errorf("round trip changed the link:\n got %s\nwant %s", got, q)
	}
	// Units and lists stay readable in the link.
	for _, want := range []string{"q=45L/s", "s1.fit=entry_sharp:1,elbow90lr:1,gate:1&s1.z=214.5m", "z2=251m", "pq=0,20,40,55,70L/s"} {
		if !strings.Contains(q, want) {
			t.Errorf("link %q lacks %q", q, want)
		}
	}
}

// TestSignedAtTheLimit: a sheet whose canonical link is as long as a link
// may be (MaxQueryBytes, this project's limit) is signed and read back
// whole; FuzzSheets found such a sheet lost on import when the check field
// pushed its line past the limit.
func TestSignedAtTheLimit(t *testing.T) {
	var s Scenario
	_ = s.Set("z1", "3m")
	_ = s.Set("name", "x")
	_ = s.Set("name", strings.Repeat("x", 1+MaxQueryBytes-len(s.Encode())))
	if n := len(s.Encode()); n != MaxQueryBytes {
		t.Fatalf("the canonical link is %d bytes, want %d", n, MaxQueryBytes)
	}
	got, err := Parse(s.Sign())
	if err != nil || got.Encode() != s.Encode() {
		t.Errorf("a signed link at the limit: %v", err)
	}
	if _, err := Parse(s.Sign() + "x"); err == nil {
		t.Error("a byte more than a signed link at the limit is read")
	}
}

// TestFirstFieldLikeCheck: a sheet whose link starts with a field of the
// check field's form (the extra ΣK given as 8 hex digits, the first field
// in link order) reads back as that field, signed or not, and a check
// whose name lost its "c" in transit is still read as the check
// (mangledCheck). FuzzScenario found the first read back as a damaged link.
func TestFirstFieldLikeCheck(t *testing.T) {
	for _, v := range []string{"12345678", "dddddddd", "1234abcd.AB.2"} {
		var s Scenario
		_ = s.Set("k", v)
		got, err := Parse(s.Encode())
		if err != nil || got.Get("k") != v || got.Encode() != s.Encode() {
			t.Errorf("k=%s: read back as %q (%v), link %q", v, got.Get("k"), err, s.Encode())
		}
		got, err = Parse(s.Sign())
		if err != nil || got.Get("k") != v {
			t.Errorf("k=%s signed: read back as %q (%v)", v, got.Get("k"), err)
		}
	}
	d := Demo()
	mangled := "k" + strings.TrimPrefix(d.Sign(), CheckParam)
	if got, err := Parse(mangled); err != nil || got.Encode() != d.Encode() {
		t.Errorf("the demo's signed link with its check named k: %v", err)
	}
}

func TestParseLinkErrors(t *testing.T) {
	tests := []struct {
		query string
		kind  LinkKind
		name  string // the parameter the error names
		want  string // in the error as the page words it
		kept  string // a parameter that must survive
	}{
		{"z1=3m&zz=4", LinkUnknown, "zz", `"zz": not a Fieldhead parameter`, "z1"},
		{"z1=3m&z1=4m", LinkTwice, "z1", `"z1" (` + Label("z1") + `): given twice`, "z1"},
		{"z1=3m&" + strings.Repeat("a", MaxQueryBytes), LinkTooLong, "", "longer than the 8192", ""},
		{"z1=3m&name=%ff%fe", LinkNotUTF8, "name", "not valid UTF-8", "z1"},
		{"z1=3m&name=a%07b", LinkControl, "name", "control characters", "z1"},
		{"z1=3m&" + strings.Repeat("é", 20) + "=1", LinkUnknown, strings.Repeat("é", 12) + "…", "not a Fieldhead parameter", "z1"},
		{"z1=3m&%ff=1", LinkNotUTF8, "", "name or value is not valid UTF-8", "z1"},
		// 2.7 KB of non-ASCII text triples once escaped: refused whole.
		{"name=" + strings.Repeat("é", 1400), LinkTooLongOut, "", "once written out", ""},
	}
	for _, tc := range tests {
		s, err := Parse(tc.query)
		var le *LinkError
		if !errors.As(err, &le) || le.Kind != tc.kind || le.Name != tc.name {
			t.Errorf("Parse(%.40q): error %#v, want kind %d naming %q", tc.query, err, tc.kind, tc.name)
		}
		if w := linkWorded(err); !strings.Contains(w, tc.want) {
			t.Errorf("Parse(%.40q): error worded %q, want it to contain %q", tc.query, w, tc.want)
		}
		if tc.kept != "" && !s.Has(tc.kept) {
			t.Errorf("Parse(%.40q) dropped %s", tc.query, tc.kept)
		}
	}
	// Every problem of a link is listed, in link order.
	_, err := Parse("zz=1&z1=3m&z1=4m&name=a%07b")
	var list LinkErrors
	if !errors.As(err, &list) || len(list) != 3 || list[0].Kind != LinkUnknown || list[1].Kind != LinkTwice || list[2].Kind != LinkControl {
		t.Errorf("three problems: %v", err)
	}
	var s Scenario
	var le *LinkError
	if err := s.Set("zz", "1"); !errors.As(err, &le) || le.Kind != LinkUnknown || !strings.Contains(linkWorded(err), "not a Fieldhead parameter") {
		t.Errorf("Set of an unknown parameter: %v", err)
	}
}

// TestLenientPercent: a '%' typed by hand in a link is a percent sign.
func TestLenientPercent(t *testing.T) {
	s, err := Parse("spd=90%&peff=0,50,70%25&p1=%zz&t=20C")
	if err != nil {
		t.Fatal(err)
	}
	if s.Get("spd") != "90%" || s.Get("peff") != "0,50,70%" || s.Get("p1") != "%zz" {
		t.Errorf("got spd=%q peff=%q p1=%q", s.Get("spd"), s.Get("peff"), s.Get("p1"))
	}
	if r := Evaluate(Read(s)); r.Errors["p1"] == nil || !strings.HasPrefix(r.Errors["p1"].Error(), "p1:") {
		t.Errorf("p1=%%zz: want a message on p1, got %v", r.Errors)
	}
}

func TestDemo(t *testing.T) {
	r := Evaluate(Read(Demo()))
	if len(r.Errors) > 0 {
		t.Fatalf("the demo has errors: %v", r.Errors)
	}
	if r.Balance == nil || r.Balance.Line == nil || len(r.Balance.Profile) == 0 || r.Convert == nil ||
		r.Pump == nil || r.Pump.Operating == nil || r.NPSH == nil || r.Field == nil {
		t.Fatalf("the demo must fill the balance, line, profile, conversion, pump, NPSH and field check: %+v", r)
	}
	// The curves are worked out for the views that draw them (drawsCurves).
	pumpView := Demo()
	_ = pumpView.Set("view", "pump")
	if len(r.Pump.System) != 0 || len(Evaluate(Read(pumpView)).Pump.System) == 0 {
		t.Errorf("the system curve: %d points on the Balance view, want none; none on the Pump view", len(r.Pump.System))
	}
	if t2 := Evaluate(Read(TurbineDemo())); len(t2.Errors) > 0 || t2.Turbine == nil || t2.BestTurbine == nil {
		t.Errorf("the turbine demo: errors %v, turbine %v", t2.Errors, t2.Turbine)
	}
	// Sanity, not a reference: the static lift is 39 m, so the pump head
	// must exceed it by the (positive) losses.
	if !(r.Balance.Value > 39 && r.Balance.FrictionHead > 0) {
		t.Errorf("pump head %.3g m with losses %.3g m", r.Balance.Value, r.Balance.FrictionHead)
	}
}

// TestBadInputs is the catalogue of bad inputs: each names the parameter
// whose message must appear, with a piece of that message, and a parameter
// whose result must still be computed (nothing else is lost).
func TestBadInputs(t *testing.T) {
	base := "liq=water&t=18C&alt=210m&p1=0kPa&z1=212m&v1=0&p2=0kPa&z2=251m&v2=0&q=45L/s&solve=hp" +
		"&l=640m&d=202.7mm&mat=steel&cv=430kPa"
	set := func(kv string) string {
		k, v, _ := strings.Cut(kv, "=")
		s, _ := Parse(base)
		s.Set(k, v)
		return s.Encode()
	}
	tests := []struct {
		query, param, msg string
		stillConvert      bool // the Convert part must survive
	}{
		{set("z1=") + "&z1=", "z1", "enter the elevation", true},
		{set("z1=high"), "z1", "expected a length", true},
		{set("z1=1e999m"), "z1", "", true},
		{set("z1=NaN"), "z1", "", true},
		{set("z1=Inf m"), "z1", "", true},
		{set("z2=12kPa"), "z2", "length", true},
		{set("d=0mm"), "d", "above zero", true},
		{set("d=-5mm"), "d", "above zero", true},
		{set("d=abc"), "d", "length", true},
		{set("l=-3m"), "l", "must be zero or more", true},
		{set("q=12"), "", "", true}, // a bare number takes L/s: not an error
		{set("q=12kg"), "q", "flow", true},
		{set("q=-5L/s"), "q", "negative", true},
		{set("t=150C"), "t", "", false},
		{set("t=-10C"), "t", "", false},
		{set("t=warm"), "t", "temperature", false},
		{set("t=18kPa"), "t", "temperature", false},
		{set("p1=4m"), "p1", "pressure", true},
		{set("p1ref=x"), "p1ref", "(use g (gauge) or a (absolute))", true},
		{set("mat=unobtainium"), "mat", "", true},
		{set("fit=teleporter:2"), "fit", "", true},
		{set("fit=gate:many"), "fit", "whole number", true},
		{set("fit=gate:2,gate:1"), "fit", "twice", true},
		{set("k=-1"), "k", "zero or more", true},
		{set("fm=guess"), "fm", "", true},
		{set("solve=everything"), "solve", "not one of the choices", true},
		{set("alpha=3"), "alpha", "auto", true},
		{set("liq=mercury"), "liq", "seawater", false},
		{set("units=imperial"), "units", "si or us", true},
		{set("alt=99999m"), "alt", "", false},
		{set("baro=-3kPa"), "baro", "above zero", false},
		{set("view=map"), "view", "regime (Run and sizes), line, pump, report", true},
		{set("eps=-1mm"), "eps", "zero or more", true},
		{set("chw=0"), "chw", "above zero", true},
		{set("name=<script>alert(1)</script>"), "", "", true}, // text, kept as text
		{set("cv=loud"), "cv", "pressure", false},
		{set("cv=3kg"), "cv", "pressure", false},
	}
	for _, tc := range tests {
		s, err := Parse(tc.query)
		if err != nil {
			t.Errorf("%s: the link itself failed: %v", tc.query, err)
			continue
		}
		r := Evaluate(Read(s))
		if tc.param != "" {
			fe, ok := r.Errors[tc.param]
			if !ok {
				t.Errorf("%s: no message on %s (errors %v)", tc.query, tc.param, r.Errors)
				continue
			}
			m := worded(fe, r.US)
			if !strings.HasPrefix(m, tc.param+":") {
				t.Errorf("%s: message %q does not start with the field's name", tc.query, m)
			}
			if !strings.Contains(m, tc.msg) {
				t.Errorf("%s: message %q lacks %q", tc.query, m, tc.msg)
			}
		} else if len(r.Errors) > 0 {
			t.Errorf("%s: unexpected errors %v", tc.query, r.Errors)
		}
		if tc.stillConvert && r.Convert == nil {
			t.Errorf("%s: the conversion was lost", tc.query)
		}
		// Whatever was typed is still in the scenario.
		for _, part := range strings.Split(tc.query, "&") {
			p, v, _ := strings.Cut(part, "=")
			if v != "" && !s.Has(p) {
				t.Errorf("%s: %s was dropped", tc.query, p)
			}
		}
		checkFinite(t, tc.query, r)
	}
}

// checkFinite fails on a NaN or Inf in a result reported as computed.
func checkFinite(t *testing.T, what string, r Result) {
	t.Helper()
	walkFloats(reflect.ValueOf(r), "Result", map[uintptr]bool{}, func(path string, v float64) {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Errorf("%s: %s is %v", what, path, v)
		}
	})
}

// walkFloats calls f for every float64 reachable from v: fields (exported
// or not), pointers, slices, arrays, maps and interfaces, each pointer
// once.
func walkFloats(v reflect.Value, path string, seen map[uintptr]bool, f func(string, float64)) {
	switch v.Kind() {
	case reflect.Float64, reflect.Float32:
		f(path, v.Float())
	case reflect.Pointer:
		if v.IsNil() || seen[v.Pointer()] {
			return
		}
		seen[v.Pointer()] = true
		walkFloats(v.Elem(), path, seen, f)
	case reflect.Interface:
		if !v.IsNil() {
			walkFloats(v.Elem(), path, seen, f)
		}
	case reflect.Struct:
		for i := 0; i < v.NumField(); i++ {
			walkFloats(v.Field(i), path+"."+v.Type().Field(i).Name, seen, f)
		}
	case reflect.Slice, reflect.Array:
		for i := 0; i < v.Len(); i++ {
			walkFloats(v.Index(i), path+"["+strconv.Itoa(i)+"]", seen, f)
		}
	case reflect.Map:
		it := v.MapRange()
		for it.Next() {
			walkFloats(it.Value(), path+"["+fmt.Sprint(it.Key())+"]", seen, f)
		}
	}
}

// checkBoxesReadBack: the text every box shows, with its picker's unit,
// reads back to the value Read used (a box always shows what the result
// was worked out from).
func checkBoxesReadBack(t *testing.T, what string, s Scenario) {
	t.Helper()
	d := NewDraft(s)
	in := Read(s)
	for _, p := range in.sortedGiven() {
		v, ok := in.Value(p)
		row, _, _ := Lookup(p)
		if !ok || row.Kind != KindQuantity {
			continue
		}
		box, unit := d.Box(p)
		back := Scenario{raw: map[string]string{p: compose(p, box, unit)}}
		for _, ctx := range []string{"units", "liq", p + "ref"} {
			if c := s.Get(ctx); c != "" {
				back.raw[ctx] = c
			}
		}
		back2 := Read(back)
		w, ok := back2.Value(p)
		if !ok || w.SI != v.SI || w.Abs != v.Abs || w.Dim != v.Dim {
			t.Errorf("%s: the box of %s shows %q %q, which reads as %v (%v), not the %v Read used", what, p, box, unit, w.SI, ok, v.SI)
		}
	}
}

// TestSplitSegment: segment parameters are sN.field with N written
// without leading zeros (the link's own syntax, doc.go).
func TestSplitSegment(t *testing.T) {
	for in, want := range map[string]int{"s1.l": 1, "s20.fit": 20, "solve": 0, "s.l": 0, "sx.l": 0, "s3": 0, "s12.": 12, "s01.l": 0} {
		if got, _ := splitSegment(in); got != want {
			t.Errorf("splitSegment(%q) = %d, want %d", in, got, want)
		}
	}
}

func TestSplit(t *testing.T) {
	tests := []struct{ in, num, unit string }{
		{"45 L/s", "45", "L/s"}, {"-18kPa", "-18", "kPa"}, {"1e-3 m", "1e-3", "m"},
		{"12,5psi", "12,5", "psi"}, {"3", "3", ""}, {"  ", "", ""}, {"2.5e3Pa", "2.5e3", "Pa"},
		{"5 ft", "5", "ft"}, {"7e", "7", "e"},
	}
	for _, tc := range tests {
		n, u := Split(tc.in)
		if n != tc.num || u != tc.unit {
			t.Errorf("Split(%q) = %q, %q; want %q, %q", tc.in, n, u, tc.num, tc.unit)
		}
	}
}

func TestChoicesAndUnits(t *testing.T) {
	for _, p := range []string{"view", "units", "liq", "solve", "alpha", "fm", "mat", "nps", "sch", "fit", "p1ref"} {
		if len(Choices(p)) == 0 {
			t.Errorf("Choices(%s) is empty", p)
		}
	}
	for _, row := range Table {
		p := row.Name
		if row.Segment && p == "z" {
			p = "s1.z" // a segment's own parameter
		}
		if row.Kind != KindQuantity && row.Kind != KindList {
			continue
		}
		for _, us := range []bool{false, true} {
			us := UnitChoices(p, us)
			if len(us) < 2 {
				t.Errorf("UnitChoices(%s) = %v", p, us)
			}
		}
	}
}

// quoted matches what a message quotes of the user's input (strconv.Quote).
var quoted = regexp.MustCompile(`"(?:[^"\\]|\\.)*"`)

func FuzzScenario(f *testing.F) {
	f.Add(Demo().Encode())
	f.Add("z1=3m&z1=4m")
	f.Add("solve=q&l=1m&d=1mm&eps=0&q=0&p1=0&p2=0&z1=0&z2=0&v1=0&v2=0&liq=water&t=20C")
	f.Add("liq=custom&rho=1e-300kg/m3&mu=1e300Pa.s&pv=0&cv=1e308kPa")
	f.Add("%zz&name=%3Cb%3E")
	f.Add(Demo().Encode() + "&etam=92%&gcs=1.6%&gss=250kPa&gcd=1%&gsd=1000kPa&uqm=2%&upin=1.5%&uz=10mm&grade=2B" +
		"&qsp=70L/s&nrat=1450rpm&fmains=50Hz&hours=3000&tariff=0.18")
	f.Add("pq=0,10,20,30L/s&ph=40,44,42,30m&peff=0,0.5,0.7,0.6&spd=45Hz&fmains=0Hz&qsp=1e300L/s")
	f.Add(strings.NewReplacer("liq=water", "liq=pg&glyv=30%", "t=18C", "t=-40C").Replace(Demo().Encode()))
	f.Add("liq=eg&gly=60%&t=-48C&baro=20kPa&view=convert&cv=1e-300kPa")
	f.Add(TurbineDemo().Encode() + "&tc=1e-300s&wall=1e-300mm&epipe=1e300GPa&kliq=1e300GPa&cr=2&dv=1e300m/s")
	f.Fuzz(func(t *testing.T, q string) {
		s, _ := Parse(q)
		r := Evaluate(Read(s))
		checkFinite(t, fmt.Sprintf("%.60q", q), r)
		checkBoxesReadBack(t, fmt.Sprintf("%.60q", q), s)
		for p, fe := range r.Errors {
			// A "?" stands for a missing word unless the user typed it
			// (echoed in quotes).
			m := worded(fe, r.US)
			placeholder := strings.Contains(quoted.ReplaceAllString(m, ""), "?") && !strings.Contains(m, "did you mean")
			if !strings.HasPrefix(m, p+":") || strings.ContainsRune(m, '\uE000') || placeholder {
				t.Errorf("%q: message %q on %s does not name its field", q, m, p)
			}
		}
		// The link survives a round trip; a value holding a control
		// character is kept, and reported again.
		s2, err := Parse(s.Encode())
		var list LinkErrors
		if errors.As(err, &list) && !slices.ContainsFunc(list, func(e *LinkError) bool { return e.Kind != LinkControl }) {
			err = nil
		}
		if err != nil || s2.Encode() != s.Encode() {
			t.Errorf("%q: round trip failed: %v", q, err)
		}
	})
}

// The water is taken at the mean of the points' absolute pressures (pl absent).
func ExampleEvaluate() {
	s, _ := Parse("liq=water&t=20C&alt=0m&p1=0kPa&z1=10m&v1=0&p2=150kPa&z2=18m&d2=50mm" +
		"&q=4L/s&solve=hp&l=60m&d=50mm&mat=pvc&fit=elbow90:3,gate:1")
	r := Evaluate(Read(s))
	fmt.Println("pump head", ShowParam("hp", r.Balance.Value, false))
	fmt.Println("regime", r.Run.Regime, "at Re", calc.FormatNumber(r.Run.Reynolds, 4))
	// Output:
	// pump head 28.52 m
	// regime turbulent at Re 101500
}

// TestUnitChoicesFitTheField checks that each picker offers the units its
// kind of value is given in (common practice: gauges read in kPa, bar,
// MPa, psi or a liquid column, never GPa or ksi; elevations and heads in
// m, cm, mm, ft or in; a run's length in km too; a roughness in µm too; a
// pipe wall's modulus in GPa, MPa, psi or ksi), and that a value linked in
// a unit a picker leaves out is still read, its box showing it as typed.
// The conversions are GNU units' (units '0.1 km' m: 100; '2 GPa' Pa: 2e9).
func TestUnitChoicesFitTheField(t *testing.T) {
	for _, c := range []struct {
		param      string
		us         bool
		has, lacks []string
	}{
		{"p1", false, []string{"kPa", "bar", "MPa", "Pa", "psi", "mH2O", "ftH2O", "inHg"}, []string{"GPa", "ksi"}},
		{"ps", true, []string{"psi", "kPa", "bar", "inHg"}, []string{"GPa", "ksi"}},
		{"z1", false, []string{"m", "cm", "mm", "ft", "in"}, []string{"km", "µm"}},
		{"s1.z", true, []string{"ft", "m"}, []string{"km", "µm"}},
		{"s1.l", false, []string{"m", "km", "ft"}, []string{"µm"}},
		{"l", true, []string{"ft", "km"}, []string{"µm"}},
		{"s2.eps", false, []string{"mm", "µm", "in"}, []string{"km"}},
		{"d", false, []string{"mm", "in"}, []string{"km", "µm"}},
		{"epipe", false, []string{"GPa", "MPa", "psi", "ksi"}, []string{"kPa", "bar", "mH2O", "inHg"}},
		{"kliq", true, []string{"ksi", "GPa"}, []string{"kPa", "ftH2O"}},
		{"cv", false, []string{"kPa", "GPa", "ksi", "m", "ft"}, nil},
		{"pin", false, []string{"kW", "W", "hp"}, []string{"Btu/h", "TR"}},
		{"load", true, []string{"Btu/h", "TR", "kW"}, nil},
		{"tc", false, []string{"s", "min"}, []string{"d"}},
	} {
		got := UnitChoices(c.param, c.us)
		if def := DefaultUnit(c.param, c.us); len(got) == 0 || got[0] != def {
			t.Errorf("UnitChoices(%s, us=%v) = %v: want the default %s first", c.param, c.us, got, def)
		}
		for _, u := range c.has {
			if !slices.Contains(got, u) {
				t.Errorf("UnitChoices(%s, us=%v) = %v: want %s", c.param, c.us, got, u)
			}
		}
		for _, u := range c.lacks {
			if slices.Contains(got, u) {
				t.Errorf("UnitChoices(%s, us=%v) = %v: %s has no place there", c.param, c.us, got, u)
			}
		}
	}

	// A link holding units a picker leaves out: read in full, shown as typed.
	s, err := Parse("units=si&z1=0.1km&epipe=2GPa&p1=0.5MPa&z2=150cm")
	if err != nil {
		t.Fatal(err)
	}
	in := Read(s)
	for p, want := range map[string]float64{"z1": 100, "epipe": 2e9, "p1": 5e5, "z2": 1.5} {
		if got := in.Num(p); !in.OK(p) || math.Abs(got-want) > 1e-9*want {
			t.Errorf("%s read as %g (problem %v), want %g", p, got, in.Problems[p], want)
		}
	}
	d := NewDraft(s)
	for p, want := range map[string][2]string{"z1": {"0.1km", ""}, "epipe": {"2", "GPa"}, "p1": {"0.5", "MPa"}, "z2": {"150", "cm"}} {
		if box, unit := d.Box(p); box != want[0] || unit != want[1] {
			t.Errorf("box %s shows %q with the picker on %q, want %q with %q", p, box, unit, want[0], want[1])
		}
	}
	boxesMatch(t, "a link with a unit no picker of its field offers", &d)
}
