package present

import (
	"strings"
	"testing"

	"fieldhead/calc/scenario"
)

// TestSolveGridOfALoop: the solve-for row offers every unknown on a line
// between two points and only the pump head and the flow on a closed loop
// (a loop has no points or static head to solve for), laid out two to a
// row so that no empty cell sits inside the frame (web/fieldhead.css
// .solve-grid.two). This project's own layout rule, no external source.
func TestSolveGridOfALoop(t *testing.T) {
	grid := func(sc scenario.Scenario) Block {
		t.Helper()
		sh, _ := sheetOf(t, sc, "balance")
		for _, bl := range card(t, sh.Cards, "answer-card").Blocks {
			if bl.Kind == BlockButtons && strings.HasPrefix(bl.Class, "solve-grid") {
				return bl
			}
		}
		t.Fatal("no solve-for row")
		return Block{}
	}
	ids := func(bl Block) string {
		var out []string
		for _, b := range bl.Buttons {
			out = append(out, b.ID)
		}
		return strings.Join(out, " ")
	}
	open := grid(scenario.Demo())
	if open.Class != "solve-grid" || len(open.Buttons)%4 != 0 || len(open.Buttons) != len(scenario.Choices("solve")) {
		t.Errorf("open line: class %q, %d buttons (%s): want every unknown, rows of four filled", open.Class, len(open.Buttons), ids(open))
	}
	loop := grid(with(t, scenario.Demo(), "loop", "1"))
	if loop.Class != "solve-grid two" || ids(loop) != "solve-hp solve-q" {
		t.Errorf("closed loop: class %q, buttons %s; want solve-grid two with solve-hp solve-q", loop.Class, ids(loop))
	}
	if !loop.Buttons[0].On {
		t.Errorf("closed loop: the pump head (the demo's unknown) is not the one chosen")
	}
}

// TestTemperatureHints: with a flow given, the supply and return
// temperatures only add the load the flow carries, and their boxes say
// they may stay blank; with a heat load given they are needed (the
// parameter table's Missing for tsup and tret) and keep the table's hints.
// This project's own wording rule, no external source.
func TestTemperatureHints(t *testing.T) {
	hints := func(sc scenario.Scenario) (sup, ret string) {
		t.Helper()
		sh, _ := sheetOf(t, sc, "balance")
		s, ok1 := fieldOf(sh, "tsup")
		r, ok2 := fieldOf(sh, "tret")
		if !ok1 || !ok2 {
			t.Fatal("no supply or return temperature box on the Balance view")
		}
		return s.Hint, r.Hint
	}
	sup, ret := hints(scenario.Demo())
	if !strings.Contains(sup, "optional") || !strings.Contains(ret, "optional") {
		t.Errorf("flow given: hints %q and %q, want both to say the boxes are optional", sup, ret)
	}
	tsup, _, _ := scenario.Lookup("tsup")
	tret, _, _ := scenario.Lookup("tret")
	sup, ret = hints(with(t, scenario.Demo(), "q", "", "load", "300kW"))
	if sup != tsup.Hint || ret != tret.Hint {
		t.Errorf("heat load given: hints %q and %q, want the table's %q and %q", sup, ret, tsup.Hint, tret.Hint)
	}
}

// TestLoopBalanceWarnings: the Balance view of a closed loop lists the
// warnings its cards point to, as the open line's does. A propylene glycol
// mix at 60 °C lies above Melinder's (2010) tables, which stop at +40 °C
// (calc/glycol_melinder.go), so the liquid's warning must be worded
// somewhere on the view; once, a card built and dropped had marked it
// listed and the loop's view showed none.
func TestLoopBalanceWarnings(t *testing.T) {
	listed := func(sh Sheet) []string {
		var out []string
		var walk func([]Block)
		walk = func(bs []Block) {
			for _, bl := range bs {
				if bl.Kind == BlockWarnings {
					out = append(out, bl.Items...)
				}
				if bl.Card != nil {
					walk(bl.Card.Blocks)
				}
			}
		}
		for _, c := range sh.Cards {
			walk(c.Blocks)
		}
		return out
	}
	hot := with(t, scenario.Demo(), "liq", "pg", "gly", "30%", "t", "60°C")
	for _, tc := range []struct {
		name string
		sc   scenario.Scenario
	}{
		{"open line", hot},
		{"closed loop", with(t, hot, "loop", "1")},
	} {
		sh, r := sheetOf(t, tc.sc, "balance")
		if len(r.Warnings) == 0 {
			t.Fatalf("%s: no warning worked out for a glycol mix at 60 °C", tc.name)
		}
		items := listed(sh)
		found := false
		for _, it := range items {
			if strings.Contains(it, "40") && strings.Contains(it, "°C") {
				found = true
			}
		}
		if !found {
			t.Errorf("%s: the Balance view lists %d warnings, none about the tables' +40 °C limit: %q", tc.name, len(items), items)
		}
	}
}

