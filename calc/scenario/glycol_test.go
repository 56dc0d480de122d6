package scenario

import (
	"math"
	"strings"
	"testing"

	"fieldhead/calc"
)

// A glycol mix is picked and its share typed by mass, then switched to by
// volume and back: the link holds only the side in use, the other side's
// value is held aside and restored (the Draft's rule for either/or groups,
// DEVELOPERS.md), and both sides give the mix Evaluate reports.
func TestGlycolDraft(t *testing.T) {
	d := NewDraft(Demo())
	d.Choose("liq", "pg")
	d.Type("gly", "30")
	r := Evaluate(Read(d.Scen))
	if r.Glycol == nil || r.Glycol.MassFraction != 0.3 || r.Glycol.ByVolume || r.Fluid == nil {
		t.Fatalf("pg 30 %% by mass: %+v, errors %v", r.Glycol, r.Errors)
	}
	if !strings.Contains(r.Fluid.Name, "propylene glycol") {
		t.Errorf("fluid %q", r.Fluid.Name)
	}
	d.Switch("gly", "v")
	d.Type("glyv", "30")
	if d.Scen.Has("gly") || d.Scen.Get("glyv") != "30%" {
		t.Fatalf("by volume: link %s", d.Scen.Encode())
	}
	r = Evaluate(Read(d.Scen))
	want, _ := calc.GlycolMassFraction(calc.PropyleneGlycol, 0.3)
	if r.Glycol == nil || !r.Glycol.ByVolume || math.Abs(r.Glycol.MassFraction-want) > 1e-15 || !(want > 0.3) {
		t.Fatalf("pg 30 %% by volume: %+v, want %v by mass", r.Glycol, want)
	}
	d.Switch("gly", "m")
	if d.Scen.Get("gly") != "30%" || d.Scen.Has("glyv") {
		t.Errorf("back to by mass: link %s", d.Scen.Encode())
	}
	// Water again: the share stays in the link but is not used.
	d.Choose("liq", "water")
	if r := Evaluate(Read(d.Scen)); r.Glycol != nil || r.Fluid == nil || !strings.HasPrefix(r.Fluid.Name, "water") {
		t.Errorf("water with a glycol share left in the link: %+v", r.Glycol)
	}
}
