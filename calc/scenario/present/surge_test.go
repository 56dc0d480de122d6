package present

import (
	"math"
	"reflect"
	"strings"
	"testing"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// surgeDemo is the turbine demo with a wall thickness (160 mm PE, SDR 11:
// 14.6 mm, as ISO 4427 gives it, from memory) and a closing time.
func surgeDemo(t *testing.T, tc string) scenario.Scenario {
	t.Helper()
	sc := scenario.TurbineDemo().Clone()
	for k, v := range map[string]string{"wall": "14.6mm", "tc": tc} {
		if err := sc.Set(k, v); err != nil {
			t.Fatal(err)
		}
	}
	return sc
}

// The moduli's SI unit counts as SI after a figure in every US check.
func init() { siTokens["GPa"] = true }

func findCard(cards []Card, id string) *Card {
	for i := range cards {
		if cards[i].ID == id {
			return &cards[i]
		}
	}
	return nil
}

func TestSurgeCard(t *testing.T) {
	// Source: the card words calc's surge figures (checked against
	// python3-mpmath in ref-surge.case) with scenario.Show, under the
	// screening caution, and says plainly when the closure is slower than
	// 2L/a (Joukowsky's rise is then an upper bound: Wylie & Streeter 1993).
	for _, c := range []struct {
		tc    string
		fast  bool
		label string
	}{{"1s", true, "Joukowsky"}, {"30s", false, "slower than 2L/a"}} {
		sh, r := sheetOf(t, surgeDemo(t, c.tc), "balance")
		if len(r.Errors) > 0 {
			t.Fatalf("errors: %v", r.Errors)
		}
		sr := r.Surge
		if sr == nil || sr.Fast != c.fast {
			t.Fatalf("tc %s: surge %+v", c.tc, sr)
		}
		card := findCard(sh.Cards, "surge")
		if card == nil {
			t.Fatalf("no surge card on the Balance view")
		}
		var caution, answer bool
		for _, b := range card.Blocks {
			switch b.Kind {
			case BlockLevel:
				caution = strings.Contains(b.Text, "Screening estimate") && strings.Contains(b.Text, "licensed engineer") && strings.Contains(b.Text, "transient analysis")
			case BlockAnswer:
				answer = true
				if !strings.Contains(b.Answer.Label, c.label) {
					t.Errorf("tc %s: answer label %q, want it to say %q", c.tc, b.Answer.Label, c.label)
				}
				if want := scenario.Show(sr.DeltaP, calc.Pressure, false); b.Answer.Values[0].Text != want {
					t.Errorf("tc %s: rise %q, want %q", c.tc, b.Answer.Values[0].Text, want)
				}
			}
		}
		if !caution || !answer {
			t.Errorf("tc %s: caution %v, answer %v", c.tc, caution, answer)
		}
		rep, _ := sheetOf(t, surgeDemo(t, c.tc), "report")
		found := false
		walk(reflect.ValueOf(rep.Cards), "", func(_, s string) { found = found || strings.Contains(s, "Joukowsky rise") })
		if !found {
			t.Errorf("tc %s: the report has no surge line", c.tc)
		}
	}
	// A sheet with no pipe between the points offers no surge card.
	sc := scenario.Demo().Clone()
	for i, n := 1, sc.SegmentCount(); i <= n; i++ {
		for _, f := range scenario.SegmentFields {
			_ = sc.Set(scenario.SegmentParam(i, f), "")
		}
	}
	_ = sc.Set("hf", "5m")
	if sh, _ := sheetOf(t, sc, "balance"); findCard(sh.Cards, "surge") != nil {
		t.Error("a surge card without a pipe run")
	}
}

func TestSurgeAndHydroUS(t *testing.T) {
	// Source: a US sheet words every figure in US customary units
	// (scenario.DefaultUnit with us): the surge and turbine figures too,
	// moduli in ksi.
	us := usOf(t, surgeDemo(t, "1s"))
	for _, v := range []string{"balance", "pump", "report"} {
		sh, r := sheetOf(t, us, v)
		if len(r.Errors) > 0 {
			t.Fatalf("%s: errors %v", v, r.Errors)
		}
		entered := enteredInSI(sh)
		walk(reflect.ValueOf(sh.Cards), "", func(name, s string) {
			if bad := siAfterDigit(s); len(bad) > 0 && !entered[s] {
				t.Errorf("%s: %s %q has SI units %v", v, name, s, bad)
			}
		})
	}
}

func TestHydroFacts(t *testing.T) {
	// Source: the turbine card words calc's shares of the gross head and
	// the no-flow inlet pressure p1 + ρ·g·(z1 − z2) (ref-surge.case checks
	// the figures), and cautions that the flow of most output is not a
	// design flow.
	sh, r := sheetOf(t, scenario.TurbineDemo(), "pump")
	tr := r.Turbine
	if tr == nil || r.BestTurbine == nil {
		t.Fatal("no turbine result for the turbine demo")
	}
	card := findCard(sh.Cards, "turbine")
	if card == nil {
		t.Fatal("no turbine card")
	}
	facts, labels := map[string]string{}, map[string]string{}
	for _, b := range card.Blocks {
		for _, f := range b.Facts {
			facts[f.ID], labels[f.ID] = f.Value, f.Label
		}
	}
	if got, want := facts["turb-loss-share"], percent(tr.LossShare); got != want {
		t.Errorf("loss share %q, want %q", got, want)
	}
	if got := facts["turb-static"]; !strings.HasPrefix(got, scenario.Show(tr.StaticInlet, calc.Pressure, false)) {
		t.Errorf("no-flow inlet pressure %q, want it to start with %q", got, scenario.Show(tr.StaticInlet, calc.Pressure, false))
	}
	if !strings.Contains(labels["turb-best-note"], "not a design flow") || !strings.HasPrefix(facts["turb-best-note"], percent(r.BestTurbine.LossShare)) {
		t.Errorf("best-flow caution %q: %q", labels["turb-best-note"], facts["turb-best-note"])
	}
	if tr.GrossHead <= 0 || tr.LossShare+tr.NetShare > 1 {
		t.Errorf("shares %g + %g of %g m", tr.LossShare, tr.NetShare, tr.GrossHead)
	}
}

func TestLoopSurgeStatic(t *testing.T) {
	// Source: hydrostatics. A closed loop at rest has its static pressure
	// carried by elevation from its expansion vessel's connection, so the
	// valve's static pressure is pexp + ρ·g·(zexp − zv) (the figures are
	// checked with python3-iapws in ref-loops.case); the card offers the
	// valve's elevation on a loop only, names where the static pressure is
	// taken, and a loop without its static pressure has none, rather than
	// the site's pressure at the pump standing in for it.
	base := "loop=1&liq=water&t=20C&baro=101.325kPa&zp=0m&q=30L/s&l=500m&nps=6&sch=40&mat=steel&tc=0.5s&epipe=200GPa&view=balance"
	for _, c := range []struct {
		name, extra string
		known       bool
		label       string
	}{
		{"a valve 25 m up", "&pexp=200kPa&zexp=30m&zv=25m", true, "at the valve's elevation, 25.00 m,"},
		{"no valve elevation", "&pexp=200kPa&zexp=30m", true, "at the pump's level"},
		{"no static pressure", "&zexp=30m&zv=25m", false, ""},
	} {
		sc, err := scenario.Parse(base + c.extra)
		if err != nil {
			t.Fatal(err)
		}
		d := scenario.NewDraft(sc)
		r := scenario.Evaluate(scenario.Read(d.Scen))
		sr := r.Surge
		if sr == nil || sr.StaticKnown != c.known {
			t.Fatalf("%s: surge %+v, errors %v", c.name, sr, r.Errors)
		}
		// Unknown, the static cannot say whether the column parts: the
		// caution gives the static it would take (the rise plus the
		// vapour pressure, gauge) instead of a verdict on the site's.
		var parts, unknown bool
		for _, w := range r.Warnings {
			parts = parts || w.Code == calc.CautionSurgeColumnParts
			if w.Code == calc.CautionSurgeColumnUnknown {
				unknown = true
				want := sr.DeltaP + r.Fluid.VapourPressure - r.SitePressure
				if len(w.Figures) != 1 || math.Abs(w.Figures[0].Value-want) > 1e-9*want {
					t.Errorf("%s: the caution quotes %v, want %g Pa gauge", c.name, w.Figures, want)
				}
			}
		}
		if unknown == c.known || (!c.known && (parts || sr.ColumnParts)) {
			t.Errorf("%s: column parts %v (%v), unknown %v, with the static known %v", c.name, parts, sr.ColumnParts, unknown, c.known)
		}
		sh := Build(&d, r)
		card := findCard(sh.Cards, "surge")
		if card == nil {
			t.Fatalf("%s: no surge card", c.name)
		}
		var box bool
		var static string
		for _, b := range card.Blocks {
			for _, f := range b.Fields {
				box = box || f.Param == "zv"
			}
			for _, f := range b.Facts {
				if f.ID == "surge-static" || f.Label == "static pressure" {
					static = f.Label + ": " + f.Value
				}
			}
		}
		if !box {
			t.Errorf("%s: no box for the valve's elevation on a loop's surge card", c.name)
		}
		switch {
		case c.known && !strings.Contains(static, c.label):
			t.Errorf("%s: static pressure %q, want it taken %s", c.name, static, c.label)
		case !c.known && !strings.Contains(static, "not known: give the loop's static pressure"):
			t.Errorf("%s: static pressure %q, want it not known", c.name, static)
		}
	}
	// A line between two points has no such box: its valve is at point 2.
	sh, _ := sheetOf(t, surgeDemo(t, "1s"), "balance")
	for _, b := range findCard(sh.Cards, "surge").Blocks {
		for _, f := range b.Fields {
			if f.Param == "zv" {
				t.Error("a line's surge card asks for a loop valve's elevation")
			}
		}
	}
}
