package present

import (
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// TestEveryKindAndReasonWorded: every Kind and every Reason calc can
// report has a wording here, in both unit systems, with no placeholder
// left, and a US sheet's wording has no SI unit after a figure (the
// scanner of TestNoSIUnitsOnUSSheet).
func TestEveryKindAndReasonWorded(t *testing.T) {
	// A full error: every figure slot filled with a quantity, so that a
	// wording that quotes any of them is exercised in both systems.
	full := func(field string, k calc.Kind, r calc.Reason) *calc.FieldError {
		fe := calc.NewFieldError(field, k).Got(calc.Fig(0.3, calc.Length)).Within(calc.Fig(0.2, calc.Length), calc.Fig(0.5, calc.Length)).
			Because(r, declared(r.FigureDims())...).
			Typed("12x").With("q").Given(2)
		fe.Dim, fe.UnitDim = calc.Length, calc.Pressure
		return fe
	}
	check := func(what string, fe *calc.FieldError) map[bool]string {
		out := map[bool]string{}
		for _, us := range []bool{false, true} {
			s := ErrorText(fe, us)
			switch {
			case s == "":
				t.Errorf("%s (us %v): no wording", what, us)
			case strings.Contains(s, "?") && !strings.Contains(s, "did you mean"):
				t.Errorf("%s (us %v): a placeholder is left in %q", what, us, s)
			case strings.ContainsRune(s, '\uE000'):
				t.Errorf("%s (us %v): a figure mark is left in %q", what, us, s)
			}
			if bad := siAfterDigit(s); us && len(bad) > 0 {
				t.Errorf("%s: the US wording %q has SI units %v", what, s, bad)
			}
			out[us] = s
		}
		return out
	}
	for _, k := range calc.Kinds() {
		for _, field := range []string{"d", "pq", "etam", "cat"} {
			w := check(k.String()+" on "+field, full(field, k, calc.ReasonNone))
			if k == calc.NotPositive && field == "d" && !strings.Contains(w[true], "in") {
				t.Errorf("a diameter's figures on a US sheet are not in inches: %q", w[true])
			}
		}
	}
	for _, r := range calc.Reasons() {
		if reasonWording(r) == nil {
			t.Errorf("reason %v has no wording", r)
			continue
		}
		for _, k := range []calc.Kind{calc.OutOfRange, calc.BelowLimit, calc.NoSolution, calc.Missing} {
			check(r.String(), full("p1", k, r))
		}
	}
	// An error lacking the data its reason quotes is still worded, not a panic.
	for _, r := range calc.Reasons() {
		for _, k := range append(calc.Kinds(), calc.KindOther) {
			_ = ErrorText(calc.NewFieldError("q", k).Because(r), true)
		}
	}
	for _, c := range calc.Cautions() {
		_ = WarningText(c, nil, true)
	}
	if n := worded(reasonWords[:]); n != len(calc.Reasons()) {
		t.Errorf("%d wordings for %d reasons", n, len(calc.Reasons()))
	}
}

// TestErrorTextNamesAndUnits: the wording names the field by its label,
// quotes figures in the sheet's units, and other fields by their labels.
func TestErrorTextNamesAndUnits(t *testing.T) {
	// Source: the labels of scenario's table; the figures by scenario.Show
	// and ShowParam (the same unit table), e.g. 203.2 mm = 8 in exactly.
	d := calc.NewFieldError("d1", calc.NotPositive).Got(calc.Fig(-0.2032, calc.Length))
	for _, c := range []struct {
		fe   *calc.FieldError
		us   bool
		want string
	}{
		{d, false, "the " + scenario.Label("d1") + " must be above zero; got " + minus(scenario.ShowParam("d1", -0.2032, false))},
		{d, true, "the " + scenario.Label("d1") + " must be above zero; got " + minus(scenario.ShowParam("d1", -0.2032, true))},
		{calc.NewFieldError("hsp", calc.Missing).With("pq"), false, "give the " + scenario.Label("pq") + " first"},
		{calc.NewFieldError("t", calc.OutsideValidity).Got(calc.Fig(400, calc.Temperature)).
			Within(calc.Fig(273.15, calc.Temperature), calc.Fig(373.15, calc.Temperature)).Because(calc.ReasonWaterProperties), true,
			"the water temperature must be from 32 °F to 212 °F; got 260.3 °F"}, // a limit exact, without padding zeros: 273.15 K = 32 °F and 373.15 K = 212 °F by definition
		{calc.NewFieldError("d1", calc.OutOfRange).Got(calc.Fig(2.5, calc.Length)).Within(calc.Fig(0.6, calc.Length), calc.Fig(2, calc.Length)), false,
			"the " + scenario.Label("d1") + " must be from 600 mm to 2000 mm; got " + scenario.ShowParam("d1", 2.5, false)},
		{calc.NewFieldError("etam", calc.OutOfRange).Got(calc.Num(1.2)).Within(calc.Num(0), calc.Num(1)).Because(calc.ReasonEfficiency), false,
			"the motor efficiency must be above 0 and at most 100 %; got 120 %"},
		{calc.NewFieldError("peff", calc.OutOfRange).At(2).Got(calc.Num(0.0052)).Because(calc.ReasonFractionTyped, calc.Num(0.52)), false,
			"point 2: 0.52 % looks like a fraction typed into the percentage list: did you mean 52 %? (give every efficiency in %, e.g. 0,52,71,76,72%)"},
		{calc.NewFieldError("hours", calc.OutOfRange).Got(calc.Num(9000)).Within(calc.Num(0), calc.Num(8784)), false,
			"the running hours per year must be from 0 to 8784; got 9000"},
		{calc.NewFieldError("units", calc.UnknownChoice).Typed("imperial"), false, `"imperial" is not one of the choices (use si or us)`},
		// A wall of 1e-309 mm: the surge's wave speed leaves the range of numbers (calc.TestSurgeBadInputs).
		{calc.NewFieldError("wall", calc.NotFinite).Got(calc.Fig(1e-312, calc.Length)).Because(calc.ReasonBeyondNumbers), false,
			"the " + scenario.Label("wall") + " (" + scenario.ShowParam("wall", 1e-312, false) + ") is too thin for a pressure wave to be worked out: check the wall thickness and its unit"},
		{&calc.FieldError{Field: "q", Msg: "flow \uE0000; is odd", Figures: []calc.Figure{calc.Fig(0.045, calc.Flow)}}, true, "flow " + scenario.Show(0.045, calc.Flow, true) + " is odd"},
	} {
		if got := ErrorText(c.fe, c.us); got != c.want {
			t.Errorf("%v (us %v):\n got %q\nwant %q", c.fe, c.us, got, c.want)
		}
	}
}

// TestParseErrorWords words each error of calc.Parse as an SI sheet shows
// it: what the box expected, with an example, then what is wrong.
func TestParseErrorWords(t *testing.T) {
	// Source: the messages Fieldhead has shown for these inputs (they were
	// calc's own before errors became data), and the unit examples of
	// calc's dimension table (203 mm, 250 kPa, 1.5 m/s, 18 °C).
	rows := []struct {
		text string
		dim  calc.Dimension
		def  string
		msg  string // after the expectation
	}{
		{"abc", calc.Pressure, "kPa", `"abc" is not a number`},
		{"NaN", calc.Length, "m", `"NaN" is not a finite number`},
		{"1e999", calc.Length, "m", `"1e999" is not a finite number`},
		{"1.2.3 m", calc.Length, "", "more than one separator"},
		{"1,250 m", calc.Length, "", `"1,250" is ambiguous; write 1250 (no grouping) or 1.250 (decimal point)`},
		{"-2,500 kPa", calc.Pressure, "", `"-2,500" is ambiguous; write -2500 (no grouping) or -2.500 (decimal point)`},
		{"250", calc.Pressure, "", `add a unit to "250"`},
		{"3 kPz", calc.Pressure, "", `unknown unit "kPz" (use kPa, bar, MPa, Pa,`},
		{"10 m", calc.Pressure, "", `got a length unit "m" (a water column as a pressure is written mH2O or ftH2O)`},
		{"10 mH2O", calc.Length, "", `got a pressure unit "mH2O"`},
		{"15 L/s", calc.Velocity, "", `got a volumetric flow unit "L/s"`},
		{"2 m²", calc.Length, "", `got an area unit "m²"`},
		{"50 %", calc.Length, "", `got "%", which is a plain-number unit`},
		{"30 psig", calc.Pressure, "", `"psig" names gauge or absolute`},
		{"-300 °C", calc.Temperature, "", `"-300 °C" is below absolute zero`},
	}
	examples := map[calc.Dimension]string{calc.Length: "a length, e.g. 203 mm", calc.Pressure: "a pressure, e.g. 250 kPa",
		calc.Velocity: "a velocity, e.g. 1.5 m/s", calc.Temperature: "a temperature, e.g. 18 °C"}
	for _, r := range rows {
		_, err := calc.Parse("fld", r.text, r.dim, r.def)
		fe, ok := err.(*calc.FieldError)
		if !ok {
			t.Fatalf("Parse(%q): %v", r.text, err)
		}
		got, want := ErrorText(fe, false), "expected "+examples[r.dim]+"; "
		if !strings.HasPrefix(got, want) || !strings.Contains(got, r.msg) {
			t.Errorf("Parse(%q): %q\n want %q…%q", r.text, got, want, r.msg)
		}
	}
	// A US sheet's example is in US units; long input is shortened.
	_, err := calc.Parse("q", strings.Repeat("z", 500), calc.Flow, "")
	if got := ErrorText(err.(*calc.FieldError), true); !strings.HasPrefix(got, "expected a volumetric flow, e.g. 700 gpm; ") || len(got) > 120 {
		t.Errorf("long input on a US sheet: %q", got)
	}
}

// TestEveryCautionWorded: every Caution calc can report has a wording
// here, in both unit systems, with no placeholder left and no SI unit
// after a figure on a US sheet.
func TestEveryCautionWorded(t *testing.T) {
	figs := declared([]calc.Dimension{calc.Length, calc.Length, calc.Length, calc.Dimensionless, calc.Length, calc.Flow})
	for _, c := range calc.Cautions() {
		for _, us := range []bool{false, true} {
			// Exactly the figures the caution declares: a wording that
			// reads one more shows a placeholder and fails here.
			s := WarningText(c, declared(c.FigureDims()), us)
			if s == "" || strings.Contains(s, "?") {
				t.Errorf("%v (us %v): %q", c, us, s)
			}
			if bad := siAfterDigit(s); us && len(bad) > 0 {
				t.Errorf("%v: the US wording %q has SI units %v", c, s, bad)
			}
		}
	}
	if n := worded(cautionWords[:]); n != len(calc.Cautions()) {
		t.Errorf("%d wordings for %d cautions", n, len(calc.Cautions()))
	}
	if WarningText(calc.CautionText, figs, false) != "" {
		t.Error("a warning of text is worded by its own Words")
	}
}

// declared makes one plausible figure of each dimension, in order.
func declared(dims []calc.Dimension) []calc.Figure {
	values := map[calc.Dimension]float64{calc.Length: 3.1, calc.Flow: 0.02, calc.Pressure: 120e3, calc.Velocity: 1.5,
		calc.Dimensionless: 2.3, calc.Temperature: 300, calc.Density: 998, calc.DynamicViscosity: 1e-3,
		calc.Power: 30e3, calc.Duration: 2, calc.Frequency: 24.2, calc.KinematicViscosity: 1e-6}
	out := make([]calc.Figure, len(dims))
	for i, d := range dims {
		v, ok := values[d]
		if !ok {
			v = 1
		}
		out[i] = calc.Fig(v+float64(i)/10, d)
	}
	return out
}

// TestCautionWords: the wording of calc's warnings as an SI sheet shows
// them, and in a US sheet's units.
func TestCautionWords(t *testing.T) {
	// Source: the sentences Fieldhead has shown for these warnings (they
	// were calc's own before warnings became data); figures by
	// scenario.Show, e.g. 0.6 m = 1.969 ft (0.6/0.3048).
	for _, c := range []struct {
		c    calc.Caution
		figs []calc.Figure
		us   bool
		want string
	}{
		{calc.CautionNPSHBelow, []calc.Figure{calc.Fig(10, calc.Length), calc.Fig(12, calc.Length)}, false,
			"NPSH available 10.00 m is below the 12.00 m required: the pump will cavitate (lost head, noise, damage); raise the source, lower the pump, cut the suction losses or cool the liquid"},
		{calc.CautionNPSHUnrated, []calc.Figure{calc.Fig(10, calc.Length), calc.Fig(0.6, calc.Length)}, true,
			"NPSH available is 32.81 ft; give the pump's NPSH required at this flow to judge the margin (margin guidance: NPSHa/NPSHr at least 1.1 (the low end of the 1.1–2.0 range by application in ANSI/HI 9.6.1, from memory) and at least 1.969 ft (common practice, from memory); large, high-energy or hot-liquid pumps need more)"},
		{calc.CautionWireLow, []calc.Figure{calc.Num(0.2), calc.Num(0.3)}, false,
			"the wire-to-water efficiency is only 20 % (below 30 %): look for wear, a throttled or recirculating pump, a motor problem, or a reading error"},
		// A rule of thumb's limits to two significant figures, in the
		// sheet's units (GNU units: 0.3 m/s = 0.98425197 ft/s, 3 m/s =
		// 9.8425197 ft/s, 4 m/s = 13.12336 ft/s; 0.0117 m = 0.46062992 in, 0.598 m = 23.543307
		// in, 0.05 m = 1.9685039 in, 1.2 m = 47.244094 in).
		{calc.CautionVelocityHigh, []calc.Figure{calc.Fig(4, calc.Velocity), calc.Fig(0.3, calc.Velocity), calc.Fig(3, calc.Velocity)}, false,
			"velocity 4.000 m/s is high for a liquid line (usual range about 0.3 m/s–3 m/s, common practice)"},
		{calc.CautionVelocityLow, []calc.Figure{calc.Fig(0.1, calc.Velocity), calc.Fig(0.3, calc.Velocity), calc.Fig(3, calc.Velocity)}, true,
			"velocity 0.3281 ft/s is low for a liquid line (usual range about 0.98 ft/s–9.8 ft/s, common practice)"},
		{calc.CautionPointVelocityHigh, []calc.Figure{calc.Fig(4, calc.Velocity), calc.Fig(3, calc.Velocity)}, true,
			"a velocity of 13.12 ft/s is unusually high for a liquid line (common practice keeps below about 9.8 ft/s): erosion, noise and water-hammer risk"},
		{calc.CautionFittingSizes, []calc.Figure{calc.Fig(1.2, calc.Length), calc.Fig(0.0117, calc.Length), calc.Fig(0.598, calc.Length)}, false,
			"inside diameter 1200 mm is outside the sizes the fitting methods were published for (about 12 mm–600 mm): their K values are extrapolated"},
		{calc.CautionFittingSizes, []calc.Figure{calc.Fig(1.2, calc.Length), calc.Fig(0.0117, calc.Length), calc.Fig(0.598, calc.Length)}, true,
			"inside diameter 47.24 in is outside the sizes the fitting methods were published for (about 0.46 in–24 in): their K values are extrapolated"},
		{calc.CautionHazenSmallPipe, []calc.Figure{calc.Fig(0.05, calc.Length)}, true,
			"Hazen–Williams is meant for pipes of about 2 in and larger: prefer Colebrook"},
		// 300 m = 984.3 ft, 12 m = 39.37 ft (0.3048 m/ft), 14.5 L/s =
		// 229.8 gpm, 30 L/s = 475.5 gpm (231 in³/gal, NIST SP 811).
		{calc.CautionHighPointBreaks, []calc.Figure{calc.Num(2), calc.Num(0), calc.Fig(300, calc.Length), calc.Fig(12, calc.Length), calc.Fig(0.0145, calc.Flow), calc.Fig(0.03, calc.Flow)}, true,
			"high point at the start of segment 2 (984.3 ft from point 1, elevation 39.37 ft): the hydraulic grade line falls below the vapour-pressure line, so the pressure there would be below the liquid's vapour pressure — the column breaks (vapour pockets, a siphon that stops, cavitation and hammer when it rejoins). The pipe runs full only up to 229.8 gpm (with the surplus head taken by a valve at point 2), not the 475.5 gpm of the balance; lower the pipe, reduce the losses upstream or raise the pressure"},
		{calc.CautionInletSuction, []calc.Figure{calc.Num(1), calc.Num(1), calc.Fig(300, calc.Length), calc.Fig(0, calc.Length), calc.Fig(2.1, calc.Length)}, false,
			"at the pump's inlet, the end of segment 1 (300.0 m from point 1, elevation 0.000 m): the hydraulic grade line is 2.100 m below the pipe crown, so the suction is below atmospheric pressure: air leaks in at joints and seals; check the NPSH on the Pump view"},
		{calc.CautionSurgeSlow, []calc.Figure{calc.Fig(3, calc.Duration), calc.Fig(1.5, calc.Duration), calc.Fig(2.634e6, calc.Pressure)}, false,
			"the closure (3.000 s) is slower than the wave's round trip 2L/a (1.500 s): the rise is smaller than Joukowsky's 2634 kPa, which is then an upper bound; only a transient analysis of the valve's closing curve gives the actual figure"},
		// 2.2e6 Pa = 319.08 psi (GNU units).
		{calc.CautionSurgeColumnUnknown, []calc.Figure{calc.Fig(2.2e6, calc.Pressure)}, true,
			"the static pressure at the valve is not known: unless it is above 319.1 psig (Joukowsky's rise plus the vapour pressure), the low swing after the closure reaches the vapour pressure and the liquid column may part"},
	} {
		if got := WarningText(c.c, c.figs, c.us); got != c.want {
			t.Errorf("%v (us %v):\n got %q\nwant %q", c.c, c.us, got, c.want)
		}
	}
}

// worded counts the codes a wording table words.
func worded[F any](fs []F) int {
	n := 0
	for _, f := range fs {
		if any(f) != nil && !reflect.ValueOf(f).IsNil() {
			n++
		}
	}
	return n
}

// TestWaterTemperatureLimits: a water temperature below the range quotes
// the same range as one above it, the liquid's own (0–100 °C, calc.Water's
// documented range), not the wider saturation line's.
func TestWaterTemperatureLimits(t *testing.T) {
	for _, tv := range []string{"-40C", "250C"} {
		sc := scenario.Demo()
		if err := sc.Set("t", tv); err != nil {
			t.Fatal(err)
		}
		fe := scenario.Evaluate(scenario.Read(sc)).Errors["t"]
		if fe == nil {
			t.Fatalf("t=%s: no error", tv)
		}
		if got := ErrorText(fe, false); !strings.Contains(got, "from 0 °C to 100 °C") {
			t.Errorf("t=%s: %q", tv, got)
		}
	}
	// A negative figure is written with the minus sign (U+2212), never
	// the hyphen: "got −40 °C" (the minus sign as ISO 80000-2 writes it,
	// from memory).
	sc := scenario.Demo()
	_ = sc.Set("t", "-40C")
	got := ErrorText(scenario.Evaluate(scenario.Read(sc)).Errors["t"], false)
	if !strings.Contains(got, "got −40") || strings.Contains(got, "-40") {
		t.Errorf("t=-40C: %q, want the figure as −40 with a minus sign", got)
	}
}
