package present

import (
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// eachField calls f with every input of the cards, segment cards and data
// sheets included.
func eachField(cards []Card, f func(Field)) {
	for _, c := range cards {
		for _, b := range c.Blocks {
			for _, x := range b.Fields {
				f(x)
			}
			if b.Card != nil {
				eachField([]Card{*b.Card}, f)
			}
			if b.DataSheet != nil {
				for _, x := range b.DataSheet.AsText {
					f(x)
				}
			}
		}
	}
}

func selected(opts []Option) string {
	for _, o := range opts {
		if o.Selected {
			return o.Value
		}
	}
	return ""
}

// TestUnitSwitchEveryView switches both demos to US units the way the page
// does (the units buttons' action, Draft.Choose) and back, and walks every
// box, unit picker and data-sheet column of every view: each unit shown
// is the system's default for the box (scenario.DefaultUnit; the motor's
// input is kW in both), and on the US sheet no SI unit follows a figure
// anywhere (the check of TestNoSIUnitsOnUSSheet). The issue this guards:
// after a switch the Line view showed the pump centreline in m beside
// point 1's elevation in ft.
func TestUnitSwitchEveryView(t *testing.T) {
	for _, demo := range []sheetCase{{"demo", scenario.Demo()}, {"turbine demo", scenario.TurbineDemo()}} {
		d := scenario.NewDraft(demo.sc)
		for _, us := range []bool{true, false} {
			units := map[bool]string{true: "us", false: "si"}[us]
			for _, v := range Views {
				d.Choose("units", units) // a second press changes nothing
				d.Choose("view", v.Key)
				r := scenario.Evaluate(scenario.Read(d.Scen))
				sh := Build(&d, r)
				if sh.US != us {
					t.Fatalf("%s %s: the sheet says US %v", demo.name, units, sh.US)
				}
				boxes := 0
				eachField(sh.Cards, func(f Field) {
					if f.Kind != FieldQuantity || f.Box == "" {
						return
					}
					boxes++
					if got, want := selected(f.Options), scenario.DefaultUnit(f.Param, us); got != want {
						t.Errorf("%s %s/%s: box %s shows %q %s, want its %s unit %s", demo.name, units, v.Key, f.Param, f.Box, got, units, want)
					}
				})
				for _, c := range sh.Cards {
					for _, b := range c.Blocks {
						if b.DataSheet == nil {
							continue
						}
						for _, col := range b.DataSheet.Columns {
							if got, want := selected(col.Units), scenario.DefaultUnit(col.Param, us); len(col.Units) > 0 && got != want {
								t.Errorf("%s %s: data-sheet column %s in %q, want %s", demo.name, units, col.Param, got, want)
							}
						}
					}
				}
				if us {
					entered := enteredInSI(sh)
					walk(reflect.ValueOf(sh), "", func(name, s string) {
						if name == "Value" || name == "Units" {
							return // unit pickers' option values
						}
						if bad := siAfterDigit(s); len(bad) > 0 && !entered[s] {
							t.Errorf("%s switched to US, %s: %s %q has SI units %v", demo.name, v.Key, name, s, bad)
						}
					})
				}
				if v.Key == "line" && boxes < 3 || v.Key == "balance" && boxes < 5 {
					t.Errorf("%s %s/%s: only %d boxes with a value: the walk finds too little", demo.name, units, v.Key, boxes)
				}
			}
		}
		if got, want := d.Scen.Encode(), func() string { s := demo.sc.Clone(); _ = s.Set("view", "book"); return s.Encode() }(); got != want {
			t.Errorf("%s: after US and back\n got %s\nwant %s", demo.name, got, want)
		}
	}
}

// TestSizingHintsRound checks that the sizing card's blank marks are the
// sheet's own round figures: 2 and 8 ft/s on a US sheet, 0.6 and 2.4 m/s
// on an SI one (common practice, from memory; calc.DefaultSizingLimitsFor),
// not the other system's converted (2.0–7.9 ft/s).
func TestSizingHintsRound(t *testing.T) {
	for _, c := range []struct {
		units  string
		lo, hi string
	}{{"si", "(blank: 0.6 m/s, common practice)", "(blank: 2.4 m/s)"}, {"us", "(blank: 2 ft/s, common practice)", "(blank: 8 ft/s)"}} {
		d := scenario.NewDraft(scenario.Demo())
		d.Choose("units", c.units)
		d.Choose("view", "regime")
		sh := Build(&d, scenario.Evaluate(scenario.Read(d.Scen)))
		got := map[string]string{}
		eachField(sh.Cards, func(f Field) { got[f.Param] = f.Hint })
		if got["vlo"] != c.lo || got["vhi"] != c.hi {
			t.Errorf("%s: velocity band hints %q, %q; want %q, %q", c.units, got["vlo"], got["vhi"], c.lo, c.hi)
		}
		if m := sizingMethod(c.units == "us"); !strings.Contains(m, strings.TrimSuffix(strings.TrimPrefix(c.lo, "(blank: "), ", common practice)")) {
			t.Errorf("%s: the method's text does not give the low mark: %s", c.units, m)
		}
	}
}
