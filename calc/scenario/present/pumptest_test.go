package present

import (
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// testedDemo is the demo with instrument accuracies, a motor efficiency,
// a grade, a flow to reach by speed and a tariff: every part of the pump
// test on one sheet (invented inputs, for wording only).
func testedDemo(t *testing.T, sc scenario.Scenario) scenario.Scenario {
	return with(t, sc, "etam", "92%", "gcs", "1.6%", "gcd", "1.6%", "uqm", "2%", "upin", "1.5%",
		"grade", "2B", "qsp", "70L/s", "nrat", "1450rpm", "fmains", "50Hz", "hours", "3000", "tariff", "0.18")
}

// level finds the badge with id in the cards.
func level(cards []Card, id string) (Block, bool) {
	for _, c := range cards {
		for _, bl := range c.Blocks {
			if bl.Kind == BlockLevel && bl.ID == id {
				return bl, true
			}
		}
	}
	return Block{}, false
}

func TestPumpTestWording(t *testing.T) {
	// Source: the view model words scenario.Evaluate's results with
	// scenario.Show in the sheet's units: value ± band from
	// Result.FieldBands, the verdict badge from Result.Acceptance (its
	// class from the verdict), the speed for a flow from PumpResult.SpeedFor
	// and the energy from Result.Energy. A US sheet shows no SI unit after
	// a figure but the electrical input as entered (in kW by design).
	for _, tc := range []struct {
		name  string
		sc    scenario.Scenario
		spans []string
	}{
		{"SI", scenario.Demo(), []string{"gss", "250kPa", "gsd", "1000kPa"}},
		{"US", usDemo(t), []string{"gss", "36psi", "gsd", "145psi"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			sc := with(t, testedDemo(t, tc.sc), tc.spans...)
			sh, r := sheetOf(t, sc, "pump")
			if len(r.Errors) > 0 {
				t.Fatalf("errors %v", r.Errors)
			}
			f, u, a := r.Field, r.FieldBands, r.Acceptance
			if u == nil || a == nil || r.Pump.SpeedFor == nil || r.Energy == nil {
				t.Fatalf("missing parts: bands %v, acceptance %v, speed %v, energy %v", u, a, r.Pump.SpeedFor, r.Energy)
			}
			us := r.US
			show := func(v float64, d calc.Dimension) string { return scenario.Show(v, d, us) }
			// A band is one unbreakable piece ("± 1.684 m" with no-break
			// spaces), so that its unit never stands alone on a line.
			pm := func(s string) string { return " " + strings.ReplaceAll("± "+s, " ", "\u00a0") }
			for id, want := range map[string]string{
				"band-head":     show(f.Head, calc.Length) + pm(show(u.Head.U, calc.Length)),
				"band-power":    show(f.HydraulicPower, calc.Power) + pm(show(u.Power.U, calc.Power)),
				"band-wire":     percent(f.Efficiency) + pm(percent(u.Wire.U)),
				"band-pump":     percent(f.PumpEfficiency) + pm(percent(u.Pump.U)),
				"energy-vol":    show(r.Energy.PerVolume, calc.SpecificEnergy),
				"energy-head":   show(r.Energy.PerVolumeHead, calc.SpecificEnergyHead),
				"speed-for":     percent(r.Pump.SpeedFor.Ratio),
				"accept-head":   show(a.Head.Low, calc.Length) + " to " + show(a.Head.High, calc.Length),
				"field-eff-dev": "percentage points",
			} {
				if got := figure(t, sh.Cards, id); !strings.Contains(got, want) {
					t.Errorf("%s: %q, want it to hold %q", id, got, want)
				}
			}
			if got := figure(t, sh.Cards, "speed-for"); !strings.Contains(got, "rpm") || !strings.Contains(got, "Hz") {
				t.Errorf("speed for a flow %q lacks rpm and Hz", got)
			}
			bl, ok := level(sh.Cards, "accept-level")
			want := map[calc.Verdict]string{calc.Within: "lvl-ok", calc.Outside: "lvl-danger", calc.CannotTell: "lvl-caution"}[a.Verdict]
			if !ok || bl.Class != want || !strings.Contains(bl.Text, "grade 2B") {
				t.Errorf("verdict badge %+v, want class %s naming grade 2B", bl, want)
			}
			if a.Verdict == calc.CannotTell && !strings.Contains(bl.Text, "improve") {
				t.Errorf("an undecided verdict %q does not say what to improve", bl.Text)
			}
			var labels []string
			for _, m := range card(t, sh.Cards, "pump-chart-card").Blocks[1].Chart.Markers {
				labels = append(labels, m.Label)
			}
			if !strings.Contains(strings.Join(labels, "|"), "measured\n") || !strings.Contains(strings.Join(labels, "|"), " ± ") {
				t.Errorf("markers %q lack the measured point with its band", labels)
			}
			if us {
				entered := enteredInSI(sh)
				walk(reflect.ValueOf(sh), "", func(name, s string) {
					if bad := siAfterDigit(s); len(bad) > 0 && !entered[s] {
						t.Errorf("%s %q has SI units %v", name, s, bad)
					}
				})
			}
			for _, line := range []string{figure(t, sh.Cards, "band-head"), figure(t, sh.Cards, "band-pump"), bl.Text,
				figure(t, sh.Cards, "accept-head"), figure(t, sh.Cards, "speed-for"), figure(t, sh.Cards, "energy-vol")} {
				t.Log(line)
			}
		})
	}
}

func TestSlipMessageBesideItsField(t *testing.T) {
	// Source: issue 11's guard — a fraction typed in a percentage box is
	// refused with the percentage meant, beside its own box, and listed
	// with the field's name.
	sh, r := sheetOf(t, with(t, scenario.Demo(), "etam", "0.78"), "pump")
	fe := r.Errors["etam"]
	if fe == nil {
		t.Fatal("no error on etam")
	}
	found := false
	walk(reflect.ValueOf(sh.Cards), "", func(name, s string) {
		found = found || (name == "Error" && strings.Contains(s, "did you mean 78 %?") && strings.Contains(s, "motor efficiency"))
	})
	if !found {
		t.Errorf("the etam box does not say %q", fe.Error())
	}
}
