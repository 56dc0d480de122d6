package scenario

import (
	"testing"

	"fieldhead/calc"
)

// slipExamples gives, for each kind of slip rule, a value that is a slip
// and one that is not (sources: the rules' comments in slips.go — common
// practice — and the examples: 415 Pa for a gauge, 0.02 % for a
// meter, 0.3 % for a glycol share).
var slipExamples = map[slipRule][2]string{
	slipPascals:     {"415Pa", "415kPa"},
	slipGigapascals: {"2.2MPa", "2.2GPa"},
	slipShare:       {"0.9", "90"},
	slipGlycol:      {"0.3", "30"},
	slipAccuracy:    {"0.02", "2"},
}

// TestSlips: every field of the slip table refuses its slip at its box with
// a slip's reason, takes it when kept, and takes a plausible value.
func TestSlips(t *testing.T) {
	for name, rule := range slipRules {
		ex := slipExamples[rule]
		slip := ex[0]
		if name == "peff" {
			slip = "0,0.52,0.71,0.76,0.72"
		}
		for _, tc := range []struct {
			text, keep string
			bad        bool
		}{{slip, "", true}, {slip, name, false}, {ex[1], "", false}} {
			s := Scenario{raw: map[string]string{name: tc.text}}
			if tc.keep != "" {
				s.raw[KeepParam] = "x," + tc.keep
			}
			in := Read(s)
			fe := in.Problems[name]
			if got := Slippable(fe); got != tc.bad {
				t.Errorf("%s=%s keep=%q: slip %v (%v), want %v", name, tc.text, tc.keep, got, fe, tc.bad)
			}
		}
	}
}

// TestSlipTableCoversEveryField: every pressure and percentage of the
// vocabulary has a slip rule or a stated reason for none, so a new one
// cannot slip through unjudged.
func TestSlipTableCoversEveryField(t *testing.T) {
	for _, p := range Table {
		if (p.Kind != KindQuantity && p.Kind != KindList) || (p.Dim != calc.Pressure && p.Dim != calc.Dimensionless) {
			continue
		}
		_, ruled := slipRules[p.Name]
		_, exempt := slipExempt[p.Name]
		if ruled == exempt {
			t.Errorf("%s: in the slip table %v, exempt %v: want exactly one", p.Name, ruled, exempt)
		}
	}
}

// TestKeepDropsOnChange: a value kept as typed is kept in the link until it
// changes; then it is judged afresh.
func TestKeepDropsOnChange(t *testing.T) {
	s, _ := Parse("pd=415Pa")
	d := NewDraft(s)
	if !Slippable(Read(d.Scen).Problems["pd"]) {
		t.Fatal("415 Pa on the discharge gauge is not caught")
	}
	d.Keep("pd")
	if got := d.Scen.Get(KeepParam); got != "pd" {
		t.Fatalf("keep = %q after Keep", got)
	}
	in := Read(d.Scen)
	if in.Bad("pd") || in.Num("pd") != 415 {
		t.Errorf("kept 415 Pa reads as %v (bad %v)", in.Num("pd"), in.Bad("pd"))
	}
	d.Type("pd", "416")
	if got := d.Scen.Get(KeepParam); got != "" {
		t.Errorf("keep = %q after the value changed", got)
	}
}