// TestLoopWording: a loop's sheet names its friction head by what it holds
// (the components' drops with the pipe's and the fittings') and its budget
// by the one point it has: the pump supplies the head and the loop uses
// it. This project's own wording; the figures are checked elsewhere
// (ref-loops.case).
func TestLoopWording(t *testing.T) {
	sc, err := scenario.Parse("name=Loop&loop=1&liq=pg&gly=30%25&t=7C&q=12L/s&pexp=150kPa&zexp=10m&zp=0m" +
		"&s1.l=120m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.fit=elbow90:4&s1.cmp=chiller:45kPa@12L/s,coil:3.2m@12L/s,valve:kv40")
	if err != nil {
		t.Fatal(err)
	}
	sh, _ := sheetOf(t, sc, "balance")
	text := sheetText(sh)
	for _, w := range []string{"friction, fittings and components", "Supplied by the pump", "Used round the loop"} {
		if !strings.Contains(text, w) {
			t.Errorf("the loop's Balance view does not say %q", w)
		}
	}
	for _, not := range []string{"Supplied at point 1", "Used at point 2", ", friction and fittings "} {
		if strings.Contains(text, not) {
			t.Errorf("the loop's Balance view still says %q", not)
		}
	}
	// The Pump view's suction side: the loop's static pressure and where
	// it connects, not an open tank's surface.
	pump, _ := sheetOf(t, sc, "pump")
	for _, p := range []string{"pexp", "zexp", "zp"} {
		if _, ok := fieldOf(pump, p); !ok {
			t.Errorf("the loop's Pump view has no %s box", p)
		}
	}
	for _, p := range []string{"p1", "z1"} {
		if _, ok := fieldOf(pump, p); ok {
			t.Errorf("the loop's Pump view asks for %s, which a loop does not use", p)
		}
	}
	if text := sheetText(pump); !strings.Contains(text, "static pressure at the vessel's connection") || strings.Contains(text, "source surface") {
		t.Error("the loop's NPSH figures do not name the loop's static pressure, or still name a source surface")
	}
	rep, _ := sheetOf(t, sc, "report")
	if !strings.Contains(sheetText(rep), "friction, fittings and components") {
		t.Error("the loop's report does not name its friction head with the components")
	}
	// Water hammer in a loop: no point 2 to close a valve at.
	surge, _ := sheetOf(t, with(t, sc, "liq", "water", "gly", "", "tc", "0.5s"), "balance")
	st := sheetText(Sheet{Cards: []Card{card(t, surge.Cards, "surge")}})
	if !strings.Contains(st, "Surge on a fast closure in the loop") || !strings.Contains(st, "the loop's static pressure at the pump's level") || strings.Contains(st, "point 2") {
		t.Error("the loop's surge card does not speak of the loop, or still names point 2")
	}
}

// TestEveryLiquidOfALoop: a closed loop of each liquid builds every view,
// and the liquid's line says where its pressure came from. Once a water
// loop failed to draw: the pressure's source had no words. This project's
// own rule (every sheet draws), no external source.
func TestEveryLiquidOfALoop(t *testing.T) {
	base := "name=Loop&loop=1&t=7C&q=12L/s&pexp=150kPa&zexp=10m&zp=0m&tc=0.5s" +
		"&s1.l=120m&s1.nps=3&s1.sch=40&s1.mat=steel&s1.fit=elbow90:4&s1.cmp=chiller:45kPa@12L/s,valve:kv40"
	for _, liq := range []string{"liq=water", "liq=seawater", "liq=eg&gly=30%25", "liq=pg&gly=30%25", "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa"} {
		sc, err := scenario.Parse(base + "&" + liq)
		if err != nil {
			t.Fatalf("%s: %v", liq, err)
		}
		for _, v := range Views {
			func() {
				defer func() {
					if p := recover(); p != nil {
						t.Errorf("%s, %s view: %v", liq, v.Key, p)
					}
				}()
				sh, _ := sheetOf(t, sc.Clone(), v.Key)
				if text := sheetText(sh); (liq == "liq=water" || liq == "liq=seawater") && v.Key == "balance" && !strings.Contains(text, "the loop's static pressure at the vessel's connection)") {
					t.Errorf("%s: the liquid's line does not say its pressure is the loop's static pressure", liq)
				}
			}()
		}
	}
}
